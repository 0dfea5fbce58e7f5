package remedy_test

import (
	"encoding/json"
	"math"
	"strings"
	"sync"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
	"colloidtriage/rules"
)

// engine is the advisor with the built-in rules and library.
var engine = sync.OnceValues(func() (*advisor.Engine, error) { return advisor.LoadEngine(rules.FS) })

func loadEngine(t testing.TB) *advisor.Engine {
	t.Helper()
	e, err := engine()
	if err != nil {
		t.Fatal(err)
	}
	return e
}

// TestRemedyWithoutPeakEstimate: FuzzTriage found a sample (a 12 nm median
// in 60 mM salt) where the peak estimate of W does not apply at some point
// of a remedy search, whose NaN reached the half-life and panicked; the
// searches now fall back to the quadrature there.
func TestRemedyWithoutPeakEstimate(t *testing.T) {
	t.Parallel()
	const sample = `{"sample_id":"FUZZ-1","symptom":"settling","particles":{"material":"titania_anatase","diameter_nm":60,
		"size_distribution":[{"diameter_nm":11.838084919350958,"volume_fraction":0.5}],"volume_fraction":0.02,"zeta_mV":45},
		"medium":{"liquid":"water","temperature_c":25,"ph":3.8,"electrolytes":[{"formula":"NaNO3","concentration_mM":60}]},
		"storage":{"container_height_mm":250,"shelf_life_days":365},
		"observation":{"age_days":10,"clear_layer_mm":100,"sediment_redisperses":true}}`
	var s input.Sample
	if err := json.Unmarshal([]byte(sample), &s); err != nil {
		t.Fatal(err)
	}
	rep, err := loadEngine(t).Triage(&s)
	if err != nil {
		t.Fatal(err)
	}
	targets := 0
	for _, c := range rep.Causes {
		for _, r := range c.Remedies {
			if r.Target != nil {
				targets++
				if v := r.Target.Value; math.IsNaN(v) || math.IsInf(v, 0) {
					t.Errorf("%s: target %v", r.ID, v)
				}
			}
		}
	}
	if targets == 0 {
		t.Errorf("no remedy target: %+v", rep.Causes)
	}
}

// TestApproachRoot checks approachRoot on f(x) = 2 - x^3 (root 2^(1/3), the
// cube root of 2, 1.2599210498948732), its acceptance of the upper end, and
// its refusals.
func TestApproachRoot(t *testing.T) {
	cube := func(x float64) (float64, float64) { return 2 - x*x*x, -3 * x * x }
	root := math.Cbrt(2)
	for _, x0 := range []float64{0.3, 1, 1.26, 2.5} {
		x, ok := remedy.ApproachRoot(cube, x0, 0.1, 3, 1e-6)
		if !ok || math.Abs(x-root) > 2e-6 {
			t.Errorf("from %g: %g, %v; want %g within 2e-6", x0, x, ok, root)
		}
	}
	// From 1 the Newton steps are 0.333, -0.0694, -0.00394, -1.2e-5: after
	// the fourth the next is predicted at 3e-11, so the fifth point is
	// returned without being evaluated.
	evaluations := 0
	counted := func(x float64) (float64, float64) { evaluations++; return cube(x) }
	if x, _ := remedy.ApproachRoot(counted, 1, 0.1, 3, 1e-6); evaluations != 4 || math.Abs(x-root) > 1e-9 {
		t.Errorf("from 1: %g after %d evaluations; want %g within 1e-9 after 4", x, evaluations, root)
	}
	// A step clamped to a decade says nothing of the convergence: from 3
	// on a margin nearly flat above 2, the first step is clamped and the
	// second (-0.63) must not be taken for the last.
	kinked := func(x float64) (float64, float64) {
		if x > 2 {
			return 1 - math.E - 1e-3*(x-2), -1e-3
		}
		return 1 - math.Exp(x-1), -math.Exp(x - 1)
	}
	if x, ok := remedy.ApproachRoot(kinked, 3, 0, 3, 1e-6); !ok || math.Abs(x-1) > 2e-6 {
		t.Errorf("after a clamped step: %g, %v; want 1 within 2e-6", x, ok)
	}
	if x, ok := remedy.ApproachRoot(cube, 1, 0.1, 1.1, 1e-6); !ok || x != 1.1 {
		t.Errorf("acceptable at the upper end: %g, %v; want 1.1, true", x, ok)
	}
	if _, ok := remedy.ApproachRoot(cube, 2, 1.5, 3, 1e-6); ok {
		t.Error("no acceptable point above the root: want found = false")
	}
	if _, ok := remedy.ApproachRoot(func(float64) (float64, float64) { return math.NaN(), -1 }, 1, 0, 2, 1e-6); ok {
		t.Error("NaN margin: want found = false")
	}
	if _, ok := remedy.ApproachRoot(func(x float64) (float64, float64) { return x - 3, 1 }, 1, 0, 2, 1e-6); ok {
		t.Error("rising margin: want found = false")
	}
}

func TestCatalogRemediesHaveSolvers(t *testing.T) {
	t.Parallel()
	rs := loadEngine(t).RuleSet()
	for _, r := range rs.Catalog.Remedies {
		ok := remedy.For(r.ID) != nil
		if !ok && r.ID != "investigate_non_colloidal" {
			t.Errorf("remedy %s has no target solver", r.ID)
		}
		if ok != strings.Contains(r.Action, "{target}") {
			t.Errorf("remedy %s: action template and solver disagree about a target", r.ID)
		}
	}
	for _, id := range remedy.SolverIDs() {
		if _, ok := rs.Catalog.Remedy(id); !ok {
			t.Errorf("solver for %s, which the catalogue does not list", id)
		}
	}
}
