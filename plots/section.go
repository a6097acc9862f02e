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
}

// zoneInk are the colours of the sets' zones, of this project's own choice:
// distinct in hue and in lightness, so the dashes and fills still part them
// in grey print.
var zoneInk = []color.NRGBA{
	{R: 0xb0, G: 0x1c, B: 0x1c, A: 0xff}, // brick red
	{R: 0x1f, G: 0x4e, B: 0x8c, A: 0xff}, // slate blue
	{R: 0xa8, G: 0x74, B: 0x00, A: 0xff}, // ochre
	{R: 0x2d, G: 0x6e, B: 0x4e, A: 0xff}, // moss green
	{R: 0x5e, G: 0x3a, B: 0x87, A: 0xff}, // violet
	{R: 0x55, G: 0x55, B: 0x55, A: 0xff}, // graphite
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

// Draw draws the figure on c.
func (t *TunnelSection) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{t.Site}, t.Lines...)) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	side := min(body.Max.X-body.Min.X-vg.Points(190), body.Max.Y-body.Min.Y)
	cx, cy := body.Min.X+side/2, body.Max.Y-side/2
	w := t.view()
	k := float64(side) * 0.43 / w // canvas points per metre
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
	c.FillPolygon(color.NRGBA{R: 0xfa, G: 0xf8, B: 0xf3, A: 0xff}, ring(w))
	c.StrokeLines(draw.LineStyle{Color: light, Width: vg.Points(0.6), Dashes: []vg.Length{vg.Points(1), vg.Points(2)}}, ring(w))
	// Joint traces: three parallel lines per set, in the rock only.
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
	// The limit, the opening, the compass of the section.
	lim := t.Radius + t.Limit
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}, ring(lim))
	c.FillPolygon(color.NRGBA{R: 0xe8, G: 0xe8, B: 0xe6, A: 0xff}, ring(t.Radius))
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.6)}, ring(t.Radius))
	lab := textStyle(7.5, false, ink)
	lab.XAlign, lab.YAlign = draw.XCenter, draw.YCenter
	for _, m := range []struct {
		a   float64
		txt string
	}{{0, "crown"}, {90, "right"}, {180, "invert"}, {270, "left"}} {
		haloText(&c, lab, pt(m.a, w+6/k), m.txt)
	}
	// The deepest point of each bounded zone, on every other set at its twin
	// 180° on (the zones are symmetric through the axis), labels pushed
	// outward along the ray until they clear the ones placed before.
	var placed []vg.Point
	for i, z := range t.Zones {
		if math.IsNaN(z.Depth) {
			continue
		}
		a := z.Angle + 180*float64(i%2)
		sty, _ := zoneStyle(i)
		sty.Dashes = nil
		tip := math.Min(t.Radius+z.Depth, w)
		c.StrokeLines(sty, []vg.Point{pt(a, t.Radius), pt(a, tip)})
		c.DrawGlyph(draw.GlyphStyle{Color: sty.Color, Radius: vg.Points(2), Shape: draw.CircleGlyph{}}, pt(a, tip))
		nl := textStyle(7, true, sty.Color)
		nl.XAlign, nl.YAlign = draw.XCenter, draw.YCenter
		at := pt(a, tip+9/k)
		for r := tip + 9/k; clash(at, placed); r += 6 / k {
			at = pt(a, r)
		}
		placed = append(placed, at)
		haloText(&c, nl, at, fmt.Sprintf("%s %.2f m", z.Name, z.Depth))
	}
	t.key(&c, body.Min.X+side+vg.Points(14), body.Max.Y, w)
}

// clash reports whether a label centred at p would overlap one centred at
// any of the points placed (labels about 44 × 9 points).
func clash(p vg.Point, placed []vg.Point) bool {
	for _, q := range placed {
		if math.Abs(float64(p.X-q.X)) < 46 && math.Abs(float64(p.Y-q.Y)) < 10 {
			return true
		}
	}
	return false
}

// key draws the key from (x, y) down.
func (t *TunnelSection) key(c *draw.Canvas, x, y vg.Length, w float64) {
	head := textStyle(8, true, ink)
	c.FillText(head, vg.Point{X: x, Y: y}, "zones of potential slip")
	y -= vg.Points(16)
	note := textStyle(7.5, false, ink)
	note.YAlign = draw.YCenter
	small := textStyle(7, false, grey)
	small.YAlign = draw.YCenter
	for i, z := range t.Zones {
		sty, fill := zoneStyle(i)
		box := []vg.Point{{X: x, Y: y - vg.Points(4)}, {X: x + vg.Points(16), Y: y - vg.Points(4)}, {X: x + vg.Points(16), Y: y + vg.Points(4)}, {X: x, Y: y + vg.Points(4)}}
		c.FillPolygon(fill, box)
		c.StrokeLines(sty, append(box, box[0]))
		c.FillText(textStyle(7.5, true, ink), vg.Point{X: x + vg.Points(22), Y: y + vg.Points(4)}, z.Name)
		y -= vg.Points(11)
		for _, l := range z.Note {
			c.FillText(note, vg.Point{X: x + vg.Points(22), Y: y}, l)
			y -= vg.Points(10)
		}
		trace := "no trace: the plane is the section"
		if !math.IsNaN(z.Trace) {
			dip, side := z.Trace, "left"
			if dip > 90 {
				dip, side = 180-dip, "right"
			}
			trace = fmt.Sprintf("trace dips %.0f° to the %s", dip, side)
		}
		c.FillText(small, vg.Point{X: x + vg.Points(22), Y: y}, trace)
		y -= vg.Points(15)
	}
	y -= vg.Points(4)
	c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}, x, y, x+vg.Points(16), y)
	c.FillText(note, vg.Point{X: x + vg.Points(22), Y: y}, fmt.Sprintf("limit %.2g m beyond the wall", t.Limit))
	y -= vg.Points(13)
	for _, l := range []string{
		"looking along the drive, crown up",
		"filled: critical (FS ≤ 1) or opening (σn' ≤ 0)",
		"  under the stress in the rock",
		"thin lines: joint traces at their apparent dip",
		"line with a dot: deepest point of a bounded zone",
		fmt.Sprintf("shown to %.1f m beyond the wall (dotted ring)", w-t.Radius),
	} {
		c.FillText(small, vg.Point{X: x, Y: y}, l)
		y -= vg.Points(11)
	}
}
