package slope

import "cleft/planes"

// Reading is one field reading run through the kinematic tests: its plane,
// its friction angle (°), its set (0, 1, …; −1 unassigned) and its weight
// (Terzaghi's, or 1).
type Reading struct {
	Orientation planes.Orientation
	Phi         float64
	Set         int
	Weight      float64
}

// AllSets stands for every reading in Count.SetA.
const AllSets = -2

// MaxPairReadings is the number of readings below which every pair of
// readings is also run through the wedge test (n(n−1)/2 pairs).
const MaxPairReadings = 500

// Count is how many readings, or pairs of readings for the wedge test, pass
// one kinematic test: those of set SetA (wedges: pairs of a reading of SetA
// and one of SetB, SetA ≤ SetB in the order S1, S2, …, unassigned), or
// every reading when SetA is AllSets. A pair weighs the product of its
// readings' weights.
type Count struct {
	Test         Test
	SetA, SetB   int // −1 unassigned; AllSets; SetB is −1 but for wedges
	Tested, Pass int
	Weight       float64 // Σ weight of those tested
	PassWeight   float64 // Σ weight of those that pass
}

// Share is the fraction that pass, Pass/Tested (NaN when none is tested).
func (c Count) Share() float64 { return float64(c.Pass) / float64(c.Tested) }

// WeightedShare is the weighted fraction that pass.
func (c Count) WeightedShare() float64 { return c.PassWeight / c.Weight }

// Tally runs every reading through the planar-sliding and
// flexural-toppling tests and, when there are fewer than MaxPairReadings,
// every pair of readings through the wedge test, with each reading's own
// friction (the smaller of a pair's on both planes; see WedgeSliding). It
// returns, for each test in the order planar, wedge, toppling, a Count per
// set of readings (S1 … Sn, then the unassigned when there are any, then
// all), and for wedges per pair of sets. nSets is the number of sets.
func Tally(sl Slope, rs []Reading, nSets int) []Count {
	groups := make([]int, 0, nSets+1)
	for s := range nSets {
		groups = append(groups, s)
	}
	for _, r := range rs {
		if r.Set < 0 {
			groups = append(groups, -1)
			break
		}
	}
	slot := func(set int) int {
		if set < 0 {
			return len(groups) - 1
		}
		return set
	}
	single := func(test Test, pass func(Reading) bool) []Count {
		out := make([]Count, len(groups)+1)
		for i, g := range groups {
			out[i] = Count{Test: test, SetA: g, SetB: -1}
		}
		out[len(groups)] = Count{Test: test, SetA: AllSets, SetB: -1}
		for _, r := range rs {
			ok := pass(r)
			for _, c := range []*Count{&out[slot(r.Set)], &out[len(groups)]} {
				c.Tested++
				c.Weight += r.Weight
				if ok {
					c.Pass++
					c.PassWeight += r.Weight
				}
			}
		}
		return out
	}
	out := single(PlanarTest, func(r Reading) bool {
		return PlanarSliding(r.Orientation, sl.Face, r.Phi, sl.LateralLimit).Feasible
	})
	if len(rs) < MaxPairReadings {
		n := len(groups)
		pairs := make([]Count, 0, n*(n+1)/2+1)
		index := make([][]int, n)
		for i := range n {
			index[i] = make([]int, n)
			for j := i; j < n; j++ {
				index[i][j] = len(pairs)
				pairs = append(pairs, Count{Test: WedgeTest, SetA: groups[i], SetB: groups[j]})
			}
		}
		pairs = append(pairs, Count{Test: WedgeTest, SetA: AllSets, SetB: -1})
		all := &pairs[len(pairs)-1]
		for i, a := range rs {
			for _, b := range rs[i+1:] {
				_, _, k := WedgeSliding(a.Orientation, b.Orientation, sl.Face, a.Phi, b.Phi)
				sa, sb := slot(a.Set), slot(b.Set)
				if sa > sb {
					sa, sb = sb, sa
				}
				w := a.Weight * b.Weight
				for _, c := range []*Count{&pairs[index[sa][sb]], all} {
					c.Tested++
					c.Weight += w
					if k.Feasible {
						c.Pass++
						c.PassWeight += w
					}
				}
			}
		}
		out = append(out, pairs...)
	}
	return append(out, single(TopplingTest, func(r Reading) bool {
		return FlexuralToppling(r.Orientation, sl.Face, r.Phi, sl.ToppleLimit).Feasible
	})...)
}
