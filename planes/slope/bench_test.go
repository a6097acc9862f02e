package slope

import (
	"math/rand/v2"
	"testing"

	"cleft/planes"
)

func BenchmarkPlanarFSWith(b *testing.B) {
	blk, _ := NewPlanarBlock(20, 60, 0, 30, 5, true, 0.026)
	ld := PlanarLoad{Bolt: 0.2, BoltPlunge: 15, Seismic: 0.1}
	b.ReportAllocs()
	s := 0.0
	for i := 0; b.Loop(); i++ {
		s += blk.FSWith(0.02, 35, float64(i%5), ld)
	}
	_ = s
}

func BenchmarkWedgeBlock(b *testing.B) {
	sl := wedgeSlope()
	sl.CrackGiven, sl.Crack = true, 3
	a, c := planes.MustNew(55, 170), planes.MustNew(55, 250)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := NewWedgeBlock(sl, a, c); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkWedgeSolve(b *testing.B) {
	sl := wedgeSlope()
	sl.CrackGiven, sl.Crack = true, 3
	w, _ := NewWedgeBlock(sl, planes.MustNew(55, 170), planes.MustNew(55, 250))
	st := Strength{PhiA: 30, PhiB: 35, CA: 0.01, CB: 0.02}
	ld := Load{Bolt: 2, Plunge: 15, Seismic: 0.1}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		w.Solve(st, float64(i%4), ld)
	}
}

// BenchmarkTally499: 499 readings, every test and the 124,251 pairs.
func BenchmarkTally499(b *testing.B) {
	sl := wedgeSlope()
	rng := rand.New(rand.NewPCG(3, 4))
	rs := make([]Reading, 499)
	for i := range rs {
		rs[i] = Reading{Orientation: planes.MustNew(90*rng.Float64(), 360*rng.Float64()), Phi: 30, Set: i%4 - 1, Weight: 1 + rng.Float64()}
	}
	b.ReportAllocs()
	for b.Loop() {
		Tally(sl, rs, 3)
	}
}
