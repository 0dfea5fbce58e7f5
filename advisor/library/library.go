package library

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"maps"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"colloidtriage/advisor/number"
)

// Paths of the library files inside the file system given to Load.
const (
	materialsPath = "library/materials.yaml"
	liquidsPath   = "library/liquids.yaml"
)

// SourcedValue is one number of the library together with where it comes
// from: a handbook table, a paper, or an honest "from memory (typical of ...)".
type SourcedValue struct {
	Value  float64 `yaml:"value" json:"value"`
	Source string  `yaml:"source" json:"source"`
}

// Material is a particle or droplet material of the library. Numbers are in
// SI units; an optional property is nil where it does not apply or no
// published value was found.
type Material struct {
	Key   string // snake_case library key
	Name  string
	Kind  string // oxide, carbonate, clay, pigment, latex, oil, wax, metal or organic
	Phase string // solid or liquid (droplets)

	Density              SourcedValue  // kg/m^3
	RefractiveIndex      *SourcedValue // n_D at 589 nm; nil for metals
	RelativePermittivity *SourcedValue // static; nil where not meaningful
	IsoelectricPH        *SourcedValue // pH
	HamakerWater         *SourcedValue // non-retarded A131 across water, J
	SurfaceSites         *SurfaceSites // proton-binding sites of an oxide; nil where none is sourced

	Notes string
}

// SurfaceSites are the parameters of a single-site basic Stern model of an
// oxide surface (physics.SiteSurface), each with its source.
type SurfaceSites struct {
	// Model is "one_pk" (Hiemstra, Van Riemsdijk & Bolt: sites of charge
	// -1/2 and +1/2, PK the point of zero charge) or "silica" (Behrens &
	// Grier: silanols of charge 0 and -1, PK their pK).
	Model            string
	SiteDensity      SourcedValue // 1/m^2
	PK               SourcedValue // pH
	SternCapacitance SourcedValue // F/m^2
	// CationPairLogK and AnionPairLogK are log10 of the ion-pair constants
	// (L/mol) of monovalent electrolyte cations and anions with the charged
	// sites; nil where none is sourced (no pairs of that sign).
	CationPairLogK, AnionPairLogK *SourcedValue
	// SlipDistance is the distance of the electrokinetic slip plane
	// outside the head end of the diffuse layer, m; nil where none is
	// sourced (the two coincide).
	SlipDistance *SourcedValue
}

// SitesListing is the SurfaceSites of a MaterialListing, in the library
// file's units.
type SitesListing struct {
	Model               string       `json:"model"`
	SiteDensityNm2      SourcedValue `json:"site_density_per_nm2"`
	PK                  SourcedValue `json:"pk"`
	SternCapacitanceFm2 SourcedValue `json:"stern_capacitance_F_m2"`
}

// Library is the materials and liquids library, checked at load time: every
// value carries a source and lies in its physical range, and every liquid
// stays finite and positive over LiquidMinTempK to LiquidMaxTempK.
type Library struct {
	Materials map[string]Material
	Liquids   map[string]Liquid

	materialKeys, liquidKeys []string
}

// Error is one problem in a library file; Line is 0 when the problem
// concerns the file as a whole.
type Error struct {
	File string
	Line int
	Msg  string
}

// Error formats the problem as file:line: message.
func (e *Error) Error() string {
	if e.Line > 0 {
		return fmt.Sprintf("%s:%d: %s", e.File, e.Line, e.Msg)
	}
	return e.File + ": " + e.Msg
}

// Load reads library/materials.yaml and library/liquids.yaml from fsys
// (normally rules.FS), decodes them strictly (an unknown key is an error) and
// checks every entry. The error, if any, joins one *Error per problem
// found, each naming its file and line.
func Load(fsys fs.FS) (*Library, error) {
	materials, errM := loadMaterials(fsys)
	liquids, errL := loadLiquids(fsys)
	if err := errors.Join(errM, errL); err != nil {
		return nil, err
	}
	return &Library{
		Materials:    materials,
		Liquids:      liquids,
		materialKeys: slices.Sorted(maps.Keys(materials)),
		liquidKeys:   slices.Sorted(maps.Keys(liquids)),
	}, nil
}

// MaterialKeys returns the material keys in sorted order.
func (lib *Library) MaterialKeys() []string { return slices.Clone(lib.materialKeys) }

// LiquidKeys returns the liquid keys in sorted order.
func (lib *Library) LiquidKeys() []string { return slices.Clone(lib.liquidKeys) }

// Listing is the library as served by GET /v1/materials: units in the
// field names, a source beside every value, entries sorted by key.
type Listing struct {
	Materials []MaterialListing `json:"materials"`
	Liquids   []LiquidListing   `json:"liquids"`
}

// MaterialListing is one material of a Listing.
type MaterialListing struct {
	Key                  string        `json:"key"`
	Name                 string        `json:"name"`
	Kind                 string        `json:"kind"`
	Phase                string        `json:"phase"`
	DensityKgM3          SourcedValue  `json:"density_kg_m3"`
	RefractiveIndex      *SourcedValue `json:"refractive_index,omitempty"`
	RelativePermittivity *SourcedValue `json:"relative_permittivity,omitempty"`
	IsoelectricPH        *SourcedValue `json:"isoelectric_ph,omitempty"`
	HamakerWaterZJ       *SourcedValue `json:"hamaker_water_zJ,omitempty"`
	SurfaceSites         *SitesListing `json:"surface_sites,omitempty"`
	Notes                string        `json:"notes,omitempty"`
}

// Listing returns the whole library for the API, in key order.
func (lib *Library) Listing() Listing {
	out := Listing{
		Materials: make([]MaterialListing, 0, len(lib.materialKeys)),
		Liquids:   make([]LiquidListing, 0, len(lib.liquidKeys)),
	}
	for _, k := range lib.materialKeys {
		out.Materials = append(out.Materials, lib.Materials[k].listing())
	}
	for _, k := range lib.liquidKeys {
		out.Liquids = append(out.Liquids, lib.Liquids[k].listing())
	}
	return out
}

func (m Material) listing() MaterialListing {
	out := MaterialListing{
		Key: m.Key, Name: m.Name, Kind: m.Kind, Phase: m.Phase,
		DensityKgM3:          m.Density,
		RefractiveIndex:      copySourced(m.RefractiveIndex),
		RelativePermittivity: copySourced(m.RelativePermittivity),
		IsoelectricPH:        copySourced(m.IsoelectricPH),
		Notes:                m.Notes,
	}
	if s := m.SurfaceSites; s != nil {
		out.SurfaceSites = &SitesListing{Model: s.Model, PK: s.PK, SternCapacitanceFm2: s.SternCapacitance,
			SiteDensityNm2: SourcedValue{Value: number.Round(s.SiteDensity.Value*1e-18, listingDigits), Source: s.SiteDensity.Source}}
	}
	if m.HamakerWater != nil {
		out.HamakerWaterZJ = &SourcedValue{Value: number.Round(m.HamakerWater.Value/zeptojoule, listingDigits), Source: m.HamakerWater.Source}
	}
	return out
}

func copySourced(v *SourcedValue) *SourcedValue {
	if v == nil {
		return nil
	}
	c := *v
	return &c
}

// listingDigits are the significant digits of a listed library value: far
// more than any source gives, so only conversion noise is removed.
const listingDigits = 12

const zeptojoule = 1e-21 // J

// Physical ranges checked at load time.
const (
	minSolidDensity, maxSolidDensity       = 500.0, 25000.0 // kg/m^3
	minLiquidDensity, maxLiquidDensity     = 600.0, 2000.0  // kg/m^3
	minRefractiveIndex, maxRefractiveIndex = 1.0, 3.5
	minPermittivity, maxPermittivity       = 1.0, 200.0
	minPH, maxPH                           = 0.0, 14.0
	minHamakerZJ, maxHamakerZJ             = 0.1, 600.0
	minSitesNm2, maxSitesNm2               = 0.5, 30.0 // proton-binding sites per nm^2
	minSternFm2, maxSternFm2               = 0.1, 10.0 // Stern capacitance, F/m^2
	minPairLogK, maxPairLogK               = -5.0, 5.0 // ion-pair constant, log10 L/mol
	maxSlipNm                              = 5.0       // slip-plane distance, nm
)

var (
	materialKinds  = []string{"oxide", "carbonate", "clay", "pigment", "latex", "oil", "wax", "metal", "organic"}
	materialPhases = []string{"solid", "liquid"}
	siteModels     = []string{"one_pk", "silica"}
	keyForm        = regexp.MustCompile(`^[a-z][a-z0-9_]*$`)
)

type materialsFileYAML struct {
	Materials []materialYAML `yaml:"materials"`
}

type materialYAML struct {
	Key                  yamlText     `yaml:"key"`
	Name                 yamlText     `yaml:"name"`
	Kind                 yamlText     `yaml:"kind"`
	Phase                yamlText     `yaml:"phase"`
	Density              *yamlSourced `yaml:"density_kg_m3"`
	RefractiveIndex      *yamlSourced `yaml:"refractive_index"`
	RelativePermittivity *yamlSourced `yaml:"relative_permittivity"`
	IsoelectricPH        *yamlSourced `yaml:"isoelectric_ph"`
	HamakerWaterZJ       *yamlSourced `yaml:"hamaker_water_zJ"`
	SurfaceSites         *sitesYAML   `yaml:"surface_sites"`
	Notes                string       `yaml:"notes"`
}

type sitesYAML struct {
	Model            yamlText     `yaml:"model"`
	SiteDensityNm2   *yamlSourced `yaml:"site_density_per_nm2"`
	PK               *yamlSourced `yaml:"pk"`
	SternCapacitance *yamlSourced `yaml:"stern_capacitance_F_m2"`
	CationPairLogK   *yamlSourced `yaml:"cation_pair_log_k"`
	AnionPairLogK    *yamlSourced `yaml:"anion_pair_log_k"`
	SlipDistanceNm   *yamlSourced `yaml:"slip_distance_nm"`
}

// sites checks a surface_sites block: a model and all three required
// sourced values in range, the optional pair constants and slip distance in
// range where given, or nil with the problems recorded.
func (c *checker) sites(y *sitesYAML, key string, line int) *SurfaceSites {
	if y == nil {
		return nil
	}
	c.oneOf(y.Model, "surface_sites.model", line, siteModels)
	density := c.sourced(y.SiteDensityNm2, "surface_sites.site_density_per_nm2", minSitesNm2, maxSitesNm2, 1e18)
	pk := c.sourced(y.PK, "surface_sites.pk", minPH, maxPH, 1)
	stern := c.sourced(y.SternCapacitance, "surface_sites.stern_capacitance_F_m2", minSternFm2, maxSternFm2, 1)
	if y.SiteDensityNm2 == nil || y.PK == nil || y.SternCapacitance == nil {
		c.add(line, "material %q: surface_sites needs site_density_per_nm2, pk and stern_capacitance_F_m2", key)
	}
	cation := c.sourced(y.CationPairLogK, "surface_sites.cation_pair_log_k", minPairLogK, maxPairLogK, 1)
	anion := c.sourced(y.AnionPairLogK, "surface_sites.anion_pair_log_k", minPairLogK, maxPairLogK, 1)
	slip := c.sourced(y.SlipDistanceNm, "surface_sites.slip_distance_nm", 0, maxSlipNm, 1e-9)
	if density == nil || pk == nil || stern == nil || !slices.Contains(siteModels, y.Model.text) ||
		(y.CationPairLogK != nil && cation == nil) || (y.AnionPairLogK != nil && anion == nil) || (y.SlipDistanceNm != nil && slip == nil) {
		return nil
	}
	return &SurfaceSites{Model: y.Model.text, SiteDensity: *density, PK: *pk, SternCapacitance: *stern,
		CationPairLogK: cation, AnionPairLogK: anion, SlipDistance: slip}
}

func loadMaterials(fsys fs.FS) (map[string]Material, error) {
	var doc materialsFileYAML
	c := &checker{file: materialsPath}
	lines, ok := c.decode(fsys, "materials", &doc)
	if !ok {
		return nil, c.err()
	}
	out := make(map[string]Material, len(doc.Materials))
	for i, e := range doc.Materials {
		line := entryLine(lines, i)
		key := entryKey(c, e.Key, e.Name, line, out)
		c.oneOf(e.Kind, "kind", line, materialKinds)
		c.oneOf(e.Phase, "phase", line, materialPhases)
		lo, hi := minSolidDensity, maxSolidDensity
		if e.Phase.text == "liquid" {
			lo, hi = minLiquidDensity, maxLiquidDensity
		}
		m := Material{Key: key, Name: e.Name.text, Kind: e.Kind.text, Phase: e.Phase.text, Notes: e.Notes}
		if d := c.sourced(e.Density, "density_kg_m3", lo, hi, 1); d != nil {
			m.Density = *d
		} else if e.Density == nil {
			c.add(line, "material %q: density_kg_m3 is required", key)
		}
		m.RefractiveIndex = c.sourced(e.RefractiveIndex, "refractive_index", minRefractiveIndex, maxRefractiveIndex, 1)
		m.RelativePermittivity = c.sourced(e.RelativePermittivity, "relative_permittivity", minPermittivity, maxPermittivity, 1)
		m.IsoelectricPH = c.sourced(e.IsoelectricPH, "isoelectric_ph", minPH, maxPH, 1)
		m.HamakerWater = c.sourced(e.HamakerWaterZJ, "hamaker_water_zJ", minHamakerZJ, maxHamakerZJ, zeptojoule)
		m.SurfaceSites = c.sites(e.SurfaceSites, key, line)
		if key != "" {
			out[key] = m
		}
	}
	if len(out) == 0 && len(c.errs) == 0 {
		c.add(0, "no materials")
	}
	return out, c.err()
}

// decode reads the checker's file from fsys and decodes it strictly into
// doc, recording every problem. Type errors (an unknown key, a string where
// a number belongs) leave the rest of doc usable and ok true; a missing,
// empty or unparsable file gives ok false. It returns the line of each
// entry of the top-level sequence listKey, for messages about an entry as a
// whole.
func (c *checker) decode(fsys fs.FS, listKey string, doc any) (lines []int, ok bool) {
	data, err := fs.ReadFile(fsys, c.file)
	if err != nil {
		c.add(0, "%v", err)
		return nil, false
	}
	dec := yaml.NewDecoder(bytes.NewReader(data))
	dec.KnownFields(true)
	if err := dec.Decode(doc); err != nil {
		var te *yaml.TypeError
		switch {
		case errors.Is(err, io.EOF):
			c.add(0, "empty file")
			return nil, false
		case errors.As(err, &te):
			for _, msg := range te.Errors {
				c.yamlMessage(msg)
			}
		default:
			c.yamlMessage(err.Error())
			return nil, false
		}
	}
	var root yaml.Node
	if err := yaml.Unmarshal(data, &root); err == nil && len(root.Content) == 1 {
		top := root.Content[0]
		for i := 0; i+1 < len(top.Content); i += 2 {
			if top.Content[i].Value == listKey {
				for _, entry := range top.Content[i+1].Content {
					lines = append(lines, entry.Line)
				}
			}
		}
	}
	return lines, true
}

// yamlMessage records one of the parser's messages ("yaml: line 3: ...", or
// a TypeError's "line 7: field x not found in type y") with its line.
func (c *checker) yamlMessage(msg string) {
	msg = strings.TrimPrefix(msg, "yaml: ")
	e := &Error{File: c.file, Msg: msg}
	if rest, ok := strings.CutPrefix(msg, "line "); ok {
		if num, tail, ok := strings.Cut(rest, ": "); ok {
			if line, err := strconv.Atoi(num); err == nil {
				e.Line, e.Msg = line, tail
			}
		}
	}
	if field, ok := strings.CutPrefix(e.Msg, "field "); ok {
		if name, _, ok := strings.Cut(field, " not found in type "); ok {
			e.Msg = "unknown key " + strconv.Quote(name)
		}
	}
	c.errs = append(c.errs, e)
}

// entryLine is the line of entry i, or 0 if unknown.
func entryLine(lines []int, i int) int {
	if i < len(lines) {
		return lines[i]
	}
	return 0
}

// checker collects the problems of one file.
type checker struct {
	file string
	errs []error
}

func (c *checker) add(line int, format string, args ...any) {
	c.errs = append(c.errs, &Error{File: c.file, Line: line, Msg: fmt.Sprintf(format, args...)})
}

func (c *checker) err() error { return errors.Join(c.errs...) }

// entryKey checks an entry's key and name and returns the key ("" if unusable).
func entryKey[V any](c *checker, key, name yamlText, entryLine int, seen map[string]V) string {
	switch {
	case key.bad:
		return ""
	case key.line == 0:
		c.add(entryLine, "entry without a key")
		return ""
	case !keyForm.MatchString(key.text):
		c.add(key.line, "key %q is not snake_case", key.text)
		return ""
	}
	if _, dup := seen[key.text]; dup {
		c.add(key.line, "duplicate key %q", key.text)
		return ""
	}
	if strings.TrimSpace(name.text) == "" && !name.bad {
		c.add(key.line, "%q: name is required", key.text)
	}
	return key.text
}

func (c *checker) oneOf(v yamlText, what string, entryLine int, allowed []string) {
	switch {
	case v.bad:
	case v.line == 0:
		c.add(entryLine, "%s is required (one of %s)", what, strings.Join(allowed, ", "))
	case !slices.Contains(allowed, v.text):
		c.add(v.line, "%s %q is not one of %s", what, v.text, strings.Join(allowed, ", "))
	}
}

// sourced checks an optional sourced value against [lo, hi] (file units) and
// returns it multiplied by scale into SI, or nil when absent or invalid.
func (c *checker) sourced(s *yamlSourced, what string, lo, hi, scale float64) *SourcedValue {
	if s == nil || s.bad {
		return nil
	}
	if !(s.value >= lo && s.value <= hi) {
		c.add(s.line, "%s %g is outside its physical range [%g, %g]", what, s.value, lo, hi)
		return nil
	}
	return &SourcedValue{Value: s.value * scale, Source: s.source}
}

// yamlText is a YAML scalar string with the line it stands on (0 if absent).
// A value that failed to decode has bad set (its error is already recorded).
type yamlText struct {
	text string
	line int
	bad  bool
}

func (t *yamlText) UnmarshalYAML(n *yaml.Node) error {
	t.line = n.Line
	if n.Kind != yaml.ScalarNode {
		t.bad = true
		return typeError(n.Line, "want a string")
	}
	t.text = n.Value
	return nil
}

// yamlNumber is a YAML number with the line it stands on (0 if absent).
type yamlNumber struct {
	value float64
	line  int
	bad   bool
}

func (v *yamlNumber) UnmarshalYAML(n *yaml.Node) error {
	v.line = n.Line
	if n.Kind != yaml.ScalarNode || n.Decode(&v.value) != nil {
		v.bad = true
		return typeError(n.Line, "want a number")
	}
	return nil
}

// yamlSourced is a {value, source} mapping. It decodes itself because the
// strict decoder's unknown-key check does not reach custom unmarshalers.
type yamlSourced struct {
	value  float64
	source string
	line   int
	bad    bool
}

func (s *yamlSourced) UnmarshalYAML(n *yaml.Node) error {
	s.line = n.Line
	if n.Kind != yaml.MappingNode {
		s.bad = true
		return typeError(n.Line, `want {value: <number>, source: "<where it comes from>"}`)
	}
	var problems []string
	seen := map[string]bool{}
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, v := n.Content[i], n.Content[i+1]
		if seen[k.Value] {
			problems = append(problems, fmt.Sprintf("line %d: duplicate key %q", k.Line, k.Value))
			continue
		}
		seen[k.Value] = true
		switch k.Value {
		case "value":
			if v.Kind != yaml.ScalarNode || v.Decode(&s.value) != nil {
				problems = append(problems, fmt.Sprintf("line %d: value must be a number", v.Line))
			}
		case "source":
			if v.Kind != yaml.ScalarNode {
				problems = append(problems, fmt.Sprintf("line %d: source must be a string", v.Line))
			}
			s.source = strings.TrimSpace(v.Value)
		default:
			problems = append(problems, fmt.Sprintf("line %d: unknown key %q (want value and source)", k.Line, k.Value))
		}
	}
	if !seen["value"] {
		problems = append(problems, fmt.Sprintf("line %d: missing value", n.Line))
	}
	if s.source == "" {
		problems = append(problems, fmt.Sprintf("line %d: missing source: every value needs one", n.Line))
	}
	if len(problems) > 0 {
		s.bad = true
		return &yaml.TypeError{Errors: problems}
	}
	return nil
}

func typeError(line int, msg string) error {
	return &yaml.TypeError{Errors: []string{fmt.Sprintf("line %d: %s", line, msg)}}
}
