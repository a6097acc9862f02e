package opening

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// farOf returns the far field in the frame of a drive along l from
// principal stresses s along the axes ax.
func farOf(s [3]float64, ax [3]geom.Line, l geom.Line) insitu.Tensor {
	ned := principal(s, [3]r3.Vec{ax[0].Vec(), ax[1].Vec(), ax[2].Vec()})
	up, right, along := TunnelFrame(l)
	return ned.Rotate([3]r3.Vec{up, right, along})
}

func TestMaxTangential(t *testing.T) {
	const tol = 1e-9
	t.Run("oblique principal axes", func(t *testing.T) {
		// Derived: σ1 = 30 along 090/45, σ2 = 20 along 000/00, σ3 = 10 along
		// 270/45, drive 000/0 (Up = −D, Right = E, axis = N). In the section
		// v1 = (Up −1/√2, Right 1/√2), v3 = (−1/√2, −1/√2), so σ11 = σ22 =
		// 30/2 + 10/2 = 20, σ12 = −30/2 + 10/2 = −10, σ33 = 20. With Hiramatsu
		// & Oka's σθ = σ11 + σ22 − 2(σ11 − σ22)cos 2θ − 4σ12 sin 2θ
		// = 40 + 40 sin 2θ the peak is 80 MPa at θ = 45° (and 225°); the 10°
		// samples gave 40 + 40 sin 80° = 79.39 at 40°.
		far := farOf([3]float64{30, 20, 10}, [3]geom.Line{{Trend: 90, Plunge: 45}, {}, {Trend: 270, Plunge: 45}}, geom.Line{})
		p := MaxTangential(far, 0)
		if !scalar.EqualWithinAbs(p.Stress, 80, tol) || !scalar.EqualWithinAbs(p.Theta, 45, tol) {
			t.Errorf("%+v, want 80 MPa at 45°", p)
		}
	})
	t.Run("no negative zero", func(t *testing.T) {
		// σ11 < σ22 and σ12 = 0 put the peak at the crown: atan2(−0, ·) = −0.
		if p := MaxTangential(insitu.Tensor{NN: 20, EE: 22.5}, 0); p.Theta != 0 || math.Signbit(p.Theta) {
			t.Errorf("crown peak at %v°, want +0", p.Theta)
		}
	})
	t.Run("Brady and Brown", func(t *testing.T) {
		// Brady & Brown eqs. 6.18–6.20 (read), derived: p = 10 vertical,
		// K = 0.5: the sidewall (θ = 90°) carries the peak, 25 MPa.
		p := MaxTangential(insitu.Tensor{NN: 10, EE: 5}, 0)
		if !scalar.EqualWithinAbs(p.Stress, 25, tol) || !scalar.EqualWithinAbs(p.Theta, 90, tol) {
			t.Errorf("%+v, want 25 MPa at 90°", p)
		}
	})
	t.Run("Lamé support", func(t *testing.T) {
		// Lamé (memory): a hydrostatic p with internal pressure pᵢ has
		// σθ = 2p − pᵢ all round.
		p := MaxTangential(insitu.Tensor{NN: 10, EE: 10, DD: 10}, 2)
		if !scalar.EqualWithinAbs(p.Stress, 18, tol) {
			t.Errorf("%+v, want 18 MPa", p)
		}
	})
	t.Run("against dense sampling", func(t *testing.T) {
		// Property: no θ on a 0.01° grid beats the closed form, and the
		// closed form's value is σθ at its own angle.
		rng := rand.New(rand.NewPCG(81, 82))
		for range 100 {
			far := randomFar(rng)
			pi := rng.Float64() * 2
			p := MaxTangential(far, pi)
			if got := Wall(far, p.Theta, 0.25).Theta - pi; !scalar.EqualWithinAbs(got, p.Stress, tol) {
				t.Fatalf("σθ(%v) = %v, peak %v", p.Theta, got, p.Stress)
			}
			for th := 0.0; th < 180; th += 0.01 {
				if s := Wall(far, th, 0.25).Theta - pi; s > p.Stress+tol {
					t.Fatalf("%+v: σθ(%v) = %v is larger", p, th, s)
				}
			}
		}
	})
}

func TestMaxWallPrincipal(t *testing.T) {
	const tol = 1e-9
	t.Run("horizontal SHmax oblique to the drive", func(t *testing.T) {
		// Derived: drive 000/0, SHmax 30 MPa at azimuth 045, Shmin 15, Sv 20,
		// ν = 0.25. NED: σNN = σEE = 22.5, σNE = 7.5, σDD = 20. Tunnel frame
		// (Up = −D, Right = E, axis = N): σ11 = 20, σ22 = 22.5, σ33 = 22.5,
		// σ23 = σEN = 7.5, σ12 = σ13 = 0. At the crown (θ = 0):
		//	σθ = 20 + 22.5 − 2(20 − 22.5) = 47.5
		//	σz = 22.5 − 2·0.25·(20 − 22.5) = 23.75
		//	τθz = 2·7.5 = 15
		//	σmax = (47.5 + 23.75)/2 + √(11.875² + 15²) = 35.625 + √366.015625
		//	     = 35.625 + 19.131534 = 54.756534 MPa
		// Over θ: σθ = 42.5 + 5 cos 2θ, σz = 22.5 + 1.25 cos 2θ and
		// τθz² = 225 cos²θ are all largest at θ = 0 (σθ − σz = 20 + 3.75 cos 2θ
		// too), so the maximum over the wall is this crown value, at 0°
		// (and 180°).
		const want = 35.625 + 19.131534
		const tolRead = 1e-6 // the hand value has 6 decimals
		far := farOf([3]float64{30, 20, 15}, [3]geom.Line{{Trend: 45}, {Plunge: 90}, {Trend: 135}}, geom.Line{})
		w := Wall(far, 0, 0.25)
		if !scalar.EqualWithinAbs(w.Theta, 47.5, tol) || !scalar.EqualWithinAbs(w.Z, 23.75, tol) || !scalar.EqualWithinAbs(w.ThetaZ, 15, tol) {
			t.Fatalf("crown %+v, want 47.5, 23.75, 15", w)
		}
		if got := w.WallPrincipal(); !scalar.EqualWithinAbs(got, want, tolRead) {
			t.Errorf("crown σmax %v, want %v", got, want)
		}
		p := MaxWallPrincipal(far, 0.25, 0)
		const tolAngle = 1e-4 // degrees: a flat maximum is located to about √(tol)
		if !scalar.EqualWithinAbs(p.Stress, want, tolRead) || math.Min(p.Theta, 180-p.Theta) > tolAngle {
			t.Errorf("%+v, want %v at 0°", p, want)
		}
	})
	t.Run("properties", func(t *testing.T) {
		// The largest eigenvalue of the wall block is at least its diagonal
		// entry σθ, so the peak is at least MaxTangential; no θ on a 0.01°
		// grid beats it; and with τθz = 0 and σz below σθ everywhere it is
		// MaxTangential.
		rng := rand.New(rand.NewPCG(83, 84))
		for range 100 {
			far := randomFar(rng)
			nu, pi := 0.15+rng.Float64()*0.3, rng.Float64()*2
			p := MaxWallPrincipal(far, nu, pi)
			if mt := MaxTangential(far, pi); p.Stress < mt.Stress-tol {
				t.Fatalf("%+v below the tangential peak %+v", p, mt)
			}
			f := func(th float64) float64 {
				w := Wall(far, th, nu)
				w.Theta -= pi
				return w.WallPrincipal()
			}
			if got := f(p.Theta); !scalar.EqualWithinAbs(got, p.Stress, tol) {
				t.Fatalf("σmax(%v) = %v, peak %v", p.Theta, got, p.Stress)
			}
			for th := 0.0; th < 180; th += 0.01 {
				if s := f(th); s > p.Stress+tol {
					t.Fatalf("%+v: σmax(%v) = %v is larger", p, th, s)
				}
			}
			plane := far
			plane.ND, plane.ED, plane.DD = 0, 0, 0
			// With σ33 = 0, σz = ν(σθ − A) for A = σ11 + σ22 > 0 here, so
			// max σz = νR ≤ A + R = max σθ (R the cos/sin amplitude).
			if pt, mt := MaxWallPrincipal(plane, nu, 0), MaxTangential(plane, 0); !scalar.EqualWithinAbs(pt.Stress, mt.Stress, tol) {
				t.Fatalf("no anti-plane terms: %+v, tangential %+v", pt, mt)
			}
		}
	})
}

func TestHalfTurnNeverGivesHalfATurn(t *testing.T) {
	// Angles round the wall are in [0, 180): one a hair below 180 (which a
	// table would round to "180") is the same place as 0 (common practice).
	for _, th := range []float64{180, 179.999999999, -1e-12, 360, 539.9999999999} {
		if got := halfTurn(th); got != 0 {
			t.Errorf("halfTurn(%v) = %v, want 0", th, got)
		}
	}
	if got := halfTurn(179.9); got != 179.9 {
		t.Errorf("halfTurn(179.9) = %v", got)
	}
}
