package planes

import "cleft/insitu/geom"

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
// A dip of exactly 20° or 45° belongs to the steeper band; "with dip" means
// the drive has a component down the dip direction.
type DriveClass struct {
	StrikeToAxis float64 // angle between strike and tunnel axis, degrees, [0, 90]
	Drive        string  // "with dip", "against dip", or "" when the strike is parallel or the dip below 20°
	Class        string  // very favourable … very unfavourable
	Rule         string  // the band of the table applied, in words
}

// ClassifyDrive rates plane o against a drive along the azimuth trend.
func ClassifyDrive(o Orientation, trend float64) DriveClass {
	d := azDiff(o.Strike(), trend)
	if d > 90 {
		d = 180 - d
	}
	c := DriveClass{StrikeToAxis: d}
	if o.Dip() < 20 {
		c.Class, c.Rule = "fair", "dip 0–20°, irrespective of strike"
		return c
	}
	steep := o.Dip() >= 45
	if d < 45 {
		if steep {
			c.Class, c.Rule = "very unfavourable", "strike parallel to the axis, dip 45–90°"
		} else {
			c.Class, c.Rule = "fair", "strike parallel to the axis, dip 20–45°"
		}
		return c
	}
	_, cos := geom.SinCosDeg(trend - o.DipDirection())
	with := cos > 0
	switch {
	case with && steep:
		c.Drive, c.Class, c.Rule = "with dip", "very favourable", "strike perpendicular to the axis, drive with dip, dip 45–90°"
	case with:
		c.Drive, c.Class, c.Rule = "with dip", "favourable", "strike perpendicular to the axis, drive with dip, dip 20–45°"
	case steep:
		c.Drive, c.Class, c.Rule = "against dip", "fair", "strike perpendicular to the axis, drive against dip, dip 45–90°"
	default:
		c.Drive, c.Class, c.Rule = "against dip", "unfavourable", "strike perpendicular to the axis, drive against dip, dip 20–45°"
	}
	return c
}
