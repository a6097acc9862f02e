package geom

// GoldenMax returns the point in [lo, hi] where f is largest and the value
// there, by golden-section search (Kiefer 1953) to a bracket narrower than
// tol, for an f with one maximum in the bracket. It does not allocate. It is
// how cleft locates peaks round an opening rather than reading them off
// samples.
func GoldenMax(f func(float64) float64, lo, hi, tol float64) (x, fx float64) {
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
