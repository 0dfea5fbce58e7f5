package rule

import (
	"cmp"
	"math"
	"slices"
	"strings"

	"github.com/expr-lang/expr/vm"
)

// Score is one cause with its combined certainty factor and the rules that
// fired for it, in the order they fired.
type Score struct {
	Cause     string
	Certainty float64
	Fired     []*Rule
}

// Rank runs the rules of symptom on f, combines their certainty factors per
// cause, sets TopCauseScore and runs the after_causes rules, and returns the
// causes with a positive score, best first (ties by cause id).
func (rs *Set) Rank(f Facts, symptom string) []*Score {
	scores := map[string]*Score{}
	var machine vm.VM
	run := func(after bool) {
		var env map[string]any // for the expression machine, built on first need
		for i := range rs.rules {
			r := &rs.rules[i]
			if r.AfterCauses != after || !r.appliesTo(symptom) {
				continue
			}
			var out bool
			if r.cond != nil {
				out = r.cond(f)
			} else {
				if env == nil {
					env = f.env(after)
				}
				var err error
				if out, err = runRule(&machine, r.program, env); err != nil {
					continue
				}
			}
			if !out {
				continue
			}
			cs := scores[r.Cause]
			if cs == nil {
				cs = &Score{Cause: r.Cause}
				scores[r.Cause] = cs
			}
			cs.Certainty = combine(cs.Certainty, r.Certainty)
			cs.Fired = append(cs.Fired, r)
		}
	}
	run(false)
	top := 0.0
	for _, cs := range scores {
		top = math.Max(top, cs.Certainty)
	}
	f.SetNumber(TopCauseScore, top)
	run(true)

	list := make([]*Score, 0, len(scores))
	for _, cs := range scores {
		if cs.Certainty > 0 {
			list = append(list, cs)
		}
	}
	slices.SortFunc(list, func(a, b *Score) int {
		if a.Certainty != b.Certainty {
			return cmp.Compare(b.Certainty, a.Certainty)
		}
		return strings.Compare(a.Cause, b.Cause)
	})
	return list
}
