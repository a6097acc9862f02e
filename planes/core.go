package planes

import (
	"math"

	"cleft/insitu"

	"gonum.org/v1/gonum/spatial/r3"
)

// Core is the part of a Result that a verdict needs: the effective normal
// and shear stress, slip tendency, factor of safety, pressure to slip and
// state, with the same meanings and NaNs as in Result.
type Core struct {
	EffectiveNormal float64
	Shear           float64
	SlipTendency    float64
	FactorOfSafety  float64
	PressureToSlip  float64
	State           PlaneState
}

// ResolveCore writes into r the Core of the plane with unit normal n
// (either sense) in state s, judged by c: the same arithmetic as ResolveTo,
// so the same numbers to the last bit (tested), without the rake, sense,
// normalised slip and dilation tendency, and without an Orientation. For
// hot loops that screen many realisations; it does not allocate.
func ResolveCore(r *Core, s *insitu.State, n r3.Vec, c Criterion) {
	t := s.Total.Apply(n)
	sn := r3.Dot(t, n)
	sv := r3.Sub(t, r3.Scale(sn, n))
	tau := math.Sqrt(r3.Dot(sv, sv))
	ap := s.Biot * s.PorePressure
	en := sn - ap
	scale := math.Max(math.Abs(s.Principal.Values[0]), math.Abs(s.Principal.Values[2]))
	if !(tau > shearTol*scale) {
		tau = 0
	}
	nan := math.NaN()
	*r = Core{EffectiveNormal: en, Shear: tau, SlipTendency: nan, FactorOfSafety: nan}
	if en > 0 {
		r.SlipTendency = tau / en
		if tau > 0 {
			r.FactorOfSafety = c.Strength(en) / tau
		}
	}
	r.PressureToSlip, _ = pressureToSlip(en, c.CriticalNormal(tau), shearTol*scale, s.Biot)
	r.State = stateFrom(en, r.FactorOfSafety)
}
