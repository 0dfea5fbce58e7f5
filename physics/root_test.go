package physics

import (
	"math"
	"testing"
)

func TestFindRoot(t *testing.T) {
	t.Parallel()
	// Closed-form roots: sqrt(2) of x^2-2 (Pythagoras), the Dottie number of
	// cos x = x (0.7390851332151607, OEIS A003957), ln 10 of exp(x)-10.
	cases := []struct {
		name   string
		f      func(float64) float64
		lo, hi float64
		want   float64
	}{
		{"sqrt2", func(x float64) float64 { return x*x - 2 }, 0, 2, math.Sqrt2},
		{"dottie", func(x float64) float64 { return math.Cos(x) - x }, 0, 1, 0.7390851332151607},
		{"ln10", func(x float64) float64 { return math.Exp(x) - 10 }, 0, 5, math.Ln10},
		{"reversed", func(x float64) float64 { return 2 - x*x }, 2, 0, math.Sqrt2},
	}
	for _, c := range cases {
		got, ok := FindRoot(c.f, c.lo, c.hi, 1e-12)
		if !ok || math.Abs(got-c.want) > 1e-10 {
			t.Errorf("%s: got %v (ok %v), want %v", c.name, got, ok, c.want)
		}
		// FindRootFrom, given the ends' values, finds the same root
		// without evaluating f at either end again.
		atEnd := false
		f := func(x float64) float64 { atEnd = atEnd || x == c.lo || x == c.hi; return c.f(x) }
		if from, _ := FindRootFrom(f, c.lo, c.hi, c.f(c.lo), c.f(c.hi), 1e-12); from != got || atEnd {
			t.Errorf("%s: FindRootFrom %v (evaluated at an end: %v), want %v", c.name, from, atEnd, got)
		}
	}
	if _, ok := FindRoot(func(x float64) float64 { return x*x + 1 }, -1, 1, 1e-9); ok {
		t.Error("no bracket must report ok = false")
	}
	if _, ok := FindRoot(func(x float64) float64 { return math.NaN() }, -1, 1, 1e-9); ok {
		t.Error("NaN ends must report ok = false")
	}
}

func TestFindRootNewton(t *testing.T) {
	t.Parallel()
	// Roots as TestFindRoot: the Dottie number (OEIS A003957) of cos x = x,
	// ln 10 of 10 - exp(x) from far away (the step cap matters), and
	// Wallis's cubic x^3 - 2x - 5 = 0, root 2.0945514815423265 (the
	// equation Newton's method was first shown on).
	calls := 0
	cases := []struct {
		name                  string
		f                     func(float64) (float64, float64)
		x0, lo, hi, slopeSign float64
		want                  float64
	}{
		{"dottie", func(x float64) (float64, float64) { return math.Cos(x) - x, -math.Sin(x) - 1 }, 0, -1, 2, -1, 0.7390851332151607},
		{"ln10 from -20", func(x float64) (float64, float64) { return 10 - math.Exp(x), -math.Exp(x) }, -20, -30, 30, -1, math.Ln10},
		{"wallis", func(x float64) (float64, float64) { return x*x*x - 2*x - 5, 3*x*x - 2 }, 3, 1.5, 5, 1, 2.0945514815423265},
		// Newton's iterates on a convex function approach the root from one
		// side only, yet the bracket closes.
		{"one-sided", func(x float64) (float64, float64) { return math.Exp(-x) - 0.5, -math.Exp(-x) }, 0, -5, 5, -1, math.Ln2},
		// A poor derivative estimate (half the true one) still converges.
		{"rough slope", func(x float64) (float64, float64) { calls++; return 2 - x*x, -x }, 0.5, 0, 10, -1, math.Sqrt2},
	}
	for _, tc := range cases {
		const tol = 1e-9
		hold, fail, ok := FindRootNewton(tc.f, tc.x0, tc.lo, tc.hi, tc.slopeSign, 1, tol)
		if !ok || !(math.Abs(hold-fail) < tol) || math.Abs(hold-tc.want) > tol || math.Abs(fail-tc.want) > tol {
			t.Errorf("%s: hold %v fail %v ok %v, want %v", tc.name, hold, fail, ok, tc.want)
		}
		if fh, _ := tc.f(hold); fh < 0 {
			t.Errorf("%s: f(hold) = %g < 0", tc.name, fh)
		}
		if ff, _ := tc.f(fail); ff >= 0 {
			t.Errorf("%s: f(fail) = %g >= 0", tc.name, ff)
		}
	}
	if calls > 60 {
		t.Errorf("rough slope took %d evaluations", calls)
	}
	// No root on the interval: the end reached holds or fails throughout.
	positive := func(x float64) (float64, float64) { return 1 + x*x, 2 * x }
	if hold, fail, ok := FindRootNewton(positive, 1, -3, 3, 1, 1, 1e-6); ok || !math.IsNaN(fail) || hold != -3 {
		t.Errorf("no root: hold %v fail %v ok %v, want -3 NaN false", hold, fail, ok)
	}
}
