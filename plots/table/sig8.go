package table

import (
	"encoding/binary"
	"math"
	"math/bits"
	"strconv"
)

// AppendSig8 appends v with 8 significant digits to b and returns the
// extended buffer. The bytes are exactly those of
//
//	strconv.AppendFloat(b, v, 'g', 8, 64)
//
// for every float64 v, NaN, ±Inf and −0 included: the shortest of at most 8
// correctly rounded significant digits (ties to even), trailing zeros
// dropped, in positional form for decimal exponents −4 … 7 and as d.ddde±XX
// otherwise.
//
// The digits come from one floating-point scaling,
//
//	x = |v|·10^(7−k) ∈ [10⁷, 10⁸),  digits = round(x),
//
// whose error is below 5·10⁻⁸ (at most four roundings of 2⁻⁵³ each, see
// sig8Scale). When x lies within sig8Margin of a rounding tie the error could
// decide the rounding, and so could an exact tie, so those values, NaN and
// ±Inf go to strconv. AppendSig8 does not allocate beyond growing b.
func AppendSig8(b []byte, v float64) []byte {
	u := math.Float64bits(v)
	be := int(u>>52) & 0x7ff
	m := u & (1<<52 - 1)
	var e int // ⌊log₂|v|⌋
	switch {
	case be == 0x7ff:
		return strconv.AppendFloat(b, v, 'g', 8, 64)
	case be != 0:
		e = be - 1023
	case m == 0:
		if u>>63 != 0 {
			return append(b, '-', '0')
		}
		return append(b, '0')
	default: // subnormal
		e = -1011 - bits.LeadingZeros64(m)
	}
	a := math.Abs(v)
	// k0 = ⌊e·log₁₀2⌋ ≤ ⌊log₁₀|v|⌋ ≤ k0 + 1 (exact for |e| < 1650; Adams
	// 2018, the Ryu paper), so the first x lies in [10⁷, 10⁹).
	p := 7 - (e*78913)>>18
	x := sig8Scale(a, p)
	if x >= 1e8 {
		p--
		x = sig8Scale(a, p)
	}
	if x < 1e7-1 {
		// Cannot happen by the bound on k0; kept as a guard.
		return strconv.AppendFloat(b, v, 'g', 8, 64)
	}
	q := uint64(x)
	frac := x - float64(q) // exact: x < 2⁵³
	if frac > 0.5-sig8Margin && frac < 0.5+sig8Margin {
		return strconv.AppendFloat(b, v, 'g', 8, 64)
	}
	if frac > 0.5 {
		q++
	}
	if q >= 1e8 { // 99999999.5… rounded up to 10⁸
		q /= 10
		p--
	}
	var d [8]byte
	hi, lo := uint32(q/10000), uint32(q%10000)
	i0, i1, i2, i3 := 2*(hi/100), 2*(hi%100), 2*(lo/100), 2*(lo%100)
	d[0], d[1] = digitPairs[i0], digitPairs[i0+1]
	d[2], d[3] = digitPairs[i1], digitPairs[i1+1]
	d[4], d[5] = digitPairs[i2], digitPairs[i2+1]
	d[6], d[7] = digitPairs[i3], digitPairs[i3+1]
	// Trailing zeros are the high zero bytes of the little-endian word
	// less '0' in every byte; d[0] ≠ '0' since q ≥ 10⁷.
	nd := 8 - bits.LeadingZeros64(binary.LittleEndian.Uint64(d[:])^0x3030303030303030)/8
	if u>>63 != 0 {
		b = append(b, '-')
	}
	k := 7 - p // decimal exponent of the first digit
	switch {
	case k < -4 || k > 7:
		b = append(b, d[0])
		if nd > 1 {
			b = append(b, '.')
			b = append(b, d[1:nd]...)
		}
		b = append(b, 'e')
		if k < 0 {
			b = append(b, '-')
			k = -k
		} else {
			b = append(b, '+')
		}
		if k >= 100 {
			b = append(b, byte('0'+k/100))
			k %= 100
		}
		return append(b, digitPairs[2*k:2*k+2]...)
	case k < 0:
		b = append(b, "0.0000"[:1-k]...)
		return append(b, d[:nd]...)
	case nd <= k+1:
		b = append(b, d[:nd]...)
		return append(b, "0000000"[:k+1-nd]...)
	default:
		b = append(b, d[:k+1]...)
		b = append(b, '.')
		return append(b, d[k+1:nd]...)
	}
}

// sig8Margin is how close to a rounding tie the scaled value may come before
// AppendSig8 leaves the value to strconv: 20 times the largest error of
// sig8Scale at x < 10⁸ (4·2⁻⁵³·10⁸ ≈ 4.4·10⁻⁸).
const sig8Margin = 1e-6

// sig8Scale returns a·10^p for a > 0 with |p| ≤ 331 and a·10^p < 10⁹,
// with relative error at most 4·2⁻⁵³: the power of ten is the correctly
// rounded float64 (error ≤ 2⁻⁵³, none for 0 ≤ p ≤ 22), the product adds
// one rounding, and for p > 308 (only |v| < 10⁻³⁰⁰, subnormals among them)
// the scaling is done in two steps through 10³⁰⁰ so that no factor
// overflows or loses precision, adding two more.
func sig8Scale(a float64, p int) float64 {
	if p > sig8MaxPow {
		return a * sig8Pow10[300-sig8MinPow] * sig8Pow10[p-300-sig8MinPow]
	}
	return a * sig8Pow10[p-sig8MinPow]
}

// The powers of ten of sig8Scale: 10^p, p ∈ [sig8MinPow, sig8MaxPow], each
// the correctly rounded float64 (strconv.ParseFloat rounds correctly), all
// normal numbers.
const sig8MinPow, sig8MaxPow = -303, 308

var sig8Pow10 = func() (t [sig8MaxPow - sig8MinPow + 1]float64) {
	for i := range t {
		f, err := strconv.ParseFloat("1e"+strconv.Itoa(i+sig8MinPow), 64)
		if err != nil {
			panic("table: " + err.Error())
		}
		t[i] = f
	}
	return t
}()

// digitPairs holds "00" … "99".
const digitPairs = "00010203040506070809" +
	"10111213141516171819" +
	"20212223242526272829" +
	"30313233343536373839" +
	"40414243444546474849" +
	"50515253545556575859" +
	"60616263646566676869" +
	"70717273747576777879" +
	"80818283848586878889" +
	"90919293949596979899"
