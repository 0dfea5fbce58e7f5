package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

// beyondRelErr is the relative error used by the steric, bridging,
// ripening, rheology, distribution, shear and yield-stress tests.
func beyondRelErr(got, want float64) float64 {
	if want == 0 {
		return math.Abs(got)
	}
	return math.Abs(got-want) / math.Abs(want)
}

// beyondHamakerSpheres is Hamaker's exact non-retarded energy (J) of two
// equal spheres of radius a at surface separation h (Hamaker, Physica 4,
// 1058 (1937)), written out here so the steric tests do not lean on the
// package's own van der Waals code.
func beyondHamakerSpheres(hamaker, a float64) func(h float64) float64 {
	return func(h float64) float64 {
		s := 2*a + h
		return -hamaker / 6 * (2*a*a/(h*(4*a+h)) + 2*a*a/(s*s) + math.Log(h*(4*a+h)/(s*s)))
	}
}

const beyondKT = physics.Boltzmann * 298.15

func TestSolventQualityFromChi(t *testing.T) {
	t.Parallel()
	// Flory, Principles of Polymer Chemistry (1953): theta point at
	// chi = 1/2, better solvents below, worse above [pub]; the +-0.005 band
	// is this package's documented rounding [practice].
	cases := []struct {
		chi  float64
		want physics.SolventQuality
	}{
		{-0.2, physics.GoodSolvent},
		{0.3, physics.GoodSolvent},
		{0.45, physics.GoodSolvent},
		{0.494, physics.GoodSolvent},
		{0.495, physics.ThetaSolvent},
		{0.5, physics.ThetaSolvent},
		{0.505, physics.ThetaSolvent},
		{0.51, physics.PoorSolvent},
		{0.8, physics.PoorSolvent},
	}
	for _, c := range cases {
		if got := physics.SolventQualityFromChi(c.chi); got != c.want {
			t.Errorf("SolventQualityFromChi(%v) = %v, want %v", c.chi, got, c.want)
		}
	}
}

func TestParseSolventQuality(t *testing.T) {
	t.Parallel()
	// The request vocabulary (solvent_quality in openapi/openapi.yaml).
	for _, q := range []physics.SolventQuality{physics.GoodSolvent, physics.ThetaSolvent, physics.PoorSolvent} {
		got, err := physics.ParseSolventQuality(q.String())
		if err != nil || got != q {
			t.Errorf("ParseSolventQuality(%q) = %v, %v; want %v", q.String(), got, err, q)
		}
	}
	for _, s := range []string{"", "Good", "bad", "unknown"} {
		if _, err := physics.ParseSolventQuality(s); err == nil {
			t.Errorf("ParseSolventQuality(%q) gave no error", s)
		}
	}
	if s := physics.SolventQuality(0).String(); s != "unknown" {
		t.Errorf("zero SolventQuality prints %q, want unknown", s)
	}
}

func TestStericLayerEffective(t *testing.T) {
	t.Parallel()
	// Napper, Polymeric Stabilization of Colloidal Dispersions (1983):
	// flocculation at and beyond theta conditions, for PEO-type layers on
	// heating to the critical flocculation temperature (about the theta
	// temperature; the cloud point stands in for it) [pub].
	c := physics.Kelvin
	cases := []struct {
		quality       physics.SolventQuality
		storage, cp   float64
		hasCloudPoint bool
		want          bool
	}{
		{physics.GoodSolvent, c(25), c(60), true, true},
		{physics.GoodSolvent, c(60), c(60), true, false},
		{physics.GoodSolvent, c(70), c(60), true, false},
		{physics.GoodSolvent, c(70), c(60), false, true},
		{physics.ThetaSolvent, c(25), c(60), true, false},
		{physics.PoorSolvent, c(25), c(60), false, false},
		{physics.SolventQuality(0), c(25), c(60), false, false},
	}
	for _, k := range cases {
		if got := physics.StericLayerEffective(k.quality, k.storage, k.cp, k.hasCloudPoint); got != k.want {
			t.Errorf("StericLayerEffective(%v, %v, %v, %v) = %v, want %v",
				k.quality, k.storage, k.cp, k.hasCloudPoint, got, k.want)
		}
	}
}

func TestMinimumStericThicknessDerjaguin(t *testing.T) {
	t.Parallel()
	// Closed form for the Derjaguin limit V = -A a/(12 h) (Hamaker 1937):
	// delta = A a/(24 kT allowed) [calc]; testdata/reference/beyond_dlvo.py
	// prints 1.012210e-08 m for A = 1e-20 J, a = 100 nm, 1 kT.
	cases := []struct {
		hamaker, radius, allowed, want, tol float64
	}{
		{1e-20, 100e-9, 1, 1.012210e-08, 1e-6},
		{1e-20, 100e-9, 0.5, 2.024420e-08, 1e-6},
		{1e-20, 1e-6, 1, 1e-20 * 1e-6 / (24 * beyondKT), 1e-8},
		{4e-21, 250e-9, 3, 4e-21 * 250e-9 / (24 * beyondKT * 3), 1e-8},
	}
	for _, c := range cases {
		a, r := c.hamaker, c.radius
		vdw := func(h float64) float64 { return -a * r / (12 * h) }
		got := physics.MinimumStericThickness(vdw, 298.15, c.allowed)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("A=%g a=%g allowed=%g: delta = %.8e m, want %.8e (rel err %.1e)", a, r, c.allowed, got, c.want, e)
		}
	}
}

func TestMinimumStericThicknessHamaker(t *testing.T) {
	t.Parallel()
	// The test's Hamaker function against testdata/reference/REFERENCES.md [calc], a = 100 nm,
	// A = 1e-20 J: -18.53, -8.68, -2.96, -1.20 kT at 1, 2, 5, 10 nm.
	vdw := beyondHamakerSpheres(1e-20, 100e-9)
	for _, c := range []struct{ h, wantKT float64 }{{1e-9, -18.53}, {2e-9, -8.68}, {5e-9, -2.96}, {10e-9, -1.20}} {
		if got := vdw(c.h) / beyondKT; math.Abs(got-c.wantKT) > 0.006 {
			t.Fatalf("test Hamaker function at %g m: %.4f kT, want %.2f", c.h, got, c.wantKT)
		}
	}
	// Root of |V(2 delta)| = allowed kT with scipy.optimize.brentq
	// (testdata/reference/beyond_dlvo.py) [calc].
	cases := []struct {
		hamaker, radius, allowed, want, tol float64
	}{
		{1e-20, 100e-9, 1, 5.680251e-09, 1e-6},
		{1e-20, 100e-9, 0.5, 9.004319e-09, 1e-6},
		{1e-20, 1e-6, 1, 5.680251e-08, 1e-6},
		{5e-21, 100e-9, 1, 3.410473e-09, 1e-6},
		{2e-20, 1e-6, 1, 9.004319e-08, 1e-6},
	}
	for _, c := range cases {
		got := physics.MinimumStericThickness(beyondHamakerSpheres(c.hamaker, c.radius), 298.15, c.allowed)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("A=%g a=%g allowed=%g: delta = %.6e m, want %.6e (rel err %.1e)",
				c.hamaker, c.radius, c.allowed, got, c.want, e)
		}
	}
	// testdata/reference/REFERENCES.md: a 5-10 nm layer is the usual minimum [practice], for a
	// sub-micrometre particle with a typical Hamaker constant.
	for _, allowed := range []float64{1, 0.5} {
		got := physics.MinimumStericThickness(vdw, 298.15, allowed)
		if got < 5e-9 || got > 10e-9 {
			t.Errorf("a = 100 nm, A = 1e-20 J, %g kT: delta = %.3g m, outside the practical 5–10 nm", allowed, got)
		}
	}
}

func TestMinimumStericThicknessEdges(t *testing.T) {
	t.Parallel()
	// Limits documented on the function: no attraction needs no layer; an
	// attraction that never falls below the allowance needs an infinite one.
	none := func(float64) float64 { return 0 }
	if got := physics.MinimumStericThickness(none, 298.15, 1); got != 0 {
		t.Errorf("no attraction: delta = %g, want 0", got)
	}
	strong := func(float64) float64 { return -1e-15 }
	if got := physics.MinimumStericThickness(strong, 298.15, 1); !math.IsInf(got, 1) {
		t.Errorf("constant deep attraction: delta = %g, want +Inf", got)
	}
	defer func() {
		if recover() == nil {
			t.Error("allowedKT = 0 did not panic")
		}
	}()
	physics.MinimumStericThickness(none, 298.15, 0)
}

// TestMinimumStericThicknessEvaluations: the search takes about 8 energies
// over the grid of Hamaker constants, radii and allowances, also where an
// iterate lands on the root exactly (a 10 um sphere, A = 3e-19 J, 3 kT,
// retarded: FindRootNewton's zero step used to send it 2 units away and
// cost 32 energies).
func TestMinimumStericThicknessEvaluations(t *testing.T) {
	t.Parallel()
	for _, hamaker := range []float64{1e-20, 5e-20, 1e-19, 3e-19} {
		for _, radius := range []float64{100e-9, 1e-6, 10e-6} {
			for _, allowed := range []float64{0.5, 1, 3} {
				p := physics.Pair{Radius: radius, Hamaker: hamaker, Retarded: true, TempK: 298.15, EpsR: 78.4}
				energy, evaluations := p.EnergyCurve(), 0
				counted := func(h float64) float64 { evaluations++; return energy(h) }
				physics.MinimumStericThickness(counted, 298.15, allowed)
				if evaluations > 12 {
					t.Errorf("A = %g J, a = %g m, %g kT: %d energies, want at most 12", hamaker, radius, allowed, evaluations)
				}
			}
		}
	}
}

func BenchmarkMinimumStericThickness(b *testing.B) {
	vdw := beyondHamakerSpheres(1e-20, 100e-9)
	for b.Loop() {
		physics.MinimumStericThickness(vdw, 298.15, 1)
	}
}
