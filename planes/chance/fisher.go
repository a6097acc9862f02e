package chance

import (
	"math"
	"math/rand/v2"

	"gonum.org/v1/gonum/spatial/r3"
)

// Fisher draws unit vectors from the Fisher distribution on the sphere
// about a mean direction with concentration κ, whose density is
// proportional to exp(κ·cos θ), θ the angle from the mean. Build it with
// NewFisher; the zero Fisher is not usable.
type Fisher struct {
	mean, e1, e2 r3.Vec  // right-handed orthonormal frame about the mean
	kappa, em    float64 // κ and e^(−2κ) − 1
}

// NewFisher returns the Fisher distribution about the direction of mean
// with concentration kappa ∈ [0, +Inf]: κ = 0 is uniform on the sphere and
// κ = +Inf always gives the mean. NewFisher panics for a zero or non-finite
// mean and for a negative or NaN kappa.
func NewFisher(mean r3.Vec, kappa float64) Fisher {
	n := r3.Norm(mean)
	if !(n > 0) || math.IsInf(n, 0) {
		panic("chance: Fisher mean direction zero or not finite")
	}
	if !(kappa >= 0) {
		panic("chance: Fisher concentration negative or NaN")
	}
	m := r3.Scale(1/n, mean)
	ref := r3.Vec{X: 1}
	if math.Abs(m.X) > 0.6 {
		ref = r3.Vec{Y: 1}
	}
	e1 := r3.Unit(r3.Cross(m, ref))
	return Fisher{mean: m, e1: e1, e2: r3.Cross(m, e1), kappa: kappa, em: math.Expm1(-2 * kappa)}
}

// Draw returns one direction drawn with the generator r, by the inversion
// of Fisher, Lewis & Embleton (1987, §3.6.2):
//
//	cos θ = 1 + ln(u + (1 − u)e^(−2κ))/κ = 1 + log1p(v·(e^(−2κ) − 1))/κ,  v = 1 − u
//
// with u uniform on [0, 1) and the azimuth about the mean uniform on
// [0, 2π); cos θ = 1 − 2v at κ = 0. It uses two values of r and does not
// allocate.
func (f Fisher) Draw(r *rand.Rand) r3.Vec {
	v := float64(r.Uint64()>>11) / (1 << 53)
	phi := 2 * math.Pi * float64(r.Uint64()>>11) / (1 << 53)
	var c float64
	switch {
	case math.IsInf(f.kappa, 1):
		return f.mean
	case f.kappa == 0:
		c = 1 - 2*v
	default:
		c = math.Max(-1, 1+math.Log1p(v*f.em)/f.kappa)
	}
	s := math.Sqrt((1 - c) * (1 + c))
	sp, cp := math.Sincos(phi)
	return r3.Add(r3.Scale(c, f.mean), r3.Add(r3.Scale(s*cp, f.e1), r3.Scale(s*sp, f.e2)))
}
