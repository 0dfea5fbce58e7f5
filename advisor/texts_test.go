package advisor_test

import (
	"encoding/json"
	"regexp"
	"testing"
)

// Texts a formulator reads must not print an exponent no one can picture
// ("10^873 days"), an infinity as an exponent ("10^unbounded"), or compare
// a signed zeta potential with a magnitude ("-30 mV is above the 30 mV
// line").
var (
	hugeExponent  = regexp.MustCompile(`10\^(unbounded|[0-9]{3,})`)
	signedVsLine  = regexp.MustCompile(`-[0-9.]+ mV\)?[^.]*(above|below) the usual 30 mV line`)
	magnitudeLine = regexp.MustCompile(`magnitude[^.]*30 mV line`)
)

func TestReportTextsPlain(t *testing.T) {
	t.Parallel()
	for _, tc := range demoCases(t) {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			data, err := json.Marshal(triageDemo(t, tc.path))
			if err != nil {
				t.Fatal(err)
			}
			if m := hugeExponent.FindString(string(data)); m != "" {
				t.Errorf("report prints %q", m)
			}
			for _, m := range signedVsLine.FindAllString(string(data), -1) {
				if !magnitudeLine.MatchString(m) {
					t.Errorf("report compares a signed zeta with a magnitude: %q", m)
				}
			}
		})
	}
}
