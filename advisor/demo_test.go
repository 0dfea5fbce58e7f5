package advisor_test

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"sync"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/rules"
)

// The demo scenarios in testdata/demo are invented batches of invented
// products (see testdata/demo/README.md), one or more per cause of the
// catalogue. Each file is named <cause_id>.json or <cause_id>_<n>.json and
// must rank that cause first, for the physical reasons the README states.
// Their reports are pinned in testdata/golden; after a deliberate change of
// rules or physics, review the new reports and rewrite them with
//
//	go test ./advisor -run Demo -update

var update = flag.Bool("update", false, "rewrite testdata/golden from the demo scenarios")

const (
	demoDir   = "../testdata/demo"
	goldenDir = "../testdata/golden"
	// noTarget is how a remedy's action says that no value of its quantity
	// meets the criterion within the physical range (see remedy.go).
	noTarget = "no target found within the physical range"
)

var (
	demoFile = regexp.MustCompile(`^([a-z_]+?)(_[0-9]+)?\.json$`)
	unfilled = regexp.MustCompile(`\{[A-Za-z0-9_]+\}`)
)

var demoEngine = sync.OnceValues(func() (*advisor.Engine, error) { return advisor.LoadEngine(rules.FS) })

type demoCase struct {
	name  string // file name without .json
	cause string // expected top cause
	path  string
}

func demoCases(t *testing.T) []demoCase {
	t.Helper()
	paths, err := filepath.Glob(filepath.Join(demoDir, "*.json"))
	if err != nil || len(paths) == 0 {
		t.Fatalf("no demo scenarios in %s (%v)", demoDir, err)
	}
	sort.Strings(paths)
	out := make([]demoCase, 0, len(paths))
	for _, p := range paths {
		base := filepath.Base(p)
		m := demoFile.FindStringSubmatch(base)
		if m == nil {
			t.Fatalf("%s: a demo file is named <cause_id>[_N].json", base)
		}
		out = append(out, demoCase{name: strings.TrimSuffix(base, ".json"), cause: m[1], path: p})
	}
	return out
}

// loadDemo decodes a scenario strictly: an unknown field is an error, as at
// the API's edge.
func loadDemo(t *testing.T, path string) *input.Sample {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	var s input.Sample
	if err := dec.Decode(&s); err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	if dec.More() {
		t.Fatalf("%s: trailing data after the sample", path)
	}
	return &s
}

func triageDemo(t *testing.T, path string) *advisor.Report {
	t.Helper()
	eng, err := demoEngine()
	if err != nil {
		t.Fatal(err)
	}
	rep, err := eng.Triage(loadDemo(t, path))
	if err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	return rep
}

// goldenReport is a report without the fields that depend on the request
// or the build: the echo of the inputs and the engine and rule-set versions
// (the rule-set hash changes with every edit of any rule file).
type goldenReport struct {
	SampleID    string                   `json:"sample_id"`
	Symptom     string                   `json:"symptom"`
	Scales      map[string]advisor.Scale `json:"scales"`
	Causes      []advisor.Cause          `json:"causes"`
	Cautions    []string                 `json:"cautions"`
	Assumptions []string                 `json:"assumptions"`
	Models      map[string]string        `json:"models"`
	Consistency []advisor.Consistency    `json:"consistency,omitempty"`
	MeasureNext []advisor.Measurement    `json:"measure_next,omitempty"`
	RuledOut    []advisor.RuledOut       `json:"ruled_out,omitempty"`
	Analysis    *advisor.Analysis        `json:"analysis,omitempty"`
}

func goldenJSON(t *testing.T, rep *advisor.Report) []byte {
	t.Helper()
	g := goldenReport{SampleID: rep.SampleID, Symptom: rep.Symptom, Scales: rep.Scales, Causes: rep.Causes,
		Cautions: rep.Cautions, Assumptions: rep.Assumptions, Models: rep.Models, Consistency: rep.Consistency,
		MeasureNext: rep.MeasureNext, RuledOut: rep.RuledOut, Analysis: rep.Analysis}
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetEscapeHTML(false)
	enc.SetIndent("", "  ")
	if err := enc.Encode(g); err != nil {
		t.Fatalf("golden report does not marshal: %v", err)
	}
	return buf.Bytes()
}

// TestDemoScenarios: each scenario ranks the cause its file is named after
// first; every remedy of that cause carries a computed target, unless it is
// the non-colloidal check (which has none) or its action says that no
// target exists in the physical range; the report marshals (so it holds no
// NaN or infinity) and is byte-identical when triaged twice.
func TestDemoScenarios(t *testing.T) {
	t.Parallel()
	for _, tc := range demoCases(t) {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			rep := triageDemo(t, tc.path)
			if len(rep.Causes) == 0 {
				t.Fatal("no cause ranked")
			}
			top := rep.Causes[0]
			if top.ID != tc.cause {
				var got []string
				for _, c := range rep.Causes {
					got = append(got, c.ID)
				}
				t.Fatalf("top cause %s (score %g), want %s; ranking %v", top.ID, top.Score, tc.cause, got)
			}
			if !(top.Score > 0 && top.Score <= 1) || top.Rank != 1 || top.Explanation == "" {
				t.Errorf("top cause %+v: want rank 1, a score in (0, 1] and an explanation", top)
			}
			if len(top.Remedies) == 0 {
				t.Error("top cause has no remedy")
			}
			for _, r := range top.Remedies {
				if r.Target == nil && r.ID != "investigate_non_colloidal" && !strings.Contains(r.Action, noTarget) {
					t.Errorf("remedy %s has no target and does not say why: %q", r.ID, r.Action)
				}
				if strings.Contains(r.Action, "{target}") {
					t.Errorf("remedy %s: unfilled placeholder in %q", r.ID, r.Action)
				}
			}
			for _, c := range rep.Causes {
				if m := unfilled.FindString(c.Explanation); m != "" {
					t.Errorf("cause %s: unfilled placeholder %s in its explanation", c.ID, m)
				}
			}
			first, err := json.Marshal(rep)
			if err != nil {
				t.Fatalf("report does not marshal (NaN or infinity?): %v", err)
			}
			second, err := json.Marshal(triageDemo(t, tc.path))
			if err != nil {
				t.Fatal(err)
			}
			if !bytes.Equal(first, second) {
				t.Error("two triages of the same sample differ")
			}
		})
	}
}

// TestDemoGolden compares each report with testdata/golden/<name>.json.
func TestDemoGolden(t *testing.T) {
	t.Parallel()
	for _, tc := range demoCases(t) {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			got := goldenJSON(t, triageDemo(t, tc.path))
			path := filepath.Join(goldenDir, tc.name+".json")
			if *update {
				if err := os.WriteFile(path, got, 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (run go test ./advisor -run Demo -update)", err)
			}
			if !bytes.Equal(got, want) {
				t.Errorf("report differs from %s; review the change and rewrite with -update:\n%s", path, firstDifference(want, got))
			}
		})
	}
}

// firstDifference shows the first differing line of two reports.
func firstDifference(want, got []byte) string {
	w, g := strings.Split(string(want), "\n"), strings.Split(string(got), "\n")
	for i := 0; i < len(w) || i < len(g); i++ {
		var a, b string
		if i < len(w) {
			a = w[i]
		}
		if i < len(g) {
			b = g[i]
		}
		if a != b {
			return "line " + strconv.Itoa(i+1) + ":\n  want " + a + "\n  got  " + b
		}
	}
	return ""
}

// TestDemoCoverage: every cause of the catalogue is the top cause of at
// least one scenario, and every remedy of the catalogue appears in at
// least one demo report (the reports TestDemoGolden pins), so that no part
// of the knowledge base goes unexercised.
func TestDemoCoverage(t *testing.T) {
	t.Parallel()
	eng, err := demoEngine()
	if err != nil {
		t.Fatal(err)
	}
	cat := eng.RuleSet().Catalog
	known := map[string]bool{}
	for _, c := range cat.Causes {
		known[c.ID] = true
	}
	topCauses, remedies := map[string]bool{}, map[string]bool{}
	for _, tc := range demoCases(t) {
		if !known[tc.cause] {
			t.Errorf("%s.json names %s, which is not a cause of the catalogue", tc.name, tc.cause)
		}
		rep := triageDemo(t, tc.path)
		if len(rep.Causes) > 0 && rep.Causes[0].ID == tc.cause {
			topCauses[tc.cause] = true
		}
		for _, c := range rep.Causes {
			for _, r := range c.Remedies {
				remedies[r.ID] = true
			}
		}
	}
	for _, c := range cat.Causes {
		if !topCauses[c.ID] {
			t.Errorf("cause %s: no demo scenario ranks it first", c.ID)
		}
	}
	for _, r := range cat.Remedies {
		if !remedies[r.ID] {
			t.Errorf("remedy %s appears in no demo report", r.ID)
		}
	}
}
