package study

import (
	"math"
	"math/rand/v2"

	"cleft/insitu"
	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/chance"
	"cleft/planes/site"
)

// workspace is one worker's buffers, reused from plane to plane.
type workspace struct {
	fs, ts, pts []float64
	keys, tmp   []uint64
	idx, tmpIdx []int32
	rank        []float64
	counts      []int32
	plane       site.Plane
}

func newWorkspace(n int) *workspace {
	return &workspace{
		fs: make([]float64, n), ts: make([]float64, n), pts: make([]float64, n),
		keys: make([]uint64, n), tmp: make([]uint64, n),
		idx: make([]int32, n), tmpIdx: make([]int32, n), rank: make([]float64, n), counts: make([]int32, selectBins),
	}
}

// plan works out which inputs are each target's own columns, which targets'
// realised planes the slope and tunnel need, and whether the varied keys
// touch them.
func (r *runner) plan(a *assess.Assessment) {
	r.planeIn = make([][]planeInput, len(r.targets))
	names := map[string][]int{}
	for i := range r.targets {
		names[r.targets[i].Plane.Name] = append(names[r.targets[i].Plane.Name], i)
	}
	for j, in := range r.u.Vary {
		k := in.Path.Key
		if k.IsPlane() {
			for _, i := range names[in.Path.Plane] {
				r.planeIn[i] = append(r.planeIn[i], planeInput{col: j, key: k})
			}
		}
	}
	r.keep = make([]bool, len(r.targets))
	r.kept = make([][]site.Plane, len(r.targets))
	scatter := r.u.FisherK > 0
	for _, i := range r.slopeTargets(a) {
		r.keep[i] = true
		if scatter || len(r.planeIn[i]) > 0 {
			r.touchesSlope = true
		}
	}
	for _, i := range r.tunnelTargets(a) {
		r.keep[i] = true
		if scatter || len(r.planeIn[i]) > 0 {
			r.touchesTunnel = true
		}
	}
	for _, in := range r.u.Vary {
		k := in.Path.Key
		switch {
		case k.Slope(), k.Strength() && r.opt.Slope != nil, k == site.VerticalGradient, k == site.VerticalDensity:
			r.touchesSlope = true
		}
		if k.Stress() || k.Strength() {
			r.touchesTunnel = true
		}
	}
	for i := range r.targets {
		if r.keep[i] && (scatter || len(r.planeIn[i]) > 0) {
			r.kept[i] = make([]site.Plane, r.n)
		}
	}
}

// target works out the odds of target ti over every realisation.
func (r *runner) target(ti int, w *workspace) {
	t := &r.targets[ti]
	base := t.Plane
	ins := r.planeIn[ti]
	kappa := r.u.FisherK
	if t.IsSet() && kappa > 0 {
		kappa = t.SetK
	}
	moves := kappa > 0
	reorients := false
	for _, in := range ins {
		reorients = reorients || in.key == site.PlaneDip || in.key == site.PlaneDipDirection
	}
	var fisher chance.Fisher
	var src = r.itemStream(ti, moves)
	if moves && !reorients {
		fisher = chance.NewFisher(base.Orientation.Normal(), kappa)
	}
	kept := r.kept[ti]
	var scratch planes.Coulomb
	var res planes.Core
	var st insitu.State
	crit, open := 0, 0
	for i := range r.n {
		p := &base
		n := base.Orientation.Normal()
		if len(ins) > 0 || moves {
			w.plane = base
			p = &w.plane
			for _, in := range ins {
				site.SetPlane(p, in.key, r.x[i*r.k+in.col])
			}
			n = p.Orientation.Normal()
			if moves {
				f := fisher
				if reorients {
					f = chance.NewFisher(n, kappa)
				}
				n = f.Draw(src)
				if kept != nil {
					p.Orientation = planes.FromUnitNormal(n)
				}
			}
			if kept != nil {
				kept[i] = *p
			}
		}
		r.stateAt(i, p.Depth, &st)
		if !math.IsNaN(p.PorePressure) {
			st.PorePressure = p.PorePressure
		}
		c := r.crits[i]
		if !math.IsNaN(p.Friction) || !math.IsNaN(p.Cohesion) {
			c = r.variants[i].CriterionFor(p, &scratch)
		}
		planes.ResolveCore(&res, &st, n, c)
		fs, ts := res.FactorOfSafety, res.SlipTendency
		switch res.State {
		case planes.Opening:
			open++
			fs, ts = math.Inf(-1), math.Inf(1)
		case planes.Critical:
			crit++
		}
		if math.IsNaN(fs) { // no shear: it cannot slip
			fs = math.Inf(1)
		}
		w.fs[i], w.ts[i], w.pts[i] = fs, ts, res.PressureToSlip
	}
	r.progress(int64(r.n))
	r.out.Odds[ti] = r.odds(crit, open, w)
}

// itemStream is the target's own stream when its orientation moves.
func (r *runner) itemStream(ti int, moves bool) *rand.Rand {
	if !moves {
		return nil
	}
	return chance.ItemStream(r.seed, ti)
}

// odds turns one target's values into its statistics.
func (r *runner) odds(crit, open int, w *workspace) Odds {
	n := r.n
	o := Odds{Critical: crit, Opening: open, Driver: -1}
	o.PCritical = float64(crit) / float64(n)
	o.POpening = float64(open) / float64(n)
	o.PUnstable = float64(crit+open) / float64(n)
	o.StdErr = chance.StdErr(o.PUnstable, n)

	// Factor of safety: sorted with its realisation indexes, for the
	// percentiles and the mid-ranks.
	for i, v := range w.fs {
		w.keys[i], w.idx[i] = orderBits(v), int32(i)
	}
	radixSort(w.keys, w.tmp, w.idx, w.tmpIdx)
	sorted := w.fs // reused: the values are no longer needed in order
	for i, k := range w.keys {
		sorted[i] = fromOrderBits(k)
	}
	for j, p := range Percentiles {
		o.FS[j] = chance.Percentile(sorted, p)
	}
	for lo := 0; lo < n; {
		hi := lo + 1
		for hi < n && w.keys[hi] == w.keys[lo] {
			hi++
		}
		rk := float64(lo+hi+1)/2 - float64(n+1)/2
		for _, i := range w.idx[lo:hi] {
			w.rank[i] = rk
		}
		lo = hi
	}
	ss := 0.0
	for _, v := range w.rank {
		ss += v * v
	}
	o.Rho = make([]float64, r.k)
	best := 0.0
	for j := range r.k {
		o.Rho[j] = math.NaN()
		if ss == 0 || r.sumSq[j] == 0 {
			continue
		}
		s := 0.0
		for i, c := range r.centred[j] {
			s += c * w.rank[i]
		}
		o.Rho[j] = s / math.Sqrt(ss*r.sumSq[j])
		if a := math.Abs(o.Rho[j]); a > best {
			best, o.Driver = a, j
		}
	}
	o.TS = selectPercentiles(w.ts, w.keys, w.counts, w.tmp)
	o.PtS = selectPercentiles(w.pts, w.keys, w.counts, w.tmp)
	return o
}
