package plots

import (
	"image/color"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// look is the sizing of one drawing of a figure: text sizes, gaps and
// margins are k times their sizes at the default figure size of
// 19 × 13.5 cm, never below a floor that keeps them legible in print.
type look struct {
	k float64
}

// Default figure size: the sizes of text and gaps are given for it.
const (
	lookW = 19 * vg.Centimeter
	lookH = 13.5 * vg.Centimeter
)

// Range of the text scale: 0.62 makes 8 pt text 5 pt (the floors hold
// most text at 5.5 pt or more); 1.6 makes the title 17.6 pt on a poster.
const (
	lookMin = 0.62
	lookMax = 1.6
)

// lookFor returns the look of a w × h canvas: k = √(area / default area),
// within [lookMin, lookMax].
//
//	k = √(w·h / (19 cm · 13.5 cm))
func lookFor(w, h vg.Length) look {
	k := math.Sqrt(float64(w*h) / float64(lookW*lookH))
	return look{k: math.Max(lookMin, math.Min(lookMax, k))}
}

// smaller returns the next look down when a layout does not fit, and false
// at the smallest.
func (l look) smaller() (look, bool) {
	if l.k <= lookMin+1e-9 {
		return l, false
	}
	return look{k: math.Max(lookMin, l.k*0.9)}, true
}

// pt returns v points scaled by the look.
func (l look) pt(v float64) vg.Length { return vg.Points(v * l.k) }

// text returns the figure font at size points scaled by the look, never
// below floor points.
func (l look) text(size, floor float64, bold bool, clr color.Color) draw.TextStyle {
	return textStyle(vg.Points(math.Max(floor, size*l.k)), bold, clr)
}

// The text styles of the figures.
func (l look) keyText() draw.TextStyle  { return l.text(7.5, 5.5, false, ink) }
func (l look) noteText() draw.TextStyle { return l.text(7, 5.5, false, grey) }
func (l look) headText() draw.TextStyle { return l.text(8, 6, true, ink) }
func (l look) nameText() draw.TextStyle { return l.text(7.5, 5.5, true, ink) }
func (l look) tickText() draw.TextStyle { return l.text(7, 5.5, false, ink) }

// margin is the blank border of a figure.
func (l look) margin() vg.Length { return l.pt(12) }

// glyphScale is the size of the symbols on a net of radius r, relative to
// their size on a net of 125 pt (the default figure), within [0.55, 1.6].
func glyphScale(r vg.Length) float64 {
	return math.Max(0.55, math.Min(1.6, float64(r/vg.Points(125))))
}
