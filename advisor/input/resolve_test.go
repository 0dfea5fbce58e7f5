package input_test

import (
	"encoding/json"
	"errors"
	"math"
	"slices"
	"strings"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/library"
	"colloidtriage/rules"
)

func loadLibrary(t *testing.T) *library.Library {
	t.Helper()
	lib, err := library.Load(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	return lib
}

func sample(t *testing.T, js string) *input.Sample {
	t.Helper()
	var s input.Sample
	if err := json.Unmarshal([]byte(js), &s); err != nil {
		t.Fatal(err)
	}
	return &s
}

func near(got, want, rel float64) bool { return math.Abs(got-want) <= rel*math.Abs(want) }

// TestResolveFills checks what Resolve fills in and notes. Expected values
// come from the library YAML (rules/library/*.yaml) and published data, not
// from the code:
//   - titania_rutile: density 4250 kg/m^3, isoelectric pH 5.5, Hamaker
//     constant across water 60 zJ, phase solid (materials.yaml);
//   - water at 25 °C: density 997.047 kg/m^3 (Kell 1975; the polynomial
//     agrees within about 3 ppm) [pub], viscosity
//     0.8900 mPa s (IAPWS R12-08) [pub], relative permittivity 78.30
//     (Malmberg & Maryott 1956) [pub];
//   - ionic strength I = 1/2 sum c z^2 (Lewis & Randall 1921) [pub]: 10 mM
//     NaCl gives 10 mM, 5 mM CaCl2 gives 15 mM (3 per mM of salt);
//   - neutral water holds 1e-7 mol/L each of H+ and OH- (Kw = 1e-14 at
//     25 °C) [pub]: 1e-4 mol/m^3, its floor; pH 2 adds 10 mol/m^3 of a 1:1
//     acid;
//   - Henry's function: 1.5 in Smoluchowski's limit, 1 in Hückel's [pub].
func TestResolveFills(t *testing.T) {
	t.Parallel()
	lib := loadLibrary(t)
	tests := []struct {
		name  string
		js    string
		check func(t *testing.T, c *input.Conditions)
		notes []string // substrings, each in some note
	}{
		{
			name: "material and liquid from the library",
			js: `{"symptom":"settling","particles":{"material":"titania_rutile","diameter_nm":300},
				"medium":{"liquid":"water","temperature_c":25,"electrolytes":[{"formula":"NaCl","concentration_mM":10}]}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if c.ParticleDensity != 4250 || c.IsoelectricPH != 5.5 || c.Phase != "solid" {
					t.Errorf("density %g, iep %g, phase %q; want 4250, 5.5, solid", c.ParticleDensity, c.IsoelectricPH, c.Phase)
				}
				if !near(c.Hamaker, 60e-21, 1e-12) {
					t.Errorf("Hamaker %g J, want 6e-20", c.Hamaker)
				}
				if !near(c.Liquid.Density, 997.047, 1e-5) || !near(c.Liquid.Viscosity, 0.8900e-3, 1e-4) ||
					!near(c.Liquid.Permittivity, 78.30, 1e-4) || !c.Liquid.Aqueous {
					t.Errorf("water at 25 degC: %+v", c.Liquid)
				}
				if !near(c.Radius, 150e-9, 1e-12) || !near(c.StorageTempK, 298.15, 1e-12) {
					t.Errorf("radius %g m, storage %g K; want 1.5e-7, 298.15", c.Radius, c.StorageTempK)
				}
				if !near(c.IonicStrength, 10, 1e-12) || c.MultivalentSalt != "" {
					t.Errorf("ionic strength %g mol/m^3, multivalent %q; want 10 and none", c.IonicStrength, c.MultivalentSalt)
				}
			},
			notes: []string{"particles.density_kg_m3 = ", `kg/m^3 from the library entry "titania_rutile"`,
				`hamaker_zJ = 60 zJ across water from the library entry "titania_rutile"`,
				`particles.isoelectric_ph = 5.5 pH from the library entry "titania_rutile"`,
				"particles.volume_fraction not given: default", "storage.temperature_c not given"},
		},
		{
			name: "multivalent salt",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"electrolytes":[{"formula":"CaCl2","concentration_mM":5}]}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if !near(c.IonicStrength, 15, 1e-12) || c.MultivalentSalt != "CaCl2" || !near(c.MultivalentConc, 5, 1e-12) ||
					!near(c.MultivalentIonicShare, 3, 1e-12) {
					t.Errorf("I %g, salt %q at %g, share %g; want 15, CaCl2 at 5, 3",
						c.IonicStrength, c.MultivalentSalt, c.MultivalentConc, c.MultivalentIonicShare)
				}
			},
			notes: []string{"medium.temperature_c not given: default"},
		},
		{
			name: "neutral water without salt",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"liquid":"water"}}`,
			check: func(t *testing.T, c *input.Conditions) {
				// Kw = 1.01e-14 (mol/kg)^2 at 25 degC (CRC, pKw 13.995) [pub]: [H+] = [OH-] = 1.005e-7 mol/kg,
				// 1.003e-4 mol/m^3 at 997 kg/m^3 [calc], the ionic strength of neutral water (to the 0.01 uncertainty
				// in pKw of the Bandura & Lvov fit the code uses).
				if !near(c.IonicStrength, 1.003e-4, 2e-3) || len(c.Ions) != 2 {
					t.Errorf("ionic strength %g mol/m^3 from %d ions, want the autoionisation of water, 1.003e-4 from H+ and OH-",
						c.IonicStrength, len(c.Ions))
				}
			},
			notes: []string{"no electrolyte and no pH stated: the H+ and OH- of neutral water only"},
		},
		{
			name: "acid pH adds its ions",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"ph":2}}`,
			check: func(t *testing.T, c *input.Conditions) {
				// pH 2 on the molality scale: 1e-2 mol/kg H+ with as much monovalent anion, 9.970 mol/m^3
				// at 997.05 kg/m^3 (Kell 1975) [calc].
				if !near(c.IonicStrength, 9.9705, 1e-4) || c.PH != 2 {
					t.Errorf("ionic strength %g mol/m^3 at pH %g, want 9.9705 at 2", c.IonicStrength, c.PH)
				}
			},
			notes: []string{"pH 2: 9.97 mM of H+ or OH-"},
		},
		{
			name: "no ions in an oil",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"liquid":"hexadecane"}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if c.IonicStrength != 0 || c.Liquid.Aqueous {
					t.Errorf("ionic strength %g, aqueous %v; want 0, false", c.IonicStrength, c.Liquid.Aqueous)
				}
			},
		},
		{
			name: "Smoluchowski's limit",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650,"mobility_um_cm_per_V_s":-2},
				"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":10}]},"models":{"zeta_from_mobility":"smoluchowski"}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if c.Henry != 1.5 || c.ZetaSource != "mobility" || !(c.Zeta < 0) {
					t.Errorf("Henry %g, zeta %g V from %q; want 1.5 and a negative zeta from mobility", c.Henry, c.Zeta, c.ZetaSource)
				}
			},
			notes: []string{"Smoluchowski's limit"},
		},
		{
			name: "Hückel's limit",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650,"mobility_um_cm_per_V_s":-2},
				"medium":{"liquid":"toluene"},"models":{"zeta_from_mobility":"huckel"}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if c.Henry != 1 {
					t.Errorf("Henry %g, want 1", c.Henry)
				}
			},
		},
		{
			// 100 mM NaCl is 0.1 mol/kg of water: 0.1 mol/kg NaCl freezes
			// at -0.348 degC (CRC, Concentrative Properties of Aqueous
			// Solutions) [pub]; the ideal law says 0.373 K. A storage
			// temperature below it is not an error.
			name: "salt water frozen in storage",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"temperature_c":20,"electrolytes":[{"formula":"NaCl","concentration_mM":100}]},
				"storage":{"min_temperature_c":-8,"freeze_thaw_cycles":3}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if got := c.FreezingK - 273.15; !near(got, -0.348, 0.08) {
					t.Errorf("freezing point %g degC, want -0.348 within 8 %%", got)
				}
				if !near(c.MinStorageTempK, 265.15, 1e-12) || !near(c.StorageTempK, 293.15, 1e-12) || !c.StorageRange || c.FreezeThawCycles != 3 {
					t.Errorf("cold end %g K, warm end %g K, range %v, cycles %g; want 265.15, 293.15, true, 3",
						c.MinStorageTempK, c.StorageTempK, c.StorageRange, c.FreezeThawCycles)
				}
			},
			notes: []string{"storage range -8 to 20 degC", "freezing at the cold end"},
		},
		{
			// ASHRAE Handbook Fundamentals (2009) ch. 31 [pub]: 40 % w/w
			// propylene glycol freezes at -21.1 degC, 1036.2 kg/m^3 at 20 degC.
			name: "propylene glycol in water",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"temperature_c":20,"cosolvents":[{"name":"propylene_glycol","mass_fraction":0.4}]}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if got := c.FreezingK - 273.15; math.Abs(got+21.1) > 0.6 {
					t.Errorf("freezing point %g degC, want -21.1 within 0.6 K", got)
				}
				if !near(c.Liquid.Density, 1036.2, 0.007) || c.CosolventFraction != 0.4 {
					t.Errorf("density %g kg/m^3, fraction %g; want 1036.2, 0.4", c.Liquid.Density, c.CosolventFraction)
				}
			},
			notes: []string{"liquid: water with propylene_glycol at mass fraction 0.4"},
		},
		{
			// A gear pump shears at 1e4 to 1e5 1/s (tip speed over
			// clearance, v/h) [practice]: geometric mean 3.16e4 1/s.
			name: "process step",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"storage":{"process_step":"gear_pump"}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if !near(c.Shear, 31622.8, 1e-5) || c.ProcessStep != "gear_pump" {
					t.Errorf("shear %g 1/s from %q, want 31622.8 from gear_pump", c.Shear, c.ProcessStep)
				}
			},
			notes: []string{"from storage.process_step gear_pump"},
		},
		{
			name: "explicit shear wins over the process step",
			js: `{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"storage":{"process_step":"gear_pump","shear_rate_per_s":50}}`,
			check: func(t *testing.T, c *input.Conditions) {
				if c.Shear != 50 || c.ProcessStep != "" {
					t.Errorf("shear %g 1/s from %q, want 50 stated", c.Shear, c.ProcessStep)
				}
			},
			notes: []string{"storage.shear_rate_per_s given: it wins"},
		},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			t.Parallel()
			n := input.NewNotes(32)
			c, err := input.Resolve(sample(t, tt.js), lib, n)
			if err != nil {
				t.Fatal(err)
			}
			tt.check(t, c)
			for _, want := range tt.notes {
				if !slices.ContainsFunc(n.List(), func(s string) bool { return strings.Contains(s, want) }) {
					t.Errorf("no note with %q in %q", want, n.List())
				}
			}
		})
	}
}

// TestResolveErrors checks the problems Resolve reports with their JSON
// pointers. Toluene's properties are sourced over 0-100 °C
// (liquids.yaml), which the advisor extends by 10 K.
func TestResolveErrors(t *testing.T) {
	t.Parallel()
	lib := loadLibrary(t)
	tests := []struct {
		name, js string
		want     input.FieldProblem
	}{
		{
			name: "medium above the liquid's range",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"liquid":"toluene","temperature_c":130}}`,
			want: input.FieldProblem{Pointer: "/medium/temperature_c", Unit: "degC", Valid: "-10 <= value <= 110"},
		},
		{
			name: "storage below the liquid's range",
			js: `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"liquid":"toluene","temperature_c":25},
				"storage":{"temperature_c":-40}}`,
			want: input.FieldProblem{Pointer: "/storage/temperature_c", Unit: "degC", Valid: "-10 <= value <= 110"},
		},
		{
			name: "unknown salt",
			js: `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":1},{"formula":"XyZ2","concentration_mM":1}]}}`,
			want: input.FieldProblem{Pointer: "/medium/electrolytes/1/formula"},
		},
		{
			name: "unknown co-solvent",
			js: `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"cosolvents":[{"name":"methanol","mass_fraction":0.2}]}}`,
			want: input.FieldProblem{Pointer: "/medium/cosolvents/0/name", Valid: "one of: ethylene_glycol, propylene_glycol, glycerol, ethanol"},
		},
		{
			name: "co-solvent in an oil",
			js: `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"liquid":"toluene","cosolvents":[{"name":"glycerol","mass_fraction":0.2}]}}`,
			want: input.FieldProblem{Pointer: "/medium/cosolvents"},
		},
		{
			// Lange's table 5.13 ends at 56.1 % ethanol.
			name: "ethanol beyond its table",
			js: `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"medium":{"cosolvents":[{"name":"ethanol","mass_fraction":0.58}]}}`,
			want: input.FieldProblem{Pointer: "/medium/cosolvents/0/mass_fraction", Unit: "1", Valid: "0 <= value <= 0.561"},
		},
		{
			// Water melts at 0 degC and boils at 99.97 degC (ITS-90).
			name: "medium water below its freezing point",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"temperature_c":-5}}`,
			want: input.FieldProblem{Pointer: "/medium/temperature_c", Unit: "degC", Valid: "0 <= value <= 99.97"},
		},
		{
			// n-hexadecane melts at 18.2 degC (CRC).
			name: "medium hexadecane below its melting point",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"liquid":"hexadecane","temperature_c":16}}`,
			want: input.FieldProblem{Pointer: "/medium/temperature_c", Unit: "degC", Valid: "18.2 <= value <= 286.9"},
		},
		{
			// 50 % w/w glycerol-water freezes at -22.0 degC (Lange table
			// 5.13) and boils at about 106 degC [memory].
			name: "medium glycerol-water above its boiling point",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},"medium":{"liquid":"glycerol_water_50","temperature_c":108}}`,
			want: input.FieldProblem{Pointer: "/medium/temperature_c", Unit: "degC", Valid: "-22 <= value <= 106"},
		},
		{
			name: "storage range upside down",
			js: `{"symptom":"settling","particles":{"diameter_nm":200,"density_kg_m3":2650},
				"storage":{"min_temperature_c":30,"max_temperature_c":10}}`,
			want: input.FieldProblem{Pointer: "/storage/min_temperature_c", Unit: "degC", Valid: "value <= 10"},
		},
		{
			name: "no density",
			js:   `{"symptom":"settling","particles":{"diameter_nm":200}}`,
			want: input.FieldProblem{Pointer: "/particles/density_kg_m3", Unit: "kg/m^3"},
		},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			t.Parallel()
			_, err := input.Resolve(sample(t, tt.js), lib, input.NewNotes(8))
			var bad *input.Error
			if !errors.As(err, &bad) {
				t.Fatalf("error %v, want an *input.Error", err)
			}
			if len(bad.Problems) != 1 {
				t.Fatalf("problems %+v, want one", bad.Problems)
			}
			p := bad.Problems[0]
			if p.Pointer != tt.want.Pointer || p.Unit != tt.want.Unit || (tt.want.Valid != "" && p.Valid != tt.want.Valid) || p.Reason == "" {
				t.Errorf("problem %+v, want pointer %q, unit %q, valid %q and a reason", p, tt.want.Pointer, tt.want.Unit, tt.want.Valid)
			}
		})
	}
}
