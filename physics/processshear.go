package physics

import (
	"errors"
	"fmt"
	"math"
	"strings"
)

// ErrUnknownProcessStep is wrapped by the error of ProcessStepNamed: the
// name is not one of ProcessSteps.
var ErrUnknownProcessStep = errors.New("physics: unknown process step")

// ProcessStep is a named step of making, moving or applying a dispersion
// with the range of shear rates (1/s) it typically imposes, and where that
// range comes from.
type ProcessStep struct {
	Name             string
	MinRate, MaxRate float64 // 1/s
	Source           string
}

// TypicalRate returns the geometric mean of the step's range, in 1/s: the
// middle of a range that spans decades.
func (p ProcessStep) TypicalRate() float64 { return math.Sqrt(p.MinRate * p.MaxRate) }

// processSteps: Barnes, Hutton & Walters (1989), table 1.1, for the steps
// it names; v/h (a surface speed over a gap or film) and 4Q/(pi R^3) (the
// wall shear rate of Poiseuille flow) for the others, with the speeds and
// gaps of common equipment.
var processSteps = []ProcessStep{
	{"stirring", 1e1, 1e3, "Barnes, Hutton & Walters (1989), table 1.1, mixing and stirring"},
	{"pumping", 1e0, 1e3, "Barnes, Hutton & Walters (1989), table 1.1, pipe flow"},
	{"gear_pump", 1e4, 1e5, "practice: tip speed 1-5 m/s over a 20-100 µm clearance, v/h"},
	{"high_shear_mixing", 1e4, 1e5, "practice: rotor-stator tip speed 10-30 m/s over a 0.2-1 mm gap, v/h"},
	{"milling", 1e3, 1e5, "Barnes, Hutton & Walters (1989), table 1.1, milling pigments in fluid bases"},
	{"filling", 1e2, 1e4, "practice: 0.1-1 L/s through a 5-10 mm nozzle radius, 4Q/(pi R^3)"},
	{"spraying", 1e3, 1e4, "Barnes, Hutton & Walters (1989), table 1.1, spraying and brushing"},
	{"brushing", 1e3, 1e4, "Barnes, Hutton & Walters (1989), table 1.1, spraying and brushing"},
	{"rolling", 1e3, 1e5, "practice: roller speed 0.5-2 m/s over a 20-200 µm film, v/h"},
}

// ProcessSteps returns the named process steps, a fresh copy each call.
//
// References: H. A. Barnes, J. F. Hutton and K. Walters, An Introduction to
// Rheology (Elsevier, 1989), table 1.1 "Shear rates typical of some
// familiar materials and processes"; T. G. Mezger, The Rheology Handbook,
// 4th ed. (Vincentz, 2014), ch. 2 (shear rate v/h of two-plate flow, worked
// example of brushing).
func ProcessSteps() []ProcessStep {
	return append([]ProcessStep(nil), processSteps...)
}

// ProcessStepNamed returns the process step of that name. Any other name
// gives an error wrapping ErrUnknownProcessStep that lists the known names.
func ProcessStepNamed(name string) (ProcessStep, error) {
	names := make([]string, len(processSteps))
	for i, p := range processSteps {
		if p.Name == name {
			return p, nil
		}
		names[i] = p.Name
	}
	return ProcessStep{}, fmt.Errorf("%w %q: known are %s", ErrUnknownProcessStep, name, strings.Join(names, ", "))
}
