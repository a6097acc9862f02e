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
	// Smooth, when set, says that Field holds the exponential Kamb
	// weighting of NewSmoothField (and Kamb is not used).
	Smooth *sets.Smoothing
}

// NewDensityField evaluates the Kamb density of the poles at every node of
// an n × n net grid, in parallel over rows; nodes outside the primitive take
// the value of the primitive point on their radius. The counting is
// sets.KambCounter's, the same to the last bit as sets.Kamb.Density at each
// node, in time O(n² + N) for N poles. Weights are scaled to sum to the
// number of readings.
func NewDensityField(p Projection, poles []r3.Vec, weights []float64, n int) (*Field, sets.Kamb) {
	k := sets.NewKamb(float64(len(poles)))
	kc := sets.NewKambCounter(k, poles, scaledWeights(weights))
	f := densityField(p, n, func() func(r3.Vec) float64 {
		var scratch []int32
		return func(a r3.Vec) (v float64) {
			v, scratch = kc.Density(a, scratch)
			return v
		}
	})
	return f, k
}

// NewSmoothField evaluates the smoothed pole density of the poles
// (sets.Smoothing, the exponential Kamb weighting of Vollmer 1995) at every
// node of an n × n net grid as NewDensityField counts.
func NewSmoothField(p Projection, poles []r3.Vec, weights []float64, n int) (*Field, sets.Smoothing) {
	sm := sets.NewSmoothing(float64(len(poles)))
	sc := sets.NewSmoothCounter(sm, poles, scaledWeights(weights))
	return densityField(p, n, func() func(r3.Vec) float64 { return sc.Density }), sm
}

// scaledWeights returns the weights scaled to sum to their number, or nil.
func scaledWeights(weights []float64) []float64 {
	if weights == nil {
		return nil
	}
	sw := 0.0
	for _, w := range weights {
		sw += w
	}
	scaled := make([]float64, len(weights))
	for i, w := range weights {
		scaled[i] = w * float64(len(weights)) / sw
	}
	return scaled
}

// densityField evaluates a density at the axis of every node of an n × n
// net grid, in parallel over rows; each worker gets its own evaluator from
// eval. Nodes outside the primitive take the value of the primitive point
// on their radius.
func densityField(p Projection, n int, eval func() func(r3.Vec) float64) *Field {
	f := &Field{N: n, Values: make([]float64, n*n)}
	rows := make(chan int, n)
	for j := range n {
		rows <- j
	}
	close(rows)
	var wg sync.WaitGroup
	for range runtime.GOMAXPROCS(0) {
		wg.Go(func() {
			density := eval()
			for j := range rows {
				for i := range n {
					pt := f.Node(i, j)
					if r := math.Hypot(pt.X, pt.Y); r > 1 {
						pt.X, pt.Y = pt.X/r, pt.Y/r
					}
					l, _ := p.Inverse(pt)
					f.Values[j*n+i] = density(l.Vec())
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
	return f
}

// Draw draws the figure on c, laid out like the tendency stereonet: text
// sized from the canvas, the key beside the net or under it, the set names
// clear of the poles and of each other.
func (d *DensityNet) Draw(c draw.Canvas) {
	if d.Field == nil {
		panic("plots: DensityNet.Field is nil: compute it with NewDensityField")
	}
	hi := math.Max(6, math.Ceil(d.Field.Max/2)*2)
	f := layFrame(c, append([]string{d.Site}, d.Lines...), d.key(hi), netScore)
	n := netIn(&c, f.square(), f.l)
	g := glyphScale(n.r)
	var ramp Ramp
	drawRaster(n, d.Field, func(v float64) color.NRGBA { return pale(ramp.At(v / hi)) })
	thin := draw.LineStyle{Color: color.NRGBA{R: 0x10, G: 0x10, B: 0x10, A: 0xa0}, Width: vg.Points(0.5)}
	for _, l := range d.levels(hi) {
		for _, line := range Chain(d.Field.Contour(d.Field.Values, l)) {
			n.c.StrokeLines(thin, n.path(line))
		}
	}
	drawPrimitiveLook(n, f.l)
	lab := &labeller{bounds: f.inner, pad: f.l.pt(1)}
	lab.blockText(f.titleRect())
	lab.blockText(f.keyRect())
	lab.blockText(n.northBox(f.l))
	// Poles: small dots, open for unassigned readings.
	for _, i := range d.shown() {
		at := n.pt(d.Proj.ProjectVec(d.Poles[i]))
		readingGlyph(&c, at, d.InSet == nil || d.InSet[i], g)
		lab.block(square(at, vg.Points(1.6*g+0.5)))
	}
	// Set means with their α95 cones.
	for _, s := range d.Sets {
		pole := s.Mean.Pole()
		if !math.IsNaN(s.Alpha95) {
			for _, path := range d.Proj.SmallCircle(pole, s.Alpha95, 120) {
				n.c.StrokeLines(draw.LineStyle{Color: white, Width: vg.Points(2.4)}, n.path(path))
				n.c.StrokeLines(draw.LineStyle{Color: ink, Width: vg.Points(1.2)}, n.path(path))
			}
		}
		at := n.pt(d.Proj.Project(pole))
		meanGlyph(n.c, at, g)
		lab.block(square(at, meanRadius(g)))
	}
	sty := f.l.text(9, 6.5, true, ink)
	for _, s := range d.Sets {
		lab.place(sty, s.Name, n.pt(d.Proj.Project(s.Mean.Pole())), meanRadius(g), math.Pi/4, 10)
	}
	lab.draw(&c)
	f.drawText(&c)
}

// readingGlyph draws the pole of a reading: a dot when it is in a set, a
// ring when it is not.
func readingGlyph(c *draw.Canvas, at vg.Point, inSet bool, g float64) {
	if inSet {
		c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: vg.Points(1.3 * g), Shape: draw.CircleGlyph{}}, at)
		return
	}
	c.DrawGlyph(draw.GlyphStyle{Color: poleInk, Radius: vg.Points(1.6 * g), Shape: draw.RingGlyph{}}, at)
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

// key returns the density net's key.
func (d *DensityNet) key(hi float64) *keyBox {
	k := d.Kamb
	kb := &keyBox{
		head: "pole density (Kamb 1959)",
		bar:  &densityBar{hi: hi, marks: append([]float64{0}, append(d.levels(hi), hi)...)},
		notes: []string{
			fmt.Sprintf("counting cone %.1f° (%.1f%% of the net)", k.Theta, 100*k.Area),
			fmt.Sprintf("uniform scatter: %.1f poles = 3σ, σ = %.2f", k.Expected, k.Sigma),
			fmt.Sprintf("contours every %gσ", levelStep(hi)),
		},
	}
	if sm := d.Smooth; sm != nil {
		kb.head = "pole density, smoothed (Vollmer 1995)"
		kb.notes = []string{
			fmt.Sprintf("exponential Kamb weighting, K = %.3g", sm.K),
			fmt.Sprintf("uniform scatter reads %.1fσ", sm.Expected/sm.Sigma),
			fmt.Sprintf("contours every %gσ", levelStep(hi)),
		}
	}
	if shown := len(d.shown()); shown < len(d.Poles) {
		kb.notes = append(kb.notes, fmt.Sprintf("symbols for %d of the %d readings, evenly spread", shown, len(d.Poles)))
	}
	in, out := 0, 0
	for i := range d.Poles {
		if d.InSet == nil || d.InSet[i] {
			in++
		} else {
			out++
		}
	}
	kb.rows = append(kb.rows,
		keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { readingGlyph(c, at, true, keyGlyph(l)) }, text: fmt.Sprintf("pole of a reading in a set (%d)", in)},
		keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { readingGlyph(c, at, false, keyGlyph(l)) }, text: fmt.Sprintf("unassigned reading (%d)", out)},
		keyRow{glyph: func(c *draw.Canvas, at vg.Point, l look) { meanGlyph(c, at, keyGlyph(l)) }, text: "set mean pole, with its α95 cone"},
	)
	for _, s := range d.Sets {
		l := s.Mean.Pole()
		alpha := "α95 —" // one reading: no cone
		if !math.IsNaN(s.Alpha95) {
			alpha = fmt.Sprintf("α95 %.1f°", s.Alpha95)
		}
		kb.rows = append(kb.rows, keyRow{text: fmt.Sprintf("%s: %s, pole %s, %s, n = %d", s.Name, s.Mean, fmtLine(l.Trend, l.Plunge), alpha, s.Count)})
	}
	return kb
}

// densityBar is the density net's colour bar, 0 to hi in multiples of σ,
// rising to the right, labelled where the labels clear each other.
type densityBar struct {
	hi    float64
	marks []float64
}

func (b *densityBar) height(l look, _ vg.Length) vg.Length {
	_, th := textBox(l.tickText(), "0σ")
	return l.pt(10) + l.pt(3) + th
}

func (b *densityBar) draw(c *draw.Canvas, l look, r vg.Rectangle) {
	w := min(r.Max.X-r.Min.X, l.pt(200))
	x0, top := r.Min.X, r.Max.Y
	bottom := top - l.pt(10)
	var ramp Ramp
	const steps = 100
	for k := range steps {
		x1 := x0 + w*vg.Length(k)/steps
		x2 := x0 + w*vg.Length(k+1)/steps
		c.FillPolygon(ramp.At((float64(k)+0.5)/steps), []vg.Point{{X: x1, Y: bottom}, {X: x2 + 0.3, Y: bottom}, {X: x2 + 0.3, Y: top}, {X: x1, Y: top}})
	}
	frame := draw.LineStyle{Color: ink, Width: vg.Points(0.6)}
	c.StrokeLines(frame, []vg.Point{{X: x0, Y: bottom}, {X: x0 + w, Y: bottom}, {X: x0 + w, Y: top}, {X: x0, Y: top}, {X: x0, Y: bottom}})
	barTicks(c, l, r, bottom, b.marks, func(v float64) vg.Length { return x0 + w*vg.Length(v/b.hi) }, func(v float64) string { return fmt.Sprintf("%gσ", v) })
}
