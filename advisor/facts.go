package advisor

import (
	"math"
	"slices"
	"strconv"

	"colloidtriage/advisor/number"
)

type factKind int

const (
	numberFact factKind = iota
	textFact
	flagFact
)

// factSpec declares one name the rules may use. Every scale is a numeric fact
// in its reporting unit; inputFacts add what the sample states directly.
type factSpec struct {
	Name    string
	Kind    factKind
	Unit    string
	Meaning string
}

// declaredFact is a factSpec with its slot among the facts of its kind.
type declaredFact struct {
	factSpec
	slot int
}

// topCauseScore is visible only to rules marked after_causes: the highest
// score of any cause after all other rules ran.
const topCauseScore = "top_cause_score"

var inputFacts = []factSpec{
	{"symptom", textFact, "", "the reported symptom"},
	{"phase", textFact, "", "solid, liquid (droplets) or gas (bubbles)"},
	{"volume_fraction", numberFact, "1", "volume fraction of the dispersed phase"},
	{"shelf_life_days", numberFact, "d", "required shelf life"},
	{"container_height_mm", numberFact, "mm", "fill height of the container"},
	{"max_clear_layer_mm", numberFact, "mm", "acceptance criterion for the clear or cream layer"},
	{"storage_temperature_c", numberFact, "degC", "temperature at which stability is judged"},
	{"observed_clear_layer_mm", numberFact, "mm", "clear layer reported in the complaint"},
	{"age_days", numberFact, "d", "age of the sample when observed"},
	{"sediment_redisperses", textFact, "", `"yes", "no" or "" when not observed`},
	{"viscosity_change_percent", numberFact, "%", "observed change of viscosity"},
	{"size_growth_percent", numberFact, "%", "observed growth of the median size"},
	{"zeta_measured", flagFact, "", "zeta potential or mobility was measured"},
	{"has_electrolyte", flagFact, "", "the medium holds dissolved ions"},
	{"ph", numberFact, "pH", "pH of the medium"},
	{"isoelectric_ph", numberFact, "pH", "isoelectric point of the particles"},
	{"has_steric_layer", flagFact, "", "an adsorbed steric layer is declared"},
	{"steric_thickness_nm", numberFact, "nm", "declared steric layer thickness"},
	{"solvent_quality", textFact, "", "good, theta, poor or \"\" when unknown"},
	{"cloud_point_c", numberFact, "degC", "cloud point of the stabiliser"},
	{"free_polymer_g_L", numberFact, "g/L", "free non-adsorbing polymer"},
	{"adsorbing_coverage", numberFact, "1", "surface coverage of the adsorbing polymer"},
	{"adsorbing_molar_mass_kg_mol", numberFact, "kg/mol", "molar mass of the adsorbing polymer"},
	{"shear_rate_per_s", numberFact, "1/s", "shear rate in processing or transport"},
	{"yield_stress_pa", numberFact, "Pa", "yield stress of the continuous phase"},
	{"min_barrier_kT", numberFact, "kT", "acceptance criterion: smallest energy barrier"},
	{"half_life_to_shelf_life", numberFact, "1", "acceptance criterion: aggregation half-life over shelf life"},
	{"has_size_distribution", flagFact, "", "a size span or distribution was given"},
	{"max_relative_viscosity", numberFact, "1", "acceptance criterion: largest relative viscosity"},
	{"max_steric_contact_kT", numberFact, "kT", "acceptance criterion: deepest van der Waals energy at steric contact"},
}

// factIndex holds every declared fact with its slot among the facts of its
// kind; topCauseScore is the last number.
var factIndex = func() map[string]declaredFact {
	m := map[string]declaredFact{}
	var count [3]int
	add := func(f factSpec) {
		if _, dup := m[f.Name]; dup {
			panic("advisor: fact " + f.Name + " declared twice")
		}
		m[f.Name] = declaredFact{f, count[f.Kind]}
		count[f.Kind]++
	}
	for _, f := range inputFacts {
		add(f)
	}
	for _, s := range scaleSpecs {
		add(factSpec{s.Name, numberFact, s.Unit, s.Meaning})
	}
	add(factSpec{topCauseScore, numberFact, "1", "highest cause score before the after_causes rules"})
	return m
}()

// factDefaults are the values of facts not set for a sample: NaN, "" and
// false.
var factDefaults = func() facts {
	var f facts
	for _, d := range factIndex {
		switch d.Kind {
		case numberFact:
			f.num = append(f.num, math.NaN())
		case textFact:
			f.text = append(f.text, "")
		case flagFact:
			f.flag = append(f.flag, false)
		}
	}
	return f
}()

// facts is the environment of the rules for one sample: one value per
// declared fact, in the slot of its kind. Numbers not computed for this
// sample are NaN, so every comparison with them is false.
type facts struct {
	num  []float64
	text []string
	flag []bool
}

func newFacts() facts {
	return facts{num: slices.Clone(factDefaults.num), text: slices.Clone(factDefaults.text), flag: slices.Clone(factDefaults.flag)}
}

// slot panics on an undeclared fact, a programming error.
func slot(name string) int {
	f, ok := factIndex[name]
	if !ok {
		panic("advisor: undeclared fact " + name)
	}
	return f.slot
}

func (f facts) setNumber(name string, v float64) { f.num[slot(name)] = v }
func (f facts) setText(name, v string)           { f.text[slot(name)] = v }
func (f facts) setFlag(name string, v bool)      { f.flag[slot(name)] = v }
func (f facts) number(name string) float64       { return f.num[slot(name)] }

// value is a fact as the expression language sees it.
func (f facts) value(spec declaredFact) any {
	switch spec.Kind {
	case numberFact:
		return f.num[spec.slot]
	case textFact:
		return f.text[spec.slot]
	}
	return f.flag[spec.slot]
}

// env is the facts as the expression machine's environment, for rules that
// do not compile to a condition (see compileCondition); with
// afterCauses, topCauseScore is declared too.
func (f facts) env(afterCauses bool) map[string]any {
	m := make(map[string]any, len(factIndex))
	for name, spec := range factIndex {
		if name != topCauseScore || afterCauses {
			m[name] = f.value(spec)
		}
	}
	return m
}

// appendFormat renders a fact for an explanation: three significant digits
// and its unit.
func (f facts) appendFormat(b []byte, spec declaredFact) []byte {
	switch spec.Kind {
	case numberFact:
		return number.AppendQuantity(b, f.num[spec.slot], spec.Unit)
	case flagFact:
		return strconv.AppendBool(b, f.flag[spec.slot])
	}
	return append(b, f.text[spec.slot]...)
}
