package planes

import (
	"math"
	"sort"
	"testing"
)

func TestLessStable(t *testing.T) {
	nan := math.NaN()
	rs := []Result{
		{State: Stable, FactorOfSafety: nan, PressureToSlip: 9},     // no shear
		{State: Stable, FactorOfSafety: 2.5, PressureToSlip: 3},     //
		{State: Opening, EffectiveNormal: -0.5, PressureToSlip: -1}, //
		{State: Critical, FactorOfSafety: 0.9, PressureToSlip: -0.2},
		{State: Opening, EffectiveNormal: -2, PressureToSlip: -3},
		{State: Stable, FactorOfSafety: 1.4, PressureToSlip: 1},
	}
	sort.SliceStable(rs, func(i, j int) bool { return LessStable(rs[i], rs[j]) })
	want := []float64{-3, -1, -0.2, 1, 3, 9}
	for i, r := range rs {
		if r.PressureToSlip != want[i] {
			t.Fatalf("order by ΔPp = %v at %d, want %v", r.PressureToSlip, i, want)
		}
	}
}
