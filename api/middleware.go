package api

import (
	"fmt"
	"net/http"
	"time"

	"github.com/labstack/echo/v4"
	"github.com/rs/zerolog"
)

// accessLog writes one zerolog JSON line per request: method, route, status,
// size, latency and request id. Bodies are never logged; errors of status
// 500 and above are logged with their internal detail, which clients never see.
func accessLog(log zerolog.Logger) echo.MiddlewareFunc {
	return func(next echo.HandlerFunc) echo.HandlerFunc {
		return func(c echo.Context) error {
			start := time.Now()
			err := next(c)
			if err != nil {
				c.Error(err)
			}
			res := c.Response()
			ev := log.Info()
			if res.Status >= http.StatusInternalServerError {
				ev = log.Error().AnErr("internal_error", err)
			}
			ev.Str("request_id", res.Header().Get(echo.HeaderXRequestID)).
				Str("method", c.Request().Method).
				Str("route", c.Path()).
				Int("status", res.Status).
				Int64("bytes", res.Size).
				Dur("latency", time.Since(start)).
				Msg("request")
			return nil
		}
	}
}

// recoverPanic turns a panic in a handler into a 500 problem detail, so that
// a programming error never drops the connection or leaks a stack trace.
func recoverPanic(next echo.HandlerFunc) echo.HandlerFunc {
	return func(c echo.Context) (err error) {
		defer func() {
			if r := recover(); r != nil {
				if r == http.ErrAbortHandler {
					panic(r)
				}
				err = fmt.Errorf("panic: %v", r)
			}
		}()
		return next(c)
	}
}
