package advisor_test

import (
	"encoding/binary"
	"encoding/json"
	"errors"
	"math"
	"os"
	"path/filepath"
	"reflect"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/go-playground/validator/v10"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/rules"
)

// FuzzTriage runs Engine.Triage and Engine.Profile on samples that the HTTP
// edge would accept: a demo scenario edited by a fuzzed program of
// (field, number) pairs, each number folded into the field's valid range
// from its validate tag, then checked with the same validator settings as
// package api. Neither may panic; an error must be an *input.Error
// naming fields; a report must marshal with encoding/json, which refuses
// NaN and infinities.
//
// Run it longer with
//
//	go test -run '^$' -fuzz '^FuzzTriage$' -fuzztime 10m ./advisor
func FuzzTriage(f *testing.F) {
	demos := fuzzDemos(f)
	eng, err := advisor.LoadEngine(rules.FS)
	if err != nil {
		f.Fatal(err)
	}
	fields := fuzzFields(eng)
	for i := range demos {
		f.Add(uint8(i), []byte{})
		// One edit per seed: field i set from the bits of 1e-3 * i.
		f.Add(uint8(i), fuzzOp(uint8(i), 1e-3*float64(i)))
	}
	// Edges found by hand: 0 and the largest float in every field.
	for i := range fields {
		f.Add(uint8(i), append(fuzzOp(uint8(i), 0), fuzzOp(uint8(i+1), math.MaxFloat64)...))
	}
	check := fuzzValidator()
	f.Fuzz(func(t *testing.T, demo uint8, program []byte) {
		s := demos[int(demo)%len(demos)]
		s = cloneSample(t, s)
		for len(program) >= 9 {
			op := program[0]
			x := math.Float64frombits(binary.LittleEndian.Uint64(program[1:9]))
			program = program[9:]
			fields[int(op&0x7f)%len(fields)].apply(reflect.ValueOf(s).Elem(), x, op&0x80 != 0)
		}
		if check.Struct(s) != nil {
			return // the edge would refuse it with a 422
		}
		rep, err := guarded(t, eng, s, func() (any, error) { return eng.Triage(s) })
		checkTriageResult(t, s, rep, err)
		points := advisor.ProfilePointsMin + int(demo)*7
		prof, err := guarded(t, eng, s, func() (any, error) { return eng.Profile(s, points) })
		checkTriageResult(t, s, prof, err)
	})
}

// guarded runs one engine call; a panic or a hang fails the test.
func guarded(t *testing.T, eng *advisor.Engine, s *input.Sample, call func() (any, error)) (result any, err error) {
	t.Helper()
	start := time.Now()
	defer func() {
		if d := time.Since(start); d > slowCall {
			t.Errorf("took %v (a triage should take well under 1 ms) for %s", d, sampleJSON(s))
		}
		if r := recover(); r != nil {
			t.Fatalf("panic: %v\nfor %s", r, sampleJSON(s))
		}
	}()
	return call()
}

// slowCall is far beyond any triage's time, even under the fuzzer's
// instrumentation: a call that takes longer hangs for a client.
const slowCall = time.Second

func checkTriageResult(t *testing.T, s *input.Sample, result any, err error) {
	t.Helper()
	if err != nil {
		var ie *input.Error
		if !errors.As(err, &ie) || len(ie.Problems) == 0 {
			t.Fatalf("error %T %v for %s", err, err, sampleJSON(s))
		}
		for _, p := range ie.Problems {
			if !strings.HasPrefix(p.Pointer, "/") || p.Reason == "" {
				t.Fatalf("problem %+v without a pointer or reason for %s", p, sampleJSON(s))
			}
		}
		return
	}
	if _, err := json.Marshal(result); err != nil {
		t.Fatalf("result does not marshal (%v) for %s", err, sampleJSON(s))
	}
}

func sampleJSON(s *input.Sample) string {
	b, _ := json.Marshal(s)
	return string(b)
}

func cloneSample(t *testing.T, s *input.Sample) *input.Sample {
	b, err := json.Marshal(s)
	if err != nil {
		t.Fatal(err)
	}
	var out input.Sample
	if err := json.Unmarshal(b, &out); err != nil {
		t.Fatal(err)
	}
	return &out
}

// fuzzOp encodes one program step: set field op to x.
func fuzzOp(op uint8, x float64) []byte {
	b := make([]byte, 9)
	b[0] = op
	binary.LittleEndian.PutUint64(b[1:], math.Float64bits(x))
	return b
}

func fuzzDemos(f *testing.F) []*input.Sample {
	files, err := filepath.Glob("../testdata/demo/*.json")
	if err != nil || len(files) == 0 {
		f.Fatalf("no demo scenarios: %v", err)
	}
	out := make([]*input.Sample, len(files))
	for i, name := range files {
		b, err := os.ReadFile(name)
		if err != nil {
			f.Fatal(err)
		}
		out[i] = &input.Sample{}
		if err := json.Unmarshal(b, out[i]); err != nil {
			f.Fatalf("%s: %v", name, err)
		}
	}
	return out
}

// fuzzValidator validates as package api does (JSON names, required
// structs).
func fuzzValidator() *validator.Validate {
	v := validator.New(validator.WithRequiredStructEnabled())
	v.RegisterTagNameFunc(func(f reflect.StructField) string {
		name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
		return name
	})
	return v
}

// fuzzField is one settable leaf of input.Sample: the struct field
// indices leading to it (a slice is entered at an element chosen by the
// number), and how a number becomes a valid value.
type fuzzField struct {
	path    [][]int // Index of each struct field on the way
	kind    reflect.Kind
	lo, hi  float64
	loOpen  bool
	hiOpen  bool
	choices []string // for strings: the values to pick from
}

// fuzzFields lists every leaf of input.Sample by reflection: numbers with
// their ranges, enumerations with their values, library keys and salt
// formulas for the free-text names.
func fuzzFields(eng *advisor.Engine) []fuzzField {
	salts := []string{"NaCl", "KCl", "CaCl2", "MgSO4", "Na2SO4", "AlCl3", "LaCl3", "Ca(NO3)2", "K4Fe(CN)6", ""}
	var out []fuzzField
	var walk func(t reflect.Type, path [][]int)
	walk = func(t reflect.Type, path [][]int) {
		for i := range t.NumField() {
			sf := t.Field(i)
			p := append(append([][]int{}, path...), sf.Index)
			ft := sf.Type
			for ft.Kind() == reflect.Pointer || ft.Kind() == reflect.Slice {
				ft = ft.Elem()
			}
			ff := fuzzField{path: p, kind: ft.Kind()}
			tag := sf.Tag.Get("validate")
			switch ft.Kind() {
			case reflect.Struct:
				walk(ft, p)
				continue
			case reflect.Float64, reflect.Int:
				for _, part := range strings.Split(tag, ",") {
					k, v, _ := strings.Cut(part, "=")
					x, err := strconv.ParseFloat(v, 64)
					if err != nil {
						continue
					}
					switch k {
					case "gt", "gte":
						ff.lo, ff.loOpen = x, k == "gt"
					case "lt", "lte":
						ff.hi, ff.hiOpen = x, k == "lt"
					}
				}
			case reflect.String:
				name, _, _ := strings.Cut(sf.Tag.Get("json"), ",")
				switch {
				case strings.Contains(tag, "oneof="):
					_, list, _ := strings.Cut(tag, "oneof=")
					list, _, _ = strings.Cut(list, ",")
					ff.choices = strings.Fields(list)
					if strings.HasPrefix(tag, "omitempty") {
						ff.choices = append(ff.choices, "")
					}
				case name == "material":
					ff.choices = append(eng.Library().MaterialKeys(), "")
				case name == "liquid":
					ff.choices = append(eng.Library().LiquidKeys(), "")
				case name == "formula":
					ff.choices = salts
				default:
					continue // sample_id: free text, echoed only
				}
			case reflect.Bool:
			default:
				continue
			}
			out = append(out, ff)
		}
	}
	walk(reflect.TypeOf(input.Sample{}), nil)
	return out
}

// apply sets the field in the sample root from x, or clears it when clear
// is set and the field is optional. Structs on the way are allocated with
// their required members set to the middle of their range.
func (ff fuzzField) apply(root reflect.Value, x float64, clear bool) {
	v := root
	for _, idx := range ff.path {
		if v.Kind() == reflect.Slice {
			if v.Len() == 0 {
				v.Set(reflect.Append(v, newRequired(v.Type().Elem())))
			}
			v = v.Index(int(fold(x, 0, float64(v.Len()-1), false, false)))
		}
		if v.Kind() == reflect.Pointer {
			if v.IsNil() {
				v.Set(reflect.New(v.Type().Elem()))
				fillRequired(v.Elem())
			}
			v = v.Elem()
		}
		v = v.FieldByIndex(idx)
	}
	if clear && (v.Kind() == reflect.Pointer || v.Kind() == reflect.Slice) {
		v.Set(reflect.Zero(v.Type()))
		return
	}
	if v.Kind() == reflect.Slice {
		return // a slice of numbers is not part of the contract
	}
	if v.Kind() == reflect.Pointer {
		if v.IsNil() {
			v.Set(reflect.New(v.Type().Elem()))
		}
		v = v.Elem()
	}
	switch ff.kind {
	case reflect.Float64:
		v.SetFloat(fold(x, ff.lo, ff.hi, ff.loOpen, ff.hiOpen))
	case reflect.Int:
		v.SetInt(int64(math.Round(fold(x, ff.lo, ff.hi, false, false))))
	case reflect.String:
		v.SetString(ff.choices[int(fold(x, 0, float64(len(ff.choices)-1), false, false))])
	case reflect.Bool:
		v.SetBool(x > 0)
	}
}

// fold maps any float64 into [lo, hi] (open ends excluded): a value inside
// is kept as it is, so that the fuzzer can reach the edges exactly; one
// outside is folded by its fractional part, on a log scale when the range
// spans more than three decades above zero.
func fold(x, lo, hi float64, loOpen, hiOpen bool) float64 {
	if !(x >= lo && x <= hi) {
		u := 0.0
		if !math.IsNaN(x) && !math.IsInf(x, 0) {
			u = math.Abs(x) - math.Floor(math.Abs(x))
		}
		if lo > 0 && hi/lo > 1e3 {
			x = lo * math.Pow(hi/lo, u)
		} else {
			x = lo + u*(hi-lo)
		}
		x = math.Min(math.Max(x, lo), hi)
	}
	if loOpen && x <= lo {
		x = math.Nextafter(lo, math.Inf(1))
	}
	if hiOpen && x >= hi {
		x = math.Nextafter(hi, math.Inf(-1))
	}
	return x
}

func newRequired(t reflect.Type) reflect.Value {
	v := reflect.New(t).Elem()
	fillRequired(v)
	return v
}

// fillRequired sets the required numbers of a new struct, and the plain
// (non-pointer) numbers that are validated even when zero, to the middle of
// their range, and a required choice to its first value.
func fillRequired(v reflect.Value) {
	t := v.Type()
	for i := range t.NumField() {
		sf := t.Field(i)
		tag := sf.Tag.Get("validate")
		if _, choices, ok := strings.Cut(tag, "oneof="); ok && sf.Type.Kind() == reflect.String && strings.HasPrefix(tag, "required,") {
			first, _, _ := strings.Cut(choices, " ")
			v.Field(i).SetString(first)
			continue
		}
		if !strings.HasPrefix(tag, "required,") && sf.Type.Kind() != reflect.Float64 {
			continue
		}
		ff := fuzzField{kind: reflect.Float64}
		for _, part := range strings.Split(tag, ",") {
			k, val, _ := strings.Cut(part, "=")
			if k == "oneof" && v.Field(i).Kind() == reflect.String {
				first, _, _ := strings.Cut(val, " ")
				v.Field(i).SetString(first)
			}
			if x, err := strconv.ParseFloat(val, 64); err == nil && (k == "gt" || k == "gte") {
				ff.lo = x
			} else if err == nil && (k == "lt" || k == "lte") {
				ff.hi = x
			}
		}
		mid := (ff.lo + ff.hi) / 2
		f := v.Field(i)
		if f.Kind() == reflect.String {
			continue
		}
		if f.Kind() == reflect.Pointer {
			f.Set(reflect.New(f.Type().Elem()))
			f = f.Elem()
		}
		f.SetFloat(mid)
	}
}
