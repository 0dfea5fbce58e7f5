package physics

import "math"

// RichardsonZakiExponentLowRe is the Richardson–Zaki exponent n for
// particle Reynolds numbers below about 0.2 (Richardson & Zaki 1954, Trans.
// Instn Chem. Engrs 32, 35). Brzinski & Durian (Soft Matter 14, 2018) find
// 5.6 for Brownian and 4.48 for non-Brownian spheres; 4.65 is the classic
// value.
const RichardsonZakiExponentLowRe = 4.65

// StokesReynoldsLimit is the largest particle Reynolds number at which
// ISO 13317-4 accepts Stokes' law for gravitational sedimentation.
const StokesReynoldsLimit = 0.25

// StokesVelocity returns the terminal velocity, in m/s, of an isolated rigid
// sphere of radius (m) with density excess deltaRho = rho_particle -
// rho_liquid (kg/m^3) in a liquid of viscosity (Pa s) under standard gravity:
//
//	v = 2 a^2 deltaRho g / (9 eta).
//
// The sign follows deltaRho: positive means the particle moves down
// (settling), negative that it rises (creaming). Valid while the particle
// Reynolds number is below StokesReynoldsLimit and the liquid is a continuum
// at the particle's scale; Brownian motion, neighbours and walls are ignored
// (see RichardsonZakiFactor for crowding).
//
// It panics on a negative or non-finite radius, a non-positive or non-finite
// viscosity, or a non-finite deltaRho.
//
// Reference: G. G. Stokes, "On the effect of the internal friction of fluids
// on the motion of pendulums", Trans. Camb. Phil. Soc. 9, 8–106 (1851) for
// the drag 6 pi eta a v, balanced against the buoyant weight
// (4/3) pi a^3 deltaRho g.
func StokesVelocity(radius, deltaRho, viscosity float64) float64 {
	if !(radius >= 0 && radius <= math.MaxFloat64) || !(viscosity > 0 && viscosity <= math.MaxFloat64) ||
		!(math.Abs(deltaRho) <= math.MaxFloat64) {
		panic("physics: StokesVelocity needs finite radius >= 0, viscosity > 0 and deltaRho")
	}
	return 2 * radius * radius * deltaRho * StandardGravity / (9 * viscosity)
}

// StokesRadius inverts StokesVelocity for the radius: the radius, in m, of
// the sphere that moves at speed (m/s, sign ignored) with density excess
// deltaRho (kg/m^3, sign ignored) in a liquid of viscosity (Pa s),
//
//	a = (9 eta |v| / (2 |deltaRho| g))^(1/2).
//
// Spheres smaller than it move slower. It returns +Inf at deltaRho = 0 and
// speed != 0 (no size moves that fast), and 0 at speed 0. It panics on a
// non-finite speed or deltaRho, or a non-positive or non-finite viscosity.
//
// Reference: G. G. Stokes, Trans. Camb. Phil. Soc. 9, 8–106 (1851), the
// terminal velocity of StokesVelocity solved for a.
func StokesRadius(speed, deltaRho, viscosity float64) float64 {
	checkStokesInverse(speed, deltaRho, viscosity)
	if speed == 0 {
		return 0
	}
	return math.Sqrt(9 * viscosity * math.Abs(speed) / (2 * math.Abs(deltaRho) * StandardGravity))
}

// StokesDensityDifference inverts StokesVelocity for the density excess:
// the magnitude |deltaRho| (kg/m^3) at which a sphere of radius (m, > 0)
// moves at speed (m/s, sign ignored) in a liquid of viscosity (Pa s),
//
//	|deltaRho| = 9 eta |v| / (2 a^2 g).
//
// A smaller density difference moves the sphere slower. It panics on a
// non-positive or non-finite radius or viscosity, or a non-finite speed.
//
// Reference: G. G. Stokes, Trans. Camb. Phil. Soc. 9, 8–106 (1851), the
// terminal velocity of StokesVelocity solved for deltaRho.
func StokesDensityDifference(speed, radius, viscosity float64) float64 {
	checkStokesInverse(speed, 0, viscosity)
	if !(radius > 0 && radius <= math.MaxFloat64) {
		panic("physics: StokesDensityDifference needs a finite radius > 0")
	}
	return 9 * viscosity * math.Abs(speed) / (2 * radius * radius * StandardGravity)
}

// StokesViscosity inverts StokesVelocity for the viscosity: the viscosity,
// in Pa s, in which a sphere of radius (m) with density excess deltaRho
// (kg/m^3, sign ignored) moves at speed (m/s, sign ignored),
//
//	eta = 2 a^2 |deltaRho| g / (9 |v|).
//
// A more viscous liquid moves the sphere slower. It returns +Inf at speed 0
// unless radius or deltaRho is 0, and 0 then. It panics on a negative or
// non-finite radius, a non-finite deltaRho, or a non-finite speed.
//
// Reference: G. G. Stokes, Trans. Camb. Phil. Soc. 9, 8–106 (1851), the
// terminal velocity of StokesVelocity solved for eta.
func StokesViscosity(speed, radius, deltaRho float64) float64 {
	checkStokesInverse(speed, deltaRho, 1)
	if !(radius >= 0 && radius <= math.MaxFloat64) {
		panic("physics: StokesViscosity needs a finite radius >= 0")
	}
	force := 2 * radius * radius * math.Abs(deltaRho) * StandardGravity
	if force == 0 {
		return 0
	}
	return force / (9 * math.Abs(speed))
}

func checkStokesInverse(speed, deltaRho, viscosity float64) {
	if !(math.Abs(speed) <= math.MaxFloat64) || !(math.Abs(deltaRho) <= math.MaxFloat64) ||
		!(viscosity > 0 && viscosity <= math.MaxFloat64) {
		panic("physics: Stokes' law inverted needs finite speed, deltaRho and viscosity > 0")
	}
}

// RichardsonZakiFactor returns the hindered-settling factor (1 - phi)^n,
// dimensionless, by which the Stokes velocity of a suspension at particle
// volume fraction phi is reduced; n is RichardsonZakiExponentLowRe at low
// Reynolds number.
//
// It panics unless 0 <= phi <= 1 and n is finite and >= 0.
//
// Reference: J. F. Richardson and W. N. Zaki, "Sedimentation and
// fluidisation: Part I", Trans. Instn Chem. Engrs 32, 35–53 (1954).
func RichardsonZakiFactor(phi, n float64) float64 {
	if !(phi >= 0 && phi <= 1) || !(n >= 0 && n <= math.MaxFloat64) {
		panic("physics: RichardsonZakiFactor needs 0 <= phi <= 1 and finite n >= 0")
	}
	return math.Pow(1-phi, n)
}

// ParticleReynolds returns the particle Reynolds number rho |v| d / eta,
// dimensionless, for a sphere of diameter (m) moving at speed (m/s, either
// sign) through a liquid of liquidDensity (kg/m^3) and viscosity (Pa s).
// Stokes' law holds below StokesReynoldsLimit.
//
// It panics on a negative or non-finite diameter or liquidDensity, a
// non-finite speed, or a non-positive or non-finite viscosity.
//
// Reference: ISO 13317-1:2001, "Determination of particle size distribution
// by gravitational liquid sedimentation methods — Part 1: General principles
// and guidelines", for the definition; ISO 13317-4:2014 for the 0.25 limit.
func ParticleReynolds(diameter, speed, liquidDensity, viscosity float64) float64 {
	if !(diameter >= 0 && diameter <= math.MaxFloat64) || !(liquidDensity >= 0 && liquidDensity <= math.MaxFloat64) ||
		!(math.Abs(speed) <= math.MaxFloat64) || !(viscosity > 0 && viscosity <= math.MaxFloat64) {
		panic("physics: ParticleReynolds needs finite diameter >= 0, liquidDensity >= 0, speed and viscosity > 0")
	}
	return liquidDensity * math.Abs(speed) * diameter / viscosity
}

// GravitationalLength returns the sedimentation (gravitational) length
// kT / (|deltaRho| (4/3) pi a^3 g), in m, of spheres of radius (m) and
// density excess deltaRho (kg/m^3) at temperature tempK (K): the height over
// which their equilibrium number density falls by a factor e (Perrin's
// barometric law). A container much taller than this holds a sediment or a
// cream layer at equilibrium; a much shorter one stays mixed.
//
// It returns +Inf at deltaRho = 0 or radius = 0 (no gravitational
// separation). It panics on a negative or non-finite radius, a non-finite
// deltaRho, or a non-positive or non-finite tempK.
//
// Reference: J. Perrin, "Mouvement brownien et réalité moléculaire", Ann.
// Chim. Phys. (8) 18, 5–114 (1909).
func GravitationalLength(radius, deltaRho, tempK float64) float64 {
	if !(radius >= 0 && radius <= math.MaxFloat64) || !(math.Abs(deltaRho) <= math.MaxFloat64) ||
		!(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: GravitationalLength needs finite radius >= 0, deltaRho and tempK > 0")
	}
	weight := math.Abs(deltaRho) * 4 / 3 * math.Pi * radius * radius * radius * StandardGravity
	if weight == 0 {
		return math.Inf(1)
	}
	return Boltzmann * tempK / weight
}

// PerrinRadius inverts GravitationalLength for the radius: the radius, in
// m, of spheres with density excess deltaRho (kg/m^3, sign ignored) whose
// gravitational length at tempK (K) equals length (m),
//
//	a = (3 kT / (4 pi |deltaRho| g l))^(1/3).
//
// Smaller spheres have a longer gravitational length: in a container of
// height l they stay spread over the whole height at sedimentation
// equilibrium. It returns +Inf at deltaRho = 0 or length = 0. It panics on a
// negative or non-finite length, a non-finite deltaRho, or a non-positive or
// non-finite tempK.
//
// Reference: J. Perrin, "Mouvement brownien et réalité moléculaire", Ann.
// Chim. Phys. (8) 18, 5–114 (1909), the barometric law of
// GravitationalLength solved for a.
func PerrinRadius(length, deltaRho, tempK float64) float64 {
	if !(length >= 0 && length <= math.MaxFloat64) || !(math.Abs(deltaRho) <= math.MaxFloat64) ||
		!(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: PerrinRadius needs finite length >= 0, deltaRho and tempK > 0")
	}
	kT := Boltzmann * tempK
	return math.Cbrt(3 * kT / (4 * math.Pi * math.Abs(deltaRho) * StandardGravity * length))
}

// SuspensionDiameter returns, in m, the largest sphere diameter d for which
// one thermal energy kT lifts the sphere by its own diameter against its
// buoyant weight:
//
//	kT = (pi/6) d^3 |deltaRho| g d,  so  d = (6 kT / (pi |deltaRho| g))^(1/4),
//
// i.e. the diameter at which GravitationalLength equals the diameter itself.
// Particles well below it are kept suspended by Brownian motion, particles
// well above it settle. deltaRho is rho_particle - rho_liquid (kg/m^3), tempK
// in K.
//
// It returns +Inf at deltaRho = 0. It panics on a non-finite deltaRho or a
// non-positive or non-finite tempK.
//
// Reference: the criterion is Perrin's barometric law (Ann. Chim. Phys. (8)
// 18, 5, 1909) evaluated at a height of one diameter.
func SuspensionDiameter(deltaRho, tempK float64) float64 {
	if !(math.Abs(deltaRho) <= math.MaxFloat64) || !(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: SuspensionDiameter needs finite deltaRho and tempK > 0")
	}
	return math.Sqrt(math.Sqrt(6 * Boltzmann * tempK / (math.Pi * math.Abs(deltaRho) * StandardGravity)))
}

// QuantumDiameter returns, in m, the smallest diameter for which a sphere of
// the given density (kg/m^3) behaves classically at temperature tempK (K).
//
// Criterion: Heisenberg's relation dx dp >= hbar/2 with the thermal momentum
// spread of one Cartesian component, dp = sqrt(m kT) (equipartition), gives a
// minimum position uncertainty hbar / (2 sqrt(m kT)). The particle is
// classical when that is smaller than its own diameter d; with
// m = rho pi d^3 / 6 the boundary is
//
//	d^5 = 3 hbar^2 / (2 pi rho kT).
//
// For ordinary densities at room temperature this is below a nanometre, so
// colloids are always classical; the scale shows how far the sample is from
// that limit.
//
// It panics on a non-positive or non-finite density or tempK.
//
// References: W. Heisenberg, Z. Phys. 43, 172–198 (1927); E. H. Kennard,
// Z. Phys. 44, 326–352 (1927) for the bound hbar/2; equipartition as in
// L. D. Landau and E. M. Lifshitz, Statistical Physics, Part 1, 3rd ed.
// (Pergamon, 1980). The criterion itself is this package's choice.
func QuantumDiameter(density, tempK float64) float64 {
	if !(density > 0 && density <= math.MaxFloat64) || !(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: QuantumDiameter needs finite density > 0 and tempK > 0")
	}
	return math.Pow(3*ReducedPlanck*ReducedPlanck/(2*math.Pi*density*Boltzmann*tempK), 0.2)
}

// SettlingTime returns height/|speed|, in s: the time for a particle moving
// at speed (m/s, either sign) to cross height (m), e.g. the time for the top
// of a container to clear.
//
// It returns +Inf at speed 0 and 0 at height 0. It panics on a negative or
// non-finite height or a non-finite speed.
//
// Reference: uniform motion at the Stokes velocity; G. G. Stokes, Trans.
// Camb. Phil. Soc. 9, 8 (1851).
func SettlingTime(height, speed float64) float64 {
	if !(height >= 0 && height <= math.MaxFloat64) || !(math.Abs(speed) <= math.MaxFloat64) {
		panic("physics: SettlingTime needs finite height >= 0 and finite speed")
	}
	if height == 0 {
		return 0
	}
	if speed == 0 {
		return math.Inf(1)
	}
	return height / math.Abs(speed)
}

// ClearLayer returns min(|speed| duration, height), in m: the thickness of
// the particle-free layer (at the top when settling, at the bottom when
// creaming) after duration (s) in a container of height (m), for particles
// moving at speed (m/s, either sign).
//
// It panics on a negative or non-finite duration or height, or a non-finite
// speed.
//
// Reference: uniform motion at the Stokes velocity; G. G. Stokes, Trans.
// Camb. Phil. Soc. 9, 8 (1851).
func ClearLayer(speed, duration, height float64) float64 {
	if !(duration >= 0 && duration <= math.MaxFloat64) || !(height >= 0 && height <= math.MaxFloat64) ||
		!(math.Abs(speed) <= math.MaxFloat64) {
		panic("physics: ClearLayer needs finite duration >= 0, height >= 0 and speed")
	}
	return math.Min(math.Abs(speed)*duration, height)
}

// SedimentedFraction returns the fraction of the solids volume that has
// reached the end of its travel (the bottom when settling, the top when
// creaming) after duration (s) in a column of height (m) in which every
// class started uniformly spread: class i contributes its volume fraction
// times min(1, |v_i| t / H), with v_i = speedOf(diameter) in m/s. classes
// should be normalised; no classes give 0. It panics unless height is
// positive and finite and duration >= 0, and if speedOf returns NaN.
//
// Reference: Allen, Particle Size Measurement, 5th ed. (1997)
// (cumulative sedimentation from a homogeneous start).
func SedimentedFraction(classes []SizeClass, speedOf func(diameter float64) float64, duration, height float64) float64 {
	if !(height > 0) || math.IsInf(height, 1) || !(duration >= 0) {
		panic("physics: SedimentedFraction needs finite height > 0 and duration >= 0")
	}
	settled := 0.0
	for _, c := range classes {
		v := speedOf(c.Diameter)
		if math.IsNaN(v) {
			panic("physics: SedimentedFraction: speedOf returned NaN")
		}
		travel := 0.0 // a class at rest stays put even after an infinite time
		if v != 0 {
			travel = math.Abs(v) * duration
		}
		if travel >= height {
			settled += c.VolumeFraction
		} else {
			settled += c.VolumeFraction * travel / height
		}
	}
	return settled
}
