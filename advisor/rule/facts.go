package rule

import (
	"fmt"
	"math"
	"slices"
	"strconv"

	"colloidtriage/advisor/number"
)

// Kind is the type of a fact: a number, a text or a flag.
type Kind int

// The kinds of facts.
const (
	Number Kind = iota
	Text
	Flag
)

// Fact declares one name the rules may use, in the unit its value is given
// in (for numbers; "" or "1" when dimensionless).
type Fact struct {
	Name    string
	Kind    Kind
	Unit    string
	Meaning string
}

// TopCauseScore is visible only to rules marked after_causes: the highest
// score of any cause after all other rules ran. Load declares it.
const TopCauseScore = "top_cause_score"

// declared is a Fact with its slot among the facts of its kind.
type declared struct {
	Fact
	slot int
}

// vocabulary is the declared facts of a rule set with their slots and the
// values of facts not set for a sample (NaN, "" and false).
type vocabulary struct {
	index    map[string]declared
	defaults Facts
}

func newVocabulary(facts []Fact) (*vocabulary, error) {
	v := &vocabulary{index: make(map[string]declared, len(facts)+1)}
	v.defaults.vocab = v
	all := append(slices.Clip(facts), Fact{TopCauseScore, Number, "1", "highest cause score before the after_causes rules"})
	var count [3]int
	for _, f := range all {
		if _, dup := v.index[f.Name]; dup {
			return nil, fmt.Errorf("fact %s declared twice", f.Name)
		}
		v.index[f.Name] = declared{f, count[f.Kind]}
		count[f.Kind]++
		switch f.Kind {
		case Number:
			v.defaults.num = append(v.defaults.num, math.NaN())
		case Text:
			v.defaults.text = append(v.defaults.text, "")
		case Flag:
			v.defaults.flag = append(v.defaults.flag, false)
		}
	}
	return v, nil
}

// Facts is the environment of the rules for one sample: one value per
// declared fact, in the slot of its kind. Numbers not computed for this
// sample are NaN, so every comparison with them is false.
type Facts struct {
	vocab *vocabulary
	num   []float64
	text  []string
	flag  []bool
}

// NewFacts returns the facts of one sample, every one unset: NaN, "" or
// false.
func (s *Set) NewFacts() Facts {
	d := s.vocab.defaults
	return Facts{vocab: s.vocab, num: slices.Clone(d.num), text: slices.Clone(d.text), flag: slices.Clone(d.flag)}
}

// lookup panics on an undeclared fact, a programming error.
func (f Facts) lookup(name string) declared {
	d, ok := f.vocab.index[name]
	if !ok {
		panic("rule: undeclared fact " + name)
	}
	return d
}

// SetNumber sets a declared numeric fact. It and the other setters and
// getters panic on an undeclared name.
func (f Facts) SetNumber(name string, v float64) { f.num[f.lookup(name).slot] = v }

// SetText sets a declared text fact.
func (f Facts) SetText(name, v string) { f.text[f.lookup(name).slot] = v }

// SetFlag sets a declared flag.
func (f Facts) SetFlag(name string, v bool) { f.flag[f.lookup(name).slot] = v }

// Number returns a declared numeric fact.
func (f Facts) Number(name string) float64 { return f.num[f.lookup(name).slot] }

// Unit returns the unit a declared fact is given in.
func (f Facts) Unit(name string) string { return f.lookup(name).Unit }

// value is a fact as the expression language sees it.
func (f Facts) value(d declared) any {
	switch d.Kind {
	case Number:
		return f.num[d.slot]
	case Text:
		return f.text[d.slot]
	}
	return f.flag[d.slot]
}

// env is the facts as the expression machine's environment, for rules that
// do not compile to a condition (see compiler.condition); with
// afterCauses, TopCauseScore is declared too.
func (f Facts) env(afterCauses bool) map[string]any {
	m := make(map[string]any, len(f.vocab.index))
	for name, d := range f.vocab.index {
		if name != TopCauseScore || afterCauses {
			m[name] = f.value(d)
		}
	}
	return m
}

// appendFormat renders a fact for an explanation: three significant digits
// and its unit.
func (f Facts) appendFormat(b []byte, d declared) []byte {
	switch d.Kind {
	case Number:
		return number.AppendQuantity(b, f.num[d.slot], d.Unit)
	case Flag:
		return strconv.AppendBool(b, f.flag[d.slot])
	}
	return append(b, f.text[d.slot]...)
}

// Reset unsets every fact again (NaN, "" or false), for a Facts reused
// across evaluations.
func (f Facts) Reset() {
	d := f.vocab.defaults
	copy(f.num, d.num)
	copy(f.text, d.text)
	copy(f.flag, d.flag)
}
