package advisor

import (
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
	"colloidtriage/advisor/remedy"
	"colloidtriage/physics"
)

// computeInteraction reports screening, surface charge, the DLVO energy
// curve's barrier and secondary minimum, and the aggregation kinetics of two
// median particles, when a surface potential is known.
func (ev *evaluation) computeInteraction() {
	c := ev.cond
	T := c.StorageTempK
	kT := physics.Boltzmann * T
	kappa := physics.DebyeKappa(c.IonicStrength, c.Liquid.Permittivity, T)
	ev.set("ionic_strength", c.IonicStrength, "1/2 sum c z^2 over the stated ions")
	ev.set("debye_length", 1/kappa*1e9, "Debye-Hueckel: kappa^2 = 2 NA e^2 I/(eps0 epsr kT)")
	if kappa > 0 {
		ev.set("kappa_a", kappa*c.Radius, "median radius over Debye length")
	}
	ev.set("counter_ion_valence", float64(c.CounterValence), "largest valence of the ions opposite in sign to the surface")
	ev.set("hamaker_constant", c.Hamaker*1e21, "request, library or Tabor-Winterton estimate (see assumptions)")
	if !math.IsNaN(c.IsoelectricPH) && !math.IsNaN(c.PH) {
		ev.set("ph_distance_from_iep", math.Abs(c.PH-c.IsoelectricPH), "|pH - isoelectric pH|")
	}
	if !math.IsNaN(c.SurfaceCharge) {
		ev.set("surface_charge_density", c.SurfaceCharge, "site-binding model of the material (see assumptions) at the product's pH and ions")
		ev.set("diffuse_layer_potential", c.DiffusePotential*1e3, "site-binding model: Stern-plane potential, Grahame equation in the product's ion mixture")
	}
	if !math.IsNaN(c.Henry) {
		ev.set("henry_function", c.Henry, "Henry's function used to convert mobility to zeta (see assumptions)")
	}

	ev.pair = physics.Pair{Radius: c.Radius, Hamaker: c.Hamaker, Kappa: kappa, EpsR: c.Liquid.Permittivity, TempK: T,
		Valence: max(c.CounterValence, 1)}
	ev.chooseModels()
	ev.vanDerWaalsOnly = ev.pair
	ev.vanDerWaalsOnly.Potential, ev.vanDerWaalsOnly.Kappa = 0, 0
	if math.IsNaN(c.Zeta) {
		return
	}
	ev.set("zeta_potential", c.Zeta*1e3, "zeta potential ("+c.ZetaSource+"), used as the diffuse-layer potential")
	ev.pair = ev.pair.WithPotential(c.Zeta).WithIons(c.Ions)
	ev.addLayers()
	ev.hasPair = true

	if shielded(ev.pair) {
		ev.notes.Add("the steric layers stop the pair where the total energy is still repulsive (%s at layer contact): there is no well to aggregate into, so the barrier, stability ratio and half-life are unbounded",
			number.Quantity(ev.pair.Energy(2*ev.pair.StericThickness)/kT, "kT"))
		ev.set("energy_barrier", math.Inf(1), "")
		ev.set("log10_stability_ratio", math.Inf(1), "")
		ev.set("log10_aggregation_half_life_days", math.Inf(1), "")
		ev.set("log10_half_life_over_shelf_life", math.Inf(1), "")
		ev.setSecondaryMinimum(ev.pair.SecondaryMinimum(), kT)
		return
	}
	b, m := ev.pair.Extrema()
	if b.Found {
		ev.hasBarrier, ev.lastBarrier = true, b.Separation
		ev.set("energy_barrier", b.Energy/kT, "maximum of the total interaction energy (logarithmic scan, Newton refinement)")
		ev.set("barrier_position", b.Separation*1e9, "separation at the barrier")
		ev.flagBarrierPosition(b, kappa)
	} else {
		ev.set("energy_barrier", 0, "no maximum of the total interaction energy: no barrier")
	}
	ev.setSecondaryMinimum(m, kT)
	ev.kinetics(b)
	ev.criticalCoagulation()
	ev.multivalent()
}

// multivalent reports the far field the ion mixture leaves the double layer
// and, with a multivalent salt present, that salt's own critical
// coagulation concentration: the concentration of it at which the highest
// maximum of the energy vanishes, the other ions kept (bisection in log
// concentration, 1e-6 to 5000 mM, to 0.1 %).
func (ev *evaluation) multivalent() {
	c := ev.cond
	if len(c.Ions) > 0 {
		ev.set("far_field_potential", physics.FarFieldPotential(c.Zeta, c.Ions, c.StorageTempK)*1e3,
			"flat-plate Poisson-Boltzmann far field of the zeta potential in the actual ion mixture")
	}
	if c.MultivalentSalt == "" {
		return
	}
	ev.set("multivalent_concentration", c.MultivalentConc, c.MultivalentSalt)
	kT := physics.Boltzmann * c.StorageTempK
	margin := func(log10C float64) float64 {
		if b := remedy.MultivalentPair(ev.pair, c, math.Pow(10, log10C)).Barrier(); b.Found {
			return b.Energy / kT
		}
		return -1
	}
	ccc, ok := physics.FindRoot(margin, -6, math.Log10(5000), math.Log10(1.001))
	if !ok {
		return
	}
	ev.set("multivalent_ccc", math.Pow(10, ccc), "barrier vanishes (highest maximum, chosen model) at this concentration of "+c.MultivalentSalt)
	ev.set("multivalent_over_ccc", c.MultivalentConc/math.Pow(10, ccc), "multivalent salt over its own critical coagulation concentration")
}

// flagBarrierPosition reports whether the barrier sits at the closest
// approach, and says what that and a barrier well inside one Debye length
// mean for the stability ratio.
func (ev *evaluation) flagBarrierPosition(b physics.Extremum, kappa float64) {
	closest := math.Max(physics.MinimumSeparation, 2*ev.pair.StericThickness)
	atCutoff := b.Separation <= closest*(1+1e-6)
	ev.set("barrier_at_cutoff", map[bool]float64{true: 1, false: 0}[atCutoff], "barrier position against the closest approach of the energy searches")
	switch {
	case atCutoff:
		ev.notes.Add("the energy still rises towards the closest approach (%s): the barrier is the energy at that cut-off, so it and the stability ratio W depend on where continuum theory is cut off; read W as an order of magnitude",
			number.Quantity(closest*1e9, "nm"))
	case !ev.pair.ConstantPotential && kappa*b.Separation < 1:
		ev.notes.Add("the barrier lies at kappa h = %s, inside one Debye length, where linear superposition is least accurate (it assumes weakly overlapping double layers)",
			number.Quantity(kappa*b.Separation, ""))
	}
}

func (ev *evaluation) setSecondaryMinimum(m physics.Extremum, kT float64) {
	if m.Found {
		ev.set("secondary_minimum", m.Energy/kT, "minimum of the total energy beyond the barrier")
		ev.set("secondary_minimum_position", m.Separation*1e9, "separation at the secondary minimum")
	} else {
		ev.facts.SetNumber("secondary_minimum", 0)
	}
}

// shielded reports a pair whose steric layers meet where the total energy is
// still repulsive: the hard steric wall then keeps it out of any well, and
// Fuchs' capture at the wall does not apply (Napper 1983, ch. 2).
func shielded(p physics.Pair) bool {
	return p.StericThickness > 0 && p.Energy(2*p.StericThickness) >= 0
}

// vanDerWaalsModels and doubleLayerModels describe the model choices of a
// request in the report.
var (
	vanDerWaalsModels = map[string]modelChoice{
		"hamaker_exact":    newModelChoice("van_der_waals", "Hamaker (1937) exact sphere-sphere expression, non-retarded"),
		"retarded_gregory": newModelChoice("van_der_waals", "Gregory (1981) retarded sphere-sphere expression, lambda = 100 nm"),
	}
	doubleLayerModels = map[string]modelChoice{
		"linear_superposition": newModelChoice("double_layer", "linear superposition, equal spheres, Derjaguin limit (Bell, Levine & McCartney 1970)"),
		"constant_potential":   newModelChoice("double_layer", "constant potential, Hogg, Healy & Fuerstenau (1966)"),
	}
)

func (ev *evaluation) chooseModels() {
	m := input.EffectiveModels(ev.cond.Models)
	ev.pair.Retarded = m.VanDerWaals == "retarded_gregory"
	ev.pair.ConstantPotential = m.DoubleLayer == "constant_potential"
	vdw, okVdW := vanDerWaalsModels[m.VanDerWaals]
	edl, okEDL := doubleLayerModels[m.DoubleLayer]
	if !okVdW || !okEDL {
		panic("advisor: model choice not validated: " + m.VanDerWaals + ", " + m.DoubleLayer)
	}
	ev.model(vdw)
	ev.model(edl)
	ev.model(stabilityRatioModel)
	ev.model(halfLifeModel)
	ev.model(viscosityModel)
	ev.model(scoringModel)
}

// kinetics reports the Fuchs stability ratio and the Smoluchowski half-lives
// as logarithms, so that very stable sols never overflow.
func (ev *evaluation) kinetics(barrier physics.Extremum) {
	c := ev.cond
	log10W := physics.Log10StabilityRatioWith(ev.pair, barrier, true)
	n0 := physics.NumberDensity(c.VolumeFraction, c.Radius)
	rapid := physics.Log10HalfLife(c.Liquid.Viscosity, c.StorageTempK, n0, 0)
	slow := physics.Log10HalfLife(c.Liquid.Viscosity, c.StorageTempK, n0, log10W)
	ev.set("log10_stability_ratio", log10W, "Fuchs integral with Honig hydrodynamics over the total energy")
	ev.set("rapid_aggregation_half_life", math.Pow(10, rapid), "Smoluchowski 3 eta/(4 kT N0), median particles")
	ev.set("log10_aggregation_half_life_days", slow-math.Log10(input.Day), "log10(W x rapid half-life / 1 d)")
	ev.set("log10_half_life_over_shelf_life", slow-math.Log10(c.ShelfLife), "log10 of half-life over shelf life")
}

// criticalCoagulation solves for the ionic strength at which the barrier of
// the chosen model vanishes and reports it as a concentration of the salt
// type present (its ionic strength per mole).
func (ev *evaluation) criticalCoagulation() {
	c := ev.cond
	z := max(c.CounterValence, 1)
	gamma := physics.ReducedSurfacePotential(math.Abs(c.Zeta), c.StorageTempK, z)
	ev.set("ccc_high_potential", physics.CCCHighPotential(c.Hamaker, gamma, c.Liquid.Permittivity, c.StorageTempK, z),
		"Derjaguin-Landau-Verwey-Overbeek closed form for a z:z salt, -A a/(12 h) attraction, linear superposition")
	iCrit, ok := physics.CriticalIonicStrength(ev.pair, 0, ev.lastBarrier)
	if !ok {
		return
	}
	perMole := c.IonicStrengthPerMole()
	ev.set("critical_coagulation_concentration", iCrit/perMole,
		"ionic strength at which the barrier vanishes (numerical, chosen model), as concentration of the salt type present")
	ev.set("ionic_strength_over_ccc", c.IonicStrength/iCrit, "ionic strength over its critical value")
}
