package advisor

import (
	"math"

	"colloidtriage/physics"
)

// computeTemperature reports the temperature history against the liquid
// and the stabiliser: the freezing point of the continuous phase and the
// margin of the coldest storage above it, the margin of the warmest below
// the boiling point and below the stabiliser's cloud point, and the steric
// layer at the warm end against the thinnest layer that still works.
func (ev *evaluation) computeTemperature() {
	c := ev.cond
	ev.set("freezing_point", c.FreezingK-physics.CelsiusZero,
		"co-solvent ice line (Melinder 2010; Lange table 5.13) lowered by Kf m of the ions; the library's melting point for other liquids")
	ev.set("freeze_margin", c.MinStorageTempK-c.FreezingK, "lowest storage temperature minus the freezing point")
	if !math.IsInf(c.Liquid.BoilingK, 1) {
		ev.set("boiling_margin", c.Liquid.BoilingK-c.StorageTempK, "boiling point at 1 atm minus the highest storage temperature")
	}
	s := c.Steric
	if math.IsNaN(s.CloudK) {
		return
	}
	ev.set("cloud_point_margin", s.CloudK-c.StorageTempK, "cloud point minus the highest storage temperature")
	if !s.Present || math.IsNaN(s.Factor) {
		return
	}
	ev.set("layer_factor_at_storage", s.Factor,
		"[((theta - T)/T) / ((theta - Tref)/Tref)]^(1/3), theta = cloud point, Tref = medium temperature (Flory chi; Alexander-de Gennes)")
	ev.set("steric_thickness_at_storage", s.Thickness*s.Factor*1e9, "stated thickness times the layer factor")
	ev.set("minimum_steric_thickness",
		physics.MinimumStericThickness(ev.vanDerWaalsOnly.EnergyCurve(), c.StorageTempK, c.Criteria.MaxStericKT)*1e9,
		"thickness at which |van der Waals energy| at contact (h = 2 thickness) equals the acceptance criterion")
}
