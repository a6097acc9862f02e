package plots

import (
	"fmt"
	"image/color"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// rankFit is how much of the chart is shown: the first planes, and the
// first inputs (by |ρ|) of each.
type rankFit struct{ planes, inputs int }

// rankLook are the sizes of the chart in look l.
func rankLook(l look) (name, head, detail draw.TextStyle, line vg.Length) {
	name, head, detail = l.keyText(), l.text(8.5, 6, true, ink), l.noteText()
	_, h := textBox(name, "X")
	return name, head, detail, h + l.pt(3)
}

// headLines returns the heading of row r wrapped to width w: the plane in
// bold, its detail beside it when it fits, else under it.
func (b *RankBars) headLines(l look, r RankRow, w vg.Length) *textLines {
	_, head, detail, _ := rankLook(l)
	t := &textLines{gap: l.pt(1)}
	t.add(head, r.Plane, w)
	t.add(detail, r.Detail, w)
	if len(t.lines) == 2 && textWidth(head, r.Plane)+l.pt(8)+textWidth(detail, r.Detail) <= w {
		t.lines, t.sty = t.lines[:1], t.sty[:1] // the detail goes beside
	}
	return t
}

// height returns the height the chart takes in width w with fit f.
func (b *RankBars) height(l look, w vg.Length, f rankFit) vg.Length {
	_, _, _, line := rankLook(l)
	_, th := textBox(l.tickText(), "0")
	h := l.pt(3) + th + l.pt(4) // the axis and its labels
	for _, r := range b.Rows[:f.planes] {
		h += b.headLines(l, r, w).height() + l.pt(4)
		h += vg.Length(min(f.inputs, b.count(r))) * line
	}
	return h
}

// fit returns the most of the chart that fits in main: every input (to
// MaxInputs) of every plane, else fewer inputs down to three, then fewer
// planes, then fewer inputs; ok is false when not even one bar fits.
func (b *RankBars) fit(l look, main vg.Rectangle) (rankFit, bool) {
	w, h := main.Max.X-main.Min.X, main.Max.Y-main.Min.Y
	most := 0
	for _, r := range b.Rows {
		most = max(most, b.count(r))
	}
	var tries []rankFit
	for m := most; m >= min(3, most); m-- {
		tries = append(tries, rankFit{len(b.Rows), m})
	}
	for p := len(b.Rows) - 1; p >= 1; p-- {
		tries = append(tries, rankFit{p, min(3, most)})
	}
	for m := min(3, most) - 1; m >= 1; m-- {
		tries = append(tries, rankFit{1, m})
	}
	for _, f := range tries {
		if b.height(l, w, f) <= h {
			return f, true
		}
	}
	return rankFit{1, 1}, false
}

// bars returns how many bars fit f shows.
func (b *RankBars) bars(f rankFit) int {
	n := 0
	for _, r := range b.Rows[:f.planes] {
		n += min(f.inputs, b.count(r))
	}
	return n
}

// key returns the chart's key, saying what fit f leaves out.
func (b *RankBars) key(f rankFit) *keyBox {
	k := &keyBox{notes: []string{"Spearman's ρ between each input and the factor of safety over the realisations, largest |ρ| first"}}
	all := b.all()
	switch {
	case f.planes < all.planes:
		k.notes = append(k.notes, fmt.Sprintf("for want of room: the first %d of %d planes and set means, %d inputs each at most", f.planes, all.planes, f.inputs))
	case f.inputs < all.inputs:
		k.notes = append(k.notes, fmt.Sprintf("for want of room: the %d inputs of largest |ρ| of each (of %d)", f.inputs, all.inputs))
	}
	dark, lightFill := rankInk()
	k.rows = []keyRow{
		{glyph: func(c *draw.Canvas, at vg.Point, l look) {
			rankBar(c, at.X-l.pt(7), at.X+l.pt(7), at.Y, l.pt(6), -1, dark, lightFill)
		}, text: "ρ < 0: the input lowers FS as it rises"},
		{glyph: func(c *draw.Canvas, at vg.Point, l look) {
			rankBar(c, at.X-l.pt(7), at.X+l.pt(7), at.Y, l.pt(6), 1, dark, lightFill)
		}, text: "ρ > 0: it raises FS (hatched)"},
	}
	return k
}

func rankInk() (dark, lightFill color.Color) { return Ramp{}.At(0.12), Ramp{}.At(0.85) }

// rankBar draws a bar from xa to xb (xa < xb) of height h centred on yc:
// solid for sign < 0, light and hatched for sign > 0.
func rankBar(c *draw.Canvas, xa, xb, yc, h vg.Length, sign float64, dark, lightFill color.Color) {
	box := []vg.Point{{X: xa, Y: yc - h/2}, {X: xb, Y: yc - h/2}, {X: xb, Y: yc + h/2}, {X: xa, Y: yc + h/2}, {X: xa, Y: yc - h/2}}
	if sign < 0 {
		c.FillPolygon(dark, box)
		return
	}
	c.FillPolygon(lightFill, box)
	for hx := xa + vg.Points(3); hx < xb; hx += vg.Points(4) {
		c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.4)}, hx, yc-h/2, min(hx+h, xb), yc+h/2)
	}
	c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(0.7)}, box)
}

// look is the chart's look on a canvas r: that of a canvas as wide of the
// default shape, or of r when r is less tall, so that a longer list of
// bars gets a taller canvas, not larger text.
func (b *RankBars) look(r vg.Rectangle) look {
	w, h := r.Max.X-r.Min.X, r.Max.Y-r.Min.Y
	return lookFor(w, min(h, w*lookH/lookW))
}

// score rates a main area: more bars first, then wider ones.
func (b *RankBars) score(l look, main vg.Rectangle) float64 {
	fit, ok := b.fit(l, main)
	if !ok {
		return 0
	}
	return float64(b.bars(fit)) + math.Min(0.99, float64((main.Max.X-main.Min.X)/l.pt(1000)))
}

// Height returns the least height, a multiple of 0.5 cm from 6 cm to
// 60 cm, at which the chart on a canvas w wide shows every bar (to
// MaxInputs per plane); 60 cm when none does.
func (b *RankBars) Height(w vg.Length) vg.Length {
	all := b.all()
	title := append([]string{b.Site}, b.Lines...)
	for h := 6 * vg.Centimeter; h < 60*vg.Centimeter; h += vg.Centimeter / 2 {
		c := draw.Canvas{Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}
		f := layFrameFrom(c, b.look(c.Rectangle), title, b.key(all), b.score)
		if got, ok := b.fit(f.l, f.main); ok && got == all {
			return h
		}
	}
	return 60 * vg.Centimeter
}

// all is the fit that shows every bar.
func (b *RankBars) all() rankFit {
	f := rankFit{planes: len(b.Rows)}
	for _, r := range b.Rows {
		f.inputs = max(f.inputs, b.count(r))
	}
	return f
}
