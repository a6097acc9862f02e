package sets

import (
	"math"
	"math/rand/v2"
	"sort"

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
		panic("planes: Cluster needs 1 ≤ K ≤ number of readings")
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
	rng := rand.New(rand.NewPCG(0x5e7, 0xc1e))
	var best Clustering
	bestCost := math.Inf(1)
	for range 10 {
		c, cost := refine(unit, seedPlusPlus(unit, k, rng), o)
		if cost < bestCost {
			best, bestCost = c, cost
		}
	}
	return order(best, o.Weights)
}

// seedPlusPlus draws k starting axes, each new one with probability
// proportional to its misfit from the nearest already drawn.
func seedPlusPlus(unit []r3.Vec, k int, rng *rand.Rand) []r3.Vec {
	axes := []r3.Vec{unit[rng.IntN(len(unit))]}
	d := make([]float64, len(unit))
	for len(axes) < k {
		total := 0.0
		for i, u := range unit {
			d[i] = math.Inf(1)
			for _, a := range axes {
				d[i] = math.Min(d[i], axialDist(u, a))
			}
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
	cost := 0.0
	for range 100 {
		changed := false
		cost = 0
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
			cost += w(i) * (1 - bd*bd)
			if best != assign[i] {
				assign[i] = best
				changed = true
			}
		}
		if !changed {
			break
		}
		for j := range axes {
			var members []r3.Vec
			var ws []float64
			for i, u := range unit {
				if assign[i] == j {
					members = append(members, u)
					ws = append(ws, w(i))
				}
			}
			if len(members) == 0 {
				axes[j] = worstFit(unit, axes, assign)
				continue
			}
			axes[j] = OrientationTensor(members, ws).Axes[0]
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

// Silhouette returns the mean silhouette width (Rousseeuw 1987) of a
// clustering, with the axial angle in degrees as the distance: for each
// assigned reading, s = (b − a)/max(a, b), a its mean angle to the other
// members of its set, b the least mean angle to the members of another set.
// Readings in sets of one count 0. Unassigned readings are left out. At most
// limit readings (spread evenly through the input) are used, since the cost
// grows with the square of their number. NaN for fewer than two sets.
func Silhouette(normals []r3.Vec, c Clustering, limit int) float64 {
	if len(c.Axes) < 2 {
		return math.NaN()
	}
	var idx []int
	for i, a := range c.Assign {
		if a >= 0 {
			idx = append(idx, i)
		}
	}
	if limit > 0 && len(idx) > limit {
		step := float64(len(idx)) / float64(limit)
		sub := make([]int, limit)
		for i := range sub {
			sub[i] = idx[int(float64(i)*step)]
		}
		idx = sub
	}
	k := len(c.Axes)
	sum := 0.0
	sums := make([]float64, k)
	counts := make([]int, k)
	for _, i := range idx {
		counts[c.Assign[i]]++
	}
	for _, i := range idx {
		for j := range sums {
			sums[j] = 0
		}
		u := r3.Unit(normals[i])
		for _, m := range idx {
			if m == i {
				continue
			}
			d := math.Acos(math.Min(1, math.Abs(r3.Dot(u, r3.Unit(normals[m])))))
			sums[c.Assign[m]] += d
		}
		own := c.Assign[i]
		if counts[own] < 2 {
			continue
		}
		a := sums[own] / float64(counts[own]-1)
		b := math.Inf(1)
		for j := range sums {
			if j != own && counts[j] > 0 {
				b = math.Min(b, sums[j]/float64(counts[j]))
			}
		}
		if m := math.Max(a, b); m > 0 && !math.IsInf(b, 1) {
			sum += (b - a) / m
		}
	}
	return sum / float64(len(idx))
}

// ChooseK picks the number of sets for automatic clustering: it clusters
// with K = 2 … kmax and keeps the K of the largest mean silhouette width
// (Rousseeuw 1987). When no K reaches 0.25, which Kaufman & Rousseeuw (1990)
// read as no substantial structure, it returns 1. scores[K] holds each
// width (scores[0] and scores[1] are NaN).
func ChooseK(normals []r3.Vec, o ClusterOptions, kmax int) (k int, scores []float64) {
	kmax = min(kmax, len(normals)-1)
	scores = []float64{math.NaN(), math.NaN()}
	k, best := 1, 0.25
	for kk := 2; kk <= kmax; kk++ {
		oo := o
		oo.K, oo.Seeds = kk, nil
		s := Silhouette(normals, Cluster(normals, oo), 2000)
		scores = append(scores, s)
		if s > best {
			k, best = kk, s
		}
	}
	return k, scores
}
