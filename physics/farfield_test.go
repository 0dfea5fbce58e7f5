package physics_test

import (
	"fmt"
	"math"
	"testing"

	"colloidtriage/physics"
)

// surfaceRelErr is |got/want - 1|, or |got| when want is 0.
func surfaceRelErr(got, want float64) float64 {
	if want == 0 {
		return math.Abs(got)
	}
	return math.Abs(got/want - 1)
}

// farFieldMixtures are the ion mixtures of testdata/reference/pb_far_field.py
// (valence, mol/m^3).
var farFieldMixtures = map[string][]physics.Ion{
	"NaCl 10 mM":                    {{Valence: 1, Concentration: 10}, {Valence: -1, Concentration: 10}},
	"MgSO4 1 mM":                    {{Valence: 2, Concentration: 1}, {Valence: -2, Concentration: 1}},
	"CaCl2 1 mM":                    {{Valence: 2, Concentration: 1}, {Valence: -1, Concentration: 2}},
	"Na2SO4 1 mM":                   {{Valence: 1, Concentration: 2}, {Valence: -2, Concentration: 1}},
	"AlCl3 1 mM":                    {{Valence: 3, Concentration: 1}, {Valence: -1, Concentration: 3}},
	"Na3PO4 1 mM":                   {{Valence: 1, Concentration: 3}, {Valence: -3, Concentration: 1}},
	"NaCl 10 mM + CaCl2 1 mM":       {{Valence: 1, Concentration: 10}, {Valence: 2, Concentration: 1}, {Valence: -1, Concentration: 12}},
	"NaCl 5 + CaCl2 2 + MgSO4 1 mM": {{Valence: 1, Concentration: 5}, {Valence: 2, Concentration: 2}, {Valence: 2, Concentration: 1}, {Valence: -1, Concentration: 9}, {Valence: -2, Concentration: 1}},
}

// reducedFarField is FarFieldPotential in units of kT/e at 25 °C.
func reducedFarField(y0 float64, ions []physics.Ion) float64 {
	const tempK = 298.15
	thermal := physics.Boltzmann * tempK / physics.ElementaryCharge
	return physics.FarFieldPotential(y0*thermal, ions, tempK) / thermal
}

func TestFarFieldPotentialReference(t *testing.T) {
	t.Parallel()
	// [calc] testdata/reference/pb_far_field.py (table in pb_far_field.txt):
	// SciPy DOP853 integration of the full Poisson–Boltzmann equation from
	// the linear far field inwards, accurate to about 1e-9.
	cases := []struct {
		mixture  string
		y0, want float64
	}{
		{"NaCl 10 mM", -10, -3.9464571926},
		{"NaCl 10 mM", -4, -3.0463766238},
		{"NaCl 10 mM", -1, -0.9796746496},
		{"NaCl 10 mM", 0.5, 0.4974120071},
		{"NaCl 10 mM", 1, 0.9796746496},
		{"NaCl 10 mM", 4, 3.0463766238},
		{"NaCl 10 mM", 10, 3.9464571926},
		{"MgSO4 1 mM", -4, -1.9280551602},
		{"MgSO4 1 mM", 4, 1.9280551602},
		{"CaCl2 1 mM", -10, -1.6075687389},
		{"CaCl2 1 mM", -4, -1.5574855294},
		{"CaCl2 1 mM", -1, -0.8156700854},
		{"CaCl2 1 mM", 1, 1.1313713862},
		{"CaCl2 1 mM", 4, 4.3004521039},
		{"CaCl2 1 mM", 10, 5.9017844220},
		{"Na2SO4 1 mM", -4, -4.3004521039},
		{"Na2SO4 1 mM", 4, 1.5574855294},
		{"AlCl3 1 mM", -10, -0.9938769061},
		{"AlCl3 1 mM", -4, -0.9898625151},
		{"AlCl3 1 mM", -1, -0.6834810200},
		{"AlCl3 1 mM", 1, 1.3032249519},
		{"AlCl3 1 mM", 4, 5.9284673639},
		{"AlCl3 1 mM", 10, 8.5426314582},
		{"Na3PO4 1 mM", -4, -5.9284673639},
		{"Na3PO4 1 mM", 4, 0.9898625151},
		{"NaCl 10 mM + CaCl2 1 mM", -4, -2.3010974688},
		{"NaCl 10 mM + CaCl2 1 mM", 4, 3.2639806038},
		{"NaCl 5 + CaCl2 2 + MgSO4 1 mM", -6, -1.9617273529},
		{"NaCl 5 + CaCl2 2 + MgSO4 1 mM", -2, -1.4737004882},
		{"NaCl 5 + CaCl2 2 + MgSO4 1 mM", 2, 1.8759967522},
		{"NaCl 5 + CaCl2 2 + MgSO4 1 mM", 6, 2.8646475549},
	}
	for _, c := range cases {
		got := reducedFarField(c.y0, farFieldMixtures[c.mixture])
		if e := surfaceRelErr(got, c.want); e > 1e-8 {
			t.Errorf("%s, y0 = %g: y_eff = %.10f, want %.10f (rel err %.1e)", c.mixture, c.y0, got, c.want, e)
		}
	}
}

func TestFarFieldPotentialClosedForms(t *testing.T) {
	t.Parallel()
	// Gouy–Chapman, z:z electrolyte: y_eff = (4/z) tanh(z y0/4) [pub]
	// (Verwey & Overbeek, Theory of the Stability of Lyophobic Colloids,
	// 1948, ch. II). 2:1 electrolyte: y_eff = 6 (u - 1)/(u + 1),
	// u = sqrt((2 e^y0 + 1)/3), and 1:2 its mirror image y -> -y [memory]
	// (H. Ohshima, Theory of Colloid and Interfacial Electric Phenomena,
	// 2006, ch. 1, as recalled; pb_far_field.py's ODE confirms it to
	// 2.5e-10).
	symmetric := func(z int) func(float64) float64 {
		return func(y0 float64) float64 { return 4 / float64(z) * math.Tanh(float64(z)*y0/4) }
	}
	twoOne := func(y0 float64) float64 {
		u := math.Sqrt((2*math.Exp(y0) + 1) / 3)
		return 6 * (u - 1) / (u + 1)
	}
	oneTwo := func(y0 float64) float64 { return -twoOne(-y0) }
	cases := []struct {
		name string
		ions []physics.Ion
		want func(float64) float64
	}{
		{"1:1", farFieldMixtures["NaCl 10 mM"], symmetric(1)},
		{"2:2", farFieldMixtures["MgSO4 1 mM"], symmetric(2)},
		{"3:3", []physics.Ion{{Valence: 3, Concentration: 0.1}, {Valence: -3, Concentration: 0.1}}, symmetric(3)},
		{"2:1", farFieldMixtures["CaCl2 1 mM"], twoOne},
		{"1:2", farFieldMixtures["Na2SO4 1 mM"], oneTwo},
	}
	for _, c := range cases {
		for y0 := -30.0; y0 <= 30; y0 += 0.37 {
			got, want := reducedFarField(y0, c.ions), c.want(y0)
			if e := surfaceRelErr(got, want); e > 1e-9 {
				t.Errorf("%s, y0 = %.2f: y_eff = %.12f, want %.12f (rel err %.1e)", c.name, y0, got, want, e)
			}
		}
	}
}

func TestFarFieldPotentialProperties(t *testing.T) {
	t.Parallel()
	const tempK = 298.15
	for name, ions := range farFieldMixtures {
		// Odd in the sign of the charges, continuous and monotone in psi,
		// equal to psi to first order [calc] (linearised Poisson–Boltzmann; the
		// relative correction is y sum c z^3 / (6 sum c z^2), below y/2).
		mirror := make([]physics.Ion, len(ions))
		for i, ion := range ions {
			mirror[i] = physics.Ion{Valence: -ion.Valence, Concentration: ion.Concentration}
		}
		prev := math.Inf(-1)
		for psi := -0.8; psi <= 0.8; psi += 0.001 {
			got := physics.FarFieldPotential(psi, ions, tempK)
			if math.IsNaN(got) || got < prev || math.Signbit(got) != math.Signbit(psi) {
				t.Fatalf("%s: psi_eff(%.3f V) = %g after %g: not finite, non-decreasing and of the sign of psi", name, psi, got, prev)
			}
			if m := physics.FarFieldPotential(-psi, mirror, tempK); surfaceRelErr(m, -got) > 1e-12 {
				t.Errorf("%s mirrored: psi_eff(%.3f V) = %g, want %g", name, -psi, m, -got)
			}
			prev = got
		}
		for _, psi := range []float64{1e-9, -1e-6, 1e-4} {
			if got := physics.FarFieldPotential(psi, ions, tempK); surfaceRelErr(got, psi) > 0.5*math.Abs(psi)/0.0257 {
				t.Errorf("%s: psi_eff(%g V) = %g, want psi to first order", name, psi, got)
			}
		}
		for _, psi := range []float64{-40, 40, 0} {
			if got := physics.FarFieldPotential(psi, ions, tempK); math.IsNaN(got) || math.IsInf(got, 0) {
				t.Errorf("%s: psi_eff(%g V) = %g", name, psi, got)
			}
		}
	}
	// No charged ion: no double layer, psi returned.
	if got := physics.FarFieldPotential(0.05, []physics.Ion{{Valence: 0, Concentration: 5}}, tempK); got != 0.05 {
		t.Errorf("no ions: psi_eff = %g, want 0.05", got)
	}
}

func TestFarFieldPotentialPanics(t *testing.T) {
	t.Parallel()
	nacl := farFieldMixtures["NaCl 10 mM"]
	for name, call := range map[string]func(){
		"not neutral": func() { physics.FarFieldPotential(0.05, []physics.Ion{{Valence: 1, Concentration: 1}}, 298) },
		"negative c": func() {
			physics.FarFieldPotential(0.05, []physics.Ion{{Valence: 1, Concentration: -1}, {Valence: -1, Concentration: -1}}, 298)
		},
		"NaN psi":      func() { physics.FarFieldPotential(math.NaN(), nacl, 298) },
		"zero kelvin":  func() { physics.FarFieldPotential(0.05, nacl, 0) },
		"infinite psi": func() { physics.FarFieldPotential(math.Inf(1), nacl, 298) },
	} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", name)
				}
			}()
			call()
		}()
	}
}

func ExampleFarFieldPotential() {
	// A surface at -100 mV in 1 mM CaCl2 at 25 °C: the divalent
	// counter-ions hold the far field well below the 1:1 value
	// (Ohshima's 2:1 closed form gives -39.9 mV, Gouy–Chapman -77.1 mV).
	ions := []physics.Ion{{Valence: 2, Concentration: 1}, {Valence: -1, Concentration: 2}}
	nacl := []physics.Ion{{Valence: 1, Concentration: 3}, {Valence: -1, Concentration: 3}}
	fmt.Printf("CaCl2 %.1f mV, NaCl %.1f mV\n",
		1e3*physics.FarFieldPotential(-0.1, ions, 298.15), 1e3*physics.FarFieldPotential(-0.1, nacl, 298.15))
	// Output: CaCl2 -39.9 mV, NaCl -77.1 mV
}

func BenchmarkFarFieldPotential(b *testing.B) {
	ions := farFieldMixtures["NaCl 5 + CaCl2 2 + MgSO4 1 mM"]
	for b.Loop() {
		physics.FarFieldPotential(-0.08, ions, 298.15)
	}
}
