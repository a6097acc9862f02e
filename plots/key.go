package plots

import (
	"fmt"
	"math"

	"cleft/planes"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// drawKey draws the colour bar and the symbol legend in the column c.
func (s *Stereonet) drawKey(c draw.Canvas, lo, hi float64) {
	m := s.Field.Measure
	x := c.Min.X
	y := c.Max.Y
	head := textStyle(8, true, ink)
	c.FillText(head, vg.Point{X: x, Y: y}, m.Label())
	y -= head.Height("X") + vg.Points(8)

	// The bar: values up the page, the light end at the unstable side.
	barW, barH := vg.Points(12), (c.Max.Y-c.Min.Y)*0.42
	top, bottom := y, y-barH
	var ramp Ramp
	const steps = 120
	for k := range steps {
		v0 := lo + (hi-lo)*float64(k)/steps
		v1 := lo + (hi-lo)*float64(k+1)/steps
		y0 := bottom + barH*vg.Length(k)/steps
		y1 := bottom + barH*vg.Length(k+1)/steps
		clr := ramp.At(s.frac(0.5*(v0+v1), lo, hi))
		c.FillPolygon(clr, []vg.Point{{X: x, Y: y0}, {X: x + barW, Y: y0}, {X: x + barW, Y: y1 + 0.3}, {X: x, Y: y1 + 0.3}})
	}
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	c.StrokeLines(frame, []vg.Point{{X: x, Y: bottom}, {X: x + barW, Y: bottom}, {X: x + barW, Y: top}, {X: x, Y: top}, {X: x, Y: bottom}})
	at := func(v float64) vg.Length { return bottom + barH*vg.Length((v-lo)/(hi-lo)) }
	tick := textStyle(7, false, ink)
	tick.YAlign = draw.YCenter
	for _, t := range (plot.DefaultTicks{}).Ticks(lo, hi) {
		if t.Label == "" || t.Value < lo-1e-9 || t.Value > hi+1e-9 {
			continue
		}
		yy := at(t.Value)
		c.StrokeLine2(frame, x+barW, yy, x+barW+vg.Points(3), yy)
		lbl := t.Label
		if m == FactorOfSafety && math.Abs(t.Value-hi) < 1e-9 {
			lbl = "≥ " + lbl
		}
		c.FillText(tick, vg.Point{X: x + barW + vg.Points(5), Y: yy}, lbl)
	}
	// Contour levels across the bar, and FS = 1 where the bar shows FS.
	for _, l := range s.levels(lo, hi) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.5)}, x, at(l), x+barW, at(l))
	}
	if m == FactorOfSafety && lo < 1 && hi > 1 {
		c.StrokeLine2(draw.LineStyle{Color: white, Width: vg.Points(2.6)}, x-2, at(1), x+barW+2, at(1))
		c.StrokeLine2(draw.LineStyle{Color: warning, Width: vg.Points(1.4)}, x-2, at(1), x+barW+2, at(1))
	}
	note := textStyle(7, false, grey)
	c.FillText(note, vg.Point{X: x, Y: bottom - vg.Points(5)}, m.Direction())
	c.FillText(note, vg.Point{X: x, Y: bottom - vg.Points(14)}, "thin lines: contours at the bar's marks")
	c.FillText(note, vg.Point{X: x, Y: bottom - vg.Points(23)}, "background: same scale, paler")

	// The legend.
	y = bottom - vg.Points(40)
	row := func(glyph func(at vg.Point), txt string) {
		glyph(vg.Point{X: x + vg.Points(6), Y: y})
		t := textStyle(7.5, false, ink)
		t.YAlign = draw.YCenter
		c.FillText(t, vg.Point{X: x + vg.Points(18), Y: y}, txt)
		y -= vg.Points(12.5)
	}
	mid := ramp.At(0.5)
	count := map[planes.PlaneState]int{}
	for _, p := range s.Poles {
		count[p.Result.State]++
	}
	row(func(a vg.Point) { stateGlyph(&c, planes.Stable, a, mid) }, fmt.Sprintf("pole, stable (%d)", count[planes.Stable]))
	row(func(a vg.Point) { stateGlyph(&c, planes.Critical, a, mid) }, fmt.Sprintf("pole, critical: FS ≤ 1 (%d)", count[planes.Critical]))
	row(func(a vg.Point) { stateGlyph(&c, planes.Opening, a, undefinedFill) }, fmt.Sprintf("pole, opening: σn' ≤ 0 (%d)", count[planes.Opening]))
	row(func(a vg.Point) {
		c.StrokeLine2(draw.LineStyle{Color: white, Width: vg.Points(2.6)}, a.X-6, a.Y, a.X+6, a.Y)
		c.StrokeLine2(draw.LineStyle{Color: warning, Width: vg.Points(1.4)}, a.X-6, a.Y, a.X+6, a.Y)
	}, s.slipLineText())
	for i := range 3 {
		row(func(a vg.Point) { axisGlyph(&c, i, a) }, fmt.Sprintf("%s axis (%s)", axisLabels[i], fmtLine(s.State.Principal.Axis(i).Trend, s.State.Principal.Axis(i).Plunge)))
	}
	if hasTrace(s.Poles) {
		row(func(a vg.Point) {
			c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.9)}, a.X-6, a.Y, a.X+6, a.Y)
		}, "great circle of a named plane")
	}
	if len(s.Means) > 0 {
		row(func(a vg.Point) {
			c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.9), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}, a.X-6, a.Y, a.X+6, a.Y)
		}, "mean plane of a joint set")
	}
	row(func(a vg.Point) {
		c.DrawGlyph(draw.GlyphStyle{Color: undefinedFill, Radius: vg.Points(4), Shape: draw.BoxGlyph{}}, a)
	}, "grey: value undefined")
}

func (s *Stereonet) slipLineText() string {
	if !s.slipLine {
		return fmt.Sprintf("FS = 1: no orientation reaches it at %g m", s.Depth)
	}
	return fmt.Sprintf("FS = 1 at %g m: the orientations that slip", s.Depth)
}

func hasTrace(ps []Pole) bool {
	for _, p := range ps {
		if p.Trace {
			return true
		}
	}
	return false
}

// fmtLine writes a line as TTT/PP in whole degrees, the trend in [0, 360)
// (a trend a hair below 0 is 000, not -00).
func fmtLine(trend, plunge float64) string {
	t := math.Mod(math.Round(trend)+360, 360) + 0
	return fmt.Sprintf("%03.0f/%02.0f", t, math.Round(plunge)+0)
}
