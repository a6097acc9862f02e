package chance

import (
	"fmt"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// fisherMean is an oblique mean axis (trend 135°, plunge 50° in NED).
var fisherMean = r3.Vec{X: -0.45451947767204365, Y: 0.45451947767204376, Z: 0.766044443118978}

func TestFisherMeanCosine(t *testing.T) {
	// Fisher, Lewis & Embleton (1987), §4.2 (memory): E[cos θ] = coth κ − 1/κ.
	// Tolerance 5 sample standard errors of the mean of cos θ.
	const n = 100000
	for i, kappa := range []float64{0.5, 2, 10, 50, 500} {
		t.Run(fmt.Sprintf("κ=%g", kappa), func(t *testing.T) {
			f := NewFisher(fisherMean, kappa)
			r := Stream(uint64(100+i), 0)
			s, s2 := 0.0, 0.0
			for range n {
				c := r3.Dot(f.Draw(r), fisherMean)
				s += c
				s2 += c * c
			}
			mean := s / n
			se := math.Sqrt((s2/n - mean*mean) / n)
			want := 1/math.Tanh(kappa) - 1/kappa
			if math.Abs(mean-want) > 5*se {
				t.Errorf("mean cos θ %.6f, want %.6f ± %.2g", mean, want, 5*se)
			}
		})
	}
}

func TestFisherAngleDistribution(t *testing.T) {
	// Fisher, Lewis & Embleton (1987) (memory): P(θ ≤ θ₀) =
	// (1 − e^(−κ(1 − cos θ₀)))/(1 − e^(−2κ)); checked at its quartiles, each
	// fraction within 5 binomial standard errors. The azimuth about the mean,
	// measured in a frame of the test's own, is uniform: a quarter in each
	// quadrant, within 5 standard errors.
	const (
		n       = 40000
		kappa   = 10.0
		unitTol = 1e-12 // |v| of a unit vector
	)
	f := NewFisher(fisherMean, kappa)
	r := Stream(200, 0)
	u := r3.Unit(r3.Cross(fisherMean, r3.Vec{Z: 1}))
	w := r3.Cross(fisherMean, u)
	var quarter [4]int
	cosines := make([]float64, n)
	for i := range cosines {
		v := f.Draw(r)
		if !scalar.EqualWithinAbs(r3.Norm(v), 1, unitTol) {
			t.Fatalf("|v| = %v", r3.Norm(v))
		}
		cosines[i] = r3.Dot(v, fisherMean)
		a, b := r3.Dot(v, u), r3.Dot(v, w)
		q := 0
		if a < 0 {
			q |= 1
		}
		if b < 0 {
			q |= 2
		}
		quarter[q]++
	}
	for _, p := range []float64{0.25, 0.5, 0.75} {
		// invert the published CDF for θ₀ with P = p
		c0 := 1 + math.Log(1-p*(1-math.Exp(-2*kappa)))/kappa
		hits := 0
		for _, c := range cosines {
			if c >= c0 {
				hits++
			}
		}
		if got, se := float64(hits)/n, StdErr(p, n); math.Abs(got-p) > 5*se {
			t.Errorf("P(θ ≤ %.2f°) = %v, want %v", math.Acos(c0)*180/math.Pi, got, p)
		}
	}
	for q, c := range quarter {
		if got, se := float64(c)/n, StdErr(0.25, n); math.Abs(got-0.25) > 5*se {
			t.Errorf("quadrant %d holds %v of the draws", q, got)
		}
	}
}

func TestFisherConcentrationEstimate(t *testing.T) {
	// Fisher (1953): K = (N − 1)/(N − R) estimates κ; for large N its
	// relative spread is about 1/√N (memory), so 2 % is > 5 spreads here.
	const (
		n      = 100000
		relTol = 0.02
	)
	for i, kappa := range []float64{5, 20, 100} {
		t.Run(fmt.Sprintf("κ=%g", kappa), func(t *testing.T) {
			f := NewFisher(r3.Vec{X: 0, Y: 0, Z: 2}, kappa)
			r := Stream(300+uint64(i), 0)
			var sum r3.Vec
			for range n {
				sum = r3.Add(sum, f.Draw(r))
			}
			K := (n - 1) / (n - r3.Norm(sum))
			if math.Abs(K/kappa-1) > relTol {
				t.Errorf("K = %v for κ = %v", K, kappa)
			}
		})
	}
}

func TestFisherLimits(t *testing.T) {
	t.Run("κ=0 uniform sphere", func(t *testing.T) {
		// Uniform on the sphere (common practice): each component has mean 0
		// and mean square 1/3; 5 standard errors (sd of a component 1/√3,
		// of its square √(4/45)).
		const n = 40000
		f := NewFisher(fisherMean, 0)
		r := Stream(400, 0)
		var s, s2 r3.Vec
		for range n {
			v := f.Draw(r)
			s = r3.Add(s, v)
			s2 = r3.Add(s2, r3.Vec{X: v.X * v.X, Y: v.Y * v.Y, Z: v.Z * v.Z})
		}
		s, s2 = r3.Scale(1.0/n, s), r3.Scale(1.0/n, s2)
		se1, se2 := math.Sqrt(1.0/3/n), math.Sqrt(4.0/45/n)
		for i, c := range [3]float64{s.X, s.Y, s.Z} {
			if math.Abs(c) > 5*se1 {
				t.Errorf("component %d mean %v", i, c)
			}
		}
		for i, c := range [3]float64{s2.X, s2.Y, s2.Z} {
			if math.Abs(c-1.0/3) > 5*se2 {
				t.Errorf("component %d mean square %v", i, c)
			}
		}
	})
	t.Run("κ=Inf is the mean", func(t *testing.T) {
		f := NewFisher(r3.Scale(3, fisherMean), math.Inf(1))
		r := Stream(401, 0)
		const tol = 1e-15 // the unit mean, up to rounding
		for range 10 {
			if v := f.Draw(r); r3.Norm(r3.Sub(v, fisherMean)) > tol {
				t.Fatalf("draw %v, want %v", v, fisherMean)
			}
		}
	})
	t.Run("panics", func(t *testing.T) {
		wantPanic(t, func() { NewFisher(r3.Vec{}, 1) })
		wantPanic(t, func() { NewFisher(r3.Vec{X: math.NaN()}, 1) })
		wantPanic(t, func() { NewFisher(fisherMean, -1) })
		wantPanic(t, func() { NewFisher(fisherMean, math.NaN()) })
	})
}
