package advisor

import (
	"math"

	"colloidtriage/physics"
)

// depletionOnsetKT is the depth of a depletion well at which flocculation
// is usually seen, a few kT (common practice; cf. Vrij 1976, Pure Appl.
// Chem. 48:471).
const depletionOnsetKT = 2.0

// addLayers puts an effective steric layer and free-polymer depletion into
// the pair before its energy curve is searched.
func (ev *evaluation) addLayers() {
	c := ev.c
	if c.steric.present && ev.stericEffective() {
		ev.pair.StericThickness = c.steric.thickness
	}
	if c.freePolymer.present && !math.IsNaN(c.freePolymer.rg) && !math.IsNaN(c.freePolymer.molarMass) {
		ev.pair.DepletionRange = c.freePolymer.rg
		ev.pair.DepletionDensity = physics.PolymerNumberDensity(c.freePolymer.concentration, c.freePolymer.molarMass)
	}
}

func (ev *evaluation) stericEffective() bool {
	c := ev.c
	q := physics.GoodSolvent
	if c.steric.hasQuality {
		q = c.steric.quality
	}
	return physics.StericLayerEffective(q, c.storageTempK, c.steric.cloudK, !math.IsNaN(c.steric.cloudK))
}

// computeBeyondDLVO reports the steric, depletion, bridging, ripening,
// rheology and shear scales.
func (ev *evaluation) computeBeyondDLVO() {
	c := ev.c
	kT := physics.Boltzmann * c.storageTempK
	if !ev.hasPair {
		ev.addLayers()
	}
	if c.steric.present {
		v := ev.vdwOnly.Energy(2 * c.steric.thickness)
		ev.set("steric_contact_energy", v/kT, "van der Waals energy at h = 2 x layer thickness")
		if !ev.stericEffective() {
			ev.n.add("steric layer counted as collapsed: solvent not good or storage at or above the cloud point")
		}
	}
	ev.depletion(kT)
	ev.bridging()
	ev.ripening()
	ev.rheology()
	if c.shear > 0 {
		ev.set("orthokinetic_ratio", physics.OrthoPerikineticRatio(c.shear, 2*c.radius, c.liquid.viscosity, c.storageTempK),
			"Smoluchowski shear over Brownian kernel, G d^3 eta/(2 kT)")
		if b, ok := ev.scales["energy_barrier"]; ok && b.Value > 0 {
			width := 1 / math.Max(ev.pair.Kappa, 1/c.radius)
			w := physics.HydrodynamicShearForceEnergy(c.liquid.viscosity, c.shear, c.radius, width)
			ev.set("shear_energy", w/kT, "6 pi eta a^2 G over one Debye length (van de Ven & Mason 1977)")
		}
	}
}

func (ev *evaluation) depletion(kT float64) {
	c := ev.c
	fp := c.freePolymer
	if !fp.present || math.IsNaN(fp.rg) || math.IsNaN(fp.molarMass) {
		return
	}
	n := physics.PolymerNumberDensity(fp.concentration, fp.molarMass)
	contact := 2 * ev.pair.StericThickness
	ev.set("depletion_well", physics.AsakuraOosawa(c.radius, contact, fp.rg, n, c.storageTempK)/kT,
		"Asakura-Oosawa energy at contact, depletion layer = radius of gyration")
	ev.set("free_polymer_overlap_ratio", fp.concentration/physics.OverlapConcentration(fp.molarMass, fp.rg),
		"concentration over overlap concentration 3M/(4 pi NA Rg^3)")
	ev.model(depletionModel)
}

func (ev *evaluation) bridging() {
	c := ev.c
	if !c.adsorbing.present {
		return
	}
	size := physics.PolymerCoilSize(c.adsorbing.molarMass)
	debye := math.Min(1/ev.pair.Kappa, 1)
	gap := 0.0
	if b, ok := ev.scales["barrier_position"]; ok {
		gap = b.Value * 1e-9
	}
	likely, reason := physics.BridgingLikely(c.adsorbing.molarMass, c.adsorbing.coverage, size, debye, gap)
	ev.set("bridging_likely", map[bool]float64{true: 1, false: 0}[likely], "La Mer-Healy coverage, molar mass and reach rules: "+reason)
}

func (ev *evaluation) ripening() {
	c := ev.c
	if c.phase != "liquid" {
		return
	}
	d := c.droplet
	rate := physics.LSWRate(d.tension, d.solubility, d.molarVolume, molecularDiffusivityM2S, c.storageTempK)
	ev.set("ostwald_ripening_rate", rate*1e27, "Lifshitz-Slyozov-Wagner d r^3/dt = 8 gamma c Vm^2 D/(9 R T)")
	ev.set("time_to_double_diameter", physics.TimeToDoubleDiameter(c.radius, rate)/day, "7 r^3 over the LSW rate")
	if !math.IsNaN(c.observed.age) {
		ev.set("predicted_size_growth_at_age", physics.SizeGrowthFromRate(c.radius, rate, c.observed.age)*100,
			"LSW growth of the diameter over the observed age")
	}
	ev.model(ripeningModel)
}

// rheology reports the Krieger-Dougherty viscosity on the effective volume
// fraction: the particles plus a shell of one Debye length (charged, when
// thinner than the radius) or of the steric layer.
func (ev *evaluation) rheology() {
	c := ev.c
	shell := 0.0
	switch {
	case ev.pair.StericThickness > 0:
		shell = ev.pair.StericThickness
	case ev.hasPair && ev.pair.Kappa > 0 && math.Abs(c.zeta) > 0:
		shell = math.Min(1/ev.pair.Kappa, c.radius)
	}
	phiEff := physics.EffectiveVolumeFraction(c.phi, c.radius, shell)
	phiMax := physics.RandomClosePacking
	if c.classes != nil {
		phiMax = physics.MaxPackingPolydisperse(c.classes)
	}
	ev.set("effective_volume_fraction", phiEff, "phi (1 + shell/a)^3, shell = steric layer or Debye length")
	ev.set("max_packing_fraction", phiMax, "random close packing, widened by the size distribution")
	ev.set("packing_ratio", phiEff/phiMax, "effective volume fraction over maximum packing")
	ev.set("relative_viscosity", physics.KriegerDougherty(math.Min(phiEff, phiMax), phiMax, physics.DefaultIntrinsicViscosity),
		"Krieger-Dougherty (1 - phi/phim)^(-2.5 phim) on the effective volume fraction")
	largest := c.radius
	if c.classes != nil {
		largest = c.classes[len(c.classes)-1].Diameter / 2
	}
	ev.set("yield_stress_needed", physics.YieldStressToHoldSphere(largest, c.particleDensity-c.liquid.density),
		"Beris et al. (1985): 3 tau_y/(2 drho g R) = 0.143, largest particle")
}
