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

// randomFar returns a far field in the tunnel frame with compressive normal
// components and shears up to ±5 MPa.
func randomFar(rng *rand.Rand) insitu.Tensor {
	return insitu.Tensor{NN: 5 + rng.Float64()*25, EE: 5 + rng.Float64()*25, DD: 5 + rng.Float64()*25,
		NE: rng.Float64()*10 - 5, ND: rng.Float64()*10 - 5, ED: rng.Float64()*10 - 5}
}

func mustCircle(t testing.TB, far insitu.Tensor, a, nu, pi float64) Circle {
	t.Helper()
	c, err := NewCircle(far, a, nu, pi)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

func sameTensor(a, b insitu.Tensor, tol float64) bool {
	return scalar.EqualWithinAbs(a.NN, b.NN, tol) && scalar.EqualWithinAbs(a.EE, b.EE, tol) &&
		scalar.EqualWithinAbs(a.DD, b.DD, tol) && scalar.EqualWithinAbs(a.NE, b.NE, tol) &&
		scalar.EqualWithinAbs(a.ND, b.ND, tol) && scalar.EqualWithinAbs(a.ED, b.ED, tol)
}

func TestFieldAtTheWall(t *testing.T) {
	// At r = a the field is the tested boundary solution (Wall, WallTensor):
	// σrr = pᵢ, τrθ = τrz = 0, σθ = Wall's σθ − pᵢ, σz and τθz unchanged.
	const tol = 1e-9
	rng := rand.New(rand.NewPCG(71, 72))
	up, right, along := TunnelFrame(geom.Line{Trend: 40, Plunge: 5})
	for _, pi := range []float64{0, 0.7} {
		t.Run(map[bool]string{true: "unsupported", false: "supported"}[pi == 0], func(t *testing.T) {
			for range 50 {
				far := randomFar(rng)
				c := mustCircle(t, far, 3, 0.27, pi)
				for k := range 36 {
					th := float64(k * 10)
					p := c.At(3, th)
					w := Wall(far, th, 0.27)
					if !scalar.EqualWithinAbs(p.R, pi, tol) || math.Abs(p.RTheta) > tol || math.Abs(p.RZ) > tol {
						t.Fatalf("θ %v: σrr %v (want %v), τrθ %v, τrz %v", th, p.R, pi, p.RTheta, p.RZ)
					}
					if !scalar.EqualWithinAbs(p.Theta, w.Theta-pi, tol) || !scalar.EqualWithinAbs(p.Z, w.Z, tol) || !scalar.EqualWithinAbs(p.ThetaZ, w.ThetaZ, tol) {
						t.Fatalf("θ %v: field %+v, wall %+v", th, p, w)
					}
					if cw := c.Wall(th); !scalar.EqualWithinAbs(cw.Theta, p.Theta, tol) {
						t.Fatalf("θ %v: Circle.Wall σθ %v, field %v", th, cw.Theta, p.Theta)
					}
					if pi == 0 {
						if got, want := p.Tensor(up, right, along, th), w.WallTensor(up, right, along, th); !sameTensor(got, want, tol) {
							t.Fatalf("θ %v: tensor %+v, wall tensor %+v", th, got, want)
						}
					}
				}
			}
		})
	}
}

func TestFieldFarAway(t *testing.T) {
	// r → ∞ recovers the far field: at r = 10⁶a the perturbation is of order
	// (a/r)² = 10⁻¹², and the NED tensor is the NED far field it came from.
	const tol = 1e-9
	rng := rand.New(rand.NewPCG(73, 74))
	for range 100 {
		ned := randomFar(rng)
		l := geom.Line{Trend: rng.Float64() * 360, Plunge: rng.Float64()*20 - 10}
		up, right, along := TunnelFrame(l)
		far := ned.Rotate([3]r3.Vec{up, right, along})
		c := mustCircle(t, far, 2, 0.25, 1.5)
		th := rng.Float64() * 360
		got := c.At(2e6, th).Tensor(up, right, along, th)
		if !sameTensor(got, ned, tol) {
			t.Fatalf("%v θ %v: %+v, want %+v", l, th, got, ned)
		}
		ray := c.Ray(up, right, along, th)
		if got := ray.TensorAt(2e6); !sameTensor(got, ned, tol) {
			t.Fatalf("%v θ %v: ray %+v, want %+v", l, th, got, ned)
		}
	}
}

func TestRayMatchesAt(t *testing.T) {
	// The ray's polynomial form in q gives the same tensor as At and Tensor.
	const tol = 1e-12 // relative to the far-field scale, ~30 MPa
	rng := rand.New(rand.NewPCG(79, 80))
	for range 100 {
		c := mustCircle(t, randomFar(rng), 1+rng.Float64()*4, 0.2+rng.Float64()*0.2, rng.Float64()*2)
		up, right, along := TunnelFrame(geom.Line{Trend: rng.Float64() * 360, Plunge: rng.Float64()*20 - 10})
		th := rng.Float64() * 360
		y := c.Ray(up, right, along, th)
		for _, r := range []float64{c.Radius, c.Radius * (1 + rng.Float64()), c.Radius * (2 + rng.Float64()*10)} {
			if got, want := y.TensorAt(r), c.At(r, th).Tensor(up, right, along, th); !sameTensor(got, want, tol*30) {
				t.Fatalf("r %v θ %v: ray %+v, At %+v", r, th, got, want)
			}
			if got, want := y.At(r), c.At(r, th); got != want {
				t.Fatalf("r %v θ %v: ray %+v, At %+v", r, th, got, want)
			}
		}
	}
}

func TestKirschUniaxial(t *testing.T) {
	// Kirsch (1898), uniaxial far field p along x1, θ from x1, as in Jaeger,
	// Cook & Zimmerman (2007) §8.4 (derived by hand from the published form
	// σrr = p/2(1 − q) + p/2(1 − 4q + 3q²)cos 2θ, σθθ = p/2(1 + q) −
	// p/2(1 + 3q²)cos 2θ, τrθ = −p/2(1 + 2q − 3q²)sin 2θ, q = (a/r)²), p = 10:
	//  r = 2a, θ = 0   (q = 1/4):  σrr = 3.75 + 5·0.1875 = 4.6875, σθθ = 6.25 − 5·1.1875 = 0.3125, τ = 0;
	//  r = 2a, θ = 90°:            σrr = 3.75 − 0.9375 = 2.8125,   σθθ = 6.25 + 5.9375 = 12.1875, τ = 0;
	//  r = 3a, θ = 45° (q = 1/9):  σrr = 5·8/9 = 4.444444, σθθ = 5·10/9 = 5.555556,
	//                              τrθ = −5(1 + 2/9 − 1/27) = −160/27 = −5.925926.
	const tol = 1e-6
	c := mustCircle(t, insitu.Tensor{NN: 10}, 1.5, 0.25, 0)
	for _, k := range []struct {
		name       string
		r, th      float64
		rr, tt, rt float64
	}{
		{"2a,0", 3, 0, 4.6875, 0.3125, 0},
		{"2a,90", 3, 90, 2.8125, 12.1875, 0},
		{"3a,45", 4.5, 45, 4.444444, 5.555556, -5.925926},
	} {
		t.Run(k.name, func(t *testing.T) {
			p := c.At(k.r, k.th)
			if !scalar.EqualWithinAbs(p.R, k.rr, tol) || !scalar.EqualWithinAbs(p.Theta, k.tt, tol) || !scalar.EqualWithinAbs(p.RTheta, k.rt, tol) {
				t.Errorf("σrr %v σθθ %v τrθ %v; want %v %v %v", p.R, p.Theta, p.RTheta, k.rr, k.tt, k.rt)
			}
		})
	}
}

func TestFieldEquilibrium(t *testing.T) {
	// A different derivation from the formulas: the field must satisfy the
	// equilibrium equations in polar coordinates without body force (Jaeger,
	// Cook & Zimmerman 2007, §5.4; common practice):
	//	∂σrr/∂r + (1/r)∂τrθ/∂θ + (σrr − σθθ)/r = 0
	//	(1/r)∂σθθ/∂θ + ∂τrθ/∂r + 2τrθ/r = 0
	//	∂τrz/∂r + (1/r)∂τθz/∂θ + τrz/r = 0
	// and compatibility: σrr + σθθ is harmonic (plane strain, Airy), and the
	// anti-plane shear is the gradient of a harmonic displacement, so
	// ∂(r τθz)/∂r − ∂τrz/∂θ = 0; plane strain fixes σzz by Hooke's law.
	// Central differences with step h.
	const (
		h   = 1e-4
		tol = 1e-5 // MPa/m: truncation O(h²) and rounding O(ε/h²) on stresses of ~50 MPa
	)
	rng := rand.New(rand.NewPCG(75, 76))
	for range 100 {
		c := mustCircle(t, randomFar(rng), 1+rng.Float64()*4, 0.2+rng.Float64()*0.2, rng.Float64()*2)
		r := c.Radius * (1.05 + rng.Float64()*3)
		th := rng.Float64() * 360
		dth := h / r * geom.Deg // an arc of h
		at := func(dr, dt float64) Polar { return c.At(r+dr*h, th+dt*dth) }
		pr, mr, pt, mt, o := at(1, 0), at(-1, 0), at(0, 1), at(0, -1), at(0, 0)
		d := func(f func(Polar) float64, p, m Polar) float64 { return (f(p) - f(m)) / (2 * h) }
		R := func(p Polar) float64 { return p.R }
		T := func(p Polar) float64 { return p.Theta }
		RT := func(p Polar) float64 { return p.RTheta }
		RZ := func(p Polar) float64 { return p.RZ }
		TZ := func(p Polar) float64 { return p.ThetaZ }
		// (1/r)∂/∂θ is the derivative along the arc: d(·, pt, mt).
		eq1 := d(R, pr, mr) + d(RT, pt, mt) + (o.R-o.Theta)/r
		eq2 := d(T, pt, mt) + d(RT, pr, mr) + 2*o.RTheta/r
		eq3 := d(RZ, pr, mr) + d(TZ, pt, mt) + o.RZ/r
		rTZ := func(p Polar, rr float64) float64 { return rr * p.ThetaZ }
		curl := (rTZ(pr, r+h)-rTZ(mr, r-h))/(2*h) - r*d(RZ, pt, mt)
		sum := func(p Polar) float64 { return p.R + p.Theta }
		// ∇²f = f_rr + f_r/r + f_θθ/r², by the 5-point stencil.
		lap := (sum(pr)-2*sum(o)+sum(mr))/(h*h) + d(sum, pr, mr)/r + (sum(pt)-2*sum(o)+sum(mt))/(h*h)
		const lapTol = 1e-4 // MPa/m²: the second differences lose 8 digits
		// Plane strain, εzz = 0 with Hooke's law (common practice): the
		// axial stress changes by ν times the change of σrr + σθθ.
		const tolHooke = 1e-10 // MPa, rounding on stresses of ~50 MPa
		if dz, dsum := o.Z-c.Far.DD, o.R+o.Theta-c.Far.NN-c.Far.EE; !scalar.EqualWithinAbs(dz, c.Poisson*dsum, tolHooke) {
			t.Fatalf("r %v θ %v: σzz − σ33 = %v, ν·Δ(σrr + σθθ) = %v", r, th, dz, c.Poisson*dsum)
		}
		if math.Abs(eq1) > tol || math.Abs(eq2) > tol || math.Abs(eq3) > tol || math.Abs(curl) > tol*r || math.Abs(lap) > lapTol {
			t.Fatalf("r %v θ %v: equilibrium %v %v %v, compatibility %v, ∇²(σrr+σθθ) %v", r, th, eq1, eq2, eq3, curl, lap)
		}
	}
}

func TestFieldAxisAlongPrincipal(t *testing.T) {
	// A drive along a principal direction sees σ13 = σ23 = 0, and then no
	// anti-plane shear anywhere: τrz = τθz = 0 at every r and θ.
	const tol = 1e-12
	rng := rand.New(rand.NewPCG(77, 78))
	for range 50 {
		// A principal triad: σ1 along the drive, σ2, σ3 across it at angle β.
		l := geom.Line{Trend: rng.Float64() * 360, Plunge: rng.Float64()*30 - 15}
		up, right, along := TunnelFrame(l)
		s, co := geom.SinCosDeg(rng.Float64() * 180)
		v2 := r3.Add(r3.Scale(co, up), r3.Scale(s, right))
		v3 := r3.Cross(along, v2)
		ned := principal([3]float64{30, 20, 10}, [3]r3.Vec{along, v2, v3})
		far := ned.Rotate([3]r3.Vec{up, right, along})
		c := mustCircle(t, far, 2.5, 0.3, 0.4)
		for range 20 {
			p := c.At(2.5*(1+rng.Float64()*5), rng.Float64()*360)
			if math.Abs(p.RZ) > tol*30 || math.Abs(p.ThetaZ) > tol*30 {
				t.Fatalf("%v: τrz %v τθz %v", l, p.RZ, p.ThetaZ)
			}
		}
	}
}

// principal returns Σ σi vi viᵀ for unit vectors v.
func principal(s [3]float64, v [3]r3.Vec) insitu.Tensor {
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

func TestNewCircleErrors(t *testing.T) {
	for _, c := range []struct {
		name           string
		far            insitu.Tensor
		a, nu, support float64
	}{
		{"nan far", insitu.Tensor{NN: math.NaN()}, 1, 0.25, 0},
		{"zero radius", insitu.Tensor{}, 0, 0.25, 0},
		{"inf radius", insitu.Tensor{}, math.Inf(1), 0.25, 0},
		{"nu 0.5", insitu.Tensor{}, 1, 0.5, 0},
		{"nu negative", insitu.Tensor{}, 1, -0.1, 0},
		{"suction", insitu.Tensor{}, 1, 0.25, -1},
	} {
		t.Run(c.name, func(t *testing.T) {
			if _, err := NewCircle(c.far, c.a, c.nu, c.support); err == nil {
				t.Error("no error")
			}
		})
	}
	t.Run("inside panics", func(t *testing.T) {
		defer func() {
			if recover() == nil {
				t.Error("no panic")
			}
		}()
		c := mustCircle(t, insitu.Tensor{NN: 1}, 2, 0.25, 0)
		c.At(1.9, 0)
	})
}
