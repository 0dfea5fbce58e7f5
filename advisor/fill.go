package advisor

import (
	"fmt"
	"math"

	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// extrapolationMarginK is how far beyond a liquid's sourced range the
// advisor still answers, with the extrapolation stated; further out the
// temperature is rejected.
const extrapolationMarginK = 10.0

// liquidAt returns a library liquid's properties at tempC, or an InputError
// on field when the temperature is too far outside its sourced range.
func (e *Engine) liquidAt(l library.Liquid, tempC float64, field string, n *notes) (liquidState, error) {
	T := physics.Kelvin(tempC)
	lo := math.Max(l.MinTempK-extrapolationMarginK, library.LiquidMinTempK)
	hi := math.Min(l.MaxTempK+extrapolationMarginK, library.LiquidMaxTempK)
	if !(T >= lo && T <= hi) {
		bad := &InputError{}
		bad.add(field, fmt.Sprintf("outside the range in which the properties of %s are known", l.Name), "degC",
			fmt.Sprintf("%g <= value <= %g", number.Round(lo-physics.CelsiusZero, 4), number.Round(hi-physics.CelsiusZero, 4)))
		return liquidState{}, bad
	}
	p, lines := l.Properties(T)
	for _, line := range lines {
		n.text(line)
	}
	st := liquidState{key: l.Key, density: p.Density, viscosity: p.Viscosity, epsR: p.RelativePermittivity,
		refrIndex: p.RefractiveIndex, aqueous: l.Aqueous, flammable: l.Flammable, flashPointC: math.NaN()}
	if l.FlashPointC != nil {
		st.flashPointC = l.FlashPointC.Value
	}
	return st, nil
}

// materialProps are the library's properties of a particle material, NaN
// where the library has none.
type materialProps struct {
	kind, phase                                 string
	density, refrIndex, epsR, iep, hamakerWater float64
}

func (e *Engine) resolveMaterial(p *Particles, bad *InputError) (materialProps, bool) {
	none := materialProps{density: math.NaN(), refrIndex: math.NaN(), epsR: math.NaN(), iep: math.NaN(),
		hamakerWater: math.NaN()}
	if p.Material == "" {
		return none, false
	}
	m, ok := e.lib.Materials[p.Material]
	if !ok {
		bad.add("/particles/material", "unknown material", "", "one of: "+joinKeys(e.lib.MaterialKeys()))
		return none, false
	}
	out := materialProps{kind: m.Kind, phase: m.Phase, density: m.Density.Value,
		refrIndex: valueOrNaN(m.RefractiveIndex), epsR: valueOrNaN(m.RelativePermittivity),
		iep: valueOrNaN(m.IsoelectricPH), hamakerWater: valueOrNaN(m.HamakerWater)}
	return out, true
}

func valueOrNaN(v *library.SourcedValue) float64 {
	if v == nil {
		return math.NaN()
	}
	return v.Value
}
