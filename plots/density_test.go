package plots

import (
	"math"
	"math/rand/v2"
	"strconv"
	"testing"

	"cleft/planes/sets"

	"gonum.org/v1/gonum/spatial/r3"
)

// densityPoles draws n poles: two tight clusters, one of steep planes
// whose poles straddle the primitive, and a uniform scatter; seeded.
func densityPoles(n int, seed uint64) ([]r3.Vec, []float64) {
	rng := rand.New(rand.NewPCG(seed, 81))
	poles := make([]r3.Vec, n)
	weights := make([]float64, n)
	for i := range poles {
		v := r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}
		switch i % 4 {
		case 0:
			v = r3.Add(r3.Vec{X: 4, Y: 3, Z: 6}, v)
		case 1:
			v = r3.Add(r3.Vec{X: 9, Y: -2}, v)
		case 2:
			v = r3.Add(r3.Vec{Y: 1, Z: 12}, v)
		}
		if v = r3.Unit(v); v.Z < 0 {
			v = r3.Scale(-1, v)
		}
		poles[i], weights[i] = v, 1+9*rng.Float64()
	}
	return poles, weights
}

// TestDensityFieldIsKamb checks every node of the density field against
// sets.Kamb.Density, the plain count over every pole, at the node's axis
// (the inverse projection of the node, clamped to the primitive outside
// it): equal to the last bit, weighted and not, on both nets.
func TestDensityFieldIsKamb(t *testing.T) {
	poles, weights := densityPoles(3000, 82)
	for _, p := range []Projection{EqualArea, EqualAngle} {
		for _, w := range [][]float64{nil, weights} {
			t.Run(p.Name()+" weighted "+strconv.FormatBool(w != nil), func(t *testing.T) {
				f, k := NewDensityField(p, poles, w, 61)
				scaled := w
				if w != nil { // as NewDensityField scales them: to sum to N
					sw := 0.0
					for _, x := range w {
						sw += x
					}
					scaled = make([]float64, len(w))
					for i, x := range w {
						scaled[i] = x * float64(len(w)) / sw
					}
				}
				bad := 0
				for j := range f.N {
					for i := range f.N {
						pt := f.Node(i, j)
						if r := math.Hypot(pt.X, pt.Y); r > 1 {
							pt.X, pt.Y = pt.X/r, pt.Y/r
						}
						l, _ := p.Inverse(pt)
						want := k.Density(l.Vec(), poles, scaled)
						if got := f.Values[j*f.N+i]; math.Float64bits(got) != math.Float64bits(want) {
							if bad++; bad < 5 {
								t.Errorf("node %d, %d: %v, want %v", i, j, got, want)
							}
						}
					}
				}
				if f.Max < 6 {
					t.Errorf("densest node %vσ: the clusters should stand out", f.Max)
				}
			})
		}
	}
}

func BenchmarkDensityField(b *testing.B) {
	for _, n := range []int{10000, 1000000} {
		poles, weights := densityPoles(n, 83)
		b.Run(strconv.Itoa(n), func(b *testing.B) {
			for b.Loop() {
				NewDensityField(EqualArea, poles, weights, 400)
			}
		})
	}
	b.Run("brute/10000", func(b *testing.B) { // the plain count, for comparison
		poles, weights := densityPoles(10000, 83)
		k := sets.NewKamb(float64(len(poles)))
		f := &Field{N: 400}
		for b.Loop() {
			for j := range f.N {
				for i := range f.N {
					l, _ := EqualArea.Inverse(f.Node(i, j))
					k.Density(l.Vec(), poles, weights)
				}
			}
		}
	})
}

// TestSmoothFieldIsTheSum checks every node of the smoothed density field
// against sets.Smoothing.Density, the plain sum over every pole, at the
// node's axis (only weights below 1e-12 are left out by the cells).
func TestSmoothFieldIsTheSum(t *testing.T) {
	poles, weights := densityPoles(3000, 83)
	f, s := NewSmoothField(EqualArea, poles, weights, 61)
	sw := 0.0
	for _, x := range weights {
		sw += x
	}
	scaled := make([]float64, len(weights))
	for i, x := range weights {
		scaled[i] = x * float64(len(weights)) / sw
	}
	const cut = 1e-6 // sets.smoothCut: the weight below which a reading is left out
	tol := cut * float64(len(poles)) / s.Sigma
	for j := range f.N {
		for i := range f.N {
			pt := f.Node(i, j)
			if r := math.Hypot(pt.X, pt.Y); r > 1 {
				pt.X, pt.Y = pt.X/r, pt.Y/r
			}
			l, _ := EqualArea.Inverse(pt)
			if got, want := f.Values[j*f.N+i], s.Density(l.Vec(), poles, scaled); math.Abs(got-want) > tol {
				t.Fatalf("node %d, %d: %v, want %v", i, j, got, want)
			}
		}
	}
}
