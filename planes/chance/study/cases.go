package study

import (
	"cleft/planes"
	"cleft/planes/site"
)

// CaseRun is every target resolved in one case.
type CaseRun struct {
	Name    string     // site.BaseCase for the site as given
	Case    *site.Case // nil for the base
	Results []planes.Result
	Depths  []float64 // of each target in this case (planes.NAME.depth may change it)
}

// Cases resolves every target in the base site and in each of its cases,
// base first. A case that the site file accepted cannot fail here but for
// a measured model that cannot be rebuilt, which is returned as an error.
func Cases(s *site.Site, targets []Target) ([]CaseRun, error) {
	runs := []CaseRun{{Name: site.BaseCase}}
	for i := range s.Cases {
		runs = append(runs, CaseRun{Name: s.Cases[i].Name, Case: &s.Cases[i]})
	}
	v := s.Variant()
	for k := range runs {
		run := &runs[k]
		if run.Case != nil {
			if err := run.Case.Apply(v); err != nil {
				return nil, &site.Error{File: s.File, Line: run.Case.Line, Key: "cases." + run.Name, Err: site.ErrRange, Msg: err.Error()}
			}
		} else {
			v.Reset()
			if err := v.Finish(); err != nil {
				return nil, err
			}
		}
		run.Results = make([]planes.Result, len(targets))
		run.Depths = make([]float64, len(targets))
		for i := range targets {
			p := targets[i].Plane
			if run.Case != nil {
				run.Case.ApplyPlanes(&p)
			}
			v.Resolve(&p, &run.Results[i])
			run.Depths[i] = p.Depth
		}
	}
	return runs, nil
}

// Robust reports whether target i has the same state in every case run;
// false when there is only the base.
func Robust(runs []CaseRun, i int) bool {
	if len(runs) < 2 {
		return false
	}
	for _, r := range runs[1:] {
		if r.Results[i].State != runs[0].Results[i].State {
			return false
		}
	}
	return true
}

// Critical returns in how many of the runs target i is critical or opening.
func Critical(runs []CaseRun, i int) int {
	n := 0
	for _, r := range runs {
		if r.Results[i].State != planes.Stable {
			n++
		}
	}
	return n
}
