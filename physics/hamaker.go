package physics

import "math"

// UVAbsorptionFrequency is the main electronic absorption frequency nu_e in
// Hz assumed by the Tabor–Winterton estimate; about 3.0e15 Hz for most
// liquids and organic solids (Israelachvili, Intermolecular and Surface
// Forces, 3rd ed., 2011, ch. 13).
const UVAbsorptionFrequency = 3.0e15

// HamakerTaborWinterton returns the non-retarded Hamaker constant A131 in J of
// medium 1 interacting across medium 3, from their static relative
// permittivities eps1, eps3 and optical refractive indices n1, n3, at
// temperature tempK (K):
//
//	A131 = 3/4 kT ((e1-e3)/(e1+e3))^2
//	     + 3 h nu_e (n1^2-n3^2)^2 / (16 sqrt2 (n1^2+n3^2)^(3/2))
//
// with nu_e = UVAbsorptionFrequency. A131 >= 0: identical bodies always
// attract. The estimate is good to about 10-20 % for low-index materials and
// overshoots high-index ones (TiO2) and fails for metals. It panics unless all
// permittivities and indices are finite and > 0 and tempK > 0.
//
// References: D. Tabor & R. H. S. Winterton, Proc. R. Soc. Lond. A 312 (1969)
// 435; J. N. Israelachvili, Intermolecular and Surface Forces, 3rd ed. (2011),
// eq. 13.16.
func HamakerTaborWinterton(eps1, n1, eps3, n3, tempK float64) float64 {
	return hamakerAsymmetricTaborWinterton(eps1, n1, eps1, n1, eps3, n3, tempK)
}

// hamakerAsymmetricTaborWinterton returns the non-retarded Hamaker constant
// A132 in J of medium 1 interacting with medium 2 across medium 3:
//
//	A132 = 3/4 kT (e1-e3)/(e1+e3) (e2-e3)/(e2+e3)
//	     + 3 h nu_e (n1^2-n3^2)(n2^2-n3^2) /
//	       (8 sqrt2 sqrt(n1^2+n3^2) sqrt(n2^2+n3^2) (sqrt(n1^2+n3^2)+sqrt(n2^2+n3^2)))
//
// A132 < 0 (repulsion) when medium 3 lies between 1 and 2 in permittivity and
// index. Domain and panics as HamakerTaborWinterton.
//
// Reference: J. N. Israelachvili, Intermolecular and Surface Forces, 3rd ed.
// (2011), eq. 13.15.
func hamakerAsymmetricTaborWinterton(eps1, n1, eps2, n2, eps3, n3, tempK float64) float64 {
	for _, v := range [...]float64{eps1, n1, eps2, n2, eps3, n3, tempK} {
		if !(v > 0 && v <= math.MaxFloat64) {
			panic("physics: Tabor–Winterton Hamaker constant needs finite permittivities, indices and tempK > 0")
		}
	}
	zeroFrequency := 0.75 * Boltzmann * tempK * (eps1 - eps3) / (eps1 + eps3) * (eps2 - eps3) / (eps2 + eps3)
	s1 := math.Sqrt(n1*n1 + n3*n3)
	s2 := math.Sqrt(n2*n2 + n3*n3)
	dispersion := 3 * Planck * UVAbsorptionFrequency / (8 * math.Sqrt2) *
		(n1*n1 - n3*n3) * (n2*n2 - n3*n3) / (s1 * s2 * (s1 + s2))
	return zeroFrequency + dispersion
}
