package api

import (
	"errors"
	"fmt"
	"net/http"
	"unicode/utf8"

	"colloidtriage/advisor/input"

	"github.com/labstack/echo/v4"
)

// Problem is an RFC 9457 problem detail. Errors lists the offending fields
// as JSON pointers with the expected unit and the valid range.
type Problem struct {
	Type      string               `json:"type"`
	Title     string               `json:"title"`
	Status    int                  `json:"status"`
	Detail    string               `json:"detail,omitempty"`
	Instance  string               `json:"instance,omitempty"`
	RequestID string               `json:"request_id,omitempty"`
	Errors    []input.FieldProblem `json:"errors,omitempty"`
}

// Problem types; relative URIs resolve against the service's own address.
const (
	typeInvalidJSON   = "/problems/invalid-json"
	typeInvalidSample = "/problems/invalid-sample"
	typeInvalidBatch  = "/problems/invalid-batch"
	typeBatchTooLarge = "/problems/batch-too-large"
	typeInvalidCSV    = "/problems/invalid-csv"
	typeInvalidQuery  = "/problems/invalid-query"
	typeUnauthorized  = "/problems/unauthorized"
	typeInternal      = "/problems/internal"
	typeIdempotency   = "/problems/idempotency-key"
	typeBusy          = "/problems/busy"
	typeBlank         = "about:blank"
)

const problemContentType = "application/problem+json"

// kind is a failure the API reports; problemKinds maps it to the problem's
// type, title and HTTP status.
type kind int

const (
	bodyUnreadable kind = iota + 1
	bodyTimeout
	jsonInvalid
	bodyEmpty
	fieldWrongType
	fieldUnknown
	memberOffContract
	sampleNotObject
	batchUnreadable
	samplesMissing
	batchTooLarge
	csvMediaType
	csvNotAcceptable
	csvEmpty
	csvSyntax
	csvHeaderInvalid
	csvRowLength
	csvCellInvalid
	queryInvalid
	fieldsInvalid
	sampleInconsistent
	keyRejected
	mediaUnsupported
	mediaNotAcceptable
	internalError
	idempotencyKeyInvalid
	idempotencyKeyReused
	idempotencyKeyInFlight
	batchesBusy
	kindCount
)

// problemClass is what every problem of one kind has in common.
type problemClass struct {
	typ, title string
	status     int
}

// problemKinds is the one place where a failure becomes a problem type,
// a title and an HTTP status.
var problemKinds = [kindCount]problemClass{
	bodyUnreadable:         {typeInvalidJSON, "The request body could not be read", http.StatusBadRequest},
	bodyTimeout:            {typeBlank, "Request Timeout", http.StatusRequestTimeout},
	jsonInvalid:            {typeInvalidJSON, "The request body is not valid JSON", http.StatusBadRequest},
	bodyEmpty:              {typeInvalidJSON, "The request body is empty", http.StatusBadRequest},
	fieldWrongType:         {typeInvalidJSON, "A field has the wrong type", http.StatusBadRequest},
	fieldUnknown:           {typeInvalidJSON, "Unknown field", http.StatusBadRequest},
	memberOffContract:      {typeInvalidJSON, "A member is not part of the contract", http.StatusBadRequest},
	sampleNotObject:        {typeInvalidJSON, "A sample is not a JSON object", http.StatusBadRequest},
	batchUnreadable:        {typeInvalidBatch, "The request body could not be read", http.StatusBadRequest},
	samplesMissing:         {typeInvalidBatch, "The batch has no samples field", http.StatusBadRequest},
	batchTooLarge:          {typeBatchTooLarge, "Too many samples in one batch", http.StatusRequestEntityTooLarge},
	csvMediaType:           {typeInvalidCSV, "The CSV media type is incomplete or invalid", http.StatusUnsupportedMediaType},
	csvNotAcceptable:       {typeInvalidCSV, "Not acceptable", http.StatusNotAcceptable},
	csvEmpty:               {typeInvalidCSV, "The CSV body is empty", http.StatusBadRequest},
	csvSyntax:              {typeInvalidCSV, "The body is not valid CSV", http.StatusBadRequest},
	csvHeaderInvalid:       {typeInvalidCSV, "The CSV header names unknown or repeated columns", http.StatusBadRequest},
	csvRowLength:           {typeInvalidCSV, "A row has the wrong number of fields", http.StatusBadRequest},
	csvCellInvalid:         {typeInvalidCSV, "A cell does not parse", http.StatusBadRequest},
	queryInvalid:           {typeInvalidQuery, "A query parameter is invalid", http.StatusBadRequest},
	fieldsInvalid:          {typeInvalidSample, "The sample has invalid fields", http.StatusUnprocessableEntity},
	sampleInconsistent:     {typeInvalidSample, "The sample is physically invalid or inconsistent", http.StatusUnprocessableEntity},
	keyRejected:            {typeUnauthorized, "Missing or invalid API key", http.StatusUnauthorized},
	mediaUnsupported:       {typeBlank, "Unsupported media type", http.StatusUnsupportedMediaType},
	mediaNotAcceptable:     {typeBlank, "Not acceptable", http.StatusNotAcceptable},
	internalError:          {typeInternal, "Internal error", http.StatusInternalServerError},
	idempotencyKeyInvalid:  {typeIdempotency, "The Idempotency-Key is not valid", http.StatusBadRequest},
	idempotencyKeyReused:   {typeIdempotency, "The Idempotency-Key was used with another request", http.StatusUnprocessableEntity},
	idempotencyKeyInFlight: {typeIdempotency, "A request with this Idempotency-Key is still running", http.StatusConflict},
	batchesBusy:            {typeBusy, "Too many batches at once", http.StatusServiceUnavailable},
}

// problemError is a failure of a known kind, with what the client needs to
// fix it.
type problemError struct {
	kind   kind
	detail string
	fields []input.FieldProblem
}

func (e *problemError) Error() string { return problemKinds[e.kind].title + ": " + e.detail }

// fail reports a failure of kind k.
func fail(k kind, detail string, fields ...input.FieldProblem) error {
	return &problemError{kind: k, detail: detail, fields: fields}
}

// maxProblems is the most field problems one problem detail lists; the
// detail says how many more there were.
const maxProblems = 100

// maxEcho is the most bytes of one string of a problem detail (a detail,
// a pointer, a reason): they may quote what the client sent.
const maxEcho = 256

func (e *problemError) problem() Problem {
	c := problemKinds[e.kind]
	p := Problem{Type: c.typ, Title: c.title, Status: c.status, Detail: clip(e.detail, maxEcho)}
	fields := e.fields
	if n := len(fields) - maxProblems; n > 0 {
		fields = fields[:maxProblems]
		p.Detail += fmt.Sprintf(" (%d more problems not listed)", n)
	}
	if len(fields) > 0 {
		p.Errors = make([]input.FieldProblem, len(fields))
		for i, f := range fields {
			p.Errors[i] = input.FieldProblem{Pointer: clip(f.Pointer, maxEcho), Reason: clip(f.Reason, maxEcho),
				Unit: f.Unit, Valid: clip(f.Valid, maxEcho)}
		}
	}
	return p
}

// clip cuts s to at most n bytes, at a character boundary, marking the cut
// with an ellipsis, so that a string a client sent is never echoed whole.
func clip(s string, n int) string {
	if len(s) <= n {
		return s
	}
	const mark = "…"
	cut := n - len(mark)
	for cut > 0 && !utf8.RuneStart(s[cut]) {
		cut--
	}
	return s[:cut] + mark
}

// problemFor maps any handler error to a problem detail; internal detail is
// never serialised. An echo.HTTPError (no route, wrong method, body over
// the limit) is a plain HTTP status, of type about:blank.
func problemFor(err error) Problem {
	var pe *problemError
	var ie *input.Error
	var he *echo.HTTPError
	switch {
	case errors.As(err, &pe):
		return pe.problem()
	case errors.As(err, &ie):
		return (&problemError{kind: sampleInconsistent, fields: ie.Problems}).problem()
	case errors.As(err, &he):
		title := http.StatusText(he.Code)
		if title == "" {
			title = "Error"
		}
		p := Problem{Type: typeBlank, Title: title, Status: he.Code}
		if he.Code == http.StatusRequestEntityTooLarge {
			p.Detail = "the request body exceeds the limit of this route"
		}
		return p
	}
	return (&problemError{kind: internalError,
		detail: "the server could not complete the request; the request id identifies it in the logs"}).problem()
}

// errorHandler renders every error as application/problem+json.
func errorHandler(err error, c echo.Context) {
	if c.Response().Committed {
		return
	}
	p := problemFor(err)
	p.Instance = c.Request().URL.Path
	p.RequestID = c.Response().Header().Get(echo.HeaderXRequestID)
	body, _ := marshalPlain(p) // a Problem holds only strings and numbers, which always encode
	_ = c.Blob(p.Status, problemContentType, body)
}
