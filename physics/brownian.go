package physics

import "math"

// StokesEinsteinDiffusion returns the translational diffusion coefficient
// D = kT / (6 pi eta a), in m^2/s, of an isolated sphere of radius (m) in a
// liquid of viscosity (Pa s) at temperature tempK (K): Einstein's relation
// D = kT/f with the Stokes friction f = 6 pi eta a (no-slip sphere, creeping
// flow, infinite dilution).
//
// It panics on a non-positive or non-finite radius, viscosity or tempK.
//
// References: A. Einstein, "Über die von der molekularkinetischen Theorie der
// Wärme geforderte Bewegung von in ruhenden Flüssigkeiten suspendierten
// Teilchen", Ann. Phys. 17, 549–560 (1905); W. Sutherland, Phil. Mag.
// (6) 9, 781–785 (1905).
func StokesEinsteinDiffusion(radius, viscosity, tempK float64) float64 {
	if !(radius > 0 && radius <= math.MaxFloat64) || !(viscosity > 0 && viscosity <= math.MaxFloat64) ||
		!(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: StokesEinsteinDiffusion needs finite radius, viscosity and tempK > 0")
	}
	return Boltzmann * tempK / (6 * math.Pi * viscosity * radius)
}
