package physics

import (
	"fmt"
	"math"
)

// CosolventMaxTempK is the upper end, in K (100 °C), of the temperature
// range of CosolventDensity and CosolventViscosity.
const CosolventMaxTempK = 373.15

// melinderPairs are the exponents (i of x - xm, j of t - tm) of Melinder's
// property polynomials, in the order of his coefficient tables.
var melinderPairs = [18][2]int{
	{0, 0}, {0, 1}, {0, 2}, {0, 3}, {1, 0}, {1, 1}, {1, 2}, {1, 3},
	{2, 0}, {2, 1}, {2, 2}, {2, 3}, {3, 0}, {3, 1}, {3, 2}, {4, 0}, {4, 1}, {5, 0},
}

// melinderFluid holds Melinder's reference composition xm (mass %) and
// temperature tm (°C) and the coefficients of density (kg/m^3) and ln of
// viscosity (mPa s) of one glycol-water system.
type melinderFluid struct {
	xm, tm    float64
	rho, lnMu [18]float64
}

var melinderFluids = map[Cosolvent]*melinderFluid{
	EthyleneGlycol: {
		xm: 30.8462, tm: 31.728,
		rho: [18]float64{
			1.0340e03, -4.7810e-01, -2.6920e-03, 4.7250e-06,
			1.3110e00, -6.8760e-03, 4.8050e-05, 1.6900e-08,
			7.4900e-05, 7.8550e-05, -3.9950e-07, 4.9820e-09,
			-1.0620e-04, 1.2290e-06, -1.1530e-08,
			-9.6230e-07, -7.2110e-08,
			4.8910e-08,
		},
		lnMu: [18]float64{
			4.7050e-01, -2.5500e-02, 1.7820e-04, -7.6690e-07,
			2.4710e-02, -1.1710e-04, 1.0520e-06, -1.6340e-08,
			3.3280e-06, 1.0860e-06, 1.0510e-08, -6.4750e-10,
			1.6590e-06, 3.1570e-09, 4.0630e-10,
			3.0890e-08, 1.8310e-10,
			-1.8650e-09,
		},
	},
	PropyleneGlycol: {
		xm: 30.7031, tm: 32.7083,
		rho: [18]float64{
			1.0180e03, -5.4060e-01, -2.6660e-03, 1.3470e-05,
			7.6040e-01, -9.4500e-03, 5.5410e-05, -1.3430e-07,
			-2.4980e-03, 2.7000e-05, -4.0180e-07, 3.3760e-09,
			-1.5500e-04, 2.8290e-06, -7.1750e-09,
			-1.1310e-06, -2.2210e-08,
			2.3420e-08,
		},
		lnMu: [18]float64{
			6.8370e-01, -3.0450e-02, 2.5250e-04, -1.3990e-06,
			3.3280e-02, -3.9840e-04, 4.3320e-06, -1.8600e-08,
			5.4530e-05, -8.6000e-08, -1.5930e-08, -4.4650e-11,
			-3.9000e-06, 1.0540e-07, -1.5890e-09,
			-1.5870e-08, 4.4750e-10,
			3.5640e-09,
		},
	},
}

// melinderPolynomial evaluates sum c_ij (x - xm)^i (t - tm)^j at mass
// percent x and temperature t (°C).
func melinderPolynomial(c *[18]float64, xm, tm, x, t float64) float64 {
	var xp, tp [6]float64
	xp[0], tp[0] = 1, 1
	for k := 1; k < 6; k++ {
		xp[k] = xp[k-1] * (x - xm)
		tp[k] = tp[k-1] * (t - tm)
	}
	var sum float64
	for k, p := range melinderPairs {
		sum += c[k] * xp[p[0]] * tp[p[1]]
	}
	return sum
}

// CosolventHasLiquidProperties reports whether CosolventDensity and
// CosolventViscosity cover co-solvent c: ethylene glycol, propylene glycol
// and glycerol.
func CosolventHasLiquidProperties(c Cosolvent) bool {
	return c == EthyleneGlycol || c == PropyleneGlycol || c == Glycerol
}

// checkCosolventState panics unless c has liquid properties, massFraction
// is within its freezing table and tempK lies between the mixture's
// freezing point and CosolventMaxTempK.
func checkCosolventState(name string, c Cosolvent, massFraction, tempK float64) {
	if !CosolventHasLiquidProperties(c) {
		panic(fmt.Sprintf("physics: %s has no properties for co-solvent %s", name, c))
	}
	if !(massFraction >= 0 && massFraction <= CosolventMaxMassFraction(c)) {
		panic(fmt.Sprintf("physics: %s needs 0 <= massFraction <= %g", name, CosolventMaxMassFraction(c)))
	}
	if !(tempK >= CosolventFreezingPoint(c, massFraction)-1e-9 && tempK <= CosolventMaxTempK) {
		panic(fmt.Sprintf("physics: %s needs the freezing point <= tempK <= %g K", name, CosolventMaxTempK))
	}
}

// CosolventDensity returns the density, in kg/m^3, of a mixture of water
// and co-solvent c at co-solvent mass fraction massFraction and temperature
// tempK (K), at atmospheric pressure.
//
// Ethylene glycol and propylene glycol: Melinder's polynomial
// rho = sum c_ij (x - xm)^i (t - tm)^j (x in mass %, t in °C; i + j <= 5,
// j <= 3), fitted to the published tables of the inhibitor-free glycols
// between the freezing point and 100 °C, 0-60 % (about 0.1-0.2 %).
// Glycerol: the model of Volk and Kähler (2018), pure glycerol
// 1273 - 0.612 t, water 1000 (1 - |(t - 3.98)/615|^1.71), mixed by volume
// fraction of the unmixed liquids and multiplied by the contraction factor
// 1 + A sin(Cv^1.331 pi), A = 1.78e-6 t^2 - 1.82e-4 t + 1.41e-2 (within
// 0.1 % of the tables, 0-100 °C); below 0 °C it is extrapolated.
//
// Valid for 0 <= massFraction <= CosolventMaxMassFraction(c) (0.60) and
// CosolventFreezingPoint(c, massFraction) <= tempK <= CosolventMaxTempK;
// it panics outside that range (including NaN) and for a co-solvent without
// liquid properties (CosolventHasLiquidProperties).
//
// References: Å. Melinder, Properties of Secondary Working Fluids for
// Indirect Systems, 2nd ed., International Institute of Refrigeration
// (2010), density polynomials for monoethylene and monopropylene glycol;
// A. Volk and C. J. Kähler, "Density model for aqueous glycerol
// solutions", Exp. Fluids 59, 75 (2018), eqs. 3-9.
func CosolventDensity(c Cosolvent, massFraction, tempK float64) float64 {
	checkCosolventState("CosolventDensity", c, massFraction, tempK)
	t := tempK - CelsiusZero
	if c == Glycerol {
		return glycerolWaterDensity(massFraction, t)
	}
	f := melinderFluids[c]
	return melinderPolynomial(&f.rho, f.xm, f.tm, 100*massFraction, t)
}

// glycerolWaterDensity is the Volk-Kähler model at glycerol mass fraction
// w and temperature t (°C), kg/m^3.
func glycerolWaterDensity(w, t float64) float64 {
	rg := 1273 - 0.612*t
	rw := 1000 * (1 - math.Pow(math.Abs((t-3.98)/615), 1.71))
	cv := (w / rg) / (w/rg + (1-w)/rw)
	a := 1.78e-6*t*t - 1.82e-4*t + 1.41e-2
	kappa := 1 + a*math.Sin(math.Pow(cv, 1.331)*math.Pi)
	return kappa * (rg*cv + rw*(1-cv))
}

// CosolventViscosity returns the shear viscosity, in Pa s, of a mixture of
// water and co-solvent c at co-solvent mass fraction massFraction and
// temperature tempK (K), at atmospheric pressure.
//
// Ethylene glycol and propylene glycol: Melinder's polynomial for
// ln(eta / mPa s), of the same form as CosolventDensity's (within a few per
// cent of the tables, between the freezing point and 100 °C). Glycerol:
// Cheng's correlation eta = eta_w^alpha eta_g^(1 - alpha), with
// eta_w = 1.790 exp((-1230 - t) t / (36100 + 360 t)),
// eta_g = 12100 exp((-1233 + t) t / (9900 + 70 t)) (mPa s, t in °C) and
// alpha = 1 - w + a b w (1 - w) / (a w + b (1 - w)), a = 0.705 - 0.0017 t,
// b = (4.9 + 0.036 t) a^2.5 (within about 2 % of Segur's tables, 0-100 °C);
// below 0 °C it is extrapolated.
//
// Domain and panics as CosolventDensity.
//
// References: Melinder (2010), viscosity polynomials for monoethylene and
// monopropylene glycol; N.-S. Cheng, "Formula for the viscosity of a
// glycerol-water mixture", Ind. Eng. Chem. Res. 47, 3285-3288 (2008),
// eqs. 5-11.
func CosolventViscosity(c Cosolvent, massFraction, tempK float64) float64 {
	checkCosolventState("CosolventViscosity", c, massFraction, tempK)
	t := tempK - CelsiusZero
	if c == Glycerol {
		return 1e-3 * glycerolWaterViscosity(massFraction, t)
	}
	f := melinderFluids[c]
	return 1e-3 * math.Exp(melinderPolynomial(&f.lnMu, f.xm, f.tm, 100*massFraction, t))
}

// glycerolWaterViscosity is Cheng's correlation at glycerol mass fraction
// w and temperature t (°C), mPa s.
func glycerolWaterViscosity(w, t float64) float64 {
	muW := 1.790 * math.Exp((-1230-t)*t/(36100+360*t))
	muG := 12100 * math.Exp((-1233+t)*t/(9900+70*t))
	a := 0.705 - 0.0017*t
	b := (4.9 + 0.036*t) * math.Pow(a, 2.5)
	alpha := 1 - w + a*b*w*(1-w)/(a*w+b*(1-w))
	return math.Pow(muW, alpha) * math.Pow(muG, 1-alpha)
}
