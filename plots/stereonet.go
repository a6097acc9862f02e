package plots

import (
	"fmt"
	"image"
	"image/color"
	"math"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Pole is one plane on a stereonet: its orientation, its own result (at its
// own depth) and whether to draw its great circle.
type Pole struct {
	Name        string
	Orientation planes.Orientation
	Result      planes.Result
	Trace       bool
}

// Stereonet is the tendency stereonet: the measure for every orientation at
// one depth as a raster with contours, the line where the factor of safety
// is 1, the poles of the planes coloured by their own value and shaped by
// their state, chosen great circles and the principal stress axes.
type Stereonet struct {
	Site      string
	Model     string // the stress model in one line
	Depth     float64
	State     insitu.State // the far field at Depth
	Criterion planes.Criterion
	Measure   Measure
	Proj      Projection
	Grid      bool      // draw a 10° polar grid (plunge circles, trend radials)
	Contours  []float64 // levels; nil for the measure's defaults
	Poles     []Pole
	// Note is a line under the title, or "" (how many planes are left out).
	Note string
	// Means are planes drawn only as dashed great circles (the mean planes
	// of joint sets), named at their east end.
	Means []Pole

	// Field is the measure for every orientation at Depth, from NewField
	// with State, Criterion, Measure and Proj: the caller computes it
	// (FieldSize gives a resolution to match the figure). Required.
	Field *Field

	slipLine bool // some orientation reaches FS = 1 at Depth
}

// FieldSize returns the grid size for a net in a figure of w × h: about one
// node per PNG pixel of the net's diameter, between 150 and 400. The net
// takes the height left under the title, or the width left beside the key.
func FieldSize(w, h vg.Length) int {
	d := min(w-vg.Points(24+150), h-vg.Points(24+60)) - vg.Points(28)
	n := int(float64(d/vg.Inch) * PNGDPI)
	return max(150, min(400, n))
}

// Scale returns the value range of the colour bar. Field must be set.
func (s *Stereonet) Scale() (lo, hi float64) {
	m := s.Field.Measure
	fmin, fmax := s.Field.Min, s.Field.Max
	for _, p := range s.Poles {
		if v := m.Value(&p.Result); !math.IsNaN(v) {
			fmin, fmax = math.Min(fmin, v), math.Max(fmax, v)
		}
	}
	switch m {
	case SlipTendency:
		return 0, math.Max(0.1, math.Ceil(fmax*10-1e-9)/10)
	case NormalisedSlip, DilationTendency:
		return 0, 1
	case FactorOfSafety:
		return math.Max(0, math.Floor(fmin*2)/2), 3
	}
	lo, hi = math.Floor(fmin), math.Ceil(fmax)
	if hi <= lo {
		hi = lo + 1
	}
	return lo, hi
}

// frac returns where v sits on the ramp: 1 (light) at the unstable end.
func (s *Stereonet) frac(v, lo, hi float64) float64 {
	f := (v - lo) / (hi - lo)
	if !s.Field.Measure.HighIsUnstable() {
		f = 1 - f
	}
	return math.Max(0, math.Min(1, f))
}

// levels returns the contour levels inside the colour range.
func (s *Stereonet) levels(lo, hi float64) []float64 {
	lv := s.Contours
	if lv == nil {
		lv = s.Field.Measure.DefaultContours()
	}
	if lv == nil {
		for _, t := range (plot.DefaultTicks{}).Ticks(lo, hi) {
			if t.Label != "" {
				lv = append(lv, t.Value)
			}
		}
	}
	var out []float64
	for _, l := range lv {
		if l > lo && l < hi {
			out = append(out, l)
		}
	}
	return out
}

// net maps net coordinates onto the canvas.
type net struct {
	c      *draw.Canvas
	cx, cy vg.Length
	r      vg.Length
}

func (n net) pt(p Point) vg.Point {
	return vg.Point{X: n.cx + vg.Length(p.X)*n.r, Y: n.cy + vg.Length(p.Y)*n.r}
}

func (n net) path(pts []Point) []vg.Point {
	out := make([]vg.Point, len(pts))
	for i, p := range pts {
		out[i] = n.pt(p)
	}
	return out
}

// Draw draws the figure on c.
func (s *Stereonet) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	m := s.Measure
	lines := []string{
		s.Site,
		fmt.Sprintf("Poles to %d planes coloured by %s at their own depths; background: every orientation at %g m", len(s.Poles), m.Label(), s.Depth),
		s.Model,
		"Lower-hemisphere " + s.Proj.Name()[:len(s.Proj.Name())-len(", lower hemisphere")] + "; poles to planes",
	}
	if s.Note != "" {
		lines = append(lines, s.Note)
	}
	th := titleBlock(&c, lines) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	right := vg.Points(150)
	side := min(body.Max.X-body.Min.X-right, body.Max.Y-body.Min.Y)
	label := vg.Points(14) // room for the N mark and tick labels
	n := net{c: &c, cx: body.Min.X + side/2, cy: body.Max.Y - side/2, r: side/2 - label}
	if s.Field == nil {
		panic("plots: Stereonet.Field is nil: compute it with NewField")
	}
	lo, hi := s.Scale()
	s.drawField(n, lo, hi)
	if s.Grid {
		drawGrid(n, s.Proj)
	}
	s.drawContours(n, lo, hi)
	drawPrimitive(n)
	s.drawTraces(n)
	s.drawPoles(n, lo, hi)
	drawAxes(n, s.Proj, s.State.Principal)

	col := draw.Crop(body, side+vg.Points(30), 0, 0, 0)
	s.drawKey(col, lo, hi)
}

func (s *Stereonet) drawField(n net, lo, hi float64) {
	var ramp Ramp
	drawRaster(n, s.Field, func(v float64) color.NRGBA { return pale(ramp.At(s.frac(v, lo, hi))) })
}

// drawRaster draws the values of f inside the primitive, coloured by clr
// (NaN in the undefined grey), with an anti-aliased edge.
func drawRaster(n net, f *Field, clr func(float64) color.NRGBA) {
	img := image.NewNRGBA(image.Rect(0, 0, f.N, f.N))
	px := 2 / float64(f.N-1) // node spacing in net units
	for j := range f.N {
		for i := range f.N {
			p := f.Node(i, j)
			r := math.Hypot(p.X, p.Y)
			alpha := math.Max(0, math.Min(1, (1-r)/px+0.5))
			if alpha == 0 {
				continue
			}
			c := undefinedFill
			if v := f.Values[j*f.N+i]; !math.IsNaN(v) {
				c = clr(v)
			}
			c.A = uint8(255 * alpha)
			img.SetNRGBA(i, j, c)
		}
	}
	half := vg.Length(1+px/2) * n.r
	n.c.DrawImage(vg.Rectangle{Min: vg.Point{X: n.cx - half, Y: n.cy - half}, Max: vg.Point{X: n.cx + half, Y: n.cy + half}}, img)
}

func drawPrimitive(n net) {
	n.c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.1)}, circlePath(n, 1, 360))
	// 10° ticks outside the primitive, longer every 90°.
	for a := 0; a < 360; a += 10 {
		s, c := geom.SinCosDeg(float64(a))
		l := 0.025
		if a%90 == 0 {
			l = 0.05
		}
		in := n.pt(Point{X: s, Y: c})
		out := n.pt(Point{X: s * (1 + l), Y: c * (1 + l)})
		n.c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.8)}, in.X, in.Y, out.X, out.Y)
	}
	sty := textStyle(9, true, ink)
	sty.XAlign, sty.YAlign = draw.XCenter, draw.YBottom
	top := n.pt(Point{X: 0, Y: 1.06})
	n.c.FillText(sty, top, "N")
	// The centre cross.
	d := vg.Points(3)
	n.c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.6)}, n.cx-d, n.cy, n.cx+d, n.cy)
	n.c.StrokeLine2(draw.LineStyle{Color: ink, Width: vg.Points(0.6)}, n.cx, n.cy-d, n.cx, n.cy+d)
}

func circlePath(n net, r float64, k int) []vg.Point {
	pts := make([]vg.Point, k+1)
	for i := range pts {
		s, c := math.Sincos(2 * math.Pi * float64(i) / float64(k))
		pts[i] = n.pt(Point{X: r * s, Y: r * c})
	}
	return pts
}

// drawGrid draws circles of equal plunge and radials of equal trend, every 10°.
func drawGrid(n net, p Projection) {
	sty := draw.LineStyle{Color: color.NRGBA{A: 0x50}, Width: vg.Points(0.4)}
	for pl := 10.0; pl < 90; pl += 10 {
		r := p.Radius((90 - pl) * math.Pi / 180)
		n.c.StrokeLines(sty, circlePath(n, r, 180))
	}
	inner := p.Radius(10 * math.Pi / 180) // radials stop at plunge 80°
	for a := 0; a < 360; a += 10 {
		s, c := geom.SinCosDeg(float64(a))
		n.c.StrokeLines(sty, []vg.Point{n.pt(Point{X: s * inner, Y: c * inner}), n.pt(Point{X: s, Y: c})})
	}
}

func (s *Stereonet) drawContours(n net, lo, hi float64) {
	f := s.Field
	thin := draw.LineStyle{Color: color.NRGBA{R: 0x10, G: 0x10, B: 0x10, A: 0xa0}, Width: vg.Points(0.5)}
	for _, l := range s.levels(lo, hi) {
		for _, line := range Chain(f.Contour(f.Values, l)) {
			n.c.StrokeLines(thin, n.path(line))
		}
	}
	// The orientations that would slip: FS = 1, a dark red line on white.
	lines := Chain(f.Contour(f.Safety, 1))
	s.slipLine = len(lines) > 0
	for _, line := range lines {
		n.c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.6)}, n.path(line))
	}
	for _, line := range lines {
		n.c.StrokeLines(draw.LineStyle{Color: warning, Width: vg.Points(1.4)}, n.path(line))
	}
}

func (s *Stereonet) drawTraces(n net) {
	sty := draw.LineStyle{Color: ink, Width: vg.Points(0.9)}
	dashed := draw.LineStyle{Color: ink, Width: vg.Points(0.9), Dashes: []vg.Length{vg.Points(4), vg.Points(2)}}
	lab := textStyle(7, false, ink)
	lab.XAlign, lab.YAlign = draw.XCenter, draw.YCenter
	traced := append([]Pole(nil), s.Means...)
	for _, p := range s.Poles {
		if p.Trace {
			traced = append(traced, p)
		}
	}
	var placed []vg.Point
	for i, p := range traced {
		st := sty
		if i < len(s.Means) {
			st = dashed
		}
		pts := s.Proj.GreatCircle(p.Orientation, 90)
		n.c.StrokeLines(st, n.path(pts))
		// Name just outside the primitive, at the end of the trace on the
		// east side (the west side is where the key is not, but keeping one
		// rule makes the names easy to find).
		end := pts[0]
		if pts[len(pts)-1].X > end.X {
			end = pts[len(pts)-1]
		}
		// Step outwards past names already placed close by.
		f := 1.1
		at := n.pt(Point{X: end.X * f, Y: end.Y * f})
		for tries := 0; tries < 6 && crowded(at, placed); tries++ {
			f += 0.06
			at = n.pt(Point{X: end.X * f, Y: end.Y * f})
		}
		placed = append(placed, at)
		haloText(n.c, lab, at, p.Name)
	}
}

// crowded reports whether at is within 10 pt of any of the points.
func crowded(at vg.Point, pts []vg.Point) bool {
	for _, p := range pts {
		if math.Hypot(float64(at.X-p.X), float64(at.Y-p.Y)) < 10 {
			return true
		}
	}
	return false
}

// haloText draws text with a white halo so that it reads over the raster.
func haloText(c *draw.Canvas, sty draw.TextStyle, at vg.Point, txt string) {
	h := sty
	h.Color = white
	for _, d := range []vg.Point{{X: -0.8, Y: 0}, {X: 0.8, Y: 0}, {X: 0, Y: -0.8}, {X: 0, Y: 0.8}} {
		c.FillText(h, vg.Point{X: at.X + d.X, Y: at.Y + d.Y}, txt)
	}
	c.FillText(sty, at, txt)
}

// Glyph sizes and shapes of the plane states: stable a circle, critical a
// triangle, opening a square with a cross; critical and opening are larger
// with a heavy outline, so they stand out in grey print.
func stateGlyph(c *draw.Canvas, st planes.PlaneState, at vg.Point, fill color.Color) {
	switch st {
	case planes.Critical:
		r := vg.Points(5.2)
		tri := []vg.Point{{X: at.X, Y: at.Y + r}, {X: at.X - r*0.866, Y: at.Y - r/2}, {X: at.X + r*0.866, Y: at.Y - r/2}, {X: at.X, Y: at.Y + r}}
		c.FillPolygon(fill, tri)
		c.StrokeLines(draw.LineStyle{Color: poleInk, Width: vg.Points(1.5)}, tri)
	case planes.Opening:
		r := vg.Points(3.8)
		sq := []vg.Point{{X: at.X - r, Y: at.Y - r}, {X: at.X + r, Y: at.Y - r}, {X: at.X + r, Y: at.Y + r}, {X: at.X - r, Y: at.Y + r}, {X: at.X - r, Y: at.Y - r}}
		c.FillPolygon(fill, sq)
		c.StrokeLines(draw.LineStyle{Color: poleInk, Width: vg.Points(1.5)}, sq)
		c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(0.8)}, []vg.Point{sq[0], sq[2]}, []vg.Point{sq[1], sq[3]})
	default:
		r := vg.Points(3.1)
		c.DrawGlyph(draw.GlyphStyle{Color: white, Radius: r + vg.Points(0.9), Shape: draw.CircleGlyph{}}, at)
		c.DrawGlyph(draw.GlyphStyle{Color: fill, Radius: r, Shape: draw.CircleGlyph{}}, at)
		c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: r, Shape: draw.RingGlyph{}}, at)
	}
}

// poleInk outlines every plane marker, once per marker, and axisInk fills
// every principal-axis symbol, once per symbol: colours used for nothing
// else, so that a reader of the SVG (the tests) can count the markers.
var (
	poleInk = color.NRGBA{R: 0x11, G: 0x11, B: 0x11, A: 0xff}
	axisInk = color.NRGBA{R: 0x05, G: 0x05, B: 0x05, A: 0xff} // not black: SVG leaves the default fill unwritten
)

var undefinedFill = color.NRGBA{R: 0xe4, G: 0xe4, B: 0xe4, A: 0xff}

// BackgroundFade is how far the tendency field is blended towards white, so
// that the poles, drawn in the full colours of the same scale, stand out.
const BackgroundFade = 0.4

func pale(c color.NRGBA) color.NRGBA {
	f := func(u uint8) uint8 { return uint8(math.Round(float64(u) + BackgroundFade*(255-float64(u)))) }
	return color.NRGBA{R: f(c.R), G: f(c.G), B: f(c.B), A: c.A}
}

func (s *Stereonet) drawPoles(n net, lo, hi float64) {
	var ramp Ramp
	m := s.Field.Measure
	// Stable first, so the others sit on top.
	for _, pass := range []planes.PlaneState{planes.Stable, planes.Critical, planes.Opening} {
		for _, p := range s.Poles {
			if p.Result.State != pass {
				continue
			}
			var fill color.Color = undefinedFill
			if v := m.Value(&p.Result); !math.IsNaN(v) {
				fill = ramp.At(s.frac(v, lo, hi))
			}
			stateGlyph(n.c, p.Result.State, n.pt(s.Proj.Project(p.Orientation.Pole())), fill)
		}
	}
}

// axisGlyph draws the symbol of principal axis i: σ1 a square, σ2 a
// diamond, σ3 a circle with a cross; black with a white rim.
func axisGlyph(c *draw.Canvas, i int, at vg.Point) {
	r := vg.Points(4.2)
	var shape []vg.Point
	switch i {
	case 0:
		shape = []vg.Point{{X: at.X - r*0.8, Y: at.Y - r*0.8}, {X: at.X + r*0.8, Y: at.Y - r*0.8}, {X: at.X + r*0.8, Y: at.Y + r*0.8}, {X: at.X - r*0.8, Y: at.Y + r*0.8}, {X: at.X - r*0.8, Y: at.Y - r*0.8}}
	case 1:
		shape = []vg.Point{{X: at.X, Y: at.Y - r}, {X: at.X + r, Y: at.Y}, {X: at.X, Y: at.Y + r}, {X: at.X - r, Y: at.Y}, {X: at.X, Y: at.Y - r}}
	default:
		c.DrawGlyph(draw.GlyphStyle{Color: white, Radius: r + vg.Points(1), Shape: draw.CircleGlyph{}}, at)
		c.DrawGlyph(draw.GlyphStyle{Color: axisInk, Radius: r, Shape: draw.CircleGlyph{}}, at)
		d := r * 0.62
		w := draw.LineStyle{Color: white, Width: vg.Points(1.2)}
		c.StrokeLine2(w, at.X-d, at.Y, at.X+d, at.Y)
		c.StrokeLine2(w, at.X, at.Y-d, at.X, at.Y+d)
		return
	}
	c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.4)}, shape)
	c.FillPolygon(axisInk, shape)
}

var axisLabels = [3]string{"σ1", "σ2", "σ3"}

func drawAxes(n net, p Projection, pr insitu.Principal) {
	lab := textStyle(9, true, ink)
	lab.XAlign, lab.YAlign = draw.XLeft, draw.YCenter
	for i := range 3 {
		l := pr.Axis(i)
		pts := []Point{p.Project(l)}
		if l.Plunge == 0 { // a horizontal axis shows at both ends
			pts = append(pts, Point{X: -pts[0].X, Y: -pts[0].Y})
		}
		for _, q := range pts {
			at := n.pt(q)
			axisGlyph(n.c, i, at)
			haloText(n.c, lab, vg.Point{X: at.X + vg.Points(6), Y: at.Y + vg.Points(5)}, axisLabels[i])
		}
	}
}
