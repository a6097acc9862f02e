package chance

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/stat/distuv"
)

// must returns d, panicking on a construction error in a test's fixed data.
func must(d Dist, err error) Dist {
	if err != nil {
		panic(err)
	}
	return d
}

func mustTrunc(t testing.TB, d Dist, min, max float64) Dist {
	t.Helper()
	d, err := d.Truncate(min, max)
	if err != nil {
		t.Fatal(err)
	}
	return d
}

func wantPanic(t *testing.T, f func()) {
	t.Helper()
	defer func() {
		t.Helper()
		r := recover()
		if r == nil {
			t.Fatal("no panic")
		}
		if s, ok := r.(string); !ok || !strings.HasPrefix(s, "chance: ") {
			t.Fatalf("panic %v does not start with the package name", r)
		}
	}()
	f()
}

func TestDistErrors(t *testing.T) {
	inf := math.Inf(1)
	n01, _ := NewNormal(0, 1)
	u01, _ := NewUniform(0, 1)
	ln, _ := NewLogNormal(1, 0.5)
	n50, _ := NewNormal(5, 0)
	for _, c := range []struct {
		name string
		err  error
		want error
	}{
		{"normal sd<0", second(NewNormal(0, -1)), ErrSpread},
		{"normal NaN mean", second(NewNormal(math.NaN(), 1)), ErrNotFinite},
		{"normal Inf sd", second(NewNormal(0, inf)), ErrNotFinite},
		{"lognormal median 0", second(NewLogNormal(0, 1)), ErrMedian},
		{"lognormal median<0", second(NewLogNormal(-2, 1)), ErrMedian},
		{"lognormal sd<0", second(NewLogNormal(1, -0.1)), ErrSpread},
		{"uniform low>high", second(NewUniform(2, 1)), ErrOrder},
		{"triangular low>high", second(NewTriangular(2, 1.5, 1)), ErrOrder},
		{"triangular mode>high", second(NewTriangular(0, 2, 1)), ErrMode},
		{"triangular mode<low", second(NewTriangular(0, -1, 1)), ErrMode},
		{"fixed Inf", second(NewFixed(inf)), ErrNotFinite},
		{"min=max", second(n01.Truncate(1, 1)), ErrBounds},
		{"min>max", second(n01.Truncate(2, 1)), ErrBounds},
		{"NaN bound", second(n01.Truncate(math.NaN(), 1)), ErrNotFinite},
		{"normal far tail", second(n01.Truncate(40, 50)), ErrEmpty},
		{"uniform outside", second(u01.Truncate(2, 3)), ErrEmpty},
		{"lognormal below 0", second(ln.Truncate(-2, -1)), ErrEmpty},
		{"constant outside", second(n50.Truncate(0, 1)), ErrEmpty},
	} {
		t.Run(c.name, func(t *testing.T) {
			if !errors.Is(c.err, c.want) {
				t.Errorf("error %v, want %v", c.err, c.want)
			}
		})
	}
}

func second(_ Dist, err error) error { return err }

func TestZeroSpreadIsTheConstant(t *testing.T) {
	for _, c := range []struct {
		name string
		d    Dist
		want float64
	}{
		{"zero Dist", Dist{}, 0},
		{"fixed", must(NewFixed(-2.5)), -2.5},
		{"normal sd 0", must(NewNormal(3, 0)), 3},
		{"lognormal sd 0", must(NewLogNormal(2, 0)), 2},
		{"uniform low=high", must(NewUniform(4, 4)), 4},
		{"triangular low=high", must(NewTriangular(1, 1, 1)), 1},
		{"truncated normal sd 0", mustTrunc(t, must(NewNormal(3, 0)), 0, 10), 3},
	} {
		t.Run(c.name, func(t *testing.T) {
			for _, u := range []float64{0, 0.3, 1} {
				if q := c.d.Quantile(u); q != c.want {
					t.Errorf("Quantile(%v) = %v, want %v", u, q, c.want)
				}
			}
			if m, v := c.d.Mean(), c.d.Variance(); m != c.want || v != 0 {
				t.Errorf("mean %v, variance %v, want %v and 0", m, v, c.want)
			}
		})
	}
}

func TestQuantileAndCDFAgainstGonum(t *testing.T) {
	// The reference library gonum/stat/distuv, parameterised independently:
	// the lognormal by μ = ln median, σ = sd of ln; the triangle by (low,
	// high, mode).
	const tol = 1e-12
	for _, c := range []struct {
		name string
		d    Dist
		ref  distuv.Quantiler
		cdf  func(float64) float64
	}{
		{"normal", must(NewNormal(30, 4)), distuv.Normal{Mu: 30, Sigma: 4}, distuv.Normal{Mu: 30, Sigma: 4}.CDF},
		{"lognormal", must(NewLogNormal(2.5, 0.4)), distuv.LogNormal{Mu: math.Log(2.5), Sigma: 0.4}, distuv.LogNormal{Mu: math.Log(2.5), Sigma: 0.4}.CDF},
		{"uniform", must(NewUniform(0.5, 0.8)), distuv.Uniform{Min: 0.5, Max: 0.8}, distuv.Uniform{Min: 0.5, Max: 0.8}.CDF},
		{"triangular", must(NewTriangular(20, 25, 40)), distuv.NewTriangle(20, 40, 25, nil), distuv.NewTriangle(20, 40, 25, nil).CDF},
		{"triangular mode at low", must(NewTriangular(0, 0, 2)), distuv.NewTriangle(0, 2, 0, nil), distuv.NewTriangle(0, 2, 0, nil).CDF},
		{"triangular mode at high", must(NewTriangular(0, 2, 2)), distuv.NewTriangle(0, 2, 2, nil), distuv.NewTriangle(0, 2, 2, nil).CDF},
	} {
		t.Run(c.name, func(t *testing.T) {
			for _, u := range []float64{1e-9, 0.01, 0.2, 0.5, 0.77, 0.99, 1 - 1e-9} {
				q, want := c.d.Quantile(u), c.ref.Quantile(u)
				if !scalar.EqualWithinAbsOrRel(q, want, tol, tol) {
					t.Errorf("Quantile(%v) = %v, gonum %v", u, q, want)
				}
				if f, want := c.d.CDF(q), c.cdf(q); !scalar.EqualWithinAbsOrRel(f, want, tol, 1e-9) {
					t.Errorf("CDF(%v) = %v, gonum %v", q, f, want)
				}
			}
		})
	}
}

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

func TestMomentsAgainstQuadratureOfQuantile(t *testing.T) {
	// A different derivation: E[X] = ∫₀¹ Q(u) du and Var X = ∫₀¹ (Q(u) − E X)² du,
	// by the midpoint rule on the quantile function, against the closed
	// forms of Mean and Variance.
	const (
		n   = 1 << 18
		tol = 2e-5 // relative; midpoint error on bounded quantile functions
	)
	cases := truncCases(t)
	cases = append(cases,
		truncCase{name: "triangular untruncated", d: must(NewTriangular(20, 25, 40))},
		truncCase{name: "uniform untruncated", d: must(NewUniform(0.5, 0.8))},
		truncCase{name: "lognormal untruncated", d: must(NewLogNormal(2, 0.25))},
	)
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			m, m2 := 0.0, 0.0
			mean := c.d.Mean()
			for i := range n {
				q := c.d.Quantile((float64(i) + 0.5) / n)
				m += q
				m2 += (q - mean) * (q - mean)
			}
			m /= n
			m2 /= n
			if !scalar.EqualWithinAbsOrRel(mean, m, tol, tol) {
				t.Errorf("Mean %v, quadrature %v", mean, m)
			}
			if v := c.d.Variance(); !scalar.EqualWithinAbsOrRel(v, m2, tol, 1e-3) {
				t.Errorf("Variance %v, quadrature %v", v, m2)
			}
		})
	}
}

func TestMomentsPublished(t *testing.T) {
	const tol = 1e-9
	n01 := must(NewNormal(0, 1))
	for _, c := range []struct {
		name       string
		d          Dist
		mean, vari float64
	}{
		// Half-normal distribution (Johnson, Kotz & Balakrishnan 1994; memory):
		// mean √(2/π), variance 1 − 2/π.
		{"half-normal", mustTrunc(t, n01, 0, math.Inf(1)), 0.7978845608028654, 0.36338022763241865},
		// The same, scaled and shifted: N(10, 2) on [10, ∞) → 10 + 2√(2/π), 4(1 − 2/π) (derived).
		{"half-normal scaled", mustTrunc(t, must(NewNormal(10, 2)), 10, math.Inf(1)), 11.595769121605731, 1.4535209105296746},
		// Mirror image: (−∞, 0] → −√(2/π) (derived by symmetry).
		{"half-normal lower", mustTrunc(t, n01, math.Inf(-1), 0), -0.7978845608028654, 0.36338022763241865},
		// Lognormal (Johnson, Kotz & Balakrishnan 1994; memory): mean m·e^(s²/2),
		// variance m²e^(s²)(e^(s²) − 1); m = 1, s = 0.5 → 1.1331484531, 0.3646958540 (derived).
		{"lognormal", must(NewLogNormal(1, 0.5)), 1.1331484530668263, 0.3646958540650136},
		// Triangular (Evans, Hastings & Peacock, Statistical Distributions; memory):
		// mean (a + b + c)/3, variance (a² + b² + c² − ab − ac − bc)/18;
		// 20, 25, 40 → 85/3, (2625 − 2300)/18 = 325/18 (derived).
		{"triangular", must(NewTriangular(20, 25, 40)), 85.0 / 3, 325.0 / 18},
		{"triangular mode at low", must(NewTriangular(0, 0, 3)), 1, 0.5},
		// Uniform on the intersection [0.2, 1]: mean 0.6, variance 0.8²/12 (derived).
		{"uniform clipped bound", mustTrunc(t, must(NewUniform(0, 1)), 0.2, 2), 0.6, 0.64 / 12},
	} {
		t.Run(c.name, func(t *testing.T) {
			if m := c.d.Mean(); !scalar.EqualWithinAbsOrRel(m, c.mean, tol, tol) {
				t.Errorf("mean %v, want %v", m, c.mean)
			}
			if v := c.d.Variance(); !scalar.EqualWithinAbsOrRel(v, c.vari, tol, tol) {
				t.Errorf("variance %v, want %v", v, c.vari)
			}
		})
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

func TestQuantilePanics(t *testing.T) {
	d := must(NewNormal(0, 1))
	for _, u := range []float64{-0.1, 1.1, math.NaN()} {
		t.Run(fmt.Sprintf("u=%g", u), func(t *testing.T) { wantPanic(t, func() { d.Quantile(u) }) })
	}
}

func TestKindString(t *testing.T) {
	for k, want := range map[Kind]string{Fixed: "fixed", Normal: "normal", LogNormal: "lognormal", Uniform: "uniform", Triangular: "triangular"} {
		if k.String() != want {
			t.Errorf("%d: %q, want %q", k, k.String(), want)
		}
	}
}
