package advisor

import (
	"math"
	"strings"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
	"colloidtriage/advisor/remedy"
	"colloidtriage/advisor/rule"
	"colloidtriage/physics"
)

// evaluation is the working state of one triage: the resolved conditions,
// the facts the rules see, the scales reported, and the notes made.
type evaluation struct {
	cond   *input.Conditions
	facts  rule.Facts
	scales map[string]Scale
	notes  *input.Notes
	models map[string]string

	pair            physics.Pair // the interaction of two median particles, when evaluable
	hasPair         bool
	vanDerWaalsOnly physics.Pair // the same pair without double layer, for steric checks

	hasBarrier  bool    // the pair as specified has an energy barrier
	lastBarrier float64 // separation of the last barrier found, a warm start

	remedies *remedy.Case // built on the first remedy, see remedyCase

	// lean is the evaluation of one Monte Carlo draw: facts only, no
	// scales map, notes or models (nil).
	lean bool
}

// remedyCase is the evaluation as the remedy solvers see it, built on the
// first call and shared by every remedy of the triage.
func (ev *evaluation) remedyCase() *remedy.Case {
	if ev.remedies == nil {
		ev.remedies = &remedy.Case{Cond: ev.cond, Facts: ev.facts, Reported: ev.reported,
			Pair: ev.pair, HasPair: ev.hasPair, VanDerWaalsOnly: ev.vanDerWaalsOnly, HasBarrier: ev.hasBarrier, LastBarrier: ev.lastBarrier}
	}
	return ev.remedies
}

// reported returns a scale as the report gives it: the fact rounded to 6
// significant digits, ok false when the report leaves it out (not set or
// not finite). It reads the facts, so a lean evaluation answers alike.
func (ev *evaluation) reported(name string) (float64, bool) {
	v := ev.facts.Number(name)
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, false
	}
	return number.Round(v, 6), true
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
	ev.facts.SetNumber(name, v)
	if ev.lean {
		return
	}
	if math.IsNaN(v) || math.IsInf(v, 0) {
		if !math.IsNaN(v) {
			ev.notes.Add("%s is unbounded for this sample and is not reported as a number", name)
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
	if ev.lean {
		return
	}
	ev.models[m.key] = m.text
	ev.notes.Text(m.note)
}

func (ev *evaluation) inputFacts() {
	c, f := ev.cond, ev.facts
	f.SetText("symptom", c.Symptom)
	f.SetText("phase", c.Phase)
	f.SetNumber("volume_fraction", c.VolumeFraction)
	f.SetNumber("shelf_life_days", c.ShelfLife/input.Day)
	f.SetNumber("container_height_mm", c.Height*1e3)
	f.SetNumber("max_clear_layer_mm", c.MaxClear*1e3)
	f.SetNumber("storage_temperature_c", c.StorageTempK-physics.CelsiusZero)
	f.SetNumber("storage_min_temperature_c", c.MinStorageTempK-physics.CelsiusZero)
	f.SetNumber("freeze_thaw_cycles", c.FreezeThawCycles)
	f.SetNumber("observed_clear_layer_mm", c.Observed.ClearLayer*1e3)
	f.SetNumber("age_days", c.Observed.Age/input.Day)
	f.SetText("sediment_redisperses", c.Observed.Redisperses)
	f.SetNumber("viscosity_change_percent", c.Observed.ViscosityChange)
	f.SetNumber("size_growth_percent", c.Observed.SizeGrowth)
	f.SetFlag("zeta_measured", c.ZetaSource == "measured" || c.ZetaSource == "mobility" || c.ZetaSource == "carried")
	f.SetFlag("has_electrolyte", c.IonicStrength > 0)
	f.SetNumber("ph", c.PH)
	f.SetNumber("isoelectric_ph", c.IsoelectricPH)
	f.SetFlag("has_steric_layer", c.Steric.Present)
	f.SetNumber("steric_thickness_nm", nanOr(c.Steric.Present, c.Steric.Thickness*1e9))
	if c.Steric.HasQuality {
		f.SetText("solvent_quality", c.Steric.Quality.String())
	}
	f.SetNumber("cloud_point_c", c.Steric.CloudK-physics.CelsiusZero)
	f.SetNumber("free_polymer_g_L", nanOr(c.FreePolymer.Present, c.FreePolymer.Concentration))
	f.SetNumber("adsorbing_coverage", nanOr(c.Adsorbing.Present, c.Adsorbing.Coverage))
	f.SetNumber("adsorbing_molar_mass_kg_mol", nanOr(c.Adsorbing.Present, c.Adsorbing.MolarMass))
	f.SetNumber("shear_rate_per_s", c.Shear)
	f.SetNumber("yield_stress_pa", c.YieldStress)
	f.SetNumber("min_barrier_kT", c.Criteria.MinBarrierKT)
	f.SetNumber("stable_ph_distance", physics.PHDistanceForStability)
	f.SetNumber("half_life_to_shelf_life", c.Criteria.HalfLifeRatio)
	f.SetFlag("has_size_distribution", c.Classes != nil)
	f.SetNumber("max_relative_viscosity", c.Criteria.MaxRelViscosity)
	f.SetNumber("max_steric_contact_kT", c.Criteria.MaxStericKT)
}

func nanOr(ok bool, v float64) float64 {
	if !ok {
		return math.NaN()
	}
	return v
}
