package chance

import (
	"math"
	"math/bits"
	"math/rand/v2"
	"slices"

	"gonum.org/v1/gonum/mat"
)

// targetFactor checks pairs against k inputs and returns the inputs they
// name, ascending, and the Cholesky factor of the Pearson target
// C′ᵢⱼ = 2·sin(π·Cᵢⱼ/6) of the rank-correlation matrix C among those inputs.
// Both C and C′ are built pair by pair, so that a failure names the first
// pair that makes the matrix not positive definite.
func targetFactor(k int, pairs []Pair) (cols []int, chol *mat.Cholesky, err error) {
	seen := make(map[[2]int]bool, len(pairs))
	for p, c := range pairs {
		bad := func(e error) error { return &CorrelationError{Pair: p, A: c.A, B: c.B, Rho: c.Rho, Err: e} }
		switch {
		case c.A < 0 || c.A >= k || c.B < 0 || c.B >= k:
			return nil, nil, bad(ErrIndex)
		case c.A == c.B:
			return nil, nil, bad(ErrSelf)
		case !(c.Rho > -1 && c.Rho < 1):
			return nil, nil, bad(ErrRho)
		}
		ab := [2]int{min(c.A, c.B), max(c.A, c.B)}
		if seen[ab] {
			return nil, nil, bad(ErrDuplicate)
		}
		seen[ab] = true
		cols = append(cols, c.A, c.B)
	}
	slices.Sort(cols)
	cols = slices.Compact(cols)
	at := func(j int) int { i, _ := slices.BinarySearch(cols, j); return i }
	m := len(cols)
	chol = new(mat.Cholesky)
	for _, pearson := range []bool{false, true} {
		c := mat.NewSymDense(m, nil)
		for i := range m {
			c.SetSym(i, i, 1)
		}
		for p, pr := range pairs {
			r := pr.Rho
			if pearson {
				r = 2 * math.Sin(math.Pi*r/6)
			}
			c.SetSym(at(pr.A), at(pr.B), r)
			if !chol.Factorize(c) {
				e := ErrNotPosDef
				if pearson {
					e = ErrNoScores
				}
				return nil, nil, &CorrelationError{Pair: p, A: pr.A, B: pr.B, Rho: pr.Rho, Err: e}
			}
		}
	}
	return cols, chol, nil
}

// rearrange reorders the columns cols of the n × stride row-major x to the
// ranks of the Iman–Conover scores R·Q⁻¹·P, P the upper Cholesky factor of
// target (over cols). It reports false if the scores' correlation is not
// positive definite.
func rearrange(x []float64, n, stride int, cols []int, target *mat.Cholesky, seed uint64) bool {
	k := len(cols)
	scores := make([]float64, n)
	for i := range scores {
		scores[i] = normalQuantile(float64(i+1) / float64(n+1))
	}
	r := make([]float64, n*k)
	perm := make([]float64, n)
	var src rand.ChaCha8
	for j, col := range cols {
		src.Seed(key(seed, purposeScores, uint64(col)))
		copy(perm, scores)
		for i := n - 1; i > 0; i-- { // Fisher–Yates
			hi, _ := bits.Mul64(src.Uint64(), uint64(i+1))
			perm[i], perm[hi] = perm[hi], perm[i]
		}
		for i, v := range perm {
			r[i*k+j] = v
		}
	}
	var e mat.Cholesky
	if !e.Factorize(correlation(r, n, k)) {
		return false
	}
	var q, p, qi mat.TriDense
	e.UTo(&q)
	target.UTo(&p)
	if qi.InverseTri(&q) != nil {
		return false
	}
	t := make([]float64, k*k) // T = Q⁻¹·P, upper triangular
	for i := range k {
		for j := i; j < k; j++ {
			s := 0.0
			for l := i; l <= j; l++ {
				s += qi.At(i, l) * p.At(l, j)
			}
			t[i*k+j] = s
		}
	}
	row := make([]float64, k)
	for i := range n {
		ri := r[i*k : i*k+k]
		for j := range k {
			s := 0.0
			for l := 0; l <= j; l++ {
				s += ri[l] * t[l*k+j]
			}
			row[j] = s
		}
		copy(ri, row)
	}
	type keyed struct {
		v float64
		i int32
	}
	order := make([]keyed, n)
	vals := make([]float64, n)
	for j, col := range cols {
		for i := range n {
			order[i] = keyed{r[i*k+j], int32(i)}
			vals[i] = x[i*stride+col]
		}
		slices.SortFunc(order, func(a, b keyed) int { // scores are never NaN
			switch {
			case a.v < b.v:
				return -1
			case a.v > b.v:
				return 1
			}
			return int(a.i - b.i)
		})
		slices.Sort(vals)
		for rank, o := range order {
			x[int(o.i)*stride+col] = vals[rank]
		}
	}
	return true
}

// correlation returns the Pearson correlation matrix of the columns of the
// n × k row-major r, by plain serial sums.
func correlation(r []float64, n, k int) *mat.SymDense {
	mean := make([]float64, k)
	for i := range n {
		for j := range k {
			mean[j] += r[i*k+j]
		}
	}
	for j := range mean {
		mean[j] /= float64(n)
	}
	cov := make([]float64, k*k)
	for i := range n {
		ri := r[i*k : i*k+k]
		for a := range k {
			da := ri[a] - mean[a]
			for b := a; b < k; b++ {
				cov[a*k+b] += da * (ri[b] - mean[b])
			}
		}
	}
	c := mat.NewSymDense(k, nil)
	for a := range k {
		for b := a; b < k; b++ {
			c.SetSym(a, b, cov[a*k+b]/math.Sqrt(cov[a*k+a]*cov[b*k+b]))
		}
	}
	return c
}
