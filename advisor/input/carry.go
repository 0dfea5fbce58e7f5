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
	return &measuredIn{ions: tmp.Ions, pH: *z.PH, tempK: liquidWaterK(tmp.StorageTempK)}
}

// Bounds of the Stern capacitance fitted to a measured zeta potential, F/m^2.
const minFitStern, maxFitStern = 1e-3, 1e3

// carryZeta takes a zeta potential measured in another liquid to the
// product: the Stern capacitance of the material's site model is fitted so
// that the model's slip-plane potential in the measurement liquid equals
// the measured zeta, and the model with it is evaluated in the product.
// Without a stated liquid, zeta is taken as measured in the product and the
// site model is not needed. The fitted
// capacitance goes into a copy of c.Sites: the surface Resolve built is
// shared by the draws that carry the zeta potential again (Rederive).
func carryZeta(c *Conditions, meas *measuredIn, n *Notes) {
	if meas == nil {
		n.Add("particles.zeta_measured_in not given: the zeta potential is assumed measured in the product itself")
		return
	}
	if c.Sites == nil || !c.Liquid.Aqueous || math.IsNaN(c.PH) {
		n.Add("zeta measured at pH %g in another liquid, but without a site-binding model for this material (or a product pH) it is used unchanged in the product",
			meas.pH)
		return
	}
	st, fittedC, model, ok := fitSternCapacitance(c, meas)
	if !ok {
		n.Add("zeta %s measured at pH %g cannot be matched by the site model (model %s there): used unchanged in the product",
			number.Quantity(c.Zeta*1e3, "mV"), meas.pH, number.Quantity(model*1e3, "mV"))
		return
	}
	n.Add("zeta %s measured at pH %g, ionic strength %s, %s degC, carried to the product (pH %g, ionic strength %s): %s, with the Stern capacitance of the site model fitted to the measurement (%s instead of %s)",
		number.Quantity(c.Zeta*1e3, "mV"), meas.pH, number.Quantity(physics.IonicStrength(meas.ions), "mM"),
		number.Shortest(number.Round(meas.tempK-physics.CelsiusZero, 4)), c.PH, number.Quantity(c.IonicStrength, "mM"),
		number.Quantity(st.Zeta*1e3, "mV"), number.Quantity(fittedC, "F/m^2"),
		number.Quantity(c.Sites.Surface.SternCapacitance, "F/m^2"))
	c.useFitted(fittedC, st)
	c.ZetaSource = "carried"
}

// fitSternCapacitance fits the Stern capacitance of the material's site
// model so that its slip-plane potential in the liquid meas equals c.Zeta,
// and evaluates the fitted model in the product: the product's surface
// state and the fitted capacitance (F/m^2). ok is false when no capacitance
// within [minFitStern, maxFitStern] matches, or the model's sign there
// differs (model is then its unfitted zeta in that liquid).
func fitSternCapacitance(c *Conditions, meas *measuredIn) (st physics.SurfaceState, fitted, model float64, ok bool) {
	surface := c.Sites.Surface
	at := func(logC float64) physics.SurfaceState {
		surface.SternCapacitance = math.Pow(10, logC)
		return surface.State(meas.pH, meas.ions, c.Liquid.Permittivity, meas.tempK)
	}
	miss := func(logC float64) float64 { return math.Abs(at(logC).Zeta) - math.Abs(c.Zeta) }
	model = at(math.Log10(c.Sites.Surface.SternCapacitance)).Zeta
	logC, found := physics.FindRoot(miss, math.Log10(minFitStern), math.Log10(maxFitStern), 1e-6)
	if !found || model*c.Zeta <= 0 {
		return physics.SurfaceState{}, 0, model, false
	}
	surface.SternCapacitance = math.Pow(10, logC)
	return surface.State(c.PH, c.Ions, c.Liquid.Permittivity, liquidWaterK(c.StorageTempK)), surface.SternCapacitance, model, true
}

// useFitted makes the fitted surface the product's: a copy of c.Sites with
// the fitted capacitance (the surface Resolve built is shared by the draws
// that fit again, see Rederive), and its state as zeta, charge and
// diffuse-layer potential.
func (c *Conditions) useFitted(capacitance float64, st physics.SurfaceState) {
	fitted := *c.Sites
	fitted.Surface.SternCapacitance = capacitance
	c.Sites = &fitted
	c.Zeta = st.Zeta
	c.SurfaceCharge, c.DiffusePotential = st.Charge, st.DiffusePotential
}

// anchorSaltMM is the 1:1 background, mM, of the zeta potentials behind the
// pH-and-isoelectric-point estimate: electrophoresis is usually run in about
// 1 mM of KCl or NaCl (common practice), and the rules of thumb the estimate
// follows (|zeta| above 30 mV about 2 pH units from the isoelectric point)
// come from such measurements.
const anchorSaltMM = 1.0

// anchoredEstimate estimates the zeta potential at pH of a material with a
// site-binding model when none is measured. The pH-and-isoelectric-point
// estimate (physics.SurfacePotentialFromPH) gives the level, as measured in
// anchorSaltMM of 1:1 salt at that pH and the product's temperature; the
// site model gives how it changes from that liquid to the product's ions,
// as the ratio of its slip-plane potentials in the two. Basic Stern models
// follow how an oxide's charge regulates with salt, pH and multivalent
// ions, but put its slip-plane potential two to three times above measured
// zeta potentials; the estimate was drawn from such measurements. For a
// 1-pK surface the estimate is taken about the model's point of zero charge
// (ZeroPointPH), so that both vanish at the same pH. reference is the
// estimate in the anchor liquid and st the site model's state in the
// product at pH; ok is false without a zero point or where the ratio is
// undefined.
func (c *Conditions) anchoredEstimate(pH float64) (zeta, reference float64, st physics.SurfaceState, ok bool) {
	zero := c.ZeroPointPH()
	if math.IsNaN(zero) {
		return math.NaN(), math.NaN(), st, false
	}
	reference = physics.SurfacePotentialFromPH(pH, zero, c.StorageTempK)
	anchor := resolveMeasuredIn(&ZetaLiquid{PH: &pH, Electrolytes: []Electrolyte{{Formula: "KCl", ConcentrationMM: ptr(anchorSaltMM)}}},
		c, &Error{})
	zetaAt := func(pH float64) (inProduct, inAnchor float64) {
		return c.SurfaceState(pH).Zeta, c.Sites.Surface.State(pH, anchor.ions, c.Liquid.Permittivity, anchor.tempK).Zeta
	}
	st = c.SurfaceState(pH)
	inProduct, inAnchor := st.Zeta, c.anchorZeta(pH, anchor)
	if !(math.Abs(inAnchor) > minAnchorPotential) {
		// Near the point of zero charge both potentials vanish together:
		// their ratio is that of their slopes in pH.
		upP, upA := zetaAt(pH + ratioStepPH)
		downP, downA := zetaAt(pH - ratioStepPH)
		inProduct, inAnchor = upP-downP, upA-downA
	}
	ratio := inProduct / inAnchor
	if math.IsNaN(ratio) || math.IsInf(ratio, 0) {
		return math.NaN(), reference, st, false
	}
	return reference * ratio, reference, st, true
}

// anchorZeta is the site model's slip-plane potential at pH in the anchor
// liquid, from the memo of Salts when it holds that pH.
func (c *Conditions) anchorZeta(pH float64, anchor *measuredIn) float64 {
	if m := c.anchor; m != nil && m.set && m.pH == pH {
		return m.zeta
	}
	zeta := c.Sites.Surface.State(pH, anchor.ions, c.Liquid.Permittivity, anchor.tempK).Zeta
	if m := c.anchor; m != nil {
		m.pH, m.zeta, m.set = pH, zeta, true
	}
	return zeta
}

// Near the point of zero charge, where the site model's slip-plane potential
// in the anchor liquid is below minAnchorPotential (V), the ratio is taken
// from the potentials ratioStepPH either side of the pH.
const (
	minAnchorPotential = 1e-3
	ratioStepPH        = 0.1
)
