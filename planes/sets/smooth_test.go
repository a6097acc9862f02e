package sets

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// uniformAxis draws a direction uniform on the sphere (common practice:
// normalise three standard normals).
func uniformAxis(rng *rand.Rand) r3.Vec {
	return r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
}

func TestSmoothingOfAUniformScatter(t *testing.T) {
	// The mean and spread of the weighted sum of N uniform axes about a
	// fixed axis, over independent scatters, must be E and σ of
	// NewSmoothing (derived there from |a·n| uniform on [0, 1]): in units of
	// σ the sums have mean E/σ and standard deviation 1. Seeded Monte Carlo,
	// 4000 scatters; the bounds are 5 standard errors.
	rng := rand.New(rand.NewPCG(41, 42))
	const (
		n, trials = 200, 4000
		bound     = 5    // standard errors
		limitTol  = 0.01 // E/σ = 3·√(N/(N + 9)) is 3 − 1.4e-5 at N = 10⁶
	)
	s := NewSmoothing(n)
	axis := r3.Vec{Z: 1}
	var sum, sum2 float64
	ns := make([]r3.Vec, n)
	for range trials {
		for i := range ns {
			ns[i] = uniformAxis(rng)
		}
		d := s.Density(axis, ns, nil)
		sum += d
		sum2 += d * d
	}
	mean := sum / trials
	sd := math.Sqrt(sum2/trials - mean*mean)
	if want := s.Expected / s.Sigma; math.Abs(mean-want) > bound/math.Sqrt(trials) {
		t.Errorf("mean density %v σ, want %v", mean, want)
	}
	if math.Abs(sd-1) > bound/math.Sqrt(2*trials) {
		t.Errorf("spread %v σ, want 1", sd)
	}
	// For many readings a uniform scatter reads 3σ, as Kamb's counting
	// (K = 2(1 + N/9), derived: E/σ → (N/K)/√(N/(2K)) = √(2N/K) → 3).
	if big := NewSmoothing(1e6); !scalar.EqualWithinAbs(big.Expected/big.Sigma, 3, limitTol) {
		t.Errorf("1e6 readings: uniform reads %v σ", big.Expected/big.Sigma)
	}
}

func TestSmoothCounterIsTheSum(t *testing.T) {
	// The cell search leaves out only weights below 1e-12: its sums match
	// the plain sum over every reading (a different route to the same
	// number), weighted and not, for small and large sets.
	const sumTol = smoothCut // each reading left out weighs less: this times n/σ absolute, or relative
	rng := rand.New(rand.NewPCG(43, 44))
	for _, n := range []int{20, 500, 20000} {
		ns := make([]r3.Vec, n)
		ws := make([]float64, n)
		mean := uniformAxis(rng)
		for i := range ns {
			if i%2 == 0 {
				ns[i] = r3.Unit(r3.Add(mean, r3.Scale(0.2, uniformAxis(rng))))
			} else {
				ns[i] = uniformAxis(rng)
			}
			ws[i] = 0.5 + rng.Float64()
		}
		s := NewSmoothing(float64(n))
		for _, w := range [][]float64{nil, ws} {
			c := NewSmoothCounter(s, ns, w)
			for range 50 {
				a := uniformAxis(rng)
				want := s.Density(a, ns, w)
				if got := c.Density(a); !scalar.EqualWithinAbsOrRel(got, want, sumTol*float64(n)/s.Sigma, sumTol) {
					t.Fatalf("n %d: counter %v, sum %v", n, got, want)
				}
			}
		}
	}
}
