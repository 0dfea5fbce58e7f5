package rule

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/expr-lang/expr/vm"
)

// conditionsMatchMachine checks that every condition of rs compiles to a
// closure and that the closure answers as the expression library's machine
// does on random facts, NaN and infinities included. The tests outside the
// package hand it the built-in rule set, whose vocabulary the advisor
// declares.
func conditionsMatchMachine(t *testing.T, rs *Set) {
	t.Helper()
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
			f := rs.NewFacts()
			for _, d := range rs.vocab.index {
				switch d.Kind {
				case Number:
					f.num[d.slot] = numbers[rng.IntN(len(numbers))]
					if rng.IntN(4) == 0 {
						f.num[d.slot] = rng.NormFloat64() * 20
					}
				case Text:
					f.text[d.slot] = texts[rng.IntN(len(texts))]
				case Flag:
					f.flag[d.slot] = rng.IntN(2) == 0
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

// hasClosure reports whether rule id of rs is loaded and whether its
// condition compiled to a closure.
func hasClosure(rs *Set, id string) (loaded, closure bool) {
	for _, r := range rs.rules {
		if r.ID == id {
			return true, r.cond != nil
		}
	}
	return false, false
}

func TestVocabularyRejectsDuplicates(t *testing.T) {
	t.Parallel()
	if _, err := newVocabulary([]Fact{{Name: "x", Kind: Number}, {Name: "x", Kind: Text}}); err == nil {
		t.Error("fact declared twice: no error")
	}
	if _, err := newVocabulary([]Fact{{Name: TopCauseScore, Kind: Number}}); err == nil {
		t.Error("top_cause_score declared by the caller: no error")
	}
}
