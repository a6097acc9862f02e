package plots

import (
	"fmt"
	"image/color"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// TunnelSeries is one plane or set along the alignment.
type TunnelSeries struct {
	Name     string
	FS       []float64 // far-field factor of safety at each station, with the plane's own strength (NaN: undefined)
	FarBad   []bool    // critical or opening in the far field
	WallSlip []bool    // critical or opening somewhere on the wall
	// ZoneDepth is the greatest depth of the slip zone beyond the wall at
	// each station, m (NaN: no zone; a lower bound where the zone reaches
	// the edge of the search). Nil draws no zone panel.
	ZoneDepth []float64
}

// TunnelProfile is the along-alignment chart, panels one above the other
// over the chainage: cover; σmax/UCS with the spalling band; the far-field
// factor of safety of each plane or set (with its own strength, so one
// FS = 1 line serves every plane) on a logarithmic axis, values beyond its
// ends drawn at the end with an open triangle; the depth of each one's slip
// zone beyond the wall against ZoneLimit, shaded where some plane is
// critical or opening in the far field (its zone has no bound there); and
// one lane per plane or set marking where it is critical or opening in the
// far field (dark) or only somewhere on the wall (light).
//
// Each series has its own colour, dashes and marker; markers of different
// series sit at different stations, so that two series on the same values
// still show apart. The figure lays itself out like the stereonet: text
// sized from the canvas, the key beside the panels or under them.
type TunnelProfile struct {
	Site      string
	Lines     []string
	Chainage  []float64
	Cover     []float64
	Ratio     []float64
	Series    []TunnelSeries
	ZoneLimit float64 // m beyond the wall

	clip fsClip // what the last Draw drew at the ends of the FS axis
}

// The ends of the factor-of-safety axis: values beyond are drawn at them.
const (
	fsTop    = 20.0
	fsBottom = 0.05
)

// fsClip says which series values lie beyond the ends of the FS axis.
type fsClip struct{ above, below bool }

// fsAxis returns the logarithmic axis of the factors of safety: from a
// round value (1, 2 or 5 × 10ⁿ) at or below the least, and at most 0.5, to
// one at or above the greatest, and at least 2, within [fsBottom, fsTop].
func (t *TunnelProfile) fsAxis() (axisScale, fsClip) {
	lo, hi := 0.5, 2.0
	for _, s := range t.Series {
		for _, v := range s.FS {
			if v > 0 && !math.IsInf(v, 0) {
				lo, hi = math.Min(lo, v), math.Max(hi, v)
			}
		}
	}
	a := axisScale{lo: math.Max(fsBottom, roundDown125(lo)), hi: math.Min(fsTop, roundUp125(hi*1.05)), log: true}
	var cl fsClip
	for _, s := range t.Series {
		for _, v := range s.FS {
			cl.above = cl.above || v > a.hi
			cl.below = cl.below || (v < a.lo && !math.IsNaN(v))
		}
	}
	return a, cl
}

// roundUp125 returns the least 1, 2 or 5 × 10ⁿ at or above v > 0, and
// roundDown125 the greatest at or below.
func roundUp125(v float64) float64 {
	e := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 2, 5, 10} {
		if m*e >= v*(1-1e-12) {
			return m * e
		}
	}
	return 10 * e
}

func roundDown125(v float64) float64 {
	e := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{5, 2, 1} {
		if m*e <= v*(1+1e-12) {
			return m * e
		}
	}
	return e
}

func (t *TunnelProfile) hasZones() bool { return len(t.Series) > 0 && t.Series[0].ZoneDepth != nil }

// stack returns the panels of the chart in look l.
func (t *TunnelProfile) stack(l look) *chartStack {
	lo, hi := t.Chainage[0], t.Chainage[len(t.Chainage)-1]
	if hi <= lo {
		hi = lo + 1
	}
	s := &chartStack{l: l, x: axisScale{lo: lo, hi: hi}, xLabel: "chainage (m)"}
	top := 1.0
	for _, v := range t.Cover {
		top = math.Max(top, v)
	}
	s.panels = append(s.panels, &chartPanel{head: "Cover above the crown, m", y: axisScale{lo: 0, hi: top * 1.08}, weight: 0.8, plot: t.coverPlot})
	maxR := 0.6
	for _, r := range t.Ratio {
		maxR = math.Max(maxR, r*1.1)
	}
	s.panels = append(s.panels, &chartPanel{head: "Wall stress σmax / UCS", y: axisScale{lo: 0, hi: maxR * 1.08}, weight: 0.8, plot: t.ratioPlot})
	fa, cl := t.fsAxis()
	t.clip = cl
	s.panels = append(s.panels, &chartPanel{head: "Far-field FS, log scale", y: fa, weight: 1.3, plot: t.fsPlot})
	if t.hasZones() {
		s.panels = append(s.panels, t.zonePanel())
	}
	var names []string
	for _, se := range t.Series {
		names = append(names, se.Name)
	}
	if len(names) > 0 {
		s.panels = append(s.panels, &chartPanel{head: "Critical or opening", lanes: names, plot: t.lanePlot})
	}
	return s
}

// Draw draws the chart on c.
func (t *TunnelProfile) Draw(c draw.Canvas) {
	if len(t.Chainage) == 0 {
		panic("plots: TunnelProfile without stations")
	}
	t.stack(look{k: 1}) // the key needs to know what is clipped
	score := func(l look, main vg.Rectangle) float64 {
		h := t.stack(l).layout(main)
		w := main.Max.X - main.Min.X
		return float64(h) * math.Min(1, float64(w/l.pt(420)))
	}
	f := layFrame(c, append([]string{t.Site}, t.Lines...), t.key(), score)
	s := t.stack(f.l)
	s.layout(f.main)
	s.draw(&c)
	f.drawText(&c)
}

func (t *TunnelProfile) coverPlot(c *draw.Canvas, x, y func(float64) vg.Length) {
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.2)}, c.ClipLinesXY(runs(t.Chainage, t.Cover, x, y)...)...)
}

// spallBand is the onset of spalling, σmax/UCS = 0.4 ± 0.1 (Martin, Kaiser
// & McCreath 1999).
var (
	spallFill  = color.NRGBA{R: 0xf3, G: 0xd9, B: 0xd9, A: 0xff}
	spallStyle = draw.LineStyle{Color: warning, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
	oneStyle   = draw.LineStyle{Color: warning, Width: vg.Points(1), Dashes: []vg.Length{vg.Points(2), vg.Points(2)}}
	farFill    = color.NRGBA{R: 0xec, G: 0xe4, B: 0xd4, A: 0xff}
)

func (t *TunnelProfile) ratioPlot(c *draw.Canvas, x, y func(float64) vg.Length) {
	fillBand(c, y(0.3), y(0.5))
	c.StrokeLine2(spallStyle, c.Min.X, y(0.4), c.Max.X, y(0.4))
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.2)}, c.ClipLinesXY(runs(t.Chainage, t.Ratio, x, y)...)...)
}

// fillBand fills c across between heights y0 and y1.
func fillBand(c *draw.Canvas, y0, y1 vg.Length) {
	c.FillPolygon(spallFill, c.ClipPolygonXY([]vg.Point{{X: c.Min.X, Y: y0}, {X: c.Max.X, Y: y0}, {X: c.Max.X, Y: y1}, {X: c.Min.X, Y: y1}}))
}

func (t *TunnelProfile) fsPlot(c *draw.Canvas, x, y func(float64) vg.Length) {
	a, _ := t.fsAxis()
	if a.lo < 1 && a.hi > 1 {
		c.StrokeLine2(oneStyle, c.Min.X, y(1), c.Max.X, y(1))
	}
	vals := make([][]float64, len(t.Series))
	for i, s := range t.Series {
		vals[i] = s.FS
	}
	t.drawSeries(c, x, y, vals, a.lo, a.hi)
}

// drawSeries draws each series' values, those beyond [lo, hi] at the end
// with an open triangle, and its markers at its own stations.
func (t *TunnelProfile) drawSeries(c *draw.Canvas, x, y func(float64) vg.Length, vals [][]float64, lo, hi float64) {
	g := math.Max(0.7, math.Min(1.4, float64(c.Max.Y-c.Min.Y)/100))
	stride := markStride(len(vals), t.Chainage, x, seriesRadius(g)*4)
	for i, v := range vals {
		line, glyph := seriesStyle(i, g)
		at := make([]float64, len(v))
		for k, val := range v {
			at[k] = math.Max(lo, math.Min(hi, val))
		}
		c.StrokeLines(line, c.ClipLinesXY(runs(t.Chainage, at, x, y)...)...)
		for k, val := range v {
			if math.IsNaN(val) {
				continue
			}
			p := vg.Point{X: x(t.Chainage[k]), Y: y(at[k])}
			switch {
			case val > hi:
				clipGlyph(c, p, glyph.Color, glyph.Radius, 1)
			case val < lo:
				clipGlyph(c, p, glyph.Color, glyph.Radius, -1)
			case marked(k, i, len(vals), stride):
				c.DrawGlyph(glyph, p)
			}
		}
	}
}

// runs returns the polylines through the points (xs, ys) mapped by x and
// y, broken where a value is NaN.
func runs(xs, ys []float64, x, y func(float64) vg.Length) [][]vg.Point {
	var out [][]vg.Point
	var cur []vg.Point
	for k := range xs {
		if math.IsNaN(ys[k]) {
			if len(cur) > 0 {
				out = append(out, cur)
			}
			cur = nil
			continue
		}
		cur = append(cur, vg.Point{X: x(xs[k]), Y: y(ys[k])})
	}
	if len(cur) > 0 {
		out = append(out, cur)
	}
	return out
}

// markStride returns every how many stations a series is marked: at least
// once per series (so that each series marks stations of its own) and no
// closer on the page than gap.
func markStride(series int, chainage []float64, x func(float64) vg.Length, gap vg.Length) int {
	if len(chainage) < 2 || series == 0 {
		return max(1, series)
	}
	step := (x(chainage[len(chainage)-1]) - x(chainage[0])) / vg.Length(len(chainage)-1)
	k := series
	if step > 0 {
		k = max(k, int(math.Ceil(float64(gap/step))))
	}
	return k
}

// marked reports whether series i of n marks station k: series take turns.
func marked(k, i, n, stride int) bool {
	return (k-i*stride/max(1, n))%stride == 0 && k >= i*stride/max(1, n)
}

// clipGlyph draws an open triangle pointing up (dir 1) or down (−1): a
// value beyond the end of the axis, drawn at the end.
func clipGlyph(c *draw.Canvas, at vg.Point, clr color.Color, r vg.Length, dir vg.Length) {
	r *= 1.5
	tri := []vg.Point{{X: at.X, Y: at.Y + dir*r}, {X: at.X - r*0.9, Y: at.Y - dir*r*0.5}, {X: at.X + r*0.9, Y: at.Y - dir*r*0.5}, {X: at.X, Y: at.Y + dir*r}}
	c.FillPolygon(white, tri)
	c.StrokeLines(draw.LineStyle{Color: clr, Width: vg.Points(1)}, tri)
}

func (t *TunnelProfile) clipText() string {
	a, cl := t.fsAxis()
	switch {
	case cl.above && cl.below:
		return fmt.Sprintf("FS above %g or below %g: drawn at the axis' end", a.hi, a.lo)
	case cl.above:
		return fmt.Sprintf("FS above %g: drawn at %g", a.hi, a.hi)
	case cl.below:
		return fmt.Sprintf("FS below %g: drawn at %g", a.lo, a.lo)
	}
	return ""
}
