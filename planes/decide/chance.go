package decide

import (
	"cleft/planes/chance/study"
)

// withChance adds to each finding its cases and probability, then lets
// them raise its standing (byChance): planes, set means and readings their
// target's P(critical or opening); slope cases the largest P(FS < 1) over
// the water cases; planes and sets along the tunnel the largest P of being
// critical or opening in the far field along the alignment.
func withChance(fs []Finding, s *Screenings) {
	out := s.Outcome
	slopeP := map[int]*study.SlopeOdds{}
	if out != nil {
		for i := range out.Slope {
			slopeP[out.Slope[i].Case] = &out.Slope[i]
		}
	}
	for i := range fs {
		f := &fs[i]
		switch f.Kind {
		case Plane, SetMean, Readings:
			if len(s.Runs) > 1 {
				f.Cases, f.Unstable = len(s.Runs), study.Critical(s.Runs, f.target)
			}
			if out != nil {
				o := out.Odds[f.target]
				f.P, f.SE = o.PUnstable, o.StdErr
			}
		case Planar, Wedge:
			if o, ok := slopeP[f.Case]; ok && s.Slope != nil {
				for w, p := range o.P {
					if w == 0 || p > f.P {
						f.P, f.SE, f.PWater = p, o.StdErr[w], s.Slope.Slope.Water[w]
					}
				}
			}
		case TunnelZone:
			if out == nil || s.Tunnel == nil {
				break
			}
			for _, o := range out.Tunnel {
				if o.Target == f.target && !(o.P <= f.P) {
					f.P, f.SE, f.PChainage = o.P, o.StdErr, s.Tunnel.Stations[o.Station].Chainage
				}
			}
		}
		f.byChance()
	}
}
