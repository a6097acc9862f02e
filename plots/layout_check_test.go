package plots

import (
	"bytes"
	"encoding/base64"
	"image/png"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"cleft/planes"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// badFigure draws what the layout check must find: two texts overlapping,
// a text leaving the canvas, a text over a plane marker; and what it must
// accept: a name on its halo, a turned text.
type badFigure struct{}

func (badFigure) Draw(c draw.Canvas) {
	sty := textStyle(8, false, ink)
	putText(&c, sty, 10, 90, "alpha")
	putText(&c, sty, 16, 88, "beta")   // over alpha
	putText(&c, sty, 180, 60, "gamma") // past the right edge of 200 pt
	stateGlyph(&c, planes.Stable, vg.Point{X: 100, Y: 50}, white, 1)
	putText(&c, sty, 98, 54, "delta")   // over the marker
	putHalo(&c, sty, 40, 40, "epsilon") // fine: the halo is part of it
	turned := sty
	turned.Rotation = math.Pi / 2
	c.FillText(turned, vg.Point{X: 150, Y: 20}, "a turned label")
}

func TestLayoutCheckFinds(t *testing.T) {
	var b bytes.Buffer
	if err := Write(badFigure{}, 200, 100, "svg", &b); err != nil {
		t.Fatal(err)
	}
	doc, err := readSVG(b.Bytes())
	if err != nil {
		t.Fatal(err)
	}
	got := strings.Join(layoutProblems(doc), "\n")
	for _, want := range []string{`texts "alpha" and "beta" overlap`, `text "gamma"`, `text "delta" lies over a symbol`} {
		if !strings.Contains(got, want) {
			t.Errorf("the check misses %s; it found:\n%s", want, got)
		}
	}
	if n := len(layoutProblems(doc)); n != 3 {
		t.Errorf("%d problems, want 3:\n%s", n, got)
	}
	// The turned label's box is tall and narrow: its length runs up the page.
	const tol = 0.2 // pt: rounding of the written coordinates
	for _, x := range doc.texts {
		if x.text != "a turned label" {
			continue
		}
		sty := textStyle(8, false, ink)
		w := sty.Width(x.text) // the font's own width, not the room kept
		_, h := textBox(sty, x.text)
		if bw, bh := x.box.x1-x.box.x0, x.box.y1-x.box.y0; math.Abs(bw-h.Points()) > tol || math.Abs(bh-w.Points()) > tol {
			t.Errorf("turned text box %.2f × %.2f pt, want %.2f × %.2f", bw, bh, h.Points(), w.Points())
		}
	}
}

func TestSVGStrict(t *testing.T) {
	// The Mohr diagram's transparent plot background made gonum write
	// "fill:#-8000000000000000…"; raster images were labelled image/jpg.
	for _, f := range []Figure{demoMohr(), demoStereonet()} {
		data := svgOf(t, f, 17*vg.Centimeter, 12*vg.Centimeter)
		if bytes.Contains(data, []byte("#-")) {
			t.Error("SVG holds a colour formatted from NaN")
		}
		checkSVG(t, data)
		doc, _ := readSVG(data)
		for _, im := range doc.images {
			raw, err := base64.StdEncoding.DecodeString(strings.TrimPrefix(im, "data:image/png;base64,"))
			if err != nil {
				t.Fatal(err)
			}
			if _, err := png.Decode(bytes.NewReader(raw)); err != nil {
				t.Errorf("image labelled PNG does not decode as PNG: %v", err)
			}
		}
	}
}

func TestLabellerKeepsClear(t *testing.T) {
	// Seeded random symbols and names: every placed name lies inside the
	// bounds and clear of every symbol and of every other name.
	rng := rand.New(rand.NewPCG(3, 5))
	sty := textStyle(7, true, ink)
	for trial := range 20 {
		lab := &labeller{bounds: vg.Rectangle{Max: vg.Point{X: 300, Y: 200}}, pad: 1}
		var syms []vg.Rectangle
		var at []vg.Point
		for range 60 {
			p := vg.Point{X: vg.Length(20 + 260*rng.Float64()), Y: vg.Length(20 + 160*rng.Float64())}
			at = append(at, p)
			syms = append(syms, square(p, 4))
			lab.block(square(p, 4))
		}
		for i, p := range at[:25] {
			lab.place(sty, "N"+string(rune('A'+i)), p, 4, 0, 12)
		}
		for i, n := range lab.names {
			r := grow(n.box, haloSize)
			if !inside(r, lab.bounds) {
				t.Errorf("trial %d: %q outside the bounds", trial, n.txt)
			}
			for _, s := range syms {
				if overlaps(r, s) {
					t.Errorf("trial %d: %q over a symbol", trial, n.txt)
				}
			}
			for _, m := range lab.names[i+1:] {
				if overlaps(r, grow(m.box, haloSize)) {
					t.Errorf("trial %d: %q over %q", trial, n.txt, m.txt)
				}
			}
		}
		if len(lab.names)+lab.dropped != 25 {
			t.Errorf("trial %d: %d placed + %d dropped, want 25", trial, len(lab.names), lab.dropped)
		}
	}
}

func TestWrap(t *testing.T) {
	sty := textStyle(8, false, ink)
	txt := "Every plane at this depth by its orientation; planes with their own pore pressure keep its excess"
	for _, w := range []vg.Length{30, 80, 200, 1000} {
		lines := wrap(sty, txt, w)
		for _, l := range lines {
			if sty.Width(l) > w {
				t.Errorf("width %v: line %q is %v wide", w, l, sty.Width(l))
			}
		}
		// Words wider than w break between letters: the letters stay.
		if strings.ReplaceAll(strings.Join(lines, ""), " ", "") != strings.ReplaceAll(txt, " ", "") {
			t.Errorf("width %v: the words change: %q", w, strings.Join(lines, "|"))
		}
		if w >= 80 && strings.Join(lines, " ") != txt {
			t.Errorf("width %v: the words change: %q", w, strings.Join(lines, "|"))
		}
	}
	if n := len(wrap(sty, txt, 1000)); n != 1 {
		t.Errorf("%d lines at 1000 pt, want 1", n)
	}
}

func TestPolesTo(t *testing.T) {
	for n, want := range map[int]string{1: "Pole to 1 plane", 2: "Poles to 2 planes", 139: "Poles to 139 planes"} {
		if got := polesTo(n); got != want {
			t.Errorf("polesTo(%d) = %q, want %q", n, got, want)
		}
	}
}
