package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestPKwBanduraLvov(t *testing.T) {
	t.Parallel()
	// IAPWS R11-07(2019), "Revised Release on the Ionization Constant of
	// H2O", Table 3, values for verifying computer programs [pub].
	cases := []struct{ tempK, density, want float64 }{
		{300, 1000, 13.906565},
		{600, 70, 21.048874},
		{600, 700, 11.203153},
		{800, 200, 15.089765},
		{800, 1200, 6.438330},
	}
	for _, c := range cases {
		if got := physics.PKwBanduraLvov(c.tempK, c.density); math.Abs(got-c.want) > 1e-6 {
			t.Errorf("pKw(%g K, %g kg/m^3) = %.6f, want %.6f", c.tempK, c.density, got, c.want)
		}
	}
}

func TestWaterPKw(t *testing.T) {
	t.Parallel()
	cases := []struct {
		celsius, want, tol float64
	}{
		// Bandura & Lvov, J. Phys. Chem. Ref. Data 35 (2006) 15, table of
		// pKw at 0.1 MPa [memory].
		{0, 14.946, 0.002},
		{25, 13.995, 0.002},
		{50, 13.264, 0.002},
		// H. S. Harned & R. A. Robinson, "A note on the temperature
		// variation of the ionisation constants of weak electrolytes",
		// Trans. Faraday Soc. 36 (1940) 973, from emf measurements [memory].
		{0, 14.943, 0.005},
		{25, 13.996, 0.005},
		{50, 13.262, 0.005},
	}
	for _, c := range cases {
		if got := physics.WaterPKw(physics.Kelvin(c.celsius)); math.Abs(got-c.want) > c.tol {
			t.Errorf("pKw(%g °C) = %.4f, want %.3f ± %g", c.celsius, got, c.want, c.tol)
		}
	}
	// Monotone: water ionises more as it warms [pub] (Bandura & Lvov 2006).
	prev := math.Inf(1)
	for tk := physics.WaterMinTempK; tk <= physics.WaterMaxTempK; tk += 0.5 {
		got := physics.WaterPKw(tk)
		if !(got < prev) {
			t.Fatalf("pKw(%g K) = %g, not below %g", tk, got, prev)
		}
		prev = got
	}
}

func TestWaterIons(t *testing.T) {
	t.Parallel()
	tk := physics.Kelvin(25)
	rho := physics.WaterDensity(tk)
	// [calc] by hand: pH 3 at 25 °C, [H+] = 1e-3 mol/kg x 997.05 kg/m^3.
	if got := physics.WaterIons(3, tk)[0]; surfaceRelErr(got.Concentration, 0.99705) > 1e-4 || got.Valence != 1 {
		t.Errorf("H+ at pH 3 = %+v, want 0.99705 mol/m^3, valence +1", got)
	}
	// Neutral water at pH = pKw/2: [H+] = [OH-] [pub] (definition of Kw).
	for _, celsius := range []float64{0, 25, 50, 90} {
		tk := physics.Kelvin(celsius)
		ions := physics.WaterIons(physics.WaterPKw(tk)/2, tk)
		if surfaceRelErr(ions[1].Concentration, ions[0].Concentration) > 1e-12 || ions[1].Valence != -1 {
			t.Errorf("%g °C, neutral pH: H+ %g, OH- %+v", celsius, ions[0].Concentration, ions[1])
		}
	}
	// Every pH, no window: the ion product stays Kw rho^2 and the ionic
	// strength moves smoothly through pH 4 and 10.
	kw := math.Pow(10, -physics.WaterPKw(tk)) * rho * rho
	first := physics.WaterIons(0, tk)
	prev := physics.IonicStrength(first[:])
	for pH := 0.01; pH <= 14; pH += 0.01 {
		ions := physics.WaterIons(pH, tk)
		if surfaceRelErr(ions[0].Concentration*ions[1].Concentration, kw) > 1e-12 {
			t.Fatalf("pH %.2f: ion product %g, want %g", pH, ions[0].Concentration*ions[1].Concentration, kw)
		}
		is := physics.IonicStrength(ions[:])
		if r := is / prev; r > 1.03 || r < 1/1.03 {
			t.Fatalf("pH %.2f: ionic strength jumps from %g to %g mol/m^3", pH, prev, is)
		}
		prev = is
	}
}

func TestWaterIonsPanics(t *testing.T) {
	t.Parallel()
	for name, call := range map[string]func(){
		"NaN pH":       func() { physics.WaterIons(math.NaN(), 298) },
		"cold":         func() { physics.WaterIons(7, 200) },
		"pKw hot":      func() { physics.PKwBanduraLvov(1100, 500) },
		"pKw negative": func() { physics.PKwBanduraLvov(300, -1) },
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
