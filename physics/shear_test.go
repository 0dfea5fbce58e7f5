package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestHydrodynamicShearForceEnergy(t *testing.T) {
	t.Parallel()
	// Hand calculation of 6 pi eta a^2 G w (van de Ven & Mason 1977 order
	// of magnitude) [calc]: eta 1 mPa s, G 1000 1/s, a 1 um, w 5 nm ->
	// 6 pi 1e-3 1e-12 1e3 5e-9 = 9.424778e-20 J; and the identity
	// F w/kT = Pe w/a.
	cases := []struct {
		eta, rate, radius, width, want, tol float64
	}{
		{1e-3, 1000, 1e-6, 5e-9, 9.424778e-20, 1e-6},
		{1e-3, 0, 1e-6, 5e-9, 0, 0},
		{0.89e-3, 100, 0.5e-6, 2e-9, 50.942828 * 2e-9 / 0.5e-6 * beyondKT, 1e-6},
	}
	for _, c := range cases {
		got := physics.HydrodynamicShearForceEnergy(c.eta, c.rate, c.radius, c.width)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("HydrodynamicShearForceEnergy(%v, %v, %v, %v) = %.6e J, want %.6e",
				c.eta, c.rate, c.radius, c.width, got, c.want)
		}
	}
}

func TestHydrodynamicShearRate(t *testing.T) {
	t.Parallel()
	// 6 pi eta a^2 G w = E solved for G: 10 kT at 25 °C over w = 10 nm at
	// a = 100 nm in 1 mPa s, testdata/reference/inverses.py [calc]; and back
	// to the hand value of TestHydrodynamicShearForceEnergy [calc].
	kT := physics.Boltzmann * 298.15
	cases := []struct {
		energy, eta, radius, width, want, tol float64
	}{
		{10 * kT, 1e-3, 100e-9, 10e-9, 2.183821e4, 1e-6},
		{9.424778e-20, 1e-3, 1e-6, 5e-9, 1000, 1e-6},
		{0, 1e-3, 1e-6, 5e-9, 0, 0},
	}
	for _, c := range cases {
		got := physics.HydrodynamicShearRate(c.energy, c.eta, c.radius, c.width)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("HydrodynamicShearRate(%v, %v, %v, %v) = %.6e 1/s, want %.6e", c.energy, c.eta, c.radius, c.width, got, c.want)
		}
	}
	g := physics.HydrodynamicShearRate(3e-19, 2e-3, 0.4e-6, 7e-9)
	if got := physics.HydrodynamicShearForceEnergy(2e-3, g, 0.4e-6, 7e-9); beyondRelErr(got, 3e-19) > 1e-14 {
		t.Errorf("round trip: %.17g J, want 3e-19", got)
	}
	if got := physics.HydrodynamicShearRate(kT, 1e-3, 1e-6, 0); !math.IsInf(got, 1) {
		t.Errorf("zero width: %v, want +Inf", got)
	}
	defer func() {
		if recover() == nil {
			t.Error("negative energy: no panic")
		}
	}()
	physics.HydrodynamicShearRate(-kT, 1e-3, 1e-6, 5e-9)
}
