package api

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"net/http"
	"net/http/httptest"
	"reflect"
	"strconv"
	"strings"
	"testing"
	"time"

	"colloidtriage/advisor/input"

	"github.com/labstack/echo/v4"
	"github.com/rs/zerolog"
)

// Bad and extreme input against the HTTP routes (issue 7). The contract
// (openapi/openapi.yaml): bad input gets a 4xx application/problem+json with a
// title, field errors name the field as a JSON pointer (RFC 6901), range
// errors carry the unit and the valid range, and nothing is ever a 5xx.

// badCase is one request that must be refused.
type badCase struct {
	name         string
	method, path string // default POST /v1/triage
	contentType  string // default application/json; "-" sends none
	body         string
	status       int      // the expected status; 0 accepts any 4xx
	pointer      string   // when set, errors[] must hold this JSON pointer ...
	unit         string   // ... with this unit ...
	validHas     []string // ... and a valid range holding each of these
	root         bool     // errors[] must hold the pointer "" (the whole document)
}

// sampleBase is a valid sample with every required field set: 2.5 um
// particles of titania's density in water.
func sampleBase() map[string]any {
	return map[string]any{
		"symptom":   "settling",
		"particles": map[string]any{"diameter_nm": 2500.0, "density_kg_m3": 4200.0},
	}
}

// baseWith is sampleBase with a JSON fragment of members added to its top level.
func baseWith(members string) string {
	b, _ := json.Marshal(sampleBase())
	if members == "" {
		return string(b)
	}
	return strings.TrimSuffix(string(b), "}") + "," + members + "}"
}

func mustJSON(v any) string {
	b, err := json.Marshal(v)
	if err != nil {
		panic(err)
	}
	return string(b)
}

// tagField is one leaf field of input.Sample reached through JSON names;
// a slice on the way is entered at its element 0.
type tagField struct {
	steps   []tagStep
	field   reflect.StructField
	pointer string
}

type tagStep struct {
	name  string
	slice bool
	typ   reflect.Type // the struct type this step leads to
}

// sampleFields lists every leaf field of input.Sample by reflection, so
// that a field added to the contract is covered without editing this file.
func sampleFields() []tagField {
	var out []tagField
	var walk func(t reflect.Type, steps []tagStep, ptr string)
	walk = func(t reflect.Type, steps []tagStep, ptr string) {
		for i := range t.NumField() {
			f := t.Field(i)
			name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
			if name == "" || name == "-" {
				continue
			}
			ft, slice := f.Type, false
			for ft.Kind() == reflect.Pointer || ft.Kind() == reflect.Slice {
				slice = slice || ft.Kind() == reflect.Slice
				ft = ft.Elem()
			}
			p := ptr + "/" + name
			if ft.Kind() == reflect.Struct {
				if slice {
					p += "/0"
				}
				walk(ft, append(append([]tagStep{}, steps...), tagStep{name, slice, ft}), p)
				continue
			}
			// a list of plain values (constraints) is replaced as a whole
			out = append(out, tagField{steps: steps, field: f, pointer: p})
		}
	}
	walk(reflect.TypeOf(input.Sample{}), nil, "")
	return out
}

func (f tagField) name() string {
	n, _, _ := strings.Cut(f.field.Tag.Get("json"), ",")
	return n
}

func (f tagField) numeric() bool {
	k := baseKind(f.field.Type)
	return k == reflect.Float64 || k == reflect.Int
}

func baseKind(t reflect.Type) reflect.Kind {
	for t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	return t.Kind()
}

// tagBounds reads a numeric field's range from its validate tag.
type tagBounds struct {
	lo, hi           string // as written in the tag; "" when unbounded
	loIncl, hiIncl   bool
	loValue, hiValue float64
}

func boundsOf(f reflect.StructField) tagBounds {
	var b tagBounds
	for _, part := range strings.Split(f.Tag.Get("validate"), ",") {
		k, v, _ := strings.Cut(part, "=")
		x, err := strconv.ParseFloat(v, 64)
		if err != nil {
			continue
		}
		switch k {
		case "gt", "gte":
			b.lo, b.loIncl, b.loValue = v, k == "gte", x
		case "lt", "lte":
			b.hi, b.hiIncl, b.hiValue = v, k == "lte", x
		}
	}
	return b
}

// validRange is the valid range as the contract writes it, e.g.
// "0.5 <= value <= 1e7" or "0 < value < 0.74".
func (b tagBounds) validRange() string {
	op := func(incl bool) string {
		if incl {
			return " <= "
		}
		return " < "
	}
	return b.lo + op(b.loIncl) + "value" + op(b.hiIncl) + b.hi
}

// justBelow is the largest invalid value under the minimum and justAbove the
// smallest invalid value over the maximum (the bound itself when exclusive).
func (b tagBounds) justBelow(isInt bool) any {
	switch {
	case isInt:
		return int(b.loValue) - 1
	case b.loIncl:
		return math.Nextafter(b.loValue, math.Inf(-1))
	}
	return b.loValue
}

func (b tagBounds) justAbove(isInt bool) any {
	switch {
	case isInt:
		return int(b.hiValue) + 1
	case b.hiIncl:
		return math.Nextafter(b.hiValue, math.Inf(1))
	}
	return b.hiValue
}

// midValue is a valid value of a bounded numeric field.
func midValue(f reflect.StructField) any {
	b := boundsOf(f)
	if baseKind(f.Type) == reflect.Int {
		return int(b.loValue+b.hiValue) / 2
	}
	return (b.loValue + b.hiValue) / 2
}

// bodyWith is sampleBase with the field f set to v. Objects on the way are
// created with their required members set to valid values, and an
// electrolyte gets its formula (or, for a valence field, both valences),
// so that f is the only thing wrong with the sample.
func bodyWith(f tagField, v any) string {
	root := sampleBase()
	cur := root
	for _, s := range f.steps {
		next, ok := cur[s.name].(map[string]any)
		if !ok {
			next = requiredMembers(s.typ, f.name())
			if s.slice {
				cur[s.name] = []any{next}
			} else {
				cur[s.name] = next
			}
		}
		cur = next
	}
	cur[f.name()] = v
	return mustJSON(root)
}

func requiredMembers(t reflect.Type, leaf string) map[string]any {
	m := map[string]any{}
	for i := range t.NumField() {
		f := t.Field(i)
		name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
		tag := f.Tag.Get("validate")
		always := f.Type.Kind() == reflect.Float64 // a plain number is validated even when zero
		_, choices, oneOf := strings.Cut(tag, "oneof=")
		switch {
		case f.Type.Kind() == reflect.String && oneOf && strings.HasPrefix(tag, "required,"):
			m[name], _, _ = strings.Cut(choices, " ") // a required choice: its first value
		case always || strings.HasPrefix(tag, "required,") || tag == "required":
			m[name] = midValue(f)
		}
	}
	if t == reflect.TypeOf(input.Cosolvent{}) && leaf != "name" {
		m["name"] = "propylene_glycol"
	}
	if t == reflect.TypeOf(input.Electrolyte{}) {
		if strings.HasSuffix(leaf, "_valence") {
			m["cation_valence"], m["anion_valence"] = 1, 1
		} else {
			m["formula"] = "NaCl"
		}
	}
	return m
}

func formatNumber(v any) string {
	if x, ok := v.(float64); ok {
		return strconv.FormatFloat(x, 'g', -1, 64)
	}
	return fmt.Sprint(v)
}

// generatedBadCases derives, for every field of input.Sample, a value of
// the wrong JSON type and, for every bounded numeric field, the values just
// outside its range and the absurd magnitudes +-1e308.
func generatedBadCases() []badCase {
	var cases []badCase
	for _, f := range sampleFields() {
		wrong := any("1")
		switch baseKind(f.field.Type) {
		case reflect.String:
			wrong = 1
		case reflect.Bool:
			wrong = "yes"
		}
		cases = append(cases, badCase{name: "wrong type " + f.pointer, body: bodyWith(f, wrong), status: 400, pointer: f.pointer})
		if !f.numeric() {
			continue
		}
		b := boundsOf(f.field)
		if b.lo == "" || b.hi == "" {
			cases = append(cases, badCase{name: "unbounded " + f.pointer, body: bodyWith(f, 1.0), status: 0,
				pointer: f.pointer}) // a numeric field without a range: the valid 1.0 must then fail this case
			continue
		}
		isInt := baseKind(f.field.Type) == reflect.Int
		unit := f.field.Tag.Get("unit")
		valid := []string{b.validRange()}
		for _, v := range []any{b.justBelow(isInt), b.justAbove(isInt)} {
			cases = append(cases, badCase{name: "out of range " + f.pointer + "=" + formatNumber(v), body: bodyWith(f, v),
				status: 422, pointer: f.pointer, unit: unit, validHas: valid})
		}
		for _, v := range []float64{1e308, -1e308} {
			c := badCase{name: "absurd " + f.pointer + "=" + formatNumber(v), body: bodyWith(f, v), status: 422,
				pointer: f.pointer, unit: unit, validHas: valid}
			if isInt { // 1e308 does not fit an int: a type error, without a range
				c.status, c.unit, c.validHas = 400, "", nil
			}
			cases = append(cases, c)
		}
	}
	return cases
}

// nested is depth levels of open, then close, around inner.
func nested(open, inner, close string, depth int) string {
	return strings.Repeat(open, depth) + inner + strings.Repeat(close, depth)
}

// handBadCases are the malformed bodies, wrong shapes, missing fields,
// unknown names, physically impossible values, limits, media types and
// methods that reflection cannot derive.
func handBadCases() []badCase {
	base := baseWith("")
	el := func(members string) string { return baseWith(`"medium":{"electrolytes":[{` + members + `}]}`) }
	medium := func(members string) string { return baseWith(`"medium":{` + members + `}`) }
	storage := func(members string) string { return baseWith(`"storage":{` + members + `}`) }
	particles := func(members string) string {
		return `{"symptom":"settling","particles":{` + members + `}}`
	}
	tempValid := []string{"<= value <="}
	cases := []badCase{
		// Malformed JSON is 400 (RFC 8259 grammar). Truncation at every
		// kind of token:
		{name: "truncated open brace", body: "{", status: 400},
		{name: "truncated after name", body: `{"symptom"`, status: 400},
		{name: "truncated after colon", body: `{"symptom":`, status: 400},
		{name: "truncated in string", body: `{"symptom":"sett`, status: 400},
		{name: "truncated in number", body: `{"symptom":"settling","particles":{"diameter_nm":25`, status: 400},
		{name: "truncated last brace", body: strings.TrimSuffix(base, "}"), status: 400},
		{name: "truncated in escape", body: `{"symptom":"settling\u00`, status: 400},
		// Trailing commas, which JavaScript allows and JSON does not.
		{name: "trailing comma object", body: strings.TrimSuffix(base, "}") + ",}", status: 400},
		{name: "trailing comma nested", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,`), status: 400},
		{name: "trailing comma array", body: el(`"formula":"NaCl","concentration_mM":1},`), status: 400},
		{name: "missing comma", body: particles(`"diameter_nm":2500 "density_kg_m3":4200`), status: 400},
		{name: "missing colon", body: `{"symptom" "settling"}`, status: 400},
		// Numbers JSON has no literal for: NaN and Infinity are refused
		// before they can reach the physics.
		{name: "NaN literal", body: particles(`"diameter_nm":NaN,"density_kg_m3":4200`), status: 400},
		{name: "Infinity literal", body: particles(`"diameter_nm":Infinity,"density_kg_m3":4200`), status: 400},
		{name: "minus Infinity literal", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"zeta_mV":-Infinity`), status: 400},
		{name: "NaN string", body: particles(`"diameter_nm":"NaN","density_kg_m3":4200`), status: 400, pointer: "/particles/diameter_nm"},
		{name: "plus sign", body: particles(`"diameter_nm":+2500,"density_kg_m3":4200`), status: 400},
		{name: "leading zero", body: particles(`"diameter_nm":02500,"density_kg_m3":4200`), status: 400},
		{name: "hex number", body: particles(`"diameter_nm":0x9c4,"density_kg_m3":4200`), status: 400},
		{name: "bare fraction", body: particles(`"diameter_nm":.5,"density_kg_m3":4200`), status: 400},
		{name: "dangling exponent", body: particles(`"diameter_nm":25e,"density_kg_m3":4200`), status: 400},
		// 1e309 is valid JSON but no float64: a 400 on the field.
		{name: "number beyond float64", body: particles(`"diameter_nm":1e309,"density_kg_m3":4200`), status: 400, pointer: "/particles/diameter_nm"},
		// Comments are not JSON (RFC 8259 has none); accepting them would
		// make the service's dialect differ from every client's validator.
		{name: "line comment", body: "{\n// the complaint\n\"symptom\":\"settling\"}", status: 400},
		{name: "block comment", body: `{/* x */"symptom":"settling"}`, status: 400},
		{name: "hash comment", body: "# sample\n" + base, status: 400},
		{name: "single quotes", body: `{'symptom':'settling'}`, status: 400},
		{name: "unquoted name", body: `{symptom:"settling"}`, status: 400},
		{name: "raw newline in string", body: "{\"symptom\":\"settl\ning\"}", status: 400},
		{name: "bad escape", body: `{"symptom":"settl\qing"}`, status: 400},
		// A UTF-8 byte order mark: RFC 8259 §8.1 lets a parser either
		// ignore it or refuse it. The single-sample routes are strict (the
		// batch route, fed by spreadsheet exports, drops it), so 400.
		// UTF-16 is not JSON on the wire (RFC 8259 §8.1 requires UTF-8).
		{name: "UTF-16LE body", body: "\xff\xfe{\x00}\x00", status: 400},
		{name: "empty body", body: "", status: 400},
		{name: "whitespace body", body: " \n\t ", status: 400},
		{name: "trailing value", body: base + " {}", status: 400},
		{name: "trailing garbage", body: base + "x", status: 400},
		{name: "trailing bracket", body: base + "]", status: 400},
		{name: "trailing brace", body: base + "}", status: 400},
		// The body must be one JSON object.
		{name: "array body", body: "[" + base + "]", status: 400, root: true},
		{name: "string body", body: `"settling"`, status: 400},
		{name: "number body", body: `42`, status: 400},
		{name: "true body", body: `true`, status: 400},
		// null decodes as an empty sample: a 4xx either way (it names the
		// missing symptom).
		{name: "null body", body: `null`, status: 0},
		// Duplicate member names: RFC 8259 §4 says names SHOULD be unique
		// and leaves the outcome of duplicates unpredictable; I-JSON
		// (RFC 7493 §2.3) forbids them. A second diameter_nm silently
		// winning can hide a unit mistake in a LIMS export, and two parsers
		// that pick differently disagree about what was triaged, so 400.
		{name: "duplicate symptom", body: `{"symptom":"settling","symptom":"caking","particles":{"diameter_nm":2500,"density_kg_m3":4200}}`,
			status: 400},
		{name: "duplicate nested number", body: particles(`"diameter_nm":2500,"diameter_nm":25,"density_kg_m3":4200`),
			status: 400},
		{name: "duplicate object", body: baseWith(`"storage":{"shelf_life_days":365},"storage":{"shelf_life_days":1}`),
			status: 400},
		// Names are exact: the unit suffix is part of the name, and mV is
		// not MV.
		{name: "name in upper case", body: `{"SYMPTOM":"settling","particles":{"diameter_nm":2500,"density_kg_m3":4200}}`,
			status: 400, pointer: "/SYMPTOM"},
		{name: "unit suffix in wrong case", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"zeta_MV":-45`),
			status: 400, pointer: "/particles/zeta_MV"},
		{name: "duplicate by case", body: `{"symptom":"settling","Symptom":"caking","particles":{"diameter_nm":2500,"density_kg_m3":4200}}`,
			status: 400},
		// Unknown members: 400 naming where they are.
		{name: "unknown top-level field", body: baseWith(`"particle":{}`), status: 400, pointer: "/particle"},
		{name: "unknown nested field", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"diamter_nm":3`),
			status: 400, pointer: "/particles/diamter_nm"},
		{name: "unit left out of name", body: particles(`"diameter":2500,"density_kg_m3":4200`), status: 400},

		// Wrong shapes of objects and arrays.
		{name: "particles as array", body: `{"symptom":"settling","particles":[]}`, status: 400, pointer: "/particles"},
		{name: "particles as number", body: `{"symptom":"settling","particles":5}`, status: 400, pointer: "/particles"},
		{name: "electrolytes as object", body: medium(`"electrolytes":{"formula":"NaCl","concentration_mM":1}`),
			status: 400, pointer: "/medium/electrolytes"},
		{name: "size distribution as number", body: particles(`"size_distribution":3,"density_kg_m3":4200`),
			status: 400, pointer: "/particles/size_distribution"},
		{name: "number with unit", body: particles(`"diameter_nm":"2500 nm","density_kg_m3":4200`), status: 400, pointer: "/particles/diameter_nm"},
		{name: "number as boolean", body: particles(`"diameter_nm":true,"density_kg_m3":4200`), status: 400, pointer: "/particles/diameter_nm"},
		{name: "fractional valence", body: el(`"cation_valence":1.5,"anion_valence":1,"concentration_mM":1`), status: 400,
			pointer: "/medium/electrolytes/0/cation_valence"},

		// Missing required fields: 422 naming each.
		{name: "empty object", body: `{}`, status: 422, pointer: "/symptom"},
		{name: "no symptom", body: `{"particles":{"diameter_nm":2500,"density_kg_m3":4200}}`, status: 422, pointer: "/symptom"},
		{name: "null symptom", body: `{"symptom":null,"particles":{"diameter_nm":2500,"density_kg_m3":4200}}`, status: 422, pointer: "/symptom"},
		{name: "empty symptom", body: `{"symptom":"","particles":{"diameter_nm":2500,"density_kg_m3":4200}}`, status: 422, pointer: "/symptom"},
		{name: "no diameter", body: particles(`"density_kg_m3":4200`), status: 422, pointer: "/particles/diameter_nm"},
		{name: "null diameter", body: particles(`"diameter_nm":null,"density_kg_m3":4200`), status: 422, pointer: "/particles/diameter_nm"},
		{name: "empty size distribution", body: particles(`"size_distribution":[],"density_kg_m3":4200`), status: 422, pointer: "/particles/size_distribution"},
		{name: "no density and no material", body: particles(`"diameter_nm":2500`), status: 422, pointer: "/particles/density_kg_m3", unit: "kg/m^3"},
		{name: "electrolyte without concentration", body: el(`"formula":"NaCl"`), status: 422, pointer: "/medium/electrolytes/0/concentration_mM", unit: "mM"},
		{name: "electrolyte null", body: medium(`"electrolytes":[null]`), status: 422, pointer: "/medium/electrolytes/0/concentration_mM"},
		{name: "free polymer without concentration", body: medium(`"free_polymer":{"radius_of_gyration_nm":10}`),
			status: 422, pointer: "/medium/free_polymer/concentration_g_L", unit: "g/L"},
		{name: "adsorbing polymer without coverage", body: baseWith(`"stabilizer":{"adsorbing_polymer":{"molar_mass_kg_mol":100}}`),
			status: 422, pointer: "/stabilizer/adsorbing_polymer/surface_coverage"},
		{name: "adsorbing polymer without molar mass", body: baseWith(`"stabilizer":{"adsorbing_polymer":{"surface_coverage":0.5}}`),
			status: 422, pointer: "/stabilizer/adsorbing_polymer/molar_mass_kg_mol"},

		// Values outside an enumeration or a length.
		{name: "unknown symptom", body: `{"symptom":"sedimentation","particles":{"diameter_nm":2500,"density_kg_m3":4200}}`, status: 422, pointer: "/symptom"},
		{name: "symptom in capitals", body: `{"symptom":"Settling","particles":{"diameter_nm":2500,"density_kg_m3":4200}}`, status: 422, pointer: "/symptom"},
		{name: "symptom with invalid UTF-8", body: "{\"symptom\":\"settling\xff\",\"particles\":{\"diameter_nm\":2500,\"density_kg_m3\":4200}}", status: 422, pointer: "/symptom"},
		{name: "unknown phase", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"phase":"plasma"`), status: 422, pointer: "/particles/phase"},
		{name: "unknown product category", body: baseWith(`"product_category":"rocket"`), status: 422, pointer: "/product_category"},
		{name: "unknown solvent quality", body: baseWith(`"stabilizer":{"solvent_quality":"excellent"}`), status: 422, pointer: "/stabilizer/solvent_quality"},
		{name: "unknown van der Waals model", body: baseWith(`"models":{"van_der_waals":"casimir"}`), status: 422, pointer: "/models/van_der_waals"},
		{name: "unknown double-layer model", body: baseWith(`"models":{"double_layer":"poisson_boltzmann"}`), status: 422, pointer: "/models/double_layer"},
		{name: "sample id too long", body: baseWith(`"sample_id":"` + strings.Repeat("x", 129) + `"`), status: 422, pointer: "/sample_id"},
		{name: "material name too long", body: particles(`"diameter_nm":2500,"material":"` + strings.Repeat("m", 65) + `"`), status: 422, pointer: "/particles/material"},
		{name: "too many size classes", body: particles(`"density_kg_m3":4200,"size_distribution":[` +
			strings.TrimSuffix(strings.Repeat(`{"diameter_nm":100,"volume_fraction":0.01},`, 101), ",") + `]`), status: 422, pointer: "/particles/size_distribution"},
		{name: "too many electrolytes", body: medium(`"electrolytes":[` +
			strings.TrimSuffix(strings.Repeat(`{"formula":"NaCl","concentration_mM":1},`, 21), ",") + `]`), status: 422, pointer: "/medium/electrolytes"},

		// Non-physical values. Solids at or above close packing (0.74,
		// face-centred cubic) cannot be a suspension.
		{name: "solids at close packing", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"volume_fraction":0.74`),
			status: 422, pointer: "/particles/volume_fraction", unit: "1", validHas: []string{"0 < value < 0.74"}},
		{name: "solids all solid", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"volume_fraction":1`),
			status: 422, pointer: "/particles/volume_fraction", unit: "1"},
		{name: "no solids", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"volume_fraction":0`),
			status: 422, pointer: "/particles/volume_fraction", unit: "1"},
		{name: "zero viscosity", body: medium(`"viscosity_mPa_s":0`), status: 422, pointer: "/medium/viscosity_mPa_s", unit: "mPa s"},
		{name: "negative viscosity", body: medium(`"viscosity_mPa_s":-1`), status: 422, pointer: "/medium/viscosity_mPa_s", unit: "mPa s"},
		{name: "zero particle density", body: particles(`"diameter_nm":2500,"density_kg_m3":0`), status: 422, pointer: "/particles/density_kg_m3"},
		{name: "negative diameter", body: particles(`"diameter_nm":-2500,"density_kg_m3":4200`), status: 422, pointer: "/particles/diameter_nm", unit: "nm"},
		{name: "negative zero diameter", body: particles(`"diameter_nm":-0,"density_kg_m3":4200`), status: 422, pointer: "/particles/diameter_nm"},
		{name: "diameter 1e-320", body: particles(`"diameter_nm":1e-320,"density_kg_m3":4200`), status: 422, pointer: "/particles/diameter_nm"},
		{name: "diameter 1e308", body: particles(`"diameter_nm":1e308,"density_kg_m3":4200`), status: 422, pointer: "/particles/diameter_nm"},
		{name: "negative shelf life", body: storage(`"shelf_life_days":-1`), status: 422, pointer: "/storage/shelf_life_days", unit: "d"},
		{name: "zero container", body: storage(`"container_height_mm":0`), status: 422, pointer: "/storage/container_height_mm", unit: "mm"},
		{name: "negative salt", body: el(`"formula":"NaCl","concentration_mM":-1`), status: 422, pointer: "/medium/electrolytes/0/concentration_mM", unit: "mM"},
		{name: "pH above 14", body: medium(`"ph":14.5`), status: 422, pointer: "/medium/ph", unit: "pH"},
		{name: "negative pH", body: medium(`"ph":-1`), status: 422, pointer: "/medium/ph", unit: "pH"},
		{name: "size class fraction above 1", body: particles(`"density_kg_m3":4200,"size_distribution":[{"diameter_nm":100,"volume_fraction":1.5}]`),
			status: 422, pointer: "/particles/size_distribution/0/volume_fraction", unit: "1"},
		{name: "size class without fraction", body: particles(`"density_kg_m3":4200,"size_distribution":[{"diameter_nm":100}]`),
			status: 422, pointer: "/particles/size_distribution/0/volume_fraction"},

		// Temperatures outside the liquid's known range (its sourced range
		// plus the documented 10 K of extrapolation): water 0-100 degC,
		// glycerol 0-100 degC, hexadecane 25-100 degC.
		{name: "water medium frozen", body: medium(`"temperature_c":-30`), status: 422, pointer: "/medium/temperature_c", unit: "degC", validHas: tempValid},
		{name: "water medium boiling", body: medium(`"temperature_c":120`), status: 422, pointer: "/medium/temperature_c", unit: "degC", validHas: tempValid},
		{name: "water storage frozen", body: storage(`"temperature_c":-25`), status: 422, pointer: "/storage/temperature_c", unit: "degC", validHas: tempValid},
		{name: "water storage boiling", body: storage(`"temperature_c":150`), status: 422, pointer: "/storage/temperature_c", unit: "degC", validHas: tempValid},
		{name: "glycerol medium cold", body: medium(`"liquid":"glycerol","temperature_c":-20`), status: 422, pointer: "/medium/temperature_c", unit: "degC", validHas: tempValid},
		{name: "glycerol medium hot", body: medium(`"liquid":"glycerol","temperature_c":200`), status: 422, pointer: "/medium/temperature_c", unit: "degC", validHas: tempValid},
		{name: "glycerol storage hot", body: baseWith(`"medium":{"liquid":"glycerol"},"storage":{"temperature_c":150}`),
			status: 422, pointer: "/storage/temperature_c", unit: "degC", validHas: tempValid},
		{name: "hexadecane frozen", body: medium(`"liquid":"hexadecane","temperature_c":5`), status: 422, pointer: "/medium/temperature_c", unit: "degC", validHas: tempValid},
		{name: "oil droplets stored at -60 degC", body: `{"symptom":"creaming","particles":{"material":"soybean_oil","diameter_nm":1400},"storage":{"temperature_c":-60}}`,
			status: 422, pointer: "/storage/temperature_c", unit: "degC", validHas: tempValid},
		{name: "oil droplets in water at -60 degC", body: `{"symptom":"creaming","particles":{"material":"soybean_oil","diameter_nm":1400},"medium":{"temperature_c":-60}}`,
			status: 422, pointer: "/medium/temperature_c", unit: "degC", validHas: tempValid},
		{name: "silica in glycerol stored at 200 degC", body: `{"symptom":"settling","particles":{"material":"silica_amorphous","diameter_nm":1400},"medium":{"liquid":"glycerol"},"storage":{"temperature_c":200}}`,
			status: 422, pointer: "/storage/temperature_c", unit: "degC", validHas: tempValid},
		{name: "temperature below absolute zero", body: medium(`"temperature_c":-300`), status: 422, pointer: "/medium/temperature_c", unit: "degC"},

		// Names that are not in the library or the salt parser.
		{name: "unknown salt", body: el(`"formula":"XyZ","concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0/formula"},
		{name: "unknown constraint", body: baseWith(`"constraints":["medium.colour"]`), status: 422, pointer: "/constraints/0"},
		{name: "unbalanced salt", body: el(`"formula":"NaCl2","concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0/formula"},
		{name: "salt in lower case", body: el(`"formula":"nacl","concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0/formula"},
		{name: "salt not in lowest terms", body: el(`"formula":"Na2Cl2","concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0/formula"},
		{name: "salt with space", body: el(`"formula":"Na Cl","concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0/formula"},
		{name: "salt with neither formula nor valences", body: el(`"concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0"},
		{name: "salt with formula and valences", body: el(`"formula":"NaCl","cation_valence":1,"anion_valence":1,"concentration_mM":1`),
			status: 422, pointer: "/medium/electrolytes/0"},
		{name: "salt with one valence", body: el(`"cation_valence":2,"concentration_mM":1`), status: 422, pointer: "/medium/electrolytes/0"},
		{name: "unknown material", body: particles(`"diameter_nm":2500,"material":"unobtainium"`), status: 422, pointer: "/particles/material"},
		{name: "material in capitals", body: particles(`"diameter_nm":2500,"material":"Titania_Rutile"`), status: 422, pointer: "/particles/material"},
		{name: "unknown liquid", body: medium(`"liquid":"mercury"`), status: 422, pointer: "/medium/liquid"},
		{name: "liquid in capitals", body: medium(`"liquid":"Water"`), status: 422, pointer: "/medium/liquid"},

		// Body limits: 256 KiB on the single-sample routes.
		{name: "huge sample id", body: baseWith(`"sample_id":"` + strings.Repeat("x", 300<<10) + `"`), status: 413},
		{name: "huge whitespace padding", body: base + strings.Repeat(" ", 300<<10), status: 413},
		{name: "huge scales body", path: "/v1/scales", body: baseWith(`"sample_id":"` + strings.Repeat("x", 300<<10) + `"`), status: 413},
		{name: "huge profile body", path: "/v1/interaction-profile", body: baseWith(`"sample_id":"` + strings.Repeat("x", 300<<10) + `"`), status: 413},

		// Deep nesting: encoding/json stops at 10,000 levels; all of these
		// must be refused quickly (see TestDeepNestingIsFast).
		{name: "10000 nested arrays in a field", body: baseWith(`"sample_id":` + nested("[", "", "]", 10000)), status: 400},
		{name: "10000 nested objects in a field", body: baseWith(`"sample_id":` + nested(`{"a":`, "1", "}", 10000)), status: 400},
		{name: "10000 nested arrays as body", body: nested("[", "", "]", 10000), status: 400},
		{name: "100000 nested arrays as body", body: nested("[", "", "]", 100000), status: 400},
		{name: "10000 nested arrays unclosed", body: baseWith(`"x":`) + strings.Repeat("[", 10000), status: 400},
		{name: "deep nesting in unknown field", body: baseWith(`"extra":` + nested("[", "", "]", 10000)), status: 400},

		// Media types: only application/json (any parameters, any case).
		{name: "text/plain", contentType: "text/plain", body: base, status: 415},
		{name: "no content type", contentType: "-", body: base, status: 415},
		{name: "form", contentType: "application/x-www-form-urlencoded", body: "symptom=settling", status: 415},
		{name: "multipart", contentType: "multipart/form-data; boundary=x", body: "--x--", status: 415},
		{name: "xml", contentType: "application/xml", body: "<sample/>", status: 415},
		{name: "text/json", contentType: "text/json", body: base, status: 415},
		{name: "problem+json", contentType: "application/problem+json", body: base, status: 415},
		{name: "merge-patch+json", contentType: "application/merge-patch+json", body: base, status: 415},
		{name: "malformed media type", contentType: "application/json;;", body: base, status: 415},
		{name: "ndjson on the single route", contentType: "application/x-ndjson", body: base, status: 415},

		// Methods: 405 with Allow (RFC 9110 §15.5.6).
		{name: "GET triage", method: http.MethodGet, status: 405},
		{name: "PUT triage", method: http.MethodPut, body: base, status: 405},
		{name: "DELETE triage", method: http.MethodDelete, status: 405},
		{name: "PATCH triage", method: http.MethodPatch, body: base, status: 405},
		{name: "GET scales", method: http.MethodGet, path: "/v1/scales", status: 405},
		{name: "GET batch", method: http.MethodGet, path: "/v1/triage/batch", status: 405},
		{name: "POST catalog", path: "/v1/catalog", body: base, status: 405},
		{name: "POST healthz", path: "/healthz", body: base, status: 405},

		// The other single-sample routes share the decoder and validator.
		{name: "scales malformed", path: "/v1/scales", body: "{", status: 400},
		{name: "scales text/plain", path: "/v1/scales", contentType: "text/plain", body: base, status: 415},
		{name: "scales no diameter", path: "/v1/scales", body: `{"particles":{"density_kg_m3":4200}}`, status: 422, pointer: "/particles/diameter_nm"},
		{name: "scales out of range", path: "/v1/scales", body: particles(`"diameter_nm":2500,"density_kg_m3":4200,"volume_fraction":0.9`),
			status: 422, pointer: "/particles/volume_fraction", unit: "1", validHas: []string{"0 < value < 0.74"}},
		{name: "scales unknown liquid", path: "/v1/scales", body: medium(`"liquid":"mercury"`), status: 422, pointer: "/medium/liquid"},
		{name: "scales glycerol hot", path: "/v1/scales", body: medium(`"liquid":"glycerol","temperature_c":200`), status: 422, pointer: "/medium/temperature_c", unit: "degC"},
		{name: "profile malformed", path: "/v1/interaction-profile", body: "[", status: 400},
		{name: "profile text/plain", path: "/v1/interaction-profile", contentType: "text/plain", body: base, status: 415},
		{name: "profile points too few", path: "/v1/interaction-profile?points=1", body: baseWith(`"particles":{"diameter_nm":100,"density_kg_m3":2000,"zeta_mV":-40}`),
			status: 400, pointer: "?points"},
		{name: "profile points too many", path: "/v1/interaction-profile?points=100000", body: base, status: 400, pointer: "?points"},
		{name: "profile points not a number", path: "/v1/interaction-profile?points=abc", body: base, status: 400, pointer: "?points"},
		{name: "profile points fraction", path: "/v1/interaction-profile?points=20.5", body: base, status: 400, pointer: "?points"},
		{name: "profile negative diameter", path: "/v1/interaction-profile", body: particles(`"diameter_nm":-1,"density_kg_m3":4200,"zeta_mV":-40`),
			status: 422, pointer: "/particles/diameter_nm", unit: "nm"},
		{name: "batch malformed", path: "/v1/triage/batch", body: `{"samples":[`, status: 400},
		{name: "batch text/plain", path: "/v1/triage/batch", contentType: "text/plain", body: `{"samples":[]}`, status: 415},
		{name: "batch without samples", path: "/v1/triage/batch", body: `{}`, status: 400, pointer: "/samples"},
		{name: "batch samples as object", path: "/v1/triage/batch", body: `{"samples":{}}`, status: 400, pointer: "/samples"},
		{name: "batch unknown envelope field", path: "/v1/triage/batch", body: `{"samples":[],"sample":[]}`, status: 400},
		// Each sample is decoded on its own, so the decoder's depth limit
		// (10,000) counts from the sample; a sample nested deeper makes the
		// body unreadable.
		{name: "batch deep nesting", path: "/v1/triage/batch", body: `{"samples":[` + nested("[", "", "]", 10001) + `]}`, status: 400},
		{name: "batch too many samples", path: "/v1/triage/batch", body: `{"samples":[` + strings.TrimSuffix(strings.Repeat("{},", 5001), ",") + `]}`, status: 413},
	}
	return cases
}

// checkProblem checks that rec is the refusal c asks for.
func checkProblem(t *testing.T, rec *httptest.ResponseRecorder, c badCase) {
	t.Helper()
	body := rec.Body.Bytes()
	if rec.Code >= 500 {
		t.Fatalf("status %d (a 5xx for bad input): %.300s", rec.Code, body)
	}
	if c.status != 0 && rec.Code != c.status || rec.Code < 400 {
		t.Fatalf("status %d, want %d: %.300s", rec.Code, c.status, body)
	}
	if ct := rec.Header().Get("Content-Type"); ct != problemContentType {
		t.Fatalf("Content-Type %q, want %s: %.300s", ct, problemContentType, body)
	}
	var p problemBody
	if err := json.Unmarshal(body, &p); err != nil {
		t.Fatalf("problem is not JSON: %v: %.300s", err, body)
	}
	if p.Status != rec.Code || p.Title == "" || p.Type == "" {
		t.Fatalf("problem lacks status, title or type: %.300s", body)
	}
	for _, f := range p.Errors {
		if f.Reason == "" {
			t.Errorf("field error without a reason: %+v", f)
		}
	}
	if rec.Code == http.StatusMethodNotAllowed && rec.Header().Get("Allow") == "" {
		t.Errorf("405 without an Allow header")
	}
	if c.pointer == "" && !c.root {
		return
	}
	for _, f := range p.Errors {
		if f.Pointer != c.pointer {
			continue
		}
		if c.unit != "" && f.Unit != c.unit {
			t.Errorf("%s: unit %q, want %q", f.Pointer, f.Unit, c.unit)
		}
		for _, v := range c.validHas {
			if !strings.Contains(f.Valid, v) {
				t.Errorf("%s: valid %q does not hold %q", f.Pointer, f.Valid, v)
			}
		}
		return
	}
	t.Errorf("no error names %q: %.400s", c.pointer, body)
}

func sendCase(t testing.TB, h http.Handler, c badCase) *httptest.ResponseRecorder {
	method, path, ct := c.method, c.path, c.contentType
	if method == "" {
		method = http.MethodPost
	}
	if path == "" {
		path = "/v1/triage"
	}
	switch ct {
	case "":
		ct = echo.MIMEApplicationJSON
	case "-":
		ct = ""
	}
	return do(t, h, method, path, ct, c.body)
}

func TestBadInput(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	cases := append(handBadCases(), generatedBadCases()...)
	if len(cases) < 150 {
		t.Fatalf("only %d bad requests", len(cases))
	}
	seen := map[string]bool{}
	for _, c := range cases {
		if seen[c.name] {
			t.Fatalf("two cases named %q", c.name)
		}
		seen[c.name] = true
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			checkProblem(t, sendCase(t, h, c), c)
		})
	}
}

// TestBadInputCoversEveryField: the generated cases reach every bounded
// numeric field of the contract, below and above its range.
func TestBadInputCoversEveryField(t *testing.T) {
	t.Parallel()
	want := 0
	for _, f := range sampleFields() {
		if f.numeric() {
			want++
		}
	}
	got := 0
	for _, c := range generatedBadCases() {
		if strings.HasPrefix(c.name, "out of range ") {
			got++
		}
	}
	if want < 40 || got != 2*want {
		t.Errorf("%d numeric fields, %d out-of-range cases", want, got)
	}
}

// TestDeepNestingIsFast: a body of 100,000 nested arrays is refused in
// well under a second, so that nesting cannot tie up a worker.
func TestDeepNestingIsFast(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for _, body := range []string{nested("[", "", "]", 100000), baseWith(`"sample_id":` + nested(`{"a":`, "1", "}", 20000))} {
		start := time.Now()
		rec := do(t, h, http.MethodPost, "/v1/triage", echo.MIMEApplicationJSON, body)
		if d := time.Since(start); rec.Code != 400 || d > time.Second {
			t.Errorf("status %d after %v", rec.Code, d)
		}
	}
}

// chunkedReader hides the length of a body, as a client that streams it
// with Transfer-Encoding: chunked does.
type chunkedReader struct{ r io.Reader }

func (c chunkedReader) Read(p []byte) (int, error) { return c.r.Read(p) }

// TestBodyLimitsPerRoute: every POST route refuses a body over its limit
// with 413, whether or not the client declared the length.
func TestBodyLimitsPerRoute(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	over := baseWith(`"sample_id":"` + strings.Repeat("x", 257_000) + `"`)
	// echo reads "256K" as 256,000 bytes (gommon/bytes: K = 1000).
	under := baseWith(`"sample_id":"x"`) + strings.Repeat(" ", 255_000)
	batchOver := `{"samples":[` + over + `],"x":"` + strings.Repeat("y", 64<<20) + `"}`
	cases := []struct {
		name, path, body string
		chunked          bool
		status           int
	}{
		{"triage over", "/v1/triage", over, false, 413},
		{"triage under", "/v1/triage", under, false, 200},
		{"triage over chunked", "/v1/triage", over, true, 413},
		{"scales over chunked", "/v1/scales", over, true, 413},
		{"profile over chunked", "/v1/interaction-profile", over, true, 413},
		// The batch route takes 64 MiB; a sample of 300 KiB fits.
		{"batch over single limit", "/v1/triage/batch", `{"samples":[` + over + `]}`, false, 200},
		{"batch over", "/v1/triage/batch", batchOver, false, 413},
		{"batch over chunked", "/v1/triage/batch", batchOver, true, 413},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			var body io.Reader = strings.NewReader(c.body)
			if c.chunked {
				body = chunkedReader{body}
			}
			req := httptest.NewRequest(http.MethodPost, c.path, body)
			req.Header.Set("Content-Type", echo.MIMEApplicationJSON)
			if c.chunked && req.ContentLength != -1 {
				t.Fatalf("length %d known", req.ContentLength)
			}
			rec := httptest.NewRecorder()
			h.ServeHTTP(rec, req)
			if rec.Code != c.status {
				t.Fatalf("status %d, want %d: %.200s", rec.Code, c.status, rec.Body)
			}
			if c.status == 413 && rec.Header().Get("Content-Type") != problemContentType {
				t.Errorf("413 as %q", rec.Header().Get("Content-Type"))
			}
		})
	}
}

// TestBatchItemProblems: one bad sample of a batch fails alone, with a
// pointer into the request body, and never as a 5xx.
func TestBatchItemProblems(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	items := []struct {
		sample  string
		status  int
		pointer string
	}{
		{baseWith(""), 200, ""},
		{`{"symptom":"settling","particles":{"diameter_nm":-1,"density_kg_m3":4200}}`, 422, "/samples/1/particles/diameter_nm"},
		{`42`, 400, "/samples/2"},
		{`{"symptom":"settling","particles":{"diameter_nm":"big","density_kg_m3":4200}}`, 400, "/samples/3/particles/diameter_nm"},
		{`{"symptom":"settling","particles":{"diameter_nm":100,"material":"unobtainium"}}`, 422, "/samples/4/particles/material"},
		{baseWith(`"medium":{"liquid":"glycerol","temperature_c":200}`), 422, "/samples/5/medium/temperature_c"},
		{`null`, 400, "/samples/6"},
	}
	parts := make([]string, len(items))
	for i, it := range items {
		parts[i] = it.sample
	}
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", echo.MIMEApplicationJSON, `{"samples":[`+strings.Join(parts, ",")+`]}`)
	if rec.Code != 200 {
		t.Fatalf("status %d: %.300s", rec.Code, rec.Body)
	}
	if err := finiteJSON(rec.Body.Bytes()); err != nil {
		t.Fatal(err)
	}
	var out struct {
		Items []struct {
			Status  int      `json:"status"`
			Problem *Problem `json:"problem"`
		} `json:"items"`
	}
	if err := json.Unmarshal(rec.Body.Bytes(), &out); err != nil || len(out.Items) != len(items) {
		t.Fatalf("%v: %.300s", err, rec.Body)
	}
	for i, it := range items {
		got := out.Items[i]
		if got.Status != it.status {
			t.Errorf("item %d: status %d, want %d", i, got.Status, it.status)
			continue
		}
		if it.pointer == "" {
			continue
		}
		if got.Problem == nil || got.Problem.Title == "" || len(got.Problem.Errors) == 0 || got.Problem.Errors[0].Pointer != it.pointer {
			t.Errorf("item %d: problem %+v, want pointer %s", i, got.Problem, it.pointer)
		}
	}
}

// finiteJSON checks that data is JSON whose every number is a finite float64.
func finiteJSON(data []byte) error {
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.UseNumber()
	var v any
	if err := dec.Decode(&v); err != nil {
		return fmt.Errorf("not JSON: %v", err)
	}
	var walk func(v any, path string) error
	walk = func(v any, path string) error {
		switch x := v.(type) {
		case json.Number:
			f, err := strconv.ParseFloat(string(x), 64)
			if err != nil || math.IsInf(f, 0) || math.IsNaN(f) {
				return fmt.Errorf("%s = %s is not a finite float64", path, x)
			}
		case map[string]any:
			for k, e := range x {
				if err := walk(e, path+"/"+k); err != nil {
					return err
				}
			}
		case []any:
			for i, e := range x {
				if err := walk(e, path+"/"+strconv.Itoa(i)); err != nil {
					return err
				}
			}
		}
		return nil
	}
	return walk(v, "")
}

// extremeCase is a valid sample at an edge of the physics: it must be
// triaged with finite numbers, or refused with a clear 4xx naming a field.
type extremeCase struct {
	name, body string
	path       string // default /v1/triage
}

func handExtremeCases() []extremeCase {
	sample := func(particles, rest string) string {
		s := `{"symptom":"settling","particles":{` + particles + `}`
		if rest != "" {
			s += "," + rest
		}
		return s + "}"
	}
	tio2 := `"material":"titania_rutile","diameter_nm":2500,"zeta_mV":-45`
	cases := []extremeCase{
		{name: "1 nm", body: sample(`"diameter_nm":1,"density_kg_m3":4200,"zeta_mV":-30`, "")},
		{name: "0.5 nm", body: sample(`"diameter_nm":0.5,"density_kg_m3":4200`, "")},
		{name: "1 cm", body: sample(`"diameter_nm":1e7,"density_kg_m3":4200`, "")},
		{name: "zero zeta", body: sample(`"diameter_nm":500,"density_kg_m3":2650,"zeta_mV":0`, `"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":10}]}`)},
		{name: "zero mobility", body: sample(`"diameter_nm":500,"density_kg_m3":2650,"mobility_um_cm_per_V_s":0`, "")},
		{name: "1000 mM NaCl", body: sample(tio2, `"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":1000}]}`)},
		{name: "5000 mM NaCl", body: sample(tio2, `"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":5000}]}`)},
		{name: "5000 mM AlCl3", body: sample(tio2, `"medium":{"electrolytes":[{"formula":"AlCl3","concentration_mM":5000}]}`)},
		{name: "5000 mM ionic strength", body: sample(tio2, `"medium":{"ionic_strength_mM":5000}`)},
		{name: "zero salt", body: sample(tio2, `"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":0}]}`)},
		{name: "density matched exactly", body: sample(`"diameter_nm":2000,"density_kg_m3":1000,"zeta_mV":-30`, `"medium":{"density_kg_m3":1000}`)},
		{name: "density matched at 997.0478", body: sample(`"diameter_nm":2000,"density_kg_m3":997.0478,"zeta_mV":-30`, `"medium":{"density_kg_m3":997.0478}`)},
		{name: "lighter by 1e-9", body: sample(`"diameter_nm":2000,"density_kg_m3":999.999999999,"zeta_mV":-30`, `"medium":{"density_kg_m3":1000}`)},
		{name: "heavier by 1e-9", body: sample(`"diameter_nm":2000,"density_kg_m3":1000.000000001,"zeta_mV":-30`, `"medium":{"density_kg_m3":1000}`)},
		{name: "density matched creaming", body: `{"symptom":"creaming","particles":{"phase":"liquid","diameter_nm":2000,"density_kg_m3":1000},"medium":{"density_kg_m3":1000}}`},
		{name: "shelf life 1 day", body: sample(tio2, `"storage":{"shelf_life_days":1}`)},
		{name: "shelf life 100 years", body: sample(tio2, `"storage":{"shelf_life_days":36500}`)},
		{name: "container 1 mm", body: sample(tio2, `"storage":{"container_height_mm":1}`)},
		{name: "container 5e-324 mm with a size span", body: sample(tio2+`,"size_span":1`, `"storage":{"container_height_mm":5e-324}`)},
		{name: "container 20 m", body: sample(tio2, `"storage":{"container_height_mm":20000}`)},
		{name: "hexadecane without salt", body: sample(`"material":"silica_amorphous","diameter_nm":300`, `"medium":{"liquid":"hexadecane"}`)},
		{name: "toluene without salt", body: `{"symptom":"flocculation","particles":{"material":"carbon_black","diameter_nm":100,"zeta_mV":-30},"medium":{"liquid":"toluene"}}`},
		{name: "mineral oil with salt", body: sample(`"material":"silica_amorphous","diameter_nm":300,"zeta_mV":-30`, `"medium":{"liquid":"white_mineral_oil","electrolytes":[{"formula":"NaCl","concentration_mM":1}]}`)},
		{name: "pH 0", body: sample(`"material":"alumina","diameter_nm":300`, `"medium":{"ph":0}`)},
		{name: "pH 14", body: sample(`"material":"alumina","diameter_nm":300`, `"medium":{"ph":14}`)},
		{name: "pH at IEP", body: sample(`"diameter_nm":300,"density_kg_m3":3950,"isoelectric_ph":9`, `"medium":{"ph":9}`)},
		{name: "droplets without emulsifier creaming", body: `{"symptom":"creaming","particles":{"material":"soybean_oil","phase":"liquid","diameter_nm":5000,"volume_fraction":0.2}}`},
		{name: "droplets without emulsifier growth", body: `{"symptom":"size_growth","particles":{"material":"hexadecane","phase":"liquid","diameter_nm":300}}`},
		{name: "droplets without emulsifier separating", body: `{"symptom":"phase_separation","particles":{"material":"mct_oil","phase":"liquid","diameter_nm":1000,"volume_fraction":0.3}}`},
		{name: "bubbles", body: `{"symptom":"creaming","particles":{"phase":"gas","diameter_nm":50000,"density_kg_m3":1.2}}`},
		{name: "random close packing", body: sample(`"diameter_nm":1000,"density_kg_m3":2650,"volume_fraction":0.64`, "")},
		{name: "above random close packing", body: `{"symptom":"viscosity_rise","particles":{"diameter_nm":1000,"density_kg_m3":2650,"volume_fraction":0.7}}`},
		{name: "just below close packing", body: sample(`"diameter_nm":1000,"density_kg_m3":2650,"volume_fraction":0.7399999`, "")},
		{name: "wide distribution near packing", body: sample(`"diameter_nm":1000,"size_span":5,"density_kg_m3":2650,"volume_fraction":0.73`, "")},
		{name: "glycerol at 0 degC", body: sample(tio2, `"medium":{"liquid":"glycerol","temperature_c":0}`)},
		{name: "glycerol at 110 degC", body: sample(tio2, `"medium":{"liquid":"glycerol","temperature_c":110}`)},
		{name: "water at -10 degC", body: sample(tio2, `"medium":{"temperature_c":-10}`)},
		{name: "water stored at 110 degC", body: sample(tio2, `"storage":{"temperature_c":110}`)},
		{name: "viscosity 1e7 mPa s", body: sample(tio2, `"medium":{"viscosity_mPa_s":1e7}`)},
		{name: "viscosity 0.1 mPa s", body: sample(tio2, `"medium":{"viscosity_mPa_s":0.1}`)},
		{name: "shear 1e7 per s", body: `{"symptom":"flocculation","particles":{"material":"silica_amorphous","diameter_nm":2000,"zeta_mV":-5},"storage":{"shear_rate_per_s":1e7}}`},
		{name: "thick steric layer", body: sample(tio2, `"stabilizer":{"layer_thickness_nm":1000,"solvent_quality":"poor"}`)},
		{name: "cloud point below storage", body: sample(tio2, `"stabilizer":{"layer_thickness_nm":10,"cloud_point_c":-20},"storage":{"temperature_c":60}`)},
		{name: "free polymer of 1e-300 kg/mol", body: sample(tio2, `"medium":{"free_polymer":{"concentration_g_L":250,"molar_mass_kg_mol":1e-300}}`)},
		{name: "free polymer at 500 g/L", body: sample(tio2, `"medium":{"free_polymer":{"concentration_g_L":500,"radius_of_gyration_nm":1000,"molar_mass_kg_mol":100000}}`)},
		{name: "adsorbing polymer full coverage", body: `{"symptom":"flocculation","particles":{"material":"kaolinite","diameter_nm":500},"stabilizer":{"adsorbing_polymer":{"molar_mass_kg_mol":100000,"surface_coverage":1}}}`},
		{name: "adsorbing polymer bare", body: `{"symptom":"flocculation","particles":{"material":"kaolinite","diameter_nm":500},"stabilizer":{"adsorbing_polymer":{"molar_mass_kg_mol":1e-9,"surface_coverage":0}}}`},
		{name: "observation extremes", body: sample(tio2, `"observation":{"age_days":36500,"clear_layer_mm":20000,"sediment_redisperses":false,"viscosity_change_percent":100000,"size_growth_percent":100000}`)},
		{name: "observation clear layer 0", body: sample(tio2, `"observation":{"age_days":1e-9,"clear_layer_mm":0}`)},
		{name: "criteria extremes", body: sample(tio2, `"criteria":{"min_barrier_kT":200,"half_life_to_shelf_life":1e6,"max_relative_viscosity":1.0000001,"max_steric_contact_kT":1e-9}`)},
		{name: "retarded constant potential", body: sample(tio2, `"models":{"van_der_waals":"retarded_gregory","double_layer":"constant_potential"}`)},
		{name: "hundred size classes", body: `{"symptom":"settling","particles":{"density_kg_m3":2650,"size_distribution":[` +
			strings.TrimSuffix(strings.Repeat(`{"diameter_nm":1e7,"volume_fraction":1},{"diameter_nm":0.5,"volume_fraction":1e-300},`, 50), ",") + `]}}`},
		{name: "content type with charset", body: sample(tio2, "")},
		// JSON has one number type, and JSON Schema 2020-12 counts 2.0 as an
		// integer; OpenAPI 3.0 leaves it open, so a clear 400 is accepted.
		{name: "valence written 2.0", body: sample(tio2, `"medium":{"electrolytes":[{"cation_valence":2.0,"anion_valence":1,"concentration_mM":1}]}`)},
		{name: "scales at 5000 mM", path: "/v1/scales", body: sample(tio2, `"medium":{"ionic_strength_mM":5000}`)},
		{name: "profile at 5000 mM", path: "/v1/interaction-profile", body: sample(tio2, `"medium":{"ionic_strength_mM":5000}`)},
		{name: "profile without salt in oil", path: "/v1/interaction-profile", body: sample(`"material":"silica_amorphous","diameter_nm":300,"zeta_mV":-30`, `"medium":{"liquid":"toluene"}`)},
		{name: "profile 1 nm", path: "/v1/interaction-profile?points=2000", body: sample(`"diameter_nm":1,"density_kg_m3":4200,"zeta_mV":-30`, "")},
		{name: "profile 1 cm", path: "/v1/interaction-profile", body: sample(`"diameter_nm":1e7,"density_kg_m3":4200,"zeta_mV":-300,"hamaker_zJ":1000`, "")},
	}
	for _, s := range []string{"settling", "caking", "creaming", "flocculation", "viscosity_rise", "size_growth", "phase_separation"} {
		cases = append(cases,
			extremeCase{name: "symptom " + s, body: `{"symptom":"` + s + `","particles":{` + tio2 + `,"volume_fraction":0.3}}`},
			extremeCase{name: "symptom " + s + " of droplets", body: `{"symptom":"` + s + `","particles":{"material":"soybean_oil","phase":"liquid","diameter_nm":800}}`},
			extremeCase{name: "symptom " + s + " bare", body: `{"symptom":"` + s + `","particles":{"diameter_nm":100,"density_kg_m3":1050}}`})
	}
	return cases
}

// generatedExtremeCases sets every bounded numeric field, one at a time, to
// its minimum, its maximum (the bound itself, or the nearest float inside
// an exclusive one) and 1e-320 where that is valid.
func generatedExtremeCases() []extremeCase {
	var cases []extremeCase
	for _, f := range sampleFields() {
		if !f.numeric() {
			continue
		}
		b := boundsOf(f.field)
		isInt := baseKind(f.field.Type) == reflect.Int
		lo, hi := any(b.loValue), any(b.hiValue)
		if isInt {
			lo, hi = int(b.loValue), int(b.hiValue)
		} else {
			if !b.loIncl {
				lo = math.Nextafter(b.loValue, math.Inf(1))
			}
			if !b.hiIncl {
				hi = math.Nextafter(b.hiValue, math.Inf(-1))
			}
		}
		vals := []any{lo, hi}
		if !isInt && 1e-320 > b.loValue && 1e-320 < b.hiValue {
			vals = append(vals, 1e-320)
		}
		for _, v := range vals {
			name := f.pointer + "=" + formatNumber(v)
			cases = append(cases, extremeCase{name: name, body: bodyWith(f, v)})
		}
	}
	return cases
}

// checkExtreme accepts a 200 whose every number is finite, or a clear 4xx
// problem naming at least one field; it logs which of the two it was.
func checkExtreme(t *testing.T, rec *httptest.ResponseRecorder) {
	t.Helper()
	body := rec.Body.Bytes()
	switch {
	case rec.Code == http.StatusOK:
		if strings.HasPrefix(rec.Header().Get("Content-Type"), "image/svg+xml") {
			return
		}
		if err := finiteJSON(body); err != nil {
			t.Fatal(err)
		}
	case rec.Code >= 400 && rec.Code < 500:
		var p problemBody
		if err := json.Unmarshal(body, &p); err != nil || p.Title == "" || len(p.Errors) == 0 ||
			rec.Header().Get("Content-Type") != problemContentType {
			t.Fatalf("unclear %d: %.400s", rec.Code, body)
		}
		for _, f := range p.Errors {
			if f.Reason == "" {
				t.Fatalf("field error without a reason: %.400s", body)
			}
		}
		t.Logf("refused %d: %.300s", rec.Code, body)
	default:
		t.Fatalf("status %d: %.400s", rec.Code, body)
	}
}

func TestExtremeInput(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	cases := append(handExtremeCases(), generatedExtremeCases()...)
	seen := map[string]bool{}
	for _, c := range cases {
		if seen[c.name] {
			t.Fatalf("two cases named %q", c.name)
		}
		seen[c.name] = true
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			path := c.path
			if path == "" {
				path = "/v1/triage"
			}
			ct := echo.MIMEApplicationJSON
			if c.name == "content type with charset" {
				ct = "Application/JSON; charset=utf-8"
			}
			checkExtreme(t, do(t, h, http.MethodPost, path, ct, c.body))
		})
	}
}

// TestExtremeInputSVG: the chart of an extreme profile renders.
func TestExtremeInputSVG(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for _, body := range []string{
		`{"particles":{"diameter_nm":1,"density_kg_m3":4200,"zeta_mV":-300},"medium":{"ionic_strength_mM":5000}}`,
		`{"particles":{"diameter_nm":1e7,"density_kg_m3":4200,"zeta_mV":300,"hamaker_zJ":0}}`,
		`{"particles":{"diameter_nm":100,"density_kg_m3":4200,"zeta_mV":-1e-320}}`,
	} {
		rec := do(t, h, http.MethodPost, "/v1/interaction-profile", echo.MIMEApplicationJSON, body, "Accept", svgContentType)
		if rec.Code >= 500 || (rec.Code == 200 && !bytes.Contains(rec.Body.Bytes(), []byte("<svg"))) ||
			bytes.Contains(rec.Body.Bytes(), []byte("NaN")) || bytes.Contains(rec.Body.Bytes(), []byte("Inf")) {
			t.Errorf("%s: %d %.200s", body, rec.Code, rec.Body)
		}
	}
}

// TestRecoverPanic: a handler that panics behind the service's middleware
// answers a 500 problem detail that leaks nothing, the access log records
// it at error level, and the server goes on serving. http.ErrAbortHandler
// is passed on, as net/http expects.
func TestRecoverPanic(t *testing.T) {
	t.Parallel()
	var logBuf bytes.Buffer
	e := New(testEngine(t), Config{Logger: zerolog.New(&logBuf)})
	e.POST("/v1/zz-panic", func(c echo.Context) error { panic("kaboom: secret internal state") })
	e.POST("/v1/zz-panic-error", func(c echo.Context) error { panic(errors.New("kaboom error")) })
	e.POST("/v1/zz-panic-nil", func(c echo.Context) error { panic(nil) })
	for _, path := range []string{"/v1/zz-panic", "/v1/zz-panic-error", "/v1/zz-panic-nil"} {
		rec := do(t, e, http.MethodPost, path, echo.MIMEApplicationJSON, "{}")
		var p Problem
		if err := json.Unmarshal(rec.Body.Bytes(), &p); err != nil {
			t.Fatalf("%s: %v: %s", path, err, rec.Body)
		}
		if rec.Code != 500 || rec.Header().Get("Content-Type") != problemContentType || p.Type != typeInternal ||
			p.Title == "" || p.RequestID == "" || p.RequestID != rec.Header().Get(echo.HeaderXRequestID) {
			t.Errorf("%s: %d %s %s", path, rec.Code, rec.Header().Get("Content-Type"), rec.Body)
		}
		if strings.Contains(rec.Body.String(), "kaboom") || strings.Contains(rec.Body.String(), "goroutine") {
			t.Errorf("%s: internal detail leaked: %s", path, rec.Body)
		}
	}
	if rec := do(t, e, http.MethodPost, "/v1/triage", echo.MIMEApplicationJSON, demo(t, "gravity_settling.json")); rec.Code != 200 {
		t.Errorf("after the panics: %d", rec.Code)
	}
	panics := 0
	for _, line := range strings.Split(strings.TrimSpace(logBuf.String()), "\n") {
		var entry map[string]any
		if err := json.Unmarshal([]byte(line), &entry); err != nil {
			t.Fatalf("log line %q: %v", line, err)
		}
		if !strings.HasPrefix(fmt.Sprint(entry["route"]), "/v1/zz-panic") {
			continue
		}
		panics++
		if entry["level"] != "error" || entry["status"] != 500.0 || !strings.Contains(fmt.Sprint(entry["internal_error"]), "panic") {
			t.Errorf("log of a panic: %s", line)
		}
	}
	if panics != 3 {
		t.Errorf("%d log lines for 3 panics: %s", panics, logBuf.String())
	}

	abort := recoverPanic(func(echo.Context) error { panic(http.ErrAbortHandler) })
	func() {
		defer func() {
			if r := recover(); r != http.ErrAbortHandler {
				t.Errorf("recovered %v, want http.ErrAbortHandler passed on", r)
			}
		}()
		c := echo.New().NewContext(httptest.NewRequest(http.MethodGet, "/", nil), httptest.NewRecorder())
		_ = abort(c)
	}()
}

// TestLogsHoldNoBody: at info level (and below) the service logs no part of
// a request body, whether the request succeeds, is refused, or is bad JSON.
func TestLogsHoldNoBody(t *testing.T) {
	t.Parallel()
	const marker = "MARKER-7f3c9e-SECRET"
	var logBuf bytes.Buffer
	h := New(testEngine(t), Config{Logger: zerolog.New(&logBuf).Level(zerolog.DebugLevel)})
	bodies := []struct{ path, body string }{
		{"/v1/triage", baseWith(`"sample_id":"` + marker + `"`)},
		{"/v1/triage", `{"symptom":"settling","particles":{"diameter_nm":2500,"material":"` + marker + `"}}`},
		{"/v1/triage", `{"symptom":"` + marker + `"}`},
		{"/v1/triage", `{"` + marker + `":1}`},
		{"/v1/triage", `{"sample_id":"` + marker},
		{"/v1/triage", `{"symptom":"settling","particles":{"diameter_nm":"` + marker + `"}}`},
		{"/v1/scales", baseWith(`"sample_id":"` + marker + `"`)},
		{"/v1/interaction-profile", baseWith(`"sample_id":"` + marker + `"`)},
		{"/v1/triage/batch", `{"samples":[` + baseWith(`"sample_id":"`+marker+`"`) + `,{"x":"` + marker + `"}]}`},
	}
	for _, b := range bodies {
		do(t, h, http.MethodPost, b.path, echo.MIMEApplicationJSON, b.body)
	}
	if logBuf.Len() == 0 {
		t.Fatal("nothing logged")
	}
	if strings.Contains(logBuf.String(), marker) {
		t.Errorf("a request body reached the log:\n%s", logBuf.String())
	}
}

// TestLogFieldsClipped: what a client chooses (a method, a request id)
// reaches the access log clipped, so one request writes one short line.
func TestLogFieldsClipped(t *testing.T) {
	t.Parallel()
	var logBuf bytes.Buffer
	h := New(testEngine(t), Config{Logger: zerolog.New(&logBuf)})
	do(t, h, strings.Repeat("M", 32<<10), "/v1/triage", "", "")
	if logBuf.Len() > 1024 {
		t.Errorf("%d bytes logged for one request: %.200s", logBuf.Len(), logBuf.String())
	}
}

// TestRequestIDChecked: a client's X-Request-Id is kept only when it is at
// most 64 characters of [A-Za-z0-9._-]; otherwise the service makes its
// own. Either way the header, the report's request_id and the log agree.
func TestRequestIDChecked(t *testing.T) {
	t.Parallel()
	cases := []struct {
		sent string
		kept bool
	}{
		{"lims-2026.12_05-0001", true},
		{strings.Repeat("a", 64), true},
		{strings.Repeat("a", 65), false},
		{strings.Repeat("x", 60<<10), false},
		{"has space", false},
		{"<script>", false},
		{"ünïcode", false},
	}
	for _, c := range cases {
		var logBuf bytes.Buffer
		h := New(testEngine(t), Config{Logger: zerolog.New(&logBuf)})
		rec := do(t, h, http.MethodPost, "/v1/triage", echo.MIMEApplicationJSON, demo(t, "gravity_settling.json"),
			"X-Request-Id", c.sent)
		id := rec.Header().Get("X-Request-Id")
		var body struct {
			RequestID string `json:"request_id"`
		}
		var line struct {
			RequestID string `json:"request_id"`
		}
		if err := json.Unmarshal(rec.Body.Bytes(), &body); err != nil {
			t.Fatal(err)
		}
		if err := json.Unmarshal(logBuf.Bytes(), &line); err != nil {
			t.Fatal(err)
		}
		if (id == c.sent) != c.kept || len(id) == 0 || len(id) > 64 || body.RequestID != id || line.RequestID != id {
			t.Errorf("sent %.70q: header %.70q, body %.70q, log %.70q", c.sent, id, body.RequestID, line.RequestID)
		}
	}
}
