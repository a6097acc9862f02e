package plots

import (
	"fmt"
	"math"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Projection maps lower-hemisphere lines onto the unit disc.
type Projection int

const (
	// EqualArea is the Lambert azimuthal equal-area (Schmidt) net: for a line
	// at angular distance θ = 90° − plunge from the centre,
	//	r = √2·sin(θ/2)
	// (Snyder 1987, USGS PP 1395, ρ = 2R·sin(θ/2), scaled so that the
	// primitive has radius 1).
	EqualArea Projection = iota
	// EqualAngle is the stereographic (Wulff) net: r = tan(θ/2).
	EqualAngle
)

// ParseProjection reads "equal-area" or "equal-angle".
func ParseProjection(s string) (Projection, error) {
	switch s {
	case "equal-area":
		return EqualArea, nil
	case "equal-angle":
		return EqualAngle, nil
	}
	return 0, fmt.Errorf("projection %q: want equal-area or equal-angle", s)
}

func (p Projection) String() string {
	if p == EqualAngle {
		return "equal-angle"
	}
	return "equal-area"
}

// Name is the projection's name as a caption gives it.
func (p Projection) Name() string {
	if p == EqualAngle {
		return "equal-angle (stereographic, Wulff) net, lower hemisphere"
	}
	return "equal-area (Lambert, Schmidt) net, lower hemisphere"
}

// Point is a position on the net, primitive radius 1, x east, y north.
type Point struct{ X, Y float64 }

// Radius returns the distance from the centre of the net of a line at
// angular distance theta (radians) from the vertical, θ ∈ [0, π/2].
func (p Projection) Radius(theta float64) float64 {
	if p == EqualAngle {
		return math.Tan(theta / 2)
	}
	return math.Sqrt2 * math.Sin(theta/2)
}

// theta inverts Radius: the angular distance from the vertical for r ∈ [0, 1].
func (p Projection) theta(r float64) float64 {
	if p == EqualAngle {
		return 2 * math.Atan(r)
	}
	return 2 * math.Asin(math.Min(1, r/math.Sqrt2))
}

// Project returns the net position of a line (lower hemisphere: a line with
// negative plunge is taken as its opposite).
func (p Projection) Project(l geom.Line) Point {
	return p.ProjectVec(l.Vec())
}

// ProjectVec returns the net position of the axis of a non-zero vector v
// (NED); v and −v give the same point, except on the primitive.
func (p Projection) ProjectVec(v r3.Vec) Point {
	n := math.Sqrt(r3.Dot(v, v))
	if v.Z < 0 {
		v = r3.Scale(-1, v)
	}
	h := math.Hypot(v.X, v.Y)
	theta := math.Atan2(h, v.Z) // angle from the downward vertical
	r := p.Radius(theta)
	if h == 0 || n == 0 {
		return Point{}
	}
	return Point{X: r * v.Y / h, Y: r * v.X / h}
}

// Inverse returns the line at net position pt, and false when pt lies
// outside the primitive.
func (p Projection) Inverse(pt Point) (geom.Line, bool) {
	r := math.Hypot(pt.X, pt.Y)
	if r > 1 {
		return geom.Line{}, false
	}
	theta := p.theta(r)
	trend := 0.0
	if r > 0 {
		trend = geom.Azimuth(math.Atan2(pt.X, pt.Y) * 180 / math.Pi)
	}
	return geom.Line{Trend: trend, Plunge: 90 - theta*180/math.Pi}, true
}

// GreatCircle returns the trace of plane o on the net as n+1 points from one
// end of its strike to the other, through the projected line of steepest
// dip. n must be at least 2.
func (p Projection) GreatCircle(o planes.Orientation, n int) []Point {
	s, d := o.StrikeVec(), o.DownDip()
	pts := make([]Point, n+1)
	for i := range pts {
		t := math.Pi * float64(i) / float64(n)
		sn, cs := math.Sincos(t)
		v := r3.Add(r3.Scale(cs, s), r3.Scale(sn, d))
		if i == 0 || i == n { // keep the ends exactly on the primitive
			v.Z = 0
		}
		pts[i] = p.ProjectVec(v)
	}
	return pts
}

// SmallCircle returns the cone of half-angle alpha (degrees) about the axis,
// as paths on the net sampled at n points round the cone. The cone is axial:
// the part of it above the horizontal is drawn through the opposite, lower
// hemisphere, so a cone about a steep plane's pole that crosses the primitive
// comes out as two arcs meeting the primitive on opposite sides.
func (p Projection) SmallCircle(axis geom.Line, alpha float64, n int) [][]Point {
	a := axis.Vec()
	// Two unit vectors normal to the axis.
	ref := r3.Vec{Z: 1}
	if math.Abs(a.Z) > 0.9 {
		ref = r3.Vec{X: 1}
	}
	u := r3.Unit(r3.Cross(a, ref))
	w := r3.Cross(a, u)
	sa, ca := math.Sincos(alpha * math.Pi / 180)
	var paths [][]Point
	var cur []Point
	prevDown := true
	for i := 0; i <= n; i++ {
		t := 2 * math.Pi * float64(i) / float64(n)
		st, ct := math.Sincos(t)
		v := r3.Add(r3.Scale(ca, a), r3.Add(r3.Scale(sa*ct, u), r3.Scale(sa*st, w)))
		down := v.Z >= 0
		if i > 0 && down != prevDown {
			// Crossing the horizontal: end the path on the primitive and
			// start a new one at the antipodal point.
			h := r3.Vec{X: v.X, Y: v.Y}
			if math.Hypot(h.X, h.Y) > 0 {
				end, start := h, r3.Scale(-1, h)
				if !prevDown { // the path so far is the flipped upper part
					end, start = start, end
				}
				cur = append(cur, p.ProjectVec(end))
				paths = append(paths, cur)
				cur = []Point{p.ProjectVec(start)}
			}
		}
		prevDown = down
		cur = append(cur, p.ProjectVec(v))
	}
	paths = append(paths, cur)
	// The first and last paths may be one run cut at t = 0.
	if len(paths) > 2 {
		first := paths[0]
		last := paths[len(paths)-1]
		paths = append([][]Point{append(last, first[1:]...)}, paths[1:len(paths)-1]...)
	}
	return paths
}
