package plots

import (
	"image/color"
	"math"

	"cleft/planes"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// poleInk outlines every plane marker, once per marker, and axisInk fills
// every principal-axis symbol, once per symbol: colours used for nothing
// else, so that a reader of the SVG (the tests) can count the markers.
var (
	poleInk = color.NRGBA{R: 0x11, G: 0x11, B: 0x11, A: 0xff}
	axisInk = color.NRGBA{R: 0x05, G: 0x05, B: 0x05, A: 0xff} // not black: SVG leaves the default fill unwritten
	meanInk = color.NRGBA{R: 0x08, G: 0x08, B: 0x08, A: 0xff} // fills the set-mean symbol, once per symbol
)

var undefinedFill = color.NRGBA{R: 0xe4, G: 0xe4, B: 0xe4, A: 0xff}

// BackgroundFade is how far the tendency field is blended towards white, so
// that the poles, drawn in the full colours of the same scale, stand out.
const BackgroundFade = 0.4

func pale(c color.NRGBA) color.NRGBA {
	f := func(u uint8) uint8 { return uint8(math.Round(float64(u) + BackgroundFade*(255-float64(u)))) }
	return color.NRGBA{R: f(c.R), G: f(c.G), B: f(c.B), A: c.A}
}

// stateRadius is the half-size of the marker of a plane in state st at
// glyph scale g, its outline included.
func stateRadius(st planes.PlaneState, g float64) vg.Length {
	switch st {
	case planes.Critical:
		return vg.Points(5.2*g + 0.75)
	case planes.Opening:
		return vg.Points(3.8*g + 0.75)
	}
	return vg.Points(3.1*g + 0.9)
}

// stateGlyph draws the marker of a plane in state st at glyph scale g:
// stable a circle, critical a triangle, opening a square with a cross;
// critical and opening are larger with a heavy outline, so that they stand
// out in grey print.
func stateGlyph(c *draw.Canvas, st planes.PlaneState, at vg.Point, fill color.Color, g float64) {
	switch st {
	case planes.Critical:
		r := vg.Points(5.2 * g)
		tri := []vg.Point{{X: at.X, Y: at.Y + r}, {X: at.X - r*0.866, Y: at.Y - r/2}, {X: at.X + r*0.866, Y: at.Y - r/2}, {X: at.X, Y: at.Y + r}}
		c.FillPolygon(fill, tri)
		c.StrokeLines(draw.LineStyle{Color: poleInk, Width: vg.Points(1.5)}, tri)
	case planes.Opening:
		r := vg.Points(3.8 * g)
		sq := []vg.Point{{X: at.X - r, Y: at.Y - r}, {X: at.X + r, Y: at.Y - r}, {X: at.X + r, Y: at.Y + r}, {X: at.X - r, Y: at.Y + r}, {X: at.X - r, Y: at.Y - r}}
		c.FillPolygon(fill, sq)
		c.StrokeLines(draw.LineStyle{Color: poleInk, Width: vg.Points(1.5)}, sq)
		c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(0.8)}, []vg.Point{sq[0], sq[2]}, []vg.Point{sq[1], sq[3]})
	default:
		r := vg.Points(3.1 * g)
		c.DrawGlyph(draw.GlyphStyle{Color: white, Radius: r + vg.Points(0.9), Shape: draw.CircleGlyph{}}, at)
		c.DrawGlyph(draw.GlyphStyle{Color: fill, Radius: r, Shape: draw.CircleGlyph{}}, at)
		c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: r, Shape: draw.RingGlyph{}}, at)
	}
}

// axisRadius is the half-size of a principal-axis symbol at glyph scale g,
// its white rim included.
func axisRadius(g float64) vg.Length { return vg.Points(4.8*g + 1.2) }

// axisGlyph draws the symbol of principal axis i (0, 1, 2 for σ1, σ2, σ3)
// at glyph scale g: a black hexagon on a white rim, crossed by i+1 white
// upright bars, like tally marks, so that the three read apart without
// colour and without their labels.
func axisGlyph(c *draw.Canvas, i int, at vg.Point, g float64) {
	r := vg.Points(4.8 * g)
	hex := make([]vg.Point, 7)
	for k := range hex {
		s, co := math.Sincos(math.Pi/2 + math.Pi/3*float64(k))
		hex[k] = vg.Point{X: at.X + r*vg.Length(co), Y: at.Y + r*vg.Length(s)}
	}
	c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.4)}, hex)
	c.FillPolygon(axisInk, hex)
	bar := draw.LineStyle{Color: white, Width: vg.Points(0.9 * g)}
	sp := r * 0.36
	for j := range i + 1 {
		x := at.X + sp*(vg.Length(j)-vg.Length(i)/2)
		c.StrokeLine2(bar, x, at.Y-r*0.52, x, at.Y+r*0.52)
	}
}

// meanRadius is the half-size of a set-mean symbol at glyph scale g.
func meanRadius(g float64) vg.Length { return vg.Points(4.6*g + 1.2) }

// meanGlyph draws the mean pole of a joint set at glyph scale g: a heavy
// black cross on a white rim.
func meanGlyph(c *draw.Canvas, at vg.Point, g float64) {
	a, t := vg.Points(4.6*g), vg.Points(1.5*g)
	x, y := at.X, at.Y
	cross := []vg.Point{
		{X: x - t, Y: y + a}, {X: x + t, Y: y + a}, {X: x + t, Y: y + t}, {X: x + a, Y: y + t},
		{X: x + a, Y: y - t}, {X: x + t, Y: y - t}, {X: x + t, Y: y - a}, {X: x - t, Y: y - a},
		{X: x - t, Y: y - t}, {X: x - a, Y: y - t}, {X: x - a, Y: y + t}, {X: x - t, Y: y + t}, {X: x - t, Y: y + a},
	}
	c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.4)}, cross)
	c.FillPolygon(meanInk, cross)
}
