package insitu

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestFrictionalLimit(t *testing.T) {
	// Jaeger & Cook (1979); Zoback (2007), read: "for μ = 0.6 the ratio is
	// 3.1" — [√(μ²+1)+μ]² = 3.1194 exactly. μ = 0.85 and 1 are derived from
	// the same formula.
	const (
		oneDecimal   = 0.05 // a value read to one decimal
		fourDecimals = 5e-5 // a value given to four decimals
	)
	for _, c := range []struct{ mu, want, tol float64 }{
		{0.6, 3.1, oneDecimal},
		{0.6, 3.1194, fourDecimals},
		{0.85, 4.6761, fourDecimals},
		{1, 5.8284, fourDecimals},
	} {
		if got := FrictionalLimit(c.mu); !scalar.EqualWithinAbs(got, c.want, c.tol) {
			t.Errorf("FrictionalLimit(%v) = %v, want %v ± %v", c.mu, got, c.want, c.tol)
		}
	}
	// Jaeger & Cook; Zoback (2007), read: the optimal plane lies at
	// ½·atan(1/μ) from σ1, 29.5° for μ = 0.6.
	if got := OptimalAngle(0.6); !scalar.EqualWithinAbs(got, 29.5, oneDecimal) {
		t.Errorf("OptimalAngle(0.6) = %v, want 29.5", got)
	}
}

func TestTsMaxAtFrictionalLimit(t *testing.T) {
	// Derived (Mohr-circle tangent): Ts,max = (σ1'−σ3')/(2√(σ1'σ3')) equals μ
	// when the effective ratio is at the frictional limit, for any μ.
	for _, mu := range []float64{0.3, 0.6, 0.85, 1} {
		r := FrictionalLimit(mu)
		s3 := 10.0
		s1 := r * s3
		if got := (s1 - s3) / (2 * math.Sqrt(s1*s3)); !scalar.EqualWithinAbs(got, mu, tol) {
			t.Errorf("μ = %v: Ts,max at the limit = %v", mu, got)
		}
	}
}

func TestEffectiveRatio(t *testing.T) {
	s := State{Principal: Principal{Values: [3]float64{30, 20, 10}}, PorePressure: 4, Biot: 1}
	if got := s.EffectiveRatio(); !scalar.EqualWithinAbs(got, 26.0/6, tol) {
		t.Errorf("ratio = %v, want 26/6", got)
	}
	s.PorePressure = 10
	if got := s.EffectiveRatio(); !math.IsInf(got, 1) {
		t.Errorf("σ3' = 0: ratio = %v, want +Inf", got)
	}
}

func TestCheckLimit(t *testing.T) {
	// Jaeger & Cook (1979); Zoback (2007) (read): for μ = 0.6 the limit of
	// (σ1 − Pp)/(σ3 − Pp) is 3.1 (3.1194). Dry states just either side of it,
	// one with σ3' = 0, and the empty state (derived).
	const fourDecimals = 5e-5 // 3.1194 is given to four decimals
	for _, c := range []struct {
		name    string
		s1, s3  float64
		exceeds bool
	}{
		{"below", 31, 10, false}, {"above", 31.3, 10, true}, {"σ3' = 0", 10, 0, true}, {"no stress", 0, 0, false},
	} {
		s := NewState(Andersonian(c.s1, c.s3, c.s3, 0), 100, 0, 1)
		if got := CheckLimit(s, 0.6); got.Exceeds != c.exceeds || math.Abs(got.Limit-3.1194) > fourDecimals {
			t.Errorf("%s: %+v", c.name, got)
		}
	}
}
