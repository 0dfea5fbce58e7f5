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
	flo, fhi := f(lo), f(hi)
	if math.IsNaN(flo) || math.IsNaN(fhi) || math.IsInf(flo, 0) || math.IsInf(fhi, 0) {
		return 0, false
	}
	if flo == 0 {
		return lo, true
	}
	if fhi == 0 {
		return hi, true
	}
	if (flo > 0) == (fhi > 0) {
		return 0, false
	}
	side := 0
	for i := 0; i < 100; i++ {
		x = (lo*fhi - hi*flo) / (fhi - flo)
		if !(x > math.Min(lo, hi) && x < math.Max(lo, hi)) {
			x = 0.5 * (lo + hi)
		}
		fx := f(x)
		if fx == 0 || math.Abs(hi-lo) < tol {
			return x, true
		}
		if (fx > 0) == (fhi > 0) {
			hi, fhi = x, fx
			if side == 1 {
				flo /= 2
			}
			side = 1
		} else {
			lo, flo = x, fx
			if side == -1 {
				fhi /= 2
			}
			side = -1
		}
	}
	return x, true
}
