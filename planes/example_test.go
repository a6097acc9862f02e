package planes_test

import (
	"fmt"

	"cleft/insitu"
	"cleft/planes"
)

// A strike-slip far field at 200 m, hydrostatic water below 10 m, and one
// steep joint striking 30° clockwise of SHmax: nearly optimal for sinistral
// slip. (Checked by hand from the principal-axis form: σn = 4.555 MPa,
// |t|² = 23.21 MPa², so τ = 1.57 MPa.)
func ExampleResolve() {
	m, err := insitu.NewGradientModel(0.026,
		insitu.Horizontal{Kind: insitu.Ratio, Value: 1.4}, // SHmax = 1.4·Sv
		insitu.Horizontal{Kind: insitu.Ratio, Value: 0.7}, // Shmin = 0.7·Sv
		45, // SHmax azimuth, degrees
		insitu.Water{Gradient: insitu.Hydrostatic, Table: 10, Biot: 1})
	if err != nil {
		panic(err)
	}
	joint, _ := planes.Parse("85/165")
	r := planes.Resolve(m.At(200), joint, &planes.Coulomb{Mu: 0.6})
	fmt.Printf("σn' = %.3f MPa, τ = %.3f MPa\n", r.EffectiveNormal, r.Shear)
	fmt.Printf("Ts = %.3f, FS = %.2f, pressure to slip = %.2f MPa\n", r.SlipTendency, r.FactorOfSafety, r.PressureToSlip)
	fmt.Printf("rake %.0f°, %s, %s\n", r.Rake, r.Sense, r.State)
	// Output:
	// σn' = 2.691 MPa, τ = 1.571 MPa
	// Ts = 0.584, FS = 1.03, pressure to slip = 0.07 MPa
	// rake -2°, sinistral, stable
}
