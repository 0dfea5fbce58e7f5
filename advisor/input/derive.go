package input

import (
	"math"
)

// derivation is what Resolve derived the ions, the surface and the zeta
// potential from: the request's medium and particles, the site-binding
// surface of the material before a measured zeta potential was fitted to
// it, and the liquid that zeta potential was measured in. It is shared,
// read-only, by the draws of one triage.
type derivation struct {
	medium     Medium
	particles  Particles
	sites      *SurfaceSites
	measuredIn *measuredIn
	iepStated  bool
}

// Drawn are the primary values of a Monte Carlo draw that Rederive derives
// from, besides those the Conditions hold themselves (pH, temperature,
// isoelectric point, radius, viscosity): a factor on every stated salt
// concentration, and the zeta potential (mV) or electrophoretic mobility
// (um cm/(V s)) as measured in its own liquid, NaN to keep the request's.
type Drawn struct {
	SaltFactor       float64
	ZetaMV, Mobility float64
}

// NominalDrawn moves nothing.
func NominalDrawn() Drawn { return Drawn{SaltFactor: 1, ZetaMV: math.NaN(), Mobility: math.NaN()} }

// Rederive recomputes what Resolve derived from the values a draw moved,
// the same way Resolve does: the ions of the medium (its salts times
// d.SaltFactor, buffers and water at the drawn pH and temperature), the
// multivalent salt, the site-binding surface (a stated isoelectric point is
// the point of zero charge of a 1-pK surface), and the zeta potential
// (measured or from mobility, carried from the liquid it was measured in,
// or estimated at the drawn pH, ions and temperature), with the surface
// state and the counter-ion valence. Rederive changes only c's own fields:
// slices and the surface are replaced, never written through.
func (c *Conditions) Rederive(d Drawn) {
	r := c.derived
	if r == nil {
		return
	}
	m := r.medium
	if m.PH != nil {
		m.PH = &c.PH
	}
	resolveElectrolyte(&m, "/medium", c, d.SaltFactor, &Error{}, nil)
	c.Sites = r.sites
	if r.iepStated && c.Sites != nil && c.Sites.Model != "silica" && c.IsoelectricPH != c.Sites.Surface.PK {
		s := *c.Sites
		s.Surface.PK = c.IsoelectricPH
		c.Sites = &s
	}
	p := r.particles
	if p.ZetaMV != nil && !math.IsNaN(d.ZetaMV) {
		p.ZetaMV = &d.ZetaMV
	}
	if p.Mobility != nil && !math.IsNaN(d.Mobility) {
		p.Mobility = &d.Mobility
	}
	meas := r.measuredIn
	if meas != nil && p.ZetaMeasuredIn.TemperatureC == nil {
		meas = resolveMeasuredIn(p.ZetaMeasuredIn, c, &Error{})
	}
	c.Zeta, c.ZetaSource, c.Henry = math.NaN(), "", math.NaN()
	c.SurfaceCharge, c.DiffusePotential = math.NaN(), math.NaN()
	resolveZeta(&p, meas, c, nil)
}
