package uncertainty

import (
	"maps"
	"math"
	"slices"
	"sort"
	"strings"

	"colloidtriage/advisor/input"
	"colloidtriage/physics"
)

// Input is one uncertain input of a triage: its request field path, where
// its value came from, its nominal value in the field's unit, its standard
// uncertainty (SD, absolute, or Factor, lognormal; exactly one is
// non-zero) and where that came from, its physical range (Range), and how
// it is written into a draw: into the conditions (apply), or, for a value
// that Conditions.Rederive derives others from and the conditions do not
// hold, into the draw's input.Drawn (drawn). An input marked after is the
// error of a derived value and is applied once Rederive has derived it.
type Input struct {
	Path       string
	Provenance Provenance
	Nominal    float64
	SD, Factor float64
	Source     string
	Lo, Hi     float64
	apply      func(c *input.Conditions, v float64)
	drawn      func(d *input.Drawn, v float64)
	after      bool
}

// How names the measurement that pins the input.
func (in Input) How() string { return how[in.Path] }

// value is the input at a standard-normal deviate z.
func (in Input) value(z float64) float64 {
	if in.Factor > 0 {
		return in.Nominal * math.Pow(in.Factor, z)
	}
	return in.Nominal + in.SD*z
}

// Check returns an *input.Error naming every path of the request's
// uncertainty that is not an input, and every uncertainty that is not a
// finite non-negative SD or a factor of at least 1.
func Check(u input.Uncertainty) error {
	if len(u) == 0 {
		return nil
	}
	bad := &input.Error{}
	for _, path := range slices.Sorted(maps.Keys(u)) {
		s := u[path]
		pointer := "/uncertainty/" + strings.NewReplacer("~", "~0", "/", "~1").Replace(path)
		switch {
		case !Known(path):
			bad.Problems = append(bad.Problems, input.FieldProblem{Pointer: pointer,
				Reason: "not an input with an uncertainty", Valid: "one of: " + strings.Join(Paths(), ", ")})
		case s.Factor != 0 && !(s.Factor >= 1 && s.Factor <= 100):
			bad.Problems = append(bad.Problems, input.FieldProblem{Pointer: pointer + "/factor",
				Reason: "a lognormal factor is at least 1", Unit: "1", Valid: "1 <= value <= 100"})
		case s.Factor == 0 && !(s.SD >= 0 && s.SD < math.Inf(1)):
			bad.Problems = append(bad.Problems, input.FieldProblem{Pointer: pointer,
				Reason: "a standard deviation is finite and not negative", Valid: "value >= 0"})
		}
	}
	if len(bad.Problems) > 0 {
		return bad
	}
	return nil
}

// Paths lists the inputs that take an uncertainty, sorted.
func Paths() []string {
	out := make([]string, 0, len(how)+len(observationPaths))
	for p := range how {
		out = append(out, p)
	}
	for p := range observationPaths {
		out = append(out, p)
	}
	sort.Strings(out)
	return out
}

// planner collects the inputs of one sample.
type planner struct {
	u   input.Uncertainty
	out []Input
}

// add appends an input written into the conditions (see planner.input).
func (p *planner) add(path string, prov Provenance, nominal float64, apply func(*input.Conditions, float64)) {
	if in, ok := p.input(path, prov, nominal); ok {
		in.apply = apply
		p.out = append(p.out, in)
	}
}

// addDrawn appends an input that Conditions.Rederive derives others from.
func (p *planner) addDrawn(path string, prov Provenance, nominal float64, drawn func(*input.Drawn, float64)) {
	if in, ok := p.input(path, prov, nominal); ok {
		in.drawn = drawn
		p.out = append(p.out, in)
	}
}

// addAfter appends the error of a derived value, applied after Rederive.
func (p *planner) addAfter(path string, prov Provenance, nominal float64, apply func(*input.Conditions, float64)) {
	if in, ok := p.input(path, prov, nominal); ok {
		in.apply, in.after = apply, true
		p.out = append(p.out, in)
	}
}

// input is an input with its uncertainty, ok false when that is zero. The
// request's stated uncertainty wins over the table's default.
func (p *planner) input(path string, prov Provenance, nominal float64) (Input, bool) {
	if math.IsNaN(nominal) {
		return Input{}, false
	}
	lo, hi, _ := Range(path)
	lo, hi = math.Min(lo, nominal), math.Max(hi, nominal) // the request's value is valid by definition
	in := Input{Path: path, Provenance: prov, Nominal: nominal, Lo: lo, Hi: hi}
	if s, ok := p.u[path]; ok {
		in.SD, in.Factor, in.Source = s.SD, s.Factor, "stated in the request"
	} else {
		d, ok := lookup(path, prov)
		if !ok {
			panic("uncertainty: no default for " + path + " (" + string(prov) + ")")
		}
		in.SD, in.Factor, in.Source = max(d.sd, d.relative*abs(nominal)), d.factor, d.source
	}
	if in.Factor == 1 || in.Factor == 0 && in.SD == 0 || in.Factor > 0 && nominal <= 0 {
		return Input{}, false
	}
	return in, true
}

func given(v *float64, yes, no Provenance) Provenance {
	if v != nil {
		return yes
	}
	return no
}

// Plan lists the uncertain inputs of a resolved sample in the order a draw
// applies them: the inputs a derived value depends on come before it (the
// refractive index before an estimated Hamaker constant, the median
// diameter before the span); the ions and the zeta potential are derived
// after all of them by Conditions.Rederive (see Apply). It returns the
// error of Check.
func Plan(s *input.Sample, c *input.Conditions) ([]Input, error) {
	if err := Check(s.Uncertainty); err != nil {
		return nil, err
	}
	p := &planner{u: s.Uncertainty}
	pa, m := &s.Particles, &s.Medium

	p.add("particles.diameter_nm", Measured, 2*c.Radius*1e9, func(c *input.Conditions, v float64) {
		r := v * 0.5e-9 / c.Radius
		c.Radius *= r
		if c.Classes != nil {
			cl := slices.Clone(c.Classes)
			for i := range cl {
				cl[i].Diameter *= r
			}
			c.Classes = cl
		}
	})
	if pa.SizeSpan != nil && *pa.SizeSpan > 0 && len(pa.SizeDistribution) == 0 {
		p.add("particles.size_span", Measured, *pa.SizeSpan, func(c *input.Conditions, v float64) {
			if cl, err := physics.LogNormalFromSpan(2*c.Radius, v, physics.DefaultLogNormalClasses); err == nil {
				c.Classes = cl
			}
		})
	}
	densityProv := given(pa.DensityKgM3, Measured, Library)
	p.add("particles.density_kg_m3", densityProv, c.ParticleDensity, func(c *input.Conditions, v float64) { c.ParticleDensity = v })
	p.add("medium.density_kg_m3", given(m.DensityKgM3, Measured, Library), c.Liquid.Density,
		func(c *input.Conditions, v float64) { c.Liquid.Density = v })
	p.add("medium.viscosity_mPa_s", given(m.ViscosityMPaS, Measured, Library), c.Liquid.Viscosity*1e3,
		func(c *input.Conditions, v float64) { c.Liquid.Viscosity = v * 1e-3 })
	tempPath, tempProv := "medium.temperature_c", given(m.TemperatureC, Measured, Default)
	if s.Storage.TemperatureC != nil {
		tempPath, tempProv = "storage.temperature_c", Measured
	}
	p.add(tempPath, tempProv, c.StorageTempK-physics.CelsiusZero,
		func(c *input.Conditions, v float64) { c.StorageTempK = physics.Kelvin(v) })
	p.add("particles.volume_fraction", given(pa.VolumeFraction, Measured, Default), c.VolumeFraction,
		func(c *input.Conditions, v float64) { c.VolumeFraction = v })
	p.add("particles.isoelectric_ph", given(pa.IsoelectricPH, Measured, Library), c.IsoelectricPH,
		func(c *input.Conditions, v float64) { c.IsoelectricPH = v })
	if m.PH != nil {
		p.add("medium.ph", Measured, c.PH, func(c *input.Conditions, v float64) { c.PH = v })
	}
	p.planIons(s, c)
	p.planZeta(s, c)
	p.planHamaker(s, c)
	p.planLayers(s, c)
	p.planDroplet(s, c)
	p.add("storage.container_height_mm", given(s.Storage.ContainerHeightMm, Measured, Default), c.Height*1e3,
		func(c *input.Conditions, v float64) { c.Height = v * 1e-3 })
	if c.Shear > 0 {
		p.add("storage.shear_rate_per_s", Measured, c.Shear, func(c *input.Conditions, v float64) { c.Shear = v })
	}
	if c.YieldStress > 0 {
		p.add("medium.yield_stress_Pa", Measured, c.YieldStress, func(c *input.Conditions, v float64) { c.YieldStress = v })
	}
	return p.out, nil
}

// planIons draws one factor on every stated salt, ionic strength or
// conductivity estimate, or on the unstated background of an aqueous
// medium; Rederive builds the ions from it (water's own ions follow the
// drawn pH).
func (p *planner) planIons(s *input.Sample, c *input.Conditions) {
	if c.IonicStrength <= 0 {
		return
	}
	m := &s.Medium
	path, prov := "medium.ionic_strength_mM", Default
	switch {
	case len(m.Electrolytes) > 0:
		path, prov = "medium.electrolytes", Measured
	case m.IonicStrengthMM != nil:
		prov = Measured
	case m.ConductivityUSCm != nil:
		path, prov = "medium.conductivity_uS_cm", Estimated
	}
	nominal := c.IonicStrength
	p.addDrawn(path, prov, nominal, func(d *input.Drawn, v float64) { d.SaltFactor = v / nominal })
}

// planZeta draws a zeta potential or mobility as measured, in the liquid
// it was measured in (Rederive carries it to the product), and an
// estimated one as the estimate Rederive makes at the drawn pH, ions and
// temperature plus the estimate's own error. A zeta potential that the
// error turns over changes the counter-ions.
func (p *planner) planZeta(s *input.Sample, c *input.Conditions) {
	if math.IsNaN(c.Zeta) {
		return
	}
	pa := &s.Particles
	switch {
	case pa.ZetaMV != nil:
		p.addDrawn("particles.zeta_mV", Measured, *pa.ZetaMV, func(d *input.Drawn, v float64) { d.ZetaMV = v })
	case pa.Mobility != nil:
		p.addDrawn("particles.mobility_um_cm_per_V_s", Measured, *pa.Mobility, func(d *input.Drawn, v float64) { d.Mobility = v })
	case c.ZetaSource == "estimated":
		nominal := c.Zeta
		p.addAfter("particles.zeta_mV", Estimated, nominal*1e3, func(c *input.Conditions, v float64) {
			zeta := c.Zeta + v*1e-3 - nominal
			if (zeta > 0) != (c.Zeta > 0) {
				sign := -1
				if zeta > 0 {
					sign = 1
				}
				c.CounterValence = physics.CounterIonValence(c.Ions, sign)
			}
			c.Zeta = zeta
		})
	}
}

// planHamaker draws a Tabor-Winterton estimate through the particle's
// refractive index it came from, times the approximation's own error.
func (p *planner) planHamaker(s *input.Sample, c *input.Conditions) {
	prov := map[string]Provenance{"request": Measured, "library": Library, "estimated": Estimated, "default": Default}[c.HamakerSource]
	if prov == "" {
		return
	}
	nominal := c.Hamaker
	if prov == Estimated {
		p.add("particles.refractive_index", given(s.Particles.RefractiveIndex, Measured, Library), c.ParticleIndex,
			func(c *input.Conditions, v float64) { c.ParticleIndex = v })
		p.add("particles.hamaker_zJ", Estimated, nominal*1e21, func(c *input.Conditions, v float64) {
			c.Hamaker = physics.HamakerTaborWinterton(c.ParticlePermittivity, c.ParticleIndex, c.Liquid.Permittivity,
				c.Liquid.RefractiveIndex, c.StorageTempK) * v * 1e-21 / nominal
		})
		return
	}
	p.add("particles.hamaker_zJ", prov, nominal*1e21, func(c *input.Conditions, v float64) { c.Hamaker = v * 1e-21 })
}

func (p *planner) planLayers(s *input.Sample, c *input.Conditions) {
	if c.Steric.Present {
		p.add("stabilizer.layer_thickness_nm", Measured, c.Steric.Thickness*1e9,
			func(c *input.Conditions, v float64) { c.Steric.Thickness = v * 1e-9 })
	}
	if !math.IsNaN(c.Steric.CloudK) {
		p.add("stabilizer.cloud_point_c", Measured, c.Steric.CloudK-physics.CelsiusZero,
			func(c *input.Conditions, v float64) { c.Steric.CloudK = physics.Kelvin(v) })
	}
	if c.Adsorbing.Present {
		p.add("stabilizer.adsorbing_polymer.surface_coverage", Measured, c.Adsorbing.Coverage,
			func(c *input.Conditions, v float64) { c.Adsorbing.Coverage = v })
	}
	if fp := c.FreePolymer; fp.Present {
		p.add("medium.free_polymer.concentration_g_L", Measured, fp.Concentration,
			func(c *input.Conditions, v float64) { c.FreePolymer.Concentration = v })
		rgProv := Measured
		if s.Medium.FreePolymer.RadiusGyrationNm == nil {
			rgProv = Estimated
		}
		p.add("medium.free_polymer.radius_of_gyration_nm", rgProv, fp.RadiusOfGyration*1e9,
			func(c *input.Conditions, v float64) { c.FreePolymer.RadiusOfGyration = v * 1e-9 })
	}
}

func (p *planner) planDroplet(s *input.Sample, c *input.Conditions) {
	if c.Phase != "liquid" {
		return
	}
	pa := &s.Particles
	p.add("particles.solubility_mol_m3", given(pa.SolubilityMolM3, Measured, Default), c.Droplet.Solubility,
		func(c *input.Conditions, v float64) { c.Droplet.Solubility = v })
	p.add("particles.interfacial_tension_mN_m", given(pa.TensionMNm, Measured, Default), c.Droplet.Tension*1e3,
		func(c *input.Conditions, v float64) { c.Droplet.Tension = v * 1e-3 })
	p.add("particles.molar_volume_cm3_mol", given(pa.MolarVolumeCm3Mol, Measured, Default), c.Droplet.MolarVolume*1e6,
		func(c *input.Conditions, v float64) { c.Droplet.MolarVolume = v * 1e-6 })
}
