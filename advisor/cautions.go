package advisor

import (
	"fmt"
	"math"
	"slices"

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

// cautions chooses the handling and regulatory cautions that fit the
// sample: what the product is (a wet dispersion of solids or droplets, its
// category, its liquid and pH) and what the offered remedies would do to it
// (milling, changing salts, adding a freeze protectant). The deferral is
// always last.
func cautions(ev *evaluation, causes []Cause) []string {
	c := ev.cond
	offered := func(ids ...string) bool {
		for _, cs := range causes {
			for _, r := range cs.Remedies {
				if slices.Contains(ids, r.ID) {
					return true
				}
			}
		}
		return false
	}
	var out []string
	d := 2 * c.Radius
	if c.Phase == "solid" && d < nanoLimit {
		out = append(out, fmt.Sprintf("Nanoscale particles (median %s): nanomaterial reporting and labelling rules may apply.",
			number.Quantity(d*1e9, "nm")))
	}
	if c.Phase == "solid" && d < respirableLim && offered("reduce_particle_size") {
		out = append(out, fmt.Sprintf("Milling (reduce_particle_size) makes the solid finer. %s is a wet dispersion and raises no dust as such, but a fine powder handled dry (before dispersing, or after drying) is respirable and, for combustible solids, a dust-explosion risk: handle it wet or with local exhaust ventilation and suitable respiratory protection.",
			productName(c.Product)))
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
	if offered("remove_multivalent_ions", "controlled_flocculation") {
		out = append(out, "Changing salts or adding chelating agents changes the product's composition: check the safety data sheets of the additives.")
	}
	if offered("add_freeze_protectant") {
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

// productName names the product by its category for a caution.
func productName(category string) string {
	if category == "" || category == "other" {
		return "This product"
	}
	return "This " + category + " product"
}
