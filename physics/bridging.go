package physics

import (
	"fmt"
	"math"
)

// Rule-of-thumb limits of BridgingLikely [common practice]. Bridging
// flocculants are linear polymers of about 1e6 g/mol and more; La Mer and
// Healy's collision efficiency theta (1 - theta) falls below 36 % of its
// optimum outside 0.1 <= theta <= 0.9.
const (
	BridgingMinMolarMass = 1e3 // kg/mol, i.e. 1e6 g/mol
	BridgingMinCoverage  = 0.1 // fraction of the adsorption plateau
	BridgingMaxCoverage  = 0.9
)

// BridgingLikely applies the rules of thumb for bridging flocculation by an
// adsorbing polymer and says which one decided. All must hold:
//
//   - partial coverage: BridgingMinCoverage <= surfaceCoverage <=
//     BridgingMaxCoverage (fraction of the adsorption plateau; La Mer &
//     Healy 1963: bridging is strongest at half coverage and absent at full
//     coverage, where no bare surface is left to bridge to);
//   - high molar mass: molarMass (kg/mol) >= BridgingMinMolarMass;
//   - reach: the coil diameter 2 polymerSize, with polymerSize the radius of
//     gyration in m (see PolymerCoilSize), exceeds the range that keeps the
//     surfaces apart, taken as the smaller of 2 debyeLength and the gap at
//     the barrier (both m). A debyeLength of 0 or +Inf means no double
//     layer and a gap <= 0 or +Inf means no barrier known; with neither
//     there is no range to span and the reach test passes.
//
// It panics on negative or NaN arguments and on a coverage above 1.
//
// The reach test is common practice: a chain shorter than the distance at
// which the double layers hold the particles cannot touch the second
// surface.
//
// References: La Mer & Healy, Rev. Pure Appl. Chem. 13, 112 (1963); Fleer,
// Cohen Stuart, Scheutjens, Cosgrove & Vincent, Polymers at Interfaces
// (1993).
func BridgingLikely(molarMass, surfaceCoverage, polymerSize, debyeLength, gap float64) (likely bool, reason string) {
	if !(molarMass >= 0) || !(surfaceCoverage >= 0 && surfaceCoverage <= 1) ||
		!(polymerSize >= 0) || !(debyeLength >= 0) || math.IsNaN(gap) {
		panic("physics: BridgingLikely needs non-negative arguments and coverage <= 1")
	}
	switch {
	case surfaceCoverage < BridgingMinCoverage:
		return false, fmt.Sprintf("surface coverage %.2f is too low for bridges to form often (La Mer–Healy optimum 0.5)", surfaceCoverage)
	case surfaceCoverage > BridgingMaxCoverage:
		return false, fmt.Sprintf("surface coverage %.2f leaves almost no bare surface to bridge to (La Mer–Healy optimum 0.5)", surfaceCoverage)
	case molarMass < BridgingMinMolarMass:
		return false, fmt.Sprintf("molar mass %.3g kg/mol is below the ~1000 kg/mol of bridging flocculants", molarMass)
	}
	reach := 2 * polymerSize
	span := math.Inf(1)
	if debyeLength > 0 && !math.IsInf(debyeLength, 1) {
		span = 2 * debyeLength
	}
	if gap > 0 && gap < span {
		span = gap
	}
	if math.IsInf(span, 1) {
		return true, fmt.Sprintf("coverage %.2f and molar mass %.3g kg/mol favour bridging and no repulsion range keeps the surfaces apart", surfaceCoverage, molarMass)
	}
	if reach <= span {
		return false, fmt.Sprintf("coil diameter %.3g nm does not span the %.3g nm repulsion range", reach*1e9, span*1e9)
	}
	return true, fmt.Sprintf("coverage %.2f, molar mass %.3g kg/mol and a coil diameter of %.3g nm spanning the %.3g nm repulsion range favour bridging",
		surfaceCoverage, molarMass, reach*1e9, span*1e9)
}

// PolymerCoilSize returns the radius of gyration (m) of poly(ethylene
// oxide) in water at 25 C, a flexible coil in a good solvent, from its
// molar mass in kg/mol:
//
//	Rg = 0.0215 nm * (M / (g/mol))^0.583
//
// The fit covers about 1e4 to 1e6 g/mol; beyond it the value is an
// extrapolation along the same good-solvent exponent. Other flexible
// water-soluble polymers are of the same order, not the same value. It
// panics on a negative or NaN molar mass (+Inf gives +Inf).
//
// Reference: Devanand & Selser, Macromolecules 24, 5943 (1991).
func PolymerCoilSize(molarMass float64) float64 {
	if !(molarMass >= 0) {
		panic("physics: PolymerCoilSize needs molarMass >= 0")
	}
	return 0.0215e-9 * math.Pow(molarMass*1e3, 0.583)
}

// OverlapConcentration returns the overlap concentration c* (kg/m^3) at
// which coils of molar mass M (kg/mol) and radius of gyration Rg (m) fill
// the solution, c* = 3 M / (4 pi NA Rg^3); above it free polymer is
// semidilute and depletion theory for dilute coils no longer holds. +Inf
// for Rg = 0. It panics on negative, infinite or NaN arguments.
//
// Reference: de Gennes, Scaling Concepts in Polymer Physics (1979), ch. III.
func OverlapConcentration(molarMass, radiusOfGyration float64) float64 {
	if !(molarMass >= 0) || !(radiusOfGyration >= 0) || math.IsInf(molarMass, 1) || math.IsInf(radiusOfGyration, 1) {
		panic("physics: OverlapConcentration needs finite non-negative arguments")
	}
	if radiusOfGyration == 0 {
		return math.Inf(1)
	}
	return 3 * molarMass / (4 * math.Pi * Avogadro * radiusOfGyration * radiusOfGyration * radiusOfGyration)
}

// PolymerNumberDensity returns the number of chains per m^3 for a mass
// concentration in kg/m^3 (numerically g/L) and molar mass in kg/mol:
// n = c NA / M. It panics unless both are finite, concentration >= 0 and
// molarMass > 0.
//
// Reference: definition of the mole (SI Brochure, 9th ed., 2019).
func PolymerNumberDensity(concentration, molarMass float64) float64 {
	if !(concentration >= 0) || !(molarMass > 0) || math.IsInf(concentration, 1) || math.IsInf(molarMass, 1) {
		panic("physics: PolymerNumberDensity needs finite concentration >= 0 and molarMass > 0")
	}
	return concentration * Avogadro / molarMass
}
