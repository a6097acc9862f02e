package chance

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/stat"
)

func TestSpearmanWorkedExamples(t *testing.T) {
	const tol = 1e-12
	inf := math.Inf(1)
	for _, c := range []struct {
		name string
		x, y []float64
		want float64
	}{
		// IQ against hours of television per week, ten people, no ties:
		// Σd² = 194, ρ = 1 − 6·194/(10·99) = −29/165 (worked example of
		// the Wikipedia article "Spearman's rank correlation coefficient";
		// memory).
		{"no ties",
			[]float64{106, 100, 86, 101, 99, 103, 97, 113, 112, 110},
			[]float64{7, 27, 2, 50, 28, 29, 20, 12, 6, 17},
			-29.0 / 165},
		// Derived by hand with mid-ranks: x ranks 1, 2.5, 2.5, 4, 5 and y
		// ranks 2, 1, 3.5, 3.5, 5; deviations from 3 give Σdxdy = 7.25 and
		// Σdx² = Σdy² = 9.5, so ρ = 7.25/9.5 = 29/38.
		{"ties", []float64{1, 2, 2, 3, 4}, []float64{2, 1, 4, 4, 5}, 29.0 / 38},
		// The same with the extremes of x and the top of y moved to ±Inf:
		// only the order matters (derived).
		{"infinities", []float64{-inf, 2, 2, 3, inf}, []float64{2, 1, 4, 4, inf}, 29.0 / 38},
		// Tied −Inf (two undefined outputs) against a plain order: x ranks
		// 1.5, 1.5, 3, 4 and y ranks 1…4; deviations from 2.5 give
		// Σdxdy = 1.5 + 0.5 + 0.25 + 2.25 = 4.5, Σdx² = 4.5, Σdy² = 5,
		// so ρ = 4.5/√22.5 (derived by hand).
		{"tied −Inf", []float64{-inf, -inf, 1, 2}, []float64{1, 2, 3, 4}, 4.5 / math.Sqrt(22.5)},
	} {
		t.Run(c.name, func(t *testing.T) {
			if got := Spearman(c.x, c.y); !scalar.EqualWithinAbs(got, c.want, tol) {
				t.Errorf("ρ = %v, want %v", got, c.want)
			}
		})
	}
}

func TestRanksMidRanksAndInfinities(t *testing.T) {
	inf := math.Inf(1)
	got, ok := Ranks(nil, []float64{3, -inf, 1, -inf, 2, inf, 2})
	// Derived: −Inf, −Inf → 1.5; 1 → 3; 2, 2 → 4.5; 3 → 6; +Inf → 7.
	want := []float64{6, 1.5, 3, 1.5, 4.5, 7, 4.5}
	if !ok || !slices.Equal(got, want) {
		t.Errorf("ranks %v, want %v", got, want)
	}
	if _, ok := Ranks(nil, []float64{1, math.NaN()}); ok {
		t.Error("NaN ranked")
	}
}

// bruteRanks ranks by counting, a different derivation of mid-ranks:
// rank(xᵢ) = #{xⱼ < xᵢ} + (#{xⱼ = xᵢ} + 1)/2.
func bruteRanks(x []float64) []float64 {
	r := make([]float64, len(x))
	for i, v := range x {
		less, eq := 0, 0
		for _, w := range x {
			switch {
			case w < v:
				less++
			case w == v:
				eq++
			}
		}
		r[i] = float64(less) + float64(eq+1)/2
	}
	return r
}

func TestSpearmanAgainstGonumPearsonOfRanks(t *testing.T) {
	// Spearman's ρ is the Pearson correlation of the mid-ranks (Spearman
	// 1904; Kendall & Gibbons 1990, memory): gonum's stat.Correlation of
	// ranks counted by brute force, on seeded data rounded to force ties and
	// with −Inf entries standing for undefined outputs.
	const tol = 1e-12
	rng := rand.New(rand.NewPCG(21, 22))
	for trial := range 20 {
		n := 5 + trial*7
		x, y := make([]float64, n), make([]float64, n)
		for i := range x {
			x[i] = math.Round(rng.NormFloat64() * 3)
			y[i] = math.Round(x[i] + rng.NormFloat64()*4)
			if rng.IntN(10) == 0 {
				y[i] = math.Inf(-1)
			}
		}
		want := stat.Correlation(bruteRanks(x), bruteRanks(y), nil)
		if got := Spearman(x, y); !scalar.EqualWithinAbs(got, want, tol) {
			t.Errorf("n = %d: ρ = %v, Pearson of ranks %v", n, got, want)
		}
	}
}

func TestSpearmanProperties(t *testing.T) {
	const tol = 1e-12
	rng := rand.New(rand.NewPCG(23, 24))
	x, y := make([]float64, 500), make([]float64, 500)
	for i := range x {
		x[i] = rng.NormFloat64()
		y[i] = x[i] + rng.NormFloat64()
	}
	rho := Spearman(x, y)
	t.Run("monotone transform", func(t *testing.T) {
		ex := make([]float64, len(x))
		for i, v := range x {
			ex[i] = math.Exp(v)
		}
		if got := Spearman(ex, y); !scalar.EqualWithinAbs(got, rho, tol) {
			t.Errorf("ρ(exp x, y) = %v, ρ(x, y) = %v", got, rho)
		}
	})
	t.Run("reversal", func(t *testing.T) {
		nx := make([]float64, len(x))
		for i, v := range x {
			nx[i] = -v
		}
		if got := Spearman(nx, y); !scalar.EqualWithinAbs(got, -rho, tol) {
			t.Errorf("ρ(−x, y) = %v, want %v", got, -rho)
		}
	})
	t.Run("undefined", func(t *testing.T) {
		for name, c := range map[string][2][]float64{
			"NaN":      {{1, 2, math.NaN()}, {1, 2, 3}},
			"constant": {{1, 1, 1}, {1, 2, 3}},
			"one":      {{1}, {2}},
		} {
			if got := Spearman(c[0], c[1]); !math.IsNaN(got) {
				t.Errorf("%s: ρ = %v, want NaN", name, got)
			}
		}
	})
	t.Run("lengths", func(t *testing.T) {
		wantPanic(t, func() { Spearman([]float64{1, 2}, []float64{1}) })
	})
}
