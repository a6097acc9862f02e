package plots

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/plot/vg"
)

func TestRound125(t *testing.T) {
	// The 1–2–5 sequence of round values (common practice for axis ends);
	// values worked by hand.
	for _, c := range []struct {
		v, up, down float64
	}{{6.4, 10, 5}, {2.01, 5, 2}, {0.93, 1, 0.5}, {0.05, 0.05, 0.05}, {1, 1, 1}, {37, 50, 20}} {
		t.Run(fmt.Sprint(c.v), func(t *testing.T) {
			const tol = 1e-12
			if got := roundUp125(c.v); math.Abs(got-c.up) > tol*c.up {
				t.Errorf("roundUp125(%v) = %v, want %v", c.v, got, c.up)
			}
			if got := roundDown125(c.v); math.Abs(got-c.down) > tol*c.down {
				t.Errorf("roundDown125(%v) = %v, want %v", c.v, got, c.down)
			}
		})
	}
}

func TestLogTicks(t *testing.T) {
	// With room, every 1, 2 and 5 × 10ⁿ in the range (common practice for
	// a logarithmic axis); with less, fewer, never closer than the gap,
	// and 1 always among them.
	a := axisScale{lo: 0.5, hi: 10, log: true}
	const tol = 1e-12
	t.Run("room", func(t *testing.T) {
		got := logTicks(a, 300, 10)
		want := []float64{0.5, 1, 2, 5, 10}
		if len(got) != len(want) {
			t.Fatalf("%v, want %v", got, want)
		}
		for i := range want {
			if math.Abs(got[i].v-want[i]) > tol {
				t.Errorf("tick %d at %v, want %v", i, got[i].v, want[i])
			}
		}
	})
	for _, n := range []vg.Length{20, 40, 60, 90} {
		t.Run(fmt.Sprintf("%v pt", n), func(t *testing.T) {
			ts := logTicks(a, n, 10)
			if !spaced(a, ts, n, 10) {
				t.Errorf("%v: closer than 10 pt on %v pt", ts, n)
			}
			one := false
			for _, x := range ts {
				one = one || x.v == 1
			}
			if !one {
				t.Errorf("%v: no tick at 1", ts)
			}
		})
	}
}

func TestLinearTicks(t *testing.T) {
	// Seeded random ranges and axis lengths: ticks lie in the range, at
	// least the gap apart, at a step of 1, 2 or 5 × 10ⁿ, and there is one
	// at least.
	const (
		rangeTol = 1e-9 // relative to the range
		stepTol  = 1e-6 // on the step's mantissa
		// decadeTol keeps log10 of an exact power of ten from rounding down a decade.
		decadeTol = 1e-9
	)
	rng := rand.New(rand.NewPCG(7, 11))
	for trial := range 200 {
		lo := (rng.Float64() - 0.5) * math.Pow(10, 4*rng.Float64())
		hi := lo + math.Pow(10, 4*rng.Float64()-1)
		n := vg.Length(10 + 400*rng.Float64())
		gap := vg.Length(5 + 20*rng.Float64())
		a := axisScale{lo: lo, hi: hi}
		ts := linearTicks(a, n, gap)
		if len(ts) == 0 {
			t.Errorf("trial %d: no tick on [%v, %v]", trial, lo, hi)
			continue
		}
		if !spaced(a, ts, n, gap) {
			t.Errorf("trial %d: ticks %v closer than %v on %v", trial, ts, gap, n)
		}
		for _, x := range ts {
			if x.v < lo-rangeTol*(hi-lo) || x.v > hi+rangeTol*(hi-lo) {
				t.Errorf("trial %d: tick %v outside [%v, %v]", trial, x.v, lo, hi)
			}
		}
		if len(ts) > 1 {
			step := ts[1].v - ts[0].v
			m := step / math.Pow(10, math.Floor(math.Log10(step)+decadeTol))
			if math.Abs(m-1) > stepTol && math.Abs(m-2) > stepTol && math.Abs(m-5) > stepTol {
				t.Errorf("trial %d: step %v is not 1, 2 or 5 × 10ⁿ", trial, step)
			}
		}
	}
}

func TestFitText(t *testing.T) {
	sty := textStyle(8, false, ink)
	if got := fitText(sty, "S1", 100); got != "S1" {
		t.Errorf("short name changed to %q", got)
	}
	long := "a-very-long-plane-name-from-the-table"
	const widthTol = 1e-6 // pt
	got := fitText(sty, long, 40)
	if textWidth(sty, got) > 40+widthTol || []rune(got)[len([]rune(got))-1] != '…' {
		t.Errorf("fitText = %q (%v wide), want ≤ 40 pt ending in …", got, textWidth(sty, got))
	}
}
