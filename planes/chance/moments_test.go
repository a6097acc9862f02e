package chance

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestMomentsAgainstQuadratureOfQuantile(t *testing.T) {
	// A different derivation: E[X] = ∫₀¹ Q(u) du and Var X = ∫₀¹ (Q(u) − E X)² du,
	// by the midpoint rule on the quantile function, against the closed
	// forms of Mean and Variance.
	const (
		n         = 1 << 18
		tol       = 2e-5 // relative; midpoint error on bounded quantile functions
		varRelTol = 1e-3 // relative, on the variance
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
			if v := c.d.Variance(); !scalar.EqualWithinAbsOrRel(v, m2, tol, varRelTol) {
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
