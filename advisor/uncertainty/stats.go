package uncertainty

import (
	"math"
	"slices"
)

// Quantile returns the weighted q-quantile of values (0 <= q <= 1): the
// smallest value whose cumulative weight reaches q of the total. Values
// with zero weight count only when every weight is zero (then all count
// alike). It returns NaN for no values.
func Quantile(values, weights []float64, q float64) float64 {
	idx := make([]int, len(values))
	for i := range idx {
		idx[i] = i
	}
	slices.SortFunc(idx, func(a, b int) int {
		switch {
		case values[a] < values[b]:
			return -1
		case values[a] > values[b]:
			return 1
		}
		return a - b
	})
	total := 0.0
	for _, i := range idx {
		total += weights[i]
	}
	w := func(i int) float64 { return weights[i] }
	if total == 0 {
		total = float64(len(idx))
		w = func(int) float64 { return 1 }
	}
	acc := 0.0
	for _, i := range idx {
		acc += w(i)
		if acc >= q*total*(1-1e-12) {
			return values[i]
		}
	}
	if len(idx) == 0 {
		return math.NaN()
	}
	return values[idx[len(idx)-1]]
}

// EffectiveSize is Kish's effective sample size of weights,
// (sum w)^2 / sum w^2 (Kish 1965, Survey Sampling, sec. 11.7).
func EffectiveSize(weights []float64) float64 {
	s, s2 := 0.0, 0.0
	for _, w := range weights {
		s += w
		s2 += w * w
	}
	if s2 == 0 {
		return 0
	}
	return s * s / s2
}

// LogLikelihood is the log-likelihood of an observed positive value
// against a predicted interval [lo, hi] of positive values: zero inside,
// and outside a lognormal fall-off -1/2 (d/width)^2 in the distance d of
// ln(observed) from the interval, width the combined log-standard
// deviation of the observation and the model.
func LogLikelihood(observed, lo, hi, width float64) float64 {
	d := 0.0
	switch {
	case observed < lo:
		d = math.Log(lo / observed)
	case observed > hi:
		d = math.Log(observed / hi)
	}
	return -0.5 * (d / width) * (d / width)
}

// FirstOrder estimates the first-order variance-based sensitivity index
// S = Var(E[y|x]) / Var(y) of y on x from weighted draws already made, by
// the given-data estimator on equal-count partitions of x (Plischke,
// Borgonovo & Smith 2013, "Global sensitivity measures from given data",
// Eur. J. Oper. Res. 226:536, eq. 4; Saltelli et al. 2008, Global
// Sensitivity Analysis: The Primer, sec. 1.2.5), with sqrt(n) partitions.
// The estimate's bias for an x with no effect, about (partitions - 1) /
// effective size, is subtracted; the result is clipped to [0, 1]. It is 0
// when y does not vary.
func FirstOrder(x, y, w []float64) float64 {
	n := len(x)
	idx := make([]int, n)
	for i := range idx {
		idx[i] = i
	}
	slices.SortStableFunc(idx, func(a, b int) int {
		switch {
		case x[a] < x[b]:
			return -1
		case x[a] > x[b]:
			return 1
		}
		return 0
	})
	total, mean := 0.0, 0.0
	for i := range y {
		total += w[i]
		mean += w[i] * y[i]
	}
	if total == 0 {
		return 0
	}
	mean /= total
	variance := 0.0
	for i := range y {
		variance += w[i] * (y[i] - mean) * (y[i] - mean)
	}
	variance /= total
	if variance <= 1e-15 {
		return 0
	}
	parts := max(2, int(math.Sqrt(float64(n))))
	between := 0.0
	for p := range parts {
		lo, hi := p*n/parts, (p+1)*n/parts
		wp, yp := 0.0, 0.0
		for _, i := range idx[lo:hi] {
			wp += w[i]
			yp += w[i] * y[i]
		}
		if wp > 0 {
			yp /= wp
			between += wp * (yp - mean) * (yp - mean)
		}
	}
	s := between/total/variance - float64(parts-1)/EffectiveSize(w)
	return math.Min(math.Max(s, 0), 1)
}
