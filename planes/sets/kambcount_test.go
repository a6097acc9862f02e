package sets

import (
	"math"
	"math/rand/v2"
	"strconv"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"
)

// TestKambCounterSameAsKamb checks the grid counting against the plain
// definition, Kamb.Density, which tests every reading: the two must agree to
// the last bit, with and without weights, for scatters, tight clusters,
// readings on the primitive and on the axes of the grid, and readings that
// are not of unit length.
func TestKambCounterSameAsKamb(t *testing.T) {
	rng := rand.New(rand.NewPCG(71, 72))
	uniform := func(n int) []r3.Vec {
		out := make([]r3.Vec, n)
		for i := range out {
			out[i] = r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
		}
		return out
	}
	clustered := func(n int) []r3.Vec {
		var out []r3.Vec
		for _, m := range []r3.Vec{{X: 1, Y: 1, Z: 1}, {X: 1, Z: 0.02}, {Z: 1}} {
			for _, v := range fisherSample(rng, m, 300, n/3) {
				out = append(out, r3.Unit(v))
			}
		}
		return out
	}
	special := func(int) []r3.Vec {
		var out []r3.Vec
		for _, v := range []r3.Vec{{X: 1}, {Y: 1}, {Z: 1}, {X: -1}, {Y: -1}, {Z: -1}} {
			out = append(out, v, v) // on the axes of the grid, twice
		}
		for k := range 360 { // on the primitive, both ends
			s, c := math.Sincos(float64(k) * math.Pi / 180)
			out = append(out, r3.Vec{X: c, Y: s}, r3.Vec{X: -c, Y: -s, Z: 1e-17})
		}
		return out
	}
	odd := func(n int) []r3.Vec {
		out := uniform(n)
		out[0] = r3.Scale(2, out[0])
		out[1] = r3.Scale(0.5, out[1])
		out[2] = r3.Vec{}
		out[3] = r3.Vec{X: math.NaN(), Y: 0, Z: 1}
		return out
	}
	// Readings on the rim of the cone about 200 axes (the cone of 4000
	// readings, θ = 3.87°), and the axes themselves are tried below.
	var rimAxes []r3.Vec
	rim := func(n int) []r3.Vec {
		k := NewKamb(float64(n))
		th := k.Theta * math.Pi / 180
		var out []r3.Vec
		for len(out) < n {
			a := uniform(1)[0]
			rimAxes = append(rimAxes, a)
			u := r3.Unit(r3.Cross(a, r3.Vec{X: 0.3, Y: -0.5, Z: 0.8}))
			v := r3.Cross(a, u)
			for j := range 20 {
				s, c := math.Sincos(2 * math.Pi * float64(j) / 20)
				st, ct := math.Sincos(th * (1 + 1e-9*float64(j%3-1)))
				out = append(out, r3.Unit(r3.Add(r3.Scale(ct, a), r3.Add(r3.Scale(st*c, u), r3.Scale(st*s, v)))))
			}
		}
		return out
	}
	for _, c := range []struct {
		name  string
		make  func(int) []r3.Vec
		sizes []int
	}{
		{"uniform", uniform, []int{1, 2, 9, 133, 5000}},
		{"clusters", clustered, []int{300, 30000}},
		{"primitive and grid axes", special, []int{0}},
		{"not unit", odd, []int{10, 2000}},
		{"rim", rim, []int{4000}},
	} {
		for _, n := range c.sizes {
			normals := c.make(n)
			weights := make([]float64, len(normals))
			for i := range weights {
				weights[i] = 0.1 + 9.9*rng.Float64()
			}
			k := NewKamb(float64(len(normals)))
			axes := uniform(300)
			axes = append(axes, normals[:min(300, len(normals))]...) // at the readings themselves
			axes = append(axes, r3.Vec{X: 1}, r3.Vec{Z: -1}, r3.Vec{X: 1, Y: 1}, r3.Vec{})
			axes = append(axes, rimAxes...)
			for _, w := range [][]float64{nil, weights} {
				name := c.name + " " + strconv.Itoa(len(normals))
				if w != nil {
					name += " weighted"
				}
				t.Run(name, func(t *testing.T) {
					kc := NewKambCounter(k, normals, w)
					var scratch []int32
					bad := 0
					for _, a := range axes {
						var got float64
						got, scratch = kc.Density(a, scratch)
						if want := k.Density(a, normals, w); math.Float64bits(got) != math.Float64bits(want) && !(math.IsNaN(got) && math.IsNaN(want)) {
							if bad++; bad < 5 {
								t.Errorf("n %d axis %v: %v, want %v", len(normals), a, got, want)
							}
						}
					}
				})
			}
		}
	}
}

func TestKambCounterAllocationFree(t *testing.T) {
	rng := rand.New(rand.NewPCG(73, 74))
	normals := fisherSample(rng, r3.Vec{X: 1, Z: 1}, 50, 20000)
	weights := make([]float64, len(normals))
	for i := range weights {
		weights[i] = 1 + rng.Float64()
	}
	kc := NewKambCounter(NewKamb(float64(len(normals))), normals, weights)
	axis := r3.Unit(r3.Vec{X: 1, Z: 1})
	_, scratch := kc.Density(axis, nil)
	if n := testing.AllocsPerRun(100, func() { _, scratch = kc.Density(axis, scratch) }); n != 0 {
		t.Errorf("%v allocations per count", n)
	}
}

func BenchmarkKambCounter(b *testing.B) {
	rng := rand.New(rand.NewPCG(75, 76))
	for _, n := range []int{10000, 1000000} {
		normals := fisherSample(rng, r3.Vec{X: 1, Z: 1}, 30, n)
		for i := range normals {
			normals[i] = r3.Unit(normals[i])
		}
		k := NewKamb(float64(n))
		b.Run("prepare/"+strconv.Itoa(n), func(b *testing.B) {
			for b.Loop() {
				NewKambCounter(k, normals, nil)
			}
		})
		kc := NewKambCounter(k, normals, nil)
		axes := make([]r3.Vec, 1024)
		for i := range axes {
			axes[i] = r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
		}
		b.Run("count/"+strconv.Itoa(n), func(b *testing.B) {
			i := 0
			for b.Loop() {
				kc.Density(axes[i%len(axes)], nil)
				i++
			}
		})
	}
}
