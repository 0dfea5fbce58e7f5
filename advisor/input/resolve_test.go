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
