package advisor

import (
	"encoding/json"
	"math"
	"testing"

	"colloidtriage/advisor/input"
)

// comparePair returns a reference lot of a zirconia slip that behaved and
// a complaint lot made with a new, hard water supply (2 mM of Ca2+ as
// 200 mg/L CaCO3), with small lot-to-lot drifts of size, solids, zeta, pH,
// temperature and container beside it. The calcium alone removes the
// barrier: a 2:1 salt at 2 mM is past the critical coagulation
// concentration of divalent ions on a -42 mV surface (Schulze-Hardy; the
// multivalent_ions demo scenario), while each drift moves it by a few kT.
func comparePair(t testing.TB) (ref, complaint *input.Sample) {
	t.Helper()
	refJSON := `{"sample_id": "LOT-41", "symptom": "flocculation",
	  "particles": {"material": "zirconia", "diameter_nm": 400, "volume_fraction": 0.35, "zeta_mV": -42},
	  "medium": {"liquid": "water", "temperature_c": 25, "ph": 9.2, "electrolytes": [{"formula": "NaCl", "concentration_mM": 2}]},
	  "storage": {"container_height_mm": 600, "shelf_life_days": 7},
	  "analysis": {"draws": 0}}`
	cmpJSON := `{"sample_id": "LOT-42", "symptom": "flocculation",
	  "particles": {"material": "zirconia", "diameter_nm": 420, "volume_fraction": 0.34, "zeta_mV": -40, "density_kg_m3": 5900},
	  "medium": {"liquid": "water", "temperature_c": 24, "ph": 9.0, "electrolytes": [{"formula": "NaCl", "concentration_mM": 2.2}],
	    "hardness": {"value": 200, "unit": "mg_L_CaCO3"}},
	  "storage": {"container_height_mm": 590, "shelf_life_days": 8},
	  "analysis": {"draws": 0}}`
	ref, complaint = new(input.Sample), new(input.Sample)
	if err := json.Unmarshal([]byte(refJSON), ref); err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal([]byte(cmpJSON), complaint); err != nil {
		t.Fatal(err)
	}
	return ref, complaint
}

func TestCompareDecisiveDifferenceRanksFirst(t *testing.T) {
	t.Parallel()
	e := benchEngine(t)
	ref, complaint := comparePair(t)
	c, err := e.Compare(ref, complaint, nil)
	if err != nil {
		t.Fatal(err)
	}
	if len(c.Differences) != 10 {
		t.Fatalf("%d differences, want 10: %+v", len(c.Differences), c.Differences)
	}
	if c.KeyScale != "energy_barrier" {
		t.Fatalf("key scale %q, want energy_barrier", c.KeyScale)
	}
	first := c.Differences[0]
	if first.Path != "/medium/hardness" || first.Share == nil || *first.Share < 0.5 {
		t.Fatalf("first difference %s share %v, want /medium/hardness carrying most of the loss of barrier; verdict: %s",
			first.Path, first.Share, c.Verdict)
	}
	for i, d := range c.Differences {
		if d.Rank != i+1 || d.Problem != "" {
			t.Errorf("difference %d: rank %d, problem %q", i, d.Rank, d.Problem)
		}
	}
	if len(c.Pairs) != 6 {
		t.Errorf("%d pairs, want 6 (the four strongest, two by two)", len(c.Pairs))
	}
	// The interaction is the pair's change less the two single changes.
	p := c.Pairs[0]
	var a, b Difference
	for _, d := range c.Differences {
		switch d.Path {
		case p.Paths[0]:
			a = d
		case p.Paths[1]:
			b = d
		}
	}
	want := p.Effects["energy_barrier"] - a.Effects["energy_barrier"] - b.Effects["energy_barrier"]
	if got := p.Interaction["energy_barrier"]; math.Abs(got-want) > 1e-2*(1+math.Abs(want)) { // each effect is rounded to 4 digits
		t.Errorf("interaction %g, want %g", got, want)
	}
	if c.Triage == nil || c.Triage.SampleID != "LOT-42" {
		t.Errorf("the comparison carries no triage of the complaint")
	}
	if c.Verdict == "" {
		t.Error("no verdict")
	}
	t.Log(c.Verdict)
}

func TestCompareDeterministic(t *testing.T) {
	t.Parallel()
	e := benchEngine(t)
	ref, complaint := comparePair(t)
	a, err := e.Compare(ref, complaint, nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := e.Compare(ref, complaint, nil)
	if err != nil {
		t.Fatal(err)
	}
	ja, _ := json.Marshal(a)
	jb, _ := json.Marshal(b)
	if string(ja) != string(jb) {
		t.Error("two comparisons of the same pair differ")
	}
}

func TestCompareIdentical(t *testing.T) {
	t.Parallel()
	e := benchEngine(t)
	ref, _ := comparePair(t)
	c, err := e.Compare(ref, ref, nil)
	if err != nil {
		t.Fatal(err)
	}
	if len(c.Differences) != 0 || len(c.Pairs) != 0 || c.KeyScale != "" {
		t.Errorf("identical samples: %d differences, %d pairs, key %q", len(c.Differences), len(c.Pairs), c.KeyScale)
	}
}

// BenchmarkCompare compares two single-size samples with ten differing
// inputs (analysis.draws 0 in both).
func BenchmarkCompare(b *testing.B) {
	e := benchEngine(b)
	ref, complaint := comparePair(b)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := e.Compare(ref, complaint, nil); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkCompareDraws200 is BenchmarkCompare with the complaint's triage
// running 200 Monte Carlo draws.
func BenchmarkCompareDraws200(b *testing.B) {
	e := benchEngine(b)
	ref, complaint := comparePair(b)
	draws := 200
	complaint.Analysis = &input.Analysis{Draws: &draws}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := e.Compare(ref, complaint, nil); err != nil {
			b.Fatal(err)
		}
	}
}
