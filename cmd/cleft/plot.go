package main

import (
	"math"
	"strings"

	"cleft/planes/assess"
	"cleft/planes/site"
	"cleft/plots"

	"github.com/spf13/cobra"
)

type plotOptions struct {
	site       string
	example    bool
	kind       string
	measure    string
	depth      float64
	projection string
	grid       bool
	contours   []float64
	traces     string
	out        string
	width      float64
	height     float64
}

func newPlotCmd() *cobra.Command {
	var o plotOptions
	c := &cobra.Command{
		Use:   "plot (SITE.yaml | --example) --kind stereonet|mohr --out FILE.{png,svg,pdf}",
		Short: "A tendency stereonet or a Mohr diagram of the site",
		Long: `plot draws one figure; the format follows the file extension.

stereonet: the poles of the planes, coloured by the chosen measure at their
own depths and shaped by their state (circle stable, triangle critical,
square opening), over the measure for every orientation at --depth, with
contours, the line where the factor of safety is 1, the principal stress axes
and the great circles of chosen planes.

mohr: the three effective Mohr circles at --depth, every plane's point at
that depth, the strength envelopes in use and the pore-pressure rise that
brings the most critical plane to its envelope.

The default depth is the site's depth:, else the median plane depth.
Measures: ` + strings.Join(plots.Measures(), ", ") + `.

` + caution,
		Args: siteOrExample(&o.example),
		RunE: func(cmd *cobra.Command, args []string) error {
			if len(args) == 1 {
				o.site = args[0]
			}
			return runPlot(o, cmd)
		},
	}
	f := c.Flags()
	f.BoolVar(&o.example, "example", false, "plot the built-in demo site (invented data)")
	f.StringVar(&o.kind, "kind", "stereonet", "stereonet or mohr")
	f.StringVar(&o.measure, "measure", "slip-tendency", "stereonet colour: "+strings.Join(plots.Measures(), ", "))
	floatVar(f, &o.depth, "depth", math.NaN(), "depth below ground of the field and the Mohr circles, m")
	f.StringVar(&o.projection, "projection", "equal-area", "equal-area or equal-angle (lower hemisphere)")
	f.BoolVar(&o.grid, "grid", false, "draw a 10° grid of plunge circles and trend radials")
	floatsVar(f, &o.contours, "contours", "contour levels of the measure, e.g. 0.2,0.4,0.6")
	f.StringVar(&o.traces, "great-circles", "unstable", "great circles to draw: unstable, all, none, or plane names")
	f.StringVar(&o.out, "out", "", "output file: .png, .svg or .pdf")
	floatVar(f, &o.width, "width", 0, "figure width, cm, 6 to 100 (default 19 for a stereonet, 17 for a Mohr diagram)")
	floatVar(f, &o.height, "height", 0, "figure height, cm, 6 to 100 (default 13.5 for a stereonet, 12 for a Mohr diagram)")
	return c
}

func runPlot(o plotOptions, cmd *cobra.Command) error {
	if o.out == "" {
		return usagef("give --out FILE.png, .svg or .pdf")
	}
	if _, err := plots.FormatOf(o.out); err != nil {
		return usageError{err}
	}
	if o.kind != "stereonet" && o.kind != "mohr" {
		return usagef("--kind %q: want stereonet or mohr", o.kind)
	}
	m, err := plots.ParseMeasure(o.measure)
	if err != nil {
		return usageError{err}
	}
	proj, err := plots.ParseProjection(o.projection)
	if err != nil {
		return usageError{err}
	}
	if !math.IsNaN(o.depth) {
		if err := inRange("depth", o.depth, 0, site.MaxDepth, " m below ground"); err != nil {
			return err
		}
	}
	for i, v := range []float64{o.width, o.height} {
		if v != 0 {
			if err := inRange([]string{"width", "height"}[i], v, 6, 100, " cm"); err != nil {
				return err
			}
		}
	}
	for _, v := range o.contours {
		if math.Abs(v) > 1e6 {
			return usagef("--contours %g: want levels of the measure within ±1e6", v)
		}
	}
	if err := refuseInputs([]string{o.out}, o.site); err != nil {
		return err
	}
	s, err := loadSite(o.example, o.site)
	if err != nil {
		return err
	}
	if !o.example {
		if err := refuseInputs([]string{o.out}, siteInputs(s)...); err != nil {
			return err
		}
	}
	a, err := assess.New(s)
	if err != nil {
		return err
	}
	warnRepeats(cmd.ErrOrStderr(), a.Repeat, a.Repeats, false)
	if err := checkTraces(a, o.traces); err != nil {
		return err
	}
	fo := figureOptions{measure: m, depth: o.depth, proj: proj, grid: o.grid, contours: o.contours, traces: o.traces}
	if o.kind == "mohr" {
		return writeFigure(mohr(a, fo), cm(o.width, 17), cm(o.height, 12), o.out)
	}
	w, h := or(o.width, 19), or(o.height, 13.5)
	return writeFigure(stereonet(a, fo, w, h), cm(w, 0), cm(h, 0), o.out)
}

// or is v, or def when v is 0.
func or(v, def float64) float64 {
	if v == 0 {
		return def
	}
	return v
}
