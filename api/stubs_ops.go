package api

import (
	"net/http"

	"github.com/labstack/echo/v4"
)

type metrics struct{}

func newMetrics() *metrics { return &metrics{} }

func (m *metrics) middleware(next echo.HandlerFunc) echo.HandlerFunc { return next }

func (h *handlers) metricsText(c echo.Context) error {
	return c.String(http.StatusOK, "")
}

func apiKeyAuth(keys []string) echo.MiddlewareFunc {
	return func(next echo.HandlerFunc) echo.HandlerFunc { return next }
}
