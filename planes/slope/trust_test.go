package slope

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

// phiOf is the friction angle of a friction coefficient, degrees.
func phiOf(mu float64) float64 { return math.Atan(mu) * geom.Deg }

func TestOwnFrictionInTheKinematicTests(t *testing.T) {
	const (
		tol     = 1e-9
		readTol = 1e-4 // degrees: φ = atan 0.45 given to four decimals
	)
	// A clay-gouge plane 30/180 of μ 0.45 (φ 24.2°) under a 60/180 face,
	// the slope's φ 35°: Hoek & Bray's (1981) planar condition ψp > φ holds
	// with the plane's own φ, and the dry cohesionless factor of safety is
	// tan φ / tan ψp = 0.45 / tan 30° = 0.779 (lecture notes, read).
	sl := Slope{Face: planes.MustNew(60, 180), Top: planes.MustNew(0, 180), Height: 20, FrictionAngle: 35,
		LateralLimit: 20, ToppleLimit: 20, UnitWeight: 0.026, Water: []Water{{}}}
	gouge := Candidate{Name: "gouge", Orientation: planes.MustNew(30, 180), Phi: phiOf(0.45)}
	sc := Screen(sl, []Candidate{gouge})
	c := sc.Cases[0]
	if !c.Feasible || !scalar.EqualWithinAbs(c.Phi, 24.2277, readTol) || c.FS == nil || !scalar.EqualWithinAbs(c.FS[0], 0.45/math.Tan(30*geom.Rad), tol) {
		t.Errorf("gouge plane: %+v", c)
	}
	// A wedge 45/130 + 45/230 of μ 0.45 on the same face: its line 180/32.7
	// (derived: the symmetric pair's line plunges atan(tan 45° cos 50°))
	// plunges more than 24.2°, so it can slide; with the slope's 35° it
	// could not.
	a := Candidate{Name: "A", Orientation: planes.MustNew(45, 130), Phi: phiOf(0.45)}
	b := Candidate{Name: "B", Orientation: planes.MustNew(45, 230), Phi: phiOf(0.45)}
	l, _, k := WedgeSliding(a.Orientation, b.Orientation, sl.Face, a.Phi, b.Phi)
	if !k.Feasible || !scalar.EqualWithinAbs(l.Plunge, math.Atan(math.Cos(50*geom.Rad))*geom.Deg, tol) || !scalar.EqualWithinAbs(l.Trend, 180, tol) {
		t.Errorf("wedge of μ 0.45: line %v, %+v", l, k)
	}
	if _, _, k := WedgeSliding(a.Orientation, b.Orientation, sl.Face, 35, 35); k.Feasible {
		t.Errorf("the same wedge with φ 35° passed: %+v", k)
	}
	// Sliding on both planes tests the smaller friction angle.
	if _, _, k := WedgeSliding(a.Orientation, b.Orientation, sl.Face, 40, phiOf(0.45)); k.Mode != WedgeBoth || !scalar.EqualWithinAbs(k.Phi, phiOf(0.45), tol) {
		t.Errorf("both planes, φ 40° and 24.2°: %+v", k)
	}
	// Flexural toppling of layers 50/000 of μ 0.3 (φ 16.7°) on a 70/180
	// face (Goodman & Bray 1976): (90 − 50) + 16.7 = 56.7 ≤ 70 passes; with
	// φ 35° it is 75 > 70.
	if k := FlexuralToppling(planes.MustNew(50, 0), planes.MustNew(70, 180), phiOf(0.3), 20); !k.Feasible {
		t.Errorf("layers of μ 0.3: %+v", k)
	}
}

func TestVerticalJointToppling(t *testing.T) {
	// A vertical joint has no dip direction: 90/030 and 90/210 are the same
	// plane, and so is 89.5/210 within the tolerance (Goodman & Bray 1976
	// condition, (90 − 90) + 30 ≤ 65).
	f := planes.MustNew(65, 210)
	for _, o := range []planes.Orientation{planes.MustNew(90, 30), planes.MustNew(90, 210), planes.MustNew(89.5, 210), planes.MustNew(89.5, 30)} {
		if k := FlexuralToppling(o, f, 30, 20); !k.Feasible {
			t.Errorf("%v: %+v", o, k)
		}
	}
}

func TestDescendingTop(t *testing.T) {
	const tol = 5e-4
	// Top 10/000 behind a 60/180 face (it descends into the slope), H 20 m,
	// plane 40/180, crack 5 m behind the crest, c 0.02 MPa, φ 35°, γ 0.026
	// MN/m³: the block polygon with the true top gives a crack 5.23 m deep
	// and FS 1.097, 0.955, 0.776 with the crack empty, half and full (the
	// hand calculation of the issue, checked by a separate polygon sum).
	// Flattening the top gave 6.12 m and 1.091/0.925/0.713.
	sl := Slope{Face: planes.MustNew(60, 180), Top: planes.MustNew(10, 0), Height: 20, FrictionAngle: 35,
		LateralLimit: 20, ToppleLimit: 20, UnitWeight: 0.026, Water: []Water{{}, {Depth: 5.2338 / 2}, {Kind: WaterFull}}, Crack: 5, CrackGiven: true}
	sc := Screen(sl, []Candidate{{Name: "P", Orientation: planes.MustNew(40, 180), Phi: 35, Cohesion: 0.02}})
	c := sc.Cases[0]
	if c.FS == nil || !scalar.EqualWithinAbs(c.CrackDepth, 5.2338, tol) {
		t.Fatalf("case %+v", c)
	}
	for i, want := range []float64{1.0972, 0.9550, 0.7757} {
		if !scalar.EqualWithinAbs(c.FS[i], want, tol) {
			t.Errorf("water %v: FS %v, want %v", sl.Water[i], c.FS[i], want)
		}
	}
}

func TestSamePlaneTypedTwoWays(t *testing.T) {
	// A vertical plane by either dip direction, and a horizontal plane by any
	// strike, is one plane: every test gives it one verdict (seeded random
	// faces, planes and friction angles; common practice).
	rng := rand.New(rand.NewPCG(31, 32))
	for range 2000 {
		f := planes.MustNew(40+rng.Float64()*50, rng.Float64()*360)
		phi := 15 + rng.Float64()*30
		other := planes.MustNew(20+rng.Float64()*70, rng.Float64()*360)
		dd := rng.Float64() * 360
		pairs := [][2]planes.Orientation{
			{planes.MustNew(90, dd), planes.MustNew(90, geom.Azimuth(dd+180))},
			{planes.MustNew(0, dd), planes.MustNew(0, rng.Float64()*360)},
		}
		for _, p := range pairs {
			if a, b := PlanarSliding(p[0], f, phi, 20), PlanarSliding(p[1], f, phi, 20); a.Feasible != b.Feasible {
				t.Fatalf("planar %v / %v on %v: %v / %v", p[0], p[1], f, a.Feasible, b.Feasible)
			}
			if a, b := FlexuralToppling(p[0], f, phi, 20), FlexuralToppling(p[1], f, phi, 20); a.Feasible != b.Feasible {
				t.Fatalf("toppling %v / %v on %v: %v / %v", p[0], p[1], f, a.Feasible, b.Feasible)
			}
			_, _, a := WedgeSliding(p[0], other, f, phi, phi)
			_, _, b := WedgeSliding(p[1], other, f, phi, phi)
			if a.Feasible != b.Feasible {
				t.Fatalf("wedge %v / %v with %v on %v: %+v / %+v", p[0], p[1], other, f, a, b)
			}
		}
	}
}
