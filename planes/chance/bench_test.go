package chance

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
	"gonum.org/v1/gonum/spatial/r3"
)

// benchInputs are eight inputs of a typical site: three stress terms,
// a density, the water table, friction and two per-plane terms.
func benchInputs(b *testing.B) []Dist {
	return []Dist{
		must(NewNormal(1.3, 0.1)),
		must(NewNormal(0.8, 0.05)),
		must(NewUniform(50, 80)),
		mustTrunc(b, must(NewNormal(2650, 50)), 2400, 2900),
		mustTrunc(b, must(NewLogNormal(12, 0.4)), 0, 40),
		must(NewUniform(0.5, 0.8)),
		mustTrunc(b, must(NewTriangular(0, 0.1, 0.5)), 0, math.Inf(1)),
		must(NewTriangular(0, 0.2, 1)),
	}
}

func BenchmarkDraw(b *testing.B) {
	dists := benchInputs(b)
	for _, c := range []struct {
		name  string
		pairs []Pair
	}{
		{"20000x8/uncorrelated", nil},
		{"20000x8/one-pair", []Pair{{0, 1, 0.6}}},
		{"20000x8/all-paired", []Pair{{0, 1, 0.6}, {2, 3, -0.3}, {4, 5, 0.4}, {6, 7, 0.2}}},
	} {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Draw(dists, c.pairs, 20000, 1); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkFisherDraw(b *testing.B) {
	f := NewFisher(r3.Vec{X: 0.3, Y: -0.2, Z: 0.9}, 40)
	r := Stream(1, 0)
	var sink r3.Vec
	b.ReportAllocs()
	for b.Loop() {
		sink = r3.Add(sink, f.Draw(r))
	}
	_ = sink
}

func BenchmarkStreamReseed(b *testing.B) {
	// One worker's cost per realisation of rekeying its generator.
	var sink uint64
	g := newReseeder()
	b.ReportAllocs()
	i := 0
	for b.Loop() {
		g.Seed(StreamKey(1, i))
		sink += g.Uint64()
		i++
	}
	_ = sink
}

func BenchmarkSpearman20000(b *testing.B) {
	x, err := Draw([]Dist{must(NewNormal(0, 1)), must(NewNormal(0, 1))}, []Pair{{0, 1, 0.5}}, 20000, 3)
	if err != nil {
		b.Fatal(err)
	}
	u, v := mat.Col(nil, 0, x), mat.Col(nil, 1, x)
	b.ReportAllocs()
	for b.Loop() {
		Spearman(u, v)
	}
}

func BenchmarkPercentiles20000(b *testing.B) {
	x, _ := Draw([]Dist{must(NewNormal(0, 1))}, nil, 20000, 4)
	col := mat.Col(nil, 0, x)
	ps := []float64{0.05, 0.5, 0.95}
	dst := make([]float64, len(ps))
	b.ReportAllocs()
	for b.Loop() {
		Percentiles(dst, col, ps)
	}
}
