package study

import (
	"math"
	stdbits "math/bits"
)

// orderBits maps a float64 that is not NaN to a uint64 in the same order
// (−Inf lowest, +Inf highest; −0 just below +0): the sign bit flipped for a
// positive number, every bit for a negative one.
func orderBits(x float64) uint64 {
	b := math.Float64bits(x)
	if b>>63 != 0 {
		return ^b
	}
	return b | 1<<63
}

// fromOrderBits inverts orderBits.
func fromOrderBits(k uint64) float64 {
	if k>>63 != 0 {
		return math.Float64frombits(k &^ (1 << 63))
	}
	return math.Float64frombits(^k)
}

// radixSort sorts keys ascending by a stable least-significant-digit radix
// sort on 11-bit digits, carrying idx along when it is not nil; tmp and tmpIdx are
// buffers of the same lengths. A digit that every key shares is skipped, so
// numbers of one sign and magnitude take few passes. It does not allocate.
func radixSort(keys, tmp []uint64, idx, tmpIdx []int32) {
	n := len(keys)
	if n < 2 {
		return
	}
	const bits, mask = 11, 1<<11 - 1
	// Only the digits below the highest bit in which keys differ need a
	// pass: the keys are taken relative to their least.
	lo, hi := keys[0], keys[0]
	for _, k := range keys {
		lo, hi = min(lo, k), max(hi, k)
	}
	if lo == hi {
		return
	}
	for i := range keys {
		keys[i] -= lo
	}
	defer func() {
		for i := range keys {
			keys[i] += lo
		}
	}()
	top := uint(stdbits.Len64(hi - lo))
	var count [1 << bits]int
	src, dst := keys, tmp[:n]
	si, di := idx, tmpIdx
	for shift := uint(0); shift < top; shift += bits {
		count = [1 << bits]int{}
		for _, k := range src {
			count[(k>>shift)&mask]++
		}
		if count[(src[0]>>shift)&mask] == n {
			continue
		}
		pos := 0
		for b, c := range count {
			count[b] = pos
			pos += c
		}
		for i, k := range src {
			b := (k >> shift) & mask
			dst[count[b]] = k
			if si != nil {
				di[count[b]] = si[i]
			}
			count[b]++
		}
		src, dst = dst, src
		si, di = di, si
	}
	if &src[0] != &keys[0] {
		copy(keys, src)
		if idx != nil {
			copy(idx, si)
		}
	}
}
