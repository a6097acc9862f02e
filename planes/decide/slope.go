package decide

import (
	"math"

	"cleft/planes/assess"
	"cleft/planes/slope"
)

// slopeFindings are the findings of the slope's feasible cases: planar and
// wedge blocks by their least factor of safety over the water cases (near
// below the slope's target FS), flexural toppling and blocks without a
// factor of safety as kinematic only.
func slopeFindings(a *assess.Assessment, sc *slope.Screening) []Finding {
	sl := sc.Slope
	var out []Finding
	for ci := range sc.Cases {
		c := &sc.Cases[ci]
		if !c.Feasible {
			continue
		}
		k := Planar
		switch c.Test {
		case slope.WedgeTest:
			k = Wedge
		case slope.TopplingTest:
			k = Toppling
		}
		f := blank(k)
		f.Name, f.Case, f.Mode, f.Target = sc.Names(*c), ci, c.Mode, sl.TargetFS
		for _, p := range []int{c.A, c.B} {
			if p >= 0 && p < a.NPlanes {
				if o, ok := ownOf(&a.Planes[p]); ok {
					f.Own = append(f.Own, o)
					f.Reasons |= o.reasons() &^ OwnPorePressure // a block has the slope's water cases
				}
			}
		}
		if k == Planar {
			f.CrackDepth, f.ToFail = c.CrackDepth, c.WaterToFail
		}
		if k == Toppling || c.FS == nil {
			if k != Toppling {
				f.Reasons |= NoBlock
			}
			f.byKinematic()
			out = append(out, f)
			continue
		}
		least, best := -1, -1
		for w, fs := range c.FS {
			if math.IsNaN(fs) {
				continue
			}
			if least < 0 || fs < c.FS[least] {
				least = w
			}
			if best < 0 || fs > c.FS[best] {
				best = w
			}
		}
		if least < 0 {
			f.byKinematic()
			out = append(out, f)
			continue
		}
		f.byFS(c.FS[least], sl.TargetFS)
		f.Water, f.Best, f.BestWater = sl.Water[least], c.FS[best], sl.Water[best]
		switch {
		case sl.Water[least].Kind == slope.WaterFull:
			f.Reasons |= Saturated
		case least < len(c.Heads) && c.Heads[least] > 0:
			f.Reasons |= Water
		}
		if least < len(c.Modes) {
			f.Mode = c.Modes[least]
		}
		if f.Mode == slope.WedgeOnFirst || f.Mode == slope.WedgeOnSecond {
			f.Reasons |= OnePlane
		}
		if sl.Load.Seismic > 0 {
			f.Reasons |= Seismic
		}
		if (k == Planar && sl.Load.Bolt > 0) || (k == Wedge && sl.WedgeBolt > 0) {
			f.Reasons |= Bolted
		}
		out = append(out, f)
	}
	return out
}

// SlopeSummary is the slope screening in a few numbers.
type SlopeSummary struct {
	Candidates int // planes and set means tested
	Sets       int // of them, set means
	// Feasible counts the kinematically feasible cases of each test.
	Planar, Wedge, Toppling int
	// Least is the case with the least factor of safety over every feasible
	// planar and wedge case and water case (Case −1 when none has one).
	Least Finding
}

// SummariseSlope returns the counts and the least safe case of sc.
func SummariseSlope(a *assess.Assessment, sc *slope.Screening) SlopeSummary {
	s := SlopeSummary{Candidates: len(sc.Candidates), Least: blank(Planar)}
	for _, c := range sc.Candidates {
		if c.IsSet {
			s.Sets++
		}
	}
	s.Planar, s.Wedge, s.Toppling = sc.Feasible()
	for _, f := range slopeFindings(a, sc) {
		if f.Measure == FactorOfSafety && (s.Least.Case < 0 || f.Value < s.Least.Value) {
			s.Least = f
		}
	}
	return s
}
