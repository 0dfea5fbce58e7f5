package input

import (
	"fmt"

	"colloidtriage/advisor/library"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// resolveSites builds the site-binding surface of a library material in an
// aqueous medium, with the material's ion pairs of monovalent electrolyte
// ions and its slip plane where the library sources them; a stated
// isoelectric point replaces a 1-pK surface's point of zero charge (the two
// coincide without specific adsorption).
func resolveSites(lib *library.SurfaceSites, iep *float64, aqueous bool) *SurfaceSites {
	if lib == nil || !aqueous {
		return nil
	}
	s := &SurfaceSites{Model: lib.Model, Surface: physics.SiteSurface{SiteDensity: lib.SiteDensity.Value,
		PK: lib.PK.Value, SternCapacitance: lib.SternCapacitance.Value}}
	pkSource := lib.PK.Source
	var name, pkName string
	switch lib.Model {
	case "silica":
		s.Surface.DeprotonatedCharge = -1
		name, pkName = "the silica basic Stern model (Behrens & Grier 2001; silanols SiOH = SiO- + H+)", "silanol pK"
	default:
		s.Surface.DeprotonatedCharge = -0.5
		name, pkName = "the 1-pK basic Stern model (Hiemstra, Van Riemsdijk & Bolt 1989)", "point of zero charge"
		if iep != nil {
			s.Surface.PK, pkSource = *iep, "particles.isoelectric_ph"
		}
	}
	pairs := ", no ion pairs"
	for _, p := range []struct {
		valence int
		v       *library.SourcedValue
		what    string
	}{{1, lib.CationPairLogK, "cation"}, {-1, lib.AnionPairLogK, "anion"}} {
		if p.v == nil {
			continue
		}
		if len(s.Surface.Pairs) == 0 {
			pairs = ""
		}
		s.Surface.Pairs = append(s.Surface.Pairs, physics.IonPair{Valence: p.valence, LogK: p.v.Value})
		pairs += fmt.Sprintf(", monovalent %s ion pairs log K %s (%s)", p.what, number.Shortest(p.v.Value), p.v.Source)
	}
	slip := ", zeta at the head end of the diffuse layer"
	if lib.SlipDistance != nil {
		s.Surface.SlipDistance = lib.SlipDistance.Value
		slip = fmt.Sprintf(", zeta at a slip plane %s outside the head end of the diffuse layer (%s)",
			number.Quantity(lib.SlipDistance.Value*1e9, "nm"), lib.SlipDistance.Source)
	}
	s.Basis = fmt.Sprintf("%s with site density %s (%s), %s %s (%s), Stern capacitance %s (%s)%s, diffuse layer by the Grahame equation%s",
		name, number.Quantity(s.Surface.SiteDensity*1e-18, "nm^-2"), lib.SiteDensity.Source,
		pkName, number.Shortest(s.Surface.PK), pkSource,
		number.Quantity(s.Surface.SternCapacitance, "F/m^2"), lib.SternCapacitance.Source, pairs, slip)
	return s
}
