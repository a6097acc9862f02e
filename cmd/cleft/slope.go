package main

import (
	"fmt"
	"io"
	"math"
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
		Short: "Kinematic tests, planar and wedge factors of safety for a cut slope",
		Long: `slope screens the cut face of the site file's slope: block against its
planes (the planes table and inline planes, and the mean plane of every joint
set of the readings): planar sliding (Markland's test as refined by Hoek &
Bray 1981), wedge sliding on every pair (the line of intersection; sliding on
one plane or both, decided by the normal reactions of the block), flexural
toppling (Goodman & Bray 1976). Every feasible planar case gets the
limit-equilibrium factor of safety with a tension crack (Hoek & Bray 1981;
Wyllie & Mah 2004), and every feasible wedge its block (volume, weight, face
traces) and factor of safety from the vector solution of its normal
reactions, each for every water case (m of water, the site's water table
below the crest, saturated) with the slope's bolt and seismic load, and the
bolt force for target_fs. With readings, every reading (and every pair of
readings when there are fewer than 500) is run through the tests: counts
and weighted shares per set. With --out: slope.csv, slope-readings.csv (with
readings) and a kinematic stereonet (slope-kinematic.svg/.png). Direct
toppling is not tested.

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site, o.warn = args[0], cmd.ErrOrStderr()
			return runSlope(o, cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder for slope.csv, slope-readings.csv and the kinematic stereonet")
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
	sc, counts := a.Slope(), a.SlopeReadings()
	var b strings.Builder
	printSlope(&b, sc, counts)
	if o.out != "" {
		if err := makeDir(o.out); err != nil {
			return err
		}
		out := &outputs{dir: o.out}
		if err := out.tables(slopeTables(sc, counts)...); err != nil {
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

// printSlope prints the feasible cases in a few lines, and the readings
// against the tests.
func printSlope(b *strings.Builder, sc *slope.Screening, counts []slope.Count) {
	for _, l := range append(words.SlopeLines(sc), words.ReadingLines(counts)...) {
		b.WriteString(wrapIndented(l, 100) + "\n")
	}
}

// wrapIndented wraps l at width, its continuation lines indented two
// spaces more than l is.
func wrapIndented(l string, width int) string {
	lead := len(l) - len(strings.TrimLeft(l, " "))
	pad := strings.Repeat(" ", lead)
	return pad + strings.ReplaceAll(words.Wrap(l, width-lead), "\n", "\n"+pad+"  ")
}

// slopeTables are slope.csv and, with readings, slope-readings.csv.
func slopeTables(sc *slope.Screening, counts []slope.Count) []namedTable {
	t := []namedTable{csvTable("slope.csv", table.Slope(sc))}
	if counts != nil {
		t = append(t, csvTable("slope-readings.csv", table.SlopeReadings(counts)))
	}
	return t
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
			k.Items = append(k.Items, plots.KinItem{Name: sc.Names(c), Line: c.Line, Feasible: c.Feasible, Toppling: topple[c.A], Fails: c.Fails, FS: leastFS(c.FS)})
		case c.Test == slope.WedgeTest && c.HasLine:
			if !c.Feasible {
				if grey == maxGreyWedges {
					hidden++
					continue
				}
				grey++
			}
			k.Items = append(k.Items, plots.KinItem{Name: sc.Names(c), Line: c.Line, Intersection: true, Feasible: c.Feasible, Fails: c.Fails, FS: leastFS(c.FS), OnePlane: c.Feasible && (c.Mode == slope.WedgeOnFirst || c.Mode == slope.WedgeOnSecond)})
		}
	}
	if hidden > 0 {
		k.Lines = append(k.Lines, fmt.Sprintf("%d lines of intersection of wedges that cannot slide are not drawn (every case is in slope.csv)", hidden))
	}
	return k
}

// leastFS is the least defined factor of safety of a case over its water
// cases, NaN when none is: the kinematic net names the least first.
func leastFS(fs []float64) float64 {
	least := math.NaN()
	for _, v := range fs {
		if !math.IsNaN(v) && !(v >= least) {
			least = v
		}
	}
	return least
}

// slopeFigure is the kinematic stereonet of the slope screening.
func slopeFigure(siteName string, sc *slope.Screening) *namedFigure {
	sl := sc.Slope
	return &namedFigure{file: "slope-kinematic",
		title:   fmt.Sprintf("Kinematic screening of the %s face", sl.Face),
		caption: fmt.Sprintf("Lower-hemisphere equal-area net of lines: dip vectors of the planes (circles) and lines of intersection of every pair (diamonds). A line daylights when it plots beyond the face's great circle and can slide when it also lies inside the friction circle (φ = %.1f°). Densely hatched and outlined: the planar sliding zone within ±%g° of the face's dip direction; sparsely hatched across it: the wedge sliding zone; hatched level in the light tone: the flexural toppling envelope (±%g°). Large pale symbols with a heavy outline are the cases that can fail, named (triangle: planar sliding; downward triangle: flexural toppling; diamond: wedge sliding, its mode from the normal reactions of the block, barred when it slides on one plane alone and is then tested by that plane's dip, so that its line may lie outside the zones); small ones are held back, their fill saying by what (white: does not daylight; mid tone: flatter than φ; dark: only the lateral limit). The cases that can fail are named least factor of safety first (the least over the water cases); when there are more than the net has room for, the key says how many are not named (every case is in slope.csv).", sl.FrictionAngle, sl.LateralLimit, sl.ToppleLimit),
		fig:     kinematicNet(siteName, sc), w: cm(19, 0), h: cm(13.5, 0)}
}
