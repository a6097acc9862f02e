package assess

import (
	"errors"
	"fmt"
	"io"
	"math"
	"sort"

	"cleft/planes"
	"cleft/planes/sets"
	"cleft/planes/site"

	"gonum.org/v1/gonum/spatial/r3"
)

// Input is an input file of the assessment with its SHA-256 (hex).
type Input struct {
	Name, SHA256 string
}

// Assessment is a site with every plane resolved, in input order: the
// site's planes first, then its readings.
type Assessment struct {
	Site    *site.Site
	Extras  []string // names of the carried-through columns, in Plane.Extras order
	Planes  []site.Plane
	Results []planes.Result
	NPlanes int // Planes[:NPlanes] are the site's planes, the rest readings
	Inputs  []Input

	// Repeat is the first of the site's planes named like an earlier one
	// (kind site.ErrDuplicate), or nil; Repeats counts such planes.
	Repeat  *site.Error
	Repeats int

	// Grouping is the readings grouped into sets (nil without
	// readings_file); Sets are the set means with their stress.
	Grouping *sets.Grouping
	Sets     []SetMean
}

// SetMean is a joint set of the readings and the stress on its mean plane
// at the median depth of its readings.
type SetMean struct {
	Name   string
	Set    sets.Set
	Plane  site.Plane
	Result planes.Result
}

// MaxPlanes is the most planes and readings an assessment holds in memory
// (cleft resolve streams any number).
const MaxPlanes = 200000

// New resolves every plane and reading of s. A site whose tables hold no
// plane at all is an error, and so is one with more than MaxPlanes, or with
// a slope and more than MaxWedgePlanes candidates (Candidates).
func New(s *site.Site) (*Assessment, error) {
	s.AllowReadingsOnly()
	ps, err := s.OpenPlanes("", nil)
	if err != nil {
		return nil, err
	}
	defer ps.Close()
	a := &Assessment{Site: s, Extras: ps.ExtraNames, Inputs: []Input{{Name: s.File, SHA256: s.SHA256}}}
	rv := s.Resolver()
	held := 0
	for {
		var p site.Plane
		if err := ps.Next(&p); err != nil {
			if errors.Is(err, io.EOF) {
				break
			}
			return nil, err
		}
		held += p.TextSize()
		if len(a.Planes) == MaxPlanes || held > site.MaxHeldText {
			name, _ := ps.Table()
			return nil, &site.Error{File: name, Line: p.Line, Err: site.ErrLimit, Msg: fmt.Sprintf("more than %d planes or %d MiB of names and carried values: an assessment holds no more; cleft resolve streams a table of any length", MaxPlanes, site.MaxHeldText>>20)}
		}
		var r planes.Result
		rv.Resolve(&p, &r)
		a.Planes = append(a.Planes, p)
		a.Results = append(a.Results, r)
	}
	a.Repeat, a.Repeats, _ = ps.Repeats()
	if name, sum := ps.Table(); name != "" {
		a.Inputs = append(a.Inputs, Input{Name: name, SHA256: sum})
	}
	a.NPlanes = len(a.Planes)
	if s.ReadingsFile != "" {
		if err := a.addReadings(); err != nil {
			return nil, err
		}
	}
	if len(a.Planes) == 0 {
		return nil, &site.Error{File: s.File, Err: site.ErrNoPlanes, Msg: "no planes to assess: the tables have a header but no rows"}
	}
	if len(a.Planes) > MaxPlanes {
		return nil, &site.Error{File: s.ReadingsFile, Err: site.ErrLimit, Msg: fmt.Sprintf("%d planes and readings: an assessment holds at most %d", len(a.Planes), MaxPlanes)}
	}
	if err := a.checkSlope(); err != nil {
		return nil, err
	}
	return a, nil
}

// Ranked returns the plane indexes from least to most stable
// (planes.LessStable), ties in input order.
func (a *Assessment) Ranked() []int {
	idx := make([]int, len(a.Planes))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(i, j int) bool { return planes.LessStable(a.Results[idx[i]], a.Results[idx[j]]) })
	return idx
}

// RankedSets returns the set indexes from least to most stable.
func (a *Assessment) RankedSets() []int {
	idx := make([]int, len(a.Sets))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(i, j int) bool { return planes.LessStable(a.Sets[idx[i]].Result, a.Sets[idx[j]].Result) })
	return idx
}

// FigureDepth is the depth of the stereonet field and the Mohr diagram when
// none is asked for: the site's depth, else the median plane depth.
func (a *Assessment) FigureDepth() float64 {
	if a.Site.HasDepth {
		return a.Site.Depth
	}
	ds := make([]float64, len(a.Planes))
	for i, p := range a.Planes {
		ds[i] = p.Depth
	}
	sort.Float64s(ds)
	return ds[len(ds)/2]
}

// ReportDepths are the site's report.depths, or when it gives none: the
// distinct plane depths when there are at most five, else the shallowest,
// the middle of the range and the deepest.
func (a *Assessment) ReportDepths() []float64 {
	if len(a.Site.ReportDepths) > 0 {
		return a.Site.ReportDepths
	}
	seen := map[float64]bool{}
	var ds []float64
	for _, p := range a.Planes {
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

// addReadings reads the site's readings_file, groups the readings into sets,
// and adds every reading (with its set in the "set" column) and every set
// mean to the assessment.
func (a *Assessment) addReadings() error {
	s := a.Site
	readings, extras, sum, err := s.OpenReadings()
	if err != nil {
		return err
	}
	a.Inputs = append(a.Inputs, Input{Name: s.ReadingsFile, SHA256: sum})
	for _, r := range readings {
		if math.IsNaN(r.Depth) {
			return &site.Error{File: s.ReadingsFile, Line: r.Line, Key: "depth", Err: site.ErrMissing, Msg: "no depth for this reading and no depth: in the site file: the stress on it needs one"}
		}
	}
	if c := max(s.Sets.Count, len(s.Sets.Seeds)); c > len(readings) {
		return &site.Error{File: s.File, Key: "sets", Err: site.ErrRange, Msg: fmt.Sprintf("%d readings cannot make %d sets", len(readings), c)}
	}
	a.Grouping = Group(readings, s.Sets)
	a.mergeColumns(readings, extras)
	rv := s.Resolver()
	for _, r := range readings {
		var res planes.Result
		rv.Resolve(&r, &res)
		a.Planes = append(a.Planes, r)
		a.Results = append(a.Results, res)
	}
	for k, set := range a.Grouping.Analysis.Sets {
		depths := make([]float64, len(set.Members))
		for j, m := range set.Members {
			depths[j] = readings[m].Depth
		}
		sort.Float64s(depths)
		p := site.Plane{Name: sets.Name(k) + " mean", Orientation: set.Mean(), Depth: depths[len(depths)/2],
			Friction: math.NaN(), Cohesion: math.NaN(), PorePressure: math.NaN(), Weight: math.NaN()}
		var res planes.Result
		rv.Resolve(&p, &res)
		a.Sets = append(a.Sets, SetMean{Name: sets.Name(k), Set: set, Plane: p, Result: res})
	}
	return nil
}

// mergeColumns gives planes and readings one set of extra columns: the
// planes' own, "set", then the readings' (their own set column as
// field_set); each reading's "set" is the set it was grouped into.
func (a *Assessment) mergeColumns(readings []site.Plane, extras []string) {
	names := append([]string(nil), a.Extras...)
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
	cols := make([]int, len(extras))
	for i, e := range extras {
		if e == "set" {
			e = "field_set"
		}
		cols[i] = index(e)
	}
	for i := range a.Planes {
		for len(a.Planes[i].Extras) < len(names) {
			a.Planes[i].Extras = append(a.Planes[i].Extras, "")
		}
	}
	for i := range readings {
		ex := make([]string, len(names))
		for j, c := range cols {
			ex[c] = readings[i].Extras[j]
		}
		ex[setCol] = a.Grouping.Assigned(i)
		readings[i].Extras = ex
	}
	a.Extras = names
}

// Group groups readings into sets by c (sets.Group), with each reading's own
// weight.
func Group(readings []site.Plane, c sets.Config) *sets.Grouping {
	poles := make([]r3.Vec, len(readings))
	own := make([]float64, len(readings))
	for i := range readings {
		poles[i], own[i] = readings[i].Orientation.Normal(), readings[i].Weight
	}
	return sets.GroupPoles(poles, own, c)
}
