package advisor

import (
	"math"
	"strconv"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// resolve turns a validated Sample into SI conditions, filling every gap from
// the library or a documented default and recording each fill in n. It
// returns an InputError for values that are well-formed but physically
// impossible together (a temperature outside the liquid's range, a density
// nobody gave, an unknown salt).
func (e *Engine) resolve(s *Sample, n *notes) (*conditions, error) {
	bad := &InputError{}
	c := &conditions{symptom: s.Symptom, product: s.Product, ph: math.NaN(), iep: math.NaN(), zeta: math.NaN(),
		henry: math.NaN()}
	p, m := &s.Particles, &s.Medium

	mat, hasMat := e.resolveMaterial(p, bad)
	c.material, c.materialKind = p.Material, mat.kind
	c.phase = p.Phase
	if c.phase == "" {
		c.phase = "solid"
		if hasMat && mat.phase != "" {
			c.phase = mat.phase
			n.text("particles.phase = " + c.phase + " from the library entry " + strconv.Quote(p.Material))
		} else {
			n.text("particles.phase not given: solid assumed")
		}
	}

	mediumT := valueOr(m.TemperatureC, temperatureDefault, n)
	storageT := mediumT
	tempField := "/medium/temperature_c"
	if s.Storage.TemperatureC != nil {
		storageT, tempField = *s.Storage.TemperatureC, "/storage/temperature_c"
	} else {
		n.text("storage.temperature_c not given: stability judged at the medium temperature, " + number.Shortest(mediumT) + " degC")
	}
	c.storageTempK = physics.Kelvin(storageT)
	c.liquid = e.resolveLiquid(m, mediumT, storageT, tempField, bad, n)

	e.resolveSize(p, c, bad, n)
	c.particleDensity = firstKnown(p.DensityKgM3, mat.density, "particles.density_kg_m3", "kg/m^3", p.Material, n)
	if math.IsNaN(c.particleDensity) {
		bad.add("/particles/density_kg_m3", "required unless particles.material names a library entry with a density",
			"kg/m^3", "0 < value <= 25000")
	}
	c.phi = valueOr(p.VolumeFraction, volumeFractionDefault, n)

	resolveElectrolyte(m, c, bad, n)
	c.iep = firstKnown(p.IsoelectricPH, mat.iep, "particles.isoelectric_ph", "pH", p.Material, n)
	if m.PH != nil {
		c.ph = *m.PH
	}
	e.resolveHamaker(p, c, mat, n)
	resolveStorage(s, c, n)
	resolveStabilizer(s.Stabilizer, m.FreePolymer, c, n)
	resolveDroplet(p, c, n)
	resolveObservation(s.Observation, c)
	resolveCriteria(s.Criteria, c, n)
	c.models = s.Models
	if err := bad.orNil(); err != nil {
		return nil, err
	}
	resolveZeta(p, c, n)
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
func valueOr(v *float64, d fieldDefault, n *notes) float64 {
	if v != nil {
		return *v
	}
	n.text(d.note)
	return d.value
}

// firstKnown takes the request's value, else the library's (noting the fill),
// else NaN.
func firstKnown(v *float64, lib float64, field, unit, key string, n *notes) float64 {
	if v != nil {
		return *v
	}
	if !math.IsNaN(lib) {
		n.text(field + " = " + number.Quantity(lib, unit) + " from the library entry " + strconv.Quote(key))
		return lib
	}
	return math.NaN()
}

func (e *Engine) resolveSize(p *Particles, c *conditions, bad *InputError, n *notes) {
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
		c.classes = norm
		c.radius = physics.D50(norm) / 2
		n.add("median diameter %s taken from the size distribution (%d classes, normalised to a total of 1)",
			number.Quantity(2*c.radius*1e9, "nm"), len(norm))
		if p.DiameterNm != nil {
			n.add("particles.diameter_nm is superseded by particles.size_distribution")
		}
	case p.SizeSpan != nil && *p.SizeSpan > 0:
		c.radius = *p.DiameterNm * 0.5e-9
		classes, err := physics.LogNormalFromSpan(2*c.radius, *p.SizeSpan, physics.DefaultLogNormalClasses)
		if err != nil {
			bad.add("/particles/size_span", err.Error(), "1", "0 <= value <= 5")
			return
		}
		c.classes = classes
		n.add("size distribution: volume-weighted log-normal with span %g, %d classes", *p.SizeSpan, physics.DefaultLogNormalClasses)
	default:
		c.radius = *p.DiameterNm * 0.5e-9
		n.text("single particle size: no size_span or size_distribution given")
	}
}

func (e *Engine) resolveHamaker(p *Particles, c *conditions, mat materialProps, n *notes) {
	switch {
	case p.HamakerZJ != nil:
		c.hamaker = *p.HamakerZJ * 1e-21
	case !math.IsNaN(mat.hamakerWater) && c.liquid.key == "water":
		c.hamaker = mat.hamakerWater
		n.text("hamaker_zJ = " + number.Quantity(c.hamaker*1e21, "zJ") + " across water from the library entry " + strconv.Quote(p.Material))
	default:
		epsP := pick(p.Permittivity, mat.epsR)
		nP := pick(p.RefractiveIndex, mat.refrIndex)
		if !math.IsNaN(epsP) && !math.IsNaN(nP) && c.liquid.epsR > 0 && c.liquid.refrIndex > 0 {
			c.hamaker = physics.HamakerTaborWinterton(epsP, nP, c.liquid.epsR, c.liquid.refrIndex, c.storageTempK)
			n.add("hamaker constant %s estimated by the Tabor-Winterton (Lifshitz) approximation from permittivities and refractive indices",
				number.Quantity(c.hamaker*1e21, "zJ"))
			return
		}
		c.hamaker = defaultHamakerJ
		n.add("hamaker constant not given and not estimable: default %s (typical of oxides and polymers across water)",
			number.Quantity(defaultHamakerJ*1e21, "zJ"))
	}
}

func pick(v *float64, lib float64) float64 {
	if v != nil {
		return *v
	}
	return lib
}

func resolveStorage(s *Sample, c *conditions, n *notes) {
	st := &s.Storage
	h := valueOr(st.ContainerHeightMm, containerDefault, n)
	c.height = h * 1e-3
	c.shelfLife = valueOr(st.ShelfLifeDays, shelfLifeDefault, n) * day
	if st.MaxClearLayerMm != nil {
		c.maxClear = *st.MaxClearLayerMm * 1e-3
	} else {
		c.maxClear = defaultClearLayerShare * c.height
		n.text("storage.max_clear_layer_mm not given: acceptance criterion " + number.Shortest(defaultClearLayerShare*100) +
			" % of the container height, " + number.Quantity(c.maxClear*1e3, "mm"))
	}
	if st.ShearRatePerS != nil {
		c.shear = *st.ShearRatePerS
	}
	c.yieldStress = 0
	if s.Medium.YieldStressPa != nil {
		c.yieldStress = *s.Medium.YieldStressPa
	}
}

func resolveObservation(o *Observation, c *conditions) {
	c.observed = observed{age: math.NaN(), clearLayer: math.NaN(), viscosityChange: math.NaN(), sizeGrowth: math.NaN()}
	if o == nil {
		return
	}
	if o.AgeDays != nil {
		c.observed.age = *o.AgeDays * day
	}
	if o.ClearLayerMm != nil {
		c.observed.clearLayer = *o.ClearLayerMm * 1e-3
	}
	if o.ViscosityChangePercent != nil {
		c.observed.viscosityChange = *o.ViscosityChangePercent
	}
	if o.SizeGrowthPercent != nil {
		c.observed.sizeGrowth = *o.SizeGrowthPercent
	}
	if o.SedimentRedisperses != nil {
		c.observed.redisperses = map[bool]string{true: "yes", false: "no"}[*o.SedimentRedisperses]
	}
}

func resolveCriteria(k *Criteria, c *conditions, n *notes) {
	if k == nil {
		k = &Criteria{}
	}
	c.criteria.minBarrierKT = valueOr(k.MinBarrierKT, minBarrierDefault, n)
	c.criteria.halfLifeRatio = valueOr(k.HalfLifeToShelfLife, halfLifeRatioDefault, n)
	c.criteria.maxRelViscosity = valueOr(k.MaxRelativeViscosity, maxRelViscosityDefault, n)
	c.criteria.maxStericKT = valueOr(k.MaxStericContactKT, maxStericKTDefault, n)
}

// day is the length of a day in seconds.
const day = 86400.0
