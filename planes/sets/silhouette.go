package sets

import (
	"math"
	"runtime"
	"sync"

	"gonum.org/v1/gonum/spatial/r3"
)

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
	return newAngles(normals, c.Assign, limit).silhouette(c)
}

// angles are the axial angles between the readings a silhouette is
// computed from: the assigned ones, at most limit of them spread evenly.
// ChooseK computes them once for every number of sets it tries (they do not
// depend on the grouping when no reading is left unassigned).
type angles struct {
	idx []int     // the readings, input indexes
	d   []float64 // len(idx)², row-major; symmetric
}

func newAngles(normals []r3.Vec, assign []int, limit int) *angles {
	var idx []int
	for i, a := range assign {
		if a >= 0 {
			idx = append(idx, i)
		}
	}
	if limit > 0 && len(idx) > limit {
		idx = spread(idx, limit)
	}
	n := len(idx)
	unit := make([]r3.Vec, n)
	for m, i := range idx {
		unit[m] = r3.Unit(normals[i])
	}
	a := &angles{idx: idx, d: make([]float64, n*n)}
	// Rows in parallel; each angle is computed once, for (m, l) with
	// l > m, and copied to (l, m): u·v and v·u are the same to the bit.
	parallel(n, func(m int) {
		u := unit[m]
		for l := m + 1; l < n; l++ {
			a.d[m*n+l] = math.Acos(math.Min(1, math.Abs(r3.Dot(u, unit[l]))))
		}
	})
	for m := range n {
		for l := range m {
			a.d[m*n+l] = a.d[l*n+m]
		}
	}
	return a
}

// silhouette is Silhouette of c over the readings of a.
func (a *angles) silhouette(c Clustering) float64 {
	k := len(c.Axes)
	n := len(a.idx)
	counts := make([]int, k)
	set := make([]int, n)
	for m, i := range a.idx {
		set[m] = c.Assign[i]
		counts[set[m]]++
	}
	// Each reading's width in parallel; summed in input order afterwards.
	width := make([]float64, n)
	parallel(n, func(m int) {
		var buf [12]float64
		sums := buf[:0]
		if k > len(buf) {
			sums = make([]float64, k)
		}
		sums = sums[:k]
		width[m] = silhouetteOf(m, a.d[m*n:(m+1)*n], set, counts, sums)
	})
	sum := 0.0
	for _, s := range width {
		sum += s
	}
	return sum / float64(n)
}

// silhouetteOf is the silhouette width of reading m, given its angles to
// every reading (of sets set): 0 for a reading alone in its set. sums is
// scratch of one element per set.
func silhouetteOf(m int, d []float64, set, counts []int, sums []float64) float64 {
	for n, x := range d {
		if n != m {
			sums[set[n]] += x
		}
	}
	own := set[m]
	if counts[own] < 2 {
		return 0
	}
	a := sums[own] / float64(counts[own]-1)
	b := math.Inf(1)
	for j := range sums {
		if j != own && counts[j] > 0 {
			b = math.Min(b, sums[j]/float64(counts[j]))
		}
	}
	if m := math.Max(a, b); m > 0 && !math.IsInf(b, 1) {
		return (b - a) / m
	}
	return 0
}

// parallel calls f(i) for i in [0, n) on one goroutine per CPU.
func parallel(n int, f func(i int)) {
	next := make(chan int, n)
	for i := range n {
		next <- i
	}
	close(next)
	var wg sync.WaitGroup
	for range runtime.GOMAXPROCS(0) {
		wg.Go(func() {
			for i := range next {
				f(i)
			}
		})
	}
	wg.Wait()
}

// spread returns limit of the items, spread evenly through them.
func spread(items []int, limit int) []int {
	step := float64(len(items)) / float64(limit)
	sub := make([]int, limit)
	for i := range sub {
		sub[i] = items[int(float64(i)*step)]
	}
	return sub
}

// ChooseSample is the number of readings on which ChooseK groups when
// there are more: enough that a set holding 1 % of the readings still has
// 200 of them, which fixes its axis within a few degrees (α95 of 200
// readings with Fisher K = 20 is about 1.3°), and ten times the 2000
// readings that the silhouette itself is computed from.
const ChooseSample = 20000

// ChooseK picks the number of sets for automatic clustering: it clusters
// with K = 2 … kmax and keeps the K of the largest mean silhouette width
// (Rousseeuw 1987). When no K reaches 0.25, which Kaufman & Rousseeuw (1990)
// read as no substantial structure, it returns 1. scores[K] holds each
// width (scores[0] and scores[1] are NaN). With more than ChooseSample
// readings, the groupings are made of ChooseSample of them spread evenly
// through the input (with their weights): the choice then costs the same
// for any number of readings.
func ChooseK(normals []r3.Vec, o ClusterOptions, kmax int) (k int, scores []float64) {
	return chooseK(normals, o, kmax, ChooseSample)
}

// chooseK is ChooseK on at most sample readings.
func chooseK(normals []r3.Vec, o ClusterOptions, kmax, sample int) (k int, scores []float64) {
	if len(normals) > sample {
		idx := make([]int, len(normals))
		for i := range idx {
			idx[i] = i
		}
		idx = spread(idx, sample)
		sub := make([]r3.Vec, len(idx))
		var ws []float64
		if o.Weights != nil {
			ws = make([]float64, len(idx))
		}
		for j, i := range idx {
			sub[j] = normals[i]
			if ws != nil {
				ws[j] = o.Weights[i]
			}
		}
		normals, o.Weights = sub, ws
	}
	kmax = min(kmax, len(normals)-1)
	scores = []float64{math.NaN(), math.NaN()}
	k, best := 1, 0.25
	var ang *angles
	for kk := 2; kk <= kmax; kk++ {
		oo := o
		oo.K, oo.Seeds = kk, nil
		c := Cluster(normals, oo)
		if ang == nil || o.MaxAngle > 0 { // a cut-off changes who is assigned
			ang = newAngles(normals, c.Assign, 2000)
		}
		s := ang.silhouette(c)
		scores = append(scores, s)
		if s > best {
			k, best = kk, s
		}
	}
	return k, scores
}
