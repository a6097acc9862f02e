package planes

import (
	"cleft/insitu"
	"cleft/insitu/geom"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestOrientationExactEdges(t *testing.T) {
	// Dip 0 and 90, dip direction 0 and 360, give exact unit components.
	cases := []struct {
		dip, dd float64
		pole    r3.Vec
	}{
		{0, 0, r3.Vec{Z: 1}},
		{0, 360, r3.Vec{Z: 1}},
		{90, 0, r3.Vec{X: -1}},
		{90, 90, r3.Vec{Y: -1}},
		{90, 360, r3.Vec{X: -1}},
	}
	for _, c := range cases {
		o := MustNew(c.dip, c.dd)
		if o.Normal() != c.pole {
			t.Errorf("%v/%v: pole %v, want %v", c.dip, c.dd, o.Normal(), c.pole)
		}
	}
	if o := MustNew(30, 360); o.DipDirection() != 0 {
		t.Errorf("dip direction 360 stored as %v, want 0", o.DipDirection())
	}
}

func TestOrientationFrames(t *testing.T) {
	const angleTol = 1e-9 // degrees
	for dip := 0.0; dip <= 90; dip += 15 {
		for dd := 0.0; dd < 360; dd += 37 {
			o := MustNew(dip, dd)
			n, s, d := o.Normal(), o.StrikeVec(), o.DownDip()
			if !scalar.EqualWithinAbs(r3.Dot(n, s), 0, tol) || !scalar.EqualWithinAbs(r3.Dot(n, d), 0, tol) || !scalar.EqualWithinAbs(r3.Dot(s, d), 0, tol) {
				t.Fatalf("%v: frame not orthogonal", o)
			}
			// Right-hand rule: the plane dips to the right of the strike, so
			// in NED (z down) strike × down-dip is the downward pole.
			if c := r3.Cross(s, d); r3.Norm(r3.Sub(c, n)) > tol {
				t.Fatalf("%v: strike × down-dip = %v, want the pole %v", o, c, n)
			}
			if p := o.Pole(); geom.AxialAngle(p.Vec(), n) > angleTol {
				t.Fatalf("%v: Pole() %v disagrees with Normal()", o, p)
			}
			if dl := o.DipLine(); geom.Angle(dl.Vec(), d) > angleTol {
				t.Fatalf("%v: DipLine() %v disagrees with DownDip()", o, dl)
			}
		}
	}
}

func TestOrientationConstructors(t *testing.T) {
	const angleTol = 1e-9 // degrees
	// Right-hand rule (common practice): strike 030, dip 60 dips to 120.
	o, err := FromStrike(30, 60)
	if err != nil || o.DipDirection() != 120 || o.Dip() != 60 || o.Strike() != 30 {
		t.Errorf("FromStrike(30, 60) = %v, %v", o, err)
	}
	o, err = FromStrike(300, 45)
	if err != nil || o.DipDirection() != 30 {
		t.Errorf("FromStrike(300, 45) dip direction = %v, want 30", o.DipDirection())
	}
	o, err = FromPole(300, 20)
	if err != nil || o.DipDirection() != 120 || o.Dip() != 70 {
		t.Errorf("FromPole(300, 20) = %v, %v; want 70/120", o, err)
	}
	o, err = Parse(" 65 / 120 ")
	if err != nil || o.Dip() != 65 || o.DipDirection() != 120 || o.String() != "65/120" {
		t.Errorf("Parse = %v, %v", o, err)
	}
	if q := FromNormal(r3.Scale(-1, MustNew(65, 120).Normal())); !scalar.EqualWithinAbs(q.Dip(), 65, angleTol) || !scalar.EqualWithinAbs(q.DipDirection(), 120, angleTol) {
		t.Errorf("FromNormal(−pole) = %v, want 65/120", q)
	}
	for _, bad := range []struct {
		name string
		f    func() error
	}{
		{"dip 95", func() error { _, err := New(95, 10); return err }},
		{"dip −1", func() error { _, err := New(-1, 10); return err }},
		{"dip NaN", func() error { _, err := New(math.NaN(), 10); return err }},
		{"dip direction 361", func() error { _, err := New(40, 361); return err }},
		{"dip direction −5", func() error { _, err := New(40, -5); return err }},
		{"strike 400", func() error { _, err := FromStrike(400, 10); return err }},
		{"pole plunge 91", func() error { _, err := FromPole(10, 91); return err }},
		{"parse no slash", func() error { _, err := Parse("65 120"); return err }},
		{"parse words", func() error { _, err := Parse("steep/east"); return err }},
	} {
		if bad.f() == nil {
			t.Errorf("%s: no error", bad.name)
		}
	}
}

func TestSenseOf(t *testing.T) {
	// Aki & Richards (1980): 0 sinistral, +90 reverse, ±180 dextral, −90 normal;
	// the 45° sectors and their edges are this tool's choice (see SenseOf).
	cases := []struct {
		rake float64
		want Sense
	}{
		{0, Sinistral}, {22.5, Sinistral}, {22.6, SinistralReverse}, {45, SinistralReverse},
		{67.5, Reverse}, {90, Reverse}, {112.5, Reverse}, {135, DextralReverse},
		{157.5, Dextral}, {180, Dextral}, {-180, Dextral}, {-135, DextralNormal},
		{-90, NormalSlip}, {-67.5, NormalSlip}, {-45, SinistralNormal}, {-22.5, Sinistral},
		{math.NaN(), NoSlip},
	}
	for _, c := range cases {
		if got := SenseOf(c.rake); got != c.want {
			t.Errorf("SenseOf(%v) = %v, want %v", c.rake, got, c.want)
		}
	}
}

func TestZeroOrientationIsHorizontal(t *testing.T) {
	// The zero value is documented as the plane 0/000: it must behave as
	// New(0, 0) does, not as a plane without a pole.
	var z Orientation
	n := MustNew(0, 0)
	if z.Normal() != n.Normal() || z.StrikeVec() != n.StrikeVec() || z.UpDip() != n.UpDip() || z.Dip() != 0 || z.DipDirection() != 0 {
		t.Fatalf("zero value %v %v %v differs from 0/000 %v %v %v", z.Normal(), z.StrikeVec(), z.UpDip(), n.Normal(), n.StrikeVec(), n.UpDip())
	}
	s := insitu.NewState(insitu.Andersonian(30, 20, 25, 0), 1000, 0, 1)
	c, _ := NewCoulomb(0.6, 0)
	if r := Resolve(s, z, c); r.State == Opening || r.EffectiveNormal != 25 {
		t.Errorf("zero-value plane under compression: %v, σn' %v (want Sv = 25, stable)", r.State, r.EffectiveNormal)
	}
}
