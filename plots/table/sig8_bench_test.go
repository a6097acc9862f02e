package table

import (
	"math"
	"math/rand/v2"
	"strconv"
	"testing"
)

// sig8BenchValues are the values the benchmarks format: "table" are the
// magnitudes of a results table (stresses 0.1–100 MPa with 4 to 17 digits,
// angles, tendencies 0–1, depths), "bits" are random bit patterns (finite),
// mostly with large exponents.
func sig8BenchValues(kind string) []float64 {
	rng := rand.New(rand.NewPCG(3, 4))
	vs := make([]float64, 4096)
	for i := range vs {
		switch kind {
		case "table":
			vs[i] = math.Pow(10, 4*rng.Float64()-1.5)
			if i%3 == 0 { // a few digits only, as a tendency or an angle
				vs[i] = math.Round(vs[i]*1000) / 1000
			}
		case "bits":
			for {
				vs[i] = math.Float64frombits(rng.Uint64())
				if !math.IsNaN(vs[i]) && !math.IsInf(vs[i], 0) {
					break
				}
			}
		}
	}
	return vs
}

// BenchmarkAppendSig8 formats one value per operation with AppendSig8 and,
// for comparison, with strconv.AppendFloat(b, v, 'g', 8, 64).
func BenchmarkAppendSig8(b *testing.B) {
	for _, kind := range []string{"table", "bits"} {
		vs := sig8BenchValues(kind)
		buf := make([]byte, 0, 32)
		b.Run("sig8/"+kind, func(b *testing.B) {
			i := 0
			for b.Loop() {
				buf = AppendSig8(buf[:0], vs[i&4095])
				i++
			}
		})
		b.Run("strconv/"+kind, func(b *testing.B) {
			i := 0
			for b.Loop() {
				buf = strconv.AppendFloat(buf[:0], vs[i&4095], 'g', 8, 64)
				i++
			}
		})
	}
}
