package assess_test

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"
	"cleft/planes/slope"
	"cleft/planes/tunnel"

	"gonum.org/v1/gonum/floats/scalar"
)

// scaled is a far field proportional to depth, with any orientation of the
// principal axes (not only Andersonian ones, so that vertical planes also
// carry dip-slip), and pore pressure gradient·depth.
type scaled struct {
	per100   insitu.Tensor // MPa per 100 m of depth
	gradient float64
	biot     float64
}

func (m scaled) At(z float64) insitu.State {
	k := z / 100
	t := m.per100
	t = insitu.Tensor{NN: k * t.NN, EE: k * t.EE, DD: k * t.DD, NE: k * t.NE, ND: k * t.ND, ED: k * t.ED}
	return insitu.NewState(t, z, m.gradient*z, m.biot)
}

func randomCriterion(rng *rand.Rand) planes.Criterion {
	if rng.IntN(3) == 0 {
		return &planes.BartonBandis{JRC: rng.Float64() * 20, JCS: 20 + rng.Float64()*150, Residual: 20 + rng.Float64()*15}
	}
	return &planes.Coulomb{Mu: 0.3 + rng.Float64()*0.7, Cohesion: rng.Float64() * float64(rng.IntN(2))}
}

func same(x, y float64) bool {
	const tol = 1e-9
	return math.IsNaN(x) && math.IsNaN(y) || scalar.EqualWithinAbsOrRel(x, y, tol, tol)
}

func sameResult(a, b planes.Result) bool {
	const trendTol = 1e-7 // degrees
	trend := math.IsNaN(a.SlipTrend) && math.IsNaN(b.SlipTrend) || math.Abs(math.Remainder(a.SlipTrend-b.SlipTrend, 360)) < trendTol
	return a.State == b.State && a.Sense == b.Sense && a.OpensFirst == b.OpensFirst && trend &&
		same(a.FactorOfSafety, b.FactorOfSafety) && same(a.PressureToSlip, b.PressureToSlip)
}

func TestSamePlaneTypedTwoWaysEverywhere(t *testing.T) {
	// Issue 11: a plane and the same plane typed with the opposite dip
	// direction (dip 90) or with any strike (dip 0) give the same verdicts in
	// every test: the plane table (state, factor of safety, pressure to
	// slip, sense, slip trend), the rock-slope tests beside three other
	// planes (feasible, failed conditions, mode, φ used, factors of safety),
	// and along a tunnel (far-field result, drive class, the state at every
	// wall point and the arcs). A vertical or horizontal plane is one plane
	// however it is typed (common practice). Seeded random far fields,
	// strengths, faces, alignments and planes.
	rng := rand.New(rand.NewPCG(141, 142))
	for i := range 400 {
		c := func() float64 { return 1 + rng.Float64()*3 }
		d := func() float64 { return rng.Float64() - 0.5 }
		m := scaled{per100: insitu.Tensor{NN: c(), EE: c(), DD: c(), NE: d(), ND: d(), ED: d()}, gradient: rng.Float64() * 0.03, biot: 0.6 + rng.Float64()*0.4}
		crit := randomCriterion(rng)
		dd := rng.Float64() * 360
		pair := [2]planes.Orientation{planes.MustNew(90, dd), planes.MustNew(90, geom.Azimuth(dd+180))}
		if i%2 == 1 {
			pair = [2]planes.Orientation{planes.MustNew(0, dd), planes.MustNew(0, rng.Float64()*360)}
		}
		name := pair[0].String() + " / " + pair[1].String()

		depth := 20 + rng.Float64()*300
		a, b := planes.Resolve(m.At(depth), pair[0], crit), planes.Resolve(m.At(depth), pair[1], crit)
		if !sameResult(a, b) {
			t.Fatalf("case %d, %s: plane table\n%+v\n%+v", i, name, a, b)
		}

		sl := slope.Slope{Face: planes.MustNew(40+rng.Float64()*50, rng.Float64()*360), Height: 10 + rng.Float64()*30,
			FrictionAngle: 30, LateralLimit: 20, ToppleLimit: 10 + rng.Float64()*20, UnitWeight: 0.026, Water: []slope.Water{{Kind: slope.WaterHead, Depth: 0}, {Kind: slope.WaterHead, Depth: 3}, {Kind: slope.WaterFull}}}
		sl.Top = planes.MustNew(rng.Float64()*10, sl.Face.DipDirection())
		var others []slope.Candidate
		for k := range 3 {
			others = append(others, slope.Candidate{Name: string(rune('A' + k)), Orientation: planes.MustNew(rng.Float64()*90, rng.Float64()*360),
				Phi: 15 + rng.Float64()*25, Cohesion: rng.Float64() * 0.05})
		}
		phi := 15 + rng.Float64()*25
		screen := func(o planes.Orientation) *slope.Screening {
			return slope.Screen(sl, append([]slope.Candidate{{Name: "P", Orientation: o, Phi: phi}}, others...))
		}
		sa, sb := screen(pair[0]), screen(pair[1])
		for k := range sa.Cases {
			x, y := sa.Cases[k], sb.Cases[k]
			if x.A != 0 && x.B != 0 {
				continue // a case without the plane
			}
			if x.Feasible != y.Feasible || x.Fails != y.Fails || x.Mode != y.Mode || x.Phi != y.Phi ||
				!slices.EqualFunc(x.FS, y.FS, same) || !same(x.CrackDepth, y.CrackDepth) {
				t.Fatalf("case %d, %s: %v %s on face %v\n%+v\n%+v", i, name, x.Test, sa.Names(x), sl.Face, x, y)
			}
		}

		tn := tunnel.Tunnel{Legs: []tunnel.Leg{{From: 0, To: 100, Trend: rng.Float64() * 360, Plunge: rng.Float64()*4 - 2},
			{From: 100, To: 200, Trend: rng.Float64() * 360}}, Cover: [][2]float64{{0, 20}, {200, 20 + rng.Float64()*200}},
			Spacing: 50, Radius: 3, UCS: 60, Poisson: 0.25, Drained: rng.IntN(2) == 0}
		run := func(o planes.Orientation) *tunnel.Screening {
			sc, err := tunnel.Screen(tn, m, []tunnel.Target{{Name: "P", Orientation: o, Criterion: crit, PoreExcess: math.NaN()}})
			if err != nil {
				t.Fatal(err)
			}
			return sc
		}
		ta, tb := run(pair[0]), run(pair[1])
		for s := range ta.Stations {
			x, y := ta.Stations[s].Rows[0], tb.Stations[s].Rows[0]
			dx, dy := x.Drive, y.Drive
			if !sameResult(x.Far, y.Far) || dx.Class != dy.Class || dx.Drive != dy.Drive || dx.Band != dy.Band || !same(dx.StrikeToAxis, dy.StrikeToAxis) ||
				!slices.Equal(x.Wall, y.Wall) || !slices.Equal(x.Critical, y.Critical) || !slices.Equal(x.Opening, y.Opening) {
				t.Fatalf("case %d, %s: tunnel station %g\n%+v\n%+v", i, name, ta.Stations[s].Chainage, x, y)
			}
		}
	}
}
