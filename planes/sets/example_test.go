package sets_test

import (
	"fmt"

	"cleft/planes"
	"cleft/planes/sets"
)

// Two joint sets mapped on a face: six readings of a set dipping about 60°
// towards 195° and five of a steep set striking north–south whose dip
// directions straddle the primitive (dipping east and west): poles are axes,
// so the steep set stays one set.
func ExampleGroup() {
	var readings []planes.Orientation
	for _, s := range []string{"60/190", "65/200", "55/195", "62/185", "58/205", "70/192",
		"88/090", "86/270", "89/095", "87/268", "85/088"} {
		o, _ := planes.Parse(s)
		readings = append(readings, o)
	}
	g := sets.Group(readings, nil, sets.Config{Count: 2, MaxWeight: sets.DefaultMaxWeight})
	for k, s := range g.Analysis.Sets {
		fmt.Printf("%s: %d readings, mean %s, K %.0f\n", sets.Name(k), len(s.Members), s.Mean(), s.Raw.K)
	}
	// Output:
	// S1: 6 readings, mean 62/194, K 97
	// S2: 5 readings, mean 90/090, K 300
}
