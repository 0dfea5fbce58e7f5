package physics

import "math"

// FindRoot returns x in [lo, hi] with f(x) = 0 for a continuous f whose
// values at lo and hi differ in sign, to within an absolute tolerance tol
// on x, by the Illinois variant of the false-position method; ok is false
// when the ends do not bracket a root or f is not finite there.
// At most 100 evaluations are made.
//
// gonum v0.17 exports no scalar root finder, so this one is kept here.
//
// Reference: Dowell & Jarratt, "A modified regula falsi method for
// computing the root of an equation", BIT 11:168-174 (1971).
func FindRoot(f func(float64) float64, lo, hi, tol float64) (x float64, ok bool) {
	a, b, ok := FindRootBracket(f, lo, hi, tol)
	if !ok {
		return 0, false
	}
	return (a + b) / 2, true
}

// FindRootBracket is FindRoot that returns the final bracket instead of one
// point: f(a) has the sign of f(lo) and f(b) that of f(hi), |b - a| < tol
// (or f vanishes at the point returned at both ends). Callers that need the
// root on a given side of a criterion take that end.
func FindRootBracket(f func(float64) float64, lo, hi, tol float64) (a, b float64, ok bool) {
	flo, fhi := f(lo), f(hi)
	if math.IsNaN(flo) || math.IsNaN(fhi) || math.IsInf(flo, 0) || math.IsInf(fhi, 0) {
		return 0, 0, false
	}
	if flo == 0 {
		return lo, lo, true
	}
	if fhi == 0 {
		return hi, hi, true
	}
	if (flo > 0) == (fhi > 0) {
		return 0, 0, false
	}
	side := 0
	for i := 0; i < 100 && math.Abs(hi-lo) >= tol; i++ {
		x := (lo*fhi - hi*flo) / (fhi - flo)
		if !(x > math.Min(lo, hi) && x < math.Max(lo, hi)) {
			x = 0.5 * (lo + hi)
		}
		fx := f(x)
		switch {
		case fx == 0:
			return x, x, true
		case (fx > 0) == (fhi > 0):
			hi, fhi = x, fx
			if side == 1 {
				flo /= 2
			}
			side = 1
		default:
			lo, flo = x, fx
			if side == -1 {
				fhi /= 2
			}
			side = -1
		}
	}
	return lo, hi, true
}
