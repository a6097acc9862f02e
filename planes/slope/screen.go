package slope

import (
	"math"

	"cleft/insitu/geom"
)

// Test is one of the kinematic tests.
type Test int

const (
	PlanarTest Test = iota
	WedgeTest
	TopplingTest
)

// String returns the test's name in the tables: planar, wedge or
// flexural-toppling.
func (t Test) String() string {
	switch t {
	case PlanarTest:
		return "planar"
	case WedgeTest:
		return "wedge"
	}
	return "flexural-toppling"
}

// Case is one test of one candidate (or, for a wedge, of a pair).
type Case struct {
	Test Test
	A, B int // indexes into the candidates; B is −1 but for wedges
	Kinematic
	Line    geom.Line // wedge: the line of intersection; others: the dip vector
	HasLine bool      // false for a wedge of parallel planes

	// Feasible planar and wedge cases: the factor of safety per water case
	// (Slope.Water) with Slope.Load, and the head of water (m) of each case;
	// wedges: the mode under each case's forces. BoltToTarget is the
	// smallest bolt force in the direction of Slope.Load that brings the
	// least safe case to Slope.TargetFS (MN/m planar, MN wedge; 0 when it is
	// there already, NaN when no force in that direction does). BlockErr
	// says why a feasible case has no factor of safety (its block is outside
	// the limit-equilibrium model); then FS is nil.
	FS           []float64
	Heads        []float64
	Modes        []Mode
	BoltToTarget float64
	BlockErr     error

	// Planar: the crack depth (m), and the water depth in the crack at which
	// FS falls to 1 (m; NaN when a full crack leaves it above 1; 0 when it
	// is at or below 1 dry).
	CrackDepth  float64
	WaterToFail float64

	// Wedges with a block: its geometry, and the friction-only short form
	// (Wyllie & Mah 2004) as a cross-check (ShortOK false without one).
	Wedge   *WedgeBlock
	Short   ShortForm
	ShortOK bool
}

// Screening is every test of a slope: planar sliding of each candidate, then
// wedge sliding of each pair, then flexural toppling of each candidate.
type Screening struct {
	Slope      Slope
	Candidates []Candidate
	Cases      []Case
}

// Screen runs every test on every candidate and pair of candidates. Each
// test uses the friction angle of the plane(s) it concerns (Candidate.Phi;
// see WedgeSliding for wedges); Kinematic.Phi says which. Every feasible
// planar case and wedge gets its block and its factor of safety for each
// water case with the slope's load (Slope.Water, Slope.Load), and the bolt
// force for Slope.TargetFS.
func Screen(sl Slope, cands []Candidate) *Screening {
	sc := &Screening{Slope: sl, Candidates: cands}
	for i, c := range cands {
		k := PlanarSliding(c.Orientation, sl.Face, c.Phi, sl.LateralLimit)
		r := Case{Test: PlanarTest, A: i, B: -1, Kinematic: k, Line: c.Orientation.DipLine(), HasLine: true, CrackDepth: math.NaN(), WaterToFail: math.NaN(), BoltToTarget: math.NaN()}
		if k.Feasible {
			r.planarFS(sl, c)
		}
		sc.Cases = append(sc.Cases, r)
	}
	for i, a := range cands {
		for j := i + 1; j < len(cands); j++ {
			l, ok, k := WedgeSliding(a.Orientation, cands[j].Orientation, sl.Face, a.Phi, cands[j].Phi)
			r := Case{Test: WedgeTest, A: i, B: j, Kinematic: k, Line: l, HasLine: ok, CrackDepth: math.NaN(), WaterToFail: math.NaN(), BoltToTarget: math.NaN()}
			if k.Feasible {
				r.wedgeFS(sl, a, cands[j])
			}
			sc.Cases = append(sc.Cases, r)
		}
	}
	for i, c := range cands {
		k := FlexuralToppling(c.Orientation, sl.Face, c.Phi, sl.ToppleLimit)
		sc.Cases = append(sc.Cases, Case{Test: TopplingTest, A: i, B: -1, Kinematic: k, Line: c.Orientation.DipLine(), HasLine: true, CrackDepth: math.NaN(), WaterToFail: math.NaN(), BoltToTarget: math.NaN()})
	}
	return sc
}

// planarFS works out the tension-crack block of a feasible planar case and
// its factor of safety for each water case.
func (r *Case) planarFS(sl Slope, c Candidate) {
	dd := c.Orientation.DipDirection()
	psiF := ApparentDip(sl.Face, dd)
	crack, byDepth := sl.Crack, sl.CrackByDepth
	if !sl.CrackGiven {
		crack, byDepth = CriticalCrackDepth(sl.Height, psiF, c.Orientation.Dip()), true
	}
	b, err := NewPlanarBlock(sl.Height, psiF, ApparentDip(sl.Top, dd), c.Orientation.Dip(), crack, byDepth, sl.UnitWeight)
	if err != nil {
		r.BlockErr = err
		return
	}
	r.CrackDepth = b.CrackDepth
	ld := sl.Load.InSection(c.Orientation.Dip(), dd)
	worst, wi := math.Inf(1), 0
	for i, w := range sl.Water {
		h := w.Head(b.FootElevation(), sl.Height, b.CrackDepth)
		fs := b.FSWith(c.Cohesion, c.Phi, h, ld)
		r.Heads, r.FS = append(r.Heads, h), append(r.FS, fs)
		if fs < worst {
			worst, wi = fs, i
		}
	}
	r.WaterToFail = b.WaterDepthToFailWith(c.Cohesion, c.Phi, ld)
	r.BoltToTarget, _ = b.BoltFor(c.Cohesion, c.Phi, r.Heads[wi], ld, sl.TargetFS)
}

// wedgeFS works out the block of a feasible wedge and its factor of safety
// for each water case.
func (r *Case) wedgeFS(sl Slope, a, b Candidate) {
	if s, ok := WedgeShortForm(a.Orientation, b.Orientation, sl.Face); ok {
		r.Short, r.ShortOK = s, true
	}
	w, err := NewWedgeBlock(sl, a.Orientation, b.Orientation)
	if err != nil {
		r.BlockErr = err
		return
	}
	r.Wedge = &w
	st := Strength{PhiA: a.Phi, PhiB: b.Phi, CA: a.Cohesion, CB: b.Cohesion}
	ld := sl.Load
	ld.Bolt = sl.WedgeBolt
	worst, wi := math.Inf(1), 0
	for i, wc := range sl.Water {
		h := wc.Head(w.PeakElevation(), w.CrestElevation(), w.Saturated)
		res := w.Solve(st, h, ld)
		r.Heads, r.FS, r.Modes = append(r.Heads, h), append(r.FS, res.FS), append(r.Modes, res.Mode)
		if res.FS < worst {
			worst, wi = res.FS, i
		}
	}
	r.BoltToTarget, _ = w.BoltFor(st, r.Heads[wi], ld, sl.TargetFS)
}

// Feasible returns the number of feasible cases of each test.
func (sc *Screening) Feasible() (planar, wedge, toppling int) {
	for _, c := range sc.Cases {
		if !c.Feasible {
			continue
		}
		switch c.Test {
		case PlanarTest:
			planar++
		case WedgeTest:
			wedge++
		default:
			toppling++
		}
	}
	return planar, wedge, toppling
}

// Names returns the name of a case's plane, or of its two planes joined by
// "+".
func (sc *Screening) Names(c Case) string {
	if c.B < 0 {
		return sc.Candidates[c.A].Name
	}
	return sc.Candidates[c.A].Name + "+" + sc.Candidates[c.B].Name
}
