package plots

import (
	"fmt"
	"image/color"
	"math"

	"cleft/insitu/geom"
	"cleft/planes"
	"cleft/planes/slope"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// KinItem is one line on the kinematic net: the dip vector of a plane (for
// planar sliding and toppling) or the line of intersection of two planes
// (for wedges), with the verdict of its test.
type KinItem struct {
	Name         string
	Line         geom.Line
	Intersection bool // a wedge's line, else a plane's dip vector
	Feasible     bool
	Toppling     bool            // feasible for flexural toppling (dip vectors only)
	Fails        slope.Condition // of the sliding test (planar or wedge), when not feasible
}

// KinematicNet is the kinematic stereonet of a cut slope, drawn with lines
// (not poles): dip vectors of the planes and lines of intersection, against
// the face's great circle (a line daylights when it plots between it and the
// primitive, on the face's side), the friction circle for lines (lines
// inside it plunge more steeply than φ), the lateral limits of planar
// sliding and the envelope of flexural toppling (dip vectors of planes
// dipping into the face with plunge ≥ 90° − ψf + φ).
type KinematicNet struct {
	Site         string
	Lines        []string
	Proj         Projection
	Face         planes.Orientation
	Phi          float64 // °
	LateralLimit float64 // °
	ToppleLimit  float64 // °
	Items        []KinItem
}

var (
	slideFill  = color.NRGBA{R: 0xb0, G: 0x1c, B: 0x1c, A: 0x30}
	wedgeFill  = color.NRGBA{R: 0xb0, G: 0x1c, B: 0x1c, A: 0x14}
	toppleInk  = color.NRGBA{R: 0x1f, G: 0x4e, B: 0x8c, A: 0xff}
	toppleFill = color.NRGBA{R: 0x1f, G: 0x4e, B: 0x8c, A: 0x24}
)

// Draw draws the figure on c.
func (k *KinematicNet) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{k.Site}, k.Lines...)) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	side := min(body.Max.X-body.Min.X-vg.Points(150), body.Max.Y-body.Min.Y)
	n := net{c: &c, cx: body.Min.X + side/2, cy: body.Max.Y - side/2, r: side/2 - vg.Points(14)}

	// Zones first, as fills: wedge (any trend out of the face), planar
	// (within the lateral limits), toppling.
	k.fillZone(n, k.Face.DipDirection()-89.9, k.Face.DipDirection()+89.9, wedgeFill)
	k.fillZone(n, k.Face.DipDirection()-k.LateralLimit, k.Face.DipDirection()+k.LateralLimit, slideFill)
	k.fillTopple(n)
	drawPrimitive(n)

	fr := k.Proj.Radius((90 - k.Phi) * math.Pi / 180)
	n.c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1)}, circlePath(n, fr, 240))
	dash := draw.LineStyle{Color: ink, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
	for _, d := range []float64{-k.LateralLimit, k.LateralLimit} {
		s, co := geom.SinCosDeg(k.Face.DipDirection() + d)
		n.c.StrokeLines(dash, []vg.Point{n.pt(Point{X: s * fr, Y: co * fr}), n.pt(Point{X: s, Y: co})})
	}
	n.c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.8)}, n.path(k.Proj.GreatCircle(k.Face, 120)))
	lab := textStyle(8, true, ink)
	lab.XAlign, lab.YAlign = draw.XCenter, draw.YBottom
	mid := k.Proj.Project(k.Face.DipLine())
	haloText(n.c, lab, n.pt(Point{X: mid.X * 0.9, Y: mid.Y * 0.9}), "face "+k.Face.String())

	name := textStyle(7, true, ink)
	name.XAlign, name.YAlign = draw.XLeft, draw.YBottom
	for _, pass := range []bool{false, true} { // infeasible under feasible
		for _, it := range k.Items {
			if (it.Feasible || it.Toppling) != pass {
				continue
			}
			at := n.pt(k.Proj.Project(it.Line))
			kinGlyph(n.c, it, at)
			if pass {
				haloText(n.c, name, vg.Point{X: at.X + vg.Points(4), Y: at.Y + vg.Points(3)}, it.Name)
			}
		}
	}
	k.drawKey(draw.Crop(body, side+vg.Points(16), 0, 0, 0))
}

// fillZone fills the crescent of lines with trends from t0 to t1 (°) that
// daylight in the face and plunge at least φ.
func (k *KinematicNet) fillZone(n net, t0, t1 float64, clr color.Color) {
	var outer, inner []Point
	for t := t0; t <= t1+1e-9; t += (t1 - t0) / 90 {
		app := slope.ApparentDip(k.Face, t)
		if app <= k.Phi {
			continue
		}
		outer = append(outer, k.Proj.Project(geom.Line{Trend: geom.Azimuth(t), Plunge: app}))
		inner = append(inner, k.Proj.Project(geom.Line{Trend: geom.Azimuth(t), Plunge: k.Phi}))
	}
	if len(outer) < 2 {
		return
	}
	poly := outer
	for i := len(inner) - 1; i >= 0; i-- {
		poly = append(poly, inner[i])
	}
	n.c.FillPolygon(clr, n.path(poly))
}

// fillTopple fills the toppling envelope of dip vectors: trends within the
// toppling limit of the opposite of the face's dip direction, plunges from
// 90° − ψf + φ to 90°.
func (k *KinematicNet) fillTopple(n net) {
	pl := 90 - k.Face.Dip() + k.Phi
	if pl >= 90 {
		return
	}
	back := k.Face.DipDirection() + 180
	var poly []Point
	for t := back - k.ToppleLimit; t <= back+k.ToppleLimit+1e-9; t += k.ToppleLimit / 30 {
		poly = append(poly, k.Proj.Project(geom.Line{Trend: geom.Azimuth(t), Plunge: pl}))
	}
	poly = append(poly, Point{})
	path := n.path(poly)
	n.c.FillPolygon(toppleFill, path)
	n.c.StrokeLines(draw.LineStyle{Color: toppleInk, Width: vg.Points(0.9), Dashes: []vg.Length{vg.Points(3), vg.Points(2)}}, append(path, path[0]))
}

// kinGlyph: dip vectors are circles, lines of intersection squares; filled
// dark red when sliding is feasible, blue when toppling is; otherwise grey,
// by the condition of the sliding test that fails: open when the line does
// not daylight, light grey when it daylights but is flatter than φ, darker
// grey when only the lateral limit stops planar sliding.
func kinGlyph(c *draw.Canvas, it KinItem, at vg.Point) {
	var fill color.Color = white
	edge := color.Color(grey)
	switch {
	case it.Toppling:
		fill, edge = toppleInk, poleInk
	case it.Feasible:
		fill, edge = warning, poleInk
	case it.Fails&slope.Daylight != 0:
	case it.Fails&slope.Friction != 0:
		fill = light
	case it.Fails&slope.Lateral != 0:
		fill = grey
	}
	r := vg.Points(3)
	if it.Intersection {
		sq := []vg.Point{{X: at.X - r, Y: at.Y - r}, {X: at.X + r, Y: at.Y - r}, {X: at.X + r, Y: at.Y + r}, {X: at.X - r, Y: at.Y + r}, {X: at.X - r, Y: at.Y - r}}
		c.FillPolygon(fill, sq)
		c.StrokeLines(draw.LineStyle{Color: edge, Width: vg.Points(0.9)}, sq)
		return
	}
	c.DrawGlyph(draw.GlyphStyle{Color: fill, Radius: r, Shape: draw.CircleGlyph{}}, at)
	c.DrawGlyph(draw.GlyphStyle{Color: edge, Radius: r, Shape: draw.RingGlyph{}}, at)
}

func (k *KinematicNet) drawKey(c draw.Canvas) {
	x, y := c.Min.X, c.Max.Y
	head := textStyle(8, true, ink)
	c.FillText(head, vg.Point{X: x, Y: y}, "kinematic tests (lines, not poles)")
	y -= vg.Points(18)
	row := func(glyph func(vg.Point), txt string) {
		glyph(vg.Point{X: x + vg.Points(6), Y: y})
		t := textStyle(7.5, false, ink)
		t.YAlign = draw.YCenter
		c.FillText(t, vg.Point{X: x + vg.Points(18), Y: y}, txt)
		y -= vg.Points(14)
	}
	count := func(f func(KinItem) bool) int {
		n := 0
		for _, it := range k.Items {
			if f(it) {
				n++
			}
		}
		return n
	}
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Feasible: true}, a) }, fmt.Sprintf("dip vector, planar sliding feasible (%d)", count(func(i KinItem) bool { return !i.Intersection && i.Feasible })))
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Toppling: true}, a) }, fmt.Sprintf("dip vector, flexural toppling feasible (%d)", count(func(i KinItem) bool { return i.Toppling })))
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Fails: slope.Lateral}, a) }, "dip vector, sliding only beyond the lateral limit")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Feasible: true}, a) }, fmt.Sprintf("line of intersection, wedge feasible (%d)", count(func(i KinItem) bool { return i.Intersection && i.Feasible })))
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Fails: slope.Friction}, a) }, "grey: daylights, flatter than φ")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Fails: slope.Daylight}, a) }, "open: does not daylight")
	row(func(a vg.Point) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(1.8)}, a.X-6, a.Y, a.X+6, a.Y)
	}, "face great circle: lines beyond it daylight")
	row(func(a vg.Point) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(1)}, a.X-6, a.Y, a.X+6, a.Y)
	}, fmt.Sprintf("friction circle, φ = %.1f°: lines inside plunge more", k.Phi))
	row(func(a vg.Point) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}, a.X-6, a.Y, a.X+6, a.Y)
	}, fmt.Sprintf("lateral limits ±%g° of the face's dip direction", k.LateralLimit))
	row(func(a vg.Point) {
		c.FillPolygon(slideFill, []vg.Point{{X: a.X - 6, Y: a.Y - 4}, {X: a.X + 6, Y: a.Y - 4}, {X: a.X + 6, Y: a.Y + 4}, {X: a.X - 6, Y: a.Y + 4}})
	}, "planar sliding zone (darker) and wedge zone")
	row(func(a vg.Point) {
		c.FillPolygon(toppleFill, []vg.Point{{X: a.X - 6, Y: a.Y - 4}, {X: a.X + 6, Y: a.Y - 4}, {X: a.X + 6, Y: a.Y + 4}, {X: a.X - 6, Y: a.Y + 4}})
	}, fmt.Sprintf("flexural toppling envelope (±%g°)", k.ToppleLimit))
}
