package remedy

import (
	"maps"
	"slices"
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

func SolverIDs() []string { return slices.Sorted(maps.Keys(solvers)) }
