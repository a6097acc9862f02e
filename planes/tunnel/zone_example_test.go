package tunnel_test

import (
	"fmt"
	"math"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"
	"cleft/planes/tunnel"
)

// The zone where horizontal joints slip round a 4 m radius tunnel driven
// north in an isotropic far field of 10 MPa: dry, cohesionless, φ = 30°.
func ExampleFind() {
	up, right, along := opening.TunnelFrame(geom.Line{Trend: 0, Plunge: 0})
	c, err := opening.NewCircle(insitu.Tensor{NN: 10, EE: 10, DD: 10}, 4, 0.25, 0)
	if err != nil {
		panic(err)
	}
	st, err := tunnel.NewSection(c, up, right, along, 250, 1, nil)
	if err != nil {
		panic(err)
	}
	joints := planes.MustNew(0, 0)
	friction, err := planes.NewCoulomb(math.Tan(30*math.Pi/180), 0)
	if err != nil {
		panic(err)
	}
	z := tunnel.Find(&st, &joints, friction, tunnel.Grid{}, nil)
	fmt.Printf("deepest %.3f m beyond the wall at %.1f° from the crown\n", z.Depth, z.Angle)
	fmt.Printf("area %.2f m² per metre; at the wall: %v; reaches the outer radius: %v\n",
		z.Area, z.Flags.Has(tunnel.AtWall), z.Flags.Has(tunnel.ReachesOuter))
	// Output:
	// deepest 1.657 m beyond the wall at 30.0° from the crown
	// area 21.91 m² per metre; at the wall: true; reaches the outer radius: false
}
