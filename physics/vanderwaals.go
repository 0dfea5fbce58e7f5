package physics

import "math"

// GregoryLambda is the characteristic wavelength of the interaction, 100 nm,
// in Gregory's retarded van der Waals expression (Gregory 1981).
const GregoryLambda = 100e-9

// gregoryB is the fitted constant b = 5.32 of Gregory (1981).
const gregoryB = 5.32

// VdWHamaker returns the non-retarded van der Waals energy in J of two equal
// spheres of radius radius (m) whose surfaces are h (m) apart, with Hamaker
// constant hamaker (J, particle-medium-particle):
//
//	V = -(A/6) [2a^2/(h^2+4ah) + 2a^2/(h+2a)^2 + ln((h^2+4ah)/(h+2a)^2)]
//
// It tends to -A a/(12 h) for h << a and to -(16/9) A a^6/(h+2a)^6 for
// h >> a; the far branch is summed as a series so that the cancellation of
// the three terms never costs precision. At contact (h = 0) it returns -Inf
// for A > 0, +Inf for A < 0 and 0 for A = 0. It panics unless radius > 0,
// h >= 0 and hamaker is finite.
//
// Reference: H. C. Hamaker, "The London–van der Waals attraction between
// spherical particles", Physica 4 (1937) 1058, eq. for equal spheres.
func VdWHamaker(radius, h, hamaker float64) float64 {
	checkVdWArgs(radius, h, hamaker)
	if hamaker == 0 {
		return 0
	}
	if h == 0 {
		return math.Inf(-int(math.Copysign(1, hamaker)))
	}
	return -hamaker / 6 * hamakerSphereSum(radius, h)
}

// hamakerSphereSum is the bracket of Hamaker's equal-sphere expression,
// written in y = (2a/(h+2a))^2: y/(2(1-y)) + y/2 + ln(1-y), whose Taylor
// series starts at y^3/6 (sum over k >= 3 of (k-2)/(2k) y^k).
func hamakerSphereSum(a, h float64) float64 {
	centres := h + 2*a
	y := 2 * a / centres
	y *= y
	if y < 0.1 {
		sum, power := 0.0, y*y
		for k := 3; k < 60; k++ {
			power *= y
			term := float64(k-2) / float64(2*k) * power
			sum += term
			if term < 1e-17*sum {
				break
			}
		}
		return sum
	}
	oneMinusY := h * (h + 4*a) / (centres * centres)
	return y/(2*oneMinusY) + y/2 + math.Log(oneMinusY)
}

// VdWRetardedGregory returns the retarded van der Waals energy in J of two
// equal spheres of radius radius (m) at surface separation h (m), Hamaker
// constant hamaker (J) and characteristic wavelength lambda (m, usually
// GregoryLambda):
//
//	V = -(A a/(12 h)) [1 - (b h/lambda) ln(1 + lambda/(b h))],  b = 5.32
//
// It is the Derjaguin (h << a) form and is accurate to a few per cent for h up
// to about lambda. At h = 0 it returns -Inf (A > 0), +Inf (A < 0) or 0. It
// panics unless radius > 0, h >= 0, lambda > 0 and hamaker is finite.
//
// Reference: J. Gregory, "Approximate expressions for retarded van der Waals
// interaction", J. Colloid Interface Sci. 83 (1981) 138, sphere–sphere
// expression.
func VdWRetardedGregory(radius, h, hamaker, lambda float64) float64 {
	checkVdWArgs(radius, h, hamaker)
	if !(lambda > 0 && lambda <= math.MaxFloat64) {
		panic("physics: VdWRetardedGregory needs a finite lambda > 0")
	}
	if hamaker == 0 {
		return 0
	}
	if h == 0 {
		return math.Inf(-int(math.Copysign(1, hamaker)))
	}
	return -hamaker * radius / (12 * h) * gregoryRetardation(lambda/(gregoryB*h))
}

// gregoryRetardation is 1 - ln(1+x)/x with x = lambda/(b h); for small x the
// two terms cancel and the series x/2 - x^2/3 + x^3/4 takes over.
func gregoryRetardation(x float64) float64 {
	if x < 1e-4 {
		return x * (0.5 - x*(1.0/3-x/4))
	}
	return 1 - math.Log1p(x)/x
}

func checkVdWArgs(radius, h, hamaker float64) {
	if !(radius > 0 && radius <= math.MaxFloat64) || !(h >= 0 && h <= math.MaxFloat64) ||
		math.IsNaN(hamaker) || math.IsInf(hamaker, 0) {
		panic("physics: van der Waals energy needs finite radius > 0, h >= 0 and a finite Hamaker constant")
	}
}
