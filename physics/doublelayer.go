package physics

import "math"

// lsaPrefactor is the contact value, in J, of the double-layer repulsion
// between two equal spheres of radius a (m) with surface (Stern, zeta)
// potential psi (V) in a medium of relative permittivity epsR at tempK (K)
// with counter-ions of valence z, in the linear superposition
// approximation and the Derjaguin limit (Pair.Parts):
//
//	V = 32 pi eps0 epsR a (kT/(z e))^2 gamma^2 exp(-kappa h),
//	gamma = tanh(z e psi / (4 kT))
//
// It holds for kappa a > about 5 and kappa h > about 1, at any potential.
// z is the valence of a symmetric z:z electrolyte; an asymmetric mixture
// takes its exact far field instead (lsaContact).
//
// References: G. M. Bell, S. Levine & L. N. McCartney, J. Colloid Interface
// Sci. 33 (1970) 335; J. Gregory, J. Colloid Interface Sci. 51 (1975) 44;
// J. N. Israelachvili, Intermolecular and Surface Forces, 3rd ed. (2011),
// eq. 14.53.
func lsaPrefactor(radius, psi, epsR, tempK float64, z int) float64 {
	thermal := Boltzmann * tempK / (float64(z) * ElementaryCharge)
	gamma := ReducedSurfacePotential(psi, tempK, z)
	return 32 * math.Pi * VacuumPermittivity * epsR * radius * thermal * thermal * gamma * gamma
}

// lsaContact is the contact value, in J, of the linear superposition
// double layer of p: lsaPrefactor with the counter-ion valence when p has no
// ion mixture or a z:z one (WithIons), else the same expression written
// with the far-field potential psi_eff of the mixture,
//
//	V = 2 pi eps0 epsR a psi_eff^2 exp(-kappa h),  psi_eff = FarFieldPotential(psi, ions),
//
// which for z:z is (4kT/ze) tanh(ze psi/4kT) and so lsaPrefactor itself.
// psi_eff comes from the pair's memo when it was computed for the present
// potential (WithIons, WithPotential), else afresh.
//
// Reference: as lsaPrefactor; H. Ohshima, Theory of Colloid and Interfacial
// Electric Phenomena (Elsevier, 2006), ch. 1 (far field of a plate in an
// arbitrary electrolyte, linear superposition with it).
func (p Pair) lsaContact() float64 {
	if p.far.mix.s > 0 {
		eff := p.far.eff
		if p.far.psi != p.Potential {
			eff = p.far.mix.farFieldPotential(p.Potential, p.TempK)
		}
		return 2 * math.Pi * VacuumPermittivity * p.EpsR * p.Radius * eff * eff
	}
	return lsaPrefactor(p.Radius, p.Potential, p.EpsR, p.TempK, max(p.Valence, 1))
}

// commonValence returns the valence magnitude shared by every charged ion of
// positive concentration in ions, 0 when there is none, and whether they
// share one (a z:z electrolyte, or no charged ion at all).
func commonValence(ions []Ion) (z int, symmetric bool) {
	for _, ion := range ions {
		if ion.Valence == 0 || !(ion.Concentration > 0) {
			continue
		}
		m := ion.Valence
		if m < 0 {
			m = -m
		}
		switch {
		case z == 0:
			z = m
		case m != z:
			return 0, false
		}
	}
	return z, true
}

// ReducedSurfacePotential returns the dimensionless reduced potential
//
//	gamma = tanh(z e psi / (4 kT))
//
// of a surface at potential psi (V) in a z:z electrolyte at tempK (K): the
// amplitude of the far field of a flat Gouy–Chapman double layer, between
// -1 and 1 with the sign of psi. It is about z e psi/(4 kT) at low
// potential and tends to ±1 at high potential. It panics on a non-finite
// psi, a non-positive or non-finite tempK, or z < 1.
//
// Reference: E. J. W. Verwey & J. Th. G. Overbeek, Theory of the Stability
// of Lyophobic Colloids (1948), ch. II (the Gouy–Chapman double layer,
// gamma = tanh(z e psi/4kT)).
func ReducedSurfacePotential(psi, tempK float64, z int) float64 {
	if math.IsNaN(psi) || math.IsInf(psi, 0) || !(tempK > 0 && tempK <= math.MaxFloat64) || z < 1 {
		panic("physics: ReducedSurfacePotential needs a finite psi, tempK > 0 and z >= 1")
	}
	thermal := Boltzmann * tempK / (float64(z) * ElementaryCharge)
	return math.Tanh(psi / (4 * thermal))
}

// hhfPrefactor is the prefactor 2 pi eps0 epsR a psi^2, in J, of the
// constant-potential double-layer repulsion between two equal spheres of
// radius a (m) at potential psi (V) in a medium of relative permittivity
// epsR (Pair.Parts with ConstantPotential):
//
//	V = 2 pi eps0 epsR a psi^2 ln(1 + exp(-kappa h))
//
// It linearises the Poisson–Boltzmann equation (|psi| below about 25 mV) and
// needs kappa a > about 10.
//
// Reference: R. Hogg, T. W. Healy & D. W. Fuerstenau, "Mutual coagulation of
// colloidal dispersions", Trans. Faraday Soc. 62 (1966) 1638, equal-sphere
// case of their eq. for constant potential.
func hhfPrefactor(radius, psi, epsR float64) float64 {
	return 2 * math.Pi * VacuumPermittivity * epsR * radius * psi * psi
}
