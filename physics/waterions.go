package physics

import "math"

// Coefficients of the Bandura–Lvov ionization constant of water (IAPWS
// R11-07): n, alpha_0..2, beta_0..2, gamma_0..3, and the molar mass of
// water in g/mol.
const (
	bandLvovN      = 6
	bandLvovA0     = -0.864671
	bandLvovA1     = 8659.19
	bandLvovA2     = -22786.2
	bandLvovB0     = 0.642044
	bandLvovB1     = -56.8534
	bandLvovB2     = -0.375754
	bandLvovG0     = 0.61415
	bandLvovG1     = 48251.33
	bandLvovG2     = -67707.93
	bandLvovG3     = 10102100
	waterMolarMass = 18.015268
)

// PKwBanduraLvov returns pKw = -log10(Kw / (mol/kg)^2), the ionization
// constant of water on the molal scale, at temperature tempK (K) and water
// density (kg/m^3), from the semi-empirical fit
//
//	pKw = -2n [log10(1 + Q) - Q/(Q + 1) rho (beta0 + beta1/T + beta2 rho)]
//	      + pKw_G + 2 log10(Mw / 1000 g/mol),
//	Q = rho exp(alpha0 + alpha1/T + alpha2 rho^(2/3) / T^2),
//	pKw_G = gamma0 + gamma1/T + gamma2/T^2 + gamma3/T^3,
//
// rho in g/cm^3, n = 6, Mw = 18.015268 g/mol. Its uncertainty is about
// 0.01 in pKw for liquid water up to 100 °C.
//
// Valid for 273.15 K <= tempK <= 1073.15 K and 0 <= density <= 1250 kg/m^3;
// it panics outside (including NaN).
//
// References: A. V. Bandura & S. N. Lvov, "The ionization constant of water
// over wide ranges of temperature and density", J. Phys. Chem. Ref. Data 35
// (2006) 15–30, eqs. 3–5; IAPWS R11-07(2019), "Revised Release on the
// Ionization Constant of H2O", eqs. 1–3.
func PKwBanduraLvov(tempK, density float64) float64 {
	if !(tempK >= 273.15 && tempK <= 1073.15) || !(density >= 0 && density <= 1250) {
		panic("physics: PKwBanduraLvov needs 273.15 K <= tempK <= 1073.15 K and 0 <= density <= 1250 kg/m^3")
	}
	rho := density / 1000
	q := rho * math.Exp(bandLvovA0+bandLvovA1/tempK+bandLvovA2*math.Cbrt(rho*rho)/(tempK*tempK))
	gas := bandLvovG0 + bandLvovG1/tempK + bandLvovG2/(tempK*tempK) + bandLvovG3/(tempK*tempK*tempK)
	return -2*bandLvovN*(math.Log10(1+q)-q/(q+1)*rho*(bandLvovB0+bandLvovB1/tempK+bandLvovB2*rho)) +
		gas + 2*math.Log10(waterMolarMass/1000)
}

// WaterPKw returns pKw of liquid water at 1 atm and temperature tempK (K):
// PKwBanduraLvov at the density WaterDensity. It is 14.95 at 0 °C, 14.00 at
// 25 °C and 13.26 at 50 °C.
//
// It panics outside 273.15 K <= tempK <= 423.15 K (WaterDensity's range).
//
// Reference: as PKwBanduraLvov.
func WaterPKw(tempK float64) float64 {
	return PKwBanduraLvov(tempK, WaterDensity(tempK))
}

// WaterIons returns the hydronium (H+) and hydroxide (OH-) ions of water at
// pH pH and temperature tempK (K), in mol/m^3, at every pH:
//
//	[H+] = 10^-pH rho_w,  [OH-] = 10^(pH - pKw(T)) rho_w,
//
// with pKw from WaterPKw and rho_w (kg/m^3) from WaterDensity converting
// molalities (mol/kg) to concentrations. Activities are taken as
// molalities (dilute solution). The counter-ions of the acid or base that
// set the pH are not included: a caller adds them to keep the mixture
// electroneutral.
//
// It panics on a non-finite pH and outside 273.15 K <= tempK <= 423.15 K.
//
// References: IUPAC, "Measurement of pH. Definition, standards, and
// procedures", Pure Appl. Chem. 74 (2002) 2169 (pH on the molality scale);
// Bandura & Lvov (2006) for pKw.
func WaterIons(pH, tempK float64) [2]Ion {
	if math.IsNaN(pH) || math.IsInf(pH, 0) {
		panic("physics: WaterIons needs a finite pH")
	}
	rho := WaterDensity(tempK)
	pKw := PKwBanduraLvov(tempK, rho)
	return [2]Ion{
		{Valence: 1, Concentration: math.Pow(10, -pH) * rho},
		{Valence: -1, Concentration: math.Pow(10, pH-pKw) * rho},
	}
}
