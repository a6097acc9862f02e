package main

import (
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"cleft/insitu/geom"
	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots"

	"github.com/spf13/cobra"
)

type slopeOptions struct {
	site string
	out  string
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
			o.site = args[0]
			return runSlope(o, cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder for slope.csv and the kinematic stereonet")
	return c
}

// candidate is a plane tested against the slope.
type candidate struct {
	name  string
	o     planes.Orientation
	phi   float64 // friction angle for its sliding FS, °
	c     float64 // cohesion, MPa
	isSet bool
}

// slopeRow is one test of one plane or pair.
type slopeRow struct {
	test     string // planar, wedge, flexural-toppling
	planes   string
	k        planes.Kinematic
	line     geom.Line // wedge: the intersection; others: the dip vector
	hasLine  bool      // wedge: the planes are not parallel
	fs       []float64 // planar: one per water case
	crack    float64   // planar: crack depth, m
	waterToF float64   // planar: water depth to FS = 1, m (NaN: not reached)
}

// slopeScreen is the slope screening of an assessment.
type slopeScreen struct {
	slope *site.Slope
	cands []candidate
	rows  []slopeRow
}

// candidates are the site's planes (not the readings) and the set means.
func (a *assessment) candidates() []candidate {
	sl := a.site.Slope
	var out []candidate
	for i := 0; i < a.nPlanes; i++ {
		p := &a.planes[i]
		c := candidate{name: p.Name, o: p.Orientation, phi: sl.FrictionAngle, c: sl.Cohesion}
		if !math.IsNaN(p.Friction) {
			c.phi = math.Atan(p.Friction) * 180 / math.Pi
		}
		if !math.IsNaN(p.Cohesion) {
			c.c = p.Cohesion
		}
		out = append(out, c)
	}
	for _, s := range a.sets {
		out = append(out, candidate{name: s.name + " mean", o: s.plane.Orientation, phi: sl.FrictionAngle, c: sl.Cohesion, isSet: true})
	}
	return out
}

// screenSlope runs every test on every candidate and pair.
func (a *assessment) screenSlope() *slopeScreen {
	sl := a.site.Slope
	sc := &slopeScreen{slope: sl, cands: a.candidates()}
	phi := sl.FrictionAngle
	topDip := func(az float64) float64 { return math.Max(0, planes.ApparentDip(sl.Top, az)) }
	for _, c := range sc.cands {
		k := planes.PlanarSliding(c.o, sl.Face, phi, sl.LateralLimit)
		r := slopeRow{test: "planar", planes: c.name, k: k, line: c.o.DipLine(), crack: math.NaN(), waterToF: math.NaN()}
		if k.Feasible {
			psiF := planes.ApparentDip(sl.Face, c.o.DipDirection())
			crack, byDepth := sl.Crack, sl.CrackByDepth
			if !sl.CrackGiven {
				crack, byDepth = planes.CriticalCrackDepth(sl.Height, psiF, c.o.Dip()), true
			}
			b, err := planes.NewPlanarBlock(sl.Height, psiF, topDip(c.o.DipDirection()), c.o.Dip(), crack, byDepth, sl.UnitWeight)
			if err != nil {
				// Kinematically feasible, but the block's geometry is outside
				// the limit-equilibrium model: say so in the row.
				r.k.Mode += "; factor of safety not computed: " + err.Error()
			} else {
				r.crack = b.CrackDepth
				for _, f := range sl.CrackFill {
					r.fs = append(r.fs, b.FS(c.c, c.phi, f*b.CrackDepth))
				}
				r.waterToF = b.WaterDepthToFail(c.c, c.phi)
			}
		}
		sc.rows = append(sc.rows, r)
	}
	for i, a1 := range sc.cands {
		for _, a2 := range sc.cands[i+1:] {
			l, k := planes.WedgeSliding(a1.o, a2.o, a1.name, a2.name, sl.Face, phi)
			_, ok := planes.Intersection(a1.o, a2.o)
			sc.rows = append(sc.rows, slopeRow{test: "wedge", planes: a1.name + "+" + a2.name, k: k, line: l, hasLine: ok, crack: math.NaN(), waterToF: math.NaN()})
		}
	}
	for _, c := range sc.cands {
		k := planes.FlexuralToppling(c.o, sl.Face, phi, sl.ToppleLimit)
		sc.rows = append(sc.rows, slopeRow{test: "flexural-toppling", planes: c.name, k: k, line: c.o.DipLine(), crack: math.NaN(), waterToF: math.NaN()})
	}
	return sc
}

func (sc *slopeScreen) columns() []string {
	cols := []string{"test", "planes", "feasible", "reason", "line_trend", "line_plunge"}
	for _, f := range sc.slope.CrackFill {
		cols = append(cols, "fs_crack_fill_"+strconv.FormatFloat(f, 'g', -1, 64))
	}
	return append(cols, "crack_depth_m", "water_depth_to_fail_m")
}

func (sc *slopeScreen) write(w io.Writer) error {
	rows := [][]string{sc.columns()}
	for _, r := range sc.rows {
		feasible := "no"
		if r.k.Feasible {
			feasible = "yes"
		}
		row := []string{r.test, r.planes, feasible, r.k.Reason(), "", ""}
		if r.hasLine {
			row[4], row[5] = cell(r.line.Trend), cell(r.line.Plunge)
		}
		for i := range sc.slope.CrackFill {
			v := math.NaN()
			if i < len(r.fs) {
				v = r.fs[i]
			}
			row = append(row, cell(v))
		}
		rows = append(rows, append(row, cell(r.crack), cell(r.waterToF)))
	}
	return writeCSV(w, rows)
}

// summary puts the feasible cases in a few lines.
func (sc *slopeScreen) summary(b *strings.Builder) {
	sl := sc.slope
	count := map[string]int{}
	for _, r := range sc.rows {
		if r.k.Feasible {
			count[r.test]++
		}
	}
	fmt.Fprintf(b, "Slope: face %s, %g m high, friction angle %.1f°, lateral limits %g° (sliding) and %g° (toppling); %d planes tested, %d pairs.\n",
		sl.Face, sl.Height, sl.FrictionAngle, sl.LateralLimit, sl.ToppleLimit, len(sc.cands), len(sc.cands)*(len(sc.cands)-1)/2)
	fmt.Fprintf(b, "Kinematically feasible: %d planar, %d wedge, %d flexural toppling.\n", count["planar"], count["wedge"], count["flexural-toppling"])
	for _, r := range sc.rows {
		if !r.k.Feasible {
			continue
		}
		switch r.test {
		case "planar":
			if len(r.fs) == 0 {
				fmt.Fprintf(b, "  planar %s: %s.\n", r.planes, r.k.Mode)
				continue
			}
			var fs []string
			for i, f := range sl.CrackFill {
				fs = append(fs, fmt.Sprintf("%.2f (crack %g%% full)", r.fs[i], 100*f))
			}
			water := "does not fall to 1 even with a full crack"
			if !math.IsNaN(r.waterToF) {
				water = fmt.Sprintf("falls to 1 with %.1f m of water in the crack", r.waterToF)
				if r.waterToF == 0 {
					water = "is at or below 1 dry"
				}
			}
			fmt.Fprintf(b, "  planar %s: crack %.1f m deep; FS %s; FS %s.\n", r.planes, r.crack, strings.Join(fs, ", "), water)
		case "wedge":
			fmt.Fprintf(b, "  wedge %s: line %03.0f/%02.0f, %s.\n", r.planes, r.line.Trend, r.line.Plunge, r.k.Mode)
		default:
			fmt.Fprintf(b, "  flexural toppling %s.\n", r.planes)
		}
	}
}

func runSlope(o slopeOptions, stdout io.Writer) error {
	a, err := assessFor(o.site, func(s *site.Site) bool { return s.Slope != nil }, "no slope: block: give the face, height and the rest (see README, Rock slopes)")
	if err != nil {
		return err
	}
	sc := a.slope
	var b strings.Builder
	sc.summary(&b)
	if o.out != "" {
		if err := makeDir(o.out); err != nil {
			return err
		}
		var wrote []string
		if err := writeTables(o.out, []namedTable{{"slope.csv", sc.write}}, &wrote); err != nil {
			return err
		}
		if err := writeFigures(o.out, []namedFigure{a.slopeFigure()}, &wrote); err != nil {
			return err
		}
		fmt.Fprintf(&b, "\nWrote %s to %s.\n", strings.Join(baseNames(wrote), ", "), o.out)
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// kinematicNet draws the screening on a kinematic stereonet.
func (a *assessment) kinematicNet(sc *slopeScreen) *plots.KinematicNet {
	sl := sc.slope
	k := &plots.KinematicNet{
		Site:         a.site.Name,
		Lines:        []string{fmt.Sprintf("Kinematic screening of the %s face, %g m high, φ = %.1f°", sl.Face, sl.Height, sl.FrictionAngle), "Lower-hemisphere " + strings.TrimSuffix(plots.EqualArea.Name(), ", lower hemisphere") + "; dip vectors and lines of intersection"},
		Proj:         plots.EqualArea,
		Face:         sl.Face,
		Phi:          sl.FrictionAngle,
		LateralLimit: sl.LateralLimit,
		ToppleLimit:  sl.ToppleLimit,
	}
	topple := map[string]bool{}
	for _, r := range sc.rows {
		if r.test == "flexural-toppling" && r.k.Feasible {
			topple[r.planes] = true
		}
	}
	for _, r := range sc.rows {
		switch {
		case r.test == "planar":
			k.Items = append(k.Items, plots.KinItem{Name: r.planes, Line: r.line, Feasible: r.k.Feasible, Toppling: topple[r.planes], Fails: r.k.Fails})
		case r.test == "wedge" && r.hasLine:
			k.Items = append(k.Items, plots.KinItem{Name: r.planes, Line: r.line, Intersection: true, Feasible: r.k.Feasible, Fails: r.k.Fails})
		}
	}
	return k
}

// reportTable is the screening as the report shows it: the feasible cases,
// the settings and defaults, and the counts.
func (sc *slopeScreen) reportTable() *plots.ReportTable {
	var b strings.Builder
	sc.summary(&b)
	lines := strings.Split(strings.TrimSpace(b.String()), "\n")
	t := &plots.ReportTable{Notes: lines[:2], Empty: "No test is kinematically feasible for this face."}
	if len(sc.slope.Defaults) > 0 {
		t.Notes = append(t.Notes, "Defaults applied: "+strings.Join(sc.slope.Defaults, "; ")+".")
	}
	t.Notes = append(t.Notes, "The feasible cases (every test, feasible or not, with the condition that failed, is in slope.csv):")
	t.Columns = []string{"test", "planes", "mode", "line", "crack depth m"}
	t.Numeric = []bool{false, false, false, true, true}
	for _, f := range sc.slope.CrackFill {
		t.Columns = append(t.Columns, fmt.Sprintf("FS, crack %g%% full", 100*f))
		t.Numeric = append(t.Numeric, true)
	}
	t.Columns = append(t.Columns, "water to FS = 1, m")
	t.Numeric = append(t.Numeric, true)
	for _, r := range sc.rows {
		if !r.k.Feasible {
			continue
		}
		line := ""
		if r.hasLine {
			line = fmt.Sprintf("%03.0f/%02.0f", r.line.Trend, r.line.Plunge)
		}
		row := []string{r.test, r.planes, r.k.Mode, line, fixed2(r.crack, 1)}
		for i := range sc.slope.CrackFill {
			v := math.NaN()
			if i < len(r.fs) {
				v = r.fs[i]
			}
			row = append(row, fixed2(v, 2))
		}
		w := fixed2(r.waterToF, 1)
		if r.test == "planar" && math.IsNaN(r.waterToF) {
			w = "not reached"
		}
		t.Rows = append(t.Rows, append(row, w))
	}
	return t
}

func fixed2(v float64, d int) string {
	if math.IsNaN(v) {
		return "—"
	}
	return strconv.FormatFloat(v, 'f', d, 64)
}
