package advisor

import (
	"strings"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
	"colloidtriage/rules"
)

// TestBarrierAtCutoff flags a barrier at the 0.2 nm closest approach: with
// a Hamaker constant of 0.5 zJ (about that of a polymer nearly matched to
// water) and -60 mV in 1 mM salt, the double layer outweighs the van der
// Waals attraction down to contact (-A a/12h against 2 pi eps a psi_eff^2:
// at h = 0.2 nm, 0.5e-21 x 1e-7/(12 x 0.2e-9) = 2.1e-20 J, below 1.3e-17 J
// [calc]), so the energy rises to the cut-off and the report says what
// that means for W.
func TestBarrierAtCutoff(t *testing.T) {
	e, err := LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	s := &input.Sample{Symptom: "flocculation",
		Particles: input.Particles{DiameterNm: ptrTo(200.0), DensityKgM3: ptrTo(1050.0), ZetaMV: ptrTo(-60.0), HamakerZJ: ptrTo(0.5)},
		Medium:    input.Medium{Liquid: "water", PH: ptrTo(7.0), Electrolytes: []input.Electrolyte{{Formula: "NaCl", ConcentrationMM: ptrTo(1.0)}}}}
	rep, err := e.Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	if sc := rep.Scales["barrier_at_cutoff"]; sc.Value != 1 || rep.Scales["barrier_position"].Value != 0.2 {
		t.Errorf("barrier_at_cutoff %v at %v nm, want 1 at 0.2 nm", sc.Value, rep.Scales["barrier_position"].Value)
	}
	found := false
	for _, a := range rep.Assumptions {
		found = found || strings.Contains(a, "depend on where continuum theory is cut off")
	}
	if !found {
		t.Errorf("no note on the cut-off in %q", rep.Assumptions)
	}
}

// TestMultivalentCCC holds multivalent_ccc to its definition [calc]: with
// the other ions kept, the pair has a barrier (the highest maximum of the
// full scan) 2 % below that concentration of the multivalent salt and none
// 2 % above it.
func TestMultivalentCCC(t *testing.T) {
	e, err := LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	ev, err := e.evaluate(benchSample(t, "multivalent_ions_2.json"))
	if err != nil {
		t.Fatal(err)
	}
	ccc := ev.facts.Number("multivalent_ccc")
	if !(ccc > 0) {
		t.Fatalf("multivalent_ccc %g", ccc)
	}
	if !remedy.MultivalentPair(ev.pair, ev.cond, 0.98*ccc).Barrier().Found {
		t.Errorf("no barrier 2 %% below the multivalent CCC %g mM", ccc)
	}
	if remedy.MultivalentPair(ev.pair, ev.cond, 1.02*ccc).Barrier().Found {
		t.Errorf("a barrier 2 %% above the multivalent CCC %g mM", ccc)
	}
}
