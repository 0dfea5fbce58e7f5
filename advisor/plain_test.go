package advisor

import "testing"

// TestHalfLifeText: the age of the universe is 13.787 Gyr (Planck
// Collaboration 2020, Table 2 [pub]), 5.04e12 days (13.787e9 x 365.25
// [calc]); a half-life beyond it is said in words, not as an exponent.
func TestHalfLifeText(t *testing.T) {
	for _, tc := range []struct {
		log10Days float64
		want      string
	}{
		{-1, "2.4 h"},    // 0.1 d = 2.4 h [calc]
		{2, "100 days"},  // [calc]
		{5, "274 years"}, // 1e5 d / 365.25 [calc]
		{12.70, "1.37e+10 years"},
		{12.71, "longer than the age of the universe"},
		{873, "longer than the age of the universe"},
	} {
		if got := halfLifeText(tc.log10Days); got != tc.want {
			t.Errorf("halfLifeText(%g) = %q, want %q", tc.log10Days, got, tc.want)
		}
	}
	if got := stabilityRatioText(135); got != "above 10^30 (no aggregation on any time scale)" {
		t.Errorf("stabilityRatioText(135) = %q", got)
	}
}
