package physics

import (
	"fmt"
	"math"
)

// FloryChi returns the Flory-Huggins interaction parameter chi
// (dimensionless) of a polymer in a solvent at temperature tempK (K), from
// the theta temperature thetaK (K) and the entropy-of-dilution parameter
// psi (dimensionless) by Flory's relation
//
//	1/2 - chi = psi (1 - theta/T).
//
// chi is 1/2 at T = theta. Chains with an upper theta point (most polymers
// in organic solvents) have psi > 0; poly(ethylene oxide) chains in water,
// which lose solvency on heating, have psi < 0, so chi rises towards 1/2 as
// T approaches theta from below.
//
// It panics on a non-positive or non-finite temperature or a non-finite psi.
//
// Reference: P. J. Flory, Principles of Polymer Chemistry (Cornell, 1953),
// ch. XII (the heat and entropy parameters kappa and psi of dilution, and
// theta = kappa T / psi).
func FloryChi(tempK, thetaK, psi float64) float64 {
	if !(tempK > 0) || math.IsInf(tempK, 1) || !(thetaK > 0) || math.IsInf(thetaK, 1) ||
		math.IsNaN(psi) || math.IsInf(psi, 0) {
		panic("physics: FloryChi needs finite temperatures > 0 and a finite psi")
	}
	return 0.5 - psi*(1-thetaK/tempK)
}

// CloudPointLayerFactor returns the thickness of a polyethoxylated steric
// layer at temperature tempK relative to its thickness at refTempK (both
// K; dimensionless: 1 at refTempK, above 1 below it), as the storage
// temperature approaches the stabiliser's cloud point cloudPointK:
//
//	L(T)/L(Tref) = [ ((theta - T)/T) / ((theta - Tref)/Tref) ]^(1/3),
//
// and 0 at or above the cloud point. It combines three published results:
// a grafted layer in a good solvent is as thick as L ~ N a (v sigma)^(1/3)
// with excluded volume v ~ (1 - 2 chi) a^3 (Alexander; de Gennes); Flory's
// 1 - 2 chi = 2 psi (1 - theta/T) (FloryChi), whose psi cancels in the
// ratio; and the cloud point taken for the theta temperature, as Napper
// found the critical flocculation temperature of PEO-stabilised latices
// within a few kelvin of the chains' theta point.
//
// Near theta the layer does not vanish as the cube root says: three-body
// repulsion keeps it at a finite, marginal thickness. The factor therefore
// errs towards a thinner layer within a few kelvin of the cloud point,
// which is the safe side for judging stability.
//
// It panics unless 0 < refTempK < cloudPointK and tempK > 0, all finite.
//
// References: S. Alexander, J. Phys. (Paris) 38, 983 (1977); P.-G. de
// Gennes, Macromolecules 13, 1069 (1980); P. J. Flory, Principles of
// Polymer Chemistry (1953), ch. XII; D. H. Napper, J. Colloid Interface
// Sci. 58, 390 (1977).
func CloudPointLayerFactor(tempK, cloudPointK, refTempK float64) float64 {
	checkCloudPointArgs("CloudPointLayerFactor", cloudPointK, refTempK)
	if !(tempK > 0) || math.IsInf(tempK, 1) {
		panic("physics: CloudPointLayerFactor needs a finite tempK > 0")
	}
	if tempK >= cloudPointK {
		return 0
	}
	return math.Cbrt(((cloudPointK - tempK) / tempK) / ((cloudPointK - refTempK) / refTempK))
}

// CloudPointMaxTemp inverts CloudPointLayerFactor: the highest temperature,
// in K, at which the layer keeps at least the fraction factor (0 < factor
// <= 1) of its thickness at refTempK,
//
//	T = theta / (1 + factor^3 (theta - Tref)/Tref).
//
// With factor = L_min / L(Tref), L_min the thinnest layer that still
// shields the van der Waals attraction (MinimumStericThickness), it is the
// largest storage temperature that keeps the steric layer effective. It
// panics unless 0 < refTempK < cloudPointK and 0 < factor <= 1, all finite.
//
// Reference: as CloudPointLayerFactor, solved for T.
func CloudPointMaxTemp(cloudPointK, refTempK, factor float64) float64 {
	checkCloudPointArgs("CloudPointMaxTemp", cloudPointK, refTempK)
	if !(factor > 0 && factor <= 1) {
		panic("physics: CloudPointMaxTemp needs 0 < factor <= 1")
	}
	return cloudPointK / (1 + factor*factor*factor*(cloudPointK-refTempK)/refTempK)
}

func checkCloudPointArgs(name string, cloudPointK, refTempK float64) {
	if !(refTempK > 0) || !(cloudPointK > refTempK) || math.IsInf(cloudPointK, 1) {
		panic(fmt.Sprintf("physics: %s needs finite 0 < refTempK < cloudPointK", name))
	}
}
