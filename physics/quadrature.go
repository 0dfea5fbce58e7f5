package physics

import (
	"math"

	"gonum.org/v1/gonum/integrate/quad"
)

// quadratureRule holds the nodes and weights of a fixed rule: Gauss–Legendre
// on [-1, 1], or Gauss–Hermite for the weight exp(-t^2) on the whole line.
// The rules the stability ratio integrates with are built once, from gonum's
// quad.Legendre and quad.Hermite.
//
// Reference: M. Abramowitz & I. A. Stegun, Handbook of Mathematical
// Functions (1964), 25.4.29 (Gauss–Legendre) and 25.4.46 (Gauss–Hermite).
type quadratureRule struct{ x, w []float64 }

var (
	gaussLegendre4 = newGaussLegendre(4)
	gaussLegendre6 = newGaussLegendre(6)
	gaussLegendre8 = newGaussLegendre(8)
	gaussHermite5  = newGaussHermite(5)
	gaussHermite7  = newGaussHermite(7)
)

func newGaussHermite(n int) quadratureRule {
	r := quadratureRule{x: make([]float64, n), w: make([]float64, n)}
	quad.Hermite{}.FixedLocations(r.x, r.w, math.Inf(-1), math.Inf(1))
	return r
}

func newGaussLegendre(n int) quadratureRule {
	r := quadratureRule{x: make([]float64, n), w: make([]float64, n)}
	quad.Legendre{}.FixedLocations(r.x, r.w, -1, 1)
	return r
}
