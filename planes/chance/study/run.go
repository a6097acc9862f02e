package study

import (
	"fmt"
	"runtime"
	"sync"
	"sync/atomic"

	"cleft/insitu"
	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/chance"
	"cleft/planes/site"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// Options of Run. The zero value runs the site's own uncertainty: with
// one worker per CPU and no probability field.
type Options struct {
	Realisations int    // > 0 replaces the site's realisations:
	Seed         uint64 // used when SetSeed
	SetSeed      bool   // replace the site's seed: with Seed
	Workers      int    // 0: GOMAXPROCS

	// Field asks for the probability that each of these orientations is
	// unstable at FieldDepth, in the site-wide part of each realisation
	// (its own plane columns and scatter do not apply), over the first
	// min(N, FieldRealisations) realisations (0: all).
	Field             []planes.Orientation
	FieldDepth        float64
	FieldRealisations int

	// Slope and Tunnel are the base screenings of the site's slope and
	// tunnel (nil without them); their probabilities are worked out when a
	// varied key touches them.
	Slope  *slope.Screening
	Tunnel *tunnel.Screening

	// Progress, when set, is called now and then with the resolutions done
	// and the total, never by two goroutines at once.
	Progress func(done, total int64)
}

// Odds are the Monte Carlo statistics of one target.
type Odds struct {
	Critical, Opening int     // realisations in each state
	PCritical         float64 // Critical/N
	POpening          float64
	PUnstable         float64 // (Critical + Opening)/N
	StdErr            float64 // √(p(1−p)/N) of PUnstable
	// FS, TS and PtS are the 5th, 50th and 95th percentiles of the factor
	// of safety, the slip tendency and the pressure to slip (MPa); NaN where
	// the percentile falls on an undefined value.
	FS, TS, PtS [3]float64
	// Rho is Spearman's ρ between each varied input and the factor of
	// safety (NaN when either is constant).
	Rho []float64
	// Driver is the input whose |ρ| is largest (the first on a tie), −1
	// when no ρ is defined.
	Driver int
}

// Percentiles are the probabilities of Odds.FS, TS and PtS.
var Percentiles = [3]float64{0.05, 0.5, 0.95}

// Outcome is the Monte Carlo of a site.
type Outcome struct {
	N       int    // realisations
	Seed    uint64 // the seed used
	Inputs  []string
	Targets []Target
	Odds    []Odds // one per target

	// Field is P(unstable) for each orientation of Options.Field, over
	// FieldN realisations.
	Field  []float64
	FieldN int

	Slope  []SlopeOdds  // nil unless a varied key touches the slope
	Tunnel []TunnelOdds // nil unless a varied key touches the tunnel
}

// Run draws the realisations of the site's uncertainty: and works out the
// odds of every target. It returns an error for a site without
// uncertainty:, or when the correlated inputs need more realisations.
func Run(a *assess.Assessment, targets []Target, opt Options) (*Outcome, error) {
	s := a.Site
	u := s.Uncertainty
	if u == nil {
		return nil, &site.Error{File: s.File, Err: site.ErrMissing, Msg: "no uncertainty: block: give vary: {dotted.path: distribution} (see README)"}
	}
	r := &runner{site: s, u: u, targets: targets, opt: opt, n: u.Realisations, seed: u.Seed}
	if opt.Realisations > 0 {
		r.n = opt.Realisations
	}
	if opt.SetSeed {
		r.seed = opt.Seed
	}
	r.workers = opt.Workers
	if r.workers <= 0 {
		r.workers = runtime.GOMAXPROCS(0)
	}
	if err := r.draw(); err != nil {
		return nil, &site.Error{File: s.File, Line: u.Line, Key: "uncertainty", Err: site.ErrRange, Msg: err.Error()}
	}
	out := &Outcome{N: r.n, Seed: r.seed, Targets: targets, Odds: make([]Odds, len(targets))}
	for _, in := range u.Vary {
		out.Inputs = append(out.Inputs, in.Path.Text)
	}
	r.out = out
	r.plan(a)
	r.total = int64(len(targets)) * int64(r.n)
	if len(opt.Field) > 0 {
		out.FieldN = r.n
		if opt.FieldRealisations > 0 {
			out.FieldN = min(r.n, opt.FieldRealisations)
		}
		r.total += int64(len(opt.Field)) * int64(out.FieldN)
	}
	r.parallel(len(targets), func(ti int, w *workspace) { r.target(ti, w) })
	if len(opt.Field) > 0 {
		r.field()
	}
	if r.touchesSlope && opt.Slope != nil {
		r.slope(a)
	}
	if r.touchesTunnel && opt.Tunnel != nil {
		r.tunnel(a)
	}
	return out, nil
}

// runner holds one run's realisations and work.
type runner struct {
	site    *site.Site
	u       *site.Uncertainty
	targets []Target
	opt     Options
	n       int
	seed    uint64
	workers int
	out     *Outcome

	k        int       // varied inputs
	x        []float64 // n × k draws, row-major
	centred  [][]float64
	sumSq    []float64
	variants []site.Variant
	models   []insitu.Model
	grads    []gradState // when the site's model is a gradient model
	crits    []planes.Criterion

	planeIn                     [][]planeInput // per target
	keep                        []bool         // per target: store its realised planes
	kept                        [][]site.Plane // per target when keep and it varies
	touchesSlope, touchesTunnel bool

	mu         sync.Mutex
	done       atomic.Int64
	total      int64
	lastReport int64
}

// planeInput is a varied plane column of one target.
type planeInput struct {
	col int
	key site.Key
}

// draw draws the inputs and builds every realisation's variant.
func (r *runner) draw() error {
	r.k = len(r.u.Vary)
	r.variants = make([]site.Variant, r.n)
	r.models = make([]insitu.Model, r.n)
	r.crits = make([]planes.Criterion, r.n)
	if r.k > 0 {
		dists := make([]chance.Dist, r.k)
		for j, in := range r.u.Vary {
			dists[j] = in.Dist
		}
		m, err := chance.Draw(dists, r.u.Correlations, r.n, r.seed)
		if err != nil {
			return err
		}
		raw := m.RawMatrix()
		r.x = raw.Data[:r.n*r.k] // stride is k for a new Dense
		r.ranks()
	}
	errs := make([]error, r.n)
	r.chunks(r.n, func(lo, hi int) {
		v := r.site.Variant()
		for i := lo; i < hi; i++ {
			v.Reset()
			for j, in := range r.u.Vary {
				if !in.Path.Key.IsPlane() {
					v.Set(in.Path.Key, r.x[i*r.k+j])
				}
			}
			errs[i] = v.Finish()
			r.variants[i] = *v
		}
	})
	for i, err := range errs {
		if err != nil {
			return fmt.Errorf("realisation %d: %w", i, err)
		}
	}
	for i := range r.variants {
		r.models[i] = r.variants[i].Model()
		r.crits[i] = r.variants[i].Criterion()
	}
	if _, ok := r.models[0].(*insitu.GradientModel); ok {
		r.grads = make([]gradState, r.n)
		for i, m := range r.models {
			r.grads[i] = newGradState(m.(*insitu.GradientModel))
		}
	}
	return nil
}

// ranks keeps each input's mid-ranks, centred, and their sum of squares.
func (r *runner) ranks() {
	r.centred = make([][]float64, r.k)
	r.sumSq = make([]float64, r.k)
	col := make([]float64, r.n)
	mid := float64(r.n+1) / 2
	for j := range r.k {
		for i := range r.n {
			col[i] = r.x[i*r.k+j]
		}
		rk, _ := chance.Ranks(nil, col)
		ss := 0.0
		for i := range rk {
			rk[i] -= mid
			ss += rk[i] * rk[i]
		}
		r.centred[j], r.sumSq[j] = rk, ss
	}
}

// chunks runs fn over [0, n) in contiguous chunks, one per worker.
func (r *runner) chunks(n int, fn func(lo, hi int)) {
	w := min(r.workers, max(1, n))
	var wg sync.WaitGroup
	for c := range w {
		lo, hi := c*n/w, (c+1)*n/w
		wg.Add(1)
		go func() { defer wg.Done(); fn(lo, hi) }()
	}
	wg.Wait()
}

// parallel runs fn for every index in [0, n), handed out one at a time to
// the workers, each with a workspace of its own.
func (r *runner) parallel(n int, fn func(i int, w *workspace)) {
	var next atomic.Int64
	var wg sync.WaitGroup
	for range min(r.workers, max(1, n)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := newWorkspace(r.n)
			for {
				i := int(next.Add(1) - 1)
				if i >= n {
					return
				}
				fn(i, w)
			}
		}()
	}
	wg.Wait()
}

// progress adds d resolutions done and reports them.
func (r *runner) progress(d int64) {
	if r.opt.Progress == nil {
		return
	}
	done := r.done.Add(d)
	r.mu.Lock()
	if done > r.lastReport {
		r.lastReport = done
		r.opt.Progress(done, r.total)
	}
	r.mu.Unlock()
}
