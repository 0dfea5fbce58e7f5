package advisor

import "colloidtriage/advisor/rule"

// The rules' vocabulary is declared here: every name a rule may use, in the
// unit it is compared in. inputFacts are what the sample states directly,
// its acceptance criteria, and the thresholds that physics names
// (stable_ph_distance); every scale of scaleSpecs (scalespec.go) is a numeric fact in its
// reporting unit; package rule adds rule.TopCauseScore.

// inputFact declares one fact the sample states directly.
type inputFact struct {
	name    string
	kind    rule.Kind
	unit    string
	meaning string
}

var inputFacts = []inputFact{
	{"symptom", rule.Text, "", "the reported symptom"},
	{"phase", rule.Text, "", "solid, liquid (droplets) or gas (bubbles)"},
	{"volume_fraction", rule.Number, "1", "volume fraction of the dispersed phase"},
	{"shelf_life_days", rule.Number, "d", "required shelf life"},
	{"container_height_mm", rule.Number, "mm", "fill height of the container"},
	{"max_clear_layer_mm", rule.Number, "mm", "acceptance criterion for the clear or cream layer"},
	{"storage_temperature_c", rule.Number, "degC", "temperature at which stability is judged (the warm end of a storage range)"},
	{"storage_min_temperature_c", rule.Number, "degC", "lowest storage or transport temperature (the cold end; the storage temperature without a range)"},
	{"freeze_thaw_cycles", rule.Number, "1", "number of freeze-thaw cycles stated"},
	{"observed_clear_layer_mm", rule.Number, "mm", "clear layer reported in the complaint"},
	{"age_days", rule.Number, "d", "age of the sample when observed"},
	{"sediment_redisperses", rule.Text, "", `"yes", "no" or "" when not observed`},
	{"viscosity_change_percent", rule.Number, "%", "observed change of viscosity"},
	{"size_growth_percent", rule.Number, "%", "observed growth of the median size"},
	{"zeta_measured", rule.Flag, "", "zeta potential or mobility was measured"},
	{"has_electrolyte", rule.Flag, "", "the medium holds dissolved ions"},
	{"ph", rule.Number, "pH", "pH of the medium"},
	{"isoelectric_ph", rule.Number, "pH", "isoelectric point of the particles"},
	{"has_steric_layer", rule.Flag, "", "an adsorbed steric layer is declared"},
	{"steric_thickness_nm", rule.Number, "nm", "declared steric layer thickness"},
	{"solvent_quality", rule.Text, "", "good, theta, poor or \"\" when unknown"},
	{"cloud_point_c", rule.Number, "degC", "cloud point of the stabiliser"},
	{"free_polymer_g_L", rule.Number, "g/L", "free non-adsorbing polymer"},
	{"adsorbing_coverage", rule.Number, "1", "surface coverage of the adsorbing polymer"},
	{"adsorbing_molar_mass_kg_mol", rule.Number, "kg/mol", "molar mass of the adsorbing polymer"},
	{"shear_rate_per_s", rule.Number, "1/s", "shear rate in processing or transport"},
	{"yield_stress_pa", rule.Number, "Pa", "yield stress of the continuous phase"},
	{"min_barrier_kT", rule.Number, "kT", "acceptance criterion: smallest energy barrier"},
	{"stable_ph_distance", rule.Number, "pH", "distance from the isoelectric point within which most charge-stabilised dispersions are unstable (physics.PHDistanceForStability)"},
	{"half_life_to_shelf_life", rule.Number, "1", "acceptance criterion: aggregation half-life over shelf life"},
	{"has_size_distribution", rule.Flag, "", "a size span or distribution was given"},
	{"max_relative_viscosity", rule.Number, "1", "acceptance criterion: largest relative viscosity"},
	{"max_steric_contact_kT", rule.Number, "kT", "acceptance criterion: deepest van der Waals energy at steric contact"},
	{"aggregation_half_life_text", rule.Text, "", "the aggregation half-life in words (hours, days, years, or longer than the age of the universe)"},
	{"stability_ratio_text", rule.Text, "", "the Fuchs stability ratio as a power of ten, or in words when unbounded"},
}

// vocabulary is the facts declared to the rule set: inputFacts, then the
// scales.
var vocabulary = func() []rule.Fact {
	out := make([]rule.Fact, 0, len(inputFacts)+len(scaleSpecs))
	for _, f := range inputFacts {
		out = append(out, rule.Fact{Name: f.name, Kind: f.kind, Unit: f.unit, Meaning: f.meaning})
	}
	for _, s := range scaleSpecs {
		out = append(out, rule.Fact{Name: s.Name, Kind: rule.Number, Unit: s.Unit, Meaning: s.Meaning})
	}
	return out
}()
