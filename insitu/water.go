package insitu

import (
	"fmt"
	"math"
)

// Gravity is the acceleration used to turn densities into gradients, m/s².
const Gravity = 9.81

// Hydrostatic is the pore-pressure gradient of fresh water,
// 1000 kg/m³ × 9.81 m/s² = 0.00981 MPa/m (common practice); the same number
// is the unit weight of water γw in MN/m³, used for water forces on blocks.
const Hydrostatic = 0.00981

// DensityGradient returns the vertical stress gradient in MPa/m of rock of
// density rho in kg/m³: ρ·g·1e-6 (2700 kg/m³ gives 0.0265 MPa/m).
func DensityGradient(rho float64) float64 { return rho * Gravity * 1e-6 }

// Water is the pore-pressure model: a hydrostatic column below a water table,
//
//	Pp(z) = Gradient·max(0, z − Table)
//
// or no water at all when Dry. Biot is the effective-stress coefficient α
// applied by σ' = σ − α·Pp.
type Water struct {
	Gradient float64 // MPa/m, > 0 unless Dry
	Table    float64 // depth of the water table, m, ≥ 0
	Biot     float64 // in (0, 1]
	Dry      bool
}

// DefaultWater is a hydrostatic column from the ground surface with α = 1.
var DefaultWater = Water{Gradient: Hydrostatic, Table: 0, Biot: 1}

// Validate reports the first value out of its range.
func (w Water) Validate() error {
	switch {
	case !w.Dry && !(w.Gradient > 0) || math.IsInf(w.Gradient, 0):
		return fmt.Errorf("gradient %v MPa/m: want a finite number > 0", w.Gradient)
	case !(w.Table >= 0) || math.IsInf(w.Table, 0):
		return fmt.Errorf("table %v m: want a finite depth ≥ 0", w.Table)
	case !(w.Biot > 0 && w.Biot <= 1):
		return fmt.Errorf("biot %v: want a number in (0, 1]", w.Biot)
	}
	return nil
}

// Pressure returns the pore pressure in MPa at depth z in m.
func (w Water) Pressure(z float64) float64 {
	if w.Dry || z <= w.Table {
		return 0
	}
	return w.Gradient * (z - w.Table)
}
