package rule

import (
	"math"
	"testing"
)

func TestCombineCertainty(t *testing.T) {
	t.Parallel()
	// Worked values of the MYCIN combination function (Shortliffe & Buchanan
	// 1975, Math. Biosci. 23:351), computed by hand from its three cases.
	cases := []struct{ a, b, want float64 }{
		{0.6, 0.4, 0.76},
		{0.8, 0.8, 0.96},
		{-0.6, -0.4, -0.76},
		{0.6, -0.4, 0.2 / 0.6},
		{0.9, -0.9, 0},
		{1, -1, 0},
		{0, 0.5, 0.5},
	}
	for _, c := range cases {
		got := combine(c.a, c.b)
		if math.Abs(got-c.want) > 1e-12 {
			t.Errorf("combine(%v, %v) = %v, want %v", c.a, c.b, got, c.want)
		}
		if back := combine(c.b, c.a); math.Abs(back-got) > 1e-12 {
			t.Errorf("combine not commutative for %v, %v", c.a, c.b)
		}
	}
	// Associativity for same-sign evidence.
	x := combine(combine(0.3, 0.5), 0.7)
	y := combine(0.3, combine(0.5, 0.7))
	if math.Abs(x-y) > 1e-12 {
		t.Errorf("not associative: %v vs %v", x, y)
	}
}
