package main

import (
	"fmt"
	"io"
	"math"
	"strings"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/planes/tunnel"
	"cleft/plots"
	"cleft/plots/table"
	"cleft/plots/words"

	"github.com/spf13/cobra"
)

type tunnelOptions struct {
	site    string
	out     string
	station float64
	warn    io.Writer // standard error, for warnings
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
			o.site, o.warn = args[0], cmd.ErrOrStderr()
			return runTunnel(o, cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder")
	floatVar(c.Flags(), &o.station, "station", math.NaN(), "chainage of the station for the perimeter plot, m")
	return c
}

func runTunnel(o tunnelOptions, stdout io.Writer) error {
	var outs []string
	if o.out != "" {
		outs = inDir(o.out, tunnelFiles())
	}
	a, err := assessFor(o.site, outs, func(s *site.Site) bool { return s.Tunnel != nil }, "no tunnel: block: give the alignment, cover and rock (see README, Tunnels)")
	if err != nil {
		return err
	}
	warnRepeats(o.warn, a.Repeat, a.Repeats, false)
	sc, err := a.Tunnel()
	if err != nil {
		return err
	}
	var b strings.Builder
	printTunnel(&b, sc)
	if o.out != "" {
		idx := sc.Worst()
		if !math.IsNaN(o.station) {
			if idx = sc.StationAt(o.station); idx < 0 {
				return usagef("--station %g: no station at that chainage (stations every %g m from %g)", o.station, sc.Tunnel.Spacing, sc.Stations[0].Chainage)
			}
		}
		if err := makeDir(o.out); err != nil {
			return err
		}
		out := &outputs{dir: o.out}
		if err := out.tables(tunnelTables(sc)...); err != nil {
			return err
		}
		if err := out.figures(tunnelFigures(a.Site, sc, idx)); err != nil {
			return err
		}
		fmt.Fprintf(&b, "\nWrote stations.csv, wall.csv, profile.csv, tunnel-profile.svg/.png, tunnel-wall.svg/.png to %s.\n", o.out)
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// printTunnel prints the screening in a few lines.
func printTunnel(b *strings.Builder, sc *tunnel.Screening) {
	for i, l := range words.TunnelLines(sc) {
		if i >= 2 {
			l = "  " + strings.ReplaceAll(words.Wrap(l, 96), "\n", "\n    ")
		} else {
			l = words.Wrap(l, 100)
		}
		b.WriteString(l + "\n")
	}
}

// tunnelTables are the tunnel's output tables.
func tunnelTables(sc *tunnel.Screening) []namedTable {
	return []namedTable{csvTable("stations.csv", table.Stations(sc)), csvTable("wall.csv", table.Wall(sc)), csvTable("profile.csv", table.Profile(sc))}
}

// tunnelFigures are the along-alignment chart and the perimeter plot of
// station idx.
func tunnelFigures(s *site.Site, sc *tunnel.Screening, idx int) []*namedFigure {
	t := sc.Tunnel
	pr := &plots.TunnelProfile{
		Site:     s.Name,
		Lines:    []string{fmt.Sprintf("Along the alignment: chainage %g to %g m, radius %g m, UCS %g MPa", sc.Stations[0].Chainage, sc.Stations[len(sc.Stations)-1].Chainage, t.Radius, t.UCS), s.Summary()},
		Friction: s.Criterion.Friction(),
	}
	for _, ts := range sc.Stations {
		pr.Chainage = append(pr.Chainage, ts.Chainage)
		pr.Cover = append(pr.Cover, ts.Cover)
		pr.Ratio = append(pr.Ratio, ts.Ratio)
	}
	for i, tg := range sc.Targets {
		se := plots.TunnelSeries{Name: tg.Name}
		for _, ts := range sc.Stations {
			r := ts.Rows[i]
			se.Slip = append(se.Slip, r.Far.SlipTendency)
			se.FarBad = append(se.FarBad, r.Far.State != planes.Stable)
			se.WallSlip = append(se.WallSlip, len(r.Critical) > 0 || len(r.Opening) > 0)
		}
		pr.Series = append(pr.Series, se)
	}
	ts := sc.Stations[idx]
	wall := &plots.TunnelWall{
		Site:   s.Name,
		Lines:  []string{fmt.Sprintf("Wall of the opening at chainage %g m: cover %.0f m, axis at %.0f m, drive %03.0f/%.1f, looking along the drive", ts.Chainage, ts.Cover, ts.Depth, ts.Trend, ts.Plunge)},
		Step:   tunnel.PerimeterStep,
		UCS:    t.UCS,
		Radius: t.Radius,
	}
	for _, w := range ts.Wall {
		wall.Sigma = append(wall.Sigma, w.Theta)
	}
	for i, tg := range sc.Targets {
		ws := plots.WallSet{Name: tg.Name}
		for _, st := range ts.Rows[i].Wall {
			ws.Critical = append(ws.Critical, st == planes.Critical)
			ws.Opening = append(ws.Opening, st == planes.Opening)
		}
		wall.Sets = append(wall.Sets, ws)
	}
	return []*namedFigure{
		{file: "tunnel-profile",
			title:   "Along the tunnel alignment",
			caption: "Top: cover above the crown. Middle: the largest tangential stress at the wall against the UCS, with the band of the onset of spalling, 0.4 ± 0.1 (Martin, Kaiser & McCreath 1999). Bottom: far-field slip tendency of each plane or set at the axis depth; the dotted red line is the site friction μ. Shading: stretches where a plane is critical or opening in the far field (darker) or slips or opens somewhere on the wall (lighter).",
			fig:     pr, w: cm(19, 0), h: cm(17, 0)},
		{file: "tunnel-wall",
			title:   fmt.Sprintf("Wall of the opening at chainage %g m", ts.Chainage),
			caption: "Looking along the drive, crown up. The curve is the tangential stress σθ round the wall (Kirsch 1898, with the out-of-plane terms of Hiramatsu & Oka 1962), compression outward. Each ring is a plane or set: solid red arcs are where the wall stress resolved on it reaches its strength, dashed blue arcs where it opens.",
			fig:     wall, w: cm(19, 0), h: cm(13, 0)},
	}
}
