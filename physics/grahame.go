package physics

import "math"

// GrahameCharge returns the surface charge density sigma, in C/m^2, that
// balances the diffuse double layer of a flat surface at the diffuse-layer
// (Stern-plane) potential psiD (V), in the electroneutral ion mixture ions
// (mol/m^3), of relative permittivity epsR, at temperature tempK (K):
//
//	sigma^2 = 2 eps0 epsR kT NA sum_i c_i (exp(-z_i e psiD/kT) - 1),
//
// sigma of the sign of psiD. For a z:z electrolyte of concentration c it is
// sqrt(8 eps0 epsR kT NA c) sinh(z e psiD / 2kT) (0.1174 sqrt(c / (mol/L))
// sinh(psiD / 51.4 mV) C/m^2 for 1:1 in water at 25 °C). Without charged
// ions it is 0; it may be +-Inf where the Boltzmann factors overflow.
//
// It panics on a non-finite psiD, epsR <= 0, tempK <= 0, a negative or
// non-finite concentration, or a mixture that is not electroneutral.
//
// References: D. C. Grahame, "The electrical double layer and the theory of
// electrocapillarity", Chem. Rev. 41 (1947) 441, eq. for sigma in an
// arbitrary electrolyte; R. J. Hunter, Foundations of Colloid Science, 2nd
// ed. (Oxford, 2001), sec. 7.4.
func GrahameCharge(psiD float64, ions []Ion, epsR, tempK float64) float64 {
	if math.IsNaN(psiD) || math.IsInf(psiD, 0) || !(epsR > 0 && epsR <= math.MaxFloat64) ||
		!(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: GrahameCharge needs a finite psiD, epsR > 0 and tempK > 0")
	}
	m := newPBMixture(ions, "GrahameCharge")
	kT := Boltzmann * tempK
	return m.grahame(psiD*ElementaryCharge/kT, epsR, kT)
}

// grahame returns GrahameCharge at the reduced potential y = e psiD/kT;
// kT in J.
func (m pbMixture) grahame(y, epsR, kT float64) float64 {
	if m.s == 0 || y == 0 {
		return 0
	}
	// sum c_i (exp(-z_i y) - 1) = s G(y) / 2.
	sigma := math.Sqrt(VacuumPermittivity * epsR * kT * Avogadro * m.s * m.fieldSquared(y))
	return math.Copysign(sigma, y)
}
