package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestStokesEinsteinDiffusion(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name                     string
		radius, eta, tempK, want float64
		tol                      float64
	}{
		// testdata/reference/basics.py: a = 100 nm, water at 25 °C with the
		// IAPWS viscosity 0.89002 mPa s -> 2.453667e-12 m^2/s [calc].
		{"100 nm in water 25 °C", 100e-9, physics.WaterViscosity(298.15), 298.15, 2.453667e-12, 1e-6},
		// Same with eta = 0.8900 mPa s -> 2.453731e-12 m^2/s [calc] (the
		// round figure usually quoted is "about 2.45e-12" [practice]).
		{"100 nm, eta 0.8900 mPa s", 100e-9, 0.89e-3, 298.15, 2.453731e-12, 1e-6},
	}
	for _, c := range cases {
		got := physics.StokesEinsteinDiffusion(c.radius, c.eta, c.tempK)
		if e := basicsRelErr(got, c.want); e > c.tol {
			t.Errorf("%s: D = %.6e m^2/s, want %.6e (rel err %.1e)", c.name, got, c.want, e)
		}
	}
}

func TestStokesEinsteinEinstein1905Example(t *testing.T) {
	t.Parallel()
	// Einstein 1905 (Ann. Phys. 17, 549), closing example [pub, recalled from
	// memory]: water at 17 °C with eta = 1.35e-2 poise, particle diameter
	// 0.001 mm, N = 6e23: root-mean-square displacement along x in 1 s,
	// sqrt(2 D t), about 0.8 µm. His N and rounding allow a few per cent.
	d := physics.StokesEinsteinDiffusion(0.5e-6, 1.35e-3, physics.Kelvin(17))
	lambda := math.Sqrt(2 * d * 1)
	if e := basicsRelErr(lambda, 0.8e-6); e > 0.05 {
		t.Errorf("displacement in 1 s = %.3e m, want about 0.8e-6 (rel err %.2f)", lambda, e)
	}
}

func TestStokesEinsteinDiffusionPanics(t *testing.T) {
	t.Parallel()
	for _, args := range [][3]float64{{0, 1e-3, 298}, {1e-7, 0, 298}, {1e-7, 1e-3, 0}, {math.NaN(), 1e-3, 298}} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("StokesEinsteinDiffusion%v: no panic", args)
				}
			}()
			physics.StokesEinsteinDiffusion(args[0], args[1], args[2])
		}()
	}
}
