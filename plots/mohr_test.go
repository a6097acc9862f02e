package plots

import (
	"math"
	"strings"
	"testing"

	"cleft/planes"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

func demoMohr() *Mohr {
	s := demoState()
	c := &planes.Coulomb{Mu: 0.6}
	m := &Mohr{Site: "t", Depth: 200, State: s, Envelopes: []Envelope{{Label: "site", Criterion: c}}}
	for _, o := range []planes.Orientation{planes.MustNew(80, 10), planes.MustNew(40, 200), planes.MustNew(88, 350), planes.MustNew(10, 30)} {
		m.Points = append(m.Points, MohrPoint{Name: o.String(), Result: planes.Resolve(s, o, c)})
	}
	return m
}

func TestMohrEqualScale(t *testing.T) {
	// Circles must look like circles: one MPa is as long on x as on y, for
	// wide and tall canvases alike.
	const scaleTol = 0.005 // relative
	for _, size := range [][2]vg.Length{{17 * vg.Centimeter, 12 * vg.Centimeter}, {10 * vg.Centimeter, 16 * vg.Centimeter}, {30 * vg.Centimeter, 8 * vg.Centimeter}} {
		c := draw.New(vgimg.New(size[0], size[1]))
		sx, sy := demoMohr().Scales(c)
		if math.Abs(sx-sy)/sx > scaleTol {
			t.Errorf("canvas %v: x scale %v, y scale %v pt/MPa", size, sx, sy)
		}
	}
}

func TestMohrCriticalPlane(t *testing.T) {
	m := demoMohr()
	i := m.critical()
	for _, p := range m.Points {
		if p.Result.State != planes.Opening && p.Result.PressureToSlip < m.Points[i].Result.PressureToSlip {
			t.Errorf("critical() chose %s (ΔPp %v) over %s (ΔPp %v)", m.Points[i].Name, m.Points[i].Result.PressureToSlip, p.Name, p.Result.PressureToSlip)
		}
	}
	// The arrow ends on the envelope: at σn' − α·ΔPp the strength equals τ.
	const tol = 1e-12 // MPa
	r := m.Points[i].Result
	end := r.EffectiveNormal - m.State.Biot*r.PressureToSlip
	if got := m.Envelopes[0].Criterion.Strength(end); math.Abs(got-r.Shear) > tol {
		t.Errorf("arrow ends at strength %v, want τ = %v", got, r.Shear)
	}
}

func TestMohrArrowClearOfMarker(t *testing.T) {
	// The arrow never lies over its plane's marker, and its head ends on
	// the envelope's abscissa, for spans shorter and longer than the head,
	// both ways.
	const tol = 1e-9 // pt
	c := draw.New(vgimg.New(200, 200))
	from := vg.Point{X: 100, Y: 100}
	for _, l := range []look{{k: lookMin}, {k: 1}, {k: lookMax}} {
		rm := stateRadius(planes.Critical, 1)
		for _, dx := range []vg.Length{-80, -12, -3, -0.5, 0.5, 3, 12, 80} {
			to := vg.Point{X: from.X + dx, Y: from.Y}
			r := shiftArrow(&c, from, to, rm, l)
			if overlaps(r, square(from, rm)) {
				t.Errorf("k %v, span %v pt: arrow %v over the marker", l.k, dx, r)
			}
			if math.Abs(float64(r.Min.X-to.X)) > tol && math.Abs(float64(r.Max.X-to.X)) > tol {
				t.Errorf("k %v, span %v pt: arrow %v does not reach %v", l.k, dx, r, to.X)
			}
		}
	}
}

func TestMohrArrowDepth(t *testing.T) {
	// The arrow's key line states the diagram's depth and, for a plane at
	// another depth of its own, the tables' value there.
	m := demoMohr()
	i := m.critical()
	q := &m.Points[i]
	if s := m.arrowText(q); !strings.Contains(s, "at 200 m") || strings.Contains(s, "own depth") {
		t.Errorf("no own result: %q", s)
	}
	own := planes.Resolve(m.State, planes.MustNew(80, 10), &planes.Coulomb{Mu: 0.6})
	own.PressureToSlip = 0.42
	q.Own, q.Depth = &own, 350
	if s := m.arrowText(q); !strings.Contains(s, "at 200 m") || !strings.Contains(s, "own depth, 350 m") || !strings.Contains(s, "+0.42 MPa") {
		t.Errorf("own result at 350 m: %q", s)
	}
	q.Depth = 200
	if s := m.arrowText(q); strings.Contains(s, "own depth") {
		t.Errorf("own depth equal to the diagram's: %q", s)
	}
}

func TestMohrSmallCanvasKeepsTheCircles(t *testing.T) {
	// On the smallest canvases the command allows, the key gives way to
	// the circles (it is cut to fit) rather than squeezing the data area to
	// nothing: the diagram still spans σ3' to σ1' at equal scales
	// (a newcomer found an empty diagram with an axis of −22 to −18 MPa at
	// 7 × 7 cm).
	const scaleTol = 0.005
	m := demoMohrOf(t, -1)
	s := m.State.EffectivePrincipal()
	for _, cmSize := range [][2]float64{{6, 6}, {7, 7}, {8, 7}, {6, 10}} {
		c := draw.New(vgimg.New(vg.Length(cmSize[0])*vg.Centimeter, vg.Length(cmSize[1])*vg.Centimeter))
		f, p := m.layout(c)
		da := p.DataCanvas(sub(c, f.main))
		if da.Max.X-da.Min.X < minMohrSide || da.Max.Y-da.Min.Y < minMohrSide {
			t.Errorf("%v cm: data area %v", cmSize, da.Rectangle)
		}
		if !(p.X.Min <= s[2] && p.X.Max >= s[0]) {
			t.Errorf("%v cm: σn' axis %v to %v misses the circles %v to %v", cmSize, p.X.Min, p.X.Max, s[2], s[0])
		}
		if sx, sy := m.Scales(c); math.Abs(sx-sy)/sx > scaleTol {
			t.Errorf("%v cm: scales %v and %v", cmSize, sx, sy)
		}
	}
}
