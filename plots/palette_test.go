package plots

import (
	"fmt"
	"image/color"
	"math"
	"math/rand/v2"
	"testing"
)

func TestRampLightnessMonotone(t *testing.T) {
	// The order of values must read from lightness alone (grey print,
	// colour-vision deficiency): OKLab L strictly increasing, in nearly equal
	// steps (perceptual uniformity of the lightness channel).
	var r Ramp
	const n = 64
	prev := -1.0
	var steps []float64
	for i := 0; i <= n; i++ {
		l := oklabL(r.At(float64(i) / n))
		if l <= prev {
			t.Fatalf("lightness not increasing at %d/%d: %v after %v", i, n, l, prev)
		}
		if i > 0 {
			steps = append(steps, l-prev)
		}
		prev = l
	}
	want := (rampL1 - rampL0) / n
	for i, s := range steps {
		if s < 0.5*want || s > 1.5*want {
			t.Errorf("step %d: ΔL %v, want about %v", i, s, want)
		}
	}
}

func ExampleRamp() {
	var r Ramp
	for _, f := range []float64{0, 0.5, 1} {
		c := r.At(f)
		fmt.Printf("%.1f #%02x%02x%02x\n", f, c.R, c.G, c.B)
	}
	// Output:
	// 0.0 #242142
	// 0.5 #009592
	// 1.0 #f4edc0
}

// rampAtReference is Ramp.At as it was before the ramp was tabulated, kept
// verbatim (with its 8-bit conversion) as the reference for the table: the
// exact colour, its chroma cut to the sRGB gamut by bisection.
func rampAtReference(f float64) color.NRGBA {
	f = math.Max(0, math.Min(1, f))
	l := rampL0 + (rampL1-rampL0)*f
	h := (rampH0 + (rampH1-rampH0)*f) * math.Pi / 180
	c := rampC * math.Sin(math.Pi*(0.15+0.7*f))
	lo, hi := 0.0, c
	if _, ok := oklchToSRGBReference(l, hi, h); !ok {
		for range 30 {
			mid := 0.5 * (lo + hi)
			if _, ok := oklchToSRGBReference(l, mid, h); ok {
				lo = mid
			} else {
				hi = mid
			}
		}
		c = lo
	}
	rgb, _ := oklchToSRGBReference(l, c, h)
	return color.NRGBA{R: rgb[0], G: rgb[1], B: rgb[2], A: 255}
}

// oklchToSRGBReference is the former 8-bit OKLCh → sRGB conversion
// (Ottosson 2020 matrices; sRGB transfer function of IEC 61966-2-1).
func oklchToSRGBReference(l, c, h float64) ([3]uint8, bool) {
	a, b := c*math.Cos(h), c*math.Sin(h)
	l_ := l + 0.3963377774*a + 0.2158037573*b
	m_ := l - 0.1055613458*a - 0.0638541728*b
	s_ := l - 0.0894841775*a - 1.2914855480*b
	L, M, S := l_*l_*l_, m_*m_*m_, s_*s_*s_
	lin := [3]float64{
		+4.0767416621*L - 3.3077115913*M + 0.2309699292*S,
		-1.2684380046*L + 2.6097574011*M - 0.3413193965*S,
		-0.0041960863*L - 0.7034186147*M + 1.7076147010*S,
	}
	var out [3]uint8
	ok := true
	const gamutTol = 1e-9 // linear sRGB this far outside [0, 1] is rounding, not out of gamut
	for i, v := range lin {
		if v < -gamutTol || v > 1+gamutTol {
			ok = false
		}
		v = math.Max(0, math.Min(1, v))
		if v <= 0.0031308 {
			v *= 12.92
		} else {
			v = 1.055*math.Pow(v, 1/2.4) - 0.055
		}
		out[i] = uint8(math.Round(v * 255))
	}
	return out, ok
}

// rampDiff returns the largest channel difference between two colours.
func rampDiff(a, b color.NRGBA) int {
	d := 0
	for _, p := range [][2]uint8{{a.R, b.R}, {a.G, b.G}, {a.B, b.B}, {a.A, b.A}} {
		d = max(d, int(p[0])-int(p[1]), int(p[1])-int(p[0]))
	}
	return d
}

func TestRampTable(t *testing.T) {
	// The tabulated ramp against the exact one it replaced (rampAtReference):
	// at most 1 apart in any 8-bit channel anywhere in [0, 1], equal at the
	// table's nodes.
	const maxDiff = 1 // 8-bit units, the brief's bound
	var r Ramp
	t.Run("nodes", func(t *testing.T) {
		for i := 0; i <= rampSteps; i++ {
			f := float64(i) / rampSteps
			if got, want := r.At(f), rampAtReference(f); got != want {
				t.Errorf("At(%d/%d) = %v, want %v", i, rampSteps, got, want)
			}
		}
	})
	t.Run("dense sweep", func(t *testing.T) {
		const n = 300_000
		rng := rand.New(rand.NewPCG(17, 29))
		differ := 0
		check := func(f float64) {
			got, want := r.At(f), rampAtReference(f)
			if d := rampDiff(got, want); d > maxDiff {
				t.Fatalf("At(%v) = %v, exact %v: %d apart", f, got, want, d)
			} else if d > 0 {
				differ++
			}
		}
		for i := range n {
			check(float64(i) / n) // even steps, off the nodes
			check(rng.Float64())  // seeded random fractions
		}
		// Where the red channel leaves 0 (f ≈ 0.5976) and where the gamut
		// starts to cut the chroma (f ≈ 0.2136) the exact ramp bends
		// sharply: sweep those finely.
		for _, at := range []float64{0.2136, 0.5976} {
			for i := range 20_000 {
				check(at - 1e-3 + 1e-7*float64(i))
			}
		}
		t.Logf("%d of %d colours differ by 1 from the exact ramp", differ, 2*n+40_000)
	})
}

func TestRampAtNoAlloc(t *testing.T) {
	var r Ramp
	if a := testing.AllocsPerRun(100, func() { _ = r.At(0.3) }); a != 0 {
		t.Errorf("%v allocations per call, want 0", a)
	}
}

// BenchmarkRampAt times one colour of the ramp, over an even sweep of f:
// "table" is Ramp.At, "exact" the bisection it replaced.
func BenchmarkRampAt(b *testing.B) {
	for _, c := range []struct {
		name string
		at   func(float64) color.NRGBA
	}{{"table", Ramp{}.At}, {"exact", rampAtReference}} {
		b.Run(c.name, func(b *testing.B) {
			const n = 1000
			var sink uint8
			i := 0
			for b.Loop() {
				sink += c.at(float64(i%(n+1)) / n).G
				i++
			}
			_ = sink
		})
	}
}

// BenchmarkRampTable times building the table (once per process).
func BenchmarkRampTable(b *testing.B) {
	for b.Loop() {
		t := new([rampSteps + 1][3]float64)
		for i := range t {
			t[i] = rampExact(float64(i) / rampSteps)
		}
	}
}
