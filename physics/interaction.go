package physics

import "math"

// MinimumSeparation is the closest approach of two surfaces, 0.2 nm, in m: a
// Born-repulsion / hydration-layer cut-off (about one water molecule) below
// which the continuum van der Waals and double-layer expressions lose
// meaning. Extremum searches, the stability ratio and SeparationGrid start
// there. Israelachvili (Intermolecular and Surface Forces, 3rd ed., 2011,
// ch. 13) uses a cut-off of 0.165 nm for contact between dry solids; 0.2 nm
// for hydrated surfaces is common practice.
const MinimumSeparation = 0.2e-9

// Pair describes two equal spheres in a liquid and selects the models of
// their interaction energy, in SI units:
//
//   - Radius (m, > 0) of each sphere.
//   - Hamaker (J): particle–medium–particle constant A131; 0 switches the van
//     der Waals attraction off.
//   - Potential (V): surface (Stern, zeta) potential of each sphere; 0 or
//     Kappa = 0 switches the double layer off.
//   - Kappa (1/m, >= 0): inverse Debye length, 0 without electrolyte.
//   - EpsR (> 0) relative permittivity and TempK (K, > 0) temperature.
//   - Valence: counter-ion valence for the linear superposition double layer
//     when Ions is nil (a z:z electrolyte); 0 is read as 1.
//   - the ion mixture, set by WithIons: the electroneutral ions of the
//     liquid (mol/m^3; only the ratios of the concentrations matter), whose
//     exact flat-plate far field (FarFieldPotential) the linear
//     superposition uses in place of the z:z Gouy–Chapman one; a mixture
//     whose charged ions share one valence magnitude z is a z:z
//     electrolyte. Kappa stays the caller's, so scaling every concentration
//     needs no new mixture (WithIonicStrength).
//   - Retarded: Gregory's retarded van der Waals (wavelength 100 nm) instead of
//     Hamaker's exact non-retarded expression.
//   - ConstantPotential: Hogg–Healy–Fuerstenau instead of linear
//     superposition.
//   - DepletionRange (m, >= 0) and DepletionDensity (1/m^3, >= 0): depletion
//     layer thickness and number density of free polymer (Asakura–Oosawa);
//     either 0 switches depletion off.
//   - StericThickness (m, >= 0): an adsorbed layer that acts as a hard wall at
//     h = 2 StericThickness. Separations below the wall are excluded rather
//     than given an infinite energy: searches and the stability ratio start
//     at max(MinimumSeparation, 2 StericThickness).
//
// Methods panic when a field is out of its domain (programmer misuse; the
// advisor validates user input first).
type Pair struct {
	Radius, Hamaker, Potential, Kappa, EpsR, TempK float64
	Valence                                        int
	Retarded                                       bool
	ConstantPotential                              bool
	DepletionRange, DepletionDensity               float64
	StericThickness                                float64

	far farMemo // the ion mixture of WithIons and its far field at one potential
}

// farMemo holds the asymmetric ion mixture of a Pair (zero for none or a
// z:z electrolyte, whose far field is Gouy–Chapman's) and its far-field
// potential eff (V) at the surface potential psi (V), so that each pair
// computes it once.
type farMemo struct {
	mix      pbMixture
	psi, eff float64
}

// WithIons returns a copy of p whose linear superposition double layer uses
// the far field of the electroneutral ion mixture ions (see Pair), computed
// here once for the present Potential; a z:z mixture sets Valence to its z.
// It panics as FarFieldPotential on an invalid or non-electroneutral
// mixture or a non-finite Potential.
func (p Pair) WithIons(ions []Ion) Pair {
	p.far = farMemo{}
	z, symmetric := commonValence(ions)
	if symmetric {
		if z > 0 {
			p.Valence = z
		}
		return p
	}
	p.far.mix = newPBMixture(ions, "Pair.WithIons")
	return p.WithPotential(p.Potential)
}

// WithPotential returns a copy of p at surface potential psi (V), with the
// far field of its ion mixture computed once for it.
func (p Pair) WithPotential(psi float64) Pair {
	p.Potential = psi
	if p.far.mix.s > 0 {
		if math.IsNaN(psi) || math.IsInf(psi, 0) {
			panic("physics: Pair.WithPotential needs a finite potential")
		}
		p.far.psi, p.far.eff = psi, p.far.mix.farFieldPotential(psi, p.TempK)
	}
	return p
}

// Extremum is a stationary point of the interaction energy: Energy in J at
// surface separation Separation in m. Found is false when there is none
// (then Energy and Separation are 0).
type Extremum struct {
	Energy, Separation float64
	Found              bool
}

// WithIonicStrength returns a copy of p whose Kappa is DebyeKappa of
// ionicStrength (mol/m^3) at p.EpsR and p.TempK. It panics as DebyeKappa.
func (p Pair) WithIonicStrength(ionicStrength float64) Pair {
	p.Kappa = DebyeKappa(ionicStrength, p.EpsR, p.TempK)
	return p
}

// Energy returns the total interaction energy in J at surface separation h
// (m, >= 0): van der Waals (Hamaker's exact equal-sphere expression, or
// Gregory's retarded one when p.Retarded; see hamakerSphereSum and
// gregoryRetardation) plus double layer (linear superposition, or
// Hogg–Healy–Fuerstenau when p.ConstantPotential; see lsaPrefactor and
// hhfPrefactor) plus depletion (AsakuraOosawa). At h = 0 it is -Inf when p.Hamaker > 0 and +Inf when
// p.Hamaker < 0. It panics on a negative h or an invalid Pair.
//
// References: B. Derjaguin & L. Landau, Acta Physicochim. URSS 14 (1941) 633;
// E. J. W. Verwey & J. Th. G. Overbeek, Theory of the Stability of Lyophobic
// Colloids (1948); and the references of the three parts.
func (p Pair) Energy(h float64) float64 {
	c := p.curve()
	return c.energy(checkSeparation(h))
}

// EnergyCurve is Energy with the pair checked and its prefactors computed
// once, for solvers that evaluate one pair at many separations.
func (p Pair) EnergyCurve() func(h float64) float64 {
	c := p.curve()
	return func(h float64) float64 { return c.energy(checkSeparation(h)) }
}

// Parts returns the three contributions to Energy in J: van der Waals, double
// layer and depletion, at surface separation h (m, >= 0).
func (p Pair) Parts(h float64) (vdw, edl, depletion float64) {
	c := p.curve()
	return c.parts(checkSeparation(h))
}

// Barrier returns the primary maximum of the energy (the barrier to
// aggregation in the primary minimum): the largest energy on
// [max(MinimumSeparation, 2 StericThickness), h_max] (see SeparationGrid for
// h_max). It counts only when it is above 0 J and lies inside the range; a
// curve that is attractive everywhere, or rises to the far end, has none.
// When the energy falls monotonically from the closest approach the barrier
// is reported there (the energy at steric or Born contact).
//
// Method: a 40-point logarithmic scan brackets the maximum; Newton steps on
// dV/d(ln h) = 0 with a bisection safeguard refine it to 1e-6 in ln h.
func (p Pair) Barrier() Extremum {
	c := p.curve()
	b, _ := c.extrema(false)
	return b
}

// SecondaryMinimum returns the secondary minimum: the lowest energy beyond
// the barrier, counted only when it is below 0 J, lies inside the search
// range and a barrier exists. Method as Barrier.
func (p Pair) SecondaryMinimum() Extremum {
	_, m := p.Extrema()
	return m
}

// Extrema returns Barrier and SecondaryMinimum from one scan.
func (p Pair) Extrema() (barrier, secondaryMinimum Extremum) {
	c := p.curve()
	return c.extrema(true)
}

// SeparationGrid returns n >= 2 logarithmically spaced surface separations
// (m) for plotting p's energy curve, from max(MinimumSeparation,
// 2 StericThickness) to h_max = the largest of 50 nm, 30 Debye lengths
// (capped at 10 radii, far beyond where the Derjaguin-limit double layer
// means anything), 3 depletion ranges and 10 times the start. It panics if n < 2
// or p is invalid.
func SeparationGrid(p Pair, n int) []float64 {
	if n < 2 {
		panic("physics: SeparationGrid needs n >= 2")
	}
	c := p.curve()
	lo, hi := c.searchRange()
	grid := make([]float64, n)
	ratio := math.Pow(hi/lo, 1/float64(n-1))
	h := lo
	for i := range grid {
		grid[i] = h
		h *= ratio
	}
	grid[n-1] = hi
	return grid
}

// pairCurve is a Pair checked once, with its prefactors precomputed, so that
// the searches and quadratures evaluate only exp, log and arithmetic.
type pairCurve struct {
	radius, hamaker    float64
	retarded           bool
	kappa              float64
	edlContact         float64 // LSA: 32 pi eps a (kT/ze)^2 gamma^2; HHF: 2 pi eps a psi^2 (J)
	constantPotential  bool
	depletionRange     float64
	depletionPrefactor float64 // n kT pi/12 (J/m^3)
	stericWall, kT     float64
}

func (p Pair) curve() pairCurve {
	const maxF = math.MaxFloat64
	if !(p.Radius > 0 && p.Radius <= maxF) || !(p.TempK > 0 && p.TempK <= maxF) || !(p.EpsR > 0 && p.EpsR <= maxF) ||
		!(p.Kappa >= 0 && p.Kappa <= maxF) || math.IsNaN(p.Hamaker) || math.IsInf(p.Hamaker, 0) ||
		math.IsNaN(p.Potential) || math.IsInf(p.Potential, 0) || p.Valence < 0 ||
		!(p.DepletionRange >= 0 && p.DepletionRange <= maxF) || !(p.DepletionDensity >= 0 && p.DepletionDensity <= maxF) ||
		!(p.StericThickness >= 0 && p.StericThickness <= maxF) {
		panic("physics: invalid Pair (need finite Radius, EpsR, TempK > 0; Kappa, depletion and steric fields >= 0; Valence >= 0)")
	}
	c := pairCurve{
		radius:            p.Radius,
		hamaker:           p.Hamaker,
		retarded:          p.Retarded,
		kappa:             p.Kappa,
		constantPotential: p.ConstantPotential,
		depletionRange:    p.DepletionRange,
		stericWall:        2 * p.StericThickness,
		kT:                Boltzmann * p.TempK,
	}
	if p.ConstantPotential {
		c.edlContact = hhfPrefactor(p.Radius, p.Potential, p.EpsR)
	} else {
		c.edlContact = p.lsaContact()
	}
	c.depletionPrefactor = p.DepletionDensity * c.kT * math.Pi / 12
	return c
}

func checkSeparation(h float64) float64 {
	if !(h >= 0 && h <= math.MaxFloat64) {
		panic("physics: separation h must be finite and >= 0")
	}
	return h
}

func (c *pairCurve) energy(h float64) float64 {
	vdw, edl, dep := c.parts(h)
	return vdw + edl + dep
}

func (c *pairCurve) parts(h float64) (vdw, edl, depletion float64) {
	switch {
	case c.hamaker == 0:
	case h == 0:
		vdw = math.Inf(-int(math.Copysign(1, c.hamaker)))
	case c.retarded:
		vdw = -c.hamaker * c.radius / (12 * h) * gregoryRetardation(gregoryLambda/(gregoryB*h))
	default:
		vdw = -c.hamaker / 6 * hamakerSphereSum(c.radius, h)
	}
	if c.kappa > 0 && c.edlContact > 0 {
		if c.constantPotential {
			edl = c.edlContact * math.Log1p(math.Exp(-c.kappa*h))
		} else {
			edl = c.edlContact * math.Exp(-c.kappa*h)
		}
	}
	if gap := 2*c.depletionRange - h; gap > 0 && c.depletionPrefactor > 0 {
		depletion = -c.depletionPrefactor * (6*c.radius + 4*c.depletionRange + h) * gap * gap
	}
	return vdw, edl, depletion
}

// searchRange is the separation interval of the extremum searches; see
// SeparationGrid.
func (c *pairCurve) searchRange() (lo, hi float64) {
	lo = math.Max(MinimumSeparation, c.stericWall)
	hi = 50e-9
	if c.kappa > 0 {
		hi = math.Max(hi, math.Min(30/c.kappa, 10*c.radius))
	}
	if c.depletionPrefactor > 0 {
		hi = math.Max(hi, 3*c.depletionRange)
	}
	return lo, math.Max(hi, 10*lo)
}

const scanPoints = 40

// extrema scans the energy on a logarithmic grid and refines the barrier and,
// when withMinimum, the secondary minimum.
func (c *pairCurve) extrema(withMinimum bool) (barrier, minimum Extremum) {
	lo, hi := c.searchRange()
	var hs, vs [scanPoints]float64
	top := c.scan(&hs, &vs, lo, hi)
	// A repulsion still rising at the end of the range (a very long Debye
	// length) has its maximum further out: extend the scan, a decade at a
	// time, up to 30 Debye lengths.
	for top == scanPoints-1 && vs[top] > 0 && c.kappa > 0 && hi < 30/c.kappa {
		lo, hi = hs[scanPoints-2], math.Min(10*hi, 30/c.kappa)
		top = c.scan(&hs, &vs, lo, hi)
	}
	if top == scanPoints-1 {
		return Extremum{}, Extremum{}
	}
	// Refine before judging the sign: a barrier about to vanish can be a
	// bump narrower than the grid spacing.
	barrier = c.refine(&hs, &vs, top, 1)
	if !(barrier.Energy > 0) {
		return Extremum{}, Extremum{}
	}
	if !withMinimum {
		return barrier, Extremum{}
	}
	bottom := top + 1
	for i := top + 1; i < scanPoints; i++ {
		if vs[i] < vs[bottom] {
			bottom = i
		}
	}
	if !(vs[bottom] < 0) || bottom == scanPoints-1 {
		return barrier, Extremum{}
	}
	return barrier, c.refine(&hs, &vs, bottom, -1)
}

// scan fills hs and vs with energies at scanPoints separations spaced
// evenly in ln h from lo to hi and returns the index of the highest.
func (c *pairCurve) scan(hs, vs *[scanPoints]float64, lo, hi float64) int {
	ratio := math.Pow(hi/lo, 1.0/(scanPoints-1))
	h := lo
	top := 0
	for i := range hs {
		hs[i], vs[i] = h, c.energy(h)
		if vs[i] > vs[top] {
			top = i
		}
		h *= ratio
	}
	return top
}

// refine polishes grid point i of a maximum (sign = 1) or minimum (sign = -1)
// within its two neighbouring intervals (see polish), keeping the grid point
// if the search does no better.
func (c *pairCurve) refine(hs, vs *[scanPoints]float64, i int, sign float64) Extremum {
	a := math.Log(hs[max(i-1, 0)])
	b := math.Log(hs[min(i+1, scanPoints-1)])
	best := Extremum{Energy: vs[i], Separation: hs[i], Found: true}
	if i == 0 {
		// The scan's highest point is the closest approach, but the peak
		// may lie just beyond it, inside the first interval.
		a := math.Log(hs[0])
		if sign*c.energy(math.Exp(a+1e-4)) > sign*vs[0] {
			if s, f := c.polish(a, b, (a+b)/2, sign); sign*f > sign*best.Energy {
				best.Energy, best.Separation = f, math.Exp(s)
			}
		}
		return best
	}
	if i == scanPoints-1 {
		return best
	}
	s, f := c.polish(a, b, math.Log(hs[i]), sign)
	if sign*f > sign*best.Energy {
		best.Energy, best.Separation = f, math.Exp(s)
	}
	return best
}

// polishTol is the Newton step in ln h at which polish stops. The iterates
// converge quadratically, so that last step, not evaluated, and the
// quadratic model's extremum place the extremum to about 1e-10 in ln h and
// its energy to a few parts in 1e15.
const polishTol = 1e-5

// polish finds the extremum of sign*V(exp(s)) in [a, b] starting from s, by
// Newton's method on V_s = 0 with the closed-form V_s and V_ss of slopes,
// falling back to bisection of the bracket whenever a step leaves it or the
// curvature has the wrong sign. It returns ln h and V of the extremum: a
// smooth one converges quadratically, in two to four evaluations, and is
// placed by the last Newton step (see polishTol); at a kink (the edge of a
// depletion well) the bracket closes on the kink from both sides, and the
// best point evaluated, on its higher side, is kept.
func (c *pairCurve) polish(a, b, s, sign float64) (float64, float64) {
	v, vs, vss := c.slopes(math.Exp(s))
	return c.polishFrom(a, b, s, sign, v, vs, vss)
}

// newtonConverged reports whether the Newton step from ln h = s towards the
// extremum of sign*V is below polishTol with the right curvature; then the
// step places the extremum and the quadratic model, v + V_s step/2, gives
// its energy, both good to third order.
func newtonConverged(s, v, vs, vss, sign float64) (x, top float64, ok bool) {
	step := -vs / vss
	if !(sign*vss < 0 && math.Abs(step) < polishTol) {
		return 0, 0, false
	}
	return s + step, v + vs*step/2, true
}

// polishFrom is polish given V, V_s and V_ss at the starting point.
func (c *pairCurve) polishFrom(a, b, s, sign, v, vs, vss float64) (float64, float64) {
	bestS, bestV := s, v
	for iter := 0; ; iter++ {
		if sign*v > sign*bestV {
			bestS, bestV = s, v
		}
		slope, curv := sign*vs, sign*vss
		if slope > 0 {
			a = s
		} else {
			b = s
		}
		if x, top, ok := newtonConverged(s, v, vs, vss, sign); ok {
			if sign*top >= sign*bestV {
				return x, top
			}
			break
		}
		if b-a < 1e-9 || iter == 59 {
			break
		}
		next := s - slope/curv
		if !(curv < 0) || !(next > a && next < b) {
			next = (a + b) / 2
		}
		s = next
		v, vs, vss = c.slopes(math.Exp(s))
	}
	return bestS, bestV
}
