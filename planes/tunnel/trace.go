package tunnel

import (
	"math"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// TraceAngle returns the apparent dip of plane o in the cross-section of a
// tunnel whose axes are up, right and along (opening.TunnelFrame): the angle
// of the line where the plane cuts the section, d = n × along for the pole
// n, measured from Right towards Up, in degrees in [0, 180). Looking along
// the drive, 0 is a horizontal trace, 90 a vertical one, and a trace below
// 90 rises to the right. For a level drive this is the apparent dip along
// the horizontal across the axis. ok is false for a plane within 1e-9 rad
// of the section itself (its pole along the axis), which has no trace.
func TraceAngle(o planes.Orientation, up, right, along r3.Vec) (deg float64, ok bool) {
	d := r3.Cross(o.Normal(), along)
	if r3.Norm(d) < 1e-9 {
		return math.NaN(), false
	}
	a := math.Atan2(r3.Dot(d, up), r3.Dot(d, right)) * geom.Deg
	a = math.Mod(a+360, 180)
	if a >= 180 { // rounding of a value just below 0
		a = 0
	}
	return a, true
}
