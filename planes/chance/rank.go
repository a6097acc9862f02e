package chance

import (
	"math"
	"slices"

	"gonum.org/v1/gonum/stat"
)

// Ranks returns the ranks 1…n of x in dst (allocated if nil or too short),
// ties given the average of the ranks they span (mid-ranks). −Inf and +Inf
// rank as the smallest and largest values; Ranks returns ok = false if x
// holds a NaN, which has no rank.
func Ranks(dst, x []float64) (ranks []float64, ok bool) {
	n := len(x)
	if cap(dst) < n {
		dst = make([]float64, n)
	}
	dst = dst[:n]
	type keyed struct {
		v float64
		i int32
	}
	order := make([]keyed, n)
	for i, v := range x {
		if math.IsNaN(v) {
			return dst, false
		}
		order[i] = keyed{v, int32(i)}
	}
	slices.SortFunc(order, func(a, b keyed) int { // NaN excluded above
		switch {
		case a.v < b.v:
			return -1
		case a.v > b.v:
			return 1
		}
		return 0
	})
	for lo := 0; lo < n; {
		hi := lo + 1
		for hi < n && order[hi].v == order[lo].v {
			hi++
		}
		r := float64(lo+hi+1) / 2 // mean of the ranks lo+1 … hi
		for _, o := range order[lo:hi] {
			dst[o.i] = r
		}
		lo = hi
	}
	return dst, true
}

// Spearman returns Spearman's (1904) rank correlation of x and y: the
// Pearson correlation of their mid-ranks (Ranks), which with ties is the
// usual tie-corrected coefficient. −Inf and +Inf are ordinary ranks, so a
// caller can mark an undefined output (a plane that opens has no factor of
// safety) as −Inf to rank it below every number. Spearman returns NaN if
// either slice holds a NaN, if n < 2, or if all of x or all of y are equal.
// It panics if the lengths differ. To correlate many inputs with one
// output, rank the output once and use stat.Correlation on the ranks.
func Spearman(x, y []float64) float64 {
	if len(x) != len(y) {
		panic("chance: Spearman of slices of different lengths")
	}
	if len(x) < 2 {
		return math.NaN()
	}
	rx, okx := Ranks(nil, x)
	ry, oky := Ranks(nil, y)
	if !okx || !oky {
		return math.NaN()
	}
	return stat.Correlation(rx, ry, nil)
}
