package tunnel_test

import (
	"fmt"
	"math"

	"cleft/insitu"
	"cleft/planes"
	"cleft/planes/tunnel"
)

// A 400 m drive towards 090° under 60 to 200 m of cover, in a strike-slip
// far field with SHmax along 045°, against one steep joint set striking
// across the drive.
func ExampleScreen() {
	m, _ := insitu.NewGradientModel(0.026,
		insitu.Horizontal{Kind: insitu.Ratio, Value: 1.5}, insitu.Horizontal{Kind: insitu.Ratio, Value: 0.8},
		45, insitu.Water{Gradient: insitu.Hydrostatic, Table: 20, Biot: 1})
	t := tunnel.Tunnel{
		Legs:    []tunnel.Leg{{From: 0, To: 400, Trend: 90}},
		Cover:   [][2]float64{{0, 60}, {400, 200}},
		Spacing: 100, Radius: 3, UCS: 60, Poisson: 0.25, Drained: true,
	}
	joint := tunnel.Target{Name: "J1", Orientation: planes.MustNew(75, 270), Criterion: &planes.Coulomb{Mu: 0.6}, PoreExcess: math.NaN()}
	sc, err := tunnel.Screen(t, m, []tunnel.Target{joint})
	if err != nil {
		panic(err)
	}
	for _, st := range sc.Stations {
		r := st.Rows[0]
		fmt.Printf("%3.0f m: σmax/UCS %.2f, J1 %s FS %.2f, critical on the wall at %v\n", st.Chainage, st.Ratio, r.Drive.Class, r.Far.FactorOfSafety, r.Critical)
	}
	// Output:
	// 0 m: σmax/UCS 0.08, J1 fair FS 1.56, critical on the wall at [{160 190} {340 10}]
	// 100 m: σmax/UCS 0.12, J1 fair FS 1.48, critical on the wall at [{160 190} {340 10}]
	// 200 m: σmax/UCS 0.16, J1 fair FS 1.45, critical on the wall at [{160 190} {340 10}]
	// 300 m: σmax/UCS 0.20, J1 fair FS 1.42, critical on the wall at [{160 190} {340 10}]
	// 400 m: σmax/UCS 0.24, J1 fair FS 1.41, critical on the wall at [{160 190} {340 10}]
}

// The same drive with a support pressure of 0.2 MPa: the slip zone of the
// joint set in the rock round the opening at each station, and the
// stretches where it reaches deeper than 0.21 m beyond the wall.
func ExampleScreening_Deepest() {
	m, _ := insitu.NewGradientModel(0.026,
		insitu.Horizontal{Kind: insitu.Ratio, Value: 1.5}, insitu.Horizontal{Kind: insitu.Ratio, Value: 0.8},
		45, insitu.Water{Gradient: insitu.Hydrostatic, Table: 20, Biot: 1})
	t := tunnel.Tunnel{
		Legs:    []tunnel.Leg{{From: 0, To: 400, Trend: 90}},
		Cover:   [][2]float64{{0, 60}, {400, 200}},
		Spacing: 100, Radius: 3, UCS: 60, Poisson: 0.25, Drained: true, Support: 0.2, ZoneLimit: 0.21,
	}
	joint := tunnel.Target{Name: "J1", Orientation: planes.MustNew(75, 270), Criterion: &planes.Coulomb{Mu: 0.6}, PoreExcess: math.NaN()}
	sc, err := tunnel.Screen(t, m, []tunnel.Target{joint})
	if err != nil {
		panic(err)
	}
	for _, st := range sc.Stations {
		r := &st.Rows[0]
		fmt.Printf("%3.0f m: %s zone %.2f m deep at %.0f°, %.1f m² per metre\n", st.Chainage, r.Extent(), r.Zone.Depth, r.Zone.Angle, r.Zone.Area)
	}
	i, _, _ := sc.Deepest(0, true)
	fmt.Printf("deepest at %g m; deeper than %g m at %v\n", sc.Stations[i].Chainage, t.Limit(), sc.Deeper(0))
	// Output:
	//   0 m: bounded zone 0.18 m deep at 175°, 0.5 m² per metre
	// 100 m: bounded zone 0.20 m deep at 174°, 0.6 m² per metre
	// 200 m: bounded zone 0.22 m deep at 174°, 0.6 m² per metre
	// 300 m: bounded zone 0.22 m deep at 174°, 0.7 m² per metre
	// 400 m: bounded zone 0.23 m deep at 174°, 0.7 m² per metre
	// deepest at 400 m; deeper than 0.21 m at [{200 400}]
}
