package physics_test

import (
	"errors"
	"fmt"
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestLogNormalFromSpanClasses(t *testing.T) {
	t.Parallel()
	// Five classes over +-3 sigma with the tails folded into the end
	// classes, class probabilities from scipy.stats.norm.cdf
	// (testdata/reference/beyond_dlvo.py) [calc]; d50 = 1 um, span = 1.
	want := []physics.SizeClass{
		{Diameter: 4.06090273e-07, VolumeFraction: 0.03593032},
		{Diameter: 6.37252127e-07, VolumeFraction: 0.23832280},
		{Diameter: 1.00000000e-06, VolumeFraction: 0.45149376},
		{Diameter: 1.56923760e-06, VolumeFraction: 0.23832280},
		{Diameter: 2.46250666e-06, VolumeFraction: 0.03593032},
	}
	got, err := physics.LogNormalFromSpan(1e-6, 1, 5)
	if err != nil || len(got) != len(want) {
		t.Fatalf("LogNormalFromSpan(1e-6, 1, 5) = %v, %v", got, err)
	}
	for i := range want {
		if e := beyondRelErr(got[i].Diameter, want[i].Diameter); e > 1e-8 {
			t.Errorf("class %d diameter %.8e, want %.8e", i, got[i].Diameter, want[i].Diameter)
		}
		if e := math.Abs(got[i].VolumeFraction - want[i].VolumeFraction); e > 1e-8 {
			t.Errorf("class %d fraction %.8f, want %.8f", i, got[i].VolumeFraction, want[i].VolumeFraction)
		}
	}
}

func TestLogNormalFromSpanEdges(t *testing.T) {
	t.Parallel()
	// A zero span is a single size; invalid requests are errors, not NaN.
	for _, n := range []int{1, 10} {
		got, err := physics.LogNormalFromSpan(5e-7, 0, n)
		if err != nil || len(got) != 1 || got[0] != (physics.SizeClass{Diameter: 5e-7, VolumeFraction: 1}) {
			t.Errorf("span 0, n %d: %v, %v", n, got, err)
		}
	}
	bad := []struct {
		d50, span float64
		n         int
	}{{0, 1, 10}, {-1e-6, 1, 10}, {1e-6, -0.1, 10}, {1e-6, 1, 0}, {math.NaN(), 1, 10}, {1e-6, math.Inf(1), 10}}
	for _, b := range bad {
		if _, err := physics.LogNormalFromSpan(b.d50, b.span, b.n); !errors.Is(err, physics.ErrInvalidDistribution) {
			t.Errorf("LogNormalFromSpan(%v, %v, %d) error = %v, want ErrInvalidDistribution", b.d50, b.span, b.n, err)
		}
	}
}

func TestNormaliseClasses(t *testing.T) {
	t.Parallel()
	// Sorting and scaling by hand; the input must not be modified.
	in := []physics.SizeClass{{3e-6, 2}, {1e-6, 1}, {2e-6, 1}}
	got, err := physics.NormaliseClasses(in)
	if err != nil {
		t.Fatal(err)
	}
	want := []physics.SizeClass{{1e-6, 0.25}, {2e-6, 0.25}, {3e-6, 0.5}}
	for i := range want {
		if got[i] != want[i] {
			t.Errorf("class %d = %v, want %v", i, got[i], want[i])
		}
	}
	if in[0].Diameter != 3e-6 || in[0].VolumeFraction != 2 {
		t.Error("NormaliseClasses modified its input")
	}
	bad := [][]physics.SizeClass{
		nil,
		{},
		{{1e-6, 0}, {2e-6, 0}},
		{{1e-6, -0.1}, {2e-6, 1}},
		{{0, 1}},
		{{1e-6, math.NaN()}},
		{{math.Inf(1), 1}},
	}
	for _, b := range bad {
		if _, err := physics.NormaliseClasses(b); !errors.Is(err, physics.ErrInvalidDistribution) {
			t.Errorf("NormaliseClasses(%v) error = %v, want ErrInvalidDistribution", b, err)
		}
	}
}

func TestLargestDiameter(t *testing.T) {
	t.Parallel()
	// The upper class of a histogram (ISO 9276-1) [practice], in any order.
	cases := []struct {
		classes []physics.SizeClass
		want    float64
	}{
		{[]physics.SizeClass{{1e-6, 1}}, 1e-6},
		{[]physics.SizeClass{{1e-6, 0.5}, {2e-6, 0.3}, {4e-6, 0.2}}, 4e-6},
		{[]physics.SizeClass{{4e-6, 0.2}, {1e-6, 0.5}, {2e-6, 0.3}}, 4e-6},
	}
	for _, c := range cases {
		if got := physics.LargestDiameter(c.classes); got != c.want {
			t.Errorf("LargestDiameter(%v) = %g, want %g", c.classes, got, c.want)
		}
	}
	classes, err := physics.LogNormalFromSpan(1e-6, 1, physics.DefaultLogNormalClasses)
	if err != nil {
		t.Fatal(err)
	}
	if got, want := physics.LargestDiameter(classes), classes[len(classes)-1].Diameter; got != want {
		t.Errorf("log-normal: %g, want the last class %g", got, want)
	}
	defer func() {
		if recover() == nil {
			t.Error("no classes: no panic")
		}
	}()
	physics.LargestDiameter(nil)
}

func ExampleLogNormalFromSpan() {
	classes, err := physics.LogNormalFromSpan(1e-6, 1.0, 5)
	if err != nil {
		panic(err)
	}
	for _, c := range classes {
		fmt.Printf("%.3f um  %.4f\n", c.Diameter*1e6, c.VolumeFraction)
	}
	fmt.Printf("max packing %.3f\n", physics.MaxPackingPolydisperse(classes))
	// Output:
	// 0.406 um  0.0359
	// 0.637 um  0.2383
	// 1.000 um  0.4515
	// 1.569 um  0.2383
	// 2.463 um  0.0359
	// max packing 0.663
}
