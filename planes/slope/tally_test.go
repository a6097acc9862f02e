package slope

import (
	"testing"

	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestTally(t *testing.T) {
	const tol = 1e-12
	sl := Slope{Face: planes.MustNew(65, 210), Top: planes.MustNew(0, 210), Height: 30, FrictionAngle: 30, LateralLimit: 20, ToppleLimit: 20, UnitWeight: 0.026}
	// Hand-made readings (common practice for the tests: Hoek & Bray's
	// planar conditions, Goodman & Bray's toppling condition):
	rs := []Reading{
		{planes.MustNew(45, 205), 30, 0, 1},   // planar: daylights, ≥ φ, 5° off
		{planes.MustNew(40, 215), 30, 0, 2},   // planar
		{planes.MustNew(25, 210), 30, 0, 1.5}, // flatter than φ
		{planes.MustNew(70, 210), 30, 0, 1},   // steeper than the face
		{planes.MustNew(80, 30), 30, 1, 3},    // topples: (90 − 80) + 30 = 40 ≤ 65
		{planes.MustNew(75, 40), 30, 1, 1},    // topples: 45 ≤ 65, 10° off
		{planes.MustNew(50, 30), 30, 1, 2},    // (90 − 50) + 30 = 70 > 65
		{planes.MustNew(45, 300), 30, -1, 1},  // 90° off the face: neither
	}
	cs := Tally(sl, rs, 2)
	find := func(test Test, a, b int) Count {
		for _, c := range cs {
			if c.Test == test && c.SetA == a && c.SetB == b {
				return c
			}
		}
		t.Fatalf("no count for %v %d %d", test, a, b)
		return Count{}
	}
	for _, c := range []struct {
		name         string
		test         Test
		set          int
		tested, pass int
		share        float64
	}{
		{"planar S1", PlanarTest, 0, 4, 2, 3 / 5.5},
		{"planar S2", PlanarTest, 1, 3, 0, 0},
		{"planar unassigned", PlanarTest, -1, 1, 0, 0},
		{"planar all", PlanarTest, AllSets, 8, 2, 3 / 12.5},
		{"toppling S1", TopplingTest, 0, 4, 0, 0},
		{"toppling S2", TopplingTest, 1, 3, 2, 4.0 / 6},
		{"toppling all", TopplingTest, AllSets, 8, 2, 4 / 12.5},
	} {
		t.Run(c.name, func(t *testing.T) {
			got := find(c.test, c.set, -1)
			if got.Tested != c.tested || got.Pass != c.pass || !scalar.EqualWithinAbs(got.WeightedShare(), c.share, tol) {
				t.Errorf("%+v, want %d of %d, weighted %v", got, c.pass, c.tested, c.share)
			}
		})
	}
	t.Run("wedge pairs", func(t *testing.T) {
		// A direct count of the 28 pairs, by their sets.
		slot := map[int]int{0: 0, 1: 1, -1: 2}
		sets := []int{0, 1, -1}
		var tested, pass [3][3]int
		all := 0
		for i := range rs {
			for j := i + 1; j < len(rs); j++ {
				a, b := slot[rs[i].Set], slot[rs[j].Set]
				if a > b {
					a, b = b, a
				}
				tested[a][b]++
				if _, _, k := WedgeSliding(rs[i].Orientation, rs[j].Orientation, sl.Face, 30, 30); k.Feasible {
					pass[a][b]++
					all++
				}
			}
		}
		if all == 0 {
			t.Fatal("no pair passes: a poor check")
		}
		for a := range 3 {
			for b := a; b < 3; b++ {
				if got := find(WedgeTest, sets[a], sets[b]); got.Tested != tested[a][b] || got.Pass != pass[a][b] {
					t.Errorf("sets %d+%d: %+v, want %d of %d", sets[a], sets[b], got, pass[a][b], tested[a][b])
				}
			}
		}
		if got := find(WedgeTest, AllSets, -1); got.Tested != 28 || got.Pass != all {
			t.Errorf("all pairs: %+v, want %d of 28", got, all)
		}
	})
	t.Run("no pairs from many readings", func(t *testing.T) {
		many := make([]Reading, MaxPairReadings)
		for i := range many {
			many[i] = Reading{planes.MustNew(45, 205), 30, 0, 1}
		}
		for _, c := range Tally(sl, many, 1) {
			if c.Test == WedgeTest {
				t.Fatalf("pairs of %d readings tested", len(many))
			}
		}
	})
}
