package api

import (
	"net/http"
	"net/http/httptest"
	"strings"
	"sync"
	"testing"
	"time"

	"colloidtriage/openapi"
)

// TestIdempotencyReplay: a retry with the same key and request gets the
// first answer, byte for byte, with the first request id and a header
// saying it is a replay, on every POST route and answer format.
func TestIdempotencyReplay(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	one := demo(t, "gravity_settling.json")
	ndjson := compactJSON(t, one) + "\n"
	cases := []struct{ name, path, contentType, body, accept, wantType string }{
		{"triage", "/v1/triage", "application/json", one, "", "application/json"},
		{"scales", "/v1/scales", "application/json", one, "", "application/json"},
		{"profile", "/v1/interaction-profile", "application/json", one, "", "application/json"},
		{"batch JSON", "/v1/triage/batch", "application/json", `{"samples":[` + one + `]}`, "", "application/json"},
		{"batch NDJSON", "/v1/triage/batch", mimeNDJSON, ndjson, "", mimeNDJSON},
		{"batch CSV", "/v1/triage/batch", mimeNDJSON, ndjson, "text/csv", "text/csv"},
	}
	for _, c := range cases {
		key := "key-" + c.name
		first := do(t, h, http.MethodPost, c.path, c.contentType, c.body, "Idempotency-Key", key, "Accept", c.accept)
		again := do(t, h, http.MethodPost, c.path, c.contentType, c.body, "Idempotency-Key", key, "Accept", c.accept)
		if first.Code != 200 || again.Code != 200 || !strings.HasPrefix(again.Header().Get("Content-Type"), c.wantType) {
			t.Errorf("%s: %d then %d %s: %.200s", c.name, first.Code, again.Code, again.Header().Get("Content-Type"), again.Body)
			continue
		}
		if first.Header().Get("Idempotency-Key") != key || again.Header().Get("Idempotency-Key") != key {
			t.Errorf("%s: key not echoed: %q %q", c.name, first.Header().Get("Idempotency-Key"), again.Header().Get("Idempotency-Key"))
		}
		if first.Header().Get(replayedHeader) != "" || again.Header().Get(replayedHeader) != "true" {
			t.Errorf("%s: replay header %q then %q", c.name, first.Header().Get(replayedHeader), again.Header().Get(replayedHeader))
		}
		if again.Header().Get("X-Request-Id") != first.Header().Get("X-Request-Id") || again.Body.String() != first.Body.String() {
			t.Errorf("%s: the replay differs from the first answer", c.name)
		}
		if c.path == "/v1/scales" && !strings.Contains(first.Body.String(), `"idempotency_key":"`+key+`"`) {
			t.Errorf("scales: key not in the body")
		}
	}
}

// TestIdempotencyConflicts: the same key with another request is a 422;
// while the first request runs, a second with its key is a 409; an
// invalid key is a 400; keys of different clients never meet.
func TestIdempotencyConflicts(t *testing.T) {
	t.Parallel()
	h := New(testEngine(t), Config{OpenAPI: openapi.JSON, APIKeys: []string{"alice", "bob"}})
	one, two := demo(t, "gravity_settling.json"), demo(t, "dense_cake.json")
	auth := func(who string) []string { return []string{"Idempotency-Key", "k1", "X-API-Key", who} }
	if rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", one, auth("alice")...); rec.Code != 200 {
		t.Fatalf("%d %s", rec.Code, rec.Body)
	}
	rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", two, auth("alice")...)
	if rec.Code != 422 || !strings.Contains(rec.Body.String(), typeIdempotency) {
		t.Errorf("same key, other body: %d %s", rec.Code, rec.Body)
	}
	rec = do(t, h, http.MethodPost, "/v1/triage", "application/json", two, auth("bob")...)
	if rec.Code != 200 || rec.Header().Get(replayedHeader) != "" {
		t.Errorf("another client's key: %d %s", rec.Code, rec.Header())
	}
	rec = do(t, h, http.MethodPost, "/v1/triage", "application/json", one, "Idempotency-Key", "bad\x01key", "X-API-Key", "alice")
	if rec.Code != 400 || !strings.Contains(rec.Body.String(), typeIdempotency) {
		t.Errorf("invalid key: %d %s", rec.Code, rec.Body)
	}

	// Eight at once with one key while the first is held in its handler:
	// one runs, the others get 409 with Retry-After.
	blocked := &blockingWriter{ResponseRecorder: httptest.NewRecorder(), started: make(chan struct{}), release: make(chan struct{})}
	done := make(chan struct{})
	go func() {
		req := httptest.NewRequest(http.MethodPost, "/v1/triage/batch", strings.NewReader(compactJSON(t, one)+"\n"))
		req.Header.Set("Content-Type", mimeNDJSON)
		req.Header.Set("Idempotency-Key", "k2")
		req.Header.Set("X-API-Key", "alice")
		h.ServeHTTP(blocked, req)
		close(done)
	}()
	<-blocked.started
	var wg sync.WaitGroup
	codes := make([]int, 7)
	for i := range codes {
		wg.Go(func() {
			rec := do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON, compactJSON(t, one)+"\n",
				"Idempotency-Key", "k2", "X-API-Key", "alice")
			codes[i] = rec.Code
			if rec.Code == 409 && rec.Header().Get("Retry-After") == "" {
				t.Errorf("409 without Retry-After")
			}
		})
	}
	wg.Wait()
	close(blocked.release)
	<-done
	for _, code := range codes {
		if code != 409 {
			t.Errorf("concurrent requests with one key: %v", codes)
			break
		}
	}
	rec = do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON, compactJSON(t, one)+"\n",
		"Idempotency-Key", "k2", "X-API-Key", "alice")
	if rec.Code != 200 || rec.Header().Get(replayedHeader) != "true" || rec.Body.String() != blocked.Body.String() {
		t.Errorf("after the first finished: %d %q", rec.Code, rec.Header().Get(replayedHeader))
	}
}

// blockingWriter holds the first write until released.
type blockingWriter struct {
	*httptest.ResponseRecorder
	once    sync.Once
	started chan struct{}
	release chan struct{}
}

func (w *blockingWriter) Write(p []byte) (int, error) {
	w.once.Do(func() {
		close(w.started)
		<-w.release
	})
	return w.ResponseRecorder.Write(p)
}

// TestMemoryStoreBounds: the memory store keeps at most MaxEntries keys
// and MaxBytes bytes, oldest out first, forgets keys after TTL and keeps
// the answers over MaxAnswer without their bodies.
func TestMemoryStoreBounds(t *testing.T) {
	t.Parallel()
	now := time.Date(2026, 12, 5, 0, 0, 0, 0, time.UTC)
	s := NewMemoryStore(MemoryStoreConfig{MaxEntries: 3, MaxBytes: 4 * entryOverhead, MaxAnswer: 100, TTL: time.Hour}).(*memoryStore)
	s.now = func() time.Time { return now }
	fp := Fingerprint{1}
	put := func(key string, body []byte) {
		if a, err := s.Claim(key, fp); a != nil || err != nil {
			t.Fatalf("claim %s: %v %v", key, a, err)
		}
		s.Complete(key, StoredAnswer{Status: 200, Body: body})
	}
	for _, k := range []string{"a", "b", "c", "d"} {
		put(k, []byte("x"))
	}
	if _, ok := s.byKey["a"]; ok || len(s.byKey) != 3 {
		t.Errorf("entries %d, oldest kept: %v", len(s.byKey), ok)
	}
	put("big", make([]byte, 101))
	if a, _ := s.Claim("big", fp); a == nil || a.Body != nil {
		t.Errorf("an answer over MaxAnswer: %+v", a)
	}
	put("e", make([]byte, 2*entryOverhead))
	if s.bytes > 4*entryOverhead {
		t.Errorf("%d bytes kept", s.bytes)
	}
	now = now.Add(time.Hour)
	if a, err := s.Claim("e", fp); a != nil || err != nil || len(s.byKey) != 1 {
		t.Errorf("after the TTL: %v %v, %d keys", a, err, len(s.byKey))
	}
}

// TestBatchesBounded: past MaxBatches batches at once, a batch is refused
// with 503, Retry-After and a problem; single samples still pass.
func TestBatchesBounded(t *testing.T) {
	t.Parallel()
	h := New(testEngine(t), Config{OpenAPI: openapi.JSON, MaxBatches: 1})
	one := demo(t, "gravity_settling.json")
	blocked := &blockingWriter{ResponseRecorder: httptest.NewRecorder(), started: make(chan struct{}), release: make(chan struct{})}
	done := make(chan struct{})
	go func() {
		req := httptest.NewRequest(http.MethodPost, "/v1/triage/batch", strings.NewReader(compactJSON(t, one)+"\n"))
		req.Header.Set("Content-Type", mimeNDJSON)
		h.ServeHTTP(blocked, req)
		close(done)
	}()
	<-blocked.started
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON, compactJSON(t, one)+"\n")
	if rec.Code != 503 || rec.Header().Get("Retry-After") == "" || !strings.Contains(rec.Body.String(), typeBusy) {
		t.Errorf("a second batch: %d %q %.200s", rec.Code, rec.Header().Get("Retry-After"), rec.Body)
	}
	if rec := do(t, h, http.MethodPost, "/v1/triage", "application/json", one); rec.Code != 200 {
		t.Errorf("a single sample meanwhile: %d", rec.Code)
	}
	close(blocked.release)
	<-done
	if rec := do(t, h, http.MethodPost, "/v1/triage/batch", mimeNDJSON, compactJSON(t, one)+"\n"); rec.Code != 200 {
		t.Errorf("a batch afterwards: %d", rec.Code)
	}
}
