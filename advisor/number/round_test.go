package number

import (
	"math"
	"math/rand/v2"
	"testing"
)

// TestDecimalCeil checks decimalCeil against its definition, the smallest
// d with 10^d >= a, at powers of ten and their neighbours, the ends of the
// float64 range, and against ceil(log10 a) on random values away from
// powers of ten.
func TestDecimalCeil(t *testing.T) {
	for _, c := range []struct {
		a    float64
		want int
	}{
		{1, 0}, {9.99, 1}, {10, 1}, {math.Nextafter(10, 11), 2}, {0.1, -1}, {0.0999, -1},
		{0.101, 0}, {1e-300, -300}, {5e-324, -323}, {1.7e308, 309}, {123456, 6}, {1e22, 22}, {1e23, 23},
	} {
		if got := decimalCeil(c.a); got != c.want {
			t.Errorf("decimalCeil(%g) = %d, want %d", c.a, got, c.want)
		}
	}
	r := rand.New(rand.NewPCG(1, 2))
	for range 100000 {
		a := math.Pow(10, r.Float64()*600-300)
		if l := math.Log10(a); math.Abs(l-math.Round(l)) < 1e-9 {
			continue
		}
		if got, want := decimalCeil(a), int(math.Ceil(math.Log10(a))); got != want {
			t.Fatalf("decimalCeil(%g) = %d, ceil(log10) = %d", a, got, want)
		}
	}
}

// Decimals rounds to a fixed number of decimals towards the side asked,
// keeps values already there, and never returns -0.
func TestDecimals(t *testing.T) {
	for _, c := range []struct {
		v     float64
		n     int
		round func(float64) float64
		want  string
	}{
		{-1.251e-07, 2, math.Ceil, "0"}, {99.974, 2, math.Floor, "99.97"}, {99.97, 2, math.Floor, "99.97"},
		{99.97 + 1e-12, 2, math.Ceil, "99.97"}, {-12.345, 2, math.Ceil, "-12.34"}, {-12.345, 2, math.Floor, "-12.35"},
		{1.006, 2, math.Round, "1.01"}, {-0.001, 2, math.Round, "0"}, {math.Inf(1), 2, math.Floor, "+Inf"},
	} {
		if got := Shortest(Decimals(c.v, c.n, c.round)); got != c.want {
			t.Errorf("Decimals(%g, %d) = %s, want %s", c.v, c.n, got, c.want)
		}
	}
}
