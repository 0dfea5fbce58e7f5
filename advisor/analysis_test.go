package advisor_test

import (
	"bytes"
	"encoding/json"
	"errors"
	"math"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/uncertainty"
)

func engine(t *testing.T) *advisor.Engine {
	t.Helper()
	e, err := demoEngine()
	if err != nil {
		t.Fatal(err)
	}
	return e
}

func decode(t *testing.T, text string) *input.Sample {
	t.Helper()
	var s input.Sample
	dec := json.NewDecoder(bytes.NewReader([]byte(text)))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&s); err != nil {
		t.Fatal(err)
	}
	return &s
}

// exactBut holds every input exact (uncertainty 0) except those given.
func exactBut(keep map[string]input.Spread) input.Uncertainty {
	u := input.Uncertainty{}
	for _, p := range uncertainty.Paths() {
		u[p] = input.Spread{}
	}
	for p, s := range keep {
		u[p] = s
	}
	return u
}

func probability(r *advisor.Report, id string) float64 {
	for _, c := range r.Causes {
		if c.ID == id && c.Probability != nil {
			return *c.Probability
		}
	}
	return 0
}

// A silica sol just on the stable side of the low-charge rule (50 nm,
// measured zeta -33 mV, 5 mM NaCl: barrier 18 kT; at -28 mV it is 12 kT
// and low_surface_charge fires): as the stated uncertainty of zeta, its
// only uncertain input, grows, more draws fall below 30 mV, and the
// probability of low_surface_charge rises smoothly. The draws share their
// deviates (one input, one seed), so the rise is monotone but for the few
// draws that cross into other causes' ground (zeta near 0 or beyond
// -45 mV): no step of 1 mV may lower it by more than 0.03 or raise it by
// more than 0.15.
const nearThreshold = `{"symptom":"flocculation","particles":{"material":"silica_amorphous","diameter_nm":50,"volume_fraction":0.1,"zeta_mV":-33},
 "medium":{"liquid":"water","ph":7,"electrolytes":[{"formula":"NaCl","concentration_mM":5}]},"analysis":{"seed":7}}`

func TestProbabilitySmoothInZetaUncertainty(t *testing.T) {
	t.Parallel()
	e := engine(t)
	prev, first, last := -1.0, 0.0, 0.0
	for sd := 0.5; sd <= 12; sd++ {
		s := decode(t, nearThreshold)
		s.Uncertainty = exactBut(map[string]input.Spread{"particles.zeta_mV": {SD: sd}})
		r, err := e.Triage(s)
		if err != nil {
			t.Fatal(err)
		}
		if len(r.Analysis.Inputs) != 1 || r.Analysis.Inputs[0].Input != "particles.zeta_mV" {
			t.Fatalf("drawn inputs %+v, want zeta only", r.Analysis.Inputs)
		}
		p := probability(r, r.Causes[0].ID)
		top := probability(r, "low_surface_charge")
		t.Logf("sd %g mV: P(low_surface_charge) = %g", sd, top)
		if prev >= 0 && (top < prev-0.03 || top-prev > 0.15) {
			t.Errorf("sd %g mV: P(low_surface_charge) = %g after %g: not a smooth rise", sd, top, prev)
		}
		if prev < 0 {
			first = top
		}
		prev, last = top, top
		if p <= 0 {
			t.Errorf("sd %g mV: the top cause %s has probability %g", sd, r.Causes[0].ID, p)
		}
	}
	if !(last > first+0.1) {
		t.Errorf("P(low_surface_charge) from %g to %g: the uncertainty should move it", first, last)
	}
}

// Identical input gives byte-identical output, the seed derived from the
// request.
func TestAnalysisReproducible(t *testing.T) {
	t.Parallel()
	e := engine(t)
	var out [2][]byte
	for i := range out {
		r, err := e.Triage(loadDemo(t, demoDir+"/electrostatic_screening.json"))
		if err != nil {
			t.Fatal(err)
		}
		if out[i], err = json.Marshal(r); err != nil {
			t.Fatal(err)
		}
	}
	if !bytes.Equal(out[0], out[1]) {
		t.Error("two triages of the same request differ")
	}
}

// Flocs within 3 days of a silica sol whose estimated zeta potential
// (-48 mV from pH 6 and the library's isoelectric point) gives a nominal
// barrier of about 53 kT: the observation contradicts the nominal inputs.
// The report names the estimated zeta potential as the input the
// observation pulls, and ranks a colloidal cause, not
// outside_colloidal_physics, first.
const contradicted = `{"symptom":"flocculation","particles":{"material":"silica_amorphous","diameter_nm":60,"volume_fraction":0.1},
 "medium":{"liquid":"water","ph":6,"electrolytes":[{"formula":"NaCl","concentration_mM":1}]},
 "observation":{"age_days":3}}`

func TestObservationContradictingInputs(t *testing.T) {
	t.Parallel()
	r, err := engine(t).Triage(decode(t, contradicted))
	if err != nil {
		t.Fatal(err)
	}
	if b := r.Scales["energy_barrier"].Value; b < 40 {
		t.Fatalf("nominal barrier %g kT: the case needs a high one", b)
	}
	if r.Causes[0].ID == "outside_colloidal_physics" {
		t.Errorf("outside_colloidal_physics ranks first against an observation of flocs in 3 days")
	}
	named := map[string]bool{}
	for _, s := range r.Analysis.ClosestInputs {
		named[s.Input] = true
	}
	if !named["particles.zeta_mV"] {
		t.Errorf("closest inputs %+v do not name the estimated zeta potential", r.Analysis.ClosestInputs)
	}
	if len(r.Consistency) != 1 || r.Consistency[0].Observable != "flocs_by_age" {
		t.Errorf("consistency %+v, want the flocs observation", r.Consistency)
	}
}

// The measured zeta potential (-55 mV) of the outside_colloidal_physics
// demo leaves a barrier of about 160 kT in every draw: flocculation by 120
// days contradicts every draw, so the report says so, names what comes
// closest, and gives outside_colloidal_physics no probability.
func TestNoDrawAgrees(t *testing.T) {
	t.Parallel()
	r, err := engine(t).Triage(loadDemo(t, demoDir+"/outside_colloidal_physics.json"))
	if err != nil {
		t.Fatal(err)
	}
	if r.Analysis.ObservationsAgree {
		t.Fatal("some draw agrees with flocs by 120 days at a 160 kT barrier")
	}
	if p := probability(r, "outside_colloidal_physics"); p != 0 || r.Analysis.Unexplained != 1 {
		t.Errorf("P(outside) = %g, unexplained %g; want 0 and 1", p, r.Analysis.Unexplained)
	}
	if len(r.Analysis.ClosestInputs) == 0 || r.Analysis.ClosestInputs[0].Input != "particles.zeta_mV" {
		t.Errorf("closest inputs %+v, want the zeta potential first", r.Analysis.ClosestInputs)
	}
}

// Over every demo the probabilities of the causes and the unexplained share
// sum to 1.
func TestProbabilitiesSumToOne(t *testing.T) {
	t.Parallel()
	e := engine(t)
	for _, dc := range demoCases(t) {
		r, err := e.Triage(loadDemo(t, dc.path))
		if err != nil {
			t.Fatal(err)
		}
		sum := r.Analysis.Unexplained
		for _, c := range r.Causes {
			sum += *c.Probability
		}
		// each share is rounded to 3 decimals
		if math.Abs(sum-1) > 0.0005*float64(len(r.Causes)+1) {
			t.Errorf("%s: probabilities sum to %g", dc.name, sum)
		}
	}
}

// TestRuledOutOncePerCause: every cause the rules of the symptom consider
// and reject is listed once, and never one that is reported.
func TestRuledOutOncePerCause(t *testing.T) {
	t.Parallel()
	e := engine(t)
	for _, dc := range demoCases(t) {
		r, err := e.Triage(loadDemo(t, dc.path))
		if err != nil {
			t.Fatal(err)
		}
		seen := map[string]bool{}
		for _, c := range r.Causes {
			seen[c.ID] = true
		}
		for _, ro := range r.RuledOut {
			if seen[ro.ID] {
				t.Errorf("%s: %s is ruled out twice or also reported", dc.name, ro.ID)
			}
			seen[ro.ID] = true
		}
	}
}

// A synthetic case where two inputs are uncertain: the zeta potential, on
// the edge of the low-charge rule, and the container height, which no
// charge rule reads. measure_next ranks zeta first.
func TestMeasureNextRanksDecisiveInput(t *testing.T) {
	t.Parallel()
	s := decode(t, nearThreshold)
	s.Uncertainty = exactBut(map[string]input.Spread{"particles.zeta_mV": {SD: 5},
		"storage.container_height_mm": {Factor: 1.5}})
	r, err := engine(t).Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	if len(r.MeasureNext) == 0 || r.MeasureNext[0].Input != "particles.zeta_mV" {
		t.Fatalf("measure_next %+v, want the zeta potential first", r.MeasureNext)
	}
	if r.MeasureNext[0].Share < 0.5 {
		t.Errorf("zeta explains %g of the top cause's variance, want most", r.MeasureNext[0].Share)
	}
}

// An uncertainty for a path that is no input is a 422 with its pointer.
func TestUnknownUncertaintyPath(t *testing.T) {
	t.Parallel()
	s := decode(t, nearThreshold)
	s.Uncertainty = input.Uncertainty{"particles.colour": {SD: 1}}
	_, err := engine(t).Triage(s)
	var bad *input.Error
	if !errors.As(err, &bad) || len(bad.Problems) != 1 || bad.Problems[0].Pointer != "/uncertainty/particles.colour" {
		t.Fatalf("error %v, want one problem at /uncertainty/particles.colour", err)
	}
}

// Remedy targets carry an interval and feasibility, and the printed target
// lies within the interval's side that makes it hold in 95 % of the draws.
func TestRemedyIntervals(t *testing.T) {
	t.Parallel()
	r, err := engine(t).Triage(loadDemo(t, demoDir+"/electrostatic_screening.json"))
	if err != nil {
		t.Fatal(err)
	}
	seen := 0
	for _, c := range r.Causes {
		for _, m := range c.Remedies {
			if m.Target == nil {
				continue
			}
			seen++
			if m.Interval == nil || m.Feasible == nil || m.Interval.Low > m.Interval.High {
				t.Errorf("%s/%s: interval %+v feasible %v", c.ID, m.ID, m.Interval, m.Feasible)
			}
		}
	}
	if seen == 0 {
		t.Fatal("no remedy target")
	}
}

// At analysis.draws 0 the report has none of the analysis' fields.
func TestDrawsZeroIsNominal(t *testing.T) {
	t.Parallel()
	s := loadDemo(t, demoDir+"/electrostatic_screening.json")
	zero := 0
	s.Analysis = &input.Analysis{Draws: &zero}
	r, err := engine(t).Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	if r.Analysis != nil || r.Causes[0].Probability != nil || r.Consistency != nil || r.RuledOut != nil || r.MeasureNext != nil {
		t.Error("draws 0 reports analysis fields")
	}
}

// With every input held exact, each draw is the nominal evaluation: the
// draws derive the ions and the zeta potential (carried, estimated or from
// mobility) the same way Resolve does, so the top cause at draws 0 ranks
// first in every draw, on every demo.
func TestExactDrawsAreNominal(t *testing.T) {
	t.Parallel()
	e := engine(t)
	zero := 0
	for _, dc := range demoCases(t) {
		s := loadDemo(t, dc.path)
		s.Analysis = &input.Analysis{Draws: &zero}
		nominal, err := e.Triage(s)
		if err != nil {
			t.Fatal(err)
		}
		draws := 50
		s.Analysis = &input.Analysis{Draws: &draws}
		s.Uncertainty = exactBut(nil)
		r, err := e.Triage(s)
		if err != nil {
			t.Fatal(err)
		}
		top := nominal.Causes[0]
		tied := 0
		for _, c := range nominal.Causes {
			if c.Score == top.Score {
				tied++
			}
		}
		got := probability(r, top.ID)
		if top.ID == "outside_colloidal_physics" {
			got += r.Analysis.Unexplained
		}
		if want := math.Round(1000/float64(tied)) / 1000; math.Abs(got-want) > 1e-9 {
			t.Errorf("%s: exact draws give %s probability %g, want %g", dc.name, top.ID, got, want)
		}
	}
}
