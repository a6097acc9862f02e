package tunnel

import (
	"math"

	"cleft/insitu/geom"
	"cleft/planes"
)

// Drive says how a tunnel is driven against a discontinuity whose strike
// is perpendicular to its axis.
type Drive int

const (
	NoDrive    Drive = iota // strike parallel to the axis, or dip below 20°
	WithDip                 // the drive has a component down the dip
	AgainstDip              // the drive has a component up the dip
)

// String returns the drive as the tables write it: "with dip", "against
// dip", or "".
func (d Drive) String() string {
	switch d {
	case WithDip:
		return "with dip"
	case AgainstDip:
		return "against dip"
	}
	return ""
}

// Class is the rating of a discontinuity's orientation against the drive.
type Class int

const (
	VeryFavourable Class = iota + 1
	Favourable
	Fair
	Unfavourable
	VeryUnfavourable
)

// String returns the class as the tables write it, e.g. "very favourable".
func (c Class) String() string {
	switch c {
	case VeryFavourable:
		return "very favourable"
	case Favourable:
		return "favourable"
	case Fair:
		return "fair"
	case Unfavourable:
		return "unfavourable"
	case VeryUnfavourable:
		return "very unfavourable"
	}
	return ""
}

// Band is the band of the orientation table that applies.
type Band int

const (
	Flat                  Band = iota + 1 // dip 0–20°, irrespective of strike
	ParallelSteep                         // strike parallel to the axis, dip 45–90°
	ParallelModerate                      // strike parallel to the axis, dip 20–45°
	PerpendicularSteep                    // strike perpendicular, dip 45–90°
	PerpendicularModerate                 // strike perpendicular, dip 20–45°
)

// DriveClass is the rating of a discontinuity's orientation against the
// drive of a tunnel in Bieniawski's (1989) orientation adjustment for RMR
// (memory; the band edges are this tool's reading of the table):
//
//	strike perpendicular to the axis (angle to it ≥ 45°):
//	    drive with dip,    dip 45–90°: very favourable; dip 20–45°: favourable
//	    drive against dip, dip 45–90°: fair;            dip 20–45°: unfavourable
//	strike parallel to the axis (angle < 45°):
//	    dip 45–90°: very unfavourable; dip 20–45°: fair
//	dip 0–20°, whatever the strike: fair
//
// A dip of exactly 20° or 45° belongs to the steeper band.
type DriveClass struct {
	StrikeToAxis float64 // angle between strike and tunnel axis, degrees, [0, 90]; NaN within planes.NearHorizontal of horizontal (no strike)
	Drive        Drive
	Class        Class
	Band         Band
}

// ClassifyDrive rates plane o against a drive along the azimuth trend.
// Where the table's choice is undefined it takes the less favourable class:
// at exactly 45° strike-to-axis both bands apply, and a plane within
// planes.NearVertical of vertical is neither with nor against its dip (so
// it gets one class whichever dip direction was typed).
func ClassifyDrive(o planes.Orientation, trend float64) DriveClass {
	d := math.Abs(math.Remainder(o.Strike()-trend, 360))
	if d > 90 {
		d = 180 - d
	}
	if o.Dip() <= planes.NearHorizontal {
		d = math.NaN() // a horizontal plane has no strike to set against the axis
	}
	if o.Dip() < 20 {
		return DriveClass{StrikeToAxis: d, Class: Fair, Band: Flat}
	}
	steep := o.Dip() >= 45
	var cands []DriveClass
	if d <= 45 {
		c := DriveClass{StrikeToAxis: d, Class: Fair, Band: ParallelModerate}
		if steep {
			c.Class, c.Band = VeryUnfavourable, ParallelSteep
		}
		cands = append(cands, c)
	}
	if d >= 45 {
		band := PerpendicularModerate
		if steep {
			band = PerpendicularSteep
		}
		_, cos := geom.SinCosDeg(trend - o.DipDirection())
		vertical := o.Dip() >= 90-planes.NearVertical
		if cos > 0 || vertical {
			c := DriveClass{StrikeToAxis: d, Drive: WithDip, Class: Favourable, Band: band}
			if steep {
				c.Class = VeryFavourable
			}
			cands = append(cands, c)
		}
		if cos <= 0 || vertical {
			c := DriveClass{StrikeToAxis: d, Drive: AgainstDip, Class: Unfavourable, Band: band}
			if steep {
				c.Class = Fair
			}
			cands = append(cands, c)
		}
	}
	worst := cands[0]
	for _, c := range cands[1:] {
		if c.Class > worst.Class {
			worst = c
		}
	}
	return worst
}
