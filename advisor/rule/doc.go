// Package rule is the rule engine: it loads the catalogue of symptoms,
// causes and remedies (catalog.yaml) and the rule files (*.rules.yaml, built
// in and site packs), checks every rule against the catalogue and against
// the facts its caller declares, compiles each condition once (to a closure
// over typed fact slots where it can, else for the expression machine), and
// ranks causes by combining the certainty factors of the rules that fire.
//
// The package knows no fact by name but TopCauseScore: the vocabulary is
// handed to Load. Units: a fact is compared in the unit its declaration
// names; the package converts nothing.
package rule
