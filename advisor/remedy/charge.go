package remedy

import (
	"fmt"
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// The electrostatic remedies search the quantity the formulator controls
// until the pair meets both acceptance criteria: a barrier of at least
// min_barrier_kT and an aggregation half-life of at least
// half_life_to_shelf_life times the shelf life. Both grow monotonically as
// the ionic strength falls or the surface potential rises, so a bracketed
// root of the smaller margin is the target.

func stabilityCriterion(cs *Case) string {
	if cs.stabilityText == "" {
		cs.stabilityText = "energy barrier >= " + number.Shortest(cs.Cond.Criteria.MinBarrierKT) + " kT and aggregation half-life >= " +
			number.Shortest(cs.Cond.Criteria.HalfLifeRatio) + " x shelf life"
	}
	return cs.stabilityText
}

// stabilityMargin is the smaller of the barrier margin (kT) and the
// half-life margin (decades) of a pair, or for a pair with steric layers
// the larger of that and the energy at layer contact (kT; see
// stabilityMarginSlope); >= 0 means acceptable.
func stabilityMargin(cs *Case, p physics.Pair) float64 {
	m, _ := stabilityMarginSlope(cs, p, exactLog10W)
	return m
}

// log10WAt gives log10 W of a pair at its found barrier.
type log10WAt func(p physics.Pair, b physics.Extremum) float64

func exactLog10W(p physics.Pair, b physics.Extremum) float64 {
	return physics.Log10StabilityRatioWith(p, b, true)
}

// peakAnchor evaluates margins on the peak estimate of log10 W
// (physics.Log10StabilityRatioPeak: 5 energies about the barrier, against
// the tens of the quadrature) offset by gap, its difference from the
// quadrature at the last exact evaluation. For barriers of 15 kT and more
// the estimate is within 2e-4 decades, so the remedies search on it and
// check their answer with one quadrature.
type peakAnchor struct {
	cs  *Case
	gap float64
	// last is the last exact point, whose gap is worked out only when an
	// estimate follows it: a search that stops at its check never needs it.
	last struct {
		pair    physics.Pair
		barrier physics.Extremum
		log10W  float64
		pending bool
	}
}

func (a *peakAnchor) estimated(p physics.Pair) (margin, slope float64) {
	if last := &a.last; last.pending {
		if gap := last.log10W - physics.Log10StabilityRatioPeak(last.pair, last.barrier, true); !math.IsNaN(gap) {
			a.gap = gap
		}
		last.pending = false
	}
	return stabilityMarginSlope(a.cs, p, func(p physics.Pair, b physics.Extremum) float64 {
		return physics.Log10StabilityRatioPeak(p, b, true) + a.gap
	})
}

// exact is the margin on the quadrature; it renews the gap for the
// estimates that follow.
func (a *peakAnchor) exact(p physics.Pair) (margin, slope float64) {
	return stabilityMarginSlope(a.cs, p, func(p physics.Pair, b physics.Extremum) float64 {
		w := exactLog10W(p, b)
		a.last.pair, a.last.barrier, a.last.log10W, a.last.pending = p, b, w, true
		return w
	})
}

// anchoredRoot solves a margin for the remedies whose solver needs only
// margins: solve runs on the estimated margin of pairAt(x), and its answer
// is checked by the quadrature one step (toward, signed) into the
// acceptable side, which renews the gap. The answer, that checked point,
// stands when the estimate so anchored still fails one step the other way
// of solve's answer: the root is then within two steps. Otherwise solve
// repeats on the renewed estimate; after three rounds, or when the
// estimate finds nothing, solve runs on the exact margin.
func anchoredRoot(cs *Case, pairAt func(x float64) physics.Pair, solve func(margin func(x float64) float64) (float64, bool), toward float64) (float64, bool) {
	a := peakAnchor{cs: cs}
	estimated := func(x float64) float64 {
		m, _ := a.estimated(pairAt(x))
		return m
	}
	for round := 0; round < 3; round++ {
		x, ok := solve(estimated)
		if !ok {
			break
		}
		held := x + toward
		m, _ := a.exact(pairAt(held))
		if math.IsNaN(m) {
			break
		}
		if m >= 0 && estimated(x-toward) < 0 {
			return held, true
		}
	}
	return solve(func(x float64) float64 { return stabilityMargin(cs, pairAt(x)) })
}

// stabilityMarginSlope is stabilityMargin, with log10 W from log10W, and an
// estimate of its slope in log10 of the ionic strength, for Newton steps:
// by the envelope theorem the barrier moves by LogKappaSlope ln(10)/2 per
// decade, and log10 W follows the barrier over kT ln 10, less half a decade
// for the 1/(kappa a) of W ~ exp(Vmax/kT)/(2 kappa a) (Reerink & Overbeek,
// Discuss. Faraday Soc. 18 (1954) 74). The half-life margin is taken
// wherever there is a barrier, also below the barrier criterion, so that a
// search steps on the criterion that binds from its first point (the
// half-life one, for most products, well before the barrier reaches its
// minimum). The margin is NaN where log10W is (the peak estimate where it
// does not apply) and the barrier criterion holds; where it fails, it is
// the barrier margin.
//
// A pair with steric layers is acceptable once they shield it (the energy
// at layer contact is >= 0, see shielded), so its margin is the larger of
// that contact energy in kT and the DLVO margin, shielded or not (a NaN
// DLVO estimate counts as lower when the pair is shielded). The margin is
// so continuous across the onset of shielding, where a search would
// otherwise meet a step, and the contact energy's slope is exact:
// LogKappaSlope at layer contact.
func stabilityMarginSlope(cs *Case, p physics.Pair, log10W log10WAt) (margin, slope float64) {
	if p.StericThickness == 0 {
		return dlvoMarginSlope(cs, p, log10W)
	}
	kT := physics.Boltzmann * cs.Cond.StorageTempK
	contact := 2 * p.StericThickness
	byContact, contactSlope := p.Energy(contact)/kT, p.LogKappaSlope(contact)/kT*math.Ln10/2
	m, s := dlvoMarginSlope(cs, p, log10W)
	switch {
	case m >= byContact:
		return m, s
	case byContact >= 0 || !math.IsNaN(m):
		return byContact, contactSlope
	}
	return m, s // NaN short of shielding: the search falls back to the quadrature
}

// dlvoMarginSlope is stabilityMarginSlope without steric layers.
func dlvoMarginSlope(cs *Case, p physics.Pair, log10W log10WAt) (margin, slope float64) {
	c := cs.Cond
	kT := physics.Boltzmann * c.StorageTempK
	barrier, barrierSlope := 0.0, 0.0
	b := p.BarrierNear(cs.LastBarrier)
	if b.Found {
		barrier = b.Energy / kT
		barrierSlope = p.LogKappaSlope(b.Separation) / kT * math.Ln10 / 2
		cs.LastBarrier = b.Separation
	}
	byBarrier := barrier - c.Criteria.MinBarrierKT
	if !b.Found && byBarrier < 0 {
		return byBarrier, barrierSlope
	}
	w := log10W(p, b)
	switch {
	case math.IsNaN(w) && byBarrier < 0:
		return byBarrier, barrierSlope
	case math.IsNaN(w):
		return math.NaN(), barrierSlope // no estimate here: the search falls back to the quadrature
	}
	n0 := physics.NumberDensity(c.VolumeFraction, c.Radius)
	log10T := physics.Log10HalfLife(c.Liquid.Viscosity, c.StorageTempK, n0, w)
	byHalfLife := log10T - math.Log10(c.Criteria.HalfLifeRatio*c.ShelfLife)
	if byBarrier < byHalfLife {
		return byBarrier, barrierSlope
	}
	return byHalfLife, barrierSlope/math.Ln10 - 0.5
}

// ionicStrengthFloor is the lowest ionic strength a remedy may ask for.
func ionicStrengthFloor(cs *Case) float64 {
	if cs.Cond.Liquid.Aqueous {
		return input.AutoionisationMolM3
	}
	return 1e-6
}

// ionicStrengthTol is the accuracy of the ionic-strength target in log10 of
// the ionic strength: 0.23 %, under the three digits reported.
const ionicStrengthTol = 1e-3

// largestAcceptableIonicStrength finds the largest ionic strength that meets
// both criteria, the barrier and the half-life, below the present one. The
// margin is the smaller of the two; with no barrier at present, the search
// starts at physics.CriticalIonicStrength's answer for the barrier
// criterion, unless the pair has steric layers, whose contact energy gives
// the margin a slope at the present ionic strength and may meet the
// criterion above that answer.
//
// The half-life margin is searched on the peak estimate of log10 W
// (physics.Log10StabilityRatioPeak: 5 energies about the barrier), offset
// by its gap to the quadrature at the last exact point (none at first; the
// gap is within 2e-4 decades for barriers of 15 kT and more, against the
// margin's 0.004-decade window). Newton steps aim at the root of the
// estimated margin shifted 5/8 of the tolerance into the acceptable side
// (approachRoot, which stops within about 1/8 of the tolerance of that
// aim); the point is checked by the quadrature: it is the answer when its
// exact margin is >= 0 and within the tolerance of the root (by the local
// slope); otherwise the gap is renewed there and the search repeated. A few
// rounds without an answer fall back to Newton steps on the exact margin.
func largestAcceptableIonicStrength(cs *Case) (float64, bool) {
	c := cs.Cond
	floor := ionicStrengthFloor(cs)
	kT := physics.Boltzmann * c.StorageTempK
	top := c.IonicStrength
	pairAt := func(logI float64) physics.Pair { return cs.Pair.WithIonicStrength(math.Pow(10, logI)) }
	regulated := cs.regulated()
	if regulated {
		pairAt = func(logI float64) physics.Pair { return cs.saltPair(math.Pow(10, logI)/c.IonicStrength, math.NaN()) }
	}
	start := math.Log10(top)
	if !cs.HasBarrier && cs.Pair.StericThickness == 0 {
		// No barrier at the present ionic strength: the margin has no slope
		// there, so the search starts where the barrier meets its criterion.
		// With steric layers the margin is the contact energy there, which
		// has a slope, and the layers may shield the pair above that point.
		// When the potential follows the salt, it rises as the salt falls:
		// the barrier meets its criterion above that point, which is only
		// where the search starts.
		I, ok := physics.CriticalIonicStrength(cs.Pair, c.Criteria.MinBarrierKT*kT, cs.LastBarrier)
		switch {
		case regulated && ok && I < top && I > floor:
			start = math.Log10(I)
		case regulated:
		case !ok && I == 0:
			return 0, false
		case ok && I < top:
			top = I
		}
	}
	if top < floor {
		return 0, false
	}
	lo, hi := math.Log10(floor), math.Log10(top)
	a := peakAnchor{cs: cs}
	exact := func(logI float64) (float64, float64) { return a.exact(pairAt(logI)) }
	aimed := func(logI float64) (float64, float64) {
		m, slope := a.estimated(pairAt(logI))
		return m + slope*ionicStrengthTol*5/8, slope // slope < 0: aimed into the acceptable side
	}
	x := min(start, hi)
search:
	for round := 0; round < 3; round++ {
		next, found := approachRoot(secantRefined(aimed), x, lo, hi, ionicStrengthTol/8)
		if !found {
			break search // no estimated root, or no estimate: the exact search decides
		}
		x = next
		m, slope := exact(x)
		switch {
		case m >= 0 && x == hi:
			return top, true
		case m >= 0 && m < -slope*ionicStrengthTol:
			return math.Pow(10, x), true
		case math.IsNaN(m):
			break search
		}
	}
	hold, fail, ok := physics.FindRootNewton(secantRefined(exact), x, lo, hi, -1, 1, ionicStrengthTol)
	switch {
	case ok:
		return math.Pow(10, hold), true
	case math.IsNaN(fail):
		return top, true // acceptable at the barrier criterion's own answer
	}
	return 0, false
}

// approachRoot takes Newton steps, at most a decade each and kept within
// [lo, hi], on a decreasing margin f from x. It returns the first point
// whose Newton step to the root is shorter than tol, or the point one step
// on when the step after that, predicted from the contraction of the last
// two full (unclamped) steps (Newton's quadratic convergence: the next step
// is about step^3/previous^2; optimistic for secant slopes, which is why
// the caller checks), is shorter than tol; or hi when f >= 0 there. found
// is false at a NaN, a slope that is not negative, a step stopped by lo,
// or after 12 steps: the caller's checked search then decides. Unlike
// physics.FindRootNewton it does not close a bracket: the point it returns
// is checked by the quadrature anyway.
func approachRoot(f func(float64) (float64, float64), x, lo, hi, tol float64) (root float64, found bool) {
	previous := 0.0 // the last Newton step, when it was taken in full
	for range 12 {
		m, slope := f(x)
		step := -m / slope
		switch {
		case math.IsNaN(m):
			return x, false
		case m >= 0 && x == hi:
			return x, true
		case !(slope < 0):
			return x, false
		case math.Abs(step) < tol:
			return x, true
		}
		next := min(max(x+max(min(step, 1), -1), lo), hi)
		if next == x {
			return x, false
		}
		unclamped := next == x+step
		if a := math.Abs(step); unclamped && previous != 0 && a < math.Abs(previous)/2 && a*a*a/(previous*previous) < tol {
			return next, true
		}
		previous = 0 // a clamped step says nothing of the convergence
		if unclamped {
			previous = step
		}
		x = next
	}
	return x, false
}

// secantRefined wraps a margin and its envelope-theorem slope for
// approachRoot and physics.FindRootNewton: from the second point on, the
// secant through the last two points, which also carries the prefactor of
// W, replaces the slope when it has the expected (negative) sign.
func secantRefined(f func(float64) (float64, float64)) func(float64) (float64, float64) {
	lastX, lastF := math.NaN(), math.NaN()
	return func(x float64) (float64, float64) {
		v, slope := f(x)
		if secant := (v - lastF) / (x - lastX); secant < 0 {
			slope = secant
		}
		lastX, lastF = x, v
		return v, slope
	}
}

func solveIonicStrength(cs *Case) (Target, string, bool) {
	if !cs.HasPair {
		return Target{}, "no surface potential known", false
	}
	crit := stabilityCriterion(cs)
	if cs.regulated() {
		crit += regulatedText
	}
	I, ok := largestAcceptableIonicStrength(cs)
	if !ok {
		return Target{}, crit + ": not reached even at the lowest ionic strength", false
	}
	return Target{"medium.ionic_strength_mM", "<=", I, "mM"}, crit, true
}

func solveSurfaceCharge(cs *Case) (Target, string, bool) {
	psi, ok := smallestAcceptablePotential(cs)
	if !ok {
		return Target{}, stabilityCriterion(cs) + ": not reached below 200 mV at this ionic strength", false
	}
	return Target{"|particles.zeta_mV|", ">=", psi * 1e3, "mV"}, stabilityCriterion(cs), true
}

// smallestAcceptablePotential solves stabilityMargin = 0 on |psi| between
// the present potential and 200 mV, keeping the sign of the surface.
// The answer is kept for the rest of the triage: raise_surface_charge and
// move_ph_from_iep both need it.
func smallestAcceptablePotential(cs *Case) (float64, bool) {
	if m := &cs.acceptablePotential; !m.done && cs.HasPair {
		solve := func(margin func(psi float64) float64) (float64, bool) {
			return potentialWhere(cs, func(p physics.Pair) float64 { return margin(math.Abs(p.Potential)) })
		}
		m.psi, m.ok = anchoredRoot(cs, cs.withPotential, solve, potentialTol)
		m.done = true
	}
	return cs.acceptablePotential.psi, cs.acceptablePotential.ok
}

// potentialWhere finds the smallest |psi| in [0, 200 mV] at which margin, a
// function growing with |psi|, reaches zero; the surface keeps its sign.
func potentialWhere(cs *Case, margin func(p physics.Pair) float64) (float64, bool) {
	if !cs.HasPair {
		return 0, false
	}
	at := func(psi float64) float64 { return margin(cs.withPotential(psi)) }
	// Bracket from the present potential by steps of 1.5 before iterating,
	// so that few margins are evaluated far from the answer.
	const top, bottom = 0.2, 0.002
	start := math.Min(math.Max(math.Abs(cs.Pair.Potential), 2*bottom), top)
	lo, hi := start, start
	mLo := at(start)
	mHi := mLo
	if mLo >= 0 {
		for {
			if lo /= 1.5; lo <= bottom {
				lo, mLo = 0, at(0)
				break
			}
			if mLo = at(lo); mLo < 0 {
				break
			}
			hi, mHi = lo, mLo
		}
	} else {
		for {
			if hi = math.Min(lo*1.5, top); hi == lo {
				return 0, false // not reached at the top
			}
			if mHi = at(hi); mHi >= 0 {
				break
			}
			lo, mLo = hi, mHi
		}
	}
	return physics.FindRootFrom(at, lo, hi, mLo, mHi, potentialTol)
}

// withPotential is the pair at surface potential |psi| (V), of the sign of
// the present one: a remedy raises the charge a surface has.
func (cs *Case) withPotential(psi float64) physics.Pair {
	if !(cs.Pair.Potential > 0) {
		psi = -psi
	}
	return cs.Pair.WithPotential(psi)
}

// potentialTol is the accuracy of potential targets, V.
const potentialTol = 1e-5

// solvePH finds the pH at which the surface-potential estimate reaches the
// needed potential, anchored to the measured zeta at the present pH when
// there is one (the estimate's shape, the measurement's scale).
func solvePH(cs *Case) (Target, string, bool) {
	c := cs.Cond
	zero := c.ZeroPointPH()
	if math.IsNaN(zero) {
		return Target{}, "isoelectric point unknown", false
	}
	psi, ok := smallestAcceptablePotential(cs)
	if !ok {
		return Target{}, stabilityCriterion(cs) + ": not reachable by pH alone at this ionic strength", false
	}
	scale, anchor := 1.0, "; potential from the pH estimate model (see assumptions)"
	if c.Sites != nil {
		anchor = "; potential from the site-binding model of the surface in the present ions (see assumptions)"
	}
	if c.ZetaSource != "estimated" && !math.IsNaN(c.PH) {
		if model := c.EstimatedPotential(c.PH); model*c.Zeta > 0 {
			scale = c.Zeta / model
			anchor += ", scaled to the measured zeta at the present pH"
		}
	}
	above := math.IsNaN(c.PH) || c.PH >= zero
	lo, hi, op := zero, 14.0, ">="
	if !above {
		lo, hi, op = 0, zero, "<="
	}
	f := func(ph float64) float64 {
		return math.Abs(scale*c.EstimatedPotential(ph)) - psi
	}
	ph, ok := physics.FindRoot(f, lo, hi, 1e-4)
	if !ok {
		return Target{}, stabilityCriterion(cs) + ": the needed potential is not reached between pH 0 and 14" + anchor, false
	}
	return Target{"medium.ph", op, ph, "pH"}, stabilityCriterion(cs) + anchor, true
}

// multivalentTol is the relative accuracy of the multivalent-salt target.
const multivalentTol = 1e-4

func solveMultivalent(cs *Case) (Target, string, bool) {
	c := cs.Cond
	if c.MultivalentSalt == "" || !cs.HasPair {
		return Target{}, "no multivalent salt stated", false
	}
	withConc := func(conc float64) physics.Pair { return MultivalentPair(cs.Pair, c, conc) }
	crit := stabilityCriterion(cs) + "; the double layer's far field follows the ion mixture at each concentration"
	if cs.regulated() {
		withConc = func(conc float64) physics.Pair { return cs.saltPair(1, conc) }
		crit += regulatedText
	}
	conc := c.MultivalentConc
	a := peakAnchor{cs: cs}
	if m, _ := a.estimated(withConc(conc)); m >= 0 {
		if m, _ = a.exact(withConc(conc)); m >= 0 {
			return Target{c.MultivalentSalt + " concentration_mM", "<=", conc, "mM"}, crit, true
		}
	}
	reached := true
	solve := func(margin func(conc float64) float64) (float64, bool) {
		without := margin(0)
		if reached = without >= 0; !reached {
			return 0, false
		}
		present := margin(conc)
		if present >= 0 {
			return conc, true // the present concentration is acceptable
		}
		return physics.FindRootFrom(margin, 0, conc, without, present, multivalentTol*c.MultivalentConc)
	}
	conc, ok := anchoredRoot(cs, withConc, solve, -multivalentTol*c.MultivalentConc)
	conc = math.Max(conc, 0) // a root within the tolerance of none at all
	switch {
	case !reached:
		return Target{}, crit + ": not reached even without the multivalent salt", false
	case !ok:
		return Target{}, crit, false
	}
	if c.MultivalentSalt == input.HardnessLabel && conc < c.MultivalentConc {
		crit += sequestrantDose(c.MultivalentConc - conc)
	}
	return Target{c.MultivalentSalt + " concentration_mM", "<=", conc, "mM"}, crit, true
}

// MultivalentPair is the pair p with the sample's multivalent salt at conc
// (mol/m^3; below 0, as a search's step past none at all may ask, it is 0)
// instead of its present concentration: the ionic strength and the ion
// mixture of the far field both follow, the other ions stay.
func MultivalentPair(p physics.Pair, c *input.Conditions, conc float64) physics.Pair {
	conc = math.Max(conc, 0)
	other := c.IonicStrength - c.MultivalentIonicShare*c.MultivalentConc
	floor := 1e-6
	if c.Liquid.Aqueous {
		floor = input.AutoionisationMolM3
	}
	return p.WithIonicStrength(math.Max(other+c.MultivalentIonicShare*conc, floor)).WithIons(c.IonsWithMultivalent(conc))
}

// molarMassNa2H2EDTA is the molar mass of disodium EDTA dihydrate,
// Na2H2EDTA.2H2O (CAS 6381-92-6), g/mol.
const molarMassNa2H2EDTA = 372.24

// sequestrantDose says how much disodium EDTA binds excess mM of hardness:
// one EDTA per Ca2+ or Mg2+ (1:1 chelates, log K 10.7 for CaY and 8.7 for
// MgY, so binding is complete at the mM level above pH 7), as mg/L of the
// dihydrate.
//
// Reference: A. E. Martell & R. M. Smith, Critical Stability Constants,
// vol. 1 (Plenum, 1974), EDTA; molar mass from IUPAC atomic weights.
func sequestrantDose(excess float64) string {
	return "; or sequester the excess " + number.Quantity(excess, "mM") + " with at least " +
		number.Quantity(excess*molarMassNa2H2EDTA, "mg/L") + " of disodium EDTA dihydrate (1:1 with Ca2+ and Mg2+)"
}

// looseFlocBarrierKT is the barrier below which particles join loose flocs
// within days rather than years: a few kT (common practice of controlled
// flocculation, where zeta is brought near zero by flocculating ions).
const looseFlocBarrierKT = 5.0

func solveControlledFlocculation(cs *Case) (Target, string, bool) {
	kT := physics.Boltzmann * cs.Cond.StorageTempK
	// Each barrier is searched from the last one found (Pair.BarrierNear, as
	// in stabilityMarginSlope): the maximum reached from there, which for a
	// curve with two maxima need not be Pair.Barrier's highest.
	near := cs.LastBarrier
	psi, ok := potentialWhere(cs, func(p physics.Pair) float64 {
		if b := p.BarrierNear(near); b.Found {
			near = b.Separation
			return b.Energy/kT - looseFlocBarrierKT
		}
		return -looseFlocBarrierKT
	})
	crit := fmt.Sprintf("energy barrier <= %g kT so that particles join loose flocs; bring zeta down with flocculating ions, then confirm by sedimentation volume and redispersion", looseFlocBarrierKT)
	if !ok {
		return Target{}, crit + ": no surface potential known or the barrier stays high", false
	}
	return Target{"|particles.zeta_mV|", "<=", psi * 1e3, "mV"}, crit, true
}

// regulated reports whether the salt searches let the surface potential
// follow the salt: a zeta potential estimated from the material's
// site-binding model, or carried to the product through it, is set by the
// surface charge the sites regulate in the product's ions, so less salt or
// less of a multivalent cation lets it recover (charge regulation; Healy &
// White, Adv. Colloid Interface Sci. 9 (1978) 303). A zeta potential
// measured in the product is a fact of that liquid and stays fixed.
func (cs *Case) regulated() bool {
	c := cs.Cond
	return c.Sites != nil && (c.ZetaSource == "estimated" || c.ZetaSource == "carried")
}

// regulatedText is what the criterion says when the potential follows the
// salt.
const regulatedText = "; the potential follows the salt through the site model"

// saltPair is the pair with every stated salt scaled by scale and, unless
// multivalentConc is NaN, the multivalent salt at multivalentConc (mol/m^3),
// all re-derived as Resolve does (input.Salts): the Debye
// length, the ion mixture of the far field, the counter-ion valence and
// the potential the site model gives there, times zetaScale.
func (cs *Case) saltPair(scale, multivalentConc float64) physics.Pair {
	if cs.salts == nil {
		cs.salts, cs.zetaScale = cs.Cond.Salts(), 1
		if r := cs.Cond.Zeta / cs.salts.With(1, math.NaN()).Zeta; r > 0 && !math.IsInf(r, 0) {
			cs.zetaScale = r
		}
	}
	c := cs.salts.With(scale, multivalentConc)
	p := cs.Pair.WithIonicStrength(math.Max(c.IonicStrength, ionicStrengthFloor(cs)))
	p.Valence = max(c.CounterValence, 1)
	if zeta := c.Zeta * cs.zetaScale; !math.IsNaN(zeta) && !math.IsInf(zeta, 0) {
		p.Potential = zeta
	}
	return p.WithIons(c.Ions)
}
