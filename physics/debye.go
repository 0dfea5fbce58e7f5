package physics

import "math"

// DebyeKappa returns the inverse Debye screening length kappa in 1/m for an
// electrolyte of ionic strength I (mol/m^3, I = 1/2 sum c_i z_i^2) in a
// medium of relative permittivity epsR at temperature tempK (K):
//
//	kappa^2 = 2 NA e^2 I / (eps0 epsR kB T)
//
// An ionic strength of zero gives kappa = 0 (no double layer). Negative or
// non-finite arguments are programmer errors and panic.
//
// References: Debye & Hückel, Phys. Z. 24, 185 (1923); Israelachvili,
// Intermolecular and Surface Forces, 3rd ed. (2011), eq. 14.36.
func DebyeKappa(ionicStrength, epsR, tempK float64) float64 {
	if !(ionicStrength >= 0) || !(epsR > 0) || !(tempK > 0) {
		panic("physics: DebyeKappa needs ionicStrength >= 0, epsR > 0, tempK > 0")
	}
	return math.Sqrt(2 * Avogadro * ElementaryCharge * ElementaryCharge * ionicStrength /
		(VacuumPermittivity * epsR * Boltzmann * tempK))
}

// ionicStrengthOfKappa inverts DebyeKappa: I = eps0 epsR kB T kappa^2 /
// (2 NA e^2), in mol/m^3 (Debye & Hückel 1923, solved for I).
func ionicStrengthOfKappa(kappa, epsR, tempK float64) float64 {
	return kappa * kappa * VacuumPermittivity * epsR * Boltzmann * tempK /
		(2 * Avogadro * ElementaryCharge * ElementaryCharge)
}

// DoubleLayerRange returns the range, in m, over which the double-layer
// repulsion between spheres of radius (m, > 0) acts: the Debye length
// 1/kappa (kappa in 1/m, >= 0), at most the radius. The repulsion decays as
// exp(-kappa h); where the Debye length exceeds the radius (kappa a < 1) the
// particle's own size bounds the range instead. kappa = 0 (no ions) gives
// the radius. It panics on a negative or non-finite kappa or a non-positive
// or non-finite radius.
//
// References: E. J. W. Verwey & J. Th. G. Overbeek, Theory of the Stability
// of Lyophobic Colloids (1948), ch. IV (decay length 1/kappa); the cap at
// the radius is common practice.
func DoubleLayerRange(kappa, radius float64) float64 {
	if !(kappa >= 0 && kappa <= math.MaxFloat64) || !(radius > 0 && radius <= math.MaxFloat64) {
		panic("physics: DoubleLayerRange needs finite kappa >= 0 and radius > 0")
	}
	return 1 / math.Max(kappa, 1/radius)
}
