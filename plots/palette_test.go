package plots

import (
	"fmt"
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

// BenchmarkRampAt times one colour of the ramp, over an even sweep of f.
func BenchmarkRampAt(b *testing.B) {
	var r Ramp
	const n = 1000
	var sink uint8
	i := 0
	for b.Loop() {
		c := r.At(float64(i%(n+1)) / n)
		sink += c.G
		i++
	}
	_ = sink
}
