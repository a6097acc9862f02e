package sets

import (
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// Kamb is Kamb's (1959) counting of pole density: the counting cone is
// chosen from the number of readings N so that a uniform distribution would
// put E = N·A poles in it with E = 3σ, σ = √(N·A(1 − A)), A the cone's
// fraction of the hemisphere:
//
//	A = 9/(N + 9),  cos θ = 1 − A
//
// Densities are counts in multiples of σ, so a uniform scatter reads 3σ and
// clusters stand out as 6σ, 9σ and more.
type Kamb struct {
	N        float64 // readings (or the sum of normalised weights)
	Area     float64 // A, fraction of the hemisphere
	Theta    float64 // half-angle of the counting cone, degrees
	Expected float64 // E = N·A
	Sigma    float64 // σ = √(N·A(1 − A))
	cos      float64
}

// NewKamb returns the counting for n readings (n ≥ 1).
func NewKamb(n float64) Kamb {
	a := 9 / (n + 9)
	return Kamb{N: n, Area: a, Theta: math.Acos(1-a) * 180 / math.Pi, Expected: n * a, Sigma: math.Sqrt(n * a * (1 - a)), cos: 1 - a}
}

// Density returns the weighted count of the axes within the counting cone
// about axis (n and −n alike), in multiples of σ. weights may be nil.
func (k Kamb) Density(axis r3.Vec, normals []r3.Vec, weights []float64) float64 {
	axis = r3.Unit(axis)
	c := 0.0
	for i, n := range normals {
		if math.Abs(r3.Dot(axis, n)) >= k.cos {
			if weights == nil {
				c++
			} else {
				c += weights[i]
			}
		}
	}
	return c / k.Sigma
}
