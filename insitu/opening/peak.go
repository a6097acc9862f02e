package opening

import (
	"math"

	"cleft/insitu"
	"cleft/insitu/geom"
)

// Peak is the largest value round the wall of a stress of the opening and
// where it occurs: Stress in MPa, compression positive, and Theta in
// degrees from the crown, clockwise looking along the drive, in [0, 180).
// The wall stresses of a uniform far field repeat every 180°, so the same
// peak also occurs at Theta + 180.
type Peak struct {
	Stress, Theta float64
}

// MaxTangential returns the largest tangential stress at the wall of a
// circular opening, from the closed form: with A = σ11 + σ22 − pᵢ,
// B = 2(σ11 − σ22) and C = 4σ12 (far field in the tunnel frame, see Wall;
// pᵢ the support pressure, MPa),
//
//	σθ(θ) = A − B cos 2θ − C sin 2θ,  σθ,max = A + √(B² + C²)  at 2θ = atan2(−C, −B)
//
// When the section is isotropic (B = C = 0) σθ is the same all round and
// Theta is 0.
func MaxTangential(far insitu.Tensor, support float64) Peak {
	a := far.NN + far.EE - support
	b := 2 * (far.NN - far.EE)
	c := 4 * far.NE
	if b == 0 && c == 0 {
		return Peak{Stress: a, Theta: 0}
	}
	th := math.Atan2(-c, -b) / 2 * geom.Deg // [−90, 90]
	return Peak{Stress: a + math.Hypot(b, c), Theta: halfTurn(th)}
}

// WallPrincipal returns the largest principal stress in the plane of the
// wall (the tangent plane, spanned by eθ and the axis):
//
//	σmax = (σθ + σz)/2 + √((σθ − σz)²/4 + τθz²)
//
// The third principal stress at the wall is σr = pᵢ, normal to it.
func (w WallStress) WallPrincipal() float64 {
	h := (w.Theta - w.Z) / 2
	return (w.Theta+w.Z)/2 + math.Sqrt(h*h+w.ThetaZ*w.ThetaZ)
}

// MaxWallPrincipal returns the largest principal stress in the plane of the
// wall round a circular opening (WallStress.WallPrincipal, with σθ lowered
// by the support pressure pᵢ, MPa) and where it occurs. far is the far
// field in the tunnel frame, nu Poisson's ratio. The largest principal
// stress at the wall overall is max(Stress, pᵢ): σr = pᵢ is the third.
//
// σmax(θ) has period 180°. It is sampled every 2.5° to bracket each local
// maximum, and each bracket is then narrowed by golden-section search to
// 1e-9° before the largest is kept: the peak is located, not read off the
// samples. A flat σmax (an isotropic section with τθz = 0) gives the first
// sample, Theta = 0. MaxWallPrincipal does not allocate.
func MaxWallPrincipal(far insitu.Tensor, nu, support float64) Peak {
	f := func(th float64) float64 {
		w := Wall(far, th, nu)
		w.Theta -= support
		return w.WallPrincipal()
	}
	const n = 72
	const step = 180.0 / n
	var v [n]float64
	for k := range v {
		v[k] = f(float64(k) * step)
	}
	best := Peak{Stress: math.Inf(-1)}
	for k := range v {
		prev, next := v[(k+n-1)%n], v[(k+1)%n]
		if !(v[k] >= prev && v[k] >= next) {
			continue
		}
		th := float64(k) * step
		x, fx := geom.GoldenMax(f, th-step, th+step, 1e-9)
		if fx < v[k] {
			x, fx = th, v[k]
		}
		if fx > best.Stress {
			best = Peak{Stress: fx, Theta: x}
		}
	}
	best.Theta = halfTurn(best.Theta)
	return best
}

// halfTurn reduces an angle in degrees to [0, 180), with no negative zero.
// An angle within halfTurnTol of 180 is the same place as 0 and is given as
// 0, so that it is never written as 180 once rounded.
func halfTurn(th float64) float64 {
	th = math.Mod(th, 180)
	if th < 0 {
		th += 180
	}
	if th >= 180-halfTurnTol || th == 0 {
		th = 0 // a tiny negative th rounds up to 180 above; −0 becomes +0
	}
	return th
}

// halfTurnTol is below the resolution of the tables' 8 significant digits
// at 180° (1e-5°).
const halfTurnTol = 1e-5
