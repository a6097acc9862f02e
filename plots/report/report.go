// Package report lays out cleft's effective-stress report as one
// self-contained HTML file: inline CSS, figures as inline SVG, no scripts,
// nothing fetched. It is fed plain data — every number already formatted,
// every verdict already in words — and decides nothing itself.
package report

import (
	_ "embed"
	"html/template"
	"io"
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
	Params    []Param
	Notes     []string
	States    []State // the stress state at the report depths
	Planes    *Table  // the plane table, least to most stable
	BySet     bool    // Planes.Groups are joint sets
	Sets      *Table  // joint sets of the field readings, or nil
	Slope     *Table  // the rock-slope screening, or nil
	// SlopeReadings is the field readings against the slope's tests, or nil.
	SlopeReadings *Table
	Tunnel        *Table // the tunnel screening, or nil
	Zones         *Table // the tunnel's slip zones, shown before Tunnel, or nil
	Chance        *Table // the cases and the Monte Carlo, or nil
	Figures       []Figure
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
type Row struct {
	Class string
	Cells []string
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

// WriteHTML writes the report.
func (r *Report) WriteHTML(w io.Writer) error {
	type fig struct {
		Figure
		SVG template.HTML
		N   int
	}
	figs := make([]fig, len(r.Figures))
	for i, f := range r.Figures {
		figs[i] = fig{Figure: f, SVG: inline(f.SVG), N: i + 1}
	}
	return tmpl.Execute(w, struct {
		*Report
		Figs []fig
	}{r, figs})
}
