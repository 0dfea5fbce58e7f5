package remedy

import (
	"fmt"
	"math"
	"strings"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// protectants are the co-solvents offered as freeze protectants, the
// first the default: the glycols and glycerol (ethanol lowers the flash
// point and is offered only when the liquid already holds it).
var protectants = []physics.Cosolvent{physics.PropyleneGlycol, physics.EthyleneGlycol, physics.Glycerol}

// solveFreezeProtectant finds the co-solvent mass fraction at which the
// continuous phase stays unfrozen freezeMarginK below the lowest storage
// temperature: the root in w of physics.MixtureFreezingPoint, with the ion
// molality rising as the co-solvent takes the place of water (the ions per
// kilogram of liquid fixed, their molality that over 1 - w). The target is
// for the co-solvent already present, else propylene glycol; the criterion
// names the fractions of the other protectants.
func solveFreezeProtectant(cs *Case) (Target, string, bool) {
	c := cs.Cond
	if c.Liquid.Key != "water" {
		return Target{}, "a freeze protectant is mixed into water; " + c.Liquid.Key + " is not a water phase", false
	}
	want := c.MinStorageTempK - freezeMarginK
	crit := fmt.Sprintf("freezing point of the continuous phase, ions included, <= %s degC (%g K below the lowest storage temperature)",
		number.Shortest(number.Round(want-physics.CelsiusZero, 3)), freezeMarginK)
	perKg := physics.IonMolality(c.Ions, c.Liquid.Density) // mol of ions per kg of liquid
	fraction := func(p physics.Cosolvent) (float64, bool) {
		top := physics.CosolventMaxMassFraction(p)
		f := func(w float64) float64 { return physics.MixtureFreezingPoint(p, w, perKg/(1-w)) - want }
		if f(0) <= 0 {
			return 0, true
		}
		return physics.FindRoot(f, 0, top, 1e-5)
	}
	main := physics.PropyleneGlycol
	if c.Cosolvent != 0 {
		main = c.Cosolvent
	}
	w, ok := fraction(main)
	var others []string
	for _, p := range protectants {
		if p == main {
			continue
		}
		if x, ok := fraction(p); ok {
			others = append(others, fmt.Sprintf("%s %s", p, number.Shortest(number.RoundWith(x, 2, math.Ceil))))
		}
	}
	crit += "; with " + main.String()
	if len(others) > 0 {
		crit += " (or " + strings.Join(others, ", ") + ")"
	}
	if !ok {
		return Target{}, crit + ": beyond the tabulated mass fractions", false
	}
	return Target{"medium.cosolvents.mass_fraction", ">=", w, "1"}, crit, true
}
