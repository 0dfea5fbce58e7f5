package physics

import "math"

// EDLLinearSuperposition returns the double-layer repulsion in J between two
// equal spheres of radius radius (m) at surface separation h (m), surface (or
// Stern, or zeta) potential psi (V), inverse Debye length kappa (1/m),
// relative permittivity epsR, temperature tempK (K) and counter-ion valence z,
// in the linear superposition approximation and the Derjaguin limit:
//
//	V = 32 pi eps0 epsR a (kT/(z e))^2 gamma^2 exp(-kappa h),
//	gamma = tanh(z e psi / (4 kT))
//
// It holds for kappa a > about 5 and kappa h > about 1, at any potential. z is
// the valence of a symmetric z:z electrolyte; for an asymmetric electrolyte
// pass the counter-ion valence and the kappa of the full ionic strength (an
// approximation: the exact nonlinear double layer depends on both valences).
// kappa = 0 means no electrolyte and hence no double layer: the result is 0.
// It panics unless radius > 0, h >= 0, kappa >= 0, epsR > 0, tempK > 0,
// z >= 1 and psi is finite.
//
// References: G. M. Bell, S. Levine & L. N. McCartney, J. Colloid Interface
// Sci. 33 (1970) 335; J. Gregory, J. Colloid Interface Sci. 51 (1975) 44;
// J. N. Israelachvili, Intermolecular and Surface Forces, 3rd ed. (2011),
// eq. 14.53.
func EDLLinearSuperposition(radius, h, psi, kappa, epsR, tempK float64, z int) float64 {
	checkEDLArgs(radius, h, psi, kappa, epsR)
	if !(tempK > 0 && tempK <= math.MaxFloat64) || z < 1 {
		panic("physics: EDLLinearSuperposition needs tempK > 0 and valence z >= 1")
	}
	if kappa == 0 {
		return 0
	}
	return lsaPrefactor(radius, psi, epsR, tempK, z) * math.Exp(-kappa*h)
}

// lsaPrefactor is the contact value 32 pi eps a (kT/ze)^2 gamma^2 of the
// linear superposition repulsion (J).
func lsaPrefactor(radius, psi, epsR, tempK float64, z int) float64 {
	thermal := Boltzmann * tempK / (float64(z) * ElementaryCharge)
	gamma := math.Tanh(psi / (4 * thermal))
	return 32 * math.Pi * VacuumPermittivity * epsR * radius * thermal * thermal * gamma * gamma
}

// EDLHoggHealyFuerstenau returns the constant-potential double-layer
// repulsion in J between two equal spheres of radius radius (m) at surface
// separation h (m), potential psi (V), inverse Debye length kappa (1/m) and
// relative permittivity epsR:
//
//	V = 2 pi eps0 epsR a psi^2 ln(1 + exp(-kappa h))
//
// It linearises the Poisson–Boltzmann equation (|psi| below about 25 mV) and
// needs kappa a > about 10. kappa = 0 (no electrolyte) gives 0. It panics
// unless radius > 0, h >= 0, kappa >= 0, epsR > 0 and psi is finite.
//
// Reference: R. Hogg, T. W. Healy & D. W. Fuerstenau, "Mutual coagulation of
// colloidal dispersions", Trans. Faraday Soc. 62 (1966) 1638, equal-sphere
// case of their eq. for constant potential.
func EDLHoggHealyFuerstenau(radius, h, psi, kappa, epsR float64) float64 {
	checkEDLArgs(radius, h, psi, kappa, epsR)
	if kappa == 0 {
		return 0
	}
	return hhfPrefactor(radius, psi, epsR) * math.Log1p(math.Exp(-kappa*h))
}

// hhfPrefactor is 2 pi eps a psi^2 (J).
func hhfPrefactor(radius, psi, epsR float64) float64 {
	return 2 * math.Pi * VacuumPermittivity * epsR * radius * psi * psi
}

func checkEDLArgs(radius, h, psi, kappa, epsR float64) {
	const maxF = math.MaxFloat64
	if !(radius > 0 && radius <= maxF) || !(h >= 0 && h <= maxF) || !(kappa >= 0 && kappa <= maxF) ||
		!(epsR > 0 && epsR <= maxF) || math.IsNaN(psi) || math.IsInf(psi, 0) {
		panic("physics: double-layer energy needs finite radius > 0, h >= 0, kappa >= 0, epsR > 0 and psi")
	}
}
