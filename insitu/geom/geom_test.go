package geom

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestAzimuth(t *testing.T) {
	for _, c := range []struct{ in, want float64 }{{0, 0}, {360, 0}, {-90, 270}, {725, 5}, {-1e-17, 0}} {
		if got := Azimuth(c.in); got != c.want {
			t.Errorf("Azimuth(%v) = %v, want %v", c.in, got, c.want)
		}
	}
}

func TestLineOfIsAnAxis(t *testing.T) {
	const tol = 1e-9
	rng := rand.New(rand.NewPCG(1, 2))
	for range 200 {
		v := r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}
		a, b := LineOf(v), LineOf(r3.Scale(-1, v))
		if a != b {
			t.Fatalf("LineOf(v) %v and LineOf(−v) %v differ", a, b)
		}
		if a.Plunge < 0 || a.Plunge > 90 || a.Trend < 0 || a.Trend >= 360 {
			t.Fatalf("line %v out of range", a)
		}
		if AxialAngle(a.Vec(), v) > tol {
			t.Fatalf("line %v is %g° from %v", a, AxialAngle(a.Vec(), v), v)
		}
	}
	if l := LineOf(r3.Vec{}); !math.IsNaN(l.Trend) || !math.IsNaN(l.Plunge) {
		t.Errorf("LineOf(0) = %v, want NaNs", l)
	}
}

func TestSinCosDegExactAtRightAngles(t *testing.T) {
	for _, c := range []struct{ a, s, c float64 }{{0, 0, 1}, {90, 1, 0}, {180, 0, -1}, {270, -1, 0}, {-90, -1, 0}, {450, 1, 0}} {
		if s, co := SinCosDeg(c.a); s != c.s || co != c.c {
			t.Errorf("SinCosDeg(%v) = %v, %v", c.a, s, co)
		}
	}
}

func TestEigenDescending(t *testing.T) {
	const (
		tol      = 1e-12 // the triple product of unit vectors
		valueTol = 1e-9  // eigenvalues of about 10–30
		axisTol  = 1e-6  // degrees between axes
	)
	// A tensor built from known values and a known rotation must give them
	// back, largest first, as a right-handed triad (derived).
	rng := rand.New(rand.NewPCG(3, 4))
	for range 100 {
		vals := [3]float64{rng.Float64()*10 + 20, rng.Float64()*10 + 10, rng.Float64() * 10}
		u := r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
		w := r3.Unit(r3.Cross(u, r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}))
		axes := [3]r3.Vec{u, w, r3.Cross(u, w)}
		var s Sym3
		for i, a := range axes {
			s.XX += vals[i] * a.X * a.X
			s.YY += vals[i] * a.Y * a.Y
			s.ZZ += vals[i] * a.Z * a.Z
			s.XY += vals[i] * a.X * a.Y
			s.XZ += vals[i] * a.X * a.Z
			s.YZ += vals[i] * a.Y * a.Z
		}
		v, e, ok := EigenDescending(s)
		if !ok {
			t.Fatal("decomposition failed")
		}
		for i := range 3 {
			if !scalar.EqualWithinAbs(v[i], vals[i], valueTol) || AxialAngle(e[i], axes[i]) > axisTol {
				t.Fatalf("value %d: %v along %v, want %v along %v", i, v[i], e[i], vals[i], axes[i])
			}
		}
		if d := r3.Dot(r3.Cross(e[0], e[1]), e[2]); !scalar.EqualWithinAbs(d, 1, tol) {
			t.Fatalf("triad not right-handed: %v", d)
		}
	}
	if _, _, ok := EigenDescending(Sym3{XX: math.NaN()}); ok {
		t.Error("NaN input decomposed")
	}
}

func TestGoldenMax(t *testing.T) {
	const tol = 1e-9
	// A parabola's vertex and a sine's crest, known in closed form (common
	// practice): −(x − 1.3)² on [0, 3] peaks at 1.3; sin x on [0, 3] at π/2.
	if x, fx := GoldenMax(func(x float64) float64 { return -(x - 1.3) * (x - 1.3) }, 0, 3, tol); !scalar.EqualWithinAbs(x, 1.3, 10*tol) || fx > 0 {
		t.Errorf("parabola: %v, %v", x, fx)
	}
	// At a smooth crest f changes by only ½f″·dx², so the place is found to
	// about √ε ≈ 1.5e-8, whatever tol asks (common practice).
	const place = 1e-7
	if x, fx := GoldenMax(math.Sin, 0, 3, tol); !scalar.EqualWithinAbs(x, math.Pi/2, place) || !scalar.EqualWithinAbs(fx, 1, tol) {
		t.Errorf("sine: %v, %v", x, fx)
	}
}
