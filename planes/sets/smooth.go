package sets

import (
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// Smoothing is the exponential Kamb weighting of pole density (Vollmer
// 1995, memory; the form of the mplstereonet library's exponential_kamb,
// memory): in place of counting the poles inside a cone, each pole n counts
// for
//
//	w(n) = exp(K·(|a·n| − 1)),  K = 2(1 + N/σ²), σ = 3
//
// about the axis a, and the sum is given in standard deviations of the sum
// for a uniform scatter. For a uniform scatter of axes |a·n| is uniform on
// [0, 1], so (derived)
//
//	E = N·(1 − e^(−K))/K,  Var = N·[(1 − e^(−2K))/(2K) − ((1 − e^(−K))/K)²]
//
// and a uniform scatter reads E/σ, about 3 for large N, as Kamb's counting
// does. The weight falls smoothly with angle instead of stepping at a
// cone's rim, so contours come out smooth, without the islands of counting.
type Smoothing struct {
	N        float64 // readings (or the sum of weights scaled to it)
	K        float64 // the weighting's concentration
	Expected float64 // E, the sum of a uniform scatter
	Sigma    float64 // √Var, its standard deviation
	cut      float64 // |a·n| below which w < smoothCut: left out of the sum
}

// smoothCut is the weight below which a reading is left out of a sum: each
// one left out changes the sum by less than smoothCut, so the density by
// less than N·smoothCut/σ (about 1e-4σ for a hundred readings, well below
// any contour interval).
const smoothCut = 1e-6

// NewSmoothing returns the weighting for n readings (n ≥ 1).
func NewSmoothing(n float64) Smoothing {
	const sigma = 3
	k := 2 * (1 + n/(sigma*sigma))
	e1 := -math.Expm1(-k) / k         // (1 − e^(−K))/K
	e2 := -math.Expm1(-2*k) / (2 * k) // (1 − e^(−2K))/(2K)
	return Smoothing{N: n, K: k, Expected: n * e1, Sigma: math.Sqrt(n * (e2 - e1*e1)), cut: math.Max(0, 1+math.Log(smoothCut)/k)}
}

// Weight returns w for |a·n| = c.
func (s Smoothing) Weight(c float64) float64 { return math.Exp(s.K * (c - 1)) }

// Density returns the weighted sum about axis (n and −n alike) in
// multiples of σ, weights nil for none. It visits every reading; a field of
// many axes uses SmoothCounter.
func (s Smoothing) Density(axis r3.Vec, normals []r3.Vec, weights []float64) float64 {
	axis = r3.Unit(axis)
	sum := 0.0
	for i, n := range normals {
		w := s.Weight(math.Abs(r3.Dot(axis, n)))
		if weights != nil {
			w *= weights[i]
		}
		sum += w
	}
	return sum / s.Sigma
}

// SmoothCounter is Smoothing.Density for many axes over the same readings:
// the readings are sorted into cells as by KambCounter, and each sum visits
// only the readings whose weight is at least smoothCut (the others would change
// the sum by less than that per reading). Read-only: it may be shared.
type SmoothCounter struct {
	s     Smoothing
	cells *KambCounter
}

// NewSmoothCounter prepares the weighting s over normals (weights nil for
// none).
func NewSmoothCounter(s Smoothing, normals []r3.Vec, weights []float64) *SmoothCounter {
	return &SmoothCounter{s: s, cells: NewKambCounter(Kamb{cos: s.cut}, normals, weights)}
}

// Smoothing returns the weighting.
func (c *SmoothCounter) Smoothing() Smoothing { return c.s }

// Density returns the weighted sum about axis in multiples of σ.
func (c *SmoothCounter) Density(axis r3.Vec) float64 {
	return c.cells.sum(axis, c.s.Weight) / c.s.Sigma
}
