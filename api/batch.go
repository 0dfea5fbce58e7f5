package api

import (
	"bufio"
	"bytes"
	"context"
	"encoding/json"
	"fmt"
	"mime"
	"net/http"
	"runtime"
	"runtime/debug"
	"strconv"
	"strings"
	"sync"
	"sync/atomic"
	"time"

	"github.com/labstack/echo/v4"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
)

// batchBodyLimit is the body limit of the batch route, 64,000,000 bytes:
// maxBatchSamples samples of a few kilobytes each, with room to spare.
const batchBodyLimit = "64M"

// maxBatchSamples is the most samples one batch may hold, in any of its
// formats. A larger batch is refused whole with 413 before any sample is
// triaged, so that a client never mistakes a partial answer for a full one.
const maxBatchSamples = 5000

// Media types of the batch route besides JSON.
const (
	mimeNDJSON = "application/x-ndjson"
	mimeCSV    = "text/csv"
)

// maxSampleID is the longest sample_id (validate max=128) an item echoes;
// a longer one is clipped.
const maxSampleID = 128

// statusClientClosedRequest records a batch abandoned because the client
// went away (the status nginx logs for the same event); no client sees it.
const statusClientClosedRequest = 499

// batchEntry is one sample of a batch as sent: its JSON form, or the problem
// that kept it from having one (a CSV cell that does not parse).
type batchEntry struct {
	raw      []byte
	sampleID string
	line     int
	err      error
}

// pointerBase turns a JSON pointer inside sample index into a pointer into
// the request body as the client sent it.
type pointerBase func(index int, pointer string) string

// batchItem is the result for one sample: a report or a problem, never both.
// Index is the sample's 0-based position in the batch and Line, for NDJSON
// and CSV, the line of the body where it starts.
type batchItem struct {
	Index    int             `json:"index"`
	Line     int             `json:"line,omitempty"`
	SampleID string          `json:"sample_id,omitempty"`
	Status   int             `json:"status"`
	Report   *advisor.Report `json:"report,omitempty"`
	Problem  *Problem        `json:"problem,omitempty"`
}

// batchTail is what the JSON answer holds after its items.
type batchTail struct {
	Count          int    `json:"count"`
	Failed         int    `json:"failed"`
	RequestID      string `json:"request_id"`
	IdempotencyKey string `json:"idempotency_key,omitempty"`
}

// batch triages many samples in one request, at most cap(h.batches) at
// once (the body is not read for a batch refused as busy). The body is JSON
// ({"samples": [...]}), NDJSON (one sample per line) or CSV (see csv.go);
// the answer is JSON, NDJSON or CSV as the Accept header asks, by default
// NDJSON for NDJSON and JSON otherwise. Items keep the input order and each
// carries its own status: one bad sample never fails the others. Problems
// that concern the body as a whole (not parseable, too many samples, a bad
// CSV header) fail the request before any sample is triaged.
func (h *handlers) batch(c echo.Context) error {
	select {
	case h.batches <- struct{}{}:
		defer h.batchDone()
	default:
		c.Response().Header().Set(echo.HeaderRetryAfter, "5")
		return fail(batchesBusy, fmt.Sprintf("%d batches are running, the most at once; retry after the Retry-After seconds", cap(h.batches)))
	}
	mt, params, err := mime.ParseMediaType(c.Request().Header.Get(echo.HeaderContentType))
	if err != nil || (mt != echo.MIMEApplicationJSON && mt != mimeNDJSON && mt != mimeCSV) {
		return fail(mediaUnsupported,
			"send the batch as application/json, application/x-ndjson or text/csv")
	}
	var inDialect *csvDialect
	if mt != mimeCSV {
		if err := requireUTF8(params); err != nil {
			return err
		}
	} else {
		d, err := csvDialectOf(params, nil)
		if err != nil {
			return err
		}
		inDialect = &d
	}
	out, err := negotiateBatch(c.Request().Header.Get(echo.HeaderAccept), mt, inDialect)
	if err != nil {
		return err
	}
	body, err := readBody(c, batchUnreadable)
	if err != nil {
		return err
	}
	entries, base, err := splitBatch(mt, body, inDialect)
	if err != nil {
		return err
	}
	switch out.mediaType {
	case mimeNDJSON:
		return h.streamNDJSON(c, entries, base)
	case mimeCSV:
		rows := make([][]string, 0, len(entries))
		progress := h.keepWriting(c)
		err := h.triageAll(c.Request().Context(), entries, base, func(it batchItem) error {
			progress()
			rows = append(rows, csvRow(it, out.dialect))
			return nil
		})
		if err != nil {
			return err
		}
		return writeCSV(c, rows, out.dialect)
	}
	return h.streamJSON(c, entries, base)
}

// streamJSON answers with the JSON envelope, writing each item as soon as it
// and all before it are triaged and keeping none: items first, then count,
// failed, request_id and idempotency_key. The status (200) is sent with
// the first bytes; a client that goes away ends the answer unfinished.
func (h *handlers) streamJSON(c echo.Context, entries []batchEntry, base pointerBase) error {
	res := c.Response()
	res.Header().Set(echo.HeaderContentType, echo.MIMEApplicationJSON)
	res.WriteHeader(http.StatusOK)
	w := bufio.NewWriterSize(res, 64<<10)
	_, _ = w.WriteString(`{"items":[`)
	failed := 0
	progress := h.keepWriting(c)
	err := h.triageAll(c.Request().Context(), entries, base, func(it batchItem) error {
		progress()
		if it.Index > 0 {
			_ = w.WriteByte(',')
		}
		if it.Status != http.StatusOK {
			failed++
		}
		_, err := w.Write(itemJSON(it, base))
		return err
	})
	if err != nil {
		return err
	}
	tail, _ := marshalPlain(batchTail{Count: len(entries), Failed: failed, // strings and integers always encode
		RequestID:      res.Header().Get(echo.HeaderXRequestID),
		IdempotencyKey: c.Request().Header.Get(idempotencyKeyHeader)})
	_, _ = w.WriteString("],")
	_, _ = w.Write(tail[1:])
	_ = w.WriteByte('\n')
	if err := w.Flush(); err != nil {
		return echo.NewHTTPError(statusClientClosedRequest).SetInternal(err)
	}
	return nil
}

// keepWriting returns what a batch answer calls for each item: it moves the
// connection's write deadline to batchWindow from now, so that a batch
// longer than the server's write timeout is not cut while items keep
// coming, and a client that stops reading is still cut off a window after
// the last item. Where the writer has no deadline (a test recorder) it
// does nothing.
func (h *handlers) keepWriting(c echo.Context) func() {
	rc := http.NewResponseController(c.Response())
	return func() { _ = rc.SetWriteDeadline(time.Now().Add(h.batchWindow)) }
}

// itemJSON encodes one item; an item that does not encode becomes its 500.
func itemJSON(it batchItem, base pointerBase) []byte {
	b, err := marshalPlain(it)
	if err != nil {
		b, _ = marshalPlain(failedItem(batchItem{Index: it.Index, Line: it.Line, SampleID: it.SampleID}, err, it.Index, base))
	}
	return b
}

// batchDone ends a batch. The last batch running hands the memory of
// bodies and items back to the system at once (a forced collection of a
// heap that is then small), rather than keeping it until the runtime's
// scavenger gets to it minutes later.
func (h *handlers) batchDone() {
	<-h.batches
	if len(h.batches) == 0 {
		go debug.FreeOSMemory()
	}
}

// splitBatch splits a body of media type mt into its samples, with the
// base that makes their problems' pointers relative to the body.
func splitBatch(mt string, body []byte, d *csvDialect) ([]batchEntry, pointerBase, error) {
	switch mt {
	case mimeNDJSON:
		entries, err := ndjsonEntries(body)
		return entries, func(_ int, ptr string) string { return ptr }, err
	case mimeCSV:
		entries, err := csvEntries(body, *d)
		return entries, csvPointer, err
	}
	entries, err := jsonEntries(body)
	return entries, func(i int, ptr string) string { return "/samples/" + strconv.Itoa(i) + ptr }, err
}

// triageAll triages every entry with a pool of GOMAXPROCS workers and
// hands each item to emit in input order, as soon as that item and all
// before it are done; an item is dropped once emitted, and its entry once
// triaged, so that memory holds only the items waiting for their turn.
// triageAll stops early when ctx ends or emit fails.
func (h *handlers) triageAll(ctx context.Context, entries []batchEntry, base pointerBase, emit func(batchItem) error) error {
	n := len(entries)
	items := make([]batchItem, n)
	done := make([]chan struct{}, n)
	for i := range done {
		done[i] = make(chan struct{})
	}
	ctx, cancel := context.WithCancel(ctx)
	var wg sync.WaitGroup
	defer func() {
		cancel()
		wg.Wait()
	}()
	var next atomic.Int64
	for range min(runtime.GOMAXPROCS(0), n) {
		wg.Go(func() {
			for ctx.Err() == nil {
				i := int(next.Add(1) - 1)
				if i >= n {
					return
				}
				items[i] = h.triageEntry(i, entries[i], base)
				entries[i] = batchEntry{}
				close(done[i])
			}
		})
	}
	for i := range n {
		select {
		case <-done[i]:
		case <-ctx.Done():
			return echo.NewHTTPError(statusClientClosedRequest).SetInternal(ctx.Err())
		}
		err := emit(items[i])
		items[i] = batchItem{}
		if err != nil {
			return err
		}
	}
	return nil
}

// triageEntry decodes, validates and triages one sample by the same strict
// path as POST /v1/triage, and counts the outcome. A panic becomes this
// item's 500 and leaves the other items alone.
func (h *handlers) triageEntry(i int, e batchEntry, base pointerBase) (item batchItem) {
	item = batchItem{Index: i, Line: e.line, SampleID: e.sampleID}
	defer func() {
		if r := recover(); r != nil {
			err := fmt.Errorf("panic: %v", r)
			h.log.Error().Err(err).Int("item", i).Msg("batch item failed")
			item = failedItem(item, err, i, base)
		}
		h.metrics.countItem(item.Status)
	}()
	if e.err != nil {
		return failedItem(item, e.err, i, base)
	}
	var s input.Sample
	err := notAnObject(e.raw)
	if err == nil {
		err = unmarshalStrict(e.raw, &s)
	}
	if err != nil {
		if item.SampleID == "" {
			item.SampleID = lenientSampleID(e.raw)
		}
		return failedItem(item, err, i, base)
	}
	item.SampleID = clip(s.SampleID, maxSampleID)
	if err := h.validator.validate(&s); err != nil {
		return failedItem(item, err, i, base)
	}
	rep, err := h.engine.Triage(&s)
	if err != nil {
		return failedItem(item, err, i, base)
	}
	h.metrics.countOutcome(topCauses(rep))
	item.Status, item.Report = http.StatusOK, rep
	return item
}

// notAnObject rejects an item that is valid JSON but not an object (null,
// a number, an array), which would otherwise decode as an empty sample.
func notAnObject(raw []byte) error {
	if t := bytes.TrimSpace(raw); len(t) > 0 && t[0] == '{' {
		return nil
	}
	return fail(sampleNotObject,
		"each sample must be a JSON object", input.FieldProblem{Pointer: "", Reason: "wrong type: expected object"})
}

// lenientSampleID reads sample_id from an item that failed strict decoding,
// so that the client can still match the failure to its record.
func lenientSampleID(raw []byte) string {
	var probe struct {
		SampleID string `json:"sample_id"`
	}
	if json.Unmarshal(raw, &probe) != nil || len(probe.SampleID) > 128 {
		return ""
	}
	return probe.SampleID
}

// failedItem renders err as the item's problem, its pointers made relative
// to the request body.
func failedItem(item batchItem, err error, i int, base pointerBase) batchItem {
	p := problemFor(err)
	fields := make([]input.FieldProblem, len(p.Errors))
	for j, f := range p.Errors {
		f.Pointer = base(i, f.Pointer)
		fields[j] = f
	}
	p.Errors = fields
	item.Status, item.Problem = p.Status, &p
	return item
}

// batchOutput is the negotiated answer format.
type batchOutput struct {
	mediaType string
	dialect   csvDialect
}

// negotiateBatch picks the answer's media type from Accept (RFC 9110 §12.5.1:
// the highest q among the types offered; ties go to the earlier range). With
// no Accept or only wildcards, NDJSON input gets NDJSON and other input JSON.
// CSV answers use the dialect of the Accept range, else the request's, else
// comma and point.
func negotiateBatch(accept, inType string, inDialect *csvDialect) (batchOutput, error) {
	def := echo.MIMEApplicationJSON
	if inType == mimeNDJSON {
		def = mimeNDJSON
	}
	dialect := csvDialect{delimiter: ',', decimal: '.'}
	if inDialect != nil {
		dialect = *inDialect
	}
	if strings.TrimSpace(accept) == "" {
		return batchOutput{mediaType: def, dialect: dialect}, nil
	}
	best, bestQ := "", 0.0
	var bestParams map[string]string
	for _, rng := range splitList(accept) {
		mt, params, err := mime.ParseMediaType(rng)
		if err != nil {
			continue
		}
		q := 1.0
		if qs, ok := params["q"]; ok {
			if q, err = strconv.ParseFloat(qs, 64); err != nil {
				continue
			}
		}
		switch mt {
		case "*/*", "application/*":
			mt = def
		case echo.MIMEApplicationJSON, mimeNDJSON, mimeCSV:
		case "text/*":
			mt = mimeCSV
		default:
			continue
		}
		if q > bestQ {
			best, bestQ, bestParams = mt, q, params
		}
	}
	if best == "" {
		return batchOutput{}, fail(mediaNotAcceptable,
			"the batch answers as application/json, application/x-ndjson or text/csv")
	}
	if best == mimeCSV {
		d, err := csvDialectOf(bestParams, &dialect)
		if err != nil {
			return batchOutput{}, fail(csvNotAcceptable, problemFor(err).Detail)
		}
		dialect = d
	}
	return batchOutput{mediaType: best, dialect: dialect}, nil
}

// splitList splits a header list at commas outside quoted strings, so that
// a media-type parameter such as decimal="," stays whole.
func splitList(s string) []string {
	var parts []string
	quoted, escaped, start := false, false, 0
	for i := 0; i < len(s); i++ {
		switch c := s[i]; {
		case escaped:
			escaped = false
		case quoted && c == '\\':
			escaped = true
		case c == '"':
			quoted = !quoted
		case c == ',' && !quoted:
			parts = append(parts, s[start:i])
			start = i + 1
		}
	}
	return append(parts, s[start:])
}
