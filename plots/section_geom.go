package plots

import (
	"math"

	"gonum.org/v1/plot/vg"
)

// lobe is a run of consecutive rays that meet a zone: each ray's angle and
// the zone's least and greatest radius on it. full marks a run all round.
type lobe struct {
	theta, inner, outer []float64
	full                bool
}

// lobes splits the spans of z into runs of consecutive rays (a run through
// the crown is one), with radii clipped to the view radius w.
func lobes(z SectionZone, w float64) []lobe {
	n := len(z.Theta)
	in := func(k int) bool { return !math.IsNaN(z.Inner[k]) && z.Inner[k] < w }
	start := -1
	for k := range n {
		if !in(k) {
			start = k
			break
		}
	}
	add := func(l *lobe, k int) {
		l.theta = append(l.theta, z.Theta[k])
		l.inner = append(l.inner, z.Inner[k])
		l.outer = append(l.outer, math.Min(z.Outer[k], w))
	}
	if start < 0 {
		l := lobe{full: true}
		for k := range n {
			add(&l, k)
		}
		return []lobe{l}
	}
	var out []lobe
	var cur *lobe
	for j := 1; j <= n; j++ {
		k := (start + j) % n
		if !in(k) {
			cur = nil
			continue
		}
		if cur == nil {
			out = append(out, lobe{})
			cur = &out[len(out)-1]
		}
		add(cur, k)
	}
	return out
}

// fill returns the polygon of the lobe: the outer edge forward and the
// inner edge back; for a full ring, both rings joined by a seam, so that the
// hole stays empty under either fill rule.
func (l lobe) fill(pt func(theta, r float64) vg.Point) []vg.Point {
	var p []vg.Point
	for i := range l.theta {
		p = append(p, pt(l.theta[i], l.outer[i]))
	}
	if l.full {
		p = append(p, p[0])
		q := len(l.theta)
		p = append(p, pt(l.theta[0], l.inner[0]))
		for i := q - 1; i >= 0; i-- {
			p = append(p, pt(l.theta[i], l.inner[i]))
		}
		return p
	}
	for i := len(l.theta) - 1; i >= 0; i-- {
		p = append(p, pt(l.theta[i], l.inner[i]))
	}
	return p
}

// edges returns the outlines of the lobe: one closed line, or the outer
// and inner rings of a full one.
func (l lobe) edges(pt func(theta, r float64) vg.Point) [][]vg.Point {
	if !l.full {
		p := l.fill(pt)
		return [][]vg.Point{append(p, p[0])}
	}
	var o, in []vg.Point
	for i := range l.theta {
		o = append(o, pt(l.theta[i], l.outer[i]))
		in = append(in, pt(l.theta[i], l.inner[i]))
	}
	return [][]vg.Point{append(o, o[0]), append(in, in[0])}
}

// chordOutside returns the parts of the line p(s) = o + s·d (d a unit
// vector, coordinates in m from the axis) that lie in the annulus a ≤ |p| ≤
// w, as pairs of end points.
func chordOutside(o, d [2]float64, a, w float64) [][2][2]float64 {
	// |o + s d|² = R²: s = −b ± √(b² − c), b = o·d, c = |o|² − R².
	b := o[0]*d[0] + o[1]*d[1]
	oo := o[0]*o[0] + o[1]*o[1]
	roots := func(r float64) (float64, float64, bool) {
		disc := b*b - (oo - r*r)
		if disc <= 0 {
			return 0, 0, false
		}
		q := math.Sqrt(disc)
		return -b - q, -b + q, true
	}
	at := func(s float64) [2]float64 { return [2]float64{o[0] + s*d[0], o[1] + s*d[1]} }
	s0, s1, ok := roots(w)
	if !ok {
		return nil
	}
	h0, h1, hit := roots(a)
	if !hit || h1 <= s0 || h0 >= s1 {
		return [][2][2]float64{{at(s0), at(s1)}}
	}
	var out [][2][2]float64
	if h0 > s0 {
		out = append(out, [2][2]float64{at(s0), at(h0)})
	}
	if h1 < s1 {
		out = append(out, [2][2]float64{at(h1), at(s1)})
	}
	return out
}
