package remedy

import (
	"fmt"
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/physics"
)

// A limit is what practice can reach for one target quantity: check
// returns why target t is out of reach for the product, "" when it is not;
// nominal is the target's value at the nominal inputs, which sets the
// density window that a match must hold (the reported target, solved for
// 95 % of the uncertain inputs, may sit on the other density itself).
// Every reason ends with its source tag: [pub] a published value, [calc]
// computed from a named published formula, [practice] common practice.
type limit struct {
	quantity string
	check    func(c *input.Conditions, t Target, nominal float64) string
}

// limits is the one table of practical limits of the remedy targets, per
// quantity, the product's category, phase and material deciding. Practical
// reads it; the advisor marks a target it rejects infeasible with the
// reason and ranks it after the feasible remedies of its cause.
var limits = []limit{
	{"particles.diameter_nm", func(c *input.Conditions, t Target, nominal float64) string {
		if c.Phase == "solid" && t.Value < smallestMilledNM {
			return fmt.Sprintf("wet bead mills reach a median of about %g nm; a finer solid needs precipitation or another grade [practice]", smallestMilledNM)
		}
		if c.Phase != "solid" && t.Value < smallestHomogenisedNM {
			return fmt.Sprintf("high-pressure homogenisers reach droplets of about %g nm [practice]", smallestHomogenisedNM)
		}
		return ""
	}},
	{"medium.density_kg_m3", func(c *input.Conditions, t Target, nominal float64) string {
		if c.Liquid.Aqueous && t.Op == ">=" && t.Value > densestAqueous {
			return fmt.Sprintf("food-grade densifiers (sucrose, glycerol, sorbitol) bring water to about %g kg/m^3 at saturation [pub: saturated sucrose, 67 %% w/w, CRC Handbook]", densestAqueous)
		}
		return densityMatch(c, math.Abs(c.ParticleDensity-nominal))
	}},
	{"particles.density_kg_m3", func(c *input.Conditions, t Target, nominal float64) string {
		return densityMatch(c, math.Abs(c.Liquid.Density-nominal))
	}},
	{"medium.viscosity_mPa_s", func(c *input.Conditions, t Target, nominal float64) string {
		if limit, ok := thickestPourable[c.Product]; ok && t.Value > limit {
			return fmt.Sprintf("a %s thicker than about %g mPa s at low shear no longer pours or drinks as one [practice]", c.Product, limit)
		}
		return ""
	}},
	{"|particles.zeta_mV|", func(c *input.Conditions, t Target, nominal float64) string {
		if t.Op != ">=" {
			return ""
		}
		if psi := largestZeta(c); t.Value > psi*1e3 {
			return fmt.Sprintf("in this ionic strength an electrokinetic charge of %g C/m^2 gives at most %.3g mV by Grahame's equation [calc: Grahame 1947; charge [practice]]",
				largestElectrokineticCharge, psi*1e3)
		}
		return ""
	}},
	{"medium.ph", func(c *input.Conditions, t Target, nominal float64) string {
		w, ok := dissolves[c.Material]
		if ok && (t.Value < w.low || t.Value > w.high) {
			return fmt.Sprintf("%s dissolves outside about pH %g to %g [practice]", c.Material, w.low, w.high)
		}
		return ""
	}},
	{"stabilizer.layer_thickness_nm", func(c *input.Conditions, t Target, nominal float64) string {
		if t.Value > ThickestAdsorbedLayer*1e9 {
			return fmt.Sprintf("adsorbed polymer and surfactant layers reach about %g nm (Napper 1983) [practice]", ThickestAdsorbedLayer*1e9)
		}
		return ""
	}},
}

// Practical returns why target t (nominal at the nominal inputs) cannot be
// reached in practice for the product of c, or "" when nothing in the table
// rules it out.
func Practical(c *input.Conditions, t Target, nominal float64) string {
	for _, l := range limits {
		if l.quantity == t.Quantity {
			if reason := l.check(c, t, nominal); reason != "" {
				return reason
			}
		}
	}
	return ""
}

const (
	smallestMilledNM      = 100.0  // nm, wet bead milling in practice
	smallestHomogenisedNM = 50.0   // nm, high-pressure homogenisation and microfluidisation in practice
	densestAqueous        = 1330.0 // kg/m^3, saturated sucrose solution at 20 degC (CRC Handbook, about 67 % w/w)

	// closestDensityMatch, kg/m^3, is the closest match of the liquid's to
	// the particles' density that production holds from batch to batch
	// (raw-material variation and density measurement) [practice].
	closestDensityMatch = 1.0

	// largestElectrokineticCharge, C/m^2, is about the largest charge
	// density behind the slip plane that dispersants or adsorbing ions
	// give (electrokinetic charges are a few uC/cm^2) [practice].
	largestElectrokineticCharge = 0.05

	// specifiedYieldStressFactor and smallestSpecifiedYieldStress (Pa): a
	// yield stress target carries a safety factor of 2 and is at least
	// 0.1 Pa, below which rheometers do not resolve it reliably [practice].
	specifiedYieldStressFactor   = 2
	smallestSpecifiedYieldStress = 0.1
)

// thickestPourable is the largest low-shear viscosity of a product that must
// pour or be drunk as a thin liquid, mPa s [practice].
var thickestPourable = map[string]float64{"beverage": 50}

// dissolves is the pH window outside which a material dissolves [practice;
// amphoteric zinc oxide and alumina, acid-soluble calcite].
var dissolves = map[string]struct{ low, high float64 }{
	"zinc_oxide": {6, 12},
	"calcite":    {7, 14},
	"alumina":    {3.5, 10},
}

// Volumetric thermal expansion coefficients, 1/K: water at 20 degC (Kell
// 1975 [pub]), other liquids (toluene, ethanol about 1.1e-3, CRC Handbook
// [pub]), polymers (polystyrene, three times its linear 7e-5 /K, Polymer
// Handbook [pub]), oils and waxes and inorganic solids [practice].
const (
	expansionWater     = 2.1e-4
	expansionOrganic   = 1.0e-3
	expansionPolymer   = 2.1e-4
	expansionOil       = 7e-4
	expansionInorganic = 3e-5
)

// densityMatch returns why a density window of half-width window (kg/m^3)
// cannot be held: closer than production holds, or closer than the drift
// of the two densities over the storage temperature range (at least 1 K).
func densityMatch(c *input.Conditions, window float64) string {
	if window < closestDensityMatch {
		return fmt.Sprintf("a match within %.3g kg/m^3 is closer than production holds, about %g kg/m^3 [practice]", window, closestDensityMatch)
	}
	span := math.Max(c.StorageTempK-c.MinStorageTempK, 1)
	betaL := expansionOrganic
	if c.Liquid.Aqueous {
		betaL = expansionWater
	}
	betaP := expansionInorganic
	switch {
	case c.Phase != "solid" || c.MaterialKind == "oil" || c.MaterialKind == "wax":
		betaP = expansionOil
	case c.MaterialKind == "latex" || c.MaterialKind == "organic" || c.MaterialKind == "pigment":
		betaP = expansionPolymer
	}
	drift := math.Abs(betaL*c.Liquid.Density-betaP*c.ParticleDensity) * span
	if window < drift {
		return fmt.Sprintf("the densities drift apart by %.3g kg/m^3 over %.3g K of storage temperature, more than the %.3g kg/m^3 match [calc: thermal expansion, coefficients [pub]/[practice]]", drift, span, window)
	}
	return ""
}

// largestZeta is the diffuse-layer potential, V, at which Grahame's
// equation (physics.GrahameCharge) in the product's ions gives
// largestElectrokineticCharge; +Inf without ions.
func largestZeta(c *input.Conditions) float64 {
	if c.IonicStrength <= 0 || len(c.Ions) == 0 {
		return math.Inf(1)
	}
	lo, hi := 0.0, 0.5
	for range 60 {
		mid := (lo + hi) / 2
		if math.Abs(physics.GrahameCharge(mid, c.Ions, c.Liquid.Permittivity, c.StorageTempK)) < largestElectrokineticCharge {
			lo = mid
		} else {
			hi = mid
		}
	}
	return lo
}

// SpecifiedYieldStress is the yield stress worth specifying to hold what
// needs tau, Pa: tau with its safety factor, and no less than a rheometer
// resolves.
func SpecifiedYieldStress(tau float64) float64 {
	return math.Max(specifiedYieldStressFactor*tau, smallestSpecifiedYieldStress)
}
