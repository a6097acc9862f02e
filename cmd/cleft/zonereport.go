package main

import (
	"fmt"

	"cleft/planes/tunnel"
	"cleft/plots/report"
	"cleft/plots/table"
	"cleft/plots/words"
)

// zonesReport is the head of the report's tunnel section: the summary's
// sentences, how the zones were found and their caution, and a table of
// each plane or set's deepest slip zone and the stretches where it reaches
// deeper than the limit (every station is in zones.csv).
func zonesReport(sc *tunnel.Screening) *report.Table {
	notes := append(words.TunnelLines(sc)[:2], words.ZoneMethod(sc), words.ZoneCaution,
		"The deepest slip zone of each plane or set whose depth is known, and where zones reach deeper than the limit (every station and set is in zones.csv; the drive classes on each leg are in stations.csv):")
	lim := words.Num(sc.Tunnel.Limit())
	t := &report.Table{Notes: notes,
		Columns: []string{"plane or set", "deepest zone m", "at chainage m", "at ° from crown", "area m² per m", "open to the wall", "opening part m",
			"deeper than " + lim + " m at", "no bound (far field) at"},
		Numeric: []bool{false, true, true, true, true, false, true, false, false}}
	for k, tg := range sc.Targets {
		cells := []string{tg.Name, "—", "—", "—", "—", "—", "—", "none", "none"}
		i, _, ok := sc.Deepest(k, true)
		if !ok {
			i, _, ok = sc.Deepest(k, false)
		}
		if ok {
			st := &sc.Stations[i]
			z := st.Rows[k].Zone
			depth := words.Fixed(z.Depth, 2)
			if st.Rows[k].Extent() == tunnel.PastGrid {
				depth = "≥ " + words.Fixed(z.Depth, 1)
			}
			wall := "no"
			if z.Flags.Has(tunnel.AtWall) {
				wall = "yes"
			}
			cells[1], cells[2], cells[3], cells[4], cells[5], cells[6] = depth, table.Cell(st.Chainage), fmt.Sprintf("%.0f", z.Angle), words.Fixed(z.Area, 1), wall, words.Fixed(z.OpeningDepth, 2)
		}
		if d := sc.Deeper(k); len(d) > 0 {
			cells[7] = words.Stretches(d)
		}
		if d := sc.Stretches(func(r *tunnel.Result) bool { return r.Rows[k].Extent() == tunnel.Unbounded }); len(d) > 0 {
			cells[8] = words.Stretches(d)
		}
		t.Rows = append(t.Rows, report.Row{Cells: cells})
	}
	return t
}
