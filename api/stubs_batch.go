package api

import (
	"net/http"

	"github.com/labstack/echo/v4"
)

// batchBodyLimit is the body limit of the batch route.
const batchBodyLimit = "64M"

func (h *handlers) batch(c echo.Context) error {
	return echo.NewHTTPError(http.StatusNotImplemented)
}
