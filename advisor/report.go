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
}
