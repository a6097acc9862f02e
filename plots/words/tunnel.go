package words

import (
	"fmt"
	"strings"

	"cleft/insitu/opening"
	"cleft/planes"
	"cleft/planes/tunnel"
)

// Spalling names a spalling band (Martin, Kaiser & McCreath 1999).
func Spalling(s opening.Spalling) string {
	switch s {
	case opening.BelowOnset:
		return "below the onset of spalling"
	case opening.AtOnset:
		return "at the onset of spalling (0.4 ± 0.1)"
	case opening.PastOnset:
		return "past the onset of spalling"
	}
	return ""
}

// Arcs writes arcs of the wall as "30-120;210-300" (through the crown as
// "350-10"), "" for none.
func Arcs(as []tunnel.Arc) string {
	out := make([]string, len(as))
	for i, a := range as {
		out[i] = fmt.Sprintf("%d-%d", a.From, a.To)
	}
	return strings.Join(out, ";")
}

// ArcsOrNone writes arcs for a sentence: "30-120, 210-300°", or "none".
func ArcsOrNone(as []tunnel.Arc) string {
	if len(as) == 0 {
		return "none"
	}
	return strings.ReplaceAll(Arcs(as), ";", ", ") + "°"
}

// Stretches writes stretches of chainage as "0–150, 400".
func Stretches(ss []tunnel.Stretch) string {
	var out []string
	for _, s := range ss {
		if s.From == s.To {
			out = append(out, fmt.Sprintf("%g", s.From))
		} else {
			out = append(out, fmt.Sprintf("%g–%g", s.From, s.To))
		}
	}
	return strings.Join(out, ", ")
}

// TunnelLines puts the screening in sentences: the alignment, the largest
// tangential stress, and for each plane or set its slip zone (the deepest,
// where it has no bound, the stretches deeper than the limit), its class on
// each leg and the wall. ZoneMethod and ZoneCaution go with them.
func TunnelLines(sc *tunnel.Screening) []string {
	t := sc.Tunnel
	first, last := sc.Stations[0], sc.Stations[len(sc.Stations)-1]
	wall := "drained (Pp = 0)"
	if !t.Drained {
		wall = "at the far-field Pp"
	}
	if t.Support > 0 {
		wall += fmt.Sprintf(", support pressure %g MPa", t.Support)
	}
	out := []string{fmt.Sprintf("Tunnel: chainage %g to %g m, %d stations every %g m, radius %g m, UCS %g MPa, wall %s.",
		first.Chainage, last.Chainage, len(sc.Stations), t.Spacing, t.Radius, t.UCS, wall)}
	w := sc.Stations[sc.Worst()]
	l := fmt.Sprintf("Largest boundary stress %.1f MPa at %g m (cover %.0f m), %s: σmax/UCS = %.2f, %s (Martin, Kaiser & McCreath 1999); the tangential stress alone peaks at %.1f MPa.",
		w.WallMax.Stress, w.Chainage, w.Cover, WallAngles(w.WallMax.Theta), w.Ratio, Spalling(opening.SpallingOf(w.Ratio)), w.ThetaMax.Stress)
	if sp := sc.Stretches(func(r *tunnel.Result) bool { return r.Ratio >= opening.SpallingOnset-0.1 }); len(sp) > 0 {
		l += fmt.Sprintf(" σmax/UCS ≥ 0.3 at %s m.", Stretches(sp))
	}
	out = append(out, l)
	for i, tg := range sc.Targets {
		walls := sc.Stretches(func(r *tunnel.Result) bool { return len(r.Rows[i].Critical) > 0 || len(r.Rows[i].Opening) > 0 })
		var classes []string
		for k, leg := range t.Legs {
			d := tunnel.ClassifyDrive(tg.Orientation, leg.Trend)
			classes = append(classes, fmt.Sprintf("%s on leg %d (drive %03.0f°)", d.Class, k+1, leg.Trend))
		}
		line := fmt.Sprintf("%s (%s): ", tg.Name, tg.Orientation)
		if t.NoZones {
			if far := sc.Stretches(func(r *tunnel.Result) bool { return r.Rows[i].Far.State != planes.Stable }); len(far) > 0 {
				line += fmt.Sprintf("critical or opening in the far field at %s m; ", Stretches(far))
			}
		} else {
			line += zoneClause(sc, i) + "; "
		}
		line += strings.Join(classes, ", ")
		switch {
		case len(walls) == 1 && walls[0].From == first.Chainage && walls[0].To == last.Chainage:
			r := w.Rows[i]
			line += fmt.Sprintf("; slips or opens somewhere on the wall at every station — at %g m critical on %s, opening on %s", w.Chainage, ArcsOrNone(r.Critical), ArcsOrNone(r.Opening))
		case len(walls) > 0:
			line += fmt.Sprintf("; slips or opens at the wall at %s m", Stretches(walls))
		default:
			line += "; stable at the wall everywhere"
		}
		out = append(out, line+".")
	}
	return out
}

// WallAngles names a wall angle θ ∈ [0, 180) and its twin θ + 180 where
// the same stress recurs: "at 45° and 225° from the crown".
func WallAngles(theta float64) string {
	return fmt.Sprintf("at %.0f° and %.0f° from the crown", theta, theta+180)
}
