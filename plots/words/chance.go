package words

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/planes/chance/study"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// ChanceOrder returns the targets from the least to the most sure of being
// stable: by P(unstable) (with a Monte Carlo), then by the number of cases
// in which they are critical or opening, then by the base ranking
// (planes.LessStable), ties in input order.
func ChanceOrder(targets []study.Target, runs []study.CaseRun, out *study.Outcome) []int {
	idx := make([]int, len(targets))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(a, b int) bool {
		i, j := idx[a], idx[b]
		if out != nil && out.Odds[i].PUnstable != out.Odds[j].PUnstable {
			return out.Odds[i].PUnstable > out.Odds[j].PUnstable
		}
		if ci, cj := study.Critical(runs, i), study.Critical(runs, j); ci != cj {
			return ci > cj
		}
		return planes.LessStable(targets[i].Base, targets[j].Base)
	})
	return idx
}

// unstableWord is "critical", or "critical or opening" when it opens in
// some case or realisation.
func unstableWord(opens bool) string {
	if opens {
		return "critical or opening"
	}
	return "critical"
}

// ChanceLines puts the cases and the Monte Carlo in plain words: how many
// targets keep their state in every case, how many are unsure in the
// realisations, and the least sure three. out may be nil (cases only);
// runs holds at least the base.
func ChanceLines(targets []study.Target, runs []study.CaseRun, out *study.Outcome) []string {
	lines := ChanceOverview(targets, runs, out)
	for _, i := range ChanceOrder(targets, runs, out)[:min(3, len(targets))] {
		lines = append(lines, ChanceOf(targets, runs, out, i))
	}
	return lines
}

// ChanceOverview is the first sentences of ChanceLines: how many targets
// keep their state in every case, and how many are unsure in the
// realisations.
func ChanceOverview(targets []study.Target, runs []study.CaseRun, out *study.Outcome) []string {
	var lines []string
	n := len(targets)
	if len(runs) > 1 {
		var names []string
		robust := 0
		for _, r := range runs[1:] {
			names = append(names, r.Name)
		}
		for i := range targets {
			if study.Robust(runs, i) {
				robust++
			}
		}
		change := "change it"
		if n-robust == 1 {
			change = "changes it"
		}
		lines = append(lines, fmt.Sprintf("The site was run in %d cases, the base and %s (%s): %d of %d planes and set means keep their state in every case, %d %s.",
			len(runs), Plural(len(runs)-1, "bracketing case", "bracketing cases"), strings.Join(names, ", "), robust, n, n-robust, change))
	}
	if out != nil {
		some, half := 0, 0
		for _, o := range out.Odds {
			if o.PUnstable >= 0.05 {
				some++
			}
			if o.PUnstable >= 0.5 {
				half++
			}
		}
		what := Plural(len(out.Inputs), "uncertain input", "uncertain inputs")
		if len(out.Inputs) == 0 {
			what = "no uncertain input"
		}
		lines = append(lines, fmt.Sprintf("The Monte Carlo drew %d realisations of %s (seed %d): %d of %d planes and set means are critical or opening in at least 5 %% of them, %d in at least half.",
			out.N, what, out.Seed, some, n, half))
	}
	return lines
}

// ChanceOf is one target's sentence, e.g. "F1 is critical in 2 of 4
// cases; P(critical) 0.61 ± 0.01, FS 0.74 to 1.21 (5 to 95 %), most
// sensitive to stress.shmax.ratio (ρ = −0.82)."
func ChanceOf(targets []study.Target, runs []study.CaseRun, out *study.Outcome, i int) string {
	t := &targets[i]
	var parts []string
	opens := false
	for _, r := range runs {
		opens = opens || r.Results[i].State == planes.Opening
	}
	if out != nil {
		opens = opens || out.Odds[i].Opening > 0
	}
	if len(runs) > 1 {
		parts = append(parts, fmt.Sprintf("%s is %s in %d of %d cases", t.Plane.Name, unstableWord(opens), study.Critical(runs, i), len(runs)))
	} else {
		parts = append(parts, fmt.Sprintf("%s is %s in the base", t.Plane.Name, t.Base.State))
	}
	if out != nil {
		o := out.Odds[i]
		p := fmt.Sprintf("P(%s) %s", unstableWord(opens), Proportion(o.PUnstable, o.StdErr))
		switch o.PUnstable {
		case 0:
			p = fmt.Sprintf("P(%s) 0 in %d realisations (95 %% upper bound about 3/N = %.2g, the rule of three)", unstableWord(opens), out.N, 3/float64(out.N))
		case 1:
			p = fmt.Sprintf("P(%s) 1 in %d realisations (95 %% lower bound about 1 − 3/N = %.4g, the rule of three)", unstableWord(opens), out.N, 1-3/float64(out.N))
		}
		switch {
		case math.IsNaN(o.FS[0]) && !math.IsNaN(o.FS[2]):
			p += fmt.Sprintf(", FS up to %s (95 %%; it opens in more than 5 %% of the realisations)", Fixed(o.FS[2], 2))
		case !math.IsNaN(o.FS[0]):
			p += fmt.Sprintf(", FS %s to %s (5 to 95 %%)", Fixed(o.FS[0], 2), Fixed(o.FS[2], 2))
		}
		if o.Driver >= 0 {
			p += fmt.Sprintf(", most sensitive to %s (ρ = %s)", out.Inputs[o.Driver], Signed(o.Rho[o.Driver]))
		}
		parts = append(parts, p)
	}
	return strings.Join(parts, "; ") + "."
}

// ChanceTable is the short verdict table that cleft chance prints: the
// least sure rows (up to limit), as aligned text.
func ChanceTable(targets []study.Target, runs []study.CaseRun, out *study.Outcome, limit int) []string {
	head := []string{"plane", "base", "cases unstable", "P(unstable)", "FS 5–95 %", "driver (ρ)"}
	rows := [][]string{head}
	for _, i := range ChanceOrder(targets, runs, out)[:min(limit, len(targets))] {
		t := &targets[i]
		row := []string{t.Plane.Name, t.Base.State.String(), "—", "—", "—", "—"}
		if len(runs) > 1 {
			row[2] = fmt.Sprintf("%d of %d", study.Critical(runs, i), len(runs))
		}
		if out != nil {
			o := out.Odds[i]
			row[3] = Proportion(o.PUnstable, o.StdErr)
			row[4] = Fixed(o.FS[0], 2) + " – " + Fixed(o.FS[2], 2)
			if o.Driver >= 0 {
				row[5] = fmt.Sprintf("%s (%s)", out.Inputs[o.Driver], Signed(o.Rho[o.Driver]))
			}
		}
		rows = append(rows, row)
	}
	width := make([]int, len(head))
	for _, r := range rows {
		for k, c := range r {
			width[k] = max(width[k], len([]rune(c)))
		}
	}
	var out2 []string
	for _, r := range rows {
		var b strings.Builder
		for k, c := range r {
			b.WriteString(c)
			if k < len(r)-1 {
				b.WriteString(strings.Repeat(" ", width[k]-len([]rune(c))+2))
			}
		}
		out2 = append(out2, strings.TrimRight(b.String(), " "))
	}
	return out2
}

// SlopeChanceLines puts the slope's odds in words: for each planar case
// feasible in the base, P(FS < 1) in each water case.
func SlopeChanceLines(sc *slope.Screening, out *study.Outcome) []string {
	var lines []string
	for _, o := range out.Slope {
		c := sc.Cases[o.Case]
		var ps []string
		for w, wc := range sc.Slope.Water {
			ps = append(ps, fmt.Sprintf("%s %s", Proportion(o.P[w], o.StdErr[w]), WaterCase(wc)))
		}
		lines = append(lines, fmt.Sprintf("Planar sliding on %s: P(FS < 1) %s (kinematically feasible in %.0f %% of the realisations).",
			sc.Names(c), strings.Join(ps, ", "), 100*float64(o.Feasible)/float64(out.N)))
	}
	return lines
}

// TunnelChanceLines puts the tunnel's odds in one sentence: for each
// target, the largest P(unstable) along the alignment and where, and at
// how many stations it reaches one half; the most likely first.
func TunnelChanceLines(sc *tunnel.Screening, out *study.Outcome) []string {
	type worst struct {
		name     string
		p, at    float64
		half     int
		position int
	}
	ws := make([]worst, len(sc.Targets))
	for k, tg := range sc.Targets {
		ws[k] = worst{name: tg.Name, p: -1, position: k}
	}
	for _, o := range out.Tunnel {
		w := &ws[o.Target]
		if o.P > w.p {
			w.p, w.at = o.P, sc.Stations[o.Station].Chainage
		}
		if o.P >= 0.5 {
			w.half++
		}
	}
	sort.SliceStable(ws, func(a, b int) bool { return ws[a].p > ws[b].p })
	var parts []string
	for _, w := range ws {
		s := fmt.Sprintf("%s %.2f at chainage %g m", w.name, w.p, w.at)
		if w.p == 0 {
			s = fmt.Sprintf("%s 0", w.name)
		}
		if w.half > 0 {
			s += fmt.Sprintf(" (0.5 or more at %s)", Plural(w.half, "station", "stations"))
		}
		parts = append(parts, s)
	}
	return []string{fmt.Sprintf("Along the tunnel (%d stations), the largest probability of being critical or opening in the far field at the axis depth: %s.", len(sc.Stations), strings.Join(parts, "; "))}
}

// Proportion writes a probability with its standard error, the error to
// one significant digit and the probability to the same decimal (at least
// two): "0.61 ± 0.01", "0.058 ± 0.002"; "1.00 ± 0" when the error is 0.
func Proportion(p, se float64) string {
	if se == 0 {
		return fmt.Sprintf("%.2f ± 0", p)
	}
	d := max(2, int(math.Ceil(-math.Log10(se)+1e-9)))
	r := math.Pow(10, float64(d))
	return fmt.Sprintf("%.*f ± %.*f", d, p, d, math.Max(math.Round(se*r)/r, 1/r))
}
