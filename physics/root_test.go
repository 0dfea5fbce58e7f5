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
	}
	if _, ok := FindRoot(func(x float64) float64 { return x*x + 1 }, -1, 1, 1e-9); ok {
		t.Error("no bracket must report ok = false")
	}
	if _, ok := FindRoot(func(x float64) float64 { return math.NaN() }, -1, 1, 1e-9); ok {
		t.Error("NaN ends must report ok = false")
	}
}
