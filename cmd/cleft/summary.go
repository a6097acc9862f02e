package main

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/planes/site"
)

// summaryFacts are the figures of the summary: printed by assess, written
// to summary.json, and put in words at the top of the report.
type summaryFacts struct {
	Site        string       `json:"site"`
	Planes      int          `json:"planes"`
	Critical    int          `json:"critical"`
	Opening     int          `json:"opening"`
	Stable      int          `json:"stable"`
	DepthMin    num          `json:"depth_min_m"`
	DepthMax    num          `json:"depth_max_m"`
	LeastStable []leastPlane `json:"least_stable"`
	Limit       limitFacts   `json:"frictional_limit"`
	// Sets are the joint sets of the field readings, least stable first;
	// empty without readings_file.
	Readings int          `json:"readings"`
	Sets     []leastPlane `json:"sets"`
}

type leastPlane struct {
	Name            string `json:"name"`
	Dip             num    `json:"dip"`
	DipDirection    num    `json:"dip_direction"`
	Depth           num    `json:"depth_m"`
	State           string `json:"state"`
	EffectiveNormal num    `json:"effective_normal_stress_mpa"`
	FactorOfSafety  num    `json:"factor_of_safety"`
	PressureToSlip  num    `json:"pressure_to_slip_mpa"`
}

type limitFacts struct {
	Friction     num       `json:"friction"`
	Limit        num       `json:"limit"`
	Depths       []float64 `json:"depths_m"`
	LargestRatio num       `json:"largest_effective_ratio"`
	AtDepth      num       `json:"largest_at_depth_m"`
	ExceededAt   []float64 `json:"exceeded_at_depths_m"`
}

func newLeast(name string, p *site.Plane, r planes.Result) leastPlane {
	return leastPlane{Name: name, Dip: num(p.Orientation.Dip()), DipDirection: num(p.Orientation.DipDirection()), Depth: num(p.Depth),
		State: r.State.String(), EffectiveNormal: num(r.EffectiveNormal), FactorOfSafety: num(r.FactorOfSafety), PressureToSlip: num(r.PressureToSlip)}
}

// facts gathers the summary figures of an assessment.
func (a *assessment) facts() summaryFacts {
	f := summaryFacts{Site: a.site.Name, Planes: len(a.results), DepthMin: num(math.Inf(1)), DepthMax: num(math.Inf(-1))}
	for i, r := range a.results {
		switch r.State {
		case planes.Critical:
			f.Critical++
		case planes.Opening:
			f.Opening++
		default:
			f.Stable++
		}
		f.DepthMin = num(math.Min(float64(f.DepthMin), a.planes[i].Depth))
		f.DepthMax = num(math.Max(float64(f.DepthMax), a.planes[i].Depth))
	}
	rank := a.ranked()
	for _, i := range rank[:min(3, len(rank))] {
		f.LeastStable = append(f.LeastStable, newLeast(a.planes[i].Name, &a.planes[i], a.results[i]))
	}
	if a.grouping != nil {
		f.Readings = len(a.grouping.readings)
		idx := make([]int, len(a.sets))
		for i := range idx {
			idx[i] = i
		}
		sort.SliceStable(idx, func(i, j int) bool { return planes.LessStable(a.sets[idx[i]].result, a.sets[idx[j]].result) })
		for _, i := range idx {
			f.Sets = append(f.Sets, newLeast(a.sets[i].name, &a.sets[i].plane, a.sets[i].result))
		}
	}
	f.Limit = limitFacts{Friction: a.states[0].Friction, Limit: a.states[0].Limit, Depths: a.depths, LargestRatio: num(math.Inf(-1)), ExceededAt: []float64{}}
	for _, st := range a.states {
		if r := float64(st.Ratio); r > float64(f.Limit.LargestRatio) {
			f.Limit.LargestRatio, f.Limit.AtDepth = st.Ratio, st.Depth
		}
		if st.Exceeds {
			f.Limit.ExceededAt = append(f.Limit.ExceededAt, float64(st.Depth))
		}
	}
	return f
}

// sentences puts the facts in plain words: what was screened, the least
// stable planes, and the frictional-limit check.
func (f summaryFacts) sentences() []string {
	var out []string
	depths := fmt.Sprintf("at depths of %g to %g m", float64(f.DepthMin), float64(f.DepthMax))
	if f.DepthMin == f.DepthMax {
		depths = fmt.Sprintf("at %g m", float64(f.DepthMin))
	}
	out = append(out, fmt.Sprintf("%s screened %s: %s critical (factor of safety ≤ 1), %s opening (effective normal stress ≤ 0) and %s stable.",
		plural(f.Planes, "plane was", "planes were"), depths, isAre(f.Critical), isAre(f.Opening), isAre(f.Stable)))
	var parts []string
	for _, p := range f.LeastStable {
		parts = append(parts, p.describe())
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
			means = append(means, fmt.Sprintf("%s %02.0f/%03.0f", p.Name, float64(p.Dip), float64(p.DipDirection)))
		}
		sort.Strings(means)
		out = append(out, fmt.Sprintf("The %d field readings form %s (%s); the least stable set mean is %s.",
			f.Readings, plural(len(f.Sets), "set", "sets"), strings.Join(means, ", "), f.Sets[0].describe()))
	}
	l := f.Limit
	ds := joinDepths(l.Depths)
	if len(l.ExceededAt) == 0 {
		out = append(out, fmt.Sprintf("The stress model passes the frictional-limit check at %s m: the largest effective principal stress ratio (σ1 − αPp)/(σ3 − αPp) is %.2f, at %g m, against the limit of %.2f for μ = %.4g.",
			ds, float64(l.LargestRatio), float64(l.AtDepth), float64(l.Limit), float64(l.Friction)))
	} else {
		out = append(out, fmt.Sprintf("The stress model EXCEEDS the frictional limit (%.2f for μ = %.4g) at %s m: such a state would already have slipped on optimally oriented planes, so the stress estimate needs a second look before these results are used.",
			float64(l.Limit), float64(l.Friction), joinDepths(l.ExceededAt)))
	}
	return out
}

// describe puts one plane's stability in words.
func (p leastPlane) describe() string {
	where := fmt.Sprintf("%s (%02.0f/%03.0f at %g m)", p.Name, float64(p.Dip), float64(p.DipDirection), float64(p.Depth))
	switch {
	case p.State == "opening":
		return fmt.Sprintf("%s, opening, with an effective normal stress of %s MPa", where, signed(float64(p.EffectiveNormal)))
	case float64(p.PressureToSlip) < 0:
		return fmt.Sprintf("%s, %s with a factor of safety of %.2f, already %.2f MPa of pore pressure past its strength", where, p.State, float64(p.FactorOfSafety), -float64(p.PressureToSlip))
	case math.IsNaN(float64(p.FactorOfSafety)):
		return fmt.Sprintf("%s, carrying no shear stress", where)
	}
	return fmt.Sprintf("%s, factor of safety %.2f, which would slip after a %.2f MPa rise in pore pressure", where, float64(p.FactorOfSafety), float64(p.PressureToSlip))
}

// signed formats v to two decimals with a true minus sign.
func signed(v float64) string {
	s := fmt.Sprintf("%.2f", v+0)
	return strings.Replace(s, "-", "−", 1)
}

func plural(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}

func isAre(n int) string {
	if n == 1 {
		return "1 is"
	}
	return fmt.Sprintf("%d are", n)
}

func joinDepths(ds []float64) string {
	s := make([]string, len(ds))
	for i, d := range ds {
		s[i] = fmt.Sprintf("%g", d)
	}
	if len(s) > 1 {
		return strings.Join(s[:len(s)-1], ", ") + " and " + s[len(s)-1]
	}
	return strings.Join(s, "")
}
