package physics

import "math"

// SiteSurface is an oxide surface whose charge comes from one kind of
// amphoteric surface group that binds or releases a proton, with a Stern
// layer of constant capacitance between the surface plane and the head end
// of the diffuse layer. Two variants share it:
//
//   - the 1-pK model of Hiemstra, Van Riemsdijk & Bolt: S-OH^(-1/2) + H+ =
//     S-OH2^(+1/2), DeprotonatedCharge = -1/2, PK the point of zero charge;
//   - the silica model of Behrens & Grier: S-O^- + H+ = S-OH,
//     DeprotonatedCharge = -1, PK the pK of the silanol group.
//
// Electrolyte ions may form ion pairs with the charged groups (Pairs): a
// cation with an unprotonated site, an anion with a protonated one, the
// proton charge in the surface plane and the ion's charge at the head end
// of the diffuse layer. Without pairs it is the basic Stern model in which
// the diffuse layer alone balances the surface charge. The electrokinetic
// (slip) plane lies SlipDistance outside the head end of the diffuse layer.
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
	// Pairs are the ion-pair constants of the electrolyte ions, one per
	// valence; ions of a valence without one form no pairs.
	Pairs []IonPair
	// SlipDistance is the distance from the head end of the diffuse layer
	// to the electrokinetic slip plane, m (0: the two coincide).
	SlipDistance float64
}

// IonPair is the pairing of the electrolyte ions of one valence with the
// charged surface groups: S-OH^(q) + M^z = S-OH^(q)...M^z for a cation
// (Valence > 0), S-OH2^(q+1) + A^z = S-OH2^(q+1)...A^z for an anion
// (Valence < 0), with intrinsic constant 10^LogK L/mol.
type IonPair struct {
	Valence int
	LogK    float64
}

// SurfaceState is the equilibrium of a SiteSurface in a solution. The
// charges balance: Charge + PairCharge + DiffuseCharge = 0.
type SurfaceState struct {
	// Charge is the surface charge density sigma0 of the surface plane
	// (protons bound or released), C/m^2.
	Charge float64
	// PairCharge is the charge of the ion pairs at the head end of the
	// diffuse layer, C/m^2.
	PairCharge float64
	// DiffuseCharge is the charge of the diffuse layer, C/m^2.
	DiffuseCharge float64
	// Potential is the surface-plane potential psi0, V.
	Potential float64
	// DiffusePotential is the potential psiD at the head end of the diffuse
	// layer (the Stern plane), V.
	DiffusePotential float64
	// Zeta is the potential at the slip plane, SlipDistance further out,
	// V: the model's zeta potential (DiffusePotential when SlipDistance is
	// 0).
	Zeta float64
}

// State returns the equilibrium of the surface at pH pH in the
// electroneutral ion mixture ions (mol/m^3, which should include the H+ and
// OH- of WaterIons and the counter-ions of the acid or base that set the
// pH), of relative permittivity epsR, at temperature tempK (K). With
// reduced potentials y0 = e psi0/kT and yD = e psiD/kT, the fraction of
// each site species relative to the bare site S-OH^(q) is
//
//	S-OH2^(q+1):           P   = 10^(PK - pH) exp(-y0)
//	S-OH^(q)...M^z:        Q_M = K_M c_M exp(-z_M yD)          (z_M > 0)
//	S-OH2^(q+1)...A^z:     P Q_A, Q_A = K_A c_A exp(-z_A yD)    (z_A < 0)
//
// with c in mol/L (pH as -log10 of the H+ concentration); sigma0 = e N_s
// times the mean proton-plane charge (q for bare and cation-paired sites,
// q + 1 for the protonated ones), the pair charge sigmaB = e N_s times the
// mean z of the paired ions, and
//
//	psi0 - psiD = sigma0 / C                       (Stern layer)
//	sigma0 + sigmaB = GrahameCharge(psiD, ions)    (diffuse layer)
//
// solved for psiD by a bracketed root search on the charge balance, which
// rises strictly with psiD (with pairs, psi0 at each psiD by an inner
// search on the Stern-layer equation, which rises strictly with psi0), to
// 1e-12 in the reduced potentials. The concentrations c of the ions of
// valence +1 and -1 exclude the H+ and OH- of WaterIons(pH, tempK), which
// set the site charge and pair with nothing.
//
// The slip-plane potential is the Gouy-Chapman potential at SlipDistance
// from the head end of the diffuse layer: the first integral of the
// Poisson-Boltzmann equation of the mixture, dy/dx = -sign(y) kappa
// sqrt(G(y)), integrated outward from yD by the classical fourth-order
// Runge-Kutta method in steps of at most 0.01 Debye lengths.
//
// Without pairs, or with equal constants for a 1:1 salt, psiD is 0 at
// pH = PK for the 1-pK surface, of the sign of PK - pH; |psiD| falls as the
// ionic strength rises at fixed pH while |sigma0| rises; pairs move part of
// the compensation of sigma0 into the Stern layer, more so as salt rises,
// and lower |psiD|; |zeta| <= |psiD|.
//
// It panics unless SiteDensity > 0, SternCapacitance > 0, PK, pH and every
// LogK are finite, every pair's Valence is non-zero, -1 <=
// DeprotonatedCharge <= 0, SlipDistance >= 0 and finite, epsR > 0, tempK
// > 0 (with pairs, within WaterIons' range), and ions hold at least one
// charged species (see GrahameCharge for the other panics).
//
// References: T. Hiemstra, W. H. Van Riemsdijk & G. H. Bolt, "Multisite
// proton adsorption modeling at the solid/solution interface of
// (hydr)oxides: a new approach. I. Model description and evaluation of
// intrinsic reaction constants", J. Colloid Interface Sci. 133 (1989) 91,
// and T. Hiemstra, J. C. M. de Wit & W. H. Van Riemsdijk, "II. Application
// to various important (hydr)oxides", J. Colloid Interface Sci. 133 (1989)
// 105 (1-pK basic Stern model with ion pairs at the head end of the
// diffuse layer); S. H. Behrens & D. G. Grier, "The charge of glass and
// silica surfaces", J. Chem. Phys. 115 (2001) 6716 (silica); D. C.
// Grahame, Chem. Rev. 41 (1947) 441 (diffuse layer); J. Lyklema,
// Fundamentals of Interface and Colloid Science, Vol. II (Academic Press,
// 1995), ch. 4 (slip plane outside the Stern layer).
func (s SiteSurface) State(pH float64, ions []Ion, epsR, tempK float64) SurfaceState {
	if !(s.SiteDensity > 0 && s.SiteDensity <= math.MaxFloat64) || !(s.SternCapacitance > 0 && s.SternCapacitance <= math.MaxFloat64) ||
		math.IsNaN(s.PK) || math.IsInf(s.PK, 0) || !(s.DeprotonatedCharge >= -1 && s.DeprotonatedCharge <= 0) ||
		!(s.SlipDistance >= 0 && s.SlipDistance <= math.MaxFloat64) ||
		math.IsNaN(pH) || math.IsInf(pH, 0) || !(epsR > 0 && epsR <= math.MaxFloat64) || !(tempK > 0 && tempK <= math.MaxFloat64) {
		panic("physics: SiteSurface.State needs SiteDensity > 0, SternCapacitance > 0, finite PK and pH, " +
			"-1 <= DeprotonatedCharge <= 0, SlipDistance >= 0, epsR > 0 and tempK > 0")
	}
	m := newPBMixture(ions, "SiteSurface.State")
	if m.s == 0 {
		panic("physics: SiteSurface.State needs charged ions in solution")
	}
	kT := Boltzmann * tempK
	thermal := kT / ElementaryCharge
	stern := s.SternCapacitance * thermal // C/m^2 per unit of reduced potential
	maxCharge := ElementaryCharge * s.SiteDensity
	logRatio := math.Ln10 * (s.PK - pH)
	pairs := s.pairFormers(pH, ions, tempK)

	var balance func(yD float64) float64
	var surfacePotential func(yD float64) float64
	if len(pairs) == 0 {
		// sites returns sigma0 at the reduced surface potential y0:
		// theta = 1/(1 + exp(y0 - logRatio)).
		sites := func(y0 float64) float64 {
			theta := 0.5 - 0.5*math.Tanh((y0-logRatio)/2)
			return maxCharge * (s.DeprotonatedCharge + theta)
		}
		// balance(yD) = diffuse charge - site charge at the psi0 it
		// implies; it rises strictly with yD.
		balance = func(yD float64) float64 {
			sigma := m.grahame(yD, epsR, kT)
			return sigma - sites(yD+sigma/stern)
		}
		surfacePotential = func(yD float64) float64 { return yD + m.grahame(yD, epsR, kT)/stern }
	} else {
		sp := sitePairs{maxCharge: maxCharge, q: s.DeprotonatedCharge, logRatio: logRatio, pairs: pairs}
		surfacePotential = func(yD float64) float64 {
			// C (y0 - yD) - sigma0(y0, yD) rises strictly with y0, and
			// sigma0 lies between e N_s q and e N_s (q + 1).
			h := func(y0 float64) float64 {
				sigma0, _ := sp.charges(y0, yD)
				return stern*(y0-yD) - sigma0
			}
			lo := yD + maxCharge*s.DeprotonatedCharge/stern
			hi := yD + maxCharge*(s.DeprotonatedCharge+1)/stern
			flo, fhi := h(lo), h(hi)
			if flo >= 0 {
				return lo
			}
			if fhi <= 0 {
				return hi
			}
			y0, _ := FindRootFrom(h, lo, hi, flo, fhi, 1e-12)
			return y0
		}
		balance = func(yD float64) float64 {
			sigma0, sigmaB := sp.charges(surfacePotential(yD), yD)
			return m.grahame(yD, epsR, kT) - sigma0 - sigmaB
		}
	}
	lo, hi := 0.0, 0.0
	flo, fhi := balance(0), 0.0
	yD := 0.0
	if flo != 0 {
		// Step away from 0 in the direction of the root, doubling, until
		// the balance changes sign: the site and pair charges are bounded,
		// the diffuse charge is not. A step into overflow (|yD| beyond
		// about 180) is halved back until the balance is finite.
		dir := 1.0
		if flo > 0 {
			dir = -1
		}
		for step := 1.0; ; step *= 2 {
			hi = dir * step
			for fhi = balance(hi); math.IsInf(fhi, 0) || math.IsNaN(fhi); fhi = balance(hi) {
				hi = (lo + hi) / 2
			}
			if (fhi > 0) != (flo > 0) {
				break
			}
			lo, flo = hi, fhi
		}
		yD, _ = FindRootFrom(balance, lo, hi, flo, fhi, 1e-12)
	}
	diffuse := m.grahame(yD, epsR, kT)
	y0 := surfacePotential(yD)
	st := SurfaceState{
		Charge:           diffuse,
		DiffuseCharge:    -diffuse,
		Potential:        thermal * y0,
		DiffusePotential: thermal * yD,
	}
	if len(pairs) > 0 {
		st.Charge = stern * (y0 - yD)
		st.PairCharge = diffuse - st.Charge
	}
	kappa := DebyeKappa(m.s/2, epsR, tempK)
	st.Zeta = thermal * m.slipPotential(yD, kappa*s.SlipDistance)
	return st
}

// pairFormer is the product K c (dimensionless) of the ions of one valence
// that form ion pairs, c in mol/L.
type pairFormer struct {
	valence float64
	logKc   float64 // ln(K c)
}

// pairFormers returns the ions of ions that pair under s.Pairs, by valence,
// with the H+ and OH- of WaterIons(pH, tempK) taken out of the monovalent
// totals; valences with no ions left are dropped.
func (s SiteSurface) pairFormers(pH float64, ions []Ion, tempK float64) []pairFormer {
	if len(s.Pairs) == 0 {
		return nil
	}
	water := WaterIons(pH, tempK)
	var out []pairFormer
	for _, p := range s.Pairs {
		if math.IsNaN(p.LogK) || math.IsInf(p.LogK, 0) || p.Valence == 0 {
			panic("physics: SiteSurface.State needs a finite LogK and a non-zero valence for each ion pair")
		}
		var c float64
		for _, ion := range ions {
			if ion.Valence == p.Valence {
				c += ion.Concentration
			}
		}
		switch p.Valence {
		case 1:
			c -= water[0].Concentration
		case -1:
			c -= water[1].Concentration
		}
		if c <= 0 {
			continue
		}
		out = append(out, pairFormer{valence: float64(p.Valence), logKc: math.Ln10*p.LogK + math.Log(c/1000)})
	}
	return out
}

// sitePairs holds what the site and pair charges depend on besides the
// potentials.
type sitePairs struct {
	maxCharge, q, logRatio float64
	pairs                  []pairFormer
}

// charges returns sigma0 and the pair charge sigmaB (C/m^2) at the reduced
// surface-plane potential y0 and head-end potential yD. The species'
// weights are formed from their logarithms less the largest, so no
// Boltzmann factor overflows.
func (sp sitePairs) charges(y0, yD float64) (sigma0, sigmaB float64) {
	protonated := sp.logRatio - y0
	largest := math.Max(0, protonated)
	for _, p := range sp.pairs {
		l := p.logKc - p.valence*yD
		if p.valence < 0 {
			l += protonated
		}
		largest = math.Max(largest, l)
	}
	bare := math.Exp(-largest)
	prot := math.Exp(protonated - largest)
	total := bare + prot
	var plane, paired float64 // sum of weight x proton-plane charge, x pair charge
	plane = sp.q*bare + (sp.q+1)*prot
	for _, p := range sp.pairs {
		l := p.logKc - p.valence*yD
		q := sp.q
		if p.valence < 0 {
			l += protonated
			q++
		}
		w := math.Exp(l - largest)
		total += w
		plane += q * w
		paired += p.valence * w
	}
	return sp.maxCharge * plane / total, sp.maxCharge * paired / total
}

// slipPotential returns the reduced potential a reduced distance kd =
// kappa d outward from the reduced potential y in the flat diffuse layer
// of m: dy/dX = -sign(y) sqrt(G(y)), X = kappa x, by fourth-order
// Runge-Kutta in steps of at most 0.01.
func (m pbMixture) slipPotential(y, kd float64) float64 {
	if kd == 0 || y == 0 {
		return y
	}
	slope := func(y float64) float64 { return -math.Copysign(math.Sqrt(m.fieldSquared(y)), y) }
	n := math.Ceil(kd / 0.01)
	h := kd / n
	for i := 0.0; i < n; i++ {
		k1 := slope(y)
		k2 := slope(y + h/2*k1)
		k3 := slope(y + h/2*k2)
		k4 := slope(y + h*k3)
		y += h / 6 * (k1 + 2*k2 + 2*k3 + k4)
	}
	return y
}
