package input

import (
	"strings"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// Molar masses of calcium carbonate and calcium oxide, g/mol, from the IUPAC
// standard atomic weights (Ca 40.078, C 12.011, O 15.999), the bases of the
// hardness units.
const (
	molarMassCaCO3 = 100.0869
	molarMassCaO   = 56.0774
)

// hardnessToMM converts a total hardness in unit to mM of Ca2+ and Mg2+
// together: mg/L as CaCO3 / 100.09; a German degree is 10 mg/L CaO
// (0.17832 mM), a French degree 10 mg/L CaCO3 (0.09991 mM).
//
// References: DIN 38409-6 and the German and French degree conventions as
// tabulated in WHO, "Hardness in drinking-water", WHO/HSE/WSH/10.01/10/Rev/1
// (2011); molar masses from IUPAC atomic weights.
func hardnessToMM(value float64, unit string) float64 {
	switch unit {
	case "mg_L_CaCO3":
		return value / molarMassCaCO3
	case "dH":
		return value * 10 / molarMassCaO
	case "fH":
		return value * 10 / molarMassCaCO3
	}
	return value // mM
}

// maxHardnessMM is the largest hardness accepted, mM of Ca2+ and Mg2+: ten
// times the 180 mg/L CaCO3 above which the WHO calls water very hard, and
// beyond any tap or process water.
const maxHardnessMM = 50.0

// resolveHardness adds the hardness of the water as Ca2+ with two
// monovalent anions per ion (chloride or bicarbonate: either way a
// monovalent co-ion), registered as the multivalent salt of the sample.
// The stated hardness is checked against maxHardnessMM before scale
// multiplies it (see resolveElectrolyte).
func resolveHardness(h *Hardness, c *Conditions, ions []physics.Ion, scale float64, bad *Error, n *Notes) []physics.Ion {
	if h == nil {
		return ions
	}
	mM := hardnessToMM(*h.Value, h.Unit)
	if mM > maxHardnessMM {
		bad.add("/medium/hardness/value", "hardness above "+number.Shortest(maxHardnessMM)+" mM of Ca2+ and Mg2+", h.Unit,
			"0 <= value <= "+number.Shortest(number.Round(*h.Value*maxHardnessMM/mM, 4)))
		return ions
	}
	mM *= scale
	pair := [2]physics.Ion{{Valence: 2, Concentration: mM}, {Valence: -1, Concentration: 2 * mM}}
	noteMultivalent(c, HardnessLabel, pair, mM, len(ions))
	n.Add("medium.hardness %s %s = %s of Ca2+ and Mg2+, counted as Ca2+ (Mg2+ acts alike as a divalent counter-ion in the double layer) with two monovalent anions (chloride or bicarbonate) per ion; their specific adsorption, which lowers or reverses the charge of oxides at alkaline pH, is not modelled, so the barrier is an upper bound",
		number.Shortest(*h.Value), h.Unit, number.Quantity(mM, "mM"))
	return append(ions, pair[:]...)
}

// HardnessLabel names the hardness where a remedy names the multivalent salt.
const HardnessLabel = "medium.hardness (as Ca2+)"

// bufferSalt is a salt of a weak acid that the advisor speciates at the pH:
// cationsPerUnit monovalent cations with one anion of the acid.
type bufferSalt struct {
	cationsPerUnit int
	acid           physics.Acid
}

// bufferSalts are the buffer salts accepted as electrolyte formulas; their
// anions are speciated at the stated pH instead of counted as written.
var bufferSalts = map[string]bufferSalt{
	"NaH2PO4": {1, physics.PhosphoricAcid}, "KH2PO4": {1, physics.PhosphoricAcid},
	"Na2HPO4": {2, physics.PhosphoricAcid}, "K2HPO4": {2, physics.PhosphoricAcid},
	"Na3PO4": {3, physics.PhosphoricAcid}, "K3PO4": {3, physics.PhosphoricAcid},
	"Na3C6H5O7": {3, physics.CitricAcid}, "K3C6H5O7": {3, physics.CitricAcid},
	"NaHCO3": {1, physics.CarbonicAcid}, "KHCO3": {1, physics.CarbonicAcid},
	"Na2CO3": {2, physics.CarbonicAcid}, "K2CO3": {2, physics.CarbonicAcid},
	"CH3COONa": {1, physics.AceticAcid}, "CH3COOK": {1, physics.AceticAcid},
}

// bufferIons returns the ions of conc mM of a buffer salt: its cations, the
// acid's anions at pH (as written when pH is nil), and the monovalent ions
// of the acid or base that brought the salt to that pH, so that the mixture
// stays electroneutral.
func bufferIons(formula string, b bufferSalt, conc float64, pH *float64, n *Notes) []physics.Ion {
	cations := float64(b.cationsPerUnit) * conc
	ions := []physics.Ion{{Valence: 1, Concentration: cations}}
	if pH == nil {
		n.Add("medium.ph not given: %s counted as written, its anion of charge %d- not speciated", formula, b.cationsPerUnit)
		return append(ions, physics.Ion{Valence: -b.cationsPerUnit, Concentration: conc})
	}
	anions := b.acid.Ions(*pH, conc)
	charge := 0.0
	parts := make([]string, 0, len(anions))
	for _, a := range anions {
		charge -= float64(a.Valence) * a.Concentration
		parts = append(parts, number.Quantity(a.Concentration, "mM")+" of charge "+number.Shortest(float64(a.Valence)))
	}
	ions = append(ions, anions...)
	switch excess := cations - charge; {
	case excess > 0:
		ions = append(ions, physics.Ion{Valence: -1, Concentration: excess})
	case excess < 0:
		ions = append(ions, physics.Ion{Valence: 1, Concentration: -excess})
	}
	pk := make([]string, len(b.acid.PKa))
	for i, v := range b.acid.PKa {
		pk[i] = number.Shortest(v)
	}
	n.Add("%s %s speciated at pH %g (%s pKa %s at 25 degC): %s; the acid or base that set the pH brings %s of monovalent ions",
		formula, number.Quantity(conc, "mM"), *pH, b.acid.Name, strings.Join(pk, ", "), strings.Join(parts, ", "),
		number.Quantity(abs(cations-charge), "mM"))
	return ions
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

func isBuffer(formula string) bool {
	_, ok := bufferSalts[formula]
	return ok
}

// bufferList names the buffer salts for messages.
const bufferList = "NaH2PO4, KH2PO4, Na2HPO4, K2HPO4, Na3PO4, K3PO4, Na3C6H5O7, K3C6H5O7, NaHCO3, KHCO3, Na2CO3, K2CO3, CH3COONa, CH3COOK"
