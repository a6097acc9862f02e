package main

import (
	"fmt"
	"io"
	"math"
	"path/filepath"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots"
	"cleft/plots/table"

	"github.com/spf13/cobra"
	"gonum.org/v1/gonum/spatial/r3"
)

type setsOptions struct {
	readings   string
	count      int
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
mean silhouette width (Rousseeuw 1987), which is printed. --max-angle leaves
readings farther than that from every set mean unassigned.

--line gives the scanline or borehole the readings were taken along: each
reading is then weighted by Terzaghi's 1/|cos δ| (δ between the line and the
pole), capped at --max-weight, and weighted statistics are reported beside the
raw ones.

Per set: count, weighted count, mean plane (Fisher 1953 mean pole), Fisher K,
α95, spherical variance, and Woodcock's (1977) K and C of the orientation
tensor. With --out: sets.csv, readings.csv and a pole-density stereonet
(Kamb 1959 counting, contours in multiples of σ) as sets-density.svg/.png.

` + caution,
		Args: func(_ *cobra.Command, args []string) error {
			if len(args) != 1 {
				return usagef("want one readings table, got %d arguments", len(args))
			}
			return nil
		},
		RunE: func(cmd *cobra.Command, args []string) error {
			o.readings = args[0]
			return runSets(o, cmd.InOrStdin(), cmd.OutOrStdout())
		},
	}
	f := c.Flags()
	f.IntVar(&o.count, "sets", 0, "number of sets (default: chosen automatically)")
	f.StringArrayVar(&o.seeds, "seed", nil, "starting mean of a set, DIP/DIPDIR (repeat for each set)")
	f.Float64Var(&o.maxAngle, "max-angle", 0, "cut-off cone about each set mean, degrees (readings beyond are unassigned)")
	f.StringVar(&o.line, "line", "", "sampling line TREND/PLUNGE for Terzaghi weights")
	f.Float64Var(&o.maxWeight, "max-weight", planes.DefaultMaxWeight, "cap of the Terzaghi weight")
	f.StringVar(&o.out, "out", "", "output folder for sets.csv, readings.csv and the density stereonet")
	f.StringVar(&o.projection, "projection", "equal-area", "equal-area or equal-angle")
	return c
}

func (o setsOptions) config() (site.SetsConfig, error) {
	c := site.DefaultSets
	if o.count < 0 || o.count > 12 {
		return c, usagef("--sets %d: want 1 to 12", o.count)
	}
	c.Count = o.count
	for _, s := range o.seeds {
		p, err := planes.Parse(s)
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
	if !(o.maxWeight >= 1) {
		return c, usagef("--max-weight %v: want a number ≥ 1", o.maxWeight)
	}
	c.MaxWeight = o.maxWeight
	return c, nil
}

// grouping is readings grouped into sets, with the weights used.
type grouping struct {
	readings []site.Plane
	extras   []string
	poles    []r3.Vec
	weights  []float64 // nil when no reading is weighted
	cfg      site.SetsConfig
	an       planes.SetAnalysis
}

// group weights the readings (their own weight × Terzaghi's for the sampling
// line) and groups them into sets.
func group(readings []site.Plane, extras []string, cfg site.SetsConfig) *grouping {
	g := &grouping{readings: readings, extras: extras, cfg: cfg}
	weighted := cfg.Line != nil
	for _, r := range readings {
		g.poles = append(g.poles, r.Orientation.Normal())
		if !math.IsNaN(r.Weight) {
			weighted = true
		}
	}
	if weighted {
		for i, r := range readings {
			w := 1.0
			if !math.IsNaN(r.Weight) {
				w = r.Weight
			}
			if cfg.Line != nil {
				w *= planes.TerzaghiWeight(g.poles[i], cfg.Line.Vec(), cfg.MaxWeight)
			}
			g.weights = append(g.weights, w)
		}
	}
	so := planes.SetOptions{K: cfg.Count, MaxAngle: cfg.MaxAngle}
	for _, s := range cfg.Seeds {
		so.Seeds = append(so.Seeds, s.Normal())
	}
	g.an = planes.AnalyseSets(g.poles, g.weights, so)
	return g
}

// setName names set k (0-based): S1, S2, …
func setName(k int) string { return fmt.Sprintf("S%d", k+1) }

// assigned returns the set name of reading i, or "unassigned".
func (g *grouping) assigned(i int) string {
	if s := g.an.Assign[i]; s >= 0 {
		return setName(s)
	}
	return "unassigned"
}

func (g *grouping) weight(i int) float64 {
	if g.weights == nil {
		return 1
	}
	return g.weights[i]
}

// explain says how the sets were found, in a sentence or two.
func (g *grouping) explain() string {
	var b strings.Builder
	n := len(g.an.Sets)
	switch {
	case len(g.cfg.Seeds) > 0:
		fmt.Fprintf(&b, "%d sets from the given seeds by spherical k-means on axes.", n)
	case !g.an.Auto:
		fmt.Fprintf(&b, "%d sets as asked, by spherical k-means on axes (k-means++ starts, best of ten, fixed seed).", n)
	default:
		var sc []string
		for k := 2; k < len(g.an.Scores); k++ {
			sc = append(sc, fmt.Sprintf("%d: %.2f", k, g.an.Scores[k]))
		}
		fmt.Fprintf(&b, "The number of sets was chosen by the mean silhouette width (Rousseeuw 1987; axial angle as the distance) of k-means groupings with 2 to %d sets — %s — ", len(g.an.Scores)-1, strings.Join(sc, ", "))
		if n == 1 {
			b.WriteString("none reaching 0.25, read as no substantial structure (Kaufman & Rousseeuw 1990): one set.")
		} else {
			fmt.Fprintf(&b, "the largest at %d sets.", n)
		}
	}
	if g.cfg.MaxAngle > 0 {
		fmt.Fprintf(&b, " Readings more than %g° from every set axis are unassigned (%d).", g.cfg.MaxAngle, g.an.Unassigned)
	}
	if g.cfg.Line != nil {
		fmt.Fprintf(&b, " Weights: Terzaghi 1/|cos δ| for the sampling line %03.0f/%02.0f, capped at %g", g.cfg.Line.Trend, g.cfg.Line.Plunge, g.cfg.MaxWeight)
		if g.weights != nil && hasOwnWeight(g.readings) {
			b.WriteString(", times each reading's own weight")
		}
		b.WriteString(".")
	} else if g.weights != nil {
		b.WriteString(" Weights: each reading's own weight column.")
	}
	return b.String()
}

func hasOwnWeight(rs []site.Plane) bool {
	for _, r := range rs {
		if !math.IsNaN(r.Weight) {
			return true
		}
	}
	return false
}

// Columns of sets.csv.
var setColumns = []string{"set", "count", "weighted_count", "mean_dip", "mean_dip_direction", "fisher_k", "alpha95_deg",
	"spherical_variance", "woodcock_k", "woodcock_c", "weighted_mean_dip", "weighted_mean_dip_direction", "weighted_fisher_k", "weighted_alpha95_deg"}

// statRows are the rows of sets.csv: one per set, then the unassigned.
func (g *grouping) statRows() [][]string {
	var rows [][]string
	for k, s := range g.an.Sets {
		m, wm := s.Raw.MeanPlane(), s.Weighted.MeanPlane()
		rows = append(rows, []string{setName(k), fmt.Sprint(len(s.Members)), cell(s.WeightedCount), cell(m.Dip()), cell(m.DipDirection()),
			cell(s.Raw.K), cell(s.Raw.Alpha), cell(s.Raw.SphVar), cell(s.Tensor.WoodcockK()), cell(s.Tensor.WoodcockC()),
			cell(wm.Dip()), cell(wm.DipDirection()), cell(s.Weighted.K), cell(s.Weighted.Alpha)})
	}
	un := make([]string, len(setColumns))
	un[0], un[1], un[2] = "unassigned", fmt.Sprint(g.an.Unassigned), cell(g.an.UnassignedWeight)
	return append(rows, un)
}

func (g *grouping) writeSets(w io.Writer) error {
	return writeCSV(w, append([][]string{setColumns}, g.statRows()...))
}

func (g *grouping) writeReadings(w io.Writer) error {
	head := []string{"name", "dip", "dip_direction", "depth_m", "weight", "set", "angle_to_mean_deg"}
	for _, e := range g.extras {
		if e == "set" {
			e = "field_set" // the input's own set column, kept beside ours
		}
		head = append(head, e)
	}
	rows := [][]string{head}
	for i, r := range g.readings {
		row := []string{r.Name, cell(r.Orientation.Dip()), cell(r.Orientation.DipDirection()), cell(r.Depth), cell(g.weight(i)), g.assigned(i), cell(g.an.AngleToMean[i])}
		rows = append(rows, append(row, r.Extras...))
	}
	return writeCSV(w, rows)
}

// cell formats a number for a table: 8 significant digits, empty when
// undefined (NaN or ±Inf).
func cell(v float64) string {
	return string(table.AppendNumber(nil, v))
}

func (g *grouping) densityNet(name string, proj plots.Projection) *plots.DensityNet {
	d := &plots.DensityNet{
		Site:    name,
		Lines:   []string{fmt.Sprintf("Pole density of %d readings, %d sets", len(g.readings), len(g.an.Sets)), "Lower-hemisphere " + strings.TrimSuffix(proj.Name(), ", lower hemisphere") + "; poles to planes"},
		Proj:    proj,
		Poles:   g.poles,
		Weights: g.weights,
	}
	if g.weights != nil {
		d.Lines[0] += ", weighted"
	}
	for _, a := range g.an.Assign {
		d.InSet = append(d.InSet, a >= 0)
	}
	for k, s := range g.an.Sets {
		d.Sets = append(d.Sets, plots.SetMark{Name: setName(k), Mean: s.Raw.MeanPlane(), Alpha95: s.Raw.Alpha, Count: len(s.Members)})
	}
	return d
}

// summary prints the sets in a few lines.
func (g *grouping) summary(b *strings.Builder) {
	fmt.Fprintf(b, "%d readings. %s\n\n", len(g.readings), wrap(g.explain(), 88))
	fmt.Fprintf(b, "%-11s %6s %9s %11s %9s %8s %7s %9s\n", "set", "count", "weighted", "mean plane", "pole", "K", "α95 °", "Woodcock K")
	for k, s := range g.an.Sets {
		m := s.Raw.MeanPlane()
		p := m.Pole()
		fmt.Fprintf(b, "%-11s %6d %9.1f %11s %03.0f/%02.0f %8.1f %7.1f %9.2f\n", setName(k), len(s.Members), s.WeightedCount, m, p.Trend, p.Plunge, s.Raw.K, s.Raw.Alpha, s.Tensor.WoodcockK())
	}
	fmt.Fprintf(b, "%-11s %6d %9.1f\n", "unassigned", g.an.Unassigned, g.an.UnassignedWeight)
}

func runSets(o setsOptions, stdin io.Reader, stdout io.Writer) error {
	cfg, err := o.config()
	if err != nil {
		return err
	}
	proj, err := plots.ParseProjection(o.projection)
	if err != nil {
		return usageError{err}
	}
	readings, extras, _, err := site.LoadReadings(o.readings, stdin)
	if err != nil {
		return err
	}
	if len(cfg.Seeds) > len(readings) || cfg.Count > len(readings) {
		return fmt.Errorf("%s: %d readings cannot make %d sets", o.readings, len(readings), max(cfg.Count, len(cfg.Seeds)))
	}
	g := group(readings, extras, cfg)
	var b strings.Builder
	g.summary(&b)
	if o.out != "" {
		if err := makeDir(o.out); err != nil {
			return err
		}
		var wrote []string
		if err := writeTables(o.out, []namedTable{{"sets.csv", g.writeSets}, {"readings.csv", g.writeReadings}}, &wrote); err != nil {
			return err
		}
		if err := writeFigures(o.out, []namedFigure{g.densityFigure(filepath.Base(o.readings), proj)}, &wrote); err != nil {
			return err
		}
		names := baseNames(wrote)
		sort.Strings(names)
		fmt.Fprintf(&b, "\nWrote %s to %s.\n", strings.Join(names, ", "), o.out)
	}
	_, err = io.WriteString(stdout, b.String())
	return err
}
