package opening

import (
	"fmt"
	"math"

	"cleft/insitu"
	"cleft/insitu/geom"

	"gonum.org/v1/gonum/spatial/r3"
)

// Circle is a circular opening of radius Radius (m) in an elastic far field,
// plane strain along its axis, with an internal support pressure Support
// (MPa) on its wall. Far is the far field in the tunnel frame (see Wall for
// the components), Poisson is ν. Build it with NewCircle; its methods trust
// the values.
type Circle struct {
	Far     insitu.Tensor
	Radius  float64
	Poisson float64
	Support float64
}

// NewCircle returns the opening of radius > 0 (m) with Poisson's ratio nu ∈
// [0, 0.5) and support pressure ≥ 0 (MPa) in the far field far (tunnel
// frame, MPa, compression positive). Non-finite or out-of-range values are
// errors.
func NewCircle(far insitu.Tensor, radius, nu, support float64) (Circle, error) {
	for i, v := range [...]float64{far.NN, far.EE, far.DD, far.NE, far.ND, far.ED} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return Circle{}, fmt.Errorf("far-field component %d is %v: want a finite number", i+1, v)
		}
	}
	if math.IsNaN(radius) || math.IsInf(radius, 0) || radius <= 0 {
		return Circle{}, fmt.Errorf("radius %v m: want a finite number > 0", radius)
	}
	if math.IsNaN(nu) || nu < 0 || nu >= 0.5 {
		return Circle{}, fmt.Errorf("Poisson's ratio %v: want a number in [0, 0.5)", nu)
	}
	if math.IsNaN(support) || math.IsInf(support, 0) || support < 0 {
		return Circle{}, fmt.Errorf("support pressure %v MPa: want a finite number ≥ 0", support)
	}
	return Circle{Far: far, Radius: radius, Poisson: nu, Support: support}, nil
}

// Polar is the stress at a point in the rock round an opening in polar
// components of the tunnel frame, MPa, compression positive: radial R,
// tangential Theta, axial Z and the shears RTheta, RZ, ThetaZ.
type Polar struct {
	R, Theta, Z, RTheta, RZ, ThetaZ float64
}

// At returns the stress at distance r ≥ Radius (m) from the axis and angle
// theta (degrees from Up towards Right: from the crown, clockwise looking
// along the drive). With q = (a/r)², m = (σ11 + σ22)/2, d = (σ11 − σ22)/2,
// g = d cos 2θ + σ12 sin 2θ and h = −d sin 2θ + σ12 cos 2θ (Kirsch 1898;
// the anti-plane terms as in Jaeger, Cook & Zimmerman 2007; the Lamé term
// of the support pressure pᵢ):
//
//	σrr = m(1 − q) + g(1 − 4q + 3q²) + pᵢq
//	σθθ = m(1 + q) − g(1 + 3q²) − pᵢq
//	τrθ = h(1 + 2q − 3q²)
//	σzz = σ33 − 4νqg
//	τrz = (σ13 cos θ + σ23 sin θ)(1 − q)
//	τθz = (−σ13 sin θ + σ23 cos θ)(1 + q)
//
// At the wall (q = 1) this is Wall with σθ lowered by pᵢ, σrr = pᵢ and
// τrθ = τrz = 0; as r → ∞ it is the far field. At panics for r < Radius
// (a point inside the opening). At does not allocate.
func (c *Circle) At(r, theta float64) Polar {
	s, co := geom.SinCosDeg(theta)
	s2, c2 := geom.SinCosDeg(2 * theta)
	return c.at(r, s, co, s2, c2)
}

// at is At with the trigonometry of θ and 2θ given.
func (c *Circle) at(r, s, co, s2, c2 float64) Polar {
	if !(r >= c.Radius*(1-1e-12)) {
		panic(fmt.Sprintf("opening: point at r = %v m is inside the opening of radius %v m", r, c.Radius))
	}
	q := c.Radius / r
	q *= q
	if q > 1 {
		q = 1 // r within rounding of the wall
	}
	f := &c.Far
	m := (f.NN + f.EE) / 2
	d := (f.NN - f.EE) / 2
	g := d*c2 + f.NE*s2
	h := -d*s2 + f.NE*c2
	pi := c.Support * q
	return Polar{
		R:      m*(1-q) + g*(1-4*q+3*q*q) + pi,
		Theta:  m*(1+q) - g*(1+3*q*q) - pi,
		RTheta: h * (1 + 2*q - 3*q*q),
		Z:      f.DD - 4*c.Poisson*q*g,
		RZ:     (f.ND*co + f.ED*s) * (1 - q),
		ThetaZ: (-f.ND*s + f.ED*co) * (1 + q),
	}
}

// Wall returns the stress at the wall at theta (degrees from the crown):
// Wall(c.Far, theta, c.Poisson) with σθ lowered by the support pressure.
// The radial stress there is c.Support and τrθ = τrz = 0.
func (c *Circle) Wall(theta float64) WallStress {
	w := Wall(c.Far, theta, c.Poisson)
	w.Theta -= c.Support
	return w
}

// Tensor returns p, the stress at angle theta (degrees from the crown), as a
// full tensor in the NED frame of the tunnel axes up, right, along (see
// TunnelFrame):
//
//	σ = σrr eᵣeᵣᵀ + σθθ eθeθᵀ + σzz aaᵀ + τrθ(eᵣeθᵀ + eθeᵣᵀ) + τrz(eᵣaᵀ + aeᵣᵀ) + τθz(eθaᵀ + aeθᵀ)
//
// with eᵣ = cos θ·Up + sin θ·Right, eθ = −sin θ·Up + cos θ·Right and a the
// axis. At the wall of an unsupported opening it equals WallTensor.
func (p Polar) Tensor(up, right, along r3.Vec, theta float64) insitu.Tensor {
	s, c := geom.SinCosDeg(theta)
	er := r3.Add(r3.Scale(c, up), r3.Scale(s, right))
	et := r3.Add(r3.Scale(-s, up), r3.Scale(c, right))
	return p.tensor(er, et, along)
}

// tensor is Tensor with the radial, tangential and axial unit vectors given.
func (p Polar) tensor(er, et, a r3.Vec) insitu.Tensor {
	var t insitu.Tensor
	sym := func(k float64, u, v r3.Vec) { // k·(u vᵀ + v uᵀ)
		t.NN += 2 * k * u.X * v.X
		t.EE += 2 * k * u.Y * v.Y
		t.DD += 2 * k * u.Z * v.Z
		t.NE += k * (u.X*v.Y + v.X*u.Y)
		t.ND += k * (u.X*v.Z + v.X*u.Z)
		t.ED += k * (u.Y*v.Z + v.Y*u.Z)
	}
	sym(p.R/2, er, er)
	sym(p.Theta/2, et, et)
	sym(p.Z/2, a, a)
	sym(p.RTheta, er, et)
	sym(p.RZ, er, a)
	sym(p.ThetaZ, et, a)
	return t
}

// Ray is the stress field along one ray from the axis of an opening, with the
// trigonometry of its angle and its directions in the NED frame worked out
// once, for loops over the distance. Build it with Circle.Ray.
//
// Every polar component is a polynomial in q = (a/r)² of degree two (see
// Circle.At), so the NED tensor on the ray is T₀ + q·T₁ + q²·T₂ with three
// tensors fixed by the ray.
type Ray struct {
	c             *Circle
	theta         float64
	s, co, s2, c2 float64
	t0, t1, t2    insitu.Tensor
}

// Ray returns the ray at theta (degrees from the crown) in the tunnel frame
// with NED axes up, right, along. The Ray refers to c: c must not change
// while the Ray is in use.
func (c *Circle) Ray(up, right, along r3.Vec, theta float64) Ray {
	s, co := geom.SinCosDeg(theta)
	s2, c2 := geom.SinCosDeg(2 * theta)
	er := r3.Add(r3.Scale(co, up), r3.Scale(s, right))
	et := r3.Add(r3.Scale(-s, up), r3.Scale(co, right))
	f := &c.Far
	m := (f.NN + f.EE) / 2
	d := (f.NN - f.EE) / 2
	g := d*c2 + f.NE*s2
	h := -d*s2 + f.NE*c2
	u := f.ND*co + f.ED*s
	v := -f.ND*s + f.ED*co
	p0 := Polar{R: m + g, Theta: m - g, RTheta: h, Z: f.DD, RZ: u, ThetaZ: v}
	p1 := Polar{R: -m - 4*g + c.Support, Theta: m - c.Support, RTheta: 2 * h, Z: -4 * c.Poisson * g, RZ: -u, ThetaZ: v}
	p2 := Polar{R: 3 * g, Theta: -3 * g, RTheta: -3 * h}
	return Ray{
		c: c, theta: theta, s: s, co: co, s2: s2, c2: c2,
		t0: p0.tensor(er, et, along), t1: p1.tensor(er, et, along), t2: p2.tensor(er, et, along),
	}
}

// Theta returns the angle of the ray, degrees from the crown.
func (y *Ray) Theta() float64 { return y.theta }

// At returns the polar stress at distance r ≥ Radius (m) on the ray; see
// Circle.At.
func (y *Ray) At(r float64) Polar { return y.c.at(r, y.s, y.co, y.s2, y.c2) }

// TensorAt returns the stress at distance r ≥ Radius (m) on the ray as a
// tensor in the NED frame; see Polar.Tensor. It panics for r < Radius and
// does not allocate.
func (y *Ray) TensorAt(r float64) insitu.Tensor {
	a := y.c.Radius
	if !(r >= a*(1-1e-12)) {
		panic(fmt.Sprintf("opening: point at r = %v m is inside the opening of radius %v m", r, a))
	}
	q := a / r
	q *= q
	if q > 1 {
		q = 1 // r within rounding of the wall
	}
	q2 := q * q
	t0, t1, t2 := &y.t0, &y.t1, &y.t2
	return insitu.Tensor{
		NN: t0.NN + q*t1.NN + q2*t2.NN,
		EE: t0.EE + q*t1.EE + q2*t2.EE,
		DD: t0.DD + q*t1.DD + q2*t2.DD,
		NE: t0.NE + q*t1.NE + q2*t2.NE,
		ND: t0.ND + q*t1.ND + q2*t2.ND,
		ED: t0.ED + q*t1.ED + q2*t2.ED,
	}
}
