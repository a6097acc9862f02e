package plots

import (
	"bytes"
	_ "embed"
	"fmt"
	"html/template"
	"io"
	"math"
	"strings"
	"time"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/plot/vg"
)

// Report is everything the effective-stress report shows. The caller fills
// it from its own results; WriteHTML lays it out as one self-contained HTML
// file: inline CSS, figures as inline SVG, no scripts, nothing fetched.
type Report struct {
	Site      string
	Generated time.Time
	Version   string
	Inputs    []InputFile
	Model     string   // the model in one line
	Summary   []string // the plain-words summary, one sentence each
	Params    []Param
	Notes     []string
	States    []DepthState
	Planes    []ReportPlane // least to most stable
	BySet     bool          // group the plane table by Set
	Sets      []ReportSet   // joint sets of the field readings, or none
	SetNote   string        // how the sets were found
	Slope     *ReportTable  // the rock-slope screening, or nil
	Tunnel    *ReportTable  // the tunnel screening, or nil
	Figures   []ReportFigure
	Criterion string // the site criterion in words
	Caution   string
}

// InputFile is an input with its SHA-256, so that a reader can tell which
// inputs made the report.
type InputFile struct {
	Name   string
	SHA256 string
}

// Param is one input parameter.
type Param struct {
	Group, Name, Value, Unit, Source string
	Default                          bool
}

// DepthState is the far field at one report depth, with the friction of
// its frictional-limit check.
type DepthState struct {
	State    insitu.State
	Friction float64
}

// ReportPlane is one row of the plane table.
type ReportPlane struct {
	Name        string
	Set         string
	Orientation planes.Orientation
	Depth       float64
	Result      planes.Result
}

// ReportSet is one joint set: its statistics and the stress on its mean
// plane.
type ReportSet struct {
	Name          string
	Count         int
	WeightedCount float64
	Stats         planes.FisherStats
	WoodcockK     float64
	Depth         float64
	Result        planes.Result
}

// ReportTable is a titled table of text cells with notes before it.
type ReportTable struct {
	Notes   []string
	Columns []string
	Numeric []bool // right-aligned columns
	Rows    [][]string
	Empty   string // shown when there are no rows
}

// ReportFigure is a figure drawn inline, with its caption.
type ReportFigure struct {
	Title   string
	Caption string
	Figure  Figure
	W, H    vg.Length
}

//go:embed report.html.tmpl
var reportTemplate string

var reportTmpl = template.Must(template.New("report").Funcs(template.FuncMap{
	"num":    fmtNum,
	"fixed":  fmtFixed,
	"angle":  func(v float64, w int) string { return fmtAngle(v, w) },
	"orient": func(o planes.Orientation) string { return o.String() },
	"utc":    func(t time.Time) string { return t.UTC().Format("2006-01-02 15:04 MST") },
	"regime": regimeText,
	"ratio":  ratioText,
	"limit":  func(mu float64) string { return fmtFixed(insitu.FrictionalLimit(mu), 3) },
	"axis":   func(s insitu.State, i int) geom.Line { return s.Principal.Axis(i) },
	"eff":    func(s insitu.State, i int) float64 { return s.EffectivePrincipal()[i] },
	"sigma":  func(s insitu.State, i int) float64 { return s.Principal.Values[i] },
	"isopen": func(r planes.Result) bool { return r.State == planes.Opening },
	"iscrit": func(r planes.Result) bool { return r.State == planes.Critical },
	"groups": groupPlanes,
	"inc":    func(i int) int { return i + 1 },
	"seq3":   func() []int { return []int{0, 1, 2} },
	"rake":   fmtRake,
	"plane":  func(f planes.FisherStats) string { return f.MeanPlane().String() },
	"pole": func(f planes.FisherStats) string {
		l := f.MeanPole()
		return fmt.Sprintf("%03.0f/%02.0f", l.Trend, l.Plunge)
	},
}).Parse(reportTemplate))

// fmtNum formats with up to 4 significant decimals, "—" for NaN.
func fmtNum(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	return fmt.Sprintf("%.4g", v+0)
}

func fmtFixed(v float64, d int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	return fmt.Sprintf("%.*f", d, v+0)
}

// fmtRake rounds a rake to whole degrees in (−180, 180]: −179.7 shows as 180.
func fmtRake(v float64) string {
	if math.IsNaN(v) {
		return "—"
	}
	r := math.Round(v)
	if r == -180 {
		r = 180
	}
	return fmt.Sprintf("%.0f", r+0)
}

func fmtAngle(v float64, w int) string {
	if math.IsNaN(v) {
		return "—"
	}
	return fmt.Sprintf("%0*.0f", w, v)
}

func regimeText(s insitu.State) string {
	p := s.Principal
	if p.Isotropic() {
		return "isotropic (no regime)"
	}
	f := p.Regime()
	phi := p.Shape()
	base := fmt.Sprintf("%s, φ = %.2f, Aφ = %.2f", f.Regime, phi, insitu.APhi(f.Regime, phi))
	if !f.Andersonian() {
		return fmt.Sprintf("not Andersonian: nearest %s (σ%d axis %.1f° from vertical); φ = %.2f", f.Regime, f.Axis+1, f.Tilt, phi)
	}
	return base
}

func ratioText(s insitu.State, mu float64) template.HTML {
	r := s.EffectiveRatio()
	lim := insitu.FrictionalLimit(mu)
	switch {
	case math.IsNaN(r):
		return "undefined (no stress)"
	case math.IsInf(r, 1):
		return template.HTML(`∞ (σ3' ≤ 0) <strong class="flag">exceeds</strong>`)
	case r > lim:
		return template.HTML(fmt.Sprintf(`%.3f <strong class="flag">exceeds</strong>`, r))
	}
	return template.HTML(fmt.Sprintf("%.3f, within", r))
}

// PlaneGroup is the planes of one set, for the grouped table.
type PlaneGroup struct {
	Set    string
	Planes []ReportPlane
}

func groupPlanes(ps []ReportPlane, bySet bool) []PlaneGroup {
	if !bySet {
		return []PlaneGroup{{Planes: ps}}
	}
	var gs []PlaneGroup
	idx := map[string]int{}
	for _, p := range ps { // ps is least-stable first, so groups are too
		i, ok := idx[p.Set]
		if !ok {
			i = len(gs)
			idx[p.Set] = i
			set := p.Set
			gs = append(gs, PlaneGroup{Set: set})
		}
		gs[i].Planes = append(gs[i].Planes, p)
	}
	return gs
}

// figureSVG draws f as SVG and strips the XML prolog so that it can stand
// inside HTML.
func figureSVG(f ReportFigure) (template.HTML, error) {
	var b bytes.Buffer
	if err := Write(f.Figure, f.W, f.H, "svg", &b); err != nil {
		return "", err
	}
	s := b.String()
	if i := strings.Index(s, "<svg"); i >= 0 {
		s = s[i:]
	}
	// Let the figure scale with the page, keeping its proportions.
	s = strings.Replace(s, "<svg width=", `<svg class="fig" data-width=`, 1)
	s = strings.Replace(s, " height=", " data-height=", 1)
	return template.HTML(s), nil
}

// WriteHTML writes the report.
func (r *Report) WriteHTML(w io.Writer) error {
	type fig struct {
		ReportFigure
		SVG template.HTML
		N   int
	}
	var figs []fig
	for i, f := range r.Figures {
		svg, err := figureSVG(f)
		if err != nil {
			return err
		}
		figs = append(figs, fig{ReportFigure: f, SVG: svg, N: i + 1})
	}
	return reportTmpl.Execute(w, struct {
		*Report
		Figs []fig
	}{r, figs})
}
