package uncertainty_test

import (
	"encoding/json"
	"math"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/library"
	"colloidtriage/advisor/uncertainty"
	"colloidtriage/rules"
)

// A draw derives the ions and the zeta potential as Resolve does: moving
// one input by a deviate gives the conditions Resolve gives for the request
// with that input at the drawn value (carried zeta: the measured zeta and
// the product's salt; site-model estimate: the pH; zeta from mobility: the
// mobility).
func TestDrawRederivesAsResolve(t *testing.T) {
	t.Parallel()
	lib, err := library.Load(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct{ name, request, path string }{
		{"carried zeta, zeta moved", carried, "particles.zeta_mV"},
		{"carried zeta, salt moved", carried, "medium.electrolytes"},
		{"site estimate, pH moved", estimated, "medium.ph"},
		{"hard water, pH moved", hard, "medium.ph"},
		{"mobility moved", mobility, "particles.mobility_um_cm_per_V_s"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			s := sample(t, tc.request)
			c, err := input.Resolve(s, lib, input.NewNotes(8))
			if err != nil {
				t.Fatal(err)
			}
			inputs, err := uncertainty.Plan(s, c)
			if err != nil {
				t.Fatal(err)
			}
			row := make([]float64, len(inputs))
			at := -1
			for i, in := range inputs {
				if in.Path == tc.path {
					at = i
				}
			}
			if at < 0 {
				t.Fatalf("%s is not an uncertain input", tc.path)
			}
			row[at] = 1.5
			got := uncertainty.Apply(inputs, row, c)
			v := inputs[at].Value(1.5)
			moved := sample(t, tc.request)
			switch tc.path {
			case "particles.zeta_mV":
				moved.Particles.ZetaMV = &v
			case "particles.mobility_um_cm_per_V_s":
				moved.Particles.Mobility = &v
			case "medium.ph":
				moved.Medium.PH = &v
			case "medium.electrolytes":
				for i := range moved.Medium.Electrolytes {
					conc := *moved.Medium.Electrolytes[i].ConcentrationMM * v / inputs[at].Nominal
					moved.Medium.Electrolytes[i].ConcentrationMM = &conc
				}
			}
			want, err := input.Resolve(moved, lib, input.NewNotes(8))
			if err != nil {
				t.Fatal(err)
			}
			if got.Zeta == c.Zeta {
				t.Errorf("zeta %g V did not move", got.Zeta)
			}
			// the stated salt scales; the pH-setting acid or base follows the pH in both
			if !near(got.Zeta, want.Zeta, 1e-9) || !near(got.IonicStrength, want.IonicStrength, 1e-3) ||
				got.CounterValence != want.CounterValence || got.ZetaSource != want.ZetaSource ||
				!near(got.MultivalentConc, want.MultivalentConc, 1e-12) {
				t.Errorf("draw: zeta %g V (%s), I %g, valence %d, multivalent %g; Resolve: %g V (%s), %g, %d, %g",
					got.Zeta, got.ZetaSource, got.IonicStrength, got.CounterValence, got.MultivalentConc,
					want.Zeta, want.ZetaSource, want.IonicStrength, want.CounterValence, want.MultivalentConc)
			}
			if again := uncertainty.Apply(inputs, make([]float64, len(inputs)), c); again.Zeta != c.Zeta || again.IonicStrength != c.IonicStrength {
				t.Errorf("a row of zeros gives zeta %g, I %g; nominal %g, %g", again.Zeta, again.IonicStrength, c.Zeta, c.IonicStrength)
			}
		})
	}
}

func near(a, b, rel float64) bool { return math.Abs(a-b) <= rel*math.Max(math.Abs(a), math.Abs(b)) }

// The requests: zeta measured in diluted KCl and carried to the product;
// silica with its site-model estimate; alumina in hard water; zeta from
// mobility.
const (
	carried = `{"symptom":"flocculation","particles":{"material":"silica_amorphous","diameter_nm":120,"volume_fraction":0.08,"zeta_mV":-45,
 "zeta_measured_in":{"ph":9.5,"electrolytes":[{"formula":"KCl","concentration_mM":1}],"temperature_c":25}},
 "medium":{"liquid":"water","temperature_c":25,"ph":9.5,"electrolytes":[{"formula":"NaNO3","concentration_mM":30}]}}`
	estimated = `{"symptom":"flocculation","particles":{"material":"silica_amorphous","diameter_nm":60,"volume_fraction":0.1},
 "medium":{"liquid":"water","ph":6,"electrolytes":[{"formula":"NaCl","concentration_mM":1}]}}`
	hard = `{"symptom":"flocculation","particles":{"material":"alumina","diameter_nm":300,"volume_fraction":0.1},
 "medium":{"liquid":"water","ph":10,"hardness":{"value":300,"unit":"mg_L_CaCO3"},"electrolytes":[{"formula":"Na2HPO4","concentration_mM":2}]}}`
	mobility = `{"symptom":"flocculation","particles":{"material":"polystyrene","diameter_nm":200,"volume_fraction":0.1,"mobility_um_cm_per_V_s":-2.5},
 "medium":{"liquid":"water","ph":7,"electrolytes":[{"formula":"NaCl","concentration_mM":10}]}}`
)

func sample(t *testing.T, text string) *input.Sample {
	t.Helper()
	var s input.Sample
	if err := json.Unmarshal([]byte(text), &s); err != nil {
		t.Fatal(err)
	}
	return &s
}
