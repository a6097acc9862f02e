package insitu_test

import (
	"fmt"

	"cleft/insitu"
)

// The principal stresses and regime of a ratio model at 300 m.
func ExampleGradientModel_At() {
	m, err := insitu.NewGradientModel(insitu.DensityGradient(2700),
		insitu.Horizontal{Kind: insitu.Ratio, Value: 1.3},
		insitu.Horizontal{Kind: insitu.Ratio, Value: 0.8},
		65, insitu.DefaultWater)
	if err != nil {
		panic(err)
	}
	s := m.At(300)
	for i, v := range s.Principal.Values {
		a := s.Principal.Axis(i)
		fmt.Printf("σ%d = %.2f MPa along %05.1f/%.0f\n", i+1, v, a.Trend, a.Plunge)
	}
	f := s.Principal.Regime()
	fmt.Printf("%s regime, φ = %.2f, Pp = %.2f MPa\n", f.Regime, s.Principal.Shape(), s.PorePressure)
	// Output:
	// σ1 = 10.33 MPa along 065.0/0
	// σ2 = 7.95 MPa along 000.0/90
	// σ3 = 6.36 MPa along 155.0/0
	// strike-slip regime, φ = 0.40, Pp = 2.94 MPa
}
