package advisor

import (
	"io/fs"
	"math"
	"slices"
	"strings"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"
	"colloidtriage/advisor/remedy"
	"colloidtriage/advisor/rule"
	"colloidtriage/advisor/uncertainty"
)

// EngineVersion identifies this build of the engine in every report.
const EngineVersion = "0.1.0"

// Engine triages samples with one compiled rule set and one library. It is
// safe for concurrent use: a triage reads the engine and writes only its own
// evaluation.
type Engine struct {
	rules *rule.Set
	lib   *library.Library
}

// NewEngine builds an engine from a compiled rule set and a loaded library.
func NewEngine(rules *rule.Set, lib *library.Library) *Engine {
	return &Engine{rules: rules, lib: lib}
}

// LoadEngine compiles the rule set of builtin (the catalogue, its rule
// files and its library, as in rules.FS) plus any site packs, loads the
// library, and builds the engine.
func LoadEngine(builtin fs.FS, packs ...fs.FS) (*Engine, error) {
	rs, err := rule.Load(vocabulary, builtin, packs...)
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
func (e *Engine) RuleSet() *rule.Set { return e.rules }

// Library returns the engine's materials and liquids library.
func (e *Engine) Library() *library.Library { return e.lib }

// Triage computes the scales of a validated sample, ranks the causes of its
// symptom and solves the remedies' targets. It returns an *input.Error when
// the sample is physically inconsistent.
func (e *Engine) Triage(s *input.Sample) (*Report, error) {
	if err := uncertainty.Check(s.Uncertainty); err != nil {
		return nil, err
	}
	ev, err := e.evaluate(s)
	if err != nil {
		return nil, err
	}
	causes := e.rank(ev)
	r := &Report{
		SampleID:    s.SampleID,
		Symptom:     s.Symptom,
		Versions:    Versions{Engine: EngineVersion, Rules: e.rules.Hash},
		Scales:      ev.scales,
		Causes:      causes,
		Cautions:    cautions(ev, causes),
		Assumptions: ev.notes.List(),
		Models:      ev.models,
		Inputs:      input.Understood(s, ev.cond),
		Trends:      trends(s.Observations),
	}
	if draws := uncertainty.Draws(s); draws > 0 {
		if err := e.analyse(s, ev, r, draws, uncertainty.Seed(s)); err != nil {
			return nil, err
		}
	}
	return r, nil
}

// Scales computes only the physics of a sample, without rules.
func (e *Engine) Scales(s *input.Sample) (map[string]Scale, []string, map[string]string, error) {
	ev, err := e.evaluate(s)
	if err != nil {
		return nil, nil, nil, err
	}
	return ev.scales, ev.notes.List(), ev.models, nil
}

func (e *Engine) evaluate(s *input.Sample) (*evaluation, error) {
	ev := &evaluation{notes: input.NewNotes(32), scales: make(map[string]Scale, len(scaleSpecs)), models: make(map[string]string, 8), facts: e.rules.NewFacts()}
	c, err := input.Resolve(s, e.lib, ev.notes)
	if err != nil {
		return nil, err
	}
	ev.cond = c
	ev.compute()
	return ev, nil
}

// compute sets the facts (and, unless lean, the scales, notes and models)
// of the evaluation's conditions.
func (ev *evaluation) compute() {
	ev.inputFacts()
	ev.computeGravity()
	ev.computeInteraction()
	ev.plainTexts()
	ev.computeBeyondDLVO()
	ev.computeTemperature()
}

// rank ranks the causes of the sample's symptom (see rule.Set.Rank) and
// writes each with its evidence, explanation and remedies.
func (e *Engine) rank(ev *evaluation) []Cause {
	scores := e.rules.Rank(ev.facts, ev.cond.Symptom)
	out := make([]Cause, len(scores))
	for i, cs := range scores {
		out[i] = e.cause(ev, cs, i+1)
	}
	return out
}

func (e *Engine) cause(ev *evaluation, cs *rule.Score, rank int) Cause {
	entry, _ := e.rules.Catalog.Cause(cs.Cause)
	evidence, remedies, text := 0, 0, 0
	for _, r := range cs.Fired {
		evidence += len(r.Evidence)
		remedies += len(r.Remedies)
		text += len(r.Explain) + 17 // a placeholder's name is about as long as its value
	}
	c := Cause{ID: cs.Cause, Rank: rank, Score: math.Round(cs.Certainty*1000) / 1000, Title: entry.Title,
		Evidence: make([]Evidence, 0, evidence), Remedies: make([]Remedy, 0, remedies)}
	var explanation strings.Builder
	explanation.Grow(text)
	for i, r := range cs.Fired {
		if i > 0 {
			explanation.WriteByte(' ')
		}
		r.WriteExplanation(&explanation, ev.facts)
		for _, name := range r.Evidence {
			v := ev.facts.Number(name)
			if hasEvidence(c.Evidence, name) || math.IsNaN(v) || math.IsInf(v, 0) {
				continue
			}
			c.Evidence = append(c.Evidence, Evidence{Scale: name, Value: number.Round(v, 6), Unit: ev.facts.Unit(name), Test: r.When})
		}
		if r.Certainty < 0 {
			continue
		}
		for _, id := range r.Remedies {
			if broken := remedy.Breaks(id, ev.cond.Constraints); broken != nil {
				if !slices.ContainsFunc(c.Withheld, func(w Withheld) bool { return w.ID == id }) {
					c.Withheld = append(c.Withheld, Withheld{ID: id, Constraints: broken})
				}
				continue
			}
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
