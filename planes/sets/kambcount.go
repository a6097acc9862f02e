package sets

import (
	"math"
	"slices"

	"gonum.org/v1/gonum/spatial/r3"
)

// KambCounter is Kamb.Density for many axes over the same readings: the
// readings are sorted once into the cells of a cubic grid over [−1, 1]³, and
// each count visits only the cells that the counting cone about the axis
// (and about its opposite) can reach, testing each reading there exactly as
// Kamb.Density does. A density field of G nodes then costs O(G + N) for N
// readings instead of O(G·N): a cone holds E = N·A = 9N/(N + 9) < 9 readings
// of a uniform scatter, and the cells are no smaller than the cone.
//
// The count is the same as Kamb.Density's, to the last bit: a reading is in
// the cone when |axis·n| ≥ cos θ, the same test, and with weights the
// weights of the readings in the cone are added in input order. A reading
// whose length differs from 1 by more than 1e-12 (the grid search assumes
// unit readings) is tested at every axis. A KambCounter is read-only: it may
// be shared by goroutines.
type KambCounter struct {
	k       Kamb
	weights []float64
	m       int     // cells along each side
	h       float64 // side of a cell
	reach   float64 // chord from the axis to the rim of the cone, with a margin
	start   []int32 // readings of cell c: pts[start[c]:start[c+1]]
	pts     []r3.Vec
	index   []int32 // input index of each of pts
	rest    []int32 // readings tested at every axis, with their vectors
	restPts []r3.Vec
}

// NewKambCounter prepares the counting k over normals (weights nil for
// none; else one per reading). It panics if the lengths differ.
func NewKambCounter(k Kamb, normals []r3.Vec, weights []float64) *KambCounter {
	if weights != nil && len(weights) != len(normals) {
		panic("sets: NewKambCounter with different numbers of normals and weights")
	}
	if len(normals) > math.MaxInt32 {
		panic("sets: NewKambCounter with more than 2³¹ − 1 readings")
	}
	// |a − n|² = 2 − 2 a·n for unit a and n, so a·n ≥ cos θ puts n within
	// the chord √(2 − 2 cos θ) of a; the margin covers the rounding of the
	// dot product and of the lengths.
	reach := math.Sqrt(2-2*k.cos+1e-9) + 1e-9
	m := max(1, min(128, int(2/reach)))
	c := &KambCounter{k: k, weights: weights, m: m, h: 2 / float64(m), reach: reach}
	cell := make([]int32, len(normals))
	count := make([]int32, m*m*m+1)
	for i, n := range normals {
		if l := r3.Norm(n); !(math.Abs(l-1) <= 1e-12) {
			cell[i] = -1
			c.rest = append(c.rest, int32(i))
			c.restPts = append(c.restPts, n)
			continue
		}
		x, y, z := c.cellOf(n.X), c.cellOf(n.Y), c.cellOf(n.Z)
		cell[i] = int32((x*m+y)*m + z)
		count[cell[i]+1]++
	}
	for j := 1; j < len(count); j++ {
		count[j] += count[j-1]
	}
	c.start = slices.Clone(count)
	c.pts = make([]r3.Vec, len(normals)-len(c.rest))
	c.index = make([]int32, len(c.pts))
	for i, n := range normals { // counting sort: input order within a cell
		if cell[i] < 0 {
			continue
		}
		at := count[cell[i]]
		count[cell[i]]++
		c.pts[at], c.index[at] = n, int32(i)
	}
	return c
}

// cellOf is the cell along one side holding coordinate v (clamped).
func (c *KambCounter) cellOf(v float64) int {
	return max(0, min(c.m-1, int(math.Floor((v+1)/c.h))))
}

// Kamb returns the counting.
func (c *KambCounter) Kamb() Kamb { return c.k }

// Density returns Kamb.Density(axis, normals, weights) of the readings
// given to NewKambCounter. scratch is a buffer for the indexes of the
// weighted readings in the cone, returned for reuse (nil is fine); without
// weights it is not used. Allocation-free once scratch has grown.
func (c *KambCounter) Density(axis r3.Vec, scratch []int32) (float64, []int32) {
	axis = r3.Unit(axis)
	in := scratch[:0]
	n := 0.0 // unweighted count, as Kamb.Density keeps it
	test := func(p r3.Vec, i int32) {
		if math.Abs(r3.Dot(axis, p)) >= c.k.cos {
			if c.weights == nil {
				n++
			} else {
				in = append(in, i)
			}
		}
	}
	if !math.IsNaN(axis.X + axis.Y + axis.Z) {
		lo, hi := c.box(axis)
		alo, ahi := c.box(r3.Scale(-1, axis))
		if lo[0] <= ahi[0] && alo[0] <= hi[0] && lo[1] <= ahi[1] && alo[1] <= hi[1] && lo[2] <= ahi[2] && alo[2] <= hi[2] {
			for d := range 3 { // the boxes overlap: search their hull once
				lo[d], hi[d] = min(lo[d], alo[d]), max(hi[d], ahi[d])
			}
			c.search(lo, hi, test)
		} else {
			c.search(lo, hi, test)
			c.search(alo, ahi, test)
		}
	}
	for j, i := range c.rest {
		test(c.restPts[j], i)
	}
	if c.weights == nil {
		return n / c.k.Sigma, in
	}
	slices.Sort(in)
	w := 0.0
	for _, i := range in {
		w += c.weights[i]
	}
	return w / c.k.Sigma, in
}

// box returns the cells (lowest, highest along each side) that the ball of
// radius reach about the unit vector a can reach.
func (c *KambCounter) box(a r3.Vec) (lo, hi [3]int) {
	for d, v := range [3]float64{a.X, a.Y, a.Z} {
		lo[d], hi[d] = c.cellOf(v-c.reach), c.cellOf(v+c.reach)
	}
	return lo, hi
}

// search calls test for every reading in the cells from lo to hi.
func (c *KambCounter) search(lo, hi [3]int, test func(r3.Vec, int32)) {
	m := c.m
	for x := lo[0]; x <= hi[0]; x++ {
		for y := lo[1]; y <= hi[1]; y++ {
			row := (x*m + y) * m // the cells along z follow each other
			for t := c.start[row+lo[2]]; t < c.start[row+hi[2]+1]; t++ {
				test(c.pts[t], c.index[t])
			}
		}
	}
}

// sum returns Σ wᵢ·f(|axis·nᵢ|) over the readings within the cone (weights
// 1 when none), for weightings that vanish outside it.
func (c *KambCounter) sum(axis r3.Vec, f func(float64) float64) float64 {
	axis = r3.Unit(axis)
	total := 0.0
	add := func(p r3.Vec, i int32) {
		if d := math.Abs(r3.Dot(axis, p)); d >= c.k.cos {
			w := f(d)
			if c.weights != nil {
				w *= c.weights[i]
			}
			total += w
		}
	}
	if !math.IsNaN(axis.X + axis.Y + axis.Z) {
		lo, hi := c.box(axis)
		alo, ahi := c.box(r3.Scale(-1, axis))
		if lo[0] <= ahi[0] && alo[0] <= hi[0] && lo[1] <= ahi[1] && alo[1] <= hi[1] && lo[2] <= ahi[2] && alo[2] <= hi[2] {
			for d := range 3 {
				lo[d], hi[d] = min(lo[d], alo[d]), max(hi[d], ahi[d])
			}
			c.search(lo, hi, add)
		} else {
			c.search(lo, hi, add)
			c.search(alo, ahi, add)
		}
	}
	for j, i := range c.rest {
		add(c.restPts[j], i)
	}
	return total
}
