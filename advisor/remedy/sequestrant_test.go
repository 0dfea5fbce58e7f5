package remedy

import (
	"strings"
	"testing"
)

// TestSequestrantDose checks the EDTA dose against its stoichiometry: one
// EDTA per Ca2+ or Mg2+ (1:1 chelates, Martell & Smith) [pub] and the molar
// mass of Na2H2EDTA.2H2O, 372.24 g/mol (CAS 6381-92-6) [pub]: 1.5 mM of
// excess hardness needs 558 mg/L [calc].
func TestSequestrantDose(t *testing.T) {
	t.Parallel()
	if got := sequestrantDose(1.5); !strings.Contains(got, "1.5 mM") || !strings.Contains(got, "558 mg/L") {
		t.Errorf("dose for 1.5 mM: %q, want 558 mg/L", got)
	}
}
