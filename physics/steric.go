package physics

import (
	"fmt"
	"math"
)

// SolventQuality classifies the medium as a solvent for the chains of a
// steric stabiliser. Only a better-than-theta solvent makes overlapping
// layers repel; at theta conditions and worse they attract and the
// dispersion flocculates (Napper 1983, ch. 15).
type SolventQuality int

// The zero value is deliberately not a quality, so that a missing choice is
// never mistaken for a good solvent.
const (
	GoodSolvent SolventQuality = iota + 1
	ThetaSolvent
	PoorSolvent
)

// ThetaChiTolerance is the half-width of the band of Flory–Huggins chi
// values read as theta conditions: chi is rarely known to better than the
// second decimal, so 0.495 <= chi <= 0.505 counts as chi = 0.50.
const ThetaChiTolerance = 0.005

// String returns "good", "theta", "poor" or "unknown".
func (q SolventQuality) String() string {
	switch q {
	case GoodSolvent:
		return "good"
	case ThetaSolvent:
		return "theta"
	case PoorSolvent:
		return "poor"
	}
	return "unknown"
}

// ParseSolventQuality reads "good", "theta" or "poor" (the request
// vocabulary) and returns an error for anything else.
func ParseSolventQuality(s string) (SolventQuality, error) {
	switch s {
	case "good":
		return GoodSolvent, nil
	case "theta":
		return ThetaSolvent, nil
	case "poor":
		return PoorSolvent, nil
	}
	return 0, fmt.Errorf("physics: solvent quality %q is not one of good, theta, poor", s)
}

// SolventQualityFromChi classifies a Flory–Huggins interaction parameter
// chi (dimensionless): chi < 0.5 is a good solvent, chi = 0.5 (within
// ThetaChiTolerance) theta, chi > 0.5 poor. It panics on NaN.
//
// References: Flory, Principles of Polymer Chemistry (1953), ch. XII
// (theta point at chi = 1/2); Napper, Polymeric Stabilization of Colloidal
// Dispersions (1983), ch. 15 (flocculation at worse-than-theta conditions).
func SolventQualityFromChi(chi float64) SolventQuality {
	if math.IsNaN(chi) {
		panic("physics: SolventQualityFromChi needs a number")
	}
	switch {
	case chi < 0.5-ThetaChiTolerance:
		return GoodSolvent
	case chi <= 0.5+ThetaChiTolerance:
		return ThetaSolvent
	}
	return PoorSolvent
}

// layerCollapsed reports whether a stabiliser layer with lower-critical
// solution behaviour (poly(ethylene oxide) chains, ethoxylated nonionic
// surfactants) has lost its solvency at the storage temperature: true at
// or above the cloud point (both K). Napper found the critical flocculation
// temperature of sterically stabilised latices close to the theta
// temperature of the free stabilising chains; the cloud point is used here
// as the measurable stand-in for that theta temperature, so the test is
// approximate by a few kelvin. It panics on non-positive or NaN temperatures.
//
// References: Napper, J. Colloid Interface Sci. 58, 390 (1977); Napper,
// Polymeric Stabilization of Colloidal Dispersions (1983), ch. 5 and 15.
func layerCollapsed(storageTempK, cloudPointK float64) bool {
	if !(storageTempK > 0) || !(cloudPointK > 0) {
		panic("physics: layerCollapsed needs positive temperatures")
	}
	return storageTempK >= cloudPointK
}

// StericLayerEffective reports whether a steric layer repels at storage:
// the solvent must be better than theta and, when the stabiliser has a
// cloud point (hasCloudPoint), storage must stay below it (layerCollapsed).
// Temperatures in K; cloudPointK is ignored without a cloud point.
//
// Reference: Napper, Polymeric Stabilization of Colloidal Dispersions
// (1983), ch. 15.
func StericLayerEffective(quality SolventQuality, storageTempK, cloudPointK float64, hasCloudPoint bool) bool {
	if quality != GoodSolvent {
		return false
	}
	return !hasCloudPoint || !layerCollapsed(storageTempK, cloudPointK)
}

// Search limits of MinimumStericThickness, m: below a hundredth of a
// nanometre no layer is needed at all; a layer above a millimetre means no
// steric layer can do the job.
const (
	stericThicknessFloor   = 1e-11
	stericThicknessCeiling = 1e-3
)

// MinimumStericThickness returns the smallest steric layer thickness delta
// (m) for which the van der Waals energy at the closest approach of two
// coated particles, h = 2 delta, is no deeper than allowedKT thermal
// energies: |V(2 delta)| <= allowedKT kB T. vdwAt(h) is the pair energy in
// J at surface separation h in m and must be monotone in h (true of the
// Hamaker sphere–sphere expressions, retarded or not); tempK in K.
//
// The root is found in s = ln(delta) by FindRootNewton to 1e-9, on the side
// where the criterion holds. The first point is the Derjaguin-limit step
// from the 0.01 nm floor: with |V| proportional to 1/h, ln|V| falls by one
// per unit of s, so the root lies excess(floor) past the floor, and no
// further for the Hamaker expressions, which fall faster; the steps after
// it use the secant slope through the last two points (about 8
// evaluations, against 16 for false position over the whole range). It
// returns 0 when even a 0.01 nm layer suffices and +Inf when no layer
// thinner than 1 mm does. It panics if allowedKT or tempK is not positive or
// vdwAt returns NaN.
//
// With the Derjaguin limit V = -A a/(12 h) the answer is A a/(24 kB T
// allowedKT). The criterion follows Napper (1983, ch. 2): a steric layer
// stabilises when it keeps particles apart where the attraction is of
// order kT; 5–10 nm is the usual practical minimum.
//
// Reference: Napper, Polymeric Stabilization of Colloidal Dispersions
// (1983), ch. 2; Hamaker, Physica 4, 1058 (1937) for the energy.
func MinimumStericThickness(vdwAt func(h float64) float64, tempK, allowedKT float64) float64 {
	if !(allowedKT > 0) || !(tempK > 0) {
		panic("physics: MinimumStericThickness needs allowedKT > 0 and tempK > 0")
	}
	logLimit := math.Log(allowedKT * Boltzmann * tempK)
	// excess(s) = ln|V(2 e^s)| - ln(limit) falls through zero at the answer.
	excess := func(s float64) float64 {
		v := vdwAt(2 * math.Exp(s))
		if math.IsNaN(v) {
			panic("physics: MinimumStericThickness: vdwAt returned NaN")
		}
		return math.Log(math.Abs(v)+math.SmallestNonzeroFloat64) - logLimit
	}
	lo, hi := math.Log(stericThicknessFloor), math.Log(stericThicknessCeiling)
	atFloor := excess(lo)
	if atFloor <= 0 {
		return 0
	}
	// margin = -excess rises through zero at the answer; its slope is the
	// Derjaguin one (1) until a secant is known.
	lastS, lastE := lo, atFloor
	margin := func(s float64) (float64, float64) {
		e := excess(s)
		slope := 1.0
		if secant := (lastE - e) / (s - lastS); secant > 0 {
			slope = secant
		}
		lastS, lastE = s, e
		return -e, slope
	}
	hold, _, ok := FindRootNewton(margin, lo+atFloor, lo, hi, 1, 2, 1e-9)
	if !ok {
		return math.Inf(1) // still too deep at 1 mm
	}
	return math.Exp(hold)
}
