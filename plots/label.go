package plots

import (
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// labeller places the names on a figure so that no name lies over another
// text, over a symbol or outside its bounds. Names go beside their symbol
// when there is room there, else further out with a thin leader line back
// to the symbol; a name that finds no room is left out and counted.
type labeller struct {
	bounds  vg.Rectangle   // names stay inside
	taken   []vg.Rectangle // symbols and texts already on the figure
	texts   []vg.Rectangle // texts among taken: leaders do not cross them
	pad     vg.Length      // free space kept round every name
	dropped int            // names that found no room
	names   []placedName
}

// placedName is a name with its box and its leader (From = To: none).
type placedName struct {
	sty      draw.TextStyle
	txt      string
	box      vg.Rectangle // the glyph box
	from, to vg.Point
}

// block marks r as taken by a symbol.
func (p *labeller) block(r vg.Rectangle) { p.taken = append(p.taken, r) }

// blockText marks r as taken by a text.
func (p *labeller) blockText(r vg.Rectangle) {
	p.taken = append(p.taken, r)
	p.texts = append(p.texts, r)
}

// square returns the box of half-side r round at.
func square(at vg.Point, r vg.Length) vg.Rectangle {
	return vg.Rectangle{Min: vg.Point{X: at.X - r, Y: at.Y - r}, Max: vg.Point{X: at.X + r, Y: at.Y + r}}
}

func grow(r vg.Rectangle, d vg.Length) vg.Rectangle {
	return vg.Rectangle{Min: vg.Point{X: r.Min.X - d, Y: r.Min.Y - d}, Max: vg.Point{X: r.Max.X + d, Y: r.Max.Y + d}}
}

func overlaps(a, b vg.Rectangle) bool {
	return a.Min.X < b.Max.X && b.Min.X < a.Max.X && a.Min.Y < b.Max.Y && b.Min.Y < a.Max.Y
}

func inside(a, b vg.Rectangle) bool {
	return a.Min.X >= b.Min.X && a.Max.X <= b.Max.X && a.Min.Y >= b.Min.Y && a.Max.Y <= b.Max.Y
}

// free reports whether a name with glyph box r fits: inside the bounds and
// clear of everything taken, by the halo and the pad.
func (p *labeller) free(r vg.Rectangle) bool {
	g := grow(r, haloSize+p.pad)
	if !inside(grow(r, haloSize), p.bounds) {
		return false
	}
	for _, t := range p.taken {
		if overlaps(g, t) {
			return false
		}
	}
	return true
}

// segmentHits reports whether the segment a–b crosses rectangle r.
func segmentHits(a, b vg.Point, r vg.Rectangle) bool {
	// Liang–Barsky clipping of the segment against r.
	t0, t1 := 0.0, 1.0
	dx, dy := float64(b.X-a.X), float64(b.Y-a.Y)
	for _, e := range [4][2]float64{
		{-dx, float64(a.X - r.Min.X)}, {dx, float64(r.Max.X - a.X)},
		{-dy, float64(a.Y - r.Min.Y)}, {dy, float64(r.Max.Y - a.Y)},
	} {
		pp, q := e[0], e[1]
		if pp == 0 {
			if q < 0 {
				return false
			}
			continue
		}
		t := q / pp
		if pp < 0 {
			t0 = math.Max(t0, t)
		} else {
			t1 = math.Min(t1, t)
		}
		if t0 > t1 {
			return false
		}
	}
	return true
}

// nearest returns the point of r nearest to a.
func nearest(r vg.Rectangle, a vg.Point) vg.Point {
	return vg.Point{X: max(r.Min.X, min(a.X, r.Max.X)), Y: max(r.Min.Y, min(a.Y, r.Max.Y))}
}

// place puts txt in sty near a symbol at a of half-size rad: beside it in
// one of eight places (the one nearest the direction prefer, radians
// anticlockwise from east, first; NaN: east first), else on up to rings
// rings further out with a leader. It reports whether the name was placed;
// a name not placed with rings > 0 is counted as dropped.
func (p *labeller) place(sty draw.TextStyle, txt string, a vg.Point, rad vg.Length, prefer float64, rings int) bool {
	w, h := textBox(sty, txt)
	if math.IsNaN(prefer) {
		prefer = 0
	}
	gap := p.pad + haloSize + vg.Points(0.8)
	boxAt := func(theta float64, d vg.Length) vg.Rectangle {
		// (u, v) is theta's direction taken to the square of half-side 1;
		// the box touches the point a + d·(u, v) of the square of half-side
		// d round a: with the middle of its near side when theta is level
		// or upright, with its near corner on the diagonals, in between
		// else, so that it lies d clear of a and as near as that allows.
		s, c := math.Sincos(theta)
		k := 1 / math.Max(math.Abs(c), math.Abs(s))
		u, v := vg.Length(c*k), vg.Length(s*k)
		cx, cy := a.X+d*u+u*w/2, a.Y+d*v+v*h/2
		return vg.Rectangle{Min: vg.Point{X: cx - w/2, Y: cy - h/2}, Max: vg.Point{X: cx + w/2, Y: cy + h/2}}
	}
	// Beside the symbol: eight directions, nearest to prefer first.
	for _, th := range directions(prefer, 8) {
		if r := boxAt(th, rad+gap); p.free(r) {
			p.put(sty, txt, r, a, a)
			return true
		}
	}
	// Further out, with a leader from the symbol's edge: first a leader
	// that crosses no text, then any.
	step := h + p.pad
	for _, cross := range [2]bool{false, true} {
		for ring := 1; ring <= rings; ring++ {
			d := rad + gap + vg.Length(ring)*step
			for _, th := range directions(prefer, 32) {
				r := boxAt(th, d)
				if !p.free(r) {
					continue
				}
				s, c := math.Sincos(th)
				from := vg.Point{X: a.X + vg.Length(c)*rad, Y: a.Y + vg.Length(s)*rad}
				to := nearest(grow(r, haloSize), from)
				if !cross && p.crossesText(from, to) {
					continue
				}
				p.put(sty, txt, r, from, to)
				return true
			}
		}
	}
	if rings > 0 {
		p.dropped++
	}
	return false
}

// directions returns n directions round the circle, ordered by their
// angle from prefer.
func directions(prefer float64, n int) []float64 {
	out := make([]float64, 0, n)
	out = append(out, prefer)
	for k := 1; len(out) < n; k++ {
		d := 2 * math.Pi * float64(k) / float64(n)
		out = append(out, prefer+d)
		if len(out) < n {
			out = append(out, prefer-d)
		}
	}
	return out
}

func (p *labeller) crossesText(a, b vg.Point) bool {
	for _, t := range p.texts {
		if segmentHits(a, b, t) {
			return true
		}
	}
	return false
}

func (p *labeller) put(sty draw.TextStyle, txt string, r vg.Rectangle, from, to vg.Point) {
	p.blockText(grow(r, haloSize))
	p.names = append(p.names, placedName{sty: sty, txt: txt, box: r, from: from, to: to})
}

// draw draws the leaders, then the names over white halos.
func (p *labeller) draw(c *draw.Canvas) {
	lead := draw.LineStyle{Color: ink, Width: vg.Points(0.5)}
	for _, n := range p.names {
		if n.from != n.to {
			c.StrokeLine2(draw.LineStyle{Color: white, Width: vg.Points(1.6)}, n.from.X, n.from.Y, n.to.X, n.to.Y)
			c.StrokeLine2(lead, n.from.X, n.from.Y, n.to.X, n.to.Y)
		}
	}
	for _, n := range p.names {
		putHalo(c, n.sty, n.box.Min.X, n.box.Max.Y, n.txt)
	}
}
