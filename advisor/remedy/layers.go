package remedy

import (
	"fmt"
	"math"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// cloudPointMarginK keeps storage this far below a stabiliser's cloud point
// (common practice: the layer already thins a few kelvin below it).
const cloudPointMarginK = 10.0

// freezeMarginK keeps the lowest storage temperature this far above the
// freezing point of the continuous phase, and a protectant this far below
// the lowest storage temperature (common practice: allow a few kelvin for
// the spread of transport temperatures and of the freezing-point data).
const freezeMarginK = 3.0

func stericCriterion(cs *Case) string {
	return "|van der Waals energy| at layer contact (h = 2 thickness) <= " + number.Shortest(cs.Cond.Criteria.MaxStericKT) + " kT"
}

// ThickestAdsorbedLayer, m, is about the largest thickness adsorbed polymer or
// surfactant layers reach (2-20 nm typical, 50 nm for long block
// copolymers; common practice, cf. Napper 1983).
const ThickestAdsorbedLayer = 50e-9

func solveStericThickness(cs *Case) (Target, string, bool) {
	d := physics.MinimumStericThickness(cs.VanDerWaalsOnly.EnergyCurve(), cs.Cond.StorageTempK, cs.Cond.Criteria.MaxStericKT)
	crit := stericCriterion(cs) + "; the layer must stay in good solvent"
	if d > ThickestAdsorbedLayer {
		crit += fmt.Sprintf("; beyond the %g nm that adsorbed layers reach: not practical for particles this large", ThickestAdsorbedLayer*1e9)
	}
	return Target{"stabilizer.layer_thickness_nm", ">=", d * 1e9, "nm"}, crit, true
}

func solveEmulsifierLayer(cs *Case) (Target, string, bool) {
	t, crit, ok := solveStericThickness(cs)
	return t, crit + "; full coverage of the interface by the emulsifier", ok
}

func solveSolventQuality(cs *Case) (Target, string, bool) {
	return Target{"stabilizer.flory_huggins_chi", "<", 0.5, "1"},
		"better than theta solvent for the stabiliser chains (Napper 1983)", true
}

// depletionOnsetKT is the depth of a depletion well at which flocculation
// is usually seen, a few kT (common practice; cf. Vrij 1976, Pure Appl.
// Chem. 48:471).
const depletionOnsetKT = 2.0

func solveFreePolymer(cs *Case) (Target, string, bool) {
	well, ok := cs.Reported("depletion_well")
	if !ok || well >= 0 {
		return Target{}, "no depletion well computed", false
	}
	// The Asakura-Oosawa energy is proportional to the polymer number density.
	conc := cs.Cond.FreePolymer.Concentration * depletionOnsetKT / math.Abs(well)
	return Target{"medium.free_polymer.concentration_g_L", "<=", conc, "g/L"},
		fmt.Sprintf("depletion well at contact no deeper than %g kT (Asakura-Oosawa)", depletionOnsetKT), true
}

func solvePolymerDose(cs *Case) (Target, string, bool) {
	return Target{"stabilizer.adsorbing_polymer.surface_coverage", ">=", physics.BridgingMaxCoverage, "1"},
		"near-complete coverage leaves no bare surface for bridges (La Mer & Healy 1963)", true
}

func solveRipeningInhibitor(cs *Case) (Target, string, bool) {
	c := cs.Cond
	rate, ok := cs.Reported("ostwald_ripening_rate")
	if !ok || rate <= 0 {
		return Target{}, "no ripening rate computed", false
	}
	// LSW rate is proportional to the solubility of the dispersed phase.
	allowed := physics.DoublingRate(c.Radius, c.ShelfLife) * 1e27
	return Target{"particles.solubility_mol_m3", "<=", c.Droplet.Solubility * allowed / rate, "mol/m^3"},
		"time to double the diameter by LSW ripening >= shelf life; an inhibitor lowers the effective solubility (Kabalnov 2001)", true
}

func viscosityCriterion(cs *Case) string {
	return fmt.Sprintf("relative viscosity <= %g (Krieger-Dougherty on the effective volume fraction)", cs.Cond.Criteria.MaxRelViscosity)
}

func solveVolumeFraction(cs *Case) (Target, string, bool) {
	c := cs.Cond
	phiMax := cs.Facts.Number("max_packing_fraction")
	phiEff := cs.Facts.Number("effective_volume_fraction")
	if math.IsNaN(phiMax) || phiEff <= 0 {
		return Target{}, viscosityCriterion(cs), false
	}
	effMax := physics.MaxVolumeFractionForViscosity(c.Criteria.MaxRelViscosity, phiMax, physics.DefaultIntrinsicViscosity)
	return Target{"particles.volume_fraction", "<=", effMax * c.VolumeFraction / phiEff, "1"}, viscosityCriterion(cs), true
}

// solveSizeSpan finds the maximum packing fraction the viscosity criterion
// needs, then the log-normal span whose packing reaches it.
func solveSizeSpan(cs *Case) (Target, string, bool) {
	c := cs.Cond
	phiEff := cs.Facts.Number("effective_volume_fraction")
	crit := viscosityCriterion(cs) + ", by a wider log-normal distribution"
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

// solveStorageTemperature keeps the storage range inside the liquid's and
// the stabiliser's window: when the liquid freezes at the cold end, the
// lowest storage temperature freezeMarginK above its freezing point; when
// it boils at the warm end, the highest as far below its boiling point;
// else the highest storage temperature at which the steric layer keeps the
// thickness the van der Waals criterion needs (physics.CloudPointMaxTemp),
// or, where that cannot be solved, cloudPointMarginK below the cloud point.
func solveStorageTemperature(cs *Case) (Target, string, bool) {
	c := cs.Cond
	if c.MinStorageTempK < c.FreezingK {
		return Target{"storage.min_temperature_c", ">=", c.FreezingK + freezeMarginK - physics.CelsiusZero, "degC"},
			fmt.Sprintf("lowest storage and transport temperature at least %g K above the freezing point of the continuous phase, %s degC",
				freezeMarginK, number.Shortest(number.Round(c.FreezingK-physics.CelsiusZero, 3))), true
	}
	if c.StorageTempK > c.Liquid.BoilingK {
		return Target{"storage.max_temperature_c", "<=", c.Liquid.BoilingK - freezeMarginK - physics.CelsiusZero, "degC"},
			fmt.Sprintf("highest storage temperature at least %g K below the boiling point of the liquid", freezeMarginK), true
	}
	if math.IsNaN(c.Steric.CloudK) {
		return Target{}, "no cloud point stated", false
	}
	margin := Target{"storage.max_temperature_c", "<=", c.Steric.CloudK - physics.CelsiusZero - cloudPointMarginK, "degC"}
	marginText := fmt.Sprintf("storage at least %g K below the stabiliser's cloud point", cloudPointMarginK)
	if !c.Steric.Present || math.IsNaN(c.Steric.Factor) {
		return margin, marginText, true
	}
	need := physics.MinimumStericThickness(cs.VanDerWaalsOnly.EnergyCurve(), c.StorageTempK, c.Criteria.MaxStericKT) / c.Steric.Thickness
	if !(need > 0 && need <= 1) {
		return margin, marginText + "; the stated layer is too thin for the van der Waals criterion even at the medium temperature", true
	}
	top := physics.CloudPointMaxTemp(c.Steric.CloudK, c.MediumTempK, need)
	return Target{"storage.max_temperature_c", "<=", top - physics.CelsiusZero, "degC"},
		fmt.Sprintf("the steric layer keeps %s of its stated thickness, the %s the van der Waals criterion needs, as the chains approach their cloud point (Flory chi, layer ~ (1 - 2 chi)^(1/3))",
			number.Shortest(number.Round(need, 3)), number.Quantity(need*c.Steric.Thickness*1e9, "nm")), true
}

// solveProcessShear keeps shear-driven collisions no more frequent than
// Brownian ones and, when there is a barrier, the work of shear across one
// Debye length below the barrier height, both with the viscosity of the
// suspension (the liquid's times the relative viscosity).
func solveProcessShear(cs *Case) (Target, string, bool) {
	c := cs.Cond
	eta := cs.Facts.Number("suspension_viscosity") * 1e-3 // Pa s, as in the shear energy
	if !(eta > 0) || math.IsInf(eta, 1) {
		return Target{}, "the effective volume fraction is at or above the maximum packing, where the suspension has no finite viscosity", false
	}
	g := physics.OrthoPerikineticShearRate(1, 2*c.Radius, eta, c.StorageTempK)
	crit := "orthokinetic over perikinetic collision rate <= 1"
	if b, ok := cs.Reported("energy_barrier"); ok && b > 0 && cs.Pair.Kappa > 0 {
		kT := physics.Boltzmann * c.StorageTempK
		width := physics.DoubleLayerRange(cs.Pair.Kappa, c.Radius)
		byBarrier := physics.HydrodynamicShearRate(b*kT, eta, c.Radius, width)
		if byBarrier > g {
			g, crit = byBarrier, "work of shear across one Debye length below the energy barrier"
		}
	}
	return Target{"storage.shear_rate_per_s", "<=", g, "1/s"}, crit, true
}
