package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestYieldStressToHoldSphere(t *testing.T) {
	t.Parallel()
	// Beris et al. (1985) critical value 0.143 [pub, abstract] with
	// Y = 3 tau/(2 drho g R) [definition restated by later users, see
	// BerisCriticalYieldNumber]; values from testdata/reference/beyond_dlvo.py
	// [calc]. The restated form tau = 2 R g drho/21 (Y = 1/7 exactly, see
	// BerisCriticalYieldNumber) must agree to the rounding of 0.143 to 1/7
	// (0.1 %).
	cases := []struct {
		radius, drho, want, tol float64
	}{
		{50e-6, 1000, 4.674503e-02, 1e-6},
		{5e-6, 1650, 7.712930e-03, 1e-6},
		{1e-3, 100, 9.349006e-02, 1e-6},
		{1e-3, -100, 9.349006e-02, 1e-6}, // a rising drop needs the same hold
		{1e-3, 0, 0, 0},
	}
	for _, c := range cases {
		got := physics.YieldStressToHoldSphere(c.radius, c.drho)
		if e := beyondRelErr(got, c.want); e > c.tol {
			t.Errorf("YieldStressToHoldSphere(%v, %v) = %.6e Pa, want %.6e", c.radius, c.drho, got, c.want)
		}
		oneSeventh := 2 * c.radius * physics.StandardGravity * math.Abs(c.drho) / 21
		if e := beyondRelErr(got, oneSeventh); e > 1.1e-3 {
			t.Errorf("R %v drho %v: %.6e Pa differs from 2 R g drho/21 = %.6e by %.1e", c.radius, c.drho, got, oneSeventh, e)
		}
	}
}

func TestBerisYieldNumberConventions(t *testing.T) {
	t.Parallel()
	// Conversions between the conventions in use (see
	// BerisCriticalYieldNumber): at the threshold Y = 0.143,
	// tau/(drho g R) = 0.0953, tau/(drho g D) = 0.0477 (quoted as "about
	// 0.048" [memory]) and a plastic drag F/(pi R^2 tau) = 14.0.
	const r, drho = 20e-6, 500.0
	tau := physics.YieldStressToHoldSphere(r, drho)
	g := physics.StandardGravity
	weight := 4.0 / 3 * math.Pi * r * r * r * drho * g
	cases := []struct {
		name      string
		got, want float64
		tol       float64
	}{
		{"Y", physics.YieldNumber(tau, r, drho), physics.BerisCriticalYieldNumber, 1e-12},
		{"tau/(drho g R)", tau / (drho * g * r), 0.0953, 1e-3},
		{"tau/(drho g D)", tau / (drho * g * 2 * r), 0.048, 1e-2},
		{"F/(pi R^2 tau)", weight / (math.Pi * r * r * tau), 14.0, 2e-3},
	}
	for _, c := range cases {
		if e := beyondRelErr(c.got, c.want); e > c.tol {
			t.Errorf("%s = %.5f, want %.5f (rel err %.1e)", c.name, c.got, c.want, e)
		}
	}
	if y := physics.YieldNumber(1, r, 0); !math.IsInf(y, 1) {
		t.Errorf("YieldNumber at matched density = %v, want +Inf", y)
	}
}
