package plots

import (
	"fmt"
	"image/color"
	"math"

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
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{s.Site}, s.Lines...)) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	right := vg.Points(150)
	side := min(body.Max.X-body.Min.X-right, body.Max.Y-body.Min.Y)
	label := vg.Points(14)
	n := net{c: &c, cx: body.Min.X + side/2, cy: body.Max.Y - side/2, r: side/2 - label}
	if s.Field == nil {
		panic("plots: ChanceNet.Field is nil")
	}
	var ramp Ramp
	drawRaster(n, s.Field, func(v float64) color.NRGBA { return pale(ramp.At(v)) })
	thin := draw.LineStyle{Color: color.NRGBA{R: 0x10, G: 0x10, B: 0x10, A: 0xa0}, Width: vg.Points(0.5)}
	for _, l := range chanceLevels {
		sty := thin
		if l == 0.5 {
			sty = draw.LineStyle{Color: warning, Width: vg.Points(1.3), Dashes: []vg.Length{vg.Points(5), vg.Points(2)}}
		}
		for _, line := range Chain(s.Field.Contour(s.Field.Values, l)) {
			n.c.StrokeLines(sty, n.path(line))
		}
	}
	drawPrimitive(n)
	lab := textStyle(7, false, ink)
	lab.XAlign, lab.YAlign = draw.XLeft, draw.YCenter
	for _, pass := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		for _, p := range s.Poles {
			if p.State != pass {
				continue
			}
			at := n.pt(s.Proj.Project(p.Orientation.Pole()))
			stateGlyph(n.c, p.State, at, ramp.At(p.P), 1)
		}
	}
	drawAxes(n, s.Proj, s.State.Principal, 1)
	var placed []vg.Point
	for i := range 3 { // keep clear of the axes' labels
		l := s.State.Principal.Axis(i)
		q := s.Proj.Project(l)
		for _, pt := range []Point{q, {X: -q.X, Y: -q.Y}} {
			if pt != q && l.Plunge != 0 {
				continue
			}
			at := n.pt(pt)
			placed = append(placed, at, vg.Point{X: at.X + vg.Points(14), Y: at.Y + vg.Points(5)})
		}
	}
	for _, p := range s.Poles {
		if !p.Label {
			continue
		}
		at := n.pt(s.Proj.Project(p.Orientation.Pole()))
		txt := fmt.Sprintf("%s %.2f", p.Name, p.P)
		// Try beside the pole, then above, below and to the left, stepping
		// away from labels already placed.
		w := lab.Width(txt)
		var pos vg.Point
		for k := 0; k < 12; k++ {
			d := vg.Points(6 + 4*float64(k/4))
			switch k % 4 {
			case 0:
				pos = vg.Point{X: at.X + d, Y: at.Y - d}
			case 1:
				pos = vg.Point{X: at.X + d, Y: at.Y + d}
			case 2:
				pos = vg.Point{X: at.X - d - w, Y: at.Y - d}
			default:
				pos = vg.Point{X: at.X - d - w, Y: at.Y + d}
			}
			if !labelCrowded(pos, w, placed) {
				break
			}
		}
		placed = append(placed, pos, vg.Point{X: pos.X + w, Y: pos.Y})
		n.c.StrokeLine2(draw.LineStyle{Color: grey, Width: vg.Points(0.4)}, at.X, at.Y, pos.X+w/2, pos.Y)
		haloText(n.c, lab, pos, txt)
	}
	s.drawKey(draw.Crop(body, side+vg.Points(30), 0, 0, 0))
}

func (s *ChanceNet) drawKey(c draw.Canvas) {
	x, y := c.Min.X, c.Max.Y
	head := textStyle(8, true, ink)
	c.FillText(head, vg.Point{X: x, Y: y}, "P(critical or opening)")
	y -= head.Height("X") + vg.Points(8)
	barW, barH := vg.Points(12), (c.Max.Y-c.Min.Y)*0.42
	top, bottom := y, y-barH
	var ramp Ramp
	const steps = 100
	for k := range steps {
		y0 := bottom + barH*vg.Length(k)/steps
		y1 := bottom + barH*vg.Length(k+1)/steps
		c.FillPolygon(ramp.At((float64(k)+0.5)/steps), []vg.Point{{X: x, Y: y0}, {X: x + barW, Y: y0}, {X: x + barW, Y: y1 + 0.3}, {X: x, Y: y1 + 0.3}})
	}
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	c.StrokeLines(frame, []vg.Point{{X: x, Y: bottom}, {X: x + barW, Y: bottom}, {X: x + barW, Y: top}, {X: x, Y: top}, {X: x, Y: bottom}})
	tick := textStyle(7, false, ink)
	tick.YAlign = draw.YCenter
	for k := 0; k <= 10; k += 2 {
		v := float64(k) / 10
		yy := bottom + barH*vg.Length(v)
		c.StrokeLine2(frame, x+barW, yy, x+barW+vg.Points(3), yy)
		c.FillText(tick, vg.Point{X: x + barW + vg.Points(5), Y: yy}, fmt.Sprintf("%.1f", v))
	}
	for _, l := range chanceLevels {
		sty := draw.LineStyle{Color: ink, Width: vg.Points(0.5)}
		if l == 0.5 {
			sty = draw.LineStyle{Color: warning, Width: vg.Points(1.3)}
		}
		yy := bottom + barH*vg.Length(l)
		c.StrokeLine2(sty, x-2, yy, x+barW+2, yy)
	}
	note := textStyle(7, false, grey)
	for i, t := range []string{"light: more often unstable", "thin lines: 0.05 and 0.95", "red dashes: as likely as not (0.5)"} {
		c.FillText(note, vg.Point{X: x, Y: bottom - vg.Points(5+9*float64(i))}, t)
	}
	y = bottom - vg.Points(40)
	row := func(glyph func(at vg.Point), txt string) {
		glyph(vg.Point{X: x + vg.Points(6), Y: y})
		t := textStyle(7.5, false, ink)
		t.YAlign = draw.YCenter
		c.FillText(t, vg.Point{X: x + vg.Points(18), Y: y}, txt)
		y -= vg.Points(12.5)
	}
	count := map[planes.PlaneState]int{}
	for _, p := range s.Poles {
		count[p.State]++
	}
	mid := ramp.At(0.5)
	row(func(a vg.Point) { stateGlyph(&c, planes.Stable, a, mid, 1) }, fmt.Sprintf("pole, stable in the base (%d)", count[planes.Stable]))
	row(func(a vg.Point) { stateGlyph(&c, planes.Critical, a, mid, 1) }, fmt.Sprintf("pole, critical in the base (%d)", count[planes.Critical]))
	row(func(a vg.Point) { stateGlyph(&c, planes.Opening, a, mid, 1) }, fmt.Sprintf("pole, opening in the base (%d)", count[planes.Opening]))
	note2 := textStyle(7, false, grey)
	note2.YAlign = draw.YCenter
	c.FillText(note2, vg.Point{X: x, Y: y + vg.Points(2)}, "fill: the plane's own probability")
	y -= vg.Points(12)
	for i := range 3 {
		l := s.State.Principal.Axis(i)
		row(func(a vg.Point) { axisGlyph(&c, i, a, 1) }, fmt.Sprintf("%s axis, base (%s)", axisLabels[i], fmtLine(l.Trend, l.Plunge)))
	}
}

// labelCrowded reports whether a label of width w at pos comes within 9 pt
// of the ends of labels already placed.
func labelCrowded(pos vg.Point, w vg.Length, placed []vg.Point) bool {
	for _, q := range placed {
		for _, x := range []vg.Length{pos.X, pos.X + w/2, pos.X + w} {
			if math.Abs(float64(x-q.X)) < 9+float64(w)/2 && math.Abs(float64(pos.Y-q.Y)) < 9 {
				return true
			}
		}
	}
	return false
}
