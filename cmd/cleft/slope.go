package main

import (
	"fmt"
	"io"
	"strings"

	"cleft/planes/site"
	"cleft/planes/slope"
	"cleft/plots"
	"cleft/plots/table"
	"cleft/plots/words"

	"github.com/spf13/cobra"
)

type slopeOptions struct {
	site string
	out  string
	warn io.Writer // standard error, for warnings
}

func newSlopeCmd() *cobra.Command {
	var o slopeOptions
	c := &cobra.Command{
		Use:   "slope SITE.yaml [--out DIR]",
		Short: "Kinematic tests and planar factor of safety for a cut slope",
		Long: `slope screens the cut face of the site file's slope: block against its
planes (the planes table and inline planes, and the mean plane of every joint
set of the readings): planar sliding (Markland's test as refined by Hoek &
Bray 1981), wedge sliding on every pair (the line of intersection; sliding on
one plane or both), flexural toppling (Goodman & Bray 1976), and for every
feasible planar case the limit-equilibrium factor of safety with a tension
crack (Hoek & Bray 1981; Wyllie & Mah 2004) for each water case, and the water
depth in the crack at which it falls to 1. Each test that fails says which
condition. With --out: slope.csv and a kinematic stereonet
(slope-kinematic.svg/.png). Direct toppling is not tested.

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site, o.warn = args[0], cmd.ErrOrStderr()
			return runSlope(o, cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder for slope.csv and the kinematic stereonet")
	return c
}

func runSlope(o slopeOptions, stdout io.Writer) error {
	var outs []string
	if o.out != "" {
		outs = inDir(o.out, slopeFiles())
	}
	a, err := assessFor(o.site, outs, func(s *site.Site) bool { return s.Slope != nil }, "no slope: block: give the face, height and the rest (see README, Rock slopes)")
	if err != nil {
		return err
	}
	warnRepeats(o.warn, a.Repeat, a.Repeats, false)
	sc := a.Slope()
	var b strings.Builder
	printSlope(&b, sc)
	if o.out != "" {
		if err := makeDir(o.out); err != nil {
			return err
		}
		out := &outputs{dir: o.out}
		if err := out.tables(csvTable("slope.csv", table.Slope(sc))); err != nil {
			return err
		}
		if err := out.figures([]*namedFigure{slopeFigure(a.Site.Name, sc)}); err != nil {
			return err
		}
		fmt.Fprintf(&b, "\nWrote %s to %s.\n", strings.Join(out.names(), ", "), o.out)
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// printSlope prints the feasible cases in a few lines.
func printSlope(b *strings.Builder, sc *slope.Screening) {
	for _, l := range words.SlopeLines(sc) {
		b.WriteString(l + "\n")
	}
}

// maxGreyWedges is the most lines of intersection of wedges that are not
// feasible that the kinematic net draws (every feasible one is drawn): up to
// assess.MaxWedgePlanes candidates make 19,900 wedges.
const maxGreyWedges = 1000

// kinematicNet draws the screening on a kinematic stereonet.
func kinematicNet(siteName string, sc *slope.Screening) *plots.KinematicNet {
	sl := sc.Slope
	k := &plots.KinematicNet{
		Site:         siteName,
		Lines:        []string{fmt.Sprintf("Kinematic screening of the %s face, %g m high, φ = %.1f°", sl.Face, sl.Height, sl.FrictionAngle), "Lower-hemisphere " + strings.TrimSuffix(plots.EqualArea.Name(), ", lower hemisphere") + "; dip vectors and lines of intersection"},
		Proj:         plots.EqualArea,
		Face:         sl.Face,
		Phi:          sl.FrictionAngle,
		LateralLimit: sl.LateralLimit,
		ToppleLimit:  sl.ToppleLimit,
	}
	topple := map[int]bool{}
	for _, c := range sc.Cases {
		if c.Test == slope.TopplingTest && c.Feasible {
			topple[c.A] = true
		}
	}
	grey, hidden := 0, 0
	for _, c := range sc.Cases {
		switch {
		case c.Test == slope.PlanarTest:
			k.Items = append(k.Items, plots.KinItem{Name: sc.Names(c), Line: c.Line, Feasible: c.Feasible, Toppling: topple[c.A], Fails: c.Fails})
		case c.Test == slope.WedgeTest && c.HasLine:
			if !c.Feasible {
				if grey == maxGreyWedges {
					hidden++
					continue
				}
				grey++
			}
			k.Items = append(k.Items, plots.KinItem{Name: sc.Names(c), Line: c.Line, Intersection: true, Feasible: c.Feasible, Fails: c.Fails})
		}
	}
	if hidden > 0 {
		k.Lines = append(k.Lines, fmt.Sprintf("%d lines of intersection of wedges that cannot slide are not drawn (every case is in slope.csv)", hidden))
	}
	return k
}

// slopeFigure is the kinematic stereonet of the slope screening.
func slopeFigure(siteName string, sc *slope.Screening) *namedFigure {
	sl := sc.Slope
	return &namedFigure{file: "slope-kinematic",
		title:   fmt.Sprintf("Kinematic screening of the %s face", sl.Face),
		caption: fmt.Sprintf("Lower-hemisphere equal-area net of lines: dip vectors of the planes (circles) and lines of intersection of every pair (squares). A line daylights when it plots beyond the face's great circle and can slide when it also lies inside the friction circle (φ = %.1f°); the darker zone is planar sliding within ±%g° of the face's dip direction, the paler one wedges. The blue sector is the flexural-toppling envelope. Red and blue symbols are feasible cases; grey ones say which condition fails (open: does not daylight; light: flatter than φ; dark: beyond the lateral limit).", sl.FrictionAngle, sl.LateralLimit),
		fig:     kinematicNet(siteName, sc), w: cm(19, 0), h: cm(13.5, 0)}
}
