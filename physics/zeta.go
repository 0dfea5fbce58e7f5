package physics

import "math"

// Limits of Henry's function f(kappa a) for a non-conducting sphere, the
// factor of ZetaHenry: HenryHuckel for a double layer much thicker than the
// particle (kappa a -> 0), HenrySmoluchowski for one much thinner
// (kappa a -> Inf).
//
// References: E. Hückel, Phys. Z. 25 (1924) 204; M. von Smoluchowski, Bull.
// Int. Acad. Sci. Cracovie (1903) 184; D. C. Henry, Proc. R. Soc. Lond. A 133
// (1931) 106, who joins the two; R. J. Hunter, Zeta Potential in Colloid
// Science (Academic Press, 1981), ch. 3.
const (
	HenryHuckel       = 1.0
	HenrySmoluchowski = 1.5
)

// ZetaHenry returns the zeta potential in V from the mobility (m^2/(V s)),
// viscosity (Pa s), relative permittivity and Henry's function value f
// (1 <= f <= 3/2, from HenrySwanFurst or HenryOhshima), inverting
//
//	mu = 2 eps0 epsR zeta f(kappa a) / (3 eta)
//
// It holds for low zeta (|zeta| below about 50 mV) where relaxation is
// negligible. It panics unless viscosity > 0, epsR > 0 and f > 0.
//
// Reference: D. C. Henry, "The cataphoresis of suspended particles. Part I",
// Proc. R. Soc. Lond. A 133 (1931) 106; Hunter (1981), ch. 3.
func ZetaHenry(mobility, viscosity, epsR, f float64) float64 {
	if !(viscosity > 0) || !(epsR > 0) || !(f > 0) {
		panic("physics: ZetaHenry needs viscosity > 0, epsR > 0, f > 0")
	}
	return 3 * viscosity * mobility / (2 * VacuumPermittivity * epsR * f)
}

// HenryOhshima returns Ohshima's approximation to Henry's function f(kappa a)
// for a non-conducting sphere, within 1 % of the exact function for all
// kappa a >= 0:
//
//	f = 1 + 1 / (2 (1 + delta/(kappa a))^3),  delta = 2.5 / (1 + 2 exp(-kappa a))
//
// f rises from 1 (kappa a -> 0) to 3/2 (kappa a -> Inf). It panics if kappaA
// is negative or NaN.
//
// Reference: H. Ohshima, "A simple expression for Henry's function for the
// retardation effect in electrophoresis of spherical colloidal particles",
// J. Colloid Interface Sci. 168 (1994) 269, eq. 8.
func HenryOhshima(kappaA float64) float64 {
	if !(kappaA >= 0) {
		panic("physics: HenryOhshima needs kappaA >= 0")
	}
	if kappaA == 0 {
		return HenryHuckel
	}
	delta := 2.5 / (1 + 2*math.Exp(-kappaA))
	c := 1 + delta/kappaA
	return 1 + 1/(2*c*c*c)
}

// HenrySwanFurst returns Henry's function f(kappa a) for a non-conducting
// sphere exactly, in the form with generalised exponential integrals E_n:
//
//	f = 3/2 - (3/2) exp(kappa a) (5 E_7(kappa a) - 2 E_5(kappa a))
//
// which equals Henry's 1931 expression and stays free of its cancellation at
// large kappa a. f rises from 1 (kappa a = 0) to 3/2 (kappa a = +Inf). It
// panics if kappaA is negative or NaN.
//
// References: J. W. Swan & E. M. Furst, "A simpler expression for Henry's
// function describing the electrophoretic mobility of spherical colloids",
// J. Colloid Interface Sci. 388 (2012) 92; D. C. Henry, Proc. R. Soc. Lond.
// A 133 (1931) 106.
func HenrySwanFurst(kappaA float64) float64 {
	if !(kappaA >= 0) {
		panic("physics: HenrySwanFurst needs kappaA >= 0")
	}
	if math.IsInf(kappaA, 1) {
		return HenrySmoluchowski
	}
	return HenrySmoluchowski - HenrySmoluchowski*(5*scaledExpIntegral(7, kappaA)-2*scaledExpIntegral(5, kappaA))
}

// scaledExpIntegral returns exp(x) E_n(x) for n >= 2 and x >= 0, where
// E_n(x) = int_1^Inf exp(-x t) t^-n dt (Abramowitz & Stegun 1964, eq. 5.1.4).
// Below x = 1 it climbs from the E_1 series (A&S eq. 5.1.11) by the upward
// recurrence (A&S eq. 5.1.14), which is stable there; above it uses the
// even contraction of the continued fraction A&S eq. 5.1.22, evaluated by the
// modified Lentz method (Lentz 1976, Appl. Opt. 15:668),
// which converges quickly for large x and never needs exp(-x).
func scaledExpIntegral(n int, x float64) float64 {
	if x == 0 {
		return 1 / float64(n-1)
	}
	if x <= 1 {
		const eulerGamma = 0.57721566490153286060651209008240243
		sum, term := 0.0, 1.0
		for k := 1; k < 40; k++ {
			term *= -x / float64(k)
			sum += term / float64(k)
			if math.Abs(term) < 1e-17*math.Abs(sum) {
				break
			}
		}
		en := -eulerGamma - math.Log(x) - sum
		ex := math.Exp(-x)
		for k := 1; k < n; k++ {
			en = (ex - x*en) / float64(k)
		}
		return en / ex
	}
	// exp(x) E_n(x) = 1/(x+n- 1*n/(x+n+2- 2(n+1)/(x+n+4- ...))).
	const tiny = 1e-300
	b := x + float64(n)
	c := 1 / tiny
	d := 1 / b
	result := d
	for i := 1; i < 200; i++ {
		an := -float64(i) * float64(n-1+i)
		b += 2
		d = 1 / (an*d + b)
		c = b + an/c
		step := c * d
		result *= step
		if math.Abs(step-1) < 1e-16 {
			break
		}
	}
	return result
}
