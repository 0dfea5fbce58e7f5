package physics

import "math"

// SiteSurface is an oxide surface whose charge comes from one kind of
// amphoteric surface group that binds or releases a proton, with a Stern
// layer of constant capacitance between the surface plane and the start of
// the diffuse layer. Two variants share it:
//
//   - the 1-pK model of Hiemstra, Van Riemsdijk & Bolt: S-OH^(-1/2) + H+ =
//     S-OH2^(+1/2), DeprotonatedCharge = -1/2, PK the point of zero charge;
//   - the silica model of Behrens & Grier: S-O^- + H+ = S-OH,
//     DeprotonatedCharge = -1, PK the pK of the silanol group.
//
// No specific adsorption of electrolyte ions is included (the "basic" Stern
// model without ion pairs): the charge of the surface plane is balanced by
// the diffuse layer alone.
type SiteSurface struct {
	// SiteDensity is the number of proton-binding sites per area, 1/m^2
	// (1 nm^-2 = 1e18 m^-2).
	SiteDensity float64
	// PK is log10 of the protonation constant of a site, S-OH^(q) + H+ =
	// S-OH2^(q+1): pH units.
	PK float64
	// DeprotonatedCharge is the charge of an unprotonated site in units of
	// e: -0.5 (1-pK oxides) or -1 (silica).
	DeprotonatedCharge float64
	// SternCapacitance is the capacitance per area of the Stern layer, F/m^2.
	SternCapacitance float64
}

// SurfaceState is the equilibrium of a SiteSurface in a solution.
type SurfaceState struct {
	// Charge is the surface charge density sigma0 of the surface plane,
	// C/m^2; the diffuse layer carries -Charge.
	Charge float64
	// Potential is the surface-plane potential psi0, V.
	Potential float64
	// DiffusePotential is the potential psiD at the Stern plane, where the
	// diffuse layer starts, V: the usual estimate of the zeta potential.
	DiffusePotential float64
}

// State returns the equilibrium of the surface at pH pH in the
// electroneutral ion mixture ions (mol/m^3, which should include the H+ and
// OH- of WaterIons and the counter-ions of the acid or base that set the
// pH), of relative permittivity epsR, at temperature tempK (K). It solves
//
//	theta / (1 - theta) = 10^(PK - pH) exp(-e psi0/kT)      (site protonation)
//	sigma0 = e N_s (q + theta)                              (q = DeprotonatedCharge)
//	psi0 - psiD = sigma0 / C                                (Stern layer)
//	sigma0 = GrahameCharge(psiD, ions)                      (diffuse layer)
//
// for psiD by a bracketed root search on the charge balance, which is
// strictly monotone in psiD, to 1e-12 in e psiD/kT. For the 1-pK surface
// psiD is 0 at pH = PK, of the sign of PK - pH, and falls in magnitude as
// the ionic strength rises at fixed pH, while |sigma0| rises; psi0 stays
// below the Nernst value ln(10) (kT/e) (PK - pH) in magnitude.
//
// It panics unless SiteDensity > 0, SternCapacitance > 0, PK and pH are
// finite, -1 <= DeprotonatedCharge <= 0, epsR > 0, tempK > 0 and ions hold
// at least one charged species (see GrahameCharge for the other panics).
//
// References: T. Hiemstra, W. H. Van Riemsdijk & G. H. Bolt, "Multisite
// proton adsorption modeling at the solid/solution interface of
// (hydr)oxides: a new approach. I. Model description and evaluation of
// intrinsic reaction constants", J. Colloid Interface Sci. 133 (1989) 91,
// and T. Hiemstra, J. C. M. de Wit & W. H. Van Riemsdijk, "II. Application
// to various important (hydr)oxides", J. Colloid Interface Sci. 133 (1989)
// 105 (1-pK basic Stern model); S. H. Behrens & D. G. Grier, "The charge of
// glass and silica surfaces", J. Chem. Phys. 115 (2001) 6716 (silica);
// D. C. Grahame, Chem. Rev. 41 (1947) 441 (diffuse layer).
func (s SiteSurface) State(pH float64, ions []Ion, epsR, tempK float64) SurfaceState {
	if !(s.SiteDensity > 0 && s.SiteDensity <= math.MaxFloat64) || !(s.SternCapacitance > 0 && s.SternCapacitance <= math.MaxFloat64) ||
		math.IsNaN(s.PK) || math.IsInf(s.PK, 0) || !(s.DeprotonatedCharge >= -1 && s.DeprotonatedCharge <= 0) ||
		math.IsNaN(pH) || math.IsInf(pH, 0) || !(epsR > 0 && epsR <= math.MaxFloat64) || !(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: SiteSurface.State needs SiteDensity > 0, SternCapacitance > 0, finite PK and pH, " +
			"-1 <= DeprotonatedCharge <= 0, epsR > 0 and tempK > 0")
	}
	m := newPBMixture(ions, "SiteSurface.State")
	if m.s == 0 {
		panic("physics: SiteSurface.State needs charged ions in solution")
	}
	kT := Boltzmann * tempK
	thermal := kT / ElementaryCharge
	maxCharge := ElementaryCharge * s.SiteDensity
	logRatio := math.Ln10 * (s.PK - pH)
	// sites returns sigma0 at the reduced surface potential y0:
	// theta = 1/(1 + exp(y0 - logRatio)).
	sites := func(y0 float64) float64 {
		theta := 0.5 - 0.5*math.Tanh((y0-logRatio)/2)
		return maxCharge * (s.DeprotonatedCharge + theta)
	}
	// balance(yD) = diffuse charge - site charge at the psi0 it implies;
	// it rises strictly with yD.
	balance := func(yD float64) float64 {
		sigma := m.grahame(yD, epsR, kT)
		return sigma - sites(yD+sigma/(s.SternCapacitance*thermal))
	}
	lo, hi := 0.0, 0.0
	flo, fhi := balance(0), 0.0
	if flo == 0 {
		return SurfaceState{}
	}
	// Step away from 0 in the direction of the root, doubling, until the
	// balance changes sign: the site charge is bounded, the diffuse charge
	// is not. A step into overflow (|yD| beyond about 180) is halved back
	// until the balance is finite.
	dir := 1.0
	if flo > 0 {
		dir = -1
	}
	for step := 1.0; ; step *= 2 {
		hi = dir * step
		for fhi = balance(hi); math.IsInf(fhi, 0); fhi = balance(hi) {
			hi = (lo + hi) / 2
		}
		if (fhi > 0) != (flo > 0) {
			break
		}
		lo, flo = hi, fhi
	}
	yD, _ := FindRootFrom(balance, lo, hi, flo, fhi, 1e-12)
	sigma := m.grahame(yD, epsR, kT)
	return SurfaceState{
		Charge:           sigma,
		Potential:        thermal * (yD + sigma/(s.SternCapacitance*thermal)),
		DiffusePotential: thermal * yD,
	}
}
