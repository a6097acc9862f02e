package main

import (
	"fmt"
	"math"
	"strings"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots/report"
	"cleft/plots/words"
)

// maxCarried is the most carried columns (set, note, …) the key table shows;
// planes.csv has them all.
const maxCarried = 4

// keyTable is the report's one table of the mapped planes and the joint
// sets' mean planes (not the readings), least stable first: each with its
// inputs — μ, c and Pp, marked where they are the plane's own —, σn', τ,
// Ts, FS, ΔPp and state, and under each plane its carried columns (set,
// note, …; those with a value).
func (a *screened) keyTable() *report.Table {
	var carried []int
	for j := range a.Extras {
		for i := 0; i < a.NPlanes; i++ {
			if a.Planes[i].Extras[j] != "" {
				carried = append(carried, j)
				break
			}
		}
	}
	t := &report.Table{Columns: []string{"plane", "dip/dip dir.", "depth m", "μ", "c MPa", "Pp MPa", "σn'", "τ", "Ts", "FS", "ΔPp to slip", "state"},
		Numeric: []bool{false, true, true, true, true, true, true, true, true, true, true, false},
		NoWrap:  []bool{0: true, 11: true}}
	if len(carried) > maxCarried {
		t.Notes = append(t.Notes, fmt.Sprintf("Under each plane, the first %d of its table's %d other columns; planes.csv has them all.", maxCarried, len(carried)))
		carried = carried[:maxCarried]
	}
	var mapped []int
	for _, i := range a.Ranked() {
		if i < a.NPlanes {
			mapped = append(mapped, i)
		}
	}
	if len(mapped) > maxReportPlanes {
		t.Notes = append(t.Notes, fmt.Sprintf("The %d least stable of the %d planes are listed; planes.csv and planes.json hold every plane.", maxReportPlanes, len(mapped)))
		mapped = mapped[:maxReportPlanes]
	}
	g := report.Group{Title: words.Plural(len(mapped), "mapped plane", "mapped planes")}
	for _, i := range mapped {
		p := &a.Planes[i]
		row := a.keyRow(p, a.Results[i])
		var extra []string
		for _, j := range carried {
			if v := p.Extras[j]; v != "" {
				extra = append(extra, a.Extras[j]+": "+v)
			}
		}
		row.Extra = strings.Join(extra, " · ")
		g.Rows = append(g.Rows, row)
	}
	if len(g.Rows) > 0 {
		t.Groups = append(t.Groups, g)
	}
	if len(a.Sets) > 0 {
		g := report.Group{Title: fmt.Sprintf("%s: mean planes of %s", words.Plural(len(a.Sets), "joint set", "joint sets"), words.Plural(len(a.Planes)-a.NPlanes, "field reading", "field readings"))}
		for _, k := range a.RankedSets() {
			s := &a.Sets[k]
			g.Rows = append(g.Rows, a.keyRow(&s.Plane, s.Result))
		}
		t.Groups = append(t.Groups, g)
	}
	return t
}

// keyRow is one plane's row of the key table: its strength and pore
// pressure, the plane's own marked (Row.Own), then its stresses and
// verdict.
func (a *screened) keyRow(p *site.Plane, r planes.Result) report.Row {
	s := a.Site
	mu, c := "B–B", "—"
	if co, ok := s.Criterion.(*planes.Coulomb); ok {
		mu, c = words.Num(co.Mu), words.Num(co.Cohesion)
	}
	own := make([]bool, 12)
	if !math.IsNaN(p.Friction) {
		mu, own[3] = words.Num(p.Friction)+"*", true
		if math.IsNaN(p.Cohesion) && c == "—" {
			c = "0"
		}
	}
	if !math.IsNaN(p.Cohesion) {
		c, own[4] = words.Num(p.Cohesion)+"*", true
	}
	pp := words.Fixed(r.PorePressure, 2)
	if !math.IsNaN(p.PorePressure) {
		pp, own[5] = pp+"*", true
	}
	return report.Row{Class: r.State.String(), Own: own, Cells: []string{p.Name, p.Orientation.String(), words.Num(p.Depth), mu, c, pp,
		words.Fixed(r.EffectiveNormal, 3), words.Fixed(r.Shear, 3), words.Fixed(r.SlipTendency, 3), words.Fixed(r.FactorOfSafety, 2),
		words.Fixed(r.PressureToSlip, 2), words.StateLabel(r.State)}}
}

// readingsTable is the appendix of the field readings: one row per set
// (with the unassigned readings last) with its counts and its least stable
// reading, or with all every reading, least stable first within each set.
func (a *screened) readingsTable(all bool) *report.Table {
	if a.Grouping == nil {
		return nil
	}
	n := len(a.Sets)
	group := func(j int) int {
		if s := a.Grouping.Analysis.Assign[j]; s >= 0 {
			return s
		}
		return n
	}
	if all {
		t := &report.Table{Columns: []string{"reading", "dip/dip dir.", "depth m", "Pp MPa", "σn'", "τ", "Ts", "FS", "ΔPp to slip", "state"},
			Numeric: []bool{false, true, true, true, true, true, true, true, true, false},
			NoWrap:  []bool{0: true, 9: true}}
		groups := make([]report.Group, n+1)
		shown := 0
		for _, i := range a.Ranked() {
			if i < a.NPlanes {
				continue
			}
			if shown == maxReportPlanes {
				t.Notes = append(t.Notes, fmt.Sprintf("The %d least stable readings are listed; planes.csv holds every one.", maxReportPlanes))
				break
			}
			shown++
			p, r := &a.Planes[i], a.Results[i]
			k := group(i - a.NPlanes)
			groups[k].Rows = append(groups[k].Rows, report.Row{Class: r.State.String(), Cells: []string{p.Name, p.Orientation.String(), words.Num(p.Depth), words.Fixed(r.PorePressure, 2),
				words.Fixed(r.EffectiveNormal, 3), words.Fixed(r.Shear, 3), words.Fixed(r.SlipTendency, 3), words.Fixed(r.FactorOfSafety, 2), words.Fixed(r.PressureToSlip, 2), words.StateLabel(r.State)}})
		}
		for k, g := range groups {
			if len(g.Rows) == 0 {
				continue
			}
			name := "unassigned"
			if k < n {
				name = a.Sets[k].Name
			}
			g.Title = fmt.Sprintf("%s — %s", name, words.Plural(len(g.Rows), "reading", "readings"))
			t.Groups = append(t.Groups, g)
		}
		return t
	}
	t := &report.Table{Notes: []string{"Each set's readings in one row: how many are critical or opening, and the least stable of them. Every reading is in planes.csv and planes.json (after the mapped planes, its set in the set column) and in readings.csv of cleft sets; cleft assess --report-readings lists them here."},
		Columns: []string{"set", "readings", "critical", "opening", "least stable", "dip/dip dir.", "depth m", "σn'", "FS", "ΔPp to slip", "state"},
		Numeric: []bool{false, true, true, true, false, true, true, true, true, true, false},
		NoWrap:  []bool{4: true, 10: true}}
	least := make([]int, n+1)
	count := make([][3]int, n+1)
	for k := range least {
		least[k] = -1
	}
	for j := range a.Planes[a.NPlanes:] {
		i, k := a.NPlanes+j, group(j)
		count[k][0]++
		switch a.Results[i].State {
		case planes.Critical:
			count[k][1]++
		case planes.Opening:
			count[k][2]++
		}
		if least[k] < 0 || planes.LessStable(a.Results[i], a.Results[least[k]]) {
			least[k] = i
		}
	}
	for k, i := range least {
		if i < 0 {
			continue
		}
		name := "unassigned"
		if k < n {
			name = a.Sets[k].Name
		}
		p, r := &a.Planes[i], a.Results[i]
		t.Rows = append(t.Rows, report.Row{Class: r.State.String(), Cells: []string{name, fmt.Sprint(count[k][0]), fmt.Sprint(count[k][1]), fmt.Sprint(count[k][2]),
			p.Name, p.Orientation.String(), words.Num(p.Depth), words.Fixed(r.EffectiveNormal, 3), words.Fixed(r.FactorOfSafety, 2), words.Fixed(r.PressureToSlip, 2), words.StateLabel(r.State)}})
	}
	return t
}
