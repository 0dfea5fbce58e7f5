package api

import (
	"net/http"

	"github.com/labstack/echo/v4"

	"colloidtriage/advisor"
	"colloidtriage/advisor/rule"
)

type catalogResponse struct {
	*rule.Catalog
	Scales []advisor.ScaleSpec `json:"scales"`
}

func (h *handlers) catalog(c echo.Context) error {
	return c.JSON(http.StatusOK, catalogResponse{Catalog: h.engine.RuleSet().Catalog, Scales: advisor.Scales()})
}

type rulesResponse struct {
	Hash  string      `json:"hash"`
	Files []string    `json:"files"`
	Rules []rule.Info `json:"rules"`
}

func (h *handlers) rules(c echo.Context) error {
	rs := h.engine.RuleSet()
	return c.JSON(http.StatusOK, rulesResponse{Hash: rs.Hash, Files: rs.Files, Rules: rs.Rules()})
}

func (h *handlers) materials(c echo.Context) error {
	return c.JSON(http.StatusOK, h.engine.Library().Listing())
}
