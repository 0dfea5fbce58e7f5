package advisor

import (
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"reflect"
	"sort"
	"strings"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
)

// CompareMethod names the swap analysis of Engine.Compare.
const CompareMethod = "one-at-a-time and pairwise swap decomposition from the reference to the complaint, " +
	"as the main effects and two-factor interactions of a two-level factorial design " +
	"(Box, Hunter & Hunter, Statistics for Experimenters, 2nd ed. 2005, ch. 5); nominal evaluation of each swap"

// comparedScales are the stability scales a comparison follows, in the
// order the report lists them.
var comparedScales = [...]string{
	"energy_barrier",
	"log10_half_life_over_shelf_life",
	"clear_layer_at_shelf_life",
	"relative_viscosity",
	"time_to_double_diameter",
}

// keyScales lists, per symptom, the scales that best measure the complaint,
// preferred first; the key scale is the first whose change is finite and
// not zero.
var keyScales = map[string][]string{
	"settling":         {"clear_layer_at_shelf_life", "energy_barrier", "log10_half_life_over_shelf_life"},
	"creaming":         {"clear_layer_at_shelf_life", "energy_barrier", "log10_half_life_over_shelf_life"},
	"viscosity_rise":   {"relative_viscosity", "energy_barrier", "log10_half_life_over_shelf_life"},
	"size_growth":      {"time_to_double_diameter", "energy_barrier", "log10_half_life_over_shelf_life"},
	"flocculation":     {"energy_barrier", "log10_half_life_over_shelf_life"},
	"caking":           {"energy_barrier", "log10_half_life_over_shelf_life", "clear_layer_at_shelf_life"},
	"phase_separation": {"energy_barrier", "log10_half_life_over_shelf_life", "clear_layer_at_shelf_life"},
}

// maxPairs is how many of the strongest single differences are also
// swapped in pairs (all pairs among them).
const maxPairs = 4

// notCompared are the members of a sample that describe the complaint or
// the analysis rather than the product: they are never swapped.
var notCompared = map[string]bool{"sample_id": true, "symptom": true, "observation": true, "analysis": true, "uncertainty": true}

// Comparison is the answer to a reference batch that behaved and a
// complaint batch that did not.
type Comparison struct {
	Versions    Versions      `json:"versions"`
	Method      string        `json:"method"`
	KeyScale    string        `json:"key_scale,omitempty"`
	Scales      []ScaleChange `json:"scales"`
	Differences []Difference  `json:"differences"`
	Pairs       []PairEffect  `json:"pairs"`
	Verdict     string        `json:"verdict"`
	Triage      *Report       `json:"triage"`
}

// ScaleChange is one compared scale at the reference and at the complaint;
// a value that is not finite (no ripening, say) is absent.
type ScaleChange struct {
	Scale     string   `json:"scale"`
	Unit      string   `json:"unit"`
	Reference *float64 `json:"reference,omitempty"`
	Complaint *float64 `json:"complaint,omitempty"`
	Change    *float64 `json:"change,omitempty"`
}

// Difference is one input that differs between the batches: its JSON
// pointer in a sample, its value in each (null when absent), the change of
// each compared scale when it alone is swapped from the reference to the
// complaint, and the share of the key scale's change it carries.
type Difference struct {
	Rank      int                `json:"rank"`
	Path      string             `json:"path"`
	Reference any                `json:"reference"`
	Complaint any                `json:"complaint"`
	Effects   map[string]float64 `json:"effects"`
	Share     *float64           `json:"share,omitempty"`
	// Problem says why the swap could not be evaluated (the reference with
	// this input alone is not a valid or consistent sample).
	Problem string `json:"problem,omitempty"`
}

// PairEffect is two differences swapped together: the change of each
// scale, and the interaction (the pair's change less the two single
// changes).
type PairEffect struct {
	Paths       [2]string          `json:"paths"`
	Effects     map[string]float64 `json:"effects"`
	Interaction map[string]float64 `json:"interaction"`
	Share       *float64           `json:"share,omitempty"`
	Problem     string             `json:"problem,omitempty"`
}

// compared is the nominal value of each compared scale of one sample.
type compared [len(comparedScales)]float64

// Compare explains which differences of input between a reference sample
// and a complaint sample change the complaint's predicted stability (see
// CompareMethod), and triages the complaint in full. valid checks a swapped
// sample as the caller checks requests; both samples must already be valid.
func (e *Engine) Compare(ref, complaint *input.Sample, valid func(*input.Sample) error) (*Comparison, error) {
	rep, err := e.Triage(complaint)
	if err != nil {
		return nil, under("/complaint", err)
	}
	base := *ref
	base.Symptom = complaint.Symptom
	refTree, err := tree(&base)
	if err != nil {
		return nil, err
	}
	cmpTree, err := tree(complaint)
	if err != nil {
		return nil, err
	}
	refVals, err := e.nominal(&base)
	if err != nil {
		return nil, under("/reference", err)
	}
	cmpVals, err := e.nominal(complaint)
	if err != nil {
		return nil, under("/complaint", err)
	}
	out := &Comparison{Versions: Versions{Engine: EngineVersion, Rules: e.rules.Hash}, Method: CompareMethod, Triage: rep,
		Scales: make([]ScaleChange, len(comparedScales)), Differences: []Difference{}, Pairs: []PairEffect{}}
	for i, name := range comparedScales {
		out.Scales[i] = ScaleChange{Scale: name, Unit: scaleIndex[name].Unit, Reference: finitePtr(refVals[i]), Complaint: finitePtr(cmpVals[i]),
			Change: finitePtr(cmpVals[i] - refVals[i])}
	}
	key := -1
	for _, name := range keyScales[complaint.Symptom] {
		i := comparedIndex(name)
		if d := cmpVals[i] - refVals[i]; !math.IsNaN(d) && !math.IsInf(d, 0) && d != 0 {
			key = i
			break
		}
	}
	if key >= 0 {
		out.KeyScale = comparedScales[key]
	}
	paths := differences(refTree, cmpTree, "")
	singles := make([]compared, len(paths))
	diffs := make([]Difference, len(paths))
	for i, p := range paths {
		d := Difference{Path: p.path, Reference: p.ref, Complaint: p.cmp}
		singles[i], d.Problem = e.swap(refTree, valid, p)
		d.Effects = effects(singles[i], refVals)
		d.Share = shareOf(singles[i], refVals, cmpVals, key)
		diffs[i] = d
	}
	order := make([]int, len(paths))
	for i := range order {
		order[i] = i
	}
	strength := func(i int) float64 {
		if s := diffs[i].Share; s != nil {
			return math.Abs(*s)
		}
		return -1
	}
	sort.SliceStable(order, func(a, b int) bool { return strength(order[a]) > strength(order[b]) })
	for r, i := range order {
		d := diffs[i]
		d.Rank = r + 1
		out.Differences = append(out.Differences, d)
	}
	top := make([]int, 0, maxPairs)
	for _, i := range order {
		if len(top) < maxPairs && diffs[i].Problem == "" && strength(i) >= 0 {
			top = append(top, i)
		}
	}
	for a := 0; a < len(top); a++ {
		for b := a + 1; b < len(top); b++ {
			i, j := top[a], top[b]
			vals, problem := e.swap(refTree, valid, paths[i], paths[j])
			pe := PairEffect{Paths: [2]string{paths[i].path, paths[j].path}, Problem: problem,
				Effects: effects(vals, refVals), Interaction: map[string]float64{}}
			for k, name := range comparedScales {
				x := vals[k] - singles[i][k] - singles[j][k] + refVals[k]
				if !math.IsNaN(x) && !math.IsInf(x, 0) && problem == "" {
					pe.Interaction[name] = number.Round(x, 4)
				}
			}
			pe.Share = shareOf(vals, refVals, cmpVals, key)
			out.Pairs = append(out.Pairs, pe)
		}
	}
	out.Verdict = verdict(out, refVals, cmpVals, key)
	return out, nil
}

// under puts the field pointers of an *input.Error under prefix, the
// sample's member in the comparison request.
func under(prefix string, err error) error {
	var ie *input.Error
	if !errors.As(err, &ie) {
		return err
	}
	out := &input.Error{Problems: make([]input.FieldProblem, len(ie.Problems))}
	for i, p := range ie.Problems {
		p.Pointer = prefix + p.Pointer
		out.Problems[i] = p
	}
	return out
}

func comparedIndex(name string) int {
	for i, n := range comparedScales {
		if n == name {
			return i
		}
	}
	panic("advisor: not a compared scale " + name)
}

// nominal evaluates the compared scales of a sample, lean (facts only).
func (e *Engine) nominal(s *input.Sample) (compared, error) {
	c, err := input.Resolve(s, e.lib, nil)
	if err != nil {
		return compared{}, err
	}
	ev := &evaluation{cond: c, facts: e.rules.NewFacts(), lean: true}
	ev.compute()
	var out compared
	for i, name := range comparedScales {
		out[i] = ev.facts.Number(name)
	}
	return out, nil
}

// swap evaluates the reference with the given differences taken from the
// complaint; problem says why it could not.
func (e *Engine) swap(refTree map[string]any, valid func(*input.Sample) error, ps ...diff) (compared, string) {
	t := clone(refTree).(map[string]any)
	for _, p := range ps {
		set(t, strings.Split(p.path[1:], "/"), p.cmp)
	}
	raw, err := json.Marshal(t)
	if err != nil {
		return nanCompared(), "the swapped sample could not be written"
	}
	var s input.Sample
	if err := json.Unmarshal(raw, &s); err != nil {
		return nanCompared(), "the swapped sample could not be read"
	}
	if valid != nil {
		if err := valid(&s); err != nil {
			return nanCompared(), "the reference with this swap is not a valid sample"
		}
	}
	vals, err := e.nominal(&s)
	if err != nil {
		return nanCompared(), "the reference with this swap is physically inconsistent: " + err.Error()
	}
	return vals, ""
}

func nanCompared() compared {
	var c compared
	for i := range c {
		c[i] = math.NaN()
	}
	return c
}

// effects is the change of each compared scale from the reference,
// rounded; changes that are not finite are left out.
func effects(vals, ref compared) map[string]float64 {
	m := make(map[string]float64, len(vals))
	for i, name := range comparedScales {
		if d := vals[i] - ref[i]; !math.IsNaN(d) && !math.IsInf(d, 0) {
			m[name] = number.Round(d, 4)
		}
	}
	return m
}

// shareOf is the fraction of the key scale's change from the reference to
// the complaint that vals carries.
func shareOf(vals, ref, cmp compared, key int) *float64 {
	if key < 0 {
		return nil
	}
	s := (vals[key] - ref[key]) / (cmp[key] - ref[key])
	if math.IsNaN(s) || math.IsInf(s, 0) {
		return nil
	}
	s = number.Round(s, 3)
	return &s
}

func finitePtr(v float64) *float64 {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return nil
	}
	r := number.Round(v, 6)
	return &r
}

// tree is a sample as decoded JSON: objects, arrays and scalars.
func tree(s *input.Sample) (map[string]any, error) {
	raw, err := json.Marshal(s)
	if err != nil {
		return nil, err
	}
	var t map[string]any
	return t, json.Unmarshal(raw, &t)
}

// diff is one differing member: its JSON pointer and its two values.
type diff struct {
	path     string
	ref, cmp any
}

// differences lists the members that differ, by JSON pointer in sorted
// order: objects present in both are compared member by member; an array,
// a scalar, or an object present in one sample only is one member.
func differences(ref, cmp map[string]any, prefix string) []diff {
	keys := make([]string, 0, len(ref)+len(cmp))
	for k := range ref {
		keys = append(keys, k)
	}
	for k := range cmp {
		if _, ok := ref[k]; !ok {
			keys = append(keys, k)
		}
	}
	sort.Strings(keys)
	var out []diff
	for _, k := range keys {
		if prefix == "" && notCompared[k] {
			continue
		}
		a, b := ref[k], cmp[k]
		path := prefix + "/" + k
		ma, okA := a.(map[string]any)
		mb, okB := b.(map[string]any)
		switch {
		case okA && okB:
			out = append(out, differences(ma, mb, path)...)
		case !reflect.DeepEqual(a, b):
			out = append(out, diff{path: path, ref: a, cmp: b})
		}
	}
	return out
}

// clone copies a decoded JSON value deeply.
func clone(v any) any {
	switch x := v.(type) {
	case map[string]any:
		m := make(map[string]any, len(x))
		for k, e := range x {
			m[k] = clone(e)
		}
		return m
	case []any:
		a := make([]any, len(x))
		for i, e := range x {
			a[i] = clone(e)
		}
		return a
	}
	return v
}

// set writes v at the path of keys in t (deletes the member when v is
// nil), creating the objects on the way.
func set(t map[string]any, keys []string, v any) {
	for _, k := range keys[:len(keys)-1] {
		next, ok := t[k].(map[string]any)
		if !ok {
			next = map[string]any{}
			t[k] = next
		}
		t = next
	}
	last := keys[len(keys)-1]
	if v == nil {
		delete(t, last)
		return
	}
	t[last] = clone(v)
}

// verdict writes the one-paragraph answer: which difference carries the
// largest share of the key scale's change, the next ones, and the
// strongest interaction.
func verdict(c *Comparison, ref, cmp compared, key int) string {
	if len(c.Differences) == 0 {
		return "The two samples do not differ in any input that enters the physics; the difference in behaviour lies outside the inputs given."
	}
	if key < 0 {
		return fmt.Sprintf("The samples differ in %d input(s), but none of the compared stability scales changes between them: "+
			"the difference in behaviour is not explained by the inputs given.", len(c.Differences))
	}
	name := comparedScales[key]
	unit := scaleIndex[name].Unit
	dir := "rise"
	if cmp[key] < ref[key] {
		dir = "fall"
	}
	var b strings.Builder
	first := c.Differences[0]
	change := fmt.Sprintf("the %s of the %s from %s to %s %s", dir, strings.ReplaceAll(name, "_", " "),
		number.Shortest(number.Round(ref[key], 3)), number.Shortest(number.Round(cmp[key], 3)), unit)
	if first.Share == nil {
		fmt.Fprintf(&b, "No single difference of the %d could be evaluated against %s.", len(c.Differences), change)
		return b.String()
	}
	fmt.Fprintf(&b, "Of the %d differing input(s), %s (%s -> %s) alone carries %s of %s", len(c.Differences),
		first.Path, valueText(first.Reference), valueText(first.Complaint), percent(*first.Share), change)
	if len(c.Differences) > 1 && c.Differences[1].Share != nil {
		second := c.Differences[1]
		fmt.Fprintf(&b, "; next comes %s with %s", second.Path, percent(*second.Share))
	}
	b.WriteString(".")
	strongest := -1
	for i, p := range c.Pairs {
		x, ok := p.Interaction[name]
		if ok && (strongest < 0 || math.Abs(x) > math.Abs(c.Pairs[strongest].Interaction[name])) {
			strongest = i
		}
	}
	if strongest >= 0 {
		p := c.Pairs[strongest]
		x := p.Interaction[name] / (cmp[key] - ref[key])
		fmt.Fprintf(&b, " The strongest interaction, %s with %s, carries %s beyond their single effects.", p.Paths[0], p.Paths[1], percent(x))
	}
	return b.String()
}

func percent(x float64) string {
	return number.Shortest(number.Round(100*x, 2)) + " %"
}

func valueText(v any) string {
	if v == nil {
		return "absent"
	}
	raw, err := json.Marshal(v)
	if err != nil {
		return "?"
	}
	if len(raw) > 80 {
		return string(raw[:77]) + "..."
	}
	return string(raw)
}
