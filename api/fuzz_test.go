package api

import (
	"bytes"
	"encoding/json"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"testing"

	"github.com/labstack/echo/v4"
)

// FuzzTriage posts arbitrary bodies through the whole POST /v1/triage path
// (middleware, decoder, validator, engine, serializer). Whatever the body,
// the answer is below 500, is one JSON value, holds only finite numbers,
// and is a problem detail unless it is a 200. The seeds are the demo
// scenarios and a few of the malformed bodies of badinput_test.go.
//
// Run it longer with
//
//	go test -run '^$' -fuzz '^FuzzTriage$' -fuzztime 10m ./api
func FuzzTriage(f *testing.F) {
	files, err := filepath.Glob("../testdata/demo/*.json")
	if err != nil || len(files) == 0 {
		f.Fatalf("no demo scenarios: %v", err)
	}
	for _, name := range files {
		b, err := os.ReadFile(name)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(b)
	}
	for _, s := range []string{"", "{}", "null", "[]", `{"symptom":"settling","particles":{"diameter_nm":1e-320,"density_kg_m3":1e308}}`,
		`{"symptom":"creaming","particles":{"phase":"liquid","diameter_nm":2000,"density_kg_m3":1000},"medium":{"density_kg_m3":1000}}`,
		nested("[", "", "]", 200)} {
		f.Add([]byte(s))
	}
	h := testServer(f)
	f.Fuzz(func(t *testing.T, body []byte) {
		req := httptest.NewRequest(http.MethodPost, "/v1/triage", bytes.NewReader(body))
		req.Header.Set(echo.HeaderContentType, echo.MIMEApplicationJSON)
		rec := httptest.NewRecorder()
		h.ServeHTTP(rec, req)
		out := rec.Body.Bytes()
		if rec.Code >= 500 {
			t.Fatalf("status %d for %q: %s", rec.Code, body, out)
		}
		if err := finiteJSON(out); err != nil {
			t.Fatalf("%v for %q: %.300s", err, body, out)
		}
		if rec.Code != http.StatusOK {
			var p problemBody
			if rec.Header().Get(echo.HeaderContentType) != problemContentType || json.Unmarshal(out, &p) != nil ||
				p.Title == "" || p.Status != rec.Code {
				t.Fatalf("status %d without a problem detail for %q: %.300s", rec.Code, body, out)
			}
		}
	})
}
