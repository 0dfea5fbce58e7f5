package advisor

import (
	"fmt"
	"math"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// cloudPointMarginK keeps storage this far below a stabiliser's cloud point
// (common practice: the layer already thins a few kelvin below it).
const cloudPointMarginK = 10.0

func stericCriterion(ev *evaluation) string {
	return "|van der Waals energy| at layer contact (h = 2 thickness) <= " + number.Shortest(ev.cond.Criteria.MaxStericKT) + " kT"
}

// thickestAdsorbedLayer is about the largest thickness adsorbed polymer or
// surfactant layers reach (2-20 nm typical, 50 nm for long block
// copolymers; common practice, cf. Napper 1983).
const thickestAdsorbedLayer = 50e-9

func solveStericThickness(ev *evaluation) (Target, string, bool) {
	d := physics.MinimumStericThickness(ev.vdwOnly.EnergyCurve(), ev.cond.StorageTempK, ev.cond.Criteria.MaxStericKT)
	crit := stericCriterion(ev) + "; the layer must stay in good solvent"
	if d > thickestAdsorbedLayer {
		crit += fmt.Sprintf("; beyond the %g nm that adsorbed layers reach: not practical for particles this large", thickestAdsorbedLayer*1e9)
	}
	return Target{"stabilizer.layer_thickness_nm", ">=", d * 1e9, "nm"}, crit, true
}

func solveEmulsifierLayer(ev *evaluation) (Target, string, bool) {
	t, crit, ok := solveStericThickness(ev)
	return t, crit + "; full coverage of the interface by the emulsifier", ok
}

func solveSolventQuality(ev *evaluation) (Target, string, bool) {
	return Target{"stabilizer.flory_huggins_chi", "<", 0.5, "1"},
		"better than theta solvent for the stabiliser chains (Napper 1983)", true
}

func solveFreePolymer(ev *evaluation) (Target, string, bool) {
	well, ok := ev.scales["depletion_well"]
	if !ok || well.Value >= 0 {
		return Target{}, "no depletion well computed", false
	}
	// The Asakura-Oosawa energy is proportional to the polymer number density.
	conc := ev.cond.FreePolymer.Concentration * depletionOnsetKT / math.Abs(well.Value)
	return Target{"medium.free_polymer.concentration_g_L", "<=", conc, "g/L"},
		fmt.Sprintf("depletion well at contact no deeper than %g kT (Asakura-Oosawa)", depletionOnsetKT), true
}

func solvePolymerDose(ev *evaluation) (Target, string, bool) {
	return Target{"stabilizer.adsorbing_polymer.surface_coverage", ">=", physics.BridgingMaxCoverage, "1"},
		"near-complete coverage leaves no bare surface for bridges (La Mer & Healy 1963)", true
}

func solveRipeningInhibitor(ev *evaluation) (Target, string, bool) {
	c := ev.cond
	rate, ok := ev.scales["ostwald_ripening_rate"]
	if !ok || rate.Value <= 0 {
		return Target{}, "no ripening rate computed", false
	}
	// LSW rate is proportional to the solubility of the dispersed phase.
	allowed := 7 * c.Radius * c.Radius * c.Radius / c.ShelfLife * 1e27
	return Target{"particles.solubility_mol_m3", "<=", c.Droplet.Solubility * allowed / rate.Value, "mol/m^3"},
		"time to double the diameter by LSW ripening >= shelf life; an inhibitor lowers the effective solubility (Kabalnov 2001)", true
}

func viscosityCriterion(ev *evaluation) string {
	return fmt.Sprintf("relative viscosity <= %g (Krieger-Dougherty on the effective volume fraction)", ev.cond.Criteria.MaxRelViscosity)
}

func solveVolumeFraction(ev *evaluation) (Target, string, bool) {
	c := ev.cond
	phiMax := ev.facts.Number("max_packing_fraction")
	phiEff := ev.facts.Number("effective_volume_fraction")
	if math.IsNaN(phiMax) || phiEff <= 0 {
		return Target{}, viscosityCriterion(ev), false
	}
	effMax := physics.MaxVolumeFractionForViscosity(c.Criteria.MaxRelViscosity, phiMax, physics.DefaultIntrinsicViscosity)
	return Target{"particles.volume_fraction", "<=", effMax * c.VolumeFraction / phiEff, "1"}, viscosityCriterion(ev), true
}

// solveSizeSpan finds the maximum packing fraction the viscosity criterion
// needs, then the log-normal span whose packing reaches it.
func solveSizeSpan(ev *evaluation) (Target, string, bool) {
	c := ev.cond
	phiEff := ev.facts.Number("effective_volume_fraction")
	crit := viscosityCriterion(ev) + ", by a wider log-normal distribution"
	kd := func(phim float64) float64 {
		return physics.KriegerDougherty(phiEff, phim, physics.DefaultIntrinsicViscosity) - c.Criteria.MaxRelViscosity
	}
	top := physics.MaxPackingCap * 0.999
	if math.IsNaN(phiEff) || phiEff >= top || kd(top) > 0 {
		return Target{}, crit + ": not reachable by packing alone", false
	}
	lo := math.Max(phiEff*1.0001, physics.RandomClosePacking*0.5)
	need := top
	if kd(lo) <= 0 {
		need = lo
	} else if x, ok := physics.FindRoot(kd, lo, top, 1e-5); ok {
		need = x
	}
	packing := func(span float64) float64 {
		classes, err := physics.LogNormalFromSpan(2*c.Radius, span, physics.DefaultLogNormalClasses)
		if err != nil {
			return math.NaN()
		}
		return physics.MaxPackingPolydisperse(classes) - need
	}
	if packing(0) >= 0 {
		return Target{"particles.size_span", ">=", 0, "1"}, crit, true
	}
	span, ok := physics.FindRoot(packing, 0, 5, 1e-3)
	if !ok {
		return Target{}, crit + ": needs a span above 5", false
	}
	return Target{"particles.size_span", ">=", span, "1"}, crit, true
}

func solveStorageTemperature(ev *evaluation) (Target, string, bool) {
	c := ev.cond
	if math.IsNaN(c.Steric.CloudK) {
		return Target{}, "no cloud point stated", false
	}
	return Target{"storage.temperature_c", "<=", c.Steric.CloudK - physics.CelsiusZero - cloudPointMarginK, "degC"},
		fmt.Sprintf("storage at least %g K below the stabiliser's cloud point", cloudPointMarginK), true
}

// solveProcessShear keeps shear-driven collisions no more frequent than
// Brownian ones and, when there is a barrier, the work of shear across one
// Debye length below the barrier height.
func solveProcessShear(ev *evaluation) (Target, string, bool) {
	c := ev.cond
	kT := physics.Boltzmann * c.StorageTempK
	d := 2 * c.Radius
	g := 2 * kT / (c.Liquid.Viscosity * d * d * d)
	crit := "orthokinetic over perikinetic collision rate <= 1"
	if b, ok := ev.scales["energy_barrier"]; ok && b.Value > 0 && ev.pair.Kappa > 0 {
		width := 1 / math.Max(ev.pair.Kappa, 1/c.Radius)
		byBarrier := b.Value * kT / (6 * math.Pi * c.Liquid.Viscosity * c.Radius * c.Radius * width)
		if byBarrier > g {
			g, crit = byBarrier, "work of shear across one Debye length below the energy barrier"
		}
	}
	return Target{"storage.shear_rate_per_s", "<=", g, "1/s"}, crit, true
}
