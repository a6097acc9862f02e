package plots

import (
	"fmt"
	"image/color"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// SectionZone is one plane or set on the cross-section of a tunnel.
type SectionZone struct {
	Name string
	// Theta, Inner and Outer are the zone's span on each ray of the search:
	// θ in degrees from the crown, clockwise looking along the drive, and
	// the least and greatest radius (m from the axis) of the zone on that
	// ray, NaN where the ray misses it.
	Theta, Inner, Outer []float64
	// Depth and Angle mark the deepest point of a zone whose depth is known
	// (m beyond the wall, degrees from the crown); NaN for none.
	Depth, Angle float64
	// Trace is the apparent dip of the set's trace in the section, degrees
	// from the right towards up in [0, 180); NaN when the set has none.
	Trace float64
	// Note is the key's lines for the zone, e.g. "deepest 1.60 m at 54°".
	Note []string
}

// TunnelSection is the cross-section of a circular opening at one station,
// looking along the drive (crown up, right sidewall right): each set's zone
// of potential slip filled and outlined in its own colour and dash, the
// set's joint traces drawn across the rock at their apparent dip, the
// deepest point of each bounded zone marked with its depth, and the zone
// depth limit as a dashed ring.
type TunnelSection struct {
	Site   string
	Lines  []string
	Radius float64 // of the opening, m
	Limit  float64 // zone depth limit beyond the wall, m
	Outer  float64 // outer radius of the search, m from the axis
	Zones  []SectionZone

	dropped int // names left out for want of room, in the last Draw
}

// zoneInk are the colours of the sets' zones, of this project's own choice:
// distinct in hue and in lightness, so the dashes and fills still part them
// in grey print.
// The tunnel profile draws its series in the same colours, in the same
// order, so a plane keeps its colour from one tunnel figure to the next;
// brick red comes last, away from the red of the FS = 1 line.
var zoneInk = []color.NRGBA{
	{R: 0x1f, G: 0x4e, B: 0x8c, A: 0xff}, // slate blue
	{R: 0xa8, G: 0x74, B: 0x00, A: 0xff}, // ochre
	{R: 0x2d, G: 0x6e, B: 0x4e, A: 0xff}, // moss green
	{R: 0x5e, G: 0x3a, B: 0x87, A: 0xff}, // violet
	{R: 0x55, G: 0x55, B: 0x55, A: 0xff}, // graphite
	{R: 0xb0, G: 0x1c, B: 0x1c, A: 0xff}, // brick red
}

func zoneStyle(i int) (draw.LineStyle, color.NRGBA) {
	c := zoneInk[i%len(zoneInk)]
	fill := c
	fill.A = 0x38
	return draw.LineStyle{Color: c, Width: vg.Points(1.3), Dashes: dashSet[i%len(dashSet)]}, fill
}

// view returns the radius of rock the figure shows, m from the axis: room
// for the deepest bounded zone and twice the limit, within the search.
func (t *TunnelSection) view() float64 {
	d := math.Max(2*t.Limit, 0.5*t.Radius)
	for _, z := range t.Zones {
		if !math.IsNaN(z.Depth) {
			d = math.Max(d, 1.3*z.Depth)
		}
	}
	return math.Min(t.Radius+d, t.Outer)
}

// sectionMarks are the compass of the section.
var sectionMarks = []struct {
	a   float64
	txt string
}{{0, "crown"}, {90, "right"}, {180, "invert"}, {270, "left"}}

// sectionRoom returns the room kept beside and above the view for the
// compass labels in look l.
func sectionRoom(l look) (side, top vg.Length) {
	for _, m := range sectionMarks {
		side = max(side, textWidth(l.keyText(), m.txt))
	}
	_, h := textBox(l.keyText(), "0")
	return side + l.pt(4), h + l.pt(4)
}

// sectionRadius is the radius of the view in main.
func sectionRadius(l look, main vg.Rectangle) vg.Length {
	side, top := sectionRoom(l)
	return max(0, min((main.Max.X-main.Min.X)/2-side, (main.Max.Y-main.Min.Y)/2-top))
}

// Draw draws the figure on c.
func (t *TunnelSection) Draw(c draw.Canvas) {
	w := t.view()
	f := layFrameOf(c, append([]string{t.Site}, t.Lines...), t.keys(w), func(l look, main vg.Rectangle) float64 { return float64(sectionRadius(l, main)) })
	l := f.l
	R := sectionRadius(l, f.main)
	side, top := sectionRoom(l)
	cx := f.main.Min.X + side + R
	if f.below {
		cx = (f.main.Min.X + f.main.Max.X) / 2
	}
	cy := f.main.Max.Y - top - R
	k := float64(R) / w // canvas points per metre
	pt := func(theta, r float64) vg.Point {
		s, co := math.Sincos(theta * math.Pi / 180)
		return vg.Point{X: cx + vg.Length(r*s*k), Y: cy + vg.Length(r*co*k)}
	}
	ring := func(r float64) []vg.Point {
		var out []vg.Point
		for a := 0.0; a <= 360; a += 2 {
			out = append(out, pt(a, r))
		}
		return out
	}
	// The rock within the view, and the opening.
	c.FillPolygon(rockFill, ring(w))
	c.StrokeLines(draw.LineStyle{Color: light, Width: vg.Points(0.6), Dashes: []vg.Length{vg.Points(1), vg.Points(2)}}, ring(w))
	t.drawTraces(&c, cx, cy, k, w)
	// Zones, clipped to the view.
	for i, z := range t.Zones {
		sty, fill := zoneStyle(i)
		for _, lobe := range lobes(z, w) {
			c.FillPolygon(fill, lobe.fill(pt))
			for _, l := range lobe.edges(pt) {
				c.StrokeLines(sty, l)
			}
		}
	}
	// The limit, the opening.
	c.StrokeLines(limitRing, ring(t.Radius+t.Limit))
	c.FillPolygon(color.NRGBA{R: 0xe8, G: 0xe8, B: 0xe6, A: 0xff}, ring(t.Radius))
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.6)}, ring(t.Radius))

	lab := &labeller{bounds: f.inner, pad: l.pt(1)}
	lab.blockText(f.titleRect())
	lab.blockText(f.keyRect())
	lab.blockDisk(vg.Point{X: cx, Y: cy}, R+l.pt(1), l.pt(3))
	for _, m := range sectionMarks {
		lab.place(l.keyText(), m.txt, pt(m.a, w+1/k), l.pt(1), (90-m.a)*math.Pi/180, 8)
	}
	// The depths go on the rock: forget the disk, keep the texts.
	lab.taken = append([]vg.Rectangle(nil), lab.texts...)
	t.deepest(&c, lab, pt, l)
	lab.draw(&c)
	f.drawText(&c)
	t.dropped = lab.dropped
}

var (
	rockFill  = color.NRGBA{R: 0xfa, G: 0xf8, B: 0xf3, A: 0xff}
	limitRing = draw.LineStyle{Color: ink, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
)

// drawTraces draws three parallel joint traces per set across the rock of
// the view (w m from the axis), at k points per metre round (cx, cy).
func (t *TunnelSection) drawTraces(c *draw.Canvas, cx, cy vg.Length, k, w float64) {
	for i, z := range t.Zones {
		if math.IsNaN(z.Trace) {
			continue
		}
		sty, _ := zoneStyle(i)
		sty.Width = vg.Points(0.5)
		clr := sty.Color.(color.NRGBA)
		clr.A = 0x99
		sty.Color = clr
		s, co := math.Sincos(z.Trace * math.Pi / 180)
		for _, off := range []float64{-0.55, 0, 0.55} {
			o := [2]float64{-s * off * w, co * off * w} // offset across the trace
			for _, seg := range chordOutside(o, [2]float64{co, s}, t.Radius, w) {
				p0, p1 := seg[0], seg[1]
				c.StrokeLines(sty, []vg.Point{{X: cx + vg.Length(p0[0]*k), Y: cy + vg.Length(p0[1]*k)}, {X: cx + vg.Length(p1[0]*k), Y: cy + vg.Length(p1[1]*k)}})
			}
		}
	}
}

// deepest marks the deepest point of each bounded zone, on every other set
// at its twin 180° on (the zones are symmetric through the axis), with a
// line from the wall, a dot and its depth, named through lab.
func (t *TunnelSection) deepest(c *draw.Canvas, lab *labeller, pt func(theta, r float64) vg.Point, l look) {
	w := t.view()
	type mark struct {
		i   int
		a   float64
		tip vg.Point
	}
	var marks []mark
	dot := l.pt(2)
	for i, z := range t.Zones {
		if math.IsNaN(z.Depth) {
			continue
		}
		a := z.Angle + 180*float64(i%2)
		sty, _ := zoneStyle(i)
		sty.Dashes = nil
		tip := pt(a, math.Min(t.Radius+z.Depth, w))
		c.StrokeLines(sty, []vg.Point{pt(a, t.Radius), tip})
		c.DrawGlyph(draw.GlyphStyle{Color: sty.Color, Radius: dot, Shape: draw.CircleGlyph{}}, tip)
		lab.block(square(tip, dot))
		marks = append(marks, mark{i, a, tip})
	}
	for _, m := range marks {
		z := t.Zones[m.i]
		sty, _ := zoneStyle(m.i)
		lab.place(l.text(7, 5.5, true, sty.Color), fmt.Sprintf("%s %.2f m", z.Name, z.Depth), m.tip, dot, (90-m.a)*math.Pi/180, 16)
	}
}
