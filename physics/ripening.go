package physics

import "math"

// TypicalMolecularDiffusivity is a common default for the diffusion
// coefficient of a small dissolved molecule in water at room temperature,
// m^2/s [common practice]; callers that default D to it must say so.
const TypicalMolecularDiffusivity = 1e-9

// LSWRate returns the Lifshitz–Slyozov–Wagner Ostwald ripening rate
// omega = d r^3/dt (m^3/s) of an emulsion or sol whose dispersed phase
// dissolves in the continuous phase:
//
//	omega = 8 gamma c_inf Vm^2 D / (9 R T)
//
// with interfacialTension gamma in N/m, solubility c_inf of the bulk
// dispersed phase in mol/m^3, molarVolume Vm in m^3/mol, diffusivity D of
// the dissolved molecules in m^2/s and tempK in K. r is the number-mean
// radius in the self-similar LSW regime (dilute, diffusion-controlled).
// Rates measured with micelles present often exceed it. It panics on
// negative or non-finite arguments and non-positive tempK.
//
// References: Lifshitz & Slyozov, J. Phys. Chem. Solids 19, 35 (1961);
// Wagner, Z. Elektrochem. 65, 581 (1961); Kabalnov, J. Dispersion Sci.
// Technol. 22, 1 (2001), eq. 10.
func LSWRate(interfacialTension, solubility, molarVolume, diffusivity, tempK float64) float64 {
	for _, x := range [...]float64{interfacialTension, solubility, molarVolume, diffusivity} {
		if !(x >= 0) || math.IsInf(x, 1) {
			panic("physics: LSWRate needs finite non-negative arguments")
		}
	}
	if !(tempK > 0) || math.IsInf(tempK, 1) {
		panic("physics: LSWRate needs finite tempK > 0")
	}
	return 8 * interfacialTension * solubility * molarVolume * molarVolume * diffusivity /
		(9 * GasConstant * tempK)
}

// TimeToDoubleDiameter returns the time (s) for ripening at rate omega
// (m^3/s, see LSWRate) to take the mean radius from r to 2 r:
// ((2r)^3 - r^3)/omega = 7 r^3/omega; +Inf at omega = 0. It panics on
// negative or NaN arguments and an infinite radius.
//
// Reference: integration of LSWRate's r^3 linear in time (Kabalnov 2001).
func TimeToDoubleDiameter(radius, rate float64) float64 {
	if !(radius >= 0) || math.IsInf(radius, 1) || !(rate >= 0) {
		panic("physics: TimeToDoubleDiameter needs finite radius >= 0 and rate >= 0")
	}
	if rate == 0 {
		return math.Inf(1)
	}
	return 7 * radius * radius * radius / rate
}

// DoublingRate inverts TimeToDoubleDiameter for the rate: the ripening rate
// omega (m^3/s) at which the mean radius grows from r (m) to 2 r in exactly
// duration (s, > 0), 7 r^3/duration. A slower rate takes longer. It panics
// on a negative or non-finite radius or a non-positive or non-finite
// duration.
//
// Reference: as TimeToDoubleDiameter (LSW's r^3 linear in time; Kabalnov
// 2001), solved for omega.
func DoublingRate(radius, duration float64) float64 {
	if !(radius >= 0 && radius <= math.MaxFloat64) || !(duration > 0 && duration <= math.MaxFloat64) {
		panic("physics: DoublingRate needs a finite radius >= 0 and duration > 0")
	}
	return 7 * radius * radius * radius / duration
}

// SizeGrowthFromRate returns the fractional diameter growth after
// duration (s) of ripening at rate omega (m^3/s) from radius r (m):
// (r^3 + omega t)^(1/3)/r - 1, so 0 at omega = 0 and 1 at
// TimeToDoubleDiameter. It panics unless radius > 0 and the others are
// non-negative and finite.
//
// Reference: integration of LSWRate's r^3 linear in time (Kabalnov 2001).
func SizeGrowthFromRate(radius, rate, duration float64) float64 {
	if !(radius > 0) || !(rate >= 0) || !(duration >= 0) || math.IsInf(radius, 1) ||
		math.IsInf(rate, 1) || math.IsInf(duration, 1) {
		panic("physics: SizeGrowthFromRate needs radius > 0 and finite non-negative rate and duration")
	}
	return math.Cbrt(1+rate*duration/(radius*radius*radius)) - 1
}
