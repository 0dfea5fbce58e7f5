package physics

import "math"

// Acid is a weak polyprotic acid H_nA by its successive acid dissociation
// constants: PKa[j] is -log10 K of H_(n-j)A^(j-) = H_(n-j-1)A^((j+1)-) + H+,
// in increasing order, at 25 °C and infinite dilution (activities taken as
// concentrations).
type Acid struct {
	Name string
	PKa  []float64
}

// The buffer acids of food, drug and coating formulations, with their pKa
// at 25 °C and zero ionic strength.
//
// References: phosphoric acid 2.148, 7.206, 12.342 and carbonic acid 6.35,
// 10.33 (the latter as in CRC Handbook of Chemistry and Physics,
// "Dissociation constants of inorganic acids and bases", after D. D.
// Perrin, 1982); citric acid 3.13, 4.76, 6.40 (R. G. Bates & G. D.
// Pinching, J. Res. Natl. Bur. Stand. 42 (1949) 419); acetic acid 4.76
// (H. S. Harned & R. W. Ehlers, J. Am. Chem. Soc. 55 (1933) 652).
var (
	PhosphoricAcid = Acid{Name: "phosphate", PKa: []float64{2.148, 7.206, 12.342}}
	CitricAcid     = Acid{Name: "citrate", PKa: []float64{3.13, 4.76, 6.40}}
	CarbonicAcid   = Acid{Name: "carbonate", PKa: []float64{6.35, 10.33}}
	AceticAcid     = Acid{Name: "acetate", PKa: []float64{4.76}}
)

// Fractions returns the mole fractions alpha_j (j = 0..n) of the acid's
// species H_(n-j)A^(j-) at pH pH:
//
//	alpha_j = prod_{k<j} K_k [H+]^(n-j) / sum_i prod_{k<i} K_k [H+]^(n-i),
//
// computed in logarithms, so that every pH from 0 to 14 is exact to
// rounding. They sum to 1; two neighbouring species are equal at pH = pKa
// (Henderson–Hasselbalch). It panics on a non-finite pH.
//
// Reference: L. J. Henderson, Am. J. Physiol. 21 (1908) 173; K. A.
// Hasselbalch, Biochem. Z. 78 (1917) 112; the distribution of a polyprotic
// acid, e.g. D. C. Harris, Quantitative Chemical Analysis, ch. 9.
func (a Acid) Fractions(pH float64) []float64 {
	if math.IsNaN(pH) || math.IsInf(pH, 0) {
		panic("physics: Acid.Fractions needs a finite pH")
	}
	logs := make([]float64, len(a.PKa)+1) // log10 of alpha_j times the common factor
	for j := 1; j < len(logs); j++ {
		logs[j] = logs[j-1] + pH - a.PKa[j-1]
	}
	top := logs[0]
	for _, l := range logs {
		top = math.Max(top, l)
	}
	var sum float64
	for j, l := range logs {
		logs[j] = math.Pow(10, l-top)
		sum += logs[j]
	}
	for j := range logs {
		logs[j] /= sum
	}
	return logs
}

// Ions returns the anions of the acid at pH pH and total concentration
// total (mol/m^3, all species together): valence -j at alpha_j total for
// j = 1..n, the neutral species left out. The cations that balance them are
// the caller's (the buffer salt's own and those of the acid or base that
// set the pH). It panics on a non-finite pH or a negative or non-finite
// total.
func (a Acid) Ions(pH, total float64) []Ion {
	if !(total >= 0 && total <= math.MaxFloat64) {
		panic("physics: Acid.Ions needs a finite total >= 0")
	}
	f := a.Fractions(pH)
	ions := make([]Ion, 0, len(f)-1)
	for j := 1; j < len(f); j++ {
		ions = append(ions, Ion{Valence: -j, Concentration: f[j] * total})
	}
	return ions
}
