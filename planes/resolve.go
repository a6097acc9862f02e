package planes

import (
	"math"

	"cleft/insitu"

	"gonum.org/v1/gonum/spatial/r3"
)

// PlaneState is the screening verdict for a plane.
type PlaneState int

const (
	// Stable: factor of safety above 1.
	Stable PlaneState = iota
	// Critical: factor of safety ≤ 1, the plane is at or past its strength.
	Critical
	// Opening: effective normal stress ≤ 0, the plane is held open by water.
	Opening
)

func (s PlaneState) String() string {
	switch s {
	case Critical:
		return "critical"
	case Opening:
		return "opening"
	}
	return "stable"
}

// Result is the stress on one plane and what follows from it. Stresses are
// MPa, compression positive; angles degrees. NaN marks a value that is
// undefined for this plane (see each field).
type Result struct {
	PorePressure    float64 // Pp on the plane
	Normal          float64 // σn = n·σ·n, total
	Shear           float64 // τ = |σ·n − σn·n| ≥ 0
	EffectiveNormal float64 // σn' = σn − α·Pp

	// SlipTendency is Ts = τ/σn' (Morris, Ferrill & Henderson 1996); NaN when
	// σn' ≤ 0.
	SlipTendency float64
	// NormalisedSlip is Ts/Ts,max with Ts,max = (σ1'−σ3')/(2√(σ1'σ3')), the
	// largest Ts of any plane in this state; NaN when σ3' ≤ 0 or σ1' = σ3'.
	NormalisedSlip float64
	// DilationTendency is Td = (σ1 − σn)/(σ1 − σ3) ∈ [0, 1] (Ferrill et al.
	// 1999); NaN for an isotropic state.
	DilationTendency float64
	// FactorOfSafety is strength(σn')/τ; NaN when σn' ≤ 0 (opening) or τ = 0.
	FactorOfSafety float64
	// PressureToSlip is the rise in pore pressure that brings the plane to its
	// strength, with a tension cut-off: a plane that opens (σn' = 0) first
	// has no strength left, so the rise is never more than the one that
	// opens it,
	//
	//	ΔPp = min(σn' − σn'crit, σn') / α
	//
	// with σn'crit the criterion's CriticalNormal(τ): for Coulomb
	// min(σn' − (τ − c)/μ, σn')/α. It is negative when the plane is already
	// past its strength, and never positive for an opening plane (σn' ≤ 0).
	// The cut-off governs when σn'crit ≤ 0 (cohesion carries τ, or τ = 0; a
	// σn'crit below 1e-12 times the largest principal magnitude counts as
	// 0): see OpensFirst.
	PressureToSlip float64
	// OpensFirst is true when the cut-off governs PressureToSlip: the rise
	// opens the plane before its shear strength is reached (σn'crit ≤ 0), so
	// ΔPp = σn'/α.
	OpensFirst bool
	// Rake of the hanging-wall slip, parallel to the resolved shear traction
	// (Wallace 1951; Bott 1959), measured in the plane from the strike (Aki &
	// Richards 1980): (−180, 180], +90 reverse, −90 normal, 0 sinistral, 180
	// dextral. NaN when τ = 0, and for a plane within NearHorizontal of
	// horizontal (whose strike is not a reliable reading).
	Rake float64
	// SlipTrend is the azimuth, degrees in [0, 360), towards which the
	// hanging wall moves: the trend of its slip vector (the horizontal
	// direction of the resolved shear traction on the hanging wall's face).
	// On a plane within NearHorizontal of horizontal the hanging wall is the
	// upper block. A plane within NearVertical of vertical has no block
	// above it: the trend is that of the block on the side facing an
	// azimuth in [0, 180) (the east side; the north side of an east–west
	// plane), whichever dip direction was typed. NaN when τ = 0 or the slip
	// is vertical (pure dip-slip on a vertical plane).
	SlipTrend float64
	// Sense is the slip sense read from Rake (SenseOf), or for a plane
	// within NearVertical of vertical from Rake and the side that goes up
	// (VerticalSenseOf); NoSlip when Rake is NaN.
	Sense Sense
	// State is opening (σn' ≤ 0), critical (FS ≤ 1) or stable.
	State PlaneState
}

// shearTol is the relative size of τ, against the largest principal
// magnitude, below which the plane counts as free of shear.
const shearTol = 1e-12

// Resolve returns the stress on plane o in state s, judged by criterion c.
// The pore pressure is s.PorePressure: to override it for one plane, set it
// on the copy of s passed in. Resolve does not allocate.
//
// The traction is taken on the face whose outward normal is the downward
// pole n (the hanging wall's face), t = σ·n; σn = t·n and the shear vector
// t − σn·n points the way the hanging wall slips relative to the footwall.
func Resolve(s insitu.State, o Orientation, c Criterion) Result {
	var r Result
	ResolveTo(&r, &s, &o, c)
	return r
}

// ResolveTo is Resolve writing into r, for hot loops: it copies nothing.
func ResolveTo(r *Result, s *insitu.State, o *Orientation, c Criterion) {
	n := o.Normal()
	t := s.Total.Apply(n)
	sn := r3.Dot(t, n)
	sv := r3.Sub(t, r3.Scale(sn, n))
	tau := math.Sqrt(r3.Dot(sv, sv)) // r3.Norm's Hypot is 5× slower here

	ap := s.Biot * s.PorePressure
	*r = Result{PorePressure: s.PorePressure, Normal: sn, EffectiveNormal: sn - ap}
	s1, s3 := s.Principal.Values[0], s.Principal.Values[2]
	scale := math.Max(math.Abs(s1), math.Abs(s3))

	nan := math.NaN()
	r.Rake, r.SlipTrend, r.Sense = nan, nan, NoSlip
	if tau > shearTol*scale {
		dip := o.Dip()
		if dip > NearHorizontal {
			r.Rake = math.Atan2(r3.Dot(sv, o.UpDip()), r3.Dot(sv, o.StrikeVec())) * (180 / math.Pi)
			if r.Rake == -180 {
				r.Rake = 180
			}
			if dip >= 90-NearVertical {
				r.Sense = VerticalSenseOf(r.Rake, o.DipDirection())
			} else {
				r.Sense = SenseOf(r.Rake)
			}
		}
		x, y := sv.X, sv.Y
		if dip >= 90-NearVertical && o.DipDirection() >= 180 {
			x, y = -x, -y // the east (or north) block, not the typed hanging wall
		}
		if h2 := x*x + y*y; h2 > 1e-18*tau*tau {
			r.SlipTrend = trendDeg(y, x)
		}
	} else {
		tau = 0
	}
	r.Shear = tau

	en := r.EffectiveNormal
	r.SlipTendency, r.NormalisedSlip, r.FactorOfSafety = nan, nan, nan
	if en > 0 {
		r.SlipTendency = tau / en
		e1, e3 := s1-ap, s3-ap
		if e3 > 0 && e1-e3 > shearTol*scale {
			r.NormalisedSlip = r.SlipTendency / ((e1 - e3) / (2 * math.Sqrt(e1*e3)))
		}
		if tau > 0 {
			r.FactorOfSafety = c.Strength(en) / tau
		}
	}

	r.DilationTendency = nan
	if d := s1 - s3; d > shearTol*scale {
		r.DilationTendency = math.Min(1, math.Max(0, (s1-sn)/d))
	}

	r.PressureToSlip, r.OpensFirst = pressureToSlip(en, c.CriticalNormal(tau), shearTol*scale, s.Biot)
	r.State = stateFrom(en, r.FactorOfSafety)
}

// trendDeg returns atan2(y, x) as an azimuth in degrees, [0, 360), without
// the math.Mod of geom.Azimuth (the hot path of Resolve).
func trendDeg(y, x float64) float64 {
	a := math.Atan2(y, x) * (180 / math.Pi)
	if a < 0 {
		a += 360
		if a >= 360 { // a tiny negative angle rounds up to 360
			a = 0
		}
	}
	return a + 0 // no negative zero
}
