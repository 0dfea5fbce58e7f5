package physics

import (
	"math"
	"testing"
)

func TestAggregationKinetics(t *testing.T) {
	t.Parallel()
	const eta, tempK = 0.89e-3, 298.15
	n0 := NumberDensity(0.1, 0.5e-6)
	// [calc] testdata/reference/interaction.py; testdata/reference/REFERENCES.md: half-life
	// 1.62e17 W/N0 s (the inverse of the number-loss constant 6.17e-18
	// m^3/s), 0.85 s at a = 0.5 um and phi = 0.1, ortho/peri 10.8.
	tests := []struct {
		name      string
		got, want float64
		tol       float64
	}{
		{"N0", n0, 1.909859e17, 1e-6},
		{"half-life", math.Pow(10, Log10HalfLife(eta, tempK, n0, 0)), 0.849047, 1e-5},
		{"half-life W = 1e6", math.Pow(10, Log10HalfLife(eta, tempK, n0, 6)-6), 0.849047, 1e-5},
		{"half-life N0 = 1", math.Pow(10, Log10HalfLife(eta, tempK, 1, 0)), 1.621561e17, 1e-6},
		{"ortho/peri d = 1 um G = 100/s", OrthoPerikineticRatio(100, 1e-6, eta, tempK), 10.810404, 1e-6},
	}
	for _, tt := range tests {
		if e := interactionRelErr(tt.got, tt.want); e > tt.tol {
			t.Errorf("%s: got %.7g, want %.7g (rel err %.2g)", tt.name, tt.got, tt.want, e)
		}
	}
	// [pub] Shaw, Introduction to Colloid and Surface Chemistry: rapid
	// half-life "of the order of 1e11/n0 s" with n0 in cm^-3.
	// One particle per cm^3 is 1e6 per m^3.
	if got := Log10HalfLife(eta, tempK, 1e6, 0); math.Abs(got-11) > 0.5 {
		t.Errorf("Shaw's order of magnitude: log10(t n0[cm^-3]) = %.2f, want about 11", got)
	}
	if got := Log10HalfLife(eta, tempK, 0, 3); !math.IsInf(got, 1) {
		t.Errorf("no particles: got %g, want +Inf", got)
	}
}

func TestOrthoPerikineticShearRate(t *testing.T) {
	t.Parallel()
	// Smoluchowski's ratio G d^3 eta/(2 kT) solved for G: ratio 1 at
	// d = 1 um in 1 mPa s at 25 °C, testdata/reference/inverses.py [calc];
	// J. Gregory, Particles in Water (2006), ch. 6: for 1 um particles in
	// water the two rates are equal near G = 10 1/s [memory].
	tests := []struct {
		name                            string
		ratio, diameter, eta, want, tol float64
	}{
		{"inverses.py", 1, 1e-6, 1e-3, 8.232810, 1e-6},
		{"Gregory", 1, 1e-6, 1e-3, 10, 0.3},
		{"ratio 0", 0, 1e-6, 1e-3, 0, 0},
		// The ratio of TestAggregationKinetics [calc], read backwards.
		{"interaction.py backwards", 10.810404, 1e-6, 0.89e-3, 100, 1e-6},
	}
	for _, tt := range tests {
		if got := OrthoPerikineticShearRate(tt.ratio, tt.diameter, tt.eta, 298.15); interactionRelErr(got, tt.want) > tt.tol {
			t.Errorf("%s: %.7g 1/s, want %.7g", tt.name, got, tt.want)
		}
	}
	g := OrthoPerikineticShearRate(2.5, 0.7e-6, 3e-3, 310)
	if got := OrthoPerikineticRatio(g, 0.7e-6, 3e-3, 310); interactionRelErr(got, 2.5) > 1e-14 {
		t.Errorf("round trip: %.17g, want 2.5", got)
	}
}

func TestKineticsPanics(t *testing.T) {
	t.Parallel()
	for name, f := range map[string]func(){
		"zero viscosity":   func() { Log10HalfLife(0, 298, 1e18, 0) },
		"zero temperature": func() { OrthoPerikineticRatio(1, 1e-6, 1e-3, 0) },
		"NaN log10W":       func() { Log10HalfLife(1e-3, 298, 1e18, math.NaN()) },
		"phi above 1":      func() { NumberDensity(1.5, 1e-6) },
		"negative shear":   func() { OrthoPerikineticRatio(-1, 1e-6, 1e-3, 298) },
		"negative ratio":   func() { OrthoPerikineticShearRate(-1, 1e-6, 1e-3, 298) },
	} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", name)
				}
			}()
			f()
		}()
	}
}

func TestAggregateDiameterGrowth(t *testing.T) {
	t.Parallel()
	// [calc] (1 + t/t_1/2)^(1/df) - 1, Smoluchowski (1917) cluster number
	// with the fractal mass-radius relation of Lin et al. (1989); values
	// from Python: 2**0.5-1, 4**(1/2.1)-1, 11**(1/1.86)-1.
	cases := []struct{ t, half, df, want float64 }{
		{1, 1, 2, 0.41421356237309515},
		{3, 1, ReactionLimitedFractalDimension, 0.9350635570477832},
		{10, 1, 1.86, 2.629848844880005},
		{5, math.Inf(1), 2.1, 0},
		{0, 1, 3, 0},
	}
	for _, c := range cases {
		if got := AggregateDiameterGrowth(c.t, c.half, c.df); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("AggregateDiameterGrowth(%g, %g, %g) = %.15g, want %.15g", c.t, c.half, c.df, got, c.want)
		}
	}
}
