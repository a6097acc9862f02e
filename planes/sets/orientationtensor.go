package sets

import (
	"cleft/insitu/geom"
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// Eigen is the eigen-decomposition of a normalised orientation tensor:
// Values S1 ≥ S2 ≥ S3 summing to 1, and their unit axes.
type Eigen struct {
	Values [3]float64
	Axes   [3]r3.Vec
}

// OrientationTensor returns the normalised orientation matrix of a set of
// axes (Scheidegger 1965; Woodcock 1977),
//
//	T = Σ wᵢ nᵢnᵢᵀ / Σ wᵢ
//
// and its eigenvalues and eigenvectors. It treats n and −n alike, so it needs
// no flipping to a common hemisphere. weights may be nil (all 1); a reading
// of weight 0 counts for nothing. Eigenvalues below 1e-12 (round-off of a
// zero: one reading, or readings all in one plane) are returned as 0. It
// panics if the lengths differ and returns NaN values when the total
// weight is 0.
func OrientationTensor(normals []r3.Vec, weights []float64) Eigen {
	if weights != nil && len(weights) != len(normals) {
		panic("sets: OrientationTensor with different numbers of normals and weights")
	}
	var s tensorSum
	for i, n := range normals {
		w := 1.0
		if weights != nil {
			w = weights[i]
		}
		s.add(r3.Unit(n), w)
	}
	return s.eigen()
}

// tensorSum accumulates Σ wᵢ nᵢnᵢᵀ (xx yy zz xy xz yz), Σ wᵢ and the number
// of axes added, for OrientationTensor and for the clustering, which keeps
// one per set while it assigns the readings.
type tensorSum struct {
	t [6]float64
	w float64
	n int
}

// add adds the axis n (unit) with weight w.
func (s *tensorSum) add(n r3.Vec, w float64) {
	s.t[0] += w * n.X * n.X
	s.t[1] += w * n.Y * n.Y
	s.t[2] += w * n.Z * n.Z
	s.t[3] += w * n.X * n.Y
	s.t[4] += w * n.X * n.Z
	s.t[5] += w * n.Y * n.Z
	s.w += w
	s.n++
}

// eigen normalises the sum by Σ w and decomposes it; NaN values when Σ w = 0.
func (s *tensorSum) eigen() Eigen {
	if s.w == 0 {
		nan := math.NaN()
		return Eigen{Values: [3]float64{nan, nan, nan}}
	}
	var t [6]float64
	for i := range t {
		t[i] = s.t[i] / s.w
	}
	v, a, ok := geom.EigenDescending(geom.Sym3{XX: t[0], YY: t[1], ZZ: t[2], XY: t[3], XZ: t[4], YZ: t[5]})
	if !ok {
		panic("sets: eigen decomposition of an orientation tensor failed")
	}
	out := Eigen{Axes: a}
	for i := range 3 {
		if out.Values[i] = v[i]; v[i] < eigenZero {
			out.Values[i] = 0
		}
	}
	return out
}

// eigenZero is the eigenvalue of a normalised orientation tensor taken for
// zero: the decomposition's round-off is about 1e-16.
const eigenZero = 1e-12

// WoodcockK returns Woodcock's (1977) shape parameter K = ln(S1/S2)/ln(S2/S3):
// K > 1 for clusters, K < 1 for girdles. It is NaN when S2 = S3 = 0 (one
// reading, or readings all parallel: 0/0) and 0 for a perfect girdle
// (S1 = S2, S3 = 0).
func (e Eigen) WoodcockK() float64 {
	s1, s2, s3 := e.Values[0], e.Values[1], e.Values[2]
	num := math.Log(s1 / s2)
	den := math.Log(s2 / s3)
	if math.IsInf(den, 1) && !math.IsInf(num, 0) {
		return 0
	}
	return num / den
}

// WoodcockC returns Woodcock's (1977) strength parameter C = ln(S1/S3):
// larger for more strongly preferred orientation; +Inf when S3 = 0.
func (e Eigen) WoodcockC() float64 {
	return math.Log(e.Values[0] / e.Values[2])
}
