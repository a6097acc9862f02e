package table

import (
	"bytes"
	"flag"
	"math"
	"math/big"
	"math/rand/v2"
	"strconv"
	"strings"
	"testing"
)

// long runs the long random comparison (10⁷ values in each of the seven
// families) in place of the default 1.5·10⁶ in each (1.05·10⁷ in all).
var long = flag.Bool("long", false, "compare AppendSig8 with strconv on 10⁷ random values per family")

// sig8Want is the reference: strconv's own 8-digit 'g' formatting (Go
// standard library, the reference implementation AppendSig8 must match byte
// for byte).
func sig8Want(b []byte, v float64) []byte { return strconv.AppendFloat(b, v, 'g', 8, 64) }

// sig8Checker compares AppendSig8 with strconv on many values without
// allocating per value, and stops the test after a few reported mismatches.
type sig8Checker struct {
	t         *testing.T
	got, want []byte
	n, bad    int
}

func (c *sig8Checker) check(v float64) {
	c.n++
	c.got = AppendSig8(c.got[:0], v)
	c.want = sig8Want(c.want[:0], v)
	if !bytes.Equal(c.got, c.want) {
		c.bad++
		c.t.Errorf("AppendSig8(%v) [bits %#016x] = %q, want %q", v, math.Float64bits(v), c.got, c.want)
		if c.bad >= 10 {
			c.t.FailNow()
		}
	}
}

// checkAround checks v and its n neighbours on each side (math.Nextafter).
func (c *sig8Checker) checkAround(v float64, n int) {
	c.check(v)
	up, down := v, v
	for range n {
		up, down = math.Nextafter(up, math.Inf(1)), math.Nextafter(down, math.Inf(-1))
		c.check(up)
		c.check(down)
	}
}

func TestAppendSig8Cases(t *testing.T) {
	// The formatting rules of %g with precision 8 (Go strconv documentation,
	// "%e for large exponents, %f otherwise", the exponent form used when the
	// exponent is < −4 or ≥ the precision; common practice of printf's %.8g),
	// written out by hand for each case (derived).
	for _, c := range []struct {
		name string
		v    float64
		want string
	}{
		{"zero", 0, "0"},
		{"negative zero", math.Copysign(0, -1), "-0"},
		{"NaN", math.NaN(), "NaN"},
		{"+Inf", math.Inf(1), "+Inf"},
		{"-Inf", math.Inf(-1), "-Inf"},
		{"one", 1, "1"},
		{"tenth", 0.1, "0.1"},
		{"negative", -2.5, "-2.5"},
		{"eight digits", 12345678, "12345678"},
		{"nine digits round", 123456789, "1.2345679e+08"},
		{"1e8", 1e8, "1e+08"},
		{"tie to even up", 99999999.5, "1e+08"},            // 9 odd → up, carries to 10⁸
		{"tie to even down", 12345678.5, "12345678"},       // exact binary tie, 8 even → down
		{"tie to even up 2", 12345677.5, "12345678"},       // 7 odd → up
		{"1e-4 positional", 0.0001, "0.0001"},              // exponent −4 stays positional
		{"1e-5 exponent", 0.00001, "1e-05"},                // exponent −5 switches
		{"round to 1e-4", 9.99999995e-5 + 1e-15, "0.0001"}, // rounds up into exponent −4
		{"1e21", 1e21, "1e+21"},
		{"pi", math.Pi, "3.1415927"},                         // π = 3.14159265358979… (memory)
		{"smallest subnormal", 5e-324, "4.9406565e-324"},     // 2⁻¹⁰⁷⁴ = 4.94065645841…e−324 (memory)
		{"largest float", math.MaxFloat64, "1.7976931e+308"}, // 1.7976931348623157e308 (memory)
		{"smallest normal", 0x1p-1022, "2.2250739e-308"},     // 2.2250738585072014e−308 (memory)
		{"third", 1.0 / 3, "0.33333333"},
		{"millions", 2345678.25, "2345678.2"}, // exact tie at the 8th digit, 2 even → down
		{"hundred", 100, "100"},
	} {
		t.Run(c.name, func(t *testing.T) {
			if got := string(AppendSig8(nil, c.v)); got != c.want {
				t.Errorf("AppendSig8(%v) = %q, want %q", c.v, got, c.want)
			}
			if got := string(sig8Want(nil, c.v)); got != c.want { // the hand-written case itself
				t.Errorf("strconv gives %q for %v: the case is wrong", got, c.v)
			}
		})
	}
}

func TestAppendSig8Appends(t *testing.T) {
	b := []byte("x=")
	if got := string(AppendSig8(b, -1.5e-7)); got != "x=-1.5e-07" {
		t.Errorf("got %q", got)
	}
}

// TestAppendSig8Exhaustive checks families of values that are not random:
// every binary exponent (powers of two, which test the decimal exponent
// estimate), every power of ten and every rounding boundary 9.99999995·10^k
// where the digit count or the form changes, each with neighbours.
func TestAppendSig8Exhaustive(t *testing.T) {
	c := &sig8Checker{t: t}
	t.Run("powers of two", func(t *testing.T) {
		c.t = t
		for e := -1074; e <= 1023; e++ {
			c.checkAround(math.Ldexp(1, e), 3)
			c.checkAround(-math.Ldexp(1.5, e-1), 1)
		}
	})
	t.Run("powers of ten", func(t *testing.T) {
		c.t = t
		for k := -323; k <= 308; k++ {
			v, _ := strconv.ParseFloat("1e"+strconv.Itoa(k), 64)
			c.checkAround(v, 20)
		}
	})
	t.Run("rounding boundaries", func(t *testing.T) {
		c.t = t
		for k := -324; k <= 308; k++ {
			for _, m := range []string{"9.99999995e", "9.9999999e", "1.00000005e", "1.00000015e", "9.99999985e"} {
				v, err := strconv.ParseFloat(m+strconv.Itoa(k), 64)
				if err != nil || v == 0 || math.IsInf(v, 0) {
					continue
				}
				c.checkAround(v, 20)
			}
		}
	})
	t.Run("form switch", func(t *testing.T) {
		c.t = t
		// 'g' switches form at decimal exponents −5/−4 and 7/8; the brief's
		// 1e21 is where the shortest form would switch: check all densely.
		rng := rand.New(rand.NewPCG(1, 2))
		for _, at := range []float64{1e-5, 1e-4, 1e7, 1e8, 1e21, 1e-6} {
			c.checkAround(at, 2000)
			for range 20000 {
				c.check(at * (0.99 + 0.02*rng.Float64()))
			}
		}
	})
	t.Logf("%d values", c.n)
}

// sig8Families are the families of random values for TestAppendSig8Random.
var sig8Families = []struct {
	name string
	gen  func(r *rand.Rand) float64
}{
	{"bit patterns", func(r *rand.Rand) float64 { return math.Float64frombits(r.Uint64()) }},
	{"subnormals", func(r *rand.Rand) float64 {
		return math.Float64frombits(r.Uint64() & (1<<63 | 1<<52 - 1))
	}},
	{"near ties", func(r *rand.Rand) float64 {
		// A 9-digit decimal ending in 5 (d.ddddddd5·10^k, as 1.23456785):
		// the nearest double is within an ulp of a rounding tie; or one of
		// its two nearest neighbours on either side.
		d := 1e7 + r.Uint64N(9e7)
		k := r.IntN(617) - 308
		v, err := strconv.ParseFloat(strconv.FormatUint(d, 10)+"5e"+strconv.Itoa(k-8), 64)
		if err != nil {
			return v
		}
		for range r.IntN(3) {
			v = math.Nextafter(v, math.Inf(int(r.Uint64N(2))*2-1))
		}
		return v
	}},
	{"exact ties", func(r *rand.Rand) float64 {
		// v = m·2⁻ˢ·10ᴱ with m·5ˢ a 9-digit decimal ending in 5 is exactly a
		// tie between two 8-digit roundings (derived: m·2⁻ˢ = m·5ˢ·10⁻ˢ).
		s := 1 + r.IntN(12)
		p5 := math.Pow(5, float64(s))
		lo, hi := math.Ceil(1e8/p5), math.Floor((1e9-1)/p5)
		if lo > hi {
			return 1.5
		}
		m := lo + math.Floor(r.Float64()*(hi-lo+1))
		if math.Mod(m, 2) == 0 {
			m++
			if m > hi {
				m -= 2
			}
		}
		e := r.IntN(8)
		return m * math.Ldexp(1, -s) * math.Pow(10, float64(e))
	}},
	{"integers", func(r *rand.Rand) float64 {
		return float64(r.Int64N(int64(1)<<(1+r.IntN(62)))) * float64(1-2*r.IntN(2))
	}},
	{"table values", func(r *rand.Rand) float64 {
		// Decimals of 1 to 17 digits at the magnitudes of tables:
		// stresses, angles, depths, tendencies.
		digits := r.Uint64N(uint64(math.Pow10(1 + r.IntN(17))))
		return float64(digits) * math.Pow10(-r.IntN(20))
	}},
	{"uniform magnitudes", func(r *rand.Rand) float64 {
		return math.Pow(10, 60*r.Float64()-30)
	}},
}

// TestAppendSig8Random compares AppendSig8 with strconv byte for byte on
// seeded random values of seven families: 1.5·10⁶ in each by default
// (about 2 s), 10⁷ in each with -long.
func TestAppendSig8Random(t *testing.T) {
	n := 1_500_000
	if *long {
		n = 10_000_000
	}
	for i, f := range sig8Families {
		t.Run(f.name, func(t *testing.T) {
			rng := rand.New(rand.NewPCG(2024, uint64(i)))
			c := &sig8Checker{t: t}
			for range n {
				c.check(f.gen(rng))
			}
			t.Logf("%d values", c.n)
		})
	}
}

// TestSig8ExactTies checks the "exact ties" family itself: its shortest
// exact decimal (strconv 'e', precision −1) has 9 significant digits ending
// in 5, so that the 8-digit rounding is a true tie.
func TestSig8ExactTies(t *testing.T) {
	rng := rand.New(rand.NewPCG(9, 9))
	for _, f := range sig8Families {
		if f.name != "exact ties" {
			continue
		}
		for range 10_000 {
			v := f.gen(rng)
			s := strconv.FormatFloat(v, 'e', -1, 64)
			mant := s[:strings.IndexByte(s, 'e')]
			if len(mant) != 10 || mant[9] != '5' { // "d.dddddddd5"
				t.Fatalf("%v (%s) is not a tie at 8 digits", v, s)
			}
		}
	}
}

// TestAppendSig8BigFloat compares AppendSig8 with math/big's own decimal
// conversion (an independent implementation in the Go standard library:
// big.Float.Text with the %g rules, exact binary value, ties to even) on
// seeded random values.
func TestAppendSig8BigFloat(t *testing.T) {
	rng := rand.New(rand.NewPCG(5, 6))
	var x big.Float
	for range 100_000 {
		v := math.Float64frombits(rng.Uint64())
		if rng.IntN(2) == 0 {
			v = math.Pow(10, 40*rng.Float64()-20)
		}
		if math.IsNaN(v) || math.IsInf(v, 0) {
			continue
		}
		want := x.SetFloat64(v).Text('g', 8)
		if got := string(AppendSig8(nil, v)); got != want {
			t.Fatalf("AppendSig8(%v) = %q, big.Float gives %q", v, got, want)
		}
	}
}

func TestAppendSig8NoAlloc(t *testing.T) {
	b := make([]byte, 0, 64)
	vs := []float64{1.2345678, -3e-9, 12345678.5, 0, 7e300}
	allocs := testing.AllocsPerRun(100, func() {
		for _, v := range vs {
			b = AppendSig8(b[:0], v)
		}
	})
	if allocs != 0 {
		t.Errorf("%v allocations per run, want 0", allocs)
	}
}

func FuzzAppendSig8(f *testing.F) {
	for _, v := range []float64{0, 1, -1.5, 12345678.5, 99999999.5, 1e-5, 9.99999995e-5, 1e21, 5e-324, math.MaxFloat64, math.Inf(1), math.NaN()} {
		f.Add(v)
	}
	f.Fuzz(func(t *testing.T, v float64) {
		got, want := AppendSig8(nil, v), sig8Want(nil, v)
		if !bytes.Equal(got, want) {
			t.Errorf("AppendSig8(%v) [bits %#016x] = %q, want %q", v, math.Float64bits(v), got, want)
		}
	})
}
