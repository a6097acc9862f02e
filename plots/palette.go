package plots

import (
	"image/color"
	"math"
)

// Ramp is a sequential colour map of this project's own design: lightness
// rises linearly in the OKLab space (Ottosson 2020) from a deep blue-violet
// to a pale straw yellow while the hue turns through teal and green, so that
// the order of values reads from lightness alone (in grey print and for the
// common colour-vision deficiencies) and equal steps of value look like
// equal steps of colour. At returns the colour for a fraction f ∈ [0, 1]
// (clamped); f = 1 is the light end.
type Ramp struct{}

// Ramp's path in OKLCh: lightness, hue (degrees) and the largest chroma it
// asks for; chroma is reduced where sRGB cannot show it.
const (
	rampL0, rampL1 = 0.27, 0.94
	rampH0, rampH1 = 285.0, 100.0
	rampC          = 0.13
)

// At returns the colour at fraction f ∈ [0, 1]; f is clamped, and NaN gives
// the colour at 0. It interpolates linearly, channel by channel, in a table
// of the exact ramp (rampExact) at rampSteps+1 even steps of f, built on
// first use: every channel is within 1 of the exact ramp rounded to 8 bits
// (tested on a dense sweep), and equal to it at the table's nodes. At does
// not allocate.
func (Ramp) At(f float64) color.NRGBA {
	t := rampTable()
	x := f * rampSteps
	if !(x > 0) { // negative or NaN
		x = 0
	}
	x = min(x, rampSteps)
	i := min(int(x), rampSteps-1)
	w := x - float64(i) // ∈ [0, 1]
	a, b := &t[i], &t[i+1]
	// Rounding by +0.5 and truncation: the channels are ≥ 0.
	return color.NRGBA{
		R: uint8(a[0] + (b[0]-a[0])*w + 0.5),
		G: uint8(a[1] + (b[1]-a[1])*w + 0.5),
		B: uint8(a[2] + (b[2]-a[2])*w + 0.5),
		A: 255,
	}
}

// rampExact returns the exact colour of the ramp at fraction f ∈ [0, 1] as
// sRGB channels scaled to [0, 255], not rounded.
func rampExact(f float64) [3]float64 {
	l := rampL0 + (rampL1-rampL0)*f
	h := (rampH0 + (rampH1-rampH0)*f) * math.Pi / 180
	// Chroma: full in the middle, less at the dark and light ends, then
	// reduced to fit the sRGB gamut by bisection.
	c := rampC * math.Sin(math.Pi*(0.15+0.7*f))
	lo, hi := 0.0, c
	if _, ok := oklchToSRGB(l, hi, h); !ok {
		for range 30 {
			mid := 0.5 * (lo + hi)
			if _, ok := oklchToSRGB(l, mid, h); ok {
				lo = mid
			} else {
				hi = mid
			}
		}
		c = lo
	}
	rgb, _ := oklchToSRGB(l, c, h)
	return rgb
}

// oklchToSRGB converts OKLCh to sRGB channels scaled to [0, 255] (clipped to
// that range, not rounded); ok is false when the colour lies outside the sRGB
// gamut.
func oklchToSRGB(l, c, h float64) ([3]float64, bool) {
	a, b := c*math.Cos(h), c*math.Sin(h)
	// OKLab → LMS' → LMS → linear sRGB (Ottosson 2020).
	l_ := l + 0.3963377774*a + 0.2158037573*b
	m_ := l - 0.1055613458*a - 0.0638541728*b
	s_ := l - 0.0894841775*a - 1.2914855480*b
	L, M, S := l_*l_*l_, m_*m_*m_, s_*s_*s_
	lin := [3]float64{
		+4.0767416621*L - 3.3077115913*M + 0.2309699292*S,
		-1.2684380046*L + 2.6097574011*M - 0.3413193965*S,
		-0.0041960863*L - 0.7034186147*M + 1.7076147010*S,
	}
	var out [3]float64
	ok := true
	for i, v := range lin {
		if v < -1e-9 || v > 1+1e-9 {
			ok = false
		}
		v = math.Max(0, math.Min(1, v))
		if v <= 0.0031308 {
			v *= 12.92
		} else {
			v = 1.055*math.Pow(v, 1/2.4) - 0.055
		}
		out[i] = v * 255
	}
	return out, ok
}

// oklabL returns the OKLab lightness of an sRGB colour (for the tests).
func oklabL(c color.NRGBA) float64 {
	lin := func(u uint8) float64 {
		v := float64(u) / 255
		if v <= 0.04045 {
			return v / 12.92
		}
		return math.Pow((v+0.055)/1.055, 2.4)
	}
	r, g, b := lin(c.R), lin(c.G), lin(c.B)
	L := 0.4122214708*r + 0.5363325363*g + 0.0514459929*b
	M := 0.2119034982*r + 0.6806995451*g + 0.1073969566*b
	S := 0.0883024619*r + 0.2817188376*g + 0.6299787005*b
	return 0.2104542553*math.Cbrt(L) + 0.7936177850*math.Cbrt(M) - 0.0040720468*math.Cbrt(S)
}
