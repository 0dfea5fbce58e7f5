package advisor

import (
	"math"
	"math/rand/v2"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/physics"
)

// series builds observations at the ages from f, with Gaussian noise of
// relative SD rel, from a fixed seed.
func series(ages []float64, rel float64, seed uint64, f func(t float64) float64, set func(*input.ObservationPoint, float64)) []input.ObservationPoint {
	rng := rand.New(rand.NewPCG(seed, 1))
	out := make([]input.ObservationPoint, len(ages))
	for i, t := range ages {
		age := t
		out[i].AgeDays = &age
		set(&out[i], f(t)*(1+rel*rng.NormFloat64()))
	}
	return out
}

func clearLayer(o *input.ObservationPoint, v float64) { o.ClearLayerMm = &v }
func diameter(o *input.ObservationPoint, v float64)   { o.MedianDiameterNm = &v }

var weeks = []float64{7, 14, 21, 28, 35, 42}

func inside(t *testing.T, p Parameter, want float64) {
	t.Helper()
	if want < p.Low || want > p.High {
		t.Errorf("%s = %g [%g, %g] %s does not hold the true %g", p.Name, p.Value, p.Low, p.High, p.Unit, want)
	}
}

// A 2 um silica particle (2200 kg/m^3) in water (998 kg/m^3, 1.0 mPa s)
// settles at its Stokes speed (physics.StokesVelocity, Stokes 1851): the
// clear layer grows linearly, and the fit recovers the speed.
func TestTrendClearLayerLinear(t *testing.T) {
	t.Parallel()
	v := physics.StokesVelocity(1e-6, 2200-998, 1.0e-3) * 86400 * 1e3 / 200 // mm/d, slowed 200 times by the container's crowding
	obs := series(weeks, 0.05, 1, func(t float64) float64 { return v * t }, clearLayer)
	tr := trends(obs)
	if len(tr) != 1 || tr[0].Shape != "linear" {
		t.Fatalf("trends %+v, want one linear clear layer", tr)
	}
	inside(t, tr[0].Fits[0].Parameters[0], v)
}

// Flocs growing by Smoluchowski's (1917) rapid aggregation keep their
// mass proportional to 1 + t/tau; compact flocs (radius as the cube root of
// the mass) settle at a Stokes speed proportional to the radius squared,
// so H(t) = v0 tau (3/5) ((1 + t/tau)^(5/3) - 1): accelerating, the
// log-log slope tending to 5/3.
func TestTrendClearLayerAccelerating(t *testing.T) {
	t.Parallel()
	v0, tau := 0.05, 1.0 // mm/d of the primary particles; days
	obs := series(weeks, 0.05, 2, func(t float64) float64 {
		return v0 * tau * 0.6 * (math.Pow(1+t/tau, 5.0/3) - 1)
	}, clearLayer)
	tr := trends(obs)
	if len(tr) != 1 || tr[0].Shape != "accelerating" {
		t.Fatalf("trends %+v, want an accelerating clear layer", tr)
	}
	// The local log-log slope over the series, from the noiseless curve.
	h := func(t float64) float64 { return math.Pow(1+t/tau, 5.0/3) - 1 }
	slope := math.Log(h(42)/h(7)) / math.Log(42.0/7)
	inside(t, tr[0].Fits[1].Parameters[1], slope)
}

// An emulsion ripening by LSW (physics.LSWRate, Lifshitz & Slyozov 1961;
// Wagner 1961): hexadecane-like oil, 5 mN/m, solubility 1e-4 mol/m^3,
// 300 cm^3/mol, diffusivity 1e-9 m^2/s, 298 K; d^3 grows by 8 omega t.
func TestTrendGrowthLSW(t *testing.T) {
	t.Parallel()
	omega := physics.LSWRate(5e-3, 1e-4, 300e-6, 1e-9, 298.15) // m^3/s
	k := 8 * omega * 1e27 * 86400                              // nm^3/d on the diameter
	d0 := 300.0
	obs := series(weeks, 0.01, 3, func(t float64) float64 { return math.Cbrt(d0*d0*d0 + k*t) }, diameter)
	tr := trends(obs)
	if len(tr) != 1 || tr[0].Shape != "lsw_ripening" {
		t.Fatalf("trends %+v (k = %g nm^3/d), want LSW ripening", tr, k)
	}
	inside(t, tr[0].Fits[0].Parameters[1], k)
	inside(t, tr[0].Fits[0].Parameters[0], d0)
}

// Coalescence doubling the diameter every two weeks: exponential growth.
func TestTrendGrowthExponential(t *testing.T) {
	t.Parallel()
	g := math.Ln2 / 14
	obs := series(weeks, 0.02, 4, func(t float64) float64 { return 200 * math.Exp(g*t) }, diameter)
	tr := trends(obs)
	if len(tr) != 1 || tr[0].Shape != "exponential_growth" {
		t.Fatalf("trends %+v, want exponential growth", tr)
	}
	inside(t, tr[0].Fits[1].Parameters[1], g)
}

// A series that fits neither form says so.
func TestTrendNeither(t *testing.T) {
	t.Parallel()
	layer := []float64{0, 12, 2, 14, 1, 13}
	size := []float64{300, 520, 310, 560, 305, 540}
	obs := make([]input.ObservationPoint, len(weeks))
	for i := range weeks {
		obs[i] = input.ObservationPoint{AgeDays: &weeks[i], ClearLayerMm: &layer[i], MedianDiameterNm: &size[i]}
	}
	tr := trends(obs)
	if len(tr) != 2 || tr[0].Shape != "neither" || tr[1].Shape != "neither" {
		t.Fatalf("trends %+v, want neither for both", tr)
	}
	for _, x := range tr {
		if x.Says == "" {
			t.Errorf("%s: nothing said", x.Quantity)
		}
	}
}

// A viscosity steady within its scatter, and one that drifts.
func TestTrendViscosity(t *testing.T) {
	t.Parallel()
	steady := series(weeks, 0.02, 5, func(float64) float64 { return 120 }, func(o *input.ObservationPoint, v float64) { o.ViscosityMPaS = &v })
	if tr := trends(steady); len(tr) != 1 || tr[0].Shape != "steady" {
		t.Errorf("steady viscosity: %+v", tr)
	}
	drift := series(weeks, 0.01, 6, func(t float64) float64 { return 120 + 3*t }, func(o *input.ObservationPoint, v float64) { o.ViscosityMPaS = &v })
	tr := trends(drift)
	if len(tr) != 1 || tr[0].Shape != "drift" {
		t.Fatalf("drifting viscosity: %+v", tr)
	}
	inside(t, tr[0].Fits[0].Parameters[1], 3)
}
