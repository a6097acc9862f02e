package plots

import (
	"fmt"
	"math"
	"slices"

	"cleft/insitu"
	"cleft/planes"

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
	// Named asks for the great circle to be named even when the plane is
	// stable (a plane the reader chose by name).
	Named bool
}

// Stereonet is the tendency stereonet: the measure for every orientation at
// one depth in stepped bands between its contour levels, the line where the
// factor of safety is 1, the poles of the planes coloured by their own value
// and shaped by their state, chosen great circles and the principal stress
// axes. It lays itself out on any canvas from 8 × 8 cm to 40 × 30 cm: text
// sized from the canvas, the key beside the net or under it, names placed
// clear of each other and of the symbols. Poles are named when there are
// at most NameAll of them, and critical and opening ones always.
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
	// of joint sets), named at one end.
	Means []Pole

	// Field is the measure for every orientation at Depth, from NewField
	// with State, Criterion, Measure and Proj: the caller computes it
	// (FieldSize gives a resolution to match the figure). Required.
	Field *Field

	slipLine bool // some orientation reaches FS = 1 at Depth
	dropped  int  // names left out for want of room, in the last Draw
}

// NameAll is the most poles a stereonet names all of; with more, only the
// critical and opening ones are named.
const NameAll = 20

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
		for _, t := range (niceTicks{n: 8}).Ticks(lo, hi) { // round steps, about 8 bands
			lv = append(lv, t.Value)
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

// edges returns the edges of the background's bands, ascending: the
// contour levels, and the value at which a plane slips (FS = 1, ΔPp = 0)
// where the bar shows that measure.
func (s *Stereonet) edges(lo, hi float64) []float64 {
	e := s.levels(lo, hi)
	var slip float64
	switch s.Field.Measure {
	case FactorOfSafety:
		slip = 1
	case PressureToSlip:
		slip = 0
	default:
		return e
	}
	if slip > lo && slip < hi && !slices.Contains(e, slip) {
		e = append(e, slip)
		slices.Sort(e)
	}
	return e
}

// title returns the title lines.
func (s *Stereonet) title() []string {
	m := s.Measure
	proj := s.Proj.Name()[:len(s.Proj.Name())-len(", lower hemisphere")]
	lines := []string{
		s.Site,
		fmt.Sprintf("%s coloured by %s at their own depths; bands: every orientation at %g m", polesTo(len(s.Poles)), m.Label(), s.Depth),
		s.Model,
		"Lower-hemisphere " + proj + "; poles to planes",
	}
	if s.Note != "" {
		lines = append(lines, s.Note)
	}
	return lines
}

// polesTo is "Poles to n planes", or "Pole to 1 plane".
func polesTo(n int) string {
	if n == 1 {
		return "Pole to 1 plane"
	}
	return fmt.Sprintf("Poles to %d planes", n)
}

// Draw draws the figure on c.
func (s *Stereonet) Draw(c draw.Canvas) {
	if s.Field == nil {
		panic("plots: Stereonet.Field is nil: compute it with NewField")
	}
	lo, hi := s.Scale()
	slip := Chain(s.Field.Contour(s.Field.Safety, 1))
	s.slipLine = len(slip) > 0
	f := layFrame(c, s.title(), s.key(lo, hi), netScore)
	n := netIn(&c, f.square(), f.l)
	g := glyphScale(n.r)
	s.drawField(n, lo, hi)
	if s.Grid {
		drawGrid(n, s.Proj)
	}
	s.drawContours(n, lo, hi, slip)
	drawPrimitiveLook(n, f.l)
	s.drawTraces(n)
	s.drawPoles(n, lo, hi, g)
	drawAxes(n, s.Proj, s.State.Principal, g)

	lab := &labeller{bounds: f.inner, pad: f.l.pt(1)}
	lab.blockText(f.titleRect())
	lab.blockText(f.keyRect())
	lab.blockText(n.northBox(f.l))
	s.name(lab, n, f.l, g)
	lab.draw(&c)
	f.drawText(&c)
	s.dropped = lab.dropped
}
