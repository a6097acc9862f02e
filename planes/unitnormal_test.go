package planes

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestFromUnitNormalAgreesWithFromNormal(t *testing.T) {
	// Property: the algebraic construction gives the plane that the
	// trend/plunge route (FromNormal, by way of geom.LineOf) gives, for
	// seeded random normals of both senses and the special directions.
	const (
		tol    = 1e-9 // degrees and vector components
		minDip = 1e-6 // degrees: a flatter plane's dip direction is arbitrary
	)
	rng := rand.New(rand.NewPCG(12, 1))
	normals := []r3.Vec{{Z: 1}, {Z: -1}, {X: 1}, {Y: -1}, {X: -1}, {X: math.Sqrt(0.5), Y: math.Sqrt(0.5)}}
	for range 2000 {
		v := r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}
		normals = append(normals, r3.Unit(v))
	}
	for i, n := range normals {
		want, got := FromNormal(n), FromUnitNormal(n)
		same := func(a, b r3.Vec) bool {
			return scalar.EqualWithinAbs(a.X, b.X, tol) && scalar.EqualWithinAbs(a.Y, b.Y, tol) && scalar.EqualWithinAbs(a.Z, b.Z, tol)
		}
		dd := math.Abs(got.DipDirection() - want.DipDirection())
		dd = math.Min(dd, 360-dd)
		if !scalar.EqualWithinAbs(got.Dip(), want.Dip(), tol) || (want.Dip() > minDip && dd > tol) ||
			!same(got.Normal(), want.Normal()) || !same(got.StrikeVec(), want.StrikeVec()) || !same(got.UpDip(), want.UpDip()) {
			t.Fatalf("normal %d %v: FromUnitNormal %v (pole %v, strike %v), FromNormal %v (pole %v, strike %v)",
				i, n, got, got.Normal(), got.StrikeVec(), want, want.Normal(), want.StrikeVec())
		}
	}
}

func BenchmarkFromUnitNormal(b *testing.B) {
	n := r3.Unit(r3.Vec{X: 0.3, Y: -0.4, Z: 0.8})
	var sink float64
	for b.Loop() {
		sink += FromUnitNormal(n).Dip()
	}
	_ = sink
}
