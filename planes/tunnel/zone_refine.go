package tunnel

import (
	"math"

	"cleft/insitu/geom"
	"cleft/insitu/opening"
)

// refine narrows the deepest point of the mode's part near angle th (degrees),
// whose neighbouring rays are dth away, by golden-section search on the
// radius of the part's outer edge, and returns the better of the refined and
// the sampled point (th, r).
func (p *probe) refine(th, dth, r float64, mode int) (float64, float64) {
	f := func(t float64) float64 {
		y := p.st.Opening.Ray(p.st.Up, p.st.Right, p.st.Along, t)
		return p.edge(&y, r, mode)
	}
	const angleTol = 1e-6 // degrees
	t, e := geom.GoldenMax(f, th-dth, th+dth, angleTol)
	if e > r {
		return t, e
	}
	return th, r
}

// edge returns the outer edge of the mode's part on ray y next to r0: walking
// out from r0 by grid steps while inside, or in while outside, then
// bisecting. It returns the wall radius when no part lies inside r0.
func (p *probe) edge(y *opening.Ray, r0 float64, mode int) float64 {
	if p.in(y, r0, mode) {
		for lo := r0; ; {
			hi := math.Min(lo+p.h, p.rOut)
			if !p.in(y, hi, mode) {
				return p.bisect(y, lo, hi, true, mode)
			}
			if hi == p.rOut {
				return p.rOut
			}
			lo = hi
		}
	}
	for hi := r0; hi > p.a; {
		lo := math.Max(hi-p.h, p.a)
		if p.in(y, lo, mode) {
			return p.bisect(y, lo, hi, true, mode)
		}
		hi = lo
	}
	return p.a
}
