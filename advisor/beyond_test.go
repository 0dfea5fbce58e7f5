package advisor_test

import (
	"strings"
	"testing"

	"colloidtriage/advisor/input"
)

// A liquid without ions has no double layer: nothing holds the surfaces
// apart, so a long adsorbing chain at half coverage bridges them (La Mer &
// Healy 1963, optimum at coverage 0.5; bridging flocculants of 1e6 g/mol
// and more).
func TestBridgingWithoutElectrolyte(t *testing.T) {
	t.Parallel()
	s := &input.Sample{
		SampleID:  "bridging-in-oil",
		Symptom:   "flocculation",
		Particles: input.Particles{Material: "titania_rutile", DiameterNm: ptr(300.0), VolumeFraction: ptr(0.1)},
		Medium:    input.Medium{Liquid: "hexadecane", TemperatureC: ptr(25.0)},
		Stabilizer: &input.Stabilizer{AdsorbingPolymer: &input.AdsorbingPolymer{
			MolarMassKgMol: ptr(5000.0), SurfaceCoverage: ptr(0.5)}},
	}
	rep, err := profileEngine(t).Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	sc, ok := rep.Scales["bridging_likely"]
	if !ok || sc.Value != 1 {
		t.Fatalf("bridging_likely %+v (reported %v), want 1", sc, ok)
	}
	if want := "no repulsion range keeps the surfaces apart"; !strings.Contains(sc.Basis, want) {
		t.Errorf("basis %q, want the reason %q", sc.Basis, want)
	}
	found := false
	for _, c := range rep.Causes {
		found = found || c.ID == "bridging_flocculation"
	}
	if !found {
		t.Errorf("causes %v: bridging_flocculation missing", rep.Causes)
	}
}
