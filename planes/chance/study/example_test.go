package study_test

import (
	"fmt"

	"cleft/planes/assess"
	"cleft/planes/chance/study"
	"cleft/planes/site"
)

// A fault whose friction is known only as a range, in a site with one
// bracketing case: the case's verdict, and the Monte Carlo's probability
// that the fault is critical. Its slip tendency is 0.4829, so with friction
// uniform on [0.35, 0.55] the closed form is P(critical) = (0.4829 −
// 0.35)/0.2 = 0.665 (derived); the draw of 4000 lies within two standard
// errors of it.
func Example() {
	s, err := site.Parse([]byte(`site: example (invented)
stress:
  vertical: {density: 2650}
  shmax: {ratio: 1.35, azimuth: 128}
  shmin: {ratio: 0.72}
water: {table: 18}
planes:
  - {name: F1, dip: 74, dip_direction: 188, depth: 180}
cases:
  dry: {water.table: 180}
uncertainty:
  realisations: 4000
  vary:
    strength.friction: {uniform: [0.35, 0.55]}
`), "example.yaml")
	if err != nil {
		fmt.Println(err)
		return
	}
	a, _ := assess.New(s)
	targets, _ := study.Targets(a)
	runs, _ := study.Cases(s, targets)
	for _, r := range runs {
		fmt.Printf("%s: %s, Ts %.4f\n", r.Name, r.Results[0].State, r.Results[0].SlipTendency)
	}
	out, _ := study.Run(a, targets, study.Options{})
	o := out.Odds[0]
	fmt.Printf("P(critical) %.3f ± %.3f, driver %s (ρ %.2f)\n", o.PCritical, o.StdErr, out.Inputs[o.Driver], o.Rho[o.Driver])
	// Output:
	// base: stable, Ts 0.4829
	// dry: stable, Ts 0.2980
	// P(critical) 0.653 ± 0.008, driver strength.friction (ρ 1.00)
}
