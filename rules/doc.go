// Package rules holds colloidtriage's knowledge base as data: the rule files
// (*.rules.yaml), the catalogue of symptoms, causes and remedies
// (catalog.yaml; the scales are declared in code, beside the physics that
// computes them), and the materials and liquids library (library/*.yaml).
// Everything is embedded in the binary; packages advisor/rule and
// advisor/library parse, check and compile it once at start-up.
package rules

import "embed"

// FS holds the built-in rule set, catalogue and library.
//
//go:embed *.yaml library/*.yaml
var FS embed.FS
