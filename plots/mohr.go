package plots

import (
	"fmt"
	"image/color"
	"math"
	"strconv"
	"strings"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// MohrPoint is one plane on the Mohr diagram, resolved at the diagram's
// depth.
type MohrPoint struct {
	Name   string
	Result planes.Result
}

// Envelope is a strength criterion drawn as its envelope τ = strength(σn').
type Envelope struct {
	Label     string
	Criterion planes.Criterion
}

// Mohr is the Mohr diagram of effective stress at one depth: the three
// circles (σ1'–σ3', σ1'–σ2', σ2'–σ3'), a point (σn', τ) for every plane,
// the envelopes of the criteria in use, and an arrow for the pore-pressure
// rise that brings the most critical plane to its envelope. Both axes have
// the same scale, so the circles are circles.
type Mohr struct {
	Site      string
	Model     string
	Depth     float64
	State     insitu.State
	Points    []MohrPoint
	Envelopes []Envelope
	// Note is a line under the title saying how the points were placed
	// (more lines when it holds line breaks).
	Note string
}

// critical returns the index of the plane, among those not opening, with
// the least pressure to slip (the most critical), or −1. Opening planes are
// left out: they have already lost their normal stress.
func (m *Mohr) critical() int {
	best := -1
	for i, p := range m.Points {
		if math.IsNaN(p.Result.PressureToSlip) || p.Result.State == planes.Opening {
			continue
		}
		if best < 0 || p.Result.PressureToSlip < m.Points[best].Result.PressureToSlip {
			best = i
		}
	}
	return best
}

// ranges returns the data ranges before the equal-scale adjustment.
func (m *Mohr) ranges() (xmin, xmax, ymax float64) {
	e := m.State.EffectivePrincipal()
	xmin, xmax = math.Min(0, e[2]), e[0]
	ymax = (e[0] - e[2]) / 2
	for _, p := range m.Points {
		xmin = math.Min(xmin, p.Result.EffectiveNormal)
		ymax = math.Max(ymax, p.Result.Shear)
	}
	if i := m.critical(); i >= 0 {
		r := m.Points[i].Result
		xmin = math.Min(xmin, r.EffectiveNormal-m.State.Biot*r.PressureToSlip)
	}
	span := math.Max(xmax-xmin, 1e-6)
	return xmin - 0.06*span, xmax + 0.06*span, math.Max(ymax*1.25, 0.1*span)
}

// Draw draws the figure on c.
func (m *Mohr) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	lines := []string{m.Site, fmt.Sprintf("Mohr diagram of effective stress at %g m", m.Depth), m.Model}
	if m.Note != "" {
		lines = append(lines, strings.Split(m.Note, "\n")...)
	}
	th := titleBlock(&c, lines) + vg.Points(4)
	body := draw.Crop(c, 0, 0, 0, -th)
	p := m.plot()
	xmin, xmax, ymax := m.ranges()
	p.X.Min, p.X.Max, p.Y.Min, p.Y.Max = xmin, xmax, 0, ymax
	equalScale(p, body)
	p.Draw(body)
}

// equalScale widens one of the ranges of p so that a unit of x and a unit
// of y have the same length on c.
func equalScale(p *plot.Plot, c draw.Canvas) {
	for range 3 { // tick labels change the data area a little; settle it
		da := p.DataCanvas(c)
		w, h := float64(da.Max.X-da.Min.X), float64(da.Max.Y-da.Min.Y)
		sx, sy := w/(p.X.Max-p.X.Min), h/(p.Y.Max-p.Y.Min)
		if sx > sy {
			p.X.Max = p.X.Min + w/sy
		} else {
			p.Y.Max = p.Y.Min + h/sx
		}
	}
}

// Scales returns the lengths of one MPa along x and y when the figure is
// drawn on c: equal, to within the layout's rounding.
func (m *Mohr) Scales(c draw.Canvas) (sx, sy float64) {
	p := m.plot()
	xmin, xmax, ymax := m.ranges()
	p.X.Min, p.X.Max, p.Y.Min, p.Y.Max = xmin, xmax, 0, ymax
	equalScale(p, c)
	da := p.DataCanvas(c)
	return float64(da.Max.X-da.Min.X) / (p.X.Max - p.X.Min), float64(da.Max.Y-da.Min.Y) / (p.Y.Max - p.Y.Min)
}

func (m *Mohr) plot() *plot.Plot {
	p := plot.New()
	p.BackgroundColor = color.Transparent
	p.X.Label.Text = "effective normal stress σn' (MPa)"
	p.Y.Label.Text = "shear stress τ (MPa)"
	for _, a := range []*plot.Axis{&p.X, &p.Y} {
		a.Label.TextStyle.Font = textStyle(9, false, ink).Font
		a.Tick.Label.Font = textStyle(8, false, ink).Font
		a.Tick.Marker = niceTicks{}
	}
	p.Add(plotter.NewGrid())
	e := m.State.EffectivePrincipal()
	circles := &mohrCircles{s: e}
	p.Add(circles)
	p.Legend.Add("Mohr circles σ1'–σ3', σ1'–σ2', σ2'–σ3'", circles)
	opening := &zeroLine{}
	p.Add(opening)
	p.Legend.Add("σn' = 0: planes to the left open", opening)
	dashes := [][]vg.Length{nil, {vg.Points(5), vg.Points(3)}, {vg.Points(1.5), vg.Points(2)}, {vg.Points(6), vg.Points(2), vg.Points(1.5), vg.Points(2)}}
	for i, env := range m.Envelopes {
		l := &envelope{c: env.Criterion, style: draw.LineStyle{Color: warning, Width: vg.Points(1.3), Dashes: dashes[i%len(dashes)]}}
		p.Add(l)
		p.Legend.Add(env.Label, l)
	}
	for _, st := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		pts := &mohrPoints{state: st}
		for _, q := range m.Points {
			if q.Result.State == st {
				pts.xy = append(pts.xy, [2]float64{q.Result.EffectiveNormal, q.Result.Shear})
				if st != planes.Stable {
					pts.names = append(pts.names, q.Name)
				}
			}
		}
		p.Add(pts)
		if len(pts.xy) > 0 {
			p.Legend.Add(fmt.Sprintf("plane, %s (%d)", st, len(pts.xy)), pts)
		}
	}
	if i := m.critical(); i >= 0 {
		q := m.Points[i]
		label := fmt.Sprintf("%s: a rise of %.2f MPa in Pp brings it to slip", q.Name, q.Result.PressureToSlip)
		if q.Result.PressureToSlip < 0 {
			label = fmt.Sprintf("%s: past its strength; Pp %.2f MPa lower would hold it", q.Name, -q.Result.PressureToSlip)
		}
		a := &shiftArrow{x: q.Result.EffectiveNormal, y: q.Result.Shear, dx: -m.State.Biot * q.Result.PressureToSlip}
		p.Add(a)
		p.Legend.Add(label, a)
	}
	p.Legend.Top = true
	p.Legend.Left = true
	p.Legend.TextStyle.Font = textStyle(7.5, false, ink).Font
	p.Legend.Padding = vg.Points(3)
	p.Legend.ThumbnailWidth = vg.Points(18)
	return p
}

// mohrCircles draws the upper halves of the three Mohr circles.
type mohrCircles struct{ s [3]float64 }

func (m *mohrCircles) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	for _, pair := range [][2]int{{0, 2}, {0, 1}, {1, 2}} {
		a, b := m.s[pair[0]], m.s[pair[1]]
		cx, r := (a+b)/2, (a-b)/2
		pts := make([]vg.Point, 181)
		for k := range pts {
			s, co := math.Sincos(math.Pi * float64(k) / 180)
			pts[k] = vg.Point{X: tx(cx + r*co), Y: ty(r * s)}
		}
		w := vg.Points(1.2)
		if pair != [2]int{0, 2} {
			w = vg.Points(0.8)
		}
		c.StrokeLines(draw.LineStyle{Color: ink, Width: w}, c.ClipLinesXY(pts)...)
	}
}

func (m *mohrCircles) Thumbnail(c *draw.Canvas) {
	y := (c.Min.Y + c.Max.Y) / 2
	c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(1.2)}, c.Min.X, y, c.Max.X, y)
}

// zeroLine marks σn' = 0.
type zeroLine struct{}

var zeroStyle = draw.LineStyle{Color: grey, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(1), vg.Points(2)}}

func (z *zeroLine) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	c.StrokeLines(zeroStyle, c.ClipLinesXY([]vg.Point{{X: tx(0), Y: ty(p.Y.Min)}, {X: tx(0), Y: ty(p.Y.Max)}})...)
}

func (z *zeroLine) Thumbnail(c *draw.Canvas) {
	y := (c.Min.Y + c.Max.Y) / 2
	c.StrokeLine2(zeroStyle, c.Min.X, y, c.Max.X, y)
}

// envelope draws τ = strength(σn') for σn' > 0 across the plot.
type envelope struct {
	c     planes.Criterion
	style draw.LineStyle
}

func (e *envelope) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	const n = 200
	var pts []vg.Point
	for k := 0; k <= n; k++ {
		x := p.X.Max * float64(k) / n
		if x <= 0 {
			x = 1e-9 * math.Max(1, p.X.Max)
		}
		pts = append(pts, vg.Point{X: tx(x), Y: ty(e.c.Strength(x))})
	}
	c.StrokeLines(e.style, c.ClipLinesXY(pts)...)
}

func (e *envelope) Thumbnail(c *draw.Canvas) {
	y := (c.Min.Y + c.Max.Y) / 2
	c.StrokeLine2(e.style, c.Min.X, y, c.Max.X, y)
}

// mohrPoints are the planes of one state, with the stereonet's shapes.
// Critical and opening planes are named beside their points.
type mohrPoints struct {
	state planes.PlaneState
	xy    [][2]float64
	names []string // for critical and opening points
}

func (m *mohrPoints) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	lab := textStyle(7.5, true, ink)
	lab.XAlign, lab.YAlign = draw.XLeft, draw.YBottom
	for i, q := range m.xy {
		at := vg.Point{X: tx(q[0]), Y: ty(q[1])}
		if !c.Contains(at) {
			continue
		}
		stateGlyph(&c, m.state, at, pointFill(m.state))
		if i < len(m.names) {
			haloText(&c, lab, vg.Point{X: at.X + vg.Points(6), Y: at.Y + vg.Points(4)}, m.names[i])
		}
	}
}

func pointFill(st planes.PlaneState) color.Color {
	switch st {
	case planes.Critical:
		return Ramp{}.At(1)
	case planes.Opening:
		return undefinedFill
	}
	return white
}

func (m *mohrPoints) Thumbnail(c *draw.Canvas) {
	stateGlyph(c, m.state, c.Center(), pointFill(m.state))
}

// shiftArrow is the horizontal arrow from a plane's point to its envelope:
// a rise ΔPp in pore pressure moves the point left by α·ΔPp.
type shiftArrow struct {
	x, y, dx float64
}

func (a *shiftArrow) Thumbnail(c *draw.Canvas) {
	y := (c.Min.Y + c.Max.Y) / 2
	tip, tail, dir := c.Min.X, c.Max.X, vg.Length(1)
	if a.dx > 0 {
		tip, tail, dir = c.Max.X, c.Min.X, -1
	}
	c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(1)}, tail, y, tip, y)
	c.FillPolygon(ink, []vg.Point{{X: tip, Y: y}, {X: tip + dir*vg.Points(5), Y: y + vg.Points(2.5)}, {X: tip + dir*vg.Points(5), Y: y - vg.Points(2.5)}})
}

func (a *shiftArrow) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	from := vg.Point{X: tx(a.x), Y: ty(a.y)}
	to := vg.Point{X: tx(a.x + a.dx), Y: ty(a.y)}
	sty := draw.LineStyle{Color: ink, Width: vg.Points(1)}
	c.StrokeLine2(sty, from.X, from.Y, to.X, to.Y)
	head := vg.Points(5)
	dir := vg.Length(1)
	if to.X < from.X {
		dir = -1
	}
	if math.Abs(float64(to.X-from.X)) > float64(head) {
		c.FillPolygon(ink, []vg.Point{to, {X: to.X - dir*head, Y: to.Y + head/2}, {X: to.X - dir*head, Y: to.Y - head/2}})
	}
}

// niceTicks labels an axis every 1, 2 or 5 × 10ⁿ, about seven labels.
type niceTicks struct{}

func (niceTicks) Ticks(lo, hi float64) []plot.Tick {
	span := hi - lo
	if !(span > 0) {
		return nil
	}
	raw := span / 7
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	step := mag
	for _, f := range []float64{1, 2, 5, 10} {
		if f*mag >= raw {
			step = f * mag
			break
		}
	}
	dec := max(0, int(-math.Floor(math.Log10(step)+1e-9)))
	var ts []plot.Tick
	for k := math.Ceil(lo/step - 1e-9); k*step <= hi+1e-9*step; k++ {
		v := k * step
		ts = append(ts, plot.Tick{Value: v, Label: strconv.FormatFloat(v+0, 'f', dec, 64)})
	}
	return ts
}
