package plots

import (
	"math"
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
	for _, size := range [][2]vg.Length{{17 * vg.Centimeter, 12 * vg.Centimeter}, {10 * vg.Centimeter, 16 * vg.Centimeter}, {30 * vg.Centimeter, 8 * vg.Centimeter}} {
		c := draw.New(vgimg.New(size[0], size[1]))
		sx, sy := demoMohr().Scales(c)
		if math.Abs(sx-sy)/sx > 0.005 {
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
	r := m.Points[i].Result
	end := r.EffectiveNormal - m.State.Biot*r.PressureToSlip
	if got := m.Envelopes[0].Criterion.Strength(end); math.Abs(got-r.Shear) > 1e-12 {
		t.Errorf("arrow ends at strength %v, want τ = %v", got, r.Shear)
	}
}
