package plots

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

const tol = 1e-12

func TestProjectionRadii(t *testing.T) {
	// Fisher, Lewis & Embleton (1987) §3 (read); Snyder (1987), USGS PP 1395:
	// equal-area r = √2·R·sin(θ/2), equal-angle r = R·tan(θ/2), θ = 90° − plunge.
	// Derived r/R at plunge 30°, 45°, 60°: equal-area 0.707107, 0.541196,
	// 0.366025; equal-angle 0.577350, 0.414214, 0.267949.
	const (
		sixDecimals = 5e-7 // r/R given to six decimals
		angleTol    = 1e-9 // degrees
	)
	cases := []struct {
		plunge, area, angle float64
	}{
		{90, 0, 0},
		{60, 0.366025, 0.267949},
		{45, 0.541196, 0.414214},
		{30, 0.707107, 0.577350},
		{0, 1, 1},
	}
	for _, c := range cases {
		for _, trend := range []float64{0, 73, 180, 300} {
			l := geom.Line{Trend: trend, Plunge: c.plunge}
			for _, pc := range []struct {
				p    Projection
				want float64
			}{{EqualArea, c.area}, {EqualAngle, c.angle}} {
				pt := pc.p.Project(l)
				if r := math.Hypot(pt.X, pt.Y); !scalar.EqualWithinAbs(r, pc.want, sixDecimals) {
					t.Errorf("%v plunge %v: r = %v, want %v", pc.p, c.plunge, r, pc.want)
				}
				if c.plunge < 90 {
					// x east, y north: the point lies at the trend, clockwise from north.
					if az := geom.Azimuth(math.Atan2(pt.X, pt.Y) * 180 / math.Pi); math.Abs(math.Remainder(az-trend, 360)) > angleTol {
						t.Errorf("%v trend %v: plotted at azimuth %v", pc.p, trend, az)
					}
				}
			}
		}
	}
}

func TestProjectionRoundTrip(t *testing.T) {
	const angleTol = 1e-10 // degrees
	rng := rand.New(rand.NewPCG(31, 32))
	for _, p := range []Projection{EqualArea, EqualAngle} {
		for range 5000 {
			l := geom.Line{Trend: rng.Float64() * 360, Plunge: 0.01 + rng.Float64()*89.98}
			back, ok := p.Inverse(p.Project(l))
			if !ok || geom.Angle(back.Vec(), l.Vec()) > angleTol {
				t.Fatalf("%v: %v → %v", p, l, back)
			}
		}
		if _, ok := p.Inverse(Point{X: 0.8, Y: 0.7}); ok {
			t.Errorf("%v: a point outside the primitive inverted", p)
		}
	}
}

func TestGreatCircle(t *testing.T) {
	// The trace of a plane passes through its projected line of steepest dip
	// and meets the primitive at its strike (common practice).
	for _, p := range []Projection{EqualArea, EqualAngle} {
		for _, o := range []planes.Orientation{planes.MustNew(65, 120), planes.MustNew(0, 30), planes.MustNew(90, 200), planes.MustNew(30, 0)} {
			pts := p.GreatCircle(o, 180)
			first, last := pts[0], pts[len(pts)-1]
			s := p.Project(geom.Line{Trend: o.Strike(), Plunge: 0})
			if !near(first, s, tol) || !near(last, Point{-s.X, -s.Y}, tol) {
				t.Errorf("%v %v: ends %v, %v; want ±%v", p, o, first, last, s)
			}
			if d := p.Project(o.DipLine()); !near(pts[90], d, tol) {
				t.Errorf("%v %v: middle %v, want the dip line at %v", p, o, pts[90], d)
			}
			for _, q := range pts {
				if math.Hypot(q.X, q.Y) > 1+tol {
					t.Errorf("%v %v: point %v outside the primitive", p, o, q)
				}
			}
		}
	}
}

func TestSmallCircle(t *testing.T) {
	for _, c := range []struct {
		axis  geom.Line
		alpha float64
		paths int
	}{
		{geom.Line{Trend: 40, Plunge: 60}, 10, 1},
		{geom.Line{Trend: 40, Plunge: 3}, 10, 2}, // crosses the primitive
		{geom.Line{Trend: 0, Plunge: 90}, 25, 1},
	} {
		for _, p := range []Projection{EqualArea, EqualAngle} {
			paths := p.SmallCircle(c.axis, c.alpha, 360)
			if len(paths) != c.paths {
				t.Errorf("%v %v: %d paths, want %d", p, c.axis, len(paths), c.paths)
			}
			for _, path := range paths {
				for _, q := range path {
					l, ok := p.Inverse(q)
					if !ok {
						t.Fatalf("point %v outside", q)
					}
					// Every sampled point is α from the axis (axially); the
					// two points added on the primitive are within a sample step.
					const stepTol = 1.1 // degrees: a little over the 1° step of 360 samples
					if a := geom.AxialAngle(l.Vec(), c.axis.Vec()); math.Abs(a-c.alpha) > stepTol {
						t.Errorf("%v %v: point at %v° from the axis, want %v", p, c.axis, a, c.alpha)
					}
				}
			}
		}
	}
}

func near(a, b Point, eps float64) bool { return math.Hypot(a.X-b.X, a.Y-b.Y) <= eps }
