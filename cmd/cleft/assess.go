package main

import (
	"errors"
	"fmt"
	"io"
	"math"
	"sort"
	"strings"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots"
	"cleft/plots/table"

	"github.com/spf13/cobra"
)

type assessOptions struct {
	site    string
	example bool
	out     string
}

func newAssessCmd() *cobra.Command {
	var o assessOptions
	c := &cobra.Command{
		Use:   "assess (SITE.yaml | --example) --out DIR",
		Short: "The whole screening of a site: tables, stress states and a summary",
		Long: `assess resolves every plane of the site and writes, into DIR:

  planes.csv, planes.json   the plane table (see cleft resolve), input order
  stress.json               the stress state at the report depths
  stereonet-slip.svg/.png   tendency stereonet of slip tendency (see cleft plot)
  stereonet-dilation.svg/.png  the same for dilation tendency
  mohr.svg/.png             Mohr diagram of effective stress
  report.html, summary.json the report for the project geologist, and its figures
  with readings_file:       sets.csv, sets-density.svg/.png (see cleft sets)
  with slope:               slope.csv, slope-kinematic.svg/.png (see cleft slope)
  with tunnel:              stations.csv, wall.csv, profile.csv, tunnel-*.svg/.png

and prints a short summary: how many planes are critical or opening, the
least stable three, and the frictional-limit check of the stress model.
--example uses the invented demo site built into cleft (see cleft example).

` + caution,
		Args: siteOrExample(&o.example),
		RunE: func(cmd *cobra.Command, args []string) error {
			if len(args) == 1 {
				o.site = args[0]
			}
			return runAssess(o, cmd.OutOrStdout())
		},
	}
	c.Flags().BoolVar(&o.example, "example", false, "assess the built-in demo site (invented data)")
	c.Flags().StringVar(&o.out, "out", "", "output folder (created if missing)")
	return c
}

// assessment is a site with every plane resolved, in input order.
type assessment struct {
	site    *site.Site
	extras  []string
	planes  []site.Plane
	results []planes.Result
	depths  []float64
	states  []stressRow
	inputs  []plots.InputFile // the input files with their SHA-256

	grouping *grouping // the readings' sets, when the site has readings_file
	sets     []setRow
	nPlanes  int           // planes[:nPlanes] are the site's planes, the rest readings
	slope    *slopeScreen  // when the site has a slope
	tunnel   *tunnelScreen // when the site has a tunnel
}

func runAssess(o assessOptions, stdout io.Writer) error {
	if o.out == "" {
		return usagef("give --out DIR, the folder for the outputs")
	}
	s, err := loadSite(o.example, o.site)
	if err != nil {
		return err
	}
	a, err := assess(s)
	if err != nil {
		return err
	}
	if err := makeDir(o.out); err != nil {
		return err
	}
	var wrote []string
	tables := []namedTable{
		{"planes.csv", func(w io.Writer) error { return a.writeTable(w, table.CSV) }},
		{"planes.json", func(w io.Writer) error { return a.writeTable(w, table.JSON) }},
		{"stress.json", func(w io.Writer) error {
			return writeJSON(w, stressDoc{Site: s.Name, Model: s.Summary(), Notes: s.Notes, States: a.states})
		}},
	}
	if err := writeTables(o.out, tables, &wrote); err != nil {
		return err
	}
	figs := a.figures()
	if err := writeFigures(o.out, figs, &wrote); err != nil {
		return err
	}
	var more []namedTable
	if a.tunnel != nil {
		more = append(more, a.tunnel.tables()...)
	}
	if a.slope != nil {
		more = append(more, namedTable{"slope.csv", a.slope.write})
	}
	if a.grouping != nil {
		more = append(more, namedTable{"sets.csv", a.writeSets})
	}
	if err := writeTables(o.out, more, &wrote); err != nil {
		return err
	}
	rep, err := a.report(o.example, figs)
	if err != nil {
		return err
	}
	if err := writeTables(o.out, []namedTable{
		{"report.html", rep.WriteHTML},
		{"summary.json", func(w io.Writer) error { return writeJSON(w, a.facts()) }},
	}, &wrote); err != nil {
		return err
	}
	var b strings.Builder
	a.summary(&b)
	if a.slope != nil {
		b.WriteString("\n")
		a.slope.summary(&b)
	}
	if a.tunnel != nil {
		b.WriteString("\n")
		a.tunnel.summary(&b)
	}
	fmt.Fprintf(&b, "\nWrote %d files to %s: %s.\n\n%s\n", len(wrote), o.out, strings.Join(baseNames(wrote), ", "), caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// assess resolves every plane of s and the stress at the report depths.
func assess(s *site.Site) (*assessment, error) {
	s.AllowReadingsOnly()
	ps, err := s.OpenPlanes("", nil)
	if err != nil {
		return nil, err
	}
	defer ps.Close()
	a := &assessment{site: s, extras: ps.ExtraNames, inputs: []plots.InputFile{{Name: s.File, SHA256: s.SHA256}}}
	rv := s.Resolver()
	for {
		var p site.Plane
		if err := ps.Next(&p); err != nil {
			if errors.Is(err, io.EOF) {
				break
			}
			return nil, err
		}
		var r planes.Result
		rv.Resolve(&p, &r)
		a.planes = append(a.planes, p)
		a.results = append(a.results, r)
	}
	if name, sum := ps.Table(); name != "" {
		a.inputs = append(a.inputs, plots.InputFile{Name: name, SHA256: sum})
	}
	a.nPlanes = len(a.planes)
	if s.ReadingsFile != "" {
		if err := a.addReadings(); err != nil {
			return nil, err
		}
	}
	if len(a.planes) == 0 {
		return nil, &site.Error{File: s.File, Msg: "no planes to assess: the tables have a header but no rows"}
	}
	if s.Slope != nil {
		a.slope = a.screenSlope()
	}
	if s.Tunnel != nil {
		if a.tunnel, err = a.screenTunnel(); err != nil {
			return nil, err
		}
	}
	a.depths = s.ReportDepths
	if len(a.depths) == 0 {
		a.depths = defaultDepths(a.planes)
	}
	for _, z := range a.depths {
		a.states = append(a.states, stressAt(s, z))
	}
	return a, nil
}

// defaultDepths are the report depths when the site gives none: the
// distinct plane depths when there are at most five, else the shallowest,
// the middle of the range and the deepest.
func defaultDepths(ps []site.Plane) []float64 {
	seen := map[float64]bool{}
	var ds []float64
	for _, p := range ps {
		if !seen[p.Depth] {
			seen[p.Depth] = true
			ds = append(ds, p.Depth)
		}
	}
	sort.Float64s(ds)
	if len(ds) <= 5 {
		return ds
	}
	lo, hi := ds[0], ds[len(ds)-1]
	return []float64{lo, math.Round((lo + hi) / 2), hi}
}

func (a *assessment) writeTable(w io.Writer, f table.Format) error {
	if _, err := w.Write(table.Header(f, a.extras)); err != nil {
		return err
	}
	var buf []byte
	for i := range a.planes {
		buf = table.AppendRow(buf[:0], f, &a.planes[i], &a.results[i], a.extras, i == 0)
		if _, err := w.Write(buf); err != nil {
			return err
		}
	}
	_, err := w.Write(table.Footer(f, len(a.planes)))
	return err
}

// ranked returns the plane indexes from least to most stable.
func (a *assessment) ranked() []int {
	idx := make([]int, len(a.planes))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(i, j int) bool { return planes.LessStable(a.results[idx[i]], a.results[idx[j]]) })
	return idx
}

func (a *assessment) summary(b *strings.Builder) {
	s := a.site
	fmt.Fprintf(b, "%s\nModel: %s\n", s.Name, s.Summary())
	for _, n := range s.Notes {
		fmt.Fprintf(b, "Note: %s\n", n)
	}
	b.WriteString("\n")
	for _, l := range a.facts().sentences() {
		b.WriteString(wrap(l, 88))
		b.WriteString("\n")
	}
}

// wrap breaks text into lines of at most width runes, at spaces.
func wrap(text string, width int) string {
	var b strings.Builder
	n := 0
	for i, w := range strings.Fields(text) {
		l := len([]rune(w))
		if i > 0 && n+1+l > width {
			b.WriteString("\n")
			n = 0
		} else if i > 0 {
			b.WriteString(" ")
			n++
		}
		b.WriteString(w)
		n += l
	}
	return b.String()
}

// assessFor loads and assesses the site at path, which must have the block
// a command screens (has); missing says what to give when it does not.
func assessFor(path string, has func(*site.Site) bool, missing string) (*assessment, error) {
	s, err := site.Load(path)
	if err != nil {
		return nil, err
	}
	if !has(s) {
		return nil, &site.Error{File: s.File, Msg: missing}
	}
	return assess(s)
}
