package advisor_test

import "testing"

// TestInfeasibleRemediesLast: within a cause, a remedy marked not feasible
// never comes before a feasible one.
func TestInfeasibleRemediesLast(t *testing.T) {
	t.Parallel()
	for _, tc := range demoCases(t) {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			for _, c := range triageDemo(t, tc.path).Causes {
				seen := false
				for _, r := range c.Remedies {
					bad := r.Feasible != nil && !*r.Feasible
					if seen && !bad && r.Feasible != nil {
						t.Errorf("cause %s: feasible remedy %s after an infeasible one", c.ID, r.ID)
					}
					seen = seen || bad
				}
			}
		})
	}
}
