// Package web holds the workbench: one HTML page, its style sheet and its
// script, embedded in the binary and served at GET / by package api. The
// page is for support engineers who do not write JSON: it reads the request
// contract (ranges, enums, units, defaults) from /openapi.json and the
// library from /v1/materials at run time, posts the form to /v1/triage and
// shows the report, the interaction chart and a one-page print layout. It
// calls the public API and nothing else, and loads nothing from outside.
package web

import "embed"

// FS holds index.html, style.css and app.js.
//
//go:embed index.html style.css app.js
var FS embed.FS
