package api

import (
	"bufio"
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"net/http"
	"strings"
	"testing"

	"github.com/labstack/echo/v4"

	"colloidtriage/openapi"
)

// batchReply is the JSON answer of POST /v1/triage/batch as a client reads it.
type batchReply struct {
	Count          int    `json:"count"`
	Failed         int    `json:"failed"`
	RequestID      string `json:"request_id"`
	IdempotencyKey string `json:"idempotency_key"`
	Items          []struct {
		Index    int    `json:"index"`
		Line     int    `json:"line"`
		SampleID string `json:"sample_id"`
		Status   int    `json:"status"`
		Report   *struct {
			SampleID string `json:"sample_id"`
			Causes   []struct {
				ID string `json:"id"`
			} `json:"causes"`
		} `json:"report"`
		Problem *problemBody `json:"problem"`
	} `json:"items"`
}

func decodeBatch(t testing.TB, body []byte) batchReply {
	t.Helper()
	var r batchReply
	if err := json.Unmarshal(body, &r); err != nil {
		t.Fatalf("batch answer is not JSON: %v: %.300s", err, body)
	}
	return r
}

// limsCase is one kind of sample a LIMS export mixes: its JSON, the status
// it must get, and the pointer (relative to the sample) its problem names.
type limsCase struct {
	kind    string
	sample  func(id string) string
	status  int
	pointer string
}

var limsCases = []limsCase{
	{"valid settling", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"settling","product_category":"paint",
		"particles":{"material":"titania_rutile","diameter_nm":2500,"volume_fraction":0.05,"zeta_mV":-45},
		"medium":{"liquid":"water","temperature_c":25,"electrolytes":[{"formula":"NaCl","concentration_mM":1}]},
		"storage":{"container_height_mm":150,"shelf_life_days":365}}`
	}, 200, ""},
	{"valid flocculation", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"flocculation",
		"particles":{"material":"silica_amorphous","diameter_nm":300,"volume_fraction":0.1,"zeta_mV":-12},
		"medium":{"electrolytes":[{"formula":"CaCl2","concentration_mM":50}]}}`
	}, 200, ""},
	{"wrong type", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"settling","particles":{"diameter_nm":"big","density_kg_m3":2000}}`
	}, 400, "/particles/diameter_nm"},
	{"out of range", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"settling","particles":{"diameter_nm":800,"density_kg_m3":2000,"volume_fraction":0.9}}`
	}, 422, "/particles/volume_fraction"},
	{"unknown material", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"caking","particles":{"material":"unobtainium","diameter_nm":800}}`
	}, 422, "/particles/material"},
	{"inconsistent electrolyte", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"flocculation","particles":{"material":"alumina","diameter_nm":400},
		"medium":{"electrolytes":[{"formula":"NaCl","cation_valence":1,"anion_valence":1,"concentration_mM":5}]}}`
	}, 422, "/medium/electrolytes/0"},
	{"not an object", func(string) string { return `"S-text"` }, 400, ""},
	{"valid caking", func(id string) string {
		return `{"sample_id":"` + id + `","symptom":"caking",
		"particles":{"material":"calcite","diameter_nm":5000,"volume_fraction":0.3},
		"storage":{"container_height_mm":200,"shelf_life_days":730},"observation":{"age_days":90,"sediment_redisperses":false}}`
	}, 200, ""},
}

// limsBatch is n samples cycling through limsCases, as a JSON batch body.
func limsBatch(n int) string {
	parts := make([]string, n)
	for i := range parts {
		parts[i] = limsCases[i%len(limsCases)].sample(fmt.Sprintf("LIMS-%04d", i))
	}
	return `{"samples":[` + strings.Join(parts, ",") + `]}`
}

// TestBatchLIMS: a LIMS posts 1,000 mixed samples in one batch; every one
// comes back, in order, with its own status, and the bad ones fail alone
// with a pointer into the request body.
func TestBatchLIMS(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	const n = 1000
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", limsBatch(n), "Idempotency-Key", "lims-run-7")
	if rec.Code != http.StatusOK {
		t.Fatalf("status %d: %.500s", rec.Code, rec.Body)
	}
	r := decodeBatch(t, rec.Body.Bytes())
	if r.Count != n || len(r.Items) != n {
		t.Fatalf("count %d, %d items, want %d", r.Count, len(r.Items), n)
	}
	if r.IdempotencyKey != "lims-run-7" || r.RequestID == "" || r.RequestID != rec.Header().Get("X-Request-Id") {
		t.Errorf("echoes: key %q request %q", r.IdempotencyKey, r.RequestID)
	}
	failed := 0
	for i, it := range r.Items {
		c := limsCases[i%len(limsCases)]
		id := fmt.Sprintf("LIMS-%04d", i)
		if c.kind == "not an object" {
			id = ""
		}
		if it.Index != i || it.SampleID != id || it.Status != c.status {
			t.Fatalf("item %d (%s): index %d sample %q status %d, want %d %q", i, c.kind, it.Index, it.SampleID, it.Status, c.status, id)
		}
		if c.status == http.StatusOK {
			if it.Report == nil || it.Problem != nil || it.Report.SampleID != id || len(it.Report.Causes) == 0 {
				t.Fatalf("item %d (%s): report %+v problem %+v", i, c.kind, it.Report, it.Problem)
			}
			continue
		}
		failed++
		if it.Report != nil || it.Problem == nil || it.Problem.Status != c.status || it.Problem.Title == "" {
			t.Fatalf("item %d (%s): report %+v problem %+v", i, c.kind, it.Report, it.Problem)
		}
		want := fmt.Sprintf("/samples/%d%s", i, c.pointer)
		if !hasPointer(it.Problem, want) {
			t.Fatalf("item %d (%s): no error at %s in %+v", i, c.kind, want, it.Problem.Errors)
		}
	}
	if r.Failed != failed {
		t.Errorf("failed %d, counted %d", r.Failed, failed)
	}
}

func hasPointer(p *problemBody, ptr string) bool {
	for _, f := range p.Errors {
		if f.Pointer == ptr {
			return true
		}
	}
	return false
}

// TestBatchDeterministic: the worker pool never changes the answer; with the
// request id fixed, two runs are byte-identical.
func TestBatchDeterministic(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	body := limsBatch(200)
	a := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", body, "X-Request-Id", "fixed")
	b := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", body, "X-Request-Id", "fixed")
	if a.Code != 200 || a.Body.String() != b.Body.String() {
		t.Errorf("two runs of one batch differ (status %d)", a.Code)
	}
}

// TestBatchItemMatchesTriage: a batch item's report is the report the
// single-sample route gives for the same sample.
func TestBatchItemMatchesTriage(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	sample := demo(t, "gravity_settling.json")
	single := do(t, h, http.MethodPost, "/v1/triage", "application/json", sample)
	batch := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", `{"samples":[`+sample+`]}`)
	var s map[string]json.RawMessage
	var b struct {
		Items []struct {
			Report map[string]json.RawMessage `json:"report"`
		} `json:"items"`
	}
	if err := json.Unmarshal(single.Body.Bytes(), &s); err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(batch.Body.Bytes(), &b); err != nil || len(b.Items) != 1 {
		t.Fatalf("%v: %.300s", err, batch.Body)
	}
	delete(s, "request_id")
	delete(s, "idempotency_key")
	got, _ := json.Marshal(b.Items[0].Report)
	want, _ := json.Marshal(s)
	if string(got) != string(want) {
		t.Errorf("batch item report differs from the single triage:\n%.400s\n%.400s", got, want)
	}
}

// TestBatchWholeBody: problems of the body as a whole fail the request
// before any sample is triaged.
func TestBatchWholeBody(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	one := limsCases[0].sample("S")
	cases := []struct {
		name, contentType, body, accept string
		status                          int
		typ                             string
	}{
		{"not json", "application/json", `{"samples":[`, "", 400, typeInvalidJSON},
		{"no samples field", "application/json", `{}`, "", 400, typeInvalidBatch},
		{"a single sample", "application/json", one, "", 400, typeInvalidJSON},
		{"samples not an array", "application/json", `{"samples":{}}`, "", 400, typeInvalidJSON},
		{"wrong media type", "text/plain", one, "", 415, "about:blank"},
		{"no media type", "", one, "", 415, "about:blank"},
		{"not acceptable", "application/json", `{"samples":[]}`, "application/xml", 406, "about:blank"},
		{"too many", "application/json", `{"samples":[` + strings.Repeat(`{},`, maxBatchSamples) + `{}]}`, "", 413, typeBatchTooLarge},
		{"too many lines", mimeNDJSON, strings.Repeat("{}\n", maxBatchSamples+1), "", 413, typeBatchTooLarge},
	}
	for _, c := range cases {
		rec := do(t, h, http.MethodPost, "/v1/triage/batch", c.contentType, c.body, "Accept", c.accept)
		var p problemBody
		if rec.Code != c.status || rec.Header().Get("Content-Type") != problemContentType ||
			json.Unmarshal(rec.Body.Bytes(), &p) != nil || p.Type != c.typ {
			t.Errorf("%s: %d %s %.200s, want %d %s", c.name, rec.Code, rec.Header().Get("Content-Type"), rec.Body, c.status, c.typ)
		}
	}
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", `{"samples":[]}`)
	if r := decodeBatch(t, rec.Body.Bytes()); rec.Code != 200 || r.Count != 0 || r.Items == nil {
		t.Errorf("empty batch: %d %s", rec.Code, rec.Body)
	}
}

// TestBatchUnknownField: an unknown member of one sample fails that sample,
// pointing at the member inside it.
func TestBatchUnknownField(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json",
		`{"samples":[`+limsCases[0].sample("A")+`,{"sample_id":"B","symptom":"settling","particle":{}}]}`)
	r := decodeBatch(t, rec.Body.Bytes())
	if len(r.Items) != 2 || r.Items[0].Status != 200 || r.Items[1].Status != 400 || r.Items[1].SampleID != "B" {
		t.Fatalf("%.400s", rec.Body)
	}
	f := r.Items[1].Problem.Errors
	if len(f) != 1 || f[0].Pointer != "/samples/1/particle" || f[0].Reason != "unknown field" {
		t.Errorf("errors %+v", f)
	}
}

// TestBatchNDJSON: one sample per line in, one item per line out, in order;
// blank lines are skipped and each item names its line.
func TestBatchNDJSON(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	lines := []string{
		strings.ReplaceAll(limsCases[0].sample("N-1"), "\n", " "),
		"",
		strings.ReplaceAll(limsCases[3].sample("N-2"), "\n", " "),
		"   ",
		strings.ReplaceAll(limsCases[1].sample("N-3"), "\n", " "),
	}
	body := strings.Join(lines, "\r\n") + "\n"
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON, body)
	if rec.Code != 200 || rec.Header().Get("Content-Type") != mimeNDJSON {
		t.Fatalf("%d %s: %.300s", rec.Code, rec.Header().Get("Content-Type"), rec.Body)
	}
	want := []struct {
		id           string
		line, status int
		pointer      string
	}{{"N-1", 1, 200, ""}, {"N-2", 3, 422, "/particles/volume_fraction"}, {"N-3", 5, 200, ""}}
	sc := bufio.NewScanner(rec.Body)
	sc.Buffer(nil, 1<<20)
	i := 0
	for ; sc.Scan() && !strings.HasPrefix(sc.Text(), `{"end":`); i++ {
		var it struct {
			Index    int          `json:"index"`
			Line     int          `json:"line"`
			SampleID string       `json:"sample_id"`
			Status   int          `json:"status"`
			Problem  *problemBody `json:"problem"`
		}
		if err := json.Unmarshal(sc.Bytes(), &it); err != nil || i >= len(want) {
			t.Fatalf("line %d: %v %.200s", i, err, sc.Bytes())
		}
		w := want[i]
		if it.Index != i || it.SampleID != w.id || it.Line != w.line || it.Status != w.status ||
			(w.pointer != "" && !hasPointer(it.Problem, w.pointer)) {
			t.Errorf("item %d: %+v, want %+v", i, it, w)
		}
	}
	if i != len(want) {
		t.Errorf("%d items, want %d", i, len(want))
	}
	if end := sc.Text(); end != `{"end":true,"count":3,"failed":1}` || sc.Scan() {
		t.Errorf("the end line %q is not the last line", end)
	}

	// Asked for JSON, an NDJSON batch answers with the JSON envelope.
	rec = do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON, body, "Accept", "application/json")
	if r := decodeBatch(t, rec.Body.Bytes()); r.Count != 3 || r.Failed != 1 || r.Items[2].Line != 5 {
		t.Errorf("JSON answer to NDJSON: %.300s", rec.Body)
	}
}

// TestBatchAcceptNDJSON: a JSON batch streams as NDJSON when asked, and
// q-values decide between offered types.
func TestBatchAcceptNDJSON(t *testing.T) {
	t.Parallel()
	cases := []struct{ accept, want string }{
		{"application/x-ndjson", mimeNDJSON},
		{"application/json;q=0.5, application/x-ndjson", mimeNDJSON},
		{"application/x-ndjson;q=0.2, application/json", "application/json"},
		{"*/*", "application/json"},
		{"text/csv;q=0, application/*", "application/json"},
	}
	h := testServer(t)
	body := `{"samples":[` + limsCases[0].sample("A") + `,` + limsCases[2].sample("B") + `]}`
	for _, c := range cases {
		rec := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", body, "Accept", c.accept)
		if got, _, _ := strings.Cut(rec.Header().Get("Content-Type"), ";"); rec.Code != 200 || got != c.want {
			t.Errorf("Accept %q: %d %s, want %s", c.accept, rec.Code, got, c.want)
		}
		if c.want == mimeNDJSON && strings.Count(rec.Body.String(), "\n") != 3 { // 2 items and the end line
			t.Errorf("Accept %q: %d lines", c.accept, strings.Count(rec.Body.String(), "\n"))
		}
	}
}

// TestBatchItemPanic: a panic while triaging one item becomes that item's
// 500 and leaves the others (and the process) alone.
func TestBatchItemPanic(t *testing.T) {
	t.Parallel()
	h := &handlers{validator: newSampleValidator(), metrics: newMetrics()} // no engine: Triage panics
	entries := []batchEntry{{raw: []byte(limsCases[0].sample("P0"))}, {raw: []byte(limsCases[2].sample("P1"))}}
	var items []batchItem
	err := h.triageAll(context.Background(), entries, csvPointer, func(it batchItem) error {
		items = append(items, it)
		return nil
	})
	if err != nil || len(items) != 2 {
		t.Fatal(err)
	}
	if it := items[0]; it.Status != 500 || it.Problem == nil || it.Problem.Type != typeInternal || it.SampleID != "P0" {
		t.Errorf("panicking item: %+v", it)
	}
	if items[1].Status != 400 {
		t.Errorf("other item: %+v", items[1])
	}
}

// TestBatchCancelled: a batch whose client has gone stops with 499.
func TestBatchCancelled(t *testing.T) {
	t.Parallel()
	h := &handlers{engine: testEngine(t), validator: newSampleValidator(), metrics: newMetrics()}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	entries := make([]batchEntry, 100)
	for i := range entries {
		entries[i] = batchEntry{raw: []byte(limsCases[0].sample("C"))}
	}
	err := h.triageAll(ctx, entries, csvPointer, func(batchItem) error { return nil })
	var he *echo.HTTPError
	if !errors.As(err, &he) || he.Code != statusClientClosedRequest {
		t.Errorf("error %v, want %d", err, statusClientClosedRequest)
	}
}

// BenchmarkBatch1000 times one batch of 1,000 mixed samples through the
// whole HTTP stack.
func BenchmarkBatch1000(b *testing.B) {
	h := New(testEngine(b), Config{OpenAPI: openapi.JSON})
	body := limsBatch(1000)
	b.ReportAllocs()
	b.SetBytes(int64(len(body)))
	for b.Loop() {
		rec := do(b, h, http.MethodPost, "/v1/triage/batch", "application/json", body)
		if rec.Code != http.StatusOK {
			b.Fatalf("status %d", rec.Code)
		}
	}
}
