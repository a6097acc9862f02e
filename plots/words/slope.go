package words

import (
	"fmt"
	"math"
	"strings"

	"cleft/planes/slope"
)

// Reason says why a kinematic test failed (every condition not met), or
// how a feasible case fails (its mode); for a wedge, names its planes.
func Reason(sc *slope.Screening, c slope.Case) string {
	k := c.Kinematic
	if k.Feasible {
		s := Mode(sc, c)
		if c.BlockErr != nil {
			s += "; factor of safety not computed: " + c.BlockErr.Error()
		}
		return s
	}
	var out []string
	switch c.Test {
	case slope.PlanarTest:
		if k.Fails&slope.Lateral != 0 {
			out = append(out, fmt.Sprintf("dip direction %.0f° from the face's, beyond the lateral limit of %g°", k.Offset, k.Limit))
		}
		if k.Fails&slope.Daylight != 0 {
			out = append(out, fmt.Sprintf("does not daylight: dips %.0f°, the face %.1f° in that direction", k.Dip, k.FaceApparent))
		}
		if k.Fails&slope.Friction != 0 {
			out = append(out, fmt.Sprintf("dips %.0f°, less than the friction angle %g°", k.Dip, k.Phi))
		}
	case slope.WedgeTest:
		if k.Fails&slope.Parallel != 0 {
			out = append(out, "the planes are parallel: no line of intersection")
		}
		if k.Fails&slope.Daylight != 0 {
			if k.Offset >= 90 {
				out = append(out, fmt.Sprintf("the line plunges into the slope (trend %.0f°, %.0f° from the face's dip direction)", k.Trend, k.Offset))
			} else {
				out = append(out, fmt.Sprintf("does not daylight: the line plunges %.1f°, the face %.1f° along it", k.Dip, k.FaceApparent))
			}
		}
		if k.Fails&slope.Friction != 0 {
			out = append(out, fmt.Sprintf("the line plunges %.1f°, less than the friction angle %g°", k.Dip, k.Phi))
		}
	default:
		if k.Fails&slope.Lateral != 0 {
			out = append(out, fmt.Sprintf("does not dip into the face: dip direction %.0f° from the opposite of the face's, beyond the lateral limit of %g°", k.Offset, k.Limit))
		}
		if k.Fails&slope.Toppling != 0 {
			out = append(out, fmt.Sprintf("(90° − dip) + φ = %.0f° exceeds the face dip %g°", k.ToppleSum, k.FaceDip))
		}
	}
	return strings.Join(out, "; ")
}

// Mode names how a feasible case fails.
func Mode(sc *slope.Screening, c slope.Case) string {
	switch c.Mode {
	case slope.PlanarSlide:
		return "planar sliding"
	case slope.WedgeBoth:
		return "sliding on both planes"
	case slope.WedgeOnFirst:
		return "single-plane sliding on " + sc.Candidates[c.A].Name
	case slope.WedgeOnSecond:
		return "single-plane sliding on " + sc.Candidates[c.B].Name
	case slope.Flexural:
		return "flexural toppling"
	}
	return ""
}

// SlopeLines are the slope's screening in a few lines: the settings, the
// counts of feasible cases, then one line per feasible case (the planar
// ones with their factors of safety).
func SlopeLines(sc *slope.Screening) []string {
	sl := sc.Slope
	pl, we, to := sc.Feasible()
	n := len(sc.Candidates)
	out := []string{
		fmt.Sprintf("Slope: face %s, %g m high, friction angle %.1f°, lateral limits %g° (sliding) and %g° (toppling); %d planes tested, %d pairs.",
			sl.Face, sl.Height, sl.FrictionAngle, sl.LateralLimit, sl.ToppleLimit, n, n*(n-1)/2),
		fmt.Sprintf("Kinematically feasible: %d planar, %d wedge, %d flexural toppling.", pl, we, to),
	}
	for _, c := range sc.Cases {
		if !c.Feasible {
			continue
		}
		names := sc.Names(c)
		switch c.Test {
		case slope.PlanarTest:
			if c.FS == nil {
				out = append(out, fmt.Sprintf("  planar %s: %s.", names, Reason(sc, c)))
				continue
			}
			var fs []string
			for i, f := range sl.CrackFill {
				fs = append(fs, fmt.Sprintf("%.2f (crack %g%% full)", c.FS[i], 100*f))
			}
			out = append(out, fmt.Sprintf("  planar %s: crack %.1f m deep; FS %s; FS %s.", names, c.CrackDepth, strings.Join(fs, ", "), WaterToFail(c.WaterToFail)))
		case slope.WedgeTest:
			out = append(out, fmt.Sprintf("  wedge %s: line %03.0f/%02.0f, %s.", names, c.Line.Trend, c.Line.Plunge, Mode(sc, c)))
		default:
			out = append(out, fmt.Sprintf("  flexural toppling %s.", names))
		}
	}
	return out
}

// WaterToFail says at what water depth in the crack FS falls to 1.
func WaterToFail(zw float64) string {
	switch {
	case math.IsNaN(zw):
		return "does not fall to 1 even with a full crack"
	case zw == 0:
		return "is at or below 1 dry"
	}
	return fmt.Sprintf("falls to 1 with %.1f m of water in the crack", zw)
}
