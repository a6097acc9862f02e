package insitu

import (
	"cleft/insitu/geom"

	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

const tol = 1e-12

func TestShearerExample(t *testing.T) {
	// Shearer, Introduction to Seismology, Example 2.1.1 (read): 2-D, x east,
	// y north, tension positive, σ = [[−40, −10], [−10, −60]] MPa; principal
	// stresses −35.86 and −64.14 MPa, the most compressive axis 67.5° from x.
	// Converted at the edge: compression positive, NED, so σEE = 40, σNN = 60,
	// σNE = 10. σDD = 20 keeps the vertical the least stress.
	const (
		readTol  = 0.005 // MPa: the book gives two decimals
		angleTol = 1e-9  // degrees
	)
	s, err := Components(60, 40, 20, 10, 0, 0)
	if err != nil {
		t.Fatal(err)
	}
	p := s.Principal()
	if !scalar.EqualWithinAbs(p.Values[0], 64.14, readTol) || !scalar.EqualWithinAbs(p.Values[1], 35.86, readTol) {
		t.Errorf("principal = %v, want 64.14, 35.86", p.Values)
	}
	// 67.5° anticlockwise from east is the azimuth 22.5° (east of north).
	if a := p.Axis(0); !scalar.EqualWithinAbs(a.Trend, 22.5, angleTol) && !scalar.EqualWithinAbs(a.Trend, 202.5, angleTol) {
		t.Errorf("σ1 trend = %v, want 22.5 (or 202.5)", a.Trend)
	}
	// Traction on n = (1/√2, 1/√2) (east, north): (50/√2, 70/√2) MPa
	// compression; normal stress 60, shear 10.
	n := r3.Vec{X: 1 / math.Sqrt2, Y: 1 / math.Sqrt2}
	tr := s.Apply(n)
	if !scalar.EqualWithinAbs(tr.X, 70/math.Sqrt2, tol) || !scalar.EqualWithinAbs(tr.Y, 50/math.Sqrt2, tol) {
		t.Errorf("traction = %v, want (70/√2, 50/√2) in (N, E)", tr)
	}
	sn := r3.Dot(tr, n)
	tau := r3.Norm(r3.Sub(tr, r3.Scale(sn, n)))
	if !scalar.EqualWithinAbs(sn, 60, tol) || !scalar.EqualWithinAbs(tau, 10, tol) {
		t.Errorf("σn, τ = %v, %v; want 60, 10", sn, tau)
	}
}

func randomTensor(rng *rand.Rand) Tensor {
	c := func() float64 { return rng.Float64()*100 - 20 }
	return Tensor{c(), c(), c(), c() / 2, c() / 2, c() / 2}
}

func TestPrincipalProperties(t *testing.T) {
	const (
		absTol      = 1e-10 // MPa, on components up to 80 MPa
		relTol      = 1e-12
		residualTol = 1e-9 // MPa: |σ·a − λ·a|
	)
	rng := rand.New(rand.NewPCG(1, 2))
	for i := range 2000 {
		s := randomTensor(rng)
		p := s.Principal()
		if !(p.Values[0] >= p.Values[1] && p.Values[1] >= p.Values[2]) {
			t.Fatalf("case %d: values not descending: %v", i, p.Values)
		}
		if !scalar.EqualWithinAbsOrRel(p.Values[0]+p.Values[1]+p.Values[2], s.Trace(), absTol, relTol) {
			t.Fatalf("case %d: trace not kept", i)
		}
		if d := r3.Dot(r3.Cross(p.Axes[0], p.Axes[1]), p.Axes[2]); !scalar.EqualWithinAbs(d, 1, absTol) {
			t.Fatalf("case %d: axes not a right-handed orthonormal triad: det %v", i, d)
		}
		back := p.Tensor()
		for j, pair := range [][2]float64{{back.NN, s.NN}, {back.EE, s.EE}, {back.DD, s.DD}, {back.NE, s.NE}, {back.ND, s.ND}, {back.ED, s.ED}} {
			if !scalar.EqualWithinAbs(pair[0], pair[1], absTol) {
				t.Fatalf("case %d: component %d: reconstructed %v, want %v", i, j, pair[0], pair[1])
			}
		}
		for k := range 3 {
			// σ·a = λ·a for each axis.
			if d := r3.Norm(r3.Sub(s.Apply(p.Axes[k]), r3.Scale(p.Values[k], p.Axes[k]))); d > residualTol {
				t.Fatalf("case %d: axis %d not an eigenvector (residual %g)", i, k, d)
			}
		}
	}
}

func TestRotateKeepsInvariants(t *testing.T) {
	const (
		traceTol = 1e-9 // MPa
		relTol   = 1e-12
		i2Tol    = 1e-8 // MPa², the second invariant of components up to 80 MPa
		i2RelTol = 1e-11
	)
	rng := rand.New(rand.NewPCG(3, 4))
	for range 500 {
		s := randomTensor(rng)
		q := randomTensor(rng).Principal().Axes // a random rotation
		r := s.Rotate(q)
		i2 := func(t Tensor) float64 {
			return t.NN*t.EE + t.EE*t.DD + t.DD*t.NN - t.NE*t.NE - t.ND*t.ND - t.ED*t.ED
		}
		if !scalar.EqualWithinAbsOrRel(r.Trace(), s.Trace(), traceTol, relTol) || !scalar.EqualWithinAbsOrRel(i2(r), i2(s), i2Tol, i2RelTol) {
			t.Fatalf("invariants changed: trace %v→%v, I2 %v→%v", s.Trace(), r.Trace(), i2(s), i2(r))
		}
	}
}

func TestComponentsRejectsNonFinite(t *testing.T) {
	for _, v := range []float64{math.NaN(), math.Inf(1), math.Inf(-1)} {
		if _, err := Components(1, 2, 3, v, 0, 0); err == nil {
			t.Errorf("Components with %v: no error", v)
		}
	}
}

func TestAndersonianAxes(t *testing.T) {
	const (
		plungeTol = 1e-9 // degrees
		axisTol   = 1e-7 // degrees
	)
	for _, az := range []float64{0, 30, 90, 135, 359.5} {
		s := Andersonian(60, 40, 45, az)
		p := s.Principal()
		if a := p.Axis(0); a.Plunge > plungeTol || geom.AxialAngle(a.Vec(), geom.Line{Trend: az, Plunge: 0}.Vec()) > axisTol {
			t.Errorf("az %v: σ1 axis %v, want horizontal along %v", az, a, az)
		}
		if a := p.Axis(1); !scalar.EqualWithinAbs(a.Plunge, 90, axisTol) {
			t.Errorf("az %v: σ2 axis %v, want vertical", az, a)
		}
	}
}
