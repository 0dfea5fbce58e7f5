package api

import (
	"net/http"
	"strings"
	"testing"
)

// TestPage: the workbench and its assets are served with their types and a
// policy that allows nothing from another origin, with no API key needed;
// the page names only its own assets.
func TestPage(t *testing.T) {
	t.Parallel()
	h := New(testEngine(t), Config{APIKeys: []string{"k-1"}})
	cases := []struct{ path, ctype, holds string }{
		{"/", "text/html", `<script src="/web/app.js"`},
		{"/web/style.css", "text/css", "@media print"},
		{"/web/app.js", "javascript", "/v1/triage"},
	}
	for _, tc := range cases {
		rec := do(t, h, http.MethodGet, tc.path, "", "")
		if rec.Code != http.StatusOK {
			t.Fatalf("GET %s: status %d", tc.path, rec.Code)
		}
		if ct := rec.Header().Get("Content-Type"); !strings.Contains(ct, tc.ctype) {
			t.Errorf("GET %s: content type %q, want %s", tc.path, ct, tc.ctype)
		}
		if csp := rec.Header().Get("Content-Security-Policy"); !strings.Contains(csp, "default-src 'none'") {
			t.Errorf("GET %s: policy %q", tc.path, csp)
		}
		body := rec.Body.String()
		if !strings.Contains(body, tc.holds) {
			t.Errorf("GET %s lacks %q", tc.path, tc.holds)
		}
		if strings.Contains(body, "http://") || strings.Contains(body, "https://") {
			t.Errorf("GET %s names another origin", tc.path)
		}
	}
	if rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", "{}"); rec.Code != http.StatusUnauthorized {
		t.Errorf("the API without a key: status %d, want 401", rec.Code)
	}
}
