package opening

import (
	"cleft/insitu"
	"cleft/insitu/geom"
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestKirschCheckValues(t *testing.T) {
	// A horizontal tunnel: Up is vertical, so σ11 is the vertical far field.
	// Kirsch (1898); Hoek & Brown (1980):
	//  - hydrostatic p: σθ = 2p all round;
	//  - uniaxial vertical p: 3p at the sidewalls, −p at crown and invert;
	//  - K = 1/3: no tangential stress at the crown.
	const (
		p   = 10.0
		tol = 1e-12 // MPa
	)
	for th := 0.0; th < 360; th += 15 {
		if w := Wall(insitu.Tensor{NN: p, EE: p, DD: p}, th, 0.25); !scalar.EqualWithinAbs(w.Theta, 2*p, tol) {
			t.Fatalf("hydrostatic: σθ(%v) = %v, want %v", th, w.Theta, 2*p)
		}
	}
	uni := insitu.Tensor{NN: p}
	for _, c := range []struct{ th, want float64 }{{0, -p}, {180, -p}, {90, 3 * p}, {270, 3 * p}} {
		if w := Wall(uni, c.th, 0.25); !scalar.EqualWithinAbs(w.Theta, c.want, tol) {
			t.Errorf("uniaxial vertical: σθ(%v) = %v, want %v", c.th, w.Theta, c.want)
		}
	}
	if w := Wall(insitu.Tensor{NN: p, EE: p / 3}, 0, 0.25); !scalar.EqualWithinAbs(w.Theta, 0, tol) {
		t.Errorf("K = 1/3: crown σθ = %v, want 0", w.Theta)
	}
	// Brady & Brown eqs. 6.18–6.20 (read), derived: p = 10, K = 0.5: sidewall
	// 25, crown 5; K = 0: 30 and −10.
	for _, c := range []struct{ k, side, crown float64 }{{0.5, 25, 5}, {0, 30, -10}} {
		far := insitu.Tensor{NN: p, EE: c.k * p}
		if s, cr := Wall(far, 90, 0.2).Theta, Wall(far, 0, 0.2).Theta; !scalar.EqualWithinAbs(s, c.side, tol) || !scalar.EqualWithinAbs(cr, c.crown, tol) {
			t.Errorf("K = %v: sidewall %v, crown %v; want %v, %v", c.k, s, cr, c.side, c.crown)
		}
	}
}

func TestTunnelFrame(t *testing.T) {
	const (
		tol      = 1e-12 // unit-vector components, and MPa
		traceTol = 1e-10 // MPa
		i2Tol    = 1e-9  // MPa², the second invariant of components up to 30 MPa
	)
	rng := rand.New(rand.NewPCG(61, 62))
	for range 200 {
		l := geom.Line{Trend: rng.Float64() * 360, Plunge: rng.Float64()*20 - 10}
		u, r, a := TunnelFrame(l)
		if d := r3.Dot(r3.Cross(u, r), a); !scalar.EqualWithinAbs(d, 1, tol) {
			t.Fatalf("%v: (up, right, axis) not right-handed: %v", l, d)
		}
		if u.Z >= 0 || math.Abs(r.Z) > tol {
			t.Fatalf("%v: up %v not upward or right %v not horizontal", l, u, r)
		}
		// Rotation into the tunnel frame keeps the invariants.
		s := insitu.Tensor{NN: 30, EE: 18, DD: 22, NE: 3, ND: -1, ED: 2}
		f := s.Rotate([3]r3.Vec{u, r, a})
		i2 := func(t insitu.Tensor) float64 {
			return t.NN*t.EE + t.EE*t.DD + t.DD*t.NN - t.NE*t.NE - t.ND*t.ND - t.ED*t.ED
		}
		if !scalar.EqualWithinAbs(f.Trace(), s.Trace(), traceTol) || !scalar.EqualWithinAbs(i2(f), i2(s), i2Tol) {
			t.Fatalf("%v: invariants changed", l)
		}
	}
	// A tunnel along SHmax sees (Sv, Shmin) in its section and SHmax along it.
	s := insitu.Andersonian(40, 20, 30, 65)
	u, r, a := TunnelFrame(geom.Line{Trend: 65})
	f := s.Rotate([3]r3.Vec{u, r, a})
	if !scalar.EqualWithinAbs(f.NN, 30, tol) || !scalar.EqualWithinAbs(f.EE, 20, tol) || !scalar.EqualWithinAbs(f.DD, 40, tol) || math.Abs(f.NE) > tol {
		t.Errorf("along SHmax: section %v %v, axis %v", f.NN, f.EE, f.DD)
	}
}

func TestWallTensor(t *testing.T) {
	// The wall tensor reproduces σθ, σz, τθz on its own axes and has no
	// traction on the wall (σr = 0, τrθ = τrz = 0).
	const tol = 1e-12 // MPa
	u, r, a := TunnelFrame(geom.Line{Trend: 30, Plunge: 2})
	for th := 0.0; th < 360; th += 30 {
		w := WallStress{Theta: 25, Z: 12, ThetaZ: -3}
		m := w.WallTensor(u, r, a, th)
		s, c := geom.SinCosDeg(th)
		e := r3.Add(r3.Scale(-s, u), r3.Scale(c, r))
		radial := r3.Add(r3.Scale(c, u), r3.Scale(s, r))
		if got := r3.Dot(e, m.Apply(e)); !scalar.EqualWithinAbs(got, 25, tol) {
			t.Errorf("θ %v: σθ %v", th, got)
		}
		if got := r3.Dot(a, m.Apply(e)); !scalar.EqualWithinAbs(got, -3, tol) {
			t.Errorf("θ %v: τθz %v", th, got)
		}
		if tr := m.Apply(radial); r3.Norm(tr) > tol {
			t.Errorf("θ %v: traction on the wall %v", th, tr)
		}
	}
}

func TestSpallingOf(t *testing.T) {
	// Martin, Kaiser & McCreath (1999) (read): spalling starts at σθ,max/σc ≈ 0.4 ± 0.1.
	for _, c := range []struct {
		r    float64
		want Spalling
	}{{0.2, BelowOnset}, {0.2999, BelowOnset}, {0.3, AtOnset}, {0.45, AtOnset}, {0.5, AtOnset}, {0.51, PastOnset}, {math.NaN(), SpallingUnknown}} {
		if got := SpallingOf(c.r); got != c.want {
			t.Errorf("ratio %v: %v, want %v", c.r, got, c.want)
		}
	}
}

func TestWallRotatesWithTheFarField(t *testing.T) {
	// Turning the far field by β about the axis turns the wall stresses with
	// it: Wall(R·σ·Rᵀ)(θ) = Wall(σ)(θ − β). This checks the signs of the σ12,
	// σ13 and σ23 terms against the σ11, σ22 and σ33 ones, which the Kirsch
	// values fix.
	const tol = 1e-9 // MPa
	rng := rand.New(rand.NewPCG(63, 64))
	for range 200 {
		far := insitu.Tensor{NN: 5 + rng.Float64()*20, EE: 5 + rng.Float64()*20, DD: 5 + rng.Float64()*20,
			NE: rng.Float64()*6 - 3, ND: rng.Float64()*6 - 3, ED: rng.Float64()*6 - 3}
		beta := rng.Float64() * 360
		// Frame turned by −β about the axis (x3): the rows of q are the new
		// axes expressed in the old ones.
		s, c := geom.SinCosDeg(beta)
		q := [3]r3.Vec{{X: c, Y: -s}, {X: s, Y: c}, {Z: 1}}
		turned := far.Rotate(q)
		for th := 0.0; th < 360; th += 30 {
			a, b := Wall(turned, th, 0.3), Wall(far, th-beta, 0.3)
			if !scalar.EqualWithinAbs(a.Theta, b.Theta, tol) || !scalar.EqualWithinAbs(a.Z, b.Z, tol) || !scalar.EqualWithinAbs(a.ThetaZ, b.ThetaZ, tol) {
				t.Fatalf("β %v θ %v: %+v vs %+v", beta, th, a, b)
			}
		}
	}
}
