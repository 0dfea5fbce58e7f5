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
// line as soon as it and all before it are triaged. The status (200) is
// sent before the first item: from then on every failure is an item's.
func (h *handlers) streamNDJSON(c echo.Context, entries []batchEntry, base pointerBase) error {
	res := c.Response()
	res.Header().Set(echo.HeaderContentType, mimeNDJSON)
	res.WriteHeader(http.StatusOK)
	res.Flush()
	_, err := h.triageAll(c.Request().Context(), entries, base, func(it batchItem) error {
		line, err := marshalPlain(it)
		if err != nil {
			line, _ = marshalPlain(failedItem(batchItem{Index: it.Index, Line: it.Line, SampleID: it.SampleID}, err, it.Index, base))
		}
		if _, err := res.Write(append(line, '\n')); err != nil {
			return echo.NewHTTPError(statusClientClosedRequest).SetInternal(err)
		}
		res.Flush()
		return nil
	})
	return err
}
