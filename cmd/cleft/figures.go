package main

import (
	"fmt"
	"io"
	"math"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/plots"

	"gonum.org/v1/plot/vg"
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

// figureDepth is the depth of the stereonet field and the Mohr diagram when
// none is asked for: the site's depth, else the median plane depth.
func (a *assessment) figureDepth() float64 {
	if a.site.HasDepth {
		return a.site.Depth
	}
	ds := make([]float64, len(a.planes))
	for i, p := range a.planes {
		ds[i] = p.Depth
	}
	sort.Float64s(ds)
	return ds[len(ds)/2]
}

// depthFor is the depth asked for in o, or the figure depth.
func (a *assessment) depthFor(o figureOptions) float64 {
	if math.IsNaN(o.depth) {
		return a.figureDepth()
	}
	return o.depth
}

// traced reports whether plane i gets its great circle drawn.
func (a *assessment) traced(i int, which string) bool {
	switch which {
	case "none":
		return false
	case "all":
		return true
	case "unstable", "":
		return a.results[i].State != planes.Stable
	}
	for _, n := range strings.Split(which, ",") {
		if strings.TrimSpace(n) == a.planes[i].Name {
			return true
		}
	}
	return false
}

// checkTraces reports names in --great-circles that match no plane.
func (a *assessment) checkTraces(which string) error {
	switch which {
	case "none", "all", "unstable", "":
		return nil
	}
	names := map[string]bool{}
	for _, p := range a.planes {
		names[p.Name] = true
	}
	for _, n := range strings.Split(which, ",") {
		if n = strings.TrimSpace(n); !names[n] {
			return usagef("--great-circles: no plane is named %q (give names, or unstable, all, none)", n)
		}
	}
	return nil
}

func (a *assessment) stereonet(o figureOptions) *plots.Stereonet {
	z := a.depthFor(o)
	st := &plots.Stereonet{
		Site:      a.site.Name,
		Model:     a.site.Summary(),
		Depth:     z,
		State:     a.site.Model.At(z),
		Criterion: a.site.Criterion,
		Measure:   o.measure,
		Proj:      o.proj,
		Grid:      o.grid,
		Contours:  o.contours,
	}
	for i, p := range a.planes {
		st.Poles = append(st.Poles, plots.Pole{Name: p.Name, Orientation: p.Orientation, Result: a.results[i], Trace: a.traced(i, o.traces)})
	}
	if o.traces != "none" {
		for _, s := range a.sets {
			st.Means = append(st.Means, plots.Pole{Name: s.name, Orientation: s.plane.Orientation, Result: s.result})
		}
	}
	return st
}

// writeFigure writes f to path in the format its extension names.
func writeFigure(f plots.Figure, w, h vg.Length, path string) error {
	format, err := plots.FormatOf(path)
	if err != nil {
		return usageError{err}
	}
	return writeFile(path, func(out io.Writer) error {
		if err := plots.Write(f, w, h, format, out); err != nil {
			return fmt.Errorf("%s: %w", path, err)
		}
		return nil
	})
}

// mohr builds the Mohr diagram at the figure depth: every plane resolved at
// that depth (site.Resolver.ResolveAt), the site's envelope and one for each
// distinct per-plane Coulomb criterion.
func (a *assessment) mohr(o figureOptions) *plots.Mohr {
	z := a.depthFor(o)
	m := &plots.Mohr{
		Site:  a.site.Name,
		Model: a.site.Summary(),
		Depth: z,
		State: a.site.Model.At(z),
		Note:  "Every plane at this depth by its orientation; planes with their own pore pressure keep its excess over the water model",
	}
	m.Envelopes = append(m.Envelopes, plots.Envelope{Label: "site strength: " + a.site.Criterion.String(), Criterion: a.site.Criterion})
	seen := map[string]bool{a.site.Criterion.String(): true}
	rv := a.site.Resolver()
	for i := range a.planes {
		p := &a.planes[i]
		var r planes.Result
		c := rv.ResolveAt(p, z, &r)
		m.Points = append(m.Points, plots.MohrPoint{Name: p.Name, Result: r})
		if k := c.String(); !seen[k] {
			seen[k] = true
			m.Envelopes = append(m.Envelopes, plots.Envelope{Label: fmt.Sprintf("%s: %s", p.Name, k), Criterion: c})
		}
	}
	return m
}
