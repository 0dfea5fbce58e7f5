// Package library is the materials and liquids library: it loads
// library/materials.yaml and library/liquids.yaml (normally from rules.FS),
// checks every value against its physical range and its source, and gives a
// liquid's properties at any temperature a request may state, by the water
// functions of package physics or by interpolating the library's tables.
// Listing is the library as GET /v1/materials serves it.
//
// Units: Material, Liquid and LiquidProperties hold SI values (kg/m^3,
// Pa s, J, K); the YAML files and the Listing speak the units named in their
// keys (kg/m^3, mPa s, zJ, °C).
package library
