package decide

import (
	"cleft/insitu/opening"
	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/tunnel"
)

// tunnelFindings are the findings of the tunnel: the wall at the station of
// the largest σmax/UCS, with the stretches at or past the onset of
// spalling; and each plane or set by its deepest slip zone (by extent, then
// depth: tunnel.Screening.Deepest), failing where it reaches deeper than
// the zone limit or has no bound because the plane is critical or opening
// in the far field.
func tunnelFindings(a *assess.Assessment, sc *tunnel.Screening) []Finding {
	w := sc.Worst()
	st := &sc.Stations[w]
	wall := blank(TunnelWall)
	wall.byWall(st.Ratio)
	wall.Station, wall.Chainage = w, st.Chainage
	wall.Stretches = sc.Stretches(func(r *tunnel.Result) bool { return opening.SpallingOf(r.Ratio) != opening.BelowOnset })
	out := []Finding{wall}
	lim := sc.Tunnel.Limit()
	for k, tg := range sc.Targets {
		far := sc.Stretches(func(r *tunnel.Result) bool { return r.Rows[k].Far.State != planes.Stable })
		i, _, ok := sc.Deepest(k, true) // the deepest zone whose depth is known,
		if !ok {
			i, _, ok = sc.Deepest(k, false) // else one past the grid or unbounded
		}
		if !ok {
			continue
		}
		row := &sc.Stations[i].Rows[k]
		f := blank(TunnelZone)
		f.Name, f.Orientation, f.target = tg.Name, tg.Orientation, k
		f.Station, f.Chainage, f.Depth = i, sc.Stations[i].Chainage, sc.Stations[i].Depth
		f.Angle, f.Extent, f.Limit, f.Result = row.Zone.Angle, row.Extent(), lim, row.Far
		f.Stretches, f.FarStretches = sc.Deeper(k), far
		f.byZone(row.Zone.Depth, lim, len(far) > 0, len(f.Stretches) > 0)
		if len(f.FarStretches) > 0 {
			f.Reasons |= FarField
		}
		if f.Extent == tunnel.PastGrid {
			f.Reasons |= PastGrid
		}
		for j := 0; j < a.NPlanes; j++ {
			if a.Planes[j].Name == tg.Name {
				if o, ok := ownOf(&a.Planes[j]); ok {
					f.Own = []Own{o}
					f.Reasons |= o.reasons()
				}
				break
			}
		}
		out = append(out, f)
	}
	return out
}

// TunnelSummary is the tunnel screening in a few numbers.
type TunnelSummary struct {
	Stations int
	// Worst is the station of the largest σmax/UCS (tunnel.Screening.Worst)
	// and Spalling its band; Stretches are the stretches at or past the
	// onset of spalling.
	Worst     int
	Spalling  opening.Spalling
	Stretches []tunnel.Stretch
	// Deepest is the deepest slip zone by extent, then depth (station and
	// target; ok false when there is none), and Bounded the deepest whose
	// depth is known.
	Deepest, DeepestTarget int
	HasDeepest             bool
	Bounded, BoundedTarget int
	HasBounded             bool
	// Far are, for each target, the stretches where it is critical or
	// opening in the far field.
	Far [][]tunnel.Stretch
}

// SummariseTunnel returns the summary numbers of sc.
func SummariseTunnel(sc *tunnel.Screening) TunnelSummary {
	s := TunnelSummary{Stations: len(sc.Stations), Worst: sc.Worst()}
	s.Spalling = opening.SpallingOf(sc.Stations[s.Worst].Ratio)
	s.Stretches = sc.Stretches(func(r *tunnel.Result) bool { return opening.SpallingOf(r.Ratio) != opening.BelowOnset })
	s.Deepest, s.DeepestTarget, s.HasDeepest = sc.Deepest(-1, false)
	s.Bounded, s.BoundedTarget, s.HasBounded = sc.Deepest(-1, true)
	for k := range sc.Targets {
		s.Far = append(s.Far, sc.Stretches(func(r *tunnel.Result) bool { return r.Rows[k].Far.State != planes.Stable }))
	}
	return s
}
