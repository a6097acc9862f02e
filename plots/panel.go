package plots

import (
	"image/color"
	"math"
	"strconv"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// axisScale maps values on an axis to [0, 1] along it: linearly, or by
// their logarithm when log is set (then 0 < lo < hi).
//
//	frac(v) = (v − lo)/(hi − lo)   or   log(v/lo)/log(hi/lo)
type axisScale struct {
	lo, hi float64
	log    bool
}

func (a axisScale) frac(v float64) float64 {
	if a.log {
		return math.Log(v/a.lo) / math.Log(a.hi/a.lo)
	}
	return (v - a.lo) / (a.hi - a.lo)
}

// tick is a labelled mark on an axis.
type tick struct {
	v     float64
	label string
}

// linearTicks returns ticks every 1, 2 or 5 × 10ⁿ across a, as many as
// keep them at least gap apart on an axis of length n, and at least one.
func linearTicks(a axisScale, n, gap vg.Length) []tick {
	var best []tick
	for k := 1; k <= 60; k++ { // more ticks as k grows; keep the last spaced
		var ts []tick
		for _, t := range (niceTicks{n: k}).Ticks(a.lo, a.hi) {
			ts = append(ts, tick{v: t.Value, label: t.Label})
		}
		if len(ts) == 0 {
			continue
		}
		if !spaced(a, ts, n, gap) {
			if best == nil {
				best = ts[len(ts)/2 : len(ts)/2+1]
			}
			break
		}
		best = ts
	}
	return best
}

// logTicks returns ticks at 1, 2 and 5 × 10ⁿ across a (then 1 and 10ⁿ
// only when they crowd), at least gap apart on an axis of length n; 1 is
// kept whenever it is in the range.
func logTicks(a axisScale, n, gap vg.Length) []tick {
	for _, steps := range [][]float64{{1, 2, 5}, {1, 3}, {1}} {
		var ts []tick
		for e := math.Floor(math.Log10(a.lo)) - 1; e <= math.Ceil(math.Log10(a.hi)); e++ {
			for _, m := range steps {
				v := m * math.Pow(10, e)
				if v >= a.lo*(1-1e-9) && v <= a.hi*(1+1e-9) {
					ts = append(ts, tick{v: v, label: strconv.FormatFloat(v, 'g', 3, 64)})
				}
			}
		}
		if spaced(a, ts, n, gap) {
			return ts
		}
	}
	return []tick{{v: 1, label: "1"}}
}

// spaced reports whether consecutive ticks lie at least gap apart.
func spaced(a axisScale, ts []tick, n, gap vg.Length) bool {
	for i := 1; i < len(ts); i++ {
		if vg.Length(a.frac(ts[i].v)-a.frac(ts[i-1].v))*n < gap {
			return false
		}
	}
	return true
}

// chartPanel is one chart of a chartStack: a heading over a data area with
// its own y axis (or lanes, named top down) and the stack's x axis.
type chartPanel struct {
	head   string
	y      axisScale
	lanes  []string  // a lane chart: y runs over the lanes, lane i from the top
	weight float64   // share of the height left after the lanes
	plot   panelDraw // draws the data, clipped to the data area

	area   vg.Rectangle // the data area, once laid out
	headAt vg.Point     // top-left of the heading
	ticks  []tick
}

// panelDraw draws a panel's data on c (its data area), with x and y
// mapping values to the page.
type panelDraw func(c *draw.Canvas, x, y func(float64) vg.Length)

// chartStack is charts one above the other that share an x axis, labelled
// under the lowest only: text sized by l, every tick label clear of the
// others.
type chartStack struct {
	l      look
	x      axisScale
	xLabel string
	panels []*chartPanel
	xTicks []tick
	head   []*textLines
}

func (s *chartStack) tickStyle() draw.TextStyle { return s.l.tickText() }
func (s *chartStack) headStyle() draw.TextStyle { return s.l.text(7.5, 5.5, true, ink) }
func (s *chartStack) tickLen() vg.Length        { return s.l.pt(3) }

// laneHeight is the height of one lane: its name and a little room.
func (s *chartStack) laneHeight() vg.Length {
	_, th := textBox(s.tickStyle(), "0")
	return th + s.l.pt(2)
}

// layout places the panels in main and reports the data height left to
// the weighted panels (negative when they do not fit).
func (s *chartStack) layout(main vg.Rectangle) vg.Length {
	l := s.l
	_, th := textBox(s.tickStyle(), "0")
	w := main.Max.X - main.Min.X
	s.head = nil
	fixed := vg.Length(0)
	weights := 0.0
	for _, p := range s.panels {
		t := &textLines{gap: l.pt(1)}
		t.add(s.headStyle(), p.head, w)
		s.head = append(s.head, t)
		fixed += t.height() + th/2 + l.pt(2) // heading and the gap under it
		fixed += th/2 + l.pt(4)              // room for the last tick label and the next heading
		if p.lanes != nil {
			fixed += vg.Length(len(p.lanes)) * s.laneHeight()
		} else {
			weights += p.weight
		}
	}
	_, lh := textBox(s.tickStyle(), s.xLabel)
	bottom := max(s.tickLen(), th/2) + l.pt(1.5) + th + l.pt(2) + lh
	left := main.Max.Y - main.Min.Y - fixed - bottom
	// Heights, top down.
	y := main.Max.Y
	for i, p := range s.panels {
		p.headAt = vg.Point{X: main.Min.X, Y: y}
		y -= s.head[i].height() + th/2 + l.pt(2)
		h := vg.Length(0)
		if p.lanes != nil {
			h = vg.Length(len(p.lanes)) * s.laneHeight()
			p.y = axisScale{lo: 0, hi: float64(len(p.lanes))}
		} else if weights > 0 {
			h = max(0, left) * vg.Length(p.weight/weights)
		}
		p.area = vg.Rectangle{Min: vg.Point{Y: y - h}, Max: vg.Point{Y: y}}
		y -= h + th/2 + l.pt(4)
	}
	// Tick labels, then the gutter they need.
	gutter := vg.Length(0)
	for _, p := range s.panels {
		h := p.area.Max.Y - p.area.Min.Y
		switch {
		case p.lanes != nil:
			p.ticks = nil
			for i, n := range p.lanes {
				p.ticks = append(p.ticks, tick{v: float64(len(p.lanes)-i) - 0.5, label: n})
			}
		case p.y.log:
			p.ticks = logTicks(p.y, h, th+l.pt(1.5))
		default:
			p.ticks = linearTicks(p.y, h, th+l.pt(1.5))
		}
		for _, t := range p.ticks {
			gutter = max(gutter, textWidth(s.tickStyle(), t.label))
		}
	}
	gutter = min(gutter, 0.4*w) + s.tickLen() + l.pt(2)
	// The x axis: labels centred on their ticks, the last within main.
	wide := textWidth(s.tickStyle(), strconv.FormatFloat(math.Max(math.Abs(s.x.lo), math.Abs(s.x.hi)), 'f', 0, 64)+"0")
	x0, x1 := main.Min.X+max(gutter, wide/2), main.Max.X-wide/2
	s.xTicks = linearTicks(s.x, x1-x0, wide+l.pt(8))
	for _, p := range s.panels {
		p.area.Min.X, p.area.Max.X = x0, x1
	}
	return left
}

// xAt and yAt map values to the page in panel p.
func (s *chartStack) xAt(p *chartPanel) func(float64) vg.Length {
	return func(v float64) vg.Length { return p.area.Min.X + (p.area.Max.X-p.area.Min.X)*vg.Length(s.x.frac(v)) }
}

func yAt(p *chartPanel) func(float64) vg.Length {
	return func(v float64) vg.Length { return p.area.Min.Y + (p.area.Max.Y-p.area.Min.Y)*vg.Length(p.y.frac(v)) }
}

// draw draws every panel: grid, data, axes, ticks and their labels,
// headings, and the x labels under the lowest.
func (s *chartStack) draw(c *draw.Canvas) {
	l := s.l
	grid := draw.LineStyle{Color: gridInk, Width: vg.Points(0.4)}
	axis := draw.LineStyle{Color: ink, Width: vg.Points(0.7)}
	tsty := s.tickStyle()
	_, th := textBox(tsty, "0")
	for i, p := range s.panels {
		x, y := s.xAt(p), yAt(p)
		a := p.area
		if p.lanes == nil {
			for _, t := range p.ticks {
				c.StrokeLine2(grid, a.Min.X, y(t.v), a.Max.X, y(t.v))
			}
		}
		for _, t := range s.xTicks {
			c.StrokeLine2(grid, x(t.v), a.Min.Y, x(t.v), a.Max.Y)
		}
		if p.plot != nil {
			dc := sub(*c, a)
			p.plot(&dc, x, y)
		}
		c.StrokeLine2(axis, a.Min.X, a.Min.Y, a.Max.X, a.Min.Y)
		c.StrokeLine2(axis, a.Min.X, a.Min.Y, a.Min.X, a.Max.Y)
		for _, t := range p.ticks {
			yy := y(t.v)
			if p.lanes == nil {
				c.StrokeLine2(axis, a.Min.X-s.tickLen(), yy, a.Min.X, yy)
			}
			txt := fitText(tsty, t.label, a.Min.X-s.tickLen()-l.pt(2)-p.headAt.X)
			putText(c, tsty, a.Min.X-s.tickLen()-l.pt(1.5)-textWidth(tsty, txt), yy+th/2, txt)
		}
		for _, t := range s.xTicks {
			c.StrokeLine2(axis, x(t.v), a.Min.Y, x(t.v), a.Min.Y-s.tickLen()*0.6)
		}
		s.head[i].draw(c, p.headAt.X, p.headAt.Y)
	}
	last := s.panels[len(s.panels)-1]
	x := s.xAt(last)
	top := last.area.Min.Y - max(s.tickLen(), th/2) - l.pt(1.5)
	for _, t := range s.xTicks {
		c.StrokeLine2(axis, x(t.v), last.area.Min.Y, x(t.v), last.area.Min.Y-s.tickLen())
		putText(c, tsty, x(t.v)-textWidth(tsty, t.label)/2, top, t.label)
	}
	if s.xLabel != "" {
		lw := textWidth(tsty, s.xLabel)
		putText(c, tsty, (last.area.Min.X+last.area.Max.X)/2-lw/2, top-th-l.pt(2), s.xLabel)
	}
}

// gridInk is the colour of the panels' grid lines.
var gridInk = color.NRGBA{R: 0xe2, G: 0xe2, B: 0xe2, A: 0xff}

// fitText returns txt, or its start with an ellipsis, no wider than w in
// sty (to within rounding).
func fitText(sty draw.TextStyle, txt string, w vg.Length) string {
	w += 1e-6
	if textWidth(sty, txt) <= w {
		return txt
	}
	r := []rune(txt)
	for k := len(r) - 1; k > 0; k-- {
		if s := string(r[:k]) + "…"; textWidth(sty, s) <= w {
			return s
		}
	}
	return "…"
}
