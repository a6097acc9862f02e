package main

import (
	"fmt"
	"io"
	"strings"

	"cleft/planes/chance/study"
	"cleft/planes/site"
	"cleft/plots"
	"cleft/plots/report"
	"cleft/plots/table"
	"cleft/plots/words"

	"github.com/spf13/cobra"
)

type chanceOptions struct {
	site         string
	out          string
	realisations int
	seed         uint64
	seedSet      bool
}

func newChanceCmd() *cobra.Command {
	var o chanceOptions
	c := &cobra.Command{
		Use:   "chance SITE.yaml [--out DIR] [--realisations N] [--seed S]",
		Short: "How sure is the verdict: bracketing cases and the probability of slip",
		Long: `chance runs the site file's bracketing cases (cases:) and its Monte Carlo
(uncertainty:): every plane, reading and set mean resolved in each case, and
in every realisation of the uncertain inputs (stress, water, strength, slope
and tunnel numbers by dotted path, a plane's own columns, and the scatter of
the orientations). It prints the least sure verdicts; with --out it writes

  cases.csv             every plane in every case, the base first
  chance.csv            per plane: P(critical), P(opening), P(unstable) and its
                        standard error, percentiles of FS, Ts and ΔPp, whether
                        the state holds in every case, the driving input
  sensitivity.csv       Spearman's ρ of every input with every plane's FS
  chance-slope.csv      with a slope: P(planar FS < 1) per feasible case and
                        water case
  chance-tunnel.csv     with a tunnel: P(unstable) per set per station
  chance-stereonet.svg/.png    P(unstable) of every orientation at one depth
  chance-sensitivity.svg/.png  rank correlations of the least stable planes

The result for a seed does not depend on the number of CPUs. A progress bar
is shown on standard error for long runs when it is a terminal.

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site = args[0]
			o.seedSet = cmd.Flags().Changed("seed")
			if cmd.Flags().Changed("realisations") && o.realisations < 2 {
				return usagef("--realisations %d: want at least 2", o.realisations)
			}
			return runChance(o, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder (created if missing)")
	c.Flags().IntVar(&o.realisations, "realisations", 0, "number of realisations; 0 for the site's, else 10000")
	uintVar(c.Flags(), &o.seed, "seed", 1, "seed of the random streams, a whole number ≥ 0; when not given, the site's, else 1")
	return c
}

func runChance(o chanceOptions, stdout, stderr io.Writer) error {
	var outs []string
	if o.out != "" {
		outs = inDir(o.out, chanceFiles())
	}
	if err := refuseInputs(outs, o.site); err != nil {
		return err
	}
	s, err := site.Load(o.site)
	if err != nil {
		return err
	}
	if err := refuseInputs(outs, siteInputs(s)...); err != nil {
		return err
	}
	if len(s.Cases) == 0 && s.Uncertainty == nil {
		return &site.Error{File: s.File, Err: site.ErrMissing, Msg: "no cases: or uncertainty: block: give named cases {dotted.path: number} or uncertainty: {vary: …} (see README, How sure is the verdict)"}
	}
	a, err := screenAll(s)
	if err != nil {
		return err
	}
	ch, err := runChances(a, o, stderr)
	if err != nil {
		return err
	}
	var b strings.Builder
	fmt.Fprintf(&b, "%s\nModel: %s\n\n", s.Name, s.Summary())
	ch.print(&b, a)
	if o.out != "" {
		if err := makeDir(o.out); err != nil {
			return err
		}
		out := &outputs{dir: o.out}
		if err := out.tables(ch.tables(a)...); err != nil {
			return err
		}
		if err := out.figures(ch.figures(a)); err != nil {
			return err
		}
		fmt.Fprintf(&b, "\nWrote %d files to %s: %s.\n", len(out.wrote), o.out, strings.Join(out.names(), ", "))
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// chances are the cases and the Monte Carlo of a screened site.
type chances struct {
	targets []study.Target
	runs    []study.CaseRun // the base first
	out     *study.Outcome  // nil without uncertainty:
	depth   float64         // of the probability field
}

// Size of the probability field: nodes across, and the realisations it uses.
const (
	chanceFieldN            = 101
	chanceFieldRealisations = 2000
)

// runChances runs the site's cases and, with uncertainty:, its Monte
// Carlo (with the probability field at the figure depth).
func runChances(a *screened, o chanceOptions, stderr io.Writer) (*chances, error) {
	ts, err := study.Targets(a.Assessment)
	if err != nil {
		return nil, err
	}
	ch := &chances{targets: ts, depth: a.FigureDepth()}
	if ch.runs, err = study.Cases(a.Site, ts); err != nil {
		return nil, err
	}
	if a.Site.Uncertainty == nil {
		return ch, nil
	}
	bar := startProgress(stderr)
	ch.out, err = study.Run(a.Assessment, ts, study.Options{
		Realisations: o.realisations, Seed: o.seed, SetSeed: o.seedSet,
		Field: plots.ChanceNodes(plots.EqualArea, chanceFieldN), FieldDepth: ch.depth, FieldRealisations: chanceFieldRealisations,
		Slope: a.slope, Tunnel: a.tunnel, Progress: bar.report,
	})
	bar.finish()
	return ch, err
}

// print writes the verdict table and the sentences.
func (ch *chances) print(b *strings.Builder, a *screened) {
	for _, l := range words.ChanceTable(ch.targets, ch.runs, ch.out, 12) {
		b.WriteString(l + "\n")
	}
	b.WriteString("\n")
	for _, l := range ch.lines(a) {
		b.WriteString(words.Wrap(l, 88) + "\n")
	}
}

// lines are the sentences of the cases, the Monte Carlo, the slope and the
// tunnel.
func (ch *chances) lines(a *screened) []string {
	lines := words.ChanceLines(ch.targets, ch.runs, ch.out)
	if ch.out != nil && a.slope != nil && ch.out.Slope != nil {
		lines = append(lines, words.SlopeChanceLines(a.slope, ch.out)...)
	}
	if ch.out != nil && a.tunnel != nil && ch.out.Tunnel != nil {
		lines = append(lines, words.TunnelChanceLines(a.tunnel, ch.out)...)
	}
	return lines
}

// tables are the output tables of the cases and the Monte Carlo.
func (ch *chances) tables(a *screened) []namedTable {
	ts := []namedTable{
		csvTable("cases.csv", table.Cases(ch.targets, ch.runs)),
		csvTable("chance.csv", table.Chance(ch.targets, ch.runs, ch.out)),
	}
	if ch.out == nil {
		return ts
	}
	ts = append(ts, csvTable("sensitivity.csv", table.Sensitivity(ch.out)))
	if a.slope != nil && ch.out.Slope != nil {
		ts = append(ts, csvTable("chance-slope.csv", table.SlopeChance(a.slope, ch.out)))
	}
	if a.tunnel != nil && ch.out.Tunnel != nil {
		ts = append(ts, csvTable("chance-tunnel.csv", table.TunnelChance(a.tunnel, ch.out)))
	}
	return ts
}

// figures are the probability stereonet and the rank-correlation bars.
func (ch *chances) figures(a *screened) []*namedFigure {
	if ch.out == nil {
		return nil
	}
	out := ch.out
	net := &plots.ChanceNet{
		Site:  a.Site.Name,
		Lines: []string{fmt.Sprintf("Share of %d realisations in which a plane of each orientation at %g m is critical or opening", out.FieldN, ch.depth), a.Site.Summary(), "Lower-hemisphere equal-area; poles to planes, filled by their own probability at their own depth"},
		Depth: ch.depth,
		State: a.Site.Model.At(ch.depth),
		Proj:  plots.EqualArea,
		Field: plots.NewProbabilityField(chanceFieldN, out.Field),
	}
	order := words.ChanceOrder(ch.targets, ch.runs, out)
	labelled := map[int]bool{}
	for _, i := range order[:min(6, len(order))] {
		if out.Odds[i].PUnstable > 0 {
			labelled[i] = true
		}
	}
	for i := range a.Planes {
		t := &ch.targets[i]
		net.Poles = append(net.Poles, plots.ChancePole{Name: t.Plane.Name, Orientation: t.Plane.Orientation, State: t.Base.State, P: out.Odds[i].PUnstable, Label: labelled[i]})
	}
	bars := &plots.RankBars{Site: a.Site.Name, MaxInputs: 8,
		Lines: []string{fmt.Sprintf("Rank correlation of each uncertain input with the factor of safety, %d realisations", out.N), "The least stable planes and set means, least stable first"}}
	for _, i := range order[:min(6, len(order))] {
		d := out.Odds[i]
		bars.Rows = append(bars.Rows, plots.RankRow{Plane: ch.targets[i].Plane.Name, Detail: fmt.Sprintf("P(unstable) %s, FS %s to %s (5 to 95 %%)", words.Proportion(d.PUnstable, d.StdErr), words.Fixed(d.FS[0], 2), words.Fixed(d.FS[2], 2)), Inputs: out.Inputs, Rho: d.Rho})
	}
	return []*namedFigure{
		{file: "chance-stereonet",
			title:   fmt.Sprintf("Probability that each orientation is critical or opening at %g m", ch.depth),
			caption: fmt.Sprintf("The net of Figure 1. The background is the share of the first %d of %d realisations in which a plane of that orientation at %g m (with the site's water model and strength, as drawn in each realisation) is critical or opening: light where that is likely; thin lines mark 0.05 and 0.95, red dashes 0.5. Each pole is filled with its own plane's probability at its own depth (its own strength, pore pressure and orientation scatter) and shaped by its state in the base case; the least sure are named with their probability.", out.FieldN, out.N, ch.depth),
			fig:     net, w: cm(19, 0), h: cm(13.5, 0)},
		{file: "chance-sensitivity",
			title:   "Which uncertain input drives the verdict",
			caption: "For the least stable planes and set means, Spearman's rank correlation between each varied input and the plane's factor of safety over the realisations, largest first. A solid bar to the left: the factor of safety falls as the input rises; a hatched bar to the right: it rises. An input of one plane (planes.NAME.…) correlates with that plane only.",
			fig:     bars, w: cm(19, 0), h: bars.Height(cm(19, 0))},
	}
}

// maxChanceRows is the most planes the report's table of the cases and
// the Monte Carlo lists: the least sure; chance.csv has them all.
const maxChanceRows = 6

// reportTable is the report's section on the cases and the Monte Carlo.
func (ch *chances) reportTable(a *screened) *report.Table {
	t := &report.Table{Notes: words.ChanceOverview(ch.targets, ch.runs, ch.out)}
	if ch.out != nil && a.slope != nil && ch.out.Slope != nil {
		t.Notes = append(t.Notes, words.SlopeChanceLines(a.slope, ch.out)...)
	}
	if ch.out != nil && a.tunnel != nil && ch.out.Tunnel != nil {
		t.Notes = append(t.Notes, words.TunnelChanceLines(a.tunnel, ch.out)...)
	}
	t.Notes = append(t.Notes, "The least sure planes and set means, least sure first (every one of them is in chance.csv and cases.csv, the rank correlations in sensitivity.csv). P(unstable) is the share of realisations in which the plane is critical or opening, ± its standard error (P(critical) and P(opening) apart are in chance.csv); “—” where there is no Monte Carlo or the percentile falls on an opening realisation. These probabilities are no better than the distributions given for the inputs.")
	t.Columns = []string{"plane", "dip/dip dir.", "depth m", "base", "cases unstable", "P(unstable)", "FS 5 %", "FS 50 %", "FS 95 %", "robust", "driver (ρ)"}
	t.Numeric = []bool{false, true, true, false, true, true, true, true, true, false, false}
	t.NoWrap = []bool{0: true, 3: true, 5: true}
	for _, i := range words.ChanceOrder(ch.targets, ch.runs, ch.out)[:min(maxChanceRows, len(ch.targets))] {
		tg := &ch.targets[i]
		row := []string{tg.Plane.Name, tg.Plane.Orientation.String(), words.Num(tg.Plane.Depth), words.StateLabel(tg.Base.State), "—", "—", "—", "—", "—", "—", "—"}
		if len(ch.runs) > 1 {
			row[4] = fmt.Sprintf("%d of %d", study.Critical(ch.runs, i), len(ch.runs))
			row[9] = "no"
			if study.Robust(ch.runs, i) {
				row[9] = "yes"
			}
		}
		if o := ch.out; o != nil {
			d := o.Odds[i]
			row[5] = words.Proportion(d.PUnstable, d.StdErr)
			row[6], row[7], row[8] = words.Fixed(d.FS[0], 2), words.Fixed(d.FS[1], 2), words.Fixed(d.FS[2], 2)
			if d.Driver >= 0 {
				row[10] = fmt.Sprintf("%s (%s)", o.Inputs[d.Driver], words.Signed(d.Rho[d.Driver]))
			}
		}
		t.Rows = append(t.Rows, report.Row{Class: tg.Base.State.String(), Cells: row})
	}
	return t
}
