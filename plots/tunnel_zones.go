package plots

import (
	"fmt"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// zonePanel is the profile's bottom panel: the depth of each series' slip
// zone beyond the wall against chainage, in the series' dashes and glyphs,
// the zone depth limit, and the far-field shading. Depths above the
// panel's ceiling (zones reaching far past the others, or the edge of the
// search) are drawn at it.
func (t *TunnelProfile) zonePanel(lo, hi float64, farShade shade) *plot.Plot {
	p := plot.New()
	axisStyle(p)
	p.Y.Label.Text = "slip zone beyond wall (m)"
	p.X.Label.Text = "chainage (m)"
	p.X.Min, p.X.Max, p.Y.Min = lo, hi, 0
	p.Add(farShade)
	// The ceiling: room for every depth up to three times the limit.
	top := 2 * t.ZoneLimit
	for _, s := range t.Series {
		for _, v := range s.ZoneDepth {
			if v <= 3*t.ZoneLimit {
				top = math.Max(top, v)
			}
		}
	}
	top *= 1.1
	clipped := false
	for i, s := range t.Series {
		d := make([]float64, len(s.ZoneDepth))
		for k, v := range s.ZoneDepth {
			d[k] = math.Min(v, top)
			clipped = clipped || v > top
		}
		ln, pts, err := plotter.NewLinePoints(xy(t.Chainage, d))
		if err != nil {
			continue
		}
		ln.LineStyle = draw.LineStyle{Color: ink, Width: vg.Points(1), Dashes: dashSet[i%len(dashSet)]}
		pts.GlyphStyle = draw.GlyphStyle{Color: ink, Radius: vg.Points(1.6), Shape: shapeSet[i%len(shapeSet)]}
		p.Add(ln, pts)
		p.Legend.Add(s.Name, ln, pts)
	}
	p.Y.Max = top * 1.5 // headroom for the key
	lim := plotter.NewFunction(func(float64) float64 { return t.ZoneLimit })
	lim.LineStyle = draw.LineStyle{Color: warning, Width: vg.Points(1), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
	p.Add(lim)
	key := fmt.Sprintf("zone depth limit %.2g m", t.ZoneLimit)
	if clipped {
		key += fmt.Sprintf(" (depths past %.2g m drawn at %.2g m)", top, top)
	}
	p.Legend.Add(key, lim)
	p.Legend.Add("critical or opening in the far field: no bound", farShade)
	p.Legend.Top, p.Legend.Left = true, true
	return p
}
