package main

import (
	"math"

	"cleft/insitu/opening"
	"cleft/planes/assess"
	"cleft/planes/chance/study"
	"cleft/planes/decide"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
	"cleft/plots/words"
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
	Slope       *slopeJSON  `json:"slope,omitempty"`
	Tunnel      *tunnelJSON `json:"tunnel,omitempty"`
	Chance      *chanceJSON `json:"chance,omitempty"`
	LookFirst   []lookJSON  `json:"look_first"`
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

// slopeJSON is the slope in a few numbers: the feasible cases per test and
// the least factor of safety of any block and water case.
type slopeJSON struct {
	Tested   int            `json:"planes_tested"`
	Feasible map[string]int `json:"feasible"`
	LeastFS  *leastFSJSON   `json:"least_fs"` // null when no feasible block has a factor of safety
}

type leastFSJSON struct {
	FactorOfSafety num      `json:"factor_of_safety"`
	Case           string   `json:"case"` // the test: planar or wedge
	Planes         []string `json:"planes"`
	WaterCase      string   `json:"water_case"` // as in slope.csv's fs_water_ columns
	Mode           string   `json:"mode"`
}

// tunnelJSON is the tunnel in a few numbers.
type tunnelJSON struct {
	Stations     int          `json:"stations"`
	WorstStation worstJSON    `json:"worst_station"`
	Spalling     spallingJSON `json:"spalling"`
	Deepest      *zoneJSON    `json:"deepest_slip_zone"`         // by extent, then depth; null when no zone
	Bounded      *zoneJSON    `json:"deepest_bounded_slip_zone"` // the deepest whose depth is known
	FarField     []farJSON    `json:"far_field_unstable"`        // planes and sets critical or opening in the far field somewhere
}

type worstJSON struct {
	Chainage    num `json:"chainage_m"`
	Cover       num `json:"cover_m"`
	Depth       num `json:"depth_m"`
	SigmaMax    num `json:"sigma_max_mpa"`
	SigmaMaxAt  num `json:"sigma_max_at_deg"`
	SigmaMaxUCS num `json:"sigma_max_to_ucs"`
}

type spallingJSON struct {
	Band      string        `json:"band"` // at the worst station: below-onset, at-onset, past-onset
	Stretches []stretchJSON `json:"stretches"`
}

type stretchJSON struct {
	From num `json:"from_m"`
	To   num `json:"to_m"`
}

type zoneJSON struct {
	Set      string `json:"set"`
	Chainage num    `json:"chainage_m"`
	Depth    num    `json:"depth_m"`
	Angle    num    `json:"at_deg"`
	Extent   string `json:"extent"`
}

type farJSON struct {
	Set       string        `json:"set"`
	Stretches []stretchJSON `json:"stretches"`
}

// chanceJSON is the cases and the Monte Carlo in a few numbers.
type chanceJSON struct {
	Cases        []string        `json:"cases"`  // the base first; just the base without cases:
	Robust       *int            `json:"robust"` // planes and set means with one state in every case; null without cases:
	Realisations int             `json:"realisations"`
	Seed         *uint64         `json:"seed"` // null without uncertainty:
	Inputs       []string        `json:"inputs"`
	AtLeast5     *int            `json:"p_unstable_at_least_0_05"`
	AtLeastHalf  *int            `json:"p_unstable_at_least_0_5"`
	LeastSure    []leastSureJSON `json:"least_sure"`
}

type leastSureJSON struct {
	Name          string `json:"name"`
	State         string `json:"state"`
	CasesUnstable int    `json:"cases_unstable"`
	PUnstable     num    `json:"p_unstable"`
	StdErr        num    `json:"p_unstable_se"`
	Driver        string `json:"driver"`
}

// lookJSON is one finding of the ranked look-first list.
type lookJSON struct {
	Kind     string   `json:"kind"`
	Name     string   `json:"name"`
	Measure  string   `json:"measure"`
	Value    num      `json:"value"`
	Standing string   `json:"standing"`
	Reason   []string `json:"reason"`
	Decisive []string `json:"decisive"`
	P        num      `json:"probability"`
	// Where: the plane's depth, the tunnel station's chainage, the slope
	// case's water case (each null or "" where it does not apply).
	Depth     num    `json:"depth_m"`
	Chainage  num    `json:"chainage_m"`
	WaterCase string `json:"water_case"`
	Text      string `json:"text"`
}

func newPlaneJSON(p assess.Named) planeJSON {
	r := p.Result
	return planeJSON{Name: p.Name, Dip: num(p.Orientation.Dip()), DipDirection: num(p.Orientation.DipDirection()), Depth: num(p.Depth),
		State: r.State.String(), EffectiveNormal: num(r.EffectiveNormal), FactorOfSafety: num(r.FactorOfSafety), PressureToSlip: num(r.PressureToSlip)}
}

func newSummaryDoc(site string, f assess.Facts, a *screened, d *decision, ch *chances) summaryDoc {
	doc := summaryDoc{Site: site, Planes: f.Planes, Critical: f.Critical, Opening: f.Opening, Stable: f.Stable,
		DepthMin: num(f.DepthMin), DepthMax: num(f.DepthMax), Readings: f.Readings, LookFirst: []lookJSON{}}
	for _, p := range f.LeastStable {
		doc.LeastStable = append(doc.LeastStable, newPlaneJSON(p))
	}
	for _, p := range f.Sets {
		doc.Sets = append(doc.Sets, newPlaneJSON(p))
	}
	best, exceeded := f.Largest()
	l := f.Limits[best]
	doc.Limit = limitJSON{Friction: num(l.Friction), Limit: num(l.Limit), Depths: f.Depths, LargestRatio: num(l.Ratio), AtDepth: num(f.Depths[best]), ExceededAt: exceeded}
	if d.slope != nil {
		doc.Slope = newSlopeJSON(a.slope, d.slope)
	}
	if d.tunnel != nil {
		doc.Tunnel = newTunnelJSON(a.tunnel, d.tunnel)
	}
	if ch != nil {
		doc.Chance = newChanceJSON(ch)
	}
	for i := range d.top {
		g := &d.top[i]
		l := lookJSON{Kind: g.Kind.String(), Name: g.Name, Measure: g.Measure.String(), Value: num(g.Value),
			Standing: g.Standing.String(), Reason: g.Reasons.Tokens(), Decisive: g.Decisive.Tokens(), P: num(g.P),
			Depth: num(math.NaN()), Chainage: num(g.Chainage), Text: words.Finding(g)}
		switch g.Kind {
		case decide.Plane, decide.SetMean, decide.Readings:
			l.Depth = num(g.Depth)
		case decide.Planar, decide.Wedge:
			if g.Plain == decide.FactorOfSafety {
				l.WaterCase = g.Water.String()
			}
		}
		doc.LookFirst = append(doc.LookFirst, l)
	}
	return doc
}

func newSlopeJSON(sc *slope.Screening, s *decide.SlopeSummary) *slopeJSON {
	out := &slopeJSON{Tested: s.Candidates, Feasible: map[string]int{
		slope.PlanarTest.String(): s.Planar, slope.WedgeTest.String(): s.Wedge, slope.TopplingTest.String(): s.Toppling}}
	if s.Least.Case >= 0 {
		c := &sc.Cases[s.Least.Case]
		ps := []string{sc.Candidates[c.A].Name}
		if c.B >= 0 {
			ps = append(ps, sc.Candidates[c.B].Name)
		}
		out.LeastFS = &leastFSJSON{FactorOfSafety: num(s.Least.Value), Case: c.Test.String(), Planes: ps, WaterCase: s.Least.Water.String(), Mode: s.Least.Mode.String()}
	}
	return out
}

func stretchesJSON(ss []tunnel.Stretch) []stretchJSON {
	out := []stretchJSON{}
	for _, s := range ss {
		out = append(out, stretchJSON{num(s.From), num(s.To)})
	}
	return out
}

func newTunnelJSON(sc *tunnel.Screening, s *decide.TunnelSummary) *tunnelJSON {
	w := &sc.Stations[s.Worst]
	band := map[opening.Spalling]string{opening.BelowOnset: "below-onset", opening.AtOnset: "at-onset", opening.PastOnset: "past-onset"}[s.Spalling]
	out := &tunnelJSON{Stations: s.Stations, FarField: []farJSON{},
		WorstStation: worstJSON{num(w.Chainage), num(w.Cover), num(w.Depth), num(w.WallMax.Stress), num(w.WallMax.Theta), num(w.Ratio)},
		Spalling:     spallingJSON{Band: band, Stretches: stretchesJSON(s.Stretches)}}
	zone := func(i, k int) *zoneJSON {
		r := &sc.Stations[i].Rows[k]
		return &zoneJSON{Set: sc.Targets[k].Name, Chainage: num(sc.Stations[i].Chainage), Depth: num(r.Zone.Depth), Angle: num(r.Zone.Angle), Extent: r.Extent().String()}
	}
	if s.HasDeepest {
		out.Deepest = zone(s.Deepest, s.DeepestTarget)
	}
	if s.HasBounded {
		out.Bounded = zone(s.Bounded, s.BoundedTarget)
	}
	for k, far := range s.Far {
		if len(far) > 0 {
			out.FarField = append(out.FarField, farJSON{Set: sc.Targets[k].Name, Stretches: stretchesJSON(far)})
		}
	}
	return out
}

func newChanceJSON(ch *chances) *chanceJSON {
	out := &chanceJSON{Inputs: []string{}, LeastSure: []leastSureJSON{}}
	for _, r := range ch.runs {
		out.Cases = append(out.Cases, r.Name)
	}
	if len(ch.runs) > 1 {
		n := 0
		for i := range ch.targets {
			if study.Robust(ch.runs, i) {
				n++
			}
		}
		out.Robust = &n
	}
	o := ch.out
	if o != nil {
		seed := o.Seed
		some, half := 0, 0
		for _, d := range o.Odds {
			if d.PUnstable >= 0.05 {
				some++
			}
			if d.PUnstable >= 0.5 {
				half++
			}
		}
		out.Realisations, out.Seed, out.Inputs, out.AtLeast5, out.AtLeastHalf = o.N, &seed, o.Inputs, &some, &half
	}
	for _, i := range words.ChanceOrder(ch.targets, ch.runs, o)[:min(3, len(ch.targets))] {
		t := &ch.targets[i]
		ls := leastSureJSON{Name: t.Plane.Name, State: t.Base.State.String(), CasesUnstable: study.Critical(ch.runs, i), PUnstable: num(math.NaN()), StdErr: num(math.NaN())}
		if o != nil {
			d := o.Odds[i]
			ls.PUnstable, ls.StdErr = num(d.PUnstable), num(d.StdErr)
			if d.Driver >= 0 {
				ls.Driver = o.Inputs[d.Driver]
			}
		}
		out.LeastSure = append(out.LeastSure, ls)
	}
	return out
}
