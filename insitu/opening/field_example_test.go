package opening_test

import (
	"fmt"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
)

// The stress two radii into the rock above the crown of a tunnel driven
// north, and the peaks at the wall.
func ExampleCircle_At() {
	// Far field in the tunnel frame (Up, Right, Axis): Sv = 20 across the
	// section, Shmin 15 horizontal across it, SHmax 30 along the drive.
	far := insitu.Tensor{NN: 20, EE: 15, DD: 30}
	c, err := opening.NewCircle(far, 4, 0.25, 0.5)
	if err != nil {
		panic(err)
	}
	// By hand (q = 1/4, m = 17.5, d = 2.5): σrr = 13.125 + 0.46875 + 0.125,
	// σθθ = 21.875 − 2.96875 − 0.125, σzz = 30 − 0.625.
	p := c.At(8, 0)
	fmt.Printf("r = 2a above the crown: σrr %.3f, σθθ %.3f, σzz %.3f MPa\n", p.R, p.Theta, p.Z)
	up, right, along := opening.TunnelFrame(geom.Line{Trend: 0, Plunge: 0})
	t := p.Tensor(up, right, along, 0)
	fmt.Printf("as NED: σNN %.3f, σEE %.3f, σDD %.3f MPa\n", t.NN, t.EE, t.DD)
	mt := opening.MaxTangential(far, 0.5)
	mp := opening.MaxWallPrincipal(far, 0.25, 0.5)
	fmt.Printf("σθ,max %.2f MPa at %.0f°; σmax %.2f MPa at %.0f°\n", mt.Stress, mt.Theta, mp.Stress, mp.Theta)
	// Output:
	// r = 2a above the crown: σrr 13.719, σθθ 18.781, σzz 29.375 MPa
	// as NED: σNN 29.375, σEE 18.781, σDD 13.719 MPa
	// σθ,max 44.50 MPa at 90°; σmax 44.50 MPa at 90°
}
