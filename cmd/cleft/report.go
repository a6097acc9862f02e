package main

import (
	"fmt"
	"math"
	"slices"
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
func (a *screened) report(example bool, facts assess.Facts, figs []*namedFigure, allFigures bool) *report.Report {
	s := a.Site
	r := &report.Report{
		Site:      s.Name,
		Generated: now().UTC().Format("2006-01-02 15:04 MST"),
		Version:   version,
		Model:     s.Summary(),
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
	r.Planes, r.BySet = a.keyTable(), true
	var others []string
	for _, f := range figs {
		if !allFigures && !slices.Contains(keyFigures, f.file) {
			others = append(others, fmt.Sprintf("%s (%s)", f.file, strings.ToLower(f.title[:1])+f.title[1:]))
		}
	}
	for _, name := range keyFigures { // in the order of the report's sections
		for _, f := range figs {
			if f.file == name {
				r.Figures = append(r.Figures, report.Figure{Title: f.title, Caption: f.caption, SVG: f.svg})
			}
		}
	}
	if allFigures {
		for _, f := range figs {
			if !slices.Contains(keyFigures, f.file) {
				r.Figures = append(r.Figures, report.Figure{Title: f.title, Caption: f.caption, SVG: f.svg})
			}
		}
	}
	if len(others) > 0 {
		r.FiguresNote = "Also drawn, as SVG and PNG files in the output folder (cleft assess --report-figures draws them here too): " + strings.Join(others, "; ") + "."
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

// keyFigures are the figures the report draws unless asked for all: the
// slip stereonet and the Mohr diagram of the planes, the kinematic net of
// the slope, the cross-section with the slip zones and the along-alignment
// chart of the tunnel. The others are files in the folder, named in the report.
var keyFigures = []string{"stereonet-slip", "mohr", "slope-kinematic", "tunnel-section", "tunnel-profile"}

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

// maxReportPlanes is the most planes (and readings) a report table lists:
// the least stable; every plane is in planes.csv, and the report says so.
const maxReportPlanes = 500

// setsTable is the table of the joint sets: statistics and how they were
// found (the stress on each mean plane is in the key table).
func (a *screened) setsTable() *report.Table {
	t := &report.Table{
		Notes:   []string{words.Grouping(a.Grouping) + " Statistics after Fisher (1953) — mean plane, concentration K, 95 % cone α95 — and Woodcock (1977) K of the orientation tensor (above 1 a cluster, below 1 a girdle); sets.csv adds the weighted statistics and the stress on each mean plane."},
		Columns: []string{"set", "readings", "weighted", "mean plane", "pole", "K", "α95 °", "Woodcock K", "Woodcock C", "median depth m"},
		Numeric: []bool{false, true, true, true, true, true, true, true, true, true},
	}
	for _, st := range a.Sets {
		f := st.Set.Raw
		pole := f.MeanPole()
		t.Rows = append(t.Rows, report.Row{Cells: []string{st.Name, fmt.Sprint(len(st.Set.Members)), words.Fixed(st.Set.WeightedCount, 1),
			f.MeanPlane().String(), fmt.Sprintf("%03.0f/%02.0f", pole.Trend, pole.Plunge), words.Fixed(f.K, 1), words.Fixed(f.Alpha, 1),
			words.Fixed(st.Set.RawTensor.WoodcockK(), 2), words.Fixed(st.Set.RawTensor.WoodcockC(), 2), words.Num(st.Plane.Depth)}})
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
	t.Notes = append(t.Notes, "The feasible cases; every test, feasible or not, with the condition that failed, the heads of water, face traces and areas, is in slope.csv. A wedge's mode comes from the normal reactions of its block (the plan-view rule in brackets where it differs); a wedge is the largest block its planes cut, so its weight is an upper bound. Planar blocks per metre of slope. FS by water case:")
	t.Columns = []string{"test", "planes", "mode", "line", "φ °", "block"}
	t.NoWrap = []bool{1: true}
	t.Numeric = []bool{false, false, false, true, true, false}
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

// slopeReadingsReport is the readings against the slope's tests, in
// words: per test, how many pass, and the set that passes most (every
// count per set and pair of sets is in slope-readings.csv).
func slopeReadingsReport(counts []slope.Count) *report.Table {
	return &report.Table{Notes: words.ReadingLines(counts)}
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
