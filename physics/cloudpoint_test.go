package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestFloryChi(t *testing.T) {
	t.Parallel()
	// chi = 1/2 at the theta temperature whatever psi (Flory 1953, ch. XII)
	// [pub]; 0.5 + 0.3 (1 - 333.15/323.15) = 0.490716 for psi = -0.3 [calc
	// by hand].
	for _, psi := range []float64{-1, -0.3, 0.2} {
		if got := physics.FloryChi(333.15, 333.15, psi); got != 0.5 {
			t.Errorf("chi at theta, psi %g: %g, want 0.5", psi, got)
		}
	}
	if got := physics.FloryChi(323.15, 333.15, -0.3); math.Abs(got-0.4907164) > 1e-6 {
		t.Errorf("chi = %g, want 0.4907164", got)
	}
	// A lower-critical (psi < 0) system is a good solvent below theta and
	// a poor one above (Napper 1983, ch. 5) [pub].
	if physics.SolventQualityFromChi(physics.FloryChi(300, 333.15, -0.5)) != physics.GoodSolvent ||
		physics.SolventQualityFromChi(physics.FloryChi(340, 333.15, -0.5)) != physics.PoorSolvent {
		t.Error("PEO-like chains: good below theta, poor above")
	}
}

func TestCloudPointLayerFactor(t *testing.T) {
	t.Parallel()
	const cloud, ref = 333.15, 298.15 // 60 °C cloud point, 25 °C reference
	// [calc by hand]: ((10/323.15)/(35/298.15))^(1/3) = 0.641191.
	if got := physics.CloudPointLayerFactor(323.15, cloud, ref); math.Abs(got-0.641191) > 1e-6 {
		t.Errorf("factor at 50 °C = %g, want 0.641191", got)
	}
	if got := physics.CloudPointLayerFactor(ref, cloud, ref); math.Abs(got-1) > 1e-15 {
		t.Errorf("factor at the reference = %g, want 1", got)
	}
	for _, tempK := range []float64{cloud, cloud + 5} {
		if got := physics.CloudPointLayerFactor(tempK, cloud, ref); got != 0 {
			t.Errorf("factor at %g K = %g, want 0 at and above the cloud point", tempK, got)
		}
	}
	// The factor cubed is (1 - 2 chi(T)) / (1 - 2 chi(Tref)) for any psi
	// (Flory's chi with theta at the cloud point) [calc].
	for _, psi := range []float64{-0.2, -1} {
		tempK := 318.15
		want := (1 - 2*physics.FloryChi(tempK, cloud, psi)) / (1 - 2*physics.FloryChi(ref, cloud, psi))
		if got := math.Pow(physics.CloudPointLayerFactor(tempK, cloud, ref), 3); math.Abs(got-want) > 1e-12 {
			t.Errorf("psi %g: factor^3 = %g, want %g", psi, got, want)
		}
	}
	prev := math.Inf(1)
	for tempK := 273.15; tempK < cloud; tempK += 0.5 {
		f := physics.CloudPointLayerFactor(tempK, cloud, ref)
		if !(f < prev) {
			t.Errorf("factor %g at %g K did not fall", f, tempK)
		}
		prev = f
	}
}

func TestCloudPointMaxTemp(t *testing.T) {
	t.Parallel()
	const cloud, ref = 333.15, 298.15
	// [calc by hand]: 333.15 / (1 + 0.125 x 35/298.15) = 328.3321 K.
	if got := physics.CloudPointMaxTemp(cloud, ref, 0.5); math.Abs(got-328.3321) > 1e-4 {
		t.Errorf("CloudPointMaxTemp = %g, want 328.3321", got)
	}
	for _, f := range []float64{0.05, 0.3, 0.641191, 0.9, 1} {
		tempK := physics.CloudPointMaxTemp(cloud, ref, f)
		if back := physics.CloudPointLayerFactor(tempK, cloud, ref); math.Abs(back-f) > 1e-12 {
			t.Errorf("factor %g: T = %g K gives back %g", f, tempK, back)
		}
	}
	if got := physics.CloudPointMaxTemp(cloud, ref, 1); math.Abs(got-ref) > 1e-9 {
		t.Errorf("full thickness: %g K, want the reference %g", got, ref)
	}
}

func TestCloudPointPanics(t *testing.T) {
	t.Parallel()
	cases := map[string]func(){
		"reference above cloud": func() { physics.CloudPointLayerFactor(300, 300, 310) },
		"NaN temperature":       func() { physics.CloudPointLayerFactor(math.NaN(), 330, 300) },
		"zero factor":           func() { physics.CloudPointMaxTemp(330, 300, 0) },
		"factor above 1":        func() { physics.CloudPointMaxTemp(330, 300, 1.1) },
		"NaN psi":               func() { physics.FloryChi(300, 300, math.NaN()) },
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
