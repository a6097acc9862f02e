package plots

import (
	"fmt"
	"image/color"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// dashSet and shapeSet are the dashes and markers of the series of the
// tunnel charts, taken in turn with the colours of zoneInk: 6, 5 and 8
// choices make 120 series with a combination of their own.
var (
	dashSet  = [][]vg.Length{nil, {vg.Points(5), vg.Points(2)}, {vg.Points(1.5), vg.Points(1.5)}, {vg.Points(6), vg.Points(2), vg.Points(1.5), vg.Points(2)}, {vg.Points(9), vg.Points(3)}}
	shapeSet = []draw.GlyphDrawer{draw.CircleGlyph{}, draw.SquareGlyph{}, draw.TriangleGlyph{}, draw.PlusGlyph{}, draw.CrossGlyph{}, draw.RingGlyph{}, draw.BoxGlyph{}, draw.PyramidGlyph{}}
)

// seriesRadius is the radius of a series marker at glyph scale g.
func seriesRadius(g float64) vg.Length { return vg.Points(1.9 * g) }

// seriesStyle returns the line and the marker of series i at glyph scale g.
func seriesStyle(i int, g float64) (draw.LineStyle, draw.GlyphStyle) {
	c := zoneInk[i%len(zoneInk)]
	return draw.LineStyle{Color: c, Width: vg.Points(1.1), Dashes: dashSet[i%len(dashSet)]},
		draw.GlyphStyle{Color: c, Radius: seriesRadius(g), Shape: shapeSet[i%len(shapeSet)]}
}

// seriesSample is the key's sample of series i: its line and its marker.
func seriesSample(i int) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		line, glyph := seriesStyle(i, keyGlyph(l))
		c.StrokeLine2(line, at.X-l.pt(7), at.Y, at.X+l.pt(7), at.Y)
		c.DrawGlyph(glyph, at)
	}
}

// boxSample draws a small filled box as a key symbol, with a line across
// its middle when across is not nil.
func boxSample(fill color.Color, across *draw.LineStyle) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		w, h := l.pt(7), l.pt(4)
		c.FillPolygon(fill, []vg.Point{{X: at.X - w, Y: at.Y - h}, {X: at.X + w, Y: at.Y - h}, {X: at.X + w, Y: at.Y + h}, {X: at.X - w, Y: at.Y + h}})
		if across != nil {
			c.StrokeLine2(*across, at.X-w, at.Y, at.X+w, at.Y)
		}
	}
}

// key returns the chart's key: every series, line, band and shading.
func (t *TunnelProfile) key() *keyBox {
	k := &keyBox{notes: []string{"far-field FS on a logarithmic scale: equal steps are equal ratios, FS = 1 in the middle"}}
	if len(t.Series) > 0 {
		k.rows = append(k.rows, keyRow{kind: rowHead, text: "planes and sets"})
	}
	for i, s := range t.Series {
		k.rows = append(k.rows, keyRow{glyph: seriesSample(i), text: s.Name})
	}
	k.rows = append(k.rows, keyRow{kind: rowHead, text: "lines and bands"},
		keyRow{glyph: lineSample(oneStyle), text: "FS = 1: a plane slips below"})
	if txt := t.clipText(); txt != "" {
		k.rows = append(k.rows, keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) {
			clipGlyph(c, at, ink, seriesRadius(keyGlyph(l)), 1)
		}, text: txt})
	}
	k.rows = append(k.rows, keyRow{glyph: boxSample(spallFill, &spallStyle), text: "onset of spalling, σmax/UCS 0.4 ± 0.1 (Martin et al. 1999)"})
	if t.hasZones() {
		lim := fmt.Sprintf("zone depth limit, %.2g m beyond the wall", t.ZoneLimit)
		if top, clipped := t.zoneTop(); clipped {
			lim += fmt.Sprintf("; deeper zones than %.2g m drawn at it", top)
		}
		k.rows = append(k.rows, keyRow{glyph: lineSample(limitStyle), text: lim},
			keyRow{glyph: boxSample(farFill, nil), text: "some plane critical or opening in the far field: its zone has no bound"})
	}
	if len(t.Series) > 0 {
		k.rows = append(k.rows, keyRow{glyph: boxSample(laneFar, nil), text: "lane: critical or opening in the far field"},
			keyRow{glyph: boxSample(laneWall, nil), text: "lane: critical or opening only at the wall"})
	}
	return k
}
