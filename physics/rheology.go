package physics

import "math"

// RandomClosePacking is the volume fraction of randomly close-packed equal
// spheres (Scott & Kilgour, J. Phys. D 2, 863 (1969)), the default maximum
// packing fraction of the Krieger–Dougherty law at low shear.
const RandomClosePacking = 0.64

// DefaultIntrinsicViscosity is Einstein's intrinsic viscosity of hard
// spheres, 5/2: a dilute suspension has the relative viscosity 1 + 2.5 phi
// (Einstein, Ann. Phys. 19, 289 (1906); 34, 591 (1911)).
const DefaultIntrinsicViscosity = 2.5

// KriegerDougherty returns the relative viscosity (1 - phi/phiMax)^(-intrinsic
// phiMax) of a suspension at volume fraction phi with maximum packing
// fraction phiMax (0 < phiMax <= 1) and intrinsic viscosity intrinsic
// (> 0; 2.5 for spheres). It is +Inf at phi >= phiMax (the suspension is
// jammed). It panics on phi < 0 or NaN and on parameters out of range.
//
// Reference: Krieger & Dougherty, Trans. Soc. Rheol. 3, 137 (1959), eq. 13.
func KriegerDougherty(phi, phiMax, intrinsic float64) float64 {
	checkKriegerDougherty(phiMax, intrinsic)
	if !(phi >= 0) {
		panic("physics: KriegerDougherty needs phi >= 0")
	}
	if phi >= phiMax {
		return math.Inf(1)
	}
	return math.Pow(1-phi/phiMax, -intrinsic*phiMax)
}

// MaxVolumeFractionForViscosity inverts KriegerDougherty: the largest
// volume fraction whose relative viscosity does not exceed relViscosity,
// phi = phiMax (1 - relViscosity^(-1/(intrinsic phiMax))). It is 0 for
// relViscosity <= 1 and phiMax for relViscosity = +Inf. It panics on NaN
// and on parameters out of KriegerDougherty's range.
//
// Reference: Krieger & Dougherty, Trans. Soc. Rheol. 3, 137 (1959), eq. 13
// solved for phi.
func MaxVolumeFractionForViscosity(relViscosity, phiMax, intrinsic float64) float64 {
	checkKriegerDougherty(phiMax, intrinsic)
	if math.IsNaN(relViscosity) {
		panic("physics: MaxVolumeFractionForViscosity needs a number")
	}
	if relViscosity <= 1 {
		return 0
	}
	return phiMax * (1 - math.Pow(relViscosity, -1/(intrinsic*phiMax)))
}

// EffectiveVolumeFraction returns the volume fraction phi (1 + shell/a)^3
// of particles of radius a (m) swollen by a shell of thickness shell (m):
// a steric layer, or the Debye length as the excluded shell of a charged
// particle at low ionic strength. The result may exceed the maximum
// packing fraction, and 1; callers compare it with one. It panics unless
// phi >= 0, radius > 0 and shell >= 0, all finite.
//
// Reference: Russel, Saville & Schowalter, Colloidal Dispersions (1989)
// (effective hard-sphere diameter of soft and charged spheres).
func EffectiveVolumeFraction(phi, radius, shell float64) float64 {
	if !(phi >= 0) || !(radius > 0) || !(shell >= 0) || math.IsInf(phi, 1) ||
		math.IsInf(radius, 1) || math.IsInf(shell, 1) {
		panic("physics: EffectiveVolumeFraction needs finite phi >= 0, radius > 0, shell >= 0")
	}
	g := 1 + shell/radius
	return phi * g * g * g
}

func checkKriegerDougherty(phiMax, intrinsic float64) {
	if !(phiMax > 0 && phiMax <= 1) || !(intrinsic > 0) || math.IsInf(intrinsic, 1) {
		panic("physics: Krieger–Dougherty needs 0 < phiMax <= 1 and finite intrinsic > 0")
	}
}
