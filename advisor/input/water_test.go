package input_test

import (
	"errors"
	"fmt"
	"testing"

	"colloidtriage/advisor/input"
)

// TestHardness converts the hardness units and counts them as Ca2+ with two
// monovalent anions (ionic strength 3 per mM) [calc from the definitions]:
//   - 1 German degree = 10 mg/L CaO [pub, hardness tables]: 10/56.0774 =
//     0.17832 mM;
//   - 1 French degree = 10 mg/L CaCO3 = 0.1 mmol/L [pub, Brussels water
//     utility composition table]: 0.09991 mM with M(CaCO3) = 100.0869;
//   - 180 mg/L CaCO3, the WHO limit of "very hard" water [pub]: 1.798 mM.
func TestHardness(t *testing.T) {
	t.Parallel()
	lib := loadLibrary(t)
	for _, tt := range []struct {
		value  float64
		unit   string
		wantMM float64
	}{
		{1, "dH", 0.17832}, {1, "fH", 0.09991}, {180, "mg_L_CaCO3", 1.7984}, {2.5, "mM", 2.5},
	} {
		js := fmt.Sprintf(`{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
			"medium":{"liquid":"water","ph":7,"hardness":{"value":%g,"unit":%q}}}`, tt.value, tt.unit)
		c, err := input.Resolve(sample(t, js), lib, input.NewNotes(32))
		if err != nil {
			t.Fatal(err)
		}
		if !near(c.MultivalentConc, tt.wantMM, 2e-4) || c.MultivalentSalt == "" || !near(c.IonicStrength, 3*tt.wantMM, 1e-3) {
			t.Errorf("%g %s: %g mM of %q, ionic strength %g mM; want %g mM and %g mM", tt.value, tt.unit,
				c.MultivalentConc, c.MultivalentSalt, c.IonicStrength, tt.wantMM, 3*tt.wantMM)
		}
	}
	js := `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"hardness":{"value":400,"unit":"dH"}}}`
	_, err := input.Resolve(sample(t, js), lib, input.NewNotes(8))
	var bad *input.Error
	if !errors.As(err, &bad) || len(bad.Problems) != 1 || bad.Problems[0].Pointer != "/medium/hardness/value" || bad.Problems[0].Unit != "dH" ||
		bad.Problems[0].Valid != "0 <= value <= 280.4" {
		t.Errorf("400 dH: %v, want a problem at /medium/hardness/value in dH, valid up to 280.4 (50 mM)", err)
	}
}

// TestBufferSpeciation counts a buffer salt with its real valences at the
// pH: 10 mM Na2HPO4 brought to pH 7.4 holds 20 mM Na+, 6.099 mM HPO4 2- and
// 3.901 mM H2PO4- (pKa2 7.206, Henderson–Hasselbalch [pub]), and the acid
// that lowered the pH leaves 3.901 mM of a monovalent anion: ionic strength
// (20 + 4 x 6.099 + 3.901 + 3.901)/2 = 26.10 mM [calc], against 30 mM for
// the salt counted as written.
func TestBufferSpeciation(t *testing.T) {
	t.Parallel()
	js := `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
		"medium":{"liquid":"water","ph":7.4,"electrolytes":[{"formula":"Na2HPO4","concentration_mM":10}]}}`
	n := input.NewNotes(32)
	c, err := input.Resolve(sample(t, js), loadLibrary(t), n)
	if err != nil {
		t.Fatal(err)
	}
	if !near(c.IonicStrength, 26.10, 1e-3) {
		t.Errorf("ionic strength %g mM, want 26.10", c.IonicStrength)
	}
	js = `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
		"medium":{"liquid":"water","electrolytes":[{"formula":"Na2HPO4","concentration_mM":10}]}}`
	if c, err = input.Resolve(sample(t, js), loadLibrary(t), input.NewNotes(32)); err != nil || !near(c.IonicStrength, 30, 1e-9) {
		t.Errorf("without a pH: ionic strength %g mM (%v), want 30 (as written)", c.IonicStrength, err)
	}
}
