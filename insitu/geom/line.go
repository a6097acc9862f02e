package geom

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
	plunge := math.Asin(math.Min(1, math.Max(-1, v.Z))) * Deg
	if math.Abs(v.Z) <= flat {
		plunge = 0
	}
	trend := 0.0
	if h := math.Hypot(v.X, v.Y); h > flat {
		trend = Azimuth(math.Atan2(v.Y, v.X) * Deg)
	}
	return Line{Trend: trend, Plunge: plunge}
}
