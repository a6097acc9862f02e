package planes

import (
	"math"

	"cleft/insitu/geom"

	"gonum.org/v1/gonum/spatial/r3"
)

// FromUnitNormal returns the plane with unit normal n (either sense), as
// FromNormal does, but builds its vectors from n by algebra rather than by
// way of trend and plunge, for hot loops (a Monte Carlo of orientations):
// with the pole p = ±n in the lower hemisphere, sin δ = √(p.x² + p.y²),
// cos δ = p.z and the dip direction α from (−p.x, −p.y)/sin δ,
//
//	strike = (sin α, −cos α, 0),  up-dip = (−cos δ·cos α, −cos δ·sin α, −sin δ)
//
// A vertical n gives the horizontal plane 0/180, as FromNormal does; a
// horizontal n (a vertical plane) is taken with the sense FromNormal takes.
// n must be of unit length (to about 1e-12): FromUnitNormal does not
// normalise it. It does not allocate.
func FromUnitNormal(n r3.Vec) Orientation {
	const flat = 1e-14 // as geom.LineOf
	if n.Z < 0 || (math.Abs(n.Z) <= flat && (n.Y < 0 || (n.Y == 0 && n.X < 0))) {
		n = r3.Vec{X: -n.X, Y: -n.Y, Z: -n.Z}
	}
	// The pole of the plane is −(line of n) turned to point down: FromNormal
	// takes the lower-hemisphere line of n as the pole, whose trend + 180 is
	// the dip direction.
	sd := math.Sqrt(n.X*n.X + n.Y*n.Y)
	cd := n.Z
	if math.Abs(cd) <= flat {
		cd = 0
	}
	if sd <= flat {
		return build(0, 180)
	}
	ca, sa := -n.X/sd, -n.Y/sd
	dip := math.Atan2(sd, cd) * geom.Deg
	dd := geom.Azimuth(math.Atan2(sa, ca) * geom.Deg)
	return fromTrig(dip, dd, sd, cd, sa, ca)
}
