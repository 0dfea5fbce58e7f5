package number

import "math"

// Round keeps n significant digits of v, rounding half away from zero, so
// that reports do not pretend a precision the models do not have and stay
// byte-identical across runs.
func Round(v float64, n int) float64 { return RoundWith(v, n, math.Round) }

// RoundWith keeps n significant digits of v, rounding the scaled value with
// round (math.Round, Floor or Ceil). A value already at n digits but for its
// last bit stays as it is; one that cannot be scaled is returned unchanged.
func RoundWith(v float64, n int, round func(float64) float64) float64 {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return v
	}
	p := math.Pow10(n - decimalCeil(math.Abs(v)))
	scaled := v * p
	if nearest := math.Round(scaled); math.Abs(scaled-nearest) < 1e-9*math.Abs(scaled) {
		scaled = nearest
	}
	r := round(scaled) / p
	if math.IsInf(r, 0) || math.IsNaN(r) {
		return v
	}
	return r
}

// decimalCeil is the smallest d with 10^d >= a, for finite a > 0: the
// ceiling of log10 a, found from the binary exponent (log10 2 =
// 0.30103...) and settled on math.Pow10's exact table instead of a
// logarithm.
func decimalCeil(a float64) int {
	_, e := math.Frexp(a) // a in [2^(e-1), 2^e)
	d := int(math.Floor(float64(e-1) * math.Log10E * math.Ln2))
	for math.Pow10(d) < a {
		d++
	}
	for math.Pow10(d-1) >= a {
		d--
	}
	return d
}

// Decimals rounds v to n decimal places with round (math.Round, Floor or
// Ceil), for a bound printed to a fixed resolution: Floor keeps an upper
// bound inside, Ceil a lower one. A value already at n decimals but for
// its last bits stays as it is; the result is never -0.
func Decimals(v float64, n int, round func(float64) float64) float64 {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return v
	}
	p := math.Pow10(n)
	scaled := v * p
	if nearest := math.Round(scaled); math.Abs(scaled-nearest) < 1e-9*math.Max(1, math.Abs(scaled)) {
		scaled = nearest
	}
	return round(scaled)/p + 0
}
