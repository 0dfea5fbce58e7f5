package input

import (
	"math"

	"colloidtriage/physics"
)

// Understood is the sample as the advisor read it: the request with every
// default and library fill written into its fields, in the request's units,
// so that an auditor can rerun exactly what was computed. Properties the
// advisor derives rather than fills (liquid properties at the storage
// temperature, an estimated zeta potential) are scales, not inputs.
func Understood(s *Sample, c *Conditions) Sample {
	u := *s
	u.Particles.Phase = c.Phase
	u.Particles.DensityKgM3 = ptr(c.ParticleDensity)
	u.Particles.VolumeFraction = ptr(c.VolumeFraction)
	u.Particles.HamakerZJ = ptr(c.Hamaker * 1e21)
	if s.Particles.IsoelectricPH == nil && !math.IsNaN(c.IsoelectricPH) {
		u.Particles.IsoelectricPH = ptr(c.IsoelectricPH)
	}
	if c.Phase == "liquid" {
		u.Particles.SolubilityMolM3 = ptr(c.Droplet.Solubility)
		u.Particles.MolarVolumeCm3Mol = ptr(c.Droplet.MolarVolume * 1e6)
		u.Particles.TensionMNm = ptr(c.Droplet.Tension * 1e3)
	}
	u.Medium.Liquid = c.Liquid.Key
	if u.Medium.TemperatureC == nil {
		u.Medium.TemperatureC = ptr(defaultTemperatureC)
	}
	u.Storage.TemperatureC = ptr(c.StorageTempK - physics.CelsiusZero)
	if c.StorageRange {
		u.Storage.MinTemperatureC = ptr(c.MinStorageTempK - physics.CelsiusZero)
	}
	if c.ProcessStep != "" {
		u.Storage.ShearRatePerS = ptr(c.Shear)
	}
	u.Storage.ContainerHeightMm = ptr(c.Height * 1e3)
	u.Storage.ShelfLifeDays = ptr(c.ShelfLife / Day)
	u.Storage.MaxClearLayerMm = ptr(c.MaxClear * 1e3)
	u.Criteria = &Criteria{
		MinBarrierKT:         ptr(c.Criteria.MinBarrierKT),
		HalfLifeToShelfLife:  ptr(c.Criteria.HalfLifeRatio),
		MaxRelativeViscosity: ptr(c.Criteria.MaxRelViscosity),
		MaxStericContactKT:   ptr(c.Criteria.MaxStericKT),
	}
	m := EffectiveModels(s.Models)
	u.Models = &m
	return u
}

func ptr(v float64) *float64 { return &v }
