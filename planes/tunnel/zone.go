package tunnel

import (
	"fmt"
	"math"

	"cleft/insitu/opening"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Section is the cross-section of a tunnel at one station: the opening in its far field, the
// tunnel frame's axes in the NED frame, the depth (m), Biot's coefficient
// and the pore-pressure rule. Build it with NewSection.
type Section struct {
	Opening          opening.Circle
	Up, Right, Along r3.Vec
	Depth, Biot      float64
	Pore             PorePressure
}

// NewSection returns the station of the opening c (far field in the tunnel
// frame whose NED axes are up, right, along; see opening.TunnelFrame) at
// depth ≥ 0 m, with Biot's coefficient ∈ (0, 1] and the pore-pressure rule
// pore (nil for dry rock). It is an error for c to be invalid (see
// opening.NewCircle), for the axes not to be a right-handed orthonormal
// triad (to 1e-9), or for pore to give a non-finite pressure at the wall.
func NewSection(c opening.Circle, up, right, along r3.Vec, depth, biot float64, pore PorePressure) (Section, error) {
	if _, err := opening.NewCircle(c.Far, c.Radius, c.Poisson, c.Support); err != nil {
		return Section{}, err
	}
	const axisTol = 1e-9
	for _, d := range [...]float64{
		r3.Dot(up, up) - 1, r3.Dot(right, right) - 1, r3.Dot(along, along) - 1,
		r3.Dot(up, right), r3.Dot(up, along), r3.Dot(right, along),
		r3.Dot(r3.Cross(up, right), along) - 1,
	} {
		if !(math.Abs(d) <= axisTol) {
			return Section{}, fmt.Errorf("tunnel axes %v, %v, %v: want a right-handed orthonormal triad", up, right, along)
		}
	}
	if math.IsNaN(depth) || math.IsInf(depth, 0) || depth < 0 {
		return Section{}, fmt.Errorf("depth %v m: want a finite number ≥ 0", depth)
	}
	if math.IsNaN(biot) || biot <= 0 || biot > 1 {
		return Section{}, fmt.Errorf("Biot coefficient %v: want a number in (0, 1]", biot)
	}
	if pore == nil {
		pore = Constant(0)
	}
	if p := pore(c.Radius); math.IsNaN(p) || math.IsInf(p, 0) {
		return Section{}, fmt.Errorf("pore pressure %v MPa at the wall: want a finite number", p)
	}
	return Section{Opening: c, Up: up, Right: right, Along: along, Depth: depth, Biot: biot, Pore: pore}, nil
}

// Grid is the polar grid of a zone search: Rays rays at equal angles from
// the crown (the first at 0°), each sampled from the wall at radius a out to
// Outer·a in steps of at most Step·a. The zero value of a field takes its
// default: 360 rays (1°), Step 0.01 (1 % of the radius), Outer 6 (five radii
// of rock beyond the wall). Rays ∈ [8, 3600], Step ∈ (0, 0.01] and Outer ∈
// (1, 100] after the defaults.
type Grid struct {
	Rays        int
	Step, Outer float64
}

// Default grid values, for the zero fields of Grid.
const (
	DefaultRays  = 360
	DefaultStep  = 0.01
	DefaultOuter = 6.0
)

func (g Grid) resolved() Grid {
	if g.Rays == 0 {
		g.Rays = DefaultRays
	}
	if g.Step == 0 {
		g.Step = DefaultStep
	}
	if g.Outer == 0 {
		g.Outer = DefaultOuter
	}
	if g.Rays < 8 || g.Rays > 3600 || !(g.Step > 0 && g.Step <= 0.01) || !(g.Outer > 1 && g.Outer <= 100) {
		panic(fmt.Sprintf("tunnel: grid %+v out of range (rays [8, 3600], step (0, 0.01], outer (1, 100])", g))
	}
	return g
}

// Span is the zone on one ray at Theta (degrees from the crown): Inner and
// Outer are the least and greatest radius (m, from the axis) of the zone on
// that ray, NaN both when the ray misses the zone. Between them the ray may
// leave and re-enter the zone; Zone.Area counts only the parts inside.
type Span struct {
	Theta, Inner, Outer float64
}

// Flags records facts about a zone as a bit set.
type Flags uint8

const (
	// Exists: some point of the grid is in the zone.
	Exists Flags = 1 << iota
	// AtWall: the zone reaches the wall of the opening.
	AtWall
	// Opens: part of the zone has σn' ≤ 0 (planes.Opening).
	Opens
	// ReachesOuter: the zone reaches the outer radius of the grid, so it may
	// extend further; it is unbounded when the plane is critical or opening
	// in the far field (Zone.FarField).
	ReachesOuter
)

// Has reports whether all of the flags in g are set in f.
func (f Flags) Has(g Flags) bool { return f&g == g }

// Zone is the region round an opening where one plane is critical (FS ≤ 1)
// or opening (σn' ≤ 0) under the stress in the rock.
type Zone struct {
	// Depth is the greatest depth of the zone beyond the wall, r − a (m), and
	// Angle (degrees from the crown, clockwise looking along the drive, in
	// [0, 360)) where it occurs; both NaN for no zone. Depth is a lower bound
	// when Flags has ReachesOuter, and Angle then the first ray from the
	// crown that reaches the outer radius. Where equal depths recur
	// (symmetric zones) Angle is the first found from the crown.
	Depth, Angle float64
	// Area is the area of the zone in the section, m² per metre of tunnel.
	Area float64
	// OpeningDepth is the greatest depth beyond the wall of the part of the
	// zone where σn' ≤ 0 (m); NaN when no part opens.
	OpeningDepth float64
	// FarField is the plane's state in the undisturbed far field, with the
	// pore pressure of the rule at the grid's outer radius.
	FarField planes.PlaneState
	Flags    Flags
}
