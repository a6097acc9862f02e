package decide_test

import (
	"fmt"

	"cleft/planes/assess"
	"cleft/planes/decide"
	"cleft/planes/site"
)

// The findings of a small site, ranked: what to look at first, by how
// near each is to its limit, and why.
func ExampleFindings() {
	s, err := site.Parse([]byte(ownSite), "own.yaml")
	if err != nil {
		panic(err)
	}
	a, err := assess.New(s)
	if err != nil {
		panic(err)
	}
	fs := decide.Findings(decide.Screenings{A: a})
	top, more := decide.Top(fs, 3, 3)
	for _, f := range top {
		fmt.Printf("%s %s: %s %.3f, %s; own %v, decisive %v\n", f.Kind, f.Name, f.Measure, f.Value, f.Standing, f.Reasons, f.Decisive)
	}
	fmt.Println(more, "more near or failing")
	// Output:
	// plane wet: effective_normal_stress_mpa -0.500, fails; own own-pore-pressure, decisive own-pore-pressure
	// plane weak: factor_of_safety 0.953, fails; own own-friction, decisive own-friction
	// plane both: factor_of_safety 0.991, fails; own own-friction,own-cohesion, decisive own-friction
	// 1 more near or failing
}
