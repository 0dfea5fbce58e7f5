package physics

import (
	"math"
	"testing"
)

func TestGaussHermiteNodes(t *testing.T) {
	t.Parallel()
	// M. Abramowitz & I. A. Stegun, Handbook of Mathematical Functions
	// (1964), table 25.10, n = 5: nodes 0, 0.958572464614, 2.020182870456;
	// weights 0.945308720483, 0.393619323152, 0.019953242059.
	want := []struct{ x, w float64 }{{-2.020182870456, 0.019953242059}, {-0.958572464614, 0.393619323152},
		{0, 0.945308720483}, {0.958572464614, 0.393619323152}, {2.020182870456, 0.019953242059}}
	for i, w := range want {
		if math.Abs(gaussHermite5.x[i]-w.x) > 1e-11 || math.Abs(gaussHermite5.w[i]-w.w) > 1e-11 {
			t.Errorf("node %d: (%.12f, %.12f), want (%.12f, %.12f)", i, gaussHermite5.x[i], gaussHermite5.w[i], w.x, w.w)
		}
	}
}

func TestGaussLegendreNodes(t *testing.T) {
	t.Parallel()
	// M. Abramowitz & I. A. Stegun, Handbook of Mathematical Functions
	// (1964), table 25.4, n = 4: nodes +-0.339981043584856,
	// +-0.861136311594053; weights 0.652145154862546, 0.347854845137454
	// [pub].
	want := []struct{ x, w float64 }{{-0.861136311594053, 0.347854845137454}, {-0.339981043584856, 0.652145154862546},
		{0.339981043584856, 0.652145154862546}, {0.861136311594053, 0.347854845137454}}
	for _, w := range want {
		found := false
		for i, x := range gaussLegendre4.x { // gonum does not promise an order
			found = found || (math.Abs(x-w.x) < 1e-14 && math.Abs(gaussLegendre4.w[i]-w.w) < 1e-14)
		}
		if !found {
			t.Errorf("no node (%.15f, %.15f) in %v, %v", w.x, w.w, gaussLegendre4.x, gaussLegendre4.w)
		}
	}
}
