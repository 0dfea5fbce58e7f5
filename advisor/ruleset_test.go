package advisor

import (
	"errors"
	"strings"
	"testing"
	"testing/fstest"

	"colloidtriage/rules"
)

func TestBuiltinRuleSetCompiles(t *testing.T) {
	t.Parallel()
	rs, err := LoadRuleSet(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	if len(rs.rules) == 0 || !strings.HasPrefix(rs.Hash, "sha256:") {
		t.Fatalf("rule set: %d rules, hash %q", len(rs.rules), rs.Hash)
	}
	again, err := LoadRuleSet(rules.FS)
	if err != nil || again.Hash != rs.Hash {
		t.Fatalf("hash not stable: %q vs %q (%v)", rs.Hash, again.Hash, err)
	}
}

func TestCatalogRemediesHaveSolvers(t *testing.T) {
	t.Parallel()
	rs, err := LoadRuleSet(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rs.Catalog.Remedies {
		_, ok := remedySolvers[r.ID]
		if !ok && r.ID != "investigate_non_colloidal" {
			t.Errorf("remedy %s has no target solver", r.ID)
		}
		if ok != strings.Contains(r.Action, "{target}") {
			t.Errorf("remedy %s: action template and solver disagree about a target", r.ID)
		}
	}
	for id := range remedySolvers {
		if _, ok := find(rs.Catalog.Remedies, id); !ok {
			t.Errorf("solver for %s, which the catalogue does not list", id)
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
		_, err := LoadRuleSet(rules.FS, pack)
		var re *RuleError
		if !errors.As(err, &re) {
			t.Errorf("%s: want a *RuleError, got %v", c.name, err)
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
		_, err := LoadRuleSet(rules.FS, pack)
		if err == nil || !strings.Contains(err.Error(), c.msg) || !strings.Contains(err.Error(), "site.x") {
			t.Errorf("%s: got %v, want an error naming site.x with %q", c.name, err, c.msg)
		}
	}
	dup := fstest.MapFS{"a.rules.yaml": {Data: []byte("rules:\n  - id: gravity.clear_layer_beyond_criterion\n    cause: gravity_settling\n    symptoms: [settling]\n    when: true\n    certainty: 0.1\n    explain: x\n")}}
	if _, err := LoadRuleSet(rules.FS, dup); err == nil || !strings.Contains(err.Error(), "duplicate rule id") {
		t.Errorf("duplicate id: got %v", err)
	}
}

func TestCatalogActionHoldsOneTarget(t *testing.T) {
	t.Parallel()
	fsys := fstest.MapFS{"catalog.yaml": {Data: []byte("remedies:\n  - id: twice\n    action: \"{target} and {target}\"\n")}}
	if _, _, err := loadCatalog(fsys, "catalog.yaml"); err == nil || !strings.Contains(err.Error(), "at most one {target}") {
		t.Errorf("two {target}: got %v", err)
	}
	if got := withTarget("Raise it: {target}.", "x >= 1"); got != "Raise it: x >= 1." {
		t.Errorf("withTarget = %q", got)
	}
}
