package remedy_test

import (
	"encoding/json"
	"fmt"
	"math"
	"os"
	"strings"
	"sync"
	"testing"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
	"colloidtriage/physics"
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

func demoSample(t testing.TB, name string) *input.Sample {
	t.Helper()
	data, err := os.ReadFile("../../testdata/demo/" + name)
	if err != nil {
		t.Fatal(err)
	}
	var s input.Sample
	if err := json.Unmarshal(data, &s); err != nil {
		t.Fatal(err)
	}
	return &s
}

// evaluated is the remedy case of a demo sample.
func evaluated(t *testing.T, name string) *remedy.Case {
	t.Helper()
	cs, err := loadEngine(t).RemedyCase(demoSample(t, name))
	if err != nil {
		t.Fatal(err)
	}
	return cs
}

// TestRemedyTargetsInvertThePhysics puts each solved target back into the
// forward physics and checks that it meets its criterion exactly (to the
// solver's tolerance): the targets are inverses, not rules of thumb.
func TestRemedyTargetsInvertThePhysics(t *testing.T) {
	t.Parallel()
	kT := func(cs *remedy.Case) float64 { return physics.Boltzmann * cs.Cond.StorageTempK }

	// Settling: a 2.5 um rutile slurry. The size target is set by Perrin's
	// barometric law (gravitational length = container height), the
	// viscosity target by hindered Stokes settling.
	cs := evaluated(t, "gravity_settling.json")
	c := cs.Cond
	drho := c.ParticleDensity - c.Liquid.Density
	if tg, _, ok := remedy.For("reduce_particle_size")(cs); !ok {
		t.Error("no size target")
	} else if lg := physics.GravitationalLength(tg.Value*0.5e-9, drho, c.StorageTempK); math.Abs(lg/c.Height-1) > 5e-3 {
		t.Errorf("size target %v nm: gravitational length %v m, want the container height %v m", tg.Value, lg, c.Height)
	}
	if tg, _, ok := remedy.For("raise_viscosity")(cs); !ok {
		t.Error("no viscosity target")
	} else {
		v := physics.StokesVelocity(c.Radius, drho, tg.Value*1e-3) * physics.RichardsonZakiFactor(c.VolumeFraction, physics.RichardsonZakiExponentLowRe)
		if got := physics.ClearLayer(v, c.ShelfLife, c.Height); math.Abs(got/c.MaxClear-1) > 5e-3 {
			t.Errorf("viscosity target %v mPa s: clear layer %v m, want %v m", tg.Value, got, c.MaxClear)
		}
	}
	if tg, _, ok := remedy.For("add_yield_stress")(cs); !ok {
		t.Error("no yield-stress target")
	} else if y := physics.YieldNumber(tg.Value, c.Radius, drho); math.Abs(y/physics.BerisCriticalYieldNumber-1) > 5e-3 {
		t.Errorf("yield stress target %v Pa: yield number %v, want 0.143", tg.Value, y)
	}
	if tg, _, ok := remedy.For("add_steric_layer")(cs); !ok {
		t.Error("no steric target")
	} else if v := cs.VanDerWaalsOnly.Energy(2*tg.Value*1e-9) / kT(cs); math.Abs(math.Abs(v)/c.Criteria.MaxStericKT-1) > 2e-2 {
		t.Errorf("layer target %v nm: vdW at contact %v kT, want -%v kT", tg.Value, v, c.Criteria.MaxStericKT)
	}

	// Salt: the ionic-strength target leaves the pair exactly at the edge
	// of acceptance (barrier and half-life margins >= 0, and just below it
	// not acceptable).
	cs = evaluated(t, "electrostatic_screening.json")
	tg, _, ok := remedy.For("lower_ionic_strength")(cs)
	if !ok {
		t.Fatal("no ionic-strength target")
	}
	at := remedy.StabilityMargin(cs, cs.Pair.WithIonicStrength(tg.Value))
	above := remedy.StabilityMargin(cs, cs.Pair.WithIonicStrength(tg.Value*1.02))
	if at < -1e-2 || above >= 0 {
		t.Errorf("ionic strength target %v mM: margin %v there, %v 2 %% above; want >= 0 and < 0", tg.Value, at, above)
	}

	// Crowding: the volume-fraction target gives the criterion's viscosity.
	cs = evaluated(t, "near_jamming.json")
	if tg, _, ok := remedy.For("lower_volume_fraction")(cs); !ok {
		t.Error("no volume-fraction target")
	} else {
		c := cs.Cond
		eff := tg.Value * cs.Facts.Number("effective_volume_fraction") / c.VolumeFraction
		got := physics.KriegerDougherty(eff, cs.Facts.Number("max_packing_fraction"), physics.DefaultIntrinsicViscosity)
		if math.Abs(got/c.Criteria.MaxRelViscosity-1) > 1e-2 {
			t.Errorf("volume fraction target %v: relative viscosity %v, want %v", tg.Value, got, c.Criteria.MaxRelViscosity)
		}
	}
}

// TestAnchoredSearchesMatchExactRoots: the remedies that search on the peak
// estimate of W and check with one quadrature land on the acceptable side
// of the root of the exact margin (found here by false position on the
// quadrature alone, to 1e-9), within two tolerances of it.
func TestAnchoredSearchesMatchExactRoots(t *testing.T) {
	t.Parallel()
	var checked [3]int
	for _, name := range []string{"electrostatic_screening.json", "electrostatic_screening_2.json",
		"low_surface_charge.json", "multivalent_ions.json", "multivalent_ions_2.json", "coalescence.json"} {
		cs := evaluated(t, name)
		c := cs.Cond
		if checkIonicStrengthRoot(t, name, cs) {
			checked[0]++
		}
		if checkPotentialRoot(t, name, cs) {
			checked[1]++
		}
		if c.MultivalentSalt != "" {
			tg, _, ok := remedy.For("remove_multivalent_ions")(cs)
			other := c.IonicStrength - c.MultivalentIonicShare*c.MultivalentConc
			exact := func(conc float64) float64 {
				return remedy.StabilityMargin(cs, cs.Pair.WithIonicStrength(math.Max(other+c.MultivalentIonicShare*conc, remedy.IonicStrengthFloor(cs))))
			}
			checked[2]++
			root, found := physics.FindRoot(exact, 0, c.MultivalentConc, 1e-12)
			if !ok || !found {
				t.Errorf("%s: multivalent target %v (%v), exact root found %v", name, tg.Value, ok, found)
			} else if d := tg.Value - root; d > 1e-12 || d < -2*remedy.MultivalentTol*c.MultivalentConc-1e-3*root {
				t.Errorf("%s: multivalent target %g mM, exact root %g mM", name, tg.Value, root)
			}
		}
	}
	if checked[0] == 0 || checked[1] == 0 || checked[2] == 0 {
		t.Errorf("searches checked (ionic, potential, multivalent): %v; want each at least once", checked)
	}
}

// checkIonicStrengthRoot holds the ionic-strength target of cs, when there
// is one below the present ionic strength, to the acceptable side of the
// exact margin's root (false position on the quadrature alone, to 1e-9),
// within two tolerances; it reports whether there was a target.
func checkIonicStrengthRoot(t *testing.T, name string, cs *remedy.Case) bool {
	t.Helper()
	I, ok := remedy.LargestAcceptableIonicStrength(cs)
	if !ok || I >= cs.Cond.IonicStrength {
		return false
	}
	exact := func(logI float64) float64 {
		return remedy.StabilityMargin(cs, cs.Pair.WithIonicStrength(math.Pow(10, logI)))
	}
	root, found := physics.FindRoot(exact, math.Log10(remedy.IonicStrengthFloor(cs)), math.Log10(cs.Cond.IonicStrength), 1e-9)
	if d := math.Log10(I) - root; !found || d > 0 || d < -2*remedy.IonicStrengthTol {
		t.Errorf("%s: ionic strength %g mM, exact root %g mM", name, I, math.Pow(10, root))
	}
	return true
}

// checkPotentialRoot is checkIonicStrengthRoot for the potential target.
func checkPotentialRoot(t *testing.T, name string, cs *remedy.Case) bool {
	t.Helper()
	psi, ok := remedy.SmallestAcceptablePotential(cs)
	if !ok || psi <= 0 {
		return false
	}
	exact := func(psi float64) float64 {
		p := cs.Pair
		p.Potential = math.Copysign(psi, cs.Pair.Potential)
		return remedy.StabilityMargin(cs, p)
	}
	root, found := physics.FindRoot(exact, 0, 0.2, 1e-9)
	if d := psi - root; !found || d < 0 || d > 2*remedy.PotentialTol {
		t.Errorf("%s: potential %g mV, exact root %g mV", name, psi*1e3, root*1e3)
	}
	return true
}

// TestShieldingMarginIsContinuous: for the emulsion of the coalescence
// demo (2 nm steric layers, no barrier at -14 mV) the potential target is
// where the layers start to shield the pair (energy at layer contact 0),
// and the margin crosses zero there continuously, as the contact energy in
// kT, instead of stepping from the barrier margin (-15) to a constant.
func TestShieldingMarginIsContinuous(t *testing.T) {
	t.Parallel()
	cs := evaluated(t, "coalescence.json")
	psi, ok := remedy.SmallestAcceptablePotential(cs)
	if !ok {
		t.Fatal("no potential target")
	}
	kT := physics.Boltzmann * cs.Cond.StorageTempK
	for _, f := range []float64{0.999, 1.001} {
		p := cs.Pair
		p.Potential = math.Copysign(f*psi, cs.Pair.Potential)
		m := remedy.StabilityMargin(cs, p)
		contact := p.Energy(2*p.StericThickness) / kT
		if m != contact || math.Abs(m) > 0.05 || (m >= 0) != (f > 1) {
			t.Errorf("|psi| = %g mV: margin %g, contact energy %g kT; want the contact energy, near 0, >= 0 only above the target", f*psi*1e3, m, contact)
		}
	}
}

// TestZeroBarrierCriterionKeepsHalfLife: with criteria.min_barrier_kT = 0
// a pair without a barrier still has to meet the half-life criterion, so
// its margin is negative and the potential target lies above the present
// zeta (the salt-limited demo at 20 mV: 61.2 mV before the margin's
// rewrite, 0 mV while it counted "no barrier" as meeting a zero criterion).
func TestZeroBarrierCriterionKeepsHalfLife(t *testing.T) {
	t.Parallel()
	e := loadEngine(t)
	s := demoSample(t, "electrostatic_screening.json")
	zeta, zero := 20.0, 0.0
	s.Particles.ZetaMV = &zeta
	s.Criteria = &input.Criteria{MinBarrierKT: &zero}
	cs, err := e.RemedyCase(s)
	if err != nil {
		t.Fatal(err)
	}
	if cs.HasBarrier {
		t.Fatal("the case changed: the pair has a barrier")
	}
	if m := remedy.StabilityMargin(cs, cs.Pair); !(m < 0) {
		t.Errorf("margin without a barrier = %g, want < 0 (the half-life fails)", m)
	}
	if psi, ok := remedy.SmallestAcceptablePotential(cs); !ok || math.Abs(psi*1e3-61.2) > 0.1 {
		t.Errorf("potential target %g mV (%v), want 61.2 mV", psi*1e3, ok)
	}
	checkIonicStrengthRoot(t, "min_barrier_kT 0", cs)
	checkPotentialRoot(t, "min_barrier_kT 0", cs)
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

// TestAnchoredSearchesSweep repeats TestAnchoredSearchesMatchExactRoots for
// the ionic-strength and potential targets over 384 variants of the
// salt-limited demo (diameter, zeta, salt, volume fraction, and no or 1 nm
// steric layers), so that the early stops of the searches and the margin
// at the onset of shielding are held to the exact roots away from the demos
// too.
func TestAnchoredSearchesSweep(t *testing.T) {
	t.Parallel()
	e := loadEngine(t)
	var ionic, potential int
	for _, d := range []float64{20, 60, 200, 800} {
		for _, zeta := range []float64{15, 25, 45, 70} {
			for _, salt := range []float64{1, 10, 60, 200} {
				for _, phi := range []float64{0.001, 0.02, 0.2} {
					for _, layer := range []float64{0, 1} {
						s := demoSample(t, "electrostatic_screening.json")
						s.Particles.DiameterNm, s.Particles.ZetaMV, s.Particles.VolumeFraction = &d, &zeta, &phi
						s.Medium.Electrolytes[0].ConcentrationMM = &salt
						if layer > 0 {
							s.Stabilizer = &input.Stabilizer{LayerThicknessNm: &layer}
						}
						cs, err := e.RemedyCase(s)
						if err != nil {
							t.Fatal(err)
						}
						name := fmt.Sprintf("d %g nm, zeta %g mV, %g mM, phi %g, layers %g nm", d, zeta, salt, phi, layer)
						if checkIonicStrengthRoot(t, name, cs) {
							ionic++
						}
						if checkPotentialRoot(t, name, cs) {
							potential++
						}
					}
				}
			}
		}
	}
	if ionic < 100 || potential < 300 {
		t.Errorf("only %d ionic-strength and %d potential targets checked", ionic, potential)
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
