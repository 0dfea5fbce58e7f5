package remedy

// changes maps each catalogue remedy to the request inputs it changes (JSON
// paths as in the request, without units' brackets). A request's
// constraints name inputs the product cannot change; a remedy that changes
// one is withheld. A test holds the request's list of constrainable inputs
// to this table.
var changes = map[string][]string{
	"reduce_particle_size":        {"particles.diameter_nm"},
	"match_density":               {"medium.density_kg_m3", "particles.density_kg_m3"},
	"raise_viscosity":             {"medium.viscosity_mPa_s"},
	"add_yield_stress":            {"medium.yield_stress_Pa"},
	"raise_surface_charge":        {"particles.zeta_mV"},
	"move_ph_from_iep":            {"medium.ph"},
	"lower_ionic_strength":        {"medium.ionic_strength_mM", "medium.electrolytes"},
	"remove_multivalent_ions":     {"medium.ionic_strength_mM", "medium.electrolytes"},
	"add_steric_layer":            {"stabilizer.layer_thickness_nm"},
	"thicken_steric_layer":        {"stabilizer.layer_thickness_nm"},
	"improve_solvent_quality":     {"stabilizer.solvent_quality"},
	"reduce_free_polymer":         {"medium.free_polymer"},
	"adjust_polymer_dose":         {"stabilizer.adsorbing_polymer"},
	"add_ripening_inhibitor":      {"particles.solubility_mol_m3"},
	"increase_emulsifier":         {"stabilizer.layer_thickness_nm"},
	"lower_volume_fraction":       {"particles.volume_fraction"},
	"widen_size_distribution":     {"particles.size_distribution"},
	"controlled_flocculation":     {"medium.ionic_strength_mM", "medium.electrolytes"},
	"control_storage_temperature": {"storage.temperature_c", "storage.min_temperature_c", "storage.max_temperature_c"},
	"reduce_process_shear":        {"storage.shear_rate_per_s"},
	"add_freeze_protectant":       {"medium.cosolvents"},
}

// Breaks returns the constraints among constrained that remedy id would
// change, nil when it changes none of them.
func Breaks(id string, constrained []string) []string {
	var out []string
	for _, in := range changes[id] {
		for _, c := range constrained {
			if c == in {
				out = append(out, c)
			}
		}
	}
	return out
}
