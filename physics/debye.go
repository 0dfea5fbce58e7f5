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

// DebyeLength returns 1/kappa in m (see DebyeKappa); +Inf without ions.
func DebyeLength(ionicStrength, epsR, tempK float64) float64 {
	return 1 / DebyeKappa(ionicStrength, epsR, tempK)
}

// ionicStrengthOfKappa inverts DebyeKappa: I = eps0 epsR kB T kappa^2 /
// (2 NA e^2), in mol/m^3 (Debye & Hückel 1923, solved for I).
func ionicStrengthOfKappa(kappa, epsR, tempK float64) float64 {
	return kappa * kappa * VacuumPermittivity * epsR * Boltzmann * tempK /
		(2 * Avogadro * ElementaryCharge * ElementaryCharge)
}
