package plots

import (
	"fmt"
	"image/color"
	"math"
	"runtime"
	"sync"

	"cleft/planes"
	"cleft/planes/sets"

	"gonum.org/v1/gonum/spatial/r3"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// SetMark is a joint set on the density net: its mean pole, the 95 %
// confidence cone of the mean, and its name.
type SetMark struct {
	Name    string
	Mean    planes.Orientation
	Alpha95 float64 // degrees
	Count   int
}

// DensityNet is the pole-density stereonet of field readings: the Kamb
// (1959) density of the poles as a raster with contours in multiples of σ,
// the poles themselves (filled for readings in a set, open for unassigned
// ones), and each set's mean pole with its α95 cone.
type DensityNet struct {
	Site    string
	Lines   []string // title lines under the site name
	Proj    Projection
	Poles   []r3.Vec // unit poles of the readings
	Weights []float64
	InSet   []bool // per reading: assigned to a set
	Sets    []SetMark
	Levels  []float64 // contour levels in σ; nil for every 2σ (every 2·⌈max/40⌉σ past 40σ)
	// MaxPoles is the most pole symbols drawn (0 for DefaultMaxPoles): with
	// more readings, that many spread evenly through them are drawn, and
	// the key says so. The density counts every reading.
	MaxPoles int

	// Field is the density at every node of the net and Kamb its counting,
	// from NewDensityField: the caller computes them (FieldSize gives a
	// resolution to match the figure).
	Field *Field
	Kamb  sets.Kamb
}

// NewDensityField evaluates the Kamb density of the poles at every node of
// an n × n net grid, in parallel over rows; nodes outside the primitive take
// the value of the primitive point on their radius. The counting is
// sets.KambCounter's, the same to the last bit as sets.Kamb.Density at each
// node, in time O(n² + N) for N poles.
func NewDensityField(p Projection, poles []r3.Vec, weights []float64, n int) (*Field, sets.Kamb) {
	total := float64(len(poles))
	if weights != nil { // weights scaled to sum to the number of readings
		sw := 0.0
		for _, w := range weights {
			sw += w
		}
		scaled := make([]float64, len(weights))
		for i, w := range weights {
			scaled[i] = w * total / sw
		}
		weights = scaled
	}
	k := sets.NewKamb(total)
	kc := sets.NewKambCounter(k, poles, weights)
	f := &Field{N: n, Values: make([]float64, n*n)}
	rows := make(chan int, n)
	for j := range n {
		rows <- j
	}
	close(rows)
	var wg sync.WaitGroup
	for range runtime.GOMAXPROCS(0) {
		wg.Go(func() {
			var scratch []int32
			for j := range rows {
				for i := range n {
					pt := f.Node(i, j)
					if r := math.Hypot(pt.X, pt.Y); r > 1 {
						pt.X, pt.Y = pt.X/r, pt.Y/r
					}
					l, _ := p.Inverse(pt)
					f.Values[j*n+i], scratch = kc.Density(l.Vec(), scratch)
				}
			}
		})
	}
	wg.Wait()
	f.Min, f.Max = math.Inf(1), math.Inf(-1)
	for j := range n {
		for i := range n {
			if f.Inside(i, j) {
				v := f.Values[j*n+i]
				f.Min, f.Max = math.Min(f.Min, v), math.Max(f.Max, v)
			}
		}
	}
	return f, k
}

// Draw draws the figure on c.
func (d *DensityNet) Draw(c draw.Canvas) {
	margin := vg.Points(12)
	c = draw.Crop(c, margin, -margin, margin, -margin)
	lines := append([]string{d.Site}, d.Lines...)
	th := titleBlock(&c, lines) + vg.Points(6)
	body := draw.Crop(c, 0, 0, 0, -th)
	side := min(body.Max.X-body.Min.X-vg.Points(150), body.Max.Y-body.Min.Y)
	label := vg.Points(14)
	n := net{c: &c, cx: body.Min.X + side/2, cy: body.Max.Y - side/2, r: side/2 - label}
	if d.Field == nil {
		panic("plots: DensityNet.Field is nil: compute it with NewDensityField")
	}
	hi := math.Max(6, math.Ceil(d.Field.Max/2)*2)
	var ramp Ramp
	drawRaster(n, d.Field, func(v float64) color.NRGBA { return pale(ramp.At(v / hi)) })
	thin := draw.LineStyle{Color: color.NRGBA{R: 0x10, G: 0x10, B: 0x10, A: 0xa0}, Width: vg.Points(0.5)}
	for _, l := range d.levels(hi) {
		for _, line := range Chain(d.Field.Contour(d.Field.Values, l)) {
			n.c.StrokeLines(thin, n.path(line))
		}
	}
	drawPrimitive(n)
	// Poles: small dots, open for unassigned readings.
	for _, i := range d.shown() {
		at := n.pt(d.Proj.ProjectVec(d.Poles[i]))
		if d.InSet == nil || d.InSet[i] {
			c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: vg.Points(1.3), Shape: draw.CircleGlyph{}}, at)
		} else {
			c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: vg.Points(1.6), Shape: draw.RingGlyph{}}, at)
		}
	}
	// Set means with their α95 cones.
	lab := textStyle(9, true, ink)
	lab.XAlign, lab.YAlign = draw.XLeft, draw.YBottom
	for _, s := range d.Sets {
		pole := s.Mean.Pole()
		if !math.IsNaN(s.Alpha95) {
			for _, path := range d.Proj.SmallCircle(pole, s.Alpha95, 120) {
				n.c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.4)}, n.path(path))
				n.c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.2)}, n.path(path))
			}
		}
		at := n.pt(d.Proj.Project(pole))
		axisGlyph(n.c, 1, at)
		haloText(n.c, lab, vg.Point{X: at.X + vg.Points(6), Y: at.Y + vg.Points(4)}, s.Name)
	}
	d.drawKey(draw.Crop(body, side+vg.Points(16), 0, 0, 0), hi)
}

// DefaultMaxPoles is the most pole symbols a DensityNet draws by default:
// at a symbol of 1.3 pt on a net of about 170 pt radius, 5000 cover about a
// third of the net, beyond which more symbols only hide the density.
const DefaultMaxPoles = 5000

// shown returns the indexes of the poles drawn: all, or MaxPoles of them
// spread evenly through the input.
func (d *DensityNet) shown() []int {
	max := d.MaxPoles
	if max <= 0 {
		max = DefaultMaxPoles
	}
	n := len(d.Poles)
	idx := make([]int, min(n, max))
	step := 1.0
	if n > max {
		step = float64(n) / float64(max)
	}
	for j := range idx {
		idx[j] = int(float64(j) * step)
	}
	return idx
}

func (d *DensityNet) levels(hi float64) []float64 {
	if d.Levels != nil {
		return d.Levels
	}
	var lv []float64
	step := levelStep(hi)
	for l := step; l < hi; l += step {
		lv = append(lv, l)
	}
	return lv
}

// levelStep is the spacing of the default contours: 2σ, widened past 40σ
// (many readings counted in a small cone) to keep at most twenty levels.
func levelStep(hi float64) float64 { return 2 * math.Max(1, math.Ceil(hi/40)) }

func (d *DensityNet) drawKey(c draw.Canvas, hi float64) {
	x, y := c.Min.X, c.Max.Y
	head := textStyle(8, true, ink)
	c.FillText(head, vg.Point{X: x, Y: y}, "pole density (Kamb 1959)")
	y -= head.Height("X") + vg.Points(8)
	barW, barH := vg.Points(12), (c.Max.Y-c.Min.Y)*0.36
	top, bottom := y, y-barH
	var ramp Ramp
	const steps = 100
	for k := range steps {
		y0 := bottom + barH*vg.Length(k)/steps
		y1 := bottom + barH*vg.Length(k+1)/steps
		c.FillPolygon(ramp.At((float64(k)+0.5)/steps), []vg.Point{{X: x, Y: y0}, {X: x + barW, Y: y0}, {X: x + barW, Y: y1 + 0.3}, {X: x, Y: y1 + 0.3}})
	}
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	c.StrokeLines(frame, []vg.Point{{X: x, Y: bottom}, {X: x + barW, Y: bottom}, {X: x + barW, Y: top}, {X: x, Y: top}, {X: x, Y: bottom}})
	tick := textStyle(7, false, ink)
	tick.YAlign = draw.YCenter
	for _, l := range append([]float64{0}, append(d.levels(hi), hi)...) {
		yy := bottom + barH*vg.Length(l/hi)
		c.StrokeLine2(frame, x, yy, x+barW+vg.Points(3), yy)
		c.FillText(tick, vg.Point{X: x + barW + vg.Points(5), Y: yy}, fmt.Sprintf("%gσ", l))
	}
	note := textStyle(7, false, grey)
	k := d.Kamb
	for i, t := range []string{
		fmt.Sprintf("counting cone %.1f° (%.1f%% of the net)", k.Theta, 100*k.Area),
		fmt.Sprintf("uniform scatter: %.1f poles = 3σ, σ = %.2f", k.Expected, k.Sigma),
		fmt.Sprintf("contours every %gσ", levelStep(hi)),
	} {
		c.FillText(note, vg.Point{X: x, Y: bottom - vg.Points(5+9*float64(i))}, t)
	}
	y = bottom - vg.Points(42)
	if shown := len(d.shown()); shown < len(d.Poles) {
		c.FillText(note, vg.Point{X: x, Y: bottom - vg.Points(32)}, fmt.Sprintf("symbols for %d of the %d readings, evenly spread", shown, len(d.Poles)))
		y -= vg.Points(9)
	}
	row := func(glyph func(vg.Point), txt string) {
		glyph(vg.Point{X: x + vg.Points(6), Y: y})
		t := textStyle(7.5, false, ink)
		t.YAlign = draw.YCenter
		c.FillText(t, vg.Point{X: x + vg.Points(18), Y: y}, txt)
		y -= vg.Points(14)
	}
	in, out := 0, 0
	for i := range d.Poles {
		if d.InSet == nil || d.InSet[i] {
			in++
		} else {
			out++
		}
	}
	row(func(a vg.Point) {
		c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: vg.Points(1.3), Shape: draw.CircleGlyph{}}, a)
	}, fmt.Sprintf("pole of a reading in a set (%d)", in))
	row(func(a vg.Point) {
		c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: vg.Points(1.6), Shape: draw.RingGlyph{}}, a)
	}, fmt.Sprintf("unassigned reading (%d)", out))
	row(func(a vg.Point) { axisGlyph(&c, 1, a) }, "set mean pole, with its α95 cone")
	for _, s := range d.Sets {
		l := s.Mean.Pole()
		row(func(vg.Point) {}, fmt.Sprintf("%s: %s, pole %s, α95 %.1f°, n = %d", s.Name, s.Mean, fmtLine(l.Trend, l.Plunge), s.Alpha95, s.Count))
	}
}
