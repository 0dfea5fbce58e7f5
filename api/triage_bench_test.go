package api

import (
	"net/http"
	"os"
	"testing"

	"colloidtriage/openapi"
)

// BenchmarkTriageHTTP times one POST /v1/triage of the settling demo (the
// load test's body) through the whole handler stack: strict decoding,
// validation, triage, serialisation, request id and access log.
func BenchmarkTriageHTTP(b *testing.B) {
	h := New(testEngine(b), Config{OpenAPI: openapi.JSON})
	body, err := os.ReadFile("../testdata/demo/gravity_settling.json")
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		rec := do(b, h, http.MethodPost, "/v1/triage", "application/json", string(body))
		if rec.Code != http.StatusOK {
			b.Fatalf("status %d", rec.Code)
		}
	}
}
