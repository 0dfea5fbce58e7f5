package physics_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"colloidtriage/physics"
)

func TestParseSalt(t *testing.T) {
	t.Parallel()
	// Formula charges from the ions' standard oxidation states (IUPAC Red
	// Book 2005) [pub]; counts read off the formulas.
	cases := []struct {
		formula                     string
		zc, za, perCation, perAnion int
	}{
		{"NaCl", 1, 1, 1, 1},
		{"KNO3", 1, 1, 1, 1},
		{"NaNO3", 1, 1, 1, 1},
		{"HCl", 1, 1, 1, 1},
		{"KOH", 1, 1, 1, 1},
		{"NaClO4", 1, 1, 1, 1},
		{"NaHCO3", 1, 1, 1, 1},
		{"CsI", 1, 1, 1, 1},
		{"CaCl2", 2, 1, 1, 2},
		{"MgCl2", 2, 1, 1, 2},
		{"Ca(NO3)2", 2, 1, 1, 2},
		{"Mg(NO3)2", 2, 1, 1, 2},
		{"Ca(OH)2", 2, 1, 1, 2},
		{"MgSO4", 2, 2, 1, 1},
		{"ZnSO4", 2, 2, 1, 1},
		{"CaCO3", 2, 2, 1, 1},
		{"Na2SO4", 1, 2, 2, 1},
		{"K2SO4", 1, 2, 2, 1},
		{"(NH4)2SO4", 1, 2, 2, 1},
		{"Na3PO4", 1, 3, 3, 1},
		{"AlCl3", 3, 1, 1, 3},
		{"LaCl3", 3, 1, 1, 3},
		{"FeCl3", 3, 1, 1, 3},
		{"Al(NO3)3", 3, 1, 1, 3},
		{"AlPO4", 3, 3, 1, 1},
		{"Al2(SO4)3", 3, 2, 2, 3},
		{"  NaCl ", 1, 1, 1, 1},
	}
	for _, c := range cases {
		s, err := physics.ParseSalt(c.formula)
		if err != nil {
			t.Errorf("ParseSalt(%q): %v", c.formula, err)
			continue
		}
		want := physics.Salt{Formula: strings.TrimSpace(c.formula), CationValence: c.zc, AnionValence: c.za,
			CationsPerUnit: c.perCation, AnionsPerUnit: c.perAnion}
		if s != want {
			t.Errorf("ParseSalt(%q) = %+v, want %+v", c.formula, s, want)
		}
	}
}

func TestParseSaltErrors(t *testing.T) {
	t.Parallel()
	// Formulas that are not electroneutral salts of known ions [practice].
	cases := []struct {
		formula, mention string
	}{
		{"", "empty"},
		{"XyCl", "no known ion"},
		{"NaXy", "no known ion"},
		{"Na", "no known ion"},
		{"Cl", "no known ion"},
		{"nacl", "no known ion"},
		{"CaCl", "do not balance"},
		{"Na2Cl", "do not balance"},
		{"FeCl2", "do not balance"},
		{"HCO3", "do not balance"},
		{"Na2Cl2", "lowest terms"},
		{"CaNO32", "write (NO3)2"},
		{"Ca(NO3", "missing )"},
		{"NaCl!", "unexpected"},
		{"NaClNaCl", "unexpected"},
		{"NaCl0", "bad count"},
		{"Na100Cl", "bad count"},
		{"SO4Na2", "no known ion"},
		{"Na citrate", "no known ion"},
	}
	for _, c := range cases {
		_, err := physics.ParseSalt(c.formula)
		if err == nil {
			t.Errorf("ParseSalt(%q): no error", c.formula)
			continue
		}
		if !errors.Is(err, physics.ErrUnknownSalt) {
			t.Errorf("ParseSalt(%q) error %v does not wrap ErrUnknownSalt", c.formula, err)
		}
		msg := err.Error()
		if !strings.Contains(msg, c.mention) || !strings.Contains(msg, strings.TrimSpace(c.formula)) {
			t.Errorf("ParseSalt(%q) error %q should quote the formula and mention %q", c.formula, msg, c.mention)
		}
	}
}

func TestIonicStrengthOfSalts(t *testing.T) {
	t.Parallel()
	// Lewis & Randall 1921, I = 1/2 sum c z^2, by hand for 1 mM (1 mol/m^3)
	// of each salt [calc]: 1:1 -> 1, 2:1 and 1:2 -> 3, 2:2 -> 4, 3:1 -> 6,
	// 3:2 -> 15 mM.
	cases := []struct {
		formula string
		want    float64
	}{
		{"NaCl", 1},
		{"CaCl2", 3},
		{"MgSO4", 4},
		{"AlCl3", 6},
		{"LaCl3", 6},
		{"Na2SO4", 3},
		{"Al2(SO4)3", 15},
	}
	for _, c := range cases {
		s, err := physics.ParseSalt(c.formula)
		if err != nil {
			t.Fatalf("ParseSalt(%q): %v", c.formula, err)
		}
		ions := s.Ions(1)
		if got := physics.IonicStrength(ions[:]); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("ionic strength of 1 mM %s = %v mM, want %v", c.formula, got, c.want)
		}
		if ions[0].Valence <= 0 || ions[1].Valence >= 0 {
			t.Errorf("%s ions %+v: want cation positive, anion negative", c.formula, ions)
		}
	}
}

func TestSymmetricIons(t *testing.T) {
	t.Parallel()
	// Electroneutral salts of given valences; ionic strength of 1 mM by hand
	// (Lewis & Randall 1921) [calc].
	cases := []struct {
		zc, za int
		want   float64
	}{
		{1, 1, 1},
		{2, 1, 3},
		{1, 2, 3},
		{2, 2, 4},
		{3, 1, 6},
		{3, 2, 15},
		{2, -1, 3},
		{4, 2, 12}, // like Th(SO4)2: 1 x 16 + 2 x 4, halved
	}
	for _, c := range cases {
		ions, err := physics.SymmetricIons(c.zc, c.za, 1)
		if err != nil {
			t.Errorf("SymmetricIons(%d, %d): %v", c.zc, c.za, err)
			continue
		}
		if got := physics.IonicStrength(ions[:]); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("SymmetricIons(%d, %d): I = %v, want %v", c.zc, c.za, got, c.want)
		}
		charge := float64(ions[0].Valence)*ions[0].Concentration + float64(ions[1].Valence)*ions[1].Concentration
		if charge != 0 {
			t.Errorf("SymmetricIons(%d, %d) = %+v is not electroneutral", c.zc, c.za, ions)
		}
	}
	for _, bad := range [][2]int{{0, 1}, {1, 0}, {-1, 1}, {5, 1}, {1, -5}} {
		if _, err := physics.SymmetricIons(bad[0], bad[1], 1); !errors.Is(err, physics.ErrUnknownSalt) {
			t.Errorf("SymmetricIons(%d, %d): error %v, want ErrUnknownSalt", bad[0], bad[1], err)
		}
	}
}
