package physics

import (
	"math"
	"testing"
)

func TestIAPWSViscosityVerificationTable(t *testing.T) {
	t.Parallel()
	// IAPWS R12-08, verification table for mu0 mu1 (mu2 = 1), in µPa s [pub].
	cases := []struct {
		tempK, density, wantMicroPaS, tol float64
	}{
		{298.15, 998, 889.735100, 1e-6},
		{298.15, 1200, 1437.649467, 1e-6},
		{373.15, 1000, 307.883622, 1e-6},
		{433.15, 1000, 217.685358, 1e-6},
	}
	for _, c := range cases {
		got := iapwsViscosity(c.tempK, c.density) * 1e6
		if e := interactionRelErr(got, c.wantMicroPaS); e > c.tol {
			t.Errorf("iapwsViscosity(%v, %v) = %.6f µPa s, want %.6f (rel err %.1e > %.0e)",
				c.tempK, c.density, got, c.wantMicroPaS, e, c.tol)
		}
	}
}

func TestIAPWSViscosityPanics(t *testing.T) {
	t.Parallel()
	for name, f := range map[string]func(){
		"zero density":         func() { iapwsViscosity(300, 0) },
		"infinite temperature": func() { iapwsViscosity(math.Inf(1), 1000) },
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
