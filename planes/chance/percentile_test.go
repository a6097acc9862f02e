package chance

import (
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestPercentileType7(t *testing.T) {
	const tol = 1e-12
	ninf := math.Inf(-1)
	nan := math.NaN()
	for _, c := range []struct {
		name string
		x    []float64
		p    float64
		want float64
	}{
		// numpy.percentile([1, 2, 3, 4], 25) = 1.75 (NumPy's default, type 7; memory).
		{"numpy 25 %", []float64{1, 2, 3, 4}, 0.25, 1.75},
		// Hyndman & Fan (1996) type 7, derived: h = 3·0.5 = 1.5 → 2.5; h = 2.7 → 3.7.
		{"median of four", []float64{1, 2, 3, 4}, 0.5, 2.5},
		{"90 %", []float64{1, 2, 3, 4}, 0.9, 3.7},
		// R: quantile(1:10, 0.1) = 1.9 (R's default, type 7; memory).
		{"R 10 %", []float64{1, 2, 3, 4, 5, 6, 7, 8, 9, 10}, 0.1, 1.9},
		{"minimum", []float64{1, 2, 3, 4}, 0, 1},
		{"maximum", []float64{1, 2, 3, 4}, 1, 4},
		{"one value", []float64{7}, 0.3, 7},
		{"empty", nil, 0.5, nan},
		// FS undefined as −Inf, derived: n = 5, h = 4p.
		{"on −Inf", []float64{ninf, ninf, 1, 2, 3}, 0.25, nan},       // h = 1, x[1] = −Inf
		{"next to −Inf", []float64{ninf, ninf, 1, 2, 3}, 0.375, nan}, // h = 1.5, between −Inf and 1
		{"past −Inf", []float64{ninf, ninf, 1, 2, 3}, 0.5, 1},        // h = 2
		{"above −Inf", []float64{ninf, ninf, 1, 2, 3}, 0.625, 1.5},   // h = 2.5
		{"all −Inf", []float64{ninf, ninf}, 0.5, nan},
		{"+Inf top", []float64{1, 2, math.Inf(1)}, 1, nan},
	} {
		t.Run(c.name, func(t *testing.T) {
			got := Percentile(c.x, c.p)
			if math.IsNaN(c.want) {
				if !math.IsNaN(got) {
					t.Errorf("got %v, want NaN", got)
				}
				return
			}
			if !scalar.EqualWithinAbs(got, c.want, tol) {
				t.Errorf("got %v, want %v", got, c.want)
			}
		})
	}
	t.Run("panics", func(t *testing.T) {
		wantPanic(t, func() { Percentile([]float64{1, 2}, 1.5) })
		wantPanic(t, func() { Percentile([]float64{1, 2}, math.NaN()) })
		wantPanic(t, func() { Percentile([]float64{2, 1}, 0.5) })
		wantPanic(t, func() { Percentile([]float64{1, math.NaN(), 2}, 0.5) })
	})
}

func TestPercentilesOfADrawMatchTheQuantile(t *testing.T) {
	// The sample p-quantile of n draws converges to the distribution's
	// quantile with standard error √(p(1 − p)/n)/f(Q(p)) (Cramér 1946;
	// memory): 5 standard errors for a normal N(30, 4), f from the density.
	const n = 20000
	d := must(NewNormal(30, 4))
	x, err := Draw([]Dist{d}, nil, n, 77)
	if err != nil {
		t.Fatal(err)
	}
	col := slices.Clone(x.RawMatrix().Data)
	ps := []float64{0.05, 0.1, 0.5, 0.9, 0.95}
	got := Percentiles(nil, col, ps)
	if !slices.Equal(col, x.RawMatrix().Data) {
		t.Error("Percentiles changed its input")
	}
	for i, p := range ps {
		q := d.Quantile(p)
		f := normalPDF((q-30)/4) / 4
		se := math.Sqrt(p*(1-p)/n) / f
		if math.Abs(got[i]-q) > 5*se {
			t.Errorf("p = %v: %v, want %v ± %v", p, got[i], q, 5*se)
		}
	}
}

func TestStdErr(t *testing.T) {
	const tol = 1e-15
	// Derived: √(0.5·0.5/10000) = 0.005; √(0.2·0.8/400) = 0.02.
	for _, c := range []struct {
		p    float64
		n    int
		want float64
	}{{0.5, 10000, 0.005}, {0.2, 400, 0.02}, {0, 100, 0}, {1, 100, 0}} {
		t.Run(fmt.Sprintf("p=%g,n=%d", c.p, c.n), func(t *testing.T) {
			if got := StdErr(c.p, c.n); !scalar.EqualWithinAbs(got, c.want, tol) {
				t.Errorf("StdErr = %v, want %v", got, c.want)
			}
		})
	}
	t.Run("simulated spread", func(t *testing.T) {
		// A different derivation: the spread of p̂ over 4000 seeded runs of
		// n = 400 Bernoulli(0.2) trials. The sample sd of 4000 values is
		// within 5 % of the truth with overwhelming probability (its relative
		// sd is ≈ 1/√(2·4000) = 1.1 %).
		const (
			runs, n, p = 4000, 400, 0.2
			relTol     = 0.05
		)
		rng := rand.New(rand.NewPCG(31, 32))
		s, s2 := 0.0, 0.0
		for range runs {
			hits := 0
			for range n {
				if rng.Float64() < p {
					hits++
				}
			}
			ph := float64(hits) / n
			s += ph
			s2 += ph * ph
		}
		sd := math.Sqrt((s2 - s*s/runs) / (runs - 1))
		if want := StdErr(p, n); math.Abs(sd/want-1) > relTol {
			t.Errorf("simulated sd %v, StdErr %v", sd, want)
		}
	})
	t.Run("panics", func(t *testing.T) {
		wantPanic(t, func() { StdErr(1.2, 10) })
		wantPanic(t, func() { StdErr(0.5, 0) })
	})
}
