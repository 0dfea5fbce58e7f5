package advisor_test

import (
	"slices"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/rules"
)

// TestConstraintsWithholdRemedies: a dressing whose salt is part of the
// recipe states medium.ionic_strength_mM as a constraint; no remedy that
// changes the ionic strength is offered, and each is listed as withheld on
// its cause with the constraint it would break.
func TestConstraintsWithholdRemedies(t *testing.T) {
	eng, err := advisor.LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	s := loadDemo(t, demoDir+"/electrostatic_screening.json")
	free, err := eng.Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	if !offers(free, "lower_ionic_strength") {
		t.Fatal("the demo offers no lower_ionic_strength remedy to withhold")
	}
	s.Constraints = []string{"medium.ionic_strength_mM"}
	rep, err := eng.Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	if offers(rep, "lower_ionic_strength", "remove_multivalent_ions", "controlled_flocculation") {
		t.Error("a remedy that changes the constrained ionic strength is offered")
	}
	found := false
	for _, c := range rep.Causes {
		for _, w := range c.Withheld {
			if w.ID == "lower_ionic_strength" && slices.Contains(w.Constraints, "medium.ionic_strength_mM") {
				found = true
			}
		}
	}
	if !found {
		t.Error("lower_ionic_strength is not listed as withheld")
	}
}
