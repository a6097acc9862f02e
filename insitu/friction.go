package insitu

import (
	"math"

	"cleft/insitu/geom"
)

// FrictionalLimit returns the largest effective principal stress ratio that
// a crust with optimally oriented faults of friction μ can sustain (Jaeger &
// Cook 1979; Zoback 2007):
//
//	(σ1 − Pp)/(σ3 − Pp) ≤ [√(μ² + 1) + μ]²
//
// For μ = 0.6 the limit is 3.12. μ must be positive.
func FrictionalLimit(mu float64) float64 {
	r := math.Sqrt(mu*mu+1) + mu
	return r * r
}

// OptimalAngle returns the angle in degrees between σ1 and the plane most
// prone to slip for friction μ: ½·atan(1/μ) (29.5° for μ = 0.6). The plane's
// normal lies in the σ1–σ3 plane at 90° minus this angle from σ1.
func OptimalAngle(mu float64) float64 {
	return 0.5 * math.Atan(1/mu) * geom.Deg
}

// EffectiveRatio returns (σ1 − αPp)/(σ3 − αPp) for the state. It returns +Inf
// when σ3' ≤ 0 (the least effective stress is tensile or zero, so the limit is
// exceeded whatever μ) and NaN for the all-zero state.
func (s State) EffectiveRatio() float64 {
	p := s.Biot * s.PorePressure
	s1, s3 := s.Principal.Values[0]-p, s.Principal.Values[2]-p
	if s1 == 0 && s3 == 0 {
		return math.NaN()
	}
	if s3 <= 0 {
		return math.Inf(1)
	}
	return s1 / s3
}

// LimitCheck is the frictional-limit check of a state: its effective
// principal ratio against the limit for friction μ.
type LimitCheck struct {
	Friction float64 // μ
	Ratio    float64 // (σ1 − αPp)/(σ3 − αPp): +Inf when σ3' ≤ 0, NaN for no stress
	Limit    float64 // [√(μ² + 1) + μ]²
	Exceeds  bool    // Ratio > Limit (an infinite ratio exceeds it; NaN does not)
}

// CheckLimit checks s against the frictional limit for friction μ > 0. This
// is the one place where cleft decides that a state exceeds the limit.
func CheckLimit(s State, mu float64) LimitCheck {
	c := LimitCheck{Friction: mu, Ratio: s.EffectiveRatio(), Limit: FrictionalLimit(mu)}
	c.Exceeds = c.Ratio > c.Limit
	return c
}
