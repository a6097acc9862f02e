package sets

import (
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// DefaultMaxWeight caps the Terzaghi weight: 10 means planes within about
// 5.7° of parallel to the sampling line (sin θ < 0.1) all count ten times.
const DefaultMaxWeight = 10.0

// TerzaghiWeight returns Terzaghi's (1965) correction for sampling along a
// line (scanline or borehole) of unit direction line, for a plane with unit
// pole:
//
//	w = 1/|cos δ| = 1/sin θ
//
// with δ the angle between the line and the pole and θ between the line and
// the plane; w is capped at max (≥ 1). Planes nearly parallel to the line
// are undersampled and the correction is unreliable there (Terzaghi 1965;
// Priest 1993): the cap keeps a few such readings from dominating.
func TerzaghiWeight(pole, line r3.Vec, max float64) float64 {
	c := math.Abs(r3.Dot(pole, line))
	if c*max <= 1 {
		return max
	}
	return 1 / c
}
