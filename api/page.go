package api

import (
	"github.com/labstack/echo/v4"

	"colloidtriage/api/web"
)

// pagePrefix is where the workbench's style sheet and script are served;
// the page itself is at /. Neither is part of the JSON API, so neither is
// in the OpenAPI document, and neither needs an API key: they hold no data,
// and the page sends the key the user gives it with its API calls.
const pagePrefix = "/web"

// pageSecurity is the Content-Security-Policy of the workbench: everything
// from this service, nothing inline but the chart's blob and nothing from
// anywhere else, so the page works offline and cannot be made to load
// another origin's script.
const pageSecurity = "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' blob:; " +
	"connect-src 'self'; form-action 'none'; base-uri 'none'; frame-ancestors 'none'"

// pageRoutes serves the workbench page at GET / and its assets under
// pagePrefix.
func pageRoutes(e *echo.Echo) {
	headers := func(next echo.HandlerFunc) echo.HandlerFunc {
		return func(c echo.Context) error {
			hd := c.Response().Header()
			hd.Set("Content-Security-Policy", pageSecurity)
			hd.Set("X-Content-Type-Options", "nosniff")
			hd.Set("Cache-Control", "no-cache")
			return next(c)
		}
	}
	e.FileFS("/", "index.html", web.FS, headers)
	for _, asset := range []string{"style.css", "app.js"} {
		e.FileFS(pagePrefix+"/"+asset, asset, web.FS, headers)
	}
}
