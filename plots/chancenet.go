package plots

import (
	"fmt"
	"image/color"
	"math"
	"strconv"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// ChancePole is one plane on the probability stereonet: its base state
// (the glyph) and its own probability of being critical or opening over
// the realisations (the fill).
type ChancePole struct {
	Name        string
	Orientation planes.Orientation
	State       planes.PlaneState
	P           float64 // ∈ [0, 1]
	Label       bool    // write its name beside it
}

// ChanceNet is the probability stereonet: for every orientation, the share
// of the Monte Carlo's realisations in which a plane of that orientation at
// Depth is critical or opening (a Field computed by the caller from the
// same realisations, at the nodes of ChanceNodes), drawn on the net of the
// tendency stereonet with the poles of the planes filled by their own
// probability and shaped by their base state, and the principal axes of
// the base state.
type ChanceNet struct {
	Site  string
	Lines []string // lines under the site's name
	Depth float64
	State insitu.State // the base state at Depth, for the axes
	Proj  Projection
	Field *Field // probabilities ∈ [0, 1]; required
	Poles []ChancePole

	dropped int // names left out for want of room, in the last Draw
}

// ChanceNodes returns the orientations whose poles are the nodes of an
// n × n field (Field's layout, nodes outside the primitive taken at the
// primitive), for the caller to compute probabilities at.
func ChanceNodes(p Projection, n int) []planes.Orientation {
	f := &Field{N: n}
	out := make([]planes.Orientation, 0, n*n)
	for j := range n {
		for i := range n {
			out = append(out, f.orientation(p, i, j))
		}
	}
	return out
}

// NewProbabilityField returns the Field of probabilities values (n × n, in
// the order of ChanceNodes).
func NewProbabilityField(n int, values []float64) *Field {
	if len(values) != n*n {
		panic("plots: probability field of the wrong size")
	}
	return &Field{N: n, Values: values, Min: 0, Max: 1}
}

// chanceLevels are the contours of the probability field.
var chanceLevels = []float64{0.05, 0.5, 0.95}

// Draw draws the figure on c.
func (s *ChanceNet) Draw(c draw.Canvas) {
	if s.Field == nil {
		panic("plots: ChanceNet.Field is nil")
	}
	f := layFrame(c, append([]string{s.Site}, s.Lines...), s.key(), netScore)
	l := f.l
	n := netIn(&c, f.square(), l)
	g := glyphScale(n.r)
	var ramp Ramp
	drawRaster(n, s.Field, func(v float64) color.NRGBA { return pale(ramp.At(v)) })
	for _, lv := range chanceLevels {
		for _, line := range Chain(s.Field.Contour(s.Field.Values, lv)) {
			n.c.StrokeLines(levelStyle(lv), n.path(line))
		}
	}
	drawPrimitiveLook(n, l)
	for _, pass := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		for _, p := range s.Poles {
			if p.State == pass {
				stateGlyph(n.c, p.State, n.pt(s.Proj.Project(p.Orientation.Pole())), ramp.At(p.P), g)
			}
		}
	}
	drawAxes(n, s.Proj, s.State.Principal, g)

	lab := &labeller{bounds: f.inner, pad: l.pt(1)}
	lab.blockText(f.titleRect())
	lab.blockText(f.keyRect())
	lab.blockText(n.northBox(l))
	for _, p := range s.Poles {
		lab.block(square(n.pt(s.Proj.Project(p.Orientation.Pole())), stateRadius(p.State, g)))
	}
	for i := range 3 {
		for _, q := range axisPoints(s.Proj, s.State.Principal, i) {
			lab.block(square(n.pt(q), axisRadius(g)))
		}
	}
	axis := l.text(9, 6.5, true, ink)
	for i := range 3 {
		for _, q := range axisPoints(s.Proj, s.State.Principal, i) {
			lab.place(axis, axisLabels[i], n.pt(q), axisRadius(g), math.Pi/4, 6)
		}
	}
	for _, p := range s.Poles {
		if p.Label {
			lab.place(l.nameText(), fmt.Sprintf("%s %.2f", p.Name, p.P), n.pt(s.Proj.Project(p.Orientation.Pole())), stateRadius(p.State, g), 0, 24)
		}
	}
	lab.draw(&c)
	f.drawText(&c)
	s.dropped = lab.dropped
}

// levelStyle is the line of the contour at probability lv: red dashes at
// 0.5, thin dark lines else.
func levelStyle(lv float64) draw.LineStyle {
	if lv == 0.5 {
		return draw.LineStyle{Color: warning, Width: vg.Points(1.3), Dashes: []vg.Length{vg.Points(5), vg.Points(2)}}
	}
	return draw.LineStyle{Color: color.NRGBA{R: 0x10, G: 0x10, B: 0x10, A: 0xa0}, Width: vg.Points(0.5)}
}

// key returns the probability net's key.
func (s *ChanceNet) key() *keyBox {
	k := &keyBox{head: "P(critical or opening)", bar: chanceBar{},
		notes: []string{"light: more often unstable", "thin lines: 0.05 and 0.95; red dashes: as likely as not (0.5)"}}
	count := map[planes.PlaneState]int{}
	for _, p := range s.Poles {
		count[p.State]++
	}
	mid := Ramp{}.At(0.5)
	state := func(st planes.PlaneState, txt string) keyRow {
		return keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { stateGlyph(c, st, at, mid, keyGlyph(l)) }, text: txt}
	}
	k.rows = append(k.rows,
		state(planes.Stable, fmt.Sprintf("pole, stable in the base (%d)", count[planes.Stable])),
		state(planes.Critical, fmt.Sprintf("pole, critical in the base (%d)", count[planes.Critical])),
		state(planes.Opening, fmt.Sprintf("pole, opening in the base (%d)", count[planes.Opening])),
		keyRow{kind: rowNote, text: "fill: the plane's own probability; named: the least sure, with it"})
	for i := range 3 {
		a := s.State.Principal.Axis(i)
		k.rows = append(k.rows, keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { axisGlyph(c, i, at, keyGlyph(l)) },
			text: fmt.Sprintf("%s axis, base (%s)", axisLabels[i], fmtLine(a.Trend, a.Plunge))})
	}
	return k
}

// chanceBar is the probability net's colour bar: the ramp from 0 to 1,
// rising to the right, with the contour levels marked.
type chanceBar struct{}

func (chanceBar) strip(l look) vg.Length { return l.pt(8) }

func (b chanceBar) height(l look, _ vg.Length) vg.Length {
	_, th := textBox(l.tickText(), "0")
	return b.strip(l) + l.pt(3) + th + l.pt(2)
}

func (b chanceBar) draw(c *draw.Canvas, l look, r vg.Rectangle) {
	w := min(r.Max.X-r.Min.X, l.pt(200))
	x0, top := r.Min.X, r.Max.Y-l.pt(2)
	bottom := top - b.strip(l)
	at := func(v float64) vg.Length { return x0 + w*vg.Length(v) }
	var ramp Ramp
	const steps = 100
	for k := range steps {
		v0, v1 := float64(k)/steps, float64(k+1)/steps
		c.FillPolygon(ramp.At(0.5*(v0+v1)), []vg.Point{{X: at(v0), Y: bottom}, {X: at(v1) + 0.3, Y: bottom}, {X: at(v1) + 0.3, Y: top}, {X: at(v0), Y: top}})
	}
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	c.StrokeLines(frame, []vg.Point{{X: x0, Y: bottom}, {X: x0 + w, Y: bottom}, {X: x0 + w, Y: top}, {X: x0, Y: top}, {X: x0, Y: bottom}})
	for _, lv := range chanceLevels {
		sty := levelStyle(lv)
		sty.Dashes = nil
		c.StrokeLine2(sty, at(lv), bottom-l.pt(1.5), at(lv), top+l.pt(1.5))
	}
	barTicks(c, l, r, bottom, []float64{0, 0.2, 0.4, 0.6, 0.8, 1}, at, func(v float64) string { return strconv.FormatFloat(v, 'f', 1, 64) })
}
