package words

import (
	"fmt"
	"sort"
	"strings"

	"cleft/planes/assess"
	"cleft/planes/decide"
)

// LookFirstBrief says in one line how the findings to look at first are
// ranked; LookFirstRule says it in full.
const LookFirstBrief = "Ranked across the planes, the joint sets, the slope and the tunnel by how near each is to its limit: what fails now first, then what is near it (the rule is under Method)."

// LookFirstRule says how the findings to look at first are ranked
// (decide.Rank).
const LookFirstRule = "Ranked across the planes, the joint sets, the slope and the tunnel by how near each is to its limit: " +
	"first what fails now (factor of safety ≤ 1, an opening plane, a slip zone deeper than the limit or without bound, " +
	"σmax/UCS past the onset of spalling, a probability of 0.5 or more), then what is near it (factor of safety below 1.5, " +
	"a slope case below its target, a slip zone deeper than two thirds of the limit, σmax/UCS at the onset of spalling, " +
	"critical in a bracketing case, a probability of 0.05 or more, a kinematically possible case without a factor of safety); " +
	"within each, by the share of its limit it uses (1/FS, zone depth/limit, σmax/UCS/0.5, P/0.5). " +
	"Each part of the site that has such a finding is listed."

// Screened says in a sentence or two what was screened: the planes and
// their states, the readings and their sets, the slope's feasible cases
// and the tunnel's stations (sl and tn nil without them).
func Screened(f assess.Facts, sl *decide.SlopeSummary, tn *decide.TunnelSummary) []string {
	depths := fmt.Sprintf("at depths of %g to %g m", f.DepthMin, f.DepthMax)
	if f.DepthMin == f.DepthMax {
		depths = fmt.Sprintf("at %g m", f.DepthMin)
	}
	out := []string{fmt.Sprintf("%s screened %s: %s critical (factor of safety ≤ 1), %s opening (effective normal stress ≤ 0) and %s stable.",
		Plural(f.Planes, "plane was", "planes were"), depths, isAre(f.Critical), isAre(f.Opening), isAre(f.Stable))}
	if len(f.Sets) > 0 {
		var means []string
		for _, p := range f.Sets {
			means = append(means, fmt.Sprintf("%s %s", p.Name, p.Orientation))
		}
		sort.Strings(means)
		out[0] += fmt.Sprintf(" The %d field readings among them form %s (%s).", f.Readings, Plural(len(f.Sets), "set", "sets"), strings.Join(means, ", "))
	}
	var parts []string
	if sl != nil {
		tested := Plural(sl.Candidates-sl.Sets, "plane", "planes")
		if sl.Sets > 0 {
			tested += " and " + Plural(sl.Sets, "set mean", "set means")
		}
		parts = append(parts, fmt.Sprintf("against the slope, %s give kinematically feasible cases: %d planar, %d wedge, %d flexural toppling",
			tested, sl.Planar, sl.Wedge, sl.Toppling))
	}
	if tn != nil {
		parts = append(parts, fmt.Sprintf("the tunnel was screened at %s", Plural(tn.Stations, "station", "stations")))
	}
	if len(parts) > 0 {
		out = append(out, upper(strings.Join(parts, "; "))+".")
	}
	return out
}

// Quiet is "" when the first of the ranked findings fails or is near its
// limit, else a sentence that says none is and the list holds the least
// stable.
func Quiet(top []decide.Finding) string {
	if len(top) == 0 || top[0].Standing >= decide.Near {
		return ""
	}
	return "Nothing fails or is near its limit; the least stable are listed."
}

// More says how many findings near or past their limits the list leaves
// out, or "".
func More(n int) string {
	if n == 0 {
		return ""
	}
	if n == 1 {
		return "1 more finding near or past its limit is not listed: see the sections below."
	}
	return fmt.Sprintf("%d more findings near or past their limits are not listed: see the key table and the sections below.", n)
}

// upper capitalises the first letter of s.
func upper(s string) string {
	if s == "" {
		return s
	}
	r := []rune(s)
	return strings.ToUpper(string(r[0])) + string(r[1:])
}
