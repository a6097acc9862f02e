package plots

import (
	"fmt"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// RankRow is one plane of the rank-correlation chart: the Spearman ρ
// between each varied input and its factor of safety.
type RankRow struct {
	Plane  string
	Detail string // e.g. "P(unstable) 0.61 ± 0.01"
	Inputs []string
	Rho    []float64 // NaN where undefined
}

// RankBars is the ranked bar chart of rank correlations: one panel per
// plane (the caller's order, least stable first), its inputs ranked by |ρ|,
// each a bar from 0 towards −1 (the input lowers the factor of safety as it
// rises: solid) or +1 (it raises it: outlined, hatched), with the value at
// its end.
type RankBars struct {
	Site  string
	Lines []string
	Rows  []RankRow
	// MaxInputs caps the bars per plane (0: all).
	MaxInputs int
}

// Draw draws the figure on c.
func (b *RankBars) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	th := titleBlock(&c, append([]string{b.Site}, b.Lines...)) + vg.Points(8)
	body := draw.Crop(c, 0, 0, 0, -th)
	bars := 0
	for _, r := range b.Rows {
		bars += b.count(r)
	}
	if bars == 0 {
		t := textStyle(9, false, ink)
		c.FillText(t, vg.Point{X: body.Min.X, Y: body.Max.Y}, "No input varies: no rank correlation to show.")
		return
	}
	headH := vg.Points(13)
	avail := body.Max.Y - body.Min.Y - vg.Points(22) - headH*vg.Length(len(b.Rows))
	barH := min(vg.Points(13), avail/vg.Length(bars))
	nameW := vg.Points(150)
	x0 := body.Min.X + nameW
	x1 := body.Max.X - vg.Points(40)
	mid := (x0 + x1) / 2
	half := (x1 - x0) / 2
	xAt := func(r float64) vg.Length { return mid + half*vg.Length(r) }
	y := body.Max.Y
	name := textStyle(7.5, false, ink)
	name.XAlign, name.YAlign = draw.XRight, draw.YCenter
	val := textStyle(7, false, ink)
	val.YAlign = draw.YCenter
	head := textStyle(8.5, true, ink)
	sub := textStyle(7.5, false, grey)
	axis := draw.LineStyle{Color: grey, Width: vg.Points(0.5)}
	var ramp Ramp
	dark, lightFill := ramp.At(0.12), ramp.At(0.85)
	top := y
	for _, r := range b.Rows {
		c.FillText(head, vg.Point{X: body.Min.X, Y: y}, r.Plane)
		c.FillText(sub, vg.Point{X: body.Min.X + vg.Points(8) + head.Width(r.Plane), Y: y - vg.Points(1)}, r.Detail)
		y -= headH
		for _, j := range b.order(r) {
			yc := y - barH/2
			c.FillText(name, vg.Point{X: x0 - vg.Points(6), Y: yc}, r.Inputs[j])
			rho := r.Rho[j]
			h := barH * 0.7
			if math.IsNaN(rho) {
				c.FillText(val, vg.Point{X: mid + vg.Points(4), Y: yc}, "undefined")
			} else {
				xa, xb := mid, xAt(rho)
				if xb < xa {
					xa, xb = xb, xa
				}
				box := []vg.Point{{X: xa, Y: yc - h/2}, {X: xb, Y: yc - h/2}, {X: xb, Y: yc + h/2}, {X: xa, Y: yc + h/2}, {X: xa, Y: yc - h/2}}
				if rho < 0 {
					c.FillPolygon(dark, box)
				} else {
					c.FillPolygon(lightFill, box)
					for hx := xa + vg.Points(3); hx < xb; hx += vg.Points(4) {
						c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.4)}, hx, yc-h/2, min(hx+h, xb), yc+h/2)
					}
					c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(0.7)}, box)
				}
				v := val
				at := xAt(rho) + vg.Points(3)
				if rho < 0 {
					v.XAlign = draw.XRight
					at = xAt(rho) - vg.Points(3)
				}
				c.FillText(v, vg.Point{X: at, Y: yc}, signed2(rho))
			}
			y -= barH
		}
	}
	c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.8)}, mid, top+vg.Points(2), mid, y)
	tick := textStyle(7, false, ink)
	tick.XAlign, tick.YAlign = draw.XCenter, draw.YTop
	for _, t := range []float64{-1, -0.5, 0, 0.5, 1} {
		xx := xAt(t)
		c.StrokeLine2(axis, xx, y, xx, y-vg.Points(3))
		c.FillText(tick, vg.Point{X: xx, Y: y - vg.Points(4)}, fmt.Sprintf("%g", t))
	}
	c.StrokeLine2(axis, xAt(-1), y, xAt(1), y)
	note := textStyle(7, false, grey)
	note.XAlign = draw.XCenter
	c.FillText(note, vg.Point{X: mid, Y: y - vg.Points(13)}, "Spearman's ρ with the factor of safety: solid, the input lowers FS as it rises; hatched, it raises FS")
}

func (b *RankBars) count(r RankRow) int {
	if b.MaxInputs > 0 {
		return min(b.MaxInputs, len(r.Inputs))
	}
	return len(r.Inputs)
}

// order returns the inputs of r by |ρ|, largest first (undefined last),
// cut to MaxInputs.
func (b *RankBars) order(r RankRow) []int {
	idx := make([]int, len(r.Inputs))
	for i := range idx {
		idx[i] = i
	}
	key := func(i int) float64 {
		if math.IsNaN(r.Rho[i]) {
			return -1
		}
		return math.Abs(r.Rho[i])
	}
	for i := 1; i < len(idx); i++ { // insertion sort: stable, few inputs
		for j := i; j > 0 && key(idx[j]) > key(idx[j-1]); j-- {
			idx[j], idx[j-1] = idx[j-1], idx[j]
		}
	}
	return idx[:b.count(r)]
}

// signed2 writes ρ with two decimals and a true minus sign, 0.00 without
// a sign.
func signed2(v float64) string {
	s := fmt.Sprintf("%.2f", v)
	switch {
	case s == "-0.00" || s == "0.00":
		return "0.00"
	case v < 0:
		return "−" + s[1:]
	}
	return "+" + s
}

// RankBarsHeight is a height for a chart of rows with at most maxInputs
// bars each, cm.
func RankBarsHeight(rows, bars int) float64 { return 3.6 + 0.46*float64(rows+bars) }
