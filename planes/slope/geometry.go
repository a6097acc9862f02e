package slope

import (
	"math"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// ApparentDip returns the apparent dip, in degrees, of plane o along the
// horizontal azimuth az (common practice):
//
//	tan α = tan δ · cos β,  β = az − dip direction
//
// It is negative along azimuths pointing up the dip (|β| > 90°), 0 along
// the strike, and δ along the dip direction. A vertical plane gives ±90,
// or 0 along its strike.
func ApparentDip(o planes.Orientation, az float64) float64 {
	_, c := geom.SinCosDeg(az - o.DipDirection())
	if o.Dip() == 90 {
		switch {
		case c > 0:
			return 90
		case c < 0:
			return -90
		}
		return 0
	}
	return math.Atan(math.Tan(o.Dip()*geom.Rad)*c) * geom.Deg
}

// Intersection returns the line of intersection of two planes, in the
// lower hemisphere (the axis of n1 × n2), and false when the planes are
// parallel (|n1 × n2| < 1e-9).
func Intersection(a, b planes.Orientation) (geom.Line, bool) {
	v := r3.Cross(a.Normal(), b.Normal())
	if r3.Norm(v) < 1e-9 {
		return geom.Line{}, false
	}
	return geom.LineOf(v), true
}

// azDiff returns the smallest angle in degrees, in [0, 180], between two
// azimuths.
func azDiff(a, b float64) float64 {
	return math.Abs(math.Remainder(a-b, 360))
}

// between reports whether azimuth x lies on the shorter arc from a to b
// (inclusive).
func between(x, a, b float64) bool {
	return azDiff(a, x)+azDiff(x, b) <= azDiff(a, b)+1e-9
}

func tand(a float64) float64 { return math.Tan(a * geom.Rad) }
