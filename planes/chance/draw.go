package chance

import (
	"fmt"
	"math/rand/v2"

	"gonum.org/v1/gonum/mat"
)

// Pair asks Draw for a rank (Spearman) correlation Rho ∈ (−1, 1) between
// inputs A and B, given by their 0-based index in the dists of Draw.
type Pair struct {
	A, B int
	Rho  float64
}

// Draw returns n realisations of the inputs dists as an n × k matrix, row i
// being realisation i and column j input j, for the given seed.
//
// Sampling: column j is dists[j].Quantile of n independent uniforms on
// (0, 1) from the ChaCha8 stream keyed by (seed, j) (simple random sampling;
// no Latin hypercube), so a column does not depend on the other inputs
// unless it is named in a pair.
//
// Correlation: the m inputs named in pairs are reordered by the method of
// Iman & Conover (1982) so that their sample rank correlations approach
// the target C (1 on the diagonal, Rho for each pair, 0 for two of them not
// paired: those zeros are targets too); the other inputs keep their
// independent draws. Each column of an n × m score matrix R is a random
// permutation of the van der Waerden scores Φ⁻¹(i/(n + 1)), i = 1…n; with
// E = QᵀQ the Cholesky factorisation of the correlation of R and C′ = PᵀP
// that of the target, the columns of R·Q⁻¹·P have Pearson correlation
// exactly C′, and each input column is rearranged to have their ranks. The
// values of every column (its marginal sample) are unchanged. Because
// normal scores with Pearson correlation r have rank correlation
// (6/π)·asin(r/2) (Pearson 1907; Kruskal 1958), the Pearson target is
// C′ᵢⱼ = 2·sin(π·Cᵢⱼ/6), which makes the rank correlation, not the score
// correlation, match the request.
//
// Errors: a bad pair (index out of range, an input paired with itself, a
// pair given twice, Rho not in (−1, 1)) or a target C (ErrNotPosDef) or C′
// (ErrNoScores) that is not positive definite is a *CorrelationError naming
// the pair; n ≤ m returns ErrRealisations. Draw panics if dists is empty or n < 1.
// Draw is serial and deterministic: the same arguments give the same
// matrix on any machine with the same float64 arithmetic.
func Draw(dists []Dist, pairs []Pair, n int, seed uint64) (*mat.Dense, error) {
	k := len(dists)
	if k == 0 {
		panic("chance: Draw with no inputs")
	}
	if n < 1 {
		panic("chance: Draw with fewer than one realisation")
	}
	var (
		cols   []int
		target *mat.Cholesky
	)
	if len(pairs) > 0 {
		var err error
		if cols, target, err = targetFactor(k, pairs); err != nil {
			return nil, err
		}
		if n <= len(cols) {
			return nil, fmt.Errorf("%w: %d realisations for %d correlated inputs", ErrRealisations, n, len(cols))
		}
	}
	x := mat.NewDense(n, k, nil)
	raw := x.RawMatrix()
	var src rand.ChaCha8
	for j, d := range dists {
		src.Seed(key(seed, purposeInput, uint64(j)))
		for i := range n {
			raw.Data[i*raw.Stride+j] = d.Quantile(openUniform(&src))
		}
	}
	if target != nil {
		if !rearrange(raw.Data, n, raw.Stride, cols, target, seed) {
			return nil, fmt.Errorf("%w: score correlation singular with %d realisations for %d correlated inputs", ErrRealisations, n, len(cols))
		}
	}
	return x, nil
}
