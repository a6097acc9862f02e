package plots

import (
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
	// FS is the least factor of safety of a feasible case over its water
	// cases; NaN when it has none. Names go to the least first.
	FS float64
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
//
// It lays itself out like the tendency stereonet. The lines that can fail
// are named, least factor of safety first, beside their symbol or further
// out with a leader; when they are many, only as many as the net has room
// for are named, and the key says how many more are not.
type KinematicNet struct {
	Site         string
	Lines        []string
	Proj         Projection
	Face         planes.Orientation
	Phi          float64 // °
	LateralLimit float64 // °
	ToppleLimit  float64 // °
	Items        []KinItem

	named   int // lines that can fail named in the last Draw
	dropped int // names left out for want of room, in the last Draw
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

// ranked returns the items that can fail, most important first: least FS
// first, those without one (toppling, blocks without a factor of safety)
// after, in their order.
func (k *KinematicNet) ranked() []KinItem {
	var out []KinItem
	for _, it := range k.Items {
		if canFail(it) {
			out = append(out, it)
		}
	}
	sort.SliceStable(out, func(i, j int) bool {
		a, b := out[i].FS, out[j].FS
		if math.IsNaN(b) {
			return !math.IsNaN(a)
		}
		return a < b
	})
	return out
}

// nameRoom is how many names the net of radius r has room for in look l:
// about one for every two and a half lines of names down its diameter,
// within [6, NameAll].
func nameRoom(l look, r vg.Length) int {
	_, h := textBox(l.nameText(), "X")
	return max(6, min(NameAll, int(2*r/(2.5*h))))
}

// Draw draws the figure on c.
func (k *KinematicNet) Draw(c draw.Canvas) {
	ranked := k.ranked()
	most := len(ranked)
	var f frame
	var n net
	var lab *labeller
	for {
		f = layFrameOf(c, append([]string{k.Site}, k.Lines...), k.keys(len(ranked)-most), netScore)
		n = netIn(&c, f.square(), f.l)
		if room := nameRoom(f.l, n.r); most > room {
			most = room
			continue
		}
		var placed int
		lab, placed = k.names(f, n, ranked[:most])
		if placed == most {
			break
		}
		most = placed // name the most important only; the key counts the others
	}
	g := glyphScale(n.r)
	k.drawZones(n, f.l)
	// Those held back first, then those that can fail, least FS on top.
	for _, it := range k.Items {
		if !canFail(it) {
			kinGlyph(n.c, it, n.pt(k.Proj.Project(it.Line)), g)
		}
	}
	for i := len(ranked) - 1; i >= 0; i-- { // the named ones are the first
		kinGlyph(n.c, ranked[i], n.pt(k.Proj.Project(ranked[i].Line)), g)
	}
	lab.draw(&c)
	f.drawText(&c)
	k.named, k.dropped = most, lab.dropped
}

// names places the face's label and the names of the items, in order,
// until one finds no room; it returns the labeller and how many were
// placed.
func (k *KinematicNet) names(f frame, n net, items []KinItem) (*labeller, int) {
	l := f.l
	g := glyphScale(n.r)
	lab := &labeller{bounds: f.inner, pad: l.pt(1)}
	lab.blockText(f.titleRect())
	lab.blockText(f.keyRect())
	lab.blockText(n.northBox(l))
	for _, it := range k.Items {
		lab.block(square(n.pt(k.Proj.Project(it.Line)), kinRadius(it, g)))
	}
	mid := k.Proj.Project(k.Face.DipLine())
	lab.place(l.text(8, 6, true, ink), "face "+k.Face.String(), n.pt(mid), l.pt(2), math.Atan2(-mid.Y, -mid.X), 8)
	for i, it := range items {
		if !lab.place(l.nameText(), it.Name, n.pt(k.Proj.Project(it.Line)), kinRadius(it, g), 0, 24) {
			lab.dropped--
			return lab, i
		}
	}
	return lab, len(items)
}

// drawZones draws the zones, the primitive, the friction circle, the
// lateral limits and the face's great circle.
func (k *KinematicNet) drawZones(n net, l look) {
	dd := k.Face.DipDirection()
	wedge := k.zone(n, dd-89.9, dd+89.9)
	planar := k.zone(n, dd-k.LateralLimit, dd+k.LateralLimit)
	topple := k.toppleZone(n)
	if wedge != nil {
		hatch(n.c, wedge, -35, vg.Points(7), thinLine(kinWedgeInk, 0.6))
	}
	if planar != nil {
		hatch(n.c, planar, 55, vg.Points(3), thinLine(kinPlanarInk, 0.7))
		n.c.StrokeLines(thinLine(kinPlanarInk, 1.2), append(planar, planar[0]))
	}
	if topple != nil {
		hatch(n.c, topple, 0, vg.Points(3.5), thinLine(kinToppleInk, 0.8))
		n.c.StrokeLines(thinLine(kinToppleInk, 1.2), append(topple, topple[0]))
	}
	drawPrimitiveLook(n, l)
	// Friction circle for lines, the lateral limits (solid, with a bar where
	// they leave the friction circle) and the face's great circle.
	fr := k.Proj.Radius((90 - k.Phi) * math.Pi / 180)
	n.c.StrokeLines(thinLine(ink, 1), circlePath(n, fr, 240))
	for _, d := range []float64{-k.LateralLimit, k.LateralLimit} {
		s, co := geom.SinCosDeg(dd + d)
		a, b := n.pt(Point{X: s * fr, Y: co * fr}), n.pt(Point{X: s, Y: co})
		n.c.StrokeLines(thinLine(kinPlanarInk, 0.9), []vg.Point{a, b})
		px, py := vg.Length(co)*vg.Points(3), -vg.Length(s)*vg.Points(3)
		n.c.StrokeLines(thinLine(kinPlanarInk, 0.9), []vg.Point{{X: a.X - px, Y: a.Y - py}, {X: a.X + px, Y: a.Y + py}})
	}
	n.c.StrokeLines(thinLine(ink, 2), n.path(k.Proj.GreatCircle(k.Face, 120)))
}

func thinLine(clr color.Color, w float64) draw.LineStyle {
	return draw.LineStyle{Color: clr, Width: vg.Points(w)}
}
