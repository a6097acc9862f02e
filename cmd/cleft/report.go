package main

import (
	"fmt"
	"math"
	"sort"
	"strings"
	"time"

	"cleft/plots"
)

// now is the clock of the report header; tests may fix it.
var now = time.Now

// report builds the effective-stress report of the assessment.
func (a *assessment) report(example bool, figs []namedFigure) (*plots.Report, error) {
	s := a.site
	r := &plots.Report{
		Site:      s.Name,
		Generated: now(),
		Version:   version,
		Model:     s.Summary(),
		Summary:   a.facts().sentences(),
		Notes:     s.Notes,
		Criterion: s.Criterion.String(),
		Caution:   strings.TrimPrefix(caution, "Caution: "),
	}
	for _, in := range a.inputs {
		if example {
			in.Name += " (built-in demo)"
		}
		r.Inputs = append(r.Inputs, in)
	}
	for _, p := range s.Params {
		r.Params = append(r.Params, plots.Param{Group: p.Group, Name: p.Name, Value: p.Value, Unit: p.Unit, Source: p.Source, Default: p.Default})
	}
	for _, z := range a.depths {
		r.States = append(r.States, plots.DepthState{State: s.Model.At(z), Friction: s.Criterion.Friction()})
	}
	setCol := -1
	for i, n := range a.extras {
		if n == "set" {
			setCol = i
		}
	}
	r.BySet = setCol >= 0
	for _, i := range a.ranked() {
		p := a.planes[i]
		rp := plots.ReportPlane{Name: p.Name, Orientation: p.Orientation, Depth: p.Depth, Result: a.results[i]}
		if setCol >= 0 {
			rp.Set = p.Extras[setCol]
		}
		r.Planes = append(r.Planes, rp)
	}
	if r.BySet { // sets in order of their least stable plane; stable sort keeps the rank
		first := map[string]int{}
		for k, p := range r.Planes {
			if _, ok := first[p.Set]; !ok {
				first[p.Set] = k
			}
		}
		sort.SliceStable(r.Planes, func(i, j int) bool { return first[r.Planes[i].Set] < first[r.Planes[j].Set] })
	}
	for _, f := range figs {
		r.Figures = append(r.Figures, f.ReportFigure)
	}
	if a.slope != nil {
		r.Slope = a.slope.reportTable()
	}
	if a.tunnel != nil {
		r.Tunnel = a.tunnel.reportTable()
	}
	if g := a.grouping; g != nil {
		r.SetNote = g.explain()
		for _, st := range a.sets {
			r.Sets = append(r.Sets, plots.ReportSet{Name: st.name, Count: len(st.set.Members), WeightedCount: st.set.WeightedCount,
				Stats: st.set.Raw, WoodcockK: st.set.Tensor.WoodcockK(), Depth: st.plane.Depth, Result: st.result})
		}
	}
	return r, nil
}

// namedFigure is a figure of the assessment with its file name.
type namedFigure struct {
	file string // without extension
	plots.ReportFigure
}

// figures are the assessment's figures, built once for the files and the
// report: the slip and dilation stereonets and the Mohr diagram at the
// figure depth.
func (a *assessment) figures() []namedFigure {
	fo := figureOptions{depth: math.NaN(), proj: plots.EqualArea, traces: "unstable"}
	z := a.figureDepth()
	figs := []namedFigure{
		{"stereonet-slip", plots.ReportFigure{
			Title: fmt.Sprintf("Slip tendency of every plane, and of every orientation at %g m", z),
			Caption: fmt.Sprintf("Lower-hemisphere equal-area net of poles to planes. Each pole is coloured by the plane's own slip tendency Ts = τ/σn' at its own depth and shaped by its state (circle stable, triangle critical, square with a cross opening). The paler background is Ts for every orientation at %g m with the site's water model and strength; thin lines are its contours, the dark red line (if any) is where the factor of safety is 1 and orientations past it would slip. Black symbols are the principal stress axes; great circles are drawn for the critical and opening planes, dashed ones for the mean planes of the joint sets. %s",
				z, traceNote(a)),
			Figure: a.stereonet(fo.with(plots.SlipTendency)), W: cm(0, 19), H: cm(0, 13.5)}},
		{"stereonet-dilation", plots.ReportFigure{
			Title:   fmt.Sprintf("Dilation tendency of every plane, and of every orientation at %g m", z),
			Caption: "As Figure 1 for the dilation tendency Td = (σ1 − σn)/(σ1 − σ3): the light end marks the planes nearest to opening, the likely water paths.",
			Figure:  a.stereonet(fo.with(plots.DilationTendency)), W: cm(0, 19), H: cm(0, 13.5)}},
		{"mohr", plots.ReportFigure{
			Title:   fmt.Sprintf("Mohr diagram of effective stress at %g m", z),
			Caption: fmt.Sprintf("The three effective Mohr circles at %g m and every plane at that depth by its orientation (planes with their own pore pressure keep its excess over the water model). Red lines are the strength envelopes in use. The arrow shows the change in pore pressure that brings the most critical plane (opening planes aside) to its envelope. Both axes have the same scale.", z),
			Figure:  a.mohr(fo), W: cm(0, 17), H: cm(0, 12)}},
	}
	if g := a.grouping; g != nil {
		figs = append(figs, g.densityFigure(a.site.Name, plots.EqualArea))
	}
	if a.tunnel != nil {
		figs = append(figs, a.tunnelFigures(a.tunnel.worst())...)
	}
	if a.slope != nil {
		figs = append(figs, a.slopeFigure())
	}
	return figs
}

// densityFigure is the pole-density stereonet of the readings, named site.
func (g *grouping) densityFigure(site string, proj plots.Projection) namedFigure {
	return namedFigure{"sets-density", plots.ReportFigure{
		Title:   fmt.Sprintf("Pole density of the %d field readings and their %d sets", len(g.readings), len(g.an.Sets)),
		Caption: "Kamb (1959) counting of the poles (weighted where the readings are), in multiples of σ: a uniform scatter reads 3σ. Dots are poles of readings in a set, rings unassigned readings; each set mean is shown with its 95 % confidence cone (α95, Fisher 1953). " + g.explain(),
		Figure:  g.densityNet(site, proj), W: cm(0, 19), H: cm(0, 13.5)}}
}

// slopeFigure is the kinematic stereonet of the slope screening.
func (a *assessment) slopeFigure() namedFigure {
	sl := a.site.Slope
	return namedFigure{"slope-kinematic", plots.ReportFigure{
		Title:   fmt.Sprintf("Kinematic screening of the %s face", sl.Face),
		Caption: fmt.Sprintf("Lower-hemisphere equal-area net of lines: dip vectors of the planes (circles) and lines of intersection of every pair (squares). A line daylights when it plots beyond the face's great circle and can slide when it also lies inside the friction circle (φ = %.1f°); the darker zone is planar sliding within ±%g° of the face's dip direction, the paler one wedges. The blue sector is the flexural-toppling envelope. Red and blue symbols are feasible cases; grey ones say which condition fails (open: does not daylight; light: flatter than φ; dark: beyond the lateral limit).", sl.FrictionAngle, sl.LateralLimit),
		Figure:  a.kinematicNet(a.slope), W: cm(0, 19), H: cm(0, 13.5)}}
}

func traceNote(a *assessment) string {
	n := 0
	for i := range a.planes {
		if a.traced(i, "unstable") {
			n++
		}
	}
	if n == 0 {
		return "No plane is critical or opening, so no great circle is drawn."
	}
	return ""
}
