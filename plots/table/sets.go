package table

import (
	"encoding/csv"
	"fmt"
	"io"

	"cleft/planes/assess"
	"cleft/planes/sets"
	"cleft/planes/site"
)

// SetColumns are the columns of sets.csv.
var SetColumns = []string{"set", "count", "weighted_count", "mean_dip", "mean_dip_direction", "fisher_k", "alpha95_deg",
	"spherical_variance", "woodcock_k", "woodcock_c", "weighted_mean_dip", "weighted_mean_dip_direction", "weighted_fisher_k", "weighted_alpha95_deg",
	"weighted_woodcock_k", "weighted_woodcock_c"}

// SetStressColumns follow SetColumns in the sets.csv of an assessment: the
// stress on each set's mean plane at the median depth of its readings.
var SetStressColumns = []string{"depth_m", "effective_normal_stress_mpa", "shear_stress_mpa", "slip_tendency",
	"dilation_tendency", "factor_of_safety", "pressure_to_slip_mpa", "rake_deg", "slip_trend_deg", "slip_sense", "state"}

// SetRows are the rows of sets.csv under its header: one per set, then the
// unassigned readings.
func SetRows(g *sets.Grouping) [][]string {
	var rows [][]string
	an := g.Analysis
	for k, s := range an.Sets {
		m, wm := s.Raw.MeanPlane(), s.Weighted.MeanPlane()
		rows = append(rows, []string{sets.Name(k), fmt.Sprint(len(s.Members)), Cell(s.WeightedCount), Cell(m.Dip()), Cell(m.DipDirection()),
			Cell(s.Raw.K), Cell(s.Raw.Alpha), Cell(s.Raw.SphVar), Cell(s.RawTensor.WoodcockK()), Cell(s.RawTensor.WoodcockC()),
			Cell(wm.Dip()), Cell(wm.DipDirection()), Cell(s.Weighted.K), Cell(s.Weighted.Alpha), Cell(s.Tensor.WoodcockK()), Cell(s.Tensor.WoodcockC())})
	}
	un := make([]string, len(SetColumns))
	un[0], un[1], un[2] = "unassigned", fmt.Sprint(an.Unassigned), Cell(an.UnassignedWeight)
	return append(rows, un)
}

// Sets is sets.csv of cleft sets.
func Sets(g *sets.Grouping) [][]string {
	return append([][]string{SetColumns}, SetRows(g)...)
}

// AssessedSets is sets.csv of an assessment: the statistics of Sets, then
// the stress on each set's mean plane.
func AssessedSets(a *assess.Assessment) [][]string {
	rows := [][]string{append(append([]string(nil), SetColumns...), SetStressColumns...)}
	stats := SetRows(a.Grouping)
	for k, st := range a.Sets {
		r := st.Result
		rows = append(rows, append(stats[k], Cell(st.Plane.Depth), Cell(r.EffectiveNormal), Cell(r.Shear), Cell(r.SlipTendency),
			Cell(r.DilationTendency), Cell(r.FactorOfSafety), Cell(r.PressureToSlip), Cell(r.Rake), Cell(r.SlipTrend), r.Sense.String(), r.State.String()))
	}
	un := stats[len(stats)-1]
	return append(rows, append(un, make([]string, len(SetStressColumns))...))
}

// Readings is readings.csv: each reading with the weight used, its set and
// its angle to its set's mean pole, then the input's other columns (its own
// set column as field_set, any other name already taken with InputPrefix).
func Readings(g *sets.Grouping, readings []site.Plane, extras []string) [][]string {
	rows := [][]string{readingsHeader(extras)}
	for i := range readings {
		rows = append(rows, readingRow(nil, g, readings, i))
	}
	return rows
}

// WriteReadings writes Readings as CSV row by row, without holding the
// whole table: the same bytes as WriteCSV(w, Readings(…)).
func WriteReadings(w io.Writer, g *sets.Grouping, readings []site.Plane, extras []string) error {
	cw := csv.NewWriter(w)
	if err := cw.Write(readingsHeader(extras)); err != nil {
		return err
	}
	var row []string
	for i := range readings {
		row = readingRow(row[:0], g, readings, i)
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

func readingsHeader(extras []string) []string {
	head := []string{"name", "dip", "dip_direction", "depth_m", "weight", "set", "angle_to_mean_deg"}
	own := make([]string, len(extras))
	for i, e := range extras {
		if e == "set" {
			e = "field_set" // the input's own set column, kept beside ours
		}
		own[i] = e
	}
	return append(head, Carried(head, own)...)
}

// readingRow appends the cells of reading i to row.
func readingRow(row []string, g *sets.Grouping, readings []site.Plane, i int) []string {
	r := &readings[i]
	row = append(row, r.Name, Cell(r.Orientation.Dip()), Cell(r.Orientation.DipDirection()), Cell(r.Depth), Cell(g.Weight(i)), g.Assigned(i), Cell(g.Analysis.AngleToMean[i]))
	return append(row, r.Extras...)
}
