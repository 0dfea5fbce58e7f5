package library

import (
	"fmt"
	"io/fs"
	"math"
	"strconv"
	"strings"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// LiquidModel names where a liquid's properties come from.
type LiquidModel string

const (
	// LiquidTabulated interpolates the library's own tables.
	LiquidTabulated LiquidModel = "tabulated"
	// LiquidIAPWSWater uses the water functions of package physics.
	LiquidIAPWSWater LiquidModel = "iapws"
)

// Temperatures, in K, between which Liquid.Properties is defined: -60 to
// 300 °C, the range a request may state. Loading checks that every liquid's
// extrapolation stays finite and physical over this whole range.
const (
	LiquidMinTempK = 213.15
	LiquidMaxTempK = 573.15
)

// LiquidPoint is one tabulated value at temperature TempK (K), in SI units.
type LiquidPoint struct {
	TempK, Value float64
}

// LiquidTable is a property tabulated against temperature, points in
// strictly increasing TempK, from one source.
type LiquidTable struct {
	Source string
	Points []LiquidPoint
}

// Liquid is a continuous-phase liquid of the library. Tables are in SI
// units (kg/m^3, Pa s, dimensionless); they are empty for LiquidIAPWSWater.
type Liquid struct {
	Key   string
	Name  string
	Model LiquidModel

	// MinTempK and MaxTempK bound the sourced range, in K: the density and
	// viscosity tables (or, for water, the physics fits) cover it.
	MinTempK, MaxTempK float64

	Density              LiquidTable // kg/m^3, linear in T
	Viscosity            LiquidTable // Pa s, ln(eta) linear in 1/T
	RelativePermittivity LiquidTable // linear in T; one point = constant

	RefractiveIndex SourcedValue  // n_D, not corrected for temperature
	FlashPointC     *SourcedValue // °C; nil where the liquid has none
	Aqueous         bool          // water is the continuous phase or its main part
	Flammable       bool          // flash point below 60 °C (UN GHS categories 1-3)

	// MeltingC is the melting point at 101.325 kPa, °C (the pour point for
	// oils without a sharp one). BoilingC is the normal boiling point, °C;
	// nil where the liquid decomposes or has none below the request range.
	// SupercoolsToC, for liquids that in practice stay liquid far below
	// their melting point and set to a glass rather than crystallise, is
	// the lowest temperature at which they are still taken as liquid, °C.
	MeltingC      SourcedValue
	BoilingC      *SourcedValue
	SupercoolsToC *SourcedValue

	Notes string
}

// LowestLiquidK returns the lowest temperature, in K, at which the library
// takes the pure liquid to be liquid: SupercoolsToC where given, else its
// melting point.
func (l Liquid) LowestLiquidK() float64 {
	if l.SupercoolsToC != nil {
		return physics.Kelvin(l.SupercoolsToC.Value)
	}
	return physics.Kelvin(l.MeltingC.Value)
}

// BoilingK returns the normal boiling point, in K, or +Inf where the
// liquid has none (BoilingC nil).
func (l Liquid) BoilingK() float64 {
	if l.BoilingC == nil {
		return math.Inf(1)
	}
	return physics.Kelvin(l.BoilingC.Value)
}

// LiquidProperties are a liquid's properties at one temperature, in SI units.
type LiquidProperties struct {
	Density              float64 // kg/m^3
	Viscosity            float64 // Pa s
	RelativePermittivity float64
	RefractiveIndex      float64
	InSourcedRange       bool // false: some values are extrapolated
}

// Properties returns the liquid's properties at tempK (K) and human-readable
// notes on how each was obtained, for a report's assumptions.
//
// Water (LiquidIAPWSWater) uses physics.WaterDensity (Kell 1975),
// physics.WaterViscosity (IAPWS R12-08) and physics.WaterPermittivity
// (Malmberg & Maryott 1956). Other liquids interpolate their tables: density
// and permittivity linearly in T, viscosity with ln(eta) linear in 1/T, the
// Andrade form eta = A exp(B/T) fitted through each pair of neighbouring
// points (E. N. da C. Andrade, "The viscosity of liquids", Nature 125, 309,
// 1930). A table point is returned exactly, and between points the value is
// monotone. Outside the sourced range (and, for water, outside 0-100 °C) the
// end segment is extended the same way, InSourcedRange is false and a note
// says so.
//
// It panics unless LiquidMinTempK <= tempK <= LiquidMaxTempK (including
// NaN): callers validate the request temperature first.
func (l Liquid) Properties(tempK float64) (LiquidProperties, []string) {
	if !(tempK >= LiquidMinTempK && tempK <= LiquidMaxTempK) {
		panic("library: Liquid.Properties needs LiquidMinTempK <= tempK <= LiquidMaxTempK")
	}
	p := LiquidProperties{
		RefractiveIndex: l.RefractiveIndex.Value,
		InSourcedRange:  tempK >= l.MinTempK && tempK <= l.MaxTempK,
	}
	at := celsiusText(tempK)
	notes := make([]string, 0, 5)
	if !p.InSourcedRange {
		notes = append(notes, fmt.Sprintf("%s at %s is OUTSIDE its sourced range %s to %s: its properties are extrapolated",
			l.Name, at, celsiusText(l.MinTempK), celsiusText(l.MaxTempK)))
	}
	if l.Model == LiquidIAPWSWater {
		p.Density, p.Viscosity, p.RelativePermittivity = waterProperties(tempK)
		how := "density Kell 1975 (J. Chem. Eng. Data 20, 97), viscosity IAPWS R12-08 (Huber et al. 2009), " +
			"relative permittivity Malmberg & Maryott 1956 (J. Res. NBS 56, 1)"
		if !p.InSourcedRange {
			how += ", each extended beyond 0-100 °C along its last 10 K (density and permittivity linear in T, ln(viscosity) linear in 1/T)"
		}
		notes = append(notes, l.Name+" at "+at+": "+how)
	} else {
		var use tableUse
		p.Density, use = l.Density.at(tempK, false)
		notes = append(notes, l.Density.note("density", l.Name, tempK, use))
		p.Viscosity, use = l.Viscosity.at(tempK, true)
		notes = append(notes, l.Viscosity.note("viscosity", l.Name, tempK, use))
		p.RelativePermittivity, use = l.RelativePermittivity.at(tempK, false)
		notes = append(notes, l.RelativePermittivity.note("relative permittivity", l.Name, tempK, use))
	}
	notes = append(notes, "refractive index of "+l.Name+" "+number.Shortest(l.RefractiveIndex.Value)+
		", not corrected for temperature; source: "+l.RefractiveIndex.Source)
	return p, notes
}

// waterSpanK is the span at the ends of the water fits whose secant carries
// them beyond 0-100 °C.
const waterSpanK = 10

func waterProperties(tempK float64) (density, viscosity, permittivity float64) {
	lo, hi := physics.WaterMinTempK, physics.WaterMaxTempK
	if tempK >= lo && tempK <= hi {
		return physics.WaterDensity(tempK), physics.WaterViscosity(tempK), physics.WaterPermittivity(tempK)
	}
	edge, inner := lo, lo+waterSpanK
	if tempK > hi {
		edge, inner = hi, hi-waterSpanK
	}
	extend := func(f func(float64) float64, andrade bool) float64 {
		return interpolatePoints(LiquidPoint{edge, f(edge)}, LiquidPoint{inner, f(inner)}, tempK, andrade)
	}
	return extend(physics.WaterDensity, false), extend(physics.WaterViscosity, true), extend(physics.WaterPermittivity, false)
}

// tableUse says how a table produced a value.
type tableUse int

const (
	useTabulated tableUse = iota
	useInterpolated
	useExtrapolated
	useSinglePoint
)

// at evaluates the table at tempK: linearly in T, or with ln(value) linear
// in 1/T when andrade is set; beyond the ends the end segment is extended.
func (t LiquidTable) at(tempK float64, andrade bool) (float64, tableUse) {
	pts := t.Points
	if len(pts) == 1 {
		return pts[0].Value, useSinglePoint
	}
	i := 0
	for i < len(pts)-2 && tempK > pts[i+1].TempK {
		i++
	}
	a, b := pts[i], pts[i+1]
	switch {
	case tempK == a.TempK:
		return a.Value, useTabulated
	case tempK == b.TempK:
		return b.Value, useTabulated
	case tempK < pts[0].TempK || tempK > pts[len(pts)-1].TempK:
		return interpolatePoints(a, b, tempK, andrade), useExtrapolated
	}
	return interpolatePoints(a, b, tempK, andrade), useInterpolated
}

// interpolate passes a straight line through a and b, in (T, value) or, for
// andrade, in (1/T, ln value), and evaluates it at tempK. Written as a
// weighted mean so that f = 0 and f = 1 give a and b without rounding.
func interpolatePoints(a, b LiquidPoint, tempK float64, andrade bool) float64 {
	if !andrade {
		f := (tempK - a.TempK) / (b.TempK - a.TempK)
		return a.Value*(1-f) + b.Value*f
	}
	f := (1/tempK - 1/a.TempK) / (1/b.TempK - 1/a.TempK)
	return math.Exp(math.Log(a.Value)*(1-f) + math.Log(b.Value)*f)
}

func (t LiquidTable) note(property, liquid string, tempK float64, use tableUse) string {
	at := celsiusText(tempK)
	rule := "linearly in temperature"
	if property == "viscosity" {
		rule = "with ln(viscosity) linear in 1/T (Andrade 1930)"
	}
	first, last := t.Points[0].TempK, t.Points[len(t.Points)-1].TempK
	var how string
	switch use {
	case useTabulated:
		how = "tabulated value"
	case useInterpolated:
		how = "interpolated " + rule + " between tabulated points"
	case useExtrapolated:
		how = fmt.Sprintf("EXTRAPOLATED %s beyond the tabulated %s to %s", rule, celsiusText(first), celsiusText(last))
	case useSinglePoint:
		how = fmt.Sprintf("the value at %s used at every temperature (its temperature dependence is not tabulated)", celsiusText(first))
	}
	return property + " of " + liquid + " at " + at + ": " + how + "; source: " + t.Source
}

// celsiusText prints a temperature in °C to 0.01 K, without trailing zeros.
func celsiusText(tempK float64) string {
	c := math.Round((tempK-physics.CelsiusZero)*100)/100 + 0 // + 0 turns -0 into 0
	return strconv.FormatFloat(c, 'f', -1, 64) + " °C"
}

// LiquidListing is one liquid of a Listing. For water the points are
// computed from the physics fits and the sources name them.
type LiquidListing struct {
	Key                string                    `json:"key"`
	Name               string                    `json:"name"`
	Model              LiquidModel               `json:"model"`
	MinTemperatureC    float64                   `json:"min_temperature_c"`
	MaxTemperatureC    float64                   `json:"max_temperature_c"`
	DensitySource      string                    `json:"density_source"`
	DensityPoints      []LiquidDensityPoint      `json:"density_points"`
	ViscositySource    string                    `json:"viscosity_source"`
	ViscosityPoints    []LiquidViscosityPoint    `json:"viscosity_points"`
	PermittivitySource string                    `json:"relative_permittivity_source"`
	PermittivityPoints []LiquidPermittivityPoint `json:"relative_permittivity_points"`
	RefractiveIndex    SourcedValue              `json:"refractive_index"`
	FlashPointC        *SourcedValue             `json:"flash_point_c,omitempty"`
	MeltingC           SourcedValue              `json:"melting_c"`
	BoilingC           *SourcedValue             `json:"boiling_c,omitempty"`
	SupercoolsToC      *SourcedValue             `json:"supercools_to_c,omitempty"`
	Aqueous            bool                      `json:"aqueous"`
	Flammable          bool                      `json:"flammable"`
	Notes              string                    `json:"notes,omitempty"`
}

// LiquidDensityPoint is one density point of a LiquidListing.
type LiquidDensityPoint struct {
	TemperatureC float64 `json:"temperature_c"`
	DensityKgM3  float64 `json:"density_kg_m3"`
}

// LiquidViscosityPoint is one viscosity point of a LiquidListing.
type LiquidViscosityPoint struct {
	TemperatureC  float64 `json:"temperature_c"`
	ViscosityMPaS float64 `json:"viscosity_mPa_s"`
}

// LiquidPermittivityPoint is one permittivity point of a LiquidListing.
type LiquidPermittivityPoint struct {
	TemperatureC         float64 `json:"temperature_c"`
	RelativePermittivity float64 `json:"relative_permittivity"`
}

// waterListingC are the temperatures, °C, at which the listing shows water.
var waterListingC = []float64{0, 10, 20, 25, 30, 40, 50, 60, 70, 80, 90, 100}

func (l Liquid) listing() LiquidListing {
	out := LiquidListing{
		Key: l.Key, Name: l.Name, Model: l.Model,
		MinTemperatureC: number.Round(l.MinTempK-physics.CelsiusZero, listingDigits),
		MaxTemperatureC: number.Round(l.MaxTempK-physics.CelsiusZero, listingDigits),
		DensitySource:   l.Density.Source, ViscositySource: l.Viscosity.Source,
		PermittivitySource: l.RelativePermittivity.Source,
		RefractiveIndex:    l.RefractiveIndex, FlashPointC: copySourced(l.FlashPointC),
		MeltingC: l.MeltingC, BoilingC: copySourced(l.BoilingC), SupercoolsToC: copySourced(l.SupercoolsToC),
		Aqueous: l.Aqueous, Flammable: l.Flammable, Notes: l.Notes,
	}
	density, viscosity, permittivity := l.Density.Points, l.Viscosity.Points, l.RelativePermittivity.Points
	if l.Model == LiquidIAPWSWater {
		out.DensitySource = "Kell 1975, J. Chem. Eng. Data 20, 97 (physics.WaterDensity)"
		out.ViscositySource = "IAPWS R12-08; Huber et al. 2009, J. Phys. Chem. Ref. Data 38, 101 (physics.WaterViscosity)"
		out.PermittivitySource = "Malmberg & Maryott 1956, J. Res. NBS 56, 1 (physics.WaterPermittivity)"
		density, viscosity, permittivity = nil, nil, nil
		for _, c := range waterListingC {
			k := physics.Kelvin(c)
			rho, eta, eps := waterProperties(k)
			density = append(density, LiquidPoint{k, number.Round(rho, 7)})
			viscosity = append(viscosity, LiquidPoint{k, number.Round(eta, 5)})
			permittivity = append(permittivity, LiquidPoint{k, number.Round(eps, 5)})
		}
	}
	out.DensityPoints = make([]LiquidDensityPoint, len(density))
	for i, p := range density {
		out.DensityPoints[i] = LiquidDensityPoint{number.Round(p.TempK-physics.CelsiusZero, listingDigits), number.Round(p.Value, listingDigits)}
	}
	out.ViscosityPoints = make([]LiquidViscosityPoint, len(viscosity))
	for i, p := range viscosity {
		out.ViscosityPoints[i] = LiquidViscosityPoint{number.Round(p.TempK-physics.CelsiusZero, listingDigits), number.Round(p.Value*1e3, listingDigits)}
	}
	out.PermittivityPoints = make([]LiquidPermittivityPoint, len(permittivity))
	for i, p := range permittivity {
		out.PermittivityPoints[i] = LiquidPermittivityPoint{number.Round(p.TempK-physics.CelsiusZero, listingDigits), number.Round(p.Value, listingDigits)}
	}
	return out
}

// Physical ranges of liquid tables, in file units.
const (
	minViscosityMPaS, maxViscosityMPaS = 0.01, 1e9
	minFlashPointC, maxFlashPointC     = -60.0, 400.0
	minPhaseC, maxPhaseC               = -200.0, 400.0 // melting, boiling and glass points
	flammableBelowC                    = 60.0          // UN GHS, chapter 2.6: categories 1-3
)

type liquidsFileYAML struct {
	Liquids []liquidYAML `yaml:"liquids"`
}

type liquidYAML struct {
	Key                  yamlText                          `yaml:"key"`
	Name                 yamlText                          `yaml:"name"`
	Model                yamlText                          `yaml:"model"`
	MinC                 yamlNumber                        `yaml:"min_c"`
	MaxC                 yamlNumber                        `yaml:"max_c"`
	Density              *yamlTable[densityPointYAML]      `yaml:"density"`
	Viscosity            *yamlTable[viscosityPointYAML]    `yaml:"viscosity"`
	RelativePermittivity *yamlTable[permittivityPointYAML] `yaml:"relative_permittivity"`
	RefractiveIndex      *yamlSourced                      `yaml:"refractive_index"`
	FlashPointC          *yamlSourced                      `yaml:"flash_point_c"`
	MeltingC             *yamlSourced                      `yaml:"melting_c"`
	BoilingC             *yamlSourced                      `yaml:"boiling_c"`
	SupercoolsToC        *yamlSourced                      `yaml:"supercools_to_c"`
	Aqueous              *bool                             `yaml:"aqueous"`
	Flammable            *bool                             `yaml:"flammable"`
	Notes                string                            `yaml:"notes"`
}

type yamlTable[P yamlPoint] struct {
	Source yamlText `yaml:"source"`
	Points []P      `yaml:"points"`
}

// yamlPoint is one point of a table in the file: a temperature and a value.
type yamlPoint interface {
	temperatureAndValue() (yamlNumber, yamlNumber)
}

type densityPointYAML struct {
	TemperatureC yamlNumber `yaml:"temperature_c"`
	Value        yamlNumber `yaml:"value_kg_m3"`
}

type viscosityPointYAML struct {
	TemperatureC yamlNumber `yaml:"temperature_c"`
	Value        yamlNumber `yaml:"value_mPa_s"`
}

type permittivityPointYAML struct {
	TemperatureC yamlNumber `yaml:"temperature_c"`
	Value        yamlNumber `yaml:"value"`
}

func (p densityPointYAML) temperatureAndValue() (yamlNumber, yamlNumber) {
	return p.TemperatureC, p.Value
}

func (p viscosityPointYAML) temperatureAndValue() (yamlNumber, yamlNumber) {
	return p.TemperatureC, p.Value
}

func (p permittivityPointYAML) temperatureAndValue() (yamlNumber, yamlNumber) {
	return p.TemperatureC, p.Value
}

func loadLiquids(fsys fs.FS) (map[string]Liquid, error) {
	var doc liquidsFileYAML
	c := &checker{file: liquidsPath}
	lines, ok := c.decode(fsys, "liquids", &doc)
	if !ok {
		return nil, c.err()
	}
	out := make(map[string]Liquid, len(doc.Liquids))
	for i, e := range doc.Liquids {
		line := entryLine(lines, i)
		before := len(c.errs)
		key := entryKey(c, e.Key, e.Name, line, out)
		l, complete := c.liquid(e, key, line)
		if key != "" && complete && len(c.errs) == before {
			c.extrapolation(l, line)
		}
		if key != "" {
			out[key] = l
		}
	}
	if len(out) == 0 && len(c.errs) == 0 {
		c.add(0, "no liquids")
	}
	return out, c.err()
}

// liquid converts and checks one entry other than its key and name;
// complete reports that its model and tables are whole enough to evaluate.
func (c *checker) liquid(e liquidYAML, key string, line int) (l Liquid, complete bool) {
	l = Liquid{Key: key, Name: e.Name.text, Model: LiquidTabulated, Notes: e.Notes}
	if e.Model.line != 0 && !e.Model.bad {
		l.Model = LiquidModel(e.Model.text)
	}
	switch l.Model {
	case LiquidIAPWSWater:
		if e.MinC.line != 0 || e.MaxC.line != 0 || e.Density != nil || e.Viscosity != nil || e.RelativePermittivity != nil {
			c.add(line, "%q: model iapws takes its range and tables from package physics: give no min_c, max_c or tables", key)
		}
		l.MinTempK, l.MaxTempK = physics.WaterMinTempK, physics.WaterMaxTempK
		complete = true
	case LiquidTabulated:
		complete = c.tabulated(&l, e, line)
	default:
		c.add(e.Model.line, "model %q is not one of %s, %s", e.Model.text, LiquidTabulated, LiquidIAPWSWater)
	}
	if ri := c.sourced(e.RefractiveIndex, "refractive_index", minRefractiveIndex, maxRefractiveIndex, 1); ri != nil {
		l.RefractiveIndex = *ri
	} else if e.RefractiveIndex == nil {
		c.add(line, "%q: refractive_index is required", key)
	}
	l.FlashPointC = c.sourced(e.FlashPointC, "flash_point_c", minFlashPointC, maxFlashPointC, 1)
	c.phaseLimits(&l, e, line)
	if e.Aqueous == nil || e.Flammable == nil {
		c.add(line, "%q: aqueous and flammable are required (true or false)", key)
		return l, complete
	}
	l.Aqueous, l.Flammable = *e.Aqueous, *e.Flammable
	switch {
	case l.FlashPointC == nil && l.Flammable:
		c.add(line, "%q: a flammable liquid needs its flash_point_c", key)
	case l.FlashPointC != nil && l.Flammable != (l.FlashPointC.Value < flammableBelowC):
		c.add(e.FlashPointC.line, "%q: flammable must be %t for a flash point of %g °C (flammable means below %g °C)",
			key, !l.Flammable, l.FlashPointC.Value, flammableBelowC)
	}
	return l, complete
}

// phaseLimits converts and checks the melting point (required), the
// boiling point and the supercooling limit: each sourced, the boiling point
// above the melting point and the supercooling limit below it.
func (c *checker) phaseLimits(l *Liquid, e liquidYAML, line int) {
	if m := c.sourced(e.MeltingC, "melting_c", minPhaseC, maxPhaseC, 1); m != nil {
		l.MeltingC = *m
	} else if e.MeltingC == nil {
		c.add(line, "%q: melting_c is required", l.Key)
	}
	l.BoilingC = c.sourced(e.BoilingC, "boiling_c", minPhaseC, maxPhaseC, 1)
	l.SupercoolsToC = c.sourced(e.SupercoolsToC, "supercools_to_c", minPhaseC, maxPhaseC, 1)
	if l.BoilingC != nil && !(l.BoilingC.Value > l.MeltingC.Value) {
		c.add(e.BoilingC.line, "%q: boiling_c must be above melting_c", l.Key)
	}
	if l.SupercoolsToC != nil && !(l.SupercoolsToC.Value < l.MeltingC.Value) {
		c.add(e.SupercoolsToC.line, "%q: supercools_to_c must be below melting_c", l.Key)
	}
}

// tabulated converts and checks the range and tables of a tabulated liquid
// and reports whether they are complete.
func (c *checker) tabulated(l *Liquid, e liquidYAML, line int) bool {
	var okD, okV, okP bool
	l.Density, okD = liquidTable(c, e.Density, "density", line, minLiquidDensity, maxLiquidDensity, 1)
	l.Viscosity, okV = liquidTable(c, e.Viscosity, "viscosity", line, minViscosityMPaS, maxViscosityMPaS, 1e-3)
	l.RelativePermittivity, okP = liquidTable(c, e.RelativePermittivity, "relative_permittivity", line, minPermittivity, maxPermittivity, 1)
	if e.MinC.line == 0 || e.MaxC.line == 0 {
		c.add(line, "%q: min_c and max_c (the sourced range) are required", l.Key)
		return false
	}
	if e.MinC.bad || e.MaxC.bad {
		return false
	}
	l.MinTempK, l.MaxTempK = physics.Kelvin(e.MinC.value), physics.Kelvin(e.MaxC.value)
	if !(l.MinTempK < l.MaxTempK) {
		c.add(e.MinC.line, "%q: min_c must be below max_c", l.Key)
		return false
	}
	if !okD || !okV || !okP {
		return false
	}
	for _, t := range []struct {
		name  string
		table LiquidTable
	}{{"density", l.Density}, {"viscosity", l.Viscosity}} {
		pts := t.table.Points
		if pts[0].TempK > l.MinTempK || pts[len(pts)-1].TempK < l.MaxTempK {
			c.add(e.MinC.line, "%q: the %s table (%s to %s) does not cover the sourced range min_c to max_c",
				l.Key, t.name, celsiusText(pts[0].TempK), celsiusText(pts[len(pts)-1].TempK))
		}
	}
	return true
}

// liquidTable converts and checks one table; values must lie in [lo, hi]
// (file units) and are multiplied by scale into SI.
func liquidTable[P yamlPoint](c *checker, t *yamlTable[P], what string, line int, lo, hi, scale float64) (LiquidTable, bool) {
	if t == nil {
		c.add(line, "the %s table is required", what)
		return LiquidTable{}, false
	}
	if t.Source.line != 0 {
		line = t.Source.line
	}
	ok := !t.Source.bad
	if strings.TrimSpace(t.Source.text) == "" && !t.Source.bad {
		c.add(line, "%s: missing source: every table needs one", what)
		ok = false
	}
	if len(t.Points) == 0 {
		c.add(line, "%s: no points", what)
		return LiquidTable{}, false
	}
	out := LiquidTable{Source: strings.TrimSpace(t.Source.text), Points: make([]LiquidPoint, 0, len(t.Points))}
	prev := math.Inf(-1)
	for _, p := range t.Points {
		temp, v := p.temperatureAndValue()
		if temp.bad || v.bad {
			ok = false
			continue
		}
		if temp.line == 0 || v.line == 0 {
			c.add(max(temp.line, v.line, line), "%s: every point needs temperature_c and its value", what)
			ok = false
			continue
		}
		tempK := physics.Kelvin(temp.value)
		switch {
		case !(tempK >= LiquidMinTempK && tempK <= LiquidMaxTempK):
			c.add(temp.line, "%s: temperature_c %g is outside %s to %s", what, temp.value,
				celsiusText(LiquidMinTempK), celsiusText(LiquidMaxTempK))
			ok = false
		case !(tempK > prev):
			c.add(temp.line, "%s: temperatures must increase from point to point", what)
			ok = false
		case !(v.value >= lo && v.value <= hi):
			c.add(v.line, "%s %g is outside its physical range [%g, %g]", what, v.value, lo, hi)
			ok = false
		default:
			out.Points = append(out.Points, LiquidPoint{TempK: tempK, Value: v.value * scale})
		}
		prev = tempK
	}
	return out, ok
}

// extrapolation checks that the liquid stays physical at both ends of the
// domain of Properties, so that no request temperature can yield a
// non-positive density or viscosity or a permittivity below 1.
func (c *checker) extrapolation(l Liquid, line int) {
	for _, tempK := range []float64{LiquidMinTempK, LiquidMaxTempK} {
		p, _ := l.Properties(tempK)
		if !(p.Density > 0 && p.Viscosity > 0 && p.RelativePermittivity >= 1) ||
			math.IsInf(p.Density, 0) || math.IsInf(p.Viscosity, 0) || math.IsInf(p.RelativePermittivity, 0) {
			c.add(line, "%q: extrapolated to %s its properties become unphysical (density %g kg/m^3, viscosity %g Pa s, permittivity %g); add points at the ends of its tables",
				l.Key, celsiusText(tempK), p.Density, p.Viscosity, p.RelativePermittivity)
		}
	}
}
