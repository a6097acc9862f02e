package main

import (
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"cleft/cmd/cleft/demo"
	"cleft/cmd/cleft/site"
	"cleft/cmd/cleft/table"
	"cleft/planes"
	"cleft/plots"

	"github.com/spf13/cobra"
	"gonum.org/v1/plot/vg"
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

and prints a short summary: how many planes are critical or opening, the
least stable three, and the frictional-limit check of the stress model.
--example uses the invented demo site built into cleft (see cleft example).

` + caution,
		Args: func(cmd *cobra.Command, args []string) error {
			if o.example {
				if len(args) > 0 {
					return usagef("give a site file or --example, not both")
				}
				return nil
			}
			return oneSite(cmd, args)
		},
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
}

func runAssess(o assessOptions, stdout io.Writer) error {
	if o.out == "" {
		return usagef("give --out DIR, the folder for the outputs")
	}
	var s *site.Site
	var err error
	if o.example {
		s, err = site.ParseFS(demo.FS, demo.Site)
	} else {
		s, err = site.Load(o.site)
	}
	if err != nil {
		return err
	}
	a, err := assess(s)
	if err != nil {
		return err
	}
	if err := os.MkdirAll(o.out, 0o755); err != nil {
		return fmt.Errorf("%s: cannot create the output folder: %w", o.out, unwrapPath(err))
	}
	var wrote []string
	for _, f := range []struct {
		name  string
		write func(io.Writer) error
	}{
		{"planes.csv", func(w io.Writer) error { return a.writeTable(w, table.CSV) }},
		{"planes.json", func(w io.Writer) error { return a.writeTable(w, table.JSON) }},
		{"stress.json", func(w io.Writer) error {
			return writeJSON(w, stressDoc{Site: s.Name, Model: s.Summary(), Notes: s.Notes, States: a.states})
		}},
	} {
		path := filepath.Join(o.out, f.name)
		if err := writeFile(path, f.write); err != nil {
			return err
		}
		wrote = append(wrote, path)
	}
	fo := figureOptions{depth: math.NaN(), proj: plots.EqualArea, traces: "unstable"}
	for _, f := range []struct {
		name string
		fig  plots.Figure
		w, h vg.Length
	}{
		{"stereonet-slip", a.stereonet(fo.with(plots.SlipTendency)), cm(0, 19), cm(0, 13.5)},
		{"stereonet-dilation", a.stereonet(fo.with(plots.DilationTendency)), cm(0, 19), cm(0, 13.5)},
		{"mohr", a.mohr(fo), cm(0, 17), cm(0, 12)},
	} {
		for _, ext := range []string{".svg", ".png"} {
			path := filepath.Join(o.out, f.name+ext)
			if err := writeFigure(f.fig, f.w, f.h, path); err != nil {
				return err
			}
			wrote = append(wrote, path)
		}
	}
	var b strings.Builder
	a.summary(&b)
	names := make([]string, len(wrote))
	for i, w := range wrote {
		names[i] = filepath.Base(w)
	}
	fmt.Fprintf(&b, "\nWrote %d files to %s: %s.\n\n%s\n", len(wrote), o.out, strings.Join(names, ", "), caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// assess resolves every plane of s and the stress at the report depths.
func assess(s *site.Site) (*assessment, error) {
	ps, err := s.OpenPlanes("", nil)
	if err != nil {
		return nil, err
	}
	defer ps.Close()
	a := &assessment{site: s, extras: ps.ExtraNames}
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
	if len(a.planes) == 0 {
		return nil, &site.Error{File: s.File, Msg: "no planes to assess: the planes table has a header but no rows"}
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
	var crit, open int
	for _, r := range a.results {
		switch r.State {
		case planes.Critical:
			crit++
		case planes.Opening:
			open++
		}
	}
	fmt.Fprintf(b, "\n%d planes: %d critical, %d opening, %d stable.\n", len(a.results), crit, open, len(a.results)-crit-open)
	b.WriteString("Least stable:\n")
	rank := a.ranked()
	w := 4
	for _, i := range rank[:min(3, len(rank))] {
		w = max(w, len(a.planes[i].Name))
	}
	for _, i := range rank[:min(3, len(rank))] {
		p, r := a.planes[i], a.results[i]
		fs := "FS —"
		if !math.IsNaN(r.FactorOfSafety) {
			fs = fmt.Sprintf("FS %.2f", r.FactorOfSafety)
		}
		fmt.Fprintf(b, "  %-*s  %s at %g m  %-8s  σn' %.2f MPa, %s, pressure to slip %+.2f MPa\n",
			w, p.Name, p.Orientation, p.Depth, r.State, r.EffectiveNormal, fs, r.PressureToSlip)
	}
	worst, at := math.Inf(-1), 0.0
	var over []string
	for _, st := range a.states {
		if f := float64(st.Ratio); f > worst || math.IsNaN(worst) {
			worst, at = f, float64(st.Depth)
		}
		if st.Exceeds {
			over = append(over, fmt.Sprintf("%g m", float64(st.Depth)))
		}
	}
	limit := float64(a.states[0].Limit)
	ds := make([]string, len(a.depths))
	for i, z := range a.depths {
		ds[i] = fmt.Sprintf("%g", z)
	}
	if len(over) == 0 {
		fmt.Fprintf(b, "Frictional limit: the stress model is within it at %s m (largest (σ1−αPp)/(σ3−αPp) %.2f at %g m, limit %.2f for μ = %.4g).\n",
			strings.Join(ds, ", "), worst, at, limit, float64(a.states[0].Friction))
	} else {
		fmt.Fprintf(b, "Frictional limit: EXCEEDED at %s (limit %.2f for μ = %.4g): such a state would already have slipped on optimally oriented planes; check the stress estimate.\n",
			strings.Join(over, ", "), limit, float64(a.states[0].Friction))
	}
}
