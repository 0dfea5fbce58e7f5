package advisor

import (
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/rules"
)

// TestSiteModelFollowsSalt is the case of the issue: rutile (300 nm) at
// pH 8.5 without a measured zeta. Its surface potential now comes from the
// 1-pK basic Stern model, whose diffuse-layer potential falls as the ionic
// strength rises (Hiemstra, Van Riemsdijk & Bolt 1989; the trend of
// Kobayashi et al. 2005 [pub]), so the barrier in 10 mM NaCl is below the
// one in 1 mM, and the report carries the model's surface charge and
// diffuse potential.
func TestSiteModelFollowsSalt(t *testing.T) {
	e, err := LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	at := func(mM float64) *evaluation {
		s := &input.Sample{Symptom: "settling",
			Particles: input.Particles{Material: "titania_rutile", DiameterNm: ptrTo(300.0)},
			Medium: input.Medium{Liquid: "water", PH: ptrTo(8.5),
				Electrolytes: []input.Electrolyte{{Formula: "NaCl", ConcentrationMM: ptrTo(mM)}}}}
		ev, err := e.evaluate(s)
		if err != nil {
			t.Fatal(err)
		}
		for _, name := range []string{"surface_charge_density", "diffuse_layer_potential"} {
			if _, ok := ev.scales[name]; !ok {
				t.Fatalf("%g mM: no %s scale", mM, name)
			}
		}
		return ev
	}
	low, high := at(1), at(10)
	zLow, zHigh := low.facts.Number("diffuse_layer_potential"), high.facts.Number("diffuse_layer_potential")
	bLow, bHigh := low.facts.Number("energy_barrier"), high.facts.Number("energy_barrier")
	if !(zHigh > zLow && zHigh < 0) {
		t.Errorf("diffuse potential %.4g mV in 1 mM, %.4g mV in 10 mM: want it negative and falling in magnitude", zLow, zHigh)
	}
	if !(bHigh < bLow) {
		t.Errorf("barrier %.4g kT in 1 mM, %.4g kT in 10 mM: want it lower in 10 mM", bLow, bHigh)
	}
	t.Logf("rutile pH 8.5: 1 mM %.4g mV, %.4g kT; 10 mM %.4g mV, %.4g kT", zLow, bLow, zHigh, bHigh)
}
