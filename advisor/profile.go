package advisor

import (
	"fmt"
	"math"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

// Bounds and default of the number of points of an interaction profile. The
// lower bound keeps the curve's shape recognisable on a logarithmic grid; the
// upper bound keeps a response under about 250 kB.
const (
	ProfilePointsDefault = 200
	ProfilePointsMin     = 20
	ProfilePointsMax     = 2000
)

// Profile is the total interaction energy of two median particles of a
// sample against their surface separation, with its parts, its barrier and
// secondary minimum, and the record of how it was computed. Energies are in
// kT at the storage temperature, separations in nm; no value is NaN or
// infinite (non-finite points are left out and said so in Assumptions).
type Profile struct {
	SampleID         string            `json:"sample_id,omitempty"`
	Versions         Versions          `json:"versions"`
	Units            ProfileUnits      `json:"units"`
	Pair             ProfilePair       `json:"pair"`
	Points           []ProfilePoint    `json:"points"`
	Barrier          *ProfileExtremum  `json:"barrier"`
	SecondaryMinimum *ProfileExtremum  `json:"secondary_minimum"`
	Models           map[string]string `json:"models"`
	Assumptions      []string          `json:"assumptions"`
}

// ProfileUnits names the units of the curve and gives the thermal energy
// kT in zJ (1e-21 J) at the storage temperature, to convert back to joules.
type ProfileUnits struct {
	Separation   string  `json:"separation"`
	Energy       string  `json:"energy"`
	KTZJ         float64 `json:"kT_zJ"`
	TemperatureC float64 `json:"temperature_c"`
}

// ProfilePair is what the curve was computed for. DebyeLengthNm is absent
// without electrolyte (no double layer), DepletionRangeNm without a
// depletant. ClosestApproachBy says what sets the start of the curve:
// ContactBorn or ContactSteric.
type ProfilePair struct {
	RadiusNm          float64  `json:"radius_nm"`
	HamakerZJ         float64  `json:"hamaker_zJ"`
	ZetaMV            float64  `json:"zeta_mV"`
	DebyeLengthNm     *float64 `json:"debye_length_nm,omitempty"`
	CounterIonValence int      `json:"counter_ion_valence"`
	ClosestApproachNm float64  `json:"closest_approach_nm"`
	ClosestApproachBy string   `json:"closest_approach_by"`
	DepletionRangeNm  *float64 `json:"depletion_range_nm,omitempty"`
}

// ProfilePoint is the energy and its parts at one surface separation.
// DepletionKT is present only when free polymer causes depletion.
type ProfilePoint struct {
	SeparationNm  float64  `json:"separation_nm"`
	TotalKT       float64  `json:"total_kT"`
	VanDerWaalsKT float64  `json:"van_der_waals_kT"`
	DoubleLayerKT float64  `json:"double_layer_kT"`
	DepletionKT   *float64 `json:"depletion_kT,omitempty"`
}

// ProfileExtremum marks the barrier or the secondary minimum.
// AtClosestApproach says that the energy is highest at the closest approach
// (it only falls from there), so the barrier is the energy at contact.
type ProfileExtremum struct {
	EnergyKT          float64 `json:"energy_kT"`
	SeparationNm      float64 `json:"separation_nm"`
	AtClosestApproach bool    `json:"at_closest_approach,omitempty"`
}

// What sets the closest approach of a profile.
const (
	ContactBorn   = "born_hydration_cutoff" // physics.MinimumSeparation
	ContactSteric = "steric_layers"         // twice the adsorbed layer thickness
)

// zetaNeeded is the problem of a sample whose double layer cannot be set up.
var zetaNeeded = input.FieldProblem{Pointer: "/particles/zeta_mV",
	Reason: "needed for the interaction profile: give zeta_mV, mobility_um_cm_per_V_s, or medium.ph with " +
		"particles.isoelectric_ph or a material with an isoelectric point",
	Unit: "mV", Valid: "-300 <= value <= 300"}

// Profile evaluates a validated sample as Triage does and returns the
// interaction energy curve of two median particles on points log-spaced
// separations (physics.SeparationGrid). It returns an *input.Error when the
// sample is inconsistent or no surface potential is known. It panics when
// points is outside [ProfilePointsMin, ProfilePointsMax] (the caller checks
// the request).
func (e *Engine) Profile(s *input.Sample, points int) (*Profile, error) {
	if points < ProfilePointsMin || points > ProfilePointsMax {
		panic(fmt.Sprintf("advisor: Profile needs %d to %d points, got %d", ProfilePointsMin, ProfilePointsMax, points))
	}
	ev, err := e.evaluate(s)
	if err != nil {
		return nil, err
	}
	if !ev.hasPair {
		return nil, &input.Error{Problems: []input.FieldProblem{zetaNeeded}}
	}
	p := ev.profile(points)
	p.SampleID = s.SampleID
	p.Versions = Versions{Engine: EngineVersion, Rules: e.rules.Hash}
	return p, nil
}

// profile samples ev.pair, the pair the scales were computed for, so that
// the curve's barrier is the report's energy_barrier.
func (ev *evaluation) profile(points int) *Profile {
	pair := ev.pair
	kT := physics.Boltzmann * pair.TempK
	grid := physics.SeparationGrid(pair, points)
	depletion := pair.DepletionRange > 0 && pair.DepletionDensity > 0
	notes := append([]string(nil), ev.notes.List()...)
	note := func(format string, args ...any) { notes = append(notes, fmt.Sprintf(format, args...)) }

	pts, skipped := samplePoints(pair, grid, depletion)

	lo, hi := grid[0], grid[len(grid)-1]
	contact, contactBy := "Born/hydration cut-off, "+number.Quantity(lo*1e9, "nm"), ContactBorn
	if 2*pair.StericThickness > physics.MinimumSeparation {
		contact = "hard wall of the steric layers at twice their thickness, " + number.Quantity(lo*1e9, "nm")
		contactBy = ContactSteric
	}
	note("interaction profile: two median particles, %d separations log-spaced from the closest approach (%s) "+
		"to %s (the largest of 50 nm, 30 Debye lengths capped at 10 radii, 3 depletion ranges and 10 times the start)",
		points, contact, number.Quantity(hi*1e9, "nm"))
	note("energies in kT at the storage temperature, kT = %.4g J", kT)
	if pair.Kappa == 0 {
		note("no electrolyte: no double layer, the profile is attraction only")
	}
	if skipped > 0 {
		note("%d of %d points with a non-finite energy left out of the profile", skipped, points)
	}

	out := &Profile{
		Units: ProfileUnits{Separation: "nm", Energy: "kT", KTZJ: number.Round(kT*1e21, 6),
			TemperatureC: number.Round(pair.TempK-physics.CelsiusZero, 6)},
		Pair:   ev.profilePair(lo, contactBy),
		Points: pts,
		Models: map[string]string{"van_der_waals": ev.models["van_der_waals"], "double_layer": ev.models["double_layer"],
			"closest_approach": contact},
		Assumptions: notes,
	}
	if depletion {
		out.Models["depletion"] = ev.models["depletion"]
	}
	b, m := pair.Extrema()
	if b.Found {
		// Pair.Extrema polishes the grid's highest point by Newton steps
		// on the closed-form slope in ln h, bisecting the bracket when a
		// step leaves it. A maximum at the closest approach stays on that
		// grid point, or the bracket closes on it to 1e-9 in ln h: 1e-4
		// relative is a wide margin for "at the closest approach".
		out.Barrier = &ProfileExtremum{EnergyKT: number.Round(b.Energy/kT, 6),
			SeparationNm: number.Round(b.Separation*1e9, 6), AtClosestApproach: b.Separation <= lo*(1+1e-4)}
		if out.Barrier.AtClosestApproach {
			note("the total energy is highest at the closest approach: the barrier given is the energy at contact")
		}
	} else {
		note("the total energy has no maximum above 0 kT inside the range: no barrier to aggregation")
	}
	if m.Found {
		out.SecondaryMinimum = &ProfileExtremum{EnergyKT: number.Round(m.Energy/kT, 6),
			SeparationNm: number.Round(m.Separation*1e9, 6)}
	}
	return out
}

// samplePoints evaluates the pair's energy and its parts on the grid in kT,
// to 6 significant digits, leaving out non-finite points.
func samplePoints(pair physics.Pair, grid []float64, depletion bool) (pts []ProfilePoint, skipped int) {
	kT := physics.Boltzmann * pair.TempK
	// One backing array for the optional depletion values instead of one
	// allocation per point.
	var depletionKT []float64
	if depletion {
		depletionKT = make([]float64, len(grid))
	}
	pts = make([]ProfilePoint, 0, len(grid))
	for i, h := range grid {
		vdw, edl, dep := pair.Parts(h)
		pt := ProfilePoint{SeparationNm: number.Round(h*1e9, 6), TotalKT: number.Round((vdw+edl+dep)/kT, 6),
			VanDerWaalsKT: number.Round(vdw/kT, 6), DoubleLayerKT: number.Round(edl/kT, 6)}
		if !finite(pt.TotalKT, pt.VanDerWaalsKT, pt.DoubleLayerKT, dep/kT) {
			skipped++
			continue
		}
		if depletion {
			depletionKT[i] = number.Round(dep/kT, 6)
			pt.DepletionKT = &depletionKT[i]
		}
		pts = append(pts, pt)
	}
	return pts, skipped
}

func (ev *evaluation) profilePair(closest float64, by string) ProfilePair {
	p := ev.pair
	pp := ProfilePair{RadiusNm: number.Round(p.Radius*1e9, 6), HamakerZJ: number.Round(p.Hamaker*1e21, 6),
		ZetaMV: number.Round(p.Potential*1e3, 6), CounterIonValence: max(p.Valence, 1),
		ClosestApproachNm: number.Round(closest*1e9, 6), ClosestApproachBy: by}
	if p.Kappa > 0 {
		v := number.Round(1/p.Kappa*1e9, 6)
		pp.DebyeLengthNm = &v
	}
	if p.DepletionRange > 0 && p.DepletionDensity > 0 {
		v := number.Round(p.DepletionRange*1e9, 6)
		pp.DepletionRangeNm = &v
	}
	return pp
}

func finite(vs ...float64) bool {
	for _, v := range vs {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return false
		}
	}
	return true
}
