package physics

import (
	"math"
	"testing"
)

// vdwOf is the van der Waals part of Pair.Parts: spheres of radius a at
// surface separation h with Hamaker constant A, Gregory-retarded or not.
func vdwOf(a, h, hamaker float64, retarded bool) float64 {
	vdw, _, _ := Pair{Radius: a, Hamaker: hamaker, EpsR: 78.4, TempK: 298.15, Retarded: retarded}.Parts(h)
	return vdw
}

func TestVdWHamaker(t *testing.T) {
	t.Parallel()
	const a, hamaker = 100e-9, 1e-20
	kT := Boltzmann * 298.15
	// [calc] testdata/reference/interaction.py, Hamaker 1937 exact formula;
	// testdata/reference/REFERENCES.md lists -18.53, -8.68, -2.96, -1.20 kT, which agree.
	tests := []struct {
		h, wantKT, tol float64
	}{
		{1e-9, -18.526562, 1e-6},
		{2e-9, -8.680242, 1e-6},
		{5e-9, -2.963652, 1e-6},
		{10e-9, -1.196874, 1e-6},
		{100e-9, -0.013942, 1e-4},
	}
	for _, tt := range tests {
		if got := vdwOf(a, tt.h, hamaker, false) / kT; interactionRelErr(got, tt.wantKT) > tt.tol {
			t.Errorf("h = %g: got %.6f kT, want %.6f kT", tt.h, got, tt.wantKT)
		}
	}
	// Limits of the same formula (Hamaker 1937): -A a/(12 h) at h << a and
	// the London far field -(16/9) A a^6/(h+2a)^6 at h >> a, where the
	// closed form loses all precision and the series takes over.
	if got, want := vdwOf(a, 1e-12, hamaker, false), -hamaker*a/(12*1e-12); interactionRelErr(got, want) > 1e-3 {
		t.Errorf("near field: got %g, want %g", got, want)
	}
	for _, h := range []float64{10e-6, 1e-3} {
		want := -16.0 / 9 * hamaker * math.Pow(a/(h+2*a), 6)
		if got := vdwOf(a, h, hamaker, false); interactionRelErr(got, want) > 1e-3 {
			t.Errorf("far field h = %g: got %g, want %g", h, got, want)
		}
	}
	// [calc] interaction.py prints -3.834938e-12 kT for the London form at 10 um.
	if got := vdwOf(a, 10e-6, hamaker, false) / kT; interactionRelErr(got, -3.834938e-12) > 2e-3 {
		t.Errorf("far field in kT: got %g", got)
	}
	// The series and the closed form meet at y = 0.1 (h = 4.3246 a) without a step.
	hSwitch := 2 * a * (1/math.Sqrt(0.1) - 1)
	below, above := vdwOf(a, hSwitch*(1-1e-9), hamaker, false), vdwOf(a, hSwitch*(1+1e-9), hamaker, false)
	if interactionRelErr(below, above) > 1e-7 {
		t.Errorf("step at the series switch: %g vs %g", below, above)
	}
	// Contact and sign conventions.
	if got := vdwOf(a, 0, hamaker, false); !math.IsInf(got, -1) {
		t.Errorf("contact: got %g, want -Inf", got)
	}
	if got := vdwOf(a, 0, -hamaker, false); !math.IsInf(got, 1) {
		t.Errorf("contact with A < 0: got %g, want +Inf", got)
	}
	if got := vdwOf(a, 0, 0, false); got != 0 {
		t.Errorf("contact with A = 0: got %g, want 0", got)
	}
}

func TestVdWRetardedGregory(t *testing.T) {
	t.Parallel()
	const a, hamaker = 100e-9, 1e-20
	kT := Boltzmann * 298.15
	// [calc] testdata/reference/interaction.py, Gregory 1981 with b = 5.32 and
	// lambda = 100 nm; testdata/reference/REFERENCES.md lists -17.03, -2.37, -0.885 kT.
	tests := []struct {
		h, wantKT, tol float64
	}{
		{1e-9, -17.028811, 1e-6},
		{2e-9, -7.600152, 1e-6},
		{5e-9, -2.368603, 1e-6},
		{10e-9, -0.885301, 1e-5},
		{100e-9, -0.016935, 1e-4},
	}
	for _, tt := range tests {
		if got := vdwOf(a, tt.h, hamaker, true) / kT; interactionRelErr(got, tt.wantKT) > tt.tol {
			t.Errorf("h = %g: got %.6f kT, want %.6f kT", tt.h, got, tt.wantKT)
		}
	}
	// Retardation only weakens the attraction, and vanishes as h -> 0.
	for _, h := range []float64{0.5e-9, 3e-9, 30e-9} {
		if r, u := vdwOf(a, h, hamaker, true), -hamaker*a/(12*h); !(r > u && r < 0) {
			t.Errorf("h = %g: retarded %g not between the unretarded %g and 0", h, r, u)
		}
	}
	if got, want := vdwOf(a, 1e-13, hamaker, true), -hamaker*a/(12*1e-13); interactionRelErr(got, want) > 1e-3 {
		t.Errorf("h -> 0: got %g, want %g", got, want)
	}
	// Far out the series branch: 1 - ln(1+x)/x -> x/2, so V -> -A a lambda/(24 b h^2).
	h := 1e-2
	if got, want := vdwOf(a, h, hamaker, true), -hamaker*a*gregoryLambda/(24*gregoryB*h*h); interactionRelErr(got, want) > 1e-4 {
		t.Errorf("far field: got %g, want %g", got, want)
	}
	if got := vdwOf(a, 0, hamaker, true); !math.IsInf(got, -1) {
		t.Errorf("contact: got %g, want -Inf", got)
	}
}
