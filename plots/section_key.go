package plots

import (
	"fmt"
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// keys returns the section's keys for a view w m from the axis, fullest
// first: each zone's symbol, name and notes, its trace, the limit, and how
// to read the figure; then without the last; then the zones' names and the
// limit alone.
func (t *TunnelSection) keys(w float64) []*keyBox {
	return []*keyBox{t.key(w, 0), t.key(w, 1), t.key(w, 2)}
}

// key returns the section's key with less the higher level is.
func (t *TunnelSection) key(w float64, level int) *keyBox {
	k := &keyBox{head: "zones of potential slip"}
	if level == 0 {
		k.notes = []string{
			"looking along the drive, crown up",
			"filled: critical (FS ≤ 1) or opening (σn' ≤ 0) under the stress in the rock",
			"thin lines: joint traces at their apparent dip",
			"line with a dot: deepest point of a bounded zone",
			fmt.Sprintf("shown to %.1f m beyond the wall (dotted ring)", w-t.Radius),
		}
	}
	for i, z := range t.Zones {
		k.rows = append(k.rows, keyRow{glyph: zoneSample(i), text: z.Name, kind: rowBold})
		if level == 2 {
			continue
		}
		for _, n := range z.Note {
			k.rows = append(k.rows, keyRow{text: n})
		}
		trace := "no trace: the plane is the section"
		if !math.IsNaN(z.Trace) {
			dip, side := z.Trace, "left"
			if dip > 90 {
				dip, side = 180-dip, "right"
			}
			trace = fmt.Sprintf("trace dips %.0f° to the %s", dip, side)
		}
		k.rows = append(k.rows, keyRow{text: trace, kind: rowNote})
	}
	k.rows = append(k.rows, keyRow{glyph: lineSample(limitRing), text: fmt.Sprintf("limit %.2g m beyond the wall", t.Limit)})
	return k
}

// zoneSample is the key's sample of zone i: a box in its fill and outline.
func zoneSample(i int) func(c *draw.Canvas, at vg.Point, l look) {
	return func(c *draw.Canvas, at vg.Point, l look) {
		sty, fill := zoneStyle(i)
		w, h := l.pt(7), l.pt(4)
		box := []vg.Point{{X: at.X - w, Y: at.Y - h}, {X: at.X + w, Y: at.Y - h}, {X: at.X + w, Y: at.Y + h}, {X: at.X - w, Y: at.Y + h}}
		c.FillPolygon(fill, box)
		c.StrokeLines(sty, append(box, box[0]))
	}
}
