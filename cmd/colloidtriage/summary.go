package main

import (
	"encoding/json"
	"fmt"
	"io"
	"strconv"
	"strings"
)

// summaryReport is the part of a triage report the text summary prints.
// The uncertainty members (probability, support, interval, feasible,
// measure_next, consistency, ruled_out) are optional: printed when present.
type summaryReport struct {
	SampleID string `json:"sample_id"`
	Symptom  string `json:"symptom"`
	Versions struct {
		Engine string `json:"engine"`
		Rules  string `json:"rules"`
	} `json:"versions"`
	Causes []struct {
		ID          string   `json:"id"`
		Rank        int      `json:"rank"`
		Score       float64  `json:"score"`
		Probability *float64 `json:"probability"`
		Title       string   `json:"title"`
		Explanation string   `json:"explanation"`
		Evidence    []struct {
			Scale string  `json:"scale"`
			Value float64 `json:"value"`
			Unit  string  `json:"unit"`
		} `json:"evidence"`
		Remedies []struct {
			Action   string        `json:"action"`
			Target   *targetText   `json:"target"`
			Feasible *bool         `json:"feasible"`
			Reason   string        `json:"reason"`
			Interval *intervalText `json:"interval"`
		} `json:"remedies"`
	} `json:"causes"`
	MeasureNext []struct {
		Input string   `json:"input"`
		Share *float64 `json:"share"`
		How   string   `json:"how"`
	} `json:"measure_next"`
	RuledOut []struct {
		ID     string `json:"id"`
		Reason string `json:"reason"`
	} `json:"ruled_out"`
	Cautions  []string `json:"cautions"`
	RequestID string   `json:"request_id"`
}

type targetText struct {
	Quantity string        `json:"quantity"`
	Op       string        `json:"op"`
	Value    float64       `json:"value"`
	Unit     string        `json:"unit"`
	Interval *intervalText `json:"interval"`
	Feasible *bool         `json:"feasible"`
	Reason   string        `json:"reason"`
}

type intervalText struct {
	Low  float64 `json:"low"`
	High float64 `json:"high"`
}

// Limits of the summary: a ticket wants the top of the ranking.
const (
	summaryCauses   = 3
	summaryEvidence = 4
)

// writeSummary prints a triage report as plain text for a support ticket:
// the top causes with score (and probability when the report has one), the
// key evidence, the remedies with their targets, what to measure next, what
// was ruled out, and the cautions.
func writeSummary(w io.Writer, body []byte) error {
	var r summaryReport
	if err := json.Unmarshal(body, &r); err != nil {
		return fmt.Errorf("reading the report: %w", err)
	}
	id := r.SampleID
	if id == "" {
		id = "(no sample id)"
	}
	fmt.Fprintf(w, "Sample %s, symptom %s\n", id, strings.ReplaceAll(r.Symptom, "_", " "))
	fmt.Fprintf(w, "Engine %s, rules %s\n", r.Versions.Engine, r.Versions.Rules)
	if len(r.Causes) == 0 {
		fmt.Fprintln(w, "\nNo cause fired for this symptom.")
	}
	for i, c := range r.Causes {
		if i == summaryCauses {
			fmt.Fprintf(w, "\n(%d more causes in the JSON report: --format json)\n", len(r.Causes)-summaryCauses)
			break
		}
		fmt.Fprintf(w, "\n%d. %s [%s]  score %s", c.Rank, c.Title, c.ID, short(c.Score))
		if c.Probability != nil {
			fmt.Fprintf(w, ", probability %s", percent(*c.Probability))
		}
		fmt.Fprintln(w)
		fmt.Fprintf(w, "   %s\n", c.Explanation)
		for k, e := range c.Evidence {
			if k == summaryEvidence {
				break
			}
			fmt.Fprintf(w, "   - %s = %s %s\n", strings.ReplaceAll(e.Scale, "_", " "), short(e.Value), unitText(e.Unit))
		}
		for _, m := range c.Remedies {
			t := m.Target
			feasible, reason, iv := m.Feasible, m.Reason, m.Interval
			if t != nil {
				if feasible == nil {
					feasible, reason = t.Feasible, t.Reason
				}
				if iv == nil {
					iv = t.Interval
				}
			}
			mark := "Remedy"
			if feasible != nil && !*feasible {
				mark = "Remedy (not feasible)"
			}
			fmt.Fprintf(w, "   %s: %s\n", mark, m.Action)
			if t != nil && (iv != nil || !strings.Contains(m.Action, t.Quantity)) {
				fmt.Fprintf(w, "     target %s %s %s %s", t.Quantity, t.Op, short(t.Value), unitText(t.Unit))
				if iv != nil {
					fmt.Fprintf(w, " (over the inputs' uncertainty %s to %s)", short(iv.Low), short(iv.High))
				}
				fmt.Fprintln(w)
			}
			if feasible != nil && !*feasible && reason != "" {
				fmt.Fprintf(w, "     why not: %s\n", reason)
			}
		}
	}
	if len(r.MeasureNext) > 0 {
		fmt.Fprintln(w, "\nMeasure next:")
		for _, m := range r.MeasureNext {
			share := ""
			if m.Share != nil {
				share = " (" + percent(*m.Share) + ")"
			}
			fmt.Fprintf(w, "- %s%s: %s\n", m.Input, share, m.How)
		}
	}
	if len(r.RuledOut) > 0 {
		fmt.Fprintln(w, "\nRuled out:")
		for _, o := range r.RuledOut {
			fmt.Fprintf(w, "- %s: %s\n", o.ID, o.Reason)
		}
	}
	if len(r.Cautions) > 0 {
		fmt.Fprintln(w, "\nCautions:")
		for _, c := range r.Cautions {
			fmt.Fprintf(w, "- %s\n", c)
		}
	}
	return nil
}

// writeProblem prints a problem detail as text: its title and detail, then
// one line per field with the reason and the valid range.
func writeProblem(w io.Writer, body []byte) {
	var p struct {
		Title  string `json:"title"`
		Detail string `json:"detail"`
		Errors []struct {
			Pointer string `json:"pointer"`
			Reason  string `json:"reason"`
			Unit    string `json:"unit"`
			Valid   string `json:"valid"`
		} `json:"errors"`
	}
	if err := json.Unmarshal(body, &p); err != nil || p.Title == "" {
		fmt.Fprintf(w, "refused: %s\n", strings.TrimSpace(string(body)))
		return
	}
	fmt.Fprintf(w, "refused: %s", p.Title)
	if p.Detail != "" {
		fmt.Fprintf(w, ": %s", p.Detail)
	}
	fmt.Fprintln(w)
	for _, e := range p.Errors {
		fmt.Fprintf(w, "  %s: %s", e.Pointer, e.Reason)
		if e.Valid != "" {
			fmt.Fprintf(w, " (valid: %s %s)", e.Valid, unitText(e.Unit))
		}
		fmt.Fprintln(w)
	}
}

// short prints a number with at most four significant digits.
func short(v float64) string { return strconv.FormatFloat(v, 'g', 4, 64) }

func percent(share float64) string { return strconv.FormatFloat(100*share, 'f', 0, 64) + " %" }

// unitText leaves the dimensionless unit "1" out.
func unitText(u string) string {
	if u == "1" {
		return ""
	}
	return u
}
