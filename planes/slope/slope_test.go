package slope

import (
	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestApparentDip(t *testing.T) {
	// Common practice: tan α = tan δ · cos β. Derived for 60/120 along 150
	// (β = 30°): tan α = √3·(√3/2) = 3/2, α = atan 1.5 = 56.3099°.
	const angleTol = 1e-9 // degrees
	o := planes.MustNew(60, 120)
	for _, c := range []struct{ az, want float64 }{
		{120, 60}, {30, 0}, {210, 0}, {300, -60},
		{150, math.Atan(1.5) * 180 / math.Pi},
	} {
		if got := ApparentDip(o, c.az); !scalar.EqualWithinAbs(got, c.want, angleTol) {
			t.Errorf("apparent dip along %v = %v, want %v", c.az, got, c.want)
		}
	}
	if got := ApparentDip(planes.MustNew(90, 10), 40); got != 90 {
		t.Errorf("vertical plane: %v, want 90", got)
	}
}

func TestIntersection(t *testing.T) {
	// Wyllie & Mah (2004) example as quoted in lecture notes (read): planes
	// 50/130 and 30/250 meet in a line 20.5° → 200.5°, read graphically off
	// a net; the exact answer is 20.87° → 201.34° (derived), so the check
	// against the published value allows 1°.
	const (
		graphTol    = 1     // degrees: read graphically off a net
		twoDecimals = 0.005 // degrees: the derived line given to two decimals
		tol         = 1e-12 // n·l of unit vectors
		angleTol    = 1e-9  // degrees
	)
	l, ok := Intersection(planes.MustNew(50, 130), planes.MustNew(30, 250))
	if !ok || !scalar.EqualWithinAbs(l.Plunge, 20.5, graphTol) || !scalar.EqualWithinAbs(l.Trend, 200.5, graphTol) {
		t.Errorf("line %v, want about 200.5/20.5", l)
	}
	if !scalar.EqualWithinAbs(l.Plunge, 20.87, twoDecimals) || !scalar.EqualWithinAbs(l.Trend, 201.34, twoDecimals) {
		t.Errorf("line %v, want 201.34/20.87 (derived)", l)
	}
	// The line lies in both planes: n1·l = n2·l = 0, the cross product's axis.
	v := l.Vec()
	if d1, d2 := r3.Dot(v, planes.MustNew(50, 130).Normal()), r3.Dot(v, planes.MustNew(30, 250).Normal()); math.Abs(d1) > tol || math.Abs(d2) > tol {
		t.Errorf("line not in the planes: %v, %v", d1, d2)
	}
	if _, ok := Intersection(planes.MustNew(40, 10), planes.MustNew(40, 10)); ok {
		t.Error("parallel planes intersect")
	}
	// Hand case: two vertical planes meet in a vertical line.
	if l, _ := Intersection(planes.MustNew(90, 0), planes.MustNew(90, 90)); !scalar.EqualWithinAbs(l.Plunge, 90, angleTol) {
		t.Errorf("two vertical planes: %v, want plunge 90", l)
	}
}

var face = planes.MustNew(65, 210)

func TestPlanarSliding(t *testing.T) {
	// Hoek & Bray (1981), lecture notes (read): dip directions within ±20°,
	// ψp < ψf (daylights), ψp > φ. One feasible case and one failing case per
	// condition.
	const phi, lat = 35, 20
	for _, c := range []struct {
		name  string
		p     planes.Orientation
		ok    bool
		fails Condition
	}{
		{"feasible", planes.MustNew(45, 200), true, 0},
		{"beyond the lateral limit", planes.MustNew(45, 240), false, Lateral},
		{"steeper than the face", planes.MustNew(70, 210), false, Daylight},
		{"flatter than φ", planes.MustNew(30, 210), false, Friction},
		{"exactly at φ passes", planes.MustNew(35, 210), true, 0},
		{"exactly at the lateral limit passes", planes.MustNew(45, 230), true, 0},
		{"exactly the face dip does not daylight", planes.MustNew(65, 210), false, Daylight},
	} {
		k := PlanarSliding(c.p, face, phi, lat)
		if k.Feasible != c.ok || k.Fails != c.fails || (k.Mode == PlanarSlide) != c.ok {
			t.Errorf("%s: %+v", c.name, k)
		}
	}
}

func TestWedgeSliding(t *testing.T) {
	const phi = 30
	for _, c := range []struct {
		name  string
		a, b  planes.Orientation
		mode  Mode
		fails Condition
	}{
		// Line 20.9 → 201.3: daylights in a 65/210 face but plunges below φ = 30.
		{"line flatter than φ", planes.MustNew(50, 130), planes.MustNew(30, 250), NoMode, Friction},
		{"both planes", planes.MustNew(55, 170), planes.MustNew(55, 250), WedgeBoth, 0},
		// Line 205/45: sliding down A's dip (45° to 210) moves away from B
		// (derived: d̂A·n̂B = sin 85° cos 45° cos 80° − cos 85° sin 45° = 0.061 > 0).
		{"one plane", planes.MustNew(45, 210), planes.MustNew(85, 290), WedgeOnFirst, 0},
		{"the other plane", planes.MustNew(85, 290), planes.MustNew(45, 210), WedgeOnSecond, 0},
		// Line 227/48: B (75/300) overhangs the block, whose outcrop on the
		// face lies between the traces' upward rays; A carries it alone.
		{"one plane, the other overhanging", planes.MustNew(48, 218), planes.MustNew(75, 300), WedgeOnFirst, 0},
		{"into the slope", planes.MustNew(50, 20), planes.MustNew(50, 80), NoMode, Daylight},
		{"steeper than the face", planes.MustNew(80, 170), planes.MustNew(80, 250), NoMode, Daylight},
		{"parallel", planes.MustNew(50, 200), planes.MustNew(50, 200), NoMode, Parallel},
	} {
		l, _, k := WedgeSliding(c.a, c.b, face, phi, phi)
		if k.Mode != c.mode || k.Fails != c.fails || k.Feasible != (c.mode != NoMode) {
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
		p    planes.Orientation
		ok   bool
	}{
		{"feasible", planes.MustNew(80, 30), true},
		{"boundary (90−85)+30 = 35 ≤ 65 passes", planes.MustNew(85, 30), true},
		{"exactly (90−55)+30 = 65 passes", planes.MustNew(55, 30), true},
		{"too flat: (90−50)+30 = 70 > 65", planes.MustNew(50, 30), false},
		{"dips out of the face", planes.MustNew(80, 210), false},
		{"beyond the lateral limit", planes.MustNew(80, 60), false},
	} {
		if k := FlexuralToppling(c.p, face, phi, lat); k.Feasible != c.ok {
			t.Errorf("%s: %+v", c.name, k)
		}
	}
}

func TestPlanarBlock(t *testing.T) {
	const (
		tol       = 1e-12
		lengthTol = 1e-9 // m
		fsTol     = 1e-9 // the water depth to fail is found by bisection
	)
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
		if !scalar.EqualWithinAbsOrRel(b.Weight, w, tol, tol) || !scalar.EqualWithinAbsOrRel(b.Length, a, tol, tol) {
			t.Errorf("z = %v: W %v A %v, want %v %v", z, b.Weight, b.Length, w, a)
		}
		if !scalar.EqualWithinAbs(b.CrackDepth, z, lengthTol) {
			t.Errorf("z = %v: crack depth came out %v", z, b.CrackDepth)
		}
		// The factor of safety by resolving the force vectors on the block
		// (derived; a different route from the closed form in FS): x into the
		// slope, y up; weight (0, −W), water in the crack (−V, 0) towards the
		// face, uplift U along the base normal (−sin ψp, cos ψp); sliding
		// down the base along (−cos ψp, −sin ψp).
		c, phi, zw := 0.02, 32.0, 0.5*z
		U, V := 0.5*insitu.Hydrostatic*zw*a, 0.5*insitu.Hydrostatic*zw*zw
		sp, cp := math.Sincos(psiP * math.Pi / 180)
		down, normal := r3.Vec{X: -cp, Y: -sp}, r3.Vec{X: -sp, Y: cp}
		weight, push := r3.Vec{Y: -w}, r3.Vec{X: -V}
		drive := r3.Dot(r3.Add(weight, push), down)
		onBase := -r3.Dot(r3.Add(weight, push), normal) - U
		want := (c*a + onBase*math.Tan(phi*math.Pi/180)) / drive
		if got := b.FS(c, phi, zw); !scalar.EqualWithinAbsOrRel(got, want, tol, tol) {
			t.Errorf("z = %v: FS %v, want %v", z, got, want)
		}
	}
	// Dry and cohesionless: FS = tan φ / tan ψp whatever the geometry
	// (lecture notes, read).
	b, _ := NewPlanarBlock(h, psiF, 5, psiP, 6, false, gamma)
	if got := b.FS(0, 38, 0); !scalar.EqualWithinAbs(got, math.Tan(38*math.Pi/180)/math.Tan(psiP*math.Pi/180), tol) {
		t.Errorf("dry cohesionless FS %v", got)
	}
	// By distance: a crack 6 m behind the crest of a flat top is as deep as
	// the geometry says: z = H + b tan 0 − (H cot ψf + b) tan ψp.
	bd, _ := NewPlanarBlock(h, psiF, 0, psiP, 6, false, gamma)
	if want := h - (h*cot(psiF)+6)*math.Tan(psiP*math.Pi/180); !scalar.EqualWithinAbs(bd.CrackDepth, want, lengthTol) || !scalar.EqualWithinAbs(bd.Behind, 6, lengthTol) {
		t.Errorf("crack by distance: z %v b %v, want %v 6", bd.CrackDepth, bd.Behind, want)
	}
	// The water depth to fail brings FS to 1.
	bw, _ := NewPlanarBlock(h, psiF, 0, psiP, 10, true, gamma)
	if zw := bw.WaterDepthToFail(0.01, 38); math.IsNaN(zw) || !scalar.EqualWithinAbs(bw.FS(0.01, 38, zw), 1, fsTol) {
		t.Errorf("water depth to fail %v gives FS %v", zw, bw.FS(0.01, 38, zw))
	}
	// Critical crack depth (Hoek & Bray 1981, memory): z/H = 1 − √(cot ψf tan ψp),
	// checked by what it means, not by the formula typed again: it is the
	// depth of a dry crack that leaves the least factor of safety with
	// cohesion. Derived: dry, FS = c·A/(W sin ψp) + tan φ/tan ψp is least where
	// A/W ∝ (1 − u)/((1 − u²) cot ψp − cot ψf), u = z/H, is least, and its
	// derivative vanishes at (1 − u)² = cot ψf tan ψp. Found here by
	// golden-section search on the blocks' own FS, between no crack and the
	// crack that meets the plane at the crest, z = H(1 − cot ψf tan ψp), for
	// this face and a flatter one.
	const (
		crackTol  = 1e-5 // m: the search finds a flat minimum to about 2e-7 m here
		searchTol = 1e-9 // m: the bracket the search narrows to
	)
	for _, g := range []struct{ psiF, psiP float64 }{{psiF, psiP}, {50, 30}} {
		fsAt := func(z float64) float64 {
			b, err := NewPlanarBlock(h, g.psiF, 0, g.psiP, z, true, gamma)
			if err != nil {
				t.Fatalf("crack %v m: %v", z, err)
			}
			return b.FS(0.05, 30, 0)
		}
		atCrest := h * (1 - cot(g.psiF)*math.Tan(g.psiP*math.Pi/180))
		z, _ := geom.GoldenMax(func(z float64) float64 { return -fsAt(z) }, 0.01*h, 0.99*atCrest, searchTol)
		if zc := CriticalCrackDepth(h, g.psiF, g.psiP); !scalar.EqualWithinAbs(zc, z, crackTol) {
			t.Errorf("face %v°, plane %v°: critical crack depth %v m, least FS at %v m", g.psiF, g.psiP, zc, z)
		}
	}
	if _, err := NewPlanarBlock(h, psiF, 0, psiP, 25, true, gamma); err == nil {
		t.Error("a crack meeting the plane in front of the crest was accepted")
	}
}
