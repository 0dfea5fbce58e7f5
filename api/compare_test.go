package api

import (
	"encoding/json"
	"net/http"
	"testing"
)

// TestCompareProblemPointers: the problems of a comparison name their
// field under /reference or /complaint, with unit and valid range, for the
// validation of both samples and for the physics of either.
func TestCompareProblemPointers(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	cases := []struct {
		name, body string
		want       []string
	}{
		{"ranges", `{"reference":{"particles":{"diameter_nm":0.1,"density_kg_m3":2000}},` +
			`"complaint":{"symptom":"settling","particles":{"diameter_nm":100,"volume_fraction":0.9}}}`,
			[]string{"/reference/particles/diameter_nm", "/complaint/particles/volume_fraction"}},
		{"reference physics", `{"reference":{"particles":{"diameter_nm":100,"density_kg_m3":2000},"medium":{"electrolytes":[{"formula":"XyZ","concentration_mM":1}]}},` +
			`"complaint":{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000}}}`,
			[]string{"/reference/medium/electrolytes/0/formula"}},
		{"complaint physics", `{"reference":{"particles":{"diameter_nm":100,"density_kg_m3":2000}},` +
			`"complaint":{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"storage":{"temperature_c":150}}}`,
			[]string{"/complaint/storage/temperature_c"}},
		{"missing", `{"complaint":{"symptom":"settling","particles":{"diameter_nm":100}}}`, []string{"/reference"}},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			rec := do(t, h, http.MethodPost, "/v1/compare", jsonType, tc.body)
			if rec.Code != http.StatusUnprocessableEntity {
				t.Fatalf("status %d, want 422: %s", rec.Code, rec.Body)
			}
			var p Problem
			if err := json.Unmarshal(rec.Body.Bytes(), &p); err != nil {
				t.Fatal(err)
			}
			if len(p.Errors) != len(tc.want) {
				t.Fatalf("problems %+v, want pointers %v", p.Errors, tc.want)
			}
			for i, w := range tc.want {
				if p.Errors[i].Pointer != w {
					t.Errorf("pointer %q, want %q", p.Errors[i].Pointer, w)
				}
				if tc.name == "ranges" && (p.Errors[i].Unit == "" || p.Errors[i].Valid == "") {
					t.Errorf("%s: no unit or range: %+v", w, p.Errors[i])
				}
			}
		})
	}
}
