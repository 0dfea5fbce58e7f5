package advisor

import (
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
)

// Report is the answer to one Sample. It carries no NaN or infinity: values
// that can leave float64's range are reported as log10 scales, and a scale
// that is unbounded for this sample (say, a gravitational length at exact
// density match) is left out and said so in Assumptions.
type Report struct {
	SampleID    string            `json:"sample_id,omitempty"`
	Symptom     string            `json:"symptom"`
	Versions    Versions          `json:"versions"`
	Scales      map[string]Scale  `json:"scales"`
	Causes      []Cause           `json:"causes"`
	Cautions    []string          `json:"cautions"`
	Assumptions []string          `json:"assumptions"`
	Models      map[string]string `json:"models"`
	Inputs      input.Sample      `json:"inputs"`

	// With uncertainty analysis on (analysis.draws > 0; see analysis.go).
	Consistency []Consistency `json:"consistency,omitempty"`
	MeasureNext []Measurement `json:"measure_next,omitempty"`
	RuledOut    []RuledOut    `json:"ruled_out,omitempty"`
	Analysis    *Analysis     `json:"analysis,omitempty"`

	// Trends fits the observations over time (see trends.go).
	Trends []Trend `json:"trends,omitempty"`
}

// Versions identifies the engine and the rule set that produced a report.
type Versions struct {
	Engine string `json:"engine"`
	Rules  string `json:"rules"`
}

// Scale is one computed physical scale in its reporting unit.
type Scale struct {
	Value float64 `json:"value"`
	Unit  string  `json:"unit"`
	Basis string  `json:"basis"`
}

// Cause is one ranked explanation of the complaint.
type Cause struct {
	ID          string     `json:"id"`
	Rank        int        `json:"rank"`
	Score       float64    `json:"score"`
	Title       string     `json:"title"`
	Explanation string     `json:"explanation"`
	Evidence    []Evidence `json:"evidence"`
	Remedies    []Remedy   `json:"remedies"`
	// Withheld lists the remedies of the cause left out because they
	// would change an input the request names in its constraints.
	Withheld []Withheld `json:"withheld,omitempty"`
	// Probability is the weighted share of the draws in which the cause
	// ranks first (ties split equally), Support the share in which it
	// scores above 0.3; both absent at analysis.draws 0.
	Probability *float64 `json:"probability,omitempty"`
	Support     *float64 `json:"support,omitempty"`
}

// Evidence is one number that supports (or weakens) a cause, with the rule test it entered.
type Evidence struct {
	Scale string  `json:"scale"`
	Value float64 `json:"value"`
	Unit  string  `json:"unit"`
	Test  string  `json:"test"`
}

// Remedy is one fix, with its computed target when the physics gives one.
type Remedy struct {
	ID        string         `json:"id"`
	Action    string         `json:"action"`
	Target    *remedy.Target `json:"target,omitempty"`
	Criterion string         `json:"criterion,omitempty"`
	// Interval is the central 95 % of the targets solved on the draws;
	// Feasible says whether the printed target can be reached, and Reason
	// why not. All three are absent at analysis.draws 0.
	Interval *Interval `json:"interval,omitempty"`
	Feasible *bool     `json:"feasible,omitempty"`
	Reason   string    `json:"reason,omitempty"`
}

// Withheld is a remedy left out of a cause and the constraints it would
// break.
type Withheld struct {
	ID          string   `json:"id"`
	Constraints []string `json:"constraints"`
}

// Interval is a range of values {low, high}.
type Interval struct {
	Low  float64 `json:"low"`
	High float64 `json:"high"`
}

// Consistency is one observation against what the inputs predict: the
// median and central 95 % of the prediction over the unweighted draws, and
// the verdict (consistent, above_prediction or below_prediction).
type Consistency struct {
	Observable string    `json:"observable"`
	Observed   float64   `json:"observed"`
	Predicted  Predicted `json:"predicted"`
	Unit       string    `json:"unit"`
	Verdict    string    `json:"verdict"`
}

// Predicted is a prediction over the draws.
type Predicted struct {
	Value float64 `json:"value"`
	Low   float64 `json:"low"`
	High  float64 `json:"high"`
}

// Measurement is one input worth measuring next: the first-order share of
// the top cause's variance over the draws it explains, and how to measure it.
type Measurement struct {
	Input string  `json:"input"`
	Share float64 `json:"share"`
	How   string  `json:"how"`
}

// RuledOut is a cause of the symptom that the rules considered and
// rejected, with the deciding rule and number (absent when unknown).
type RuledOut struct {
	ID     string   `json:"id"`
	Reason string   `json:"reason"`
	Scale  string   `json:"scale,omitempty"`
	Value  *float64 `json:"value,omitempty"`
	Unit   string   `json:"unit,omitempty"`
}

// Analysis records the Monte Carlo run: the draws and seed, Kish's
// effective number of draws after weighting by the observations, the share
// of the weighted draws that no cause explains, the share in which causes
// tie for first, whether any draw agrees with the observations, and the
// inputs the observations move most from their nominal values (their mean
// shift in standard uncertainties over the weighted draws; when no draw
// agrees, over the best-agreeing tenth: the inputs whose plausible range
// comes closest), and every drawn input.
type Analysis struct {
	Draws             int              `json:"draws"`
	Seed              uint64           `json:"seed"`
	EffectiveDraws    float64          `json:"effective_draws"`
	Unexplained       float64          `json:"unexplained"`
	Tied              float64          `json:"tied"`
	ObservationsAgree bool             `json:"observations_agree"`
	ClosestInputs     []InputShift     `json:"closest_inputs,omitempty"`
	Inputs            []UncertainInput `json:"inputs"`
}

// InputShift is how far an input moved from its nominal value, in
// standard uncertainties.
type InputShift struct {
	Input   string  `json:"input"`
	ShiftSD float64 `json:"shift_sd"`
}

// UncertainInput is one drawn input: its provenance, nominal value and
// standard uncertainty (sd in the field's unit, or a lognormal factor),
// and where the uncertainty came from.
type UncertainInput struct {
	Input      string  `json:"input"`
	Provenance string  `json:"provenance"`
	Nominal    float64 `json:"nominal"`
	SD         float64 `json:"sd,omitempty"`
	Factor     float64 `json:"factor,omitempty"`
	Source     string  `json:"source"`
}
