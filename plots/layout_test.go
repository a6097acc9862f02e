package plots

import (
	"bytes"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

// layoutSizes are the canvas sizes the layout must hold at, cm: the
// smallest and largest the issue names, a small figure and the default.
var layoutSizes = [][2]float64{{8, 8}, {12, 10}, {19, 13.5}, {40, 30}}

// layoutCase is one figure kind with its data; build makes the figure for
// a w × h canvas (fields sized for it).
type layoutCase struct {
	name  string
	build func(t *testing.T, w, h vg.Length) Figure
}

// Tolerances of the layout checks, pt. gonum writes coordinates with five
// significant digits: 0.1 pt on a 40 cm canvas.
const (
	svgRound = 0.12 // rounding of the written coordinates
	haloGap  = 1.0  // a halo lies within this of its text
)

// checkLayout checks an SVG figure with layoutProblems.
func checkLayout(t *testing.T, data []byte) {
	t.Helper()
	doc, err := readSVG(data)
	if err != nil {
		t.Fatalf("SVG does not read: %v", err)
	}
	for _, p := range layoutProblems(doc) {
		t.Error(p)
	}
}

// layoutProblems lists what is wrong with the layout of an SVG figure:
// a text element's glyph box outside the canvas, two texts that overlap
// (a white copy of a text within haloGap of it is its halo and counts as
// part of it), a text over a plane, axis or set-mean symbol.
func layoutProblems(doc *svgDoc) []string {
	var out []string
	canvas := rect{0, 0, doc.w, doc.h}.grow(svgRound)
	var texts, halos []svgText
	for _, x := range doc.texts {
		if strings.EqualFold(x.fill, "#FFFFFF") {
			halos = append(halos, x)
		} else {
			texts = append(texts, x)
		}
	}
	for _, h := range halos {
		found := false
		for i := range texts {
			x := &texts[i]
			if x.text == h.text && math.Abs(x.x-h.x) <= haloGap && math.Abs(x.y-h.y) <= haloGap {
				x.box = x.box.union(h.box)
				found = true
				break
			}
		}
		if !found {
			out = append(out, fmt.Sprintf("white text %q at (%.1f, %.1f) is no halo", h.text, h.x, h.y))
		}
	}
	for _, x := range texts {
		if x.box.union(canvas) != canvas {
			out = append(out, fmt.Sprintf("text %q at (%.1f, %.1f)–(%.1f, %.1f) leaves the %.0f × %.0f pt canvas", x.text, x.box.x0, x.box.y0, x.box.x1, x.box.y1, doc.w, doc.h))
		}
	}
	for i := range texts {
		a := texts[i].box.grow(-svgRound)
		for j := i + 1; j < len(texts); j++ {
			if a.overlap(texts[j].box.grow(-svgRound)) > 0 {
				out = append(out, fmt.Sprintf("texts %q and %q overlap", texts[i].text, texts[j].text))
			}
		}
		for _, m := range doc.markers {
			if a.overlap(m) > 0 {
				out = append(out, fmt.Sprintf("text %q lies over a symbol at (%.1f, %.1f)", texts[i].text, (m.x0+m.x1)/2, (m.y0+m.y1)/2))
			}
		}
	}
	return out
}

var hexColour = regexp.MustCompile(`^#[0-9A-Fa-f]{6}$`)

// checkSVG checks what strict SVG readers need: every colour a six-digit
// hexadecimal one, every embedded image labelled image/png.
func checkSVG(t *testing.T, data []byte) {
	t.Helper()
	doc, err := readSVG(data)
	if err != nil {
		t.Fatalf("SVG does not read: %v", err)
	}
	for _, c := range doc.colours {
		if !hexColour.MatchString(c) {
			t.Errorf("colour %q is not #RRGGBB", c)
			break
		}
	}
	for _, im := range doc.images {
		if !strings.HasPrefix(im, "data:image/png;base64,") {
			t.Errorf("image labelled %q", im[:min(len(im), 30)])
		}
	}
}

// svgOf draws f on a w × h cm canvas as SVG.
func svgOf(t *testing.T, f Figure, w, h vg.Length) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := Write(f, w, h, "svg", &b); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

// TestFigureLayout draws every figure kind at every size of layoutSizes and
// checks its layout and its SVG. LAYOUT_PNG=DIR writes each drawing as PNG into DIR, to look at.
func TestFigureLayout(t *testing.T) {
	for _, fc := range layoutCases() {
		for _, sz := range layoutSizes {
			t.Run(fmt.Sprintf("%s/%gx%gcm", fc.name, sz[0], sz[1]), func(t *testing.T) {
				w, h := vg.Length(sz[0])*vg.Centimeter, vg.Length(sz[1])*vg.Centimeter
				f := fc.build(t, w, h)
				data := svgOf(t, f, w, h)
				checkLayout(t, data)
				checkSVG(t, data)
				if dir := os.Getenv("LAYOUT_PNG"); dir != "" { // to look at them
					var b bytes.Buffer
					if err := Write(f, w, h, "png", &b); err != nil {
						t.Fatal(err)
					}
					name := fmt.Sprintf("%s-%gx%g.png", fc.name, sz[0], sz[1])
					if err := os.WriteFile(filepath.Join(dir, name), b.Bytes(), 0o644); err != nil {
						t.Fatal(err)
					}
				}
				if d := droppedNames(f); d > 0 {
					t.Errorf("%d names left out for want of room", d)
				}
			})
		}
	}
}

// droppedNames returns how many names the last Draw of f left out.
func droppedNames(f Figure) int {
	switch f := f.(type) {
	case *Stereonet:
		return f.dropped
	case *Mohr:
		return f.dropped
	case *KinematicNet:
		return f.dropped
	case *TunnelWall:
		return f.dropped
	case *TunnelSection:
		return f.dropped
	case *ChanceNet:
		return f.dropped
	}
	return 0
}
