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

// A 1.5 um polystyrene dispersion in 60 mM NaCl whose only uncertain input
// is its zeta potential (-30 +- 10 mV): at a large zeta the barrier holds
// and the particles sit in a secondary minimum; at a small one the barrier
// goes and they reach the primary minimum. A sediment that redisperses is
// what secondary-minimum flocs predict and a hard one what primary-minimum
// contact predicts, so the observation moves probability between the two.
const redisperseCase = `{"symptom":"flocculation","particles":{"material":"polystyrene","diameter_nm":1500,"volume_fraction":0.01,"zeta_mV":-30},
 "medium":{"liquid":"water","ph":7,"electrolytes":[{"formula":"NaCl","concentration_mM":60}]},"observation":{"age_days":1,"sediment_redisperses":%s},"analysis":{"seed":3}}`

func TestRedispersionMovesProbability(t *testing.T) {
	t.Parallel()
	zeta := map[string]input.Spread{"particles.zeta_mV": {SD: 10}}
	yes := triageWith(t, fmt.Sprintf(redisperseCase, "true"), zeta)
	no := triageWith(t, fmt.Sprintf(redisperseCase, "false"), zeta)
	secYes, secNo := probability(yes, "secondary_minimum"), probability(no, "secondary_minimum")
	scrYes, scrNo := probability(yes, "electrostatic_screening"), probability(no, "electrostatic_screening")
	t.Logf("secondary_minimum %.3f -> %.3f, electrostatic_screening %.3f -> %.3f (redisperses yes -> no)", secYes, secNo, scrYes, scrNo)
	if secYes < secNo+0.2 || scrNo < scrYes+0.2 {
		t.Errorf("redispersion moved secondary_minimum %.3f -> %.3f and electrostatic_screening %.3f -> %.3f; want the first down and the second up by 0.2",
			secYes, secNo, scrYes, scrNo)
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
