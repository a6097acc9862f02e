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
	}
	if a.tunnel != nil {
		r.Tunnel = tunnelReport(a.tunnel, s.TunnelDefaults)
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
	t := &report.Table{Columns: []string{"plane", "dip/dip dir.", "depth m", "σn'", "τ", "Ts", "Td", "FS", "ΔPp to slip", "rake °", "sense", "state"},
		Numeric: []bool{false, true, true, true, true, true, true, true, true, true, false, false},
		NoWrap:  []bool{11: true}}
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
			words.Fixed(res.SlipTendency, 3), words.Fixed(res.DilationTendency, 3), words.Fixed(res.FactorOfSafety, 2), words.Fixed(res.PressureToSlip, 2), words.Rake(res.Rake), sense, words.StateLabel(res.State)}}
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
			f.MeanPlane().String(), fmt.Sprintf("%03.0f/%02.0f", pole.Trend, pole.Plunge), words.Fixed(f.K, 1), words.Fixed(f.Alpha, 1), words.Fixed(st.Set.Tensor.WoodcockK(), 2),
			words.Num(st.Plane.Depth), words.Fixed(r.EffectiveNormal, 3), words.Fixed(r.Shear, 3), words.Fixed(r.SlipTendency, 3), words.Fixed(r.FactorOfSafety, 2),
			words.Fixed(r.PressureToSlip, 2), words.StateLabel(r.State)}})
	}
	return t
}

// slopeReport is the slope screening as the report shows it: the settings
// and defaults, the counts, and the feasible cases.
func slopeReport(sc *slope.Screening, defaults []string) *report.Table {
	lines := words.SlopeLines(sc)
	t := &report.Table{Notes: lines[:2], Empty: "No test is kinematically feasible for this face."}
	if len(defaults) > 0 {
		t.Notes = append(t.Notes, "Defaults applied: "+strings.Join(defaults, "; ")+".")
	}
	t.Notes = append(t.Notes, "The feasible cases (every test, feasible or not, with the condition that failed, is in slope.csv):")
	t.Columns = []string{"test", "planes", "mode", "line", "crack depth m"}
	t.Numeric = []bool{false, false, false, true, true}
	for _, f := range sc.Slope.CrackFill {
		t.Columns = append(t.Columns, fmt.Sprintf("FS, crack %g%% full", 100*f))
		t.Numeric = append(t.Numeric, true)
	}
	t.Columns = append(t.Columns, "water to FS = 1, m")
	t.Numeric = append(t.Numeric, true)
	for _, c := range sc.Cases {
		if !c.Feasible {
			continue
		}
		line := ""
		if c.Test == slope.WedgeTest && c.HasLine {
			line = fmt.Sprintf("%03.0f/%02.0f", c.Line.Trend, c.Line.Plunge)
		}
		row := []string{c.Test.String(), sc.Names(c), words.Reason(sc, c), line, words.Fixed(c.CrackDepth, 1)}
		for i := range sc.Slope.CrackFill {
			v := math.NaN()
			if i < len(c.FS) {
				v = c.FS[i]
			}
			row = append(row, words.Fixed(v, 2))
		}
		w := words.Fixed(c.WaterToFail, 1)
		if c.Test == slope.PlanarTest && math.IsNaN(c.WaterToFail) {
			w = "not reached"
		}
		t.Rows = append(t.Rows, report.Row{Cells: append(row, w)})
	}
	return t
}

// tunnelReport is the tunnel screening as the report shows it: the notes of
// the summary, and a table of each plane or set at the station of the
// largest tangential stress.
func tunnelReport(sc *tunnel.Screening, defaults []string) *report.Table {
	notes := words.TunnelLines(sc)
	if len(defaults) > 0 {
		notes = append(notes, "Defaults applied: "+strings.Join(defaults, "; ")+".")
	}
	w := sc.Stations[sc.Worst()]
	notes = append(notes, fmt.Sprintf("At the station of the largest tangential stress, chainage %g m (axis %.0f m deep; every station is in stations.csv, wall.csv and profile.csv):", w.Chainage, w.Depth))
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
