package rule_test

import (
	"encoding/json"
	"errors"
	"io/fs"
	"os"
	"strings"
	"testing"
	"testing/fstest"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/rule"
	"colloidtriage/rules"
)

// load builds the rule set of the built-in rules plus packs, against the
// vocabulary the advisor declares.
func load(packs ...fs.FS) (*rule.Set, error) {
	eng, err := advisor.LoadEngine(rules.FS, packs...)
	if err != nil {
		return nil, err
	}
	return eng.RuleSet(), nil
}

func TestBuiltinRuleSetCompiles(t *testing.T) {
	t.Parallel()
	rs, err := load()
	if err != nil {
		t.Fatal(err)
	}
	if len(rs.Rules()) == 0 || !strings.HasPrefix(rs.Hash, "sha256:") {
		t.Fatalf("rule set: %d rules, hash %q", len(rs.Rules()), rs.Hash)
	}
	again, err := load()
	if err != nil || again.Hash != rs.Hash {
		t.Fatalf("hash not stable: %q vs %q (%v)", rs.Hash, again.Hash, err)
	}
}

// TestConditionsMatchMachine: every built-in condition compiles to a
// closure, and the closure answers as the expression library's machine does
// on random facts, NaN and infinities included.
func TestConditionsMatchMachine(t *testing.T) {
	t.Parallel()
	rs, err := load()
	if err != nil {
		t.Fatal(err)
	}
	rule.ConditionsMatchMachine(t, rs)
}

// TestConditionOutsideSubset: a site rule beyond the subset has no closure
// and still runs, on the machine.
func TestConditionOutsideSubset(t *testing.T) {
	t.Parallel()
	pack := fstest.MapFS{"site.rules.yaml": {Data: []byte("rules:\n  - id: site.modulo\n    cause: gravity_settling\n" +
		"    symptoms: [settling]\n    when: symptom in [\"settling\"] && int(age_days) % 2 == 0\n    certainty: 0.9\n    explain: site-modulo-fired\n")}}
	eng, err := advisor.LoadEngine(rules.FS, pack)
	if err != nil {
		t.Fatal(err)
	}
	loaded, closure := rule.HasClosure(eng.RuleSet(), "site.modulo")
	if !loaded {
		t.Fatal("site.modulo not loaded")
	}
	if closure {
		t.Fatal("site.modulo compiled to a closure")
	}
	data, err := os.ReadFile("../../testdata/demo/gravity_settling.json")
	if err != nil {
		t.Fatal(err)
	}
	for _, age := range []float64{4, 3} {
		var s input.Sample
		if err := json.Unmarshal(data, &s); err != nil {
			t.Fatal(err)
		}
		s.Observation = &input.Observation{AgeDays: &age}
		rep, err := eng.Triage(&s)
		if err != nil {
			t.Fatal(err)
		}
		fired := false
		for _, c := range rep.Causes {
			fired = fired || strings.Contains(c.Explanation, "site-modulo-fired")
		}
		if fired != (age == 4) {
			t.Errorf("age %g d: site.modulo fired = %v", age, fired)
		}
	}
}

// TestRuleErrorsNamePlace checks that every kind of broken rule stops the
// load with file, rule id, line and column.
func TestRuleErrorsNamePlace(t *testing.T) {
	t.Parallel()
	head := "rules:\n  - id: site.broken\n    cause: gravity_settling\n    symptoms: [settling]\n    certainty: 0.5\n    explain: x\n"
	cases := []struct {
		name, when, extra string
		line, column      int
		msg               string
	}{
		{"unknown fact", "stokes_speed > 1", "", 7, 11, "unknown name stokes_speed"},
		{"bad syntax", "stokes_velocity >", "", 7, 27, "unexpected token"},
		{"wrong result type", "stokes_velocity + 1", "", 7, 11, "expected bool"},
		{"quoted offset", `"density_difference > 0 && nonsense"`, "", 7, 38, "unknown name nonsense"},
		{"unknown key", "true", "    weight: 2\n", 8, 5, `unknown key "weight"`},
	}
	for _, c := range cases {
		pack := fstest.MapFS{"site.rules.yaml": {Data: []byte(head + "    when: " + c.when + "\n" + c.extra)}}
		_, err := load(pack)
		var re *rule.Error
		if !errors.As(err, &re) {
			t.Errorf("%s: want a *rule.Error, got %v", c.name, err)
			continue
		}
		if re.File != "pack1/site.rules.yaml" || re.RuleID != "site.broken" || re.Line != c.line ||
			re.Column != c.column || !strings.Contains(re.Message, c.msg) {
			t.Errorf("%s: got %s:%d:%d rule %q: %q; want line %d column %d containing %q",
				c.name, re.File, re.Line, re.Column, re.RuleID, re.Message, c.line, c.column, c.msg)
		}
	}
}

func TestRuleCatalogueChecks(t *testing.T) {
	t.Parallel()
	base := "rules:\n  - id: site.x\n    symptoms: [settling]\n    when: true\n    explain: x\n"
	cases := []struct{ name, body, msg string }{
		{"unknown cause", "    cause: cosmic_rays\n    certainty: 0.5\n", `unknown cause "cosmic_rays"`},
		{"certainty out of range", "    cause: gravity_settling\n    certainty: 1.5\n", "certainty must be in [-1, 1]"},
		{"unknown remedy", "    cause: gravity_settling\n    certainty: 0.5\n    remedies: [pray]\n", `unknown remedy "pray"`},
		{"evidence not a number", "    cause: gravity_settling\n    certainty: 0.5\n    evidence: [symptom]\n", "not a numeric fact"},
		{"top score before the causes", "    cause: gravity_settling\n    certainty: 0.5\n    evidence: [top_cause_score]\n", "not a numeric fact"},
	}
	for _, c := range cases {
		pack := fstest.MapFS{"site.rules.yaml": {Data: []byte(base + c.body)}}
		_, err := load(pack)
		if err == nil || !strings.Contains(err.Error(), c.msg) || !strings.Contains(err.Error(), "site.x") {
			t.Errorf("%s: got %v, want an error naming site.x with %q", c.name, err, c.msg)
		}
	}
	dup := fstest.MapFS{"a.rules.yaml": {Data: []byte("rules:\n  - id: gravity.clear_layer_beyond_criterion\n    cause: gravity_settling\n    symptoms: [settling]\n    when: true\n    certainty: 0.1\n    explain: x\n")}}
	if _, err := load(dup); err == nil || !strings.Contains(err.Error(), "duplicate rule id") {
		t.Errorf("duplicate id: got %v", err)
	}
}
