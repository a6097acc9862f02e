package chance

import (
	"math"
	"slices"
)

// Percentile returns the p-quantile, p ∈ [0, 1], of the ascending sorted
// values by linear interpolation between order statistics (Hyndman & Fan
// 1996, type 7; the default of R and NumPy):
//
//	h = (n − 1)·p,  j = ⌊h⌋,  Q(p) = x[j] + (h − j)·(x[j+1] − x[j])
//
// −Inf entries (an undefined output ranked below every number) sort first
// and count in n. Percentile returns NaN when the result is not finite (it
// falls on or next to an infinite entry) and for an empty slice. It panics
// if p is outside [0, 1] or sorted is not ascending (a NaN entry counts as
// out of order).
func Percentile(sorted []float64, p float64) float64 {
	if !(p >= 0 && p <= 1) {
		panic("chance: percentile probability outside [0, 1]")
	}
	n := len(sorted)
	if n == 0 {
		return math.NaN()
	}
	for i := 1; i < n; i++ {
		if !(sorted[i-1] <= sorted[i]) {
			panic("chance: Percentile of values not sorted ascending")
		}
	}
	h := float64(n-1) * p
	j := int(h)
	g := h - float64(j)
	q := sorted[j]
	if g > 0 && j+1 < n {
		q += g * (sorted[j+1] - sorted[j])
	}
	if math.IsInf(q, 0) || math.IsNaN(q) {
		return math.NaN()
	}
	return q
}

// Percentiles returns in dst (allocated if nil or too short) the Percentile
// of x at each of ps, sorting a copy of x; x is left as it is.
func Percentiles(dst, x, ps []float64) []float64 {
	s := slices.Clone(x)
	slices.Sort(s)
	if cap(dst) < len(ps) {
		dst = make([]float64, len(ps))
	}
	dst = dst[:len(ps)]
	for i, p := range ps {
		dst[i] = Percentile(s, p)
	}
	return dst
}

// StdErr returns the binomial standard error of a proportion p ∈ [0, 1]
// estimated from n ≥ 1 independent realisations:
//
//	√(p(1 − p)/n)
//
// It is 0 at p = 0 and p = 1, where it says nothing: with no hits in n
// realisations the usual 95 % upper bound is about 3/n (the "rule of
// three", common practice). StdErr panics for p outside [0, 1] or n < 1.
func StdErr(p float64, n int) float64 {
	if !(p >= 0 && p <= 1) {
		panic("chance: proportion outside [0, 1]")
	}
	if n < 1 {
		panic("chance: StdErr with fewer than one realisation")
	}
	return math.Sqrt(p * (1 - p) / float64(n))
}
