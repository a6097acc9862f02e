package insitu

import (
	"cleft/insitu/geom"

	"fmt"
	"math"
	"sort"

	"gonum.org/v1/gonum/mat"
	"gonum.org/v1/gonum/spatial/r3"
)

// Principal holds the principal stresses, Values[0] = σ1 ≥ Values[1] = σ2 ≥
// Values[2] = σ3 (MPa, compression positive), and their unit axes in the NED
// frame, forming a right-handed triad.
type Principal struct {
	Values [3]float64
	Axes   [3]r3.Vec
}

// Axis returns the lower-hemisphere trend and plunge of principal axis i
// (0 for σ1, 1 for σ2, 2 for σ3).
func (p Principal) Axis(i int) geom.Line {
	if i < 0 || i > 2 {
		panic(fmt.Sprintf("insitu: principal axis index %d out of range [0, 2]", i))
	}
	return geom.LineOf(p.Axes[i])
}

// Tensor returns the stress tensor with these principal values and axes:
//
//	σ = Σ σi·ai aiᵀ
func (p Principal) Tensor() Tensor {
	var t Tensor
	for i, a := range p.Axes {
		s := p.Values[i]
		t.NN += s * a.X * a.X
		t.EE += s * a.Y * a.Y
		t.DD += s * a.Z * a.Z
		t.NE += s * a.X * a.Y
		t.ND += s * a.X * a.Z
		t.ED += s * a.Y * a.Z
	}
	return t
}

// Shape returns the shape ratio φ = (σ2 − σ3)/(σ1 − σ3) ∈ [0, 1]. It returns
// NaN when σ1 = σ3 (an isotropic state has no shape).
func (p Principal) Shape() float64 {
	d := p.Values[0] - p.Values[2]
	if !(d > isoTol*p.scale()) {
		return math.NaN()
	}
	return (p.Values[1] - p.Values[2]) / d
}

// Isotropic reports whether σ1 and σ3 are equal to within a relative 1e-12.
func (p Principal) Isotropic() bool {
	return !(p.Values[0]-p.Values[2] > isoTol*p.scale())
}

func (p Principal) scale() float64 {
	return math.Max(math.Abs(p.Values[0]), math.Abs(p.Values[2]))
}

// isoTol is the relative difference below which σ1 and σ3 count as equal.
const isoTol = 1e-12

// AxisFit reports how far three given principal axes were from mutually
// orthogonal, and by how much the orthogonalised axes moved.
type AxisFit struct {
	// Misfit is the largest departure from 90° of the angle between any two of
	// the given axes, in degrees.
	Misfit float64
	// Moved is the largest angle, in degrees, between a given axis and its
	// orthogonalised replacement. Zero when the axes were orthogonal.
	Moved float64
}

// MaxAxisMisfit is the largest departure from mutual orthogonality, in degrees,
// that FromPrincipal accepts and corrects.
const MaxAxisMisfit = 2.0

// FromPrincipal returns the tensor with principal magnitudes mags (MPa, any
// order) along the axes (trend/plunge, any hemisphere). Axes up to
// MaxAxisMisfit from mutually orthogonal are replaced by the nearest
// orthogonal triad (the polar factor of the matrix of axes, which treats the
// three alike) and the correction is reported in AxisFit; a larger misfit is
// an error.
func FromPrincipal(mags [3]float64, axes [3]geom.Line) (Principal, AxisFit, error) {
	var fit AxisFit
	var v [3]r3.Vec
	for i, a := range axes {
		if bad(a.Trend) || bad(a.Plunge) {
			return Principal{}, fit, fmt.Errorf("axis %d trend/plunge %v/%v: want finite numbers", i+1, a.Trend, a.Plunge)
		}
		if math.IsNaN(mags[i]) || math.IsInf(mags[i], 0) {
			return Principal{}, fit, fmt.Errorf("magnitude %d is %v: want a finite number", i+1, mags[i])
		}
		v[i] = a.Vec()
	}
	for i := range 3 {
		for j := i + 1; j < 3; j++ {
			d := math.Abs(90 - geom.Angle(v[i], v[j]))
			fit.Misfit = math.Max(fit.Misfit, d)
		}
	}
	if fit.Misfit > MaxAxisMisfit {
		return Principal{}, fit, fmt.Errorf("principal axes are %.2f° from mutually orthogonal: at most %g° is allowed", fit.Misfit, MaxAxisMisfit)
	}
	o := orthogonalise(v)
	for i := range 3 {
		fit.Moved = math.Max(fit.Moved, geom.Angle(v[i], o[i]))
	}
	idx := []int{0, 1, 2}
	sort.SliceStable(idx, func(a, b int) bool { return mags[idx[a]] > mags[idx[b]] })
	var p Principal
	for k, i := range idx {
		p.Values[k] = mags[i]
		p.Axes[k] = o[i]
	}
	if r3.Dot(r3.Cross(p.Axes[0], p.Axes[1]), p.Axes[2]) < 0 {
		p.Axes[2] = r3.Scale(-1, p.Axes[2])
	}
	return p, fit, nil
}

func bad(x float64) bool { return math.IsNaN(x) || math.IsInf(x, 0) }

// orthogonalise returns the orthonormal triad nearest to v in the Frobenius
// sense: with A the matrix whose columns are v and A = U Σ Vᵀ, it is U Vᵀ.
// Each output keeps the sense of its input.
func orthogonalise(v [3]r3.Vec) [3]r3.Vec {
	a := mat.NewDense(3, 3, nil)
	for j := range 3 {
		a.Set(0, j, v[j].X)
		a.Set(1, j, v[j].Y)
		a.Set(2, j, v[j].Z)
	}
	var svd mat.SVD
	if !svd.Factorize(a, mat.SVDFull) {
		panic("insitu: SVD of principal axes failed")
	}
	var u, vt mat.Dense
	svd.UTo(&u)
	svd.VTo(&vt)
	var q mat.Dense
	q.Mul(&u, vt.T())
	var o [3]r3.Vec
	for j := range 3 {
		o[j] = r3.Unit(r3.Vec{X: q.At(0, j), Y: q.At(1, j), Z: q.At(2, j)})
	}
	return o
}
