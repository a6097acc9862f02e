package decide

import (
	"math"

	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/site"
)

// ownOf returns p's own inputs, or false when it gives none.
func ownOf(p *site.Plane) (Own, bool) {
	o := Own{Name: p.Name, Friction: p.Friction, Cohesion: p.Cohesion, PorePressure: p.PorePressure}
	return o, o.reasons() != 0
}

// planeFinding is the finding of plane p with result r (kind k): measured
// by σn' when it opens, else by its factor of safety; with its own inputs,
// and those that decide its standing (p resolved with the site's value
// instead of each, one at a time, stands better).
func planeFinding(k Kind, p *site.Plane, r planes.Result, s *site.Site, rv *site.Resolver) Finding {
	f := blank(k)
	f.Name, f.Orientation, f.Depth, f.Result = p.Name, p.Orientation, p.Depth, r
	f.standPlane(r)
	if r.OpensFirst && r.State == planes.Stable {
		f.Reasons |= OpensFirst
	}
	f.Site = r
	f.SiteOwn = Own{Name: p.Name, Friction: math.NaN(), Cohesion: math.NaN(), PorePressure: r.PorePressure}
	if c, ok := s.Criterion.(*planes.Coulomb); ok {
		f.SiteOwn.Friction, f.SiteOwn.Cohesion = c.Mu, c.Cohesion
	}
	if o, ok := ownOf(p); ok {
		f.Own = []Own{o}
		f.Reasons |= o.reasons()
		q := *p
		q.Friction, q.Cohesion, q.PorePressure = math.NaN(), math.NaN(), math.NaN()
		rv.Resolve(&q, &f.Site)
		f.SiteOwn.PorePressure = f.Site.PorePressure
		for _, bit := range []Reason{OwnFriction, OwnCohesion, OwnPorePressure} {
			if !f.Reasons.Has(bit) {
				continue
			}
			q := *p
			switch bit {
			case OwnFriction:
				q.Friction = math.NaN()
			case OwnCohesion:
				q.Cohesion = math.NaN()
			default:
				q.PorePressure = math.NaN()
			}
			var alt planes.Result
			rv.Resolve(&q, &alt)
			var g Finding
			g.standPlane(alt)
			if g.Standing < f.Standing {
				f.Decisive |= bit
			}
		}
	}
	return f
}

// standPlane measures a plane by its result.
func (f *Finding) standPlane(r planes.Result) {
	if r.State == planes.Opening {
		f.byOpening(r.EffectiveNormal)
		return
	}
	f.byFS(r.FactorOfSafety, NearFS)
}

// planeFindings are the findings of the site's planes, its set means and
// its readings (one per set, by the set's least stable reading).
func planeFindings(a *assess.Assessment) []Finding {
	rv := a.Site.Resolver()
	var out []Finding
	for i := 0; i < a.NPlanes; i++ {
		f := planeFinding(Plane, &a.Planes[i], a.Results[i], a.Site, rv)
		f.target = i
		out = append(out, f)
	}
	for i := range a.Sets {
		s := &a.Sets[i]
		f := planeFinding(SetMean, &s.Plane, s.Result, a.Site, rv)
		f.target = len(a.Planes) + i
		out = append(out, f)
	}
	if a.Grouping == nil {
		return out
	}
	// The readings of each set, in the order of the sets, unassigned last.
	n := len(a.Sets)
	least := make([]int, n+1)
	count := make([]int, n+1)
	of := make([]int, n+1)
	for k := range least {
		least[k] = -1
	}
	for j, s := range a.Grouping.Analysis.Assign {
		k := s
		if k < 0 {
			k = n
		}
		i := a.NPlanes + j
		of[k]++
		if a.Results[i].State != planes.Stable {
			count[k]++
		}
		if least[k] < 0 || planes.LessStable(a.Results[i], a.Results[least[k]]) {
			least[k] = i
		}
	}
	for k, i := range least {
		if i < 0 {
			continue
		}
		f := planeFinding(Readings, &a.Planes[i], a.Results[i], a.Site, rv)
		f.Set, f.Count, f.Of, f.target = a.Grouping.Assigned(i-a.NPlanes), count[k], of[k], i
		out = append(out, f)
	}
	return out
}
