package planes

import (
	"math"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestApparentDip(t *testing.T) {
	// Common practice: tan α = tan δ · cos β.
	o := MustNew(60, 120)
	for _, c := range []struct{ az, want float64 }{
		{120, 60}, {30, 0}, {210, 0}, {300, -60},
		{150, math.Atan(math.Tan(60*math.Pi/180)*math.Cos(30*math.Pi/180)) * 180 / math.Pi},
	} {
		if got := ApparentDip(o, c.az); !scalar.EqualWithinAbs(got, c.want, 1e-9) {
			t.Errorf("apparent dip along %v = %v, want %v", c.az, got, c.want)
		}
	}
	if got := ApparentDip(MustNew(90, 10), 40); got != 90 {
		t.Errorf("vertical plane: %v, want 90", got)
	}
}

func TestIntersection(t *testing.T) {
	// Wyllie & Mah (2004) example as quoted in lecture notes (read): planes
	// 50/130 and 30/250 meet in a line 20.5° → 200.5°, read graphically off
	// a net; the exact answer is 20.87° → 201.34° (derived), so the check
	// against the published value allows 1°.
	l, ok := Intersection(MustNew(50, 130), MustNew(30, 250))
	if !ok || !scalar.EqualWithinAbs(l.Plunge, 20.5, 1) || !scalar.EqualWithinAbs(l.Trend, 200.5, 1) {
		t.Errorf("line %v, want about 200.5/20.5", l)
	}
	if !scalar.EqualWithinAbs(l.Plunge, 20.87, 0.005) || !scalar.EqualWithinAbs(l.Trend, 201.34, 0.005) {
		t.Errorf("line %v, want 201.34/20.87 (derived)", l)
	}
	// The line lies in both planes: n1·l = n2·l = 0, the cross product's axis.
	v := l.Vec()
	if d1, d2 := r3.Dot(v, MustNew(50, 130).Normal()), r3.Dot(v, MustNew(30, 250).Normal()); math.Abs(d1) > 1e-12 || math.Abs(d2) > 1e-12 {
		t.Errorf("line not in the planes: %v, %v", d1, d2)
	}
	if _, ok := Intersection(MustNew(40, 10), MustNew(40, 10)); ok {
		t.Error("parallel planes intersect")
	}
	// Hand case: two vertical planes meet in a vertical line.
	if l, _ := Intersection(MustNew(90, 0), MustNew(90, 90)); !scalar.EqualWithinAbs(l.Plunge, 90, 1e-9) {
		t.Errorf("two vertical planes: %v, want plunge 90", l)
	}
}

var face = MustNew(65, 210)

func TestPlanarSliding(t *testing.T) {
	// Hoek & Bray (1981), lecture notes (read): dip directions within ±20°,
	// ψp < ψf (daylights), ψp > φ. One feasible case and one failing case per
	// condition.
	const phi, lat = 35, 20
	for _, c := range []struct {
		name  string
		p     Orientation
		ok    bool
		why   string
		fails Condition
	}{
		{"feasible", MustNew(45, 200), true, "", 0},
		{"beyond the lateral limit", MustNew(45, 240), false, "lateral limit", Lateral},
		{"steeper than the face", MustNew(70, 210), false, "does not daylight", Daylight},
		{"flatter than φ", MustNew(30, 210), false, "friction angle", Friction},
		{"exactly at φ passes", MustNew(35, 210), true, "", 0},
		{"exactly at the lateral limit passes", MustNew(45, 230), true, "", 0},
		{"exactly the face dip does not daylight", MustNew(65, 210), false, "does not daylight", Daylight},
	} {
		k := PlanarSliding(c.p, face, phi, lat)
		if k.Feasible != c.ok || (c.why != "" && !contains(k.Reason(), c.why)) || k.Fails != c.fails {
			t.Errorf("%s: %+v", c.name, k)
		}
	}
}

func contains(s, sub string) bool {
	return len(sub) == 0 || (len(s) >= len(sub) && indexOf(s, sub) >= 0)
}

func indexOf(s, sub string) int {
	for i := 0; i+len(sub) <= len(s); i++ {
		if s[i:i+len(sub)] == sub {
			return i
		}
	}
	return -1
}

func TestWedgeSliding(t *testing.T) {
	const phi = 30
	for _, c := range []struct {
		name string
		a, b Orientation
		ok   bool
		mode string
	}{
		// Line 20.9 → 201.3: daylights in a 65/210 face but plunges below φ = 30.
		{"line flatter than φ", MustNew(50, 130), MustNew(30, 250), false, "friction angle"},
		{"both planes", MustNew(55, 170), MustNew(55, 250), true, "both planes"},
		// Line 227/48: A dips to 218, between the face (210) and the line.
		{"one plane", MustNew(48, 218), MustNew(75, 300), true, "single-plane sliding on A"},
		{"into the slope", MustNew(50, 20), MustNew(50, 80), false, "into the slope"},
		{"steeper than the face", MustNew(80, 170), MustNew(80, 250), false, "does not daylight"},
	} {
		l, k := WedgeSliding(c.a, c.b, "A", "B", face, phi)
		if k.Feasible != c.ok || !contains(k.Reason(), c.mode) {
			t.Errorf("%s: line %v, %+v", c.name, l, k)
		}
	}
}

func TestFlexuralToppling(t *testing.T) {
	// Goodman & Bray (1976) (read, summary): (90° − δ) + φ ≤ ψf for planes
	// dipping into the face within the lateral limit.
	const phi, lat = 30, 20
	for _, c := range []struct {
		name string
		p    Orientation
		ok   bool
	}{
		{"feasible", MustNew(80, 30), true},
		{"boundary (90−85)+30 = 35 ≤ 65 passes", MustNew(85, 30), true},
		{"exactly (90−55)+30 = 65 passes", MustNew(55, 30), true},
		{"too flat: (90−50)+30 = 70 > 65", MustNew(50, 30), false},
		{"dips out of the face", MustNew(80, 210), false},
		{"beyond the lateral limit", MustNew(80, 60), false},
	} {
		if k := FlexuralToppling(c.p, face, phi, lat); k.Feasible != c.ok {
			t.Errorf("%s: %+v", c.name, k)
		}
	}
}

func TestPlanarBlock(t *testing.T) {
	const h, psiF, psiP, gamma = 30.0, 65.0, 35.0, 0.026
	cot := func(a float64) float64 { return 1 / math.Tan(a*math.Pi/180) }
	for _, z := range []float64{0.0001, 4, 8, 12} {
		b, err := NewPlanarBlock(h, psiF, 0, psiP, z, true, gamma)
		if err != nil {
			t.Fatal(err)
		}
		// Hoek & Bray (1981); Wyllie & Mah (2004): flat top, crack in the
		// upper surface, W = ½γH²{[1 − (z/H)²] cot ψp − cot ψf},
		// A = (H − z)/sin ψp.
		w := 0.5 * gamma * h * h * ((1-(z/h)*(z/h))*cot(psiP) - cot(psiF))
		a := (h - z) / math.Sin(psiP*math.Pi/180)
		if !scalar.EqualWithinAbsOrRel(b.Weight, w, 1e-12, 1e-12) || !scalar.EqualWithinAbsOrRel(b.Length, a, 1e-12, 1e-12) {
			t.Errorf("z = %v: W %v A %v, want %v %v", z, b.Weight, b.Length, w, a)
		}
		if !scalar.EqualWithinAbs(b.CrackDepth, z, 1e-9) {
			t.Errorf("z = %v: crack depth came out %v", z, b.CrackDepth)
		}
		// The factor of safety of the published formula, by hand.
		c, phi, zw := 0.02, 32.0, 0.5*z
		U, V := 0.5*WaterUnitWeight*zw*a, 0.5*WaterUnitWeight*zw*zw
		sp, cp := math.Sincos(psiP * math.Pi / 180)
		want := (c*a + (w*cp-U-V*sp)*math.Tan(phi*math.Pi/180)) / (w*sp + V*cp)
		if got := b.FS(c, phi, zw); !scalar.EqualWithinAbsOrRel(got, want, 1e-12, 1e-12) {
			t.Errorf("z = %v: FS %v, want %v", z, got, want)
		}
	}
	// Dry and cohesionless: FS = tan φ / tan ψp whatever the geometry
	// (lecture notes, read).
	b, _ := NewPlanarBlock(h, psiF, 5, psiP, 6, false, gamma)
	if got := b.FS(0, 38, 0); !scalar.EqualWithinAbs(got, math.Tan(38*math.Pi/180)/math.Tan(psiP*math.Pi/180), 1e-12) {
		t.Errorf("dry cohesionless FS %v", got)
	}
	// By distance: a crack 6 m behind the crest of a flat top is as deep as
	// the geometry says: z = H + b tan 0 − (H cot ψf + b) tan ψp.
	bd, _ := NewPlanarBlock(h, psiF, 0, psiP, 6, false, gamma)
	if want := h - (h*cot(psiF)+6)*math.Tan(psiP*math.Pi/180); !scalar.EqualWithinAbs(bd.CrackDepth, want, 1e-9) || !scalar.EqualWithinAbs(bd.Behind, 6, 1e-9) {
		t.Errorf("crack by distance: z %v b %v, want %v 6", bd.CrackDepth, bd.Behind, want)
	}
	// The water depth to fail brings FS to 1.
	bw, _ := NewPlanarBlock(h, psiF, 0, psiP, 10, true, gamma)
	if zw := bw.WaterDepthToFail(0.01, 38); math.IsNaN(zw) || !scalar.EqualWithinAbs(bw.FS(0.01, 38, zw), 1, 1e-9) {
		t.Errorf("water depth to fail %v gives FS %v", zw, bw.FS(0.01, 38, zw))
	}
	// Critical crack depth (Hoek & Bray 1981, memory): z/H = 1 − √(cot ψf tan ψp).
	if zc := CriticalCrackDepth(h, psiF, psiP); !scalar.EqualWithinAbs(zc/h, 1-math.Sqrt(cot(psiF)*math.Tan(psiP*math.Pi/180)), 1e-12) {
		t.Errorf("critical crack depth %v", zc)
	}
	if _, err := NewPlanarBlock(h, psiF, 0, psiP, 25, true, gamma); err == nil {
		t.Error("a crack meeting the plane in front of the crest was accepted")
	}
}

func TestClassifyDrive(t *testing.T) {
	// Bieniawski (1989) orientation adjustment for tunnels (memory), at the
	// band edges of this tool's reading (≥ 45° strike-to-axis is
	// perpendicular; dips of 20° and 45° go to the steeper band).
	const drive = 90.0 // driving east
	for _, c := range []struct {
		name  string
		o     Orientation
		class string
		drive string
	}{
		{"perpendicular, with dip, steep", MustNew(60, 90), "very favourable", "with dip"},
		{"perpendicular, with dip, dip 45 is steep", MustNew(45, 90), "very favourable", "with dip"},
		{"perpendicular, with dip, 20–45", MustNew(30, 90), "favourable", "with dip"},
		{"perpendicular, with dip, dip 20 is 20–45", MustNew(20, 90), "favourable", "with dip"},
		{"perpendicular, against dip, steep", MustNew(60, 270), "fair", "against dip"},
		{"perpendicular, against dip, 20–45", MustNew(30, 270), "unfavourable", "against dip"},
		{"strike exactly 45° to the axis counts as perpendicular", MustNew(60, 45), "very favourable", "with dip"},
		{"strike 44° to the axis is parallel", MustNew(60, 44), "very unfavourable", ""},
		{"parallel, steep", MustNew(80, 0), "very unfavourable", ""},
		{"parallel, 20–45", MustNew(30, 180), "fair", ""},
		{"flat, any strike", MustNew(19.9, 90), "fair", ""},
	} {
		got := ClassifyDrive(c.o, drive)
		if got.Class != c.class || got.Drive != c.drive {
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
	up, right, along := opening.TunnelFrame(geom.Line{Trend: 0})
	far := insitu.Tensor{NN: 10, EE: 5, DD: 8}
	c := &Coulomb{Mu: 0.6}
	for _, w := range []struct {
		theta, sigma float64
		flat         Orientation // the plane whose normal is the tangent
	}{
		{0, 5, MustNew(90, 90)},
		{90, 25, MustNew(0, 0)},
	} {
		ws := opening.Wall(far, w.theta, 0.25)
		st := insitu.NewState(ws.WallTensor(up, right, along, w.theta), 100, 0, 1)
		if r := Resolve(st, w.flat, c); !scalar.EqualWithinAbs(r.Normal, w.sigma, 1e-12) || r.Shear > 1e-12 {
			t.Errorf("θ %v: plane normal to the tangent σn %v τ %v, want %v and 0", w.theta, r.Normal, r.Shear, w.sigma)
		}
		r := Resolve(st, MustNew(45, 90), c)
		if !scalar.EqualWithinAbs(r.Normal, w.sigma/2, 1e-12) || !scalar.EqualWithinAbs(r.Shear, w.sigma/2, 1e-12) {
			t.Errorf("θ %v: 45/090 σn %v τ %v, want %v each", w.theta, r.Normal, r.Shear, w.sigma/2)
		}
	}
	if ws := opening.Wall(far, 0, 0.25); !scalar.EqualWithinAbs(ws.Z, 5.5, 1e-12) {
		t.Errorf("crown σz = %v, want 5.5", ws.Z)
	}
}
