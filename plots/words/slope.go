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
		s := Mode(sc, c, c.Mode)
		if c.Test == slope.WedgeTest && k.PlanView != c.Mode {
			s += " (the plan-view rule would say " + Mode(sc, c, k.PlanView) + ")"
		}
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
			if k.Sliding == slope.WedgeOnFirst || k.Sliding == slope.WedgeOnSecond {
				out = append(out, fmt.Sprintf("it would slide on %s alone, which dips %.1f°, less than its friction angle %.3g°", plane(sc, c, k.Sliding), k.SlideDip, k.Phi))
			} else {
				out = append(out, fmt.Sprintf("the line plunges %.1f°, less than the friction angle %.3g°", k.Dip, k.Phi))
			}
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

func plane(sc *slope.Screening, c slope.Case, m slope.Mode) string {
	if m == slope.WedgeOnSecond {
		return sc.Candidates[c.B].Name
	}
	return sc.Candidates[c.A].Name
}

// Mode names a mode of case c.
func Mode(sc *slope.Screening, c slope.Case, m slope.Mode) string {
	switch m {
	case slope.PlanarSlide:
		return "planar sliding"
	case slope.WedgeBoth:
		return "sliding on both planes"
	case slope.WedgeOnFirst, slope.WedgeOnSecond:
		return "single-plane sliding on " + plane(sc, c, m)
	case slope.Flexural:
		return "flexural toppling"
	case slope.LiftOff:
		return "off both planes"
	}
	return ""
}

// WaterCase names a water case: "dry", "5 m of water", "table 18 m below
// the crest", "saturated".
func WaterCase(w slope.Water) string {
	switch {
	case w.Kind == slope.WaterFull:
		return "saturated"
	case w.Kind == slope.WaterTable:
		return fmt.Sprintf("table %g m below the crest", w.Depth)
	case w.Depth == 0:
		return "dry"
	}
	return fmt.Sprintf("%g m of water", w.Depth)
}

// FS formats a factor of safety: two decimals, "not driven" when nothing
// drives the block (+Inf), "—" when undefined.
func FS(v float64) string {
	if math.IsInf(v, 1) {
		return "not driven"
	}
	return Fixed(v, 2)
}

// SlopeLines are the slope's screening in a few lines: the settings, the
// counts of feasible cases, then one line per feasible case (planar cases
// and wedges with their blocks and factors of safety).
func SlopeLines(sc *slope.Screening) []string {
	sl := sc.Slope
	pl, we, to := sc.Feasible()
	n := len(sc.Candidates)
	var cases []string
	for _, w := range sl.Water {
		cases = append(cases, WaterCase(w))
	}
	out := []string{
		fmt.Sprintf("Slope: face %s, %g m high, friction angle %.1f°, lateral limits %g° (sliding) and %g° (toppling); %d planes tested, %d pairs.",
			sl.Face, sl.Height, sl.FrictionAngle, sl.LateralLimit, sl.ToppleLimit, n, n*(n-1)/2),
		fmt.Sprintf("Water cases: %s. %s", strings.Join(cases, ", "), Loads(sl)),
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
			out = append(out, fmt.Sprintf("  planar %s: crack %.1f m deep; FS %s; FS %s; %s.", names, c.CrackDepth, fsList(sl, c), WaterToFail(c.WaterToFail), Bolt(c, sl.TargetFS, "MN/m")))
		case slope.WedgeTest:
			s := fmt.Sprintf("  wedge %s: line %03.0f/%02.0f, %s", names, c.Line.Trend, c.Line.Plunge, Reason(sc, c))
			if w := c.Wedge; w != nil {
				s += fmt.Sprintf("; %.0f m³, %.2f MN, traces on the face %.1f and %.1f m; FS %s", w.Volume, w.Weight, w.TraceA, w.TraceB, fsList(sl, c))
				if c.ShortOK && c.Short.Both {
					s += fmt.Sprintf("; K = %.3f, friction-only FS %.2f", c.Short.K, c.Short.FS(sc.Candidates[c.A].Phi, sc.Candidates[c.B].Phi))
				}
				s += "; " + Bolt(c, sl.TargetFS, "MN")
			}
			out = append(out, s+".")
		default:
			out = append(out, fmt.Sprintf("  flexural toppling %s.", names))
		}
	}
	return out
}

// fsList is the factors of safety of a case by water case, with the head
// where it is not the case's own number, and the mode where water changes
// it.
func fsList(sl slope.Slope, c slope.Case) string {
	var fs []string
	for i, w := range sl.Water {
		wc := WaterCase(w)
		if w.Kind == slope.WaterTable || (w.Kind == slope.WaterHead && w.Depth > 0) {
			wc = "with " + strings.Replace(wc, "table", "the table", 1)
		}
		s := fmt.Sprintf("%s %s", FS(c.FS[i]), wc)
		switch {
		case w.Kind == slope.WaterTable && c.Heads[i] == 0:
			s += " (below the block: no water in it)"
		case w.Kind == slope.WaterHead && c.Heads[i] < w.Depth:
			s += fmt.Sprintf(" (%.1f m, the most the block holds)", c.Heads[i])
		case w.Kind != slope.WaterHead:
			s += fmt.Sprintf(" (%.1f m of water)", c.Heads[i])
		}
		if c.Modes != nil && c.Modes[i] != c.Mode {
			s += " on " + c.Modes[i].String()
		}
		fs = append(fs, s)
	}
	return strings.Join(fs, ", ")
}

// Bolt says what bolt force brings a case's least safe water case to the
// target factor of safety.
func Bolt(c slope.Case, target float64, unit string) string {
	switch {
	case math.IsNaN(c.BoltToTarget):
		return fmt.Sprintf("no bolt force in the given direction brings FS to %g", target)
	case c.BoltToTarget == 0:
		return fmt.Sprintf("FS ≥ %g without a bolt", target)
	}
	return fmt.Sprintf("bolt for FS %g: %.3g %s", target, c.BoltToTarget, unit)
}

// Loads describes the slope's external loads.
func Loads(sl slope.Slope) string {
	ld := sl.Load
	dir := fmt.Sprintf("%g° below the horizontal", ld.Plunge)
	if ld.ToPlane {
		dir = fmt.Sprintf("at %g° to the sliding plane or line", ld.Plunge)
	}
	if ld.HasTrend {
		dir += fmt.Sprintf(", trend %03.0f°", ld.Trend)
	} else {
		dir += ", into the slope"
	}
	bolt := "no bolt"
	if ld.Bolt > 0 || sl.WedgeBolt > 0 {
		bolt = fmt.Sprintf("bolt %g MN/m on planar blocks and %g MN on wedges", ld.Bolt, sl.WedgeBolt)
	}
	return fmt.Sprintf("Loads: %s, %s; seismic coefficient %g; target FS %g.", bolt, dir, ld.Seismic, sl.TargetFS)
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

// WaterShort is a water case in a few characters, for column heads: "dry",
// "5 m", "table 18 m", "full".
func WaterShort(w slope.Water) string {
	switch {
	case w.Kind == slope.WaterFull:
		return "full"
	case w.Kind == slope.WaterTable:
		return fmt.Sprintf("table %g m", w.Depth)
	case w.Depth == 0:
		return "dry"
	}
	return fmt.Sprintf("%g m", w.Depth)
}
