package remedy

import (
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/rule"
	"colloidtriage/physics"
)

// Case is one evaluated sample as the solvers see it: the resolved
// conditions, the facts the rules saw, the reported scales, and the pair of
// median particles the scales were computed for. The advisor builds it once
// per triage, from its evaluation, before the first remedy is solved; the
// solvers of that triage share it, and with it their warm starts and the
// results they solve once.
type Case struct {
	Cond  *input.Conditions
	Facts rule.Facts
	// Reported returns a scale as the report gives it (rounded, in its
	// reporting unit), ok false when the report leaves it out.
	Reported func(name string) (value float64, ok bool)

	Pair            physics.Pair // the interaction of two median particles, when HasPair
	HasPair         bool
	VanDerWaalsOnly physics.Pair // the same pair without double layer or layers, for steric checks
	HasBarrier      bool         // the pair as specified has an energy barrier
	LastBarrier     float64      // separation of the last barrier found, m: a warm start the solvers update

	stabilityText string // stabilityCriterion, written once per triage

	acceptablePotential struct { // solved once per triage, shared by two remedies
		done, ok bool
		psi      float64
	}

	// salts re-derives the conditions at a search's trial salts, and
	// zetaScale is the present zeta potential over the one it gives at the
	// present salts (1 at the nominal inputs; a draw's error of the
	// estimate otherwise); saltPair sets both on its first call.
	salts     *input.Salts
	zetaScale float64
}
