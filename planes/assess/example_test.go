package assess_test

import (
	"fmt"

	"cleft/planes/assess"
	"cleft/planes/site"
	"cleft/planes/site/demo"
)

// The invented demo site: its planes, readings, slope and tunnel, screened
// from Go without the command line.
func ExampleNew() {
	s, err := site.ParseFS(demo.FS, demo.Site)
	if err != nil {
		panic(err)
	}
	a, err := assess.New(s)
	if err != nil {
		panic(err)
	}
	f := a.Facts()
	fmt.Printf("%d planes and readings: %d critical, %d opening; least stable %s\n", f.Planes, f.Critical, f.Opening, f.LeastStable[0].Name)
	fmt.Printf("%d sets from %d readings\n", len(a.Sets), f.Readings)
	pl, we, to := a.Slope().Feasible()
	fmt.Printf("slope: %d planar, %d wedge, %d toppling cases feasible\n", pl, we, to)
	tn, err := a.Tunnel()
	if err != nil {
		panic(err)
	}
	w := tn.Stations[tn.Worst()]
	fmt.Printf("tunnel: %d stations, largest σmax/UCS %.2f at %g m\n", len(tn.Stations), w.Ratio, w.Chainage)
	// Output:
	// 139 planes and readings: 1 critical, 1 opening; least stable F2
	// 3 sets from 133 readings
	// slope: 1 planar, 3 wedge, 1 toppling cases feasible
	// tunnel: 57 stations, largest σmax/UCS 0.33 at 575 m
}
