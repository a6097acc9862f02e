package plots

import (
	"math"
	"testing"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

func demoState() insitu.State {
	return insitu.NewState(insitu.Andersonian(7.0, 3.7, 5.2, 128), 200, 1.8, 1)
}

func TestFieldEqualsResolve(t *testing.T) {
	// Every node holds planes.Resolve for the plane whose pole projects there.
	const tol = 1e-12
	s := demoState()
	c := &planes.Coulomb{Mu: 0.6}
	for _, p := range []Projection{EqualArea, EqualAngle} {
		for _, m := range []Measure{SlipTendency, DilationTendency, FactorOfSafety, PressureToSlip, NormalisedSlip} {
			f := NewField(s, c, m, p, 41)
			for j := 0; j < f.N; j += 5 {
				for i := 0; i < f.N; i += 3 {
					if !f.Inside(i, j) {
						continue
					}
					l, ok := p.Inverse(f.Node(i, j))
					if !ok {
						t.Fatal("inside node does not invert")
					}
					o, err := planes.FromPole(l.Trend, l.Plunge)
					if err != nil {
						t.Fatal(err)
					}
					r := planes.Resolve(s, o, c)
					want := m.Value(&r)
					got := f.Values[j*f.N+i]
					if !(math.IsNaN(want) && math.IsNaN(got)) && !scalar.EqualWithinAbsOrRel(got, want, tol, tol) {
						t.Fatalf("%v %v node (%d, %d): %v, want %v", p, m, i, j, got, want)
					}
				}
			}
		}
	}
}

func TestFieldRange(t *testing.T) {
	// Slip tendency over all orientations peaks at Ts,max (Morris et al. 1996):
	// (σ1'−σ3')/(2√(σ1'σ3')) for this state.
	const tol = 1e-12
	s := demoState()
	f := NewField(s, &planes.Coulomb{Mu: 0.6}, SlipTendency, EqualArea, 301)
	e := s.EffectivePrincipal()
	tsmax := (e[0] - e[2]) / (2 * math.Sqrt(e[0]*e[2]))
	if f.Max > tsmax+tol || f.Max < 0.99*tsmax || f.Min < 0 {
		t.Errorf("field range [%v, %v], want up to Ts,max = %v", f.Min, f.Max, tsmax)
	}
}

func TestContourOfRadialField(t *testing.T) {
	const gridTol = 0.01 // radius: contours interpolate r² linearly across a grid cell
	f := &Field{N: 81}
	vals := make([]float64, f.N*f.N)
	for j := range f.N {
		for i := range f.N {
			p := f.Node(i, j)
			vals[j*f.N+i] = p.X*p.X + p.Y*p.Y
		}
	}
	for _, level := range []float64{0.25, 0.81, 1.44} {
		segs := f.Contour(vals, level)
		r := math.Sqrt(level)
		if level > 1 {
			if len(segs) != 0 {
				t.Errorf("level %v outside the primitive gave %d segments", level, len(segs))
			}
			continue
		}
		if len(segs) < 20 {
			t.Errorf("level %v: only %d segments", level, len(segs))
		}
		for _, s := range segs {
			for _, q := range []Point{s.A, s.B} {
				if d := math.Hypot(q.X, q.Y); math.Abs(d-r) > gridTol {
					t.Fatalf("level %v: point at radius %v, want %v", level, d, r)
				}
			}
		}
	}
}

func TestClipToPrimitive(t *testing.T) {
	segs := appendClipped(nil, Point{-2, 0}, Point{2, 0})
	if len(segs) != 1 || !near(segs[0].A, Point{-1, 0}, tol) || !near(segs[0].B, Point{1, 0}, tol) {
		t.Errorf("clipped %v", segs)
	}
	if segs := appendClipped(nil, Point{1.5, 1.5}, Point{2, 0}); len(segs) != 0 {
		t.Errorf("outside segment kept: %v", segs)
	}
}

// BenchmarkField400 is the tendency field of the size: 400 × 400.
func BenchmarkField400(b *testing.B) {
	s := demoState()
	c := &planes.Coulomb{Mu: 0.6}
	for b.Loop() {
		NewField(s, c, SlipTendency, EqualArea, 400)
	}
}
