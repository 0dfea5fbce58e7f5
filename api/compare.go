package api

import (
	"errors"
	"net/http"

	"github.com/labstack/echo/v4"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
)

// compareRequest is the body of POST /v1/compare: a reference batch that
// behaved and a complaint batch that did not.
type compareRequest struct {
	Reference *input.Sample `json:"reference" validate:"required"`
	Complaint *input.Sample `json:"complaint" validate:"required"`
}

type compareResponse struct {
	*advisor.Comparison
	RequestID      string `json:"request_id"`
	IdempotencyKey string `json:"idempotency_key,omitempty"`
}

// compare explains which differences of input between two batches change
// the complaint's predicted stability (advisor.Engine.Compare). Problems
// name their field under /reference or /complaint. The reference takes the
// complaint's symptom when it states none.
func (h *handlers) compare(c echo.Context) error {
	var req compareRequest
	if err := decodeJSON(c, &req); err != nil {
		return err
	}
	var missing []input.FieldProblem
	if req.Reference == nil {
		missing = append(missing, input.FieldProblem{Pointer: "/reference", Reason: "required"})
	}
	if req.Complaint == nil {
		missing = append(missing, input.FieldProblem{Pointer: "/complaint", Reason: "required"})
	}
	if missing != nil {
		return fail(fieldsInvalid, "the comparison needs a reference and a complaint sample", missing...)
	}
	if req.Reference.Symptom == "" {
		req.Reference.Symptom = req.Complaint.Symptom
	}
	errRef := under("/reference", h.validator.validate(req.Reference))
	errCmp := under("/complaint", h.validator.validate(req.Complaint))
	if err := joinProblems(errRef, errCmp); err != nil {
		return err
	}
	cmp, err := h.engine.Compare(req.Reference, req.Complaint, h.validator.validate)
	if err != nil {
		return err
	}
	c.Set(triageCausesKey, topCauses(cmp.Triage))
	return c.JSON(http.StatusOK, compareResponse{Comparison: cmp,
		RequestID:      c.Response().Header().Get(echo.HeaderXRequestID),
		IdempotencyKey: c.Request().Header.Get(idempotencyKeyHeader)})
}

// under puts the field pointers of a sample's problem under prefix.
func under(prefix string, err error) error {
	var pe *problemError
	if err == nil || !errors.As(err, &pe) {
		return err
	}
	fields := make([]input.FieldProblem, len(pe.fields))
	for i, f := range pe.fields {
		f.Pointer = prefix + f.Pointer
		fields[i] = f
	}
	return &problemError{kind: pe.kind, detail: prefix[1:] + ": " + pe.detail, fields: fields}
}

// joinProblems reports the problems of both samples at once.
func joinProblems(a, b error) error {
	var pa, pb *problemError
	switch {
	case a == nil:
		return b
	case b == nil || !errors.As(a, &pa) || !errors.As(b, &pb) || pa.kind != pb.kind:
		return a
	}
	return &problemError{kind: pa.kind, detail: pa.detail + "; " + pb.detail, fields: append(pa.fields, pb.fields...)}
}
