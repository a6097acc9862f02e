package tunnel

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// randomField returns a compressive NED far field with normal components in
// [10, 40] MPa and shears up to ±8 MPa.
func randomField(rng *rand.Rand) insitu.Tensor {
	return insitu.Tensor{NN: 10 + rng.Float64()*30, EE: 10 + rng.Float64()*30, DD: 10 + rng.Float64()*30,
		NE: rng.Float64()*16 - 8, ND: rng.Float64()*16 - 8, ED: rng.Float64()*16 - 8}
}

func randomPlane(rng *rand.Rand) planes.Orientation {
	return planes.MustNew(rng.Float64()*90, rng.Float64()*360)
}

func randomDrive(rng *rand.Rand) geom.Line {
	return geom.Line{Trend: rng.Float64() * 360, Plunge: rng.Float64()*20 - 10}
}

// nested reports whether the zone of spans b lies inside that of a, to tol
// (m), ray by ray.
func nested(a, b []Span, tol float64) bool {
	for k := range a {
		if math.IsNaN(b[k].Inner) {
			continue
		}
		if math.IsNaN(a[k].Inner) || b[k].Inner < a[k].Inner-tol || b[k].Outer > a[k].Outer+tol {
			return false
		}
	}
	return true
}

const (
	tolNest  = 1e-6 // m: boundaries bisected to 1e-9·a, a ≤ 6 m
	tolArea  = 1e-6 // m²
	tolDepth = 5e-3 // m: the angular refinement finds the peak next to the deepest ray, which may differ between two nested zones by O(a·Δθ²)
)

func TestZoneShrinksWithFriction(t *testing.T) {
	// Property: at every point FS = τs(σn')/τ rises with μ at fixed stress, so
	// the critical set for a larger μ lies inside that for a smaller one
	// (the opening part, σn' ≤ 0, does not depend on μ).
	rng := rand.New(rand.NewPCG(91, 92))
	const cases = 12
	shrank := 0
	for range cases {
		ned, drive, o := randomField(rng), randomDrive(rng), randomPlane(rng)
		a := 2 + rng.Float64()*4
		st := station(t, ned, drive, a, 0.2+rng.Float64()*0.2, 0, 1, Constant(rng.Float64()*3))
		g := Grid{Rays: 90}
		prev := make([]Span, g.Rays)
		cur := make([]Span, g.Rays)
		mu := 0.2 + rng.Float64()*0.2
		z0 := Find(&st, &o, coulomb(t, mu, 0), g, prev)
		for range 3 {
			mu += 0.05 + rng.Float64()*0.2
			z := Find(&st, &o, coulomb(t, mu, 0), g, cur)
			if !nested(prev, cur, tolNest) || z.Area > z0.Area+tolArea || z.Depth > z0.Depth+tolDepth {
				t.Fatalf("%v %v %v μ %v: area %v → %v, depth %v → %v", ned, drive, o, mu, z0.Area, z.Area, z0.Depth, z.Depth)
			}
			if z.Area < z0.Area-tolArea {
				shrank++
			}
			z0, prev, cur = z, cur, prev
		}
	}
	if shrank < cases {
		t.Errorf("only %d of %d steps shrank the zone: the cases are too easy", shrank, 3*cases)
	}
}

func TestZoneShrinksWithSupport(t *testing.T) {
	// Property, derived: in an isotropic far field p the Kirsch and Lamé
	// terms give σ = p·I + k(eθeθᵀ − eᵣeᵣᵀ) with k = (p − pᵢ)(a/r)² (σrr =
	// p − k, σθθ = p + k, σzz = p, no shear). On any plane σn' = p' + k·g and
	// τ = k·f with f ≥ 0 and g fixed by the plane and the point, so the
	// Coulomb condition k(f − μg) ≥ μp' + c and the opening condition
	// p' + kg ≤ 0 hold on sets that shrink as k falls: raising pᵢ towards p
	// shrinks the zone, for any plane, μ, c and pore pressure.
	rng := rand.New(rand.NewPCG(93, 94))
	const cases = 12
	shrank := 0
	for range cases {
		p := 10 + rng.Float64()*20
		drive, o := randomDrive(rng), randomPlane(rng)
		a, nu := 2+rng.Float64()*4, 0.2+rng.Float64()*0.2
		pore := Constant(rng.Float64() * 0.5 * p)
		k := coulomb(t, 0.2+rng.Float64()*0.3, rng.Float64()*0.5)
		g := Grid{Rays: 90}
		prev := make([]Span, g.Rays)
		cur := make([]Span, g.Rays)
		pi := 0.0
		st := station(t, insitu.Tensor{NN: p, EE: p, DD: p}, drive, a, nu, pi, 1, pore)
		z0 := Find(&st, &o, k, g, prev)
		for range 3 {
			pi += rng.Float64() * 0.3 * p
			st := station(t, insitu.Tensor{NN: p, EE: p, DD: p}, drive, a, nu, pi, 1, pore)
			z := Find(&st, &o, k, g, cur)
			if !nested(prev, cur, tolNest) || z.Area > z0.Area+tolArea || z.Depth > z0.Depth+tolDepth {
				t.Fatalf("p %v %v %v pᵢ %v: area %v → %v, depth %v → %v", p, drive, o, pi, z0.Area, z.Area, z0.Depth, z.Depth)
			}
			if z.Area < z0.Area-tolArea {
				shrank++
			}
			z0, prev, cur = z, cur, prev
		}
	}
	if shrank < cases {
		t.Errorf("only %d of %d steps shrank the zone: the cases are too easy", shrank, 3*cases)
	}
}

func TestZoneAxisAlongPrincipal(t *testing.T) {
	// A drive along a principal direction: τrz = τθz = 0 everywhere, so the
	// axis stays a principal direction of the stress at every point (σ·a ∥ a)
	// and a plane across the drive (normal along it) carries no shear: with
	// dry rock and σzz > 0 it has no zone at all, however weak.
	const tol = 1e-12 // relative to the far-field scale
	rng := rand.New(rand.NewPCG(95, 96))
	for range 20 {
		// σ1 = 30 along a horizontal drive, σ2 and σ3 across it at angle β.
		drive := geom.Line{Trend: rng.Float64() * 360}
		up, right, along := opening.TunnelFrame(drive)
		s, c := geom.SinCosDeg(rng.Float64() * 180)
		v2 := r3.Add(r3.Scale(c, up), r3.Scale(s, right))
		ned := principalTensor([3]float64{30, 20, 10}, [3]r3.Vec{along, v2, r3.Cross(along, v2)})
		st := station(t, ned, drive, 3, 0.25, 0.2, 1, nil)
		for range 50 {
			y := st.Opening.Ray(up, right, along, rng.Float64()*360)
			m := y.TensorAt(3 * (1 + rng.Float64()*5))
			ta := m.Apply(along)
			if off := r3.Sub(ta, r3.Scale(r3.Dot(ta, along), along)); r3.Norm(off) > tol*30 {
				t.Fatalf("%v: σ·a has %v across the axis", drive, off)
			}
		}
		across := planes.MustNew(90, geom.Azimuth(drive.Trend+180))
		if z := Find(&st, &across, coulomb(t, 0.05, 0), Grid{Rays: 36}, nil); z.Flags != 0 {
			t.Fatalf("%v: plane across the drive has a zone %+v", drive, z)
		}
	}
}

// principalTensor returns Σ σi vi viᵀ for unit vectors v.
func principalTensor(s [3]float64, v [3]r3.Vec) insitu.Tensor {
	var t insitu.Tensor
	for i, a := range v {
		t.NN += s[i] * a.X * a.X
		t.EE += s[i] * a.Y * a.Y
		t.DD += s[i] * a.Z * a.Z
		t.NE += s[i] * a.X * a.Y
		t.ND += s[i] * a.X * a.Z
		t.ED += s[i] * a.Y * a.Z
	}
	return t
}

func TestZoneRotatesWithTheFarField(t *testing.T) {
	// A vertical shaft: its frame has Up = north and Right = east, so θ is
	// the azimuth. Turning the far field by β about the vertical and the
	// plane's dip direction by β turns the whole problem, so the zone turns
	// by β: the span on the ray at θ + β is the span at θ, and depth and area
	// are unchanged. (The field at θ + 180° equals that at θ, so the deepest
	// angle is compared modulo 180°.)
	const (
		tolSpan  = 1e-7 // m
		tolAngle = 1e-2 // degrees
		tolSame  = 1e-6 // m, m²
	)
	rng := rand.New(rand.NewPCG(97, 98))
	shaft := geom.Line{Plunge: 90}
	for i := range 8 {
		// Draw until the zone exists and ends inside the grid, so that its
		// deepest angle is defined.
		var (
			ned, turned insitu.Tensor
			o0, o1      planes.Orientation
			z0, z1      Zone
			out0, out1  = make([]Span, DefaultRays), make([]Span, DefaultRays)
			beta        float64
		)
		k := coulomb(t, 0.3, 0)
		for try := 0; ; try++ {
			if try == 50 {
				t.Fatalf("case %d: no bounded zone in %d draws", i, try)
			}
			ned = randomField(rng)
			dip, dd := 20+rng.Float64()*60, rng.Float64()*360
			beta = float64(rng.IntN(360))
			if i%2 == 1 {
				beta += rng.Float64() // off the rays: only depth, angle and area
			}
			s, c := geom.SinCosDeg(beta)
			turned = ned.Rotate([3]r3.Vec{{X: c, Y: -s}, {X: s, Y: c}, {Z: 1}})
			o0, o1 = planes.MustNew(dip, dd), planes.MustNew(dip, geom.Azimuth(dd+beta))
			st0 := station(t, ned, shaft, 3, 0.25, 0, 1, Constant(2))
			z0 = Find(&st0, &o0, k, Grid{}, out0)
			if z0.Flags.Has(Exists) && !z0.Flags.Has(ReachesOuter) {
				st1 := station(t, turned, shaft, 3, 0.25, 0, 1, Constant(2))
				z1 = Find(&st1, &o1, k, Grid{}, out1)
				break
			}
		}
		if z0.Flags != z1.Flags || !scalar.EqualWithinAbs(z0.Depth, z1.Depth, tolSame) {
			t.Fatalf("β %v: flags %b → %b, depth %v → %v", beta, z0.Flags, z1.Flags, z0.Depth, z1.Depth)
		}
		if d := math.Mod(z1.Angle-z0.Angle-beta+720+90, 180) - 90; math.Abs(d) > tolAngle {
			t.Fatalf("β %v: angle %v → %v; %+v %+v", beta, z0.Angle, z1.Angle, z0, z1)
		}
		if beta != math.Trunc(beta) {
			const tolQuad = 1e-3 // relative: the rays sample the zone at other angles
			if !scalar.EqualWithinRel(z0.Area, z1.Area, tolQuad) {
				t.Fatalf("β %v: area %v → %v", beta, z0.Area, z1.Area)
			}
			continue
		}
		if !scalar.EqualWithinAbs(z0.Area, z1.Area, tolSame) {
			t.Fatalf("β %v: area %v → %v", beta, z0.Area, z1.Area)
		}
		for j, s0 := range out0 {
			s1 := out1[(j+int(beta))%DefaultRays]
			if math.IsNaN(s0.Inner) != math.IsNaN(s1.Inner) || (!math.IsNaN(s0.Inner) &&
				(!scalar.EqualWithinAbs(s0.Inner, s1.Inner, tolSpan) || !scalar.EqualWithinAbs(s0.Outer, s1.Outer, tolSpan))) {
				t.Fatalf("β %v ray %v: %+v → %+v", beta, s0.Theta, s0, s1)
			}
		}
	}
}

func TestProbeMatchesFreshState(t *testing.T) {
	// The search resolves with the far field's principal stresses in its
	// state (see probe). Its verdicts must be those of a state built afresh
	// by insitu.NewState at each point, resolved by planes.ResolveTo.
	rng := rand.New(rand.NewPCG(99, 100))
	for range 20 {
		st := station(t, randomField(rng), randomDrive(rng), 3, 0.25, rng.Float64(), 0.5+rng.Float64()*0.5, Constant(rng.Float64()*8))
		o := randomPlane(rng)
		k := coulomb(t, 0.2+rng.Float64()*0.6, rng.Float64())
		var p probe
		p.init(&st, &o, k, Grid{}.resolved())
		for range 200 {
			y := st.Opening.Ray(st.Up, st.Right, st.Along, rng.Float64()*360)
			r := 3 * (1 + rng.Float64()*rng.Float64()*5)
			p.in(&y, r, isZone)
			s := insitu.NewState(y.TensorAt(r), st.Depth, st.Pore(r), st.Biot)
			var want planes.Result
			planes.ResolveTo(&want, &s, &o, k)
			if p.res != want.State {
				t.Fatalf("r %v θ %v: %v; fresh %v (FS %v)", r, y.Theta(), p.res, want.State, want.FactorOfSafety)
			}
		}
	}
}
