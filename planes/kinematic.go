package planes

import (
	"cleft/insitu/geom"
	"fmt"
	"math"
	"strings"

	"gonum.org/v1/gonum/spatial/r3"
)

// ApparentDip returns the apparent dip, in degrees, of plane o along the
// horizontal azimuth az (common practice):
//
//	tan α = tan δ · cos β,  β = az − dip direction
//
// It is negative along azimuths pointing up the dip (|β| > 90°), 0 along
// the strike, and δ along the dip direction.
func ApparentDip(o Orientation, az float64) float64 {
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
	return math.Atan(math.Tan(o.Dip()*math.Pi/180)*c) * 180 / math.Pi
}

// Intersection returns the line of intersection of two planes, in the
// lower hemisphere (the direction of n1 × n2), and false when the planes are
// parallel (within 1e-9 rad).
func Intersection(a, b Orientation) (geom.Line, bool) {
	v := r3.Cross(a.Normal(), b.Normal())
	if r3.Norm(v) < 1e-9 {
		return geom.Line{}, false
	}
	return geom.LineOf(v), true
}

// azDiff returns the smallest angle in degrees, in [0, 180], between two
// azimuths.
func azDiff(a, b float64) float64 {
	d := math.Abs(math.Remainder(a-b, 360))
	return d
}

// Condition is a condition of a kinematic test, as a bit of Kinematic.Fails.
type Condition int

const (
	// Lateral: the dip direction is beyond the lateral limit.
	Lateral Condition = 1 << iota
	// Daylight: the plane or line does not daylight in the face (or, for a
	// wedge, its line plunges into the slope).
	Daylight
	// Friction: it dips or plunges less than the friction angle.
	Friction
	// Toppling: (90° − dip) + φ exceeds the face dip.
	Toppling
)

// Kinematic is the outcome of one kinematic test: feasible, or the
// conditions that fail, in words and as bits.
type Kinematic struct {
	Feasible bool
	Fails    Condition // the conditions not met, 0 when feasible
	Failed   []string  // the same in words
	// Mode says how a feasible wedge slides: "sliding on both planes" or
	// "single-plane sliding on NAME".
	Mode string
}

// Reason returns the failed conditions joined by "; ", or the mode.
func (k Kinematic) Reason() string {
	if k.Feasible {
		return k.Mode
	}
	return strings.Join(k.Failed, "; ")
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
// within lateral degrees of the face's.
func PlanarSliding(p, f Orientation, phi, lateral float64) Kinematic {
	var k Kinematic
	if d := azDiff(p.DipDirection(), f.DipDirection()); d > lateral {
		k.Fails |= Lateral
		k.Failed = append(k.Failed, fmt.Sprintf("dip direction %.0f° from the face's, beyond the lateral limit of %g°", d, lateral))
	}
	if app := ApparentDip(f, p.DipDirection()); !(p.Dip() < app) {
		k.Fails |= Daylight
		k.Failed = append(k.Failed, fmt.Sprintf("does not daylight: dips %.0f°, the face %.1f° in that direction", p.Dip(), app))
	}
	if p.Dip() < phi {
		k.Fails |= Friction
		k.Failed = append(k.Failed, fmt.Sprintf("dips %.0f°, less than the friction angle %g°", p.Dip(), phi))
	}
	k.Feasible = len(k.Failed) == 0
	if k.Feasible {
		k.Mode = "planar sliding"
	}
	return k
}

// WedgeSliding tests the wedge of planes a and b (named na, nb) on face f
// (Hoek & Bray 1981): the line of intersection points out of the face (its
// trend within 90° of the face's dip direction), daylights (plunges less
// than the face's apparent dip along its trend) and plunges at least as
// steeply as phi. A feasible wedge slides on one plane alone when that
// plane's dip direction lies between the line's trend and the face's dip
// direction (Hoek & Bray 1981; Wyllie & Mah 2004), else on both.
func WedgeSliding(a, b Orientation, na, nb string, f Orientation, phi float64) (geom.Line, Kinematic) {
	var k Kinematic
	l, ok := Intersection(a, b)
	if !ok {
		k.Fails, k.Failed = Daylight, []string{"the planes are parallel: no line of intersection"}
		return l, k
	}
	// Of the two senses of a horizontal line, take the one towards the face.
	if l.Plunge == 0 && azDiff(l.Trend, f.DipDirection()) > 90 {
		l.Trend = geom.Azimuth(l.Trend + 180)
	}
	if d := azDiff(l.Trend, f.DipDirection()); d >= 90 {
		k.Fails |= Daylight
		k.Failed = append(k.Failed, fmt.Sprintf("the line plunges into the slope (trend %.0f°, %.0f° from the face's dip direction)", l.Trend, d))
	} else if app := ApparentDip(f, l.Trend); !(l.Plunge < app) {
		k.Fails |= Daylight
		k.Failed = append(k.Failed, fmt.Sprintf("does not daylight: the line plunges %.1f°, the face %.1f° along it", l.Plunge, app))
	}
	if l.Plunge < phi {
		k.Fails |= Friction
		k.Failed = append(k.Failed, fmt.Sprintf("the line plunges %.1f°, less than the friction angle %g°", l.Plunge, phi))
	}
	k.Feasible = len(k.Failed) == 0
	if k.Feasible {
		k.Mode = "sliding on both planes"
		for _, c := range []struct {
			o    Orientation
			name string
		}{{a, na}, {b, nb}} {
			if between(c.o.DipDirection(), l.Trend, f.DipDirection()) {
				k.Mode = "single-plane sliding on " + c.name
			}
		}
	}
	return l, k
}

// between reports whether azimuth x lies on the shorter arc from a to b
// (inclusive).
func between(x, a, b float64) bool {
	return azDiff(a, x)+azDiff(x, b) <= azDiff(a, b)+1e-9
}

// FlexuralToppling tests plane p for flexural toppling on face f (Goodman &
// Bray 1976): the plane dips into the face, its dip direction within
// lateral degrees of the opposite of the face's, and
//
//	(90° − δ) + φ ≤ ψf
//
// so that slip between the layers can take place.
func FlexuralToppling(p, f Orientation, phi, lateral float64) Kinematic {
	var k Kinematic
	if d := azDiff(p.DipDirection(), f.DipDirection()+180); d > lateral {
		k.Fails |= Lateral
		k.Failed = append(k.Failed, fmt.Sprintf("does not dip into the face: dip direction %.0f° from the opposite of the face's, beyond the lateral limit of %g°", d, lateral))
	}
	if s := 90 - p.Dip() + phi; s > f.Dip() {
		k.Fails |= Toppling
		k.Failed = append(k.Failed, fmt.Sprintf("(90° − dip) + φ = %.0f° exceeds the face dip %g°", s, f.Dip()))
	}
	k.Feasible = len(k.Failed) == 0
	if k.Feasible {
		k.Mode = "flexural toppling"
	}
	return k
}
