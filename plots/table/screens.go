package table

import (
	"fmt"
	"math"
	"strconv"

	"cleft/insitu/opening"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
	"cleft/plots/words"
)

// Slope is slope.csv: every test of every candidate and pair.
func Slope(sc *slope.Screening) [][]string {
	cols := []string{"test", "planes", "feasible", "reason", "line_trend", "line_plunge", "friction_angle_deg"}
	for _, f := range sc.Slope.CrackFill {
		cols = append(cols, "fs_crack_fill_"+strconv.FormatFloat(f, 'g', -1, 64))
	}
	rows := [][]string{append(cols, "crack_depth_m", "water_depth_to_fail_m")}
	for _, c := range sc.Cases {
		feasible := "no"
		if c.Feasible {
			feasible = "yes"
		}
		row := []string{c.Test.String(), sc.Names(c), feasible, words.Reason(sc, c), "", "", Cell(c.Phi)}
		if c.Test == slope.WedgeTest && c.HasLine {
			row[4], row[5] = Cell(c.Line.Trend), Cell(c.Line.Plunge)
		}
		for i := range sc.Slope.CrackFill {
			v := math.NaN()
			if i < len(c.FS) {
				v = c.FS[i]
			}
			row = append(row, Cell(v))
		}
		rows = append(rows, append(row, Cell(c.CrackDepth), Cell(c.WaterToFail)))
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
