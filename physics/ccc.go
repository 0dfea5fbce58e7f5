package physics

import "math"

// CCCHighPotential returns the critical coagulation concentration in mol/m^3
// of a symmetric z:z electrolyte for equal spheres with Hamaker constant
// hamaker (J, > 0) and reduced surface potential gamma = tanh(z e psi/(4 kT))
// (0 <= |gamma| <= 1), in a medium of relative permittivity epsR at tempK (K).
// It is the concentration at which the barrier of
//
//	V = -A a/(12 h) + 32 pi eps a (kT/(z e))^2 gamma^2 exp(-kappa h)
//
// vanishes (V = 0 and dV/dh = 0 together, which gives kappa h = 1):
//
//	c = 73728 pi^2 eps^3 (kT)^5 gamma^4 / (exp(2) NA e^6 z^6 A^2)
//
// independent of radius. At high potential (gamma -> 1) it scales as z^-6
// (Schulze–Hardy 1 : 1/64 : 1/729); at low potential gamma ~ z, so z^-2.
// A = 0 returns +Inf (no attraction, no coagulation). It panics unless
// hamaker >= 0, |gamma| <= 1, epsR > 0, tempK > 0 (all finite) and z >= 1.
//
// References: B. Derjaguin & L. Landau, Acta Physicochim. URSS 14 (1941) 633;
// E. J. W. Verwey & J. Th. G. Overbeek, Theory of the Stability of Lyophobic
// Colloids (1948), ch. X; with the linear superposition repulsion of
// Pair (Bell, Levine & McCartney 1970; Gregory 1975).
func CCCHighPotential(hamaker, gamma, epsR, tempK float64, z int) float64 {
	const maxF = math.MaxFloat64
	if !(hamaker >= 0 && hamaker <= maxF) || !(math.Abs(gamma) <= 1) || !(epsR > 0 && epsR <= maxF) ||
		!(tempK > 0 && tempK <= maxF) || z < 1 {
		panic("physics: CCCHighPotential needs hamaker >= 0, |gamma| <= 1, epsR > 0, tempK > 0, z >= 1")
	}
	if hamaker == 0 {
		return math.Inf(1)
	}
	eps := VacuumPermittivity * epsR
	kT := Boltzmann * tempK
	e2 := ElementaryCharge * ElementaryCharge
	g2 := gamma * gamma
	zf := float64(z)
	z6 := zf * zf * zf * zf * zf * zf
	// Grouped as (eps kT/e^2)^3 (kT/A)^2 so that no intermediate under- or overflows.
	ratio := eps * kT / e2
	return 73728 * math.Pi * math.Pi * ratio * ratio * ratio * (kT / hamaker) * (kT / hamaker) * g2 * g2 /
		(math.E * math.E * Avogadro * z6)
}

// Bounds of the ionic-strength search of CriticalIonicStrength, mol/m^3.
const (
	minCriticalIonicStrength = 1e-6
	maxCriticalIonicStrength = 5000
)

// CriticalIonicStrength returns the largest ionic strength I (mol/m^3) at
// which p still has a barrier (Pair.Barrier) of at least criterion J, with
// Kappa recomputed from I by DebyeKappa at p.EpsR and p.TempK (the Kappa of p
// is ignored; the potential is held fixed). criterion <= 0 asks for any
// barrier, so it gives the critical coagulation concentration in terms of
// ionic strength on the full model of p; criterion = 15 kT is a common
// design margin for lasting stability. hint (m) is where the barrier of p
// is expected, from an earlier Barrier or Extrema; 0 when unknown.
//
// The barrier is the highest maximum of the whole curve: with depletion or
// steric layers the curve can have two, and the one followed from hint may
// vanish while the other still stands, so whenever the followed maximum
// falls below the criterion a full scan looks for the highest one, which
// is taken when it still meets the criterion: the answer does not depend
// on hint.
//
// ok is false when no answer lies in [1e-6, 5000] mol/m^3: then I is 0 if
// even 1e-6 mol/m^3 leaves the barrier below criterion, and +Inf if
// 5000 mol/m^3 still leaves it at or above criterion (no attraction, say).
// Method: the barrier falls monotonically with I (both double-layer models
// decrease with kappa at every h), so the signed height of the primary
// maximum minus criterion has one root in log10 I. By the envelope theorem
// the height moves with ln kappa as the double layer's ln-kappa derivative
// at the maximum (edlLogKappaSlope), which FindRootNewton uses from the
// pair's own ionic strength, in steps of at most a decade, to 1e-4 decades
// (about 0.02 %); each evaluation climbs to the maximum from the previous
// one before falling back to a full scan. The result is the end of the
// final bracket where the barrier still meets criterion. It panics on an
// invalid Pair or a NaN criterion.
//
// Reference: Derjaguin & Landau (1941); Verwey & Overbeek (1948), the
// condition that the maximum of the pair energy reach a given value.
func CriticalIonicStrength(p Pair, criterion, hint float64) (ionicStrength float64, ok bool) {
	if math.IsNaN(criterion) {
		panic("physics: CriticalIonicStrength needs a criterion")
	}
	c := p.curve()
	floor := math.Max(criterion, 0)
	margin := func(log10I float64) (float64, float64) {
		c.kappa = DebyeKappa(math.Pow(10, log10I), p.EpsR, p.TempK)
		v, h := c.signedBarrier(hint)
		if hint > 0 && v < floor {
			// The maximum followed from the last one has fallen below the
			// criterion: another one of the whole curve may still meet it.
			if v2, h2 := c.signedBarrier(0); v2 >= floor {
				v, h = v2, h2
			}
		}
		if h > 0 {
			hint = h
		}
		if criterion <= 0 && v == 0 && h == 0 {
			return -1, 0 // no barrier at all: on the failing side
		}
		at := h
		if at == 0 {
			at, _ = c.searchRange()
		}
		return v - floor, c.edlLogKappaSlope(at) * math.Ln10 / 2
	}
	lo, hi := math.Log10(minCriticalIonicStrength), math.Log10(maxCriticalIonicStrength)
	start := 0.0 // 1 mol/m^3 without electrolyte
	if p.Kappa > 0 {
		start = math.Log10(ionicStrengthOfKappa(p.Kappa, p.EpsR, p.TempK))
	}
	hold, _, ok := FindRootNewton(margin, start, lo, hi, -1, 1, 1e-4)
	switch {
	case ok:
		return math.Pow(10, hold), true
	case math.IsNaN(hold):
		return 0, false
	}
	return math.Inf(1), false
}
