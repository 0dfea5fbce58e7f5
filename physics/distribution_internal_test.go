package physics

import (
	"math"
	"testing"
)

// spanAndSpread read a distribution back: the span (d90 - d10)/d50 (Allen,
// Particle Size Measurement, 5th ed., 1997) and the volume-weighted
// geometric standard deviation exp(sd of ln d) (ISO 9276-5:2005).
func spanAndSpread(classes []SizeClass) (span, spread float64) {
	span = (diameterAtCumulative(classes, 0.9) - diameterAtCumulative(classes, 0.1)) / D50(classes)
	mean, v := 0.0, 0.0
	for _, c := range classes {
		mean += c.VolumeFraction * math.Log(c.Diameter)
	}
	for _, c := range classes {
		d := math.Log(c.Diameter) - mean
		v += c.VolumeFraction * d * d
	}
	return span, math.Exp(math.Sqrt(v))
}

func TestLogNormalSigmaFromSpan(t *testing.T) {
	t.Parallel()
	// sigma = asinh(span/2)/z90 with z90 = norm.ppf(0.9) = 1.2815515655
	// (scipy.stats, testdata/reference/beyond_dlvo.py) [calc].
	cases := []struct{ span, want, tol float64 }{
		{0.5, 0.19309911, 1e-7},
		{1.0, 0.37549158, 1e-7},
		{1.5, 0.54086562, 1e-7},
		{2.0, 0.68773946, 1e-7},
		{0, 0, 0},
	}
	for _, c := range cases {
		got := logNormalSigmaFromSpan(c.span)
		if e := interactionRelErr(got, c.want); e > c.tol {
			t.Errorf("logNormalSigmaFromSpan(%v) = %.8f, want %.8f", c.span, got, c.want)
		}
	}
}

func TestLogNormalFromSpanRecovers(t *testing.T) {
	t.Parallel()
	// The span, median and geometric spread read back from the classes
	// must match the requested log-normal (ISO 9276-5: geometric standard
	// deviation exp(sigma)); tolerances are the discretisation error of n
	// classes read as point masses (diameterAtCumulative).
	cases := []struct {
		span      float64
		n         int
		spanTol   float64
		spreadTol float64
	}{
		{0.5, DefaultLogNormalClasses, 0.005, 0.002},
		{1.0, DefaultLogNormalClasses, 0.005, 0.002},
		{1.5, DefaultLogNormalClasses, 0.005, 0.002},
		{2.0, DefaultLogNormalClasses, 0.005, 0.002},
		{1.0, 12, 0.04, 0.005},
		{2.0, 60, 0.001, 0.002},
	}
	for _, c := range cases {
		classes, err := LogNormalFromSpan(2e-6, c.span, c.n)
		if err != nil {
			t.Fatal(err)
		}
		sum := 0.0
		for _, k := range classes {
			sum += k.VolumeFraction
		}
		if math.Abs(sum-1) > 1e-12 {
			t.Errorf("span %v n %d: fractions sum to %v", c.span, c.n, sum)
		}
		if d := D50(classes); interactionRelErr(d, 2e-6) > 1e-12 {
			t.Errorf("span %v n %d: D50 %.6e, want 2e-6", c.span, c.n, d)
		}
		s, g := spanAndSpread(classes)
		if interactionRelErr(s, c.span) > c.spanTol {
			t.Errorf("span %v n %d: recovered span %.5f (rel err %.1e > %.0e)", c.span, c.n, s, interactionRelErr(s, c.span), c.spanTol)
		}
		wantSpread := math.Exp(logNormalSigmaFromSpan(c.span))
		if interactionRelErr(g, wantSpread) > c.spreadTol {
			t.Errorf("span %v n %d: geometric spread %.5f, want %.5f", c.span, c.n, g, wantSpread)
		}
	}
}
