package planes

import (
	"math"

	"cleft/insitu"
)

// StateOf returns the verdict ResolveTo would give for plane o in state s
// under criterion c, and only that: with σn' = n·σ·n − α·Pp and τ = |σ·n −
// σn·n| (zero below the shear floor of ResolveTo, 1e-12 of the larger of
// |σ1| and |σ3| in s.Principal),
//
//	Opening  if σn' ≤ 0
//	Critical if τ > 0 and c.Strength(σn')/τ ≤ 1
//	Stable   otherwise
//
// It skips the rake, the sense, the tendencies and the pressure to slip, for
// searches that evaluate many points and read only the verdict (several
// times faster than ResolveTo: BenchmarkStateOf against BenchmarkResolveTo).
// It is tested to agree with ResolveTo's State. StateOf does not allocate.
func StateOf(s *insitu.State, o *Orientation, c Criterion) PlaneState {
	n := o.Normal()
	t := s.Total.Apply(n)
	sn := t.X*n.X + t.Y*n.Y + t.Z*n.Z
	en := sn - s.Biot*s.PorePressure
	if en <= 0 {
		return Opening
	}
	vx, vy, vz := t.X-sn*n.X, t.Y-sn*n.Y, t.Z-sn*n.Z
	tau := math.Sqrt(vx*vx + vy*vy + vz*vz)
	scale := math.Max(math.Abs(s.Principal.Values[0]), math.Abs(s.Principal.Values[2]))
	if !(tau > shearTol*scale) {
		return Stable // no shear: FS undefined, as in ResolveTo
	}
	if c.Strength(en)/tau <= 1 {
		return Critical
	}
	return Stable
}

// pressureToSlip is the rise in pore pressure that ends the plane's
// stability, with the tension cut-off (see Result.PressureToSlip):
//
//	ΔPp = min(σn' − σn'crit, σn') / α
//
// crit is σn'crit; one within floor of 0 (τ = c) counts as 0, so that the
// same plane typed two ways gets one verdict. opensFirst is true when the
// cut-off governs. ResolveTo and ResolveCore both use it.
func pressureToSlip(en, crit, floor, biot float64) (dp float64, opensFirst bool) {
	if crit > floor {
		return (en - crit) / biot, false
	}
	return en / biot, true
}

// stateFrom is the verdict from σn' and the factor of safety (NaN without
// shear): opening, critical when FS ≤ 1, else stable.
func stateFrom(en, fs float64) PlaneState {
	switch {
	case en <= 0:
		return Opening
	case fs <= 1:
		return Critical
	}
	return Stable
}
