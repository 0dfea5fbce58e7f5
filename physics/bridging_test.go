package physics_test

import (
	"math"
	"strings"
	"testing"

	"colloidtriage/physics"
)

func TestPolymerCoilSize(t *testing.T) {
	t.Parallel()
	// Devanand & Selser, Macromolecules 24, 5943 (1991): PEO in water,
	// Rg = 0.0215 M^0.583 nm, M in g/mol; evaluated in
	// testdata/reference/beyond_dlvo.py [calc].
	cases := []struct {
		molarMass, wantNM, tol float64
	}{
		{10, 4.61784, 1e-5},
		{100, 17.67822, 1e-5},
		{1000, 67.67659, 1e-5},
		{5000, 172.95693, 1e-5},
		{0, 0, 0},
	}
	for _, c := range cases {
		got := physics.PolymerCoilSize(c.molarMass) * 1e9
		if e := beyondRelErr(got, c.wantNM); e > c.tol {
			t.Errorf("PolymerCoilSize(%v kg/mol) = %.5f nm, want %.5f", c.molarMass, got, c.wantNM)
		}
	}
}

func TestOverlapConcentration(t *testing.T) {
	t.Parallel()
	cases := []struct {
		molarMass, rg, want, tol float64
	}{
		// Hand calculation of de Gennes' c* = 3 M/(4 pi NA Rg^3) (1979):
		// M = 1 kg/mol, Rg = 1 nm: 3/(4 pi 6.02214076e23 1e-27) = 396.43 kg/m^3.
		{1, 1e-9, 396.43, 1e-4},
		// PEO of 1000 kg/mol with the Devanand–Selser Rg, from
		// testdata/reference/beyond_dlvo.py [calc]: 1.278925 kg/m^3 (about
		// 1.3 g/L, the usual order for such a coil [practice]).
		{1000, physics.PolymerCoilSize(1000), 1.278925, 1e-5},
	}
	for _, c := range cases {
		got := physics.OverlapConcentration(c.molarMass, c.rg)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("OverlapConcentration(%v, %v) = %.6g, want %.6g", c.molarMass, c.rg, got, c.want)
		}
	}
	if got := physics.OverlapConcentration(1, 0); !math.IsInf(got, 1) {
		t.Errorf("OverlapConcentration at Rg = 0 = %v, want +Inf", got)
	}
}

func TestPolymerNumberDensity(t *testing.T) {
	t.Parallel()
	// Hand calculation n = c NA / M [calc]: 1 kg/m^3 of 100 kg/mol chains
	// is 6.022141e21 per m^3.
	cases := []struct {
		conc, molarMass, want, tol float64
	}{
		{1, 100, 6.022141e21, 1e-6},
		{0, 100, 0, 0},
		{5, 1, 5 * 6.02214076e23, 1e-12},
	}
	for _, c := range cases {
		got := physics.PolymerNumberDensity(c.conc, c.molarMass)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("PolymerNumberDensity(%v, %v) = %.6e, want %.6e", c.conc, c.molarMass, got, c.want)
		}
	}
}

func TestBridgingLikely(t *testing.T) {
	t.Parallel()
	// Rules of thumb documented on BridgingLikely: La Mer & Healy (1963)
	// coverage window [pub]; molar mass above ~1e6 g/mol and coil reaching
	// past the double-layer range [practice]. Debye length 9.6 nm is 1 mM
	// NaCl (testdata/reference/REFERENCES.md [calc]).
	rg := physics.PolymerCoilSize(5000) // 173 nm
	cases := []struct {
		name                       string
		molarMass, theta, size, dl float64
		gap                        float64
		want                       bool
		reasonMentions             string
	}{
		{"textbook flocculant", 5000, 0.5, rg, 9.6e-9, 2e-9, true, "favour"},
		{"saturated surface", 5000, 0.98, rg, 9.6e-9, 2e-9, false, "bare surface"},
		{"bare surface", 5000, 0.02, rg, 9.6e-9, 2e-9, false, "too low"},
		{"short chains", 10, 0.5, physics.PolymerCoilSize(10), 9.6e-9, 2e-9, false, "molar mass"},
		{"coil shorter than the gap and the double layer", 2000, 0.5, 5e-9, 300e-9, 50e-9, false, "does not span"},
		{"coil spans the gap though not 2 Debye lengths", 2000, 0.5, 30e-9, 300e-9, 50e-9, true, "favour"},
		{"no double layer, no barrier", 2000, 0.4, 5e-9, math.Inf(1), 0, true, "no repulsion"},
		{"edge of the window", 1000, 0.9, rg, 9.6e-9, 0, true, "favour"},
	}
	for _, c := range cases {
		got, reason := physics.BridgingLikely(c.molarMass, c.theta, c.size, c.dl, c.gap)
		if got != c.want || !strings.Contains(reason, c.reasonMentions) {
			t.Errorf("%s: BridgingLikely = %v, %q; want %v and a reason mentioning %q",
				c.name, got, reason, c.want, c.reasonMentions)
		}
	}
}
