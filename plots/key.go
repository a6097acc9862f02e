package plots

import (
	"fmt"
	"image/color"
	"math"
	"strconv"

	"cleft/planes"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// keyGlyph is the glyph scale of the symbols in a key of look l.
func keyGlyph(l look) float64 { return math.Max(0.6, math.Min(1.2, l.k)) }

// key returns the stereonet's key: the measure, its colour bar, how to read
// it, and the meaning of every symbol and line.
func (s *Stereonet) key(lo, hi float64) *keyBox {
	m := s.Field.Measure
	k := &keyBox{
		head: m.Label(),
		bar:  &tendencyBar{s: s, lo: lo, hi: hi},
		notes: []string{
			m.Direction(),
			"upper strip: poles, at their own depths",
			fmt.Sprintf("lower strip: bands, at %g m", s.Depth),
		},
	}
	mid := Ramp{}.At(0.5)
	count := map[planes.PlaneState]int{}
	undefined := false
	for i := range s.Poles {
		count[s.Poles[i].Result.State]++
		undefined = undefined || math.IsNaN(m.Value(&s.Poles[i].Result))
	}
	for j := range s.Field.N {
		for i := range s.Field.N {
			undefined = undefined || (s.Field.Inside(i, j) && math.IsNaN(s.Field.Values[j*s.Field.N+i]))
		}
	}
	state := func(st planes.PlaneState, fill color.Color, txt string) keyRow {
		return keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { stateGlyph(c, st, at, fill, keyGlyph(l)) }, text: txt}
	}
	k.rows = append(k.rows,
		state(planes.Stable, mid, fmt.Sprintf("pole, stable (%d)", count[planes.Stable])),
		state(planes.Critical, mid, fmt.Sprintf("pole, critical: FS ≤ 1 (%d)", count[planes.Critical])),
		state(planes.Opening, undefinedFill, fmt.Sprintf("pole, opening: σn' ≤ 0 (%d)", count[planes.Opening])),
		keyRow{glyph: slipSample, text: s.slipLineText()},
	)
	for i := range 3 {
		a := s.State.Principal.Axis(i)
		k.rows = append(k.rows, keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { axisGlyph(c, i, at, keyGlyph(l)) },
			text: fmt.Sprintf("%s axis (%s)", axisLabels[i], fmtLine(a.Trend, a.Plunge))})
	}
	if hasTrace(s.Poles) {
		k.rows = append(k.rows, keyRow{glyph: lineSample(traceStyle), text: "great circle of a chosen plane"})
	}
	if len(s.Means) > 0 {
		k.rows = append(k.rows, keyRow{glyph: lineSample(meanStyle), text: "mean plane of a joint set"})
	}
	if undefined {
		k.rows = append(k.rows, keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) {
			c.DrawGlyph(draw.GlyphStyle{Color: undefinedFill, Radius: l.pt(4), Shape: draw.BoxGlyph{}}, at)
		}, text: "grey: value undefined"})
	}
	return k
}

// lineSample draws a short length of a line style as a key symbol.
func lineSample(sty draw.LineStyle) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		c.StrokeLine2(sty, at.X-l.pt(6), at.Y, at.X+l.pt(6), at.Y)
	}
}

// slipSample is the key's sample of the FS = 1 line.
func slipSample(c *draw.Canvas, at vg.Point, l look) {
	c.StrokeLine2(draw.LineStyle{Color: white, Width: vg.Points(2.6)}, at.X-l.pt(6), at.Y, at.X+l.pt(6), at.Y)
	c.StrokeLine2(draw.LineStyle{Color: warning, Width: vg.Points(1.4)}, at.X-l.pt(6), at.Y, at.X+l.pt(6), at.Y)
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

// tendencyBar is the stereonet's colour bar, values rising to the right:
// an upper strip in the continuous colours of the poles and a lower strip
// in the stepped colours of the background's bands, with the band edges
// marked and labelled.
type tendencyBar struct {
	s      *Stereonet
	lo, hi float64
}

func (b *tendencyBar) strip(l look) vg.Length { return l.pt(7) }

func (b *tendencyBar) height(l look, _ vg.Length) vg.Length {
	_, th := textBox(l.tickText(), "0")
	return 2*b.strip(l) + l.pt(3) + th
}

func (b *tendencyBar) draw(c *draw.Canvas, l look, r vg.Rectangle) {
	s, lo, hi := b.s, b.lo, b.hi
	w := min(r.Max.X-r.Min.X, l.pt(200))
	x0, top := r.Min.X, r.Max.Y
	mid, bottom := top-b.strip(l), top-2*b.strip(l)
	at := func(v float64) vg.Length { return x0 + w*vg.Length((v-lo)/(hi-lo)) }
	var ramp Ramp
	const steps = 120
	for k := range steps {
		v0, v1 := lo+(hi-lo)*float64(k)/steps, lo+(hi-lo)*float64(k+1)/steps
		clr := ramp.At(s.frac(0.5*(v0+v1), lo, hi))
		c.FillPolygon(clr, []vg.Point{{X: at(v0), Y: mid}, {X: at(v1) + 0.3, Y: mid}, {X: at(v1) + 0.3, Y: top}, {X: at(v0), Y: top}})
	}
	edges, fills := s.bands(lo, hi)
	prev := lo
	for k, e := range append(append([]float64(nil), edges...), hi) {
		c.FillPolygon(fills[k], []vg.Point{{X: at(prev), Y: bottom}, {X: at(e), Y: bottom}, {X: at(e), Y: mid}, {X: at(prev), Y: mid}})
		prev = e
	}
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	c.StrokeLines(frame, []vg.Point{{X: x0, Y: bottom}, {X: x0 + w, Y: bottom}, {X: x0 + w, Y: top}, {X: x0, Y: top}, {X: x0, Y: bottom}})
	c.StrokeLine2(frame, x0, mid, x0+w, mid)
	if s.Field.Measure == FactorOfSafety && lo < 1 && hi > 1 {
		c.StrokeLine2(draw.LineStyle{Color: white, Width: vg.Points(2.6)}, at(1), bottom-2, at(1), top+2)
		c.StrokeLine2(draw.LineStyle{Color: warning, Width: vg.Points(1.4)}, at(1), bottom-2, at(1), top+2)
	}
	marks := append(append([]float64{lo}, edges...), hi)
	dec := decimals(marks)
	barTicks(c, l, r, bottom, marks, at, func(v float64) string {
		lbl := strconv.FormatFloat(v, 'f', dec, 64)
		if s.Field.Measure == FactorOfSafety && v == hi {
			lbl = "≥ " + lbl
		}
		return lbl
	})
}

// barTicks ticks a colour bar at marks (ascending) under its bottom edge
// and labels every k-th of them, k the least that keeps the labels apart,
// the last mark too when it clears the label before; labels stay inside
// the key's rectangle r.
func barTicks(c *draw.Canvas, l look, r vg.Rectangle, bottom vg.Length, marks []float64, at func(float64) vg.Length, label func(float64) string) {
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	sty := l.tickText()
	top := bottom - l.pt(3)
	box := func(v float64) vg.Rectangle {
		lbl := label(v)
		tw, _ := textBox(sty, lbl)
		x := max(r.Min.X, min(at(v)-tw/2, r.Max.X-tw))
		return boxOf(sty, x, top, lbl)
	}
	apart := func(a, b vg.Rectangle) bool { return !overlaps(grow(a, l.pt(1.5)), b) }
	var pick []int
	for k := 1; k <= len(marks); k++ {
		pick = pick[:0]
		ok := true
		for i := 0; i < len(marks); i += k {
			if len(pick) > 0 && !apart(box(marks[pick[len(pick)-1]]), box(marks[i])) {
				ok = false
				break
			}
			pick = append(pick, i)
		}
		if ok {
			break
		}
	}
	if last := len(marks) - 1; pick[len(pick)-1] != last && apart(box(marks[pick[len(pick)-1]]), box(marks[last])) {
		pick = append(pick, last)
	}
	for _, v := range marks {
		x := at(v)
		c.StrokeLine2(frame, x, bottom, x, bottom-l.pt(2.5))
	}
	for _, i := range pick {
		b := box(marks[i])
		putText(c, sty, b.Min.X, top, label(marks[i]))
	}
}

// decimals returns the fewest decimals (at most 3) that write every value
// exactly, so that the labels of one bar share one format.
func decimals(vs []float64) int {
	for d := 0; d < 3; d++ {
		exact := true
		for _, v := range vs {
			p := math.Pow(10, float64(d))
			exact = exact && math.Abs(v*p-math.Round(v*p)) < 1e-9*math.Max(1, math.Abs(v*p))
		}
		if exact {
			return d
		}
	}
	return 3
}
