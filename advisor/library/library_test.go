package library_test

import (
	"bytes"
	"encoding/json"
	"math"
	"slices"
	"strings"
	"testing"
	"testing/fstest"

	"colloidtriage/advisor/library"
	"colloidtriage/rules"
)

func loadEmbedded(t testing.TB) *library.Library {
	t.Helper()
	lib, err := library.Load(rules.FS)
	if err != nil {
		t.Fatalf("library.Load(rules.FS): %v", err)
	}
	return lib
}

func TestLibraryEmbeddedLoads(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	if n := len(lib.Materials); n < 24 {
		t.Errorf("%d materials, want at least 24", n)
	}
	if n := len(lib.Liquids); n < 8 {
		t.Errorf("%d liquids, want at least 8", n)
	}
	// The groups the design asks for, one representative key each.
	for _, k := range []string{"silica_amorphous", "titania_rutile", "titania_anatase", "alumina", "hematite",
		"zinc_oxide", "zirconia", "ceria", "calcite", "kaolinite", "montmorillonite", "carbon_black",
		"phthalocyanine_blue", "iron_oxide_yellow", "polystyrene", "pmma", "acrylic_latex", "soybean_oil",
		"mct_oil", "paraffin_oil", "hexadecane", "paraffin_wax", "carnauba_wax", "gold", "silver", "organic_crystal"} {
		if _, ok := lib.Materials[k]; !ok {
			t.Errorf("material %q missing", k)
		}
	}
	for _, k := range []string{"water", "ethylene_glycol", "propylene_glycol", "glycerol", "glycerol_water_50",
		"ethanol", "isopropanol", "hexadecane", "pdms_100cst", "white_mineral_oil"} {
		if _, ok := lib.Liquids[k]; !ok {
			t.Errorf("liquid %q missing", k)
		}
	}
}

func TestLibraryEveryValueSourcedAndInRange(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	check := func(owner, what string, v *library.SourcedValue, lo, hi float64) {
		t.Helper()
		if v == nil {
			return
		}
		if strings.TrimSpace(v.Source) == "" {
			t.Errorf("%s %s: no source", owner, what)
		}
		if !(v.Value >= lo && v.Value <= hi) {
			t.Errorf("%s %s = %g, outside [%g, %g]", owner, what, v.Value, lo, hi)
		}
	}
	for k, m := range lib.Materials {
		if k != m.Key || m.Name == "" || m.Kind == "" || (m.Phase != "solid" && m.Phase != "liquid") {
			t.Errorf("material %q: key %q, name %q, kind %q, phase %q", k, m.Key, m.Name, m.Kind, m.Phase)
		}
		check(k, "density", &m.Density, 500, 25000)
		check(k, "refractive index", m.RefractiveIndex, 1, 3.5)
		check(k, "permittivity", m.RelativePermittivity, 1, 200)
		check(k, "isoelectric pH", m.IsoelectricPH, 0, 14)
		check(k, "Hamaker constant (J)", m.HamakerWater, 0.1e-21, 600e-21)
		if s := m.SurfaceSites; s != nil {
			check(k, "site density (1/m^2)", &s.SiteDensity, 0.5e18, 30e18)
			check(k, "site pK", &s.PK, 0, 14)
			check(k, "Stern capacitance", &s.SternCapacitance, 0.1, 10)
		}
	}
	for k, l := range lib.Liquids {
		check(k, "refractive index", &l.RefractiveIndex, 1, 3.5)
		check(k, "flash point", l.FlashPointC, -60, 400)
		if l.Model == library.LiquidIAPWSWater {
			continue
		}
		for _, tb := range []struct {
			what   string
			table  library.LiquidTable
			lo, hi float64
		}{
			{"density", l.Density, 600, 2000},
			{"viscosity (Pa s)", l.Viscosity, 1e-5, 1e6},
			{"permittivity", l.RelativePermittivity, 1, 200},
		} {
			if strings.TrimSpace(tb.table.Source) == "" || len(tb.table.Points) == 0 {
				t.Errorf("%s %s: no source or no points", k, tb.what)
			}
			for i, p := range tb.table.Points {
				if !(p.Value >= tb.lo && p.Value <= tb.hi) {
					t.Errorf("%s %s point %d = %g, outside [%g, %g]", k, tb.what, i, p.Value, tb.lo, tb.hi)
				}
				if i > 0 && !(p.TempK > tb.table.Points[i-1].TempK) {
					t.Errorf("%s %s: temperatures not increasing at point %d", k, tb.what, i)
				}
			}
		}
	}
}

// Library values against published and recalled outside values.
func TestLibraryValuesAgainstReferences(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	const zJ = 1e-21
	tests := []struct {
		key      string
		property string
		want     float64
		tol      float64 // absolute, in the property's unit
		tag      string
	}{
		// Walstra, Physical Chemistry of Foods (2003), Table 12.2, A across water [pub].
		{"polystyrene", "hamaker", 9 * zJ, 0.5 * zJ, "[pub]"},
		{"hexadecane", "hamaker", 5.4 * zJ, 0.3 * zJ, "[pub]"},
		// Larson et al. 1993, JACS 115:11885: rutile across water 6 +/- 2e-20 J [pub].
		{"titania_rutile", "hamaker", 60 * zJ, 20 * zJ, "[pub]"},
		// Biggs & Mulvaney 1994, J. Chem. Phys. 100:8501: gold 2.5 +/- 0.5e-19 J [pub].
		{"gold", "hamaker", 250 * zJ, 50 * zJ, "[pub]"},
		// testdata/reference/REFERENCES.md trade facts, isoelectric points [memory]: silica 2-3.5,
		// rutile and anatase 4-6, alumina about 9, hematite 8-9, zinc oxide about 9,
		// zirconia 4-11.
		{"silica_amorphous", "iep", 2.75, 0.75, "[memory]"},
		{"titania_rutile", "iep", 5, 1, "[memory]"},
		{"titania_anatase", "iep", 5, 1, "[memory]"},
		{"alumina", "iep", 9, 0.5, "[memory]"},
		{"hematite", "iep", 8.5, 0.5, "[memory]"},
		{"zinc_oxide", "iep", 9, 0.5, "[memory]"},
		{"zirconia", "iep", 7.5, 3.5, "[memory]"},
		// CRC Handbook densities, g/cm^3 [memory]: Au 19.3, Ag 10.5, alpha-Al2O3
		// 3.99, quartz 2.65, calcite 2.71, rutile 4.25.
		{"gold", "density", 19300, 50, "[memory]"},
		{"silver", "density", 10500, 50, "[memory]"},
		{"alumina", "density", 3990, 20, "[memory]"},
		{"silica_quartz", "density", 2650, 10, "[memory]"},
		{"calcite", "density", 2710, 10, "[memory]"},
		{"titania_rutile", "density", 4250, 60, "[memory]"},
		// Malitson 1965, fused silica n = 1.4585 at 589 nm [memory].
		{"silica_amorphous", "n", 1.4585, 0.002, "[memory]"},
	}
	for _, tc := range tests {
		m, ok := lib.Materials[tc.key]
		if !ok {
			t.Errorf("%s missing", tc.key)
			continue
		}
		var v *library.SourcedValue
		switch tc.property {
		case "hamaker":
			v = m.HamakerWater
		case "iep":
			v = m.IsoelectricPH
		case "density":
			v = &m.Density
		case "n":
			v = m.RefractiveIndex
		}
		if v == nil {
			t.Errorf("%s %s missing", tc.key, tc.property)
			continue
		}
		if math.Abs(v.Value-tc.want) > tc.tol {
			t.Errorf("%s %s = %g, want %g +/- %g %s", tc.key, tc.property, v.Value, tc.want, tc.tol, tc.tag)
		}
	}
}

func TestLibraryKeysSorted(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	for name, tc := range map[string]struct {
		keys []string
		n    int
	}{"materials": {lib.MaterialKeys(), len(lib.Materials)}, "liquids": {lib.LiquidKeys(), len(lib.Liquids)}} {
		if !slices.IsSorted(tc.keys) || len(tc.keys) != tc.n {
			t.Errorf("%s keys %v: not sorted or not %d", name, tc.keys, tc.n)
		}
	}
	keys := lib.MaterialKeys()
	keys[0] = "changed"
	if lib.MaterialKeys()[0] == "changed" {
		t.Error("MaterialKeys returns the library's own slice")
	}
}

func TestLibraryListingJSON(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	first, err := json.Marshal(lib.Listing())
	if err != nil {
		t.Fatal(err)
	}
	again, _ := json.Marshal(lib.Listing())
	if !bytes.Equal(first, again) {
		t.Error("listing is not deterministic")
	}
	for _, field := range []string{`"density_kg_m3"`, `"hamaker_water_zJ"`, `"isoelectric_ph"`, `"viscosity_points"`,
		`"viscosity_mPa_s"`, `"density_points"`, `"relative_permittivity_points"`, `"temperature_c"`, `"source"`,
		`"min_temperature_c"`, `"flash_point_c"`, `"model":"iapws"`, `"melting_c"`, `"boiling_c"`} {
		if !bytes.Contains(first, []byte(field)) {
			t.Errorf("listing lacks %s", field)
		}
	}

	listing := lib.Listing()
	if len(listing.Materials) != len(lib.Materials) || len(listing.Liquids) != len(lib.Liquids) {
		t.Fatalf("listing has %d materials and %d liquids", len(listing.Materials), len(listing.Liquids))
	}
	// Units converted back exactly: Walstra's 9 zJ, Segur's 1412 mPa s at 20 °C,
	// water from IAPWS R12-08 at 25 °C, 0.8900 mPa s [calc, testdata/reference/REFERENCES.md].
	for _, m := range listing.Materials {
		if m.Key == "polystyrene" && (m.HamakerWaterZJ == nil || m.HamakerWaterZJ.Value != 9) {
			t.Errorf("polystyrene hamaker_water_zJ = %+v, want 9", m.HamakerWaterZJ)
		}
	}
	for _, l := range listing.Liquids {
		switch l.Key {
		case "glycerol":
			if !slices.Contains(l.ViscosityPoints, library.LiquidViscosityPoint{TemperatureC: 20, ViscosityMPaS: 1412}) {
				t.Errorf("glycerol viscosity points %v lack {20, 1412}", l.ViscosityPoints)
			}
		case "water":
			found := false
			for _, p := range l.ViscosityPoints {
				if p.TemperatureC == 25 {
					found = math.Abs(p.ViscosityMPaS-0.8900) < 0.0002
				}
			}
			if !found || l.MinTemperatureC != 0 || l.MaxTemperatureC != 100 {
				t.Errorf("water listing %+v: want 0.8900 mPa s at 25 °C over 0-100 °C", l)
			}
		}
	}
}

const validMaterials = `materials:
  - key: grit
    name: Grit
    kind: oxide
    phase: solid
    density_kg_m3: {value: 2650, source: "test"}
`

const validSites = `    surface_sites:
      model: one_pk
      site_density_per_nm2: {value: 5, source: "test"}
      pk: {value: 9, source: "test"}
      stern_capacitance_F_m2: {value: 1, source: "test"}
`

const validLiquids = `liquids:
  - key: water
    name: Water
    model: iapws
    refractive_index: {value: 1.333, source: "test"}
    aqueous: true
    flammable: false
    melting_c: {value: 0, source: "test"}
`

const validSolvent = `liquids:
  - key: solvent
    name: Solvent
    min_c: 0
    max_c: 50
    density:
      source: "test"
      points:
        - {temperature_c: 0, value_kg_m3: 800}
        - {temperature_c: 50, value_kg_m3: 760}
    viscosity:
      source: "test"
      points:
        - {temperature_c: 0, value_mPa_s: 1.0}
        - {temperature_c: 50, value_mPa_s: 0.6}
    relative_permittivity:
      source: "test"
      points:
        - {temperature_c: 25, value: 20}
    refractive_index: {value: 1.36, source: "test"}
    flash_point_c: {value: 12, source: "test"}
    aqueous: false
    flammable: true
    melting_c: {value: -100, source: "test"}
    boiling_c: {value: 70, source: "test"}
`

func TestLibraryBrokenFiles(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name      string
		materials string
		liquids   string
		want      []string // substrings of the error
	}{
		{"valid", validMaterials, validLiquids, nil},
		{"valid solvent", validMaterials, validSolvent, nil},
		{"unknown key", strings.Replace(validMaterials, "    phase: solid\n", "    phase: solid\n    colour: red\n", 1), validLiquids,
			[]string{`library/materials.yaml:6: unknown key "colour"`}},
		{"missing source", strings.Replace(validMaterials, `source: "test"`, `source: ""`, 1), validLiquids,
			[]string{"library/materials.yaml:6: missing source"}},
		{"source left out", strings.Replace(validMaterials, `, source: "test"`, ``, 1), validLiquids,
			[]string{"library/materials.yaml:6: missing source"}},
		{"unknown key in a value", strings.Replace(validMaterials, `source: "test"`, `source: "test", unit: "g"`, 1), validLiquids,
			[]string{`library/materials.yaml:6: unknown key "unit"`}},
		{"value out of range", strings.Replace(validMaterials, "2650", "26500", 1), validLiquids,
			[]string{"library/materials.yaml:6: density_kg_m3 26500 is outside"}},
		{"bad kind", strings.Replace(validMaterials, "kind: oxide", "kind: mineral", 1), validLiquids,
			[]string{`library/materials.yaml:4: kind "mineral" is not one of`}},
		{"missing density", strings.Replace(validMaterials, "    density_kg_m3: {value: 2650, source: \"test\"}\n", "", 1), validLiquids,
			[]string{`library/materials.yaml:2: material "grit": density_kg_m3 is required`}},
		{"duplicate key", validMaterials + strings.TrimPrefix(validMaterials, "materials:\n"), validLiquids,
			[]string{`library/materials.yaml:7: duplicate key "grit"`}},
		{"not snake_case", strings.Replace(validMaterials, "key: grit", "key: Grit", 1), validLiquids,
			[]string{`library/materials.yaml:2: key "Grit" is not snake_case`}},
		{"syntax error", "materials:\n  - key: [grit\n", validLiquids, []string{"library/materials.yaml:"}},
		{"empty file", "", validLiquids, []string{"library/materials.yaml: empty file"}},
		{"temperatures not increasing", validMaterials, strings.Replace(validSolvent, "temperature_c: 50, value_mPa_s", "temperature_c: -5, value_mPa_s", 1),
			[]string{"library/liquids.yaml:15: viscosity: temperatures must increase"}},
		{"non-positive viscosity", validMaterials, strings.Replace(validSolvent, "value_mPa_s: 0.6", "value_mPa_s: 0", 1),
			[]string{"library/liquids.yaml:15: viscosity 0 is outside its physical range"}},
		{"flammable inconsistent", validMaterials, strings.Replace(validSolvent, "flammable: true", "flammable: false", 1),
			[]string{`library/liquids.yaml:21: "solvent": flammable must be true`}},
		{"range not covered", validMaterials, strings.Replace(validSolvent, "max_c: 50", "max_c: 60", 1),
			[]string{`library/liquids.yaml:4: "solvent": the density table`, "the viscosity table"}},
		{"table without source", validMaterials, strings.Replace(validSolvent, "    density:\n      source: \"test\"\n", "    density:\n", 1),
			[]string{"library/liquids.yaml:2: density: missing source"}},
		{"unknown key in a point", validMaterials, strings.Replace(validSolvent, "value: 20}", "value: 20, at: 1}", 1),
			[]string{`library/liquids.yaml:19: unknown key "at"`}},
		{"valid surface sites", validMaterials + validSites, validLiquids, nil},
		{"unknown site model", validMaterials + strings.Replace(validSites, "model: one_pk", "model: two_pk", 1), validLiquids,
			[]string{`library/materials.yaml:8: surface_sites.model "two_pk" is not one of`}},
		{"site density out of range", validMaterials + strings.Replace(validSites, "{value: 5,", "{value: 50,", 1), validLiquids,
			[]string{"library/materials.yaml:9: surface_sites.site_density_per_nm2 50 is outside"}},
		{"valid ion pairs and slip plane", validMaterials + validSites +
			"      cation_pair_log_k: {value: -1, source: \"test\"}\n      anion_pair_log_k: {value: -1, source: \"test\"}\n      slip_distance_nm: {value: 0.5, source: \"test\"}\n",
			validLiquids, nil},
		{"pair constant out of range", validMaterials + validSites + "      cation_pair_log_k: {value: 9, source: \"test\"}\n", validLiquids,
			[]string{"library/materials.yaml:12: surface_sites.cation_pair_log_k 9 is outside"}},
		{"slip distance out of range", validMaterials + validSites + "      slip_distance_nm: {value: -1, source: \"test\"}\n", validLiquids,
			[]string{"library/materials.yaml:12: surface_sites.slip_distance_nm -1 is outside"}},
		{"site value missing", validMaterials + strings.Replace(validSites, "      pk: {value: 9, source: \"test\"}\n", "", 1), validLiquids,
			[]string{`library/materials.yaml:2: material "grit": surface_sites needs site_density_per_nm2, pk and stern_capacitance_F_m2`}},
		{"unknown model", validMaterials, strings.Replace(validLiquids, "model: iapws", "model: magic", 1),
			[]string{`library/liquids.yaml:4: model "magic" is not one of`}},
		{"iapws with a table", validMaterials, strings.Replace(validLiquids, "    aqueous", "    min_c: 0\n    aqueous", 1),
			[]string{`library/liquids.yaml:2: "water": model iapws takes`}},
		{"all problems at once", strings.Replace(strings.Replace(validMaterials, "    phase: solid\n", "    phase: solid\n    colour: red\n", 1), "kind: oxide", "kind: mineral", 1), validLiquids,
			[]string{`library/materials.yaml:6: unknown key "colour"`, `library/materials.yaml:4: kind "mineral" is not one of`}},
		{"text for a number", validMaterials, strings.Replace(validSolvent, "value_mPa_s: 0.6", "value_mPa_s: thin", 1),
			[]string{"library/liquids.yaml:15: want a number"}},
		{"no melting point", validMaterials, strings.Replace(validSolvent, "    melting_c: {value: -100, source: \"test\"}\n", "", 1),
			[]string{`library/liquids.yaml:2: "solvent": melting_c is required`}},
		{"boiling below melting", validMaterials, strings.Replace(validSolvent, "boiling_c: {value: 70", "boiling_c: {value: -120", 1),
			[]string{`library/liquids.yaml:25: "solvent": boiling_c must be above melting_c`}},
		{"unphysical extrapolation", validMaterials, strings.Replace(validSolvent, "value_kg_m3: 760", "value_kg_m3: 650", 1),
			[]string{`library/liquids.yaml:2: "solvent": extrapolated to 300 °C its properties become unphysical`}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			fsys := fstest.MapFS{
				"library/materials.yaml": {Data: []byte(tc.materials)},
				"library/liquids.yaml":   {Data: []byte(tc.liquids)},
			}
			lib, err := library.Load(fsys)
			if tc.want == nil {
				if err != nil || lib == nil {
					t.Fatalf("library.Load: %v", err)
				}
				return
			}
			if err == nil {
				t.Fatalf("library.Load accepted the file, want an error containing %q", tc.want)
			}
			for _, w := range tc.want {
				if !strings.Contains(err.Error(), w) {
					t.Errorf("error\n%v\nlacks %q", err, w)
				}
			}
		})
	}
}

func TestLibraryMissingFile(t *testing.T) {
	t.Parallel()
	_, err := library.Load(fstest.MapFS{"library/materials.yaml": {Data: []byte(validMaterials)}})
	if err == nil || !strings.Contains(err.Error(), "library/liquids.yaml") {
		t.Errorf("error %v, want one naming library/liquids.yaml", err)
	}
}
