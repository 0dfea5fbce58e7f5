package advisor

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
)

// Trend is the fit of one quantity of a complaint followed over time
// (input.Sample.Observations): every form tried, the shape the series has
// by the stated criterion, and what that shape says.
type Trend struct {
	Quantity string `json:"quantity"`
	Points   int    `json:"points"`
	Shape    string `json:"shape"`
	Fits     []Fit  `json:"fits"`
	Says     string `json:"says"`
}

// Fit is one form fitted by least squares: its parameters with 95 %
// intervals, and its goodness of fit on the observed quantity (R^2 about
// the mean, and the root-mean-square residual in the quantity's unit).
type Fit struct {
	Form       string      `json:"form"`
	Parameters []Parameter `json:"parameters"`
	RSquared   float64     `json:"r_squared"`
	RMS        float64     `json:"rms_residual"`
}

// Parameter is a fitted parameter with its 95 % interval (Student t on the
// least-squares standard error).
type Parameter struct {
	Name  string  `json:"name"`
	Value float64 `json:"value"`
	Low   float64 `json:"low"`
	High  float64 `json:"high"`
	Unit  string  `json:"unit"`
}

// goodFit is the least R^2 for a form to be said to fit the series.
const goodFit = 0.9

// distinctRSS is the least ratio of residual sums of squares for one of two
// two-parameter forms of the diameter to be preferred to the other.
const distinctRSS = 1.5

// steadyScatter is the largest RMS residual, relative to the mean, of a
// series said not to change: the 5-10 % between size or viscosity readings
// of one sample [practice].
const steadyScatter = 0.1

// scatter is the RMS residual of a fit over the mean of the series.
func scatter(f Fit, y []float64) float64 {
	var m float64
	for _, v := range y {
		m += v / float64(len(y))
	}
	return f.RMS / m
}

// trends fits each quantity that at least three observations measure.
func trends(obs []input.ObservationPoint) []Trend {
	var out []Trend
	pick := func(get func(input.ObservationPoint) *float64) (t, y []float64) {
		for _, o := range obs {
			if v := get(o); v != nil && o.AgeDays != nil {
				t, y = append(t, *o.AgeDays), append(y, *v)
			}
		}
		return t, y
	}
	if t, y := pick(func(o input.ObservationPoint) *float64 { return o.ClearLayerMm }); len(t) >= 3 {
		out = append(out, clearLayerTrend(t, y))
	}
	if t, y := pick(func(o input.ObservationPoint) *float64 { return o.MedianDiameterNm }); len(t) >= 3 {
		out = append(out, growthTrend(t, y))
	}
	if t, y := pick(func(o input.ObservationPoint) *float64 { return o.ViscosityMPaS }); len(t) >= 3 {
		out = append(out, viscosityTrend(t, y))
	}
	return out
}

// line is an ordinary least-squares straight line y = a + b x (a = 0 when
// through the origin) with the standard errors of a and b.
type line struct {
	a, b, seA, seB float64
	dof            int
}

func fitLine(x, y []float64, origin bool) line {
	n := float64(len(x))
	if origin {
		var sxy, sxx float64
		for i := range x {
			sxy += x[i] * y[i]
			sxx += x[i] * x[i]
		}
		b := sxy / sxx
		var rss float64
		for i := range x {
			r := y[i] - b*x[i]
			rss += r * r
		}
		dof := len(x) - 1
		return line{b: b, seB: math.Sqrt(rss / float64(dof) / sxx), dof: dof}
	}
	var mx, my float64
	for i := range x {
		mx += x[i] / n
		my += y[i] / n
	}
	var sxy, sxx float64
	for i := range x {
		sxy += (x[i] - mx) * (y[i] - my)
		sxx += (x[i] - mx) * (x[i] - mx)
	}
	b := sxy / sxx
	a := my - b*mx
	var rss float64
	for i := range x {
		r := y[i] - a - b*x[i]
		rss += r * r
	}
	dof := len(x) - 2
	s2 := rss / float64(dof)
	return line{a: a, b: b, seA: math.Sqrt(s2 * (1/n + mx*mx/sxx)), seB: math.Sqrt(s2 / sxx), dof: dof}
}

// param is a parameter with its 95 % interval from a standard error on dof
// degrees of freedom; tr maps the fitted value and its ends (exp for a
// parameter fitted as a logarithm).
func param(name, unit string, v, se float64, dof int, tr func(float64) float64) Parameter {
	q := 0.0
	if dof > 0 {
		q = distuv.StudentsT{Mu: 0, Sigma: 1, Nu: float64(dof)}.Quantile(0.975)
	}
	return Parameter{Name: name, Unit: unit, Value: number.Round(tr(v), 4),
		Low: number.Round(tr(v-q*se), 4), High: number.Round(tr(v+q*se), 4)}
}

func same(v float64) float64 { return v }

// goodness is R^2 about the mean and the RMS residual of predictions.
func goodness(y, pred []float64) (r2, rms float64) {
	var m float64
	for _, v := range y {
		m += v / float64(len(y))
	}
	var rss, tss float64
	for i := range y {
		rss += (y[i] - pred[i]) * (y[i] - pred[i])
		tss += (y[i] - m) * (y[i] - m)
	}
	r2 = 1 - rss/tss
	if tss == 0 {
		r2 = 0
	}
	return number.Round(r2, 4), number.Round(math.Sqrt(rss/float64(len(y))), 4)
}

func predict(t []float64, f func(float64) float64) []float64 {
	out := make([]float64, len(t))
	for i, v := range t {
		out[i] = f(v)
	}
	return out
}

// clearLayerTrend compares a clear layer growing linearly in time, H = v t
// (single particles settling at their constant Stokes speed; Stokes 1851),
// with a power law H = a t^n fitted on the logarithms: an exponent above 1
// is an accelerating layer, as flocs that grow by Smoluchowski (1917)
// kinetics settle faster and faster. Criterion: the exponent's 95 %
// interval above 1 is accelerating, below 1 decelerating, else the series
// is linear; the chosen form must reach R^2 >= 0.9, or neither fits.
func clearLayerTrend(t, h []float64) Trend {
	tr := Trend{Quantity: "clear_layer_mm", Points: len(t)}
	lin := fitLine(t, h, true)
	linFit := Fit{Form: "linear: H = v t", Parameters: []Parameter{param("v", "mm/d", lin.b, lin.seB, lin.dof, same)}}
	linFit.RSquared, linFit.RMS = goodness(h, predict(t, func(x float64) float64 { return lin.b * x }))
	tr.Fits = append(tr.Fits, linFit)
	var lt, lh []float64
	for i := range t {
		if t[i] > 0 && h[i] > 0 {
			lt, lh = append(lt, math.Log(t[i])), append(lh, math.Log(h[i]))
		}
	}
	shape, good := "linear", linFit.RSquared >= goodFit
	if len(lt) >= 3 {
		pw := fitLine(lt, lh, false)
		exp := param("n", "1", pw.b, pw.seB, pw.dof, same)
		pwFit := Fit{Form: "power law: H = a t^n", Parameters: []Parameter{param("a", "mm/d^n", pw.a, pw.seA, pw.dof, math.Exp), exp}}
		pwFit.RSquared, pwFit.RMS = goodness(h, predict(t, func(x float64) float64 { return math.Exp(pw.a) * math.Pow(x, pw.b) }))
		tr.Fits = append(tr.Fits, pwFit)
		switch {
		case exp.Low > 1:
			shape, good = "accelerating", pwFit.RSquared >= goodFit
		case exp.High < 1:
			shape, good = "decelerating", pwFit.RSquared >= goodFit
		}
	}
	if !good {
		shape = "neither"
	}
	tr.Shape = shape
	switch shape {
	case "linear":
		tr.Says = fmt.Sprintf("The clear layer grows linearly, at %s mm/d: single particles settling at a constant speed.", number.Shortest(tr.Fits[0].Parameters[0].Value))
	case "accelerating":
		tr.Says = fmt.Sprintf("The clear layer accelerates (exponent %s): aggregates growing and settling faster, not single particles.", number.Shortest(tr.Fits[1].Parameters[1].Value))
	case "decelerating":
		tr.Says = "The clear layer slows down: the sediment compacts or the settling is hindered as it proceeds."
	default:
		tr.Says = "Neither a linear nor a power-law clear layer fits the series (R^2 below 0.9): check the readings, or the layer is not settling."
	}
	return tr
}

// growthTrend compares Lifshitz-Slyozov-Wagner ripening, whose cube of the
// radius grows linearly in time (Lifshitz & Slyozov 1961; Wagner 1961:
// r^3 - r0^3 = omega t, here on the diameter, d^3 = d0^3 + k t with
// k = 8 omega), with exponential growth of the diameter, d = d0 exp(g t), a
// growth faster than LSW's as in coalescence (Kabalnov 2001, J. Dispersion
// Sci. Technol. 22:1, contrasts the two). Criterion: neither slope's 95 %
// interval excluding zero, with a scatter within 10 % of the mean, is no growth; else the form with the smaller
// residual sum of squares of the diameter by a factor 1.5, if its R^2 >=
// 0.9; both within the factor are indistinguishable; neither good, neither.
func growthTrend(t, d []float64) Trend {
	tr := Trend{Quantity: "median_diameter_nm", Points: len(t)}
	cube := make([]float64, len(d))
	logs := make([]float64, len(d))
	for i, v := range d {
		cube[i], logs[i] = v*v*v, math.Log(v)
	}
	lsw := fitLine(t, cube, false)
	lswFit := Fit{Form: "LSW ripening: d^3 = d0^3 + k t", Parameters: []Parameter{
		param("d0", "nm", lsw.a, lsw.seA, lsw.dof, math.Cbrt), param("k", "nm^3/d", lsw.b, lsw.seB, lsw.dof, same)}}
	lswPred := predict(t, func(x float64) float64 { return math.Cbrt(lsw.a + lsw.b*x) })
	lswFit.RSquared, lswFit.RMS = goodness(d, lswPred)
	ex := fitLine(t, logs, false)
	exFit := Fit{Form: "exponential: d = d0 exp(g t)", Parameters: []Parameter{
		param("d0", "nm", ex.a, ex.seA, ex.dof, math.Exp), param("g", "1/d", ex.b, ex.seB, ex.dof, same)}}
	exPred := predict(t, func(x float64) float64 { return math.Exp(ex.a + ex.b*x) })
	exFit.RSquared, exFit.RMS = goodness(d, exPred)
	tr.Fits = []Fit{lswFit, exFit}
	k, g := lswFit.Parameters[1], exFit.Parameters[1]
	lswRSS, exRSS := lswFit.RMS*lswFit.RMS, exFit.RMS*exFit.RMS
	switch {
	case k.Low <= 0 && k.High >= 0 && g.Low <= 0 && g.High >= 0 && scatter(exFit, d) <= steadyScatter:
		tr.Shape, tr.Says = "no_growth", "The median diameter does not change beyond the scatter of the readings."
	case lswRSS*distinctRSS <= exRSS && lswFit.RSquared >= goodFit:
		tr.Shape = "lsw_ripening"
		tr.Says = fmt.Sprintf("The cube of the diameter grows linearly (k = %s nm^3/d): Ostwald ripening by diffusion (LSW).", number.Shortest(k.Value))
	case exRSS*distinctRSS <= lswRSS && exFit.RSquared >= goodFit:
		tr.Shape = "exponential_growth"
		tr.Says = fmt.Sprintf("The diameter grows exponentially (g = %s per day), faster than ripening allows: coalescence or aggregation.", number.Shortest(g.Value))
	case lswFit.RSquared >= goodFit || exFit.RSquared >= goodFit:
		tr.Shape = "indistinguishable"
		tr.Says = "Both ripening (cube linear in time) and exponential growth fit the series; a longer series separates them."
	default:
		tr.Shape = "neither"
		tr.Says = "Neither ripening nor exponential growth fits the series (R^2 below 0.9): check the size readings."
	}
	return tr
}

// viscosityTrend fits a linear drift of the viscosity, eta = eta0 + s t;
// the slope's 95 % interval excluding zero is a drift, including zero with a
// scatter within 10 % of the mean steady.
func viscosityTrend(t, eta []float64) Trend {
	tr := Trend{Quantity: "viscosity_mPa_s", Points: len(t)}
	l := fitLine(t, eta, false)
	f := Fit{Form: "linear drift: eta = eta0 + s t", Parameters: []Parameter{
		param("eta0", "mPa s", l.a, l.seA, l.dof, same), param("s", "mPa s/d", l.b, l.seB, l.dof, same)}}
	f.RSquared, f.RMS = goodness(eta, predict(t, func(x float64) float64 { return l.a + l.b*x }))
	tr.Fits = []Fit{f}
	s := f.Parameters[1]
	switch {
	case s.Low <= 0 && s.High >= 0 && scatter(f, eta) <= steadyScatter:
		tr.Shape, tr.Says = "steady", "The viscosity does not drift beyond the scatter of the readings."
	case f.RSquared >= goodFit:
		tr.Shape = "drift"
		tr.Says = fmt.Sprintf("The viscosity drifts by %s mPa s per day.", number.Shortest(s.Value))
	default:
		tr.Shape, tr.Says = "neither", "A linear drift does not fit the viscosity readings (R^2 below 0.9, or a scatter above 10 % of the mean)."
	}
	return tr
}
