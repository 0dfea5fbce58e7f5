package physics

import "math"

// Log10StabilityRatioWith returns log10 W, the Fuchs stability ratio of the
// pair p whose barrier, found by Pair.Barrier or Pair.Extrema, is barrier:
// the factor by which the interaction slows Brownian aggregation relative
// to Smoluchowski's rapid rate,
//
//	W = 2 int_{u0}^Inf beta(u) exp(V(u a)/kT) / (u+2)^2 du,  u = h/a,
//
// with beta(u) = (6u^2+13u+2)/(6u^2+4u) when honig (the hydrodynamic
// resistance of Honig, Roebersen & Wiersema) and beta = 1 otherwise. The
// lower limit u0 a = max(MinimumSeparation, 2 StericThickness): a pair that
// reaches the closest approach counts as aggregated. W is about 1 without
// interaction (exactly 2/(u0+2) without Honig); an attractive pair gives
// W < 1. The logarithm stays finite for any valid Pair: exp(Vmax/kT) is
// factored out, and without attraction the Honig integral is cut off at u0.
//
// Method: composite Gauss–Legendre (gonum quad.Legendre nodes) in ln h from
// the closest approach to max(h_max, 2a): 4 points on background panels no
// wider than 1.5 in ln h, 6 on the barrier's panels to 1.5 and 3 widths
// either side (width from the curvature there) and 4 on its tails to 6
// widths, skipping parts whose bound is below 1e-10 of the barrier's
// contribution; 8 points in x = 1/(u+2) beyond. A sharp barrier of 15 kT
// or more that alone decides W (DLVO energies without depletion, the rest
// of the range bounded below 1e-4 of it; see peakStabilityRatio) is
// integrated instead by 7-point Gauss–Hermite about it, about 11 energies
// against 40 to 60, within 1e-5 decades of the composite rule over a sweep
// of 828 pairs. Against a fine trapezoidal reference
// (testdata/reference/interaction.py) log10 W agrees to better than 1e-4 in
// the tested cases, from W < 1 to W = 1e4048, which the tests hold it to.
// It panics on an invalid Pair.
//
// References: N. Fuchs, "Über die Stabilität und Aufladung der Aerosole",
// Z. Phys. 89 (1934) 736; G. R. Honig, G. J. Roebersen & P. H. Wiersema,
// J. Colloid Interface Sci. 36 (1971) 97; D. J. Shaw, Introduction to Colloid
// and Surface Chemistry, 4th ed. (1992), eq. 8.20; W. B. Russel, D. A.
// Saville & W. R. Schowalter, Colloidal Dispersions (1989), ch. 8;
// M. Abramowitz & I. A. Stegun, Handbook of Mathematical Functions (1964),
// 25.4.46 (Gauss–Hermite quadrature).
func Log10StabilityRatioWith(p Pair, barrier Extremum, honig bool) float64 {
	c := p.curve()
	return c.log10StabilityRatio(barrier, honig)
}

// negligibleShare: a part of the integral whose bound is below this share of
// the barrier's own contribution is skipped. With at most 56 panels and the
// far part, the skipped parts together stay below 1e-8 of W, far under the
// 1e-4 accuracy held in log10 W.
const negligibleShare = 1e-10

// maxWeight bounds the weight beta(u) u/(u+2)^2 of the integrand in ln h
// (1/8 at u = 2 without Honig, 0.236 near u = 0.8 with it), and maxFarBeta
// bounds beta(u) for u >= 2 (Honig's factor falls from 1.625 at u = 2
// towards 1).
const (
	maxWeight  = 0.25
	maxFarBeta = 2.0
)

func (c *pairCurve) log10StabilityRatio(barrier Extremum, honig bool) float64 {
	if w, ok := c.peakStabilityRatio(barrier, honig); ok {
		return w
	}
	return c.compositeStabilityRatio(barrier, honig)
}

// peakStabilityRatio is log10 W by 7-point Gauss–Hermite about a sharp
// barrier of at least peakMinBarrierKT (the scheme of
// Log10StabilityRatioPeak; the outer nodes lie 3.75 widths out), when that
// barrier alone decides W: it stands peakQuadratureClearance widths clear
// of the closest approach, no depletion well can add a second maximum, and
// the range beyond peakTailWidths widths is bounded below peakRestShare of
// the peak's share. Classic DLVO energies rise from the closest approach or
// the primary minimum to the barrier and fall from it to the secondary
// minimum and back towards 0, so beyond those widths the energy is at most
// the larger of its value at the closest approach, at the ends of the
// widths, and 0. ok is false where this does not hold.
func (c *pairCurve) peakStabilityRatio(b Extremum, honig bool) (float64, bool) {
	if !b.Found || b.Energy/c.kT < peakMinBarrierKT || c.depletionPrefactor > 0 {
		return 0, false
	}
	lo, hi := c.searchRange()
	sLo, sBarrier := math.Log(lo), math.Log(b.Separation)
	width := c.barrierWidth(sBarrier)
	if !(width <= maxPeakWidth && sBarrier-sLo >= peakQuadratureClearance*width) {
		return 0, false
	}
	core := c.peakIntegral(gaussHermite7, b, width, honig)
	rest := math.Max(c.energy(lo), c.energy(math.Exp(sBarrier-peakTailWidths*width)))
	rest = math.Max(rest, math.Max(c.energy(math.Exp(sBarrier+peakTailWidths*width)), 0))
	span := math.Log(math.Max(hi, 2*c.radius)) - sLo
	if bound := (maxWeight*span + maxFarBeta) * math.Exp((rest-b.Energy)/c.kT); !(bound < peakRestShare*core) {
		return 0, false
	}
	return (b.Energy/c.kT + math.Log(2*core)) / math.Ln10, true
}

// The peak path of the stability ratio (peakStabilityRatio).
const (
	peakMinBarrierKT        = 15.0
	peakQuadratureClearance = 5.0 // the Gaussian's mass below the closest approach < 3e-7
	peakTailWidths          = 6.0 // beyond, a Gaussian peak has fallen by 18 kT
	peakRestShare           = 1e-4
)

// compositeStabilityRatio is log10 W by the composite rule of
// Log10StabilityRatioWith.
func (c *pairCurve) compositeStabilityRatio(barrier Extremum, honig bool) float64 {
	lo, hi := c.searchRange()
	sLo := math.Log(lo)
	sHi := math.Log(math.Max(hi, 2*c.radius))
	weight := func(u float64) float64 { return stabilityWeight(u, honig) }
	// ref, the exponent factored out, is the highest energy the integral
	// sees, so that every exponential stays finite even when no barrier was
	// found in the search range; a node above it (a peak narrower than the
	// extremum scan's spacing, which the scan misses) raises it as the sum
	// goes. skipBelow is the exponent under which a part of unit width is
	// negligible against the barrier's contribution, about weight(u*) times
	// the barrier width; without a barrier nothing is skipped.
	ref := math.Max(0, c.energy(lo)/c.kT)
	skipBelow := math.Inf(-1)
	var sBarrier, width float64
	if barrier.Found {
		ref = math.Max(ref, barrier.Energy/c.kT)
		sBarrier = math.Log(barrier.Separation)
		width = c.barrierWidth(sBarrier)
		skipBelow = math.Log(negligibleShare * weight(barrier.Separation/c.radius) * math.Min(width, maxStabilityPanel))
	}
	// Beyond sHi the integral runs in x = 1/(u+2) from 0 to xMax. There
	// (past 3 depletion ranges) the energy is at most the double layer's at
	// sHi, which bounds the far part; when it is not negligible its energies
	// join ref.
	xMax := 1 / (math.Exp(sHi)/c.radius + 2)
	_, edlHi, _ := c.parts(math.Exp(sHi))
	var farU, farV [8]float64
	withFar := edlHi/c.kT-ref+math.Log(xMax*maxFarBeta) >= skipBelow
	if withFar {
		for k, x := range gaussLegendre8.x {
			farU[k] = 1/(xMax*(x+1)/2) - 2
			farV[k] = c.energy(farU[k]*c.radius) / c.kT
			ref = math.Max(ref, farV[k])
		}
	}

	// Background edges every maxStabilityPanel at most, except inside the
	// barrier's own panels (within 6 widths of it), which replace them there.
	var breaks [maxStabilityBreaks]float64
	n := 0
	aroundBarrier := barrier.Found && width < maxStabilityPanel
	reach := barrierPanelEdges[len(barrierPanelEdges)-1] * width
	core := barrierCoreWidths * width * (1 + 1e-9) // its edges included
	panels := int(math.Ceil((sHi - sLo) / maxStabilityPanel))
	panels = min(max(panels, 1), maxBackgroundPanels)
	for i := 0; i <= panels; i++ {
		s := sLo + (sHi-sLo)*float64(i)/float64(panels)
		if aroundBarrier && i > 0 && i < panels && math.Abs(s-sBarrier) < reach {
			continue
		}
		breaks[n] = s
		n++
	}
	if aroundBarrier {
		for _, k := range barrierPanelEdges {
			if s := sBarrier + k*width; s > sLo && s < sHi {
				breaks[n] = s
				n++
			}
		}
	}
	sortSmall(breaks[:n])

	// A panel without the barrier has no interior maximum of V, so its
	// integrand is at most maxWeight exp(V/kT - ref) at its higher end.
	near := 0.0
	expLeft := c.energy(math.Exp(breaks[0]))/c.kT - ref
	for i := 0; i+1 < n; i++ {
		half := (breaks[i+1] - breaks[i]) / 2
		expRight := c.energy(math.Exp(breaks[i+1]))/c.kT - ref
		holdsBarrier := barrier.Found && sBarrier >= breaks[i] && sBarrier <= breaks[i+1]
		skip := !holdsBarrier && math.Max(expLeft, expRight)+math.Log(2*half*maxWeight) < skipBelow
		expLeft = expRight
		if !(half > 1e-12) || skip {
			continue
		}
		mid := (breaks[i+1] + breaks[i]) / 2
		rule := gaussLegendre6
		if !aroundBarrier || breaks[i+1] <= sBarrier-core || breaks[i] >= sBarrier+core {
			rule = gaussLegendre4
		}
		for k, x := range rule.x {
			h := math.Exp(mid + half*x)
			e := c.energy(h)/c.kT - ref
			if e > 0 { // above every energy seen so far (a peak narrower than the scan): rescale
				near *= math.Exp(-e)
				ref += e
				e = 0
			}
			near += half * rule.w[k] * weight(h/c.radius) * math.Exp(e)
		}
	}

	// Beyond sHi: du/(u+2)^2 = -dx.
	far := 0.0
	for k, u := range farU {
		if !withFar {
			break
		}
		beta := 1.0
		if honig {
			beta = (6*u*u + 13*u + 2) / (6*u*u + 4*u)
		}
		far += xMax / 2 * gaussLegendre8.w[k] * beta * math.Exp(farV[k]-ref)
	}
	return (ref + math.Log(2*(near+far))) / math.Ln10
}

// stabilityWeight is the weight beta(u) u/(u+2)^2 of the integrand of W in
// ln h, at u = h/a.
func stabilityWeight(u float64, honig bool) float64 {
	betaU := u
	if honig {
		betaU = (6*u*u + 13*u + 2) / (6*u + 4)
	}
	return betaU / ((u + 2) * (u + 2))
}

// Log10StabilityRatioPeak is an estimate of log10 W from the barrier b of
// the pair alone: the integrand of Log10StabilityRatioWith in s = ln h,
// weight(u) exp(V/kT), is integrated about the barrier s* by 5-point
// Gauss–Hermite quadrature in t = (s - s*)/(sqrt 2 w), w the width
// (kT/|d2V/ds2|)^(1/2) at the barrier, which is Laplace's method (the
// 1-point rule) with the asymmetry of the peak and its weight resolved. It
// costs 5 energies and the curvature, against the tens of energies of the
// quadrature, and is meant for searches that check their answer with one
// Log10StabilityRatioWith. For the tested barriers of 15 kT and more it is
// within 2e-4 decades of the quadrature. It returns NaN where it does not
// apply: without a barrier, or when the barrier is no sharp interior peak
// (wider than maxPeakWidth in ln h, or closer than peakClearance widths to
// the closest approach).
//
// References: N. G. de Bruijn, Asymptotic Methods in Analysis (1958),
// sec. 4.2 (Laplace's method); M. Abramowitz & I. A. Stegun, Handbook of
// Mathematical Functions (1964), 25.4.46 (Gauss–Hermite quadrature).
func Log10StabilityRatioPeak(p Pair, b Extremum, honig bool) float64 {
	if !b.Found {
		return math.NaN()
	}
	c := p.curve()
	lo, _ := c.searchRange()
	sBarrier := math.Log(b.Separation)
	width := c.barrierWidth(sBarrier)
	if !(width <= maxPeakWidth && sBarrier-math.Log(lo) >= peakClearance*width) {
		return math.NaN()
	}
	return (b.Energy/c.kT + math.Log(2*c.peakIntegral(gaussHermite5, b, width, honig))) / math.Ln10
}

// peakIntegral is the integral in s = ln h of weight(u) exp((V - Vmax)/kT)
// about the barrier b of the given width, by the Gauss–Hermite rule in
// t = (s - s*)/(sqrt 2 width).
func (c *pairCurve) peakIntegral(rule quadratureRule, b Extremum, width float64, honig bool) float64 {
	sBarrier, step := math.Log(b.Separation), math.Sqrt2*width
	sum := 0.0
	for k, t := range rule.x {
		h := math.Exp(sBarrier + step*t)
		sum += rule.w[k] * math.Exp(t*t+(c.energy(h)-b.Energy)/c.kT) * stabilityWeight(h/c.radius, honig)
	}
	return step * sum
}

// maxPeakWidth and peakClearance bound where Log10StabilityRatioPeak
// applies: the outer Gauss–Hermite nodes lie 2.86 widths from the barrier,
// so all of them stay above the closest approach.
const (
	maxPeakWidth  = 1.0
	peakClearance = 3.0
)

const (
	maxStabilityPanel   = 1.5 // widest panel in ln h
	maxBackgroundPanels = 48
	maxStabilityBreaks  = maxBackgroundPanels + 1 + len(barrierPanelEdges)
)

// barrierPanelEdges are the extra panel edges, in barrier widths from the
// barrier, that resolve a sharp exp(V/kT) peak; the panels within
// barrierCoreWidths of it take 6 points, the tails beyond (at most e^-4.5 of
// the peak) 4.
var barrierPanelEdges = [6]float64{-6, -3, -1.5, 1.5, 3, 6}

const barrierCoreWidths = 3

// barrierWidth is the width in ln h of exp(V/kT) about s, from the curvature
// at an interior maximum and from the slope at an end of the range.
func (c *pairCurve) barrierWidth(s float64) float64 {
	_, slope, curvature := c.slopes(math.Exp(s))
	slope /= c.kT
	curvature /= c.kT
	return 1 / math.Sqrt(math.Abs(curvature)+slope*slope+1e-300)
}

// sortSmall is an insertion sort for the few panel edges.
func sortSmall(xs []float64) {
	for i := 1; i < len(xs); i++ {
		for j := i; j > 0 && xs[j] < xs[j-1]; j-- {
			xs[j], xs[j-1] = xs[j-1], xs[j]
		}
	}
}
