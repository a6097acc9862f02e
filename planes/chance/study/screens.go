package study

import (
	"math"
	"sync"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/chance"
	"cleft/planes/site"
	"cleft/planes/slope"
)

// SlopeOdds is the probability that one planar case of the slope, feasible
// in the base site, has a factor of safety below 1, for each water case of
// the slope (slope.Slope.Water). A realisation in which the case is not
// kinematically feasible (its plane moved out of the sliding zone) counts
// as not failing.
type SlopeOdds struct {
	Case     int // index into the base screening's Cases
	Target   int // index into the targets
	Feasible int // realisations in which the case is kinematically feasible
	Fails    []int
	P        []float64 // Fails/N
	StdErr   []float64
}

// TunnelOdds is the probability that one target of the tunnel is critical
// or opening in the far field at one station's axis depth (the verdict of
// stations.csv).
type TunnelOdds struct {
	Station  int // index into the base screening's Stations
	Target   int // index into the base screening's Targets
	Unstable int
	P        float64
	StdErr   float64
}

// slopeTargets returns the target of each feasible planar case.
func (r *runner) slopeTargets(a *assess.Assessment) []int {
	sc := r.opt.Slope
	if sc == nil {
		return nil
	}
	var out []int
	for _, c := range sc.Cases {
		if c.Test == slope.PlanarTest && c.Feasible {
			out = append(out, candidateTarget(a, c.A))
		}
	}
	return out
}

// candidateTarget maps an index of assess.Candidates to a target: the
// site's planes, then the set means.
func candidateTarget(a *assess.Assessment, c int) int {
	if c < a.NPlanes {
		return c
	}
	return len(a.Planes) + c - a.NPlanes
}

// tunnelTargets returns the target of each tunnel target, by name: a site
// plane, else a set (named S1, … in the tunnel, "S1 mean" as a target).
func (r *runner) tunnelTargets(a *assess.Assessment) []int {
	sc := r.opt.Tunnel
	if sc == nil {
		return nil
	}
	var out []int
	for _, tg := range sc.Targets {
		out = append(out, tunnelTarget(a, tg.Name))
	}
	return out
}

func tunnelTarget(a *assess.Assessment, name string) int {
	for i := 0; i < a.NPlanes; i++ {
		if a.Planes[i].Name == name {
			return i
		}
	}
	for k, s := range a.Sets {
		if s.Name == name {
			return len(a.Planes) + k
		}
	}
	panic("study: tunnel target " + name + " is not a target")
}

// realised returns target ti's plane in realisation i.
func (r *runner) realised(ti, i int) *site.Plane {
	if k := r.kept[ti]; k != nil {
		return &k[i]
	}
	return &r.targets[ti].Plane
}

// slope works out SlopeOdds for every feasible planar case.
func (r *runner) slope(a *assess.Assessment) {
	sc := r.opt.Slope
	type item struct{ c, t int }
	var items []item
	for ci, c := range sc.Cases {
		if c.Test == slope.PlanarTest && c.Feasible {
			items = append(items, item{ci, candidateTarget(a, c.A)})
		}
	}
	nf := len(sc.Slope.Water)
	fails := make([][]int, len(items))
	feasible := make([]int, len(items))
	for k := range fails {
		fails[k] = make([]int, nf)
	}
	var mu sync.Mutex
	r.chunks(r.n, func(lo, hi int) {
		f := make([][]int, len(items))
		fe := make([]int, len(items))
		for k := range f {
			f[k] = make([]int, nf)
		}
		for i := lo; i < hi; i++ {
			sl := r.variants[i].Slope()
			for k, it := range items {
				p := r.realised(it.t, i)
				cand := slope.Candidate{Name: p.Name, Orientation: p.Orientation, Phi: sl.FrictionAngle, Cohesion: sl.Cohesion, IsSet: r.targets[it.t].IsSet()}
				if !math.IsNaN(p.Friction) {
					cand.Phi = math.Atan(p.Friction) * geom.Deg
				}
				if !math.IsNaN(p.Cohesion) {
					cand.Cohesion = p.Cohesion
				}
				c := slope.Screen(*sl, []slope.Candidate{cand}).Cases[0]
				if !c.Feasible {
					continue
				}
				fe[k]++
				for w, fs := range c.FS {
					if fs < 1 {
						f[k][w]++
					}
				}
			}
		}
		mu.Lock()
		for k := range f {
			feasible[k] += fe[k]
			for w := range f[k] {
				fails[k][w] += f[k][w]
			}
		}
		mu.Unlock()
	})
	for k, it := range items {
		o := SlopeOdds{Case: it.c, Target: it.t, Feasible: feasible[k], Fails: fails[k]}
		for _, f := range fails[k] {
			p := float64(f) / float64(r.n)
			o.P = append(o.P, p)
			o.StdErr = append(o.StdErr, chance.StdErr(p, r.n))
		}
		r.out.Slope = append(r.out.Slope, o)
	}
}

// tunnel works out TunnelOdds for every station and tunnel target.
func (r *runner) tunnel(a *assess.Assessment) {
	sc := r.opt.Tunnel
	tts := r.tunnelTargets(a)
	out := make([]TunnelOdds, len(sc.Stations)*len(tts))
	r.parallel(len(sc.Stations), func(si int, _ *workspace) {
		z := sc.Stations[si].Depth
		var res planes.Core
		var scratch planes.Coulomb
		counts := make([]int, len(tts))
		for i := range r.n {
			model := r.models[i]
			var st0 insitu.State
			r.stateAt(i, z, &st0)
			for k, ti := range tts {
				p := r.realised(ti, i)
				st := st0
				if !math.IsNaN(p.PorePressure) {
					excess := p.PorePressure - model.At(p.Depth).PorePressure
					st.PorePressure = math.Max(0, st.PorePressure+excess)
				}
				planes.ResolveCore(&res, &st, p.Orientation.Normal(), r.variants[i].CriterionFor(p, &scratch))
				if res.State != planes.Stable {
					counts[k]++
				}
			}
		}
		for k := range tts {
			p := float64(counts[k]) / float64(r.n)
			out[si*len(tts)+k] = TunnelOdds{Station: si, Target: k, Unstable: counts[k], P: p, StdErr: chance.StdErr(p, r.n)}
		}
	})
	r.out.Tunnel = out
}

// field works out P(unstable) for each orientation of Options.Field.
func (r *runner) field() {
	os := r.opt.Field
	nf := r.out.FieldN
	total := make([]int32, len(os))
	var mu sync.Mutex
	r.chunks(nf, func(lo, hi int) {
		counts := make([]int32, len(os))
		var res planes.Core
		for i := lo; i < hi; i++ {
			var st insitu.State
			r.stateAt(i, r.opt.FieldDepth, &st)
			c := r.crits[i]
			for j := range os {
				planes.ResolveCore(&res, &st, os[j].Normal(), c)
				if res.State != planes.Stable {
					counts[j]++
				}
			}
			r.progress(int64(len(os)))
		}
		mu.Lock()
		for j, c := range counts {
			total[j] += c
		}
		mu.Unlock()
	})
	r.out.Field = make([]float64, len(os))
	for j, c := range total {
		r.out.Field[j] = float64(c) / float64(nf)
	}
}
