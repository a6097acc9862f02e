package plots

import (
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// keyRow is one entry of a figure's key: a symbol and the words beside it.
type keyRow struct {
	glyph func(c *draw.Canvas, at vg.Point, l look) // draws the symbol centred at at; nil for words alone
	text  string
	kind  rowKind
}

// rowKind is how a key row's words are set.
type rowKind int

const (
	rowPlain rowKind = iota // in the key's text, beside the symbol column
	rowBold                 // in bold, beside the symbol column
	rowNote                 // in the grey of the notes, beside the symbol column
	rowHead                 // a bold heading across the column, symbol column included
)

// style returns the text style of the row in look l.
func (r keyRow) style(l look) draw.TextStyle {
	switch r.kind {
	case rowBold:
		return l.text(7.5, 5.5, true, ink)
	case rowNote:
		return l.noteText()
	case rowHead:
		return l.headText()
	}
	return l.keyText()
}

// indent returns how far the row's words start from the column's left.
func (r keyRow) indent(l look) vg.Length {
	if r.kind == rowHead {
		return 0
	}
	return l.glyphCol()
}

// keyBar is a colour bar in a key, drawn across the key's width.
type keyBar interface {
	// height returns the height of the bar and its labels for width w.
	height(l look, w vg.Length) vg.Length
	// draw draws the bar and its labels in r.
	draw(c *draw.Canvas, l look, r vg.Rectangle)
}

// keyBox is the key of a figure: a bold heading, a colour bar, grey notes
// and rows of symbols with their meaning. It lays itself out in a given
// width: words wrap, rows flow into as many columns as fit.
type keyBox struct {
	head  string
	bar   keyBar
	notes []string
	rows  []keyRow
}

// keyLayout is a keyBox laid out in one width.
type keyLayout struct {
	k      *keyBox
	l      look
	w      vg.Length
	head   *textLines
	barH   vg.Length
	notes  *textLines
	cols   int
	colW   vg.Length
	rows   []*textLines // each row's words, wrapped
	rowH   []vg.Length
	perCol int
	h      vg.Length
}

// glyphCol is the width of the symbol column of a key row.
func (l look) glyphCol() vg.Length { return vg.Points(math.Max(12, 18*l.k)) }

// naturalWidth is the width the key takes when nothing wraps, but not more
// than most.
func (k *keyBox) naturalWidth(l look, most vg.Length) vg.Length {
	w := l.pt(110)
	if k.head != "" {
		w = max(w, textWidth(l.headText(), k.head))
	}
	for _, n := range k.notes {
		w = max(w, textWidth(l.noteText(), n))
	}
	for _, r := range k.rows {
		w = max(w, r.indent(l)+textWidth(r.style(l), r.text))
	}
	return min(w, most)
}

// fit lays the key out in width w.
func (k *keyBox) fit(l look, w vg.Length) *keyLayout {
	kl := &keyLayout{k: k, l: l, w: w}
	gap := l.pt(4)
	kl.head = &textLines{gap: l.pt(1)}
	if k.head != "" {
		kl.head.add(l.headText(), k.head, w)
		kl.h += kl.head.height() + gap
	}
	if k.bar != nil {
		kl.barH = k.bar.height(l, w)
		kl.h += kl.barH + gap
	}
	kl.notes = &textLines{gap: l.pt(1)}
	for _, n := range k.notes {
		kl.notes.add(l.noteText(), n, w)
	}
	if len(kl.notes.lines) > 0 {
		kl.h += kl.notes.height() + gap
	}
	if len(k.rows) == 0 {
		kl.h = max(0, kl.h-gap)
		return kl
	}
	// Rows flow into columns: as many as fit at their natural width, or
	// more, narrower columns with words wrapped when that makes the key
	// shorter; columns are never narrower than minCol.
	colGap := l.pt(10)
	gc := l.glyphCol()
	natural := vg.Length(0)
	for _, r := range k.rows {
		natural = max(natural, r.indent(l)+textWidth(r.style(l), r.text))
	}
	minCol := min(w, max(gc+l.pt(90), min(natural, l.pt(140))))
	most := max(1, min(len(k.rows), int((w+colGap)/(minCol+colGap))))
	var best *keyLayout
	for cols := 1; cols <= most; cols++ {
		c := kl.columns(cols, colGap)
		if best == nil || c.h < best.h-l.pt(1) {
			best = c
		}
	}
	return best
}

// columns returns the layout with the rows in cols columns across the
// width.
func (kl *keyLayout) columns(cols int, colGap vg.Length) *keyLayout {
	c := *kl
	l, k := c.l, c.k
	c.cols = cols
	c.colW = (c.w - vg.Length(cols-1)*colGap) / vg.Length(cols)
	c.perCol = (len(k.rows) + cols - 1) / cols
	c.rows, c.rowH = nil, nil
	symbol := l.pt(11) // the least height of a row with a symbol
	colH := make([]vg.Length, cols)
	for i, r := range k.rows {
		t := &textLines{gap: l.pt(1)}
		t.add(r.style(l), r.text, c.colW-r.indent(l))
		h := t.height()
		if r.glyph != nil {
			h = max(h, symbol)
		}
		h += l.pt(3)
		if r.kind == rowHead && i%c.perCol != 0 {
			h += l.pt(3) // room above a heading that does not start a column
		}
		c.rows = append(c.rows, t)
		c.rowH = append(c.rowH, h)
		colH[i/c.perCol] += h
	}
	most := vg.Length(0)
	for _, h := range colH {
		most = max(most, h)
	}
	c.h += most
	return &c
}

// draw draws the key with its top-left corner at (x, top).
func (kl *keyLayout) draw(c *draw.Canvas, x, top vg.Length) {
	l := kl.l
	gap := l.pt(4)
	y := top
	if len(kl.head.lines) > 0 {
		y -= kl.head.draw(c, x, y) + gap
	}
	if kl.k.bar != nil {
		kl.k.bar.draw(c, l, vg.Rectangle{Min: vg.Point{X: x, Y: y - kl.barH}, Max: vg.Point{X: x + kl.w, Y: y}})
		y -= kl.barH + gap
	}
	if len(kl.notes.lines) > 0 {
		y -= kl.notes.draw(c, x, y) + gap
	}
	colGap := l.pt(10)
	gc := l.glyphCol()
	ry := y
	for i, r := range kl.k.rows {
		col := i / kl.perCol
		if i%kl.perCol == 0 {
			ry = y
		}
		cx := x + vg.Length(col)*(kl.colW+colGap)
		t := kl.rows[i]
		th := t.height()
		if r.kind == rowHead && i%kl.perCol != 0 {
			ry -= l.pt(3)
		}
		textTop := ry
		if r.glyph != nil {
			// Centre the first line of words and the symbol on one line.
			_, lh := textBox(t.sty[0], t.lines[0])
			mid := ry - max(lh, l.pt(11))/2
			textTop = mid + lh/2
			r.glyph(c, vg.Point{X: cx + gc/2 - l.pt(2), Y: mid}, l)
		}
		if th > 0 {
			t.draw(c, cx+r.indent(l), textTop)
		}
		ry -= kl.rowH[i]
		if r.kind == rowHead && i%kl.perCol != 0 {
			ry += l.pt(3) // rowH holds the room above the heading, spent already
		}
	}
}
