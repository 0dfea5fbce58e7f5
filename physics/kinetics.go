package physics

import "math"

// Log10HalfLife returns log10 of the aggregation half-life in s, the time in
// which the particle number falls to half its initial value N0
// (numberDensity, 1/m^3) in Brownian aggregation slowed by the stability
// ratio W (given as log10W):
//
//	t_1/2 = 3 eta W / (4 kT N0)
//
// It returns +Inf for N0 = 0 (nothing to aggregate). It panics unless
// viscosity and tempK are finite and > 0, numberDensity is finite and >= 0
// and log10W is not NaN.
//
// Reference: M. von Smoluchowski, "Versuch einer mathematischen Theorie der
// Koagulationskinetik kolloider Lösungen", Z. Phys. Chem. 92 (1917) 129: the
// half-life 1/(k N0) of second-order kinetics dN/dt = -k N^2 with the
// number-loss constant of rapid perikinetic aggregation k = 4 kT/(3 eta)
// (half the collision kernel 8 kT/(3 eta), each collision removing one
// particle of two), divided by W; D. J. Shaw, Introduction to Colloid and
// Surface Chemistry, 4th ed. (1992), ch. 8.
func Log10HalfLife(viscosity, tempK, numberDensity, log10W float64) float64 {
	checkKineticsArgs(viscosity, tempK)
	if !(numberDensity >= 0 && numberDensity <= math.MaxFloat64) || math.IsNaN(log10W) {
		panic("physics: Log10HalfLife needs a finite numberDensity >= 0 and a log10W")
	}
	if numberDensity == 0 {
		return math.Inf(1)
	}
	return math.Log10(3*viscosity/(4*Boltzmann*tempK)) - math.Log10(numberDensity) + log10W
}

// NumberDensity returns the number of spheres per m^3 at volume fraction phi
// (0 <= phi <= 1) of spheres of radius radius (m, > 0): phi / ((4/3) pi a^3).
// It panics outside that domain.
func NumberDensity(phi, radius float64) float64 {
	if !(phi >= 0 && phi <= 1) || !(radius > 0 && radius <= math.MaxFloat64) {
		panic("physics: NumberDensity needs 0 <= phi <= 1 and a finite radius > 0")
	}
	return phi / (4.0 / 3 * math.Pi * radius * radius * radius)
}

// OrthoPerikineticRatio returns the ratio of the orthokinetic (shear-induced)
// to the perikinetic (Brownian) collision kernel of equal spheres of diameter
// diameter (m) in laminar shear of rate shearRate (1/s):
//
//	(4/3) G d^3 / (8 kT/(3 eta)) = G d^3 eta / (2 kT)
//
// Shear dominates Brownian aggregation above about 1. It panics unless
// shearRate >= 0, diameter > 0, viscosity > 0 and tempK > 0, all finite.
//
// Reference: M. von Smoluchowski, Z. Phys. Chem. 92 (1917) 129; J. Gregory,
// Particles in Water (2006), ch. 6.
func OrthoPerikineticRatio(shearRate, diameter, viscosity, tempK float64) float64 {
	checkKineticsArgs(viscosity, tempK)
	if !(shearRate >= 0 && shearRate <= math.MaxFloat64) || !(diameter > 0 && diameter <= math.MaxFloat64) {
		panic("physics: OrthoPerikineticRatio needs a finite shearRate >= 0 and diameter > 0")
	}
	return shearRate * diameter * diameter * diameter * viscosity / (2 * Boltzmann * tempK)
}

// OrthoPerikineticShearRate inverts OrthoPerikineticRatio for the shear
// rate: the rate G (1/s) at which the orthokinetic kernel of equal spheres
// of diameter d (m) is ratio (>= 0) times the perikinetic one, in a liquid
// of viscosity eta (Pa s) at tempK (K),
//
//	G = 2 kT ratio / (eta d^3).
//
// Below it Brownian collisions weigh more than ratio allows. It panics
// unless ratio >= 0, diameter > 0, viscosity > 0 and tempK > 0, all finite.
//
// Reference: as OrthoPerikineticRatio (Smoluchowski 1917), solved for G.
func OrthoPerikineticShearRate(ratio, diameter, viscosity, tempK float64) float64 {
	checkKineticsArgs(viscosity, tempK)
	if !(ratio >= 0 && ratio <= math.MaxFloat64) || !(diameter > 0 && diameter <= math.MaxFloat64) {
		panic("physics: OrthoPerikineticShearRate needs a finite ratio >= 0 and diameter > 0")
	}
	kT := Boltzmann * tempK
	return ratio * 2 * kT / (viscosity * diameter * diameter * diameter)
}

func checkKineticsArgs(viscosity, tempK float64) {
	if !(viscosity > 0 && viscosity <= math.MaxFloat64) || !(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: aggregation kinetics needs finite viscosity > 0 and tempK > 0")
	}
}

// ReactionLimitedFractalDimension is the fractal dimension of aggregates
// grown by slow (reaction-limited) cluster aggregation, 2.1; fast
// (diffusion-limited) aggregation gives 1.86 (Lin, Lindsay, Weitz, Ball,
// Klein, Klein & Meakin, "Universality in colloid aggregation", Nature 339
// (1989) 360).
const ReactionLimitedFractalDimension = 2.1

// AggregateDiameterGrowth returns the relative growth of the mean
// aggregate diameter after a time t (s, >= 0) of aggregation whose
// half-life is halfLife (s, > 0, +Inf for none), for aggregates of fractal
// dimension df (>= 1, <= 3). With the constant Smoluchowski kernel the
// particle number falls as N = N0/(1 + t/t_1/2), so the mean aggregate
// holds 1 + t/t_1/2 primaries, and a fractal aggregate's diameter grows as
// that number to the power 1/df:
//
//	growth = (1 + t/t_1/2)^(1/df) - 1
//
// It panics outside that domain.
//
// References: M. von Smoluchowski, Z. Phys. Chem. 92 (1917) 129 (the number
// of clusters of second-order kinetics); Lin et al., Nature 339 (1989) 360
// (mass-radius relation of colloidal aggregates).
func AggregateDiameterGrowth(t, halfLife, df float64) float64 {
	if !(t >= 0 && t <= math.MaxFloat64) || !(halfLife > 0) || !(df >= 1 && df <= 3) {
		panic("physics: AggregateDiameterGrowth needs a finite t >= 0, halfLife > 0 and 1 <= df <= 3")
	}
	return math.Pow(1+t/halfLife, 1/df) - 1
}
