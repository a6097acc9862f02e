package plots

import (
	"image/color"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// zoneTop returns the ceiling of the zone panel: room for every depth up
// to three times the limit (deeper ones are drawn at the ceiling), and
// whether some depth lies above it.
func (t *TunnelProfile) zoneTop() (top float64, clipped bool) {
	top = 2 * t.ZoneLimit
	for _, s := range t.Series {
		for _, v := range s.ZoneDepth {
			if v <= 3*t.ZoneLimit {
				top = math.Max(top, v)
			}
		}
	}
	if !(top > 0) {
		top = 1
	}
	top *= 1.1
	for _, s := range t.Series {
		for _, v := range s.ZoneDepth {
			clipped = clipped || v > top
		}
	}
	return top, clipped
}

// zonePanel is the panel of the slip zones' depths beyond the wall, in the
// series' styles, with the zone depth limit and the stretches where some
// plane is critical or opening in the far field shaded.
func (t *TunnelProfile) zonePanel() *chartPanel {
	top, _ := t.zoneTop()
	return &chartPanel{head: "Slip zone beyond the wall, m", y: axisScale{lo: 0, hi: top}, weight: 1.1,
		plot: func(c *draw.Canvas, x, y func(float64) vg.Length) {
			t.shadeFar(c, x)
			c.StrokeLine2(limitStyle, c.Min.X, y(t.ZoneLimit), c.Max.X, y(t.ZoneLimit))
			vals := make([][]float64, len(t.Series))
			for i, s := range t.Series {
				vals[i] = s.ZoneDepth
			}
			t.drawSeries(c, x, y, vals, 0, top)
		}}
}

var limitStyle = draw.LineStyle{Color: warning, Width: vg.Points(1), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}

// stretch returns the chainage a station stands for: halfway to its
// neighbours.
func (t *TunnelProfile) stretch(k int) (lo, hi float64) {
	lo, hi = t.Chainage[k], t.Chainage[k]
	if k > 0 {
		lo = (t.Chainage[k-1] + t.Chainage[k]) / 2
	}
	if k+1 < len(t.Chainage) {
		hi = (t.Chainage[k] + t.Chainage[k+1]) / 2
	}
	return lo, hi
}

// shadeFar shades, full height, the stretches where some plane or set is
// critical or opening in the far field.
func (t *TunnelProfile) shadeFar(c *draw.Canvas, x func(float64) vg.Length) {
	bad := make([]bool, len(t.Chainage))
	for k := range bad {
		for _, s := range t.Series {
			bad[k] = bad[k] || s.FarBad[k]
		}
	}
	for _, r := range t.spans(bad) {
		fillRect(c, farFill, x(r[0]), c.Min.Y, x(r[1]), c.Max.Y)
	}
}

// spans returns the stretches of consecutive stations where on is true,
// as chainage ranges, so that each is filled in one piece.
func (t *TunnelProfile) spans(on []bool) [][2]float64 {
	var out [][2]float64
	for k := 0; k < len(on); k++ {
		if !on[k] {
			continue
		}
		j := k
		for j+1 < len(on) && on[j+1] {
			j++
		}
		lo, _ := t.stretch(k)
		_, hi := t.stretch(j)
		out = append(out, [2]float64{lo, hi})
		k = j
	}
	return out
}

// The lanes' fills: dark where a plane is critical or opening in the far
// field, light where only somewhere on the wall.
var (
	laneFar  = color.NRGBA{R: 0x8c, G: 0x1c, B: 0x1c, A: 0xff}
	laneWall = color.NRGBA{R: 0xe8, G: 0xa8, B: 0xa0, A: 0xff}
)

// lanePlot draws one lane per series, top down.
func (t *TunnelProfile) lanePlot(c *draw.Canvas, x, y func(float64) vg.Length) {
	n := len(t.Series)
	for i, s := range t.Series {
		y1, y0 := y(float64(n-i)), y(float64(n-i-1))
		pad := (y1 - y0) * 0.15
		c.StrokeLine2(draw.LineStyle{Color: gridInk, Width: vg.Points(0.4)}, c.Min.X, y0, c.Max.X, y0)
		wallOnly := make([]bool, len(t.Chainage))
		for k := range wallOnly {
			wallOnly[k] = s.WallSlip[k] && !s.FarBad[k]
		}
		for _, r := range t.spans(wallOnly) {
			fillRect(c, laneWall, x(r[0]), y0+pad, x(r[1]), y1-pad)
		}
		for _, r := range t.spans(s.FarBad) {
			fillRect(c, laneFar, x(r[0]), y0+pad, x(r[1]), y1-pad)
		}
	}
}

// fillRect fills the rectangle (x0, y0)–(x1, y1), clipped to c.
func fillRect(c *draw.Canvas, clr color.Color, x0, y0, x1, y1 vg.Length) {
	c.FillPolygon(clr, c.ClipPolygonXY([]vg.Point{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}))
}
