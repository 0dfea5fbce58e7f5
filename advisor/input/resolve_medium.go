package input

import (
	"math"

	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// resolveLiquid finds the properties of the continuous phase at the storage
// temperature. Overrides hold at the medium temperature; when storage is
// elsewhere they are carried over by the library liquid's own temperature
// dependence.
func resolveLiquid(lib *library.Library, m *Medium, mediumT, storageT float64, tempField string, bad *Error, n *Notes) LiquidState {
	key := m.Liquid
	if key == "" {
		key = defaultLiquid
		n.Add("medium.liquid not given: water assumed")
	}
	liquid, ok := lib.Liquids[key]
	if !ok {
		bad.add("/medium/liquid", "unknown liquid", "", "one of: "+joinKeys(lib.LiquidKeys()))
		return LiquidState{Key: key}
	}
	atStorage, err := liquidAt(liquid, storageT, tempField, n)
	if err != nil {
		bad.Problems = append(bad.Problems, err.(*Error).Problems...)
		return LiquidState{Key: key}
	}
	atMedium := atStorage
	if mediumT != storageT {
		// The liquid at the medium temperature only carries stated
		// properties to storage; without any, its sources are not listed.
		var mediumNotes *Notes
		if m.DensityKgM3 != nil || m.ViscosityMPaS != nil || m.Permittivity != nil {
			mediumNotes = n
		}
		if atMedium, err = liquidAt(liquid, mediumT, "/medium/temperature_c", mediumNotes); err != nil {
			bad.Problems = append(bad.Problems, err.(*Error).Problems...)
			return LiquidState{Key: key}
		}
	}
	st := atStorage
	carry := func(override *float64, scale, fromLib, atMed float64, name string) float64 {
		if override == nil {
			return fromLib
		}
		v := *override * scale
		if mediumT == storageT {
			return v
		}
		n.Add("medium.%s given at %g degC, carried to the storage temperature %g degC with the temperature dependence of %s",
			name, mediumT, storageT, key)
		return v * fromLib / atMed
	}
	st.Density = carry(m.DensityKgM3, 1, atStorage.Density, atMedium.Density, "density_kg_m3")
	st.Viscosity = carry(m.ViscosityMPaS, 1e-3, atStorage.Viscosity, atMedium.Viscosity, "viscosity_mPa_s")
	st.Permittivity = carry(m.Permittivity, 1, atStorage.Permittivity, atMedium.Permittivity, "relative_permittivity")
	if m.RefractiveIndex != nil {
		st.RefractiveIndex = *m.RefractiveIndex
	}
	return st
}

func joinKeys(keys []string) string {
	out := ""
	for i, k := range keys {
		if i > 0 {
			out += ", "
		}
		out += k
	}
	return out
}

// resolveElectrolyte sums the ions of the stated salts (or takes the stated
// ionic strength or its estimate from conductivity) and, in an aqueous
// medium with a stated pH, adds the H+ and OH- of water at that pH with the
// monovalent counter-ion of the acid or base that set it, so that the
// mixture stays electroneutral and changes smoothly with pH. Without a pH,
// an aqueous medium without salts holds the ions of neutral water, and one
// with salts is floored at their ionic strength. at is the JSON pointer of
// the medium, for problems. scale multiplies every stated concentration
// (1 in Resolve; a Monte Carlo draw's factor in Rederive), and the ions of
// water too when no salt is stated (then they stand for the unstated
// background).
func resolveElectrolyte(m *Medium, at string, c *Conditions, scale float64, bad *Error, n *Notes) {
	var ions []physics.Ion
	c.MultivalentSalt, c.MultivalentConc, c.MultivalentAt, c.MultivalentIonicShare = "", 0, 0, 0
	c.MultivalentUnit = [2]float64{}
	for i, el := range m.Electrolytes {
		conc := *el.ConcentrationMM * scale // mM = mol/m^3
		switch {
		case el.Formula != "" && (el.CationValence != nil || el.AnionValence != nil):
			bad.add(pointerf("%s/electrolytes/%d", at, i), "give either formula or cation_valence and anion_valence, not both", "", "")
		case el.Formula != "" && isBuffer(el.Formula):
			ions = append(ions, bufferIons(el.Formula, bufferSalts[el.Formula], conc, m.PH, n)...)
		case el.Formula != "":
			salt, err := physics.ParseSalt(el.Formula)
			if err != nil {
				bad.add(pointerf("%s/electrolytes/%d/formula", at, i), "unknown or unbalanced salt formula", "",
					"a neutral salt of common ions, e.g. NaCl, CaCl2, MgSO4, Na2SO4, AlCl3, Ca(NO3)2, or a buffer salt: "+bufferList)
				continue
			}
			pair := salt.Ions(conc)
			noteMultivalent(c, el.Formula, pair, conc, len(ions))
			ions = append(ions, pair[:]...)
		case el.CationValence != nil && el.AnionValence != nil:
			pair, err := physics.SymmetricIons(*el.CationValence, *el.AnionValence, conc)
			if err != nil {
				bad.add(pointerf("%s/electrolytes/%d", at, i), err.Error(), "", "valences 1 to 4")
				continue
			}
			noteMultivalent(c, formatValences(*el.CationValence, *el.AnionValence), pair, conc, len(ions))
			ions = append(ions, pair[:]...)
		default:
			bad.add(pointerf("%s/electrolytes/%d", at, i), "each electrolyte needs a formula or both valences", "", "")
		}
	}
	switch {
	case len(m.Electrolytes) > 0:
	case m.IonicStrengthMM != nil:
		ions = append(ions, monovalent(*m.IonicStrengthMM*scale)...)
		n.Add("medium.ionic_strength_mM given: treated as a 1:1 electrolyte for the counter-ion valence")
	case m.ConductivityUSCm != nil:
		is := physics.IonicStrengthFromConductivity(*m.ConductivityUSCm*1e-4) * scale
		ions = append(ions, monovalent(is)...)
		n.Add("ionic strength %s ESTIMATED from conductivity (Russell 1976 relation), treated as 1:1",
			number.Quantity(is, "mM"))
	}
	ions = resolveHardness(m.Hardness, c, ions, scale, bad, n)
	if len(m.Electrolytes) > 0 && (m.IonicStrengthMM != nil || m.ConductivityUSCm != nil) {
		n.Add("medium.electrolytes given: ionic_strength_mM and conductivity_uS_cm ignored")
	}
	salts := physics.IonicStrength(ions)
	if c.Liquid.Aqueous && (m.PH != nil || salts == 0) {
		water := waterIons(m.PH, c.StorageTempK, salts, n)
		if salts == 0 && scale != 1 {
			for i := range water {
				water[i].Concentration *= scale
			}
		}
		ions = append(ions, water...)
	}
	c.Ions = ions
	c.IonicStrength = physics.IonicStrength(ions)
	if c.Liquid.Aqueous && m.PH == nil && c.IonicStrength < AutoionisationMolM3 {
		c.IonicStrength = AutoionisationMolM3
		n.Add("no pH stated and salts below the autoionisation of water: ionic strength floored at %s", number.Quantity(AutoionisationMolM3, "mM"))
	}
	if !c.Liquid.Aqueous && c.IonicStrength > 0 {
		n.Add("electrolyte in a non-aqueous liquid: ions assumed fully dissociated, an upper bound on screening")
	}
}

// acidBaseNoteShare is the share of the ionic strength above which the ions
// of water and of the acid or base that set the pH are named in a note.
const acidBaseNoteShare = 0.01

// waterIons returns the H+ and OH- of water at pH (neutral water at the
// temperature when pH is nil) and tempK, with the monovalent counter-ion of
// the acid or base that set the pH (the excess of H+ over OH-, or of OH-
// over H+). pKw is taken at tempK kept within liquid water's range
// (liquidWaterK). salts is the ionic strength of the other ions, for the
// note.
func waterIons(pH *float64, tempK, salts float64, n *Notes) []physics.Ion {
	tK := liquidWaterK(tempK)
	at := physics.WaterPKw(tK) / 2
	if pH != nil {
		at = *pH
	}
	water := physics.WaterIons(at, tK)
	h, oh := water[0].Concentration, water[1].Concentration
	ions := water[:]
	if excess := h - oh; excess > 0 {
		ions = append(ions, physics.Ion{Valence: -1, Concentration: excess})
	} else if excess < 0 {
		ions = append(ions, physics.Ion{Valence: 1, Concentration: -excess})
	}
	added := physics.IonicStrength(ions)
	switch {
	case salts == 0 && pH == nil:
		n.Add("no electrolyte and no pH stated: the H+ and OH- of neutral water only, ionic strength %s", number.Quantity(added, "mM"))
	case salts == 0 || added > acidBaseNoteShare*(salts+added):
		n.Add("pH %s: %s of H+ or OH- with a monovalent counter-ion of the acid or base added to the ionic strength (pKw %s at the temperature)",
			number.Shortest(at), number.Quantity(math.Max(h, oh), "mM"), number.Shortest(number.Round(physics.WaterPKw(tK), 4)))
	}
	return ions
}

func monovalent(conc float64) []physics.Ion {
	return []physics.Ion{{Valence: 1, Concentration: conc}, {Valence: -1, Concentration: conc}}
}

// noteMultivalent remembers the most concentrated salt with an ion of
// valence above 1, for the multivalent-ion cause and its remedy; at is the
// index its two ions will take in Conditions.Ions.
func noteMultivalent(c *Conditions, label string, pair [2]physics.Ion, conc float64, at int) {
	multi := pair[0].Valence > 1 || pair[1].Valence < -1
	if multi && conc > 0 && conc >= c.MultivalentConc {
		c.MultivalentSalt, c.MultivalentConc, c.MultivalentAt = label, conc, at
		c.MultivalentUnit = [2]float64{math.Round(pair[0].Concentration / conc), math.Round(pair[1].Concentration / conc)}
		c.MultivalentIonicShare = physics.IonicStrength(pair[:]) / conc
	}
}

// resolveZeta chooses the surface potential for the double layer: measured
// zeta, zeta from mobility by Henry's equation, or an estimate from pH and
// the isoelectric point, in that order.
func resolveZeta(p *Particles, meas *measuredIn, c *Conditions, n *Notes) {
	kappa := physics.DebyeKappa(c.IonicStrength, c.Liquid.Permittivity, c.StorageTempK)
	switch {
	case p.ZetaMV != nil && p.Mobility != nil:
		c.Zeta, c.ZetaSource = *p.ZetaMV*1e-3, "measured"
		n.Add("both zeta_mV and mobility given: the measured zeta_mV is used")
		carryZeta(c, meas, n)
	case p.ZetaMV != nil:
		c.Zeta, c.ZetaSource = *p.ZetaMV*1e-3, "measured"
		carryZeta(c, meas, n)
	case p.Mobility != nil:
		mu := *p.Mobility * 1e-8 // um cm/(V s) to m^2/(V s)
		model := EffectiveModels(c.Models).ZetaFromMobility
		var how string
		switch model {
		case "smoluchowski":
			c.Henry, how = physics.HenrySmoluchowski, "Smoluchowski's limit (thin double layer, f = 1.5)"
		case "huckel":
			c.Henry, how = physics.HenryHuckel, "Hueckel's limit (thick double layer, f = 1)"
		case "henry_exact":
			c.Henry, how = physics.HenrySwanFurst(kappa*c.Radius), "Henry's equation with the exact f(kappa a) of Swan & Furst (2012)"
		default:
			c.Henry, how = physics.HenryOhshima(kappa*c.Radius), "Henry's equation with Ohshima's (1994) closed form of f(kappa a)"
		}
		c.Zeta = physics.ZetaHenry(mu, c.Liquid.Viscosity, c.Liquid.Permittivity, c.Henry)
		c.ZetaSource = "mobility"
		n.Add("zeta potential %s from mobility by %s, f = %.4g", number.Quantity(c.Zeta*1e3, "mV"), how, c.Henry)
		carryZeta(c, meas, n)
	case c.Sites != nil && !math.IsNaN(c.PH):
		c.ZetaSource = "estimated"
		if zeta, reference, st, ok := c.anchoredEstimate(c.PH); ok {
			c.Zeta, c.SurfaceCharge, c.DiffusePotential = zeta, st.Charge, st.DiffusePotential
			n.Add("zeta potential not measured: %s ESTIMATED: the pH-and-isoelectric-point estimate (%s at pH %g about the zero point %g, taken as measured in %g mM of 1:1 salt) scaled to the product's ions (ionic strength %s) by the ratio of the slip-plane potentials of %s in the two liquids (the model's own level runs two to three times above measured zeta potentials); surface charge %s, diffuse-layer potential %s of the model; measure it to confirm",
				number.Quantity(c.Zeta*1e3, "mV"), number.Quantity(reference*1e3, "mV"), c.PH, c.ZeroPointPH(), anchorSaltMM,
				number.Quantity(c.IonicStrength, "mM"), c.Sites.Basis, number.Quantity(c.SurfaceCharge, "C/m^2"),
				number.Quantity(c.DiffusePotential*1e3, "mV"))
			break
		}
		st := c.SurfaceState(c.PH)
		c.Zeta = st.Zeta
		c.SurfaceCharge, c.DiffusePotential = st.Charge, st.DiffusePotential
		n.Add("zeta potential not measured: %s ESTIMATED as the slip-plane potential of %s at pH %g in the product's ions (ionic strength %s), surface charge %s, diffuse-layer potential %s; basic Stern models tend to overestimate measured zeta potentials at low ionic strength (by up to 40 %% for hematite, Gunnarsson et al. 2001); measure it to confirm",
			number.Quantity(c.Zeta*1e3, "mV"), c.Sites.Basis, c.PH, number.Quantity(c.IonicStrength, "mM"), number.Quantity(st.Charge, "C/m^2"),
			number.Quantity(st.DiffusePotential*1e3, "mV"))
	case !math.IsNaN(c.IsoelectricPH) && !math.IsNaN(c.PH):
		c.Zeta = physics.SurfacePotentialFromPH(c.PH, c.IsoelectricPH, c.StorageTempK)
		c.ZetaSource = "estimated"
		n.Add("zeta potential not measured: %s ESTIMATED from pH %g and isoelectric point %g (see basis; no site-binding parameters for this material, so the estimate does not fall with ionic strength); measure it to confirm",
			number.Quantity(c.Zeta*1e3, "mV"), c.PH, c.IsoelectricPH)
	default:
		n.Add("no zeta potential, mobility, or pH with isoelectric point: electrostatic interaction not evaluated")
	}
	surfaceSign := 0
	if c.Zeta > 0 {
		surfaceSign = 1
	} else if c.Zeta < 0 {
		surfaceSign = -1
	}
	c.CounterValence = physics.CounterIonValence(c.Ions, surfaceSign)
}

// liquidWaterK keeps a temperature (K) within 0-150 degC, the range of
// water's ion product and density (physics.WaterPKw, WaterIons): a product
// stored frozen, or a zeta measured below 0 degC, has its water ions and
// surface chemistry taken at 0 degC, the edge of liquid water.
func liquidWaterK(tempK float64) float64 {
	return math.Min(math.Max(tempK, physics.Kelvin(0)), physics.Kelvin(150))
}
