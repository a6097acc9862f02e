package sets

import (
	"math/rand/v2"
	"strconv"
	"testing"

	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// benchReadings are n seeded readings: three Fisher sets and 10 % scatter.
func benchReadings(n int) []planes.Orientation {
	rng := rand.New(rand.NewPCG(91, uint64(n)))
	means := []r3.Vec{planes.MustNew(75, 140).Normal(), planes.MustNew(20, 250).Normal(), planes.MustNew(88, 10).Normal()}
	out := make([]planes.Orientation, n)
	for i := range out {
		v := r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}
		if k := i % 10; k < 9 {
			v = fisherSample(rng, means[k%3], 40, 1)[0]
		}
		out[i] = planes.FromNormal(r3.Unit(v))
	}
	return out
}

// BenchmarkGroup is the grouping of cleft sets with the number of sets
// chosen automatically.
func BenchmarkGroup(b *testing.B) {
	for _, n := range []int{10000, 100000} {
		rs := benchReadings(n)
		b.Run(strconv.Itoa(n), func(b *testing.B) {
			for b.Loop() {
				Group(rs, nil, DefaultConfig)
			}
		})
	}
}
