package uncertainty

import (
	"encoding/json"
	"hash/fnv"
	"math"
	"math/rand/v2"

	"colloidtriage/advisor/input"
)

// DefaultDraws is the number of draws when the request does not set it;
// MaxDraws the most it may ask for.
const (
	DefaultDraws = 200
	MaxDraws     = 2000
)

// Draws is the number of draws a request asks for: analysis.draws, else
// DefaultDraws.
func Draws(s *input.Sample) int {
	if s.Analysis != nil && s.Analysis.Draws != nil {
		return *s.Analysis.Draws
	}
	return DefaultDraws
}

// Seed is the seed of a request's random numbers: analysis.seed, else one
// derived from the request itself (FNV-1a of its canonical JSON, the
// request with analysis.seed left out), so that identical input gives
// identical output.
func Seed(s *input.Sample) uint64 {
	if s.Analysis != nil && s.Analysis.Seed != nil {
		return uint64(*s.Analysis.Seed)
	}
	canonical := *s
	if canonical.Analysis != nil {
		a := *canonical.Analysis
		a.Seed = nil
		canonical.Analysis = &a
	}
	data, _ := json.Marshal(&canonical) // a validated Sample always encodes
	h := fnv.New64a()
	h.Write(data)
	return h.Sum64() >> 11 // 53 bits: exact in any JSON reader
}

// Deviates draws n rows of standard-normal deviates, one per input, each
// truncated to the input's physical range by redrawing (at most 16 times,
// then clamping): the effective deviate of a clamped value is stored, so
// that a row always reproduces its values.
func Deviates(inputs []Input, n int, seed uint64) [][]float64 {
	rng := rand.New(rand.NewPCG(seed, 0x636f6c6c6f6964)) // second word: a fixed stream id
	flat := make([]float64, n*len(inputs))
	rows := make([][]float64, n)
	for k := range rows {
		row := flat[k*len(inputs) : (k+1)*len(inputs)]
		for i, in := range inputs {
			z := rng.NormFloat64()
			for try := 0; try < 16 && !in.inRange(in.value(z)); try++ {
				z = rng.NormFloat64()
			}
			if !in.inRange(in.value(z)) {
				z = in.deviate(math.Min(math.Max(in.value(z), in.Lo), in.Hi))
			}
			if math.IsNaN(z) || math.IsInf(z, 0) {
				z = 0
			}
			row[i] = z
		}
		rows[k] = row
	}
	return rows
}

func (in Input) inRange(v float64) bool { return v >= in.Lo && v <= in.Hi }

// deviate is the inverse of value.
func (in Input) deviate(v float64) float64 {
	if in.Factor > 0 {
		return math.Log(v/in.Nominal) / math.Log(in.Factor)
	}
	return (v - in.Nominal) / in.SD
}

// Apply writes one row of deviates into a copy of the nominal conditions,
// in the inputs' order, derives the ions and the zeta potential from them
// as Resolve does (input.Conditions.Rederive), then applies the errors of
// derived values, and returns the copy. The nominal conditions are not
// changed (slices that an input rescales are copied).
func Apply(inputs []Input, row []float64, nominal *input.Conditions) *input.Conditions {
	c := *nominal
	d := input.NominalDrawn()
	for i, in := range inputs {
		switch {
		case row[i] == 0 || in.after:
		case in.drawn != nil:
			in.drawn(&d, in.value(row[i]))
		default:
			in.apply(&c, in.value(row[i]))
		}
	}
	c.Rederive(d)
	for i, in := range inputs {
		if in.after && row[i] != 0 {
			in.apply(&c, in.value(row[i]))
		}
	}
	return &c
}

// Value is the input's value in a row of deviates.
func (in Input) Value(z float64) float64 { return in.value(z) }
