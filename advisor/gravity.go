package advisor

import (
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/physics"
)

const mmPerDayPerMS = 1e3 * input.Day // m/s to mm/d

// computeGravity reports the sedimentation and Brownian scales of the median
// particle and, with a size distribution, the fraction of solids that
// settles (or creams) within the shelf life.
func (ev *evaluation) computeGravity() {
	c := ev.cond
	eta, rhoL, T := c.Liquid.Viscosity, c.Liquid.Density, c.StorageTempK
	drho := c.ParticleDensity - rhoL
	ev.set("liquid_viscosity", eta*1e3, "request override or liquid library, at the storage temperature (see assumptions)")
	ev.set("liquid_density", rhoL, "request override or liquid library, at the storage temperature (see assumptions)")
	ev.set("particle_density", c.ParticleDensity, "request or material library")
	ev.set("density_difference", drho, "particle minus liquid density")

	v := physics.StokesVelocity(c.Radius, drho, eta)
	hindered := v * c.Hindrance()
	ev.model(hinderedSettlingModel)
	ev.set("stokes_velocity", math.Abs(v)*mmPerDayPerMS, "Stokes (1851), median diameter")
	ev.set("hindered_velocity", math.Abs(hindered)*mmPerDayPerMS, "Stokes x Richardson-Zaki (1954), n = 4.65")
	re := physics.ParticleReynolds(2*c.Radius, math.Abs(v), rhoL, eta)
	ev.set("particle_reynolds_number", re, "rho_l v d / eta")
	if re > physics.StokesReynoldsLimit {
		ev.notes.Add("particle Reynolds number %.3g exceeds %g: Stokes' law overestimates the settling speed (ISO 13317-4)",
			re, physics.StokesReynoldsLimit)
	}
	ev.set("time_to_settle_container", physics.SettlingTime(c.Height, hindered)/input.Day, "container height over hindered speed")
	ev.set("clear_layer_at_shelf_life", physics.ClearLayer(hindered, c.ShelfLife, c.Height)*1e3,
		"hindered speed x shelf life, at most the container height")

	lg := physics.GravitationalLength(c.Radius, drho, T)
	ev.set("gravitational_length", lg*1e3, "kT over buoyant weight (Perrin)")
	ev.set("height_to_gravitational_length", c.Height/lg, "container height over gravitational length")
	ev.set("suspension_diameter", physics.SuspensionDiameter(drho, T)*1e9,
		"kT = buoyant weight x own diameter: d = (6 kT/(pi |drho| g))^(1/4)")
	ev.set("quantum_diameter", physics.QuantumDiameter(c.ParticleDensity, T)*1e9,
		"hbar/(2 sqrt(m kT)) = d: d^5 = 3 hbar^2/(2 pi rho kT)")
	ev.set("diffusion_coefficient", physics.StokesEinsteinDiffusion(c.Radius, eta, T)*1e12, "Stokes-Einstein kT/(6 pi eta a)")

	if c.Classes != nil {
		speed := func(d float64) float64 {
			return physics.StokesVelocity(d/2, drho, eta) * c.Hindrance()
		}
		ev.set("sedimented_fraction", physics.SedimentedFraction(c.Classes, speed, c.ShelfLife, c.Height),
			"per-class hindered Stokes speeds over the shelf life")
	}
	ev.observedSettling(drho, hindered)
}

// observedSettling compares an observed clear layer with the prediction: a
// rate far above the Stokes rate of the primary particles points to
// aggregates, whose apparent diameter is the one that Stokes' law needs.
func (ev *evaluation) observedSettling(drho, hindered float64) {
	c := ev.cond
	if math.IsNaN(c.Observed.ClearLayer) || math.IsNaN(c.Observed.Age) || c.Observed.ClearLayer <= 0 {
		return
	}
	rate := c.Observed.ClearLayer / c.Observed.Age
	ev.set("observed_settling_rate", rate*mmPerDayPerMS, "observed clear layer over age")
	if hindered != 0 {
		ev.set("settling_rate_ratio", rate/math.Abs(hindered), "observed over predicted hindered rate of the primary particles")
	}
	if drho == 0 {
		return
	}
	d := 2 * physics.StokesRadius(rate/c.Hindrance(), drho, c.Liquid.Viscosity)
	ev.set("apparent_settling_diameter", d*1e9, "Stokes law inverted for the observed rate (closed form), hindered")
}
