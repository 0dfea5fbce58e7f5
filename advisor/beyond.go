package advisor

import (
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/physics"
)

// addLayers puts an effective steric layer and free-polymer depletion into
// the pair before its energy curve is searched.
func (ev *evaluation) addLayers() {
	c := ev.cond
	if c.Steric.Present && ev.stericEffective() {
		ev.pair.StericThickness = c.Steric.AtStorage()
	}
	if c.FreePolymer.Evaluable() {
		ev.pair.DepletionRange = c.FreePolymer.RadiusOfGyration
		ev.pair.DepletionDensity = physics.PolymerNumberDensity(c.FreePolymer.Concentration, c.FreePolymer.MolarMass)
	}
}

func (ev *evaluation) stericEffective() bool {
	c := ev.cond
	q := physics.GoodSolvent
	if c.Steric.HasQuality {
		q = c.Steric.Quality
	}
	return physics.StericLayerEffective(q, c.StorageTempK, c.Steric.CloudK, !math.IsNaN(c.Steric.CloudK))
}

// computeBeyondDLVO reports the steric, depletion, bridging, ripening,
// rheology and shear scales.
func (ev *evaluation) computeBeyondDLVO() {
	c := ev.cond
	kT := physics.Boltzmann * c.StorageTempK
	if !ev.hasPair {
		ev.addLayers()
	}
	if c.Steric.Present {
		v := ev.vanDerWaalsOnly.Energy(2 * c.Steric.AtStorage())
		ev.set("steric_contact_energy", v/kT, "van der Waals energy at h = 2 x layer thickness")
		if !ev.stericEffective() {
			ev.notes.Add("steric layer counted as collapsed: solvent not good or storage at or above the cloud point")
		}
	}
	ev.depletion(kT)
	ev.bridging()
	ev.ripening()
	ev.rheology()
	ev.shear(kT)
}

// shear reports, for a sample under shear, the orthokinetic ratio (whether
// or not a surface potential is known: this is its only place) and, over an
// energy barrier, the work shear does across the double layer's range.
func (ev *evaluation) shear(kT float64) {
	c := ev.cond
	if c.Shear <= 0 {
		return
	}
	eta := ev.suspensionViscosity()
	ev.set("suspension_viscosity", eta*1e3, "liquid viscosity times the Krieger-Dougherty relative viscosity")
	if !(eta > 0) || math.IsInf(eta, 1) {
		// At or above the maximum packing the suspension does not flow as a
		// viscous medium: the effective-medium shear estimate has no meaning
		// there (near_jamming speaks for that state).
		if !ev.lean {
			ev.notes.Text("no shear energy or orthokinetic ratio: the effective volume fraction is at or above the maximum packing, where the suspension has no finite viscosity")
		}
		return
	}
	ev.set("orthokinetic_ratio", physics.OrthoPerikineticRatio(c.Shear, 2*c.Radius, eta, c.StorageTempK),
		"Smoluchowski shear over Brownian kernel, G d^3 eta/(2 kT), eta of the suspension")
	if b, ok := ev.reported("energy_barrier"); ok && b > 0 {
		width := physics.DoubleLayerRange(ev.pair.Kappa, c.Radius)
		w := physics.HydrodynamicShearForceEnergy(eta, c.Shear, c.Radius, width)
		ev.set("shear_energy", w/kT, "6 pi eta a^2 G over one Debye length (van de Ven & Mason 1977), eta of the suspension")
	}
}

// suspensionViscosity is the viscosity, Pa s, that a pair of particles
// feels in shear flow: the liquid's times the Krieger-Dougherty relative
// viscosity on the effective volume fraction. This effective-medium view
// (each pair sheared by the mean stress of the suspension; common practice)
// overstates the force somewhat, since the liquid fills the gap between
// the pair. rheology must run first.
func (ev *evaluation) suspensionViscosity() float64 {
	return ev.cond.Liquid.Viscosity * ev.facts.Number("relative_viscosity")
}

func (ev *evaluation) depletion(kT float64) {
	c := ev.cond
	fp := c.FreePolymer
	if !fp.Evaluable() {
		return
	}
	// addLayers has put the polymer's number density into the pair.
	contact := 2 * ev.pair.StericThickness
	ev.set("depletion_well", physics.AsakuraOosawa(c.Radius, contact, fp.RadiusOfGyration, ev.pair.DepletionDensity, c.StorageTempK)/kT,
		"Asakura-Oosawa energy at contact, depletion layer = radius of gyration")
	ev.set("free_polymer_overlap_ratio", fp.Concentration/physics.OverlapConcentration(fp.MolarMass, fp.RadiusOfGyration),
		"concentration over overlap concentration 3M/(4 pi NA Rg^3)")
	ev.model(depletionModel)
}

func (ev *evaluation) bridging() {
	c := ev.cond
	if !c.Adsorbing.Present {
		return
	}
	size := physics.PolymerCoilSize(c.Adsorbing.MolarMass)
	debye := 1 / ev.pair.Kappa // +Inf without ions: no double layer to span
	gap := 0.0
	if b, ok := ev.reported("barrier_position"); ok {
		gap = b * 1e-9
	}
	likely, reason := physics.BridgingLikely(c.Adsorbing.MolarMass, c.Adsorbing.Coverage, size, debye, gap)
	ev.set("bridging_likely", map[bool]float64{true: 1, false: 0}[likely], "La Mer-Healy coverage, molar mass and reach rules: "+reason)
}

func (ev *evaluation) ripening() {
	c := ev.cond
	if c.Phase != "liquid" {
		return
	}
	d := c.Droplet
	rate := physics.LSWRate(d.Tension, d.Solubility, d.MolarVolume, d.Diffusivity, c.StorageTempK)
	ev.set("ostwald_ripening_rate", rate*1e27, "Lifshitz-Slyozov-Wagner d r^3/dt = 8 gamma c Vm^2 D/(9 R T)")
	ev.set("time_to_double_diameter", physics.TimeToDoubleDiameter(c.Radius, rate)/input.Day, "7 r^3 over the LSW rate")
	if !math.IsNaN(c.Observed.Age) {
		ev.set("predicted_size_growth_at_age", physics.SizeGrowthFromRate(c.Radius, rate, c.Observed.Age)*100,
			"LSW growth of the diameter over the observed age")
	}
	ev.model(ripeningModel)
}

// rheology reports the Krieger-Dougherty viscosity on the effective volume
// fraction: the particles plus a shell of one Debye length (charged, when
// thinner than the radius) or of the steric layer.
func (ev *evaluation) rheology() {
	c := ev.cond
	shell := 0.0
	switch {
	case ev.pair.StericThickness > 0:
		shell = ev.pair.StericThickness
	case ev.hasPair && ev.pair.Kappa > 0 && math.Abs(c.Zeta) > 0:
		shell = physics.DoubleLayerRange(ev.pair.Kappa, c.Radius)
	}
	phiEff := physics.EffectiveVolumeFraction(c.VolumeFraction, c.Radius, shell)
	phiMax := physics.RandomClosePacking
	if c.Classes != nil {
		phiMax = physics.MaxPackingPolydisperse(c.Classes)
	}
	ev.set("effective_volume_fraction", phiEff, "phi (1 + shell/a)^3, shell = steric layer or Debye length")
	ev.set("max_packing_fraction", phiMax, "random close packing, widened by the size distribution")
	ev.set("packing_ratio", phiEff/phiMax, "effective volume fraction over maximum packing")
	ev.set("relative_viscosity", physics.KriegerDougherty(math.Min(phiEff, phiMax), phiMax, physics.DefaultIntrinsicViscosity),
		"Krieger-Dougherty (1 - phi/phim)^(-2.5 phim) on the effective volume fraction")
	ev.set("yield_stress_needed", physics.YieldStressToHoldSphere(c.LargestRadius(), c.ParticleDensity-c.Liquid.Density),
		"Beris et al. (1985): 3 tau_y/(2 drho g R) = 0.143, largest particle")
}
