package plots

import "sync"

// rampSteps is the number of even steps of f in the ramp's table. The sRGB
// encoding makes a channel rise as (f − f₀)^(1/2.4) where it leaves 0, so
// linear interpolation converges slowly there: the largest error against the
// exact ramp was measured at 0.64, 0.34 and 0.20 (in 8-bit units) for 256,
// 512 and 1024 steps, near f ≈ 0.5976 where the red channel leaves 0. 1024
// keeps it well under the 0.5 that bounds the rounded difference by 1.
const rampSteps = 1024

// rampTable returns the exact ramp (rampExact) at f = i/rampSteps,
// i = 0 … rampSteps, computed on the first call (up to 31 OKLCh→sRGB
// conversions a node where the gamut cuts the chroma); 24 KiB.
var rampTable = sync.OnceValue(func() *[rampSteps + 1][3]float64 {
	t := new([rampSteps + 1][3]float64)
	for i := range t {
		t[i] = rampExact(float64(i) / rampSteps)
	}
	return t
})
