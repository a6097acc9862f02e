package geom

import (
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// Azimuth reduces an angle in degrees to [0, 360).
func Azimuth(a float64) float64 {
	a = math.Mod(a, 360)
	if a < 0 {
		a += 360
	}
	if a >= 360 { // a tiny negative a rounds up to 360 above
		a = 0
	}
	return a
}

// Deg and Rad convert radians to degrees and degrees to radians.
const (
	Deg = 180 / math.Pi
	Rad = math.Pi / 180
)

// SinCosDeg returns the sine and cosine of an angle in degrees. Whole
// multiples of 90° give exact results (sin 180° is 0, not 1.2e-16).
func SinCosDeg(a float64) (sin, cos float64) {
	r := math.Mod(a, 360)
	if r < 0 {
		r += 360
	}
	switch r {
	case 0:
		return 0, 1
	case 90:
		return 1, 0
	case 180:
		return 0, -1
	case 270:
		return -1, 0
	}
	return math.Sincos(r * Rad)
}

// Angle returns the angle in degrees, in [0, 180], between two non-zero vectors.
func Angle(a, b r3.Vec) float64 {
	return math.Atan2(r3.Norm(r3.Cross(a, b)), r3.Dot(a, b)) * Deg
}

// AxialAngle returns the angle in degrees, in [0, 90], between the axes of two
// non-zero vectors: a and −a are the same axis.
func AxialAngle(a, b r3.Vec) float64 {
	return math.Atan2(r3.Norm(r3.Cross(a, b)), math.Abs(r3.Dot(a, b))) * Deg
}
