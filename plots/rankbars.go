package plots

import (
	"fmt"
	"math"
	"strconv"
	"strings"

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
// its end. It lays itself out on its canvas: when the bars do not all fit,
// it shows fewer inputs per plane (those of largest |ρ|, down to three),
// then fewer planes, and the key says so.
type RankBars struct {
	Site  string
	Lines []string
	Rows  []RankRow
	// MaxInputs caps the bars per plane (0: all).
	MaxInputs int

	shown rankFit // what the last Draw showed
}

// Draw draws the figure on c.
func (b *RankBars) Draw(c draw.Canvas) {
	title := append([]string{b.Site}, b.Lines...)
	if b.bars(rankFit{len(b.Rows), math.MaxInt}) == 0 {
		f := layFrame(c, title, &keyBox{}, netScore)
		putText(&c, f.l.keyText(), f.main.Min.X, f.main.Max.Y, "No input varies: no rank correlation to show.")
		f.drawText(&c)
		return
	}
	// The key says what is left out, which depends on the room the key
	// leaves: lay out again until they agree; what is drawn never grows
	// past what the key says.
	shown := b.all()
	var f frame
	for range 8 {
		f = layFrameFrom(c, b.look(c.Rectangle), title, b.key(shown), b.score)
		got, _ := b.fit(f.l, f.main)
		if b.bars(got) >= b.bars(shown) {
			break
		}
		shown = got
	}
	b.shown = shown
	b.drawBars(&c, f.l, f.main, shown)
	f.drawText(&c)
}

// drawBars draws the headings, names, bars and values of fit in main, and
// the axis under them.
func (b *RankBars) drawBars(c *draw.Canvas, l look, main vg.Rectangle, fit rankFit) {
	name, _, _, line := rankLook(l)
	val := l.tickText()
	w := main.Max.X - main.Min.X
	nameW := vg.Length(0)
	for _, r := range b.Rows[:fit.planes] {
		for _, j := range b.order(r)[:min(fit.inputs, b.count(r))] {
			nameW = max(nameW, textWidth(name, r.Inputs[j]))
		}
	}
	nameW = min(nameW, 0.4*w)
	valW := textWidth(val, "−0.00")
	x0 := main.Min.X + nameW + l.pt(6) + valW + l.pt(3)
	x1 := main.Max.X - valW - l.pt(3)
	mid, half := (x0+x1)/2, (x1-x0)/2
	xAt := func(r float64) vg.Length { return mid + half*vg.Length(r) }
	_, vh := textBox(val, "0")
	_, nh := textBox(name, "X")
	dark, lightFill := rankInk()
	y := main.Max.Y
	zero := draw.LineStyle{Color: ink, Width: vg.Points(0.8)}
	for _, r := range b.Rows[:fit.planes] {
		hl := b.headLines(l, r, w)
		hl.draw(c, main.Min.X, y)
		if len(hl.lines) == 1 && r.Detail != "" { // the detail beside the plane
			_, head, detail, _ := rankLook(l)
			_, hh := textBox(head, r.Plane)
			_, dh := textBox(detail, r.Detail)
			putText(c, detail, main.Min.X+textWidth(head, r.Plane)+l.pt(8), y-(hh-dh)/2, r.Detail)
		}
		y -= hl.height() + l.pt(4)
		c.StrokeLine2(zero, mid, y, mid, y-vg.Length(min(fit.inputs, b.count(r)))*line)
		for _, j := range b.order(r)[:min(fit.inputs, b.count(r))] {
			yc := y - line/2
			txt := fitText(name, r.Inputs[j], nameW)
			putText(c, name, main.Min.X+nameW-textWidth(name, txt), yc+nh/2, txt)
			rho := r.Rho[j]
			if math.IsNaN(rho) {
				putText(c, val, mid+l.pt(3), yc+vh/2, "undefined")
			} else {
				xa, xb := min(mid, xAt(rho)), max(mid, xAt(rho))
				rankBar(c, xa, xb, yc, line*0.62, rho, dark, lightFill)
				lbl := signed2(rho)
				at := xAt(rho) + l.pt(3)
				if rho < 0 {
					at = xAt(rho) - l.pt(3) - textWidth(val, lbl)
				}
				putText(c, val, at, yc+vh/2, lbl)
			}
			y -= line
		}
	}
	axis := draw.LineStyle{Color: grey, Width: vg.Points(0.5)}
	c.StrokeLine2(axis, xAt(-1), y, xAt(1), y)
	ticks := []float64{-1, -0.5, 0, 0.5, 1}
	if half/2 < textWidth(val, "−0.5")+l.pt(4) {
		ticks = []float64{-1, 0, 1}
	}
	for _, t := range ticks {
		xx := xAt(t)
		c.StrokeLine2(axis, xx, y, xx, y-l.pt(3))
		lbl := strings.Replace(strconv.FormatFloat(t, 'g', -1, 64), "-", "−", 1)
		putText(c, val, xx-textWidth(val, lbl)/2, y-l.pt(3.5), lbl)
	}
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
