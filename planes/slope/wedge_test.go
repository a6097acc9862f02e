package slope

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// wedgeSlope is a 30 m cut 65/210 with a flat top, rock of 0.026 MN/m³.
func wedgeSlope() Slope {
	return Slope{Face: planes.MustNew(65, 210), Top: planes.MustNew(0, 210), Height: 30, FrictionAngle: 35,
		LateralLimit: 20, ToppleLimit: 20, UnitWeight: 0.026}
}

// randomWedges returns seeded feasible wedges (both planes 40–80°, dipping
// within 75° of the face's dip direction) of the slope whose weight mode is
// want (NoMode: any).
func randomWedges(t *testing.T, sl Slope, seed uint64, n int, want Mode) [][2]planes.Orientation {
	t.Helper()
	rng := rand.New(rand.NewPCG(seed, seed+1))
	var out [][2]planes.Orientation
	for tries := 0; len(out) < n && tries < 200*n; tries++ {
		a := planes.MustNew(40+40*rng.Float64(), geom.Azimuth(sl.Face.DipDirection()-75+150*rng.Float64()))
		b := planes.MustNew(40+40*rng.Float64(), geom.Azimuth(sl.Face.DipDirection()-75+150*rng.Float64()))
		if _, _, k := WedgeSliding(a, b, sl.Face, 1, 1); k.Fails&(Daylight|Parallel) != 0 {
			continue
		}
		if want != NoMode && WeightMode(a, b, sl.Face) != want {
			continue
		}
		if _, err := NewWedgeBlock(sl, a, b); err != nil {
			continue
		}
		out = append(out, [2]planes.Orientation{a, b})
	}
	if len(out) < n {
		t.Fatalf("only %d random wedges", len(out))
	}
	return out
}

func TestWedgeFrictionOnlyShortForm(t *testing.T) {
	const tol = 1e-6
	sl := wedgeSlope()
	t.Run("random", func(t *testing.T) {
		// Wyllie & Mah (2004), ch. 7: a dry cohesionless wedge of friction
		// φ on both planes has FS = K tan φ / tan ψi, K = sin β / sin(ξ/2),
		// β and ξ measured in the section across the line of intersection.
		for i, p := range randomWedges(t, sl, 7, 300, WedgeBoth) {
			w, _ := NewWedgeBlock(sl, p[0], p[1])
			phi := 20 + float64(i%25)
			r := w.Solve(Strength{PhiA: phi, PhiB: phi}, 0, Load{})
			s, ok := WedgeShortForm(p[0], p[1], sl.Face)
			if !ok || !s.Both || r.Mode != WedgeBoth {
				t.Fatalf("%v %v: short form %+v, mode %v", p[0], p[1], s, r.Mode)
			}
			want := s.K * math.Tan(phi*geom.Rad) / math.Tan(s.PlungeI*geom.Rad)
			if !scalar.EqualWithinAbsOrRel(r.FS, want, tol, tol) {
				t.Errorf("%v %v φ %v: FS %v, K form %v", p[0], p[1], phi, r.FS, want)
			}
			// With different φ the section's resolution holds too.
			if got, want := w.Solve(Strength{PhiA: phi, PhiB: phi + 7}, 0, Load{}).FS, s.FS(phi, phi+7); !scalar.EqualWithinAbsOrRel(got, want, tol, tol) {
				t.Errorf("%v %v: FS %v, short form %v", p[0], p[1], got, want)
			}
		}
	})
	t.Run("symmetric", func(t *testing.T) {
		// Planes 50/150 and 50/270, symmetric about the face's 210: the line
		// trends 210 and plunges atan(tan 50° cos 60°) = 30.79° (derived,
		// apparent dip); the section across a line in a vertical plane of
		// symmetry has a vertical bisector, β = 90°, and each trace makes
		// the angle ξ/2 with it, where the planes' upward normals make
		// 180° − ξ: cos(180° − ξ) = n̂A·n̂B = cos²50° + sin²50° cos 120°
		// (derived), so K = 1/sin(ξ/2).
		a, b := planes.MustNew(50, 150), planes.MustNew(50, 270)
		c := math.Pow(math.Cos(50*geom.Rad), 2) + math.Pow(math.Sin(50*geom.Rad), 2)*math.Cos(120*geom.Rad)
		xi := math.Pi - math.Acos(c)
		psi := math.Atan(math.Tan(50*geom.Rad)*math.Cos(60*geom.Rad)) * geom.Deg
		s, _ := WedgeShortForm(a, b, sl.Face)
		if !scalar.EqualWithinAbs(s.Beta, 90, tol) || !scalar.EqualWithinAbs(s.Xi, xi*geom.Deg, tol) || !scalar.EqualWithinAbs(s.K, 1/math.Sin(xi/2), tol) {
			t.Errorf("short form %+v, want ξ %v K %v", s, xi*geom.Deg, 1/math.Sin(xi/2))
		}
		w, err := NewWedgeBlock(sl, a, b)
		if err != nil {
			t.Fatal(err)
		}
		r := w.Solve(Strength{PhiA: 30, PhiB: 30}, 0, Load{})
		if want := math.Tan(30*geom.Rad) / math.Sin(xi/2) / math.Tan(psi*geom.Rad); !scalar.EqualWithinAbs(r.FS, want, tol) || !scalar.EqualWithinAbsOrRel(r.NA, r.NB, tol, tol) {
			t.Errorf("FS %v (NA %v NB %v), want %v with equal reactions", r.FS, r.NA, r.NB, want)
		}
	})
	t.Run("one plane twice", func(t *testing.T) {
		// Two planes 40/210 ± 0.001° are one plane: ξ → 180°, K → 1, and the
		// wedge is a planar block, FS = tan φ / tan ψp (Hoek & Bray 1981,
		// lecture notes, read), with the two reactions adding up to W cos ψp.
		a, b := planes.MustNew(40, 209.999), planes.MustNew(40, 210.001)
		w, err := NewWedgeBlock(sl, a, b)
		if err != nil {
			t.Fatal(err)
		}
		r := w.Solve(Strength{PhiA: 35, PhiB: 35}, 0, Load{})
		if want := math.Tan(35*geom.Rad) / math.Tan(40*geom.Rad); !scalar.EqualWithinAbs(r.FS, want, tol) {
			t.Errorf("FS %v, want %v", r.FS, want)
		}
		if want := w.Weight * math.Cos(40*geom.Rad); !scalar.EqualWithinAbsOrRel(r.NA+r.NB, want, tol, tol) {
			t.Errorf("NA + NB = %v, want W cos ψp = %v", r.NA+r.NB, want)
		}
	})
}

func TestWedgeModeFromMechanics(t *testing.T) {
	// The mode of a rigid block on two planes under its weight (Goodman &
	// Shi 1985, the order of block-theory modes; memory): it falls when
	// falling straight down pushes into neither plane (both overhang it);
	// it slides on A alone when A is under it (inward normal up) and moving
	// down A's dip takes it away from B (d̂A·n̂B ≥ 0, n̂B into the block);
	// likewise on B; else it rides on both along the line. Seeded random
	// wedges; the plan-view rule is counted beside it.
	sl := wedgeSlope()
	disagree := 0
	for _, p := range randomWedges(t, sl, 11, 400, NoMode) {
		a, b := p[0], p[1]
		na, nb, _, _, _ := sides(a, b, sl.Face)
		onA := na.Z < 0 && r3.Dot(a.DownDip(), nb) >= 0
		onB := nb.Z < 0 && r3.Dot(b.DownDip(), na) >= 0
		want := WedgeBoth
		switch {
		case na.Z >= 0 && nb.Z >= 0:
			want = LiftOff
		case onA:
			want = WedgeOnFirst
		case onB:
			want = WedgeOnSecond
		}
		if got := WeightMode(a, b, sl.Face); got != want {
			t.Errorf("%v %v: mode %v, want %v", a, b, got, want)
		}
		if _, _, k := WedgeSliding(a, b, sl.Face, 1, 1); k.PlanView != want {
			disagree++
		}
	}
	if disagree == 0 {
		t.Error("the plan-view rule never disagreed with the mechanics")
	}
	t.Logf("plan-view rule disagrees with the mechanics on %d of 400 wedges", disagree)
}

func TestWedgeGeometry(t *testing.T) {
	const (
		tol     = 1e-9
		onPlane = 1e-6 // m: a corner this close to a plane lies on it
		cutTol  = 1e-7 // m, m², m³: areas and volumes by a second route
	)
	sl := wedgeSlope()
	sl.Top = planes.MustNew(8, 200)
	for _, p := range randomWedges(t, sl, 13, 100, NoMode) {
		w, _ := NewWedgeBlock(sl, p[0], p[1])
		// Four corners: each lies on its three planes (derived).
		var pts []r3.Vec
		for _, f := range w.faces {
			pts = append(pts, f.pts...)
		}
		pts = dedupe(pts)
		if len(pts) != 4 {
			t.Fatalf("%v %v: %d corners", p[0], p[1], len(pts))
		}
		// The volume of a tetrahedron with a corner at O: |a·(b × c)|/6.
		var o, pa, pb, pc r3.Vec
		for _, q := range pts {
			switch {
			case r3.Norm(q) < tol:
				o = q
			case math.Abs(r3.Dot(q, w.NormalB)) > onPlane:
				pa = q
			case math.Abs(r3.Dot(q, w.NormalA)) > onPlane:
				pb = q
			default:
				pc = q
			}
		}
		_ = o
		if v := math.Abs(r3.Dot(pa, r3.Cross(pb, pc))) / 6; !scalar.EqualWithinAbsOrRel(w.Volume, v, tol, tol) {
			t.Errorf("volume %v, tetrahedron %v", w.Volume, v)
		}
		// a and b lie on the face and the top; the top passes through the
		// point of the face H above O, straight up its dip.
		nF, nT := sl.Face.Normal(), sl.Top.Normal()
		crest := r3.Scale(sl.Height/math.Sin(sl.Face.Dip()*geom.Rad), sl.Face.UpDip())
		for _, q := range []r3.Vec{pa, pb} {
			if math.Abs(r3.Dot(nF, q)) > tol || math.Abs(r3.Dot(nT, r3.Sub(q, crest))) > tol {
				t.Errorf("crest corner %v off the face or the top", q)
			}
		}
		if !scalar.EqualWithinAbs(w.TraceA, r3.Norm(pa), tol) || !scalar.EqualWithinAbs(w.AreaA, r3.Norm(r3.Cross(pa, pc))/2, cutTol) {
			t.Errorf("trace %v area %v", w.TraceA, w.AreaA)
		}
		// A crack 2 m behind the crest cuts off the tetrahedron beyond it:
		// its corners are where the crack meets the three edges through c.
		cr := sl
		cr.CrackGiven, cr.Crack = true, 2
		wc, err := NewWedgeBlock(cr, p[0], p[1])
		if err != nil {
			t.Fatal(err)
		}
		if !wc.HasCrack() {
			continue
		}
		k := wc.crackOut
		d := r3.Dot(k, pa) + 2        // pa on the crest
		at := func(q r3.Vec) r3.Vec { // on the edge from q to pc
			s := (d - r3.Dot(k, q)) / r3.Dot(k, r3.Sub(pc, q))
			return r3.Add(q, r3.Scale(s, r3.Sub(pc, q)))
		}
		ka, kb, ko := at(pa), at(pb), at(o)
		cut := math.Abs(r3.Dot(r3.Sub(ka, pc), r3.Cross(r3.Sub(kb, pc), r3.Sub(ko, pc)))) / 6
		if !scalar.EqualWithinAbsOrRel(wc.Volume, w.Volume-cut, cutTol, cutTol) {
			t.Errorf("cracked volume %v, want %v − %v", wc.Volume, w.Volume, cut)
		}
		if !scalar.EqualWithinAbsOrRel(wc.CrackArea, r3.Norm(r3.Cross(r3.Sub(ka, ko), r3.Sub(kb, ko)))/2, cutTol, cutTol) {
			t.Errorf("crack area %v", wc.CrackArea)
		}
		// The crack's depth at the line: from its foot ko straight up to the
		// top, nT·(crest − ko)/(−nT.z) with nT the top's upward normal.
		up := r3.Scale(-1, nT)
		if want := r3.Dot(up, r3.Sub(crest, ko)) / -up.Z; !scalar.EqualWithinAbsOrRel(wc.CrackDepth, want, cutTol, cutTol) {
			t.Errorf("crack depth %v, want %v", wc.CrackDepth, want)
		}
	}
}
