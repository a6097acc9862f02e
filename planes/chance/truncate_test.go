package chance

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// truncCase is a truncated distribution; rare marks an interval of so
// little probability that a rejection sampler cannot reach it.
type truncCase struct {
	name string
	d    Dist
	rare bool
}

// truncCases are truncated distributions covering both tails, the mirrored
// upper tail, one-sided bounds and bounds beyond the support.
func truncCases(t testing.TB) []truncCase {
	inf := math.Inf(1)
	n01 := must(NewNormal(0, 1))
	return []truncCase{
		{name: "normal [0,∞)", d: mustTrunc(t, n01, 0, inf)},
		{name: "normal [20,32]", d: mustTrunc(t, must(NewNormal(30, 5)), 20, 32)},
		{name: "normal [-4,-3]", d: mustTrunc(t, n01, -4, -3)},
		{name: "normal [3,4] mirrored", d: mustTrunc(t, n01, 3, 4)},
		{name: "normal [8,9] far tail", d: mustTrunc(t, n01, 8, 9), rare: true},
		{name: "normal (-∞,-1]", d: mustTrunc(t, n01, -inf, -1)},
		{name: "lognormal [0.8,2]", d: mustTrunc(t, must(NewLogNormal(1, 0.5)), 0.8, 2)},
		{name: "lognormal [-5,20]", d: mustTrunc(t, must(NewLogNormal(10, 0.3)), -5, 20)},
		{name: "uniform [0.2,2]", d: mustTrunc(t, must(NewUniform(0, 1)), 0.2, 2)},
		{name: "triangular [0.5,3]", d: mustTrunc(t, must(NewTriangular(0, 1, 4)), 0.5, 3)},
		{name: "triangular mode low [0.5,2]", d: mustTrunc(t, must(NewTriangular(0, 0, 1)), 0.5, 2)},
		{name: "triangular mode high [-1,0.5]", d: mustTrunc(t, must(NewTriangular(0, 1, 1)), -1, 0.5)},
		{name: "triangular right of mode [2,3]", d: mustTrunc(t, must(NewTriangular(0, 1, 4)), 2, 3)},
	}
}

func TestTruncationEqualsRedrawing(t *testing.T) {
	// The rule "a sample outside the valid range is redrawn" and our
	// restricted inverse CDF must give the same distribution: a two-sample
	// Kolmogorov–Smirnov test between rejection draws from the untruncated
	// Dist and Quantile draws from the truncated one. Critical value
	// D = c(α)·√((n+m)/(nm)), c(0.001) = 1.95 (Smirnov's table; common
	// practice), seeded so the outcome is fixed.
	const n = 20000
	const c001 = 1.95
	rng := rand.New(rand.NewPCG(7, 8))
	for _, c := range truncCases(t) {
		if c.rare {
			continue
		}
		t.Run(c.name, func(t *testing.T) {
			lo, hi := c.d.Bounds()
			base := c.d
			base.truncated, base.fa, base.fb, base.mirror = false, 0, 1, false
			redrawn := make([]float64, 0, n)
			for len(redrawn) < n {
				if x := base.Quantile(openUniform(rng)); x >= lo && x <= hi {
					redrawn = append(redrawn, x)
				}
			}
			direct := make([]float64, n)
			for i := range direct {
				direct[i] = c.d.Quantile(openUniform(rng))
			}
			if d, crit := ks2(redrawn, direct), c001*math.Sqrt(2.0/n); d > crit {
				t.Errorf("KS distance %.4f > %.4f", d, crit)
			}
		})
	}
}

// ks2 returns the two-sample Kolmogorov–Smirnov distance (it sorts a and b).
func ks2(a, b []float64) float64 {
	sortFloats(a)
	sortFloats(b)
	i, j, d := 0, 0, 0.0
	for i < len(a) && j < len(b) {
		x := math.Min(a[i], b[j])
		for i < len(a) && a[i] == x {
			i++
		}
		for j < len(b) && b[j] == x {
			j++
		}
		d = math.Max(d, math.Abs(float64(i)/float64(len(a))-float64(j)/float64(len(b))))
	}
	return d
}

func TestCDFInvertsQuantile(t *testing.T) {
	const tol = 1e-9
	for _, c := range truncCases(t) {
		t.Run(c.name, func(t *testing.T) {
			for _, u := range []float64{0.001, 0.1, 0.5, 0.9, 0.999} {
				if f := c.d.CDF(c.d.Quantile(u)); !scalar.EqualWithinAbs(f, u, tol) {
					t.Errorf("CDF(Quantile(%v)) = %v", u, f)
				}
			}
		})
	}
}

func TestTruncateReplacesBounds(t *testing.T) {
	d := must(NewNormal(0, 1))
	twice := mustTrunc(t, mustTrunc(t, d, 0, 1), -1, 2)
	once := mustTrunc(t, d, -1, 2)
	if twice != once {
		t.Errorf("second Truncate kept the first bounds: %+v vs %+v", twice, once)
	}
}
