package tunnel

import (
	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestClassifyDrive(t *testing.T) {
	// Bieniawski (1989) orientation adjustment for tunnels (memory), at the
	// band edges of this tool's reading (≥ 45° strike-to-axis is
	// perpendicular; dips of 20° and 45° go to the steeper band).
	const drive = 90.0 // driving east
	for _, c := range []struct {
		name  string
		o     planes.Orientation
		class string
		drive string
	}{
		{"perpendicular, with dip, steep", planes.MustNew(60, 90), "very favourable", "with dip"},
		{"perpendicular, with dip, dip 45 is steep", planes.MustNew(45, 90), "very favourable", "with dip"},
		{"perpendicular, with dip, 20–45", planes.MustNew(30, 90), "favourable", "with dip"},
		{"perpendicular, with dip, dip 20 is 20–45", planes.MustNew(20, 90), "favourable", "with dip"},
		{"perpendicular, against dip, steep", planes.MustNew(60, 270), "fair", "against dip"},
		{"perpendicular, against dip, 20–45", planes.MustNew(30, 270), "unfavourable", "against dip"},
		{"strike exactly 45° to the axis takes the less favourable band", planes.MustNew(60, 45), "very unfavourable", ""},
		{"strike 46° to the axis is perpendicular", planes.MustNew(60, 46), "very favourable", "with dip"},
		{"vertical, either dip direction: the less favourable, against dip", planes.MustNew(90, 90), "fair", "against dip"},
		{"vertical typed the other way", planes.MustNew(90, 270), "fair", "against dip"},
		{"near-vertical within the tolerance", planes.MustNew(89.5, 90), "fair", "against dip"},
		{"strike 44° to the axis is parallel", planes.MustNew(60, 44), "very unfavourable", ""},
		{"parallel, steep", planes.MustNew(80, 0), "very unfavourable", ""},
		{"parallel, 20–45", planes.MustNew(30, 180), "fair", ""},
		{"flat, any strike", planes.MustNew(19.9, 90), "fair", ""},
	} {
		got := ClassifyDrive(c.o, drive)
		if got.Class.String() != c.class || got.Drive.String() != c.drive {
			t.Errorf("%s (%v, strike %v° to the axis): %+v", c.name, c.o, got.StrikeToAxis, got)
		}
	}
}

func TestWallTensorResolved(t *testing.T) {
	// A level tunnel driven north; far field vertical 10, east–west 5, axial
	// 8 MPa; ν = 0.25. By hand (Kirsch with the axial term, see opening.Wall):
	// crown σθ = 3·5 − 10 = 5 along east, σz = 8 − 2·0.25·5 = 5.5; sidewall
	// σθ = 15 + 2·5 = 25 vertical, σz = 8 + 2·0.25·5 = 10.5; σr = 0. On a
	// plane dipping 45° east, the 2-D Mohr circle gives σn = τ = σθ/2.
	const tol = 1e-12 // MPa
	up, right, along := opening.TunnelFrame(geom.Line{Trend: 0})
	far := insitu.Tensor{NN: 10, EE: 5, DD: 8}
	c := &planes.Coulomb{Mu: 0.6}
	for _, w := range []struct {
		theta, sigma float64
		flat         planes.Orientation // the plane whose normal is the tangent
	}{
		{0, 5, planes.MustNew(90, 90)},
		{90, 25, planes.MustNew(0, 0)},
	} {
		ws := opening.Wall(far, w.theta, 0.25)
		st := insitu.NewState(ws.WallTensor(up, right, along, w.theta), 100, 0, 1)
		if r := planes.Resolve(st, w.flat, c); !scalar.EqualWithinAbs(r.Normal, w.sigma, tol) || r.Shear > tol {
			t.Errorf("θ %v: plane normal to the tangent σn %v τ %v, want %v and 0", w.theta, r.Normal, r.Shear, w.sigma)
		}
		r := planes.Resolve(st, planes.MustNew(45, 90), c)
		if !scalar.EqualWithinAbs(r.Normal, w.sigma/2, tol) || !scalar.EqualWithinAbs(r.Shear, w.sigma/2, tol) {
			t.Errorf("θ %v: 45/090 σn %v τ %v, want %v each", w.theta, r.Normal, r.Shear, w.sigma/2)
		}
	}
	if ws := opening.Wall(far, 0, 0.25); !scalar.EqualWithinAbs(ws.Z, 5.5, tol) {
		t.Errorf("crown σz = %v, want 5.5", ws.Z)
	}
}
