package physics

import (
	"math"
	"testing"
)

// TestCurveSlopes checks the analytic derivatives of the pair energy in
// s = ln h (and of the double layer in ln kappa) against central differences
// of Energy itself, for every model of the three parts and on both branches
// of Hamaker's sphere sum (h << a and h >> a). The derivatives are calculus
// on the published formulas (Hamaker 1937; Gregory 1981; Verwey & Overbeek
// 1948; Hogg, Healy & Fuerstenau 1966; Asakura & Oosawa 1954); the check
// values are the finite differences of the tested energies.
func TestCurveSlopes(t *testing.T) {
	t.Parallel()
	pairs := map[string]Pair{}
	for _, r := range referencePairs {
		pairs[r.name] = r.pair
	}
	hhfDepletion := dlvoPair(-0.03, 3)
	hhfDepletion.ConstantPotential = true
	hhfDepletion.Retarded = true
	hhfDepletion.DepletionRange, hhfDepletion.DepletionDensity = 20e-9, NumberDensity(0.05, 20e-9)
	pairs["retarded HHF with depletion"] = hhfDepletion
	// Steps in ln h: 1e-5 for first derivatives (truncation ~1e-10 of the
	// scale), 1e-3 for second ones (rounding ~1e-10 of the scale).
	const d, d2 = 1e-5, 1e-3
	for name, p := range pairs {
		c := p.curve()
		for _, h := range []float64{0.3e-9, 1e-9, 3e-9, 15e-9, 39e-9, 100e-9, 1e-6, 30e-6} {
			v, dv, d2v := c.slopes(h)
			at := func(s float64) float64 { return c.energy(math.Exp(s)) }
			s := math.Log(h)
			wantDV := (at(s+d) - at(s-d)) / (2 * d)
			wantD2V := (at(s+d2) - 2*at(s) + at(s-d2)) / (d2 * d2)
			scale := math.Abs(at(s-d2)) + math.Abs(at(s+d2)) + 1e-300
			if math.Abs(v-c.energy(h)) > 1e-12*scale {
				t.Errorf("%s h=%g: energy %g, want %g", name, h, v, c.energy(h))
			}
			if math.Abs(dv-wantDV) > 1e-6*scale {
				t.Errorf("%s h=%g: dV/ds %g, want %g", name, h, dv, wantDV)
			}
			if math.Abs(d2v-wantD2V) > 1e-3*scale {
				t.Errorf("%s h=%g: d2V/ds2 %g, want %g", name, h, d2v, wantD2V)
			}
			// The double layer depends on kappa h only, so its ln kappa
			// derivative is checked by moving kappa.
			if c.kappa > 0 {
				k := c
				k.kappa = c.kappa * math.Exp(d)
				up := k.energy(h)
				k.kappa = c.kappa * math.Exp(-d)
				want := (up - k.energy(h)) / (2 * d)
				if got := p.LogKappaSlope(h); math.Abs(got-want) > 1e-6*scale {
					t.Errorf("%s h=%g: dV/dln kappa %g, want %g", name, h, got, want)
				}
			}
		}
	}
}
