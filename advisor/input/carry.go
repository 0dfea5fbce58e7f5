package input

import (
	"math"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// measuredIn is the liquid a zeta potential was measured in: its ions, pH
// and temperature (K).
type measuredIn struct {
	ions      []physics.Ion
	pH, tempK float64
}

// resolveMeasuredIn resolves particles.zeta_measured_in: the ions of its
// salts (or ionic strength) and of water at its pH, at its temperature (the
// medium's when not stated). nil when the request has none.
func resolveMeasuredIn(z *ZetaLiquid, c *Conditions, bad *Error) *measuredIn {
	if z == nil {
		return nil
	}
	tmp := Conditions{Liquid: c.Liquid, StorageTempK: c.StorageTempK}
	if z.TemperatureC != nil {
		tmp.StorageTempK = physics.Kelvin(*z.TemperatureC)
	}
	m := Medium{PH: z.PH, Electrolytes: z.Electrolytes, IonicStrengthMM: z.IonicStrengthMM}
	resolveElectrolyte(&m, "/particles/zeta_measured_in", &tmp, 1, bad, nil)
	return &measuredIn{ions: tmp.Ions, pH: *z.PH, tempK: tmp.StorageTempK}
}

// Bounds of the Stern capacitance fitted to a measured zeta potential, F/m^2.
const minFitStern, maxFitStern = 1e-3, 1e3

// carryZeta takes a zeta potential measured in another liquid to the
// product: the Stern capacitance of the material's site model is fitted so
// that the model's slip-plane potential in the measurement liquid equals
// the measured zeta, and the model with it is evaluated in the product.
// Without a stated liquid, zeta is taken as measured in the product, and
// the site model's own value there is kept for comparison. The fitted
// capacitance goes into a copy of c.Sites: the surface Resolve built is
// shared by the draws that carry the zeta potential again (Rederive).
func carryZeta(c *Conditions, meas *measuredIn, n *Notes) {
	if meas == nil {
		n.Add("particles.zeta_measured_in not given: the zeta potential is assumed measured in the product itself")
		if c.Sites != nil && c.Liquid.Aqueous && !math.IsNaN(c.PH) {
			st := c.SurfaceState(c.PH)
			c.SurfaceCharge, c.DiffusePotential = st.Charge, st.DiffusePotential
		}
		return
	}
	if c.Sites == nil || !c.Liquid.Aqueous || math.IsNaN(c.PH) {
		n.Add("zeta measured at pH %g in another liquid, but without a site-binding model for this material (or a product pH) it is used unchanged in the product",
			meas.pH)
		return
	}
	surface := c.Sites.Surface
	at := func(logC float64) physics.SurfaceState {
		surface.SternCapacitance = math.Pow(10, logC)
		return surface.State(meas.pH, meas.ions, c.Liquid.Permittivity, meas.tempK)
	}
	miss := func(logC float64) float64 { return math.Abs(at(logC).Zeta) - math.Abs(c.Zeta) }
	model := at(math.Log10(c.Sites.Surface.SternCapacitance)).Zeta
	logC, ok := physics.FindRoot(miss, math.Log10(minFitStern), math.Log10(maxFitStern), 1e-6)
	if !ok || model*c.Zeta <= 0 {
		n.Add("zeta %s measured at pH %g cannot be matched by the site model (model %s there): used unchanged in the product",
			number.Quantity(c.Zeta*1e3, "mV"), meas.pH, number.Quantity(model*1e3, "mV"))
		return
	}
	surface.SternCapacitance = math.Pow(10, logC)
	st := surface.State(c.PH, c.Ions, c.Liquid.Permittivity, c.StorageTempK)
	n.Add("zeta %s measured at pH %g, ionic strength %s, %s degC, carried to the product (pH %g, ionic strength %s): %s, with the Stern capacitance of the site model fitted to the measurement (%s instead of %s)",
		number.Quantity(c.Zeta*1e3, "mV"), meas.pH, number.Quantity(physics.IonicStrength(meas.ions), "mM"),
		number.Shortest(number.Round(meas.tempK-physics.CelsiusZero, 4)), c.PH, number.Quantity(c.IonicStrength, "mM"),
		number.Quantity(st.Zeta*1e3, "mV"), number.Quantity(surface.SternCapacitance, "F/m^2"),
		number.Quantity(c.Sites.Surface.SternCapacitance, "F/m^2"))
	fitted := *c.Sites
	fitted.Surface.SternCapacitance = surface.SternCapacitance
	c.Sites = &fitted
	c.Zeta, c.ZetaSource = st.Zeta, "carried"
	c.SurfaceCharge, c.DiffusePotential = st.Charge, st.DiffusePotential
}
