package remedy

import (
	"maps"
	"slices"
)

// Internals for the tests of package remedy_test. The tests that need a
// fully evaluated case live in the advisor (advisor/remedy_case_test.go),
// which builds it.
var ApproachRoot = approachRoot

func SolverIDs() []string { return slices.Sorted(maps.Keys(solvers)) }

func ChangedInputs() []string {
	var out []string
	for _, in := range changes {
		out = append(out, in...)
	}
	slices.Sort(out)
	return slices.Compact(out)
}
