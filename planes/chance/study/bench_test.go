package study

import (
	"fmt"
	"math/rand/v2"
	"strings"
	"testing"

	"cleft/planes/assess"
	"cleft/planes/site"
)

// benchSite is the example uncertainty on a site of n planes of
// seeded random orientation and depth (50–500 m), F1 among them.
func benchSite(tb testing.TB, n, realisations int, fisher bool) *assess.Assessment {
	var b strings.Builder
	b.WriteString(`site: benchmark (generated)
stress:
  vertical: {density: 2650}
  shmax: {ratio: 1.35, azimuth: 128}
  shmin: {ratio: 0.72}
water: {table: 18}
strength: {friction: 0.6}
planes:
`)
	rng := rand.New(rand.NewPCG(1, 2))
	for i := range n {
		name := fmt.Sprintf("P%d", i)
		if i == 0 {
			name = "F1"
		}
		fmt.Fprintf(&b, "  - {name: %s, dip: %.1f, dip_direction: %.1f, depth: %.1f}\n", name, 90*rng.Float64(), 360*rng.Float64(), 50+450*rng.Float64())
	}
	fmt.Fprintf(&b, `uncertainty:
  realisations: %d
  seed: 7
  vary:
    stress.shmax.ratio:   {normal: [1.35, 0.15]}
    stress.shmax.azimuth: {uniform: [110, 146]}
    stress.shmin.ratio:   {triangular: [0.6, 0.72, 0.85]}
    stress.vertical.density: {normal: [2650, 50], min: 2400, max: 2900}
    water.table:          {uniform: [5, 30]}
    strength.friction:    {lognormal: [0.6, 0.1]}
    planes.F1.friction:   {uniform: [0.35, 0.5]}
  correlations: [[stress.shmax.ratio, stress.shmin.ratio, 0.7]]
`, realisations)
	if fisher {
		b.WriteString("  orientation: {fisher_k: 200}\n")
	}
	s, err := site.Parse([]byte(b.String()), "bench.yaml")
	if err != nil {
		tb.Fatal(err)
	}
	a, err := assess.New(s)
	if err != nil {
		tb.Fatal(err)
	}
	return a
}

func BenchmarkRun(b *testing.B) {
	for _, c := range []struct {
		name   string
		fisher bool
	}{{"20000x1000", false}, {"20000x1000/fisher", true}} {
		b.Run(c.name, func(b *testing.B) {
			a := benchSite(b, 1000, 20000, c.fisher)
			ts, err := Targets(a)
			if err != nil {
				b.Fatal(err)
			}
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Run(a, ts, Options{}); err != nil {
					b.Fatal(err)
				}
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/2e7, "ns/resolution")
		})
	}
}

func BenchmarkStats20000(b *testing.B) {
	rng := rand.New(rand.NewPCG(3, 3))
	const n = 20000
	v := make([]float64, n)
	for i := range v {
		v[i] = 1 + 0.3*rng.NormFloat64()
	}
	keys, tmp := make([]uint64, n), make([]uint64, n)
	idx, tmpIdx := make([]int32, n), make([]int32, n)
	counts := make([]int32, selectBins)
	b.Run("select", func(b *testing.B) {
		for b.Loop() {
			selectPercentiles(v, keys, counts, tmp)
		}
	})
	b.Run("radix-with-index", func(b *testing.B) {
		for b.Loop() {
			for i, x := range v {
				keys[i], idx[i] = orderBits(x), int32(i)
			}
			radixSort(keys, tmp, idx, tmpIdx)
		}
	})
}
