package input

import (
	"math"
	"strconv"

	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// resolve turns a validated Sample into SI conditions, filling every gap from
// the library or a documented default and recording each fill in n. It
// returns an Error for values that are well-formed but physically
// impossible together (a temperature outside the liquid's range, a density
// nobody gave, an unknown salt).
func Resolve(s *Sample, lib *library.Library, n *Notes) (*Conditions, error) {
	bad := &Error{}
	c := &Conditions{Symptom: s.Symptom, Product: s.Product, Constraints: s.Constraints, PH: math.NaN(), IsoelectricPH: math.NaN(), Zeta: math.NaN(),
		Henry: math.NaN(), SurfaceCharge: math.NaN(), DiffusePotential: math.NaN()}
	p, m := &s.Particles, &s.Medium

	mat, hasMat := resolveMaterial(lib, p, bad)
	c.Material, c.MaterialKind = p.Material, mat.kind
	c.Phase = p.Phase
	if c.Phase == "" {
		c.Phase = "solid"
		if hasMat && mat.phase != "" {
			c.Phase = mat.phase
			n.Text("particles.phase = " + c.Phase + " from the library entry " + strconv.Quote(p.Material))
		} else {
			n.Text("particles.phase not given: solid assumed")
		}
	}

	mediumT := valueOr(m.TemperatureC, temperatureDefault, n)
	storageT, tempField := resolveStorageRange(&s.Storage, mediumT, c, bad, n)
	c.StorageTempK, c.MediumTempK = physics.Kelvin(storageT), physics.Kelvin(mediumT)
	before := len(bad.Problems)
	c.Liquid = resolveLiquid(lib, m, mediumT, storageT, tempField, bad, n)
	liquidOK := len(bad.Problems) == before
	if liquidOK {
		resolveCosolvent(m, mediumT, c, bad, n)
	}

	resolveSize(p, c, bad, n)
	c.ParticleDensity = firstKnown(p.DensityKgM3, mat.density, "particles.density_kg_m3", "kg/m^3", p.Material, n)
	if math.IsNaN(c.ParticleDensity) {
		bad.add("/particles/density_kg_m3", "required unless particles.material names a library entry with a density",
			"kg/m^3", "0 < value <= 25000")
	}
	c.VolumeFraction = valueOr(p.VolumeFraction, volumeFractionDefault, n)

	resolveElectrolyte(m, "/medium", c, 1, bad, n)
	if liquidOK && len(bad.Problems) == before {
		resolveFreezing(lib.Liquids[c.Liquid.Key], mediumT, c, bad, n)
	}
	c.IsoelectricPH = firstKnown(p.IsoelectricPH, mat.iep, "particles.isoelectric_ph", "pH", p.Material, n)
	if m.PH != nil {
		c.PH = *m.PH
	}
	c.Sites = resolveSites(mat.sites, p.IsoelectricPH, c.Liquid.Aqueous)
	meas := resolveMeasuredIn(p.ZetaMeasuredIn, c, bad)
	resolveHamaker(p, c, mat, n)
	resolveStorage(s, c, bad, n)
	resolveStabilizer(s.Stabilizer, m.FreePolymer, c, n)
	resolveDroplet(p, c, n)
	resolveObservation(s.Observation, c)
	resolveCriteria(s.Criteria, c, n)
	c.Models = s.Models
	if err := bad.orNil(); err != nil {
		return nil, err
	}
	c.derived = &derivation{medium: *m, particles: *p, sites: c.Sites, measuredIn: meas, iepStated: p.IsoelectricPH != nil}
	resolveZeta(p, meas, c, n)
	return c, nil
}

// fieldDefault is the value a request field takes when it is not given,
// and the assumption note that records it, written once.
type fieldDefault struct {
	value float64
	note  string
}

func newFieldDefault(field string, value float64, unit string) fieldDefault {
	note := field + " not given: default " + number.Shortest(value)
	if unit != "" {
		note += " " + unit
	}
	return fieldDefault{value, note}
}

// The defaults that valueOr fills in, in the request's units.
var (
	temperatureDefault     = newFieldDefault("medium.temperature_c", defaultTemperatureC, "degC")
	volumeFractionDefault  = newFieldDefault("particles.volume_fraction", defaultVolumeFraction, "")
	containerDefault       = newFieldDefault("storage.container_height_mm", defaultContainerMm, "mm")
	shelfLifeDefault       = newFieldDefault("storage.shelf_life_days", defaultShelfLifeDays, "d")
	minBarrierDefault      = newFieldDefault("criteria.min_barrier_kT", defaultMinBarrierKT, "kT")
	halfLifeRatioDefault   = newFieldDefault("criteria.half_life_to_shelf_life", defaultHalfLifeRatio, "")
	maxRelViscosityDefault = newFieldDefault("criteria.max_relative_viscosity", defaultMaxRelViscosity, "")
	maxStericKTDefault     = newFieldDefault("criteria.max_steric_contact_kT", defaultMaxStericKT, "kT")
	solubilityDefault      = newFieldDefault("particles.solubility_mol_m3", defaultSolubilityMolM3, "mol/m^3")
	molarVolumeDefault     = newFieldDefault("particles.molar_volume_cm3_mol", defaultMolarVolumeM3*1e6, "cm^3/mol")
	tensionDefault         = newFieldDefault("particles.interfacial_tension_mN_m", defaultTensionNm*1e3, "mN/m")
)

// valueOr is the request's value, or the default (noting the fill).
func valueOr(v *float64, d fieldDefault, n *Notes) float64 {
	if v != nil {
		return *v
	}
	n.Text(d.note)
	return d.value
}

// firstKnown takes the request's value, else the library's (noting the fill),
// else NaN.
func firstKnown(v *float64, lib float64, field, unit, key string, n *Notes) float64 {
	if v != nil {
		return *v
	}
	if !math.IsNaN(lib) {
		n.Text(field + " = " + number.Quantity(lib, unit) + " from the library entry " + strconv.Quote(key))
		return lib
	}
	return math.NaN()
}

func resolveSize(p *Particles, c *Conditions, bad *Error, n *Notes) {
	switch {
	case len(p.SizeDistribution) > 0:
		classes := make([]physics.SizeClass, len(p.SizeDistribution))
		for i, k := range p.SizeDistribution {
			classes[i] = physics.SizeClass{Diameter: k.DiameterNm * 1e-9, VolumeFraction: k.VolumeFraction}
		}
		norm, err := physics.NormaliseClasses(classes)
		if err != nil {
			bad.add("/particles/size_distribution", err.Error(), "", "classes with volume fractions summing to a positive total")
			return
		}
		c.Classes = norm
		c.Radius = physics.D50(norm) / 2
		n.Add("median diameter %s taken from the size distribution (%d classes, normalised to a total of 1)",
			number.Quantity(2*c.Radius*1e9, "nm"), len(norm))
		if p.DiameterNm != nil {
			n.Add("particles.diameter_nm is superseded by particles.size_distribution")
		}
	case p.SizeSpan != nil && *p.SizeSpan > 0:
		c.Radius = *p.DiameterNm * 0.5e-9
		classes, err := physics.LogNormalFromSpan(2*c.Radius, *p.SizeSpan, physics.DefaultLogNormalClasses)
		if err != nil {
			bad.add("/particles/size_span", err.Error(), "1", "0 <= value <= 5")
			return
		}
		c.Classes = classes
		n.Add("size distribution: volume-weighted log-normal with span %g, %d classes", *p.SizeSpan, physics.DefaultLogNormalClasses)
	default:
		c.Radius = *p.DiameterNm * 0.5e-9
		n.Text("single particle size: no size_span or size_distribution given")
	}
}

func resolveHamaker(p *Particles, c *Conditions, mat materialProps, n *Notes) {
	c.ParticlePermittivity, c.ParticleIndex = math.NaN(), math.NaN()
	switch {
	case p.HamakerZJ != nil:
		c.Hamaker, c.HamakerSource = *p.HamakerZJ*1e-21, "request"
	case !math.IsNaN(mat.hamakerWater) && c.Liquid.Key == "water":
		c.Hamaker, c.HamakerSource = mat.hamakerWater, "library"
		n.Text("hamaker_zJ = " + number.Quantity(c.Hamaker*1e21, "zJ") + " across water from the library entry " + strconv.Quote(p.Material))
	default:
		epsP := pick(p.Permittivity, mat.epsR)
		nP := pick(p.RefractiveIndex, mat.refrIndex)
		if !math.IsNaN(epsP) && !math.IsNaN(nP) && c.Liquid.Permittivity > 0 && c.Liquid.RefractiveIndex > 0 {
			c.Hamaker = physics.HamakerTaborWinterton(epsP, nP, c.Liquid.Permittivity, c.Liquid.RefractiveIndex, c.StorageTempK)
			c.HamakerSource, c.ParticlePermittivity, c.ParticleIndex = "estimated", epsP, nP
			n.Add("hamaker constant %s estimated by the Tabor-Winterton (Lifshitz) approximation from permittivities and refractive indices",
				number.Quantity(c.Hamaker*1e21, "zJ"))
			return
		}
		c.Hamaker, c.HamakerSource = defaultHamakerJ, "default"
		n.Add("hamaker constant not given and not estimable: default %s (typical of oxides and polymers across water)",
			number.Quantity(defaultHamakerJ*1e21, "zJ"))
	}
}

func pick(v *float64, lib float64) float64 {
	if v != nil {
		return *v
	}
	return lib
}

func resolveStorage(s *Sample, c *Conditions, bad *Error, n *Notes) {
	st := &s.Storage
	h := valueOr(st.ContainerHeightMm, containerDefault, n)
	c.Height = h * 1e-3
	c.ShelfLife = valueOr(st.ShelfLifeDays, shelfLifeDefault, n) * Day
	if st.MaxClearLayerMm != nil {
		c.MaxClear = *st.MaxClearLayerMm * 1e-3
	} else {
		c.MaxClear = defaultClearLayerShare * c.Height
		n.Text("storage.max_clear_layer_mm not given: acceptance criterion " + number.Shortest(defaultClearLayerShare*100) +
			" % of the container height, " + number.Quantity(c.MaxClear*1e3, "mm"))
	}
	if st.ShearRatePerS != nil {
		c.Shear = *st.ShearRatePerS
	}
	resolveProcessStep(st, c, bad, n)
	c.YieldStress = 0
	if s.Medium.YieldStressPa != nil {
		c.YieldStress = *s.Medium.YieldStressPa
	}
}

func resolveObservation(o *Observation, c *Conditions) {
	c.Observed = Observed{Age: math.NaN(), ClearLayer: math.NaN(), ViscosityChange: math.NaN(), SizeGrowth: math.NaN()}
	if o == nil {
		return
	}
	if o.AgeDays != nil {
		c.Observed.Age = *o.AgeDays * Day
	}
	if o.ClearLayerMm != nil {
		c.Observed.ClearLayer = *o.ClearLayerMm * 1e-3
	}
	if o.ViscosityChangePercent != nil {
		c.Observed.ViscosityChange = *o.ViscosityChangePercent
	}
	if o.SizeGrowthPercent != nil {
		c.Observed.SizeGrowth = *o.SizeGrowthPercent
	}
	if o.SedimentRedisperses != nil {
		c.Observed.Redisperses = map[bool]string{true: "yes", false: "no"}[*o.SedimentRedisperses]
	}
}

func resolveCriteria(k *Criteria, c *Conditions, n *Notes) {
	if k == nil {
		k = &Criteria{}
	}
	c.Criteria.MinBarrierKT = valueOr(k.MinBarrierKT, minBarrierDefault, n)
	c.Criteria.HalfLifeRatio = valueOr(k.HalfLifeToShelfLife, halfLifeRatioDefault, n)
	c.Criteria.MaxRelViscosity = valueOr(k.MaxRelativeViscosity, maxRelViscosityDefault, n)
	c.Criteria.MaxStericKT = valueOr(k.MaxStericContactKT, maxStericKTDefault, n)
}

// Day is the length of a Day in seconds, the unit of the request's shelf
// life and age.
const Day = 86400.0

// EffectiveModels fills the model choices a request left open with the defaults.
func EffectiveModels(req *Models) Models {
	m := Models{VanDerWaals: "hamaker_exact", DoubleLayer: "linear_superposition", ZetaFromMobility: "henry_ohshima"}
	if req != nil {
		if req.ZetaFromMobility != "" {
			m.ZetaFromMobility = req.ZetaFromMobility
		}
		if req.VanDerWaals != "" {
			m.VanDerWaals = req.VanDerWaals
		}
		if req.DoubleLayer != "" {
			m.DoubleLayer = req.DoubleLayer
		}
	}
	return m
}
