package sets

import (
	"cleft/insitu/geom"
	"cleft/planes"
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// FisherStats are Fisher's (1953) statistics of a set of axes, with the axes
// first turned into a common hemisphere about the principal axis of their
// orientation tensor, so that a set straddling the primitive (steep planes
// with dip directions 180° apart) is not split.
type FisherStats struct {
	N      float64 // number of readings, or the sum of normalised weights
	R      float64 // length of the resultant vector
	Mean   r3.Vec  // unit mean axis (lower hemisphere)
	K      float64 // concentration estimate (N−1)/(N−R); +Inf when R = N, NaN for one reading
	Alpha  float64 // α95, the 95 % confidence cone of the mean, degrees
	SphVar float64 // spherical variance 1 − R/N; NaN for one reading
}

// MeanPole returns the mean as a lower-hemisphere line.
func (f FisherStats) MeanPole() geom.Line { return geom.LineOf(f.Mean) }

// MeanPlane returns the plane whose pole is the mean axis.
func (f FisherStats) MeanPlane() planes.Orientation { return planes.FromNormal(f.Mean) }

// Fisher returns the statistics of the axes in normals (Fisher 1953; Fisher,
// Lewis & Embleton 1987, §5):
//
//	R = |Σ wᵢxᵢ|,  K = (N − 1)/(N − R),
//	cos α95 = 1 − ((N − R)/R)·[(1/0.05)^(1/(N−1)) − 1]
//
// With weights (nil for none) the weights are scaled to sum to the number of
// readings, so that N stays the sample size and the weights only shift the
// mean and the spread (the usual practice with Terzaghi weights, e.g. Priest
// 1993). K, α95 and the spherical variance are NaN for fewer than two
// readings (one reading has no spread to estimate), and α95 is 180 when the formula's cosine falls below
// −1 (a spread too wide for a cone).
func Fisher(normals []r3.Vec, weights []float64) FisherStats {
	n := len(normals)
	if n == 0 {
		nan := math.NaN()
		return FisherStats{N: 0, R: nan, K: nan, Alpha: nan, SphVar: nan, Mean: r3.Vec{X: nan, Y: nan, Z: nan}}
	}
	ref := OrientationTensor(normals, weights).Axes[0]
	scale := 1.0
	if weights != nil {
		sw := 0.0
		for _, w := range weights {
			sw += w
		}
		scale = float64(n) / sw
	}
	var sum r3.Vec
	for i, v := range normals {
		v = r3.Unit(v)
		if r3.Dot(v, ref) < 0 {
			v = r3.Scale(-1, v)
		}
		w := scale
		if weights != nil {
			w *= weights[i]
		}
		sum = r3.Add(sum, r3.Scale(w, v))
	}
	N := float64(n)
	R := math.Min(N, r3.Norm(sum))
	f := FisherStats{N: N, R: R, Mean: r3.Unit(sum), SphVar: 1 - R/N}
	if f.Mean.Z < 0 {
		f.Mean = r3.Scale(-1, f.Mean)
	}
	f.K, f.Alpha = math.NaN(), math.NaN()
	if n < 2 {
		f.SphVar = math.NaN()
	} else {
		f.K = math.Inf(1)
		if N > R {
			f.K = (N - 1) / (N - R)
		}
		c := 1 - (N-R)/R*(math.Pow(1/0.05, 1/(N-1))-1)
		f.Alpha = math.Acos(math.Max(-1, math.Min(1, c))) * 180 / math.Pi
	}
	return f
}
