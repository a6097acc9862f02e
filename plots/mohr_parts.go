package plots

import (
	"image/color"
	"math"
	"strconv"

	"cleft/planes"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// mohrCircles draws the upper halves of the three Mohr circles.
type mohrCircles struct{ s [3]float64 }

var (
	circleStyle = draw.LineStyle{Color: ink, Width: vg.Points(1.2)}
	innerStyle  = draw.LineStyle{Color: ink, Width: vg.Points(0.8)}
	zeroStyle   = draw.LineStyle{Color: grey, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(1), vg.Points(2)}}
)

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
		sty := circleStyle
		if pair != [2]int{0, 2} {
			sty = innerStyle
		}
		c.StrokeLines(sty, c.ClipLinesXY(pts)...)
	}
}

// zeroLine marks σn' = 0.
type zeroLine struct{}

func (z *zeroLine) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	c.StrokeLines(zeroStyle, c.ClipLinesXY([]vg.Point{{X: tx(0), Y: ty(p.Y.Min)}, {X: tx(0), Y: ty(p.Y.Max)}})...)
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

// envelopeStyle is the line of the i-th envelope: red, with its own dashes.
func envelopeStyle(i int) draw.LineStyle {
	dashes := [][]vg.Length{nil, {vg.Points(5), vg.Points(3)}, {vg.Points(1.5), vg.Points(2)}, {vg.Points(6), vg.Points(2), vg.Points(1.5), vg.Points(2)}}
	return draw.LineStyle{Color: warning, Width: vg.Points(1.3), Dashes: dashes[i%len(dashes)]}
}

// pointFill is the fill of a Mohr point of state st.
func pointFill(st planes.PlaneState) color.Color {
	switch st {
	case planes.Critical:
		return Ramp{}.At(1)
	case planes.Opening:
		return undefinedFill
	}
	return white
}

// arrowHead fills an arrow head with its tip at tip, pointing along dir
// (+1 right, −1 left), of length n.
func arrowHead(c *draw.Canvas, tip vg.Point, dir, n vg.Length) {
	c.FillPolygon(ink, []vg.Point{tip, {X: tip.X - dir*n, Y: tip.Y + n/2}, {X: tip.X - dir*n, Y: tip.Y - n/2}})
}

// shiftArrow draws the change α·ΔPp that moves a point at from to its
// envelope at to (same height), clear of the point's marker of half-size
// rm: along the point's own level when there is room beside the marker,
// else as a dimension above the marker, between two extension lines, with
// its shaft starting before the point when the span is shorter than the
// head. It returns the rectangle the arrow takes.
func shiftArrow(c *draw.Canvas, from, to vg.Point, rm vg.Length, l look) vg.Rectangle {
	sty := draw.LineStyle{Color: ink, Width: vg.Points(1)}
	head := vg.Points(math.Max(4, 5*l.k))
	dir := vg.Length(1)
	if to.X < from.X {
		dir = -1
	}
	span := (to.X - from.X) * dir
	if span >= rm+head+l.pt(3) {
		start := from.X + dir*(rm+vg.Points(1))
		c.StrokeLine2(sty, start, from.Y, to.X-dir*head*0.8, from.Y)
		arrowHead(c, to, dir, head)
		return vg.Rectangle{Min: vg.Point{X: min(start, to.X), Y: from.Y - head/2}, Max: vg.Point{X: max(start, to.X), Y: from.Y + head/2}}
	}
	y := from.Y + rm + l.pt(5)
	ext := draw.LineStyle{Color: ink, Width: vg.Points(0.5)}
	c.StrokeLine2(ext, from.X, from.Y+rm+vg.Points(1), from.X, y+head/2+vg.Points(1))
	c.StrokeLine2(ext, to.X, to.Y+vg.Points(1), to.X, y+head/2+vg.Points(1))
	start := from.X - dir*(head+l.pt(5))
	if span > head+l.pt(2) {
		start = from.X
	}
	c.StrokeLine2(sty, start, y, to.X-dir*head*0.8, y)
	arrowHead(c, vg.Point{X: to.X, Y: y}, dir, head)
	return vg.Rectangle{Min: vg.Point{X: min(start, to.X, from.X), Y: from.Y + rm}, Max: vg.Point{X: max(start, to.X, from.X), Y: y + head/2 + vg.Points(1)}}
}

// arrowSample returns the key's symbol of the arrow, pointing along dir.
func arrowSample(dir vg.Length) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		head := vg.Points(math.Max(4, 5*l.k))
		tip := vg.Point{X: at.X + dir*l.pt(6), Y: at.Y}
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(1)}, at.X-dir*l.pt(6), at.Y, tip.X-dir*head*0.8, at.Y)
		arrowHead(c, tip, dir, head)
	}
}

// niceTicks labels an axis every 1, 2 or 5 × 10ⁿ: about n labels (7 when n
// is 0).
type niceTicks struct{ n int }

func (t niceTicks) Ticks(lo, hi float64) []plot.Tick {
	span := hi - lo
	if !(span > 0) {
		return nil
	}
	n := t.n
	if n <= 0 {
		n = 7
	}
	raw := span / float64(n)
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
