package physics

import "math"

// AsakuraOosawa returns the depletion energy in J of two equal spheres of
// radius radius (m) at surface separation h (m) in a solution of
// non-adsorbing polymer (or small particles) of number density numberDensity
// (1/m^3) whose depletion layers have thickness delta (m, about the polymer
// radius of gyration), at temperature tempK (K):
//
//	V = -n kT V_overlap,  V_overlap = (pi/12) (6a + 4 delta + h) (2 delta - h)^2
//
// for h < 2 delta and 0 beyond; V_overlap is the exact lens in which the two
// depletion shells of radius a + delta overlap. At contact it is
// -n kT 2 pi delta^2 (a + 2 delta/3). The osmotic pressure is taken as ideal
// (n kT), valid in the dilute regime below overlap. It panics unless
// radius > 0, h >= 0, delta >= 0, numberDensity >= 0, tempK > 0, all finite.
//
// References: S. Asakura & F. Oosawa, "On interaction between two bodies
// immersed in a solution of macromolecules", J. Chem. Phys. 22 (1954) 1255;
// A. Vrij, "Polymers at interfaces and the interactions in colloidal
// dispersions", Pure Appl. Chem. 48 (1976) 471.
func AsakuraOosawa(radius, h, delta, numberDensity, tempK float64) float64 {
	const maxF = math.MaxFloat64
	if !(radius > 0 && radius <= maxF) || !(h >= 0 && h <= maxF) || !(delta >= 0 && delta <= maxF) ||
		!(numberDensity >= 0 && numberDensity <= maxF) || !(tempK > 0 && tempK <= maxF) {
		panic("physics: AsakuraOosawa needs finite radius > 0, h >= 0, delta >= 0, numberDensity >= 0, tempK > 0")
	}
	gap := 2*delta - h
	if gap <= 0 {
		return 0
	}
	overlap := math.Pi / 12 * (6*radius + 4*delta + h) * gap * gap
	return -numberDensity * Boltzmann * tempK * overlap
}
