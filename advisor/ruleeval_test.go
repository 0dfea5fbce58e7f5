package advisor

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"
	"testing/fstest"

	"github.com/expr-lang/expr/vm"

	"colloidtriage/rules"
)

// TestConditionsMatchMachine: every built-in condition compiles to a
// closure, and the closure answers as the expression library's machine does
// on random facts, NaN and infinities included.
func TestConditionsMatchMachine(t *testing.T) {
	t.Parallel()
	rs, err := LoadRuleSet(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	numbers := []float64{math.NaN(), math.Inf(1), math.Inf(-1), 0, -0.5, 0.2, 0.3, 0.5, 1, 2, 3, 5, 9.99, 10, 10.01,
		15, 20, 29.9, 30, 300, 1000, -1, -2, -5, -10, -30}
	texts := []string{"", "yes", "no", "liquid", "solid", "gas", "good", "poor", "theta", "settling"}
	rng := rand.New(rand.NewPCG(1, 2))
	var machine vm.VM
	for _, r := range rs.rules {
		if r.cond == nil {
			t.Errorf("%s: condition %q does not compile to a closure", r.ID, r.When)
			continue
		}
		fired := 0
		for range 1000 {
			f := newFacts()
			for _, spec := range factIndex {
				switch spec.Kind {
				case numberFact:
					f.num[spec.slot] = numbers[rng.IntN(len(numbers))]
					if rng.IntN(4) == 0 {
						f.num[spec.slot] = rng.NormFloat64() * 20
					}
				case textFact:
					f.text[spec.slot] = texts[rng.IntN(len(texts))]
				case flagFact:
					f.flag[spec.slot] = rng.IntN(2) == 0
				}
			}
			want, err := runRule(&machine, r.program, f.env(r.AfterCauses))
			if err != nil {
				t.Fatalf("%s: machine: %v", r.ID, err)
			}
			if got := r.cond(f); got != want {
				t.Fatalf("%s: closure %v, machine %v on %v", r.ID, got, want, f.env(r.AfterCauses))
			}
			if want {
				fired++
			}
		}
		if fired == 0 {
			t.Logf("%s: never true on the random facts", r.ID)
		}
	}
}

// TestConditionOutsideSubset: a site rule beyond the subset has no closure
// and still runs, on the machine.
func TestConditionOutsideSubset(t *testing.T) {
	t.Parallel()
	pack := fstest.MapFS{"site.rules.yaml": {Data: []byte("rules:\n  - id: site.modulo\n    cause: gravity_settling\n" +
		"    symptoms: [settling]\n    when: symptom in [\"settling\"] && int(age_days) % 2 == 0\n    certainty: 0.9\n    explain: site-modulo-fired\n")}}
	rs, err := LoadRuleSet(rules.FS, pack)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rs.rules {
		if r.ID != "site.modulo" {
			continue
		}
		if r.cond != nil {
			t.Fatal("site.modulo compiled to a closure")
		}
		eng := NewEngine(rs, benchEngine(t).Library())
		for _, age := range []float64{4, 3} {
			s := benchSample(t, "gravity_settling.json")
			s.Observation = &Observation{AgeDays: &age}
			rep, err := eng.Triage(s)
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
		return
	}
	t.Fatal("site.modulo not loaded")
}
