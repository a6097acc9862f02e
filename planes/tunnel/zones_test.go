package tunnel

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"
	"cleft/planes/slope"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestMirroredSearch(t *testing.T) {
	// Find searches half the rays of an even grid and mirrors the rest
	// through the axis. Its premise: the NED stress at (r, θ + 180°) is that
	// at (r, θ). Its result must be that of searching every ray.
	const (
		tolField = 1e-12 // relative to the far-field scale, ~40 MPa
		tolSpan  = 1e-7  // m: boundaries bisected to 1e-9·a
		tolAngle = 1e-2  // degrees, modulo 180
		tolArea  = 1e-9  // relative
	)
	rng := rand.New(rand.NewPCG(141, 142))
	zones := 0
	for i := range 30 {
		pore := Constant(rng.Float64() * 6)
		if i%2 == 1 {
			var err error
			if pore, err = Drained(rng.Float64()*6, 3, 30+rng.Float64()*200); err != nil {
				t.Fatal(err)
			}
		}
		st := station(t, randomField(rng), randomDrive(rng), 3, 0.25, rng.Float64(), 1, pore)
		for range 20 {
			th, r := rng.Float64()*180, 3*(1+rng.Float64()*4)
			y0, y1 := st.Opening.Ray(st.Up, st.Right, st.Along, th), st.Opening.Ray(st.Up, st.Right, st.Along, th+180)
			if !sameTensor(y0.TensorAt(r), y1.TensorAt(r), tolField*40) {
				t.Fatalf("θ %v r %v: %+v ≠ %+v at θ + 180°", th, r, y0.TensorAt(r), y1.TensorAt(r))
			}
		}
		o := randomPlane(rng)
		k := coulomb(t, 0.3+rng.Float64()*0.5, rng.Float64())
		g := Grid{Rays: 72}.resolved()
		half, full := make([]Span, 72), make([]Span, 72)
		zh, zf := find(&st, &o, k, g, half, true), find(&st, &o, k, g, full, false)
		if zh.Flags != zf.Flags || math.IsNaN(zh.Depth) != math.IsNaN(zf.Depth) {
			t.Fatalf("case %d: mirrored %+v, full %+v", i, zh, zf)
		}
		if !math.IsNaN(zf.Depth) {
			zones++
			if !scalar.EqualWithinAbs(zh.Depth, zf.Depth, tolSpan) || !scalar.EqualWithinRel(zh.Area, zf.Area, tolArea) ||
				math.Abs(math.Remainder(zh.Angle-zf.Angle, 180)) > tolAngle {
				t.Fatalf("case %d: mirrored %+v, full %+v", i, zh, zf)
			}
		}
		for j := range full {
			a, b := half[j], full[j]
			if a.Theta != b.Theta || math.IsNaN(a.Inner) != math.IsNaN(b.Inner) ||
				(!math.IsNaN(a.Inner) && (!scalar.EqualWithinAbs(a.Inner, b.Inner, tolSpan) || !scalar.EqualWithinAbs(a.Outer, b.Outer, tolSpan))) {
				t.Fatalf("case %d ray %v: mirrored %+v, full %+v", i, b.Theta, a, b)
			}
		}
	}
	if zones < 15 {
		t.Errorf("only %d of 30 cases have a zone", zones)
	}
}

// sameTensor compares two tensors component by component.
func sameTensor(a, b insitu.Tensor, tol float64) bool {
	return scalar.EqualWithinAbs(a.NN, b.NN, tol) && scalar.EqualWithinAbs(a.EE, b.EE, tol) && scalar.EqualWithinAbs(a.DD, b.DD, tol) &&
		scalar.EqualWithinAbs(a.NE, b.NE, tol) && scalar.EqualWithinAbs(a.ND, b.ND, tol) && scalar.EqualWithinAbs(a.ED, b.ED, tol)
}

// dryMeasured is a constant measured far field ned with dry rock.
func dryMeasured(t *testing.T, ned insitu.Tensor) insitu.Model {
	t.Helper()
	m, err := insitu.NewMeasuredModel(ned, 0, insitu.Constant, insitu.Water{Dry: true, Biot: 1})
	if err != nil {
		t.Fatal(err)
	}
	return m
}

func TestTraceAngle(t *testing.T) {
	const tol = 1e-9 // degrees
	rng := rand.New(rand.NewPCG(143, 144))
	t.Run("level drive", func(t *testing.T) {
		// The section of a level drive along T is the vertical plane across
		// it, Right horizontal towards T + 90: the trace falls to the right
		// by the apparent dip along T + 90 (slope.ApparentDip: tan α = tan δ
		// cos β, common practice), so its angle from Right towards Up is −α
		// (mod 180).
		for range 200 {
			drive := geom.Line{Trend: rng.Float64() * 360}
			up, right, along := opening.TunnelFrame(drive)
			o := randomPlane(rng)
			got, ok := TraceAngle(o, up, right, along)
			if !ok {
				t.Fatalf("%v across %v: no trace", o, drive)
			}
			want := math.Mod(-slope.ApparentDip(o, drive.Trend+90)+180, 180)
			if d := math.Abs(math.Remainder(got-want, 180)); d > tol {
				t.Fatalf("%v across %v: %v°, want %v°", o, drive, got, want)
			}
		}
	})
	t.Run("hand cases", func(t *testing.T) {
		// A drive north: Right is east. 40/090 contains the axis and dips
		// to the right: 140°; 40/270 rises to the right: 40°; a vertical
		// plane striking north: 90°; a horizontal plane: 0°.
		up, right, along := opening.TunnelFrame(geom.Line{})
		for _, c := range []struct {
			o    planes.Orientation
			want float64
		}{{planes.MustNew(40, 90), 140}, {planes.MustNew(40, 270), 40}, {planes.MustNew(90, 90), 90}, {planes.MustNew(0, 0), 0}} {
			if got, ok := TraceAngle(c.o, up, right, along); !ok || !scalar.EqualWithinAbs(got, c.want, tol) {
				t.Errorf("%v: %v° (%v), want %v°", c.o, got, ok, c.want)
			}
		}
		if _, ok := TraceAngle(planes.MustNew(90, 0), up, right, along); ok {
			t.Error("the plane of the section has a trace")
		}
	})
	t.Run("plunging drive", func(t *testing.T) {
		// Property: the trace lies in the plane and in the section.
		const tolDot = 1e-12
		for range 200 {
			up, right, along := opening.TunnelFrame(randomDrive(rng))
			o := randomPlane(rng)
			a, ok := TraceAngle(o, up, right, along)
			if !ok {
				continue
			}
			s, c := geom.SinCosDeg(a)
			d := r3.Add(r3.Scale(c, right), r3.Scale(s, up))
			if math.Abs(r3.Dot(d, o.Normal())) > tolDot || a < 0 || a >= 180 {
				t.Fatalf("%v: trace %v° has d·n = %v", o, a, r3.Dot(d, o.Normal()))
			}
		}
	})
}
