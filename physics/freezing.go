package physics

import (
	"fmt"
	"math"
)

// WaterMeltingK is the melting point of ice Ih at 101.325 kPa, in K
// (0.00 °C; the triple point is 273.16 K).
//
// Reference: CRC Handbook of Chemistry and Physics, 97th ed. (2016),
// "Fixed Points on the ITS-90".
const WaterMeltingK = CelsiusZero

// WaterCryoscopicConstant is the freezing-point depression of water per
// mole of dissolved particles per kilogram of water, Kf = R T0^2 M /
// dHfus = 1.86 K kg/mol (T0 = 273.15 K, M = 18.015 g/mol, dHfus = 6.01
// kJ/mol).
//
// Reference: CRC Handbook of Chemistry and Physics, 97th ed. (2016),
// "Cryoscopic Constants for Calculation of Freezing Point Depression",
// water 1.86 K kg/mol.
const WaterCryoscopicConstant = 1.86

// ColligativeFreezingDepression returns the lowering of the freezing point
// of water, in K, by dissolved particles at a total osmolality (mol of
// particles per kg of water):
//
//	dT = Kf m,  Kf = WaterCryoscopicConstant.
//
// For a strong electrolyte m is the sum of the ion molalities (i times the
// salt molality, i the van 't Hoff factor of complete dissociation). The law
// is ideal: real 1:1 and 2:1 salts depress by 3 to 14 % less between 0.05
// and 0.5 mol/kg (their osmotic coefficient is below 1), and 2:2 salts
// (MgSO4) by up to 45 % less; above about 0.5 mol/kg it should not be used.
//
// It panics on a negative or non-finite osmolality.
//
// References: F.-M. Raoult, C. R. Acad. Sci. 95, 1030 (1882); J. H. van 't
// Hoff, Z. Phys. Chem. 1, 481 (1887); P. W. Atkins and J. de Paula,
// Physical Chemistry, 8th ed. (2006), eq. 5.36.
func ColligativeFreezingDepression(osmolality float64) float64 {
	if !(osmolality >= 0) || math.IsInf(osmolality, 1) {
		panic("physics: ColligativeFreezingDepression needs a finite osmolality >= 0")
	}
	return WaterCryoscopicConstant * osmolality
}

// IonMolality returns the total molality of the ions, in mol per kg of
// water: the sum of their concentrations (mol/m^3 of solution) divided by
// waterMassConcentration, the mass of water per volume of solution
// (kg/m^3). For a dilute aqueous solution that is the water density; in a
// water-co-solvent mixture of co-solvent mass fraction w and density rho it
// is rho (1 - w). Ions of either sign count once per ion: this is the
// osmolality ColligativeFreezingDepression takes.
//
// It panics on a negative or non-finite concentration or a non-positive or
// non-finite waterMassConcentration.
//
// Reference: IUPAC Green Book, 3rd ed. (2007), sec. 2.10 (molality).
func IonMolality(ions []Ion, waterMassConcentration float64) float64 {
	if !(waterMassConcentration > 0) || math.IsInf(waterMassConcentration, 1) {
		panic("physics: IonMolality needs a finite waterMassConcentration > 0")
	}
	var sum float64
	for _, ion := range ions {
		if !(ion.Concentration >= 0) || math.IsInf(ion.Concentration, 1) {
			panic("physics: IonMolality needs finite ion concentrations >= 0")
		}
		sum += ion.Concentration
	}
	return sum / waterMassConcentration
}

// freezingTable is a freezing-point curve of a water-co-solvent mixture:
// mass fractions w (ascending, from 0) and the temperatures at which ice
// first forms, in °C (descending).
type freezingTable struct {
	w, tC []float64
}

// Tables of the ice line, co-solvent mass fraction against freezing point
// (°C). See CosolventFreezingPoint for the sources.
var freezingTables = map[Cosolvent]freezingTable{
	EthyleneGlycol: {
		w:  []float64{0, 0.05, 0.10, 0.15, 0.20, 0.25, 0.30, 0.35, 0.40, 0.45, 0.50, 0.55, 0.60},
		tC: []float64{0, -1.58, -3.36, -5.44, -7.95, -10.97, -14.58, -18.84, -23.81, -29.52, -35.99, -43.22, -51.20},
	},
	PropyleneGlycol: {
		w:  []float64{0, 0.05, 0.10, 0.15, 0.20, 0.25, 0.30, 0.35, 0.40, 0.45, 0.50, 0.55, 0.60},
		tC: []float64{0, -1.21, -2.87, -4.87, -7.17, -9.79, -12.79, -16.32, -20.57, -25.77, -32.19, -40.16, -50.00},
	},
	Glycerol: {
		w:  []float64{0, 0.10, 0.20, 0.30, 0.40, 0.50, 0.60},
		tC: []float64{0, -1.6, -4.8, -9.5, -15.5, -22.0, -33.6},
	},
	Ethanol: {
		w: []float64{0, 0.025, 0.048, 0.068, 0.113, 0.138, 0.164, 0.175, 0.188, 0.203, 0.221,
			0.242, 0.267, 0.299, 0.338, 0.390, 0.463, 0.561},
		tC: []float64{0, -1.0, -2.0, -3.0, -5.0, -6.1, -7.5, -8.7, -9.4, -10.6, -12.2,
			-14.0, -16.0, -18.9, -23.6, -28.7, -33.9, -41.0},
	},
}

func cosolventTable(c Cosolvent) freezingTable {
	tb, ok := freezingTables[c]
	if !ok {
		panic(fmt.Sprintf("physics: no freezing table for co-solvent %d", int(c)))
	}
	return tb
}

// CosolventMaxMassFraction returns the largest co-solvent mass fraction of
// the co-solvent's freezing table (0.60 for the glycols and glycerol, 0.561
// for ethanol): above it the curve is not tabulated here (glycerol-water
// has its eutectic at 0.667, -46.5 °C; the glycols' ice lines become
// uncertain above 0.6). It panics on an unknown co-solvent.
func CosolventMaxMassFraction(c Cosolvent) float64 {
	tb := cosolventTable(c)
	return tb.w[len(tb.w)-1]
}

// CosolventFreezingPoint returns the temperature, in K, at which ice first
// forms in a mixture of water and co-solvent c at co-solvent mass fraction
// massFraction, interpolated linearly between the points of a published
// table (linear pieces keep the table's monotony: the result falls
// strictly with massFraction).
//
// Tables:
//   - ethylene glycol and propylene glycol, 0-0.60 in steps of 0.05:
//     the freezing-point polynomials of Melinder (2010) evaluated at each
//     step (testdata/reference/cosolvent_water.py); they agree with the
//     ASHRAE tables within 0.6 K (propylene glycol) and 2.5 K (ethylene
//     glycol at 0.5-0.6, where published ice lines themselves differ by
//     that much);
//   - glycerol, 0-0.60 in steps of 0.10: Lange's Handbook, table 5.13
//     (after Lane 1925). Its 0.10 entry (-1.6 °C) lies 0.6 K above the
//     dilute colligative limit, so below 0.2 the table errs on the side of
//     freezing too early;
//   - ethanol, 0-0.561: Lange's Handbook, table 5.13.
//
// It panics on an unknown co-solvent or a massFraction outside
// [0, CosolventMaxMassFraction(c)] (including NaN).
//
// References: Å. Melinder, Properties of Secondary Working Fluids for
// Indirect Systems, 2nd ed., International Institute of Refrigeration
// (2010), freezing-point polynomials for monoethylene and monopropylene
// glycol; J. G. Speight (ed.), Lange's Handbook of Chemistry, 15th ed.
// (1999), table 5.13 "Compositions of aqueous antifreeze solutions";
// L. W. Lane, Ind. Eng. Chem. 17, 924 (1925).
func CosolventFreezingPoint(c Cosolvent, massFraction float64) float64 {
	tb := cosolventTable(c)
	last := len(tb.w) - 1
	if !(massFraction >= 0 && massFraction <= tb.w[last]) {
		panic(fmt.Sprintf("physics: CosolventFreezingPoint needs 0 <= massFraction <= %g for %s", tb.w[last], c))
	}
	i := 1
	for i < last && tb.w[i] < massFraction {
		i++
	}
	f := (massFraction - tb.w[i-1]) / (tb.w[i] - tb.w[i-1])
	return CelsiusZero + tb.tC[i-1] + f*(tb.tC[i]-tb.tC[i-1])
}

// MixtureFreezingPoint returns the freezing point, in K, of an aqueous
// continuous phase holding co-solvent c at mass fraction massFraction and
// ions at a total molality ionMolality (mol per kg of water, IonMolality):
// the co-solvent's tabulated depression plus the colligative depression of
// the ions, each reckoned on the water,
//
//	Tf = CosolventFreezingPoint(c, w) - Kf m_ions.
//
// Adding the depressions of the binary solutions reproduces measured ice
// lines of glycerol-NaCl-water and of propylene glycol-NaCl-water within a
// few kelvin up to about 0.5 co-solvent mass fraction (Kleinhans & Mazur
// 2007; Weng et al. 2011). With c = 0 (no co-solvent) massFraction must be 0
// and the result is the salt's depression of pure water.
//
// It panics as CosolventFreezingPoint and ColligativeFreezingDepression do,
// and on c = 0 with a non-zero massFraction.
//
// References: F. W. Kleinhans and P. Mazur, "Comparison of actual vs.
// synthesized ternary phase diagrams for solutes of cryobiological
// interest", Cryobiology 54, 212-222 (2007); L. Weng, W. Li and J. Zuo,
// Thermochim. Acta 512, 225-232 (2011).
func MixtureFreezingPoint(c Cosolvent, massFraction, ionMolality float64) float64 {
	salt := ColligativeFreezingDepression(ionMolality)
	if c == 0 {
		if massFraction != 0 {
			panic("physics: MixtureFreezingPoint needs a co-solvent for massFraction > 0")
		}
		return WaterMeltingK - salt
	}
	return CosolventFreezingPoint(c, massFraction) - salt
}

// ProtectantMassFraction returns the smallest mass fraction of co-solvent c
// that keeps the aqueous phase free of ice down to tempK (K), given the
// depression saltDepression (K, >= 0) that dissolved ions already provide
// (ColligativeFreezingDepression of the ion molality): the inverse of
// MixtureFreezingPoint in the mass fraction, solved exactly on the linear
// pieces of the table. It is 0 when the salt alone protects down to tempK.
// ok is false when even CosolventMaxMassFraction(c) does not protect that
// far.
//
// It panics on an unknown co-solvent, a non-finite tempK or a negative or
// non-finite saltDepression.
//
// Reference: as CosolventFreezingPoint and MixtureFreezingPoint.
func ProtectantMassFraction(c Cosolvent, tempK, saltDepression float64) (massFraction float64, ok bool) {
	tb := cosolventTable(c)
	if math.IsNaN(tempK) || math.IsInf(tempK, 0) || !(saltDepression >= 0) || math.IsInf(saltDepression, 1) {
		panic("physics: ProtectantMassFraction needs a finite tempK and a finite saltDepression >= 0")
	}
	target := tempK - CelsiusZero + saltDepression
	if target >= tb.tC[0] {
		return 0, true
	}
	for i := 1; i < len(tb.w); i++ {
		if tb.tC[i] <= target {
			f := (target - tb.tC[i-1]) / (tb.tC[i] - tb.tC[i-1])
			return tb.w[i-1] + f*(tb.w[i]-tb.w[i-1]), true
		}
	}
	return 0, false
}
