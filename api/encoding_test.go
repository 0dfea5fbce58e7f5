package api

import (
	"io"
	"net/http"
	"net/http/httptest"
	"os"
	"strings"
	"testing"
)

// TestEncodingSameEverywhere: a UTF-8 byte-order mark is dropped on every
// route that reads a body, and a charset other than UTF-8 is a 415 on all
// of them.
func TestEncodingSameEverywhere(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	one := demo(t, "gravity_settling.json")
	bodies := map[string]string{"/v1/triage": one, "/v1/scales": one, "/v1/interaction-profile": one,
		"/v1/triage/batch": `{"samples":[` + one + `]}`}
	for path, body := range bodies {
		if rec := do(t, h, http.MethodPost, path, "application/json", "\xef\xbb\xbf"+body); rec.Code != 200 {
			t.Errorf("%s with a BOM: %d %.200s", path, rec.Code, rec.Body)
		}
		for _, ct := range []string{"application/json; charset=iso-8859-1", "application/json; charset=utf-16"} {
			if rec := do(t, h, http.MethodPost, path, ct, body); rec.Code != 415 {
				t.Errorf("%s as %s: %d", path, ct, rec.Code)
			}
		}
		if rec := do(t, h, http.MethodPost, path, "application/json; charset=UTF-8", body); rec.Code != 200 {
			t.Errorf("%s as UTF-8: %d", path, rec.Code)
		}
	}
	if rec := do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON+"; charset=latin1", compactJSON(t, one)); rec.Code != 415 {
		t.Errorf("NDJSON in Latin-1: %d", rec.Code)
	}
}

// TestSampleIDControlCharacters: a sample_id holding NUL or another control
// character is refused with its pointer.
func TestSampleIDControlCharacters(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for _, id := range []string{`A\u0000B`, `A\u0007`, `line\nbreak`, `del\u007f`, `c1\u0085`} {
		body := strings.Replace(demo(t, "gravity_settling.json"), `"DEMO-GS-001"`, `"`+id+`"`, 1)
		rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", body)
		if rec.Code != 422 || !strings.Contains(rec.Body.String(), `"pointer":"/sample_id"`) {
			t.Errorf("%s: %d %.300s", id, rec.Code, rec.Body)
		}
		rec = do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", `{"samples":[`+body+`]}`)
		if !strings.Contains(rec.Body.String(), `"pointer":"/samples/0/sample_id"`) {
			t.Errorf("batch %s: %.300s", id, rec.Body)
		}
	}
}

// slowBody fails as a body read past the server's read deadline does.
type slowBody struct{}

func (slowBody) Read([]byte) (int, error) { return 0, os.ErrDeadlineExceeded }

// TestSlowBody: a body that does not arrive within the read timeout is a
// 408, on the single and the batch routes.
func TestSlowBody(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for _, path := range []string{"/v1/triage", "/v1/triage/batch"} {
		req := httptest.NewRequest(http.MethodPost, path, io.MultiReader(strings.NewReader("{"), slowBody{}))
		req.Header.Set("Content-Type", "application/json")
		rec := httptest.NewRecorder()
		h.ServeHTTP(rec, req)
		if rec.Code != http.StatusRequestTimeout {
			t.Errorf("%s: %d %.200s", path, rec.Code, rec.Body)
		}
	}
}
