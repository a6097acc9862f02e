package study

import (
	"math"

	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/site"
)

// Target is one plane of the study: a site plane, a reading or a set mean.
type Target struct {
	Plane site.Plane
	// Base is the plane's result in the site as given.
	Base planes.Result
	// SetK is a set mean's fitted Fisher K (its orientation scatter), NaN
	// for a plane or reading.
	SetK float64
}

// IsSet reports whether t is a set mean.
func (t *Target) IsSet() bool { return !math.IsNaN(t.SetK) }

// Targets returns the planes of a, then its set means, and checks the plane
// keys of the site's cases and uncertainty against their names
// (site.BindPlanes).
func Targets(a *assess.Assessment) ([]Target, error) {
	out := make([]Target, 0, len(a.Planes)+len(a.Sets))
	for i := range a.Planes {
		out = append(out, Target{Plane: a.Planes[i], Base: a.Results[i], SetK: math.NaN()})
	}
	for _, s := range a.Sets {
		out = append(out, Target{Plane: s.Plane, Base: s.Result, SetK: s.Set.Raw.K})
	}
	ps := make([]site.Plane, len(out))
	for i := range out {
		ps[i] = out[i].Plane
	}
	if err := a.Site.BindPlanes(ps); err != nil {
		return nil, err
	}
	return out, nil
}
