package slope

import (
	"math"

	"cleft/insitu/geom"
	"cleft/planes"
)

// Condition is a condition of a kinematic test that is not met, as a bit of
// Kinematic.Fails.
type Condition int

const (
	// Lateral: the dip direction is beyond the lateral limit.
	Lateral Condition = 1 << iota
	// Daylight: the plane or line does not daylight in the face (or, for a
	// wedge, its line plunges into the slope: Kinematic.Offset ≥ 90).
	Daylight
	// Friction: it dips or plunges less than the friction angle.
	Friction
	// Toppling: (90° − dip) + φ exceeds the face dip.
	Toppling
	// Parallel: the two planes of a wedge are parallel; there is no line.
	Parallel
)

// Mode is how a kinematically feasible case fails.
type Mode int

const (
	NoMode        Mode = iota // not feasible
	PlanarSlide               // planar sliding on the plane
	WedgeBoth                 // a wedge sliding on both planes along the line
	WedgeOnFirst              // a wedge sliding on its first plane alone
	WedgeOnSecond             // a wedge sliding on its second plane alone
	Flexural                  // flexural toppling
	LiftOff                   // a wedge off both planes: both overhang it (it falls), or water or loads push it off
)

// String returns the mode's token in the tables: planar, both-planes,
// first-plane, second-plane, flexural-toppling, lift-off, or "" for NoMode.
func (m Mode) String() string {
	switch m {
	case PlanarSlide:
		return "planar"
	case WedgeBoth:
		return "both-planes"
	case WedgeOnFirst:
		return "first-plane"
	case WedgeOnSecond:
		return "second-plane"
	case Flexural:
		return "flexural-toppling"
	case LiftOff:
		return "lift-off"
	}
	return ""
}

// Kinematic is the outcome of one kinematic test: feasible with its Mode, or
// the conditions that fail; and the figures behind the verdict, so that a
// caller can say why.
type Kinematic struct {
	Feasible bool
	Fails    Condition // the conditions not met, 0 when feasible
	Mode     Mode

	Phi          float64 // friction angle used, °
	Limit        float64 // lateral limit used, ° (planar sliding, toppling)
	Offset       float64 // ° of the dip direction (or line trend) from the face's dip direction; toppling: from its opposite
	Dip          float64 // dip of the plane, or plunge of the line, °
	Trend        float64 // dip direction of the plane, or trend of the line, °
	FaceApparent float64 // apparent dip of the face along Trend, °
	ToppleSum    float64 // flexural toppling: (90° − dip) + φ, °
	FaceDip      float64 // true dip of the face, °

	// Wedges: SlideDip is the plunge of the direction of sliding that the
	// friction test used (the line's plunge on both planes, the plane's dip
	// on one); PlanView is the mode by the plan-view rule, reported beside
	// the mechanics (see WedgeSliding), NoMode for other tests.
	SlideDip float64
	Sliding  Mode // wedges: the mode by the mechanics, feasible or not
	PlanView Mode
}

// Conventions at the boundaries (this tool's choice, the cautious one where
// a choice exists): a plane or line exactly at the friction angle, and a dip
// direction exactly at the lateral limit, pass (limiting equilibrium counts
// as able to fail); a plane or line dipping exactly as steeply as the face's
// apparent dip does not daylight (it runs parallel to the face).

// PlanarSliding tests plane p for planar sliding on face f (Markland test as
// refined by Hoek & Bray 1981): the plane daylights (dips less than the
// face's apparent dip in the plane's dip direction), dips at least as
// steeply as the friction angle phi (degrees), and its dip direction lies
// within lateral degrees of the face's. A plane whose dip direction is not
// a reliable reading is tested as dipping towards the face (see Typed), so
// that it gets one verdict whichever way it was typed.
func PlanarSliding(p, f planes.Orientation, phi, lateral float64) Kinematic {
	p = Typed(p, f.DipDirection())
	k := Kinematic{Phi: phi, Limit: lateral, Dip: p.Dip(), Trend: p.DipDirection(), FaceDip: f.Dip()}
	k.Offset = azDiff(p.DipDirection(), f.DipDirection())
	k.FaceApparent = ApparentDip(f, p.DipDirection())
	if k.Offset > lateral {
		k.Fails |= Lateral
	}
	if !(p.Dip() < k.FaceApparent) {
		k.Fails |= Daylight
	}
	if p.Dip() < phi {
		k.Fails |= Friction
	}
	if k.Feasible = k.Fails == 0; k.Feasible {
		k.Mode = PlanarSlide
	}
	return k
}

// WedgeSliding tests the wedge of planes a and b, of friction angles phiA
// and phiB (degrees), on face f (Hoek & Bray 1981): the line of intersection
// points out of the face (its trend within 90° of the face's dip direction)
// and daylights (plunges less than the face's apparent dip along its
// trend), and the direction of sliding is at least as steep as the friction
// angle of the sliding.
//
// The mode comes from the mechanics (WeightMode): the normal reactions of
// the rigid block on the two planes under its weight. Both positive: it
// slides along the line, which must plunge at least the smaller of the two
// friction angles (the weaker plane's friction circle is the cautious screen
// when the planes differ; a both-plane wedge can slide once the line is
// steeper than the weaker plane's φ only if the stronger plane's share of
// the load is small, so this may flag wedges that the factor of safety then
// clears). One not positive: contact is lost there and the block slides
// down the dip of the other plane, which must dip at least that plane's φ.
// The plan-view rule (a plane slides alone when its dip direction lies
// between the line's trend and the face's dip direction; Hoek & Bray 1981)
// is kept in Kinematic.PlanView; it does not decide (and takes no side for
// a plane within planes.NearVertical of vertical or planes.NearHorizontal
// of horizontal, whose typed dip direction means nothing).
//
// It returns the line (towards the face when horizontal) and false in place
// of it for parallel planes.
func WedgeSliding(a, b, f planes.Orientation, phiA, phiB float64) (geom.Line, bool, Kinematic) {
	k := Kinematic{Phi: math.Min(phiA, phiB), FaceDip: f.Dip()}
	l, ok := Intersection(a, b)
	if !ok {
		k.Fails = Parallel
		return l, false, k
	}
	// Of the two senses of a horizontal line, take the one towards the face.
	if l.Plunge == 0 && azDiff(l.Trend, f.DipDirection()) > 90 {
		l.Trend = geom.Azimuth(l.Trend + 180)
	}
	k.Dip, k.Trend = l.Plunge, l.Trend
	k.Offset = azDiff(l.Trend, f.DipDirection())
	k.FaceApparent = ApparentDip(f, l.Trend)
	if k.Offset >= 90 || !(l.Plunge < k.FaceApparent) {
		k.Fails |= Daylight
	}
	k.PlanView = WedgeBoth
	if hasDipDirection(a) && between(a.DipDirection(), l.Trend, f.DipDirection()) {
		k.PlanView = WedgeOnFirst
	}
	if hasDipDirection(b) && between(b.DipDirection(), l.Trend, f.DipDirection()) {
		k.PlanView = WedgeOnSecond
	}
	mode := WeightMode(a, b, f)
	k.Sliding, k.SlideDip = mode, l.Plunge
	switch mode {
	case WedgeOnFirst:
		k.Phi, k.SlideDip = phiA, a.Dip()
	case WedgeOnSecond:
		k.Phi, k.SlideDip = phiB, b.Dip()
	}
	if k.SlideDip < k.Phi && mode != LiftOff { // a block both planes overhang falls
		k.Fails |= Friction
	}
	if k.Feasible = k.Fails == 0; k.Feasible {
		k.Mode = mode
	}
	return l, true, k
}

// FlexuralToppling tests plane p for flexural toppling on face f (Goodman &
// Bray 1976): the plane dips into the face, its dip direction within
// lateral degrees of the opposite of the face's, and
//
//	(90° − δ) + φ ≤ ψf
//
// so that slip between the layers can take place.
//
// A plane within planes.NearVertical of vertical has no meaningful dip direction:
// it is tested as dipping either way and passes if either passes, so that a
// vertical joint typed as 90/030 or 90/210 gets one verdict; a plane within
// planes.NearHorizontal of horizontal is tested as dipping into the face
// (see Typed).
func FlexuralToppling(p, f planes.Orientation, phi, lateral float64) Kinematic {
	return toppling(Typed(p, geom.Azimuth(f.DipDirection()+180)), f, phi, lateral)
}

// Typed returns p, or, when p's dip direction is not a reliable reading,
// the same plane typed with the dip direction that lies nearer the azimuth
// az: a plane within planes.NearVertical of vertical is taken with the
// nearer of its two dip directions, one within planes.NearHorizontal of
// horizontal as dipping towards az. A test that asks whether a plane dips
// towards az then gives it the verdict of its more adverse reading: the
// cautious choice where the typed direction carries no information.
func Typed(p planes.Orientation, az float64) planes.Orientation {
	switch {
	case p.Dip() <= planes.NearHorizontal:
		return planes.MustNew(p.Dip(), az)
	case p.Dip() >= 90-planes.NearVertical && azDiff(p.DipDirection(), az) > 90:
		return planes.MustNew(p.Dip(), geom.Azimuth(p.DipDirection()+180))
	}
	return p
}

// hasDipDirection reports whether p's dip direction is a reliable reading:
// p is neither within planes.NearHorizontal of horizontal nor within
// planes.NearVertical of vertical.
func hasDipDirection(p planes.Orientation) bool {
	return p.Dip() > planes.NearHorizontal && p.Dip() < 90-planes.NearVertical
}

func toppling(p, f planes.Orientation, phi, lateral float64) Kinematic {
	k := Kinematic{Phi: phi, Limit: lateral, Dip: p.Dip(), Trend: p.DipDirection(), FaceDip: f.Dip()}
	k.Offset = azDiff(p.DipDirection(), f.DipDirection()+180)
	k.ToppleSum = 90 - p.Dip() + phi
	if k.Offset > lateral {
		k.Fails |= Lateral
	}
	if k.ToppleSum > f.Dip() {
		k.Fails |= Toppling
	}
	if k.Feasible = k.Fails == 0; k.Feasible {
		k.Mode = Flexural
	}
	return k
}
