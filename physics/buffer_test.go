package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

// TestAcidFractions checks the speciation of the buffer acids against the
// Henderson–Hasselbalch equation [pub] and hand values [calc]:
//   - at pH = pKa two neighbouring species are equal (H2PO4- = HPO4 2- at
//     7.206; HCO3- = CO3 2- at 10.33);
//   - phosphate at pH 7.4: [HPO4 2-]/[H2PO4-] = 10^(7.4 - 7.206) = 1.563,
//     alpha = 0.6099 and 0.3901 to 4 digits (the other two species below
//     1e-4) [calc];
//   - acetate at pH 4.76 is half dissociated; citrate at pH 9 is almost all
//     citrate 3- (1 - 10^(6.40 - 9) = 0.9975 to 4 digits) [calc].
func TestAcidFractions(t *testing.T) {
	t.Parallel()
	for _, a := range []physics.Acid{physics.PhosphoricAcid, physics.CitricAcid, physics.CarbonicAcid, physics.AceticAcid} {
		for _, pH := range []float64{0, 3, 7, 11, 14} {
			var sum float64
			for _, f := range a.Fractions(pH) {
				sum += f
			}
			if math.Abs(sum-1) > 1e-12 {
				t.Errorf("%s at pH %g: fractions sum to %v", a.Name, pH, sum)
			}
		}
		for j, pk := range a.PKa {
			f := a.Fractions(pk)
			if math.Abs(f[j]-f[j+1]) > 1e-3*f[j] {
				t.Errorf("%s at pH = pKa%d %g: species %d and %d are %g and %g, want equal", a.Name, j+1, pk, j, j+1, f[j], f[j+1])
			}
		}
	}
	f := physics.PhosphoricAcid.Fractions(7.4)
	if math.Abs(f[1]-0.3901) > 1e-4 || math.Abs(f[2]-0.6099) > 1e-4 {
		t.Errorf("phosphate at pH 7.4: %v, want H2PO4- 0.3901 and HPO4 2- 0.6099", f)
	}
	if f := physics.AceticAcid.Fractions(4.76); math.Abs(f[1]-0.5) > 1e-12 {
		t.Errorf("acetate at its pKa: %v, want half", f)
	}
	ions := physics.CitricAcid.Ions(9, 10)
	if len(ions) != 3 || ions[2].Valence != -3 || math.Abs(ions[2].Concentration-9.975) > 1e-3 {
		t.Errorf("citrate at pH 9, 10 mM total: %+v, want 9.975 mM of citrate 3-", ions)
	}
	for _, bad := range []func(){
		func() { physics.AceticAcid.Fractions(math.NaN()) },
		func() { physics.AceticAcid.Ions(7, -1) },
	} {
		func() {
			defer func() {
				if recover() == nil {
					t.Error("no panic on invalid input")
				}
			}()
			bad()
		}()
	}
}
