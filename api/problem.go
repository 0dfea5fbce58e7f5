package api

import (
	"errors"
	"net/http"

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
	typeUnauthorized  = "/problems/unauthorized"
	typeInternal      = "/problems/internal"
)

const problemContentType = "application/problem+json"

// problemError is an error that renders as a problem detail.
type problemError struct{ p Problem }

func (e *problemError) Error() string { return e.p.Title + ": " + e.p.Detail }

func newProblem(status int, typ, title, detail string, fields ...input.FieldProblem) *problemError {
	return &problemError{Problem{Type: typ, Title: title, Status: status, Detail: detail, Errors: fields}}
}

// problemFor maps any handler error to a problem detail; internal detail is
// never serialised.
func problemFor(err error) Problem {
	var pe *problemError
	var ie *input.Error
	var he *echo.HTTPError
	switch {
	case errors.As(err, &pe):
		return pe.p
	case errors.As(err, &ie):
		return Problem{Type: typeInvalidSample, Title: "The sample is physically invalid or inconsistent",
			Status: http.StatusUnprocessableEntity, Errors: ie.Problems}
	case errors.As(err, &he):
		title := http.StatusText(he.Code)
		if title == "" {
			title = "Error"
		}
		p := Problem{Type: "about:blank", Title: title, Status: he.Code}
		if he.Code == http.StatusRequestEntityTooLarge {
			p.Detail = "the request body exceeds the limit of this route"
		}
		return p
	}
	return Problem{Type: typeInternal, Title: "Internal error", Status: http.StatusInternalServerError,
		Detail: "the server could not complete the request; the request id identifies it in the logs"}
}

// errorHandler renders every error as application/problem+json.
func errorHandler(err error, c echo.Context) {
	if c.Response().Committed {
		return
	}
	p := problemFor(err)
	p.Instance = c.Request().URL.Path
	p.RequestID = c.Response().Header().Get(echo.HeaderXRequestID)
	body, mErr := marshalPlain(p)
	if mErr != nil {
		body = []byte(`{"type":"/problems/internal","title":"Internal error","status":500}`)
	}
	_ = c.Blob(p.Status, problemContentType, body)
}
