package main

import (
	"cleft/planes/assess"
)

// summaryDoc is summary.json: the figures of the summary for other tools.
type summaryDoc struct {
	Site        string      `json:"site"`
	Planes      int         `json:"planes"`
	Critical    int         `json:"critical"`
	Opening     int         `json:"opening"`
	Stable      int         `json:"stable"`
	DepthMin    num         `json:"depth_min_m"`
	DepthMax    num         `json:"depth_max_m"`
	LeastStable []planeJSON `json:"least_stable"`
	Limit       limitJSON   `json:"frictional_limit"`
	Readings    int         `json:"readings"`
	Sets        []planeJSON `json:"sets"` // least stable first; empty without readings_file
}

type planeJSON struct {
	Name            string `json:"name"`
	Dip             num    `json:"dip"`
	DipDirection    num    `json:"dip_direction"`
	Depth           num    `json:"depth_m"`
	State           string `json:"state"`
	EffectiveNormal num    `json:"effective_normal_stress_mpa"`
	FactorOfSafety  num    `json:"factor_of_safety"`
	PressureToSlip  num    `json:"pressure_to_slip_mpa"`
}

type limitJSON struct {
	Friction     num       `json:"friction"`
	Limit        num       `json:"limit"`
	Depths       []float64 `json:"depths_m"`
	LargestRatio num       `json:"largest_effective_ratio"`
	AtDepth      num       `json:"largest_at_depth_m"`
	ExceededAt   []float64 `json:"exceeded_at_depths_m"`
}

func newPlaneJSON(p assess.Named) planeJSON {
	r := p.Result
	return planeJSON{Name: p.Name, Dip: num(p.Orientation.Dip()), DipDirection: num(p.Orientation.DipDirection()), Depth: num(p.Depth),
		State: r.State.String(), EffectiveNormal: num(r.EffectiveNormal), FactorOfSafety: num(r.FactorOfSafety), PressureToSlip: num(r.PressureToSlip)}
}

func newSummaryDoc(site string, f assess.Facts) summaryDoc {
	d := summaryDoc{Site: site, Planes: f.Planes, Critical: f.Critical, Opening: f.Opening, Stable: f.Stable,
		DepthMin: num(f.DepthMin), DepthMax: num(f.DepthMax), Readings: f.Readings}
	for _, p := range f.LeastStable {
		d.LeastStable = append(d.LeastStable, newPlaneJSON(p))
	}
	for _, p := range f.Sets {
		d.Sets = append(d.Sets, newPlaneJSON(p))
	}
	best, exceeded := f.Largest()
	l := f.Limits[best]
	d.Limit = limitJSON{Friction: num(l.Friction), Limit: num(l.Limit), Depths: f.Depths, LargestRatio: num(l.Ratio), AtDepth: num(f.Depths[best]), ExceededAt: exceeded}
	return d
}
