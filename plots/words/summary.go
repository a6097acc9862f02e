package words

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/planes/assess"
)

// Summary puts the facts of an assessment in plain words: what was
// screened, the least stable planes, the joint sets, and the
// frictional-limit check.
func Summary(f assess.Facts) []string {
	var out []string
	depths := fmt.Sprintf("at depths of %g to %g m", f.DepthMin, f.DepthMax)
	if f.DepthMin == f.DepthMax {
		depths = fmt.Sprintf("at %g m", f.DepthMin)
	}
	out = append(out, fmt.Sprintf("%s screened %s: %s critical (factor of safety ≤ 1), %s opening (effective normal stress ≤ 0) and %s stable.",
		Plural(f.Planes, "plane was", "planes were"), depths, isAre(f.Critical), isAre(f.Opening), isAre(f.Stable)))
	var parts []string
	for _, p := range f.LeastStable {
		parts = append(parts, Stability(p))
	}
	lead := "The least stable is "
	if len(parts) > 1 {
		lead = "The least stable are "
		parts[len(parts)-1] = "and " + parts[len(parts)-1]
	}
	out = append(out, lead+strings.Join(parts, "; ")+".")
	if len(f.Sets) > 0 {
		var means []string
		for _, p := range f.Sets {
			means = append(means, fmt.Sprintf("%s %s", p.Name, p.Orientation))
		}
		sort.Strings(means)
		out = append(out, fmt.Sprintf("The %d field readings form %s (%s); the least stable set mean is %s.",
			f.Readings, Plural(len(f.Sets), "set", "sets"), strings.Join(means, ", "), Stability(f.Sets[0])))
	}
	if len(f.Limits) > 0 {
		out = append(out, Limit(f))
	}
	return out
}

// Limit is the sentence of the frictional-limit check at the report depths.
func Limit(f assess.Facts) string {
	best, exceeded := f.Largest()
	l := f.Limits[best]
	if math.IsNaN(l.Ratio) {
		return fmt.Sprintf("The frictional-limit check does not apply at %s m: there is no stress there (the ground surface), so the effective principal stress ratio is undefined.", Depths(f.Depths))
	}
	if len(exceeded) == 0 {
		return fmt.Sprintf("The stress model passes the frictional-limit check at %s m: the largest effective principal stress ratio (σ1 − αPp)/(σ3 − αPp) is %.2f, at %g m, against the limit of %.2f for μ = %.4g.",
			Depths(f.Depths), l.Ratio, f.Depths[best], l.Limit, l.Friction)
	}
	return fmt.Sprintf("The stress model EXCEEDS the frictional limit (%.2f for μ = %.4g) at %s m: such a state would already have slipped on optimally oriented planes, so the stress estimate needs a second look before these results are used.",
		l.Limit, l.Friction, Depths(exceeded))
}

// Stability puts one plane's stability in words.
func Stability(p assess.Named) string {
	r := p.Result
	where := fmt.Sprintf("%s (%s at %g m)", p.Name, p.Orientation, p.Depth)
	switch {
	case r.State == planes.Opening:
		return fmt.Sprintf("%s, opening, with an effective normal stress of %s MPa", where, Signed(r.EffectiveNormal))
	case r.PressureToSlip < 0:
		return fmt.Sprintf("%s, %s with a factor of safety of %.2f, already %.2f MPa of pore pressure past its strength", where, r.State, r.FactorOfSafety, -r.PressureToSlip)
	case math.IsNaN(r.FactorOfSafety):
		return fmt.Sprintf("%s, carrying no shear stress", where)
	}
	if r.OpensFirst {
		return fmt.Sprintf("%s, factor of safety %.2f, which would open (its cohesion carrying the shear stress until then) after a %.2f MPa rise in pore pressure", where, r.FactorOfSafety, r.PressureToSlip)
	}
	return fmt.Sprintf("%s, factor of safety %.2f, which would slip after a %.2f MPa rise in pore pressure", where, r.FactorOfSafety, r.PressureToSlip)
}

// StateLabel is a plane's state as the report's tables show it: the word in
// capitals with a glyph for critical and opening planes, so that it reads
// in black-and-white print.
func StateLabel(s planes.PlaneState) string {
	switch s {
	case planes.Critical:
		return "▲ CRITICAL"
	case planes.Opening:
		return "■ OPENING"
	}
	return "stable"
}
