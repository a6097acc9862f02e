package slope_test

import (
	"fmt"

	"cleft/planes"
	"cleft/planes/slope"
)

// A 20 m cut face dipping 60° towards 180° in rock of 0.026 MN/m³, against
// bedding dipping 35° out of the face, a steep joint set into it, and a
// joint that makes a wedge with the bedding.
func ExampleScreen() {
	sl := slope.Slope{
		Face: planes.MustNew(60, 180), Top: planes.MustNew(0, 180), Height: 20,
		FrictionAngle: 30, LateralLimit: 20, ToppleLimit: 20, UnitWeight: 0.026,
		Water: []slope.Water{{}, {Kind: slope.WaterFull}}, TargetFS: 1.5,
	}
	cands := []slope.Candidate{
		{Name: "bedding", Orientation: planes.MustNew(35, 175), Phi: 30},
		{Name: "J1", Orientation: planes.MustNew(80, 0), Phi: 30},
		{Name: "J2", Orientation: planes.MustNew(55, 230), Phi: 30},
	}
	sc := slope.Screen(sl, cands)
	for _, c := range sc.Cases {
		if !c.Feasible {
			continue
		}
		fmt.Printf("%s %s", c.Test, sc.Names(c))
		switch {
		case c.Test == slope.PlanarTest:
			fmt.Printf(": crack %.1f m, FS dry %.2f, full %.2f", c.CrackDepth, c.FS[0], c.FS[1])
		case c.Wedge != nil:
			fmt.Printf(": %s, %.0f m³, %.1f MN, FS dry %.2f, saturated (%.1f m) %.2f", c.Mode, c.Wedge.Volume, c.Wedge.Weight, c.FS[0], c.Heads[1], c.FS[1])
		}
		fmt.Println()
	}
	// Output:
	// planar bedding: crack 7.3 m, FS dry 0.82, full 0.50
	// wedge bedding+J2: first-plane, 11343 m³, 294.9 MN, FS dry 0.82, saturated (10.0 m) 0.43
	// flexural-toppling J1
}
