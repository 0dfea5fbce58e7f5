package input

import (
	"bytes"
	"encoding/json"
	"errors"
)

// Sample is one complaint as a user states it: the batch's specification, its
// storage and what was observed. Field names carry their units; optional
// numbers are pointers so that "not given" differs from zero. The `validate`
// tags hold the valid ranges (checked once, at the edge, by package api) and
// the `unit` tags name the unit reported when a value is out of range.
type Sample struct {
	SampleID    string       `json:"sample_id,omitempty" validate:"max=128"`
	Symptom     string       `json:"symptom" validate:"required,oneof=settling caking creaming flocculation viscosity_rise size_growth phase_separation"`
	Product     string       `json:"product_category,omitempty" validate:"omitempty,oneof=paint ink coating cosmetic food beverage pharmaceutical ceramic agrochemical other"`
	Particles   Particles    `json:"particles"`
	Medium      Medium       `json:"medium"`
	Stabilizer  *Stabilizer  `json:"stabilizer,omitempty"`
	Storage     Storage      `json:"storage"`
	Observation *Observation `json:"observation,omitempty"`
	Criteria    *Criteria    `json:"criteria,omitempty"`
	Models      *Models      `json:"models,omitempty"`
	Uncertainty Uncertainty  `json:"uncertainty,omitempty"`
	Analysis    *Analysis    `json:"analysis,omitempty"`
	// Observations follow the complaint over time (see ObservationPoint).
	Observations []ObservationPoint `json:"observations,omitempty" validate:"omitempty,max=20,dive"`
	// Constraints names inputs the product cannot change (a salt that is
	// part of the recipe, a size set by the grade): remedies that would
	// change one are withheld and listed on their cause.
	Constraints []string `json:"constraints,omitempty" validate:"omitempty,max=30,dive,oneof=medium.cosolvents medium.density_kg_m3 medium.electrolytes medium.free_polymer medium.ionic_strength_mM medium.ph medium.viscosity_mPa_s medium.yield_stress_Pa particles.density_kg_m3 particles.diameter_nm particles.size_distribution particles.solubility_mol_m3 particles.volume_fraction particles.zeta_mV stabilizer.adsorbing_polymer stabilizer.layer_thickness_nm stabilizer.solvent_quality storage.max_temperature_c storage.min_temperature_c storage.shear_rate_per_s storage.temperature_c"`
}

// Models selects optional physical models; the defaults are named in every report.
type Models struct {
	VanDerWaals      string `json:"van_der_waals,omitempty" validate:"omitempty,oneof=hamaker_exact retarded_gregory"`
	DoubleLayer      string `json:"double_layer,omitempty" validate:"omitempty,oneof=linear_superposition constant_potential"`
	ZetaFromMobility string `json:"zeta_from_mobility,omitempty" validate:"omitempty,oneof=henry_ohshima henry_exact smoluchowski huckel"`
}

// Particles describes the dispersed phase.
type Particles struct {
	Material          string      `json:"material,omitempty" validate:"max=64"`
	Phase             string      `json:"phase,omitempty" validate:"omitempty,oneof=solid liquid gas"`
	DiameterNm        *float64    `json:"diameter_nm,omitempty" validate:"required_without=SizeDistribution,omitempty,gte=0.5,lte=1e7" unit:"nm"`
	SizeSpan          *float64    `json:"size_span,omitempty" validate:"omitempty,gte=0,lte=5" unit:"1"`
	SizeDistribution  []SizeClass `json:"size_distribution,omitempty" validate:"omitempty,min=1,max=100,dive"`
	DensityKgM3       *float64    `json:"density_kg_m3,omitempty" validate:"omitempty,gte=0.05,lte=25000" unit:"kg/m^3"`
	VolumeFraction    *float64    `json:"volume_fraction,omitempty" validate:"omitempty,gt=0,lt=0.74" unit:"1"`
	ZetaMV            *float64    `json:"zeta_mV,omitempty" validate:"omitempty,gte=-300,lte=300" unit:"mV"`
	Mobility          *float64    `json:"mobility_um_cm_per_V_s,omitempty" validate:"omitempty,gte=-20,lte=20" unit:"um cm/(V s)"`
	IsoelectricPH     *float64    `json:"isoelectric_ph,omitempty" validate:"omitempty,gte=0,lte=14" unit:"pH"`
	HamakerZJ         *float64    `json:"hamaker_zJ,omitempty" validate:"omitempty,gte=0,lte=1000" unit:"zJ"`
	RefractiveIndex   *float64    `json:"refractive_index,omitempty" validate:"omitempty,gte=1,lte=4" unit:"1"`
	Permittivity      *float64    `json:"relative_permittivity,omitempty" validate:"omitempty,gte=1,lte=1e4" unit:"1"`
	SolubilityMolM3   *float64    `json:"solubility_mol_m3,omitempty" validate:"omitempty,gte=0,lte=1e4" unit:"mol/m^3"`
	MolarVolumeCm3Mol *float64    `json:"molar_volume_cm3_mol,omitempty" validate:"omitempty,gte=1,lte=5000" unit:"cm^3/mol"`
	TensionMNm        *float64    `json:"interfacial_tension_mN_m,omitempty" validate:"omitempty,gte=0.01,lte=100" unit:"mN/m"`
	ZetaMeasuredIn    *ZetaLiquid `json:"zeta_measured_in,omitempty"`
}

// ZetaLiquid is the liquid a zeta potential or mobility was measured in,
// when it is not the product itself (a diluted sample, a standard
// electrolyte): its pH, its salts or ionic strength, its temperature.
type ZetaLiquid struct {
	PH              *float64      `json:"ph" validate:"required,gte=0,lte=14" unit:"pH"`
	Electrolytes    []Electrolyte `json:"electrolytes,omitempty" validate:"omitempty,max=20,dive"`
	IonicStrengthMM *float64      `json:"ionic_strength_mM,omitempty" validate:"omitempty,gte=0,lte=5000" unit:"mM"`
	TemperatureC    *float64      `json:"temperature_c,omitempty" validate:"omitempty,gte=-60,lte=300" unit:"degC"`
}

// SizeClass is one class of an explicit size distribution.
type SizeClass struct {
	DiameterNm     float64 `json:"diameter_nm" validate:"gte=0.5,lte=1e7" unit:"nm"`
	VolumeFraction float64 `json:"volume_fraction" validate:"gt=0,lte=1" unit:"1"`
}

// Medium describes the continuous phase.
type Medium struct {
	Liquid           string        `json:"liquid,omitempty" validate:"max=64"`
	TemperatureC     *float64      `json:"temperature_c,omitempty" validate:"omitempty,gte=-60,lte=300" unit:"degC"`
	DensityKgM3      *float64      `json:"density_kg_m3,omitempty" validate:"omitempty,gte=500,lte=3000" unit:"kg/m^3"`
	ViscosityMPaS    *float64      `json:"viscosity_mPa_s,omitempty" validate:"omitempty,gte=0.1,lte=1e7" unit:"mPa s"`
	Permittivity     *float64      `json:"relative_permittivity,omitempty" validate:"omitempty,gte=1,lte=200" unit:"1"`
	RefractiveIndex  *float64      `json:"refractive_index,omitempty" validate:"omitempty,gte=1,lte=3" unit:"1"`
	PH               *float64      `json:"ph,omitempty" validate:"omitempty,gte=0,lte=14" unit:"pH"`
	Electrolytes     []Electrolyte `json:"electrolytes,omitempty" validate:"omitempty,max=20,dive"`
	Hardness         *Hardness     `json:"hardness,omitempty"`
	IonicStrengthMM  *float64      `json:"ionic_strength_mM,omitempty" validate:"omitempty,gte=0,lte=5000" unit:"mM"`
	ConductivityUSCm *float64      `json:"conductivity_uS_cm,omitempty" validate:"omitempty,gte=0,lte=300000" unit:"uS/cm"`
	YieldStressPa    *float64      `json:"yield_stress_Pa,omitempty" validate:"omitempty,gte=0,lte=10000" unit:"Pa"`
	FreePolymer      *FreePolymer  `json:"free_polymer,omitempty"`
	Cosolvents       []Cosolvent   `json:"cosolvents,omitempty" validate:"omitempty,max=1,dive"`
}

// Cosolvent is a water-miscible liquid mixed into an aqueous medium (a
// freeze protectant), by name and mass fraction of the liquid phase.
type Cosolvent struct {
	Name         string   `json:"name" validate:"required,oneof=ethylene_glycol propylene_glycol glycerol ethanol"`
	MassFraction *float64 `json:"mass_fraction" validate:"required,gte=0,lte=0.6" unit:"1"`
}

// Electrolyte is one dissolved salt, by formula or by explicit valences.
type Electrolyte struct {
	Formula         string   `json:"formula,omitempty" validate:"max=32"`
	CationValence   *int     `json:"cation_valence,omitempty" validate:"omitempty,gte=1,lte=4" unit:"1"`
	AnionValence    *int     `json:"anion_valence,omitempty" validate:"omitempty,gte=1,lte=4" unit:"1"`
	ConcentrationMM *float64 `json:"concentration_mM" validate:"required,gte=0,lte=5000" unit:"mM"`
}

// Hardness is the total hardness (calcium and magnesium) of the water the
// product is made with, in one of four units: mg/L as CaCO3, German degrees
// (dH, 10 mg/L CaO), French degrees (fH, 10 mg/L CaCO3) or mM of Ca2+ and
// Mg2+ together; the value's unit is the one named in unit.
type Hardness struct {
	Value *float64 `json:"value" validate:"required,gte=0,lte=5000" unit:"hardness.unit"`
	Unit  string   `json:"unit" validate:"required,oneof=mg_L_CaCO3 dH fH mM"`
}

// FreePolymer is dissolved, non-adsorbing polymer (a depletant).
type FreePolymer struct {
	ConcentrationGL  *float64 `json:"concentration_g_L" validate:"required,gte=0,lte=500" unit:"g/L"`
	RadiusGyrationNm *float64 `json:"radius_of_gyration_nm,omitempty" validate:"omitempty,gte=0.1,lte=1000" unit:"nm"`
	MolarMassKgMol   *float64 `json:"molar_mass_kg_mol,omitempty" validate:"omitempty,gte=0.1,lte=100000" unit:"kg/mol"`
}

// Stabilizer describes an adsorbed steric layer and adsorbing polymer.
type Stabilizer struct {
	LayerThicknessNm *float64          `json:"layer_thickness_nm,omitempty" validate:"omitempty,gte=0,lte=1000" unit:"nm"`
	SolventQuality   string            `json:"solvent_quality,omitempty" validate:"omitempty,oneof=good theta poor"`
	FloryHugginsChi  *float64          `json:"flory_huggins_chi,omitempty" validate:"omitempty,gte=-2,lte=5" unit:"1"`
	CloudPointC      *float64          `json:"cloud_point_c,omitempty" validate:"omitempty,gte=-20,lte=250" unit:"degC"`
	AdsorbingPolymer *AdsorbingPolymer `json:"adsorbing_polymer,omitempty"`
}

// AdsorbingPolymer is a polymer that adsorbs on the particles (a possible bridge).
type AdsorbingPolymer struct {
	MolarMassKgMol  *float64 `json:"molar_mass_kg_mol" validate:"required,gte=0.1,lte=100000" unit:"kg/mol"`
	SurfaceCoverage *float64 `json:"surface_coverage" validate:"required,gte=0,lte=1" unit:"1"`
}

// Storage is where and how long the product must stay stable.
type Storage struct {
	ContainerHeightMm *float64 `json:"container_height_mm,omitempty" validate:"omitempty,gte=1,lte=20000" unit:"mm"`
	ShelfLifeDays     *float64 `json:"shelf_life_days,omitempty" validate:"omitempty,gte=0.01,lte=36500" unit:"d"`
	TemperatureC      *float64 `json:"temperature_c,omitempty" validate:"omitempty,gte=-60,lte=300" unit:"degC"`
	ShearRatePerS     *float64 `json:"shear_rate_per_s,omitempty" validate:"omitempty,gte=0,lte=1e7" unit:"1/s"`
	MaxClearLayerMm   *float64 `json:"max_clear_layer_mm,omitempty" validate:"omitempty,gte=0.01,lte=20000" unit:"mm"`
	MinTemperatureC   *float64 `json:"min_temperature_c,omitempty" validate:"omitempty,gte=-60,lte=300" unit:"degC"`
	MaxTemperatureC   *float64 `json:"max_temperature_c,omitempty" validate:"omitempty,gte=-60,lte=300" unit:"degC"`
	FreezeThawCycles  *int     `json:"freeze_thaw_cycles,omitempty" validate:"omitempty,gte=0,lte=1000" unit:"1"`
	ProcessStep       string   `json:"process_step,omitempty" validate:"omitempty,oneof=stirring pumping gear_pump high_shear_mixing milling filling spraying brushing rolling"`
}

// Observation is what the complaint reports.
type Observation struct {
	AgeDays                *float64 `json:"age_days,omitempty" validate:"omitempty,gte=0.001,lte=36500" unit:"d"`
	ClearLayerMm           *float64 `json:"clear_layer_mm,omitempty" validate:"omitempty,gte=0,lte=20000" unit:"mm"`
	SedimentRedisperses    *bool    `json:"sediment_redisperses,omitempty"`
	ViscosityChangePercent *float64 `json:"viscosity_change_percent,omitempty" validate:"omitempty,gte=-100,lte=100000" unit:"%"`
	SizeGrowthPercent      *float64 `json:"size_growth_percent,omitempty" validate:"omitempty,gte=-100,lte=100000" unit:"%"`
}

// Criteria overrides the acceptance criteria the remedies are solved for.
type Criteria struct {
	MinBarrierKT         *float64 `json:"min_barrier_kT,omitempty" validate:"omitempty,gte=0,lte=200" unit:"kT"`
	HalfLifeToShelfLife  *float64 `json:"half_life_to_shelf_life,omitempty" validate:"omitempty,gte=1,lte=1e6" unit:"1"`
	MaxRelativeViscosity *float64 `json:"max_relative_viscosity,omitempty" validate:"omitempty,gt=1,lte=1e4" unit:"1"`
	MaxStericContactKT   *float64 `json:"max_steric_contact_kT,omitempty" validate:"omitempty,gte=0.01,lte=100" unit:"kT"`
}

// Uncertainty states the standard uncertainty of numeric inputs by their
// dotted field path ("particles.zeta_mV"): an absolute standard deviation in
// the field's unit, or a lognormal factor. Inputs it leaves out take the
// default of their provenance (package advisor/uncertainty).
type Uncertainty map[string]Spread

// Spread is one stated uncertainty: a number is an absolute standard
// deviation in the field's unit; {"factor": f} a lognormal one, the
// value's geometric standard deviation f > 1.
type Spread struct {
	SD     float64
	Factor float64
}

// UnmarshalJSON reads a number or {"factor": f}.
func (s *Spread) UnmarshalJSON(data []byte) error {
	var sd float64
	if err := json.Unmarshal(data, &sd); err == nil {
		*s = Spread{SD: sd}
		return nil
	}
	var f struct {
		Factor *float64 `json:"factor"`
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&f); err != nil || f.Factor == nil {
		return errors.New(`an uncertainty is a number (standard deviation in the field's unit) or {"factor": f}`)
	}
	*s = Spread{Factor: *f.Factor}
	return nil
}

// MarshalJSON writes the form UnmarshalJSON reads.
func (s Spread) MarshalJSON() ([]byte, error) {
	if s.Factor != 0 {
		return json.Marshal(struct {
			Factor float64 `json:"factor"`
		}{s.Factor})
	}
	return json.Marshal(s.SD)
}

// Analysis sets the Monte Carlo propagation of the uncertainties: the
// number of draws (0: the nominal point only) and the seed of the random
// numbers (default: derived from the request, so identical requests give
// identical reports).
type Analysis struct {
	Draws *int `json:"draws,omitempty" validate:"omitempty,gte=0,lte=2000" unit:"1"`
	Seed  *int `json:"seed,omitempty" validate:"omitempty,gte=0,lte=9007199254740991" unit:"1"`
}

// ObservationPoint is one inspection of the complaint at an age; every
// measurement is optional.
type ObservationPoint struct {
	AgeDays             *float64 `json:"age_days" validate:"required,gte=0,lte=36500" unit:"d"`
	ClearLayerMm        *float64 `json:"clear_layer_mm,omitempty" validate:"omitempty,gte=0,lte=20000" unit:"mm"`
	MedianDiameterNm    *float64 `json:"median_diameter_nm,omitempty" validate:"omitempty,gte=0.5,lte=1e7" unit:"nm"`
	ViscosityMPaS       *float64 `json:"viscosity_mPa_s,omitempty" validate:"omitempty,gte=0.1,lte=1e7" unit:"mPa s"`
	SedimentRedisperses *bool    `json:"sediment_redisperses,omitempty"`
}
