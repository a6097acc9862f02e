package geom

import (
	"math"

	"gonum.org/v1/gonum/mat"
	"gonum.org/v1/gonum/spatial/r3"
)

// Sym3 is a symmetric 3 × 3 tensor by its six distinct components.
type Sym3 struct {
	XX, YY, ZZ, XY, XZ, YZ float64
}

// EigenDescending returns the eigenvalues of t in descending order,
// values[0] ≥ values[1] ≥ values[2], with unit eigenvectors forming a
// right-handed triad (the third is flipped if needed, so the axes are a
// proper rotation). gonum's mat.EigenSym gives ascending order; this is the
// one place in cleft where that order is reversed. ok is false for
// non-finite input, when the decomposition fails. It allocates: call it
// once per tensor, not in a loop over planes.
func EigenDescending(t Sym3) (values [3]float64, vectors [3]r3.Vec, ok bool) {
	for _, v := range [...]float64{t.XX, t.YY, t.ZZ, t.XY, t.XZ, t.YZ} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return values, vectors, false
		}
	}
	var e mat.EigenSym
	if !e.Factorize(mat.NewSymDense(3, []float64{
		t.XX, t.XY, t.XZ,
		t.XY, t.YY, t.YZ,
		t.XZ, t.YZ, t.ZZ,
	}), true) {
		return values, vectors, false
	}
	vals := e.Values(nil)
	var vecs mat.Dense
	e.VectorsTo(&vecs)
	for i := range 3 {
		j := 2 - i
		values[i] = vals[j]
		vectors[i] = r3.Vec{X: vecs.At(0, j), Y: vecs.At(1, j), Z: vecs.At(2, j)}
	}
	if r3.Dot(r3.Cross(vectors[0], vectors[1]), vectors[2]) < 0 {
		vectors[2] = r3.Scale(-1, vectors[2])
	}
	return values, vectors, true
}
