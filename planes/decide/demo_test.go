package decide_test

import (
	"math"
	"slices"
	"testing"

	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/chance/study"
	"cleft/planes/decide"
	"cleft/planes/site"
	"cleft/planes/site/demo"
	"cleft/planes/tunnel"
)

func demoScreenings(t testing.TB) decide.Screenings {
	t.Helper()
	s, err := site.ParseFS(demo.FS, demo.Site)
	if err != nil {
		t.Fatal(err)
	}
	a, err := assess.New(s)
	if err != nil {
		t.Fatal(err)
	}
	tn, err := a.Tunnel()
	if err != nil {
		t.Fatal(err)
	}
	return decide.Screenings{A: a, Slope: a.Slope(), Tunnel: tn}
}

func TestDemoFindingsAgreeWithTheScreenings(t *testing.T) {
	// Each finding is read back from the screening it came from by
	// another route: the least factor of safety of a slope case over its
	// water cases, the tunnel's Worst, Deeper and far-field states, the
	// readings' states by set.
	in := demoScreenings(t)
	fs := decide.Findings(in)
	a := in.A
	var planesN, sets, readings, slopes, walls, zones int
	for _, f := range fs {
		switch f.Kind {
		case decide.Plane:
			planesN++
		case decide.SetMean:
			sets++
		case decide.Readings:
			readings += f.Of
			n := 0
			for j := range a.Planes[a.NPlanes:] {
				if a.Grouping.Assigned(j) == f.Set && a.Results[a.NPlanes+j].State != planes.Stable {
					n++
				}
			}
			if n != f.Count {
				t.Errorf("readings of %s: %d critical or opening, finding says %d", f.Set, n, f.Count)
			}
		case decide.Planar, decide.Wedge, decide.Toppling:
			slopes++
			c := in.Slope.Cases[f.Case]
			if !c.Feasible || in.Slope.Names(c) != f.Name {
				t.Errorf("%s: case %d is %s, feasible %v", f.Name, f.Case, in.Slope.Names(c), c.Feasible)
			}
			if f.Measure == decide.FactorOfSafety {
				least := slices.Min(c.FS)
				w := slices.Index(c.FS, least)
				if f.Value != least || f.Water != in.Slope.Slope.Water[w] || f.Best != slices.Max(c.FS) {
					t.Errorf("%s: FS %v in %v (best %v); the case has %v", f.Name, f.Value, f.Water, f.Best, c.FS)
				}
				if want := least < in.Slope.Slope.TargetFS; (f.Standing >= decide.Near) != want {
					t.Errorf("%s: FS %v against the target %v stands %v", f.Name, least, in.Slope.Slope.TargetFS, f.Standing)
				}
			}
		case decide.TunnelWall:
			walls++
			if f.Station != in.Tunnel.Worst() || f.Value != in.Tunnel.Stations[f.Station].Ratio {
				t.Errorf("wall at station %d σmax/UCS %v; Worst is %d", f.Station, f.Value, in.Tunnel.Worst())
			}
		case decide.TunnelZone:
			zones++
			k := slices.IndexFunc(in.Tunnel.Targets, func(tg tunnel.Target) bool { return tg.Name == f.Name })
			deeper := in.Tunnel.Deeper(k)
			if !slices.Equal(f.Stretches, deeper) || (len(deeper) > 0) != (f.Standing == decide.Fails) {
				t.Errorf("%s: stretches %v standing %v; Deeper %v", f.Name, f.Stretches, f.Standing, deeper)
			}
			far := false
			for _, st := range in.Tunnel.Stations {
				far = far || st.Rows[k].Far.State != planes.Stable
			}
			if far != f.Reasons.Has(decide.FarField) || far != math.IsInf(f.Use, 1) {
				t.Errorf("%s: far field unstable %v, reasons %v, u %v", f.Name, far, f.Reasons, f.Use)
			}
		}
	}
	pl, we, to := in.Slope.Feasible()
	if planesN != a.NPlanes || sets != len(a.Sets) || readings != len(a.Planes)-a.NPlanes || slopes != pl+we+to || walls != 1 || zones != len(in.Tunnel.Targets) {
		t.Errorf("%d planes, %d set means, %d readings, %d slope cases, %d walls, %d zones", planesN, sets, readings, slopes, walls, zones)
	}
	for i := 1; i < len(fs); i++ {
		if a, b := fs[i-1], fs[i]; a.Standing < b.Standing || a.Standing == b.Standing && a.Use < b.Use {
			t.Fatalf("not ranked at %d: %v u=%v before %v u=%v", i, a.Standing, a.Use, b.Standing, b.Use)
		}
	}
}

func TestDemoProbabilitiesAttach(t *testing.T) {
	// With the demo's cases and Monte Carlo (its own seed), each plane's
	// finding carries its target's P and cases, each planar case the
	// largest P(FS < 1) of its water cases.
	in := demoScreenings(t)
	ts, err := study.Targets(in.A)
	if err != nil {
		t.Fatal(err)
	}
	if in.Runs, err = study.Cases(in.A.Site, ts); err != nil {
		t.Fatal(err)
	}
	if in.Outcome, err = study.Run(in.A, ts, study.Options{Slope: in.Slope, Tunnel: in.Tunnel, Realisations: 500}); err != nil {
		t.Fatal(err)
	}
	for _, f := range decide.Findings(in) {
		switch f.Kind {
		case decide.Plane:
			i := slices.IndexFunc(ts, func(t study.Target) bool { return t.Plane.Name == f.Name })
			if o := in.Outcome.Odds[i]; f.P != o.PUnstable || f.Cases != len(in.Runs) || f.Unstable != study.Critical(in.Runs, i) {
				t.Errorf("%s: P %v cases %d/%d; target %v, %d/%d", f.Name, f.P, f.Unstable, f.Cases, o.PUnstable, study.Critical(in.Runs, i), len(in.Runs))
			}
		case decide.Planar:
			for _, o := range in.Outcome.Slope {
				if o.Case == f.Case {
					if p := slices.Max(o.P); f.P != p || f.PWater != in.Slope.Slope.Water[slices.Index(o.P, p)] {
						t.Errorf("%s: P %v in %v; odds %v", f.Name, f.P, f.PWater, o.P)
					}
				}
			}
		}
	}
}
