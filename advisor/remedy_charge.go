package advisor

import (
	"fmt"
	"math"

	"colloidtriage/physics"
)

// The electrostatic remedies search the quantity the formulator controls
// until the pair meets both acceptance criteria: a barrier of at least
// min_barrier_kT and an aggregation half-life of at least
// half_life_to_shelf_life times the shelf life. Both grow monotonically as
// the ionic strength falls or the surface potential rises, so a bracketed
// root of the smaller margin is the target.

func stabilityCriterion(ev *evaluation) string {
	return fmt.Sprintf("energy barrier >= %g kT and aggregation half-life >= %g x shelf life",
		ev.c.criteria.minBarrierKT, ev.c.criteria.halfLifeRatio)
}

// stabilityMargin is the smaller of the barrier margin (kT) and the
// half-life margin (decades) of a pair; >= 0 means acceptable.
func stabilityMargin(ev *evaluation, p physics.Pair) float64 {
	c := ev.c
	kT := physics.Boltzmann * c.storageTempK
	barrier := 0.0
	if b := p.Barrier(); b.Found {
		barrier = b.Energy / kT
	}
	byBarrier := barrier - c.criteria.minBarrierKT
	if byBarrier < 0 {
		return byBarrier
	}
	n0 := physics.NumberDensity(c.phi, c.radius)
	log10T := physics.Log10HalfLife(c.liquid.viscosity, c.storageTempK, n0, physics.Log10StabilityRatio(p, true))
	return math.Min(byBarrier, log10T-math.Log10(c.criteria.halfLifeRatio*c.shelfLife))
}

func (ev *evaluation) withIonicStrength(I float64) physics.Pair {
	p := ev.pair
	p.Kappa = physics.DebyeKappa(I, ev.c.liquid.epsR, ev.c.storageTempK)
	return p
}

// ionicStrengthFloor is the lowest ionic strength a remedy may ask for.
func ionicStrengthFloor(ev *evaluation) float64 {
	if ev.c.liquid.aqueous {
		return autoionisationMolM3
	}
	return 1e-6
}

// largestAcceptableIonicStrength solves stabilityMargin = 0 on log10 I.
func largestAcceptableIonicStrength(ev *evaluation) (float64, bool) {
	lo, hi := ionicStrengthFloor(ev), ev.c.ionicStrength
	margin := func(logI float64) float64 { return stabilityMargin(ev, ev.withIonicStrength(math.Pow(10, logI))) }
	if margin(math.Log10(lo)) < 0 {
		return 0, false
	}
	if hi <= lo || margin(math.Log10(hi)) >= 0 {
		return hi, true
	}
	x, ok := physics.FindRoot(margin, math.Log10(lo), math.Log10(hi), 1e-3)
	return math.Pow(10, x), ok
}

func solveIonicStrength(ev *evaluation) (Target, string, bool) {
	if !ev.hasPair {
		return Target{}, "no surface potential known", false
	}
	I, ok := largestAcceptableIonicStrength(ev)
	if !ok {
		return Target{}, stabilityCriterion(ev) + ": not reached even at the lowest ionic strength", false
	}
	return Target{"medium.ionic_strength_mM", "<=", I, "mM"}, stabilityCriterion(ev), true
}

func solveSurfaceCharge(ev *evaluation) (Target, string, bool) {
	psi, ok := smallestAcceptablePotential(ev)
	if !ok {
		return Target{}, stabilityCriterion(ev) + ": not reached below 200 mV at this ionic strength", false
	}
	return Target{"|particles.zeta_mV|", ">=", psi * 1e3, "mV"}, stabilityCriterion(ev), true
}

// smallestAcceptablePotential solves stabilityMargin = 0 on |psi| between
// the present potential and 200 mV, keeping the sign of the surface.
func smallestAcceptablePotential(ev *evaluation) (float64, bool) {
	if !ev.hasPair {
		return 0, false
	}
	sign := -1.0
	if ev.pair.Potential > 0 {
		sign = 1
	}
	margin := func(psi float64) float64 {
		p := ev.pair
		p.Potential = sign * psi
		return stabilityMargin(ev, p)
	}
	lo, hi := math.Abs(ev.pair.Potential), 0.2
	if margin(lo) >= 0 {
		return lo, true
	}
	if margin(hi) < 0 {
		return 0, false
	}
	return physics.FindRoot(margin, lo, hi, 1e-5)
}

func solvePH(ev *evaluation) (Target, string, bool) {
	c := ev.c
	if math.IsNaN(c.iep) {
		return Target{}, "isoelectric point unknown", false
	}
	psi, ok := smallestAcceptablePotential(ev)
	if !ok {
		return Target{}, stabilityCriterion(ev) + ": not reachable by pH alone at this ionic strength", false
	}
	above := math.IsNaN(c.ph) || c.ph >= c.iep
	lo, hi, op := c.iep, 14.0, ">="
	if !above {
		lo, hi, op = 0, c.iep, "<="
	}
	f := func(ph float64) float64 {
		return math.Abs(physics.SurfacePotentialFromPH(ph, c.iep, c.storageTempK)) - psi
	}
	ph, ok := physics.FindRoot(f, lo, hi, 1e-4)
	if !ok {
		return Target{}, "the surface-potential estimate never reaches the needed potential between pH 0 and 14", false
	}
	return Target{"medium.ph", op, ph, "pH"}, stabilityCriterion(ev) + "; potential from the pH estimate model (see assumptions)", true
}

func solveMultivalent(ev *evaluation) (Target, string, bool) {
	c := ev.c
	if c.multivalentSalt == "" || !ev.hasPair {
		return Target{}, "no multivalent salt stated", false
	}
	other := c.ionicStrength - c.multivalentIonicShare*c.multivalentConc
	margin := func(conc float64) float64 {
		return stabilityMargin(ev, ev.withIonicStrength(math.Max(other+c.multivalentIonicShare*conc, ionicStrengthFloor(ev))))
	}
	crit := stabilityCriterion(ev) + "; counter-ion valence kept (conservative)"
	if margin(0) < 0 {
		return Target{}, crit + ": not reached even without the multivalent salt", false
	}
	conc := c.multivalentConc
	if margin(conc) < 0 {
		var ok bool
		if conc, ok = physics.FindRoot(margin, 0, conc, 1e-4*c.multivalentConc); !ok {
			return Target{}, crit, false
		}
	}
	return Target{c.multivalentSalt + " concentration_mM", "<=", conc, "mM"}, crit, true
}

func solveControlledFlocculation(ev *evaluation) (Target, string, bool) {
	if !ev.hasPair {
		return Target{}, "no surface potential known", false
	}
	I, ok := physics.CriticalIonicStrength(ev.pair, 0)
	if !ok {
		return Target{}, "no ionic strength removes the barrier", false
	}
	return Target{"medium.ionic_strength_mM", ">=", I, "mM"},
		"barrier just vanishes, so that particles join loose flocs; confirm by sedimentation volume and redispersion", true
}
