package advisor

import (
	"math"
	"strings"

	"colloidtriage/advisor/number"
	"colloidtriage/advisor/remedy"
)

// remedy renders one catalogue remedy with its solved target.
func (e *Engine) remedy(ev *evaluation, id string) Remedy {
	entry, _ := e.rules.Catalog.Remedy(id)
	r := Remedy{ID: id}
	solve := remedy.For(id)
	if solve == nil {
		r.Action = entry.Action
		return r
	}
	t, criterion, ok := solve(ev.remedyCase())
	r.Criterion = criterion
	if !ok || math.IsNaN(t.Value) || math.IsInf(t.Value, 0) {
		r.Action = withTarget(entry.Action, "no target found within the physical range ("+criterion+")")
		return r
	}
	t.Value = roundTowardAcceptable(t.Value, t.Op)
	r.Target = &t
	r.Action = withTarget(entry.Action, t.Quantity+" "+t.Op+" "+number.Quantity(t.Value, t.Unit))
	return r
}

// roundTowardAcceptable keeps 3 significant digits of a target, rounded
// towards the side where the criterion holds (down for "<=", up for ">="),
// so that the printed limit itself meets it.
func roundTowardAcceptable(v float64, op string) float64 {
	switch op {
	case "<=":
		return number.RoundWith(v, 3, math.Floor)
	case ">=":
		return number.RoundWith(v, 3, math.Ceil)
	}
	return number.RoundWith(v, 3, math.Round)
}

// withTarget puts target in place of the {target} of an action (the
// catalogue holds at most one).
func withTarget(action, target string) string {
	before, after, ok := strings.Cut(action, "{target}")
	if !ok {
		return action
	}
	return before + target + after
}
