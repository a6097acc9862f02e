package plots

import (
	"fmt"
	"image/color"
	"math"
	"strings"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// MohrPoint is one plane on the Mohr diagram, resolved at the diagram's
// depth. Own, when not nil, is the plane's result at its own Depth (the
// value of the tables), stated beside the arrow's value when the depths
// differ.
type MohrPoint struct {
	Name   string
	Result planes.Result
	Depth  float64        // the plane's own depth, m (with Own)
	Own    *planes.Result // at Depth; nil: not given
}

// Envelope is a strength criterion drawn as its envelope τ = strength(σn').
type Envelope struct {
	Label     string
	Criterion planes.Criterion
}

// Mohr is the Mohr diagram of effective stress at one depth: the three
// circles (σ1'–σ3', σ1'–σ2', σ2'–σ3'), a point (σn', τ) for every plane,
// the envelopes of the criteria in use, and an arrow for the pore-pressure
// change that brings the most critical plane to its envelope. Both axes
// have the same scale, so the circles are circles. The key goes beside the
// plot or under it, whichever leaves the plot larger, never over the data;
// points are named when there are at most NameAll of them, and critical
// and opening ones always.
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

	dropped int // names left out for want of room, in the last Draw
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
		xmax = math.Max(xmax, r.EffectiveNormal-m.State.Biot*r.PressureToSlip)
	}
	span := math.Max(xmax-xmin, 1e-6)
	return xmin - 0.06*span, xmax + 0.06*span, math.Max(ymax*1.25, 0.1*span)
}

// sub returns the part r of c as a canvas of its own.
func sub(c draw.Canvas, r vg.Rectangle) draw.Canvas {
	return draw.Crop(c, r.Min.X-c.Min.X, r.Max.X-c.Max.X, r.Min.Y-c.Min.Y, r.Max.Y-c.Max.Y)
}

// title returns the title lines.
func (m *Mohr) title() []string {
	lines := []string{m.Site, fmt.Sprintf("Mohr diagram of effective stress at %g m", m.Depth), m.Model}
	if m.Note != "" {
		lines = append(lines, strings.Split(m.Note, "\n")...)
	}
	return lines
}

// minMohrSide is the least width and height of the Mohr diagram's data
// area that a layout may leave it.
const minMohrSide = 40 // points

// layout lays the figure out on c and returns the frame and the plot,
// scaled equally on both axes in the frame's main area.
func (m *Mohr) layout(c draw.Canvas) (frame, *plot.Plot) {
	score := func(l look, main vg.Rectangle) float64 {
		p := m.plot(l, main)
		da := p.DataCanvas(sub(c, main))
		if da.Max.X-da.Min.X < minMohrSide || da.Max.Y-da.Min.Y < minMohrSide {
			return 0 // no room for the circles: the key must go elsewhere or shrink
		}
		return float64(da.Max.X-da.Min.X) / (p.X.Max - p.X.Min)
	}
	f := layFrame(c, m.title(), m.key(), score)
	return f, m.plot(f.l, f.main)
}

// Draw draws the figure on c.
func (m *Mohr) Draw(c draw.Canvas) {
	f, p := m.layout(c)
	main := sub(c, f.main)
	p.Draw(main)
	da := p.DataCanvas(main)
	tx, ty := p.Transforms(&da)
	g := math.Max(0.55, math.Min(1.5, float64(min(da.Max.X-da.Min.X, da.Max.Y-da.Min.Y)/vg.Points(220))))
	lab := &labeller{bounds: da.Rectangle, pad: f.l.pt(1)}
	at := func(q *MohrPoint) (vg.Point, bool) {
		pt := vg.Point{X: tx(q.Result.EffectiveNormal), Y: ty(q.Result.Shear)}
		return pt, da.Contains(pt)
	}
	for _, st := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		for i := range m.Points {
			if q := &m.Points[i]; q.Result.State == st {
				if pt, ok := at(q); ok {
					stateGlyph(&da, st, pt, pointFill(st), g)
					lab.block(square(pt, stateRadius(st, g)))
				}
			}
		}
	}
	crit := m.critical()
	if crit >= 0 {
		q := &m.Points[crit]
		if pt, ok := at(q); ok {
			to := vg.Point{X: tx(q.Result.EffectiveNormal - m.State.Biot*q.Result.PressureToSlip), Y: pt.Y}
			lab.block(shiftArrow(&da, pt, to, stateRadius(q.Result.State, g), f.l))
		}
	}
	for _, critical := range []bool{true, false} {
		for i := range m.Points {
			q := &m.Points[i]
			if (q.Result.State != planes.Stable) != critical || !(critical || len(m.Points) <= NameAll) {
				continue
			}
			if pt, ok := at(q); ok {
				name := q.Name
				if i == crit { // the arrow's plane: its value beside its name
					name += fmt.Sprintf(": ΔPp %+.2f MPa", q.Result.PressureToSlip)
				}
				lab.place(f.l.nameText(), name, pt, stateRadius(q.Result.State, g), math.Pi/4, 10)
			}
		}
	}
	lab.draw(&da)
	f.drawText(&c)
	m.dropped = lab.dropped
}

// equalScale widens one of the ranges of p so that a unit of x and a unit
// of y have the same length on c.
func equalScale(p *plot.Plot, c draw.Canvas) {
	for range 3 { // tick labels change the data area a little; settle it
		da := p.DataCanvas(c)
		w, h := float64(da.Max.X-da.Min.X), float64(da.Max.Y-da.Min.Y)
		if !(w > 0 && h > 0) {
			return // no data area to scale (a canvas too small for the axes)
		}
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
	f, p := m.layout(c)
	da := p.DataCanvas(sub(c, f.main))
	return float64(da.Max.X-da.Min.X) / (p.X.Max - p.X.Min), float64(da.Max.Y-da.Min.Y) / (p.Y.Max - p.Y.Min)
}

// plot returns the axes, grid, circles, zero line and envelopes in look l,
// scaled equally for the area main.
func (m *Mohr) plot(l look, main vg.Rectangle) *plot.Plot {
	p := plot.New()
	p.BackgroundColor = color.Transparent
	p.X.Label.Text = "effective normal stress σn' (MPa)"
	p.Y.Label.Text = "shear stress τ (MPa)"
	w, h := main.Max.X-main.Min.X, main.Max.Y-main.Min.Y
	p.X.Tick.Marker = niceTicks{n: max(3, min(10, int(w/l.pt(45))))}
	p.Y.Tick.Marker = niceTicks{n: max(3, min(8, int(h/l.pt(28))))}
	for _, a := range []*plot.Axis{&p.X, &p.Y} {
		a.Label.TextStyle.Font = l.text(9, 6.5, false, ink).Font
		a.Tick.Label.Font = l.text(8, 5.5, false, ink).Font
	}
	p.Add(plotter.NewGrid())
	p.Add(&mohrCircles{s: m.State.EffectivePrincipal()})
	p.Add(&zeroLine{})
	for i, env := range m.Envelopes {
		p.Add(&envelope{c: env.Criterion, style: envelopeStyle(i)})
	}
	xmin, xmax, ymax := m.ranges()
	p.X.Min, p.X.Max, p.Y.Min, p.Y.Max = xmin, xmax, 0, ymax
	// The data area depends on the area's size only, not on where it is.
	equalScale(p, draw.Canvas{Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}})
	return p
}

// key returns the diagram's key: the circles, the zero line, every
// envelope, the planes by state and the arrow with its value and depth.
func (m *Mohr) key() *keyBox {
	k := &keyBox{rows: []keyRow{
		{glyph: lineSample(circleStyle), text: "Mohr circles σ1'–σ3', σ1'–σ2', σ2'–σ3'"},
		{glyph: lineSample(zeroStyle), text: "σn' = 0: planes to the left open"},
	}}
	for i, env := range m.Envelopes {
		k.rows = append(k.rows, keyRow{glyph: lineSample(envelopeStyle(i)), text: env.Label})
	}
	for _, st := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		n := 0
		for _, q := range m.Points {
			if q.Result.State == st {
				n++
			}
		}
		if n > 0 {
			k.rows = append(k.rows, keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { stateGlyph(c, st, at, pointFill(st), keyGlyph(l)) },
				text: fmt.Sprintf("plane, %s (%d)", st, n)})
		}
	}
	if i := m.critical(); i >= 0 {
		dir := vg.Length(-1) // a rise in Pp moves the point left
		if m.Points[i].Result.PressureToSlip < 0 {
			dir = 1
		}
		k.rows = append(k.rows, keyRow{glyph: arrowSample(dir), text: m.arrowText(&m.Points[i])})
	}
	return k
}

// arrowText says what the arrow shows, at which depth, and the value of the
// tables at the plane's own depth when that differs.
func (m *Mohr) arrowText(q *MohrPoint) string {
	d := q.Result.PressureToSlip
	s := fmt.Sprintf("%s at %g m: a rise of %.2f MPa in Pp brings it to slip", q.Name, m.Depth, d)
	if q.Result.OpensFirst {
		s = fmt.Sprintf("%s at %g m: a rise of %.2f MPa in Pp opens it (its cohesion carries τ)", q.Name, m.Depth, d)
	}
	if d < 0 {
		s = fmt.Sprintf("%s at %g m: past its strength; Pp %.2f MPa lower would hold it", q.Name, m.Depth, -d)
	}
	if q.Own != nil && q.Depth != m.Depth && !math.IsNaN(q.Own.PressureToSlip) {
		s += fmt.Sprintf(" (at its own depth, %g m, the tables give ΔPp %+.2f MPa)", q.Depth, q.Own.PressureToSlip)
	}
	return s
}
