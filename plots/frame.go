package plots

import (
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// frame is where the parts of a figure go on its canvas: the title lines at
// the top, the main drawing (a net or a plot) and the key beside it or
// under it, whichever leaves the main drawing larger.
type frame struct {
	l     look
	inner vg.Rectangle // the canvas inside its margins
	title *textLines
	main  vg.Rectangle // the net's or the plot's area
	key   *keyLayout
	keyAt vg.Point // the key's top-left corner
	below bool     // the key is under the main drawing
	fits  bool     // the key fits beside or under a main area of some size
}

// scorer rates a main area for a figure in look l: larger is better.
type scorer func(l look, main vg.Rectangle) float64

// layFrame lays out a figure on c: text sized from the canvas (lookFor),
// shrunk step by step while the main drawing would get less than
// 0.6 of what it would have without a key, or the title more than a third
// of the height. At the smallest look it takes the best it can; on a canvas
// too small even for that (below the 8 × 8 cm the figures are made for) it
// leaves out the key's notes, then the title lines after the first two,
// then the key, rather than draw over the drawing.
func layFrame(c draw.Canvas, title []string, key *keyBox, score scorer) frame {
	return layFrameFrom(c, lookFor(c.Max.X-c.Min.X, c.Max.Y-c.Min.Y), title, key, score)
}

// layFrameFrom is layFrame starting from look l: a chart that grows in
// length only (a list of bars) keeps the text of a chart of the default
// shape.
func layFrameFrom(c draw.Canvas, l look, title []string, key *keyBox, score scorer) frame {
	for {
		f, ok := l.frameOn(c, title, key, score)
		if ok {
			return f
		}
		var more bool
		if l, more = l.smaller(); !more {
			break
		}
	}
	bare := *key
	bare.notes = nil
	short := title[:min(2, len(title))]
	for _, try := range []struct {
		title []string
		key   *keyBox
	}{{title, key}, {title, &bare}, {short, &bare}, {title[:min(1, len(title))], &keyBox{}}} {
		f, _ := l.frameOn(c, try.title, try.key, score)
		if f.fits && score(f.l, f.main) > 0 { // a score of 0: no room for the drawing
			return f
		}
	}
	f, _ := l.frameOn(c, title[:min(1, len(title))], &keyBox{}, score)
	return f
}

// frameOn lays out the figure in look l and reports whether the layout is
// good enough (see layFrame).
func (l look) frameOn(c draw.Canvas, title []string, key *keyBox, score scorer) (frame, bool) {
	m := l.margin()
	inner := vg.Rectangle{Min: vg.Point{X: c.Min.X + m, Y: c.Min.Y + m}, Max: vg.Point{X: c.Max.X - m, Y: c.Max.Y - m}}
	iw, ih := inner.Max.X-inner.Min.X, inner.Max.Y-inner.Min.Y
	tl := titleLines(l, title, iw)
	th := tl.height() + l.pt(6)
	body := vg.Rectangle{Min: inner.Min, Max: vg.Point{X: inner.Max.X, Y: inner.Max.Y - th}}
	bw, bh := body.Max.X-body.Min.X, body.Max.Y-body.Min.Y
	gap := l.pt(14)
	best := frame{l: l, inner: inner, title: tl, main: body}
	bestScore := -1.0
	try := func(f frame) {
		if s := score(l, f.main); s > bestScore {
			best, bestScore = f, s
		}
	}
	// Key beside: the widths it takes unwrapped, wrapped somewhat, and the
	// width that leaves a square main area as tall as the body.
	nat := key.naturalWidth(l, 0.45*bw)
	widths := []vg.Length{nat, 0.8 * nat, 0.62 * nat}
	if sq := bw - bh - gap; sq > 0.5*nat && sq < nat {
		widths = append(widths, sq)
	}
	for _, kw := range widths {
		kl := key.fit(l, kw)
		if kl.h > bh || bw-kw-gap <= 0 {
			continue
		}
		main := vg.Rectangle{Min: body.Min, Max: vg.Point{X: body.Max.X - kw - gap, Y: body.Max.Y}}
		try(frame{l: l, inner: inner, title: tl, main: main, key: kl, keyAt: vg.Point{X: body.Max.X - kw, Y: body.Max.Y}, fits: true})
	}
	// Key under the main drawing, across the width.
	if kl := key.fit(l, bw); kl.h+gap < bh {
		main := vg.Rectangle{Min: vg.Point{X: body.Min.X, Y: body.Min.Y + kl.h + gap}, Max: body.Max}
		try(frame{l: l, inner: inner, title: tl, main: main, key: kl, keyAt: vg.Point{X: body.Min.X, Y: body.Min.Y + kl.h}, below: true, fits: true})
	}
	if best.key == nil { // the key fits nowhere: give it the body's width
		best.key = key.fit(l, bw)
		best.keyAt = vg.Point{X: body.Min.X, Y: body.Min.Y + best.key.h}
		best.main = vg.Rectangle{Min: vg.Point{X: body.Min.X, Y: body.Min.Y + best.key.h + gap}, Max: body.Max}
		best.below = true
		return best, false
	}
	ok := bestScore >= 0.6*score(l, body) && th <= ih/3
	return best, ok
}

// titleTop is the top-left corner of the title lines.
func (f *frame) titleTop() vg.Point { return vg.Point{X: f.inner.Min.X, Y: f.inner.Max.Y} }

// keyRect is the rectangle the key takes.
func (f *frame) keyRect() vg.Rectangle {
	return vg.Rectangle{Min: vg.Point{X: f.keyAt.X, Y: f.keyAt.Y - f.key.h}, Max: vg.Point{X: f.keyAt.X + f.key.w, Y: f.keyAt.Y}}
}

// titleRect is the rectangle the title lines take.
func (f *frame) titleRect() vg.Rectangle {
	t := f.titleTop()
	return vg.Rectangle{Min: vg.Point{X: t.X, Y: t.Y - f.title.height()}, Max: vg.Point{X: t.X + f.title.width(), Y: t.Y}}
}

// drawText draws the title lines and the key.
func (f *frame) drawText(c *draw.Canvas) {
	t := f.titleTop()
	f.title.draw(c, t.X, t.Y)
	f.key.draw(c, f.keyAt.X, f.keyAt.Y)
}

// square returns the largest square in the main area, at its top, centred
// across it when the key is under it, else at its left.
func (f *frame) square() vg.Rectangle {
	w, h := f.main.Max.X-f.main.Min.X, f.main.Max.Y-f.main.Min.Y
	s := min(w, h)
	x := f.main.Min.X
	if f.below {
		x += (w - s) / 2
	}
	return vg.Rectangle{Min: vg.Point{X: x, Y: f.main.Max.Y - s}, Max: vg.Point{X: x + s, Y: f.main.Max.Y}}
}

// netIn returns the net drawn in square sq on c: the primitive with room
// round it for the ticks and the N mark.
func netIn(c *draw.Canvas, sq vg.Rectangle, l look) net {
	s := sq.Max.X - sq.Min.X
	_, nh := textBox(l.northStyle(), "N")
	r := (s/2 - nh - vg.Points(2)) / (1 + tickOut)
	return net{c: c, cx: sq.Min.X + s/2, cy: sq.Max.Y - s/2, r: r}
}

// netScore rates a main area for a net: the side of its largest square.
func netScore(_ look, main vg.Rectangle) float64 {
	return float64(min(main.Max.X-main.Min.X, main.Max.Y-main.Min.Y))
}

// layFrameOf lays out a figure with the first of keys (fullest first) that
// leaves its main drawing at least half of what the body under the title
// would give it without a key, else with the last: figures with long keys
// give their details up on small canvases rather than shrink to a blob.
func layFrameOf(c draw.Canvas, title []string, keys []*keyBox, score scorer) frame {
	var f frame
	for _, k := range keys {
		f = layFrame(c, title, k, score)
		body := vg.Rectangle{Min: f.inner.Min, Max: vg.Point{X: f.inner.Max.X, Y: f.inner.Max.Y - f.title.height() - f.l.pt(6)}}
		if score(f.l, f.main) >= 0.5*score(f.l, body) {
			break
		}
	}
	return f
}
