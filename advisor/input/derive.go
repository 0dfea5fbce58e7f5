package input

import (
	"math"

	"colloidtriage/physics"
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
// concentration, the concentration of the multivalent salt alone (mol/m^3;
// a remedy's trial value, the other ions kept), and the zeta potential (mV)
// or electrophoretic mobility (um cm/(V s)) as measured in its own liquid;
// NaN keeps the request's (for the multivalent salt, SaltFactor's).
type Drawn struct {
	SaltFactor                        float64
	MultivalentConc, ZetaMV, Mobility float64
}

// NominalDrawn moves nothing.
func NominalDrawn() Drawn {
	return Drawn{SaltFactor: 1, MultivalentConc: math.NaN(), ZetaMV: math.NaN(), Mobility: math.NaN()}
}

// Rederive recomputes what Resolve derived from the values a draw moved,
// the same way Resolve does: the ions of the medium (its salts times
// d.SaltFactor, the multivalent salt at d.MultivalentConc when given,
// buffers and water at the drawn pH and temperature), the multivalent salt, the site-binding surface (a stated isoelectric point is
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
	c.drawn = &d
	m := r.medium
	if m.PH != nil {
		m.PH = &c.PH
	}
	resolveElectrolyte(&m, "/medium", c, d.SaltFactor, &Error{}, nil)
	if !math.IsNaN(d.MultivalentConc) && c.MultivalentSalt != "" {
		c.MultivalentConc = math.Max(d.MultivalentConc, 0)
		c.Ions = c.IonsWithMultivalent(c.MultivalentConc)
		c.IonicStrength = physics.IonicStrength(c.Ions)
		if c.Liquid.Aqueous && m.PH == nil {
			c.IonicStrength = max(c.IonicStrength, AutoionisationMolM3)
		}
	}
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

// Salts re-derives copies of one Conditions with their salts changed, for
// a remedy's search: see Salts.With.
type Salts struct {
	c      *Conditions
	anchor *anchorMemo
}

// anchorMemo is the site model's slip-plane potential in the anchor liquid
// of the zeta estimate (see anchoredEstimate) at pH, which no change of the
// product's salts moves: Salts works it out once.
type anchorMemo struct {
	pH, zeta float64
	set      bool
}

// Salts returns the re-deriver of copies of c with changed salts.
func (c *Conditions) Salts() *Salts { return &Salts{c: c, anchor: &anchorMemo{}} }

// With is a copy of the Conditions re-derived by Rederive from the values of
// their own draw (none for the nominal conditions) with every stated salt
// scaled by scale more and, unless multivalentConc is NaN, the multivalent
// salt at multivalentConc (mol/m^3): the ions, the multivalent salt and the
// zeta potential the conditions would have with those salts. The
// Conditions are not changed.
func (s *Salts) With(scale, multivalentConc float64) *Conditions {
	d := NominalDrawn()
	if s.c.drawn != nil {
		d = *s.c.drawn
	}
	d.SaltFactor *= scale
	d.MultivalentConc = multivalentConc
	out := *s.c
	out.anchor = s.anchor
	out.Rederive(d)
	out.anchor = nil
	return &out
}
