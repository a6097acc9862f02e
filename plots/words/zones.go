package words

import (
	"fmt"
	"math"

	"cleft/planes/tunnel"
)

// ZoneCaution is the caution that goes with every statement of slip zones.
const ZoneCaution = "Slip zones are a screening of where each plane or set could slip or open, not a support design: " +
	"the rock is taken as linear elastic, isotropic and homogeneous round a circular opening in plane strain, " +
	"with no excavation sequence, no yield or redistribution of stress and no seepage forces; " +
	"joints are taken as continuous through every point of the section."

// ZoneMethod says in one sentence how the zones were found: the field, the
// pore-pressure rule, the grid and the limit.
func ZoneMethod(sc *tunnel.Screening) string {
	t := sc.Tunnel
	var pore string
	if t.Drained {
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, st := range sc.Stations {
			lo, hi = math.Min(lo, st.Influence), math.Max(hi, st.Influence)
		}
		r := fmt.Sprintf("%.0f m", lo)
		if hi-lo >= 0.5 {
			r = fmt.Sprintf("%.0f to %.0f m along the alignment", lo, hi)
		}
		how := "given"
		if t.Influence == 0 {
			how = "twice the head of water over the axis, at least twice the radius"
		}
		pore = fmt.Sprintf("the wall is drained, so the pore pressure rises as ln r from 0 at the wall to its undisturbed value at the radius of influence (steady radial inflow, Thiem 1906), %s (%s)", r, how)
	} else {
		pore = "the pore pressure is the undisturbed one all the way to the wall (a watertight lining, which must then carry at least the water pressure)"
	}
	g := t.ZoneGrid
	rays, step, outer := tunnel.DefaultRays, tunnel.DefaultStep, tunnel.DefaultOuter
	if g.Rays != 0 {
		rays = g.Rays
	}
	if g.Step != 0 {
		step = g.Step
	}
	if g.Outer != 0 {
		outer = g.Outer
	}
	support := "unsupported wall"
	if t.Support > 0 {
		support = fmt.Sprintf("support pressure %g MPa on the wall", t.Support)
	}
	return fmt.Sprintf("Slip zones: the points of the rock round the opening where the full elastic stress (Kirsch 1898, with the anti-plane terms; %s), resolved on each plane or set with its own strength, is critical or opening; %s. Searched on %d rays from the crown, every %g %% of the radius out to %g radii from the axis, each boundary refined by bisection and the deepest point by golden-section search. Stretches are reported where a zone reaches deeper than %s m beyond the wall.",
		support, pore, rays, 100*step, outer, Num(t.Limit()))
}

// zoneClause is the slip-zone headline of target k: its deepest zone, where
// it has no bound, and the stretches deeper than the limit.
func zoneClause(sc *tunnel.Screening, k int) string {
	far := sc.Stretches(func(r *tunnel.Result) bool { return r.Rows[k].Extent() == tunnel.Unbounded })
	var out string
	if len(far) > 0 {
		out = fmt.Sprintf("critical or opening in the far field at %s m, so its zone of potential slip has no bound there; ", Stretches(far))
	}
	i, _, ok := sc.Deepest(k, true)
	past, _, okPast := sc.Deepest(k, false)
	switch {
	case ok:
		st := &sc.Stations[i]
		z := st.Rows[k].Zone
		near := ""
		if len(far) > 0 {
			near = "near the opening "
		}
		out += fmt.Sprintf("slip zone %sup to %s m beyond the wall at %g m, %.0f° from the crown (%s m² per metre of tunnel%s)",
			near, Fixed(z.Depth, 2), st.Chainage, z.Angle, Fixed(z.Area, 1), wallNote(z))
	case okPast && sc.Stations[past].Rows[k].Extent() == tunnel.PastGrid:
		st := &sc.Stations[past]
		out += fmt.Sprintf("slip zone at least %s m beyond the wall at %g m (it reaches the edge of the search)", Fixed(st.Rows[k].Zone.Depth, 1), st.Chainage)
	case len(far) == 0:
		out += "no slip zone at any station"
	default:
		out = out[:len(out)-2]
	}
	if ps := sc.Stretches(func(r *tunnel.Result) bool { return r.Rows[k].Extent() == tunnel.PastGrid }); len(ps) > 0 && ok {
		out += fmt.Sprintf("; past the edge of the search at %s m", Stretches(ps))
	}
	if d := sc.Deeper(k); len(d) > 0 {
		out += fmt.Sprintf("; deeper than %s m at %s m", Num(sc.Tunnel.Limit()), Stretches(d))
	} else if ok || okPast {
		out += fmt.Sprintf("; nowhere deeper than %s m", Num(sc.Tunnel.Limit()))
	}
	return out
}

// wallNote says whether a zone is open to the wall and how deep its
// opening part reaches.
func wallNote(z tunnel.Zone) string {
	s := ", not reaching the wall"
	if z.Flags.Has(tunnel.AtWall) {
		s = ", open to the wall"
	}
	if !math.IsNaN(z.OpeningDepth) {
		s += fmt.Sprintf(", opening to %s m", Fixed(z.OpeningDepth, 2))
	}
	return s
}

// ZoneKey is the figure key's lines for a row's zone: "deepest 1.60 m at
// 54°", "20.0 m² per metre, from the wall", or what it reaches.
func ZoneKey(r *tunnel.Row) []string {
	z := r.Zone
	var near []string
	if z.Flags.Has(tunnel.Exists) && !z.Flags.Has(tunnel.ReachesOuter) {
		near = []string{fmt.Sprintf("deepest %s m at %.0f° (and %.0f°)", Fixed(z.Depth, 2), z.Angle, math.Mod(z.Angle+180, 360)),
			fmt.Sprintf("%s m² per metre, ", Fixed(z.Area, 1))}
		if z.Flags.Has(tunnel.AtWall) {
			near[1] += "open to the wall"
		} else {
			near[1] += "clear of the wall"
		}
	}
	switch r.Extent() {
	case tunnel.Bounded:
		return near
	case tunnel.PastGrid:
		return []string{fmt.Sprintf("at least %s m: it reaches", Fixed(z.Depth, 1)), "the edge of the search"}
	case tunnel.Unbounded:
		out := []string{"no bound: critical in the far field"}
		if near != nil {
			near[0] = "near the opening " + near[0]
		}
		return append(out, near...)
	}
	return []string{"no zone"}
}
