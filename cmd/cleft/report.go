package main

import (
	"fmt"
	"math"
	"strings"
	"time"

	"cleft/insitu"
	"cleft/planes/assess"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
	"cleft/plots/report"
	"cleft/plots/words"
)

// now is the clock of the report header; tests may fix it.
var now = time.Now

// report builds the effective-stress report of the assessment.
func (a *screened) report(example bool, facts assess.Facts, figs []*namedFigure) *report.Report {
	s := a.Site
	r := &report.Report{
		Site:      s.Name,
		Generated: now().UTC().Format("2006-01-02 15:04 MST"),
		Version:   version,
		Model:     s.Summary(),
		Summary:   words.Summary(facts),
		Notes:     s.Notes,
		Criterion: s.Criterion.String(),
		Caution:   strings.TrimPrefix(caution, "Caution: "),
	}
	for _, in := range a.Inputs {
		if example {
			in.Name += " (built-in demo)"
		}
		r.Inputs = append(r.Inputs, report.Input{Name: in.Name, SHA256: in.SHA256})
	}
	for _, p := range s.Params {
		r.Params = append(r.Params, report.Param{Group: p.Group, Name: p.Name, Value: p.Value, Unit: p.Unit, Source: p.Source, Default: p.Default})
	}
	mu := s.Criterion.Friction()
	for _, z := range a.ReportDepths() {
		r.States = append(r.States, reportState(s.Model.At(z), mu))
	}
	r.Planes, r.BySet = a.planeTable()
	for _, f := range figs {
		r.Figures = append(r.Figures, report.Figure{Title: f.title, Caption: f.caption, SVG: f.svg})
	}
	if a.slope != nil {
		r.Slope = slopeReport(a.slope, s.SlopeDefaults)
		if a.counts != nil {
			r.SlopeReadings = slopeReadingsReport(a.counts)
		}
	}
	if a.tunnel != nil {
		r.Zones, r.Tunnel = zonesReport(a.tunnel), tunnelReport(a.tunnel, s.TunnelDefaults)
	}
	if a.Grouping != nil {
		r.Sets = a.setsTable()
	}
	return r
}

// reportState is the stress state at one depth, in words.
func reportState(st insitu.State, mu float64) report.State {
	p := st.Principal
	eff := st.EffectivePrincipal()
	lc := insitu.CheckLimit(st, mu)
	out := report.State{Depth: words.Num(st.Depth), PorePressure: words.Fixed(st.PorePressure, 3), Regime: words.Regime(p),
		Limit: fmt.Sprintf("%s (μ = %s)", words.Fixed(lc.Limit, 3), words.Num(mu)), Exceeds: lc.Exceeds}
	switch {
	case math.IsNaN(lc.Ratio):
		out.Ratio = "undefined (no stress)"
	case math.IsInf(lc.Ratio, 1):
		out.Ratio = "∞ (σ3' ≤ 0)"
	default:
		out.Ratio = fmt.Sprintf("%.3f", lc.Ratio)
		out.Within = !lc.Exceeds
	}
	for i := range 3 {
		l := p.Axis(i)
		out.Principal[i] = report.Principal{Total: words.Fixed(p.Values[i], 3), Effective: words.Fixed(eff[i], 3), Axis: words.Angle(l.Trend, 3) + "/" + words.Angle(l.Plunge, 2)}
	}
	return out
}

// maxReportPlanes is the most planes the report lists: the least stable;
// every plane is in planes.csv, and the report says so.
const maxReportPlanes = 500

// planeTable is the plane table, least stable first, grouped by set (sets in
// order of their least stable plane) when the planes carry a set column; the
// maxReportPlanes least stable when there are more.
func (a *screened) planeTable() (*report.Table, bool) {
	t := &report.Table{Columns: []string{"plane", "dip/dip dir.", "depth m", "σn'", "τ", "Ts", "Td", "FS", "ΔPp to slip", "rake °", "slip trend °", "sense", "state"},
		Numeric: []bool{false, true, true, true, true, true, true, true, true, true, true, false, false},
		NoWrap:  []bool{0: true, 12: true}}
	setCol := -1
	for i, n := range a.Extras {
		if n == "set" {
			setCol = i
		}
	}
	var order []string
	groups := map[string]*report.Group{}
	ranked := a.Ranked()
	if len(ranked) > maxReportPlanes {
		t.Notes = append(t.Notes, fmt.Sprintf("The %d least stable of the %d planes are listed; planes.csv and planes.json hold every plane.", maxReportPlanes, len(ranked)))
		ranked = ranked[:maxReportPlanes]
	}
	for _, i := range ranked {
		p, res := &a.Planes[i], a.Results[i]
		sense := res.Sense.String()
		if sense == "" {
			sense = "—"
		}
		row := report.Row{Class: res.State.String(), Cells: []string{p.Name, p.Orientation.String(), words.Num(p.Depth), words.Fixed(res.EffectiveNormal, 3), words.Fixed(res.Shear, 3),
			words.Fixed(res.SlipTendency, 3), words.Fixed(res.DilationTendency, 3), words.Fixed(res.FactorOfSafety, 2), words.Fixed(res.PressureToSlip, 2), words.Rake(res.Rake), words.Trend(res.SlipTrend), sense, words.StateLabel(res.State)}}
		set := ""
		if setCol >= 0 {
			set = p.Extras[setCol]
		}
		g, ok := groups[set]
		if !ok {
			g = &report.Group{}
			groups[set] = g
			order = append(order, set)
		}
		g.Rows = append(g.Rows, row)
	}
	for _, set := range order { // in order of each set's least stable plane
		g := groups[set]
		name := set
		if name == "" {
			name = "(none)"
		}
		g.Title = fmt.Sprintf("set %s — %s", name, words.Plural(len(g.Rows), "plane", "planes"))
		t.Groups = append(t.Groups, *g)
	}
	return t, setCol >= 0
}

// setsTable is the table of the joint sets: statistics, how they were found,
// and the stress on each mean plane.
func (a *screened) setsTable() *report.Table {
	t := &report.Table{
		Notes:   []string{words.Grouping(a.Grouping) + " Statistics after Fisher (1953) — mean plane, concentration K, 95 % cone α95 — and Woodcock (1977) K of the orientation tensor (above 1 a cluster, below 1 a girdle). The stress is resolved on each set's mean plane at the median depth of its readings."},
		Columns: []string{"set", "readings", "weighted", "mean plane", "pole", "K", "α95 °", "Woodcock K", "depth m", "σn'", "τ", "Ts", "FS", "ΔPp to slip", "state"},
		Numeric: []bool{false, true, true, true, true, true, true, true, true, true, true, true, true, true, false},
		NoWrap:  []bool{14: true},
	}
	for _, st := range a.Sets {
		r, f := st.Result, st.Set.Raw
		pole := f.MeanPole()
		t.Rows = append(t.Rows, report.Row{Class: r.State.String(), Cells: []string{st.Name, fmt.Sprint(len(st.Set.Members)), words.Fixed(st.Set.WeightedCount, 1),
			f.MeanPlane().String(), fmt.Sprintf("%03.0f/%02.0f", pole.Trend, pole.Plunge), words.Fixed(f.K, 1), words.Fixed(f.Alpha, 1), words.Fixed(st.Set.RawTensor.WoodcockK(), 2),
			words.Num(st.Plane.Depth), words.Fixed(r.EffectiveNormal, 3), words.Fixed(r.Shear, 3), words.Fixed(r.SlipTendency, 3), words.Fixed(r.FactorOfSafety, 2),
			words.Fixed(r.PressureToSlip, 2), words.StateLabel(r.State)}})
	}
	return t
}

// slopeReport is the slope screening as the report shows it: the settings
// and defaults, the counts, and the feasible cases with their blocks and
// factors of safety.
func slopeReport(sc *slope.Screening, defaults []string) *report.Table {
	lines := words.SlopeLines(sc)
	t := &report.Table{Notes: lines[:3], Empty: "No test is kinematically feasible for this face."}
	if len(defaults) > 0 {
		t.Notes = append(t.Notes, "Defaults applied: "+strings.Join(defaults, "; ")+".")
	}
	t.Notes = append(t.Notes, "The feasible cases (every test, feasible or not, with the condition that failed, is in slope.csv with the wedges' face traces and areas; the mode of a wedge comes from the normal reactions of its block, the plan-view rule in brackets where it differs). Planar blocks are per metre of slope (MN/m); a wedge is the largest the two planes cut, its line daylighting at the toe; its block is its weight and volume. FS columns by water case (m of water at the block's deepest wet point; the head of the table and full cases varies by block, see slope.csv):")
	t.Columns = []string{"test", "planes", "mode", "line", "φ °", "block"}
	t.Numeric = []bool{false, false, false, true, true, true}
	for _, w := range sc.Slope.Water {
		t.Columns = append(t.Columns, "FS "+words.WaterShort(w))
		t.Numeric = append(t.Numeric, true)
	}
	t.Columns = append(t.Columns, "zw to FS 1, m", fmt.Sprintf("bolt for FS %g", sc.Slope.TargetFS), "least FS")
	t.Numeric = append(t.Numeric, true, true, true)
	for _, c := range sc.Cases {
		if !c.Feasible {
			continue
		}
		line := ""
		if c.Test == slope.WedgeTest && c.HasLine {
			line = fmt.Sprintf("%03.0f/%02.0f", c.Line.Trend, c.Line.Plunge)
		}
		block := ""
		switch {
		case c.Wedge != nil:
			block = fmt.Sprintf("%s MN, %s m³", words.Num(c.Wedge.Weight), words.Fixed(c.Wedge.Volume, 0))
		case c.Test == slope.PlanarTest && c.FS != nil:
			block = "crack " + words.Fixed(c.CrackDepth, 1) + " m"
		}
		row := []string{c.Test.String(), sc.Names(c), words.Reason(sc, c), line, words.Fixed(c.Phi, 1), block}
		least := math.Inf(1)
		for i := range sc.Slope.Water {
			v := math.NaN()
			if i < len(c.FS) {
				v = c.FS[i]
				least = math.Min(least, v)
			}
			row = append(row, words.FS(v))
		}
		w := words.Fixed(c.WaterToFail, 1)
		if c.Test == slope.PlanarTest && math.IsNaN(c.WaterToFail) {
			w = "not reached"
		}
		bolt := ""
		switch {
		case c.FS == nil:
		case math.IsNaN(c.BoltToTarget):
			bolt = "not reached"
		case c.BoltToTarget == 0:
			bolt = "none needed"
		case c.Test == slope.PlanarTest:
			bolt = words.Num(c.BoltToTarget) + " MN/m"
		default:
			bolt = words.Num(c.BoltToTarget) + " MN"
		}
		class, lf := "", ""
		if c.FS != nil {
			lf = words.FS(least)
			if least <= 1 {
				class, lf = "critical", "▲ "+lf
			}
		}
		t.Rows = append(t.Rows, report.Row{Class: class, Cells: append(row, w, bolt, lf)})
	}
	return t
}

// slopeReadingsReport is the readings against the slope's tests.
func slopeReadingsReport(counts []slope.Count) *report.Table {
	t := &report.Table{Notes: words.ReadingLines(counts)[1:],
		Columns: []string{"test", "sets", "tested", "passing", "share %", "weighted share %"},
		Numeric: []bool{false, false, true, true, true, true}}
	for _, c := range counts {
		t.Rows = append(t.Rows, report.Row{Cells: []string{c.Test.String(), words.SetsOf(c), fmt.Sprint(c.Tested), fmt.Sprint(c.Pass),
			words.Fixed(100*c.Share(), 1), words.Fixed(100*c.WeightedShare(), 1)}})
	}
	return t
}

// tunnelReport is the rest of the tunnel screening as the report shows it,
// after zonesReport: the defaults, and a table of each plane or set at the
// station of the largest boundary stress σmax (the largest σmax/UCS).
func tunnelReport(sc *tunnel.Screening, defaults []string) *report.Table {
	var notes []string
	if len(defaults) > 0 {
		notes = append(notes, "Defaults applied: "+strings.Join(defaults, "; ")+".")
	}
	w := sc.Stations[sc.Worst()]
	notes = append(notes, fmt.Sprintf("At the station of the largest boundary stress σmax, chainage %g m (axis %.0f m deep; every station is in stations.csv, wall.csv and profile.csv):", w.Chainage, w.Depth))
	t := &report.Table{Notes: notes,
		Columns: []string{"plane or set", "strike to axis °", "drive", "class", "Ts", "FS", "ΔPp to slip", "wall critical °", "wall opening °"},
		Numeric: []bool{false, true, false, false, true, true, true, false, false}}
	for i, tg := range sc.Targets {
		r := w.Rows[i]
		t.Rows = append(t.Rows, report.Row{Cells: []string{tg.Name, words.Fixed(r.Drive.StrikeToAxis, 0), r.Drive.Drive.String(), r.Drive.Class.String(),
			words.Fixed(r.Far.SlipTendency, 3), words.Fixed(r.Far.FactorOfSafety, 2), words.Fixed(r.Far.PressureToSlip, 2), words.ArcsOrNone(r.Critical), words.ArcsOrNone(r.Opening)}})
	}
	return t
}
