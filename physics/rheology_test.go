package physics_test

import (
	"fmt"
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestSuspensionViscosityAtPhi03(t *testing.T) {
	t.Parallel()
	// testdata/reference/REFERENCES.md, phi = 0.3 [calc]: Krieger–Dougherty (0.64) 2.751;
	// (0.71) 2.650; six digits from testdata/reference/beyond_dlvo.py.
	const phi = 0.3
	cases := []struct {
		name      string
		got, want float64
		tol       float64
	}{
		{"KD 0.64", physics.KriegerDougherty(phi, 0.64, 2.5), 2.751197, 1e-6},
		{"KD 0.71", physics.KriegerDougherty(phi, 0.71, 2.5), 2.650283, 1e-6},
	}
	for _, c := range cases {
		if e := beyondRelErr(c.got, c.want); e > c.tol {
			t.Errorf("%s: %.6f, want %.6f", c.name, c.got, c.want)
		}
	}
}

func TestKriegerDoughertyLimits(t *testing.T) {
	t.Parallel()
	// Krieger & Dougherty (1959): the law reduces to Einstein's 1 + [eta]
	// phi at low phi [pub], and diverges at maximum packing.
	for _, phim := range []float64{0.58, physics.RandomClosePacking, 0.71} {
		const phi = 1e-6
		slope := (physics.KriegerDougherty(phi, phim, physics.DefaultIntrinsicViscosity) - 1) / phi
		if math.Abs(slope-2.5) > 1e-4 {
			t.Errorf("phim %v: initial slope %.6f, want Einstein's 2.5", phim, slope)
		}
		if got := physics.KriegerDougherty(phim, phim, 2.5); !math.IsInf(got, 1) {
			t.Errorf("KD at phi = phim = %v, want +Inf", got)
		}
	}
	if got := physics.KriegerDougherty(0, 0.64, 2.5); got != 1 {
		t.Errorf("KD at phi = 0 = %v, want 1", got)
	}
}

func TestMaxVolumeFractionForViscosity(t *testing.T) {
	t.Parallel()
	// Numerical inversion of Krieger–Dougherty with scipy.optimize.brentq
	// (testdata/reference/beyond_dlvo.py) [calc].
	cases := []struct {
		eta, phim, want, tol float64
	}{
		{10, 0.64, 0.48823208, 1e-7},
		{2, 0.64, 0.22501134, 1e-7},
		{1, 0.64, 0, 0},
		{0.5, 0.64, 0, 0},
		{math.Inf(1), 0.64, 0.64, 1e-15},
	}
	for _, c := range cases {
		got := physics.MaxVolumeFractionForViscosity(c.eta, c.phim, 2.5)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("MaxVolumeFractionForViscosity(%v, %v) = %.8f, want %.8f", c.eta, c.phim, got, c.want)
		}
	}
	// Round trip through the forward law.
	for _, phi := range []float64{0.01, 0.2, 0.45, 0.6} {
		eta := physics.KriegerDougherty(phi, 0.64, 2.5)
		if back := physics.MaxVolumeFractionForViscosity(eta, 0.64, 2.5); math.Abs(back-phi) > 1e-12 {
			t.Errorf("round trip phi %v -> eta %v -> %v", phi, eta, back)
		}
	}
}

func TestEffectiveVolumeFraction(t *testing.T) {
	t.Parallel()
	// Hand calculation of phi (1 + shell/a)^3 (Russel, Saville &
	// Schowalter 1989) [calc]: 0.1 (1.1)^3 = 0.1331; a 9.61 nm Debye shell
	// (1 mM NaCl) on 100 nm spheres at 0.2: 0.2 (1.0961)^3 = 0.263389.
	cases := []struct {
		phi, radius, shell, want, tol float64
	}{
		{0.1, 100e-9, 10e-9, 0.1331, 1e-12},
		{0.2, 100e-9, 9.61e-9, 0.2 * 1.0961 * 1.0961 * 1.0961, 1e-12},
		{0.3, 1e-6, 0, 0.3, 0},
		{0, 1e-6, 5e-9, 0, 0},
	}
	for _, c := range cases {
		got := physics.EffectiveVolumeFraction(c.phi, c.radius, c.shell)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("EffectiveVolumeFraction(%v, %v, %v) = %.6f, want %.6f", c.phi, c.radius, c.shell, got, c.want)
		}
	}
}

func ExampleKriegerDougherty() {
	// A 30 % suspension of hard spheres at low shear.
	eta := physics.KriegerDougherty(0.30, physics.RandomClosePacking, physics.DefaultIntrinsicViscosity)
	fmt.Printf("relative viscosity %.3f\n", eta)
	// The most solids that keep the relative viscosity below 2.
	phi := physics.MaxVolumeFractionForViscosity(2, physics.RandomClosePacking, physics.DefaultIntrinsicViscosity)
	fmt.Printf("phi for eta_r = 2: %.4f\n", phi)
	// Output:
	// relative viscosity 2.751
	// phi for eta_r = 2: 0.2250
}
