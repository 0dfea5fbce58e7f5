package physics

import "math"

// Ion is one ionic species in solution: its signed charge number and its
// concentration in mol/m^3 (1 mM = 1 mol/m^3).
type Ion struct {
	Valence       int
	Concentration float64
}

// IonicStrength returns I = 1/2 sum c_i z_i^2, in mol/m^3, of ions whose
// concentrations are in mol/m^3. An empty list gives 0.
//
// It panics on a negative or non-finite concentration.
//
// Reference: G. N. Lewis and M. Randall, "The activity coefficient of strong
// electrolytes", J. Am. Chem. Soc. 43, 1112–1154 (1921).
func IonicStrength(ions []Ion) float64 {
	var sum float64
	for _, ion := range ions {
		if !(ion.Concentration >= 0 && ion.Concentration <= math.MaxFloat64) {
			panic("physics: IonicStrength needs finite concentrations >= 0")
		}
		z := float64(ion.Valence)
		sum += ion.Concentration * z * z
	}
	return sum / 2
}

// CounterIonValence returns the largest valence magnitude among the ions of
// charge opposite to the surface: surfaceSign < 0 (negative surface) looks at
// the cations, surfaceSign > 0 at the anions, 0 at all ions. Ions of zero
// concentration are ignored; with none left it returns 0. The counter-ion
// valence is what the Schulze–Hardy rule ties the coagulating power to.
//
// It never panics.
//
// Reference: H. Schulze, J. Prakt. Chem. 25, 431 (1882); W. B. Hardy,
// Proc. R. Soc. Lond. 66, 110 (1900).
func CounterIonValence(ions []Ion, surfaceSign int) int {
	largest := 0
	for _, ion := range ions {
		if !(ion.Concentration > 0) {
			continue
		}
		z := ion.Valence
		counter := surfaceSign == 0 || (surfaceSign < 0 && z > 0) || (surfaceSign > 0 && z < 0)
		if z < 0 {
			z = -z
		}
		if counter && z > largest {
			largest = z
		}
	}
	return largest
}

// conductivityToIonicStrength is Russell's 1.6e-5 mol/L per µS/cm expressed
// in (mol/m^3) per (S/m): 1 S/m = 1e4 µS/cm and 1 mol/L = 1e3 mol/m^3.
const conductivityToIonicStrength = 1.6e-5 * 1e4 * 1e3

// IonicStrengthFromConductivity estimates the ionic strength, in mol/m^3, of
// an aqueous solution from its specific conductance at 25 °C, in S/m, with
// the empirical relation I (mol/L) = 1.6e-5 x conductance (µS/cm), i.e.
// I = 160 kappa in SI units. Griffin & Jurinak's I = 0.013 x EC (dS/m) gives
// about 20 % less.
//
// The relation was fitted to natural waters, dominated by Ca2+, Mg2+ and
// HCO3-; it overestimates 1:1 electrolytes about twofold (0.01 M KCl,
// 0.1413 S/m, gives 23 mM for a true 10 mM). Treat the result as an estimate
// to within a factor of two.
//
// It panics on a negative or non-finite conductivity.
//
// References (recalled, not re-checked against the originals): L. L. Russell
// (1976), as quoted in V. L. Snoeyink and D. Jenkins, Water Chemistry
// (Wiley, 1980); R. A. Griffin and J. J. Jurinak, "Estimation of activity
// coefficients from the electrical conductivity of natural aquatic systems
// and soil extracts", Soil Sci. 116, 26–30 (1973).
func IonicStrengthFromConductivity(conductivity float64) float64 {
	if !(conductivity >= 0 && conductivity <= math.MaxFloat64) {
		panic("physics: IonicStrengthFromConductivity needs a finite conductivity >= 0")
	}
	return conductivityToIonicStrength * conductivity
}
