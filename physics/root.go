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
	return FindRootFrom(f, lo, hi, f(lo), f(hi), tol)
}

// FindRootFrom is FindRoot for a caller that has already evaluated f at the
// ends, flo = f(lo) and fhi = f(hi), as a search that brackets the root
// before iterating has: they are not evaluated again.
func FindRootFrom(f func(float64) float64, lo, hi, flo, fhi, tol float64) (x float64, ok bool) {
	a, b, ok := findRootBracket(f, lo, hi, flo, fhi, tol)
	if !ok {
		return 0, false
	}
	return (a + b) / 2, true
}

// findRootBracket is the Illinois iteration of FindRootFrom, returning the
// final bracket: f(a) has the sign of f(lo) and f(b) that of f(hi),
// |b - a| < tol (or f vanishes at the point returned at both ends).
func findRootBracket(f func(float64) float64, lo, hi, flo, fhi, tol float64) (a, b float64, ok bool) {
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

// FindRootNewton brackets and solves f(x) = 0 on [lo, hi] for a monotone f
// whose slope has the sign slopeSign (+1 or -1), where f returns its value
// and its derivative (exact or approximate). From the guess x0 it takes
// Newton steps, capped at maxStep, towards the root until the sign of f
// changes; inside the bracket it takes Newton steps towards its other end,
// replaced by bisection when one leaves the bracket. A step shorter than tol
// is lengthened by tol/4, so that once the estimate is that close the next
// point lands across the root and the bracket closes from both sides, even
// where Newton's iterates approach from one side only (a convex f). It returns hold, the end of the final bracket where f >= 0, and
// fail, the end where f < 0, with |hold - fail| < tol; when f keeps one sign
// on the whole path to the end of [lo, hi], ok is false and the missing end
// is NaN. At most 100 evaluations are made.
//
// Reference: W. H. Press, S. A. Teukolsky, W. T. Vetterling & B. P.
// Flannery, Numerical Recipes, 3rd ed. (2007), sec. 9.4 (Newton–Raphson
// with bisection safeguard).
func FindRootNewton(f func(float64) (float64, float64), x0, lo, hi, slopeSign, maxStep, tol float64) (hold, fail float64, ok bool) {
	hold, fail = math.NaN(), math.NaN()
	x := math.Min(math.Max(x0, lo), hi)
	fx, dfx := f(x)
	record := func() {
		if fx >= 0 {
			hold = x
		} else {
			fail = x
		}
	}
	record()
	evaluations := 1
	for math.IsNaN(hold) || math.IsNaN(fail) {
		dir := slopeSign
		if fx >= 0 {
			dir = -slopeSign
		}
		step := maxStep
		// At an exact root (fx = 0, a Newton step of -0) the other end lies
		// a lengthened zero step away.
		if newton := -fx / dfx; (newton*dir > 0 || fx == 0) && newton < math.Inf(1) && newton > math.Inf(-1) {
			step = math.Min(overshoot(math.Abs(newton), tol), maxStep)
		}
		next := math.Min(math.Max(x+dir*step, lo), hi)
		if next == x || evaluations >= 100 || math.IsNaN(fx) {
			return hold, fail, false
		}
		x = next
		fx, dfx = f(x)
		evaluations++
		record()
	}
	for math.Abs(hold-fail) >= tol && evaluations < 100 {
		a, b := math.Min(hold, fail), math.Max(hold, fail)
		other := hold
		if fx >= 0 {
			other = fail
		}
		next := x + math.Copysign(overshoot(math.Abs(fx/dfx), tol), other-x)
		if !(next > a && next < b) {
			next = (a + b) / 2
		}
		x = next
		fx, dfx = f(x)
		evaluations++
		if math.IsNaN(fx) {
			return hold, fail, false
		}
		record()
	}
	return hold, fail, true
}

// overshoot lengthens a Newton step shorter than tol by tol/4 (see
// FindRootNewton).
func overshoot(step, tol float64) float64 {
	if step < tol {
		return step + tol/4
	}
	return step
}
