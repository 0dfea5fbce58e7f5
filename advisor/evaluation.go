package advisor

import (
	"math"
	"strings"

	"colloidtriage/advisor/number"
	"colloidtriage/advisor/rule"
	"colloidtriage/physics"
)

// evaluation is the working state of one triage: the resolved conditions,
// the facts the rules see, the scales reported, and the notes made.
type evaluation struct {
	c      *conditions
	f      rule.Facts
	scales map[string]Scale
	n      *notes
	models map[string]string

	pair    physics.Pair // the interaction of two median particles, when evaluable
	hasPair bool
	vdwOnly physics.Pair // the same pair without double layer, for steric checks

	hasBarrier  bool    // the pair as specified has an energy barrier
	lastBarrier float64 // separation of the last barrier found while solving remedies, a warm start

	stabilityText string // stabilityCriterion, written once per triage

	acceptablePotential struct { // solved once per triage, shared by two remedies
		done, ok bool
		psi      float64
	}
}

// scaleIndex holds the declared scales by name.
var scaleIndex = func() map[string]ScaleSpec {
	m := make(map[string]ScaleSpec, len(scaleSpecs))
	for _, s := range scaleSpecs {
		m[s.Name] = s
	}
	return m
}()

// set records a scale in its reporting unit. The fact always takes the value
// (an unbounded value is +Inf for the rules); the report takes it only when
// finite and says so otherwise.
func (ev *evaluation) set(name string, v float64, basis string) {
	spec, ok := scaleIndex[name]
	if !ok {
		panic("advisor: undeclared scale " + name)
	}
	ev.f.SetNumber(name, v)
	if math.IsNaN(v) || math.IsInf(v, 0) {
		if !math.IsNaN(v) {
			ev.n.add("%s is unbounded for this sample and is not reported as a number", name)
		}
		return
	}
	ev.scales[name] = Scale{Value: number.Round(v, 6), Unit: spec.Unit, Basis: basis}
}

// modelChoice is a model the report names: its key in the report's models,
// its description, and the assumption note that records it, written once.
type modelChoice struct{ key, text, note string }

func newModelChoice(key, text string) modelChoice {
	return modelChoice{key, text, "model for " + strings.ReplaceAll(key, "_", " ") + ": " + text}
}

// The models of every triage but the two chosen by the request
// (vanDerWaalsModels, doubleLayerModels).
var (
	hinderedSettlingModel = newModelChoice("hindered_settling", "Richardson-Zaki (1-phi)^4.65")
	stabilityRatioModel   = newModelChoice("stability_ratio", "Fuchs (1934) integral with the Honig, Roebersen & Wiersema (1971) hydrodynamic factor")
	halfLifeModel         = newModelChoice("aggregation_half_life", "Smoluchowski (1917) t1/2 = 3 eta W/(4 kT N0)")
	viscosityModel        = newModelChoice("viscosity", "Krieger-Dougherty (1959), [eta] = 2.5, on the effective volume fraction")
	scoringModel          = newModelChoice("scoring", "MYCIN certainty factors (Shortliffe & Buchanan 1975)")
	depletionModel        = newModelChoice("depletion", "Asakura-Oosawa (1954), ideal polymer, depletion thickness = Rg")
	ripeningModel         = newModelChoice("ripening", "Lifshitz-Slyozov-Wagner (1961), diffusion-controlled")
)

// model records a model choice in the report's models and assumptions.
func (ev *evaluation) model(m modelChoice) {
	ev.models[m.key] = m.text
	ev.n.text(m.note)
}

func (ev *evaluation) inputFacts() {
	c, f := ev.c, ev.f
	f.SetText("symptom", c.symptom)
	f.SetText("phase", c.phase)
	f.SetNumber("volume_fraction", c.phi)
	f.SetNumber("shelf_life_days", c.shelfLife/day)
	f.SetNumber("container_height_mm", c.height*1e3)
	f.SetNumber("max_clear_layer_mm", c.maxClear*1e3)
	f.SetNumber("storage_temperature_c", c.storageTempK-physics.CelsiusZero)
	f.SetNumber("observed_clear_layer_mm", c.observed.clearLayer*1e3)
	f.SetNumber("age_days", c.observed.age/day)
	f.SetText("sediment_redisperses", c.observed.redisperses)
	f.SetNumber("viscosity_change_percent", c.observed.viscosityChange)
	f.SetNumber("size_growth_percent", c.observed.sizeGrowth)
	f.SetFlag("zeta_measured", c.zetaSource == "measured" || c.zetaSource == "mobility")
	f.SetFlag("has_electrolyte", c.ionicStrength > 0)
	f.SetNumber("ph", c.ph)
	f.SetNumber("isoelectric_ph", c.iep)
	f.SetFlag("has_steric_layer", c.steric.present)
	f.SetNumber("steric_thickness_nm", nanOr(c.steric.present, c.steric.thickness*1e9))
	if c.steric.hasQuality {
		f.SetText("solvent_quality", c.steric.quality.String())
	}
	f.SetNumber("cloud_point_c", c.steric.cloudK-physics.CelsiusZero)
	f.SetNumber("free_polymer_g_L", nanOr(c.freePolymer.present, c.freePolymer.concentration))
	f.SetNumber("adsorbing_coverage", nanOr(c.adsorbing.present, c.adsorbing.coverage))
	f.SetNumber("adsorbing_molar_mass_kg_mol", nanOr(c.adsorbing.present, c.adsorbing.molarMass))
	f.SetNumber("shear_rate_per_s", c.shear)
	f.SetNumber("yield_stress_pa", c.yieldStress)
	f.SetNumber("min_barrier_kT", c.criteria.minBarrierKT)
	f.SetNumber("half_life_to_shelf_life", c.criteria.halfLifeRatio)
	f.SetFlag("has_size_distribution", c.classes != nil)
	f.SetNumber("max_relative_viscosity", c.criteria.maxRelViscosity)
	f.SetNumber("max_steric_contact_kT", c.criteria.maxStericKT)
}

func nanOr(ok bool, v float64) float64 {
	if !ok {
		return math.NaN()
	}
	return v
}
