package plots

import (
	"math"
	"sort"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// hatch fills polygon poly with parallel lines at angle deg (° from the
// horizontal of the page) every gap, clipped to the polygon (even–odd).
func hatch(c *draw.Canvas, poly []vg.Point, deg float64, gap vg.Length, sty draw.LineStyle) {
	s, co := math.Sincos(deg * math.Pi / 180)
	// Along u = (cos, sin), across v = (−sin, cos).
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, p := range poly {
		d := -s*float64(p.X) + co*float64(p.Y)
		lo, hi = math.Min(lo, d), math.Max(hi, d)
	}
	for d := math.Ceil(lo/float64(gap)) * float64(gap); d <= hi; d += float64(gap) {
		var ts []float64
		for i := range poly {
			a, b := poly[i], poly[(i+1)%len(poly)]
			da, db := -s*float64(a.X)+co*float64(a.Y)-d, -s*float64(b.X)+co*float64(b.Y)-d
			if (da < 0) == (db < 0) {
				continue
			}
			f := da / (da - db)
			x, y := float64(a.X)+f*float64(b.X-a.X), float64(a.Y)+f*float64(b.Y-a.Y)
			ts = append(ts, co*x+s*y)
		}
		sort.Float64s(ts)
		for i := 0; i+1 < len(ts); i += 2 {
			at := func(t float64) vg.Point {
				return vg.Point{X: vg.Length(co*t - s*d), Y: vg.Length(s*t + co*d)}
			}
			c.StrokeLines(sty, []vg.Point{at(ts[i]), at(ts[i+1])})
		}
	}
}
