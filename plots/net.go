package plots

import (
	"image"
	"image/color"
	"math"

	"cleft/insitu/geom"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// net maps net coordinates onto the canvas.
type net struct {
	c      *draw.Canvas
	cx, cy vg.Length
	r      vg.Length
}

func (n net) pt(p Point) vg.Point {
	return vg.Point{X: n.cx + vg.Length(p.X)*n.r, Y: n.cy + vg.Length(p.Y)*n.r}
}

func (n net) path(pts []Point) []vg.Point {
	out := make([]vg.Point, len(pts))
	for i, p := range pts {
		out[i] = n.pt(p)
	}
	return out
}

// drawRaster draws the values of f inside the primitive, coloured by clr
// (NaN in the undefined grey), with an anti-aliased edge.
func drawRaster(n net, f *Field, clr func(float64) color.NRGBA) {
	img := image.NewNRGBA(image.Rect(0, 0, f.N, f.N))
	px := 2 / float64(f.N-1) // node spacing in net units
	for j := range f.N {
		for i := range f.N {
			p := f.Node(i, j)
			r := math.Hypot(p.X, p.Y)
			alpha := math.Max(0, math.Min(1, (1-r)/px+0.5))
			if alpha == 0 {
				continue
			}
			c := undefinedFill
			if v := f.Values[j*f.N+i]; !math.IsNaN(v) {
				c = clr(v)
			}
			c.A = uint8(255 * alpha)
			img.SetNRGBA(i, j, c)
		}
	}
	half := vg.Length(1+px/2) * n.r
	n.c.DrawImage(vg.Rectangle{Min: vg.Point{X: n.cx - half, Y: n.cy - half}, Max: vg.Point{X: n.cx + half, Y: n.cy + half}}, img)
}

// tickOut is the length of the longest tick outside the primitive, in net
// units.
const tickOut = 0.05

// northStyle is the style of the N mark.
func (l look) northStyle() draw.TextStyle { return l.text(9, 6.5, true, ink) }

// northBox returns the glyph box of the N mark: centred over the north
// tick, just clear of it.
func (n net) northBox(l look) vg.Rectangle {
	sty := l.northStyle()
	w, _ := textBox(sty, "N")
	top := n.pt(Point{X: 0, Y: 1 + tickOut})
	_, h := textBox(sty, "N")
	return boxOf(sty, top.X-w/2, top.Y+vg.Points(1.5)+h, "N")
}

// drawPrimitiveLook draws the primitive circle, its 10° ticks (longer every
// 90°), the N mark and the centre cross, sized by l.
func drawPrimitiveLook(n net, l look) {
	n.c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.1)}, circlePath(n, 1, 360))
	for a := 0; a < 360; a += 10 {
		s, c := geom.SinCosDeg(float64(a))
		t := tickOut / 2
		if a%90 == 0 {
			t = tickOut
		}
		in := n.pt(Point{X: s, Y: c})
		out := n.pt(Point{X: s * (1 + t), Y: c * (1 + t)})
		n.c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.8)}, in.X, in.Y, out.X, out.Y)
	}
	nb := n.northBox(l)
	putText(n.c, l.northStyle(), nb.Min.X, nb.Max.Y, "N")
	d := vg.Points(3)
	n.c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.6)}, n.cx-d, n.cy, n.cx+d, n.cy)
	n.c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.6)}, n.cx, n.cy-d, n.cx, n.cy+d)
}

func circlePath(n net, r float64, k int) []vg.Point {
	pts := make([]vg.Point, k+1)
	for i := range pts {
		s, c := math.Sincos(2 * math.Pi * float64(i) / float64(k))
		pts[i] = n.pt(Point{X: r * s, Y: r * c})
	}
	return pts
}

// drawGrid draws circles of equal plunge and radials of equal trend, every 10°.
func drawGrid(n net, p Projection) {
	sty := draw.LineStyle{Color: color.NRGBA{A: 0x50}, Width: vg.Points(0.4)}
	for pl := 10.0; pl < 90; pl += 10 {
		r := p.Radius((90 - pl) * math.Pi / 180)
		n.c.StrokeLines(sty, circlePath(n, r, 180))
	}
	inner := p.Radius(10 * math.Pi / 180) // radials stop at plunge 80°
	for a := 0; a < 360; a += 10 {
		s, c := geom.SinCosDeg(float64(a))
		n.c.StrokeLines(sty, []vg.Point{n.pt(Point{X: s * inner, Y: c * inner}), n.pt(Point{X: s, Y: c})})
	}
}
