package advisor

import (
	"encoding/json"
	"os"
	"strings"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/rules"
)

func benchEngine(b testing.TB) *Engine {
	b.Helper()
	e, err := LoadEngine(rules.FS)
	if err != nil {
		b.Fatal(err)
	}
	return e
}

func benchSample(b testing.TB, name string) *input.Sample {
	b.Helper()
	data, err := os.ReadFile("../testdata/demo/" + name)
	if err != nil {
		b.Fatal(err)
	}
	var s input.Sample
	if err := json.Unmarshal(data, &s); err != nil {
		b.Fatal(err)
	}
	return &s
}

// benchTriage triages s at the nominal point only (analysis.draws 0), the
// triage of before the uncertainty analysis, unless s sets its analysis.
func benchTriage(b *testing.B, s *input.Sample) {
	if s.Analysis == nil {
		zero := 0
		s.Analysis = &input.Analysis{Draws: &zero}
	}
	e := benchEngine(b)
	b.ReportAllocs()
	b.ResetTimer()
	for b.Loop() {
		if _, err := e.Triage(s); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkTriageSingleSize is a full triage of one single-size sample with
// its remedy targets (issue target: at most 50 us median on one core).
func BenchmarkTriageSingleSize(b *testing.B) {
	benchTriage(b, benchSample(b, "electrostatic_screening.json"))
}

// BenchmarkTriageDraws200 is the same sample with the default uncertainty
// analysis: 200 Monte Carlo draws, remedy intervals on 32 of them (issue
// target: at most 10 ms on one core).
func BenchmarkTriageDraws200(b *testing.B) {
	s := benchSample(b, "electrostatic_screening.json")
	draws := 200
	s.Analysis = &input.Analysis{Draws: &draws}
	benchTriage(b, s)
}

// BenchmarkTriageGravity is the walking-skeleton demo, a settling complaint.
func BenchmarkTriageGravity(b *testing.B) {
	benchTriage(b, benchSample(b, "gravity_settling.json"))
}

// BenchmarkTriageTwentyClasses is a triage of a 20-class size distribution
// (issue target: at most 1 ms).
func BenchmarkTriageTwentyClasses(b *testing.B) {
	s := benchSample(b, "electrostatic_screening.json")
	s.Particles.SizeDistribution = nil
	d50 := 400.0
	if s.Particles.DiameterNm != nil {
		d50 = *s.Particles.DiameterNm
	}
	for i := 0; i < 20; i++ {
		f := float64(i+1) / 20
		s.Particles.SizeDistribution = append(s.Particles.SizeDistribution,
			input.SizeClass{DiameterNm: d50 * (0.3 + 1.4*f), VolumeFraction: 0.05})
	}
	benchTriage(b, s)
}

// BenchmarkTriageDemos triages each single-size demo scenario, one
// sub-benchmark each: the spread of the single-size target over the
// complaints the demos cover.
func BenchmarkTriageDemos(b *testing.B) {
	entries, err := os.ReadDir("../testdata/demo")
	if err != nil {
		b.Fatal(err)
	}
	for _, entry := range entries {
		name, ok := strings.CutSuffix(entry.Name(), ".json")
		if !ok {
			continue
		}
		if s := benchSample(b, entry.Name()); len(s.Particles.SizeDistribution) == 0 {
			b.Run(name, func(b *testing.B) { benchTriage(b, s) })
		}
	}
}
