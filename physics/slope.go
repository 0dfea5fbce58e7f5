package physics

import "math"

// slopes returns the energy V (J) at surface separation h > 0 and its first
// and second derivatives in s = ln h (J), V_s = h dV/dh and
// V_ss = h dV/dh + h^2 d2V/dh2, in closed form from each part:
//
//   - Hamaker's equal spheres, with p = h(h+4a) and c = h+2a:
//     dV/dh = (A/6) q, q = 64 a^6/(p^2 c^3), d2V/dh2 = -(A/6) q (4c/p + 3/c);
//   - Gregory's retarded form, V = -(A a/12)(1/h - (b/lambda) ln(1+x)),
//     x = lambda/(b h): V_s = (A a/(12 h)) x/(1+x),
//     V_ss = -(A a/(12 h)) (x/(1+x) + x/(1+x)^2);
//   - the double layer, a function of kappa h alone (see edlLogKappaSlope);
//   - Asakura–Oosawa, V = -P (6a+4delta+h) g^2 with g = 2 delta - h:
//     dV/dh = -P g (g - 2L), d2V/dh2 = -P (2L - 4g), L = 6a+4delta+h.
//
// V is summed as in parts. Each derivative is that of the published
// expression (Hamaker 1937; Gregory 1981; Verwey & Overbeek 1948; Hogg,
// Healy & Fuerstenau 1966; Asakura & Oosawa 1954); none has the
// cancellation of the energies themselves, so they hold full precision at
// every separation.
func (c *pairCurve) slopes(h float64) (v, vs, vss float64) {
	switch {
	case c.hamaker == 0:
	case c.retarded:
		x := gregoryLambda / (gregoryB * h)
		f := x / (1 + x)
		pre := c.hamaker * c.radius / (12 * h)
		v -= pre * gregoryRetardation(x)
		vs += pre * f
		vss -= pre * (f + f/(1+x))
	default:
		a := c.radius
		p, cc := h*(h+4*a), h+2*a
		a3 := a * a * a
		q := 64 * a3 * a3 / (p * p * cc * cc * cc)
		d1 := c.hamaker / 6 * q
		d2 := -d1 * (4*cc/p + 3/cc)
		v -= c.hamaker / 6 * hamakerSphereSum(a, h)
		vs += h * d1
		vss += h*d1 + h*h*d2
	}
	if c.kappa > 0 && c.edlContact > 0 {
		x := c.kappa * h
		e := math.Exp(-x)
		if c.constantPotential {
			sigma := e / (1 + e)
			v += c.edlContact * math.Log1p(e)
			vs -= c.edlContact * x * sigma
			vss -= c.edlContact * x * sigma * (1 - x*(1-sigma))
		} else {
			e *= c.edlContact
			v += e
			vs -= x * e
			vss += x * (x - 1) * e
		}
	}
	if g := 2*c.depletionRange - h; g > 0 && c.depletionPrefactor > 0 {
		l := 6*c.radius + 4*c.depletionRange + h
		d1 := -c.depletionPrefactor * g * (g - 2*l)
		d2 := -c.depletionPrefactor * (2*l - 4*g)
		v -= c.depletionPrefactor * l * g * g
		vs += h * d1
		vss += h*d1 + h*h*d2
	}
	return v, vs, vss
}

// edlLogKappaSlope is the derivative of the energy at separation h with
// respect to ln kappa at fixed potential (J). The double layer depends on
// kappa h alone, so it equals the double layer's share of V_s; the other
// parts do not depend on kappa. At a maximum of V in h it is, by the
// envelope theorem, the rate at which the barrier height moves with ln kappa.
func (c *pairCurve) edlLogKappaSlope(h float64) float64 {
	if !(c.kappa > 0 && c.edlContact > 0) {
		return 0
	}
	x := c.kappa * h
	if c.constantPotential {
		return -c.edlContact * x / (1 + math.Exp(x))
	}
	return -x * c.edlContact * math.Exp(-x)
}

// LogKappaSlope returns the derivative of Energy at surface separation h
// (m, >= 0) with respect to ln Kappa at fixed potential, in J. Taken at the
// barrier it is, by the envelope theorem, the rate at which the barrier's
// height changes with ln Kappa (a decade of ionic strength is ln 10 / 2 in
// ln Kappa), which lets root searches over the salt take Newton steps. It
// panics on a negative h or an invalid Pair.
func (p Pair) LogKappaSlope(h float64) float64 {
	c := p.curve()
	return c.edlLogKappaSlope(checkSeparation(h))
}
