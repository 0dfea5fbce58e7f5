package physics

import (
	"math"
	"testing"
)

func TestHamakerTaborWinterton(t *testing.T) {
	t.Parallel()
	const tempK = 298.15
	// Water eps 80, n 1.333; polystyrene 2.55, 1.557; n-hexadecane 2.05, 1.434
	// (Israelachvili 3rd ed. Table 13.2 [memory]).
	tests := []struct {
		name      string
		got, want float64
		tol       float64
	}{
		// [calc] testdata/reference/interaction.py, eq. 13.16 with nu_e 3.0e15 Hz.
		{"water in vacuum", HamakerTaborWinterton(80, 1.333, 1, 1, tempK), 3.731181e-20, 1e-6},
		{"PS across water (n 1.59)", HamakerTaborWinterton(2.55, 1.59, 80, 1.333, tempK), 1.936820e-20, 1e-6},
		{"hexadecane across water", HamakerTaborWinterton(2.05, 1.434, 80, 1.333, tempK), 5.529148e-21, 1e-6},
		// [pub] Walstra, Physical Chemistry of Foods (2003), Table 12.2:
		// water in vacuum 37e-21 J, n-hexadecane across water 5.4e-21 J.
		{"water in vacuum, Walstra", HamakerTaborWinterton(80, 1.333, 1, 1, tempK), 37e-21, 0.03},
		{"hexadecane across water, Walstra", HamakerTaborWinterton(2.05, 1.434, 80, 1.333, tempK), 5.4e-21, 0.05},
		// [pub] Walstra Table 12.2, polystyrene across water 9e-21 J: the simple
		// estimate runs high for it (1.55e-20 with n = 1.557); methods differ
		// by up to several-fold (testdata/reference/REFERENCES.md), so a factor of two.
		{"PS across water, Walstra", HamakerTaborWinterton(2.55, 1.557, 80, 1.333, tempK), 9e-21, 1.0},
	}
	for _, tt := range tests {
		if e := interactionRelErr(tt.got, tt.want); e > tt.tol {
			t.Errorf("%s: got %.6g J, want %.6g J (rel err %.3g > %.3g)", tt.name, tt.got, tt.want, e, tt.tol)
		}
	}
	// Identical media do not interact; eq. 13.16 is the symmetric case of 13.15.
	if got := HamakerTaborWinterton(80, 1.333, 80, 1.333, tempK); got != 0 {
		t.Errorf("water across water: got %g, want 0", got)
	}
}

func TestHamakerAsymmetric(t *testing.T) {
	t.Parallel()
	const tempK = 298.15
	// [calc] testdata/reference/interaction.py, Israelachvili eq. 13.15:
	// polystyrene / water / hexadecane.
	if got := hamakerAsymmetricTaborWinterton(2.55, 1.59, 2.05, 1.434, 80, 1.333, tempK); interactionRelErr(got, 9.506733e-21) > 1e-6 {
		t.Errorf("A132 PS/water/hexadecane = %g, want 9.506733e-21", got)
	}
	// Medium 3 between 1 and 2 in both permittivity and index gives
	// repulsion (Israelachvili ch. 13): silica-like (3.8, 1.45) and air (1, 1)
	// across a hydrocarbon (2.0, 1.40).
	if got := hamakerAsymmetricTaborWinterton(3.8, 1.45, 1, 1, 2.0, 1.40, tempK); !(got < 0) {
		t.Errorf("A132 with the medium in between = %g, want < 0", got)
	}
}

func TestHamakerPanics(t *testing.T) {
	t.Parallel()
	for name, f := range map[string]func(){
		"zero permittivity": func() { HamakerTaborWinterton(0, 1.5, 80, 1.33, 298) },
		"zero temperature":  func() { HamakerTaborWinterton(2, 1.5, 80, 1.33, 0) },
		"NaN index":         func() { hamakerAsymmetricTaborWinterton(2, math.NaN(), 2, 1.4, 80, 1.33, 298) },
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
