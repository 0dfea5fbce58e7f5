package api

import (
	"net/http"

	"github.com/labstack/echo/v4"
)

func (h *handlers) interactionProfile(c echo.Context) error {
	return echo.NewHTTPError(http.StatusNotImplemented)
}
