package library_test

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"colloidtriage/advisor/library"
	"colloidtriage/physics"
	"colloidtriage/rules"
)

func liquid(t testing.TB, lib *library.Library, key string) library.Liquid {
	t.Helper()
	l, ok := lib.Liquids[key]
	if !ok {
		t.Fatalf("liquid %q missing", key)
	}
	return l
}

func relErr(got, want float64) float64 { return math.Abs(got-want) / math.Abs(want) }

func TestLiquidViscosityAgainstReferences(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	tests := []struct {
		key   string
		tempC float64
		want  float64 // mPa s
		tol   float64 // relative
		tag   string
	}{
		// Segur & Oberstar 1951 (Ind. Eng. Chem. 43:2117), glycerol 1412 mPa s at 20 °C
		// [memory]; CRC Handbook, Viscosity of Liquids,
		// 934 mPa s at 25 °C [memory].
		{"glycerol", 20, 1412, 0.05, "[memory]"},
		{"glycerol", 25, 934, 0.05, "[memory]"},
		// Cheng 2008 (Ind. Eng. Chem. Res. 47:3285) correlation, eq. 9 for glycerol
		// and eqs. 5-10 for the 50 % w/w mixture, off the table grid [calc,
		// testdata/reference/glycerol_water.py]. Pure glycerol is tabulated from
		// Segur, which Cheng fits to about 3 %.
		{"glycerol", 25, 905.7, 0.04, "[calc]"},
		{"glycerol", 35, 405.8, 0.04, "[calc]"},
		{"glycerol", 45, 201.2, 0.04, "[calc]"},
		{"glycerol", 65, 63.24, 0.04, "[calc]"},
		{"glycerol_water_50", 25, 5.004, 0.01, "[calc]"},
		{"glycerol_water_50", 37, 3.396, 0.01, "[calc]"},
		{"glycerol_water_50", 55, 2.104, 0.01, "[calc]"},
		// Segur 1953 table, 50 % w/w glycerol 6.00 mPa s at 20 °C [memory].
		{"glycerol_water_50", 20, 6.00, 0.01, "[memory]"},
		// Ethylene glycol at 20 °C, 19.9 mPa s [memory, typical of Sun & Teja 2003]:
		// 5 K below the table, extrapolated.
		{"ethylene_glycol", 20, 19.9, 0.05, "[memory]"},
		// Water, IAPWS R12-08 at 0.1 MPa with Kell density [calc, testdata/reference/REFERENCES.md].
		{"water", 0, 1.7918, 1e-4, "[calc]"},
		{"water", 20, 1.0016, 1e-4, "[calc]"},
		{"water", 25, 0.8900, 1e-4, "[calc]"},
		{"water", 60, 0.4660, 2e-4, "[calc]"},
		{"water", 100, 0.2816, 2e-4, "[calc]"},
		// Extrapolated water: supercooled at -10 °C about 2.6 mPa s (Hallett 1963,
		// Proc. Phys. Soc. 82:1046) [memory]; saturated liquid at 120 °C 0.232 mPa s
		// (IAPWS tables) [memory].
		{"water", -10, 2.6, 0.06, "[memory]"},
		{"water", 120, 0.232, 0.02, "[memory]"},
	}
	for _, tc := range tests {
		p, _ := liquid(t, lib, tc.key).Properties(physics.Kelvin(tc.tempC))
		if got := p.Viscosity * 1e3; !(relErr(got, tc.want) <= tc.tol) {
			t.Errorf("%s at %g °C: viscosity %.5g mPa s, want %.5g within %g %s", tc.key, tc.tempC, got, tc.want, tc.tol, tc.tag)
		}
	}
}

func TestLiquidDensityAndPermittivityAgainstReferences(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	tests := []struct {
		key          string
		tempC        float64
		density      float64 // kg/m^3, 0 = not checked
		permittivity float64 // 0 = not checked
		tol          float64 // relative
		tag          string
	}{
		// Kell 1975 density and Malmberg & Maryott 1956 (25 °C: 78.30 [pub];
		// 100 °C: 55.72 [calc]), testdata/reference/REFERENCES.md.
		{"water", 25, 997.045, 78.30, 1e-4, "[calc]/[pub]"},
		{"water", 60, 983.199, 0, 1e-5, "[calc]"},
		{"water", 100, 958.364, 55.72, 1e-4, "[calc]"},
		// Saturated liquid water at 120 °C, 943.1 kg/m^3 (IAPWS tables) [memory].
		{"water", 120, 943.1, 0, 0.005, "[memory]"},
		// CRC Handbook [memory]: glycerol 1261.3 kg/m^3 at 20 °C, 42.5 at 25 °C;
		// 50 % w/w glycerol 1126.3 at 20 °C; ethanol 789.3 at 20 °C, 24.5 at 25 °C;
		// toluene 866.9 at 20 °C; ethylene glycol 1113.5 at 20 °C.
		{"glycerol", 20, 1261.3, 0, 0.002, "[memory]"},
		{"glycerol", 25, 0, 42.5, 1e-9, "[memory]"},
		{"glycerol_water_50", 20, 1126.3, 0, 0.002, "[memory]"},
		{"ethanol", 20, 789.3, 0, 0.002, "[memory]"},
		{"ethanol", 25, 0, 24.5, 1e-9, "[memory]"},
		{"toluene", 20, 866.9, 0, 0.002, "[memory]"},
		{"ethylene_glycol", 20, 1113.5, 0, 0.002, "[memory]"},
	}
	for _, tc := range tests {
		p, _ := liquid(t, lib, tc.key).Properties(physics.Kelvin(tc.tempC))
		if tc.density != 0 && !(relErr(p.Density, tc.density) <= tc.tol) {
			t.Errorf("%s at %g °C: density %.6g, want %.6g within %g %s", tc.key, tc.tempC, p.Density, tc.density, tc.tol, tc.tag)
		}
		if tc.permittivity != 0 && !(relErr(p.RelativePermittivity, tc.permittivity) <= tc.tol) {
			t.Errorf("%s at %g °C: permittivity %.5g, want %.5g within %g %s", tc.key, tc.tempC, p.RelativePermittivity, tc.permittivity, tc.tol, tc.tag)
		}
	}
}

// Inside 0-100 °C the water path is the physics package's, unchanged.
func TestLiquidWaterMatchesPhysics(t *testing.T) {
	t.Parallel()
	water := liquid(t, loadEmbedded(t), "water")
	for c := 0.0; c <= 100; c += 2.5 {
		k := physics.Kelvin(c)
		p, notes := water.Properties(k)
		if p.Viscosity != physics.WaterViscosity(k) || p.Density != physics.WaterDensity(k) ||
			p.RelativePermittivity != physics.WaterPermittivity(k) || !p.InSourcedRange {
			t.Errorf("water at %g °C: %+v differs from physics", c, p)
		}
		if !strings.Contains(strings.Join(notes, "\n"), "IAPWS R12-08") {
			t.Errorf("water at %g °C: notes %q do not name IAPWS R12-08", c, notes)
		}
	}
}

// A table point comes back exactly; between points values are monotone and
// stay between the neighbouring points.
func TestLiquidInterpolationHitsPointsAndIsMonotone(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	for _, key := range lib.LiquidKeys() {
		l := lib.Liquids[key]
		if l.Model == library.LiquidIAPWSWater {
			continue
		}
		tables := []struct {
			name  string
			table library.LiquidTable
			get   func(library.LiquidProperties) float64
		}{
			{"density", l.Density, func(p library.LiquidProperties) float64 { return p.Density }},
			{"viscosity", l.Viscosity, func(p library.LiquidProperties) float64 { return p.Viscosity }},
			{"permittivity", l.RelativePermittivity, func(p library.LiquidProperties) float64 { return p.RelativePermittivity }},
		}
		for _, tb := range tables {
			pts := tb.table.Points
			for _, pt := range pts {
				p, _ := l.Properties(pt.TempK)
				if got := tb.get(p); got != pt.Value {
					t.Errorf("%s %s at %g K: %g, want the table's %g", key, tb.name, pt.TempK, got, pt.Value)
				}
			}
			for i := 0; i+1 < len(pts); i++ {
				a, b := pts[i], pts[i+1]
				prev := a.Value
				for s := 1; s <= 50; s++ {
					p, _ := l.Properties(a.TempK + (b.TempK-a.TempK)*float64(s)/50)
					v := tb.get(p)
					lo, hi := min(a.Value, b.Value), max(a.Value, b.Value)
					stepOK := (b.Value >= a.Value && v >= prev) || (b.Value <= a.Value && v <= prev)
					if v < lo || v > hi || !stepOK {
						t.Errorf("%s %s between %g and %g K: %g not monotone within [%g, %g]", key, tb.name, a.TempK, b.TempK, v, lo, hi)
						break
					}
					prev = v
				}
			}
		}
	}
}

func TestLiquidOutOfRangeFlagged(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	tests := []struct {
		key     string
		tempC   float64
		inRange bool
	}{
		{"glycerol", 100, true},
		{"glycerol", 120, false},
		{"glycerol", -20, false},
		{"ethylene_glycol", 20, false},
		{"ethanol", 60, false},
		{"water", 0, true},
		{"water", -10, false},
		{"water", 150, false},
	}
	for _, tc := range tests {
		p, notes := liquid(t, lib, tc.key).Properties(physics.Kelvin(tc.tempC))
		all := strings.Join(notes, "\n")
		if p.InSourcedRange != tc.inRange || strings.Contains(all, "OUTSIDE") == tc.inRange {
			t.Errorf("%s at %g °C: InSourcedRange %t, notes %q; want in range %t", tc.key, tc.tempC, p.InSourcedRange, notes, tc.inRange)
		}
		if !tc.inRange && tc.key != "water" && !strings.Contains(all, "EXTRAPOLATED") {
			t.Errorf("%s at %g °C: notes %q do not say EXTRAPOLATED", tc.key, tc.tempC, notes)
		}
	}
	// Extrapolation continues the trend: glycerol at 120 °C is thinner than at 100 °C.
	g := liquid(t, lib, "glycerol")
	hot, _ := g.Properties(physics.Kelvin(120))
	edge, _ := g.Properties(physics.Kelvin(100))
	if !(hot.Viscosity < edge.Viscosity && hot.Density < edge.Density) {
		t.Errorf("glycerol at 120 °C %+v does not continue the trend from 100 °C %+v", hot, edge)
	}
}

// Over the whole domain of Properties every liquid stays finite and physical.
func TestLiquidFiniteOverDomain(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	for _, key := range lib.LiquidKeys() {
		l := lib.Liquids[key]
		for k := library.LiquidMinTempK; k <= library.LiquidMaxTempK; k += 0.5 {
			p, notes := l.Properties(k)
			finite := !math.IsInf(p.Density, 0) && !math.IsInf(p.Viscosity, 0) && !math.IsInf(p.RelativePermittivity, 0)
			if !finite || !(p.Density > 0) || !(p.Viscosity > 0) || !(p.RelativePermittivity >= 1) || len(notes) == 0 {
				t.Fatalf("%s at %g K: %+v", key, k, p)
			}
		}
	}
}

func TestLiquidPropertiesPanicsOutsideDomain(t *testing.T) {
	t.Parallel()
	water := liquid(t, loadEmbedded(t), "water")
	for _, k := range []float64{library.LiquidMinTempK - 1, library.LiquidMaxTempK + 1, math.NaN(), math.Inf(1)} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("Properties(%g) did not panic", k)
				}
			}()
			water.Properties(k)
		}()
	}
}

func TestLiquidNotes(t *testing.T) {
	t.Parallel()
	g := liquid(t, loadEmbedded(t), "glycerol")
	tests := []struct {
		tempC float64
		want  []string
	}{
		{60, []string{"viscosity of Glycerol (anhydrous) at 60 °C: tabulated value; source: from memory (typical of L. B. Segur",
			"relative permittivity of Glycerol (anhydrous) at 60 °C: the value at 25 °C used at every temperature",
			"refractive index of Glycerol (anhydrous) 1.4746"}},
		{65, []string{"viscosity of Glycerol (anhydrous) at 65 °C: interpolated with ln(viscosity) linear in 1/T (Andrade 1930)",
			"density of Glycerol (anhydrous) at 65 °C: interpolated linearly in temperature"}},
		{-20, []string{"OUTSIDE its sourced range 0 °C to 100 °C", "EXTRAPOLATED with ln(viscosity) linear in 1/T (Andrade 1930) beyond the tabulated 0 °C to 100 °C"}},
	}
	for _, tc := range tests {
		_, notes := g.Properties(physics.Kelvin(tc.tempC))
		all := strings.Join(notes, "\n")
		for _, w := range tc.want {
			if !strings.Contains(all, w) {
				t.Errorf("glycerol at %g °C: notes\n%s\nlack %q", tc.tempC, all, w)
			}
		}
	}
}

// UN GHS chapter 2.6: a flash point below 60 °C makes a flammable liquid [pub].
func TestLiquidFlags(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	for key, want := range map[string]struct{ flammable, aqueous bool }{
		"water": {false, true}, "glycerol_water_50": {false, true}, "glycerol": {false, false},
		"ethanol": {true, false}, "isopropanol": {true, false}, "toluene": {true, false},
		"hexadecane": {false, false}, "pdms_100cst": {false, false},
	} {
		l := liquid(t, lib, key)
		if l.Flammable != want.flammable || l.Aqueous != want.aqueous {
			t.Errorf("%s: flammable %t aqueous %t, want %t %t", key, l.Flammable, l.Aqueous, want.flammable, want.aqueous)
		}
	}
}

// TestLiquidPhaseLimits checks the library's melting and boiling points
// against published values (CRC Handbook, 97th ed., Physical Constants of
// Organic Compounds and Fixed Points on the ITS-90, [memory]; Lange's
// Handbook table 5.13 for 50 % glycerol-water, [pub]) and the lowest
// liquid temperature of a supercooling liquid.
func TestLiquidPhaseLimits(t *testing.T) {
	t.Parallel()
	lib := loadEmbedded(t)
	for key, want := range map[string]struct{ lowestC, boilingC float64 }{
		"water": {0, 99.97}, "glycerol_water_50": {-22.0, 106}, "glycerol": {-93, 290},
		"ethylene_glycol": {-12.7, 197.3}, "propylene_glycol": {-60, 187.6},
		"ethanol": {-114.1, 78.3}, "isopropanol": {-87.9, 82.3}, "hexadecane": {18.2, 286.9},
		"toluene": {-94.9, 110.6}, "pdms_100cst": {-55, math.Inf(1)}, "white_mineral_oil": {-15, math.Inf(1)},
	} {
		l := liquid(t, lib, key)
		if got := l.LowestLiquidK() - physics.CelsiusZero; math.Abs(got-want.lowestC) > 1e-9 {
			t.Errorf("%s: lowest liquid temperature %g degC, want %g", key, got, want.lowestC)
		}
		if got := l.BoilingK() - physics.CelsiusZero; !(math.Abs(got-want.boilingC) <= 1e-9 || got == want.boilingC) {
			t.Errorf("%s: boiling point %g degC, want %g", key, got, want.boilingC)
		}
	}
	if g := liquid(t, lib, "glycerol"); g.MeltingC.Value != 18.1 {
		t.Errorf("glycerol melts at %g degC, want 18.1 (CRC)", g.MeltingC.Value)
	}
}

func ExampleLiquid_Properties() {
	lib, err := library.Load(rules.FS)
	if err != nil {
		panic(err)
	}
	p, _ := lib.Liquids["glycerol"].Properties(physics.Kelvin(20))
	fmt.Printf("glycerol at 20 °C: %.0f mPa s, %.1f kg/m^3, in sourced range: %t\n", p.Viscosity*1e3, p.Density, p.InSourcedRange)
	// Output: glycerol at 20 °C: 1412 mPa s, 1260.8 kg/m^3, in sourced range: true
}

func BenchmarkLiquidProperties(b *testing.B) {
	lib := loadEmbedded(b)
	g := lib.Liquids["glycerol"]
	k := physics.Kelvin(37)
	for b.Loop() {
		g.Properties(k)
	}
}
