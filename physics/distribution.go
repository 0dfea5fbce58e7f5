package physics

import (
	"errors"
	"fmt"
	"math"
	"slices"
)

// SizeClass is one class of a particle size distribution: a diameter (m)
// and the fraction of the solids volume in the class. The classes of a
// distribution sum to 1 (see NormaliseClasses).
type SizeClass struct {
	Diameter, VolumeFraction float64
}

// ErrInvalidDistribution is wrapped by every error of this file.
var ErrInvalidDistribution = errors.New("physics: invalid size distribution")

// z90 is the 90 % quantile of the standard normal distribution.
const z90 = 1.2815515655446004

// logNormalSigmaFromSpan returns the standard deviation sigma of ln d of a
// log-normal distribution with span (d90 - d10)/d50 >= 0: from
// span = exp(z90 sigma) - exp(-z90 sigma) = 2 sinh(z90 sigma),
// sigma = asinh(span/2)/z90 with z90 = 1.28155. It panics on a negative
// span or NaN.
//
// References: ISO 9276-5:2005 (log-normal size distributions); Allen,
// Particle Size Measurement, 5th ed. (1997).
func logNormalSigmaFromSpan(span float64) float64 {
	if !(span >= 0) {
		panic("physics: logNormalSigmaFromSpan needs span >= 0")
	}
	return math.Asinh(span/2) / z90
}

// DefaultLogNormalClasses is a number of classes for LogNormalFromSpan that
// reproduces the requested span (d90 - d10)/d50 within 0.5 % and the
// geometric spread exp(sd of ln d) within 0.2 % when read back from the
// classes.
const DefaultLogNormalClasses = 25

// LogNormalFromSpan returns n size classes of a volume-weighted log-normal
// distribution with median diameter d50 (m) and span (d90 - d10)/d50: n
// bins of equal width in ln d cover ln d50 +- 3 sigma (sigma =
// asinh(span/2)/z90, z90 = 1.28155), each class sits at its bin's centre and holds
// the normal probability of its bin, the 0.13 % tails beyond +-3 sigma
// going to the end classes so that the fractions sum to 1. A span of 0 or
// n = 1 gives the single class {d50, 1}. It returns an error wrapping
// ErrInvalidDistribution unless d50 > 0 and finite, span >= 0 and finite,
// and n >= 1.
//
// References: ISO 9276-5:2005; Allen, Particle Size Measurement, 5th ed.
// (1997).
func LogNormalFromSpan(d50, span float64, n int) ([]SizeClass, error) {
	switch {
	case !(d50 > 0) || math.IsInf(d50, 1):
		return nil, fmt.Errorf("%w: median diameter %g m must be positive and finite", ErrInvalidDistribution, d50)
	case !(span >= 0) || math.IsInf(span, 1):
		return nil, fmt.Errorf("%w: span %g must be non-negative and finite", ErrInvalidDistribution, span)
	case n < 1:
		return nil, fmt.Errorf("%w: %d classes requested, need at least 1", ErrInvalidDistribution, n)
	}
	sigma := logNormalSigmaFromSpan(span)
	if sigma == 0 || n == 1 {
		return []SizeClass{{Diameter: d50, VolumeFraction: 1}}, nil
	}
	classes := make([]SizeClass, n)
	width := 6 / float64(n)
	below := 0.0 // cumulative probability up to the current bin's lower edge
	for i := range classes {
		upper := 1.0
		if i < n-1 {
			upper = distributionNormalCDF(-3 + float64(i+1)*width)
		}
		x := -3 + (float64(i)+0.5)*width
		classes[i] = SizeClass{Diameter: d50 * math.Exp(sigma*x), VolumeFraction: upper - below}
		below = upper
	}
	return classes, nil
}

func distributionNormalCDF(x float64) float64 { return 0.5 * math.Erfc(-x/math.Sqrt2) }

// NormaliseClasses returns a copy of classes sorted by diameter with the
// volume fractions scaled to sum to 1. It returns an error wrapping
// ErrInvalidDistribution for no classes, a diameter that is not positive
// and finite, a negative or non-finite fraction, or a zero total.
//
// Reference: ISO 9276-1:1998 (representation of size analysis results).
func NormaliseClasses(classes []SizeClass) ([]SizeClass, error) {
	if len(classes) == 0 {
		return nil, fmt.Errorf("%w: no size classes", ErrInvalidDistribution)
	}
	total := 0.0
	for i, c := range classes {
		if !(c.Diameter > 0) || math.IsInf(c.Diameter, 1) {
			return nil, fmt.Errorf("%w: class %d diameter %g m must be positive and finite", ErrInvalidDistribution, i, c.Diameter)
		}
		if !(c.VolumeFraction >= 0) || math.IsInf(c.VolumeFraction, 1) {
			return nil, fmt.Errorf("%w: class %d volume fraction %g must be non-negative and finite", ErrInvalidDistribution, i, c.VolumeFraction)
		}
		total += c.VolumeFraction
	}
	if total == 0 {
		return nil, fmt.Errorf("%w: volume fractions sum to zero", ErrInvalidDistribution)
	}
	out := slices.Clone(classes)
	for i := range out {
		out[i].VolumeFraction /= total
	}
	slices.SortStableFunc(out, func(a, b SizeClass) int {
		switch {
		case a.Diameter < b.Diameter:
			return -1
		case a.Diameter > b.Diameter:
			return 1
		}
		return 0
	})
	return out, nil
}

// diameterAtCumulative returns the diameter (m) below which the fraction
// p (0..1) of the solids volume lies. The classes are read as a histogram:
// each class spans from the geometric mean of its diameter and its lower
// neighbour's to that of its diameter and its upper neighbour's (the outer
// bounds mirrored), and the cumulative volume is linear in ln d inside a
// class. A single class gives its diameter for every p. classes must be
// normalised and sorted (NormaliseClasses); it panics on no classes and on
// p outside [0, 1].
//
// Reference: ISO 9276-1:1998 (histogram and cumulative distribution Q3).
func diameterAtCumulative(classes []SizeClass, p float64) float64 {
	if len(classes) == 0 {
		panic("physics: diameterAtCumulative needs at least one class")
	}
	if !(p >= 0 && p <= 1) {
		panic("physics: diameterAtCumulative needs 0 <= p <= 1")
	}
	n := len(classes)
	if n == 1 {
		return classes[0].Diameter
	}
	logD := func(i int) float64 { return math.Log(classes[i].Diameter) }
	lower := logD(0) - 0.5*(logD(1)-logD(0))
	below := 0.0
	for i, c := range classes {
		var upper float64
		if i < n-1 {
			upper = 0.5 * (logD(i) + logD(i+1))
		} else {
			upper = logD(i) + 0.5*(logD(i)-logD(i-1))
		}
		if c.VolumeFraction > 0 && p <= below+c.VolumeFraction {
			t := math.Max(0, (p-below)/c.VolumeFraction)
			return math.Exp(lower + t*(upper-lower))
		}
		below += c.VolumeFraction
		lower = upper
	}
	return math.Exp(lower)
}

// D50 returns the volume median diameter (m) of normalised, sorted classes,
// read from the histogram with the cumulative volume linear in ln d inside
// a class. A single class gives its diameter. It panics on no classes.
//
// Reference: ISO 9276-1:1998 (histogram and cumulative distribution Q3).
func D50(classes []SizeClass) float64 { return diameterAtCumulative(classes, 0.5) }

// LargestDiameter returns the largest class diameter (m) of classes: the
// upper end of the distribution, where the sizes most exposed to gravity sit.
// It panics on no classes.
//
// Reference: ISO 9276-1:1998 (the upper size of a histogram).
func LargestDiameter(classes []SizeClass) float64 {
	if len(classes) == 0 {
		panic("physics: LargestDiameter needs at least one class")
	}
	largest := classes[0].Diameter
	for _, c := range classes[1:] {
		largest = math.Max(largest, c.Diameter)
	}
	return largest
}
