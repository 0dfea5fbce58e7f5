package advisor

import (
	"math"
	"strings"

	"colloidtriage/advisor/number"
)

// solver computes a remedy's target for one evaluated sample: the value a
// quantity must reach for the acceptance criterion to hold, found by
// inverting the same physics that diagnosed the cause. ok is false when no
// value of the quantity meets the criterion (the text then says why).
type solver func(ev *evaluation) (t Target, criterion string, ok bool)

// remedy renders one catalogue remedy with its solved target.
func (e *Engine) remedy(ev *evaluation, id string) Remedy {
	entry, _ := e.rules.Catalog.Remedy(id)
	r := Remedy{ID: id}
	solve := remedySolvers[id]
	if solve == nil {
		r.Action = entry.Action
		return r
	}
	t, criterion, ok := solve(ev)
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

// remedySolvers maps each remedy with a computable target to its solver;
// investigate_non_colloidal has none. A test checks the catalogue against it.
var remedySolvers = map[string]solver{
	"reduce_particle_size":        solveParticleSize,
	"match_density":               solveDensityMatch,
	"raise_viscosity":             solveViscosity,
	"add_yield_stress":            solveYieldStress,
	"lower_ionic_strength":        solveIonicStrength,
	"raise_surface_charge":        solveSurfaceCharge,
	"move_ph_from_iep":            solvePH,
	"remove_multivalent_ions":     solveMultivalent,
	"add_steric_layer":            solveStericThickness,
	"thicken_steric_layer":        solveStericThickness,
	"improve_solvent_quality":     solveSolventQuality,
	"reduce_free_polymer":         solveFreePolymer,
	"adjust_polymer_dose":         solvePolymerDose,
	"add_ripening_inhibitor":      solveRipeningInhibitor,
	"increase_emulsifier":         solveEmulsifierLayer,
	"lower_volume_fraction":       solveVolumeFraction,
	"widen_size_distribution":     solveSizeSpan,
	"controlled_flocculation":     solveControlledFlocculation,
	"control_storage_temperature": solveStorageTemperature,
	"reduce_process_shear":        solveProcessShear,
}
