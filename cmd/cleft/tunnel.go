package main

import (
	"fmt"
	"io"
	"math"
	"strings"

	"cleft/planes/site"
	"cleft/planes/tunnel"
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
		Short: "Screen a tunnel alignment: slip zones round the opening, boundary stresses, far-field tendencies",
		Long: `tunnel screens the site file's tunnel: block station by station along the
alignment: the far field at the axis depth (cover + radius) rotated into the
tunnel frame; for each plane or set, its zone of potential slip in the rock
round the opening — where the full elastic stress (Kirsch 1898, with the
anti-plane terms; support_pressure on the wall) resolved on it with its own
strength and the pore pressure of wall_pore_pressure is critical or opening —
with its greatest depth beyond the wall, where, its area and whether it is
open to the wall, and the stretches where it reaches deeper than
zone_depth_limit; its far-field slip and dilation tendency, factor of safety
and pressure to slip, its strike against the axis with the orientation class
of Bieniawski (1989); the boundary stresses round the perimeter (Hiramatsu &
Oka 1962), the largest against the UCS (spalling from about 0.4 ± 0.1,
Martin, Kaiser & McCreath 1999), and the arcs of the wall where each plane is
critical or opening.

Perimeter angles are degrees from the crown, clockwise looking along the drive
(0 crown, 90 right sidewall, 180 invert, 270 left sidewall). With --out:
stations.csv, wall.csv, profile.csv, zones.csv, an along-alignment chart, the
cross-section of one station with each set's zone (--station; default the
station of the deepest bounded zone) and the perimeter plot of the wall
stresses (--station; default the station of the largest σmax/UCS).

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site, o.warn = args[0], cmd.ErrOrStderr()
			return runTunnel(o, cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.out, "out", "", "output folder")
	floatVar(c.Flags(), &o.station, "station", math.NaN(), "chainage of the station for the cross-section and the perimeter plot, m")
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
		section, wall := sectionStation(sc), sc.Worst()
		if !math.IsNaN(o.station) {
			if section = sc.StationAt(o.station); section < 0 {
				near := sc.Stations[0].Chainage
				for _, st := range sc.Stations {
					if math.Abs(st.Chainage-o.station) < math.Abs(near-o.station) {
						near = st.Chainage
					}
				}
				return usagef("--station %g: no station at that chainage (stations every %g m from %g; the nearest is %g)", o.station, sc.Tunnel.Spacing, sc.Stations[0].Chainage, near)
			}
			wall = section
		}
		if err := makeDir(o.out); err != nil {
			return err
		}
		out := &outputs{dir: o.out}
		if err := out.tables(tunnelTables(sc)...); err != nil {
			return err
		}
		if err := out.figures(tunnelFigures(a.Site, sc, section, wall)); err != nil {
			return err
		}
		fmt.Fprintf(&b, "\nWrote stations.csv, wall.csv, profile.csv, zones.csv, tunnel-profile.svg/.png, tunnel-section.svg/.png, tunnel-wall.svg/.png to %s.\n", o.out)
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// printTunnel prints the screening in a few lines: the alignment, the
// largest wall stress, one line per plane or set, how the zones were found
// and their caution.
func printTunnel(b *strings.Builder, sc *tunnel.Screening) {
	for i, l := range words.TunnelLines(sc) {
		if i >= 2 {
			l = "  " + strings.ReplaceAll(words.Wrap(l, 96), "\n", "\n    ")
		} else {
			l = words.Wrap(l, 100)
		}
		b.WriteString(l + "\n")
	}
	b.WriteString(words.Wrap(words.ZoneMethod(sc), 100) + "\n")
	b.WriteString(words.Wrap(words.ZoneCaution, 100) + "\n")
}

// sectionStation is the station of the cross-section figure by default:
// that of the deepest zone whose depth is known, else of the deepest zone,
// else of the largest σmax/UCS.
func sectionStation(sc *tunnel.Screening) int {
	if i, _, ok := sc.Deepest(-1, true); ok {
		return i
	}
	if i, _, ok := sc.Deepest(-1, false); ok {
		return i
	}
	return sc.Worst()
}

// tunnelTables are the tunnel's output tables.
func tunnelTables(sc *tunnel.Screening) []namedTable {
	return []namedTable{csvTable("stations.csv", table.Stations(sc)), csvTable("wall.csv", table.Wall(sc)), csvTable("profile.csv", table.Profile(sc)),
		csvTable("zones.csv", table.Zones(sc))}
}
