package main

import (
	"fmt"
	"io"
	"math"
	"strings"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots"

	"github.com/spf13/cobra"
	"gonum.org/v1/gonum/spatial/r3"
)

type tunnelOptions struct {
	site    string
	out     string
	station float64
}

func newTunnelCmd() *cobra.Command {
	o := tunnelOptions{station: math.NaN()}
	c := &cobra.Command{
		Use:   "tunnel SITE.yaml [--out DIR] [--station CHAINAGE]",
		Short: "Screen a tunnel alignment: far-field tendencies, boundary stresses, joint slip at the wall",
		Long: `tunnel screens the site file's tunnel: block station by station along the
alignment: the far field at the axis depth (cover + radius) rotated into the
tunnel frame; for each plane or set, its far-field slip and dilation tendency,
factor of safety and pressure to slip, its strike against the axis with the
orientation class of Bieniawski (1989); the boundary stresses of a circular
opening round the perimeter (Kirsch 1898; Hiramatsu & Oka 1962), the largest
tangential stress against the UCS (spalling from about 0.4 ± 0.1, Martin,
Kaiser & McCreath 1999); and, at every point of the wall, the wall stress
resolved on each plane: the arcs where it is critically stressed or opening.

Perimeter angles are degrees from the crown, clockwise looking along the drive
(0 crown, 90 right sidewall, 180 invert, 270 left sidewall). With --out:
stations.csv, wall.csv, profile.csv, an along-alignment chart and a perimeter
plot of one station (--station; default the one with the largest σθ/UCS).

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site = args[0]
			return runTunnel(o, cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder")
	c.Flags().Float64Var(&o.station, "station", math.NaN(), "chainage of the station for the perimeter plot, m")
	return c
}

// perimeterStep is the spacing of the wall points, degrees.
const perimeterStep = 10

// tunnelTarget is a plane or set screened along the tunnel.
type tunnelTarget struct {
	name  string
	plane site.Plane
}

// tunnelRow is one target at one station.
type tunnelRow struct {
	far        planes.Result
	drive      planes.DriveClass
	wall       []planes.PlaneState // at each wall point
	crit, open string              // arcs, "a-b;c-d"
}

// tunnelStation is the screening at one station.
type tunnelStation struct {
	st     site.Station
	state  insitu.State
	wall   []opening.WallStress // at 0, perimeterStep, … degrees
	maxI   int                  // index of the largest σθ
	minI   int
	ratio  float64 // σθ,max / UCS
	rows   []tunnelRow
	wallPp float64
}

// tunnelScreen is the tunnel screening of an assessment.
type tunnelScreen struct {
	t        *site.Tunnel
	targets  []tunnelTarget
	stations []tunnelStation
}

func (a *assessment) tunnelTargets() ([]tunnelTarget, error) {
	var all []tunnelTarget
	for i := 0; i < a.nPlanes; i++ {
		all = append(all, tunnelTarget{name: a.planes[i].Name, plane: a.planes[i]})
	}
	for _, s := range a.sets {
		all = append(all, tunnelTarget{name: s.name, plane: s.plane})
	}
	want := a.site.Tunnel.Sets
	if want == nil {
		return all, nil
	}
	var out []tunnelTarget
	for _, w := range want {
		found := false
		for _, t := range all {
			if t.name == w {
				out = append(out, t)
				found = true
			}
		}
		if !found {
			var names []string
			for _, t := range all {
				names = append(names, t.name)
			}
			return nil, &site.Error{File: a.site.File, Key: "tunnel.sets", Msg: fmt.Sprintf("no plane or set is named %q; there are: %s", w, strings.Join(names, ", "))}
		}
	}
	return out, nil
}

func (a *assessment) screenTunnel() (*tunnelScreen, error) {
	t := a.site.Tunnel
	sts, err := t.Stations(a.site.File)
	if err != nil {
		return nil, err
	}
	targets, err := a.tunnelTargets()
	if err != nil {
		return nil, err
	}
	sc := &tunnelScreen{t: t, targets: targets}
	rv := a.site.Resolver()
	var scratch planes.Coulomb
	n := 360 / perimeterStep
	for _, st := range sts {
		ts := tunnelStation{st: st, state: a.site.Model.At(st.Depth)}
		up, right, along := opening.TunnelFrame(geom.Line{Trend: st.Trend, Plunge: st.Plunge})
		far := ts.state.Total.Rotate([3]r3.Vec{up, right, along})
		if !t.Drained {
			ts.wallPp = ts.state.PorePressure
		}
		walls := make([]insitu.State, n)
		for k := range n {
			w := opening.Wall(far, float64(k*perimeterStep), t.Poisson)
			ts.wall = append(ts.wall, w)
			walls[k] = insitu.NewState(w.WallTensor(up, right, along, float64(k*perimeterStep)), st.Depth, ts.wallPp, ts.state.Biot)
			if w.Theta > ts.wall[ts.maxI].Theta {
				ts.maxI = k
			}
			if w.Theta < ts.wall[ts.minI].Theta {
				ts.minI = k
			}
		}
		ts.ratio = ts.wall[ts.maxI].Theta / t.UCS
		for _, tg := range targets {
			p := tg.plane
			row := tunnelRow{drive: planes.ClassifyDrive(p.Orientation, st.Trend)}
			rv.ResolveAt(&p, st.Depth, &row.far)
			c := a.site.CriterionFor(&p, &scratch)
			for k := range n {
				r := planes.Resolve(walls[k], p.Orientation, c)
				row.wall = append(row.wall, r.State)
			}
			row.crit = arcs(row.wall, planes.Critical)
			row.open = arcs(row.wall, planes.Opening)
			ts.rows = append(ts.rows, row)
		}
		sc.stations = append(sc.stations, ts)
	}
	return sc, nil
}

// arcs returns the runs of wall points in state s as "from-to" angles (°),
// joined by ";", running through the crown where a run wraps round.
func arcs(states []planes.PlaneState, s planes.PlaneState) string {
	n := len(states)
	all := true
	for _, x := range states {
		if x != s {
			all = false
		}
	}
	if all {
		return fmt.Sprintf("0-%d", 360-perimeterStep)
	}
	// Start after a point not in s, so no run is cut at the array's end.
	start := 0
	for states[start] == s {
		start++
	}
	var out []string
	for i := 1; i <= n; i++ {
		k := (start + i) % n
		if states[k] != s {
			continue
		}
		j := i
		for j+1 <= n && states[(start+j+1)%n] == s {
			j++
		}
		out = append(out, fmt.Sprintf("%d-%d", k*perimeterStep, ((start+j)%n)*perimeterStep))
		i = j
	}
	return strings.Join(out, ";")
}

var stationColumns = []string{"chainage", "set", "depth_m", "slip_tendency", "dilation_tendency", "factor_of_safety",
	"pressure_to_slip_mpa", "strike_to_axis_deg", "drive", "orientation_class", "wall_critical_arcs", "wall_opening_arcs"}

func (sc *tunnelScreen) writeStations(w io.Writer) error {
	rows := [][]string{stationColumns}
	for _, ts := range sc.stations {
		for i, r := range ts.rows {
			rows = append(rows, []string{cell(ts.st.Chainage), sc.targets[i].name, cell(ts.st.Depth), cell(r.far.SlipTendency), cell(r.far.DilationTendency),
				cell(r.far.FactorOfSafety), cell(r.far.PressureToSlip), cell(r.drive.StrikeToAxis), r.drive.Drive, r.drive.Class, r.crit, r.open})
		}
	}
	return writeCSV(w, rows)
}

func (sc *tunnelScreen) writeWall(w io.Writer) error {
	rows := [][]string{{"chainage", "angle_deg", "sigma_theta_mpa", "sigma_z_mpa", "tau_theta_z_mpa"}}
	for _, ts := range sc.stations {
		for k, ws := range ts.wall {
			rows = append(rows, []string{cell(ts.st.Chainage), fmt.Sprint(k * perimeterStep), cell(ws.Theta), cell(ws.Z), cell(ws.ThetaZ)})
		}
	}
	return writeCSV(w, rows)
}

func (sc *tunnelScreen) writeProfile(w io.Writer) error {
	rows := [][]string{{"chainage", "trend", "plunge", "cover_m", "depth_m", "pore_pressure_mpa", "sigma_theta_max_mpa", "sigma_theta_max_at_deg",
		"sigma_theta_min_mpa", "sigma_theta_min_at_deg", "sigma_theta_max_to_ucs", "spalling"}}
	for _, ts := range sc.stations {
		rows = append(rows, []string{cell(ts.st.Chainage), cell(ts.st.Trend), cell(ts.st.Plunge), cell(ts.st.Cover), cell(ts.st.Depth), cell(ts.state.PorePressure),
			cell(ts.wall[ts.maxI].Theta), fmt.Sprint(ts.maxI * perimeterStep), cell(ts.wall[ts.minI].Theta), fmt.Sprint(ts.minI * perimeterStep),
			cell(ts.ratio), spallingWords(opening.SpallingOf(ts.ratio))})
	}
	return writeCSV(w, rows)
}

// stretch is a run of consecutive stations sharing a condition.
type stretch struct{ from, to float64 }

func (sc *tunnelScreen) stretches(cond func(ts *tunnelStation) bool) []stretch {
	var out []stretch
	for i := range sc.stations {
		ts := &sc.stations[i]
		if !cond(ts) {
			continue
		}
		if len(out) > 0 && i > 0 && cond(&sc.stations[i-1]) {
			out[len(out)-1].to = ts.st.Chainage
			continue
		}
		out = append(out, stretch{ts.st.Chainage, ts.st.Chainage})
	}
	return out
}

func fmtStretches(ss []stretch) string {
	var out []string
	for _, s := range ss {
		if s.from == s.to {
			out = append(out, fmt.Sprintf("%g", s.from))
		} else {
			out = append(out, fmt.Sprintf("%g–%g", s.from, s.to))
		}
	}
	return strings.Join(out, ", ")
}

// worst returns the index of the station with the largest σθ,max/UCS.
func (sc *tunnelScreen) worst() int {
	w := 0
	for i, ts := range sc.stations {
		if ts.ratio > sc.stations[w].ratio {
			w = i
		}
	}
	return w
}

// lines puts the screening in sentences: the alignment, the largest
// tangential stress, and for each plane or set its class on each leg, the
// far-field stretches and the wall.
func (sc *tunnelScreen) lines() []string {
	t := sc.t
	first, last := sc.stations[0].st, sc.stations[len(sc.stations)-1].st
	out := []string{fmt.Sprintf("Tunnel: chainage %g to %g m, %d stations every %g m, radius %g m, UCS %g MPa, wall %s.",
		first.Chainage, last.Chainage, len(sc.stations), t.Spacing, t.Radius, t.UCS, map[bool]string{true: "drained (Pp = 0)", false: "at the far-field Pp"}[t.Drained])}
	w := sc.stations[sc.worst()]
	l := fmt.Sprintf("Largest tangential stress %.1f MPa at %g m (cover %.0f m), %d° from the crown: σθ/UCS = %.2f, %s (Martin, Kaiser & McCreath 1999).",
		w.wall[w.maxI].Theta, w.st.Chainage, w.st.Cover, w.maxI*perimeterStep, w.ratio, spallingWords(opening.SpallingOf(w.ratio)))
	if sp := sc.stretches(func(ts *tunnelStation) bool { return ts.ratio >= opening.SpallingOnset-0.1 }); len(sp) > 0 {
		l += fmt.Sprintf(" σθ/UCS ≥ 0.3 at %s m.", fmtStretches(sp))
	}
	out = append(out, l)
	for i, tg := range sc.targets {
		far := sc.stretches(func(ts *tunnelStation) bool { return ts.rows[i].far.State != planes.Stable })
		wall := sc.stretches(func(ts *tunnelStation) bool { return ts.rows[i].crit != "" || ts.rows[i].open != "" })
		var classes []string
		for k, leg := range t.Legs {
			d := planes.ClassifyDrive(tg.plane.Orientation, leg.Trend)
			classes = append(classes, fmt.Sprintf("%s on leg %d (drive %03.0f°)", d.Class, k+1, leg.Trend))
		}
		line := fmt.Sprintf("%s (%s): %s", tg.name, tg.plane.Orientation, strings.Join(classes, ", "))
		if len(far) > 0 {
			line += fmt.Sprintf("; critical or opening in the far field at %s m", fmtStretches(far))
		}
		switch {
		case len(wall) == 1 && wall[0].from == first.Chainage && wall[0].to == last.Chainage:
			r := w.rows[i]
			line += fmt.Sprintf("; slips or opens somewhere on the wall at every station — at %g m critical on %s, opening on %s", w.st.Chainage, orNone(r.crit), orNone(r.open))
		case len(wall) > 0:
			line += fmt.Sprintf("; slips or opens at the wall at %s m", fmtStretches(wall))
		default:
			line += "; stable at the wall everywhere"
		}
		out = append(out, line+".")
	}
	return out
}

func (sc *tunnelScreen) summary(b *strings.Builder) {
	for i, l := range sc.lines() {
		if i >= 2 {
			l = "  " + strings.ReplaceAll(wrap(l, 96), "\n", "\n    ")
		} else {
			l = wrap(l, 100)
		}
		b.WriteString(l + "\n")
	}
}

func runTunnel(o tunnelOptions, stdout io.Writer) error {
	a, err := assessFor(o.site, func(s *site.Site) bool { return s.Tunnel != nil }, "no tunnel: block: give the alignment, cover and rock (see README, Tunnels)")
	if err != nil {
		return err
	}
	sc := a.tunnel
	var b strings.Builder
	sc.summary(&b)
	if o.out != "" {
		idx := sc.worst()
		if !math.IsNaN(o.station) {
			if idx = sc.stationAt(o.station); idx < 0 {
				return usagef("--station %g: no station at that chainage (stations every %g m from %g)", o.station, sc.t.Spacing, sc.stations[0].st.Chainage)
			}
		}
		if err := makeDir(o.out); err != nil {
			return err
		}
		if err := writeTables(o.out, sc.tables(), nil); err != nil {
			return err
		}
		if err := writeFigures(o.out, a.tunnelFigures(idx), nil); err != nil {
			return err
		}
		fmt.Fprintf(&b, "\nWrote stations.csv, wall.csv, profile.csv, tunnel-profile.svg/.png, tunnel-wall.svg/.png to %s.\n", o.out)
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

func orNone(arcs string) string {
	if arcs == "" {
		return "none"
	}
	return strings.ReplaceAll(arcs, ";", ", ") + "°"
}

// stationAt returns the index of the station at chainage ch, or −1.
func (sc *tunnelScreen) stationAt(ch float64) int {
	for i, ts := range sc.stations {
		if math.Abs(ts.st.Chainage-ch) < 1e-6 {
			return i
		}
	}
	return -1
}

// tables are the tunnel's output tables.
func (sc *tunnelScreen) tables() []namedTable {
	return []namedTable{{"stations.csv", sc.writeStations}, {"wall.csv", sc.writeWall}, {"profile.csv", sc.writeProfile}}
}

// tunnelFigures are the along-alignment chart and the perimeter plot of
// station idx.
func (a *assessment) tunnelFigures(idx int) []namedFigure {
	sc := a.tunnel
	t := sc.t
	pr := &plots.TunnelProfile{
		Site:     a.site.Name,
		Lines:    []string{fmt.Sprintf("Along the alignment: chainage %g to %g m, radius %g m, UCS %g MPa", sc.stations[0].st.Chainage, sc.stations[len(sc.stations)-1].st.Chainage, t.Radius, t.UCS), a.site.Summary()},
		Friction: a.site.Criterion.Friction(),
	}
	for _, ts := range sc.stations {
		pr.Chainage = append(pr.Chainage, ts.st.Chainage)
		pr.Cover = append(pr.Cover, ts.st.Cover)
		pr.Ratio = append(pr.Ratio, ts.ratio)
	}
	for i, tg := range sc.targets {
		s := plots.TunnelSeries{Name: tg.name}
		for _, ts := range sc.stations {
			r := ts.rows[i]
			s.Slip = append(s.Slip, r.far.SlipTendency)
			s.FarBad = append(s.FarBad, r.far.State != planes.Stable)
			s.WallSlip = append(s.WallSlip, r.crit != "" || r.open != "")
		}
		pr.Series = append(pr.Series, s)
	}
	ts := sc.stations[idx]
	wall := &plots.TunnelWall{
		Site:   a.site.Name,
		Lines:  []string{fmt.Sprintf("Wall of the opening at chainage %g m: cover %.0f m, axis at %.0f m, drive %03.0f/%.1f, looking along the drive", ts.st.Chainage, ts.st.Cover, ts.st.Depth, ts.st.Trend, ts.st.Plunge)},
		Step:   perimeterStep,
		UCS:    t.UCS,
		Radius: t.Radius,
	}
	for _, w := range ts.wall {
		wall.Sigma = append(wall.Sigma, w.Theta)
	}
	for i, tg := range sc.targets {
		ws := plots.WallSet{Name: tg.name}
		for _, st := range ts.rows[i].wall {
			ws.Critical = append(ws.Critical, st == planes.Critical)
			ws.Opening = append(ws.Opening, st == planes.Opening)
		}
		wall.Sets = append(wall.Sets, ws)
	}
	return []namedFigure{
		{"tunnel-profile", plots.ReportFigure{
			Title:   "Along the tunnel alignment",
			Caption: "Top: cover above the crown. Middle: the largest tangential stress at the wall against the UCS, with the band of the onset of spalling, 0.4 ± 0.1 (Martin, Kaiser & McCreath 1999). Bottom: far-field slip tendency of each plane or set at the axis depth; the dotted red line is the site friction μ. Shading: stretches where a plane is critical or opening in the far field (darker) or slips or opens somewhere on the wall (lighter).",
			Figure:  pr, W: cm(0, 19), H: cm(0, 17)}},
		{"tunnel-wall", plots.ReportFigure{
			Title:   fmt.Sprintf("Wall of the opening at chainage %g m", ts.st.Chainage),
			Caption: "Looking along the drive, crown up. The curve is the tangential stress σθ round the wall (Kirsch 1898, with the out-of-plane terms of Hiramatsu & Oka 1962), compression outward. Each ring is a plane or set: solid red arcs are where the wall stress resolved on it reaches its strength, dashed blue arcs where it opens.",
			Figure:  wall, W: cm(0, 19), H: cm(0, 13)}},
	}
}

// reportTable is the screening as the report shows it: the notes of the
// summary, and a table of each plane or set at the station of the largest
// tangential stress.
func (sc *tunnelScreen) reportTable() *plots.ReportTable {
	notes := sc.lines()
	if len(sc.t.Defaults) > 0 {
		notes = append(notes, "Defaults applied: "+strings.Join(sc.t.Defaults, "; ")+".")
	}
	w := sc.stations[sc.worst()]
	notes = append(notes, fmt.Sprintf("At the station of the largest tangential stress, chainage %g m (axis %.0f m deep; every station is in stations.csv, wall.csv and profile.csv):", w.st.Chainage, w.st.Depth))
	t := &plots.ReportTable{Notes: notes,
		Columns: []string{"plane or set", "strike to axis °", "drive", "class", "Ts", "FS", "ΔPp to slip", "wall critical °", "wall opening °"},
		Numeric: []bool{false, true, false, false, true, true, true, false, false}}
	for i, tg := range sc.targets {
		r := w.rows[i]
		t.Rows = append(t.Rows, []string{tg.name, fixed2(r.drive.StrikeToAxis, 0), r.drive.Drive, r.drive.Class, fixed2(r.far.SlipTendency, 3), fixed2(r.far.FactorOfSafety, 2), fixed2(r.far.PressureToSlip, 2), orNone(r.crit), orNone(r.open)})
	}
	return t
}

func spallingWords(s opening.Spalling) string {
	switch s {
	case opening.BelowOnset:
		return "below the onset of spalling"
	case opening.AtOnset:
		return "at the onset of spalling (0.4 ± 0.1)"
	case opening.PastOnset:
		return "past the onset of spalling"
	}
	return ""
}
