package api

import (
	"bytes"
	"encoding/json"
	"math"
	"net/http"
	"net/http/httptest"
	"os"
	"strings"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/openapi"
	"colloidtriage/rules"
)

// testEngine builds the engine the service runs, from the built-in rule set
// and library.
func testEngine(t testing.TB) *advisor.Engine {
	t.Helper()
	e, err := advisor.LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	return e
}

func testServer(t testing.TB) http.Handler {
	t.Helper()
	return New(testEngine(t), Config{OpenAPI: openapi.JSON})
}

func do(t testing.TB, h http.Handler, method, path, contentType, body string, header ...string) *httptest.ResponseRecorder {
	t.Helper()
	req := httptest.NewRequest(method, path, strings.NewReader(body))
	if contentType != "" {
		req.Header.Set("Content-Type", contentType)
	}
	for i := 0; i+1 < len(header); i += 2 {
		req.Header.Set(header[i], header[i+1])
	}
	rec := httptest.NewRecorder()
	h.ServeHTTP(rec, req)
	return rec
}

func demo(t testing.TB, name string) string {
	t.Helper()
	b, err := os.ReadFile("../testdata/demo/" + name)
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}

func TestTriageDemo(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", demo(t, "gravity_settling.json"),
		"Idempotency-Key", "lims-42")
	if rec.Code != http.StatusOK {
		t.Fatalf("status %d: %s", rec.Code, rec.Body)
	}
	var rep struct {
		SampleID       string                   `json:"sample_id"`
		Versions       advisor.Versions         `json:"versions"`
		Scales         map[string]advisor.Scale `json:"scales"`
		Causes         []advisor.Cause          `json:"causes"`
		Cautions       []string                 `json:"cautions"`
		Assumptions    []string                 `json:"assumptions"`
		RequestID      string                   `json:"request_id"`
		IdempotencyKey string                   `json:"idempotency_key"`
	}
	if err := json.Unmarshal(rec.Body.Bytes(), &rep); err != nil {
		t.Fatal(err)
	}
	if rep.SampleID != "DEMO-GS-001" || rep.IdempotencyKey != "lims-42" || rep.RequestID == "" ||
		rep.RequestID != rec.Header().Get("X-Request-Id") {
		t.Errorf("echoes: sample %q key %q request %q (header %q)", rep.SampleID, rep.IdempotencyKey, rep.RequestID,
			rec.Header().Get("X-Request-Id"))
	}
	if rep.Versions.Engine != advisor.EngineVersion || !strings.HasPrefix(rep.Versions.Rules, "sha256:") {
		t.Errorf("versions %+v", rep.Versions)
	}
	if len(rep.Causes) == 0 || rep.Causes[0].ID != "gravity_settling" || len(rep.Causes[0].Remedies) == 0 {
		t.Fatalf("causes %+v", rep.Causes)
	}
	for name, s := range rep.Scales {
		if math.IsNaN(s.Value) || math.IsInf(s.Value, 0) || s.Unit == "" {
			t.Errorf("scale %s = %+v", name, s)
		}
	}
	if len(rep.Assumptions) == 0 || len(rep.Cautions) == 0 ||
		!strings.Contains(rep.Cautions[len(rep.Cautions)-1], "defers to") {
		t.Errorf("assumptions %d, cautions %q", len(rep.Assumptions), rep.Cautions)
	}
}

// TestTriageDeterministic: identical input and rule set give identical
// scales, causes and versions.
func TestTriageDeterministic(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	strip := func(b []byte) string {
		var m map[string]any
		if err := json.Unmarshal(b, &m); err != nil {
			t.Fatal(err)
		}
		delete(m, "request_id")
		out, _ := json.Marshal(m)
		return string(out)
	}
	a := do(t, h, http.MethodPost, "/v1/triage", "application/json", demo(t, "gravity_settling.json"))
	b := do(t, h, http.MethodPost, "/v1/triage", "application/json", demo(t, "gravity_settling.json"))
	if strip(a.Body.Bytes()) != strip(b.Body.Bytes()) {
		t.Error("two identical requests gave different reports")
	}
}

type problemBody struct {
	Type   string               `json:"type"`
	Title  string               `json:"title"`
	Status int                  `json:"status"`
	Errors []input.FieldProblem `json:"errors"`
}

func TestTriageBadInput(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	cases := []struct {
		name, contentType, body string
		status                  int
		pointer, unit, valid    string
	}{
		{"not json", "application/json", "{", 400, "", "", ""},
		{"empty", "application/json", "", 400, "", "", ""},
		{"wrong content type", "text/plain", "{}", 415, "", "", ""},
		{"missing symptom", "application/json", `{"particles":{"diameter_nm":100,"density_kg_m3":2000}}`, 422, "/symptom", "", ""},
		{"negative size", "application/json", `{"symptom":"settling","particles":{"diameter_nm":-5,"density_kg_m3":2000}}`,
			422, "/particles/diameter_nm", "nm", "0.5 <= value <= 1e7"},
		{"solids at packing", "application/json", `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000,"volume_fraction":0.8}}`,
			422, "/particles/volume_fraction", "1", "0 < value < 0.74"},
		{"wrong type", "application/json", `{"symptom":"settling","particles":{"diameter_nm":"big"}}`, 400, "/particles/diameter_nm", "", ""},
		{"unknown field", "application/json", `{"symptom":"settling","particle":{}}`, 400, "/particle", "", ""},
		{"nested unknown field", "application/json", `{"symptom":"settling","particles":{"diameter":5}}`, 400, "/particles/diameter", "", ""},
		{"wrong type in array", "application/json", `{"symptom":"settling","medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":1},{"formula":"KCl","concentration_mM":"lots"}]}}`,
			400, "/medium/electrolytes/1/concentration_mM", "", ""},
		{"unknown salt", "application/json", `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"medium":{"electrolytes":[{"formula":"XyZ","concentration_mM":1}]}}`,
			422, "/medium/electrolytes/0/formula", "", ""},
		{"water too hot", "application/json", `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"storage":{"temperature_c":150}}`,
			422, "/storage/temperature_c", "degC", ""},
		{"no density", "application/json", `{"symptom":"settling","particles":{"diameter_nm":100}}`, 422, "/particles/density_kg_m3", "kg/m^3", ""},
		{"unknown liquid", "application/json", `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"medium":{"liquid":"mercury"}}`,
			422, "/medium/liquid", "", ""},
		{"trailing data", "application/json", `{"symptom":"settling"} {}`, 400, "", "", ""},
	}
	for _, c := range cases {
		rec := do(t, h, http.MethodPost, "/v1/triage", c.contentType, c.body)
		if rec.Code != c.status || rec.Header().Get("Content-Type") != problemContentType {
			t.Errorf("%s: status %d (%s), want %d problem+json: %s", c.name, rec.Code, rec.Header().Get("Content-Type"), c.status, rec.Body)
			continue
		}
		var p problemBody
		if err := json.Unmarshal(rec.Body.Bytes(), &p); err != nil || p.Status != c.status || p.Title == "" {
			t.Errorf("%s: problem %s (%v)", c.name, rec.Body, err)
			continue
		}
		if c.pointer == "" {
			continue
		}
		found := false
		for _, f := range p.Errors {
			if f.Pointer == c.pointer && (c.unit == "" || f.Unit == c.unit) && (c.valid == "" || f.Valid == c.valid) {
				found = true
			}
		}
		if !found {
			t.Errorf("%s: no error for %s (unit %q, valid %q) in %s", c.name, c.pointer, c.unit, c.valid, rec.Body)
		}
	}
}

func TestBodyLimit(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	big := `{"symptom":"settling","sample_id":"` + strings.Repeat("x", 300<<10) + `"}`
	rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", big)
	if rec.Code != http.StatusRequestEntityTooLarge || rec.Header().Get("Content-Type") != problemContentType {
		t.Errorf("status %d %s", rec.Code, rec.Header().Get("Content-Type"))
	}
}

func TestReadOnlyRoutes(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for _, path := range []string{"/healthz", "/readyz", "/openapi.json", "/v1/catalog", "/v1/rules", "/v1/materials"} {
		rec := do(t, h, http.MethodGet, path, "", "")
		if rec.Code != http.StatusOK || !json.Valid(rec.Body.Bytes()) {
			t.Errorf("%s: %d %s", path, rec.Code, bytes.TrimSpace(rec.Body.Bytes())[:min(80, rec.Body.Len())])
		}
	}
	if rec := do(t, h, http.MethodGet, "/nowhere", "", ""); rec.Code != 404 || rec.Header().Get("Content-Type") != problemContentType {
		t.Errorf("404: %d %s", rec.Code, rec.Header().Get("Content-Type"))
	}
}

func TestScalesWithoutSymptom(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rec := do(t, h, http.MethodPost, "/v1/scales", "application/json",
		`{"particles":{"diameter_nm":1000,"density_kg_m3":2000},"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":10}]}}`)
	if rec.Code != 200 {
		t.Fatalf("%d %s", rec.Code, rec.Body)
	}
	var out struct {
		Scales map[string]advisor.Scale `json:"scales"`
	}
	if err := json.Unmarshal(rec.Body.Bytes(), &out); err != nil {
		t.Fatal(err)
	}
	// Debye length of 10 mM NaCl at 25 C: 3.04 nm (testdata/reference/REFERENCES.md [calc]).
	if d := out.Scales["debye_length"].Value; math.Abs(d-3.04) > 0.01 {
		t.Errorf("debye_length %v, want 3.04 nm", d)
	}
}

func TestWrongMethod(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rec := do(t, h, http.MethodGet, "/v1/triage", "", "")
	if rec.Code != http.StatusMethodNotAllowed || rec.Header().Get("Content-Type") != problemContentType {
		t.Errorf("GET /v1/triage: %d %s", rec.Code, rec.Header().Get("Content-Type"))
	}
}
