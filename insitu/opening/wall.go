package opening

import (
	"cleft/insitu"
	"cleft/insitu/geom"
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// TunnelFrame returns the axes of a tunnel driven along the line axis
// (plunge negative for a rising drive): Up, the upward unit normal to the
// axis in its vertical plane; Right, the horizontal normal to the right
// looking along the drive (Right = Axis × Up); and Axis itself. (Up, Right,
// Axis) is right-handed. A vertical axis has no vertical plane: Up is then
// taken towards north.
func TunnelFrame(axis geom.Line) (up, right, along r3.Vec) {
	along = axis.Vec() // a negative plunge (rising drive) gives an upward component
	z := r3.Vec{Z: -1}
	up = r3.Sub(z, r3.Scale(r3.Dot(z, along), along))
	if r3.Norm(up) < 1e-12 {
		up = r3.Vec{X: 1}
	}
	up = r3.Unit(up)
	right = r3.Cross(along, up)
	return up, right, along
}

// WallStress is the stress at the wall of a circular opening: tangential
// σθ, axial σz and the shear τθz, MPa, compression positive; σr = τrθ =
// τrz = 0 at an unsupported wall.
type WallStress struct {
	Theta, Z, ThetaZ float64
}

// Wall returns the boundary stresses of a circular opening in an elastic
// far field, plane strain along the axis (Kirsch 1898; the general form of
// Hiramatsu & Oka 1962, as in Zoback 2007, Fig. 8.1). far holds the far
// field in the tunnel frame: NN = σ11 along Up, EE = σ22 along Right, DD =
// σ33 along the axis, NE = σ12, ND = σ13, ED = σ23. theta is the angle at
// the wall in degrees from Up towards Right (from the crown, clockwise
// looking along the drive), nu Poisson's ratio:
//
//	σθ = σ11 + σ22 − 2(σ11 − σ22) cos 2θ − 4σ12 sin 2θ
//	σz = σ33 − 2ν(σ11 − σ22) cos 2θ − 4νσ12 sin 2θ
//	τθz = 2(σ23 cos θ − σ13 sin θ)
//
// With a vertical far field p and horizontal Kp this is Brady & Brown's
// σθ = p[(1 + K) + 2(1 − K) cos 2θ] measured from the sidewall.
func Wall(far insitu.Tensor, theta, nu float64) WallStress {
	s, c := geom.SinCosDeg(theta)
	s2, c2 := geom.SinCosDeg(2 * theta)
	d := far.NN - far.EE
	return WallStress{
		Theta:  far.NN + far.EE - 2*d*c2 - 4*far.NE*s2,
		Z:      far.DD - 2*nu*d*c2 - 4*nu*far.NE*s2,
		ThetaZ: 2 * (far.ED*c - far.ND*s),
	}
}

// WallTensor returns the wall stress at theta as a full tensor in the NED
// frame, for resolving on planes: σ = σθ eθeθᵀ + σz aaᵀ + τθz(eθaᵀ + aeθᵀ),
// with eθ = −sin θ·Up + cos θ·Right the tangent to the wall and a the axis.
func (w WallStress) WallTensor(up, right, along r3.Vec, theta float64) insitu.Tensor {
	s, c := geom.SinCosDeg(theta)
	e := r3.Add(r3.Scale(-s, up), r3.Scale(c, right))
	a := along
	t := insitu.Tensor{}
	add := func(k float64, p, q r3.Vec) { // k·(p qᵀ + q pᵀ)/2 in symmetric form
		t.NN += k * p.X * q.X
		t.EE += k * p.Y * q.Y
		t.DD += k * p.Z * q.Z
		t.NE += k * (p.X*q.Y + q.X*p.Y) / 2
		t.ND += k * (p.X*q.Z + q.X*p.Z) / 2
		t.ED += k * (p.Y*q.Z + q.Y*p.Z) / 2
	}
	add(w.Theta, e, e)
	add(w.Z, a, a)
	add(2*w.ThetaZ, e, a)
	return t
}

// SpallingOnset is the ratio σmax/σc at which brittle failure (spalling)
// of the wall starts, about 0.4 ± 0.1 (Martin, Kaiser & McCreath 1999).
const SpallingOnset = 0.4

// Spalling is where a ratio σmax/σc sits against the onset of spalling of
// Martin, Kaiser & McCreath (1999), 0.4 ± 0.1. The zero value is
// SpallingUnknown, for an undefined ratio.
type Spalling int

const (
	SpallingUnknown Spalling = iota
	BelowOnset               // ratio < 0.3
	AtOnset                  // 0.3 ≤ ratio ≤ 0.5
	PastOnset                // ratio > 0.5
)

// SpallingOf returns the band of ratio; NaN gives SpallingUnknown.
func SpallingOf(ratio float64) Spalling {
	switch {
	case math.IsNaN(ratio):
		return SpallingUnknown
	case ratio < SpallingOnset-0.1:
		return BelowOnset
	case ratio <= SpallingOnset+0.1:
		return AtOnset
	}
	return PastOnset
}
