package api

import (
	"bytes"
	"container/list"
	"crypto/sha256"
	"errors"
	"net/http"
	"strings"
	"sync"
	"time"

	"github.com/labstack/echo/v4"
)

// Idempotency-Key, after the IETF httpapi working group's draft "The
// Idempotency-Key HTTP Header Field" (draft-ietf-httpapi-idempotency-key-header):
// the first answer to a POST that carries a key is kept and replayed to
// every retry with the same key and the same request; the same key with a
// different request is a 422, and a retry while the first request is
// still running a 409.
const (
	idempotencyKeyHeader = "Idempotency-Key"
	// replayedHeader marks an answer replayed from the store.
	replayedHeader = "Idempotent-Replayed"
	// maxIdempotencyKey is the longest key accepted; keys are printable ASCII.
	maxIdempotencyKey = 255
)

// Errors of IdempotencyStore.Claim.
var (
	// ErrKeyReused: the key was first used with another request.
	ErrKeyReused = errors.New("idempotency key used with another request")
	// ErrKeyInFlight: the first request with the key is still running.
	ErrKeyInFlight = errors.New("idempotency key in use by a running request")
)

// Fingerprint identifies a request for an Idempotency-Key: the SHA-256 of
// its method, path and query, Content-Type, Accept and body.
type Fingerprint [sha256.Size]byte

// StoredAnswer is the first answer to a key. Body is nil when the answer
// was too large to keep: a replay then computes it again under the
// original request id, which gives the same bytes since answers are
// deterministic.
type StoredAnswer struct {
	Status      int
	ContentType string
	RequestID   string
	Body        []byte
}

// IdempotencyStore keeps the first answer to each Idempotency-Key. The
// service holds one in memory (NewMemoryStore); behind a load balancer
// each replica has its own, so a retry that lands on another replica is
// computed again there, which is safe because the service changes nothing
// and gives the same answer to the same request: only its request id
// differs, and a concurrent retry on another replica is not refused with
// 409. A store shared by the replicas (a database, say) implements this
// interface to make replays and conflicts exact across them.
type IdempotencyStore interface {
	// Claim reserves key for a request of fingerprint fp. It returns the
	// stored answer to replay; or nil, nil when the caller is to compute the
	// answer and then call Complete or Release; or ErrKeyReused or
	// ErrKeyInFlight.
	Claim(key string, fp Fingerprint) (*StoredAnswer, error)
	// Complete stores the answer to a claimed key.
	Complete(key string, a StoredAnswer)
	// Release gives up a claim without an answer (the request failed), so
	// that a retry computes it again.
	Release(key string)
}

// MemoryStoreConfig bounds a memory store.
type MemoryStoreConfig struct {
	MaxEntries int           // keys kept at most; the oldest go first
	MaxBytes   int           // bytes of keys and answers kept at most
	MaxAnswer  int           // the largest answer kept with its body
	TTL        time.Duration // how long a key is kept
}

// DefaultMemoryStoreConfig keeps keys for 24 hours: 10,000 keys and 32 MB
// at most, answers of up to 1 MB with their bodies.
var DefaultMemoryStoreConfig = MemoryStoreConfig{MaxEntries: 10000, MaxBytes: 32 << 20, MaxAnswer: 1 << 20, TTL: 24 * time.Hour}

// entryOverhead is the bytes counted for an entry besides its key and body.
const entryOverhead = 256

type memoryEntry struct {
	key     string
	fp      Fingerprint
	running bool
	answer  StoredAnswer
	expires time.Time
	size    int
}

type memoryStore struct {
	cfg   MemoryStoreConfig
	now   func() time.Time
	mu    sync.Mutex
	byKey map[string]*list.Element
	order *list.List // of *memoryEntry, oldest first
	bytes int
}

// NewMemoryStore is an IdempotencyStore in this process's memory, bounded
// by cfg.
func NewMemoryStore(cfg MemoryStoreConfig) IdempotencyStore {
	return &memoryStore{cfg: cfg, now: time.Now, byKey: map[string]*list.Element{}, order: list.New()}
}

func (s *memoryStore) Claim(key string, fp Fingerprint) (*StoredAnswer, error) {
	s.mu.Lock()
	defer s.mu.Unlock()
	now := s.now()
	s.expire(now)
	if el, ok := s.byKey[key]; ok {
		e := el.Value.(*memoryEntry)
		switch {
		case e.fp != fp:
			return nil, ErrKeyReused
		case e.running:
			return nil, ErrKeyInFlight
		}
		a := e.answer
		return &a, nil
	}
	e := &memoryEntry{key: key, fp: fp, running: true, expires: now.Add(s.cfg.TTL), size: len(key) + entryOverhead}
	s.byKey[key] = s.order.PushBack(e)
	s.bytes += e.size
	s.shrink()
	return nil, nil
}

func (s *memoryStore) Complete(key string, a StoredAnswer) {
	s.mu.Lock()
	defer s.mu.Unlock()
	el, ok := s.byKey[key]
	if !ok {
		return // evicted meanwhile
	}
	e := el.Value.(*memoryEntry)
	if len(a.Body) > s.cfg.MaxAnswer {
		a.Body = nil
	}
	a.Body = bytes.Clone(a.Body)
	e.running, e.answer = false, a
	s.bytes += len(a.Body)
	e.size += len(a.Body)
	s.shrink()
}

func (s *memoryStore) Release(key string) {
	s.mu.Lock()
	defer s.mu.Unlock()
	if el, ok := s.byKey[key]; ok {
		s.remove(el)
	}
}

// expire drops the entries past their time; they are in order of expiry.
func (s *memoryStore) expire(now time.Time) {
	for el := s.order.Front(); el != nil && !now.Before(el.Value.(*memoryEntry).expires); el = s.order.Front() {
		s.remove(el)
	}
}

// shrink drops the oldest entries until the store is within its bounds.
func (s *memoryStore) shrink() {
	for s.order.Len() > 0 && (s.order.Len() > s.cfg.MaxEntries || s.bytes > s.cfg.MaxBytes) {
		s.remove(s.order.Front())
	}
}

func (s *memoryStore) remove(el *list.Element) {
	e := s.order.Remove(el).(*memoryEntry)
	delete(s.byKey, e.key)
	s.bytes -= e.size
}

// bodyKey holds the request body once the idempotency middleware has read
// it, so that the handler does not read it again.
const bodyKey = "request_body"

// idempotent applies Idempotency-Key to a POST route whose unreadable body
// is a problem of kind unreadable. Without the header it does nothing;
// with it, it echoes the key in the answer's header and replays, refuses
// or records as the draft asks. Keys are scoped by the credentials the
// request presents, so that one client never gets another's answer.
func idempotent(store IdempotencyStore, unreadable kind) echo.MiddlewareFunc {
	return func(next echo.HandlerFunc) echo.HandlerFunc {
		return func(c echo.Context) error {
			key := c.Request().Header.Get(idempotencyKeyHeader)
			if key == "" {
				return next(c)
			}
			if !validIdempotencyKey(key) {
				return fail(idempotencyKeyInvalid,
					"the Idempotency-Key must be 1 to 255 printable ASCII characters")
			}
			c.Response().Header().Set(idempotencyKeyHeader, key)
			body, err := readBody(c, unreadable)
			if err != nil {
				return err
			}
			c.Set(bodyKey, body)
			scoped := scopeKey(c.Request().Header, key)
			replay, err := store.Claim(scoped, fingerprint(c.Request(), body))
			switch {
			case errors.Is(err, ErrKeyReused):
				return fail(idempotencyKeyReused,
					"this Idempotency-Key was first sent with another request; use a new key for a new request")
			case errors.Is(err, ErrKeyInFlight):
				c.Response().Header().Set(echo.HeaderRetryAfter, "1")
				return fail(idempotencyKeyInFlight,
					"the first request with this Idempotency-Key is still running; retry when it is done")
			case err != nil:
				return err
			case replay != nil:
				c.Response().Header().Set(replayedHeader, "true")
				c.Response().Header().Set(echo.HeaderXRequestID, replay.RequestID)
				if replay.Body != nil {
					return c.Blob(replay.Status, replay.ContentType, replay.Body)
				}
				return next(c)
			}
			return record(c, next, store, scoped)
		}
	}
}

// record runs the handler, keeping a copy of its answer, and stores the
// answer when it is a success; any failure releases the key.
func record(c echo.Context, next echo.HandlerFunc, store IdempotencyStore, key string) error {
	res := c.Response()
	tee := &teeWriter{ResponseWriter: res.Writer, limit: DefaultMemoryStoreConfig.MaxAnswer}
	res.Writer = tee
	err := next(c)
	res.Writer = tee.ResponseWriter
	if err != nil || res.Status < 200 || res.Status > 299 {
		store.Release(key)
		return err
	}
	a := StoredAnswer{Status: res.Status, ContentType: res.Header().Get(echo.HeaderContentType),
		RequestID: res.Header().Get(echo.HeaderXRequestID)}
	if !tee.over {
		a.Body = tee.buf.Bytes()
	}
	store.Complete(key, a)
	return nil
}

// teeWriter copies what is written, up to limit bytes (past it the copy
// is dropped), and passes everything on.
type teeWriter struct {
	http.ResponseWriter
	buf   bytes.Buffer
	limit int
	over  bool
}

func (w *teeWriter) Write(p []byte) (int, error) {
	if !w.over {
		if w.buf.Len()+len(p) > w.limit {
			w.over, w.buf = true, bytes.Buffer{}
		} else {
			w.buf.Write(p)
		}
	}
	return w.ResponseWriter.Write(p)
}

// Unwrap lets http.ResponseController reach the connection (to flush).
func (w *teeWriter) Unwrap() http.ResponseWriter { return w.ResponseWriter }

func validIdempotencyKey(key string) bool {
	if len(key) > maxIdempotencyKey {
		return false
	}
	for i := 0; i < len(key); i++ {
		if key[i] < 0x20 || key[i] > 0x7e {
			return false
		}
	}
	return true
}

// scopeKey prefixes key with a digest of the credentials presented.
func scopeKey(h http.Header, key string) string {
	d := sha256.Sum256([]byte(strings.Join(presentedKeys(h), "\n")))
	return string(d[:]) + key
}

func fingerprint(r *http.Request, body []byte) Fingerprint {
	h := sha256.New()
	for _, part := range []string{r.Method, r.URL.RequestURI(), r.Header.Get(echo.HeaderContentType), r.Header.Get(echo.HeaderAccept)} {
		h.Write([]byte(part))
		h.Write([]byte{0})
	}
	h.Write(body)
	var fp Fingerprint
	h.Sum(fp[:0])
	return fp
}
