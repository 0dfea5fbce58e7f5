package advisor

import (
	"math"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/rules"
)

// TestNoStepAcrossPH holds the ions of water to every pH: without salt, the
// Debye length and log10 W of a charged sol change smoothly from pH 3.9 to
// 4.1 and from 9.9 to 10.1, where H+ and OH- once entered the ionic
// strength with a step (961 to 30 nm). The outside value is the law of mass
// action of water, [H+][OH-] = Kw (pKw 13.995 at 25 degC, Bandura & Lvov
// 2006) [pub]: the Debye length goes as 1/sqrt(I), so a 0.05 pH step
// changes it by at most 10^(0.025) - 1 = 6 % [calc], and log10 W, which
// falls with the Debye length, moves by far less than the 18 decades of the
// old step.
func TestNoStepAcrossPH(t *testing.T) {
	e, err := LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	facts := func(pH float64) (debye, log10W float64) {
		s := &input.Sample{Symptom: "flocculation",
			Particles: input.Particles{DiameterNm: ptrTo(200.0), DensityKgM3: ptrTo(2650.0), ZetaMV: ptrTo(-30.0), HamakerZJ: ptrTo(10.0)},
			Medium:    input.Medium{Liquid: "water", PH: ptrTo(pH)}}
		ev, err := e.evaluate(s)
		if err != nil {
			t.Fatal(err)
		}
		return ev.facts.Number("debye_length"), ev.facts.Number("log10_stability_ratio")
	}
	for _, span := range [][2]float64{{3.9, 4.1}, {9.9, 10.1}} {
		lastD, lastW := facts(span[0])
		for pH := span[0] + 0.05; pH <= span[1]+1e-9; pH += 0.05 {
			d, w := facts(pH)
			if r := d / lastD; !(r > 1/1.06 && r < 1.06) {
				t.Errorf("Debye length %.4g -> %.4g nm from pH %.2f to %.2f: a step", lastD, d, pH-0.05, pH)
			}
			if math.IsInf(w, 0) || math.IsInf(lastW, 0) || math.Abs(w-lastW) > 1 {
				t.Errorf("log10 W %.4g -> %.4g from pH %.2f to %.2f: a step", lastW, w, pH-0.05, pH)
			}
			lastD, lastW = d, w
		}
	}
}

func ptrTo[T any](v T) *T { return &v }
