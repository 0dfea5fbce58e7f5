package advisor

import (
	"math"

	"colloidtriage/physics"
)

// understood is the sample as the advisor read it: the request with every
// default and library fill written into its fields, in the request's units,
// so that an auditor can rerun exactly what was computed. Properties the
// advisor derives rather than fills (liquid properties at the storage
// temperature, an estimated zeta potential) are scales, not inputs.
func understood(s *Sample, c *conditions) Sample {
	u := *s
	u.Particles.Phase = c.phase
	u.Particles.DensityKgM3 = ptr(c.particleDensity)
	u.Particles.VolumeFraction = ptr(c.phi)
	u.Particles.HamakerZJ = ptr(c.hamaker * 1e21)
	if s.Particles.IsoelectricPH == nil && !math.IsNaN(c.iep) {
		u.Particles.IsoelectricPH = ptr(c.iep)
	}
	if c.phase == "liquid" {
		u.Particles.SolubilityMolM3 = ptr(c.droplet.solubility)
		u.Particles.MolarVolumeCm3Mol = ptr(c.droplet.molarVolume * 1e6)
		u.Particles.TensionMNm = ptr(c.droplet.tension * 1e3)
	}
	u.Medium.Liquid = c.liquid.key
	if u.Medium.TemperatureC == nil {
		u.Medium.TemperatureC = ptr(defaultTemperatureC)
	}
	u.Storage.TemperatureC = ptr(c.storageTempK - physics.CelsiusZero)
	u.Storage.ContainerHeightMm = ptr(c.height * 1e3)
	u.Storage.ShelfLifeDays = ptr(c.shelfLife / day)
	u.Storage.MaxClearLayerMm = ptr(c.maxClear * 1e3)
	u.Criteria = &Criteria{
		MinBarrierKT:         ptr(c.criteria.minBarrierKT),
		HalfLifeToShelfLife:  ptr(c.criteria.halfLifeRatio),
		MaxRelativeViscosity: ptr(c.criteria.maxRelViscosity),
		MaxStericContactKT:   ptr(c.criteria.maxStericKT),
	}
	m := effectiveModels(s.Models)
	u.Models = &m
	return u
}

func ptr(v float64) *float64 { return &v }
