package advisor

import (
	"math"
	"strings"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// evaluation is the working state of one triage: the resolved conditions,
// the facts the rules see, the scales reported, and the notes made.
type evaluation struct {
	c      *conditions
	f      facts
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

// scaleIndex holds the declared scales, each with its slot among the facts.
var scaleIndex = func() map[string]declaredFact {
	m := map[string]declaredFact{}
	for _, s := range scaleSpecs {
		m[s.Name] = factIndex[s.Name]
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
	ev.f.num[spec.slot] = v
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
	f.setText("symptom", c.symptom)
	f.setText("phase", c.phase)
	f.setNumber("volume_fraction", c.phi)
	f.setNumber("shelf_life_days", c.shelfLife/day)
	f.setNumber("container_height_mm", c.height*1e3)
	f.setNumber("max_clear_layer_mm", c.maxClear*1e3)
	f.setNumber("storage_temperature_c", c.storageTempK-physics.CelsiusZero)
	f.setNumber("observed_clear_layer_mm", c.observed.clearLayer*1e3)
	f.setNumber("age_days", c.observed.age/day)
	f.setText("sediment_redisperses", c.observed.redisperses)
	f.setNumber("viscosity_change_percent", c.observed.viscosityChange)
	f.setNumber("size_growth_percent", c.observed.sizeGrowth)
	f.setFlag("zeta_measured", c.zetaSource == "measured" || c.zetaSource == "mobility")
	f.setFlag("has_electrolyte", c.ionicStrength > 0)
	f.setNumber("ph", c.ph)
	f.setNumber("isoelectric_ph", c.iep)
	f.setFlag("has_steric_layer", c.steric.present)
	f.setNumber("steric_thickness_nm", nanOr(c.steric.present, c.steric.thickness*1e9))
	if c.steric.hasQuality {
		f.setText("solvent_quality", c.steric.quality.String())
	}
	f.setNumber("cloud_point_c", c.steric.cloudK-physics.CelsiusZero)
	f.setNumber("free_polymer_g_L", nanOr(c.freePolymer.present, c.freePolymer.concentration))
	f.setNumber("adsorbing_coverage", nanOr(c.adsorbing.present, c.adsorbing.coverage))
	f.setNumber("adsorbing_molar_mass_kg_mol", nanOr(c.adsorbing.present, c.adsorbing.molarMass))
	f.setNumber("shear_rate_per_s", c.shear)
	f.setNumber("yield_stress_pa", c.yieldStress)
	f.setNumber("min_barrier_kT", c.criteria.minBarrierKT)
	f.setNumber("half_life_to_shelf_life", c.criteria.halfLifeRatio)
	f.setFlag("has_size_distribution", c.classes != nil)
	f.setNumber("max_relative_viscosity", c.criteria.maxRelViscosity)
	f.setNumber("max_steric_contact_kT", c.criteria.maxStericKT)
}

func nanOr(ok bool, v float64) float64 {
	if !ok {
		return math.NaN()
	}
	return v
}
