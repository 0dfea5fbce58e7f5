package physics

import (
	"errors"
	"fmt"
	"math"
	"strings"
)

// ErrUnknownSalt is wrapped by the errors of ParseSalt and SymmetricIons: the
// formula or the valences do not describe an electroneutral salt of known
// ions.
var ErrUnknownSalt = errors.New("physics: unknown salt")

// Salt is a fully dissociating strong electrolyte: one formula unit releases
// CationsPerUnit cations of charge +CationValence and AnionsPerUnit anions of
// charge -AnionValence. AnionValence is stored as a positive magnitude.
type Salt struct {
	Formula                                                    string
	CationValence, AnionValence, CationsPerUnit, AnionsPerUnit int
}

// saltIon is an entry of the ion tables ParseSalt reads formulas with.
type saltIon struct {
	symbol  string
	valence int // magnitude
}

// Iron is taken as Fe3+ only, so FeCl3 parses and FeCl2 is reported as
// unbalanced; no table entry depends on oxidation-state guessing.
var saltCations = []saltIon{
	{"H", 1}, {"Li", 1}, {"Na", 1}, {"K", 1}, {"Rb", 1}, {"Cs", 1}, {"NH4", 1},
	{"Mg", 2}, {"Ca", 2}, {"Sr", 2}, {"Ba", 2}, {"Zn", 2}, {"Cu", 2},
	{"Fe", 3}, {"Al", 3}, {"La", 3},
}

var saltAnions = []saltIon{
	{"F", 1}, {"Cl", 1}, {"Br", 1}, {"I", 1}, {"OH", 1}, {"NO3", 1}, {"ClO4", 1}, {"HCO3", 1},
	{"SO4", 2}, {"CO3", 2}, {"PO4", 3},
}

// maxIonValence bounds explicit valences: no simple aqueous ion carries more
// than four charges (Th4+, Ce4+), so a larger number is a typing error.
const maxIonValence = 4

// ParseSalt reads a neutral salt formula written as one cation term followed
// by one anion term, each an ion symbol with an optional count, polyatomic
// ions in parentheses when counted: NaCl, KNO3, CaCl2, MgSO4, Na2SO4, AlCl3,
// Ca(NO3)2, Al2(SO4)3, (NH4)2SO4. Known cations: H, Li, Na, K, Rb, Cs, NH4
// (1+); Mg, Ca, Sr, Ba, Zn, Cu (2+); Fe, Al, La (3+). Known anions: F, Cl, Br,
// I, OH, NO3, ClO4, HCO3 (1-); SO4, CO3 (2-); PO4 (3-). Symbols are
// case-sensitive; surrounding white space is ignored.
//
// The counts must balance the charges (CationsPerUnit x CationValence =
// AnionsPerUnit x AnionValence) and be in lowest terms. Any other text gives
// an error wrapping ErrUnknownSalt that quotes the formula and says what is
// wrong. It never panics.
//
// Reference: IUPAC, Nomenclature of Inorganic Chemistry, Recommendations 2005
// (Connelly et al., RSC 2005), IR-4 for the formula conventions.
func ParseSalt(formula string) (Salt, error) {
	f := strings.TrimSpace(formula)
	fail := func(reason string, args ...any) (Salt, error) {
		return Salt{}, fmt.Errorf("%w %q: %s", ErrUnknownSalt, f, fmt.Sprintf(reason, args...))
	}
	if f == "" {
		return fail("empty formula")
	}
	cation, nCation, rest, err := parseSaltTerm(f, saltCations)
	if err != nil {
		return fail("cation: %v", err)
	}
	anion, nAnion, rest, err := parseSaltTerm(rest, saltAnions)
	if err != nil {
		return fail("anion: %v", err)
	}
	if rest != "" {
		return fail("unexpected %q after the anion", rest)
	}
	if nCation*cation.valence != nAnion*anion.valence {
		return fail("charges do not balance: %d %s (%d+) against %d %s (%d-)",
			nCation, cation.symbol, cation.valence, nAnion, anion.symbol, anion.valence)
	}
	if saltGCD(nCation, nAnion) != 1 {
		return fail("counts %d and %d are not in lowest terms", nCation, nAnion)
	}
	return Salt{
		Formula:        f,
		CationValence:  cation.valence,
		AnionValence:   anion.valence,
		CationsPerUnit: nCation,
		AnionsPerUnit:  nAnion,
	}, nil
}

// parseSaltTerm reads one ion term, "Sym", "SymN", "(Sym)" or "(Sym)N", from
// the start of s, taking the longest matching symbol of table (ClO4 before
// Cl). A count written straight after a polyatomic symbol (CaNO32) is
// refused: it cannot be told from a subscript of the ion.
func parseSaltTerm(s string, table []saltIon) (saltIon, int, string, error) {
	paren := strings.HasPrefix(s, "(")
	if paren {
		s = s[1:]
	}
	var ion saltIon
	for _, cand := range table {
		if len(cand.symbol) > len(ion.symbol) && strings.HasPrefix(s, cand.symbol) {
			ion = cand
		}
	}
	if ion.symbol == "" {
		return ion, 0, "", fmt.Errorf("no known ion at %q", s)
	}
	s = s[len(ion.symbol):]
	if paren {
		if !strings.HasPrefix(s, ")") {
			return ion, 0, "", fmt.Errorf("missing ) after %s", ion.symbol)
		}
		s = s[1:]
	}
	digits := len(s) - len(strings.TrimLeft(s, "0123456789"))
	if digits == 0 {
		return ion, 1, s, nil
	}
	if !paren && saltIonIsPolyatomic(ion.symbol) {
		return ion, 0, "", fmt.Errorf("write (%s)%s for a count of %s", ion.symbol, s[:digits], ion.symbol)
	}
	if digits > 2 || s[0] == '0' {
		return ion, 0, "", fmt.Errorf("bad count %q for %s", s[:digits], ion.symbol)
	}
	n := 0
	for _, d := range s[:digits] {
		n = 10*n + int(d-'0')
	}
	return ion, n, s[digits:], nil
}

// saltIonIsPolyatomic reports whether a symbol names more than one atom: it
// holds a digit or a second capital letter (NH4, OH, SO4).
func saltIonIsPolyatomic(symbol string) bool {
	capitals := 0
	for _, r := range symbol {
		switch {
		case r >= '0' && r <= '9':
			return true
		case r >= 'A' && r <= 'Z':
			capitals++
		}
	}
	return capitals > 1
}

// saltGCD is Euclid's greatest common divisor of two positive counts.
func saltGCD(a, b int) int {
	for b != 0 {
		a, b = b, a%b
	}
	return a
}

// Ions returns the cation (positive valence) and the anion (negative
// valence) released by the salt at a salt concentration in mol/m^3, assuming
// complete dissociation.
//
// It panics on a negative or non-finite concentration.
//
// Reference: S. Arrhenius, Z. Phys. Chem. 1, 631 (1887), complete
// dissociation of strong electrolytes.
func (s Salt) Ions(concentration float64) [2]Ion {
	if !(concentration >= 0 && concentration <= math.MaxFloat64) {
		panic("physics: Salt.Ions needs a finite concentration >= 0")
	}
	return [2]Ion{
		{Valence: s.CationValence, Concentration: float64(s.CationsPerUnit) * concentration},
		{Valence: -s.AnionValence, Concentration: float64(s.AnionsPerUnit) * concentration},
	}
}

// SymmetricIons returns the ions of an electroneutral salt given only by its
// valences, at a salt concentration in mol/m^3: one formula unit holds
// |anionValence|/g cations and cationValence/g anions, g their greatest
// common divisor, so (1, 1) is like NaCl, (2, 1) like CaCl2, (2, 2) like
// MgSO4 and (3, 2) like Al2(SO4)3. The anion valence may be given as a
// magnitude or with its minus sign.
//
// It returns an error wrapping ErrUnknownSalt unless 1 <= cationValence <= 4
// and 1 <= |anionValence| <= 4. It panics on a negative or non-finite
// concentration.
//
// Reference: as Salt.Ions (complete dissociation, electroneutrality).
func SymmetricIons(cationValence, anionValence int, concentration float64) ([2]Ion, error) {
	za := anionValence
	if za < 0 {
		za = -za
	}
	if cationValence < 1 || cationValence > maxIonValence || za < 1 || za > maxIonValence {
		return [2]Ion{}, fmt.Errorf("%w: valences (%d, %d): cation 1 to %d, anion magnitude 1 to %d",
			ErrUnknownSalt, cationValence, anionValence, maxIonValence, maxIonValence)
	}
	g := saltGCD(cationValence, za)
	s := Salt{CationValence: cationValence, AnionValence: za, CationsPerUnit: za / g, AnionsPerUnit: cationValence / g}
	return s.Ions(concentration), nil
}
