package plots

import "math"

// Segment is a straight piece of a contour line on the net.
type Segment struct{ A, B Point }

// Contour returns the segments of the level line v = level through the grid
// of values (row-major, n × n, node positions from f.Node), by marching
// squares with linear interpolation along cell edges; an ambiguous (saddle)
// cell is resolved by its mean value. Cells with a NaN corner are skipped.
// The segments are clipped to the primitive.
func (f *Field) Contour(values []float64, level float64) []Segment {
	n := f.N
	var segs []Segment
	at := func(i, j int) float64 { return values[j*n+i] }
	for j := 0; j+1 < n; j++ {
		for i := 0; i+1 < n; i++ {
			// Corners counter-clockwise from top-left: tl, tr, br, bl.
			v := [4]float64{at(i, j), at(i+1, j), at(i+1, j+1), at(i, j+1)}
			p := [4]Point{f.Node(i, j), f.Node(i+1, j), f.Node(i+1, j+1), f.Node(i, j+1)}
			idx := 0
			skip := false
			for k, x := range v {
				if math.IsNaN(x) {
					skip = true
					break
				}
				if x >= level {
					idx |= 1 << k
				}
			}
			if skip || idx == 0 || idx == 15 {
				continue
			}
			// edge k joins corner k and corner k+1.
			cross := func(k int) Point {
				a, b := k, (k+1)%4
				t := (level - v[a]) / (v[b] - v[a])
				return Point{p[a].X + t*(p[b].X-p[a].X), p[a].Y + t*(p[b].Y-p[a].Y)}
			}
			var edges []int
			for k := range 4 {
				if (idx>>k)&1 != (idx>>((k+1)%4))&1 {
					edges = append(edges, k)
				}
			}
			if len(edges) == 2 {
				segs = appendClipped(segs, cross(edges[0]), cross(edges[1]))
				continue
			}
			// Saddle: four crossings. Pair each edge with its neighbour on
			// the side the centre value says is connected.
			centre := (v[0] + v[1] + v[2] + v[3]) / 4
			high0 := idx&1 != 0
			if (centre >= level) == high0 {
				// Corner 0's region reaches the centre: cut off corners 1 and 3.
				segs = appendClipped(segs, cross(0), cross(1))
				segs = appendClipped(segs, cross(2), cross(3))
			} else {
				segs = appendClipped(segs, cross(3), cross(0))
				segs = appendClipped(segs, cross(1), cross(2))
			}
		}
	}
	return segs
}

// appendClipped appends the part of segment a–b inside the unit circle.
func appendClipped(segs []Segment, a, b Point) []Segment {
	ina, inb := a.X*a.X+a.Y*a.Y <= 1, b.X*b.X+b.Y*b.Y <= 1
	if ina && inb {
		return append(segs, Segment{a, b})
	}
	// Solve |a + t(b − a)| = 1.
	dx, dy := b.X-a.X, b.Y-a.Y
	qa := dx*dx + dy*dy
	qb := 2 * (a.X*dx + a.Y*dy)
	qc := a.X*a.X + a.Y*a.Y - 1
	disc := qb*qb - 4*qa*qc
	if qa == 0 || disc < 0 {
		return segs
	}
	sq := math.Sqrt(disc)
	t0, t1 := (-qb-sq)/(2*qa), (-qb+sq)/(2*qa)
	t0, t1 = math.Max(t0, 0), math.Min(t1, 1)
	if t0 >= t1 {
		return segs
	}
	pt := func(t float64) Point { return Point{a.X + t*dx, a.Y + t*dy} }
	return append(segs, Segment{pt(t0), pt(t1)})
}

// Chain joins segments that share end points into polylines, so that a
// contour is drawn as a few paths rather than thousands of pieces. End
// points are matched after rounding to 1e-9 of the net radius.
func Chain(segs []Segment) [][]Point {
	type key [2]int64
	k := func(p Point) key { return key{int64(math.Round(p.X * 1e9)), int64(math.Round(p.Y * 1e9))} }
	ends := make(map[key][]int, 2*len(segs))
	for i, s := range segs {
		ends[k(s.A)] = append(ends[k(s.A)], i)
		ends[k(s.B)] = append(ends[k(s.B)], i)
	}
	used := make([]bool, len(segs))
	// next returns an unused segment touching p and its far end.
	next := func(p Point) (Point, bool) {
		for _, i := range ends[k(p)] {
			if used[i] {
				continue
			}
			used[i] = true
			if k(segs[i].A) == k(p) {
				return segs[i].B, true
			}
			return segs[i].A, true
		}
		return Point{}, false
	}
	var lines [][]Point
	for i, s := range segs {
		if used[i] {
			continue
		}
		used[i] = true
		fwd := []Point{s.A, s.B}
		for p, ok := next(s.B); ok; p, ok = next(p) {
			fwd = append(fwd, p)
		}
		var back []Point
		for p, ok := next(s.A); ok; p, ok = next(p) {
			back = append(back, p)
		}
		line := make([]Point, 0, len(back)+len(fwd))
		for j := len(back) - 1; j >= 0; j-- {
			line = append(line, back[j])
		}
		lines = append(lines, append(line, fwd...))
	}
	return lines
}
