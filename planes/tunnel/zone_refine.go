package tunnel

import (
	"math"

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
	t, e := goldenMax(f, th-dth, th+dth, angleTol)
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

// goldenMax returns the point in [lo, hi] where f is largest and the value
// there, by golden-section search to a bracket narrower than tol, for an f
// with one maximum in the bracket.
func goldenMax(f func(float64) float64, lo, hi, tol float64) (x, fx float64) {
	const g = 0.6180339887498949 // (√5 − 1)/2
	x1 := hi - g*(hi-lo)
	x2 := lo + g*(hi-lo)
	f1, f2 := f(x1), f(x2)
	for hi-lo > tol {
		if f1 >= f2 {
			hi, x2, f2 = x2, x1, f1
			x1 = hi - g*(hi-lo)
			f1 = f(x1)
		} else {
			lo, x1, f1 = x1, x2, f2
			x2 = lo + g*(hi-lo)
			f2 = f(x2)
		}
	}
	if f1 >= f2 {
		return x1, f1
	}
	return x2, f2
}
