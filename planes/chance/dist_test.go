package chance

import (
	"errors"
	"fmt"
	"math"
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
	const (
		tol       = 1e-12
		cdfRelTol = 1e-9 // relative, on the CDF
	)
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
				if f, want := c.d.CDF(q), c.cdf(q); !scalar.EqualWithinAbsOrRel(f, want, tol, cdfRelTol) {
					t.Errorf("CDF(%v) = %v, gonum %v", q, f, want)
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
