package physics

import "math"

// HydrodynamicShearForceEnergy returns the work (J) a simple shear flow can
// do on a pair of spheres of radius a (m) across the range of the energy
// barrier, barrierWidth (m): F w with F = 6 pi eta a^2 G the order of the
// hydrodynamic force pressing a doublet together in shear of rate G (1/s)
// in a liquid of viscosity eta (Pa s). Compare it with the barrier height:
// shear aggregation becomes likely as F w approaches the barrier. It is an
// order-of-magnitude estimate (a numerical factor of order unity that
// depends on the doublet's orientation is left out). It panics on negative,
// infinite or NaN arguments.
//
// References: van de Ven & Mason, Colloid Polym. Sci. 255, 468 (1977)
// (orthokinetic doublet formation of spheres); Russel, Saville &
// Schowalter, Colloidal Dispersions (1989).
func HydrodynamicShearForceEnergy(viscosity, shearRate, radius, barrierWidth float64) float64 {
	checkShearArgs(viscosity, shearRate, radius)
	if !(barrierWidth >= 0) || math.IsInf(barrierWidth, 1) {
		panic("physics: HydrodynamicShearForceEnergy needs finite barrierWidth >= 0")
	}
	return 6 * math.Pi * viscosity * radius * radius * shearRate * barrierWidth
}

// HydrodynamicShearRate inverts HydrodynamicShearForceEnergy for the shear
// rate: the rate G (1/s) at which the shear work 6 pi eta a^2 G w on a pair
// of spheres of radius a (m) across barrierWidth w (m) in a liquid of
// viscosity eta (Pa s) equals energy (J, >= 0),
//
//	G = E / (6 pi eta a^2 w).
//
// Below it shear does less work than energy. It is +Inf when radius or
// barrierWidth is 0 (shear does no work) unless energy is 0 too, and 0 then.
// It panics on a negative or non-finite energy, radius or barrierWidth, or a
// non-positive or non-finite viscosity.
//
// References: as HydrodynamicShearForceEnergy (van de Ven & Mason 1977),
// solved for G.
func HydrodynamicShearRate(energy, viscosity, radius, barrierWidth float64) float64 {
	if !(energy >= 0) || math.IsInf(energy, 1) || !(viscosity > 0) || math.IsInf(viscosity, 1) ||
		!(radius >= 0) || math.IsInf(radius, 1) || !(barrierWidth >= 0) || math.IsInf(barrierWidth, 1) {
		panic("physics: HydrodynamicShearRate needs finite energy, radius, barrierWidth >= 0 and viscosity > 0")
	}
	if energy == 0 {
		return 0
	}
	return energy / (6 * math.Pi * viscosity * radius * radius * barrierWidth)
}

func checkShearArgs(viscosity, shearRate, radius float64) {
	if !(viscosity >= 0) || !(shearRate >= 0) || !(radius >= 0) ||
		math.IsInf(viscosity, 1) || math.IsInf(shearRate, 1) || math.IsInf(radius, 1) {
		panic("physics: shear needs finite non-negative viscosity, shear rate and radius")
	}
}
