package plots

import (
	"fmt"
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
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

// TunnelProfile is the along-alignment chart: cover, σmax/UCS with the
// spalling band, the far-field factor of safety of each plane or set (with
// its own strength, so one FS = 1 line serves every plane), and the depth
// of each one's slip zone beyond the wall against ZoneLimit, with the
// stretches shaded where a plane is critical in the far field (darker) or
// slips at the wall (lighter).
type TunnelProfile struct {
	Site      string
	Lines     []string
	Chainage  []float64
	Cover     []float64
	Ratio     []float64
	Series    []TunnelSeries
	ZoneLimit float64 // m beyond the wall
}

var dashSet = [][]vg.Length{nil, {vg.Points(5), vg.Points(2)}, {vg.Points(1.5), vg.Points(1.5)}, {vg.Points(6), vg.Points(2), vg.Points(1.5), vg.Points(2)}, {vg.Points(9), vg.Points(3)}}
var shapeSet = []draw.GlyphDrawer{draw.CircleGlyph{}, draw.SquareGlyph{}, draw.TriangleGlyph{}, draw.PlusGlyph{}, draw.CrossGlyph{}, draw.RingGlyph{}, draw.BoxGlyph{}, draw.PyramidGlyph{}}

func axisStyle(p *plot.Plot) {
	for _, a := range []*plot.Axis{&p.X, &p.Y} {
		a.Label.TextStyle.Font = textStyle(8.5, false, ink).Font
		a.Tick.Label.Font = textStyle(7.5, false, ink).Font
		a.Tick.Marker = niceTicks{}
	}
	p.Legend.TextStyle.Font = textStyle(7, false, ink).Font
	p.BackgroundColor = color.Transparent
}

// shade fills the stretches where bad is true, full height.
type shade struct {
	x   []float64
	bad []bool
	clr color.Color
}

func (s shade) Plot(c draw.Canvas, p *plot.Plot) {
	tx, _ := p.Transforms(&c)
	for i := range s.x {
		if !s.bad[i] {
			continue
		}
		lo, hi := s.x[i], s.x[i]
		if i > 0 {
			lo = (s.x[i-1] + s.x[i]) / 2
		}
		if i+1 < len(s.x) {
			hi = (s.x[i] + s.x[i+1]) / 2
		}
		x0, x1 := tx(lo), tx(hi)
		c.FillPolygon(s.clr, c.ClipPolygonXY([]vg.Point{{X: x0, Y: c.Min.Y}, {X: x1, Y: c.Min.Y}, {X: x1, Y: c.Max.Y}, {X: x0, Y: c.Max.Y}}))
	}
}

func (s shade) Thumbnail(c *draw.Canvas) {
	c.FillPolygon(s.clr, []vg.Point{c.Min, {X: c.Max.X, Y: c.Min.Y}, c.Max, {X: c.Min.X, Y: c.Max.Y}})
}

func xy(x, y []float64) plotter.XYs {
	var out plotter.XYs
	for i := range x {
		if !math.IsNaN(y[i]) {
			out = append(out, plotter.XY{X: x[i], Y: y[i]})
		}
	}
	return out
}

// Draw draws the chart on c.
func (t *TunnelProfile) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{t.Site}, t.Lines...)) + vg.Points(4)
	body := draw.Crop(c, 0, 0, 0, -th)
	lo, hi := t.Chainage[0], t.Chainage[len(t.Chainage)-1]

	anyFar, anyWall := make([]bool, len(t.Chainage)), make([]bool, len(t.Chainage))
	for _, s := range t.Series {
		for i := range t.Chainage {
			anyFar[i] = anyFar[i] || s.FarBad[i]
			anyWall[i] = anyWall[i] || s.WallSlip[i]
		}
	}
	wallShade := shade{x: t.Chainage, bad: anyWall, clr: color.NRGBA{R: 0xb0, G: 0x1c, B: 0x1c, A: 0x12}}
	farShade := shade{x: t.Chainage, bad: anyFar, clr: color.NRGBA{R: 0xb0, G: 0x1c, B: 0x1c, A: 0x30}}

	cover := plot.New()
	axisStyle(cover)
	cover.Y.Label.Text = "cover above crown (m)"
	cover.X.Min, cover.X.Max = lo, hi
	cover.Y.Min = 0
	l, _ := plotter.NewLine(xy(t.Chainage, t.Cover))
	l.LineStyle = draw.LineStyle{Color: ink, Width: vg.Points(1.2)}
	cover.Add(wallShade, farShade, l)

	ratio := plot.New()
	axisStyle(ratio)
	ratio.Y.Label.Text = "σmax / UCS"
	ratio.X.Min, ratio.X.Max, ratio.Y.Min = lo, hi, 0
	maxR := 0.6
	for _, r := range t.Ratio {
		maxR = math.Max(maxR, r*1.1)
	}
	ratio.Y.Max = maxR * 1.15
	band := plotter.NewFunction(func(float64) float64 { return 0.4 })
	band.LineStyle = draw.LineStyle{Color: warning, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
	rl, _ := plotter.NewLine(xy(t.Chainage, t.Ratio))
	rl.LineStyle = draw.LineStyle{Color: ink, Width: vg.Points(1.2)}
	onset := &bandFill{lo: 0.3, hi: 0.5}
	ratio.Add(onset, band, rl)
	ratio.Legend.Add("onset of spalling 0.4 ± 0.1 (Martin et al. 1999)", onset)
	ratio.Legend.Top, ratio.Legend.Left = true, true

	slip := plot.New()
	axisStyle(slip)
	slip.Y.Label.Text = "far-field factor of safety"
	slip.X.Label.Text = "chainage (m)"
	slip.X.Min, slip.X.Max, slip.Y.Min = lo, hi, 0
	slip.Add(wallShade, farShade)
	top := 1.5
	for _, s := range t.Series {
		for _, v := range s.FS {
			if !math.IsNaN(v) {
				top = math.Max(top, v*1.1)
			}
		}
	}
	top = math.Min(top, fsCeiling) // larger factors of safety are drawn at the ceiling
	for i, s := range t.Series {
		fs := make([]float64, len(s.FS))
		for k, v := range s.FS {
			fs[k] = math.Min(v, top)
		}
		ln, pts, err := plotter.NewLinePoints(xy(t.Chainage, fs))
		if err != nil {
			continue
		}
		ln.LineStyle = draw.LineStyle{Color: ink, Width: vg.Points(1), Dashes: dashSet[i%len(dashSet)]}
		pts.GlyphStyle = draw.GlyphStyle{Color: ink, Radius: vg.Points(1.6), Shape: shapeSet[i%len(shapeSet)]}
		slip.Add(ln, pts)
		slip.Legend.Add(s.Name, ln, pts)
	}
	slip.Y.Max = top * 1.6 // headroom for the key above the curves
	one := plotter.NewFunction(func(float64) float64 { return 1 })
	one.LineStyle = draw.LineStyle{Color: warning, Width: vg.Points(1), Dashes: []vg.Length{vg.Points(2), vg.Points(2)}}
	slip.Add(one)
	slip.Legend.Add("FS = 1: a plane slips below", one)
	slip.Legend.Add("critical or opening in the far field", farShade)
	slip.Legend.Add("slips or opens at the wall", wallShade)
	slip.Legend.Top = true
	slip.Legend.Left = true

	rows := [][]*plot.Plot{{cover}, {ratio}, {slip}}
	if len(t.Series) > 0 && t.Series[0].ZoneDepth != nil {
		slip.X.Label.Text = ""
		rows = append(rows, []*plot.Plot{t.zonePanel(lo, hi, farShade)})
	}
	tiles := draw.Tiles{Rows: len(rows), Cols: 1, PadY: vg.Points(6)}
	cs := plot.Align(rows, tiles, body)
	for i, r := range rows {
		r[0].Draw(cs[i][0])
	}
}

// fsCeiling is the largest factor of safety the profile chart shows; larger
// ones are drawn at it.
const fsCeiling = 4.0

// bandFill shades the band lo ≤ y ≤ hi across the plot.
type bandFill struct{ lo, hi float64 }

var bandColor = color.NRGBA{R: 0xb0, G: 0x1c, B: 0x1c, A: 0x22}

func (b *bandFill) Plot(c draw.Canvas, p *plot.Plot) {
	_, ty := p.Transforms(&c)
	c.FillPolygon(bandColor, c.ClipPolygonXY([]vg.Point{{X: c.Min.X, Y: ty(b.lo)}, {X: c.Max.X, Y: ty(b.lo)}, {X: c.Max.X, Y: ty(b.hi)}, {X: c.Min.X, Y: ty(b.hi)}}))
}

func (b *bandFill) Thumbnail(c *draw.Canvas) {
	c.FillPolygon(bandColor, []vg.Point{c.Min, {X: c.Max.X, Y: c.Min.Y}, c.Max, {X: c.Min.X, Y: c.Max.Y}})
}

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
// (solid) or opening (dashed).
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
}

// WallPeak is a peak stress round the wall and where it occurs.
type WallPeak struct{ Stress, At float64 }

// Draw draws the figure on c.
func (t *TunnelWall) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{t.Site}, t.Lines...)) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	side := min(body.Max.X-body.Min.X-vg.Points(150), body.Max.Y-body.Min.Y)
	cx, cy := body.Min.X+side/2, body.Max.Y-side/2
	r0 := side * 0.15
	pt := func(theta float64, r vg.Length) vg.Point { // θ from the crown, clockwise
		s, co := math.Sincos(theta * math.Pi / 180)
		return vg.Point{X: cx + r*vg.Length(s), Y: cy + r*vg.Length(co)}
	}
	peak := 1e-9
	for _, v := range t.Sigma {
		peak = math.Max(peak, math.Abs(v))
	}
	scale := float64(r0) * 0.7 / peak
	// The opening.
	var ring []vg.Point
	for a := 0.0; a <= 360; a += 3 {
		ring = append(ring, pt(a, r0))
	}
	c.FillPolygon(color.NRGBA{R: 0xf0, G: 0xf0, B: 0xee, A: 0xff}, ring)
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.4)}, ring)
	// σθ round the wall, closed.
	var curve []vg.Point
	n := len(t.Sigma)
	for k := 0; k <= n; k++ {
		v := t.Sigma[k%n]
		curve = append(curve, pt(float64(k%n)*t.Step, r0+vg.Length(v*scale)))
	}
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.1)}, curve)
	for k := 0; k < n; k += 3 { // ticks from the wall to the curve every 30°
		a := float64(k) * t.Step
		c.StrokeLines(draw.LineStyle{Color: grey, Width: vg.Points(0.5)}, []vg.Point{pt(a, r0), pt(a, r0+vg.Length(t.Sigma[k]*scale))})
	}
	lab := textStyle(7.5, false, ink)
	lab.XAlign, lab.YAlign = draw.XCenter, draw.YCenter
	outer := r0 + vg.Length(peak*scale) + vg.Points(10)
	for _, m := range []struct {
		a   float64
		txt string
	}{{0, "crown 0°"}, {90, "right 90°"}, {180, "invert 180°"}, {270, "left 270°"}} {
		haloText(&c, lab, pt(m.a, outer), m.txt)
	}
	// Rings of the sets.
	for i, s := range t.Sets {
		r := outer + vg.Points(12+9*float64(i))
		c.StrokeLines(draw.LineStyle{Color: light, Width: vg.Points(0.5)}, circle(pt, r))
		for k := range s.Critical {
			a0, a1 := float64(k)*t.Step-t.Step/2, float64(k)*t.Step+t.Step/2
			if s.Critical[k] {
				c.StrokeLines(draw.LineStyle{Color: warning, Width: vg.Points(4)}, arc(pt, r, a0, a1))
			} else if s.Opening[k] {
				c.StrokeLines(draw.LineStyle{Color: toppleInk, Width: vg.Points(4), Dashes: []vg.Length{vg.Points(2), vg.Points(1.5)}}, arc(pt, r, a0, a1))
			}
		}
		nl := textStyle(7, true, ink)
		nl.XAlign, nl.YAlign = draw.XRight, draw.YCenter
		p := pt(225+float64(i)*6, r)
		haloText(&c, nl, vg.Point{X: p.X - vg.Points(3), Y: p.Y}, s.Name)
	}
	// Key.
	x, y := body.Min.X+side+vg.Points(16), body.Max.Y
	head := textStyle(8, true, ink)
	c.FillText(head, vg.Point{X: x, Y: y}, "wall of the opening")
	y -= vg.Points(18)
	note := textStyle(7.5, false, ink)
	note.YAlign = draw.YCenter
	keys := []string{"curve: σθ round the wall, compression outward"}
	if p := t.ThetaMax; p.Stress != 0 {
		keys = append(keys, fmt.Sprintf("largest σθ %.1f MPa at %.0f° and %.0f°", p.Stress, p.At, p.At+180))
	}
	if p := t.WallMax; p.Stress != 0 {
		keys = append(keys, fmt.Sprintf("largest wall stress σmax %.1f MPa at %.0f°, %.2f of the UCS", p.Stress, p.At, p.Stress/t.UCS))
	}
	keys = append(keys, fmt.Sprintf("scale: %.1f MPa from the wall to the outermost point", peak), "rings: one per plane or set, outward in the key's order")
	for _, txt := range keys {
		c.FillText(note, vg.Point{X: x, Y: y}, txt)
		y -= vg.Points(13)
	}
	y -= vg.Points(4)
	c.StrokeLine2(draw.LineStyle{Color: warning, Width: vg.Points(4)}, x, y, x+vg.Points(14), y)
	c.FillText(note, vg.Point{X: x + vg.Points(20), Y: y}, "critical (FS ≤ 1) at the wall")
	y -= vg.Points(13)
	c.StrokeLine2(draw.LineStyle{Color: toppleInk, Width: vg.Points(4), Dashes: []vg.Length{vg.Points(2), vg.Points(1.5)}}, x, y, x+vg.Points(14), y)
	c.FillText(note, vg.Point{X: x + vg.Points(20), Y: y}, "opening (σn' ≤ 0) at the wall")
	y -= vg.Points(16)
	for i, s := range t.Sets {
		c.FillText(note, vg.Point{X: x, Y: y}, fmt.Sprintf("ring %d: %s", i+1, s.Name))
		y -= vg.Points(12)
	}
}

func circle(pt func(float64, vg.Length) vg.Point, r vg.Length) []vg.Point {
	return arc(pt, r, 0, 360)
}

func arc(pt func(float64, vg.Length) vg.Point, r vg.Length, a0, a1 float64) []vg.Point {
	var out []vg.Point
	for a := a0; a < a1; a += 2 {
		out = append(out, pt(a, r))
	}
	return append(out, pt(a1, r))
}
