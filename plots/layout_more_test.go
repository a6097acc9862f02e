package plots

import (
	"fmt"
	"math"
	"math/rand/v2"
	"sync"
	"testing"

	"cleft/planes"
	"cleft/planes/chance/study"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
	"cleft/plots/words"
)

// The builders below make the demo's tunnel and chance figures as the
// commands do (cmd/cleft/tunnelfig.go and chance.go), for the layout test.

// demoProfile is the demo tunnel's along-alignment chart.
func demoProfile(t testing.TB) *TunnelProfile {
	sc := demoTunnel(t)
	pr := &TunnelProfile{Site: "Quillon Ridge cutting and west portal (fictional demo)", ZoneLimit: sc.Tunnel.Limit(),
		Lines: []string{"Along the alignment: chainage 0 to 1400 m, radius 4.2 m, UCS 45 MPa", demoAssessment(t).Site.Summary()}}
	for _, st := range sc.Stations {
		pr.Chainage, pr.Cover, pr.Ratio = append(pr.Chainage, st.Chainage), append(pr.Cover, st.Cover), append(pr.Ratio, st.Ratio)
	}
	for i, tg := range sc.Targets {
		se := TunnelSeries{Name: tg.Name, ZoneDepth: []float64{}}
		for _, st := range sc.Stations {
			r := st.Rows[i]
			se.FS, se.FarBad = append(se.FS, r.Far.FactorOfSafety), append(se.FarBad, r.Far.State != planes.Stable)
			se.WallSlip = append(se.WallSlip, len(r.Critical) > 0 || len(r.Opening) > 0)
			se.ZoneDepth = append(se.ZoneDepth, r.Zone.Depth)
		}
		pr.Series = append(pr.Series, se)
	}
	return pr
}

// demoWall is the perimeter plot of the demo tunnel's worst station.
func demoWall(t testing.TB) *TunnelWall {
	sc := demoTunnel(t)
	st := sc.Stations[sc.Worst()]
	wall := &TunnelWall{Site: "Quillon Ridge cutting and west portal (fictional demo)", Step: tunnel.PerimeterStep, UCS: sc.Tunnel.UCS, Radius: sc.Tunnel.Radius,
		Lines:    []string{fmt.Sprintf("Wall of the opening at chainage %g m, looking along the drive", st.Chainage)},
		ThetaMax: WallPeak{Stress: st.ThetaMax.Stress, At: st.ThetaMax.Theta}, WallMax: WallPeak{Stress: st.WallMax.Stress, At: st.WallMax.Theta}}
	for _, p := range st.Wall {
		wall.Sigma = append(wall.Sigma, p.Theta)
	}
	for i, tg := range sc.Targets {
		ws := WallSet{Name: tg.Name}
		for _, s := range st.Rows[i].Wall {
			ws.Critical, ws.Opening = append(ws.Critical, s == planes.Critical), append(ws.Opening, s == planes.Opening)
		}
		wall.Sets = append(wall.Sets, ws)
	}
	return wall
}

// demoSection is the cross-section of the demo tunnel at the station of
// its deepest bounded zone.
func demoSection(t testing.TB) *TunnelSection {
	sc := demoTunnel(t)
	i, _, ok := sc.Deepest(-1, true)
	if !ok {
		t.Fatal("the demo tunnel has no bounded zone")
	}
	ts := sc.Stations[i]
	outer := tunnel.DefaultOuter
	if g := sc.Tunnel.ZoneGrid; g.Outer != 0 {
		outer = g.Outer
	}
	f := &TunnelSection{Site: "Quillon Ridge cutting and west portal (fictional demo)", Radius: sc.Tunnel.Radius, Limit: sc.Tunnel.Limit(), Outer: outer * sc.Tunnel.Radius,
		Lines: []string{fmt.Sprintf("Cross-section at chainage %g m, looking along the drive", ts.Chainage)}}
	for k, tg := range sc.Targets {
		r := &ts.Rows[k]
		z := SectionZone{Name: tg.Name, Depth: math.NaN(), Angle: math.NaN(), Note: words.ZoneKey(r)}
		for _, sp := range sc.Outline(i, k) {
			z.Theta, z.Inner, z.Outer = append(z.Theta, sp.Theta), append(z.Inner, sp.Inner), append(z.Outer, sp.Outer)
		}
		if r.Zone.Flags.Has(tunnel.Exists) && !r.Zone.Flags.Has(tunnel.ReachesOuter) {
			z.Depth, z.Angle = r.Zone.Depth, r.Zone.Angle
		}
		z.Trace, _ = tunnel.TraceAngle(tg.Orientation, ts.Up, ts.Right, ts.Along)
		f.Zones = append(f.Zones, z)
	}
	return f
}

var (
	chanceOnce    sync.Once
	chanceTargets []study.Target
	chanceRuns    []study.CaseRun
	chanceOut     *study.Outcome
	chanceErr     error
)

// chanceFieldTestN is the size of the probability field of the tests: small,
// for speed.
const chanceFieldTestN = 61

// demoChance runs the demo's cases and a short Monte Carlo (seeded by the
// site), once.
func demoChance(t testing.TB) ([]study.Target, []study.CaseRun, *study.Outcome) {
	a := demoAssessment(t)
	chanceOnce.Do(func() {
		if chanceTargets, chanceErr = study.Targets(a); chanceErr != nil {
			return
		}
		if chanceRuns, chanceErr = study.Cases(a.Site, chanceTargets); chanceErr != nil {
			return
		}
		chanceOut, chanceErr = study.Run(a, chanceTargets, study.Options{Realisations: 400,
			Field: ChanceNodes(EqualArea, chanceFieldTestN), FieldDepth: a.FigureDepth(), FieldRealisations: 400})
	})
	if chanceErr != nil {
		t.Fatal(chanceErr)
	}
	return chanceTargets, chanceRuns, chanceOut
}

// demoChanceNet is the demo's probability stereonet.
func demoChanceNet(t testing.TB) *ChanceNet {
	a := demoAssessment(t)
	ts, runs, out := demoChance(t)
	z := a.FigureDepth()
	net := &ChanceNet{Site: a.Site.Name, Depth: z, State: a.Site.Model.At(z), Proj: EqualArea, Field: NewProbabilityField(chanceFieldTestN, out.Field),
		Lines: []string{fmt.Sprintf("Share of %d realisations in which a plane of each orientation at %g m is critical or opening", out.FieldN, z), a.Site.Summary(), "Lower-hemisphere equal-area; poles to planes, filled by their own probability at their own depth"}}
	order := words.ChanceOrder(ts, runs, out)
	labelled := map[int]bool{}
	for _, i := range order[:min(6, len(order))] {
		if out.Odds[i].PUnstable > 0 {
			labelled[i] = true
		}
	}
	for i := range a.Planes {
		tg := &ts[i]
		net.Poles = append(net.Poles, ChancePole{Name: tg.Plane.Name, Orientation: tg.Plane.Orientation, State: tg.Base.State, P: out.Odds[i].PUnstable, Label: labelled[i]})
	}
	return net
}

// demoRankBars is the demo's rank-correlation chart.
func demoRankBars(t testing.TB) *RankBars {
	a := demoAssessment(t)
	ts, runs, out := demoChance(t)
	bars := &RankBars{Site: a.Site.Name, MaxInputs: 8,
		Lines: []string{fmt.Sprintf("Rank correlation of each uncertain input with the factor of safety, %d realisations", out.N), "The least stable planes and set means, least stable first"}}
	order := words.ChanceOrder(ts, runs, out)
	for _, i := range order[:min(6, len(order))] {
		d := out.Odds[i]
		bars.Rows = append(bars.Rows, RankRow{Plane: ts[i].Plane.Name, Inputs: out.Inputs, Rho: d.Rho,
			Detail: fmt.Sprintf("P(unstable) %s, FS %s to %s (5 to 95 %%)", words.Proportion(d.PUnstable, d.StdErr), words.Fixed(d.FS[0], 2), words.Fixed(d.FS[2], 2))})
	}
	return bars
}

// kinematicOf is the kinematic net of a slope screening, as cleft slope
// builds it (cmd/cleft/slope.go).
func kinematicOf(sc *slope.Screening, site, line string) *KinematicNet {
	k := &KinematicNet{Site: site, Lines: []string{line}, Proj: EqualArea, Face: sc.Slope.Face, Phi: sc.Slope.FrictionAngle, LateralLimit: sc.Slope.LateralLimit, ToppleLimit: sc.Slope.ToppleLimit}
	topple := map[int]bool{}
	for _, c := range sc.Cases {
		if c.Test == slope.TopplingTest && c.Feasible {
			topple[c.A] = true
		}
	}
	for _, c := range sc.Cases {
		fs := math.NaN()
		for _, v := range c.FS {
			if !math.IsNaN(v) && !(v >= fs) { // the least defined one
				fs = v
			}
		}
		switch {
		case c.Test == slope.PlanarTest:
			k.Items = append(k.Items, KinItem{Name: sc.Names(c), Line: c.Line, Feasible: c.Feasible, Toppling: topple[c.A], Fails: c.Fails, FS: fs})
		case c.Test == slope.WedgeTest && c.HasLine:
			k.Items = append(k.Items, KinItem{Name: sc.Names(c), Line: c.Line, Intersection: true, Feasible: c.Feasible, Fails: c.Fails, FS: fs,
				OnePlane: c.Feasible && (c.Mode == slope.WedgeOnFirst || c.Mode == slope.WedgeOnSecond)})
		}
	}
	return k
}

// crowdedKinematic is the demo slope against 24 seeded random planes
// dipping 45–80° within 70° of the face's dip direction: many feasible
// wedges, more than the net has room to name.
func crowdedKinematic(t testing.TB) *KinematicNet {
	sl := *demoAssessment(t).Site.Slope
	rng := rand.New(rand.NewPCG(15, 2))
	var cands []slope.Candidate
	for i := range 24 {
		dd := math.Mod(sl.Face.DipDirection()+140*(rng.Float64()-0.5)+360, 360)
		cands = append(cands, slope.Candidate{Name: fmt.Sprintf("P%d", i+1), Orientation: planes.MustNew(45+35*rng.Float64(), dd), Phi: sl.FrictionAngle})
	}
	return kinematicOf(slope.Screen(sl, cands), "Crowded cut (test)", "Kinematic screening of 24 planes")
}
