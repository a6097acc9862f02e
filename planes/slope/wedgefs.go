package slope

import (
	"math"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Strength is the shear strength of the two planes of a wedge: friction
// angles φ in degrees, cohesions c in MPa.
type Strength struct {
	PhiA, PhiB float64
	CA, CB     float64
}

// WedgeResult is the limit equilibrium of a wedge under one set of forces.
type WedgeResult struct {
	Mode    Mode    // WedgeBoth, WedgeOnFirst (A), WedgeOnSecond (B) or LiftOff
	FS      float64 // factor of safety; 0 on lift-off, +Inf when nothing drives the block
	NA, NB  float64 // effective normal reactions on A and B, MN; 0 on a plane out of contact
	Driving float64 // the force along the direction of sliding, MN
	UA, UB  float64 // water forces on A and B, MN
	V       float64 // water force on the crack face, MN
}

// Water returns the water forces on A, B and the crack face (MN) for a head
// of h m of water at the block's deepest wet point, capped at Saturated:
//
//   - with a crack, water stands h above the crack's foot on the line of
//     intersection; the crack face carries the hydrostatic pressure
//     γw·(level − elevation) below the level; on A and B the pressure is
//     that same hydrostatic pressure along their edges on the crack, 0
//     along their traces on the face and the top, and linear on each
//     triangle of the fan from O in between (the three-dimensional form
//     of Hoek & Bray's planar assumption: full at the crack, nothing at the
//     toe);
//   - without a crack, the pressure on A and B is γw·h at the middle of the
//     line of intersection and 0 along the face and the top, linear in
//     between, so each plane carries γw·h·area/3 (Hoek & Bray 1981: the
//     saturated wedge has ½γw·H at the middle of the line).
//
// γw = insitu.Hydrostatic (0.00981 MN/m³).
func (w *WedgeBlock) Water(h float64) (uA, uB, v float64) {
	h = math.Min(math.Max(h, 0), w.Saturated)
	if h == 0 {
		return 0, 0, 0
	}
	const gw = insitu.Hydrostatic
	if !w.HasCrack() {
		return gw * h * w.AreaA / 3, gw * h * w.AreaB / 3, 0
	}
	level := w.PeakElevation() + h
	hydro := func(p r3.Vec) float64 { return gw * math.Max(0, level+p.Z) }
	onCrackPlane := func(p r3.Vec) bool { return math.Abs(r3.Dot(w.crackOut, r3.Sub(p, w.peak))) < 1e-7 }
	for _, f := range w.faces {
		switch f.plane {
		case onA, onB:
			ps := wetEdges(f.pts, onCrackPlane, level)
			// Fan from O, the vertex nearest the origin.
			k := 0
			for i, p := range ps {
				if r3.Norm(p) < r3.Norm(ps[k]) {
					k = i
				}
			}
			ps = append(ps[k:], ps[:k]...)
			vs := make([]float64, len(ps))
			for i, p := range ps {
				if onCrackPlane(p) {
					vs[i] = hydro(p)
				}
			}
			if f.plane == onA {
				uA = linearIntegral(ps, vs)
			} else {
				uB = linearIntegral(ps, vs)
			}
		case onCrack:
			wet := clip([]blockFace{f}, r3.Vec{Z: -1}, level, -1) // below the level: −z ≤ level
			for _, g := range wet {
				if g.plane != onCrack {
					continue
				}
				vs := make([]float64, len(g.pts))
				for i, p := range g.pts {
					vs[i] = hydro(p)
				}
				v = linearIntegral(g.pts, vs)
			}
		}
	}
	return uA, uB, v
}

// wetEdges inserts, on each edge of the polygon that lies in the crack
// plane, the point where it crosses the water level, so that the
// hydrostatic pressure along the crack is piecewise linear on the polygon.
func wetEdges(ps []r3.Vec, onCrack func(r3.Vec) bool, level float64) []r3.Vec {
	var out []r3.Vec
	for i, a := range ps {
		b := ps[(i+1)%len(ps)]
		out = append(out, a)
		if onCrack(a) && onCrack(b) {
			ea, eb := -a.Z-level, -b.Z-level
			if (ea < 0 && eb > 0) || (ea > 0 && eb < 0) {
				out = append(out, r3.Add(a, r3.Scale(ea/(ea-eb), r3.Sub(b, a))))
			}
		}
	}
	return out
}

// Solve returns the limit equilibrium of the block with h m of water (see
// Water) and the external load ld, after the vector method of Hoek & Bray's
// (1981) comprehensive solution. The active forces are the weight W, the
// water forces UA·n̂A, UB·n̂B (n̂ into the block) and V (from the crack
// towards the face), the seismic force α·W horizontal along the line's
// trend, and the bolt force. The normal reactions NA, NB ≥ 0 solve the
// equilibrium perpendicular to the line,
//
//	F·n̂A + NA + NB·(n̂A·n̂B) = 0,  F·n̂B + NA·(n̂A·n̂B) + NB = 0,
//
// when both come out positive: the block slides along the line and
//
//	FS = (NA tan φA + NB tan φB + cA·AreaA + cB·AreaB) / (F·l̂).
//
// Contact is lost on a plane whose reaction is not positive: the block then
// slides on the other plane alone, NA = −F·n̂A, in the direction of F's
// component in that plane, FS = (NA tan φA + cA·AreaA)/|F − (F·n̂A)n̂A|;
// when it can rest on neither (F pushes it off both), it lifts off (FS = 0).
// Which case holds is unique (the complementarity problem of the two
// contacts, whose matrix [[1, n̂A·n̂B], [n̂A·n̂B, 1]] is positive definite).
func (w *WedgeBlock) Solve(st Strength, h float64, ld Load) WedgeResult {
	var r WedgeResult
	r.UA, r.UB, r.V = w.Water(h)
	f := r3.Vec{Z: w.Weight}
	f = r3.Add(f, r3.Add(r3.Scale(r.UA, w.NormalA), r3.Scale(r.UB, w.NormalB)))
	if r.V > 0 {
		f = r3.Sub(f, r3.Scale(r.V, w.crackOut))
	}
	if ld.Seismic != 0 {
		hz := r3.Unit(r3.Vec{X: w.Line.X, Y: w.Line.Y})
		f = r3.Add(f, r3.Scale(ld.Seismic*w.Weight, hz))
	}
	if ld.Bolt != 0 {
		f = r3.Add(f, r3.Scale(ld.Bolt, ld.direction(w.Line, w.Plunge)))
	}
	var nA, nB float64
	r.Mode, nA, nB = reactions(f, w.NormalA, w.NormalB)
	tA, tB := math.Tan(st.PhiA*math.Pi/180), math.Tan(st.PhiB*math.Pi/180)
	var res float64
	switch r.Mode {
	case WedgeBoth:
		r.NA, r.NB = nA, nB
		r.Driving = r3.Dot(f, w.Line)
		res = nA*tA + nB*tB + st.CA*w.AreaA + st.CB*w.AreaB
	case WedgeOnFirst:
		r.NA = nA
		r.Driving = r3.Norm(r3.Sub(f, r3.Scale(r3.Dot(f, w.NormalA), w.NormalA)))
		res = nA*tA + st.CA*w.AreaA
	case WedgeOnSecond:
		r.NB = nB
		r.Driving = r3.Norm(r3.Sub(f, r3.Scale(r3.Dot(f, w.NormalB), w.NormalB)))
		res = nB*tB + st.CB*w.AreaB
	default:
		return r // lift-off: FS 0
	}
	if r.Driving <= 0 {
		r.FS = math.Inf(1)
	} else {
		r.FS = res / r.Driving
	}
	return r
}

// reactions solves the contact of a rigid block on two planes of inward unit
// normals na, nb under the resultant f of the active forces: the mode and
// the normal reactions (0 where contact is lost). See Solve.
func reactions(f, na, nb r3.Vec) (Mode, float64, float64) {
	qa, qb, c := r3.Dot(f, na), r3.Dot(f, nb), r3.Dot(na, nb)
	det := 1 - c*c
	NA, NB := (-qa+c*qb)/det, (-qb+c*qa)/det
	switch {
	case NA > 0 && NB > 0:
		return WedgeBoth, NA, NB
	case -qa > 0 && qb-c*qa >= 0:
		return WedgeOnFirst, -qa, 0
	case -qb > 0 && qa-c*qb >= 0:
		return WedgeOnSecond, 0, -qb
	}
	return LiftOff, 0, 0
}

// WeightMode is the mode in which the wedge of planes a and b on face f
// moves under its weight alone (the mechanics of Solve with no water and no
// load; it does not depend on the block's size): WedgeBoth, WedgeOnFirst,
// WedgeOnSecond, or LiftOff for a block that both planes overhang (it
// falls). When the planes' traces on the face give no side (a plane
// parallel to the face, or striking with it), the block is taken to rest on
// both planes, the classical wedge.
func WeightMode(a, b, f planes.Orientation) Mode {
	na, nb, _, _, ok := sides(a, b, f)
	if !ok {
		na, nb = r3.Scale(-1, a.Normal()), r3.Scale(-1, b.Normal())
	}
	m, _, _ := reactions(r3.Vec{Z: 1}, na, nb)
	return m
}
