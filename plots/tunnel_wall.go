package plots

import (
	"fmt"
	"image/color"
	"math"
	"strings"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// WallSet is one plane or set on the perimeter plot.
type WallSet struct {
	Name     string
	Critical []bool // at each wall point
	Opening  []bool
}

// TunnelWall is the perimeter plot of one station, looking along the drive
// (crown up, right sidewall right): the tangential stress σθ drawn
// radially from the wall (compression outward, tension inward), and one
// ring per plane or set marking the arcs of the wall where it is critical
// (solid) or opening (dashed). It lays itself out like the stereonet: the
// crown, sidewall and invert labels lie outside the outermost ring, clear
// of the curve; each ring is named outside the rings, with a leader.
type TunnelWall struct {
	Site   string
	Lines  []string
	Step   float64   // degrees between wall points, from the crown
	Sigma  []float64 // σθ at each wall point, MPa
	UCS    float64
	Sets   []WallSet
	Radius float64 // of the opening, m (for the caption only)
	// ThetaMax and WallMax are the exact peaks of σθ and of the largest wall
	// principal stress σmax (stress MPa, angle ° from the crown in
	// [0, 180)), named in the key; Stress 0 leaves a line out.
	ThetaMax, WallMax WallPeak

	dropped int          // names left out for want of room, in the last Draw
	outer   float64      // the radius the labels keep clear of, pt, in the last Draw
	centre  vg.Point     // of the drawing, in the last Draw
	labels  []placedName // the compass labels and ring names of the last Draw
}

// WallPeak is a peak stress round the wall and where it occurs.
type WallPeak struct{ Stress, At float64 }

var wallMarks = []struct {
	a   float64
	txt string
}{{0, "crown 0°"}, {90, "right 90°"}, {180, "invert 180°"}, {270, "left 270°"}}

// room returns the room kept beside and above the rings for the compass
// labels in look l.
func wallRoom(l look) (side, top vg.Length) {
	for _, m := range wallMarks {
		side = max(side, textWidth(l.keyText(), m.txt))
	}
	_, h := textBox(l.keyText(), "0")
	return side + l.pt(4), h + l.pt(4)
}

// wallRadius is the outer radius of the rings in main.
func wallRadius(l look, main vg.Rectangle) vg.Length {
	side, top := wallRoom(l)
	return max(0, min((main.Max.X-main.Min.X)/2-side, (main.Max.Y-main.Min.Y)/2-top))
}

var (
	criticalArc = func(w vg.Length) draw.LineStyle { return draw.LineStyle{Color: warning, Width: w} }
	openingArc  = func(w vg.Length) draw.LineStyle {
		return draw.LineStyle{Color: toppleInk, Width: w, Dashes: []vg.Length{vg.Points(2), vg.Points(1.5)}}
	}
	wallCurve = draw.LineStyle{Color: ink, Width: vg.Points(1.1)}
)

// Draw draws the figure on c.
func (t *TunnelWall) Draw(c draw.Canvas) {
	f := layFrame(c, append([]string{t.Site}, t.Lines...), t.key(), func(l look, main vg.Rectangle) float64 { return float64(wallRadius(l, main)) })
	l := f.l
	R := wallRadius(l, f.main)
	side, top := wallRoom(l)
	cx := f.main.Min.X + side + R
	if f.below {
		cx = (f.main.Min.X + f.main.Max.X) / 2
	}
	cy := f.main.Max.Y - top - R
	pt := func(theta float64, r vg.Length) vg.Point { // θ from the crown, clockwise
		s, co := math.Sincos(theta * math.Pi / 180)
		return vg.Point{X: cx + r*vg.Length(s), Y: cy + r*vg.Length(co)}
	}
	n := len(t.Sets)
	d := max(vg.Points(1.5), min(max(l.pt(5), R*0.05), l.pt(9), 0.5*R/vg.Length(max(1, n))))
	rs := R - vg.Length(n)*d // inside the innermost ring
	r0 := (rs - d) / 1.7
	peak := 1e-9
	for _, v := range t.Sigma {
		peak = math.Max(peak, math.Abs(v))
	}
	scale := float64(r0) * 0.7 / peak
	// The opening, σθ round the wall and the ticks from the wall to it.
	ring := arc(pt, r0, 0, 360)
	c.FillPolygon(openingFill, ring)
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.4)}, ring)
	var curve []vg.Point
	m := len(t.Sigma)
	for k := 0; k <= m; k++ {
		curve = append(curve, pt(float64(k%m)*t.Step, r0+vg.Length(t.Sigma[k%m]*scale)))
	}
	for k := 0; k < m; k += max(1, int(math.Round(30/t.Step))) {
		a := float64(k) * t.Step
		c.StrokeLines(draw.LineStyle{Color: grey, Width: vg.Points(0.5)}, []vg.Point{pt(a, r0), pt(a, r0+vg.Length(t.Sigma[k]*scale))})
	}
	c.StrokeLines(wallCurve, curve)
	// Rings of the sets, inner first.
	w := d * 0.6
	for i, s := range t.Sets {
		r := rs + d*(vg.Length(i)+0.5)
		c.StrokeLines(draw.LineStyle{Color: light, Width: vg.Points(0.5)}, arc(pt, r, 0, 360))
		for _, a := range wallRuns(s.Critical, t.Step) {
			c.StrokeLines(criticalArc(w), arc(pt, r, a[0], a[1]))
		}
		for _, a := range wallRuns(s.Opening, t.Step) {
			c.StrokeLines(openingArc(w), arc(pt, r, a[0], a[1]))
		}
	}
	// Labels: outside the rings, clear of each other, the title and the key.
	lab := &labeller{bounds: f.inner, pad: l.pt(1)}
	lab.blockText(f.titleRect())
	lab.blockText(f.keyRect())
	lab.blockDisk(vg.Point{X: cx, Y: cy}, R+l.pt(1), l.pt(3))
	for _, mk := range wallMarks {
		lab.place(l.keyText(), mk.txt, pt(mk.a, R+l.pt(1)), l.pt(1), (90-mk.a)*math.Pi/180, 8)
	}
	for i, s := range t.Sets {
		a := 225 + (float64(i)-float64(n-1)/2)*math.Min(6, 40/float64(max(1, n)))
		lab.place(l.nameText(), s.Name, pt(a, rs+d*(vg.Length(i)+0.5)), vg.Points(0.5), (90-a)*math.Pi/180, 40)
	}
	lab.draw(&c)
	f.drawText(&c)
	t.dropped, t.outer, t.centre, t.labels = lab.dropped, float64(R), vg.Point{X: cx, Y: cy}, lab.names
}

// wallRuns returns the arcs, in degrees from the crown, of the runs of
// wall points where on is true, each point standing for step degrees
// centred on it; a run through the crown is one arc, and all points on is
// the whole circle.
func wallRuns(on []bool, step float64) [][2]float64 {
	n := len(on)
	start := -1
	for k := range n {
		if !on[k] {
			start = k
			break
		}
	}
	if start < 0 {
		if n == 0 {
			return nil
		}
		return [][2]float64{{0, 360}}
	}
	var out [][2]float64
	for j := 1; j <= n; j++ {
		k := (start + j) % n
		if !on[k] {
			continue
		}
		first := start + j
		for j+1 <= n && on[(start+j+1)%n] {
			j++
		}
		out = append(out, [2]float64{float64(first)*step - step/2, float64(start+j)*step + step/2})
	}
	return out
}

// key returns the wall plot's key.
func (t *TunnelWall) key() *keyBox {
	peak := 0.0
	for _, v := range t.Sigma {
		peak = math.Max(peak, math.Abs(v))
	}
	k := &keyBox{head: "wall of the opening"}
	if p := t.ThetaMax; p.Stress != 0 {
		k.notes = append(k.notes, fmt.Sprintf("largest σθ %.1f MPa at %.0f° and %.0f°", p.Stress, p.At, p.At+180))
	}
	if p := t.WallMax; p.Stress != 0 {
		k.notes = append(k.notes, fmt.Sprintf("largest wall stress σmax %.1f MPa at %.0f°, %.2f of the UCS", p.Stress, p.At, p.Stress/t.UCS))
	}
	k.rows = append(k.rows,
		keyRow{glyph: lineSample(wallCurve), text: fmt.Sprintf("σθ round the wall, compression outward; %.1f MPa from the wall to the outermost point", peak)},
		keyRow{glyph: arcSample(criticalArc), text: "critical (FS ≤ 1) at the wall"},
		keyRow{glyph: arcSample(openingArc), text: "opening (σn' ≤ 0) at the wall"},
	)
	if len(t.Sets) > 0 {
		var names []string
		for _, s := range t.Sets {
			names = append(names, s.Name)
		}
		k.rows = append(k.rows, keyRow{kind: rowNote, text: "rings, inner to outer: " + strings.Join(names, ", ")})
	}
	return k
}

// arcSample is the key's sample of a ring's arc.
func arcSample(sty func(vg.Length) draw.LineStyle) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		c.StrokeLine2(sty(l.pt(4)), at.X-l.pt(7), at.Y, at.X+l.pt(7), at.Y)
	}
}

var openingFill = color.NRGBA{R: 0xf0, G: 0xf0, B: 0xee, A: 0xff}

func arc(pt func(float64, vg.Length) vg.Point, r vg.Length, a0, a1 float64) []vg.Point {
	var out []vg.Point
	for a := a0; a < a1; a += 2 {
		out = append(out, pt(a, r))
	}
	return append(out, pt(a1, r))
}
