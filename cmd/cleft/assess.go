package main

import (
	"fmt"
	"io"
	"strings"

	"cleft/planes/assess"
	"cleft/planes/site"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
	"cleft/plots/table"
	"cleft/plots/words"

	"github.com/spf13/cobra"
)

type assessOptions struct {
	site       string
	example    bool
	out        string
	readings   bool      // list every field reading in the report's appendix
	allFigures bool      // draw every figure in the report
	warn       io.Writer // standard error, for warnings
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
  with slope:               slope.csv, slope-kinematic.svg/.png (see cleft slope);
                            with readings also slope-readings.csv
  with tunnel:              stations.csv, wall.csv, profile.csv, zones.csv, tunnel-*.svg/.png
  with cases: or uncertainty:  the outputs of cleft chance
  manifest.json             every file written, with its SHA-256

and prints a short summary: what was screened, the findings to look at
first (planes, set means, readings, slope cases, tunnel stretches and their
probabilities, ranked by how near each is to its limit), and the
frictional-limit check of the stress model.

Files that an earlier assess wrote into DIR (named in its manifest.json)
and this run does not write are removed, when they are unchanged since;
nothing else in DIR is touched.

--example uses the invented demo site built into cleft (see cleft example).

` + caution,
		Args: siteOrExample(&o.example),
		RunE: func(cmd *cobra.Command, args []string) error {
			if len(args) == 1 {
				o.site = args[0]
			}
			o.warn = cmd.ErrOrStderr()
			return runAssess(o, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	c.Flags().BoolVar(&o.example, "example", false, "assess the built-in demo site (invented data)")
	c.Flags().StringVar(&o.out, "out", "", "output folder (created if missing)")
	c.Flags().BoolVar(&o.readings, "report-readings", false, "list every field reading in the report's appendix (default: one row per set)")
	c.Flags().BoolVar(&o.allFigures, "report-figures", false, "draw every figure in the report (default: the key figures; every figure is a file in DIR)")
	return c
}

// screened is an assessment with the screenings its site asks for.
type screened struct {
	*assess.Assessment
	slope  *slope.Screening  // when the site has a slope
	counts []slope.Count     // the readings against the slope's tests, when it has both
	tunnel *tunnel.Screening // when the site has a tunnel
}

// screenAll assesses s and runs every screening it has.
func screenAll(s *site.Site) (*screened, error) {
	a, err := assess.New(s)
	if err != nil {
		return nil, err
	}
	sc := &screened{Assessment: a}
	if s.Slope != nil {
		sc.slope, sc.counts = a.Slope(), a.SlopeReadings()
	}
	if s.Tunnel != nil {
		if sc.tunnel, err = a.Tunnel(); err != nil {
			return nil, err
		}
	}
	return sc, nil
}

func runAssess(o assessOptions, stdout, stderr io.Writer) error {
	if o.out == "" {
		return usagef("give --out DIR, the folder for the outputs")
	}
	outs := inDir(o.out, assessFiles())
	if err := refuseInputs(outs, o.site); err != nil {
		return err
	}
	s, err := loadSite(o.example, o.site)
	if err != nil {
		return err
	}
	if !o.example {
		if err := refuseInputs(outs, siteInputs(s)...); err != nil {
			return err
		}
	}
	a, err := screenAll(s)
	if err != nil {
		return err
	}
	warnRepeats(o.warn, a.Repeat, a.Repeats, false)
	var ch *chances // with cases: or uncertainty:
	if len(s.Cases) > 0 || s.Uncertainty != nil {
		if ch, err = runChances(a, chanceOptions{}, stderr); err != nil {
			return err
		}
	}
	if err := makeDir(o.out); err != nil {
		return err
	}
	out := &outputs{dir: o.out}
	if err := out.tables(
		namedTable{"planes.csv", func(w io.Writer) error { return planeTable(w, a.Assessment, table.CSV) }},
		namedTable{"planes.json", func(w io.Writer) error { return planeTable(w, a.Assessment, table.JSON) }},
		namedTable{"stress.json", func(w io.Writer) error { return writeJSON(w, newStressDoc(s, a.ReportDepths())) }},
	); err != nil {
		return err
	}
	figs := a.figures()
	if ch != nil {
		figs = append(figs, ch.figures(a)...)
	}
	if err := out.figures(figs); err != nil {
		return err
	}
	var more []namedTable
	if a.tunnel != nil {
		more = append(more, tunnelTables(a.tunnel)...)
	}
	if a.slope != nil {
		more = append(more, slopeTables(a.slope, a.counts)...)
	}
	if a.Grouping != nil {
		more = append(more, csvTable("sets.csv", table.AssessedSets(a.Assessment)))
	}
	if ch != nil {
		more = append(more, ch.tables(a)...)
	}
	if err := out.tables(more...); err != nil {
		return err
	}
	facts := a.Facts()
	dec := a.decide(ch)
	rep := a.report(o.example, facts, figs, o.allFigures)
	rep.Summary = dec.lead(facts, ch)
	rep.LookFirst, rep.LookRule, rep.RankRule, rep.More = words.LookFirst(dec.top), words.LookFirstBrief, words.LookFirstRule, words.More(dec.more)
	if q := words.Quiet(dec.top); q != "" {
		rep.LookRule += " " + q
	}
	rep.Checks = []string{words.Limit(facts)}
	rep.Readings = a.readingsTable(o.readings)
	if ch != nil {
		rep.Chance = ch.reportTable(a)
	}
	if err := out.tables(
		namedTable{"report.html", rep.WriteHTML},
		namedTable{"summary.json", func(w io.Writer) error { return writeJSON(w, newSummaryDoc(s.Name, facts, a, dec, ch)) }},
	); err != nil {
		return err
	}
	removed, kept, err := out.manifest(siteInputs(s))
	if err != nil {
		return err
	}
	var b strings.Builder
	printHead(&b, s)
	dec.print(&b, facts, ch)
	if a.slope != nil {
		b.WriteString("\n")
		printSlope(&b, a.slope, a.counts)
	}
	if a.tunnel != nil {
		b.WriteString("\n")
		printTunnel(&b, a.tunnel)
	}
	if ch != nil {
		b.WriteString("\n")
		ch.print(&b, a)
	}
	fmt.Fprintf(&b, "\nWrote %d files to %s: %s.\n", len(out.wrote), o.out, strings.Join(out.names(), ", "))
	printTidied(&b, removed, kept)
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// planeTable writes the plane table of an assessment.
func planeTable(w io.Writer, a *assess.Assessment, f table.Format) error {
	names := table.Carried(table.Columns, a.Extras)
	if _, err := w.Write(table.Header(f, names)); err != nil {
		return err
	}
	var buf []byte
	for i := range a.Planes {
		buf = table.AppendRow(buf[:0], f, &a.Planes[i], &a.Results[i], names, i == 0)
		if _, err := w.Write(buf); err != nil {
			return err
		}
	}
	_, err := w.Write(table.Footer(f, len(a.Planes)))
	return err
}

// printHead prints the site, its model and notes.
func printHead(b *strings.Builder, s *site.Site) {
	fmt.Fprintf(b, "%s\nModel: %s\n", s.Name, s.Summary())
	for _, n := range s.Notes {
		fmt.Fprintf(b, "Note: %s\n", n)
	}
	b.WriteString("\n")
}

// assessFor loads and assesses the site at path, which must have the block
// a command screens (has); missing says what to give when it does not. No
// output in outs may be one of the site's inputs.
func assessFor(path string, outs []string, has func(*site.Site) bool, missing string) (*assess.Assessment, error) {
	if err := refuseInputs(outs, path); err != nil {
		return nil, err
	}
	s, err := site.Load(path)
	if err != nil {
		return nil, err
	}
	if err := refuseInputs(outs, siteInputs(s)...); err != nil {
		return nil, err
	}
	if !has(s) {
		return nil, &site.Error{File: s.File, Err: site.ErrMissing, Msg: missing}
	}
	return assess.New(s)
}
