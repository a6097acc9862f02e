package table

import (
	"cleft/planes/chance/study"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// CaseColumns are the columns of cases.csv.
var CaseColumns = []string{"name", "case", "depth_m", "effective_normal_stress_mpa", "shear_stress_mpa", "slip_tendency", "factor_of_safety", "pressure_to_slip_mpa", "state"}

// Cases is cases.csv: every target (planes, readings, set means, in input
// order) in every case run, the base first.
func Cases(targets []study.Target, runs []study.CaseRun) [][]string {
	rows := [][]string{CaseColumns}
	for i := range targets {
		for _, run := range runs {
			r := run.Results[i]
			rows = append(rows, []string{targets[i].Plane.Name, run.Name, Cell(run.Depths[i]), Cell(r.EffectiveNormal), Cell(r.Shear),
				Cell(r.SlipTendency), Cell(r.FactorOfSafety), Cell(r.PressureToSlip), r.State.String()})
		}
	}
	return rows
}

// ChanceColumns are the columns of chance.csv.
var ChanceColumns = []string{"name", "dip", "dip_direction", "depth_m", "state",
	"p_critical", "p_opening", "p_unstable", "p_unstable_se",
	"fs_p05", "fs_p50", "fs_p95", "ts_p05", "ts_p50", "ts_p95",
	"pressure_to_slip_p05_mpa", "pressure_to_slip_p50_mpa", "pressure_to_slip_p95_mpa",
	"robust", "driver", "driver_correlation"}

// Chance is chance.csv: one row per target. out may be nil (cases only:
// the Monte Carlo columns are empty); robust is empty without cases.
func Chance(targets []study.Target, runs []study.CaseRun, out *study.Outcome) [][]string {
	rows := [][]string{ChanceColumns}
	for i := range targets {
		t := &targets[i]
		o := t.Plane.Orientation
		row := []string{t.Plane.Name, Cell(o.Dip()), Cell(o.DipDirection()), Cell(t.Plane.Depth), t.Base.State.String()}
		if out != nil {
			d := out.Odds[i]
			row = append(row, Cell(d.PCritical), Cell(d.POpening), Cell(d.PUnstable), Cell(d.StdErr))
			for _, v := range [][3]float64{d.FS, d.TS, d.PtS} {
				row = append(row, Cell(v[0]), Cell(v[1]), Cell(v[2]))
			}
		} else {
			for range 13 {
				row = append(row, "")
			}
		}
		robust := ""
		if len(runs) > 1 {
			robust = "no"
			if study.Robust(runs, i) {
				robust = "yes"
			}
		}
		row = append(row, robust)
		if out != nil && out.Odds[i].Driver >= 0 {
			d := out.Odds[i]
			row = append(row, out.Inputs[d.Driver], Cell(d.Rho[d.Driver]))
		} else {
			row = append(row, "", "")
		}
		rows = append(rows, row)
	}
	return rows
}

// Sensitivity is sensitivity.csv: Spearman's ρ between every varied input
// and every target's factor of safety.
func Sensitivity(out *study.Outcome) [][]string {
	rows := [][]string{{"name", "input", "rank_correlation"}}
	for i := range out.Targets {
		for j, in := range out.Inputs {
			rows = append(rows, []string{out.Targets[i].Plane.Name, in, Cell(out.Odds[i].Rho[j])})
		}
	}
	return rows
}

// SlopeChance is chance-slope.csv: each planar case feasible in the base,
// for each water case, the share of realisations in which it is feasible
// and the probability of FS < 1 with its standard error.
func SlopeChance(sc *slope.Screening, out *study.Outcome) [][]string {
	rows := [][]string{{"planes", "water", "p_feasible", "p_fs_below_1", "p_fs_below_1_se"}}
	for _, o := range out.Slope {
		c := sc.Cases[o.Case]
		for w, wc := range sc.Slope.Water {
			rows = append(rows, []string{sc.Names(c), wc.String(), Cell(float64(o.Feasible) / float64(out.N)), Cell(o.P[w]), Cell(o.StdErr[w])})
		}
	}
	return rows
}

// TunnelChance is chance-tunnel.csv: each target at each station, the
// probability that it is critical or opening in the far field at the axis
// depth, with its standard error.
func TunnelChance(sc *tunnel.Screening, out *study.Outcome) [][]string {
	rows := [][]string{{"chainage", "set", "depth_m", "state", "p_unstable", "p_unstable_se"}}
	for _, o := range out.Tunnel {
		st := sc.Stations[o.Station]
		rows = append(rows, []string{Cell(st.Chainage), sc.Targets[o.Target].Name, Cell(st.Depth), st.Rows[o.Target].Far.State.String(), Cell(o.P), Cell(o.StdErr)})
	}
	return rows
}
