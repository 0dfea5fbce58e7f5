package api

import (
	"bytes"
	"encoding/json"
	"io"
	"net/http"
	"net/http/httptest"
	"os"
	"strings"
	"testing"
	"time"
)

// TestBatchOutlivesWriteTimeout: a batch whose triage takes longer than the
// server's write timeout still arrives whole, in each answer format,
// because every item written moves the write deadline on by the batch's
// write window; only a stall longer than the window cuts it.
func TestBatchOutlivesWriteTimeout(t *testing.T) {
	demo, err := os.ReadFile("../testdata/demo/electrostatic_screening.json")
	if err != nil {
		t.Fatal(err)
	}
	const n = 120
	samples := make([]string, n)
	for i := range samples {
		samples[i] = string(bytes.TrimSpace(demo))
	}
	window := 400 * time.Millisecond
	app := New(testEngine(t), Config{BatchWriteWindow: window})
	srv := httptest.NewUnstartedServer(app)
	srv.Config.WriteTimeout = window
	srv.Start()
	defer srv.Close()

	for _, accept := range []string{"application/json", "application/x-ndjson", "text/csv"} {
		req, _ := http.NewRequest(http.MethodPost, srv.URL+"/v1/triage/batch",
			strings.NewReader(`{"samples":[`+strings.Join(samples, ",")+`]}`))
		req.Header.Set("Content-Type", "application/json")
		req.Header.Set("Accept", accept)
		start := time.Now()
		res, err := http.DefaultClient.Do(req)
		if err != nil {
			t.Fatalf("%s: %v", accept, err)
		}
		body, err := io.ReadAll(res.Body)
		res.Body.Close()
		took := time.Since(start)
		if err != nil {
			t.Fatalf("%s: answer cut after %v (write timeout %v): %v", accept, took, window, err)
		}
		switch accept {
		case "application/json":
			var out struct{ Count int }
			if err := json.Unmarshal(body, &out); err != nil || out.Count != n {
				t.Errorf("%s: after %v, count %d, %v: %.200s", accept, took, out.Count, err, body)
			}
		case "application/x-ndjson":
			if !strings.Contains(string(body), `{"end":true,"count":120`) {
				t.Errorf("%s: after %v, no end line", accept, took)
			}
		case "text/csv":
			if lines := strings.Count(string(body), "\n"); lines < n {
				t.Errorf("%s: after %v, %d lines for %d samples", accept, took, lines, n)
			}
		}
		if took < window {
			t.Logf("%s: the batch took only %v, under the write timeout; the test proves little on this machine", accept, took)
		}
	}
}
