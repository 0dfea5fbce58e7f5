package physics

import (
	"math"
	"testing"
)

// edlOf is the double-layer part of Pair.Parts: spheres of radius a at
// surface separation h, potential psi, inverse Debye length kappa, in linear
// superposition with counter-ion valence z or at constant potential.
func edlOf(a, h, psi, kappa, epsR, tempK float64, z int, constantPotential bool) float64 {
	_, edl, _ := Pair{Radius: a, Potential: psi, Kappa: kappa, EpsR: epsR, TempK: tempK, Valence: z,
		ConstantPotential: constantPotential}.Parts(h)
	return edl
}

func TestEDLReferenceValues(t *testing.T) {
	t.Parallel()
	const a, psi, epsR, tempK = 100e-9, -0.025, 78.4, 298.15
	kT := Boltzmann * tempK
	kappa := DebyeKappa(1, epsR, tempK) // 1 mM 1:1, kappa a = 10.40
	// [calc] testdata/reference/interaction.py: linear superposition and
	// Hogg–Healy–Fuerstenau with the same kappa. The HHF hand values in
	// testdata/reference/REFERENCES.md,
	// 42.55, 30.90, 20.04 kT, agree; its superseded LSA values 57.12, 36.94, 21.44 kT
	// do not: they follow exp(-1.09e8 h), a kappa 5 % above the
	// 1.0402e8 1/m that kappa a = 10.40 implies.
	tests := []struct {
		h, lsaKT, hhfKT float64
	}{
		{0, 63.695114, 45.902046},
		{1e-9, 57.402602, 42.547389},
		{5e-9, 37.864605, 30.895460},
		{10e-9, 22.509236, 20.039822},
	}
	for _, tt := range tests {
		if got := edlOf(a, tt.h, psi, kappa, epsR, tempK, 1, false) / kT; interactionRelErr(got, tt.lsaKT) > 1e-6 {
			t.Errorf("LSA h = %g: got %.6f kT, want %.6f kT", tt.h, got, tt.lsaKT)
		}
		if got := edlOf(a, tt.h, psi, kappa, epsR, tempK, 1, true) / kT; interactionRelErr(got, tt.hhfKT) > 1e-6 {
			t.Errorf("HHF h = %g: got %.6f kT, want %.6f kT", tt.h, got, tt.hhfKT)
		}
	}
	// [calc] interaction.py: divalent counter-ions, same kappa, h = 1 nm.
	if got := edlOf(a, 1e-9, psi, kappa, epsR, tempK, 2, false) / kT; interactionRelErr(got, 51.386564) > 1e-6 {
		t.Errorf("LSA z = 2: got %.6f kT, want 51.386564", got)
	}
}

func TestReducedSurfacePotential(t *testing.T) {
	t.Parallel()
	// [calc] testdata/reference/interaction.py: tanh(z e psi/(4 kT)) at
	// 298.15 K (Verwey & Overbeek 1948); z psi enters as a product.
	tests := []struct {
		psi  float64
		z    int
		want float64
	}{
		{0.025, 1, 0.238573434},
		{-0.05, 1, -0.451451477},
		{0.025, 2, 0.451451477},
		{0.2, 1, 0.960013880},
		{0, 1, 0},
	}
	for _, tt := range tests {
		if got := ReducedSurfacePotential(tt.psi, 298.15, tt.z); math.Abs(got-tt.want) > 1e-9 {
			t.Errorf("ReducedSurfacePotential(%g V, z = %d) = %.9f, want %.9f", tt.psi, tt.z, got, tt.want)
		}
	}
	for name, f := range map[string]func(){
		"NaN potential": func() { ReducedSurfacePotential(math.NaN(), 298.15, 1) },
		"zero tempK":    func() { ReducedSurfacePotential(0.025, 0, 1) },
		"valence 0":     func() { ReducedSurfacePotential(0.025, 298.15, 0) },
	} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", name)
				}
			}()
			f()
		}()
	}
}

func TestEDLLimits(t *testing.T) {
	t.Parallel()
	const a, epsR, tempK = 100e-9, 78.4, 298.15
	kappa := DebyeKappa(1, epsR, tempK)
	kT := Boltzmann * tempK
	// Without electrolyte there is no double layer.
	if got := edlOf(a, 1e-9, -0.05, 0, epsR, tempK, 1, false); got != 0 {
		t.Errorf("LSA kappa = 0: got %g, want 0", got)
	}
	if got := edlOf(a, 1e-9, -0.05, 0, epsR, tempK, 1, true); got != 0 {
		t.Errorf("HHF kappa = 0: got %g, want 0", got)
	}
	if got := edlOf(a, 1e-9, 0, kappa, epsR, tempK, 1, false); got != 0 {
		t.Errorf("LSA psi = 0: got %g, want 0", got)
	}
	// Huge kappa h underflows to 0, never NaN.
	if got := edlOf(a, 1e-6, -0.05, 1e12, epsR, tempK, 1, false); got != 0 {
		t.Errorf("LSA kappa h = 1e6: got %g, want 0", got)
	}
	// At low potential and kappa h >> 1 the two models agree: LSA tends to
	// 32 pi eps a (kT/e)^2 (e psi/4kT)^2 e^-kh = 2 pi eps a psi^2 e^-kh, the
	// HHF far field (Hogg et al. 1966; Gregory 1975).
	h := 10 / kappa
	lsa := edlOf(a, h, -1e-4, kappa, epsR, tempK, 1, false)
	hhf := edlOf(a, h, -1e-4, kappa, epsR, tempK, 1, true)
	if interactionRelErr(lsa, hhf) > 1e-4 {
		t.Errorf("low-potential far field: LSA %g vs HHF %g", lsa, hhf)
	}
	// High potential saturates gamma -> 1: 32 pi eps a (kT/e)^2 at contact.
	want := 32 * math.Pi * VacuumPermittivity * epsR * a * (kT / ElementaryCharge) * (kT / ElementaryCharge)
	if got := edlOf(a, 0, 2, kappa, epsR, tempK, 1, false); interactionRelErr(got, want) > 1e-12 {
		t.Errorf("saturated LSA: got %g, want %g", got, want)
	}
}
