package physics

import (
	"math"
	"testing"
)

func TestAsakuraOosawa(t *testing.T) {
	t.Parallel()
	const a, delta, tempK = 100e-9, 10e-9, 298.15
	kT := Boltzmann * tempK
	n := 0.1 / (4.0 / 3 * math.Pi * delta * delta * delta) // phi_p = 0.1
	// [calc] testdata/reference/interaction.py: exact lens volume; at
	// contact testdata/reference/REFERENCES.md gives -1.60 kT, i.e. -n kT 2 pi delta^2 (a + 2 delta/3).
	tests := []struct {
		h, wantKT, tol float64
	}{
		{0, -1.600000, 1e-9},
		{5e-9, -0.9070312, 1e-6},
		{10e-9, -0.40625, 1e-9},
		{19.9e-9, -4.124375e-05, 1e-5},
		{20e-9, 0, 0},
		{50e-9, 0, 0},
	}
	for _, tt := range tests {
		if got := AsakuraOosawa(a, tt.h, delta, n, tempK) / kT; math.Abs(got-tt.wantKT) > tt.tol*math.Max(1, math.Abs(tt.wantKT)) {
			t.Errorf("h = %g: got %.7g kT, want %.7g kT", tt.h, got, tt.wantKT)
		}
	}
	contact := -n * kT * 2 * math.Pi * delta * delta * (a + 2*delta/3)
	if got := AsakuraOosawa(a, 0, delta, n, tempK); interactionRelErr(got, contact) > 1e-12 {
		t.Errorf("contact formula: got %g, want %g", got, contact)
	}
	if got := AsakuraOosawa(a, 0, 0, n, tempK); got != 0 {
		t.Errorf("delta = 0: got %g, want 0", got)
	}
}

func TestAsakuraOosawaPanics(t *testing.T) {
	t.Parallel()
	defer func() {
		if recover() == nil {
			t.Error("negative number density: no panic")
		}
	}()
	AsakuraOosawa(1e-7, 0, 1e-8, -1, 298)
}
