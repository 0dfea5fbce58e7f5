package physics_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"colloidtriage/physics"
)

func TestProcessStepsPublished(t *testing.T) {
	t.Parallel()
	// Barnes, Hutton & Walters, An Introduction to Rheology (1989), table
	// 1.1 [memory]: mixing and stirring 1e1-1e3, pipe flow 1e0-1e3,
	// milling pigments 1e3-1e5, spraying and brushing 1e3-1e4 1/s.
	want := map[string][2]float64{
		"stirring": {1e1, 1e3},
		"pumping":  {1e0, 1e3},
		"milling":  {1e3, 1e5},
		"spraying": {1e3, 1e4},
		"brushing": {1e3, 1e4},
	}
	for name, r := range want {
		p, err := physics.ProcessStepNamed(name)
		if err != nil {
			t.Fatal(err)
		}
		if p.MinRate != r[0] || p.MaxRate != r[1] {
			t.Errorf("%s: %g-%g 1/s, want %g-%g", name, p.MinRate, p.MaxRate, r[0], r[1])
		}
	}
	// Mezger's worked example (Anton Paar, "Examples of the calculation of
	// shear rates") [pub]: a brush at 0.5 m/s over a 200 µm wet film,
	// 2500 1/s, lies in the brushing range.
	brush, _ := physics.ProcessStepNamed("brushing")
	if g := 0.5 / 200e-6; g < brush.MinRate || g > brush.MaxRate {
		t.Errorf("brushing example %g 1/s outside %g-%g", g, brush.MinRate, brush.MaxRate)
	}
}

func TestProcessStepsPractice(t *testing.T) {
	t.Parallel()
	// The practice ranges follow from their geometry [calc by hand]:
	// v/h and the Poiseuille wall rate 4Q/(pi R^3) at the stated ends.
	cases := []struct {
		name     string
		min, max float64
	}{
		{"gear_pump", 1 / 100e-6, 5 / 20e-6},
		{"high_shear_mixing", 10 / 1e-3, 30 / 0.2e-3},
		{"rolling", 0.5 / 200e-6, 2 / 20e-6},
		{"filling", 4 * 1e-4 / (math.Pi * math.Pow(10e-3, 3)), 4 * 1e-3 / (math.Pi * math.Pow(5e-3, 3))},
	}
	for _, c := range cases {
		p, err := physics.ProcessStepNamed(c.name)
		if err != nil {
			t.Fatal(err)
		}
		// The preset rounds each end to a decade: within a factor 4.
		if p.MinRate > 4*c.min || p.MinRate < c.min/4 || p.MaxRate > 4*c.max || p.MaxRate < c.max/4 {
			t.Errorf("%s: preset %g-%g 1/s against geometry %g-%g", c.name, p.MinRate, p.MaxRate, c.min, c.max)
		}
	}
}

func TestProcessStepsWellFormed(t *testing.T) {
	t.Parallel()
	steps := physics.ProcessSteps()
	seen := map[string]bool{}
	for _, p := range steps {
		if seen[p.Name] || !(p.MinRate > 0 && p.MinRate < p.MaxRate) || p.Source == "" {
			t.Errorf("bad step %+v", p)
		}
		seen[p.Name] = true
		if got, want := p.TypicalRate(), math.Sqrt(p.MinRate*p.MaxRate); got != want {
			t.Errorf("%s typical %g, want %g", p.Name, got, want)
		}
	}
	steps[0].Name = "changed"
	if physics.ProcessSteps()[0].Name == "changed" {
		t.Error("ProcessSteps shares its table")
	}
	_, err := physics.ProcessStepNamed("kneading")
	if !errors.Is(err, physics.ErrUnknownProcessStep) || !strings.Contains(err.Error(), "gear_pump") {
		t.Errorf("unknown step error %v", err)
	}
}
