package api

import (
	"bytes"
	"net/http"

	"github.com/labstack/echo/v4"
)

// ndjsonEntries splits an NDJSON body (one sample per line, LF or CRLF)
// into entries. Blank lines are skipped, so an entry's index counts samples
// and its line counts lines of the body. The whole body is read first (it
// is bounded by batchBodyLimit): a batch over maxBatchSamples is then
// refused with 413 before any result is streamed, rather than ending in an
// error line that a line-by-line consumer might miss. Splitting stops at
// the first line past the limit.
//
// Pointers in an NDJSON item's problem are relative to its own line, which
// is its own JSON document.
func ndjsonEntries(body []byte) ([]batchEntry, error) {
	var entries []batchEntry
	line := 0
	for len(body) > 0 {
		var text []byte
		text, body, _ = bytes.Cut(body, []byte("\n"))
		line++
		text = bytes.TrimSpace(text)
		if len(text) == 0 {
			continue
		}
		if len(entries) == maxBatchSamples {
			return nil, tooManySamples()
		}
		entries = append(entries, batchEntry{raw: text, line: line})
	}
	return entries, nil
}

// streamNDJSON answers with one item per line in input order, flushing each
// line as soon as it and all before it are triaged, then the end line
// (ndjsonEnd). The status (200) is sent before the first item: from then
// on every failure is an item's, and a stream cut short has no end line.
func (h *handlers) streamNDJSON(c echo.Context, entries []batchEntry, base pointerBase) error {
	res := c.Response()
	res.Header().Set(echo.HeaderContentType, mimeNDJSON)
	res.WriteHeader(http.StatusOK)
	res.Flush()
	failed := 0
	progress := h.keepWriting(c)
	err := h.triageAll(c.Request().Context(), entries, base, func(it batchItem) error {
		progress()
		if it.Status != http.StatusOK {
			failed++
		}
		if _, err := res.Write(append(itemJSON(it, base), '\n')); err != nil {
			return echo.NewHTTPError(statusClientClosedRequest).SetInternal(err)
		}
		res.Flush()
		return nil
	})
	if err != nil {
		return err
	}
	end, _ := marshalPlain(ndjsonEnd{End: true, Count: len(entries), Failed: failed}) // integers always encode
	if _, err := res.Write(append(end, '\n')); err != nil {
		return echo.NewHTTPError(statusClientClosedRequest).SetInternal(err)
	}
	return nil
}

// ndjsonEnd is the last line of an NDJSON answer, so that a client can tell
// a whole answer from one cut short.
type ndjsonEnd struct {
	End    bool `json:"end"`
	Count  int  `json:"count"`
	Failed int  `json:"failed"`
}
