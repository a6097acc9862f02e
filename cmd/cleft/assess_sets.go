package main

import (
	"fmt"
	"io"
	"math"
	"sort"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots"
)

// setRow is a joint set of an assessment: its statistics and the stress on
// its mean plane at the median depth of its readings.
type setRow struct {
	name   string
	set    planes.Set
	plane  site.Plane
	result planes.Result
}

// addReadings reads the site's readings_file, groups the readings into sets,
// and adds every reading (with its set in the "set" column) and every set
// mean to the assessment.
func (a *assessment) addReadings() error {
	s := a.site
	readings, extras, sum, err := s.OpenReadings()
	if err != nil {
		return err
	}
	a.inputs = append(a.inputs, plots.InputFile{Name: s.ReadingsFile, SHA256: sum})
	for _, r := range readings {
		if math.IsNaN(r.Depth) {
			return &site.Error{File: s.ReadingsFile, Line: r.Line, Key: "depth", Msg: "no depth for this reading and no depth: in the site file: the stress on it needs one"}
		}
	}
	if c := max(s.Sets.Count, len(s.Sets.Seeds)); c > len(readings) {
		return &site.Error{File: s.File, Key: "sets", Msg: fmt.Sprintf("%d readings cannot make %d sets", len(readings), c)}
	}
	g := group(readings, extras, s.Sets)
	a.grouping = g

	// One set of extra columns for planes and readings: the planes' own,
	// "set", then the readings' (their own set column as field_set).
	names := append([]string(nil), a.extras...)
	index := func(n string) int {
		for i, m := range names {
			if m == n {
				return i
			}
		}
		names = append(names, n)
		return len(names) - 1
	}
	setCol := index("set")
	readingCols := make([]int, len(extras))
	for i, e := range extras {
		if e == "set" {
			e = "field_set"
		}
		readingCols[i] = index(e)
	}
	for i := range a.planes {
		for len(a.planes[i].Extras) < len(names) {
			a.planes[i].Extras = append(a.planes[i].Extras, "")
		}
	}
	rv := s.Resolver()
	for i, r := range readings {
		ex := make([]string, len(names))
		for j, c := range readingCols {
			ex[c] = r.Extras[j]
		}
		ex[setCol] = g.assigned(i)
		r.Extras = ex
		var res planes.Result
		rv.Resolve(&r, &res)
		a.planes = append(a.planes, r)
		a.results = append(a.results, res)
	}
	a.extras = names

	for k, set := range g.an.Sets {
		depths := make([]float64, len(set.Members))
		for j, m := range set.Members {
			depths[j] = readings[m].Depth
		}
		sort.Float64s(depths)
		p := site.Plane{Name: setName(k) + " mean", Orientation: set.Mean(), Depth: depths[len(depths)/2],
			Friction: math.NaN(), Cohesion: math.NaN(), PorePressure: math.NaN(), Weight: math.NaN()}
		var res planes.Result
		rv.Resolve(&p, &res)
		a.sets = append(a.sets, setRow{name: setName(k), set: set, plane: p, result: res})
	}
	return nil
}

var setStressColumns = []string{"depth_m", "effective_normal_stress_mpa", "shear_stress_mpa", "slip_tendency",
	"dilation_tendency", "factor_of_safety", "pressure_to_slip_mpa", "rake_deg", "slip_sense", "state"}

// writeSets writes sets.csv of an assessment: the set statistics of cleft
// sets, then the stress on each set's mean plane at the median depth of its
// readings.
func (a *assessment) writeSets(w io.Writer) error {
	rows := [][]string{append(append([]string(nil), setColumns...), setStressColumns...)}
	stats := a.grouping.statRows()
	for k, st := range a.sets {
		r := st.result
		rows = append(rows, append(stats[k], cell(st.plane.Depth), cell(r.EffectiveNormal), cell(r.Shear), cell(r.SlipTendency),
			cell(r.DilationTendency), cell(r.FactorOfSafety), cell(r.PressureToSlip), cell(r.Rake), r.Sense.String(), r.State.String()))
	}
	un := stats[len(stats)-1]
	rows = append(rows, append(un, make([]string, len(setStressColumns))...))
	return writeCSV(w, rows)
}
