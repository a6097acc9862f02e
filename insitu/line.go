package insitu

import (
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// Line is a direction given by its trend and plunge in degrees: trend is the
// azimuth of its horizontal projection, clockwise from north, and plunge the
// angle down from the horizontal. A Line built by LineOf is in the lower
// hemisphere: Trend ∈ [0, 360), Plunge ∈ [0, 90].
type Line struct {
	Trend, Plunge float64
}

// Vec returns the unit vector of l in the NED frame:
//
//	(cos p·cos t, cos p·sin t, sin p)
//
// Multiples of 90° give exact zeros and ones, so a vertical or horizontal line
// has no rounding noise in its components.
func (l Line) Vec() r3.Vec {
	st, ct := SinCosDeg(l.Trend)
	sp, cp := SinCosDeg(l.Plunge)
	return r3.Vec{X: cp * ct, Y: cp * st, Z: sp}
}

// LineOf returns the lower-hemisphere line parallel to v, an axis: v and −v
// give the same line. A horizontal v is given the trend in [0, 180).
// LineOf returns NaNs for the zero vector.
func LineOf(v r3.Vec) Line {
	n := r3.Norm(v)
	if n == 0 {
		return Line{math.NaN(), math.NaN()}
	}
	v = r3.Scale(1/n, v)
	const flat = 1e-14
	if v.Z < 0 || (math.Abs(v.Z) <= flat && (v.Y < 0 || (v.Y == 0 && v.X < 0))) {
		v = r3.Scale(-1, v)
	}
	plunge := math.Asin(math.Min(1, math.Max(-1, v.Z))) * deg
	if math.Abs(v.Z) <= flat {
		plunge = 0
	}
	trend := 0.0
	if h := math.Hypot(v.X, v.Y); h > flat {
		trend = Azimuth(math.Atan2(v.Y, v.X) * deg)
	}
	return Line{Trend: trend, Plunge: plunge}
}

// Azimuth reduces an angle in degrees to [0, 360).
func Azimuth(a float64) float64 {
	a = math.Mod(a, 360)
	if a < 0 {
		a += 360
	}
	if a >= 360 { // a tiny negative a rounds up to 360 above
		a = 0
	}
	return a
}

const (
	deg = 180 / math.Pi
	rad = math.Pi / 180
)

// SinCosDeg returns the sine and cosine of an angle in degrees. Whole
// multiples of 90° give exact results (sin 180° is 0, not 1.2e-16).
func SinCosDeg(a float64) (sin, cos float64) {
	r := math.Mod(a, 360)
	if r < 0 {
		r += 360
	}
	switch r {
	case 0:
		return 0, 1
	case 90:
		return 1, 0
	case 180:
		return 0, -1
	case 270:
		return -1, 0
	}
	return math.Sincos(r * rad)
}

// Angle returns the angle in degrees, in [0, 180], between two non-zero vectors.
func Angle(a, b r3.Vec) float64 {
	return math.Atan2(r3.Norm(r3.Cross(a, b)), r3.Dot(a, b)) * deg
}

// AxialAngle returns the angle in degrees, in [0, 90], between the axes of two
// non-zero vectors: a and −a are the same axis.
func AxialAngle(a, b r3.Vec) float64 {
	return math.Atan2(r3.Norm(r3.Cross(a, b)), math.Abs(r3.Dot(a, b))) * deg
}
