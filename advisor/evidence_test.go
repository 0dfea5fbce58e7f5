package advisor_test

import (
	"fmt"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
)

func triageWith(t *testing.T, text string, keep map[string]input.Spread) *advisor.Report {
	t.Helper()
	s := decode(t, text)
	s.Uncertainty = exactBut(keep)
	r, err := engine(t).Triage(s)
	if err != nil {
		t.Fatal(err)
	}
	return r
}

// A 1 um silica slurry in 10 mM NaCl that has settled, whose only
// uncertain input is its zeta potential (-20 +- 15 mV): in some draws the
// barrier holds and the particles settle one by one into a dense cake, in
// others it is gone and they settle as flocs into a loose sediment.
// Flocculated sediments redisperse and deflocculated ones cake (Hiestand
// 1964), so "redisperses" moves probability to the aggregation causes and
// "does not" to the causes of dispersed particles.
const redisperseCase = `{"symptom":"caking","particles":{"material":"silica_amorphous","diameter_nm":1000,"volume_fraction":0.1,"zeta_mV":-20},
 "medium":{"liquid":"water","ph":7,"electrolytes":[{"formula":"NaCl","concentration_mM":10}]},"storage":{"container_height_mm":100,"shelf_life_days":365},
 "observation":{"age_days":30,"sediment_redisperses":%s},"analysis":{"seed":3}}`

func TestRedispersionMovesProbability(t *testing.T) {
	t.Parallel()
	zeta := map[string]input.Spread{"particles.zeta_mV": {SD: 15}}
	yes := triageWith(t, fmt.Sprintf(redisperseCase, "true"), zeta)
	no := triageWith(t, fmt.Sprintf(redisperseCase, "false"), zeta)
	aggregated := func(r *advisor.Report) float64 {
		return probability(r, "electrostatic_screening") + probability(r, "low_surface_charge")
	}
	dispersed := func(r *advisor.Report) float64 {
		return probability(r, "dense_cake") + probability(r, "gravity_settling")
	}
	t.Logf("aggregation causes %.3f -> %.3f, dispersed-particle causes %.3f -> %.3f (redisperses yes -> no)",
		aggregated(yes), aggregated(no), dispersed(yes), dispersed(no))
	if aggregated(yes) < aggregated(no)+0.1 || dispersed(no) < dispersed(yes)+0.1 {
		t.Errorf("redispersion moved the aggregation causes %.3f -> %.3f and the dispersed ones %.3f -> %.3f; want the first down and the second up by 0.1",
			aggregated(yes), aggregated(no), dispersed(yes), dispersed(no))
	}
}

// A 200 nm latex at 5 % in 40 mM NaCl whose only uncertain input is its
// zeta potential (-25 +- 10 mV): some draws aggregate within the 30 days
// observed, others keep a barrier. An observed viscosity rise of 200 % is
// what aggregated flocs (phi (R/a)^(3 - df) on Krieger-Dougherty) predict,
// no change what dispersed particles predict. No rule of viscosity_rise
// names salt aggregation at this barrier, so the aggregating draws count
// as unexplained (a colloidal cause no rule names): the rise moves share
// from outside_colloidal_physics (no aggregation) to them.
const viscosityCase = `{"symptom":"viscosity_rise","particles":{"material":"polystyrene","diameter_nm":200,"volume_fraction":0.05,"zeta_mV":-25},
 "medium":{"liquid":"water","ph":7,"electrolytes":[{"formula":"NaCl","concentration_mM":40}]},"observation":{"age_days":30,"viscosity_change_percent":%s},"analysis":{"seed":5}}`

func TestViscosityRiseFavoursAggregation(t *testing.T) {
	t.Parallel()
	zeta := map[string]input.Spread{"particles.zeta_mV": {SD: 10}}
	still := triageWith(t, fmt.Sprintf(viscosityCase, "0"), zeta)
	rise := triageWith(t, fmt.Sprintf(viscosityCase, "200"), zeta)
	noneStill, noneRise := probability(still, "outside_colloidal_physics"), probability(rise, "outside_colloidal_physics")
	aggStill, aggRise := still.Analysis.Unexplained, rise.Analysis.Unexplained
	t.Logf("no aggregation %.3f -> %.3f, aggregating draws %.3f -> %.3f (viscosity change 0 -> 200 %%)", noneStill, noneRise, aggStill, aggRise)
	if noneRise > noneStill-0.3 || aggRise < aggStill+0.3 {
		t.Errorf("a viscosity rise moved no aggregation %.3f -> %.3f and the aggregating draws %.3f -> %.3f; want 0.3 from the first to the second",
			noneStill, noneRise, aggStill, aggRise)
	}
}
