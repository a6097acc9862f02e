package slope

import (
	"math"
	"sort"

	"gonum.org/v1/gonum/spatial/r3"
)

// Small convex-polyhedron helpers for the wedge: a block is a list of
// planar faces, each a convex polygon tagged with the plane it lies in.

// blockFace is one face of a convex block: the polygon and the plane it lies in.
type blockFace struct {
	plane int // one of the wedge plane tags (onA, onB, ...)
	pts   []r3.Vec
}

// clip keeps the part of the block where out·x ≤ d and closes the cut with a
// new face tagged tag (none when the plane misses the block).
func clip(faces []blockFace, out r3.Vec, d float64, tag int) []blockFace {
	const eps = 1e-9
	var kept []blockFace
	var cut []r3.Vec
	for _, f := range faces {
		var p []r3.Vec
		n := len(f.pts)
		for i := range n {
			a, b := f.pts[i], f.pts[(i+1)%n]
			da, db := r3.Dot(out, a)-d, r3.Dot(out, b)-d
			if da <= eps {
				p = append(p, a)
			}
			if (da < -eps && db > eps) || (da > eps && db < -eps) {
				x := r3.Add(a, r3.Scale(da/(da-db), r3.Sub(b, a)))
				p = append(p, x)
				cut = append(cut, x)
			}
			if math.Abs(da) <= eps {
				cut = append(cut, a)
			}
		}
		if len(p) >= 3 && polygonArea(p) > 0 {
			kept = append(kept, blockFace{plane: f.plane, pts: p})
		}
	}
	if c := ordered(dedupe(cut), out); len(c) >= 3 && polygonArea(c) > 0 {
		kept = append(kept, blockFace{plane: tag, pts: c})
	}
	return kept
}

// dedupe drops points within 1e-9 m of an earlier one.
func dedupe(ps []r3.Vec) []r3.Vec {
	var out []r3.Vec
	for _, p := range ps {
		seen := false
		for _, q := range out {
			if r3.Norm(r3.Sub(p, q)) < 1e-9 {
				seen = true
				break
			}
		}
		if !seen {
			out = append(out, p)
		}
	}
	return out
}

// ordered sorts coplanar points by angle round their mean in the plane of
// normal n, making a convex polygon of them.
func ordered(ps []r3.Vec, n r3.Vec) []r3.Vec {
	if len(ps) < 3 {
		return ps
	}
	var m r3.Vec
	for _, p := range ps {
		m = r3.Add(m, p)
	}
	m = r3.Scale(1/float64(len(ps)), m)
	u := r3.Unit(r3.Sub(ps[0], m))
	v := r3.Cross(r3.Unit(n), u)
	ang := make([]float64, len(ps))
	idx := make([]int, len(ps))
	for i, p := range ps {
		d := r3.Sub(p, m)
		ang[i], idx[i] = math.Atan2(r3.Dot(d, v), r3.Dot(d, u)), i
	}
	sort.Slice(idx, func(i, j int) bool { return ang[idx[i]] < ang[idx[j]] })
	out := make([]r3.Vec, len(ps))
	for i, k := range idx {
		out[i] = ps[k]
	}
	return out
}

// vectorArea is ½ Σ pᵢ × pᵢ₊₁, normal to a planar polygon with the
// polygon's area as its length.
func vectorArea(ps []r3.Vec) r3.Vec {
	var s r3.Vec
	for i := range ps {
		s = r3.Add(s, r3.Cross(ps[i], ps[(i+1)%len(ps)]))
	}
	return r3.Scale(0.5, s)
}

func polygonArea(ps []r3.Vec) float64 { return r3.Norm(vectorArea(ps)) }

// linearIntegral integrates over a convex polygon the function that is
// linear on each triangle of the fan from ps[0] and takes the values vs at
// the vertices: Σ area · (mean of its three vertex values).
func linearIntegral(ps []r3.Vec, vs []float64) float64 {
	s := 0.0
	for i := 1; i+1 < len(ps); i++ {
		a := polygonArea([]r3.Vec{ps[0], ps[i], ps[i+1]})
		s += a * (vs[0] + vs[i] + vs[i+1]) / 3
	}
	return s
}

// volume of a closed convex block whose faces have the outward unit normals
// outs[plane]: V = ⅓ Σ area · (n̂ · p) over the faces (divergence theorem).
func volume(faces []blockFace, outs map[int]r3.Vec) float64 {
	v := 0.0
	for _, f := range faces {
		v += polygonArea(f.pts) * r3.Dot(outs[f.plane], f.pts[0]) / 3
	}
	return v
}
