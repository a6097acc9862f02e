package planes

import "math"

// LessStable reports whether a is less stable than b, the order in which the
// tables and summaries list planes: opening planes first (lowest σn' first),
// then by factor of safety ascending; planes without a factor of safety (no
// shear) last; ties by pressure to slip ascending.
func LessStable(a, b Result) bool {
	ao, bo := a.State == Opening, b.State == Opening
	if ao != bo {
		return ao
	}
	if ao {
		return a.EffectiveNormal < b.EffectiveNormal
	}
	af, bf := a.FactorOfSafety, b.FactorOfSafety
	an, bn := math.IsNaN(af), math.IsNaN(bf)
	switch {
	case an != bn:
		return bn
	case !an && af != bf:
		return af < bf
	}
	return a.PressureToSlip < b.PressureToSlip
}
