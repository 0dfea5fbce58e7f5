package input_test

import (
	"fmt"
	"math"
	"testing"

	"colloidtriage/advisor/input"
)

// TestSaltsAsResolve holds the re-derivation of a remedy's trial salts to
// Resolve itself: rutile at pH 8.5 in 25 dH of hard water, zeta estimated
// through its site model, re-derived with the hardness at 1 mM, or with
// every salt halved, has the ionic strength and zeta potential that
// resolving the request with that hardness gives.
func TestSaltsAsResolve(t *testing.T) {
	lib := loadLibrary(t)
	const request = `{"symptom":"flocculation","particles":{"material":"titania_rutile","diameter_nm":150,"volume_fraction":0.2},
		"medium":{"liquid":"water","temperature_c":20,"ph":8.5,"hardness":{"value":%s,"unit":"%s"}}}`
	resolve := func(value, unit string) *input.Conditions {
		c, err := input.Resolve(sample(t, fmt.Sprintf(request, value, unit)), lib, input.NewNotes(32))
		if err != nil {
			t.Fatal(err)
		}
		return c
	}
	present := resolve("25", "dH")
	if present.ZetaSource != "estimated" || present.Sites == nil {
		t.Fatalf("zeta %s, sites %v", present.ZetaSource, present.Sites)
	}
	salts := present.Salts()
	for _, tt := range []struct {
		name, value, unit string
		scale, conc       float64
	}{
		{name: "hardness at 1 mM", scale: 1, conc: 1, value: "1", unit: "mM"},
		{name: "salts halved", scale: 0.5, conc: math.NaN(), value: "12.5", unit: "dH"},
	} {
		got, want := salts.With(tt.scale, tt.conc), resolve(tt.value, tt.unit)
		if math.Abs(got.IonicStrength/want.IonicStrength-1) > 1e-12 || math.Abs(got.Zeta/want.Zeta-1) > 1e-9 {
			t.Errorf("%s: ionic strength %g mM, zeta %g V; resolved %g mM, %g V", tt.name, got.IonicStrength, got.Zeta,
				want.IonicStrength, want.Zeta)
		}
	}
	if math.Abs(salts.With(1, 0).Zeta) <= math.Abs(present.Zeta) {
		t.Errorf("zeta %g V without the hardness, %g V with it", salts.With(1, 0).Zeta, present.Zeta)
	}
}
