package api

import (
	"net/http"

	"github.com/labstack/echo/v4"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
)

type triageResponse struct {
	*advisor.Report
	RequestID      string `json:"request_id"`
	IdempotencyKey string `json:"idempotency_key,omitempty"`
}

// readSample decodes and validates one sample from the request body.
func (h *handlers) readSample(c echo.Context) (*input.Sample, error) {
	var s input.Sample
	if err := decodeJSON(c, &s); err != nil {
		return nil, err
	}
	if err := h.validator.validate(&s); err != nil {
		return nil, err
	}
	return &s, nil
}

func (h *handlers) triage(c echo.Context) error {
	s, err := h.readSample(c)
	if err != nil {
		return err
	}
	rep, err := h.engine.Triage(s)
	if err != nil {
		return err
	}
	c.Set(triageCausesKey, topCauses(rep))
	return c.JSON(http.StatusOK, triageResponse{Report: rep,
		RequestID:      c.Response().Header().Get(echo.HeaderXRequestID),
		IdempotencyKey: c.Request().Header.Get(idempotencyKeyHeader)})
}

type scalesResponse struct {
	SampleID    string                   `json:"sample_id,omitempty"`
	Versions    advisor.Versions         `json:"versions"`
	Scales      map[string]advisor.Scale `json:"scales"`
	Assumptions []string                 `json:"assumptions"`
	Models      map[string]string        `json:"models"`
	RequestID   string                   `json:"request_id"`
	// IdempotencyKey echoes the request's Idempotency-Key.
	IdempotencyKey string `json:"idempotency_key,omitempty"`
}

// scales computes the physics only; a symptom is not needed.
func (h *handlers) scales(c echo.Context) error {
	var s input.Sample
	if err := decodeJSON(c, &s); err != nil {
		return err
	}
	if s.Symptom == "" {
		s.Symptom = "settling"
	}
	if err := h.validator.validate(&s); err != nil {
		return err
	}
	sc, notes, models, err := h.engine.Scales(&s)
	if err != nil {
		return err
	}
	return c.JSON(http.StatusOK, scalesResponse{SampleID: s.SampleID,
		Versions: advisor.Versions{Engine: advisor.EngineVersion, Rules: h.engine.RuleSet().Hash},
		Scales:   sc, Assumptions: notes, Models: models,
		RequestID:      c.Response().Header().Get(echo.HeaderXRequestID),
		IdempotencyKey: c.Request().Header.Get(idempotencyKeyHeader)})
}

// topCauses lists the id of the first-ranked cause, for the outcome metrics.
func topCauses(rep *advisor.Report) []string {
	if len(rep.Causes) == 0 {
		return nil
	}
	return []string{rep.Causes[0].ID}
}
