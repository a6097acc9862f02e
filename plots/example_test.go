package plots_test

import (
	"log"
	"math"
	"os"
	"path/filepath"

	"cleft/insitu"
	"cleft/planes"
	"cleft/planes/slope"
	"cleft/plots"

	"gonum.org/v1/plot/vg"
)

// writeSVG writes f as an SVG of w × h into testdata/name.
func writeSVG(f plots.Figure, w, h vg.Length, name string) {
	out, err := os.Create(filepath.Join("testdata", name))
	if err != nil {
		log.Fatal(err)
	}
	if err := plots.Write(f, w, h, "svg", out); err != nil {
		log.Fatal(err)
	}
	if err := out.Close(); err != nil {
		log.Fatal(err)
	}
}

// exampleState is the far field of the examples at 400 m: a reverse-faulting
// field with SHmax 26 MPa along 050°, Shmin 12 MPa, Sv 10.6 MPa, and a
// hydrostatic pore pressure of 3.9 MPa.
func exampleState() insitu.State {
	return insitu.NewState(insitu.Andersonian(26, 12, 10.6, 50), 400, 3.9, 1)
}

// examplePlanes are four mapped planes of the examples.
var examplePlanes = []struct {
	name     string
	dip, dir float64
}{
	{"F1", 80, 105}, {"F2", 70, 175}, {"J1", 35, 230}, {"J2", 85, 15},
}

// The tendency stereonet of slip tendency at 400 m, with four planes
// resolved in the same far field, a great circle through each, and the
// field computed by the caller at the size the figure needs.
func ExampleStereonet() {
	c := &planes.Coulomb{Mu: 0.6}
	s := &plots.Stereonet{
		Site:      "Example site",
		Model:     "SHmax 26 MPa along 050°, Shmin 12 MPa, Sv 10.6 MPa at 400 m; μ = 0.6",
		Depth:     400,
		State:     exampleState(),
		Criterion: c,
		Measure:   plots.SlipTendency,
		Proj:      plots.EqualArea,
	}
	w, h := 16*vg.Centimeter, 12*vg.Centimeter
	s.Field = plots.NewField(s.State, c, s.Measure, s.Proj, plots.FieldSize(w, h))
	for _, p := range examplePlanes {
		o := planes.MustNew(p.dip, p.dir)
		s.Poles = append(s.Poles, plots.Pole{Name: p.name, Orientation: o, Result: planes.Resolve(s.State, o, c), Trace: true})
	}
	writeSVG(s, w, h, "stereonet.svg")
}

// The Mohr diagram of effective stress at 400 m, with the same four planes
// and the envelope of their strength.
func ExampleMohr() {
	c := &planes.Coulomb{Mu: 0.6}
	m := &plots.Mohr{
		Site:      "Example site",
		Model:     "SHmax 26 MPa along 050°, Shmin 12 MPa, Sv 10.6 MPa at 400 m",
		Depth:     400,
		State:     exampleState(),
		Envelopes: []plots.Envelope{{Label: "μ = 0.6", Criterion: c}},
	}
	for _, p := range examplePlanes {
		m.Points = append(m.Points, plots.MohrPoint{Name: p.name, Result: planes.Resolve(m.State, planes.MustNew(p.dip, p.dir), c)})
	}
	writeSVG(m, 16*vg.Centimeter, 11*vg.Centimeter, "mohr.svg")
}

// The kinematic net of a 20 m cut face dipping 60° towards 180°, from the
// slope screening of three planes: the dip vectors of the planes and the
// lines of intersection of their pairs, with the verdict of each test.
func ExampleKinematicNet() {
	sl := slope.Slope{
		Face: planes.MustNew(60, 180), Top: planes.MustNew(0, 180), Height: 20,
		FrictionAngle: 30, LateralLimit: 20, ToppleLimit: 20, UnitWeight: 0.026,
		Water: []slope.Water{{}},
	}
	sc := slope.Screen(sl, []slope.Candidate{
		{Name: "bedding", Orientation: planes.MustNew(35, 175), Phi: 30},
		{Name: "J1", Orientation: planes.MustNew(80, 0), Phi: 30},
		{Name: "J2", Orientation: planes.MustNew(55, 230), Phi: 30},
	})
	k := &plots.KinematicNet{
		Site:  "Example cut",
		Lines: []string{"A 20 m face 60/180, φ = 30°"},
		Proj:  plots.EqualArea, Face: sl.Face, Phi: sl.FrictionAngle,
		LateralLimit: sl.LateralLimit, ToppleLimit: sl.ToppleLimit,
	}
	topple := map[int]bool{}
	for _, c := range sc.Cases {
		if c.Test == slope.TopplingTest && c.Feasible {
			topple[c.A] = true
		}
	}
	least := func(fs []float64) float64 { // the least of the defined ones, or NaN
		v := math.NaN()
		for _, f := range fs {
			if !math.IsNaN(f) && !(f >= v) {
				v = f
			}
		}
		return v
	}
	for _, c := range sc.Cases {
		switch {
		case c.Test == slope.PlanarTest:
			k.Items = append(k.Items, plots.KinItem{Name: sc.Names(c), Line: c.Line, Feasible: c.Feasible, Toppling: topple[c.A], Fails: c.Fails, FS: least(c.FS)})
		case c.Test == slope.WedgeTest && c.HasLine:
			k.Items = append(k.Items, plots.KinItem{Name: sc.Names(c), Line: c.Line, Intersection: true, Feasible: c.Feasible, Fails: c.Fails, FS: least(c.FS),
				OnePlane: c.Feasible && (c.Mode == slope.WedgeOnFirst || c.Mode == slope.WedgeOnSecond)})
		}
	}
	writeSVG(k, 16*vg.Centimeter, 12*vg.Centimeter, "kinematic.svg")
}

// The along-alignment chart of a 500 m drive at stations 100 m apart: the
// cover, σmax/UCS, and two planes' far-field factors of safety, slip-zone
// depths and lanes, given as plain numbers.
func ExampleTunnelProfile() {
	nan := math.NaN()
	t := &plots.TunnelProfile{
		Site:      "Example drive",
		Lines:     []string{"Along the alignment: chainage 0 to 500 m, radius 3 m, UCS 60 MPa"},
		Chainage:  []float64{0, 100, 200, 300, 400, 500},
		Cover:     []float64{60, 90, 140, 200, 170, 120},
		Ratio:     []float64{0.08, 0.13, 0.21, 0.31, 0.26, 0.18},
		ZoneLimit: 0.5,
		Series: []plots.TunnelSeries{
			{Name: "F1", FS: []float64{2.4, 1.9, 1.4, 0.9, 1.1, 1.6},
				FarBad:    []bool{false, false, false, true, false, false},
				WallSlip:  []bool{false, true, true, true, true, false},
				ZoneDepth: []float64{nan, 0.12, 0.31, 0.64, 0.48, 0.20}},
			{Name: "J1", FS: []float64{3.1, 2.8, 2.2, 1.7, 1.9, 2.5},
				FarBad:    []bool{false, false, false, false, false, false},
				WallSlip:  []bool{false, false, false, true, false, false},
				ZoneDepth: []float64{nan, nan, 0.05, 0.18, 0.11, nan}},
		},
	}
	writeSVG(t, 19*vg.Centimeter, 24*vg.Centimeter, "tunnel-profile.svg")
}
