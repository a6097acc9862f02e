package plots

import (
	"fmt"
	"image/color"
	"math"

	"cleft/planes/slope"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// kinRadius is the half-size of the symbol of it at glyph scale g, its
// outline and white rim included.
func kinRadius(it KinItem, g float64) vg.Length {
	switch {
	case canFail(it):
		return vg.Points(5.4*g + 1.5)
	case it.Intersection:
		return vg.Points(3.4*g + 1.3)
	}
	return vg.Points(2.8*g + 0.5)
}

// kinGlyph draws one line at glyph scale g: those that can fail large with a heavy outline
// and the ramp's light fill (triangle: planar sliding; downward triangle:
// flexural toppling; diamond: wedge sliding); the others small (circle: dip
// vector; diamond: line of intersection), filled by the condition of the
// sliding test that stops them: white when it does not daylight, the ramp's
// middle when it daylights but is flatter than φ, its dark end when only the
// lateral limit stops planar sliding.
func kinGlyph(c *draw.Canvas, it KinItem, at vg.Point, g float64) {
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
		poly(kinCanFail, heavy, diamond(vg.Points(5.2*g)))
		if it.OnePlane {
			c.StrokeLine2(draw.LineStyle{Color: poleInk, Width: vg.Points(1.2)}, at.X-vg.Points(5.2*g), at.Y, at.X+vg.Points(5.2*g), at.Y)
		}
		return
	case it.Feasible:
		r := vg.Points(5.4 * g)
		poly(kinCanFail, heavy, []vg.Point{{X: at.X, Y: at.Y + r}, {X: at.X - r*0.866, Y: at.Y - r/2}, {X: at.X + r*0.866, Y: at.Y - r/2}})
		return
	case it.Toppling:
		r := vg.Points(5.4 * g)
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
		poly(fill, edge, diamond(vg.Points(3.4*g)))
		return
	}
	r := vg.Points(2.8 * g)
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

// keys returns the net's keys, fullest first (see layFrameOf); unnamed is
// how many lines that can fail are not named.
func (k *KinematicNet) keys(unnamed int) []*keyBox {
	return []*keyBox{k.key(unnamed, 0), k.key(unnamed, 1), k.key(unnamed, 2)}
}

// key returns the net's key: in full at level 0, in fewer words at 1, and
// at 2 only the lines that can fail and the zones.
func (k *KinematicNet) key(unnamed, level int) *keyBox {
	count := func(f func(KinItem) bool) int {
		n := 0
		for _, it := range k.Items {
			if f(it) {
				n++
			}
		}
		return n
	}
	say := func(long, short string) string {
		if level > 0 {
			return short
		}
		return long
	}
	sample := func(it KinItem) func(c *draw.Canvas, at vg.Point, l look) {
		return func(c *draw.Canvas, at vg.Point, l look) { kinGlyph(c, it, at, keyGlyph(l)) }
	}
	planar := count(func(i KinItem) bool { return !i.Intersection && i.Feasible })
	wedge := count(func(i KinItem) bool { return i.Intersection && i.Feasible })
	topple := count(func(i KinItem) bool { return i.Toppling })
	kb := &keyBox{}
	kb.rows = append(kb.rows,
		keyRow{kind: rowHead, text: say("lines that can fail (named, least FS first)", "can fail (named, least FS first)")},
		keyRow{glyph: sample(KinItem{Feasible: true}), text: fmt.Sprintf(say("plane's dip vector: planar sliding (%d)", "planar sliding (%d)"), planar)},
		keyRow{glyph: sample(KinItem{Intersection: true, Feasible: true}), text: fmt.Sprintf(say("line of intersection: wedge sliding (%d)", "wedge sliding (%d)"), wedge)},
		keyRow{glyph: sample(KinItem{Intersection: true, Feasible: true, OnePlane: true}), text: say("barred: on one plane alone (tested by its dip)", "wedge on one plane alone")},
		keyRow{glyph: sample(KinItem{Toppling: true}), text: fmt.Sprintf(say("plane's dip vector: flexural toppling (%d)", "flexural toppling (%d)"), topple)},
	)
	if unnamed > 0 {
		kb.rows = append(kb.rows, keyRow{kind: rowNote, text: fmt.Sprintf("%d more that can fail are not named, for want of room", unnamed)})
	}
	if level < 2 {
		kb.rows = append(kb.rows,
			keyRow{kind: rowHead, text: say("lines held back (circle: plane, diamond: wedge)", "held back (circle: plane, diamond: wedge)")},
			keyRow{glyph: sample(KinItem{Fails: slope.Lateral}), text: say("dark: only the lateral limit holds it", "dark: by the lateral limit only")},
			keyRow{glyph: sample(KinItem{Intersection: true, Fails: slope.Friction}), text: say("mid tone: daylights, flatter than φ", "mid tone: flatter than φ")},
			keyRow{glyph: sample(KinItem{Intersection: true, Fails: slope.Daylight}), text: "white: does not daylight"},
		)
	}
	kb.rows = append(kb.rows,
		keyRow{kind: rowHead, text: "zones and limits"},
		keyRow{glyph: hatchSample(55, 3, kinPlanarInk, 0.7, true), text: fmt.Sprintf(say("planar sliding zone, within ±%g° (lateral limit)", "planar sliding, ±%g°"), k.LateralLimit)},
		keyRow{glyph: hatchSample(-35, 5, kinWedgeInk, 0.6, false), text: say("wedge sliding zone: daylights, steeper than φ", "wedge sliding")},
		keyRow{glyph: hatchSample(0, 3.5, kinToppleInk, 0.8, true), text: fmt.Sprintf(say("flexural toppling envelope (±%g°)", "flexural toppling, ±%g°"), k.ToppleLimit)},
	)
	if level == 2 {
		return kb
	}
	kb.rows = append(kb.rows,
		keyRow{glyph: lineSample(thinLine(ink, 2)), text: say("face great circle: lines beyond it daylight", "face: lines beyond it daylight")},
		keyRow{glyph: lineSample(thinLine(ink, 1)), text: fmt.Sprintf(say("friction circle, φ = %.1f°: lines inside plunge more steeply", "friction circle, φ = %.1f°"), k.Phi)},
		keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) {
			st := thinLine(kinPlanarInk, 0.9)
			c.StrokeLine2(st, at.X-l.pt(6), at.Y, at.X+l.pt(6), at.Y)
			c.StrokeLine2(st, at.X-l.pt(6), at.Y-l.pt(3), at.X-l.pt(6), at.Y+l.pt(3))
		}, text: fmt.Sprintf(say("lateral limits, ±%g° of the face's dip direction", "lateral limits, ±%g°"), k.LateralLimit)},
	)
	return kb
}

// hatchSample is the key's sample of a hatched zone: a small box hatched
// at deg every gap points in clr, outlined when outline is set.
func hatchSample(deg, gap float64, clr color.Color, w float64, outline bool) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		bw, bh := l.pt(7), l.pt(5)
		box := []vg.Point{{X: at.X - bw, Y: at.Y - bh}, {X: at.X + bw, Y: at.Y - bh}, {X: at.X + bw, Y: at.Y + bh}, {X: at.X - bw, Y: at.Y + bh}}
		hatch(c, box, deg, vg.Points(gap), thinLine(clr, w))
		if outline {
			c.StrokeLines(thinLine(clr, 1.2), append(box, box[0]))
		}
	}
}
