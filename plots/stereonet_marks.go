package plots

import (
	"image/color"
	"math"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// bands returns the colour of each band of the background between
// consecutive edges (lo, the edges, hi): the ramp at the band's middle
// value, paled.
func (s *Stereonet) bands(lo, hi float64) (edges []float64, fills []color.NRGBA) {
	edges = s.edges(lo, hi)
	var ramp Ramp
	prev := lo
	for _, e := range append(append([]float64(nil), edges...), hi) {
		fills = append(fills, pale(ramp.At(s.frac(0.5*(prev+e), lo, hi))))
		prev = e
	}
	return edges, fills
}

// bandOf returns the band of v: the number of edges at or below it.
func bandOf(v float64, edges []float64) int {
	k := 0
	for k < len(edges) && v >= edges[k] {
		k++
	}
	return k
}

// drawField draws the background: every orientation's value in the colour
// of its band, the whole band in one colour.
func (s *Stereonet) drawField(n net, lo, hi float64) {
	edges, fills := s.bands(lo, hi)
	drawRaster(n, s.Field, func(v float64) color.NRGBA { return fills[bandOf(v, edges)] })
}

func (s *Stereonet) drawContours(n net, lo, hi float64, slip [][]Point) {
	f := s.Field
	thin := draw.LineStyle{Color: color.NRGBA{R: 0x10, G: 0x10, B: 0x10, A: 0xa0}, Width: vg.Points(0.5)}
	for _, l := range s.levels(lo, hi) {
		for _, line := range Chain(f.Contour(f.Values, l)) {
			n.c.StrokeLines(thin, n.path(line))
		}
	}
	// The orientations that would slip: FS = 1, a dark red line on white.
	for _, line := range slip {
		n.c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.6)}, n.path(line))
	}
	for _, line := range slip {
		n.c.StrokeLines(draw.LineStyle{Color: warning, Width: vg.Points(1.4)}, n.path(line))
	}
}

var (
	traceStyle = draw.LineStyle{Color: ink, Width: vg.Points(0.9)}
	meanStyle  = draw.LineStyle{Color: ink, Width: vg.Points(0.9), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
)

// drawTraces draws the great circles of the means (dashed) and of the
// traced planes.
func (s *Stereonet) drawTraces(n net) {
	for _, p := range s.Means {
		n.c.StrokeLines(meanStyle, n.path(s.Proj.GreatCircle(p.Orientation, 90)))
	}
	for _, p := range s.Poles {
		if p.Trace {
			n.c.StrokeLines(traceStyle, n.path(s.Proj.GreatCircle(p.Orientation, 90)))
		}
	}
}

func (s *Stereonet) poleFill(p *Pole, lo, hi float64) color.Color {
	if v := s.Field.Measure.Value(&p.Result); !math.IsNaN(v) {
		return Ramp{}.At(s.frac(v, lo, hi))
	}
	return undefinedFill
}

func (s *Stereonet) drawPoles(n net, lo, hi float64, g float64) {
	// Stable first, so the others sit on top.
	for _, pass := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		for i := range s.Poles {
			p := &s.Poles[i]
			if p.Result.State == pass {
				stateGlyph(n.c, pass, n.pt(s.Proj.Project(p.Orientation.Pole())), s.poleFill(p, lo, hi), g)
			}
		}
	}
}

var axisLabels = [3]string{"σ1", "σ2", "σ3"}

// axisPoints returns where principal axis i shows on the net: once, or at
// both ends when it is horizontal.
func axisPoints(p Projection, pr insitu.Principal, i int) []Point {
	l := pr.Axis(i)
	pts := []Point{p.Project(l)}
	if l.Plunge == 0 {
		pts = append(pts, Point{X: -pts[0].X, Y: -pts[0].Y})
	}
	return pts
}

func drawAxes(n net, p Projection, pr insitu.Principal, g float64) {
	for i := range 3 {
		for _, q := range axisPoints(p, pr, i) {
			axisGlyph(n.c, i, n.pt(q), g)
		}
	}
}

// name places the names on the net, most important first: the principal
// axes, the critical and opening poles, the great circles of the critical
// and opening planes and of the means (at the primitive), then the other
// poles when there are few. A stable plane's great circle is not named: its
// pole is, when there are few.
func (s *Stereonet) name(lab *labeller, n net, l look, g float64) {
	for i := range s.Poles {
		p := &s.Poles[i]
		lab.block(square(n.pt(s.Proj.Project(p.Orientation.Pole())), stateRadius(p.Result.State, g)))
	}
	for i := range 3 {
		for _, q := range axisPoints(s.Proj, s.State.Principal, i) {
			lab.block(square(n.pt(q), axisRadius(g)))
		}
	}
	axis := l.text(9, 6.5, true, ink)
	for i := range 3 {
		for _, q := range axisPoints(s.Proj, s.State.Principal, i) {
			lab.place(axis, axisLabels[i], n.pt(q), axisRadius(g), math.Pi/4, 6)
		}
	}
	pole := func(p *Pole) {
		lab.place(l.nameText(), p.Name, n.pt(s.Proj.Project(p.Orientation.Pole())), stateRadius(p.Result.State, g), 0, 24)
	}
	for i := range s.Poles {
		if p := &s.Poles[i]; p.Result.State != planes.Stable {
			pole(p)
		}
	}
	traceSty := l.text(7, 5.5, false, ink)
	for _, p := range s.Means {
		s.nameTrace(lab, n, traceSty, p)
	}
	for i := range s.Poles {
		if p := &s.Poles[i]; p.Trace && (p.Result.State != planes.Stable || p.Named) {
			s.nameTrace(lab, n, traceSty, *p)
		}
	}
	if len(s.Poles) <= NameAll {
		for i := range s.Poles {
			if p := &s.Poles[i]; p.Result.State == planes.Stable {
				pole(p)
			}
		}
	}
}

// nameTrace names a great circle at one of its ends on the primitive, just
// outside it where there is room: the east end first, then the west end,
// then a little along the primitive from either (up to 24°), and only then
// further out with a leader from the east end.
func (s *Stereonet) nameTrace(lab *labeller, n net, sty draw.TextStyle, p Pole) {
	pts := s.Proj.GreatCircle(p.Orientation, 90)
	ends := [2]Point{pts[0], pts[len(pts)-1]}
	if ends[1].X > ends[0].X {
		ends[0], ends[1] = ends[1], ends[0]
	}
	for _, shift := range []float64{0, 4, -4, 8, -8, 12, -12, 16, -16, 20, -20, 24, -24} {
		for _, e := range ends {
			a := math.Atan2(e.Y, e.X) + shift*math.Pi/180
			at := n.pt(Point{X: math.Cos(a), Y: math.Sin(a)})
			if lab.place(sty, p.Name, at, vg.Points(1), a, 0) {
				return
			}
		}
	}
	lab.place(sty, p.Name, n.pt(ends[0]), vg.Points(1), math.Atan2(ends[0].Y, ends[0].X), 10)
}
