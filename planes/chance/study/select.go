package study

import (
	"math/bits"
	"slices"

	"cleft/planes/chance"
)

// selectPercentiles returns the type-7 percentiles (chance.Percentile) of
// v at Percentiles without sorting v: each needs the order statistics ⌊h⌋
// and ⌊h⌋ + 1, h = (n − 1)·p. The finite values' order-preserving keys
// (orderBits) are binned into 1<<16 equal ranges between their least and
// largest; the bins that hold the wanted ranks are gathered and sorted
// (±Inf are counted apart, below and above every bin). keys, counts and
// gather are buffers (n, 1<<16 and n long). v must hold no NaN; it is left
// as it was.
func selectPercentiles(v []float64, keys []uint64, counts []int32, gather []uint64) [3]float64 {
	n := len(v)
	const negInf, posInf = 0x000fffffffffffff, 0xfff0000000000000 // orderBits(∓Inf)
	lo, hi := ^uint64(0), uint64(0)
	below, above := 0, 0
	for i, x := range v {
		k := orderBits(x)
		keys[i] = k
		switch {
		case k == negInf:
			below++
		case k == posInf:
			above++
		default:
			lo, hi = min(lo, k), max(hi, k)
		}
	}
	shift := 0
	if below+above < n {
		shift = max(0, bits.Len64(hi-lo)-16)
	}
	clear(counts)
	for _, k := range keys[:n] {
		if k != negInf && k != posInf {
			counts[(k-lo)>>shift]++
		}
	}
	var ranks [6]int // ⌊h⌋ and ⌊h⌋ + 1 for each percentile
	var frac [3]float64
	for j, p := range Percentiles {
		h := float64(n-1) * p
		k := int(h)
		ranks[2*j], ranks[2*j+1] = k, min(k+1, n-1)
		frac[j] = h - float64(k)
	}
	var val [6]uint64
	bin := -1 // the bin of the last wanted rank
	start := below
	g := gather[:0]
	for q, rk := range ranks {
		switch {
		case rk < below:
			val[q] = negInf
			continue
		case rk >= n-above:
			val[q] = posInf
			continue
		}
		if rk < start { // ranks of neighbouring percentiles may overlap
			bin, start = -1, below
		}
		if bin < 0 || rk-start >= int(counts[bin]) {
			if bin < 0 {
				bin = 0
			}
			for rk-start >= int(counts[bin]) {
				start += int(counts[bin])
				bin++
			}
			g = g[:0]
			for _, k := range keys[:n] {
				if k != negInf && k != posInf && int((k-lo)>>shift) == bin {
					g = append(g, k)
				}
			}
			slices.Sort(g)
		}
		val[q] = g[rk-start]
	}
	var out [3]float64
	for j := range Percentiles {
		out[j] = chance.Percentile([]float64{fromOrderBits(val[2*j]), fromOrderBits(val[2*j+1])}, frac[j])
	}
	return out
}
