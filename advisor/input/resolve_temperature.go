package input

import (
	"fmt"
	"math"
	"strings"

	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// resolveStorageRange reads the storage temperatures: the warm end, at
// which kinetics, viscosity and the cloud point are judged (returned, in
// °C, with the field that set it), and the cold end, at which freezing is
// judged (c.MinStorageTempK). Without a range both are storage.temperature_c,
// else the medium temperature.
func resolveStorageRange(st *Storage, mediumT float64, c *Conditions, bad *Error, n *Notes) (warm float64, field string) {
	base, field := mediumT, "/medium/temperature_c"
	if st.TemperatureC != nil {
		base, field = *st.TemperatureC, "/storage/temperature_c"
	} else if st.MaxTemperatureC == nil {
		n.Text("storage.temperature_c not given: stability judged at the medium temperature, " + number.Shortest(mediumT) + " degC")
	}
	warm, cold := base, base
	if st.MaxTemperatureC != nil {
		warm, field = *st.MaxTemperatureC, "/storage/max_temperature_c"
		if st.TemperatureC != nil && *st.TemperatureC > warm {
			bad.add("/storage/temperature_c", "above storage.max_temperature_c", "degC",
				"value <= "+number.Shortest(warm))
		}
		cold = math.Min(base, warm)
	}
	if st.MinTemperatureC != nil {
		cold = *st.MinTemperatureC
		if cold > warm {
			bad.add("/storage/min_temperature_c", "above the warm end of storage ("+strings.ReplaceAll(field[1:], "/", ".")+")", "degC",
				"value <= "+number.Shortest(warm))
		}
	}
	c.MinStorageTempK = physics.Kelvin(cold)
	c.StorageRange = st.MinTemperatureC != nil || st.MaxTemperatureC != nil
	if c.StorageRange {
		n.Add("storage range %s to %s degC: kinetics, viscosity and the cloud point judged at the warm end, freezing at the cold end",
			number.Shortest(cold), number.Shortest(warm))
	}
	c.FreezeThawCycles = math.NaN()
	if st.FreezeThawCycles != nil {
		c.FreezeThawCycles = float64(*st.FreezeThawCycles)
	}
	return warm, field
}

// resolveCosolvent reads the co-solvent of a water medium and, unless the
// request states them, takes the liquid's density and viscosity at the
// storage temperature from the mixture's published properties
// (physics.CosolventDensity and CosolventViscosity; ethanol has none here,
// and the water values stay, with a note). The permittivity and
// refractive index stay those of water.
func resolveCosolvent(m *Medium, mediumT float64, c *Conditions, bad *Error, n *Notes) {
	if len(m.Cosolvents) == 0 {
		return
	}
	if len(m.Cosolvents) > 1 {
		bad.add("/medium/cosolvents", "one co-solvent at a time: the freezing and property tables are for binary water mixtures", "", "at most 1 item")
		return
	}
	in := m.Cosolvents[0]
	cs, err := physics.ParseCosolvent(in.Name)
	if err != nil {
		bad.add("/medium/cosolvents/0/name", "unknown co-solvent", "", "one of: "+joinKeys(cosolventKeys()))
		return
	}
	w := *in.MassFraction
	if top := physics.CosolventMaxMassFraction(cs); !(w >= 0 && w <= top) {
		bad.add("/medium/cosolvents/0/mass_fraction", "outside the tabulated range of "+in.Name+"-water", "1",
			fmt.Sprintf("0 <= value <= %g", top))
		return
	}
	if c.Liquid.Key != defaultLiquid {
		bad.add("/medium/cosolvents", "co-solvents are mixed with water only: medium.liquid is "+c.Liquid.Key, "", "medium.liquid water")
		return
	}
	c.Cosolvent, c.CosolventFraction = cs, w
	if w == 0 {
		return
	}
	if !physics.CosolventHasLiquidProperties(cs) {
		n.Add("density and viscosity of %s-water not tabulated here: those of water are used; give medium.density_kg_m3 and viscosity_mPa_s", in.Name)
		return
	}
	T := c.StorageTempK
	if !(T >= physics.CosolventFreezingPoint(cs, w) && T <= physics.CosolventMaxTempK) {
		n.Add("%s-water at %g degC is outside the range of its published properties (freezing point to 100 degC): those of water are used",
			in.Name, T-physics.CelsiusZero)
		return
	}
	how := "Melinder (2010) polynomials"
	if cs == physics.Glycerol {
		how = "Volk & Kähler (2018) density, Cheng (2008) viscosity"
	}
	if m.DensityKgM3 == nil {
		c.Liquid.Density = physics.CosolventDensity(cs, w, T)
	}
	if m.ViscosityMPaS == nil {
		c.Liquid.Viscosity = physics.CosolventViscosity(cs, w, T)
	}
	n.Add("liquid: water with %s at mass fraction %g; density %s and viscosity %s at %g degC by %s (a stated density or viscosity wins); permittivity and refractive index those of water",
		in.Name, w, number.Quantity(c.Liquid.Density, "kg/m^3"), number.Quantity(c.Liquid.Viscosity*1e3, "mPa s"),
		T-physics.CelsiusZero, how)
}

func cosolventKeys() []string {
	out := make([]string, len(physics.Cosolvents))
	for i, cs := range physics.Cosolvents {
		out[i] = cs.String()
	}
	return out
}

// colligativeLimit is the ion molality, mol/kg, above which the ideal
// colligative law overstates the depression by more than a few per cent
// (see physics.ColligativeFreezingDepression).
const colligativeLimit = 0.5

// resolveFreezing finds the freezing point of the continuous phase: for
// water, its co-solvent's ice line lowered by the colligative depression
// of the ions (physics.MixtureFreezingPoint, the ion molality on the water
// alone); for other liquids, the library's melting point (or supercooling
// limit). A medium temperature at which the liquid cannot be liquid is a
// problem on medium.temperature_c naming the liquid's range; a storage
// temperature there is left to the rules (freeze_thaw, thermal_excursion).
func resolveFreezing(l library.Liquid, mediumT float64, c *Conditions, bad *Error, n *Notes) {
	if l.Key == defaultLiquid {
		water := c.Liquid.Density * (1 - c.CosolventFraction)
		molality := physics.IonMolality(c.Ions, water)
		c.FreezingK = physics.MixtureFreezingPoint(c.Cosolvent, c.CosolventFraction, molality)
		if molality > colligativeLimit {
			n.Add("ions at %s mol/kg of water: the ideal colligative law overstates their freezing-point depression (real salts depress less)",
				number.Shortest(number.Round(molality, 3)))
		}
	} else {
		c.FreezingK = l.LowestLiquidK()
		if len(c.Ions) > 0 {
			n.Add("freezing point of %s from the library; dissolved ions not counted", l.Name)
		}
	}
	T := physics.Kelvin(mediumT)
	if T < c.FreezingK || T > c.Liquid.BoilingK {
		bad.add("/medium/temperature_c", l.Name+" is not liquid there at 1 atm (below its freezing point or above its boiling point)", "degC",
			celsiusRange(c.FreezingK, c.Liquid.BoilingK))
	}
}

// resolveProcessStep takes the typical shear rate of a named process step
// (physics.ProcessSteps) unless an explicit rate is given.
func resolveProcessStep(st *Storage, c *Conditions, bad *Error, n *Notes) {
	if st.ProcessStep == "" {
		return
	}
	step, err := physics.ProcessStepNamed(st.ProcessStep)
	if err != nil {
		names := make([]string, 0, 9)
		for _, p := range physics.ProcessSteps() {
			names = append(names, p.Name)
		}
		bad.add("/storage/process_step", "unknown process step", "", "one of: "+joinKeys(names))
		return
	}
	if st.ShearRatePerS != nil {
		n.Add("storage.shear_rate_per_s given: it wins over the typical rate of storage.process_step %s (%s to %s 1/s)",
			step.Name, number.Shortest(step.MinRate), number.Shortest(step.MaxRate))
		return
	}
	c.Shear, c.ProcessStep = step.TypicalRate(), step.Name
	n.Add("shear rate %s from storage.process_step %s: geometric mean of its typical %s to %s 1/s (%s)",
		number.Quantity(c.Shear, "1/s"), step.Name, number.Shortest(step.MinRate), number.Shortest(step.MaxRate), step.Source)
}

// celsiusRange is the valid range of a temperature field between loK and
// hiK (+Inf: no upper bound), in degC to 0.01 K, each bound rounded towards
// the inside so that every value it admits is valid: neutral water's own
// ions put its freezing point 1e-7 K below 0 degC, printed as 0.
func celsiusRange(loK, hiK float64) string {
	lo := number.Shortest(number.Decimals(loK-physics.CelsiusZero, 2, math.Ceil))
	if math.IsInf(hiK, 1) {
		return "value >= " + lo
	}
	return lo + " <= value <= " + number.Shortest(number.Decimals(hiK-physics.CelsiusZero, 2, math.Floor))
}
