package advisor

import (
	"cmp"
	"fmt"
	"maps"
	"math"
	"slices"
	"strings"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/number"
	"colloidtriage/advisor/remedy"
	"colloidtriage/advisor/rule"
	"colloidtriage/advisor/uncertainty"
	"colloidtriage/physics"
)

// Settings of the diagnosis under uncertainty.
const (
	// remedyDraws is the number of draws (the first ones, a random subset)
	// on which the remedy targets are solved.
	remedyDraws = 32
	// supportScore is the score above which a draw supports a cause: the
	// threshold of the fallback rule (rules/fallback.rules.yaml).
	supportScore = 0.3
	// agreeLogLikelihood: an observation that every draw misses by more
	// than 3 of its widths contradicts the inputs.
	agreeLogLikelihood = -4.5
	// targetShare is the weighted share of draws in which a printed
	// remedy target must hold.
	targetShare = 0.95
	// measureNextMax and closestInputsMax bound the two lists.
	measureNextMax   = 5
	closestInputsMax = 3
	// secondaryFlocKT and depletionFlocKT are the wells below which the
	// rules count secondary-minimum and depletion flocs
	// (rules/electrostatic.rules.yaml, rules/polymer.rules.yaml): flocs
	// that the aggregation half-life of the primary minimum does not time.
	secondaryFlocKT = -5
	depletionFlocKT = -2
	// reportedLog10Days bounds a predicted log10 half-life in days in the
	// consistency list (10^30 d is "never" for any product).
	reportedLog10Days = 30
)

// The model widths (standard deviations of ln) of the predictions, on top
// of what the drawn inputs move: Stokes settling with Richardson-Zaki
// hindrance for real particles, 30 % [practice]; predicted stability
// ratios of slow aggregation exceed measured ones by decades (Elimelech,
// Gregory, Jia & Williams 1995, Particle Deposition and Aggregation,
// ch. 8) [memory], a factor 10; size growth by ripening or aggregation,
// 20 % [practice].
var (
	settlingModelWidth = math.Log(1.3)
	halfLifeModelWidth = math.Log(10)
	growthModelWidth   = math.Log(1.2)
	// viscosityModelWidth: the relative viscosity of a floc suspension
	// from Krieger-Dougherty on the flocs' effective volume fraction, a
	// factor 1.5 [practice] (floc porosity and breakup under the
	// viscometer's shear are not modelled).
	viscosityModelWidth = math.Log(1.5)
)

// The redispersion test and the viscosity prediction.
const (
	// redispersionError is the chance that a visual redispersion test
	// (invert or shake gently, look for a residue) reports the other
	// outcome: 0.2 [practice].
	redispersionError = 0.2
	// reportedViscosityRatio bounds a predicted viscosity ratio in the
	// consistency list: flocs that jam the suspension predict an unbounded
	// rise, and the request accepts changes up to 100,000 %.
	reportedViscosityRatio = 1e4
)

// The observables a request can carry, in the order of the consistency
// list.
const (
	obsClearLayer = iota
	obsFlocs
	obsGrowth
	obsViscosity
	obsRedispersion
	numObservables
)

var observableNames = [numObservables]struct{ name, unit string }{
	{"clear_layer_mm", "mm"},
	{"flocs_by_age", "log10 d"},
	{"size_growth_percent", "%"},
	{"viscosity_change_percent", "%"},
	{"sediment_redisperses", "1 = yes"},
}

// verdictLogLikelihood is, per observable, the log-likelihood below which
// the best draw disagrees with the observation: 2 widths of a lognormal
// likelihood, and for the redispersion test any draw predicting the other
// outcome.
var verdictLogLikelihood = [numObservables]float64{-2, -2, -2, -2, 0}

// evidence is what a request observed: per observable the observed value
// and the log-width of its likelihood (measurement and model combined).
type evidence struct {
	present  [numObservables]bool
	observed [numObservables]float64
	width    [numObservables]float64
	floor    float64 // smallest readable clear layer, mm
	ageDays  float64
}

func observations(s *input.Sample, c *input.Conditions) evidence {
	var e evidence
	o := c.Observed
	if math.IsNaN(o.Age) {
		return e
	}
	e.ageDays = o.Age / input.Day
	if !math.IsNaN(o.ClearLayer) {
		mm := o.ClearLayer * 1e3
		u := uncertainty.ObservationWidth(s.Uncertainty, "observation.clear_layer_mm", mm)
		e.floor = u.SD
		e.present[obsClearLayer], e.observed[obsClearLayer] = true, mm
		e.width[obsClearLayer] = math.Hypot(logWidth(u, math.Max(mm, u.SD)), settlingModelWidth)
	}
	if c.Symptom == "flocculation" {
		u := uncertainty.ObservationWidth(s.Uncertainty, "observation.age_days", e.ageDays)
		e.present[obsFlocs], e.observed[obsFlocs] = true, math.Log10(e.ageDays)
		e.width[obsFlocs] = math.Hypot(logWidth(u, e.ageDays), halfLifeModelWidth)
	}
	if !math.IsNaN(o.SizeGrowth) {
		u := uncertainty.ObservationWidth(s.Uncertainty, "observation.size_growth_percent", o.SizeGrowth)
		e.present[obsGrowth], e.observed[obsGrowth] = true, o.SizeGrowth
		e.width[obsGrowth] = math.Hypot(logWidth(u, 100+o.SizeGrowth), growthModelWidth)
	}
	if !math.IsNaN(o.ViscosityChange) {
		u := uncertainty.ObservationWidth(s.Uncertainty, "observation.viscosity_change_percent", o.ViscosityChange)
		e.present[obsViscosity], e.observed[obsViscosity] = true, o.ViscosityChange
		e.width[obsViscosity] = math.Hypot(logWidth(u, 100+o.ViscosityChange), viscosityModelWidth)
	}
	if o.Redisperses != "" {
		e.present[obsRedispersion] = true
		if o.Redisperses == "yes" {
			e.observed[obsRedispersion] = 1
		}
	}
	return e
}

// any reports whether the request observed anything the draws predict.
func (e *evidence) any() bool { return e.present != [numObservables]bool{} }

// logWidth is a spread as a standard deviation of ln at value v.
func logWidth(u input.Spread, v float64) float64 {
	if u.Factor > 0 {
		return math.Log(u.Factor)
	}
	return math.Log1p(u.SD / math.Max(v, 1e-12))
}

// prediction is one draw's prediction of an observable: a central value,
// the interval [lo, hi] reported for it, and the log-likelihood of the
// observation.
type prediction struct {
	ok            bool
	value, lo, hi float64
	ll            float64
}

// predict computes a draw's predictions from its facts and returns them
// with the log-likelihood of the observations. Flocs form by the observed
// age when the aggregation half-life is at most the age, or when bridging,
// a depletion well or a deep secondary minimum makes them; then settling
// is at least that of the primary particles, up to the whole container,
// and the size grows at least as the half-life predicts (Smoluchowski
// clusters of fractal dimension physics.ReactionLimitedFractalDimension).
//
// flocs reports whether the draw makes flocs by the observed age.
func (e *evidence) predict(c *input.Conditions, f rule.Facts) (out [numObservables]prediction, ll float64, flocs bool) {
	age := e.ageDays
	log10Half := f.Number("log10_aggregation_half_life_days")
	other := f.Number("bridging_likely") == 1 || f.Number("depletion_well") < depletionFlocKT ||
		f.Number("secondary_minimum") < secondaryFlocKT
	flocs = e.any() && (other || log10Half <= math.Log10(age))
	if e.present[obsClearLayer] {
		height := c.Height * 1e3
		primary := math.Max(math.Min(f.Number("hindered_velocity")*age, height), 1e-9)
		hi := primary
		if flocs {
			hi = math.Max(height, primary)
		}
		p := prediction{ok: true, value: primary, lo: primary, hi: hi}
		obs := e.observed[obsClearLayer]
		if obs < e.floor { // nothing readable: only a predicted layer above the floor disagrees
			obs, hi = e.floor, math.Max(hi, e.floor)
		}
		p.ll = uncertainty.LogLikelihood(obs, primary, hi, e.width[obsClearLayer])
		out[obsClearLayer], ll = p, ll+p.ll
	}
	if e.present[obsFlocs] && !math.IsNaN(log10Half) {
		v := math.Min(math.Max(log10Half, -reportedLog10Days), reportedLog10Days)
		p := prediction{ok: true, value: v, lo: v, hi: v}
		if !other && log10Half > e.observed[obsFlocs] {
			d := (log10Half - e.observed[obsFlocs]) * math.Ln10 / e.width[obsFlocs]
			p.ll = -0.5 * d * d
		}
		out[obsFlocs], ll = p, ll+p.ll
	}
	agg := math.NaN() // relative diameter growth of the aggregates by the age
	if !math.IsNaN(log10Half) {
		agg = physics.AggregateDiameterGrowth(age, math.Pow(10, log10Half), physics.ReactionLimitedFractalDimension)
	}
	if e.present[obsGrowth] {
		growth, known := 0.0, false
		if g := f.Number("predicted_size_growth_at_age"); !math.IsNaN(g) {
			growth, known = g, true
		}
		if !math.IsNaN(agg) {
			growth, known = math.Max(growth, 100*agg), true
		}
		if known {
			p := prediction{ok: true, value: growth, lo: growth, hi: growth}
			hi := growth
			if other {
				hi = math.Inf(1)
			}
			obs := math.Max(1+e.observed[obsGrowth]/100, 1e-3)
			p.ll = uncertainty.LogLikelihood(obs, 1+growth/100, 1+hi/100, e.width[obsGrowth])
			out[obsGrowth], ll = p, ll+p.ll
		}
	}
	if e.present[obsViscosity] {
		if p, ok := e.viscosity(c, f, agg, other); ok {
			out[obsViscosity], ll = p, ll+p.ll
		}
	}
	if e.present[obsRedispersion] {
		p := e.redispersion(flocs)
		out[obsRedispersion], ll = p, ll+p.ll
	}
	return out, ll, flocs
}

// viscosity predicts the relative change of viscosity by the observed age,
// in %, from the growth of the aggregates agg (relative diameter growth,
// NaN when no half-life is known). Aggregates of N primaries of radius a
// and fractal dimension df (physics.ReactionLimitedFractalDimension) have
// the radius R = a N^(1/df) and enclose the volume fraction
//
//	phi_floc = phi (R/a)^(3 - df)
//
// (Quemada 1998, "Rheological modelling of complex fluids. I", Eur. Phys.
// J. AP 1:119, the effective volume fraction of fractal flocs; the mass-
// radius relation of Lin et al. 1989, Nature 339:360); the suspension's
// effective volume fraction becomes the larger of phi_floc and the
// dispersed particles' (shell included), and the change is the ratio of
// the Krieger-Dougherty viscosities (Krieger & Dougherty 1959, Trans. Soc.
// Rheol. 3:137, eq. 13) after and before. Flocs that bridging, a depletion
// well or a deep secondary minimum make at once, and those that freezing
// forces together (freeze_margin < 0: ice crystals concentrate the
// particles between them), have no timed size: the prediction extends to
// a jammed suspension. The likelihood is lognormal
// in 1 + change/100.
func (e *evidence) viscosity(c *input.Conditions, f rule.Facts, agg float64, other bool) (prediction, bool) {
	phiEff, phiMax := f.Number("effective_volume_fraction"), f.Number("max_packing_fraction")
	if !(phiEff >= 0 && phiMax > 0 && phiEff < phiMax) {
		return prediction{}, false
	}
	before := physics.KriegerDougherty(phiEff, phiMax, physics.DefaultIntrinsicViscosity)
	ratioAt := func(growth float64) float64 {
		phi := math.Max(phiEff, c.VolumeFraction*math.Pow(1+growth, 3-physics.ReactionLimitedFractalDimension))
		if phi >= phiMax {
			return reportedViscosityRatio
		}
		return math.Min(physics.KriegerDougherty(phi, phiMax, physics.DefaultIntrinsicViscosity)/before, reportedViscosityRatio)
	}
	ratio := 1.0
	if !math.IsNaN(agg) {
		ratio = ratioAt(agg)
	}
	hi := ratio
	if other || f.Number("freeze_margin") < 0 {
		hi = reportedViscosityRatio
	}
	p := prediction{ok: true, value: 100 * (ratio - 1), lo: 100 * (ratio - 1), hi: 100 * (hi - 1)}
	obs := math.Max(1+e.observed[obsViscosity]/100, 1e-3)
	p.ll = uncertainty.LogLikelihood(obs, ratio, hi, e.width[obsViscosity])
	return p, true
}

// redispersion predicts whether the sediment redisperses on gentle
// shaking (1) or not (0). A flocculated dispersion settles as flocs into a
// loose, voluminous sediment that shaking breaks up again (as flocs, when
// they are held in the primary minimum); deflocculated particles that
// settle one by one slide past each other into a dense sediment that cakes
// and does not redisperse — the classic distinction of suspension
// formulation, and the reason for controlled flocculation (Hiestand 1964,
// "Theory of coarse suspension formulation", J. Pharm. Sci. 53:1;
// Haines & Martin 1961, J. Pharm. Sci. 50:228). So a draw that makes flocs
// by the observed age, by any route, predicts redispersion. The likelihood
// is Bernoulli with the error rate redispersionError, relative to a correct
// prediction (0 when the draw predicts the observation, ln(error/(1-error))
// when not).
func (e *evidence) redispersion(flocs bool) prediction {
	v := 0.0
	if flocs {
		v = 1
	}
	p := prediction{ok: true, value: v, lo: v, hi: v}
	if v != e.observed[obsRedispersion] {
		p.ll = math.Log(redispersionError / (1 - redispersionError))
	}
	return p
}

// drawOutcome is what the analysis keeps of one draw.
type drawOutcome struct {
	scores []*rule.Score
	pred   [numObservables]prediction
	ll     float64
	flocs  bool        // the draw makes flocs by the observed age
	ev     *evaluation // kept for the first remedyDraws draws
}

// analyse runs the Monte Carlo draws of a triage (JCGM 101:2008): every
// draw perturbs the resolved conditions, computes the facts only (a lean
// evaluation) and runs the compiled rules. The draws are weighted by the
// likelihood of the observations; the report gains each cause's
// probability and support, the consistency of each observation, what to
// measure next, the causes ruled out, and the remedies' intervals.
func (e *Engine) analyse(s *input.Sample, nominal *evaluation, r *Report, draws int, seed uint64) error {
	inputs, err := uncertainty.Plan(s, nominal.cond)
	if err != nil {
		return err
	}
	rows := uncertainty.Deviates(inputs, draws, seed)
	ev := observations(s, nominal.cond)
	out := make([]drawOutcome, draws)
	shared := e.rules.NewFacts()
	maxLL := math.Inf(-1)
	for k, row := range rows {
		d := &evaluation{cond: uncertainty.Apply(inputs, row, nominal.cond), lean: true}
		if k < remedyDraws {
			d.facts = e.rules.NewFacts()
		} else {
			shared.Reset()
			d.facts = shared
		}
		d.compute()
		out[k].scores = e.rules.Rank(d.facts, d.cond.Symptom)
		out[k].pred, out[k].ll, out[k].flocs = ev.predict(d.cond, d.facts)
		if k < remedyDraws {
			out[k].ev = d
		}
		maxLL = math.Max(maxLL, out[k].ll)
	}
	// When the observations contradict every draw, each draw counts once:
	// a likelihood many widths outside every prediction measures how far
	// the model misses, not how plausible a draw is, and would hand the
	// diagnosis to the one least-bad draw. The report says so and names the
	// inputs that come closest instead.
	agree := maxLL >= agreeLogLikelihood
	weights := make([]float64, draws)
	for k := range out {
		weights[k] = 1
		if agree {
			weights[k] = math.Exp(out[k].ll - maxLL)
		}
	}
	a := &Analysis{Draws: draws, Seed: seed, EffectiveDraws: number.Round(uncertainty.EffectiveSize(weights), 3),
		ObservationsAgree: agree, Inputs: make([]UncertainInput, len(inputs))}
	for i, in := range inputs {
		a.Inputs[i] = UncertainInput{Input: in.Path, Provenance: string(in.Provenance), Nominal: number.Round(in.Nominal, 6),
			SD: number.Round(in.SD, 6), Factor: number.Round(in.Factor, 6), Source: in.Source}
	}
	r.Analysis = a

	prob, support, best := e.shares(out, weights, agree, a)
	switch {
	case !agree:
		a.ClosestInputs = closestInputs(inputs, rows, out)
		r.Assumptions = append(r.Assumptions, contradictionNote(ev, a.ClosestInputs))
	case ev.any():
		a.ClosestInputs = pulledInputs(inputs, rows, weights)
	}
	r.Causes = e.rerank(r.Causes, nominal, prob, support, best, inputs, rows, agree)
	r.Consistency = consistency(ev, out)
	if len(r.Causes) > 0 {
		r.MeasureNext = measureNext(r.Causes[0].ID, inputs, rows, out, weights)
	}
	r.RuledOut = e.ruledOut(nominal, r.Causes)
	e.intervals(r.Causes, nominal, out, weights)
	r.Assumptions = append(r.Assumptions, fmt.Sprintf("uncertainty: %d Monte Carlo draws of %d inputs (JCGM 101:2008), seed %d; "+
		"draws weighted by the likelihood of the observations (effective draws %s)", draws, len(inputs), seed,
		number.Shortest(a.EffectiveDraws)))
	u := input.Understood(s, nominal.cond)
	seedInt := int(seed)
	u.Analysis = &input.Analysis{Draws: &draws, Seed: &seedInt}
	r.Inputs = u
	return nil
}

// shares sums the weighted draws in which each cause ranks first (ties
// split equally) and in which it scores above supportScore, and keeps
// for each cause the heaviest draw in which it ranks first.
// outside_colloidal_physics explains nothing, and its share goes to the
// unexplained share, when the observations contradict every draw or when
// the draw itself makes flocs by the observed age (a colloidal
// explanation that no rule names).
func (e *Engine) shares(out []drawOutcome, weights []float64, agree bool, a *Analysis) (prob, support map[string]float64, best map[string]int) {
	prob, support, best = map[string]float64{}, map[string]float64{}, map[string]int{}
	total := 0.0
	for k, d := range out {
		w := weights[k]
		total += w
		for _, cs := range d.scores {
			if cs.Certainty > supportScore {
				support[cs.Cause] += w
			}
		}
		n := 0
		for n < len(d.scores) && d.scores[n].Certainty == d.scores[0].Certainty {
			n++
		}
		if n == 0 {
			a.Unexplained += w
			continue
		}
		if n > 1 {
			a.Tied += w
		}
		for _, cs := range d.scores[:n] {
			if cs.Cause == outsideColloidal && (!agree || d.flocs) {
				a.Unexplained += w / float64(n)
				continue
			}
			prob[cs.Cause] += w / float64(n)
			if b, ok := best[cs.Cause]; !ok || weights[b] < w {
				best[cs.Cause] = k
			}
		}
	}
	for id := range prob {
		prob[id] /= total
	}
	for id := range support {
		support[id] /= total
	}
	a.Unexplained = share(a.Unexplained / total)
	a.Tied = share(a.Tied / total)
	return prob, support, best
}

// share rounds a share of the draws to 3 decimals.
func share(x float64) float64 { return math.Round(x*1000) / 1000 }

// outsideColloidal is the cause the fallback rule names.
const outsideColloidal = "outside_colloidal_physics"

// rerank adds probability and support to the nominal causes, adds the
// causes that rank first only in some draws (written from the heaviest
// such draw), and ranks by probability, then nominal score, then id; when
// the observations contradict the inputs, outside_colloidal_physics goes
// last.
func (e *Engine) rerank(causes []Cause, nominal *evaluation, prob, support map[string]float64, best map[string]int,
	inputs []uncertainty.Input, rows [][]float64, agree bool) []Cause {
	seen := map[string]bool{}
	for _, c := range causes {
		seen[c.ID] = true
	}
	for _, id := range slices.Sorted(maps.Keys(prob)) {
		if seen[id] || prob[id] == 0 {
			continue
		}
		k := best[id]
		d := &evaluation{notes: input.NewNotes(32), scales: map[string]Scale{}, models: map[string]string{}, facts: e.rules.NewFacts(),
			cond: uncertainty.Apply(inputs, rows[k], nominal.cond)}
		d.compute()
		for _, cs := range e.rules.Rank(d.facts, d.cond.Symptom) {
			if cs.Cause == id {
				c := e.cause(d, cs, 0)
				c.Explanation = "Not supported at the nominal inputs; in the most likely draw where it ranks first (" +
					shiftText(inputs, rows[k]) + "): " + c.Explanation
				causes = append(causes, c)
			}
		}
	}
	for i := range causes {
		p, s := share(prob[causes[i].ID]), share(support[causes[i].ID])
		causes[i].Probability, causes[i].Support = &p, &s
	}
	last := func(c Cause) bool { return !agree && c.ID == outsideColloidal }
	slices.SortStableFunc(causes, func(a, b Cause) int {
		if la, lb := last(a), last(b); la != lb {
			if la {
				return 1
			}
			return -1
		}
		if c := cmp.Compare(*b.Probability, *a.Probability); c != 0 {
			return c
		}
		if c := cmp.Compare(b.Score, a.Score); c != 0 {
			return c
		}
		return strings.Compare(a.ID, b.ID)
	})
	for i := range causes {
		causes[i].Rank = i + 1
	}
	return causes
}

// shiftText names the inputs a draw moved by more than one standard
// uncertainty, largest first (at most closestInputsMax).
func shiftText(inputs []uncertainty.Input, row []float64) string {
	idx := make([]int, 0, len(inputs))
	for i := range inputs {
		if math.Abs(row[i]) > 1 {
			idx = append(idx, i)
		}
	}
	slices.SortStableFunc(idx, func(a, b int) int { return cmp.Compare(math.Abs(row[b]), math.Abs(row[a])) })
	if len(idx) == 0 {
		return "no input beyond one standard uncertainty"
	}
	parts := make([]string, 0, closestInputsMax)
	for _, i := range idx[:min(len(idx), closestInputsMax)] {
		in := inputs[i]
		parts = append(parts, fmt.Sprintf("%s %s instead of %s", in.Path, number.Shortest(number.Round(in.Value(row[i]), 3)),
			number.Shortest(number.Round(in.Nominal, 3))))
	}
	return strings.Join(parts, ", ")
}

// closestInputs are the inputs that the best-agreeing tenth of the draws
// (at least 5) moved most, as their mean deviate in standard
// uncertainties: the inputs whose plausible range comes closest to the
// observations.
func closestInputs(inputs []uncertainty.Input, rows [][]float64, out []drawOutcome) []InputShift {
	idx := make([]int, len(out))
	for k := range idx {
		idx[k] = k
	}
	slices.SortStableFunc(idx, func(a, b int) int { return cmp.Compare(out[b].ll, out[a].ll) })
	top := idx[:min(len(idx), max(5, len(idx)/10))]
	shifts := make([]InputShift, len(inputs))
	for i, in := range inputs {
		m := 0.0
		for _, k := range top {
			m += rows[k][i]
		}
		shifts[i] = InputShift{Input: in.Path, ShiftSD: number.Round(m/float64(len(top)), 3)}
	}
	return largestShifts(shifts)
}

// pulledInputs are the inputs that the weighting by the observations moves
// most from their nominal values: the weighted mean deviate, in standard
// uncertainties, of at least half a standard uncertainty.
func pulledInputs(inputs []uncertainty.Input, rows [][]float64, weights []float64) []InputShift {
	total := 0.0
	for _, w := range weights {
		total += w
	}
	shifts := make([]InputShift, len(inputs))
	for i, in := range inputs {
		m := 0.0
		for k, w := range weights {
			m += w * rows[k][i]
		}
		shifts[i] = InputShift{Input: in.Path, ShiftSD: number.Round(m/total, 3)}
	}
	return largestShifts(shifts)
}

// largestShifts keeps the shifts of at least half a standard uncertainty,
// largest first, at most closestInputsMax.
func largestShifts(shifts []InputShift) []InputShift {
	slices.SortStableFunc(shifts, func(a, b InputShift) int { return cmp.Compare(math.Abs(b.ShiftSD), math.Abs(a.ShiftSD)) })
	n := 0
	for n < len(shifts) && n < closestInputsMax && math.Abs(shifts[n].ShiftSD) >= 0.5 {
		n++
	}
	return shifts[:n]
}

func contradictionNote(ev evidence, closest []InputShift) string {
	var names []string
	for i, present := range ev.present {
		if present {
			names = append(names, observableNames[i].name)
		}
	}
	text := "the observations (" + strings.Join(names, ", ") + ") contradict every draw of the inputs within their stated or default uncertainties: " +
		"the inputs are more likely wrong than the complaint non-colloidal"
	if len(closest) == 0 {
		return text
	}
	parts := make([]string, len(closest))
	for i, c := range closest {
		parts[i] = fmt.Sprintf("%s (%+.1f standard uncertainties)", c.Input, c.ShiftSD)
	}
	return text + "; the inputs whose plausible range comes closest: " + strings.Join(parts, ", ") + "; measure them first"
}

// consistency compares each observation with the prediction over the
// unweighted draws (what the inputs predict before the observation is
// heard): median and central 95 %. The verdict is consistent when some
// draw agrees within 2 widths of the observation's likelihood, else the
// side of the prediction the observation lies on.
func consistency(ev evidence, out []drawOutcome) []Consistency {
	var list []Consistency
	for i := range numObservables {
		if !ev.present[i] {
			continue
		}
		var values, lows, highs, ones []float64
		best := math.Inf(-1)
		for _, d := range out {
			p := d.pred[i]
			if !p.ok {
				continue
			}
			values, lows, highs, ones = append(values, p.value), append(lows, p.lo), append(highs, p.hi), append(ones, 1)
			best = math.Max(best, p.ll)
		}
		if len(values) == 0 {
			continue
		}
		pr := Predicted{Value: number.Round(uncertainty.Quantile(values, ones, 0.5), 3),
			Low: number.Round(uncertainty.Quantile(lows, ones, 0.025), 3), High: number.Round(uncertainty.Quantile(highs, ones, 0.975), 3)}
		obs := ev.observed[i]
		verdict := "consistent"
		if best < verdictLogLikelihood[i] {
			verdict = "above_prediction"
			if obs < pr.Value {
				verdict = "below_prediction"
			}
		}
		list = append(list, Consistency{Observable: observableNames[i].name, Observed: number.Round(obs, 6),
			Predicted: pr, Unit: observableNames[i].unit, Verdict: verdict})
	}
	return list
}

// measureNext ranks the inputs by the first-order share of the variance
// of the top cause's indicator over the weighted draws (its share of
// first place in the draw; when it wins every draw, its score) that each
// explains (uncertainty.FirstOrder).
func measureNext(top string, inputs []uncertainty.Input, rows [][]float64, out []drawOutcome, weights []float64) []Measurement {
	y := make([]float64, len(out))
	for k, d := range out {
		n := 0
		for n < len(d.scores) && d.scores[n].Certainty == d.scores[0].Certainty {
			n++
		}
		for _, cs := range d.scores[:n] {
			if cs.Cause == top {
				y[k] = 1 / float64(n)
			}
		}
	}
	if constant(y) {
		for k, d := range out {
			y[k] = 0
			for _, cs := range d.scores {
				if cs.Cause == top {
					y[k] = cs.Certainty
				}
			}
		}
	}
	x := make([]float64, len(out))
	var list []Measurement
	for i, in := range inputs {
		for k := range rows {
			x[k] = rows[k][i]
		}
		if s := share(uncertainty.FirstOrder(x, y, weights)); s > 0 {
			list = append(list, Measurement{Input: in.Path, Share: s, How: in.How()})
		}
	}
	slices.SortStableFunc(list, func(a, b Measurement) int { return cmp.Compare(b.Share, a.Share) })
	return list[:min(len(list), measureNextMax)]
}

func constant(y []float64) bool {
	for _, v := range y {
		if v != y[0] {
			return false
		}
	}
	return true
}

// ruledOut lists the causes that rules of the symptom name but that are
// not among the reported causes, each with its deciding rule: a rule that
// counted against it, else its strongest supporting rule, which did not
// hold; the number is that rule's first evidence known for the sample.
func (e *Engine) ruledOut(nominal *evaluation, causes []Cause) []RuledOut {
	reported := map[string]bool{}
	for _, c := range causes {
		reported[c.ID] = true
	}
	deciding := map[string]*rule.Rule{}
	against, seen := map[string]bool{}, map[string]bool{}
	var order []string
	for _, r := range e.rules.For(nominal.cond.Symptom) {
		if reported[r.Cause] || r.Cause == outsideColloidal {
			continue
		}
		if !seen[r.Cause] {
			seen[r.Cause] = true
			order = append(order, r.Cause)
		}
		d := deciding[r.Cause]
		switch {
		case r.Certainty < 0 && !against[r.Cause] && r.Holds(nominal.facts):
			deciding[r.Cause], against[r.Cause] = r, true
		case !against[r.Cause] && r.Certainty > 0 && (d == nil || r.Certainty > d.Certainty):
			deciding[r.Cause] = r
		}
	}
	list := make([]RuledOut, 0, len(order))
	for _, id := range order {
		r := deciding[id]
		if r == nil {
			continue
		}
		ro := RuledOut{ID: id, Reason: "rule " + r.ID + " does not hold: " + r.When}
		if against[id] {
			ro.Reason = "rule " + r.ID + " counts against it: " + r.When
		}
		for _, name := range r.Evidence {
			v := nominal.facts.Number(name)
			if !math.IsNaN(v) && !math.IsInf(v, 0) {
				v = number.Round(v, 6)
				ro.Scale, ro.Value, ro.Unit = name, &v, nominal.facts.Unit(name)
				break
			}
		}
		list = append(list, ro)
	}
	return list
}

// intervals solves each remedy target on the first remedyDraws draws and
// replaces the nominal target by the one that holds in targetShare of the
// weighted draws, with the central 95 % as its interval; a target is not
// feasible when no value meets the criterion at the nominal point, in more
// than 5 % of the weighted draws, outside the quantity's physical range, or
// beyond what practice reaches for the product (remedy.Practical); within a
// cause the feasible remedies come first.
func (e *Engine) intervals(causes []Cause, nominal *evaluation, out []drawOutcome, weights []float64) {
	n := min(len(out), remedyDraws)
	for ci := range causes {
		for ri := range causes[ci].Remedies {
			rem := &causes[ci].Remedies[ri]
			solve := remedy.For(rem.ID)
			if solve == nil {
				continue
			}
			feasible := rem.Target != nil
			reason := ""
			if !feasible {
				reason = "no value meets the criterion at the nominal inputs"
				rem.Feasible, rem.Reason = &feasible, reason
				continue
			}
			atNominal := rem.Target.Value
			var values, w []float64
			failed, total := 0.0, 0.0
			for k := range n {
				t, _, ok := solve(out[k].ev.remedyCase())
				total += weights[k]
				if !ok || math.IsNaN(t.Value) || math.IsInf(t.Value, 0) {
					failed += weights[k]
					continue
				}
				values, w = append(values, t.Value), append(w, weights[k])
			}
			if len(values) > 0 {
				q := 0.5
				switch rem.Target.Op {
				case ">=", ">":
					q = targetShare
				case "<=", "<":
					q = 1 - targetShare
				}
				t := *rem.Target
				t.Value = roundTowardAcceptable(uncertainty.Quantile(values, w, q), t.Op)
				rem.Interval = &Interval{Low: number.Round(uncertainty.Quantile(values, w, 0.025), 3),
					High: number.Round(uncertainty.Quantile(values, w, 0.975), 3)}
				rem.Action = strings.Replace(rem.Action, rem.Target.Quantity+" "+rem.Target.Op+" "+number.Quantity(rem.Target.Value, rem.Target.Unit),
					t.Quantity+" "+t.Op+" "+number.Quantity(t.Value, t.Unit), 1)
				rem.Target = &t
				rem.Criterion += fmt.Sprintf("; the target holds in %s %% of the weighted draws (%d of %d solved)",
					number.Shortest(targetShare*100), len(values), n)
			}
			lo, hi, ok := uncertainty.Range(rem.Target.Quantity)
			practical := remedy.Practical(nominal.cond, *rem.Target, atNominal)
			switch {
			case total > 0 && failed/total > 1-targetShare:
				feasible, reason = false, fmt.Sprintf("no value meets the criterion in %s %% of the weighted draws", number.Shortest(number.Round(100*failed/total, 2)))
			case ok && (rem.Target.Value < lo || rem.Target.Value > hi):
				feasible, reason = false, fmt.Sprintf("the target lies outside the range %s can reach, %s to %s", rem.Target.Quantity,
					number.Shortest(lo), number.Shortest(hi))
			case practical != "":
				feasible, reason = false, practical
			}
			rem.Feasible, rem.Reason = &feasible, reason
		}
		slices.SortStableFunc(causes[ci].Remedies, func(a, b Remedy) int {
			return cmp.Compare(infeasible(a), infeasible(b))
		})
	}
}

// infeasible is 1 for a remedy marked not feasible, else 0: the order of
// the remedies within a cause, feasible first.
func infeasible(r Remedy) int {
	if r.Feasible != nil && !*r.Feasible {
		return 1
	}
	return 0
}
