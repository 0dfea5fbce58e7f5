package physics

import "math"

// MaxPackingCap is the largest maximum packing fraction
// MaxPackingPolydisperse returns: 1 - (1 - 0.64)^2 = 0.8704, the densest
// random packing of two widely separated sizes (Furnas, Ind. Eng. Chem. 23,
// 1052 (1931)). The Ouchiyama–Tanaka expression overshoots this bound for
// widely separated binary mixtures, so nothing above it is trusted.
const MaxPackingCap = 1 - (1-RandomClosePacking)*(1-RandomClosePacking)

// MaxPackingPolydisperse returns the random close packing fraction of
// spheres with the size distribution of classes (normalised), from the
// model of Ouchiyama & Tanaka with the monodisperse packing
// RandomClosePacking:
//
//	phi = sum f D^3 / ( sum f (D-Db)^3 H(D-Db)
//	                   + (1/beta) sum f [(D+Db)^3 - (D-Db)^3 H(D-Db)] )
//	beta = 1 + (4/13)(8 phi0 - 1) Db sum f (D+Db)^2 (1 - 3 Db/(8 (D+Db)))
//	                              / sum f [D^3 - (D-Db)^3 H(D-Db)]
//
// with f the number fractions (volume fraction / D^3, normalised), Db the
// number-mean diameter and H the unit step. A single size gives exactly
// RandomClosePacking; wider distributions pack more densely; the result
// is capped at MaxPackingCap. It panics on no classes.
//
// Reference: Ouchiyama & Tanaka, "Porosity of a mass of solid particles
// having a range of sizes", Ind. Eng. Chem. Fundam. 20, 66 (1981).
func MaxPackingPolydisperse(classes []SizeClass) float64 {
	if len(classes) == 0 {
		panic("physics: MaxPackingPolydisperse needs at least one class")
	}
	// Diameters relative to the largest keep every power of D near 1.
	dRef := 0.0
	for _, c := range classes {
		dRef = math.Max(dRef, c.Diameter)
	}
	count, mean := 0.0, 0.0
	for _, c := range classes {
		x := c.Diameter / dRef
		n := c.VolumeFraction / (x * x * x)
		count += n
		mean += n * x
	}
	if count == 0 {
		return RandomClosePacking
	}
	mean /= count
	var solid, large, betaNum, betaDen, shell float64
	for _, c := range classes {
		x := c.Diameter / dRef
		f := c.VolumeFraction / (x * x * x) / count
		over := 0.0
		if x > mean {
			over = (x - mean) * (x - mean) * (x - mean)
		}
		sum := x + mean
		solid += f * x * x * x
		large += f * over
		betaNum += f * sum * sum * (1 - 3*mean/(8*sum))
		betaDen += f * (x*x*x - over)
		shell += f * (sum*sum*sum - over)
	}
	beta := 1 + 4.0/13*(8*RandomClosePacking-1)*mean*betaNum/betaDen
	return math.Min(solid/(large+shell/beta), MaxPackingCap)
}
