package sets

import (
	"math"
	"math/rand/v2"
	"runtime"
	"sort"
	"sync"

	"gonum.org/v1/gonum/spatial/r3"
)

// ClusterOptions say how readings are grouped into sets.
type ClusterOptions struct {
	// K is the number of sets, used when Seeds is empty.
	K int
	// Seeds are starting axes for the sets (their number fixes K).
	Seeds []r3.Vec
	// MaxAngle, when > 0, is the cone (degrees) about its set axis beyond
	// which a reading is left unassigned ("random").
	MaxAngle float64
	// Weights of the readings (nil for none).
	Weights []float64
	// Progress, when not nil, is called after each of the ten k-means
	// runs of an automatic start (none with Seeds), from any goroutine.
	Progress func()
}

// Clustering is readings grouped into sets.
type Clustering struct {
	// Assign is the set of each reading, 0-based, or −1 for unassigned.
	Assign []int
	// Axes are the set axes: the principal axis of each set's orientation
	// tensor. Sets are numbered by weighted size, largest first.
	Axes []r3.Vec
}

// axialDist is the axial misfit used by the clustering: sin² of the angle
// between two axes, 1 − (a·b)², which the principal axis of an orientation
// tensor minimises in sum.
func axialDist(a, b r3.Vec) float64 {
	d := r3.Dot(a, b)
	return 1 - d*d
}

// Cluster groups axes into sets by spherical k-means on axes: each reading
// goes to the set axis nearest to it by angle (n and −n alike), each set
// axis is then re-estimated as the principal eigenvector of its members'
// orientation tensor (Scheidegger 1965), until no reading changes set.
// Without seeds, starting axes are drawn by k-means++ (Arthur & Vassilvitskii
// 2007) from a fixed seed, ten times, and the grouping with the least total
// misfit is kept: the result is reproducible. K must be between 1 and the
// number of readings.
func Cluster(normals []r3.Vec, o ClusterOptions) Clustering {
	k := o.K
	if len(o.Seeds) > 0 {
		k = len(o.Seeds)
	}
	if k < 1 || k > len(normals) {
		panic("sets: Cluster needs 1 ≤ K ≤ number of readings")
	}
	unit := make([]r3.Vec, len(normals))
	for i, n := range normals {
		unit[i] = r3.Unit(n)
	}
	if len(o.Seeds) > 0 {
		axes := make([]r3.Vec, k)
		for i, s := range o.Seeds {
			axes[i] = r3.Unit(s)
		}
		c, _ := refine(unit, axes, o)
		return order(c, o.Weights)
	}
	// The starts are drawn one after the other from the one generator, so
	// that they do not depend on how the refinements are scheduled; the
	// refinements run in parallel, and the least misfit wins, the earlier
	// start on a tie.
	rng := rand.New(rand.NewPCG(0x5e7, 0xc1e))
	starts := make([][]r3.Vec, 10)
	for r := range starts {
		starts[r] = seedPlusPlus(unit, k, rng)
	}
	var (
		mu       sync.Mutex
		best     Clustering
		bestCost = math.Inf(1)
		bestAt   = len(starts)
		wg       sync.WaitGroup
	)
	next := make(chan int, len(starts))
	for r := range starts {
		next <- r
	}
	close(next)
	for range min(runtime.GOMAXPROCS(0), len(starts)) {
		wg.Go(func() {
			for r := range next {
				c, cost := refine(unit, starts[r], o)
				mu.Lock()
				if cost < bestCost || (cost == bestCost && r < bestAt) {
					best, bestCost, bestAt = c, cost, r
				}
				mu.Unlock()
				if o.Progress != nil {
					o.Progress()
				}
			}
		})
	}
	wg.Wait()
	return order(best, o.Weights)
}

// seedPlusPlus draws k starting axes, each new one with probability
// proportional to its misfit from the nearest already drawn. The misfit of
// each reading is kept from one draw to the next (the minimum over the axes
// drawn so far), so that a draw costs one pass over the readings.
func seedPlusPlus(unit []r3.Vec, k int, rng *rand.Rand) []r3.Vec {
	axes := []r3.Vec{unit[rng.IntN(len(unit))]}
	d := make([]float64, len(unit))
	for i := range d {
		d[i] = math.Inf(1)
	}
	for len(axes) < k {
		a := axes[len(axes)-1]
		total := 0.0
		for i, u := range unit {
			d[i] = math.Min(d[i], axialDist(u, a))
			total += d[i]
		}
		if total == 0 { // all readings on the chosen axes
			axes = append(axes, unit[rng.IntN(len(unit))])
			continue
		}
		x := rng.Float64() * total
		i := 0
		for ; i < len(unit)-1 && x > d[i]; i++ {
			x -= d[i]
		}
		axes = append(axes, unit[i])
	}
	return axes
}

// refine runs the assign/update loop from the given axes and returns the
// clustering and its weighted total misfit, Σ w·sin²(angle to the set axis),
// an unassigned reading counted at the cut-off angle (else leaving readings
// out would look like a better fit).
func refine(unit []r3.Vec, axes []r3.Vec, o ClusterOptions) (Clustering, float64) {
	cut := -1.0 // |cos| below which a reading is unassigned
	if o.MaxAngle > 0 {
		cut = math.Cos(o.MaxAngle * math.Pi / 180)
	}
	assign := make([]int, len(unit))
	for i := range assign {
		assign[i] = -2 // forces a first pass
	}
	w := func(i int) float64 {
		if o.Weights == nil {
			return 1
		}
		return o.Weights[i]
	}
	// Each set's orientation tensor is summed while the readings are
	// assigned, in input order, so no member lists are built.
	sums := make([]tensorSum, len(axes))
	cost := 0.0
	for range 100 {
		changed := false
		cost = 0
		clear(sums)
		for i, u := range unit {
			best, bd := -1, -1.0
			for j, a := range axes {
				if c := math.Abs(r3.Dot(u, a)); c > bd {
					best, bd = j, c
				}
			}
			if bd < cut {
				best = -1
				bd = cut // an unassigned reading costs as much as one on the cone
			}
			wi := w(i)
			cost += wi * (1 - bd*bd)
			if best != assign[i] {
				assign[i] = best
				changed = true
			}
			if best >= 0 {
				sums[best].add(u, wi)
			}
		}
		if !changed {
			break
		}
		for j := range axes {
			if sums[j].n == 0 {
				axes[j] = worstFit(unit, axes, assign)
				continue
			}
			axes[j] = sums[j].eigen().Axes[0]
		}
	}
	return Clustering{Assign: assign, Axes: axes}, cost
}

// worstFit returns the assigned reading farthest from its set axis: where
// an emptied set restarts.
func worstFit(unit, axes []r3.Vec, assign []int) r3.Vec {
	far, fd := unit[0], -1.0
	for i, u := range unit {
		if a := assign[i]; a >= 0 {
			if d := axialDist(u, axes[a]); d > fd {
				far, fd = u, d
			}
		}
	}
	return far
}

// order renumbers the sets by weighted size, largest first, and puts each
// axis in the lower hemisphere.
func order(c Clustering, weights []float64) Clustering {
	size := make([]float64, len(c.Axes))
	for i, a := range c.Assign {
		if a >= 0 {
			w := 1.0
			if weights != nil {
				w = weights[i]
			}
			size[a] += w
		}
	}
	idx := make([]int, len(c.Axes))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(a, b int) bool { return size[idx[a]] > size[idx[b]] })
	rank := make([]int, len(idx))
	axes := make([]r3.Vec, len(idx))
	for r, i := range idx {
		rank[i] = r
		a := c.Axes[i]
		if a.Z < 0 {
			a = r3.Scale(-1, a)
		}
		axes[r] = a
	}
	for i, a := range c.Assign {
		if a >= 0 {
			c.Assign[i] = rank[a]
		}
	}
	c.Axes = axes
	return c
}
