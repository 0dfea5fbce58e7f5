package uncertainty

import "colloidtriage/advisor/input"

// Provenance is where an input's value came from.
type Provenance string

// The provenances. Measured means stated in the request.
const (
	Measured  Provenance = "measured"
	Library   Provenance = "library"
	Estimated Provenance = "estimated"
	Default   Provenance = "default"
)

// spreadDefault is the standard uncertainty an input of one provenance
// takes when the request states none: an absolute standard deviation SD in
// the field's unit (at least Relative times the value's magnitude when
// Relative > 0), or a lognormal Factor (the geometric standard deviation).
type spreadDefault struct {
	path       string
	provenance Provenance
	sd         float64
	relative   float64
	factor     float64
	source     string
}

// defaults is the one table of default uncertainties. Tags as in the
// physics tests: [pub] a published figure, [memory] recalled, [practice]
// common practice with no single source.
var defaults = []spreadDefault{
	{"particles.diameter_nm", Measured, 0, 0, 1.08, "DLS or laser diffraction median, 5-10 % between instruments and dispersion protocols on real samples (ISO 22412:2017 asks 2 % only on monodisperse latex) [practice]"},
	{"particles.size_span", Measured, 0.1, 0, 0, "span of a stated distribution, +-0.1 between methods [practice]"},
	{"particles.density_kg_m3", Measured, 0, 0, 1.005, "gas pycnometry, 0.1-0.5 % [practice]"},
	{"particles.density_kg_m3", Library, 0, 0, 1.01, "handbook densities of one material, polymorphs and porosity, about 1 % [practice]"},
	{"medium.density_kg_m3", Measured, 0, 0, 1.001, "density meter or pycnometer, 0.1 % [practice]"},
	{"medium.density_kg_m3", Library, 0, 0, 1.005, "pure-liquid table against a product's liquid with solutes, 0.5 % [practice]"},
	{"medium.viscosity_mPa_s", Measured, 0, 0, 1.03, "rotational or capillary viscometer, 2-5 % [practice]"},
	{"medium.viscosity_mPa_s", Library, 0, 0, 1.05, "pure-liquid table against a product's liquid with solutes, 5 % [practice]"},
	{"storage.temperature_c", Measured, 1, 0, 0, "storage temperature of a room or cabinet, +-1 K [practice]"},
	{"medium.temperature_c", Measured, 0.5, 0, 0, "thermometer in the sample, +-0.5 K [practice]"},
	{"medium.temperature_c", Default, 3, 0, 0, "room temperature assumed for an unstated one, 20-30 degC [practice]"},
	{"particles.volume_fraction", Measured, 0, 0, 1.03, "solids content by drying, 1-3 % relative [practice]"},
	{"particles.volume_fraction", Default, 0, 0, 2, "an unstated volume fraction is a guess [practice]"},
	{"particles.zeta_mV", Measured, 5, 0.1, 0, "electrophoretic light scattering, +-10 % or 5 mV (ISO 13099-2:2012 accepts 10 % on its reference material) [practice]"},
	{"particles.mobility_um_cm_per_V_s", Measured, 0, 0.1, 0, "electrophoretic mobility, +-10 % (ISO 13099-2:2012 reference-material tolerance) [practice]"},
	{"particles.zeta_mV", Estimated, 20, 0, 0, "the estimate from pH and isoelectric point ignores ionic strength, specific adsorption and site density; measured zeta potentials at one pH distance scatter by tens of mV [practice]"},
	{"particles.isoelectric_ph", Measured, 0.2, 0, 0, "titration or zeta-pH curve, +-0.2 pH [practice]"},
	{"particles.isoelectric_ph", Library, 0.7, 0, 0, "reported isoelectric points of one oxide scatter by about +-1 pH with origin and treatment (Kosmulski 2009, Surface Charging and Points of Zero Charge) [memory]"},
	{"medium.ph", Measured, 0.1, 0, 0, "glass electrode in a dispersion, +-0.1 pH [practice]"},
	{"particles.hamaker_zJ", Measured, 0, 0, 1.3, "a stated Hamaker constant from Lifshitz theory, 20-30 % between spectral models (Bergstrom 1997, Adv. Colloid Interface Sci. 70:125) [memory]"},
	{"particles.hamaker_zJ", Library, 0, 0, 1.5, "tabulated Hamaker constants of one material scatter by a factor 1.5-2 (Bergstrom 1997, Adv. Colloid Interface Sci. 70:125) [memory]"},
	{"particles.hamaker_zJ", Estimated, 0, 0, 1.3, "Tabor-Winterton against full Lifshitz theory, 20-30 % (Bergstrom 1997) [memory], on top of the drawn refractive index"},
	{"particles.hamaker_zJ", Default, 0, 0, 2, "the default 10 zJ stands for 3-30 zJ of oxides and polymers across water [practice]"},
	{"particles.refractive_index", Measured, 0.005, 0, 0, "refractometry, +-0.005 [practice]"},
	{"particles.refractive_index", Library, 0.02, 0, 0, "tabulated indices of one material, polymorph and wavelength, +-0.02 [practice]"},
	{"medium.electrolytes", Measured, 0, 0, 1.1, "weighed salts plus the unstated ions of raw materials and water, 10 % [practice]"},
	{"medium.ionic_strength_mM", Measured, 0, 0, 1.1, "a stated ionic strength, 10 % [practice]"},
	{"medium.conductivity_uS_cm", Estimated, 0, 0, 1.5, "ionic strength from conductivity (Russell 1976 relation) depends on the ions present, a factor 1.5 [practice]"},
	{"medium.ionic_strength_mM", Default, 0, 0, 3, "unstated background electrolyte (dissolved CO2, ions of raw materials) [practice]"},
	{"stabilizer.layer_thickness_nm", Measured, 0, 0, 1.3, "adsorbed layer thickness from hydrodynamic size differences, tens of % [practice]"},
	{"stabilizer.cloud_point_c", Measured, 2, 0, 0, "cloud point at the product's concentration and salt, +-2 K [practice]"},
	{"stabilizer.adsorbing_polymer.surface_coverage", Measured, 0.1, 0, 0, "coverage from an adsorption isotherm, +-0.1 [practice]"},
	{"medium.free_polymer.concentration_g_L", Measured, 0, 0, 1.05, "dosed polymer concentration, 5 % [practice]"},
	{"medium.free_polymer.radius_of_gyration_nm", Measured, 0, 0, 1.1, "light scattering radius of gyration, 10 % [practice]"},
	{"medium.free_polymer.radius_of_gyration_nm", Estimated, 0, 0, 1.3, "coil size from molar mass: prefactors vary with solvent, 30 % [practice]"},
	{"particles.solubility_mol_m3", Measured, 0, 0, 2, "solubility of an oil in water, reported values differ by factors [practice]"},
	{"particles.solubility_mol_m3", Default, 0, 0, 10, "the default stands for oils whose solubilities span decades [practice]"},
	{"particles.interfacial_tension_mN_m", Measured, 0, 0, 1.1, "tensiometry, 10 % [practice]"},
	{"particles.interfacial_tension_mN_m", Default, 0, 0, 2, "the default stands for emulsifier-covered interfaces of 1-20 mN/m [practice]"},
	{"particles.molar_volume_cm3_mol", Measured, 0, 0, 1.02, "molar mass over density, 2 % [practice]"},
	{"particles.molar_volume_cm3_mol", Default, 0, 0, 1.3, "the default stands for C12-C20 oils [practice]"},
	{"storage.container_height_mm", Measured, 0, 0, 1.02, "fill height, 2 % [practice]"},
	{"storage.container_height_mm", Default, 0, 0, 1.5, "an unstated container [practice]"},
	{"storage.shear_rate_per_s", Measured, 0, 0, 2, "process shear rates are known to an order of magnitude (Barnes, Hutton & Walters 1989 give ranges spanning decades) [practice]"},
	{"medium.yield_stress_Pa", Measured, 0, 0, 1.2, "yield stress depends on the method and time scale, 20 % [practice]"},
	{"observation.clear_layer_mm", Measured, 1, 0.1, 0, "a layer boundary read by eye on a ruler, +-1 mm or 10 % [practice]"},
	{"observation.size_growth_percent", Measured, 10, 0, 0, "two size measurements at 5-10 % each, +-10 percentage points [practice]"},
	{"observation.viscosity_change_percent", Measured, 5, 0.1, 0, "two viscosity readings at the same shear rate and temperature, +-5 percentage points or 10 % [practice]"},
	{"observation.age_days", Measured, 0, 0, 3, "the time by which a change is noticed: it may have happened any time before inspection, a factor 3 [practice]"},
}

// how is the measurement that pins each input, for measure_next.
var how = map[string]string{
	"particles.diameter_nm":                         "a size distribution of the product itself (laser diffraction or DLS, ISO 13320 / ISO 22412)",
	"particles.size_span":                           "a size distribution (laser diffraction, ISO 13320)",
	"particles.density_kg_m3":                       "the particles' density by gas pycnometry",
	"medium.density_kg_m3":                          "the continuous phase's density (density meter on the serum)",
	"medium.viscosity_mPa_s":                        "the continuous phase's viscosity at the storage temperature",
	"storage.temperature_c":                         "a temperature log of the storage",
	"medium.temperature_c":                          "the product's temperature",
	"particles.volume_fraction":                     "the solids content (drying) and the particle density",
	"particles.zeta_mV":                             "the zeta potential in the product's own liquid (diluted in its serum, not in water)",
	"particles.mobility_um_cm_per_V_s":              "the electrophoretic mobility in the product's own liquid",
	"particles.isoelectric_ph":                      "a zeta potential-pH titration of the particles",
	"medium.ph":                                     "the pH of the product",
	"particles.hamaker_zJ":                          "the Hamaker constant from optical data (refractive index dispersion, Lifshitz theory)",
	"particles.refractive_index":                    "the particles' refractive index",
	"medium.electrolytes":                           "the ions of the serum (conductivity and ion chromatography)",
	"medium.ionic_strength_mM":                      "the ionic strength of the serum (conductivity and ion analysis)",
	"medium.conductivity_uS_cm":                     "the ions of the serum (ion chromatography)",
	"stabilizer.layer_thickness_nm":                 "the adsorbed layer thickness (size with and without stabiliser)",
	"stabilizer.cloud_point_c":                      "the stabiliser's cloud point in the product's liquid",
	"stabilizer.adsorbing_polymer.surface_coverage": "an adsorption isotherm of the polymer",
	"medium.free_polymer.concentration_g_L":         "the free polymer content of the serum",
	"medium.free_polymer.radius_of_gyration_nm":     "the free polymer's radius of gyration (light scattering or GPC)",
	"particles.solubility_mol_m3":                   "the dispersed oil's solubility in the continuous phase",
	"particles.interfacial_tension_mN_m":            "the interfacial tension (pendant drop)",
	"particles.molar_volume_cm3_mol":                "the dispersed phase's molar mass and density",
	"storage.container_height_mm":                   "the fill height of the container",
	"storage.shear_rate_per_s":                      "the shear rate of the process step (flow rate and gap)",
	"medium.yield_stress_Pa":                        "the yield stress of the continuous phase (stress ramp)",
}

// observationPaths are the observation fields whose uncertainty widens the
// likelihood of the draws; they are not drawn.
var observationPaths = map[string]bool{
	"observation.clear_layer_mm":           true,
	"observation.size_growth_percent":      true,
	"observation.age_days":                 true,
	"observation.viscosity_change_percent": true,
}

// lookup finds the default of a path and provenance.
func lookup(path string, p Provenance) (spreadDefault, bool) {
	for _, d := range defaults {
		if d.path == path && d.provenance == p {
			return d, true
		}
	}
	return spreadDefault{}, false
}

// Known reports whether path is an input the request may state an
// uncertainty for.
func Known(path string) bool {
	if observationPaths[path] {
		return true
	}
	_, ok := how[path]
	return ok
}

// ObservationWidth is the standard uncertainty of an observed value at
// path: the request's, else the table's (the larger of the absolute SD and
// the relative part), as an absolute SD or a lognormal factor.
func ObservationWidth(u input.Uncertainty, path string, observed float64) input.Spread {
	if s, ok := u[path]; ok {
		return s
	}
	d, _ := lookup(path, Measured)
	return input.Spread{SD: max(d.sd, d.relative*abs(observed)), Factor: d.factor}
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

// ranges are the physical ranges of the quantities that inputs and remedy
// targets name, in the request's units: the request's valid ranges, but
// for a zeta potential, whose magnitude rarely exceeds 150 mV in practice.
var ranges = map[string][2]float64{
	"particles.diameter_nm":                         {0.5, 1e7},
	"particles.size_span":                           {0, 5},
	"particles.density_kg_m3":                       {0.05, 25000},
	"particles.volume_fraction":                     {1e-6, 0.73},
	"particles.solubility_mol_m3":                   {0, 1e4},
	"particles.interfacial_tension_mN_m":            {0.01, 100},
	"particles.molar_volume_cm3_mol":                {1, 5000},
	"particles.isoelectric_ph":                      {0, 14},
	"particles.hamaker_zJ":                          {0.01, 1000},
	"particles.refractive_index":                    {1, 4},
	"particles.zeta_mV":                             {-300, 300},
	"particles.mobility_um_cm_per_V_s":              {-20, 20},
	"|particles.zeta_mV|":                           {0, 150},
	"medium.density_kg_m3":                          {500, 3000},
	"medium.viscosity_mPa_s":                        {0.1, 1e7},
	"medium.temperature_c":                          {-60, 300},
	"medium.ph":                                     {0, 14},
	"medium.electrolytes":                           {1e-7, 5000},
	"medium.ionic_strength_mM":                      {1e-7, 5000},
	"medium.conductivity_uS_cm":                     {1e-7, 5000},
	"medium.yield_stress_Pa":                        {0, 10000},
	"medium.free_polymer.concentration_g_L":         {0, 500},
	"medium.free_polymer.radius_of_gyration_nm":     {0.1, 1000},
	"stabilizer.layer_thickness_nm":                 {0, 1000},
	"stabilizer.cloud_point_c":                      {-20, 250},
	"stabilizer.flory_huggins_chi":                  {-2, 5},
	"stabilizer.adsorbing_polymer.surface_coverage": {0, 1},
	"storage.temperature_c":                         {-60, 300},
	"storage.container_height_mm":                   {1, 20000},
	"storage.shear_rate_per_s":                      {0, 1e7},
}

// Range is the physical range of a quantity (a request field path or a
// remedy target's quantity), ok false when the table has none.
func Range(quantity string) (lo, hi float64, ok bool) {
	r, ok := ranges[quantity]
	return r[0], r[1], ok
}
