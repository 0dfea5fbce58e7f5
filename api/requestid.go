package api

import (
	"github.com/labstack/echo/v4"
	"github.com/labstack/gommon/random"
)

// maxRequestID is the longest client request id the service keeps.
const maxRequestID = 64

// requestID gives every request its id, in the X-Request-Id header of the
// answer, where the handlers, the error handler and the access log all
// read it. A client's own id is kept only when it is at most maxRequestID
// characters of [A-Za-z0-9._-], so that it can go into logs and bodies
// as it is; any other is replaced by a generated one (32 random
// alphanumerics), never echoed.
func requestID(next echo.HandlerFunc) echo.HandlerFunc {
	return func(c echo.Context) error {
		id := c.Request().Header.Get(echo.HeaderXRequestID)
		if !safeRequestID(id) {
			id = random.String(32)
		}
		c.Response().Header().Set(echo.HeaderXRequestID, id)
		return next(c)
	}
}

func safeRequestID(id string) bool {
	if id == "" || len(id) > maxRequestID {
		return false
	}
	for i := 0; i < len(id); i++ {
		switch c := id[i]; {
		case c >= 'a' && c <= 'z', c >= 'A' && c <= 'Z', c >= '0' && c <= '9', c == '.', c == '_', c == '-':
		default:
			return false
		}
	}
	return true
}
