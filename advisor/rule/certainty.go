package rule

import "math"

// combine merges two certainty factors in [-1, 1] with the parallel
// combination function of the MYCIN model: two confirming pieces of evidence
// reinforce each other without exceeding 1, two disconfirming ones likewise
// towards -1, and conflicting ones partly cancel. The function is commutative
// and associative, so the order in which rules fire does not change a score.
//
// References: Shortliffe & Buchanan, "A model of inexact reasoning in
// medicine", Mathematical Biosciences 23:351-379 (1975); Buchanan &
// Shortliffe, Rule-Based Expert Systems (1984), ch. 10, eq. 1.
func combine(a, b float64) float64 {
	switch {
	case a >= 0 && b >= 0:
		return a + b*(1-a)
	case a < 0 && b < 0:
		return a + b*(1+a)
	default:
		d := 1 - math.Min(math.Abs(a), math.Abs(b))
		if d == 0 {
			return 0
		}
		return (a + b) / d
	}
}
