package input

import (
	"fmt"
	"math"

	"colloidtriage/advisor/library"
	"colloidtriage/physics"
)

// extrapolationMarginK is how far beyond a liquid's sourced range the
// advisor still answers, with the extrapolation stated; further out the
// temperature is rejected.
const extrapolationMarginK = 10.0

// liquidAt returns a library liquid's properties at tempC, or an Error
// on field when the temperature is too far outside its sourced range.
func liquidAt(l library.Liquid, tempC float64, field string, n *Notes) (LiquidState, error) {
	T := physics.Kelvin(tempC)
	lo := math.Max(l.MinTempK-extrapolationMarginK, library.LiquidMinTempK)
	hi := math.Min(l.MaxTempK+extrapolationMarginK, library.LiquidMaxTempK)
	if !(T >= lo && T <= hi) {
		bad := &Error{}
		bad.add(field, fmt.Sprintf("outside the range in which the properties of %s are known", l.Name), "degC",
			celsiusRange(lo, hi))
		return LiquidState{}, bad
	}
	p, lines := l.Properties(T)
	for _, line := range lines {
		n.Text(line)
	}
	st := LiquidState{Key: l.Key, Density: p.Density, Viscosity: p.Viscosity, Permittivity: p.RelativePermittivity,
		RefractiveIndex: p.RefractiveIndex, Aqueous: l.Aqueous, Flammable: l.Flammable, FlashPointC: math.NaN(),
		BoilingK: l.BoilingK()}
	if l.FlashPointC != nil {
		st.FlashPointC = l.FlashPointC.Value
	}
	return st, nil
}

// materialProps are the library's properties of a particle material, NaN
// where the library has none.
type materialProps struct {
	kind, phase                                 string
	density, refrIndex, epsR, iep, hamakerWater float64
	sites                                       *library.SurfaceSites
}

func resolveMaterial(lib *library.Library, p *Particles, bad *Error) (materialProps, bool) {
	none := materialProps{density: math.NaN(), refrIndex: math.NaN(), epsR: math.NaN(), iep: math.NaN(),
		hamakerWater: math.NaN()}
	if p.Material == "" {
		return none, false
	}
	m, ok := lib.Materials[p.Material]
	if !ok {
		bad.add("/particles/material", "unknown material", "", "one of: "+joinKeys(lib.MaterialKeys()))
		return none, false
	}
	out := materialProps{kind: m.Kind, phase: m.Phase, density: m.Density.Value,
		refrIndex: valueOrNaN(m.RefractiveIndex), epsR: valueOrNaN(m.RelativePermittivity),
		iep: valueOrNaN(m.IsoelectricPH), hamakerWater: valueOrNaN(m.HamakerWater), sites: m.SurfaceSites}
	return out, true
}

func valueOrNaN(v *library.SourcedValue) float64 {
	if v == nil {
		return math.NaN()
	}
	return v.Value
}
