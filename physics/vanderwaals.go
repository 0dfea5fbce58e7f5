package physics

import "math"

// gregoryLambda is the characteristic wavelength of the interaction, 100 nm,
// in Gregory's retarded van der Waals expression (Gregory 1981).
const gregoryLambda = 100e-9

// gregoryB is the fitted constant b = 5.32 of Gregory (1981).
const gregoryB = 5.32

// hamakerSphereSum is the bracket of Hamaker's non-retarded van der Waals
// energy of two equal spheres of radius a whose surfaces are h apart,
// V = -(A/6) hamakerSphereSum(a, h) (Pair.Parts):
//
//	V = -(A/6) [2a^2/(h^2+4ah) + 2a^2/(h+2a)^2 + ln((h^2+4ah)/(h+2a)^2)]
//
// It tends to -A a/(12 h) for h << a and to -(16/9) A a^6/(h+2a)^6 for
// h >> a. Written in y = (2a/(h+2a))^2 the bracket is y/(2(1-y)) + y/2 +
// ln(1-y), whose Taylor series starts at y^3/6 (sum over k >= 3 of
// (k-2)/(2k) y^k); the far branch is summed as that series so that the
// cancellation of the three terms never costs precision.
//
// Reference: H. C. Hamaker, "The London–van der Waals attraction between
// spherical particles", Physica 4 (1937) 1058, eq. for equal spheres.
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

// gregoryRetardation is the retardation factor of Gregory's van der Waals
// energy of two equal spheres of radius a at surface separation h
// (Pair.Parts with Retarded), in its Derjaguin (h << a) form:
//
//	V = -(A a/(12 h)) [1 - (b h/lambda) ln(1 + lambda/(b h))],  b = 5.32,
//
// accurate to a few per cent for h up to about lambda. The factor is
// 1 - ln(1+x)/x with x = lambda/(b h); for small x the two terms cancel and
// the series x/2 - x^2/3 + x^3/4 takes over.
//
// Reference: J. Gregory, "Approximate expressions for retarded van der Waals
// interaction", J. Colloid Interface Sci. 83 (1981) 138, sphere–sphere
// expression.
func gregoryRetardation(x float64) float64 {
	if x < 1e-4 {
		return x * (0.5 - x*(1.0/3-x/4))
	}
	return 1 - math.Log1p(x)/x
}
