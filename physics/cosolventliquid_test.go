package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestCosolventLiquidWaterLimit(t *testing.T) {
	t.Parallel()
	// Without co-solvent Melinder's glycol fits must return water: Kell
	// 1975 density and IAPWS R12-08 viscosity at 0, 20, 40, 60 °C [calc]
	// (basics.py; testdata/reference/REFERENCES.md). Glycerol at w = 0 is
	// Volk-Kähler's and Cheng's own water term.
	cases := []struct {
		tC, rho, mu float64 // °C, kg/m^3, mPa s
	}{
		{0, 999.840, 1.7918},
		{20, 998.204, 1.0016},
		{40, 992.216, 0.6527},
		{60, 983.199, 0.4660},
	}
	for _, c := range []physics.Cosolvent{physics.EthyleneGlycol, physics.PropyleneGlycol, physics.Glycerol} {
		for _, w := range cases {
			tempK := physics.Kelvin(w.tC)
			rho := physics.CosolventDensity(c, 0, tempK)
			mu := 1e3 * physics.CosolventViscosity(c, 0, tempK)
			if math.Abs(rho/w.rho-1) > 1.5e-3 {
				t.Errorf("%s w = 0 at %g °C: density %g, water %g, not within 0.15 %%", c, w.tC, rho, w.rho)
			}
			if math.Abs(mu/w.mu-1) > 0.02 {
				t.Errorf("%s w = 0 at %g °C: viscosity %g, water %g mPa s, not within 2 %%", c, w.tC, mu, w.mu)
			}
		}
	}
}

func TestCosolventDensityPublished(t *testing.T) {
	t.Parallel()
	cases := []struct {
		c        physics.Cosolvent
		w, tC    float64
		rho, tol float64 // kg/m^3, relative
	}{
		// Lange's Handbook, 15th ed., table 5.13: glycerol-water specific
		// gravity 20/20 °C [pub] times water at 20 °C, 998.204 kg/m^3 [calc].
		{physics.Glycerol, 0.10, 20, 1.02395 * 998.204, 0.003},
		{physics.Glycerol, 0.20, 20, 1.04880 * 998.204, 0.003},
		{physics.Glycerol, 0.30, 20, 1.07470 * 998.204, 0.003},
		{physics.Glycerol, 0.40, 20, 1.10135 * 998.204, 0.003},
		{physics.Glycerol, 0.50, 20, 1.12845 * 998.204, 0.003},
		{physics.Glycerol, 0.60, 20, 1.15605 * 998.204, 0.003},
		// ASHRAE Handbook - Fundamentals (2009), ch. 31, propylene glycol
		// density by mass [pub]. ASHRAE's tables are of inhibited
		// commercial glycols, 0.4-0.6 % denser than Melinder's pure ones.
		{physics.PropyleneGlycol, 0.20, 0, 1025.8, 0.007},
		{physics.PropyleneGlycol, 0.20, 20, 1019.0, 0.007},
		{physics.PropyleneGlycol, 0.20, 40, 1010.2, 0.007},
		{physics.PropyleneGlycol, 0.30, 20, 1028.4, 0.007},
		{physics.PropyleneGlycol, 0.40, 0, 1045.1, 0.007},
		{physics.PropyleneGlycol, 0.40, 20, 1036.2, 0.007},
		{physics.PropyleneGlycol, 0.40, 40, 1025.3, 0.007},
		// CRC Handbook, "Concentrative properties of aqueous solutions",
		// ethylene glycol at 20 °C [memory]: 20 % 1024, 40 % 1050 kg/m^3.
		{physics.EthyleneGlycol, 0.20, 20, 1024, 0.003},
		{physics.EthyleneGlycol, 0.40, 20, 1050, 0.003},
	}
	for _, c := range cases {
		got := physics.CosolventDensity(c.c, c.w, physics.Kelvin(c.tC))
		if math.Abs(got/c.rho-1) > c.tol {
			t.Errorf("%s w = %g at %g °C: %g kg/m^3, want %g within %g", c.c, c.w, c.tC, got, c.rho, c.tol)
		}
	}
}

func TestCosolventViscosityPublished(t *testing.T) {
	t.Parallel()
	cases := []struct {
		c       physics.Cosolvent
		w, tC   float64
		mu, tol float64 // mPa s, relative
	}{
		// Segur, in Miner & Dalton, Glycerol (ACS Monograph 117, 1953),
		// viscosity of aqueous glycerol [memory], 20 °C; 50 % at 0 and
		// 40 °C.
		{physics.Glycerol, 0.20, 20, 1.76, 0.03},
		{physics.Glycerol, 0.40, 20, 3.72, 0.03},
		{physics.Glycerol, 0.50, 20, 6.00, 0.03},
		{physics.Glycerol, 0.60, 20, 10.8, 0.03},
		{physics.Glycerol, 0.50, 0, 14.6, 0.04},
		{physics.Glycerol, 0.50, 40, 3.10, 0.04},
		// CRC Handbook, "Concentrative properties of aqueous solutions",
		// 20 °C [memory]: ethylene glycol 20 % 1.66, 40 % 2.9 mPa s;
		// 1,2-propanediol 20 % 2.0, 40 % 4.3 mPa s.
		{physics.EthyleneGlycol, 0.20, 20, 1.66, 0.08},
		{physics.EthyleneGlycol, 0.40, 20, 2.9, 0.08},
		{physics.PropyleneGlycol, 0.20, 20, 2.0, 0.08},
		{physics.PropyleneGlycol, 0.40, 20, 4.3, 0.08},
	}
	for _, c := range cases {
		got := 1e3 * physics.CosolventViscosity(c.c, c.w, physics.Kelvin(c.tC))
		if math.Abs(got/c.mu-1) > c.tol {
			t.Errorf("%s w = %g at %g °C: %g mPa s, want %g within %g", c.c, c.w, c.tC, got, c.mu, c.tol)
		}
	}
}

func TestCosolventLiquidTrends(t *testing.T) {
	t.Parallel()
	// Every mixture gets thinner and lighter as it warms, and more viscous
	// with more co-solvent at 20 °C, down to its freezing point
	// (qualitative, any handbook table [pub]).
	for _, c := range []physics.Cosolvent{physics.EthyleneGlycol, physics.PropyleneGlycol, physics.Glycerol} {
		for _, w := range []float64{0.1, 0.3, 0.5, 0.6} {
			lo := physics.CosolventFreezingPoint(c, w)
			prevMu, prevRho := math.Inf(1), math.Inf(1)
			for tempK := lo + 5; tempK <= physics.CosolventMaxTempK; tempK += 5 {
				mu := physics.CosolventViscosity(c, w, tempK)
				rho := physics.CosolventDensity(c, w, tempK)
				if !(mu < prevMu) || !(rho < prevRho) {
					t.Errorf("%s w = %g at %g K: viscosity %g or density %g did not fall", c, w, tempK, mu, rho)
				}
				prevMu, prevRho = mu, rho
			}
		}
		prev := 0.0
		for w := 0.0; w <= 0.6; w += 0.05 {
			mu := physics.CosolventViscosity(c, w, physics.Kelvin(20))
			if !(mu > prev) {
				t.Errorf("%s at 20 °C: viscosity %g at w = %g did not rise", c, mu, w)
			}
			prev = mu
		}
	}
	if physics.CosolventHasLiquidProperties(physics.Ethanol) {
		t.Error("ethanol-water properties are not tabulated here")
	}
}

func TestCosolventLiquidPanics(t *testing.T) {
	t.Parallel()
	cases := map[string]func(){
		"ethanol":         func() { physics.CosolventDensity(physics.Ethanol, 0.1, 300) },
		"frozen":          func() { physics.CosolventViscosity(physics.Glycerol, 0.2, physics.Kelvin(-10)) },
		"too hot":         func() { physics.CosolventDensity(physics.EthyleneGlycol, 0.2, 380) },
		"mass fraction":   func() { physics.CosolventViscosity(physics.PropyleneGlycol, 0.7, 300) },
		"NaN":             func() { physics.CosolventDensity(physics.Glycerol, math.NaN(), 300) },
		"no co-solvent":   func() { physics.CosolventViscosity(0, 0, 300) },
		"NaN temperature": func() { physics.CosolventViscosity(physics.Glycerol, 0.1, math.NaN()) },
	}
	for name, f := range cases {
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
