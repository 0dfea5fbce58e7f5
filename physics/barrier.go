package physics

import "math"

// BarrierNear is Barrier for a pair whose barrier is expected near
// separation h (m), as along a sequence of slowly changing pairs in a root
// search: it climbs from h to the maximum, and falls back to Barrier's full
// scan when it finds none there or h is not positive.
func (p Pair) BarrierNear(h float64) Extremum {
	c := p.curve()
	if h > 0 {
		if v, at, ok := c.maximumNear(h); ok && v > 0 {
			return Extremum{Energy: v, Separation: at, Found: true}
		}
	}
	b, _ := c.extrema(false)
	return b
}

// signedBarrier is the height (J, any sign) and position of the primary
// maximum of the curve, searched near hint first when hint > 0. When the
// energy at closest approach (a steric wall, say) is higher than any
// interior maximum, or there is none, it is that energy with position 0;
// it is 0, 0 when the curve only rises.
func (c *pairCurve) signedBarrier(hint float64) (float64, float64) {
	if hint > 0 {
		if v, h, ok := c.maximumNear(hint); ok {
			return v, h
		}
	}
	lo, hi := c.searchRange()
	var hs, vs [scanPoints]float64
	top, local := c.scan(&hs, &vs, lo, hi), -1
	for i := 1; i < scanPoints-1; i++ {
		if vs[i] >= vs[i-1] && vs[i] >= vs[i+1] && (local < 0 || vs[i] > vs[local]) {
			local = i
		}
	}
	switch {
	case local >= 0 && !(top == 0 && vs[0] > vs[local]):
		s, v := c.polish(math.Log(hs[local-1]), math.Log(hs[local+1]), math.Log(hs[local]), 1)
		return v, math.Exp(s)
	case top == scanPoints-1:
		return 0, 0
	}
	edge := c.refine(&hs, &vs, 0, 1)
	return edge.Energy, 0
}

// maximumNear climbs from hint (in steps of 0.25 in ln h, at most eight,
// uphill by the sign of V_s) until V_s changes sign, and polishes the
// maximum so bracketed; ok is false when it reaches the end of the search
// range first.
func (c *pairCurve) maximumNear(hint float64) (v, h float64, ok bool) {
	const step = 0.25
	lo, hi := c.searchRange()
	sLo, sHi := math.Log(lo), math.Log(hi)
	s := math.Log(hint)
	if !(s > sLo && s < sHi) {
		return 0, 0, false
	}
	v, slope, curv := c.slopes(hint)
	if x, top, ok := newtonConverged(s, v, slope, curv, 1); ok {
		return top, math.Exp(x), true // the hint is the maximum
	}
	dir := 1.0
	if slope < 0 {
		dir = -1
	}
	for k := 0; k < 8; k++ {
		next := s + dir*step
		if next <= sLo || next >= sHi {
			return 0, 0, false
		}
		nv, nextSlope, nextCurv := c.slopes(math.Exp(next))
		if dir*nextSlope <= 0 {
			a, b := min(s, next), max(s, next)
			x, e := c.polishFrom(a, b, s, 1, v, slope, curv)
			return e, math.Exp(x), true
		}
		s, v, slope, curv = next, nv, nextSlope, nextCurv
	}
	return 0, 0, false
}
