package remedy

// Solver computes a remedy's target for one evaluated sample: the value a
// quantity must reach for the acceptance criterion to hold, found by
// inverting the same physics that diagnosed the cause, and the criterion in
// words. ok is false when no value of the quantity meets the criterion (the
// criterion then says why).
type Solver func(cs *Case) (t Target, criterion string, ok bool)

// For returns the solver of a catalogue remedy, or nil when the remedy has
// no computable target (investigate_non_colloidal).
func For(id string) Solver { return solvers[id] }

// solvers maps each remedy with a computable target to its solver;
// investigate_non_colloidal has none. A test checks the catalogue against it.
var solvers = map[string]Solver{
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
	"add_freeze_protectant":       solveFreezeProtectant,
}

// Target is a quantitative goal: quantity op value unit, e.g. "diameter_nm <= 420 nm".
type Target struct {
	Quantity string  `json:"quantity"`
	Op       string  `json:"op"`
	Value    float64 `json:"value"`
	Unit     string  `json:"unit"`
}
