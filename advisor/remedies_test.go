package advisor

import (
	"testing"
)

func TestRoundTowardAcceptable(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		v    float64
		op   string
		want float64
	}{
		{6.0378, "<=", 6.03}, {6.0378, ">=", 6.04}, {0.45, "<=", 0.45}, {0.45, ">=", 0.45},
		{14.9526, ">=", 15}, {1234.5, "<=", 1230}, {-2.345, ">=", -2.34}, {0, "<=", 0},
	} {
		if got := roundTowardAcceptable(c.v, c.op); got != c.want {
			t.Errorf("roundTowardAcceptable(%g, %q) = %g, want %g", c.v, c.op, got, c.want)
		}
	}
}

func TestWithTarget(t *testing.T) {
	t.Parallel()
	if got := withTarget("Raise it: {target}.", "x >= 1"); got != "Raise it: x >= 1." {
		t.Errorf("withTarget = %q", got)
	}
}
