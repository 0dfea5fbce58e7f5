package physics

import "math"

// Temperature range, in K, in which WaterDensity, WaterViscosity and
// WaterPermittivity are all valid for liquid water near 0.1 MPa: 0 to 100 °C,
// the range of Malmberg & Maryott's permittivity data. (At 0.1 MPa water boils
// at 99.6 °C; the last half kelvin is slightly superheated liquid, whose
// properties differ from those at saturation by far less than the fits'
// uncertainty.)
const (
	WaterMinTempK = 273.15
	WaterMaxTempK = 373.15
)

// Kell's density fit at 1 atm, t in °C, kg/m^3.
const (
	kellA0 = 999.83952
	kellA1 = 16.945176
	kellA2 = -7.9870401e-3
	kellA3 = -46.170461e-6
	kellA4 = 105.56302e-9
	kellA5 = -280.54253e-12
	kellB  = 16.87985e-3
)

// WaterDensity returns the density of air-free liquid water at 1 atm
// (101.325 kPa), in kg/m^3, at temperature tempK (K), from Kell's rational
// fit
//
//	rho = (a0 + a1 t + a2 t^2 + a3 t^3 + a4 t^4 + a5 t^5) / (1 + b t),  t in °C.
//
// Kell fitted on the 1968 temperature scale; the difference from ITS-90 moves
// the density by less than 1 ppm, below the fit's own uncertainty.
//
// Valid for 273.15 K <= tempK <= 423.15 K; it panics outside that range
// (including NaN), which callers are expected to have rejected.
//
// Reference: G. S. Kell, "Density, thermal expansivity, and compressibility of
// liquid water from 0° to 150 °C: correlations and tables for atmospheric
// pressure and saturation reviewed and expressed on 1968 temperature scale",
// J. Chem. Eng. Data 20, 97–105 (1975), density equation at 1 atm.
func WaterDensity(tempK float64) float64 {
	if !(tempK >= 273.15 && tempK <= 423.15) {
		panic("physics: WaterDensity needs 273.15 K <= tempK <= 423.15 K")
	}
	t := tempK - CelsiusZero
	num := kellA0 + t*(kellA1+t*(kellA2+t*(kellA3+t*(kellA4+t*kellA5))))
	return num / (1 + kellB*t)
}

// IAPWS R12-08 reference constants: T*, rho*, mu*.
const (
	iapwsTempK    = 647.096 // K
	iapwsDensity  = 322.0   // kg/m^3
	iapwsViscUnit = 1.00e-6 // Pa s
)

// iapwsDiluteH holds H_0..H_3 of the dilute-gas term of R12-08.
var iapwsDiluteH = [4]float64{1.67752, 2.20462, 0.6366564, -0.241605}

// iapwsResidualH holds H_ij, i = 0..5 (powers of 1/Tbar - 1), j = 0..6
// (powers of rhobar - 1), of the residual term of R12-08.
var iapwsResidualH = [6][7]float64{
	{5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0},
	{8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0},
	{-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0},
	{-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3},
	{0, 0, -2.57040e-1, 0, 0, 8.72102e-3, 0},
	{0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4},
}

// iapwsViscosity returns the shear viscosity of water, in Pa s, at
// temperature tempK (K) and density (kg/m^3), as the product of the
// dilute-gas term mu0(T) and the residual term mu1(T, rho) of IAPWS R12-08:
//
//	mu/mu* = mu0 mu1,  mu0 = 100 sqrt(Tb) / sum_i H_i/Tb^i,
//	mu1 = exp(rhob sum_i (1/Tb - 1)^i sum_j H_ij (rhob - 1)^j),
//
// with Tb = T/647.096 K, rhob = rho/(322 kg/m^3), mu* = 1 µPa s.
//
// The critical enhancement mu2 is set to 1: it differs noticeably from 1 only
// within a few kelvin and about a hundred kg/m^3 of the critical point
// (647.096 K, 322 kg/m^3), far from any liquid a colloidal product is stored
// in; R12-08's verification table for mu0 mu1 (computed with mu2 = 1) is what
// the tests reproduce.
//
// Valid wherever IAPWS-95 is (the melting line to 1173.15 K, up to 1000 MPa);
// the caller supplies a density consistent with that state. It panics on a
// non-positive or non-finite temperature or density.
//
// References: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the
// Viscosity of Ordinary Water Substance" (2008); M. L. Huber et al., "New
// international formulation for the viscosity of H2O", J. Phys. Chem. Ref.
// Data 38, 101–125 (2009), eqs. 2, 11 and 12.
func iapwsViscosity(tempK, density float64) float64 {
	if !(tempK > 0 && tempK <= math.MaxFloat64) || !(density > 0 && density <= math.MaxFloat64) {
		panic("physics: iapwsViscosity needs finite tempK > 0 and density > 0")
	}
	tb := tempK / iapwsTempK
	rb := density / iapwsDensity

	inv := 1 / tb
	h := iapwsDiluteH
	mu0 := 100 * math.Sqrt(tb) / (h[0] + inv*(h[1]+inv*(h[2]+inv*h[3])))

	x := inv - 1
	y := rb - 1
	var sum float64
	for i := len(iapwsResidualH) - 1; i >= 0; i-- {
		row := &iapwsResidualH[i]
		var inner float64
		for j := len(row) - 1; j >= 0; j-- {
			inner = inner*y + row[j]
		}
		sum = sum*x + inner
	}
	mu1 := math.Exp(rb * sum)
	return mu0 * mu1 * iapwsViscUnit
}

// WaterViscosity returns the shear viscosity of liquid water near 0.1 MPa,
// in Pa s, at temperature tempK (K): iapwsViscosity at the 1-atm density of
// WaterDensity. The pressure difference between 0.1 MPa and 1 atm changes
// the viscosity by less than 1 ppm.
//
// Valid for WaterMinTempK <= tempK <= WaterMaxTempK; it panics outside that
// range (including NaN).
//
// References: IAPWS R12-08 (2008) / Huber et al. (2009), eqs. 2, 11 and 12
// with mu2 = 1; G. S. Kell,
// J. Chem. Eng. Data 20, 97 (1975) for the density.
func WaterViscosity(tempK float64) float64 {
	if !(tempK >= WaterMinTempK && tempK <= WaterMaxTempK) {
		panic("physics: WaterViscosity needs WaterMinTempK <= tempK <= WaterMaxTempK")
	}
	return iapwsViscosity(tempK, WaterDensity(tempK))
}

// WaterPermittivity returns the static relative permittivity (dielectric
// constant) of liquid water at 1 atm, dimensionless, at temperature tempK (K),
// from Malmberg & Maryott's cubic fit to their measurements,
//
//	eps = 87.740 - 0.40008 t + 9.398e-4 t^2 - 1.410e-6 t^3,  t in °C.
//
// Valid for WaterMinTempK <= tempK <= WaterMaxTempK, the range measured; it
// panics outside that range (including NaN).
//
// Reference: C. G. Malmberg and A. A. Maryott, "Dielectric constant of water
// from 0° to 100 °C", J. Res. Natl. Bur. Stand. 56, 1–8 (1956).
func WaterPermittivity(tempK float64) float64 {
	if !(tempK >= WaterMinTempK && tempK <= WaterMaxTempK) {
		panic("physics: WaterPermittivity needs WaterMinTempK <= tempK <= WaterMaxTempK")
	}
	t := tempK - CelsiusZero
	return 87.740 + t*(-0.40008+t*(9.398e-4+t*-1.410e-6))
}
