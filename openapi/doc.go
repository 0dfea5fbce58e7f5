// Package openapi embeds colloidtriage's OpenAPI 3 document, written in
// YAML (openapi.yaml) and served as JSON. Contract tests in package api hold
// the handlers to it.
package openapi

import (
	_ "embed"
	"encoding/json"

	"go.yaml.in/yaml/v3"
)

//go:embed openapi.yaml
var YAML []byte

// JSON is the document converted once to JSON, as served at /openapi.json.
var JSON = mustJSON(YAML)

func mustJSON(doc []byte) []byte {
	var v any
	if err := yaml.Unmarshal(doc, &v); err != nil {
		panic("openapi: embedded document is not YAML: " + err.Error())
	}
	out, err := json.Marshal(v)
	if err != nil {
		panic("openapi: embedded document has keys JSON cannot hold: " + err.Error())
	}
	return out
}
