package table

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"cleft/insitu/opening"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
	"cleft/plots/words"
)

// Slope is slope.csv: every test of every candidate and pair.
func Slope(sc *slope.Screening) [][]string {
	cols := []string{"test", "planes", "feasible", "reason", "mode", "plan_view_mode", "line_trend", "line_plunge", "friction_angle_deg"}
	for _, w := range sc.Slope.Water {
		cols = append(cols, "fs_water_"+w.String())
	}
	cols = append(cols, "crack_depth_m", "water_depth_to_fail_m", "saturated_head_m", "water_table_head_m", "weight_mn", "volume_m3",
		"trace_a_m", "trace_b_m", "area_a_m2", "area_b_m2", "mode_by_water", "wedge_factor_k", "fs_friction_only",
		"bolt_to_target_mn_per_m", "bolt_to_target_mn")
	rows := [][]string{cols}
	nan := math.NaN()
	for _, c := range sc.Cases {
		feasible := "no"
		if c.Feasible {
			feasible = "yes"
		}
		row := []string{c.Test.String(), sc.Names(c), feasible, words.Reason(sc, c), c.Mode.String(), "", "", "", Cell(c.Phi)}
		if c.Test == slope.WedgeTest && c.HasLine {
			row[5], row[6], row[7] = c.PlanView.String(), Cell(c.Line.Trend), Cell(c.Line.Plunge)
		}
		table := nan
		for i, w := range sc.Slope.Water {
			v := nan
			if i < len(c.FS) {
				v = c.FS[i]
				if w.Kind == slope.WaterTable {
					table = c.Heads[i]
				}
			}
			row = append(row, Cell(v))
		}
		sat, weight, vol, ta, tb, aa, ab, k, fo := nan, nan, nan, nan, nan, nan, nan, nan, nan
		var modes []string
		if c.Test == slope.PlanarTest && c.FS != nil {
			sat = c.CrackDepth
		}
		if w := c.Wedge; w != nil {
			sat, weight, vol, ta, tb, aa, ab = w.Saturated, w.Weight, w.Volume, w.TraceA, w.TraceB, w.AreaA, w.AreaB
			for _, m := range c.Modes {
				modes = append(modes, m.String())
			}
		}
		if c.ShortOK && c.Short.Both {
			k, fo = c.Short.K, c.Short.FS(sc.Candidates[c.A].Phi, sc.Candidates[c.B].Phi)
		}
		boltPlanar, boltWedge := nan, nan
		if c.Test == slope.PlanarTest {
			boltPlanar = c.BoltToTarget
		} else {
			boltWedge = c.BoltToTarget
		}
		row = append(row, Cell(c.CrackDepth), Cell(c.WaterToFail), Cell(sat), Cell(table), Cell(weight), Cell(vol),
			Cell(ta), Cell(tb), Cell(aa), Cell(ab), strings.Join(modes, ";"), Cell(k), Cell(fo), Cell(boltPlanar), Cell(boltWedge))
		rows = append(rows, row)
	}
	return rows
}

// SlopeReadings is slope-readings.csv: for each kinematic test, how many
// readings (pairs of readings for wedges) of each set pass, and their
// weighted share.
func SlopeReadings(cs []slope.Count) [][]string {
	rows := [][]string{{"test", "sets", "tested", "passing", "share", "weighted_share"}}
	for _, c := range cs {
		rows = append(rows, []string{c.Test.String(), words.SetsOf(c), strconv.Itoa(c.Tested), strconv.Itoa(c.Pass), Cell(c.Share()), Cell(c.WeightedShare())})
	}
	return rows
}

// StationColumns are the columns of stations.csv.
var StationColumns = []string{"chainage", "set", "depth_m", "slip_tendency", "dilation_tendency", "factor_of_safety",
	"pressure_to_slip_mpa", "strike_to_axis_deg", "drive", "orientation_class", "wall_critical_arcs", "wall_opening_arcs"}

// Stations is stations.csv: each target at each station.
func Stations(sc *tunnel.Screening) [][]string {
	rows := [][]string{StationColumns}
	for _, st := range sc.Stations {
		for i, r := range st.Rows {
			rows = append(rows, []string{Cell(st.Chainage), sc.Targets[i].Name, Cell(st.Depth), Cell(r.Far.SlipTendency), Cell(r.Far.DilationTendency),
				Cell(r.Far.FactorOfSafety), Cell(r.Far.PressureToSlip), Cell(r.Drive.StrikeToAxis), r.Drive.Drive.String(), r.Drive.Class.String(),
				words.Arcs(r.Critical), words.Arcs(r.Opening)})
		}
	}
	return rows
}

// Wall is wall.csv: the boundary stresses at each wall point of each station.
func Wall(sc *tunnel.Screening) [][]string {
	rows := [][]string{{"chainage", "angle_deg", "sigma_theta_mpa", "sigma_z_mpa", "tau_theta_z_mpa"}}
	for _, st := range sc.Stations {
		for k, w := range st.Wall {
			rows = append(rows, []string{Cell(st.Chainage), fmt.Sprint(k * tunnel.PerimeterStep), Cell(w.Theta), Cell(w.Z), Cell(w.ThetaZ)})
		}
	}
	return rows
}

// Profile is profile.csv: one row per station.
func Profile(sc *tunnel.Screening) [][]string {
	rows := [][]string{{"chainage", "trend", "plunge", "cover_m", "depth_m", "pore_pressure_mpa", "sigma_theta_max_mpa", "sigma_theta_max_at_deg",
		"sigma_theta_min_mpa", "sigma_theta_min_at_deg", "sigma_max_mpa", "sigma_max_at_deg", "sigma_max_to_ucs", "spalling",
		"slip_zone_depth_max_m", "slip_zone_depth_max_set", "slip_zone_depth_max_extent"}}
	for _, st := range sc.Stations {
		row := []string{Cell(st.Chainage), Cell(st.Trend), Cell(st.Plunge), Cell(st.Cover), Cell(st.Depth), Cell(st.State.PorePressure),
			Cell(st.ThetaMax.Stress), Cell(st.ThetaMax.Theta), Cell(st.ThetaMin.Stress), Cell(st.ThetaMin.Theta),
			Cell(st.WallMax.Stress), Cell(st.WallMax.Theta), Cell(st.Ratio), words.Spalling(opening.SpallingOf(st.Ratio)), "", "", ""}
		if k := st.Deepest(); k >= 0 {
			r := &st.Rows[k]
			row[14], row[15], row[16] = Cell(r.Zone.Depth), sc.Targets[k].Name, r.Extent().String()
		}
		rows = append(rows, row)
	}
	return rows
}

// ZoneColumns are the columns of zones.csv.
var ZoneColumns = []string{"chainage", "set", "slip_zone_depth_m", "slip_zone_at_deg", "slip_zone_area_m2", "opening_zone_depth_m",
	"slip_zone_at_wall", "slip_zone_extent"}

// Zones is zones.csv: the slip zone of each target at each station, empty
// cells where there is no zone (or no opening part).
func Zones(sc *tunnel.Screening) [][]string {
	rows := [][]string{ZoneColumns}
	for _, st := range sc.Stations {
		for i := range st.Rows {
			r := &st.Rows[i]
			z := &r.Zone
			row := []string{Cell(st.Chainage), sc.Targets[i].Name, "", "", "", "", "", r.Extent().String()}
			if z.Flags.Has(tunnel.Exists) {
				row[2], row[3], row[4], row[5] = Cell(z.Depth), Cell(z.Angle), Cell(z.Area), Cell(z.OpeningDepth)
				row[6] = "no"
				if z.Flags.Has(tunnel.AtWall) {
					row[6] = "yes"
				}
			}
			rows = append(rows, row)
		}
	}
	return rows
}
