package remedy

import (
	"fmt"
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// The settling remedies invert hindered Stokes settling in closed form: the
// clear (or cream) layer at the end of the shelf life must not exceed the
// acceptance criterion, so the hindered speed must stay below
// maxClear/shelfLife.

func clearLayerCriterion(cs *Case) string {
	return "clear layer at the end of a " + number.Shortest(cs.Cond.ShelfLife/input.Day) + " d shelf life <= " +
		number.Quantity(cs.Cond.MaxClear*1e3, "mm") + " (hindered Stokes settling)"
}

// allowedStokesSpeed is the largest isolated-particle Stokes speed, m/s,
// that meets the clear-layer criterion at the sample's volume fraction.
func allowedStokesSpeed(cs *Case) float64 {
	c := cs.Cond
	return c.MaxClear / c.ShelfLife / c.Hindrance()
}

func solveParticleSize(cs *Case) (Target, string, bool) {
	c := cs.Cond
	drho := math.Abs(c.ParticleDensity - c.Liquid.Density)
	if drho == 0 {
		return Target{}, "density already matched", false
	}
	d := 2 * physics.StokesRadius(allowedStokesSpeed(cs), drho, c.Liquid.Viscosity)
	// Particles whose gravitational length reaches the container height
	// never leave a clear layer, however long they stand: at sedimentation
	// equilibrium the top holds at least 1/e of the bottom's concentration
	// (Perrin's barometric profile).
	brownian := 2 * physics.PerrinRadius(c.Height, drho, c.StorageTempK)
	crit := clearLayerCriterion(cs)
	if brownian > d {
		d = brownian
		crit = "gravitational length >= container height, so Brownian motion keeps the particles up (Perrin); " +
			"the Stokes criterion alone would ask for less"
	}
	return Target{"particles.diameter_nm", "<=", d * 1e9, "nm"}, crit, true
}

// Liquids reach densities of about 600 to 2000 kg/m^3 (hydrocarbons to
// concentrated salt or sugar solutions; common practice): a density match
// outside that range is not offered as a target.
const (
	lightestLiquid = 600.0
	densestLiquid  = 2000.0
)

// solveDensityMatch matches the liquid to solid particles, and the droplets
// (by a weighting agent) to the liquid for emulsions and foams.
func solveDensityMatch(cs *Case) (Target, string, bool) {
	c := cs.Cond
	maxDrho := physics.StokesDensityDifference(allowedStokesSpeed(cs), c.Radius, c.Liquid.Viscosity)
	crit := clearLayerCriterion(cs)
	if c.Phase != "solid" {
		if c.ParticleDensity < c.Liquid.Density {
			return Target{"particles.density_kg_m3", ">=", c.Liquid.Density - maxDrho, "kg/m^3"},
				crit + "; a weighting agent in the droplets", true
		}
		return Target{"particles.density_kg_m3", "<=", c.Liquid.Density + maxDrho, "kg/m^3"}, crit, true
	}
	t := Target{"medium.density_kg_m3", ">=", c.ParticleDensity - maxDrho, "kg/m^3"}
	if c.ParticleDensity < c.Liquid.Density {
		t = Target{"medium.density_kg_m3", "<=", c.ParticleDensity + maxDrho, "kg/m^3"}
	}
	if t.Value > densestLiquid || t.Value < lightestLiquid {
		return Target{}, fmt.Sprintf("%s: needs a liquid of %s, outside the %g-%g kg/m^3 that liquids reach",
			crit, number.Quantity(t.Value, "kg/m^3"), lightestLiquid, densestLiquid), false
	}
	return t, crit, true
}

func solveViscosity(cs *Case) (Target, string, bool) {
	c := cs.Cond
	eta := physics.StokesViscosity(allowedStokesSpeed(cs), c.Radius, c.ParticleDensity-c.Liquid.Density)
	return Target{"medium.viscosity_mPa_s", ">=", eta * 1e3, "mPa s"},
		clearLayerCriterion(cs) + "; the low-shear viscosity is what counts", true
}

func solveYieldStress(cs *Case) (Target, string, bool) {
	c := cs.Cond
	tau := physics.YieldStressToHoldSphere(c.LargestRadius(), c.ParticleDensity-c.Liquid.Density)
	return Target{"medium.yield_stress_Pa", ">=", SpecifiedYieldStress(tau), "Pa"},
		"largest particle held at rest: yield number 3 tau_y/(2 drho g R) >= 0.143 (Beris et al. 1985), " +
			number.Quantity(tau, "Pa") + ", with a safety factor of 2 and no less than 0.1 Pa [practice]", true
}
