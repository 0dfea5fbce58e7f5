package physics

import "math"

// pbMixture is an electroneutral ion mixture reduced to what the
// Poisson–Boltzmann equation needs: the concentrations (mol/m^3) and
// valences of its charged ions and s = sum c_i z_i^2 = 2I (mol/m^3).
type pbMixture struct {
	conc    []float64
	valence []float64
	s       float64
}

// neutralityTol is the largest |sum c_i z_i| / sum c_i |z_i| accepted as
// electroneutral: rounding of concentrations built from salts stays far
// below it, a forgotten counter-ion far above.
const neutralityTol = 1e-9

// newPBMixture checks ions and keeps the charged ones. It panics, naming
// caller, on a negative or non-finite concentration or a mixture that is
// not electroneutral: without electroneutrality the bulk is no solution of
// the Poisson–Boltzmann equation.
func newPBMixture(ions []Ion, caller string) pbMixture {
	var m pbMixture
	var charge, magnitude float64
	for _, ion := range ions {
		if !(ion.Concentration >= 0 && ion.Concentration <= math.MaxFloat64) {
			panic("physics: " + caller + " needs finite ion concentrations >= 0")
		}
		if ion.Valence == 0 || ion.Concentration == 0 {
			continue
		}
		z := float64(ion.Valence)
		m.conc = append(m.conc, ion.Concentration)
		m.valence = append(m.valence, z)
		charge += ion.Concentration * z
		magnitude += ion.Concentration * math.Abs(z)
		m.s += ion.Concentration * z * z
	}
	if math.Abs(charge) > neutralityTol*magnitude {
		panic("physics: " + caller + " needs an electroneutral ion mixture (sum c_i z_i = 0)")
	}
	return m
}

// fieldSquared returns G(y) = (2/s) sum c_i (exp(-z_i y) - 1 + z_i y), the
// square of the dimensionless field (dy/d(kappa x))^2 of the first integral
// of the Poisson–Boltzmann equation at the reduced potential y = e psi/kT
// (the z_i y terms sum to zero by electroneutrality and keep each term
// non-negative). G(y) = y^2 + O(y^3); it may be +Inf.
func (m pbMixture) fieldSquared(y float64) float64 {
	var sum float64
	for i, c := range m.conc {
		u := -m.valence[i] * y
		sum += c * (expRem3(u) + u*u/2)
	}
	return 2 * sum / m.s
}

// fieldExcess returns G(y) - y^2 = (2/s) sum c_i expRem3(-z_i y), without
// the cancellation of subtracting y^2 from G.
func (m pbMixture) fieldExcess(y float64) float64 {
	var sum float64
	for i, c := range m.conc {
		sum += c * expRem3(-m.valence[i]*y)
	}
	return 2 * sum / m.s
}

// expRem3 returns exp(u) - 1 - u - u^2/2, by its Taylor series where the
// direct form would cancel (|u| < 1/2).
func expRem3(u float64) float64 {
	if math.Abs(u) >= 0.5 {
		return math.Expm1(u) - u - u*u/2
	}
	term := u * u * u / 6
	sum := term
	for k := 4.0; k <= 18; k++ {
		term *= u / k
		sum += term
	}
	return sum
}
