package main

import (
	"fmt"
	"io"
	"math"
	"path/filepath"
	"runtime/debug"
	"sort"
	"strings"

	"cleft/planes/assess"
	"cleft/planes/sets"
	"cleft/planes/site"
	"cleft/plots"
	"cleft/plots/table"
	"cleft/plots/words"

	"github.com/spf13/cobra"
)

type setsOptions struct {
	readings   string
	count      float64
	seeds      []string
	maxAngle   float64
	line       string
	maxWeight  float64
	out        string
	projection string
}

func newSetsCmd() *cobra.Command {
	var o setsOptions
	c := &cobra.Command{
		Use:   "sets READINGS.csv [--sets N | --seed DIP/DIPDIR …] [--max-angle DEG] [--line TREND/PLUNGE] [--out DIR]",
		Short: "Group field readings into joint sets, with Fisher statistics and pole density",
		Long: `sets reads dip/dip-direction readings (columns dip, dip_direction or strike;
optional name, depth, weight; any other column is carried through) and groups
their poles into sets: spherical k-means on axes, so that a set of steep joints
straddling the primitive stays one set. Give the number of sets (--sets), or
starting means (--seed, repeated), or neither for an automatic choice by the
mean silhouette width (Rousseeuw 1987), which is printed. --max-angle then
trims each set: readings farther than that from their own set's mean are
unassigned (the cone never changes which sets there are).

--line gives the scanline or borehole the readings were taken along: each
reading is then weighted by Terzaghi's 1/|cos δ| (δ between the line and the
pole), capped at --max-weight, and weighted statistics are reported beside the
raw ones.

Per set: count, weighted count, mean plane (Fisher 1953 mean pole), Fisher K,
α95, spherical variance, and Woodcock's (1977) K and C of the orientation
tensor. With --out: sets.csv, readings.csv and a pole-density stereonet
(the exponential Kamb weighting of Vollmer 1995, contours in multiples of σ)
as sets-density.svg/.png.

` + caution,
		Args: func(_ *cobra.Command, args []string) error {
			if len(args) != 1 {
				return usagef("want one readings table, got %d arguments", len(args))
			}
			return nil
		},
		RunE: func(cmd *cobra.Command, args []string) error {
			o.readings = args[0]
			return runSets(o, cmd.InOrStdin(), cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	f := c.Flags()
	floatVar(f, &o.count, "sets", 0, "number of sets, 1 to 12 (default: chosen automatically)")
	f.StringArrayVar(&o.seeds, "seed", nil, "starting mean of a set, DIP/DIPDIR (repeat for each set)")
	floatVar(f, &o.maxAngle, "max-angle", 0, "cut-off cone about each set mean, degrees (readings beyond are unassigned)")
	f.StringVar(&o.line, "line", "", "sampling line TREND/PLUNGE for Terzaghi weights")
	floatVar(f, &o.maxWeight, "max-weight", sets.DefaultMaxWeight, "cap of the Terzaghi weight, 1 to 1000")
	f.StringVar(&o.out, "out", "", "output folder for sets.csv, readings.csv and the density stereonet")
	f.StringVar(&o.projection, "projection", "equal-area", "equal-area or equal-angle")
	return c
}

func (o setsOptions) config() (sets.Config, error) {
	c := sets.DefaultConfig
	if !(o.count >= 0 && o.count <= 12) || o.count != math.Trunc(o.count) {
		return c, usagef("--sets %g: want a whole number of sets, 1 to 12", o.count)
	}
	c.Count = int(o.count)
	if len(o.seeds) > 12 {
		return c, usagef("--seed given %d times: at most 12 sets", len(o.seeds))
	}
	for _, s := range o.seeds {
		p, err := site.ParseOrientation(s)
		if err != nil {
			return c, usagef("--seed %v", err)
		}
		c.Seeds = append(c.Seeds, p)
	}
	if c.Count != 0 && len(c.Seeds) != 0 && c.Count != len(c.Seeds) {
		return c, usagef("--sets %d with %d --seed: give one or the other, or one seed per set", c.Count, len(c.Seeds))
	}
	if !(o.maxAngle >= 0 && o.maxAngle <= 90) {
		return c, usagef("--max-angle %v: want degrees in (0, 90], or 0 for no cut-off", o.maxAngle)
	}
	c.MaxAngle = o.maxAngle
	if o.line != "" {
		l, err := site.ParseLine(o.line)
		if err != nil {
			return c, usagef("--line %v", err)
		}
		c.Line = &l
	}
	if err := inRange("max-weight", o.maxWeight, 1, 1000, ""); err != nil {
		return c, err
	}
	c.MaxWeight = o.maxWeight
	return c, nil
}

// densityNet is the pole-density stereonet of a grouping, named site.
func densityNet(g *sets.Grouping, site string, proj plots.Projection, w, h float64) *plots.DensityNet {
	an := g.Analysis
	d := &plots.DensityNet{
		Site:    site,
		Lines:   []string{fmt.Sprintf("Pole density of %d readings, %d sets", len(g.Poles), len(an.Sets)), "Lower-hemisphere " + strings.TrimSuffix(proj.Name(), ", lower hemisphere") + "; poles to planes"},
		Proj:    proj,
		Poles:   g.Poles,
		Weights: g.Weights,
	}
	var sm sets.Smoothing
	d.Field, sm = plots.NewSmoothField(proj, g.Poles, g.Weights, plots.FieldSize(cm(w, 0), cm(h, 0)))
	d.Smooth = &sm
	if g.Weights != nil {
		d.Lines[0] += ", weighted"
	}
	for _, a := range an.Assign {
		d.InSet = append(d.InSet, a >= 0)
	}
	for k, s := range an.Sets {
		d.Sets = append(d.Sets, plots.SetMark{Name: sets.Name(k), Mean: s.Raw.MeanPlane(), Alpha95: s.Raw.Alpha, Count: len(s.Members)})
	}
	return d
}

// densityFigure is the pole-density stereonet of the readings, named site.
func densityFigure(g *sets.Grouping, site string, proj plots.Projection) *namedFigure {
	return &namedFigure{file: "sets-density",
		title:   fmt.Sprintf("Pole density of the %d field readings and their %d sets", len(g.Poles), len(g.Analysis.Sets)),
		caption: "Pole density by the exponential Kamb weighting of Vollmer (1995) — each pole counts for exp(K(|cos θ| − 1)) at angle θ, a smooth form of Kamb's (1959) counting cone — weighted where the readings are, in multiples of σ: a uniform scatter reads about 3σ. Dots are poles of readings in a set, rings unassigned readings; each set mean is shown with its 95 % confidence cone (α95, Fisher 1953). " + words.Grouping(g),
		fig:     densityNet(g, site, proj, 19, 13.5), w: cm(19, 0), h: cm(13.5, 0)}
}

// printSets prints the sets in a few lines.
func printSets(b *strings.Builder, g *sets.Grouping) {
	an := g.Analysis
	fmt.Fprintf(b, "%d readings. %s\n\n", len(g.Poles), words.Wrap(words.Grouping(g), 88))
	fmt.Fprintf(b, "%-11s %6s %9s %11s %9s %8s %7s %9s\n", "set", "count", "weighted", "mean plane", "pole", "K", "α95 °", "Woodcock K")
	for k, s := range an.Sets {
		m := s.Raw.MeanPlane()
		p := m.Pole()
		fmt.Fprintf(b, "%-11s %6d %9.1f %11s %03.0f/%02.0f %8s %7s %9s\n", sets.Name(k), len(s.Members), s.WeightedCount, m, p.Trend, p.Plunge,
			words.Fixed(s.Raw.K, 1), words.Fixed(s.Raw.Alpha, 1), words.Fixed(s.RawTensor.WoodcockK(), 2))
	}
	fmt.Fprintf(b, "%-11s %6d %9.1f\n", "unassigned", an.Unassigned, an.UnassignedWeight)
}

// setsMemoryLimit is the soft memory limit of cleft sets, unless GOMEMLIMIT
// sets one. A million readings hold about 370 MB while the reader grows its
// table and 270 MB while they are grouped; without a limit the collector
// lets the heap grow to twice that (peak RSS 630–850 MB measured), with it
// the peak stays near 400 MB for about 20 % more CPU time.
const setsMemoryLimit = 300 << 20

func runSets(o setsOptions, stdin io.Reader, stdout, stderr io.Writer) error {
	cfg, err := o.config()
	if err != nil {
		return err
	}
	proj, err := plots.ParseProjection(o.projection)
	if err != nil {
		return usageError{err}
	}
	if o.out != "" {
		if err := refuseInputs(inDir(o.out, setsFiles()), o.readings); err != nil {
			return err
		}
	}
	if old := debug.SetMemoryLimit(-1); old == math.MaxInt64 {
		debug.SetMemoryLimit(setsMemoryLimit)
		defer debug.SetMemoryLimit(old)
	}
	bar := startProgress(stderr)
	defer bar.finish()
	readings, extras, _, err := site.LoadReadings(o.readings, stdin)
	if err != nil {
		return err
	}
	if len(cfg.Seeds) > len(readings) || cfg.Count > len(readings) {
		return fmt.Errorf("%s: %d readings cannot make %d sets", o.readings, len(readings), max(cfg.Count, len(cfg.Seeds)))
	}
	// Steps of the bar: each k-means run of the grouping, the tables, the
	// density stereonet.
	steps := 0
	cfg.Progress = func(done, total int) {
		steps = total + 2
		bar.set("grouping", done, steps)
	}
	g := assess.Group(readings, cfg)
	var b strings.Builder
	printSets(&b, g)
	if o.out != "" {
		if err := makeDir(o.out); err != nil {
			return err
		}
		bar.set("writing tables", steps-2, steps)
		out := &outputs{dir: o.out}
		if err := out.tables(csvTable("sets.csv", table.Sets(g)), namedTable{"readings.csv", func(w io.Writer) error { return table.WriteReadings(w, g, readings, extras) }}); err != nil {
			return err
		}
		bar.set("drawing the density stereonet", steps-1, steps)
		if err := out.figures([]*namedFigure{densityFigure(g, filepath.Base(o.readings), proj)}); err != nil {
			return err
		}
		names := out.names()
		sort.Strings(names)
		fmt.Fprintf(&b, "\nWrote %s to %s.\n", strings.Join(names, ", "), o.out)
	}
	bar.finish()
	_, err = io.WriteString(stdout, b.String())
	return err
}
