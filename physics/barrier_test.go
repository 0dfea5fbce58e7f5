package physics

import (
	"math"
	"testing"
)

// TestBarrierNearAgreesWithBarrier: the warm-started search finds the same
// maximum as the full scan, from hints near and far (the testdata/reference/REFERENCES.md pair,
// a = 100 nm, A = 1e-20 J, -25 mV, at several 1:1 ionic strengths).
func TestBarrierNearAgreesWithBarrier(t *testing.T) {
	t.Parallel()
	base := Pair{Radius: 100e-9, Hamaker: 1e-20, Potential: -0.025, EpsR: 78.4, TempK: 298.15, Valence: 1}
	for _, I := range []float64{0.3, 1, 3, 10, 20} {
		p := base.WithIonicStrength(I)
		want := p.Barrier()
		for _, hint := range []float64{0, 0.5e-9, want.Separation, 3e-9, 20e-9} {
			got := p.BarrierNear(hint)
			if got.Found != want.Found || math.Abs(got.Energy-want.Energy) > 1e-9*math.Abs(want.Energy) {
				t.Errorf("I = %v, hint %v: %+v, want %+v", I, hint, got, want)
			}
		}
	}
}
