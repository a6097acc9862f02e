package plots

import (
	"fmt"
	"image/color"
	"math"
	"sort"

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
	OnePlane     bool            // a feasible wedge that slides on one of its planes alone
	Fails        slope.Condition // of the sliding test (planar or wedge), when not feasible
}

// KinematicNet is the kinematic stereonet of a cut slope, drawn with lines
// (not poles): dip vectors of the planes and lines of intersection, against
// the face's great circle (a line daylights when it plots between it and the
// primitive, on the face's side), the friction circle for lines (lines
// inside it plunge more steeply than φ), the lateral limits of planar
// sliding and the envelope of flexural toppling (dip vectors of planes
// dipping into the face with plunge ≥ 90° − ψf + φ).
//
// The look is the project's own: the zones are hatched in three tones of the
// project's colour ramp (planar sliding densely, wedge sliding sparsely
// across it, flexural toppling in the light tone) and outlined; the lines
// that can fail are drawn like the critical poles of the tendency stereonet,
// large and filled with the ramp's light end: a triangle for a plane that
// can slide, a downward triangle for one that can topple, a large diamond
// for a wedge that can slide (barred when it slides on one plane alone, so
// that its line may lie outside the zones: it is tested by that plane's
// dip); the others are small circles (dip vectors) or
// diamonds (lines of intersection) whose fill says which condition stops
// them. The shapes carry the verdict without colour.
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

// The tones of the kinematic net, from the project's ramp.
var (
	kinPlanarInk = Ramp{}.At(0.10) // the planar-sliding zone and its limits
	kinWedgeInk  = Ramp{}.At(0.42) // the wedge zone
	kinToppleInk = Ramp{}.At(0.62) // the toppling envelope
	kinCanFail   = Ramp{}.At(0.97) // fill of the lines that can fail
	kinShort     = Ramp{}.At(0.55) // fill: daylights, flatter than φ
	kinLateral   = Ramp{}.At(0.18) // fill: held by the lateral limit only

	// toppleInk is the blue of the tunnel wall's opening arcs.
	toppleInk = color.NRGBA{R: 0x1f, G: 0x4e, B: 0x8c, A: 0xff}
)

// Draw draws the figure on c.
func (k *KinematicNet) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{k.Site}, k.Lines...)) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	side := min(body.Max.X-body.Min.X-vg.Points(170), body.Max.Y-body.Min.Y)
	n := net{c: &c, cx: body.Min.X + side/2, cy: body.Max.Y - side/2, r: side/2 - vg.Points(14)}

	dd := k.Face.DipDirection()
	wedge := k.zone(n, dd-89.9, dd+89.9)
	planar := k.zone(n, dd-k.LateralLimit, dd+k.LateralLimit)
	topple := k.toppleZone(n)
	thin := func(clr color.Color, w float64) draw.LineStyle {
		return draw.LineStyle{Color: clr, Width: vg.Points(w)}
	}
	if wedge != nil {
		hatch(n.c, wedge, -35, vg.Points(7), thin(kinWedgeInk, 0.6))
	}
	if planar != nil {
		hatch(n.c, planar, 55, vg.Points(3), thin(kinPlanarInk, 0.7))
		n.c.StrokeLines(thin(kinPlanarInk, 1.2), append(planar, planar[0]))
	}
	if topple != nil {
		hatch(n.c, topple, 0, vg.Points(3.5), thin(kinToppleInk, 0.8))
		n.c.StrokeLines(thin(kinToppleInk, 1.2), append(topple, topple[0]))
	}
	drawPrimitive(n)

	// Friction circle for lines, the lateral limits (solid, with a bar where
	// they leave the friction circle) and the face's great circle.
	fr := k.Proj.Radius((90 - k.Phi) * math.Pi / 180)
	n.c.StrokeLines(thin(ink, 1), circlePath(n, fr, 240))
	for _, d := range []float64{-k.LateralLimit, k.LateralLimit} {
		s, co := geom.SinCosDeg(dd + d)
		a, b := n.pt(Point{X: s * fr, Y: co * fr}), n.pt(Point{X: s, Y: co})
		n.c.StrokeLines(thin(kinPlanarInk, 0.9), []vg.Point{a, b})
		px, py := vg.Length(co)*vg.Points(3), -vg.Length(s)*vg.Points(3)
		n.c.StrokeLines(thin(kinPlanarInk, 0.9), []vg.Point{{X: a.X - px, Y: a.Y - py}, {X: a.X + px, Y: a.Y + py}})
	}
	n.c.StrokeLines(thin(ink, 2), n.path(k.Proj.GreatCircle(k.Face, 120)))
	lab := textStyle(8, true, ink)
	lab.XAlign, lab.YAlign = draw.XCenter, draw.YBottom
	mid := k.Proj.Project(k.Face.DipLine())
	haloText(n.c, lab, n.pt(Point{X: mid.X * 0.9, Y: mid.Y * 0.9}), "face "+k.Face.String())

	name := textStyle(7, true, ink)
	name.XAlign, name.YAlign = draw.XLeft, draw.YBottom
	items := append([]KinItem(nil), k.Items...)
	sort.SliceStable(items, func(i, j int) bool { return !canFail(items[i]) && canFail(items[j]) }) // those that can fail on top
	for _, it := range items {
		at := n.pt(k.Proj.Project(it.Line))
		kinGlyph(n.c, it, at)
		if canFail(it) {
			haloText(n.c, name, vg.Point{X: at.X + vg.Points(6), Y: at.Y + vg.Points(3)}, it.Name)
		}
	}
	k.drawKey(draw.Crop(body, side+vg.Points(16), 0, 0, 0))
}

func canFail(it KinItem) bool { return it.Feasible || it.Toppling }

// zone returns, in canvas coordinates, the crescent of lines with trends
// from t0 to t1 (°) that daylight in the face and plunge at least φ, or nil.
func (k *KinematicNet) zone(n net, t0, t1 float64) []vg.Point {
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
		return nil
	}
	poly := outer
	for i := len(inner) - 1; i >= 0; i-- {
		poly = append(poly, inner[i])
	}
	return n.path(poly)
}

// toppleZone returns the toppling envelope of dip vectors: trends within
// the toppling limit of the opposite of the face's dip direction, plunges
// from 90° − ψf + φ to 90°; nil when it is empty.
func (k *KinematicNet) toppleZone(n net) []vg.Point {
	pl := 90 - k.Face.Dip() + k.Phi
	if pl >= 90 {
		return nil
	}
	back := k.Face.DipDirection() + 180
	var poly []Point
	for t := back - k.ToppleLimit; t <= back+k.ToppleLimit+1e-9; t += k.ToppleLimit / 30 {
		poly = append(poly, k.Proj.Project(geom.Line{Trend: geom.Azimuth(t), Plunge: pl}))
	}
	return n.path(append(poly, Point{}))
}

// kinGlyph draws one line: those that can fail large with a heavy outline
// and the ramp's light fill (triangle: planar sliding; downward triangle:
// flexural toppling; diamond: wedge sliding); the others small (circle: dip
// vector; diamond: line of intersection), filled by the condition of the
// sliding test that stops them: white when it does not daylight, the ramp's
// middle when it daylights but is flatter than φ, its dark end when only the
// lateral limit stops planar sliding.
func kinGlyph(c *draw.Canvas, it KinItem, at vg.Point) {
	heavy := draw.LineStyle{Color: poleInk, Width: vg.Points(1.5)}
	poly := func(fill color.Color, edge draw.LineStyle, pts []vg.Point) {
		pts = append(pts, pts[0])
		c.FillPolygon(white, growPolygon(pts, at, 1.3))
		c.FillPolygon(fill, pts)
		c.StrokeLines(edge, pts)
	}
	diamond := func(r vg.Length) []vg.Point {
		return []vg.Point{{X: at.X, Y: at.Y + r}, {X: at.X + r, Y: at.Y}, {X: at.X, Y: at.Y - r}, {X: at.X - r, Y: at.Y}}
	}
	switch {
	case it.Intersection && it.Feasible:
		poly(kinCanFail, heavy, diamond(vg.Points(5.2)))
		if it.OnePlane {
			c.StrokeLine2(draw.LineStyle{Color: poleInk, Width: vg.Points(1.2)}, at.X-vg.Points(5.2), at.Y, at.X+vg.Points(5.2), at.Y)
		}
		return
	case it.Feasible:
		r := vg.Points(5.4)
		poly(kinCanFail, heavy, []vg.Point{{X: at.X, Y: at.Y + r}, {X: at.X - r*0.866, Y: at.Y - r/2}, {X: at.X + r*0.866, Y: at.Y - r/2}})
		return
	case it.Toppling:
		r := vg.Points(5.4)
		poly(kinCanFail, heavy, []vg.Point{{X: at.X, Y: at.Y - r}, {X: at.X + r*0.866, Y: at.Y + r/2}, {X: at.X - r*0.866, Y: at.Y + r/2}})
		return
	}
	var fill color.Color = white
	switch {
	case it.Fails&slope.Daylight != 0:
	case it.Fails&slope.Friction != 0:
		fill = kinShort
	case it.Fails&slope.Lateral != 0:
		fill = kinLateral
	}
	edge := draw.LineStyle{Color: grey, Width: vg.Points(0.8)}
	if it.Intersection {
		poly(fill, edge, diamond(vg.Points(3.4)))
		return
	}
	r := vg.Points(2.8)
	c.DrawGlyph(draw.GlyphStyle{Color: fill, Radius: r, Shape: draw.CircleGlyph{}}, at)
	c.DrawGlyph(draw.GlyphStyle{Color: grey, Radius: r, Shape: draw.RingGlyph{}}, at)
}

// growPolygon scales a closed polygon about o so that its halo is d points wider.
func growPolygon(pts []vg.Point, o vg.Point, d float64) []vg.Point {
	out := make([]vg.Point, len(pts))
	for i, p := range pts {
		dx, dy := float64(p.X-o.X), float64(p.Y-o.Y)
		l := math.Hypot(dx, dy)
		f := 1.0
		if l > 0 {
			f = (l + d) / l
		}
		out[i] = vg.Point{X: o.X + vg.Length(dx*f), Y: o.Y + vg.Length(dy*f)}
	}
	return out
}

func (k *KinematicNet) drawKey(c draw.Canvas) {
	x, y := c.Min.X, c.Max.Y
	head := textStyle(8, true, ink)
	count := func(f func(KinItem) bool) int {
		n := 0
		for _, it := range k.Items {
			if f(it) {
				n++
			}
		}
		return n
	}
	sub := func(s string) {
		c.FillText(head, vg.Point{X: x, Y: y}, s)
		y -= vg.Points(16)
	}
	row := func(glyph func(vg.Point), txt string) {
		glyph(vg.Point{X: x + vg.Points(7), Y: y})
		t := textStyle(7.5, false, ink)
		t.YAlign = draw.YCenter
		c.FillText(t, vg.Point{X: x + vg.Points(20), Y: y}, txt)
		y -= vg.Points(14)
	}
	sub("lines that can fail (named)")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Feasible: true}, a) }, fmt.Sprintf("plane's dip vector: planar sliding (%d)", count(func(i KinItem) bool { return !i.Intersection && i.Feasible })))
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Feasible: true}, a) }, fmt.Sprintf("line of intersection: wedge sliding (%d)", count(func(i KinItem) bool { return i.Intersection && i.Feasible })))
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Feasible: true, OnePlane: true}, a) }, "barred: on one plane alone (tested by its dip)")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Toppling: true}, a) }, fmt.Sprintf("plane's dip vector: flexural toppling (%d)", count(func(i KinItem) bool { return i.Toppling })))
	y -= vg.Points(4)
	sub("lines held back (circle: plane, diamond: wedge)")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Fails: slope.Lateral}, a) }, "dark: only the lateral limit holds it")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Fails: slope.Friction}, a) }, "mid tone: daylights, flatter than φ")
	row(func(a vg.Point) { kinGlyph(&c, KinItem{Intersection: true, Fails: slope.Daylight}, a) }, "white: does not daylight")
	y -= vg.Points(4)
	sub("zones and limits")
	box := func(a vg.Point) []vg.Point {
		return []vg.Point{{X: a.X - 7, Y: a.Y - 5}, {X: a.X + 7, Y: a.Y - 5}, {X: a.X + 7, Y: a.Y + 5}, {X: a.X - 7, Y: a.Y + 5}}
	}
	row(func(a vg.Point) {
		hatch(&c, box(a), 55, vg.Points(3), draw.LineStyle{Color: kinPlanarInk, Width: vg.Points(0.7)})
		c.StrokeLines(draw.LineStyle{Color: kinPlanarInk, Width: vg.Points(1.2)}, append(box(a), box(a)[0]))
	}, fmt.Sprintf("planar sliding zone, within ±%g° (lateral limit)", k.LateralLimit))
	row(func(a vg.Point) {
		hatch(&c, box(a), -35, vg.Points(5), draw.LineStyle{Color: kinWedgeInk, Width: vg.Points(0.6)})
	}, "wedge sliding zone: daylights, steeper than φ")
	row(func(a vg.Point) {
		hatch(&c, box(a), 0, vg.Points(3.5), draw.LineStyle{Color: kinToppleInk, Width: vg.Points(0.8)})
		c.StrokeLines(draw.LineStyle{Color: kinToppleInk, Width: vg.Points(1.2)}, append(box(a), box(a)[0]))
	}, fmt.Sprintf("flexural toppling envelope (±%g°)", k.ToppleLimit))
	row(func(a vg.Point) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(2)}, a.X-7, a.Y, a.X+7, a.Y)
	}, "face great circle: lines beyond it daylight")
	row(func(a vg.Point) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(1)}, a.X-7, a.Y, a.X+7, a.Y)
	}, fmt.Sprintf("friction circle, φ = %.1f°: lines inside plunge more", k.Phi))
	row(func(a vg.Point) {
		st := draw.LineStyle{Color: kinPlanarInk, Width: vg.Points(0.9)}
		c.StrokeLine2(st, a.X-7, a.Y, a.X+7, a.Y)
		c.StrokeLine2(st, a.X-7, a.Y-3, a.X-7, a.Y+3)
	}, fmt.Sprintf("lateral limits, ±%g° of the face's dip direction", k.LateralLimit))
}
