package physics

// Physical constants, exact SI values of CODATA 2018 (Tiesinga et al.,
// "CODATA recommended values of the fundamental physical constants: 2018",
// Rev. Mod. Phys. 93, 025010, 2021), and the conventional standard gravity
// (3rd CGPM, 1901).
const (
	Boltzmann          = 1.380649e-23     // J/K, exact
	ElementaryCharge   = 1.602176634e-19  // C, exact
	Avogadro           = 6.02214076e23    // 1/mol, exact
	Planck             = 6.62607015e-34   // J s, exact
	VacuumPermittivity = 8.8541878128e-12 // F/m, CODATA 2018 recommended value
	StandardGravity    = 9.80665          // m/s^2, conventional
	GasConstant        = Boltzmann * Avogadro
	ReducedPlanck      = Planck / (2 * 3.14159265358979323846264338327950288)
	CelsiusZero        = 273.15 // K at 0 degrees Celsius
)

// Kelvin converts a Celsius temperature to kelvin.
func Kelvin(celsius float64) float64 { return celsius + CelsiusZero }
