package assess

import (
	"fmt"
	"math"
	"strings"

	"cleft/insitu/geom"
	"cleft/planes/site"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// Candidates are the planes a slope is screened against: the site's planes
// (not the readings), each with its own friction and cohesion where it gives
// them, and the mean plane of every joint set ("S1 mean", …) with the
// slope's.
func (a *Assessment) Candidates() []slope.Candidate {
	sl := a.Site.Slope
	var out []slope.Candidate
	for i := 0; i < a.NPlanes; i++ {
		p := &a.Planes[i]
		c := slope.Candidate{Name: p.Name, Orientation: p.Orientation, Phi: sl.FrictionAngle, Cohesion: sl.Cohesion}
		if !math.IsNaN(p.Friction) {
			c.Phi = math.Atan(p.Friction) * geom.Deg
		}
		if !math.IsNaN(p.Cohesion) {
			c.Cohesion = p.Cohesion
		}
		out = append(out, c)
	}
	for _, s := range a.Sets {
		out = append(out, slope.Candidate{Name: s.Name + " mean", Orientation: s.Plane.Orientation, Phi: sl.FrictionAngle, Cohesion: sl.Cohesion, IsSet: true})
	}
	return out
}

// MaxWedgePlanes is the most candidates screened against a slope: every
// pair of them is tested as a wedge, so n candidates make n(n−1)/2 wedges
// (200 make 19,900), and the kinematic figure draws each.
const MaxWedgePlanes = 200

// checkSlope refuses a slope screening of more than MaxWedgePlanes
// candidates, before any wedge is tested.
func (a *Assessment) checkSlope() error {
	n := a.NPlanes + len(a.Sets)
	if a.Site.Slope == nil || n <= MaxWedgePlanes {
		return nil
	}
	return &site.Error{File: a.Site.File, Key: "slope", Err: site.ErrLimit,
		Msg: fmt.Sprintf("%d planes and set means would make %d wedge pairs: cleft screens at most %d against a slope (%d pairs); give the slope's own planes in planes_file:, or the field readings in readings_file: so that their set means are screened", n, n*(n-1)/2, MaxWedgePlanes, MaxWedgePlanes*(MaxWedgePlanes-1)/2)}
}

// Slope screens the site's slope against the candidates. It panics when the
// site has no slope.
func (a *Assessment) Slope() *slope.Screening {
	if a.Site.Slope == nil {
		panic("assess: Slope of a site without a slope")
	}
	return slope.Screen(*a.Site.Slope, a.Candidates())
}

// SlopeReadings runs every field reading (and every pair of readings when
// there are fewer than slope.MaxPairReadings) through the slope's kinematic
// tests, each with its own friction where it gives one, weighted by the
// grouping's weights (Terzaghi's when a line is given): counts per set.
// Nil without readings; it panics when the site has no slope.
func (a *Assessment) SlopeReadings() []slope.Count {
	sl := a.Site.Slope
	if sl == nil {
		panic("assess: SlopeReadings of a site without a slope")
	}
	if a.Grouping == nil {
		return nil
	}
	rs := make([]slope.Reading, 0, len(a.Planes)-a.NPlanes)
	for i, p := range a.Planes[a.NPlanes:] {
		r := slope.Reading{Orientation: p.Orientation, Phi: sl.FrictionAngle, Set: a.Grouping.Analysis.Assign[i], Weight: a.Grouping.Weight(i)}
		if !math.IsNaN(p.Friction) {
			r.Phi = math.Atan(p.Friction) * geom.Deg
		}
		rs = append(rs, r)
	}
	return slope.Tally(*sl, rs, len(a.Sets))
}

// Targets are the planes and sets the tunnel is screened against: those
// named by tunnel.sets, or every site plane (not the readings) and every
// set mean ("S1", …). A name that matches nothing is an error naming the
// names there are, and so are more than MaxTunnelTargets.
func (a *Assessment) Targets() ([]tunnel.Target, error) {
	s := a.Site
	var all []tunnel.Target
	add := func(name string, p *site.Plane) {
		t := tunnel.Target{Name: name, Orientation: p.Orientation, Criterion: s.CriterionFor(p, nil), PoreExcess: math.NaN()}
		if !math.IsNaN(p.PorePressure) {
			t.PoreExcess = p.PorePressure - s.Model.At(p.Depth).PorePressure
		}
		all = append(all, t)
	}
	for i := 0; i < a.NPlanes; i++ {
		add(a.Planes[i].Name, &a.Planes[i])
	}
	for i := range a.Sets {
		add(a.Sets[i].Name, &a.Sets[i].Plane)
	}
	want := s.Tunnel.Sets
	if want == nil {
		if len(all) > MaxTunnelTargets {
			return nil, &site.Error{File: s.File, Key: "tunnel", Err: site.ErrLimit, Msg: fmt.Sprintf("%d planes and set means: a tunnel is screened against at most %d; choose them with tunnel.sets", len(all), MaxTunnelTargets)}
		}
		return all, nil
	}
	if len(want) > MaxTunnelTargets {
		return nil, &site.Error{File: s.File, Key: "tunnel.sets", Err: site.ErrLimit, Msg: fmt.Sprintf("%d names: a tunnel is screened against at most %d planes and sets", len(want), MaxTunnelTargets)}
	}
	var out []tunnel.Target
	for _, w := range want {
		found := false
		for _, t := range all {
			if t.Name == w {
				out = append(out, t)
				found = true
			}
		}
		if !found {
			var names []string
			for _, t := range all {
				names = append(names, t.Name)
			}
			return nil, &site.Error{File: s.File, Key: "tunnel.sets", Err: site.ErrMissing, Msg: fmt.Sprintf("no plane or set is named %q; there are: %s", w, strings.Join(names, ", "))}
		}
	}
	return out, nil
}

// MaxTunnelTargets is the most planes and sets a tunnel is screened
// against: each is resolved at every wall point of every station, and
// drawn as a line of the along-alignment chart.
const MaxTunnelTargets = 100

// Tunnel screens the site's tunnel against the targets. It panics when the
// site has no tunnel.
func (a *Assessment) Tunnel() (*tunnel.Screening, error) {
	if a.Site.Tunnel == nil {
		panic("assess: Tunnel of a site without a tunnel")
	}
	ts, err := a.Targets()
	if err != nil {
		return nil, err
	}
	sc, err := tunnel.Screen(*a.Site.Tunnel, a.Site.Model, ts)
	if err != nil {
		return nil, &site.Error{File: a.Site.File, Key: "tunnel", Err: site.ErrRange, Msg: err.Error()}
	}
	return sc, nil
}
