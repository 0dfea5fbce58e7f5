package advisor

import (
	"cmp"
	"io/fs"
	"math"
	"slices"
	"strings"

	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"

	"github.com/expr-lang/expr/vm"
)

// EngineVersion identifies this build of the engine in every report.
const EngineVersion = "0.1.0"

// Engine triages samples with one compiled rule set and one library. It is
// safe for concurrent use: a triage reads the engine and writes only its own
// evaluation.
type Engine struct {
	rules *RuleSet
	lib   *library.Library
}

// NewEngine builds an engine from a compiled rule set and a loaded library.
func NewEngine(rules *RuleSet, lib *library.Library) *Engine {
	return &Engine{rules: rules, lib: lib}
}

// LoadEngine compiles the rule set of builtin (the catalogue, its rule
// files and its library, as in rules.FS) plus any site packs, loads the
// library, and builds the engine.
func LoadEngine(builtin fs.FS, packs ...fs.FS) (*Engine, error) {
	rs, err := LoadRuleSet(builtin, packs...)
	if err != nil {
		return nil, err
	}
	lib, err := library.Load(builtin)
	if err != nil {
		return nil, err
	}
	return NewEngine(rs, lib), nil
}

// RuleSet returns the engine's compiled rule set.
func (e *Engine) RuleSet() *RuleSet { return e.rules }

// Library returns the engine's materials and liquids library.
func (e *Engine) Library() *library.Library { return e.lib }

// Triage computes the scales of a validated sample, ranks the causes of its
// symptom and solves the remedies' targets. It returns an *InputError when
// the sample is physically inconsistent.
func (e *Engine) Triage(s *Sample) (*Report, error) {
	ev, err := e.evaluate(s)
	if err != nil {
		return nil, err
	}
	causes := e.rank(ev)
	return &Report{
		SampleID:    s.SampleID,
		Symptom:     s.Symptom,
		Versions:    Versions{Engine: EngineVersion, Rules: e.rules.Hash},
		Scales:      ev.scales,
		Causes:      causes,
		Cautions:    cautions(ev),
		Assumptions: ev.n.list,
		Models:      ev.models,
		Inputs:      understood(s, ev.c),
	}, nil
}

// Scales computes only the physics of a sample, without rules.
func (e *Engine) Scales(s *Sample) (map[string]Scale, []string, map[string]string, error) {
	ev, err := e.evaluate(s)
	if err != nil {
		return nil, nil, nil, err
	}
	return ev.scales, ev.n.list, ev.models, nil
}

func (e *Engine) evaluate(s *Sample) (*evaluation, error) {
	ev := &evaluation{n: &notes{list: make([]string, 0, 32)}, scales: make(map[string]Scale, len(scaleSpecs)), models: make(map[string]string, 8), f: newFacts()}
	c, err := e.resolve(s, ev.n)
	if err != nil {
		return nil, err
	}
	ev.c = c
	ev.inputFacts()
	ev.computeGravity()
	ev.computeInteraction()
	ev.computeBeyondDLVO()
	return ev, nil
}

type causeScore struct {
	id    string
	cf    float64
	fired []*rule
	order int
}

// rank runs the rules of the sample's symptom, combines their certainty
// factors per cause, runs the after_causes rules with the top score known,
// and returns the causes with a positive score, best first.
func (e *Engine) rank(ev *evaluation) []Cause {
	scores := map[string]*causeScore{}
	var machine vm.VM
	run := func(after bool) {
		var env map[string]any // for the expression machine, built on first need
		for i := range e.rules.rules {
			r := &e.rules.rules[i]
			if r.AfterCauses != after || !r.appliesTo(ev.c.symptom) {
				continue
			}
			var out bool
			if r.cond != nil {
				out = r.cond(ev.f)
			} else {
				if env == nil {
					env = ev.f.env(after)
				}
				var err error
				if out, err = runRule(&machine, r.program, env); err != nil {
					continue
				}
			}
			if !out {
				continue
			}
			cs := scores[r.Cause]
			if cs == nil {
				cs = &causeScore{id: r.Cause, order: len(scores)}
				scores[r.Cause] = cs
			}
			cs.cf = combineCertainty(cs.cf, r.Certainty)
			cs.fired = append(cs.fired, r)
		}
	}
	run(false)
	top := 0.0
	for _, cs := range scores {
		top = math.Max(top, cs.cf)
	}
	ev.f.setNumber(topCauseScore, top)
	run(true)

	list := make([]*causeScore, 0, len(scores))
	for _, cs := range scores {
		if cs.cf > 0 {
			list = append(list, cs)
		}
	}
	slices.SortFunc(list, func(a, b *causeScore) int {
		if a.cf != b.cf {
			return cmp.Compare(b.cf, a.cf)
		}
		return strings.Compare(a.id, b.id)
	})
	out := make([]Cause, len(list))
	for i, cs := range list {
		out[i] = e.cause(ev, cs, i+1)
	}
	return out
}

func (e *Engine) cause(ev *evaluation, cs *causeScore, rank int) Cause {
	entry, _ := find(e.rules.Catalog.Causes, cs.id)
	evidence, remedies, text := 0, 0, 0
	for _, r := range cs.fired {
		evidence += len(r.Evidence)
		remedies += len(r.Remedies)
		text += len(r.Explain) + 17 // a placeholder's name is about as long as its value
	}
	c := Cause{ID: cs.id, Rank: rank, Score: math.Round(cs.cf*1000) / 1000, Title: entry.Title,
		Evidence: make([]Evidence, 0, evidence), Remedies: make([]Remedy, 0, remedies)}
	var explanation strings.Builder
	explanation.Grow(text)
	for i, r := range cs.fired {
		if i > 0 {
			explanation.WriteByte(' ')
		}
		r.writeExplanation(&explanation, ev.f)
		for _, name := range r.Evidence {
			v := ev.f.number(name)
			if hasEvidence(c.Evidence, name) || math.IsNaN(v) || math.IsInf(v, 0) {
				continue
			}
			c.Evidence = append(c.Evidence, Evidence{Scale: name, Value: number.Round(v, 6), Unit: factIndex[name].Unit, Test: r.When})
		}
		if r.Certainty < 0 {
			continue
		}
		for _, id := range r.Remedies {
			if !hasRemedy(c.Remedies, id) {
				c.Remedies = append(c.Remedies, e.remedy(ev, id))
			}
		}
	}
	c.Explanation = explanation.String()
	return c
}

// hasEvidence and hasRemedy look through the few entries of one cause.
func hasEvidence(list []Evidence, scale string) bool {
	for _, ev := range list {
		if ev.Scale == scale {
			return true
		}
	}
	return false
}

func hasRemedy(list []Remedy, id string) bool {
	for _, r := range list {
		if r.ID == id {
			return true
		}
	}
	return false
}
