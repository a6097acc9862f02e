package assess

import (
	"math"

	"cleft/insitu"
	"cleft/planes"
)

// Facts are the figures a summary of the assessment needs.
type Facts struct {
	Planes, Critical, Opening, Stable int
	DepthMin, DepthMax                float64 // of the planes and readings, m
	LeastStable                       []Named // up to three, least stable first
	Readings                          int     // field readings; 0 without readings_file
	Sets                              []Named // the set means, least stable first
	Depths                            []float64
	Limits                            []insitu.LimitCheck // at each of Depths
}

// Named is a plane (or set mean) with its result.
type Named struct {
	Name        string
	Orientation planes.Orientation
	Depth       float64
	Result      planes.Result
}

// Facts gathers the summary figures, with the frictional-limit check at the
// report depths.
func (a *Assessment) Facts() Facts {
	f := Facts{Planes: len(a.Results), DepthMin: math.Inf(1), DepthMax: math.Inf(-1)}
	for i, r := range a.Results {
		switch r.State {
		case planes.Critical:
			f.Critical++
		case planes.Opening:
			f.Opening++
		default:
			f.Stable++
		}
		f.DepthMin = math.Min(f.DepthMin, a.Planes[i].Depth)
		f.DepthMax = math.Max(f.DepthMax, a.Planes[i].Depth)
	}
	rank := a.Ranked()
	for _, i := range rank[:min(3, len(rank))] {
		p := &a.Planes[i]
		f.LeastStable = append(f.LeastStable, Named{p.Name, p.Orientation, p.Depth, a.Results[i]})
	}
	if a.Grouping != nil {
		f.Readings = len(a.Planes) - a.NPlanes
		for _, i := range a.RankedSets() {
			s := &a.Sets[i]
			f.Sets = append(f.Sets, Named{s.Name, s.Plane.Orientation, s.Plane.Depth, s.Result})
		}
	}
	f.Depths = a.ReportDepths()
	mu := a.Site.Criterion.Friction()
	for _, z := range f.Depths {
		f.Limits = append(f.Limits, insitu.CheckLimit(a.Site.Model.At(z), mu))
	}
	return f
}

// Largest returns the index in Limits of the largest effective ratio (+Inf
// counts as largest; a NaN ratio, of a depth without stress, only when every
// ratio is NaN: then the first), and the depths where the limit is exceeded.
func (f Facts) Largest() (int, []float64) {
	best := 0
	exceeded := []float64{}
	for i, c := range f.Limits {
		if b := f.Limits[best].Ratio; c.Ratio > b || (math.IsNaN(b) && !math.IsNaN(c.Ratio)) {
			best = i
		}
		if c.Exceeds {
			exceeded = append(exceeded, f.Depths[i])
		}
	}
	return best, exceeded
}
