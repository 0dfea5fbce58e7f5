package api

import (
	"fmt"
	"net/http"

	"github.com/labstack/echo/v4"
	"github.com/labstack/echo/v4/middleware"
	"github.com/rs/zerolog"
)

// accessLog is echo's request logger writing one zerolog JSON line per
// request: request id, method (clipped), route, status, size and latency. Bodies are
// never logged; errors of status 500 and above are logged with their
// internal detail, which clients never see. The error is rendered (by the
// error handler) before the line is written, so the line has the status
// the client got.
func accessLog(log zerolog.Logger) echo.MiddlewareFunc {
	return middleware.RequestLoggerWithConfig(middleware.RequestLoggerConfig{
		HandleError:     true,
		LogError:        true,
		LogStatus:       true,
		LogMethod:       true,
		LogRoutePath:    true,
		LogResponseSize: true,
		LogLatency:      true,
		LogValuesFunc: func(c echo.Context, v middleware.RequestLoggerValues) error {
			ev := log.Info()
			if v.Status >= http.StatusInternalServerError {
				ev = log.Error().AnErr("internal_error", v.Error)
			}
			ev.Str("request_id", c.Response().Header().Get(echo.HeaderXRequestID)).
				Str("method", clip(v.Method, maxLoggedMethod)).
				Str("route", v.RoutePath).
				Int("status", v.Status).
				Int64("bytes", v.ResponseSize).
				Dur("latency", v.Latency).
				Msg("request")
			return nil
		},
	})
}

// maxLoggedMethod is the most bytes of a request's method the access log
// writes; the routed methods are far shorter, made-up ones may not be.
const maxLoggedMethod = 16

// recoverPanic is echo's recovery turning a panic in a handler into an
// error, rendered as a 500 problem detail, so that a programming error
// never drops the connection or leaks a stack trace; the access log records
// the panic's value. http.ErrAbortHandler is passed on, as net/http expects.
var recoverPanic = middleware.RecoverWithConfig(middleware.RecoverConfig{
	DisablePrintStack:   true,
	DisableErrorHandler: true,
	LogErrorFunc: func(_ echo.Context, err error, _ []byte) error {
		return fmt.Errorf("panic: %w", err)
	},
})
