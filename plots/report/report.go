// Package report lays out cleft's effective-stress report as one
// self-contained HTML file: inline CSS, figures as inline SVG, no scripts,
// nothing fetched. It is fed plain data — every number already formatted,
// every verdict already in words — and decides nothing itself.
package report

import (
	_ "embed"
	"html/template"
	"io"
	"strconv"
	"strings"
)

// Report is everything the report shows, in the order it shows it.
type Report struct {
	Site      string
	Generated string // date and time of the run, e.g. "2026-12-01 21:40 UTC"
	Version   string
	Inputs    []Input
	Model     string   // the model in one line
	Summary   []string // the plain-words summary, one sentence each
	// LookFirst are the findings to look at first, ranked, one sentence
	// each, after LookRule (how they are ranked, in brief; in full in the
	// method, RankRule) and before More (what is left out) and Checks (the
	// frictional-limit check).
	LookFirst []string
	LookRule  string
	RankRule  string
	More      string
	Checks    []string
	Params    []Param
	Notes     []string
	States    []State // the stress state at the report depths
	Planes    *Table  // the key table: mapped planes and set means, least to most stable
	BySet     bool    // Planes.Groups have titles
	Sets      *Table  // joint sets of the field readings, or nil (in the appendix)
	// Readings is the appendix of the field readings (per set, or every
	// one), or nil.
	Readings *Table
	Slope    *Table // the rock-slope screening, or nil
	// SlopeReadings is the field readings against the slope's tests, or nil.
	SlopeReadings *Table
	Tunnel        *Table // the tunnel screening, or nil
	Zones         *Table // the tunnel's slip zones, shown before Tunnel, or nil
	Chance        *Table // the cases and the Monte Carlo, or nil
	Figures       []Figure
	FiguresNote   string // the figures drawn as files only, or ""
	Criterion     string // the site criterion in words
	Caution       string
}

// Input is an input file with its SHA-256, so that a reader can tell which
// inputs made the report.
type Input struct {
	Name, SHA256 string
}

// Param is one input parameter; Default marks a value the input left out.
type Param struct {
	Group, Name, Value, Unit, Source string
	Default                          bool
}

// State is the stress state at one depth: three rows of principal stresses
// and the cells shared by them.
type State struct {
	Depth, PorePressure, Regime, Ratio, Limit string
	Exceeds                                   bool // the ratio is past the frictional limit (flagged)
	Within                                    bool // the ratio is within it
	Principal                                 [3]Principal
}

// Principal is one principal stress: total and effective magnitude and the
// trend/plunge of its axis.
type Principal struct {
	Total, Effective, Axis string
}

// Table is a table of text cells with notes before it. Rows are in Groups
// when a table is grouped (each group with a title row), else in Rows.
type Table struct {
	Notes   []string
	Columns []string
	Numeric []bool // right-aligned columns
	NoWrap  []bool // columns kept on one line (verdicts)
	Rows    []Row
	Groups  []Group
	Empty   string // shown when there are no rows
}

// Row is one row; Class is "critical", "opening" or "" and sets its style.
// Own marks the cells that are a plane's own input (shown bold). Extra,
// when not "", is shown under the row across the table (a plane's carried
// columns).
type Row struct {
	Class string
	Cells []string
	Own   []bool
	Extra string
}

// Group is a titled run of rows.
type Group struct {
	Title string
	Rows  []Row
}

// Figure is a figure drawn inline: its SVG document and its caption.
type Figure struct {
	Title   string
	Caption string
	SVG     []byte
}

//go:embed report.html.tmpl
var page string

var tmpl = template.Must(template.New("report").Funcs(template.FuncMap{
	"inc": func(i int) int { return i + 1 },
	"dec": func(i int) int { return i - 1 },
	"cell": func(t *Table, r Row, i int) template.HTMLAttr {
		own := i < len(r.Own) && r.Own[i]
		switch {
		case own && i < len(t.Numeric) && t.Numeric[i]:
			return ` class="n own"`
		case own:
			return ` class="own"`
		case i < len(t.Numeric) && t.Numeric[i]:
			return ` class="n"`
		case i < len(t.NoWrap) && t.NoWrap[i]:
			return ` class="state"`
		}
		return ""
	},
	"cls": func(t *Table, i int) template.HTMLAttr {
		switch {
		case i < len(t.Numeric) && t.Numeric[i]:
			return ` class="n"`
		case i < len(t.NoWrap) && t.NoWrap[i]:
			return ` class="state"`
		}
		return ""
	},
}).Parse(page))

// inline strips the XML prolog of an SVG document so that it can stand
// inside HTML, and lets it scale with the page, keeping its proportions.
func inline(svg []byte) template.HTML {
	s := string(svg)
	if i := strings.Index(s, "<svg"); i >= 0 {
		s = s[i:]
	}
	s = strings.Replace(s, "<svg width=", `<svg class="fig" data-width=`, 1)
	s = strings.Replace(s, " height=", " data-height=", 1)
	return template.HTML(s)
}

// size returns the width and height of an SVG document from its viewBox,
// 0 and 0 when it has none.
func size(svg []byte) (w, h float64) {
	s := string(svg[:min(len(svg), 1024)])
	i := strings.Index(s, `viewBox="`)
	if i < 0 {
		return 0, 0
	}
	f := strings.Fields(s[i+len(`viewBox="`):])
	if len(f) < 4 {
		return 0, 0
	}
	w, _ = strconv.ParseFloat(f[2], 64)
	h, _ = strconv.ParseFloat(strings.TrimSuffix(f[3], `"`), 64)
	return w, h
}

// WriteHTML writes the report.
func (r *Report) WriteHTML(w io.Writer) error {
	type fig struct {
		Figure
		SVG  template.HTML
		N    int
		Tall bool // higher than wide: printed up to a page high
	}
	figs := make([]fig, len(r.Figures))
	for i, f := range r.Figures {
		w, h := size(f.SVG)
		figs[i] = fig{Figure: f, SVG: inline(f.SVG), N: i + 1, Tall: h > w}
	}
	return tmpl.Execute(w, struct {
		*Report
		Figs []fig
	}{r, figs})
}
