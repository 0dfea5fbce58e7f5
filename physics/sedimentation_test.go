package physics_test

import (
	"fmt"
	"math"
	"testing"

	"colloidtriage/physics"
)

func TestStokesVelocity(t *testing.T) {
	t.Parallel()
	eta25 := physics.WaterViscosity(physics.Kelvin(25))
	cases := []struct {
		name                        string
		radius, deltaRho, eta, want float64
		tol                         float64
	}{
		// testdata/reference/REFERENCES.md: a = 0.5 µm, drho = 1000 kg/m^3, water at 25 °C -> 6.12e-7 m/s [calc].
		{"testdata/reference/REFERENCES.md", 0.5e-6, 1000, eta25, 6.12e-7, 1e-3},
		// testdata/reference/basics.py, same case [calc] with scipy constants.
		{"basics.py", 0.5e-6, 1000, eta25, 6.121344e-7, 1e-6},
		// McClements, Food Emulsions (CRC), ch. 7: r = 1 µm, oil 910 in water 1000
		// kg/m^3, 1 mPa s -> about 17 mm/day upward [pub]; basics.py gives 16.946.
		{"McClements creaming", 1e-6, 910 - 1000, 1e-3, -17e-3 / 86400, 0.02},
		{"neutral buoyancy", 1e-6, 0, 1e-3, 0, 0},
	}
	for _, c := range cases {
		got := physics.StokesVelocity(c.radius, c.deltaRho, c.eta)
		if c.want == 0 {
			if got != 0 {
				t.Errorf("%s: StokesVelocity = %g, want 0", c.name, got)
			}
			continue
		}
		if e := basicsRelErr(got, c.want); e > c.tol {
			t.Errorf("%s: StokesVelocity = %.6e m/s, want %.6e (rel err %.1e)", c.name, got, c.want, e)
		}
	}
}

func TestRichardsonZakiFactor(t *testing.T) {
	t.Parallel()
	// Richardson & Zaki 1954, (1 - phi)^n with n = 4.65; values from
	// testdata/reference/basics.py [calc]; tolerances are absolute.
	cases := []struct {
		phi, n, want, tol float64
	}{
		{0, physics.RichardsonZakiExponentLowRe, 1, 0},
		{0.1, physics.RichardsonZakiExponentLowRe, 0.6126715, 1e-7},
		{0.3, physics.RichardsonZakiExponentLowRe, 0.1904171, 1e-7},
		{0.5, physics.RichardsonZakiExponentLowRe, 0.0398300, 1e-7},
		{1, physics.RichardsonZakiExponentLowRe, 0, 0},
	}
	for _, c := range cases {
		got := physics.RichardsonZakiFactor(c.phi, c.n)
		if math.Abs(got-c.want) > c.tol {
			t.Errorf("RichardsonZakiFactor(%v, %v) = %.7f, want %.7f", c.phi, c.n, got, c.want)
		}
	}
}

func TestParticleReynolds(t *testing.T) {
	t.Parallel()
	tk := physics.Kelvin(25)
	rho, eta := physics.WaterDensity(tk), physics.WaterViscosity(tk)
	// testdata/reference/basics.py [calc]: d = 1 µm at the Stokes velocity of
	// the testdata/reference/REFERENCES.md case, water at 25 °C.
	if got, want := physics.ParticleReynolds(1e-6, -6.121344e-7, rho, eta), 6.857410e-7; basicsRelErr(got, want) > 1e-5 {
		t.Errorf("ParticleReynolds = %.6e, want %.6e", got, want)
	}

	// ISO 13317-4 limit Re < 0.25 [pub] reached by quartz (2650 kg/m^3) in
	// water at 25 °C at d = 60.42 µm (basics.py [calc]); the usual statement
	// that Stokes' law holds for quartz in water below about 60 µm is
	// [memory]. At that diameter Re must equal the limit.
	d := 60.41892e-6
	v := physics.StokesVelocity(d/2, 2650-rho, eta)
	if got := physics.ParticleReynolds(d, v, rho, eta); basicsRelErr(got, physics.StokesReynoldsLimit) > 1e-5 {
		t.Errorf("Re of 60.42 µm quartz = %.6f, want %v", got, physics.StokesReynoldsLimit)
	}
}

func TestGravitationalLength(t *testing.T) {
	t.Parallel()
	tk := physics.Kelvin(25)
	cases := []struct {
		name                   string
		radius, deltaRho, want float64
		tol                    float64
	}{
		// testdata/reference/REFERENCES.md: a = 50 nm, drho = 1000 -> 0.80 mm [calc].
		{"testdata/reference/REFERENCES.md", 50e-9, 1000, 0.80e-3, 0.01},
		// testdata/reference/basics.py [calc].
		{"basics.py", 50e-9, 1000, 8.016758e-4, 1e-6},
		{"creaming has the same length", 50e-9, -1000, 8.016758e-4, 1e-6},
	}
	for _, c := range cases {
		got := physics.GravitationalLength(c.radius, c.deltaRho, tk)
		if e := basicsRelErr(got, c.want); e > c.tol {
			t.Errorf("%s: GravitationalLength = %.6e m, want %.6e (rel err %.1e)", c.name, got, c.want, e)
		}
	}
	if got := physics.GravitationalLength(50e-9, 0, tk); !math.IsInf(got, 1) {
		t.Errorf("GravitationalLength at drho = 0 = %v, want +Inf", got)
	}
}

func TestSuspensionDiameter(t *testing.T) {
	t.Parallel()
	tk := physics.Kelvin(25)
	// testdata/reference/basics.py: d = (6 kT / (pi |drho| g))^(1/4) [calc].
	cases := []struct {
		deltaRho, want, tol float64
	}{
		{1000, 9.462365e-7, 1e-6},
		{100, 1.682673e-6, 1e-6},
		{1650, 8.348890e-7, 1e-6},
		{-100, 1.682673e-6, 1e-6},
	}
	for _, c := range cases {
		got := physics.SuspensionDiameter(c.deltaRho, tk)
		if e := basicsRelErr(got, c.want); e > c.tol {
			t.Errorf("SuspensionDiameter(%v) = %.6e m, want %.6e (rel err %.1e)", c.deltaRho, got, c.want, e)
		}
		// Perrin's barometric law: at this diameter the gravitational length
		// equals the diameter.
		if l := physics.GravitationalLength(got/2, c.deltaRho, tk); basicsRelErr(l, got) > 1e-12 {
			t.Errorf("GravitationalLength at d = %.6e is %.6e, want d", got, l)
		}
	}
	if got := physics.SuspensionDiameter(0, tk); !math.IsInf(got, 1) {
		t.Errorf("SuspensionDiameter(0) = %v, want +Inf", got)
	}
}

func TestQuantumDiameter(t *testing.T) {
	t.Parallel()
	tk := physics.Kelvin(25)
	// testdata/reference/basics.py: d^5 = 3 hbar^2 / (2 pi rho kT) [calc].
	cases := []struct {
		density, want, tol float64
	}{
		{1000, 6.639190e-11, 1e-6},
		{2650, 5.463437e-11, 1e-6},
		{19300, 3.672854e-11, 1e-6},
	}
	for _, c := range cases {
		got := physics.QuantumDiameter(c.density, tk)
		if e := basicsRelErr(got, c.want); e > c.tol {
			t.Errorf("QuantumDiameter(%v) = %.6e m, want %.6e (rel err %.1e)", c.density, got, c.want, e)
		}
		// Sanity bound: sub-nanometre for ordinary densities, so colloids
		// are classical.
		if got >= 1e-9 {
			t.Errorf("QuantumDiameter(%v) = %g m, want below 1 nm", c.density, got)
		}
		// Heisenberg-Kennard: at the boundary the minimum position
		// uncertainty hbar / (2 sqrt(m kT)) equals the diameter.
		m := c.density * math.Pi * got * got * got / 6
		dx := physics.ReducedPlanck / (2 * math.Sqrt(m*physics.Boltzmann*tk))
		if e := basicsRelErr(dx, got); e > 1e-12 {
			t.Errorf("position uncertainty at d = %.6e is %.6e", got, dx)
		}
	}
}

func TestSettlingTime(t *testing.T) {
	t.Parallel()
	// 0.1 m at the testdata/reference/REFERENCES.md Stokes velocity 6.121344e-7 m/s: 1.633628e5 s
	// (basics.py [calc]).
	cases := []struct {
		height, speed, want, tol float64
	}{
		{0.1, 6.121344e-7, 1.633628e5, 1e-6},
		{0.1, -6.121344e-7, 1.633628e5, 1e-6},
		{0, 0, 0, 0},
		{0, 1e-6, 0, 0},
	}
	for _, c := range cases {
		got := physics.SettlingTime(c.height, c.speed)
		if (c.want == 0 && got != 0) || (c.want != 0 && basicsRelErr(got, c.want) > c.tol) {
			t.Errorf("SettlingTime(%v, %v) = %g, want %g", c.height, c.speed, got, c.want)
		}
	}
	if got := physics.SettlingTime(0.1, 0); !math.IsInf(got, 1) {
		t.Errorf("SettlingTime at speed 0 = %v, want +Inf", got)
	}
}

func TestClearLayer(t *testing.T) {
	t.Parallel()
	// Uniform motion, min(|v| t, H) [calc by hand].
	day := 86400.0
	cases := []struct {
		speed, duration, height, want, tol float64
	}{
		{1e-7, 100 * day, 1, 0.864, 1e-12},
		{-1e-7, 100 * day, 1, 0.864, 1e-12},
		{1e-7, 1000 * day, 0.1, 0.1, 0},
		{0, 1000 * day, 0.1, 0, 0},
		{1e-7, 0, 0.1, 0, 0},
	}
	for _, c := range cases {
		got := physics.ClearLayer(c.speed, c.duration, c.height)
		if math.Abs(got-c.want) > c.tol*c.want {
			t.Errorf("ClearLayer(%v, %v, %v) = %g, want %g", c.speed, c.duration, c.height, got, c.want)
		}
	}
}

func TestSedimentationPanics(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name string
		f    func()
	}{
		{"Stokes negative radius", func() { physics.StokesVelocity(-1e-6, 1000, 1e-3) }},
		{"Stokes zero viscosity", func() { physics.StokesVelocity(1e-6, 1000, 0) }},
		{"Stokes NaN deltaRho", func() { physics.StokesVelocity(1e-6, math.NaN(), 1e-3) }},
		{"RZ phi above 1", func() { physics.RichardsonZakiFactor(1.1, 4.65) }},
		{"RZ negative n", func() { physics.RichardsonZakiFactor(0.1, -1) }},
		{"Reynolds zero viscosity", func() { physics.ParticleReynolds(1e-6, 1e-6, 1000, 0) }},
		{"gravitational length zero temperature", func() { physics.GravitationalLength(1e-7, 1000, 0) }},
		{"suspension diameter NaN", func() { physics.SuspensionDiameter(math.NaN(), 298) }},
		{"quantum diameter zero density", func() { physics.QuantumDiameter(0, 298) }},
		{"settling time negative height", func() { physics.SettlingTime(-1, 1e-6) }},
		{"clear layer infinite duration", func() { physics.ClearLayer(0, math.Inf(1), 1) }},
		{"Stokes radius zero viscosity", func() { physics.StokesRadius(1e-6, 1000, 0) }},
		{"Stokes radius NaN speed", func() { physics.StokesRadius(math.NaN(), 1000, 1e-3) }},
		{"Stokes density difference zero radius", func() { physics.StokesDensityDifference(1e-6, 0, 1e-3) }},
		{"Stokes viscosity negative radius", func() { physics.StokesViscosity(1e-6, -1e-6, 1000) }},
		{"Stokes viscosity infinite deltaRho", func() { physics.StokesViscosity(1e-6, 1e-6, math.Inf(1)) }},
		{"Perrin radius negative length", func() { physics.PerrinRadius(-1, 1000, 298) }},
	}
	for _, c := range cases {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", c.name)
				}
			}()
			c.f()
		}()
	}
}

// A 1 µm silica-like sphere (density excess 1000 kg/m^3) in water at 25 °C.
func ExampleStokesVelocity() {
	tk := physics.Kelvin(25)
	v := physics.StokesVelocity(0.5e-6, 1000, physics.WaterViscosity(tk))
	fmt.Printf("%.3g µm/s, %.1f mm/day\n", v*1e6, v*86400e3)
	// Output: 0.612 µm/s, 52.9 mm/day
}

func TestSedimentedFraction(t *testing.T) {
	t.Parallel()
	// Uniform start: class i settled fraction min(1, v t/H) (Allen 1997);
	// hand values with speeds proportional to d^2 (Stokes).
	classes := []physics.SizeClass{{1e-6, 0.5}, {2e-6, 0.3}, {4e-6, 0.2}}
	speed := func(d float64) float64 { return 1e-6 * (d / 1e-6) * (d / 1e-6) } // 1, 4, 16 um/s
	cases := []struct {
		duration, height, want float64
	}{
		{0, 0.1, 0},
		{1000, 0.1, 0.5*0.01 + 0.3*0.04 + 0.2*0.16},
		{10000, 0.1, 0.5*0.1 + 0.3*0.4 + 0.2*1},
		{1e6, 0.1, 1},
	}
	for _, c := range cases {
		got := physics.SedimentedFraction(classes, speed, c.duration, c.height)
		if math.Abs(got-c.want) > 1e-12 {
			t.Errorf("SedimentedFraction(t=%v, H=%v) = %.6f, want %.6f", c.duration, c.height, got, c.want)
		}
	}
	cream := func(d float64) float64 { return -speed(d) }
	if a, b := physics.SedimentedFraction(classes, cream, 1000, 0.1), physics.SedimentedFraction(classes, speed, 1000, 0.1); a != b {
		t.Errorf("creaming %v differs from settling %v at equal speeds", a, b)
	}
	if got := physics.SedimentedFraction(nil, speed, 1000, 0.1); got != 0 {
		t.Errorf("no classes: %v, want 0", got)
	}
}

func TestStokesInverses(t *testing.T) {
	t.Parallel()
	// Stokes (1851) solved for a, drho and eta: testdata/reference/inverses.py
	// [calc]; McClements, Food Emulsions (CRC), ch. 7: oil droplets of
	// r = 1 µm, 910 in water of 1000 kg/m^3 and 1 mPa s cream at about
	// 17 mm/day [pub], read backwards.
	mcClements := -17e-3 / 86400
	cases := []struct {
		name      string
		got, want float64
		tol       float64
	}{
		{"radius, inverses.py", physics.StokesRadius(1e-6, 1000, 1e-3), 6.774011e-7, 1e-6},
		{"radius, signs ignored", physics.StokesRadius(-1e-6, -1000, 1e-3), 6.774011e-7, 1e-6},
		{"density difference, inverses.py", physics.StokesDensityDifference(1e-6, 0.5e-6, 1e-3), 1.835489e3, 1e-6},
		{"viscosity, inverses.py", physics.StokesViscosity(1e-6, 0.5e-6, 1000), 5.448139e-4, 1e-6},
		{"radius, McClements", physics.StokesRadius(mcClements, 910-1000, 1e-3), 1e-6, 0.01},
		{"density difference, McClements", physics.StokesDensityDifference(mcClements, 1e-6, 1e-3), 90, 0.02},
		{"viscosity, McClements", physics.StokesViscosity(mcClements, 1e-6, 910-1000), 1e-3, 0.02},
	}
	for _, c := range cases {
		if e := basicsRelErr(c.got, c.want); e > c.tol {
			t.Errorf("%s: %.6e, want %.6e (rel err %.1e)", c.name, c.got, c.want, e)
		}
	}
	// Round trips through StokesVelocity.
	const a, drho, eta = 0.3e-6, 1650.0, 2.5e-3
	v := physics.StokesVelocity(a, drho, eta)
	for name, got := range map[string]float64{
		"radius": physics.StokesRadius(v, drho, eta) / a, "density": physics.StokesDensityDifference(v, a, eta) / drho,
		"viscosity": physics.StokesViscosity(v, a, drho) / eta,
	} {
		if math.Abs(got-1) > 1e-14 {
			t.Errorf("round trip of the %s: ratio %.17g, want 1", name, got)
		}
	}
	// Limits.
	if got := physics.StokesRadius(1e-6, 0, 1e-3); !math.IsInf(got, 1) {
		t.Errorf("StokesRadius at drho = 0: %v, want +Inf", got)
	}
	if got := physics.StokesRadius(0, 0, 1e-3); got != 0 {
		t.Errorf("StokesRadius at speed 0: %v, want 0", got)
	}
	if got := physics.StokesViscosity(0, 1e-6, 100); !math.IsInf(got, 1) {
		t.Errorf("StokesViscosity at speed 0: %v, want +Inf", got)
	}
	if got := physics.StokesViscosity(0, 1e-6, 0); got != 0 {
		t.Errorf("StokesViscosity at drho = 0 and speed 0: %v, want 0", got)
	}
}

func TestPerrinRadius(t *testing.T) {
	t.Parallel()
	tk := physics.Kelvin(25)
	// Perrin (1909) solved for a: testdata/reference/inverses.py [calc]; and
	// back to the gravitational length of a = 50 nm, drho = 1000 at 25 °C,
	// 8.016758e-4 m (testdata/reference/basics.py [calc]).
	cases := []struct {
		name                   string
		length, deltaRho, want float64
		tol                    float64
	}{
		{"inverses.py, 0.1 m", 0.1, 1000, 1.000698e-8, 1e-6},
		{"inverses.py, 1 mm", 1e-3, 100, 1.000698e-7, 1e-6},
		{"basics.py backwards", 8.016758e-4, 1000, 50e-9, 1e-6},
		{"creaming alike", 8.016758e-4, -1000, 50e-9, 1e-6},
	}
	for _, c := range cases {
		if got := physics.PerrinRadius(c.length, c.deltaRho, tk); basicsRelErr(got, c.want) > c.tol {
			t.Errorf("%s: PerrinRadius = %.6e m, want %.6e", c.name, got, c.want)
		}
	}
	if got := physics.GravitationalLength(physics.PerrinRadius(0.05, 80, tk), 80, tk); basicsRelErr(got, 0.05) > 1e-14 {
		t.Errorf("round trip: gravitational length %.17g, want 0.05", got)
	}
	if got := physics.PerrinRadius(0.1, 0, tk); !math.IsInf(got, 1) {
		t.Errorf("PerrinRadius at drho = 0: %v, want +Inf", got)
	}
}
