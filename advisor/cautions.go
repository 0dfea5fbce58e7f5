package advisor

import (
	"fmt"
	"math"

	"colloidtriage/advisor/number"
)

// Size limits of the handling cautions: below 100 nm a material is a
// nanomaterial in the sense of ISO/TS 80004-1; below 10 um a dry powder is
// largely respirable (EN 481 conventions; common practice).
const (
	nanoLimit     = 100e-9
	respirableLim = 10e-6
)

const deferral = "This report is an aid to qualified staff. It does not replace stability testing, and it defers to the safety data sheets, local codes and regulations, and licensed professional practice."

// cautions chooses the handling and regulatory cautions that fit the sample.
func cautions(ev *evaluation) []string {
	c := ev.cond
	var out []string
	d := 2 * c.Radius
	if c.Phase == "solid" {
		switch {
		case d < nanoLimit:
			out = append(out, fmt.Sprintf("Nanoscale particles (median %s): as dry powder or spray mist they are an inhalation hazard. Handle wet or in closed systems with local exhaust ventilation and suitable respiratory protection; nanomaterial reporting rules may apply.",
				number.Quantity(d*1e9, "nm")))
		case d < respirableLim:
			out = append(out, "Fine particles: dry handling raises respirable dust and, for combustible solids, a dust-explosion risk. Handle wet or with local exhaust ventilation; milling to a smaller size adds to this.")
		}
	}
	if c.Liquid.Flammable {
		fp := "unknown"
		if !math.IsNaN(c.Liquid.FlashPointC) {
			fp = number.Quantity(c.Liquid.FlashPointC, "degC")
		}
		out = append(out, fmt.Sprintf("Flammable liquid %q (flash point %s): keep away from ignition sources, bond and ground containers, and store and ship under the local rules for flammable liquids.", c.Liquid.Key, fp))
	}
	if !math.IsNaN(c.PH) && (c.PH < 3 || c.PH > 11) {
		out = append(out, fmt.Sprintf("pH %g is corrosive to eyes and skin: wear eye protection and gloves; adjusting pH releases heat and may release gas.", c.PH))
	}
	if c.MultivalentSalt != "" {
		out = append(out, "Changing salts or adding chelating agents changes the product's composition: check the safety data sheets of the additives.")
	}
	if c.MinStorageTempK < c.FreezingK && c.Liquid.Aqueous {
		out = append(out, "Freeze protectants: ethylene glycol is toxic if swallowed and has no place in food, cosmetic or pharmaceutical products; glycols add to the VOC content of paints and coatings, which local regulations limit; ethanol makes the liquid flammable. Check the safety data sheets and the permitted limits before adding any.")
	}
	switch c.Product {
	case "food", "beverage", "cosmetic", "pharmaceutical":
		out = append(out, fmt.Sprintf("Regulated %s product: any remedy that changes the formula, a raw material or the process must satisfy the applicable regulations (permitted ingredients and limits, labelling) and go through the product's change control and stability programme before release.", c.Product))
	case "":
		out = append(out, "If this is a food, cosmetic or pharmaceutical product, any remedy that changes the formula, a raw material or the process must satisfy the applicable regulations and go through the product's change control before release.")
	}
	return append(out, deferral)
}
