package study

import (
	"math/bits"
	"slices"

	"cleft/planes/chance"
)

// selectBins is the number of bins of selectPercentiles.
const selectBins = 1 << 12

// orderBits of −Inf and +Inf.
const negInfKey, posInfKey = 0x000fffffffffffff, 0xfff0000000000000

// selectPercentiles returns the type-7 percentiles (chance.Percentile) of
// v at Percentiles without sorting v: each needs the order statistics
// x(⌊h⌋) and x(⌊h⌋ + 1), h = (n − 1)·p. The finite values' order-preserving
// keys (orderBits) are binned into selectBins equal ranges between their
// least and largest; one pass gathers the members of the bins that hold
// the wanted ranks, each of which is then narrowed by binning it again in
// place until a few keys are left to sort (a radix select; selecting twice
// in one bin is fine, since it only reorders the bin). ±Inf are counted apart, below and above every bin. keys and gather are
// buffers n long, counts selectBins long. v must hold no NaN; it is left as
// it was.
func selectPercentiles(v []float64, keys []uint64, counts []int32, gather []uint64) [3]float64 {
	n := len(v)
	lo, hi := ^uint64(0), uint64(0)
	below, above := 0, 0
	for i, x := range v {
		k := orderBits(x)
		keys[i] = k
		switch {
		case k == negInfKey:
			below++
		case k == posInfKey:
			above++
		default:
			lo, hi = min(lo, k), max(hi, k)
		}
	}
	finite := n - below - above
	var ranks [6]int // ⌊h⌋ and ⌊h⌋ + 1 of each percentile
	var frac [3]float64
	for j, p := range Percentiles {
		h := float64(n-1) * p
		k := int(h)
		ranks[2*j], ranks[2*j+1] = k, min(k+1, n-1)
		frac[j] = h - float64(k)
	}
	counts = counts[:selectBins]
	shift := 0
	if finite > 0 {
		shift = max(0, bits.Len64(hi-lo)-bits.Len(selectBins-1))
		clear(counts)
		for _, k := range keys[:n] {
			if k != negInfKey && k != posInfKey {
				counts[(k-lo)>>shift]++
			}
		}
	}
	// The bin of each finite wanted rank, and the rank's place in it.
	var bin, within [6]int
	for q, rk := range ranks {
		bin[q] = -1
		if rk < below || rk >= below+finite {
			continue
		}
		start, b := below, 0
		for rk-start >= int(counts[b]) {
			start += int(counts[b])
			b++
		}
		bin[q], within[q] = b, rk-start
	}
	// Gather the wanted bins in one pass, each into its own stretch.
	var wanted []int
	var size, off [6]int
	for _, b := range bin {
		if b >= 0 && !slices.Contains(wanted, b) {
			size[len(wanted)] = int(counts[b])
			wanted = append(wanted, b)
		}
	}
	total := 0
	for w := range wanted {
		off[w] = total
		total += size[w]
	}
	if len(wanted) > 0 {
		// counts is reused as a table from bin to slot + 1 (0: not wanted).
		clear(counts)
		for w, b := range wanted {
			counts[b] = int32(w + 1)
		}
		fill := off
		for _, k := range keys[:n] {
			if k == negInfKey || k == posInfKey {
				continue
			}
			if w := counts[(k-lo)>>shift] - 1; w >= 0 {
				gather[fill[w]] = k
				fill[w]++
			}
		}
	}
	var val [6]uint64
	for q, rk := range ranks {
		switch {
		case rk < below:
			val[q] = negInfKey
		case rk >= below+finite:
			val[q] = posInfKey
		default:
			w := slices.Index(wanted, bin[q])
			val[q] = radixSelect(gather[off[w]:off[w]+size[w]], within[q], counts)
		}
	}
	var out [3]float64
	for j := range Percentiles {
		out[j] = chance.Percentile([]float64{fromOrderBits(val[2*j]), fromOrderBits(val[2*j+1])}, frac[j])
	}
	return out
}

// radixSelect returns the key of rank r (0-based) in sub, reordering sub
// in place: it bins sub into selectBins ranges between its least and
// largest key, moves the members of the bin that holds rank r to the front,
// and repeats on them until few are left, which it sorts. counts is a
// buffer selectBins long.
func radixSelect(sub []uint64, r int, counts []int32) uint64 {
	for len(sub) > 64 {
		lo, hi := sub[0], sub[0]
		for _, k := range sub {
			lo, hi = min(lo, k), max(hi, k)
		}
		if lo == hi {
			return lo
		}
		shift := max(0, bits.Len64(hi-lo)-bits.Len(selectBins-1))
		clear(counts)
		for _, k := range sub {
			counts[(k-lo)>>shift]++
		}
		start, b := 0, 0
		for r-start >= int(counts[b]) {
			start += int(counts[b])
			b++
		}
		i := 0
		for j, k := range sub {
			if int((k-lo)>>shift) == b {
				sub[i], sub[j] = sub[j], sub[i]
				i++
			}
		}
		sub, r = sub[:i], r-start
	}
	slices.Sort(sub)
	return sub[r]
}
