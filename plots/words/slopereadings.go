package words

import (
	"fmt"

	"cleft/planes/slope"
)

// SetsOf names the readings a count is over: "S1", "S1+S2", "unassigned",
// "all".
func SetsOf(c slope.Count) string {
	name := func(s int) string {
		switch s {
		case slope.AllSets:
			return "all"
		case -1:
			return "unassigned"
		}
		return fmt.Sprintf("S%d", s+1)
	}
	if c.SetA == slope.AllSets || c.SetB == -1 && c.Test != slope.WedgeTest {
		return name(c.SetA)
	}
	return name(c.SetA) + "+" + name(c.SetB)
}

// ReadingLines are the readings against the kinematic tests: per test, how
// many pass of all, with the weighted share, and the set that passes most.
func ReadingLines(cs []slope.Count) []string {
	if cs == nil {
		return nil
	}
	out := []string{"Readings against the tests (every count per set is in slope-readings.csv):"}
	for _, test := range []slope.Test{slope.PlanarTest, slope.WedgeTest, slope.TopplingTest} {
		var all *slope.Count
		var most *slope.Count
		for i := range cs {
			c := &cs[i]
			if c.Test != test {
				continue
			}
			if c.SetA == slope.AllSets {
				all = c
			} else if c.Pass > 0 && (most == nil || c.WeightedShare() > most.WeightedShare()) {
				most = c
			}
		}
		if all == nil {
			if test == slope.WedgeTest {
				out = append(out, fmt.Sprintf("  wedge: pairs of readings not tested (%d readings or more).", slope.MaxPairReadings))
			}
			continue
		}
		what := "readings"
		if test == slope.WedgeTest {
			what = "pairs of readings"
		}
		s := fmt.Sprintf("  %s: %d of %d %s pass (%.1f%%, weighted %.1f%%)", test, all.Pass, all.Tested, what, 100*all.Share(), 100*all.WeightedShare())
		if most != nil {
			s += fmt.Sprintf("; most in %s, %d of %d (weighted %.1f%%)", SetsOf(*most), most.Pass, most.Tested, 100*most.WeightedShare())
		}
		out = append(out, s+".")
	}
	return out
}
