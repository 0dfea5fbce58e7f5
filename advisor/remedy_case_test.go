package advisor

import (
	"fmt"
	"math"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
	"colloidtriage/physics"
)

// These tests hold the remedy solvers to the physics on fully evaluated
// samples: each target is put back into the forward physics, and the
// searches are compared with roots of the acceptance margin found here by
// false position on the quadrature alone.

// The solvers' tolerances (advisor/remedy/charge.go), which bound how far a
// target may sit from the exact root: multivalent salt relative to its
// concentration, ionic strength in log10, potential in V.
const (
	multivalentTol   = 1e-4
	ionicStrengthTol = 1e-3
	potentialTol     = 1e-5
)

// evaluated is the remedy case of a sample, evaluated as Triage does.
func evaluated(t *testing.T, e *Engine, s *input.Sample) *remedy.Case {
	t.Helper()
	ev, err := e.evaluate(s)
	if err != nil {
		t.Fatal(err)
	}
	return ev.remedyCase()
}

// ionicStrengthFloor is the lowest ionic strength the remedies ask for: that
// of neutral water in water, 1e-6 mol/m^3 in other liquids.
func ionicStrengthFloor(cs *remedy.Case) float64 {
	if cs.Cond.Liquid.Aqueous {
		return input.AutoionisationMolM3
	}
	return 1e-6
}

// acceptanceMargin recomputes the acceptance criteria of the electrostatic
// remedies with physics, >= 0 when both hold: the smaller of the barrier
// margin (barrier - min_barrier_kT, kT) and the half-life margin (log10 of
// the Smoluchowski half-life with the Fuchs stability ratio over
// half_life_to_shelf_life x shelf life, decades); for a pair with steric
// layers the larger of that and the energy at layer contact in kT (a pair
// the layers hold where the energy is still repulsive is acceptable). The
// barrier is searched from the last one found, as the solvers do.
func acceptanceMargin(cs *remedy.Case, p physics.Pair) float64 {
	c := cs.Cond
	kT := physics.Boltzmann * c.StorageTempK
	b := p.BarrierNear(cs.LastBarrier)
	barrier := 0.0
	if b.Found {
		barrier = b.Energy / kT
		cs.LastBarrier = b.Separation
	}
	margin := barrier - c.Criteria.MinBarrierKT
	if b.Found || margin >= 0 {
		n0 := physics.NumberDensity(c.VolumeFraction, c.Radius)
		halfLife := physics.Log10HalfLife(c.Liquid.Viscosity, c.StorageTempK, n0, physics.Log10StabilityRatioWith(p, b, true))
		margin = math.Min(margin, halfLife-math.Log10(c.Criteria.HalfLifeRatio*c.ShelfLife))
	}
	if p.StericThickness > 0 {
		margin = math.Max(margin, p.Energy(2*p.StericThickness)/kT)
	}
	return margin
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
	e := benchEngine(t)
	cs := evaluated(t, e, benchSample(t, "gravity_settling.json"))
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
	} else if tau := physics.YieldStressToHoldSphere(c.Radius, drho); tg.Value != remedy.SpecifiedYieldStress(tau) {
		t.Errorf("yield stress target %v Pa, want %v Pa specified for %v Pa", tg.Value, remedy.SpecifiedYieldStress(tau), tau)
	} else if y := physics.YieldNumber(tau, c.Radius, drho); math.Abs(y/physics.BerisCriticalYieldNumber-1) > 5e-3 {
		t.Errorf("yield stress %v Pa: yield number %v, want 0.143", tau, y)
	}
	if tg, _, ok := remedy.For("add_steric_layer")(cs); !ok {
		t.Error("no steric target")
	} else if v := cs.VanDerWaalsOnly.Energy(2*tg.Value*1e-9) / kT(cs); math.Abs(math.Abs(v)/c.Criteria.MaxStericKT-1) > 2e-2 {
		t.Errorf("layer target %v nm: vdW at contact %v kT, want -%v kT", tg.Value, v, c.Criteria.MaxStericKT)
	}

	// Salt: the ionic-strength target leaves the pair exactly at the edge
	// of acceptance (barrier and half-life margins >= 0, and just below it
	// not acceptable).
	cs = evaluated(t, e, benchSample(t, "electrostatic_screening.json"))
	tg, _, ok := remedy.For("lower_ionic_strength")(cs)
	if !ok {
		t.Fatal("no ionic-strength target")
	}
	at := acceptanceMargin(cs, cs.Pair.WithIonicStrength(tg.Value))
	above := acceptanceMargin(cs, cs.Pair.WithIonicStrength(tg.Value*1.02))
	if at < -1e-2 || above >= 0 {
		t.Errorf("ionic strength target %v mM: margin %v there, %v 2 %% above; want >= 0 and < 0", tg.Value, at, above)
	}

	// Crowding: the volume-fraction target gives the criterion's viscosity.
	cs = evaluated(t, e, benchSample(t, "near_jamming.json"))
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
	e := benchEngine(t)
	var checked [3]int
	for _, name := range []string{"electrostatic_screening.json", "electrostatic_screening_2.json",
		"low_surface_charge.json", "multivalent_ions.json", "multivalent_ions_2.json", "coalescence.json"} {
		cs := evaluated(t, e, benchSample(t, name))
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
				p := cs.Pair.WithIonicStrength(math.Max(other+c.MultivalentIonicShare*conc, ionicStrengthFloor(cs)))
				return acceptanceMargin(cs, p.WithIons(c.IonsWithMultivalent(conc)))
			}
			checked[2]++
			root, found := physics.FindRoot(exact, 0, c.MultivalentConc, 1e-12)
			if !ok || !found {
				t.Errorf("%s: multivalent target %v (%v), exact root found %v", name, tg.Value, ok, found)
			} else if d := tg.Value - root; d > 1e-12 || d < -2*multivalentTol*c.MultivalentConc-1e-3*root {
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
	tg, _, ok := remedy.For("lower_ionic_strength")(cs)
	I := tg.Value // mM = mol/m^3
	if !ok || I >= cs.Cond.IonicStrength {
		return false
	}
	exact := func(logI float64) float64 {
		return acceptanceMargin(cs, cs.Pair.WithIonicStrength(math.Pow(10, logI)))
	}
	root, found := physics.FindRoot(exact, math.Log10(ionicStrengthFloor(cs)), math.Log10(cs.Cond.IonicStrength), 1e-9)
	if d := math.Log10(I) - root; !found || d > 0 || d < -2*ionicStrengthTol {
		t.Errorf("%s: ionic strength %g mM, exact root %g mM", name, I, math.Pow(10, root))
	}
	return true
}

// checkPotentialRoot is checkIonicStrengthRoot for the potential target.
func checkPotentialRoot(t *testing.T, name string, cs *remedy.Case) bool {
	t.Helper()
	tg, _, ok := remedy.For("raise_surface_charge")(cs)
	psi := tg.Value * 1e-3
	if !ok || psi <= 0 {
		return false
	}
	exact := func(psi float64) float64 {
		p := cs.Pair
		p.Potential = math.Copysign(psi, cs.Pair.Potential)
		return acceptanceMargin(cs, p)
	}
	root, found := physics.FindRoot(exact, 0, 0.2, 1e-9)
	if d := psi - root; !found || d < 0 || d > 2*potentialTol {
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
	cs := evaluated(t, benchEngine(t), benchSample(t, "coalescence.json"))
	tg, _, ok := remedy.For("raise_surface_charge")(cs)
	psi := tg.Value * 1e-3
	if !ok {
		t.Fatal("no potential target")
	}
	kT := physics.Boltzmann * cs.Cond.StorageTempK
	for _, f := range []float64{0.999, 1.001} {
		p := cs.Pair
		p.Potential = math.Copysign(f*psi, cs.Pair.Potential)
		m := acceptanceMargin(cs, p)
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
	e := benchEngine(t)
	s := benchSample(t, "electrostatic_screening.json")
	zeta, zero := 20.0, 0.0
	s.Particles.ZetaMV = &zeta
	s.Criteria = &input.Criteria{MinBarrierKT: &zero}
	cs := evaluated(t, e, s)
	if cs.HasBarrier {
		t.Fatal("the case changed: the pair has a barrier")
	}
	if m := acceptanceMargin(cs, cs.Pair); !(m < 0) {
		t.Errorf("margin without a barrier = %g, want < 0 (the half-life fails)", m)
	}
	if tg, _, ok := remedy.For("raise_surface_charge")(cs); !ok || math.Abs(tg.Value-61.2) > 0.1 {
		t.Errorf("potential target %g mV (%v), want 61.2 mV", tg.Value, ok)
	}
	checkIonicStrengthRoot(t, "min_barrier_kT 0", cs)
	checkPotentialRoot(t, "min_barrier_kT 0", cs)
}

// TestAnchoredSearchesSweep repeats TestAnchoredSearchesMatchExactRoots for
// the ionic-strength and potential targets over 384 variants of the
// salt-limited demo (diameter, zeta, salt, volume fraction, and no or 1 nm
// steric layers), so that the early stops of the searches and the margin
// at the onset of shielding are held to the exact roots away from the demos
// too.
func TestAnchoredSearchesSweep(t *testing.T) {
	t.Parallel()
	e := benchEngine(t)
	var ionic, potential int
	for _, d := range []float64{20, 60, 200, 800} {
		for _, zeta := range []float64{15, 25, 45, 70} {
			for _, salt := range []float64{1, 10, 60, 200} {
				for _, phi := range []float64{0.001, 0.02, 0.2} {
					for _, layer := range []float64{0, 1} {
						s := benchSample(t, "electrostatic_screening.json")
						s.Particles.DiameterNm, s.Particles.ZetaMV, s.Particles.VolumeFraction = &d, &zeta, &phi
						s.Medium.Electrolytes[0].ConcentrationMM = &salt
						if layer > 0 {
							s.Stabilizer = &input.Stabilizer{LayerThicknessNm: &layer}
						}
						cs := evaluated(t, e, s)
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
