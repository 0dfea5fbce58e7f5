package remedy_test

import (
	"strings"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
	"colloidtriage/physics"
)

func water(product, phase, kind string, ionicStrength float64) *input.Conditions {
	c := &input.Conditions{Product: product, Phase: phase, MaterialKind: kind, StorageTempK: 298.15, MinStorageTempK: 298.15,
		ParticleDensity: 1050, PH: 7, IsoelectricPH: 3}
	c.Liquid = input.LiquidState{Key: "water", Density: 997, Permittivity: 78.4, Aqueous: true}
	c.Ions = []physics.Ion{{Valence: 1, Concentration: ionicStrength}, {Valence: -1, Concentration: ionicStrength}}
	c.IonicStrength = ionicStrength
	return c
}

// TestPracticalLimits holds each finding of the issue to its limit.
func TestPracticalLimits(t *testing.T) {
	for _, tc := range []struct {
		name     string
		cond     *input.Conditions
		target   remedy.Target
		feasible bool
	}{
		// Bead mills reach a median of about 100 nm [practice].
		{"slurry milled to 9.5 nm", water("polishing", "solid", "oxide", 1), remedy.Target{"particles.diameter_nm", "<=", 9.5, "nm"}, false},
		{"suspension milled to 43.5 nm", water("pharmaceutical", "solid", "organic", 1), remedy.Target{"particles.diameter_nm", "<=", 43.5, "nm"}, false},
		{"milled to 400 nm", water("paint", "solid", "oxide", 1), remedy.Target{"particles.diameter_nm", "<=", 400, "nm"}, true},
		// A 0.04 kg/m3 window: water's density moves 0.2 kg/m3 per kelvin
		// (expansivity 2.1e-4 /K at 20 degC, Kell 1975 [pub]).
		{"density match of 0.04 kg/m3", water("cosmetic", "solid", "latex", 1), remedy.Target{"medium.density_kg_m3", ">=", 1049.96, "kg/m^3"}, false},
		// Saturated sucrose solution: about 1330 kg/m3 (CRC Handbook, sucrose 67 % w/w [pub]).
		{"aqueous liquid at 1500 kg/m3", water("paint", "solid", "oxide", 1), remedy.Target{"medium.density_kg_m3", ">=", 1500, "kg/m^3"}, false},
		// Grahame in 250 mM 1:1 salt with an electrokinetic charge of
		// 0.05 C/m2: 51.4 mV asinh(0.05/0.0587) = 39.7 mV [calc].
		{"48 mV in 250 mM", water("food", "solid", "oxide", 250), remedy.Target{"|particles.zeta_mV|", ">=", 48, "mV"}, false},
		{"35 mV in 250 mM", water("food", "solid", "oxide", 250), remedy.Target{"|particles.zeta_mV|", ">=", 35, "mV"}, true},
		{"60 mV in 1 mM", water("food", "solid", "oxide", 1), remedy.Target{"|particles.zeta_mV|", ">=", 60, "mV"}, true},
		// A drink over 50 mPa s is a syrup [practice].
		{"beverage at 54 mPa s", water("beverage", "liquid", "oil", 1), remedy.Target{"medium.viscosity_mPa_s", ">=", 54, "mPa s"}, false},
		{"paint at 54 mPa s", water("paint", "solid", "oxide", 1), remedy.Target{"medium.viscosity_mPa_s", ">=", 54, "mPa s"}, true},
		// Zinc oxide dissolves below about pH 6 (Degen & Kosec 2000 [pub]).
		{"zinc oxide at pH 4", withMaterial(water("cosmetic", "solid", "oxide", 1), "zinc_oxide"), remedy.Target{"medium.ph", "<=", 4, "pH"}, false},
		{"calcite at pH 5", withMaterial(water("paper", "solid", "carbonate", 1), "calcite"), remedy.Target{"medium.ph", "<=", 5, "pH"}, false},
		{"alumina at pH 2", withMaterial(water("polishing", "solid", "oxide", 1), "alumina"), remedy.Target{"medium.ph", "<=", 2, "pH"}, false},
		{"alumina at pH 5", withMaterial(water("polishing", "solid", "oxide", 1), "alumina"), remedy.Target{"medium.ph", "<=", 5, "pH"}, true},
		// Adsorbed layers reach about 50 nm (Napper 1983 [practice]).
		{"layer of 80 nm", water("paint", "solid", "oxide", 1), remedy.Target{"stabilizer.layer_thickness_nm", ">=", 80, "nm"}, false},
	} {
		reason := remedy.Practical(tc.cond, tc.target, tc.target.Value)
		if (reason == "") != tc.feasible {
			t.Errorf("%s: reason %q, want feasible %v", tc.name, reason, tc.feasible)
		}
		if reason != "" && !strings.Contains(reason, "[") {
			t.Errorf("%s: reason %q names no source tag", tc.name, reason)
		}
	}
}

func withMaterial(c *input.Conditions, key string) *input.Conditions {
	c.Material = key
	return c
}

// TestYieldStressWorthSpecifying: a yield stress of 1e-5 Pa cannot be
// measured; the target carries a safety factor of 2 and is at least 0.1 Pa
// [practice].
func TestYieldStressWorthSpecifying(t *testing.T) {
	if got := remedy.SpecifiedYieldStress(1e-5); got != 0.1 {
		t.Errorf("SpecifiedYieldStress(1e-5) = %g, want 0.1", got)
	}
	if got := remedy.SpecifiedYieldStress(3); got != 6 {
		t.Errorf("SpecifiedYieldStress(3) = %g, want 6", got)
	}
}
