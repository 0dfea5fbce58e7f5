package advisor_test

import (
	"strings"
	"testing"

	"colloidtriage/advisor"
)

func offers(rep *advisor.Report, ids ...string) bool {
	for _, c := range rep.Causes {
		for _, r := range c.Remedies {
			for _, id := range ids {
				if r.ID == id {
					return true
				}
			}
		}
	}
	return false
}

func anyContains(list []string, words ...string) bool {
	for _, s := range list {
		for _, w := range words {
			if strings.Contains(s, w) {
				return true
			}
		}
	}
	return false
}

// TestCautionsFitTheProduct: every demo is a wet dispersion, so the dust
// and inhalation caution appears only where a remedy mills solid particles (not
// for droplets, whose size a homogeniser reduces);
// the caution on changing salts only where a remedy changes them; the
// deferral always, last; and no assumption is listed twice.
func TestCautionsFitTheProduct(t *testing.T) {
	t.Parallel()
	for _, tc := range demoCases(t) {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			rep := triageDemo(t, tc.path)
			mills := rep.Inputs.Particles.Phase == "solid" && offers(rep, "reduce_particle_size")
			if dust := anyContains(rep.Cautions, "dust", "inhalation"); dust != mills {
				t.Errorf("dust caution %v, milling remedy offered %v: %q", dust, mills, rep.Cautions)
			}
			salts := offers(rep, "remove_multivalent_ions", "controlled_flocculation")
			if said := anyContains(rep.Cautions, "Changing salts"); said != salts {
				t.Errorf("salt caution %v, salt remedy offered %v", said, salts)
			}
			if n := len(rep.Cautions); n == 0 || !strings.HasPrefix(rep.Cautions[n-1], "This report is an aid") {
				t.Errorf("the deferral is not the last caution: %q", rep.Cautions)
			}
			seen := map[string]bool{}
			for _, a := range rep.Assumptions {
				if seen[a] {
					t.Errorf("assumption listed twice: %q", a)
				}
				seen[a] = true
			}
			water := 0
			for _, a := range rep.Assumptions {
				if strings.HasPrefix(a, "Water at ") {
					water++
				}
			}
			if water > 1 && !anyContains(rep.Assumptions, "with the temperature dependence of water") {
				t.Errorf("water's properties listed at %d temperatures though none is carried: %q", water, rep.Assumptions)
			}
		})
	}
}
