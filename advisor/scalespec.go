package advisor

// ScaleSpec declares one reported scale: its name (a stable identifier), its
// reporting unit and what it means. Every scale is also a numeric fact of
// the same name, in the same unit, for the rules.
type ScaleSpec struct {
	Name    string `json:"name"`
	Unit    string `json:"unit"`
	Meaning string `json:"meaning"`
}

var scaleSpecs = []ScaleSpec{
	{"liquid_viscosity", "mPa s", "viscosity of the continuous phase at the storage temperature"},
	{"liquid_density", "kg/m^3", "density of the continuous phase at the storage temperature"},
	{"particle_density", "kg/m^3", "density of the dispersed phase"},
	{"density_difference", "kg/m^3", "particle minus liquid density; negative means the particles rise"},
	{"stokes_velocity", "mm/d", "Stokes speed of an isolated median particle (up or down)"},
	{"hindered_velocity", "mm/d", "speed of the particles at their volume fraction (Richardson-Zaki)"},
	{"particle_reynolds_number", "1", "Reynolds number of the settling median particle"},
	{"time_to_settle_container", "d", "time for the median particle to cross the container height"},
	{"clear_layer_at_shelf_life", "mm", "clear (or cream) layer predicted at the end of shelf life"},
	{"sedimented_fraction", "1", "fraction of the solids that reaches the bottom (or top) within shelf life"},
	{"gravitational_length", "mm", "height over which gravity and Brownian motion balance (kT over buoyant weight)"},
	{"height_to_gravitational_length", "1", "container height over gravitational length; above 1 gravity wins"},
	{"suspension_diameter", "nm", "largest diameter that one kT lifts by its own diameter against its buoyant weight"},
	{"quantum_diameter", "nm", "smallest diameter that behaves classically at this temperature"},
	{"diffusion_coefficient", "um^2/s", "Stokes-Einstein diffusion coefficient of the median particle"},
	{"ionic_strength", "mM", "ionic strength of the medium"},
	{"debye_length", "nm", "Debye screening length"},
	{"kappa_a", "1", "particle radius over Debye length"},
	{"counter_ion_valence", "1", "largest valence of the ions of charge opposite to the surface"},
	{"zeta_potential", "mV", "zeta potential used for the double layer (measured, converted or estimated)"},
	{"henry_function", "1", "Henry's function used to convert mobility to zeta potential"},
	{"surface_charge_density", "C/m^2", "charge of the surface plane from the site-binding model in the product's liquid"},
	{"diffuse_layer_potential", "mV", "potential at the start of the diffuse layer from the site-binding model in the product's liquid"},
	{"ph_distance_from_iep", "pH", "distance of the pH from the isoelectric point"},
	{"hamaker_constant", "zJ", "particle-medium-particle Hamaker constant"},
	{"energy_barrier", "kT", "height of the primary maximum of the interaction energy"},
	{"barrier_position", "nm", "surface separation at the energy barrier"},
	{"barrier_at_cutoff", "1", "1 when the barrier lies at the closest approach (the 0.2 nm cut-off or steric contact), else 0"},
	{"secondary_minimum", "kT", "depth of the secondary minimum (negative)"},
	{"secondary_minimum_position", "nm", "surface separation at the secondary minimum"},
	{"log10_stability_ratio", "1", "base-10 logarithm of the Fuchs stability ratio W"},
	{"rapid_aggregation_half_life", "s", "Smoluchowski half-life without any barrier (W = 1)"},
	{"log10_aggregation_half_life_days", "1", "base-10 logarithm of the aggregation half-life in days (with W)"},
	{"log10_half_life_over_shelf_life", "1", "base-10 logarithm of the aggregation half-life over the shelf life"},
	{"critical_coagulation_concentration", "mM", "salt concentration at which the barrier vanishes, for the counter-ion valence present"},
	{"ccc_high_potential", "mM", "critical coagulation concentration of a z:z salt of the counter-ion valence, high-potential closed form (for comparison)"},
	{"ionic_strength_over_ccc", "1", "ionic strength over the critical ionic strength at which the barrier vanishes"},
	{"far_field_potential", "mV", "effective potential of the double layer's far field in the actual ion mixture (flat-plate Poisson-Boltzmann)"},
	{"multivalent_concentration", "mM", "concentration of the multivalent salt (or hardness) present"},
	{"multivalent_ccc", "mM", "concentration of the multivalent salt at which the barrier vanishes, the other ions kept"},
	{"multivalent_over_ccc", "1", "multivalent salt concentration over its own critical coagulation concentration"},
	{"steric_contact_energy", "kT", "van der Waals energy when the steric layers touch (h = 2 thickness)"},
	{"depletion_well", "kT", "Asakura-Oosawa depletion energy at contact"},
	{"free_polymer_overlap_ratio", "1", "free polymer concentration over its overlap concentration"},
	{"bridging_likely", "1", "1 when the adsorbing polymer meets the bridging conditions, else 0"},
	{"ostwald_ripening_rate", "nm^3/s", "LSW rate of change of the cube of the mean radius"},
	{"time_to_double_diameter", "d", "time for ripening to double the mean diameter"},
	{"predicted_size_growth_at_age", "%", "diameter growth predicted by ripening at the observed age"},
	{"relative_viscosity", "1", "suspension over liquid viscosity (Krieger-Dougherty, effective volume fraction)"},
	{"effective_volume_fraction", "1", "volume fraction including the double layer or steric shell"},
	{"max_packing_fraction", "1", "maximum packing fraction used for the viscosity"},
	{"packing_ratio", "1", "effective volume fraction over maximum packing"},
	{"yield_stress_needed", "Pa", "yield stress that holds the largest particle against gravity (Beris et al.)"},
	{"orthokinetic_ratio", "1", "shear over Brownian collision rate at the storage or process shear rate"},
	{"shear_energy", "kT", "work shear can do on a pair across the barrier range"},
	{"suspension_viscosity", "mPa s", "viscosity of the suspension a pair feels under shear: liquid viscosity times relative viscosity"},
	{"freezing_point", "degC", "freezing point of the continuous phase with its co-solvent and dissolved ions"},
	{"freeze_margin", "K", "lowest storage temperature minus the freezing point; negative means the liquid freezes"},
	{"boiling_margin", "K", "boiling point of the liquid minus the highest storage temperature; negative means it boils"},
	{"cloud_point_margin", "K", "cloud point of the stabiliser minus the highest storage temperature"},
	{"layer_factor_at_storage", "1", "steric layer thickness at the highest storage temperature over the stated one (Flory chi towards the cloud point)"},
	{"steric_thickness_at_storage", "nm", "steric layer thickness at the highest storage temperature"},
	{"minimum_steric_thickness", "nm", "thinnest steric layer that keeps the van der Waals energy at contact within the acceptance criterion"},
	{"apparent_settling_diameter", "nm", "diameter whose Stokes speed explains the observed clear layer"},
	{"observed_settling_rate", "mm/d", "clear layer over age, as observed"},
	{"settling_rate_ratio", "1", "observed settling rate over the predicted rate of the primary particles"},
}

// Scales lists every scale the advisor can report.
func Scales() []ScaleSpec { return append([]ScaleSpec(nil), scaleSpecs...) }
