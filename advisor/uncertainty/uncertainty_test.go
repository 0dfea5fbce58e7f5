package uncertainty

import (
	"errors"
	"math"
	"math/rand/v2"
	"testing"

	"colloidtriage/advisor/input"
)

// Every input path has a default, a physical range and a measurement;
// every default has a source.
func TestTableComplete(t *testing.T) {
	t.Parallel()
	for path := range how {
		found := false
		for _, d := range defaults {
			found = found || d.path == path
		}
		if !found {
			t.Errorf("%s: no default uncertainty", path)
		}
		if _, _, ok := Range(path); !ok {
			t.Errorf("%s: no physical range", path)
		}
	}
	for _, d := range defaults {
		if d.source == "" || (d.sd == 0 && d.relative == 0 && d.factor == 0) || (d.factor != 0 && d.factor < 1) {
			t.Errorf("%s (%s): incomplete default %+v", d.path, d.provenance, d)
		}
		if !Known(d.path) {
			t.Errorf("%s: a default for a path that is no input", d.path)
		}
	}
}

func TestCheck(t *testing.T) {
	t.Parallel()
	if err := Check(input.Uncertainty{"particles.zeta_mV": {SD: 5}, "particles.hamaker_zJ": {Factor: 2}}); err != nil {
		t.Fatal(err)
	}
	err := Check(input.Uncertainty{"particles.colour": {SD: 1}, "particles.hamaker_zJ": {Factor: 0.5}, "a/b~c": {SD: 1}})
	var bad *input.Error
	if !errors.As(err, &bad) {
		t.Fatalf("error %v, want an input.Error", err)
	}
	want := []string{"/uncertainty/a~1b~0c", "/uncertainty/particles.colour", "/uncertainty/particles.hamaker_zJ/factor"}
	if len(bad.Problems) != len(want) {
		t.Fatalf("problems %+v, want %v", bad.Problems, want)
	}
	for i, p := range bad.Problems {
		if p.Pointer != want[i] {
			t.Errorf("problem %d at %s, want %s", i, p.Pointer, want[i])
		}
	}
}

func TestQuantile(t *testing.T) {
	t.Parallel()
	// [calc] by hand: sorted values 1 2 3 4 with weights 1 1 1 1; the
	// cumulative share reaches 0.5 at 2 and 0.975 at 4; weights 0 0 0 1
	// put every quantile at 4.
	v := []float64{3, 1, 4, 2}
	if got := Quantile(v, []float64{1, 1, 1, 1}, 0.5); got != 2 {
		t.Errorf("median %g, want 2", got)
	}
	if got := Quantile(v, []float64{1, 1, 1, 1}, 0.975); got != 4 {
		t.Errorf("0.975 quantile %g, want 4", got)
	}
	if got := Quantile(v, []float64{0, 0, 1, 0}, 0.05); got != 4 {
		t.Errorf("quantile of a single weight %g, want 4", got)
	}
	if got := Quantile(v, []float64{0, 0, 0, 0}, 0.5); got != 2 {
		t.Errorf("zero weights count alike: %g, want 2", got)
	}
}

func TestEffectiveSize(t *testing.T) {
	t.Parallel()
	// [calc] Kish (1965): (sum w)^2/sum w^2; equal weights give n, one
	// weight gives 1, weights 1 and 0.5 give 2.25/1.25 = 1.8.
	cases := []struct {
		w    []float64
		want float64
	}{{[]float64{1, 1, 1, 1}, 4}, {[]float64{0, 3, 0}, 1}, {[]float64{1, 0.5}, 1.8}}
	for _, c := range cases {
		if got := EffectiveSize(c.w); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("EffectiveSize(%v) = %g, want %g", c.w, got, c.want)
		}
	}
}

func TestLogLikelihood(t *testing.T) {
	t.Parallel()
	// [calc] -1/2 (ln(obs/edge)/width)^2 outside, 0 inside: obs e^2 above
	// an interval ending at 1, width 1, gives -2.
	if got := LogLikelihood(math.Exp(2), 0.5, 1, 1); math.Abs(got+2) > 1e-12 {
		t.Errorf("above: %g, want -2", got)
	}
	if got := LogLikelihood(0.7, 0.5, 1, 1); got != 0 {
		t.Errorf("inside: %g, want 0", got)
	}
	if got := LogLikelihood(1, 2, 3, math.Ln2); math.Abs(got+0.5) > 1e-12 {
		t.Errorf("below by one width: %g, want -0.5", got)
	}
}

// The first-order index of an additive model y = x1 + x2 of independent
// standard normals is 1/2 for each input, of y = x1 it is 1 for x1 and 0
// for x2 ([calc] Saltelli et al. 2008, The Primer, sec. 1.2.5: S_i =
// V_i/V for an additive model). The given-data estimate from 2000 draws
// holds them within 0.06.
func TestFirstOrder(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(1, 2))
	n := 2000
	x1, x2, w := make([]float64, n), make([]float64, n), make([]float64, n)
	sum, only := make([]float64, n), make([]float64, n)
	for i := range n {
		x1[i], x2[i], w[i] = rng.NormFloat64(), rng.NormFloat64(), 1
		sum[i], only[i] = x1[i]+x2[i], x1[i]
	}
	cases := []struct {
		name string
		x, y []float64
		want float64
	}{{"x1 in x1+x2", x1, sum, 0.5}, {"x2 in x1+x2", x2, sum, 0.5}, {"x1 in x1", x1, only, 1}, {"x2 in x1", x2, only, 0}}
	for _, c := range cases {
		if got := FirstOrder(c.x, c.y, w); math.Abs(got-c.want) > 0.06 {
			t.Errorf("%s: S = %g, want %g", c.name, got, c.want)
		}
	}
	if got := FirstOrder(x1, make([]float64, n), w); got != 0 {
		t.Errorf("constant y: S = %g, want 0", got)
	}
}

// Deviates stay in the physical range: a volume fraction of 0.7 with a
// factor 2 would leave it in about a third of the draws.
func TestDeviatesTruncated(t *testing.T) {
	t.Parallel()
	in := []Input{{Path: "particles.volume_fraction", Nominal: 0.7, Factor: 2, Lo: 1e-6, Hi: 0.73}}
	for k, row := range Deviates(in, 500, 3) {
		if v := in[0].Value(row[0]); !(v >= in[0].Lo && v <= in[0].Hi*(1+1e-12)) {
			t.Fatalf("draw %d: %g outside [%g, %g]", k, v, in[0].Lo, in[0].Hi)
		}
	}
}
