package main

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/planes/assess"
	"cleft/plots"
)

// figureOptions are the choices shared by cleft plot and cleft assess.
type figureOptions struct {
	measure  plots.Measure
	depth    float64 // NaN: the default depth
	proj     plots.Projection
	grid     bool
	contours []float64
	traces   string // unstable, all, none, or comma-separated names
}

func (o figureOptions) with(m plots.Measure) figureOptions { o.measure = m; return o }

// depthFor is the depth asked for in o, or the figure depth.
func depthFor(a *assess.Assessment, o figureOptions) float64 {
	if math.IsNaN(o.depth) {
		return a.FigureDepth()
	}
	return o.depth
}

// traced reports whether plane i gets its great circle drawn.
func traced(a *assess.Assessment, i int, which string) bool {
	switch which {
	case "none":
		return false
	case "all":
		return true
	case "unstable", "":
		return a.Results[i].State != planes.Stable
	}
	for _, n := range strings.Split(which, ",") {
		if strings.TrimSpace(n) == a.Planes[i].Name {
			return true
		}
	}
	return false
}

// checkTraces reports names in --great-circles that match no plane.
func checkTraces(a *assess.Assessment, which string) error {
	switch which {
	case "none", "all", "unstable", "":
		return nil
	}
	names := map[string]bool{}
	for _, p := range a.Planes {
		names[p.Name] = true
	}
	for _, n := range strings.Split(which, ",") {
		if n = strings.TrimSpace(n); !names[n] {
			return usagef("--great-circles: no plane is named %q (give names, or unstable, all, none)", n)
		}
	}
	return nil
}

// maxPoles is the most planes a stereonet or a Mohr diagram draws, and
// maxTraces the most great circles: beyond them a figure shows nothing more
// but grows without bound. The least stable are drawn, and the figure says
// how many are not.
const (
	maxPoles  = 2000
	maxTraces = 100
)

// drawn returns the indexes of the planes a figure draws, in input order:
// every plane, or the maxPoles least stable; and which of them get their
// great circle (which: see traced), at most maxTraces, the least stable.
func drawn(a *assess.Assessment, which string) (idx []int, trace map[int]bool) {
	rank := a.Ranked()
	trace = map[int]bool{}
	for _, i := range rank {
		if len(trace) == maxTraces {
			break
		}
		if traced(a, i, which) {
			trace[i] = true
		}
	}
	if len(rank) <= maxPoles {
		idx = make([]int, len(rank))
		for i := range idx {
			idx[i] = i
		}
		return idx, trace
	}
	idx = append(idx, rank[:maxPoles]...)
	sort.Ints(idx)
	for i := range trace {
		if j := sort.SearchInts(idx, i); j == len(idx) || idx[j] != i {
			delete(trace, i)
		}
	}
	return idx, trace
}

// hiddenNote says how many planes a figure leaves out, or "".
func hiddenNote(a *assess.Assessment, idx []int, trace map[int]bool, which string) string {
	var parts []string
	if len(idx) < len(a.Planes) {
		parts = append(parts, fmt.Sprintf("the %d least stable of %d planes are drawn", len(idx), len(a.Planes)))
	}
	if len(trace) == maxTraces {
		n := 0
		for i := range a.Planes {
			if traced(a, i, which) {
				n++
			}
		}
		if n > maxTraces {
			parts = append(parts, fmt.Sprintf("great circles of the %d least stable of %d", maxTraces, n))
		}
	}
	return strings.Join(parts, "; ")
}

// stereonet builds the tendency stereonet for a figure of w × h, its field
// computed at the figure depth with the site's water model and strength.
// With more than maxPoles planes it draws the least stable.
func stereonet(a *assess.Assessment, o figureOptions, w, h float64) *plots.Stereonet {
	z := depthFor(a, o)
	st := &plots.Stereonet{
		Site:      a.Site.Name,
		Model:     a.Site.Summary(),
		Depth:     z,
		State:     a.Site.Model.At(z),
		Criterion: a.Site.Criterion,
		Measure:   o.measure,
		Proj:      o.proj,
		Grid:      o.grid,
		Contours:  o.contours,
	}
	st.Field = plots.NewField(st.State, st.Criterion, st.Measure, st.Proj, plots.FieldSize(cm(w, 0), cm(h, 0)))
	idx, trace := drawn(a, o.traces)
	byName := o.traces != "" && o.traces != "unstable" && o.traces != "all" && o.traces != "none"
	for _, i := range idx {
		p := &a.Planes[i]
		st.Poles = append(st.Poles, plots.Pole{Name: p.Name, Orientation: p.Orientation, Result: a.Results[i], Trace: trace[i], Named: byName && trace[i]})
	}
	if n := hiddenNote(a, idx, trace, o.traces); n != "" {
		st.Note = strings.ToUpper(n[:1]) + n[1:]
	}
	if o.traces != "none" {
		for _, s := range a.Sets {
			st.Means = append(st.Means, plots.Pole{Name: s.Name, Orientation: s.Plane.Orientation, Result: s.Result})
		}
	}
	return st
}

// mohr builds the Mohr diagram at the figure depth: every plane (the
// maxPoles least stable when there are more) resolved at that depth
// (site.Resolver.ResolveAt), the site's envelope and one for each distinct
// per-plane Coulomb criterion.
func mohr(a *assess.Assessment, o figureOptions) *plots.Mohr {
	z := depthFor(a, o)
	s := a.Site
	m := &plots.Mohr{
		Site:  s.Name,
		Model: s.Summary(),
		Depth: z,
		State: s.Model.At(z),
		Note:  "Every plane at this depth by its orientation; planes with their own pore pressure keep its excess over the water model",
	}
	m.Envelopes = append(m.Envelopes, plots.Envelope{Label: "site strength: " + s.Criterion.String(), Criterion: s.Criterion})
	seen := map[string]bool{s.Criterion.String(): true}
	rv := s.Resolver()
	idx, _ := drawn(a, "none")
	if len(idx) < len(a.Planes) {
		m.Note += fmt.Sprintf("\nThe %d least stable of %d planes are drawn", len(idx), len(a.Planes))
	}
	for _, i := range idx {
		p := &a.Planes[i]
		var r planes.Result
		c := rv.ResolveAt(p, z, &r)
		m.Points = append(m.Points, plots.MohrPoint{Name: p.Name, Result: r, Depth: p.Depth, Own: &a.Results[i]})
		if k := c.String(); !seen[k] {
			seen[k] = true
			m.Envelopes = append(m.Envelopes, plots.Envelope{Label: fmt.Sprintf("%s: %s", p.Name, k), Criterion: c})
		}
	}
	return m
}

// figures are the assessment's figures, built once for the files and the
// report: the slip and dilation stereonets and the Mohr diagram at the
// figure depth, then those of the readings, the tunnel and the slope.
func (a *screened) figures() []*namedFigure {
	fo := figureOptions{depth: math.NaN(), proj: plots.EqualArea, traces: "unstable"}
	z := a.FigureDepth()
	figs := []*namedFigure{
		{file: "stereonet-slip",
			title: fmt.Sprintf("Slip tendency of every plane, and of every orientation at %g m", z),
			caption: fmt.Sprintf("Lower-hemisphere equal-area net of poles to planes. Each pole is coloured by the plane's own slip tendency Ts = τ/σn' at its own depth (the key's upper strip) and shaped by its state (circle stable, triangle critical, square with a cross opening); critical and opening poles are named, and every pole when there are at most %d. The background is Ts for every orientation at %g m with the site's water model and strength, in paler bands stepped at its contour lines (the key's lower strip); the dark red line (if any) is where the factor of safety is 1 and orientations past it would slip. The black hexagons with one, two and three bars are the principal stress axes σ1, σ2 and σ3; great circles are drawn for the critical and opening planes, dashed ones for the mean planes of the joint sets. %s",
				plots.NameAll, z, traceNote(a.Assessment)),
			fig: stereonet(a.Assessment, fo.with(plots.SlipTendency), 19, 13.5), w: cm(19, 0), h: cm(13.5, 0)},
		{file: "stereonet-dilation",
			title:   fmt.Sprintf("Dilation tendency of every plane, and of every orientation at %g m", z),
			caption: "As Figure 1 for the dilation tendency Td = (σ1 − σn)/(σ1 − σ3): the light end (right on the key) marks the planes nearest to opening, the likely water paths.",
			fig:     stereonet(a.Assessment, fo.with(plots.DilationTendency), 19, 13.5), w: cm(19, 0), h: cm(13.5, 0)},
		{file: "mohr",
			title:   fmt.Sprintf("Mohr diagram of effective stress at %g m", z),
			caption: fmt.Sprintf("The three effective Mohr circles at %g m and every plane at that depth by its orientation (planes with their own pore pressure keep its excess over the water model). Red lines are the strength envelopes in use. The arrow shows the change in pore pressure that brings the most critical plane (opening planes aside) to its envelope at this depth; the key gives its value and, for a plane at another depth of its own, the value of the tables there. Critical and opening planes are named. Both axes have the same scale.", z),
			fig:     mohr(a.Assessment, fo), w: cm(17, 0), h: cm(12, 0)},
	}
	if a.Grouping != nil {
		figs = append(figs, densityFigure(a.Grouping, a.Site.Name, plots.EqualArea))
	}
	if a.tunnel != nil {
		figs = append(figs, tunnelFigures(a.Site, a.tunnel, sectionStation(a.tunnel), a.tunnel.Worst())...)
	}
	if a.slope != nil {
		figs = append(figs, slopeFigure(a.Site.Name, a.slope))
	}
	return figs
}

func traceNote(a *assess.Assessment) string {
	for i := range a.Planes {
		if traced(a, i, "unstable") {
			return ""
		}
	}
	return "No plane is critical or opening, so no great circle is drawn."
}
