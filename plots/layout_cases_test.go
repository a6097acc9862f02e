package plots

import (
	"sync"
	"testing"

	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/sets"
	"cleft/planes/site"
	"cleft/planes/site/demo"
	"cleft/planes/tunnel"

	"gonum.org/v1/plot/vg"
)

var (
	demoOnce sync.Once
	demoA    *assess.Assessment
	demoErr  error
)

// demoAssessment is the built-in demo site, assessed once.
func demoAssessment(t testing.TB) *assess.Assessment {
	t.Helper()
	demoOnce.Do(func() {
		var s *site.Site
		if s, demoErr = site.ParseFS(demo.FS, demo.Site); demoErr == nil {
			demoA, demoErr = assess.New(s)
		}
	})
	if demoErr != nil {
		t.Fatal(demoErr)
	}
	return demoA
}

// demoNet is a stereonet of the demo's first n planes (all when n < 0) at
// the figure depth, as cleft plot builds it; trace says which planes get
// great circles.
func demoNet(t testing.TB, m Measure, p Projection, n int, trace func(planes.PlaneState) bool, w, h vg.Length) *Stereonet {
	a := demoAssessment(t)
	z := a.FigureDepth()
	st := &Stereonet{Site: a.Site.Name, Model: a.Site.Summary(), Depth: z, State: a.Site.Model.At(z), Criterion: a.Site.Criterion, Measure: m, Proj: p}
	st.Field = NewField(st.State, st.Criterion, m, p, FieldSize(w, h))
	for i, pl := range a.Planes {
		if n >= 0 && i >= n {
			break
		}
		st.Poles = append(st.Poles, Pole{Name: pl.Name, Orientation: pl.Orientation, Result: a.Results[i], Trace: trace(a.Results[i].State)})
	}
	for _, s := range a.Sets {
		st.Means = append(st.Means, Pole{Name: s.Name, Orientation: s.Plane.Orientation, Result: s.Result})
	}
	return st
}

func unstable(s planes.PlaneState) bool { return s != planes.Stable }
func always(planes.PlaneState) bool     { return true }

// demoMohrOf is the Mohr diagram of the demo's first n planes (all when
// n < 0) at the figure depth, as cleft plot builds it.
func demoMohrOf(t testing.TB, n int) *Mohr {
	a := demoAssessment(t)
	z := a.FigureDepth()
	s := a.Site
	m := &Mohr{Site: s.Name, Model: s.Summary(), Depth: z, State: s.Model.At(z), Note: "Every plane at this depth by its orientation; planes with their own pore pressure keep its excess over the water model"}
	m.Envelopes = append(m.Envelopes, Envelope{Label: "site strength: " + s.Criterion.String(), Criterion: s.Criterion})
	seen := map[string]bool{s.Criterion.String(): true}
	rv := s.Resolver()
	for i := range a.Planes {
		if n >= 0 && i >= n {
			break
		}
		p := &a.Planes[i]
		var r planes.Result
		c := rv.ResolveAt(p, z, &r)
		m.Points = append(m.Points, MohrPoint{Name: p.Name, Result: r, Depth: p.Depth, Own: &a.Results[i]})
		if k := c.String(); !seen[k] {
			seen[k] = true
			m.Envelopes = append(m.Envelopes, Envelope{Label: p.Name + ": " + k, Criterion: c})
		}
	}
	return m
}

// demoDensityNet is the pole-density net of the demo's readings.
func demoDensityNet(t *testing.T, w, h vg.Length) *DensityNet {
	g := demoAssessment(t).Grouping
	d := &DensityNet{Site: "Quillon Ridge readings", Lines: []string{"Pole density of 133 readings, 3 sets, weighted", "Lower-hemisphere equal-area (Lambert, Schmidt) net; poles to planes"}, Proj: EqualArea, Poles: g.Poles, Weights: g.Weights}
	d.Field, d.Kamb = NewDensityField(EqualArea, g.Poles, g.Weights, FieldSize(w, h))
	for _, k := range g.Analysis.Assign {
		d.InSet = append(d.InSet, k >= 0)
	}
	for k, s := range g.Analysis.Sets {
		d.Sets = append(d.Sets, SetMark{Name: sets.Name(k), Mean: s.Raw.MeanPlane(), Alpha95: s.Raw.Alpha, Count: len(s.Members)})
	}
	return d
}

// demoKinematic is the demo slope's kinematic net, as cleft slope builds it.
func demoKinematic(t testing.TB) *KinematicNet {
	return kinematicOf(demoAssessment(t).Slope(), "demo", "Kinematic screening")
}

// demoTunnel is the demo tunnel's screening.
func demoTunnel(t testing.TB) *tunnel.Screening {
	sc, err := demoAssessment(t).Tunnel()
	if err != nil {
		t.Fatal(err)
	}
	return sc
}

// layoutCases are the figure kinds the layout test draws.
func layoutCases() []layoutCase {
	return []layoutCase{
		{name: "stereonet-slip", build: func(t *testing.T, w, h vg.Length) Figure {
			return demoNet(t, SlipTendency, EqualArea, -1, unstable, w, h)
		}},
		{name: "stereonet-dilation", build: func(t *testing.T, w, h vg.Length) Figure {
			return demoNet(t, DilationTendency, EqualArea, -1, unstable, w, h)
		}},
		{name: "stereonet-fs-all-circles", build: func(t *testing.T, w, h vg.Length) Figure {
			s := demoNet(t, FactorOfSafety, EqualAngle, -1, always, w, h)
			s.Grid = true
			return s
		}},
		{name: "stereonet-few-named", build: func(t *testing.T, w, h vg.Length) Figure {
			s := demoNet(t, PressureToSlip, EqualArea, NameAll-1, always, w, h)
			return withNorthSouth(t, s)
		}},
		{name: "mohr", build: func(t *testing.T, w, h vg.Length) Figure { return demoMohrOf(t, -1) }},
		{name: "mohr-few-named", build: func(t *testing.T, w, h vg.Length) Figure { return demoMohrOf(t, 12) }},
		{name: "density", build: func(t *testing.T, w, h vg.Length) Figure { return demoDensityNet(t, w, h) }},
		{name: "kinematic", build: func(t *testing.T, w, h vg.Length) Figure { return demoKinematic(t) }},
		{name: "kinematic-crowded", build: func(t *testing.T, w, h vg.Length) Figure { return crowdedKinematic(t) }},
		{name: "tunnel-profile", build: func(t *testing.T, w, h vg.Length) Figure { return demoProfile(t) }},
		{name: "tunnel-wall", build: func(t *testing.T, w, h vg.Length) Figure { return demoWall(t) }},
		{name: "tunnel-section", build: func(t *testing.T, w, h vg.Length) Figure { return demoSection(t) }},
		{name: "chance-stereonet", build: func(t *testing.T, w, h vg.Length) Figure { return demoChanceNet(t) }},
		{name: "chance-sensitivity", build: func(t *testing.T, w, h vg.Length) Figure { return demoRankBars(t) }},
	}
}

// withNorthSouth adds to s a critical plane striking north–south, named
// NS-60, with its great circle: the circle ends at N and S on the
// primitive, where its name must still find room.
func withNorthSouth(t *testing.T, s *Stereonet) *Stereonet {
	ns := planes.MustNew(60, 90)
	r := planes.Resolve(s.State, ns, s.Criterion)
	r = planes.Resolve(s.State, ns, &planes.Coulomb{Mu: 0.95 * r.SlipTendency}) // just weak enough to be critical
	if r.State != planes.Critical {
		t.Fatalf("NS-60 is %v, want critical", r.State)
	}
	s.Poles = append(s.Poles, Pole{Name: "NS-60", Orientation: ns, Result: r, Trace: true})
	return s
}
