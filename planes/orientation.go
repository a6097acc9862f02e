package planes

import (
	"cleft/insitu/geom"
	"fmt"
	"math"
	"strconv"
	"strings"

	"gonum.org/v1/gonum/spatial/r3"
)

// Orientation is a plane given by its dip and dip direction, in degrees, with
// its geometry worked out once at construction. It is read-only: build it
// with New, FromStrike, FromPole, FromNormal or Parse. The zero value is the
// horizontal plane 0/000 (pole straight down, strike towards west).
type Orientation struct {
	dip float64 // ∈ [0, 90]
	dd  float64 // ∈ [0, 360)

	built  bool   // false for the zero value, whose vectors are those of 0/000
	pole   r3.Vec // unit normal, pointing down (lower hemisphere)
	strike r3.Vec // unit, horizontal, along strike (right-hand rule)
	updip  r3.Vec // unit, in the plane, pointing up the dip
}

// NearVertical is the tolerance, degrees, within which a plane counts as
// vertical wherever a verdict would otherwise depend on which of its two
// dip directions was typed (this tool's choice: 1°, well inside the
// accuracy of a compass reading).
const NearVertical = 1.0

// NearHorizontal is the tolerance, degrees, within which a plane counts as
// horizontal: its dip direction, and so its strike, is then not a reliable
// reading, and nothing that depends on them is reported (the rake and slip
// sense) or judged (the slope tests take it as dipping the way that matters).
// This tool's choice, as for NearVertical: 1°.
const NearHorizontal = 1.0

// The vectors of the zero value, the plane 0/000.
var (
	zeroPole   = r3.Vec{Z: 1}
	zeroStrike = r3.Vec{Y: -1}
	zeroUpdip  = r3.Vec{X: -1}
)

// Dip returns the dip in degrees, ∈ [0, 90].
func (o Orientation) Dip() float64 { return o.dip }

// DipDirection returns the dip direction in degrees, ∈ [0, 360).
func (o Orientation) DipDirection() float64 { return o.dd }

// New returns the plane with dip ∈ [0, 90] and dip direction ∈ [0, 360]
// (360 is stored as 0). Dips of 0 and 90 are exact: the pole of a vertical
// plane is horizontal, that of a horizontal plane vertical. A horizontal plane
// keeps the dip direction it was given, which fixes its strike and so the
// origin of its rakes.
func New(dip, dipDirection float64) (Orientation, error) {
	if math.IsNaN(dip) || dip < 0 || dip > 90 {
		return Orientation{}, fmt.Errorf("dip %v is outside [0, 90]", dip)
	}
	if math.IsNaN(dipDirection) || dipDirection < 0 || dipDirection > 360 {
		return Orientation{}, fmt.Errorf("dip direction %v is outside [0, 360]", dipDirection)
	}
	return build(dip, geom.Azimuth(dipDirection)), nil
}

// MustNew is New for values known to be valid; it panics otherwise.
func MustNew(dip, dipDirection float64) Orientation {
	o, err := New(dip, dipDirection)
	if err != nil {
		panic("planes: " + err.Error())
	}
	return o
}

func build(dip, dd float64) Orientation {
	sd, cd := geom.SinCosDeg(dip)
	sa, ca := geom.SinCosDeg(dd)
	return fromTrig(dip, dd, sd, cd, sa, ca)
}

// fromTrig is the plane of dip and dip direction dd (degrees) from their
// sines and cosines.
func fromTrig(dip, dd, sd, cd, sa, ca float64) Orientation {
	return Orientation{
		dip:    dip,
		dd:     dd,
		built:  true,
		pole:   r3.Vec{X: -sd * ca, Y: -sd * sa, Z: cd},
		strike: r3.Vec{X: sa, Y: -ca},
		updip:  r3.Vec{X: -cd * ca, Y: -cd * sa, Z: -sd},
	}
}

// FromStrike returns the plane of strike ∈ [0, 360] and dip ∈ [0, 90] by the
// right-hand rule: the plane dips to the right of the strike direction, so its
// dip direction is strike + 90.
func FromStrike(strike, dip float64) (Orientation, error) {
	if math.IsNaN(strike) || strike < 0 || strike > 360 {
		return Orientation{}, fmt.Errorf("strike %v is outside [0, 360]", strike)
	}
	if math.IsNaN(dip) || dip < 0 || dip > 90 {
		return Orientation{}, fmt.Errorf("dip %v is outside [0, 90]", dip)
	}
	return build(dip, geom.Azimuth(strike+90)), nil
}

// FromPole returns the plane whose pole has the given trend ∈ [0, 360] and
// plunge ∈ [0, 90]: dip = 90 − plunge, dip direction = trend + 180.
func FromPole(trend, plunge float64) (Orientation, error) {
	if math.IsNaN(trend) || trend < 0 || trend > 360 {
		return Orientation{}, fmt.Errorf("pole trend %v is outside [0, 360]", trend)
	}
	if math.IsNaN(plunge) || plunge < 0 || plunge > 90 {
		return Orientation{}, fmt.Errorf("pole plunge %v is outside [0, 90]", plunge)
	}
	return build(90-plunge, geom.Azimuth(trend+180)), nil
}

// FromNormal returns the plane with normal n (either sense, non-zero).
func FromNormal(n r3.Vec) Orientation {
	l := geom.LineOf(n)
	return build(90-l.Plunge, geom.Azimuth(l.Trend+180))
}

// Parse reads "DIP/DIPDIRECTION", e.g. "65/120", with optional spaces.
func Parse(s string) (Orientation, error) {
	a, b, ok := strings.Cut(s, "/")
	if !ok {
		return Orientation{}, fmt.Errorf("%q: want DIP/DIP_DIRECTION, e.g. 65/120", s)
	}
	dip, err1 := strconv.ParseFloat(strings.TrimSpace(a), 64)
	dd, err2 := strconv.ParseFloat(strings.TrimSpace(b), 64)
	if err1 != nil || err2 != nil {
		return Orientation{}, fmt.Errorf("%q: want two numbers DIP/DIP_DIRECTION, e.g. 65/120", s)
	}
	return New(dip, dd)
}

// String returns "DIP/DIPDIRECTION" with dip two digits and dip direction
// three, e.g. "65/120".
func (o Orientation) String() string {
	return fmt.Sprintf("%02.0f/%03.0f", o.dip, o.dd)
}

// Normal returns the unit pole of the plane, pointing down (into the
// footwall from the hanging wall):
//
//	(−sin δ·cos α, −sin δ·sin α, cos δ)  for dip δ, dip direction α
func (o Orientation) Normal() r3.Vec {
	if !o.built {
		return zeroPole
	}
	return o.pole
}

// Pole returns the trend and plunge of the lower-hemisphere pole:
// trend = dip direction + 180, plunge = 90 − dip.
func (o Orientation) Pole() geom.Line {
	return geom.Line{Trend: geom.Azimuth(o.dd + 180), Plunge: 90 - o.dip}
}

// Strike returns the strike in [0, 360), right-hand rule: dip direction − 90.
func (o Orientation) Strike() float64 { return geom.Azimuth(o.dd - 90) }

// StrikeVec returns the horizontal unit vector along strike.
func (o Orientation) StrikeVec() r3.Vec {
	if !o.built {
		return zeroStrike
	}
	return o.strike
}

// DownDip returns the unit vector down the line of steepest dip.
func (o Orientation) DownDip() r3.Vec { return r3.Scale(-1, o.UpDip()) }

// UpDip returns the unit vector up the line of steepest dip.
func (o Orientation) UpDip() r3.Vec {
	if !o.built {
		return zeroUpdip
	}
	return o.updip
}

// DipLine returns the trend and plunge of the line of steepest dip.
func (o Orientation) DipLine() geom.Line {
	return geom.Line{Trend: o.dd, Plunge: o.dip}
}
