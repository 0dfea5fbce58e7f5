package main

import (
	"encoding/json"
	"os"
	"strings"
	"testing"
)

// TestTriageText: --format text gives a ticket summary with the top cause,
// its score, evidence and remedy targets and the cautions; a refused sample
// gives the problem as text, ending with a newline.
func TestTriageText(t *testing.T) {
	demo, err := os.ReadFile("../../testdata/demo/electrostatic_screening.json")
	if err != nil {
		t.Fatal(err)
	}
	code, out, errOut := run(t, string(demo), "triage", "--format", "text", "-")
	if code != exitOK {
		t.Fatalf("triage --format text: %d %s", code, errOut)
	}
	// The summary restates the JSON report of the same sample: its first
	// remedy's target, as the report prints it.
	_, js, _ := run(t, string(demo), "triage", "--format", "json", "-")
	var report struct {
		Causes []struct {
			Remedies []struct {
				Action string `json:"action"`
			} `json:"remedies"`
		} `json:"causes"`
	}
	if err := json.Unmarshal([]byte(js), &report); err != nil || len(report.Causes) == 0 || len(report.Causes[0].Remedies) == 0 {
		t.Fatalf("JSON report: %v %.200s", err, js)
	}
	_, target, _ := strings.Cut(report.Causes[0].Remedies[0].Action, ": ")
	target = strings.TrimSuffix(target, ".")
	for _, want := range []string{
		"Sample ZENTHARO-TIO2NANO-PC44, symptom settling",
		"1. Salt has screened the electrostatic repulsion [electrostatic_screening]  score 0.899",
		"- ionic strength = 60.16 mM",
		target,
		"Cautions:",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("summary lacks %q:\n%s", want, out)
		}
	}
	code, _, errOut = run(t, `{"symptom":"settling","particles":{"diameter_nm":0.1}}`, "triage", "--format", "text", "-")
	if code != exitBadInput || !strings.Contains(errOut, "/particles/diameter_nm: out of range (valid: 0.5 <= value <= 1e7 nm)") ||
		!strings.HasSuffix(errOut, "\n") {
		t.Errorf("refused sample as text: %d %q", code, errOut)
	}
	// Not a terminal: JSON by default.
	if code, out, _ := run(t, string(demo), "triage", "-"); code != exitOK || !strings.HasPrefix(out, "{") {
		t.Errorf("default format off a terminal: %d %.40q", code, out)
	}
}

// TestHelp: every subcommand answers --help on standard output with exit 0,
// and usage errors end with a newline.
func TestHelp(t *testing.T) {
	cases := [][]string{{"--help"}, {"serve", "--help"}, {"triage", "--help"}, {"triage", "-h"},
		{"rules", "--help"}, {"rules", "check", "--help"}, {"version", "--help"}}
	for _, args := range cases {
		code, out, errOut := run(t, "", args...)
		if code != exitOK || !strings.Contains(strings.ToLower(out), "usage") || errOut != "" {
			t.Errorf("%v: %d, stdout %.60q, stderr %q", args, code, out, errOut)
		}
	}
	for _, args := range [][]string{{"triage"}, {"triage", "--format", "xml", "-"}, {"triage", "--bogus", "-"}, {"rules"}, {"version", "x"}, {"nope"}} {
		code, _, errOut := run(t, "", args...)
		if code != exitUsage || !strings.HasSuffix(errOut, "\n") {
			t.Errorf("%v: %d, stderr %q", args, code, errOut)
		}
	}
}
