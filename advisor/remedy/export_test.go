package remedy

import (
	"maps"
	"slices"

	"colloidtriage/physics"
)

// Internals for the tests of package remedy_test, which take their cases
// from the advisor.
var (
	StabilityMargin                = stabilityMargin
	IonicStrengthFloor             = ionicStrengthFloor
	SmallestAcceptablePotential    = smallestAcceptablePotential
	LargestAcceptableIonicStrength = largestAcceptableIonicStrength
	ApproachRoot                   = approachRoot
)

const (
	MultivalentTol   = multivalentTol
	IonicStrengthTol = ionicStrengthTol
	PotentialTol     = potentialTol
)

func (cs *Case) WithIonicStrength(I float64) physics.Pair { return cs.withIonicStrength(I) }

func SolverIDs() []string { return slices.Sorted(maps.Keys(solvers)) }
