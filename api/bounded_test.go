package api

import (
	"encoding/json"
	"net/http"
	"runtime"
	"strconv"
	"strings"
	"testing"
)

// allocated runs f and returns the bytes the heap allocated meanwhile. The
// tests that use it do not run in parallel, so that other tests' work is
// not counted.
func allocated(f func()) uint64 {
	var before, after runtime.MemStats
	runtime.GC()
	runtime.ReadMemStats(&before)
	f()
	runtime.ReadMemStats(&after)
	return after.TotalAlloc - before.TotalAlloc
}

// hostileBody is an 8 MB body made of one short piece repeated, the shapes
// that a hostile client sent: each split item or header column used to
// cost tens of bytes of memory and answer bytes.
func hostileBody(head, piece, tail string) string {
	return head + strings.Repeat(piece, 8<<20/len(piece)) + tail
}

// TestBoundedParsing: memory and answer size of a batch request follow the
// documented limits (5000 samples, the known CSV columns, 100 problems per
// answer), never the number of pieces the body splits into. The bounds
// are generous: about eight times the body for memory, 8 KiB for the answer.
func TestBoundedParsing(t *testing.T) {
	h := testServer(t)
	csvType := "text/csv; header=present; delimiter=\";\"; decimal=\",\""
	manyColumns := make([]string, 10000)
	for i := range manyColumns {
		manyColumns[i] = "col" + strconv.Itoa(i)
	}
	cases := []struct {
		name, contentType, body string
		status                  int
		typ                     string
	}{
		{"CSV header of 8 MB of delimiters", csvType, hostileBody("", ";", "\n"),
			http.StatusBadRequest, typeInvalidCSV},
		{"CSV header of 10,000 columns", csvType, strings.Join(manyColumns, ";") + "\n",
			http.StatusBadRequest, typeInvalidCSV},
		{"NDJSON of 8 MB of 1 lines", mimeNDJSON, hostileBody("", "1\n", ""),
			http.StatusRequestEntityTooLarge, typeBatchTooLarge},
		{"JSON batch of 8 MB of 1 items", "application/json", hostileBody(`{"samples":[1`, ",1", "]}"),
			http.StatusRequestEntityTooLarge, typeBatchTooLarge},
		{"CSV of 8 MB of empty-ish rows", csvType, "symptom\n" + hostileBody("", "x\n", ""),
			http.StatusRequestEntityTooLarge, typeBatchTooLarge},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			var status int
			var body []byte
			bytes := allocated(func() {
				rec := do(t, h, http.MethodPost, "/v1/triage/batch", tc.contentType, tc.body)
				status, body = rec.Code, rec.Body.Bytes()
			})
			if status != tc.status || !strings.Contains(string(body), `"type":"`+tc.typ+`"`) {
				t.Errorf("status %d, want %d %s: %.300s", status, tc.status, tc.typ, body)
			}
			if len(body) > 8<<10 {
				t.Errorf("the answer is %d bytes for one problem", len(body))
			}
			if limit := uint64(8 * len(tc.body)); bytes > limit {
				t.Errorf("the request allocated %d MB for a %d MB body", bytes>>20, len(tc.body)>>20)
			}
		})
	}
}

// TestBoundedCSVRow: a row of 8 MB of delimiters under a valid header fails
// alone, without splitting it into millions of fields.
func TestBoundedCSVRow(t *testing.T) {
	h := testServer(t)
	body := "sample_id;symptom\nok;settling\n" + hostileBody("bad", ";", "\n")
	var status int
	var out []byte
	bytes := allocated(func() {
		r := do(t, h, http.MethodPost, "/v1/triage/batch", "text/csv; delimiter=\";\"; decimal=\",\"", body)
		status, out = r.Code, r.Body.Bytes()
	})
	if status != http.StatusOK {
		t.Fatalf("status %d: %.300s", status, out)
	}
	r := decodeBatch(t, out)
	if r.Count != 2 || r.Items[1].Status != http.StatusBadRequest {
		t.Errorf("want the wide row to fail alone: %.400s", out)
	}
	if limit := uint64(8 * len(body)); bytes > limit {
		t.Errorf("the request allocated %d MB for a %d MB body", bytes>>20, len(body)>>20)
	}
}

// TestProblemsCapped: a problem lists at most maxProblems fields and says
// how many it left out.
func TestProblemsCapped(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	cols := make([]string, 300)
	for i := range cols {
		cols[i] = "unknown" + strconv.Itoa(i)
	}
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", "text/csv; delimiter=\",\"; decimal=\".\"", strings.Join(cols, ",")+"\n")
	var p struct {
		Detail string `json:"detail"`
		Errors []any  `json:"errors"`
	}
	if err := json.Unmarshal(rec.Body.Bytes(), &p); err != nil {
		t.Fatal(err)
	}
	if len(p.Errors) != 100 || !strings.Contains(p.Detail, "200 more") {
		t.Errorf("%d problems listed, detail %q", len(p.Errors), p.Detail)
	}
}

// TestEchoedStringsClipped: user text echoed in an answer (a failed item's
// sample_id, an unknown column or member, a cell) is cut to a few hundred
// bytes.
func TestEchoedStringsClipped(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	long := strings.Repeat("x", 1<<20)
	cases := []struct {
		name, contentType, body string
	}{
		{"sample_id of a failed JSON item", "application/json",
			`{"samples":[{"sample_id":"` + long + `","symptom":"settling"}]}`},
		{"sample_id of a failed NDJSON item", mimeNDJSON, `{"sample_id":"` + long + `","symptom":"nope"}`},
		{"unknown member", "application/json", `{"samples":[{"` + long + `":1}]}`},
		{"unknown CSV column", "text/csv; delimiter=\",\"; decimal=\".\"", long + "\n"},
		{"CSV cell", "text/csv; delimiter=\",\"; decimal=\".\"", "particles.diameter_nm\n" + long + "\n"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			rec := do(t, h, http.MethodPost, "/v1/triage/batch", tc.contentType, tc.body)
			if rec.Body.Len() > 8<<10 {
				t.Errorf("status %d, %d bytes back: %.300s", rec.Code, rec.Body.Len(), rec.Body)
			}
		})
	}
}
