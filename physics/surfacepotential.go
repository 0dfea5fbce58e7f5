package physics

import "math"

// PHDistanceForStability is the distance in pH units from the isoelectric
// point within which most charge-stabilised dispersions are unstable
// (common practice; no single published source).
const PHDistanceForStability = 2.0

// slipPlaneNernstFraction is the fraction of the Nernst slope that the
// diffuse-layer (zeta) potential follows near the isoelectric point. The value
// 1/4 is common practice, not a published constant: with it the estimate
// below crosses the usual 30 mV stability line about PHDistanceForStability
// pH units from the isoelectric point, as the two rules of thumb require.
const slipPlaneNernstFraction = 0.25

// SurfacePotentialFromPH returns an estimate in V of the diffuse-layer
// (zeta-like) potential of an oxide-type surface at pH pH, for a material
// with isoelectric point iep, at temperature tempK (K). Use it only when no
// zeta potential or mobility is measured.
//
// The Nernst equation for the potential-determining ion H+,
// psi_N = ln(10) (kT/e) (iep - pH), bounds the surface potential; measured
// zeta potentials follow only a fraction alpha of that slope and level off
// far from the IEP. The estimate maps alpha psi_N through the Gouy–Chapman
// relation between the potential of a charged plane and its far-field
// (effective) potential,
//
//	psi = (4kT/e) tanh(e alpha psi_N / (4kT)),  alpha = 1/4 (common practice)
//
// so it is zero at the IEP, negative above it, odd and monotone in pH - iep,
// its slope at the IEP is alpha times the Nernst slope, and its magnitude
// never exceeds the Gouy–Chapman saturation 4kT/e (102.8 mV at 25 °C). Real
// surfaces scatter widely about it with ionic strength, specific adsorption
// and site density. It panics unless tempK > 0 and pH and iep are finite.
//
// References: W. Nernst, Z. Phys. Chem. 4 (1889) 129 (Nernst equation);
// R. J. Hunter, Zeta Potential in Colloid Science (Academic Press, 1981),
// ch. 2 (Nernstian oxide surfaces and their sub-Nernstian zeta potentials);
// E. J. W. Verwey & J. Th. G. Overbeek, Theory of the Stability of Lyophobic
// Colloids (Elsevier, 1948), ch. II (Gouy–Chapman far field 4kT/e tanh(e psi/4kT)).
func SurfacePotentialFromPH(pH, iep, tempK float64) float64 {
	if !(tempK > 0) || math.IsNaN(pH) || math.IsInf(pH, 0) || math.IsNaN(iep) || math.IsInf(iep, 0) {
		panic("physics: SurfacePotentialFromPH needs finite pH and iep and tempK > 0")
	}
	thermal := Boltzmann * tempK / ElementaryCharge
	nernst := math.Ln10 * thermal * (iep - pH)
	return 4 * thermal * math.Tanh(slipPlaneNernstFraction*nernst/(4*thermal))
}
