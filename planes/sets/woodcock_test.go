package sets

import (
	"math/rand/v2"
	"testing"

	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestRawAndWeightedWoodcock(t *testing.T) {
	// Issue 11, item 8: with weights, the raw Woodcock (1977) K and C must
	// stay those of the unweighted readings, the weighted ones beside them.
	// Checks: (1) the raw tensor of a weighted grouping equals that of the
	// same grouping without weights; (2) the weighted tensor with whole
	// weights equals the raw tensor of the readings repeated that many
	// times (derived from T = Σ wᵢ nᵢnᵢᵀ / Σ wᵢ); (3) the two differ. Seeded
	// Fisher samples of three sets, seeds fixed so that the sets are the same.
	const tol = 1e-9
	rng := rand.New(rand.NewPCG(61, 62))
	ps, _, _ := threeSets(rng)
	w := make([]float64, len(ps))
	var rep []r3.Vec
	for i := range ps {
		w[i] = float64(1 + rng.IntN(4))
		for range int(w[i]) {
			rep = append(rep, ps[i])
		}
	}
	o := Options{Seeds: []r3.Vec{planes.MustNew(75, 140).Normal(), planes.MustNew(20, 250).Normal(), planes.MustNew(85, 10).Normal()}}
	weighted, plain, repeated := Analyse(ps, w, o), Analyse(ps, nil, o), Analyse(rep, nil, o)
	if len(weighted.Sets) != 3 || len(plain.Sets) != 3 || len(repeated.Sets) != 3 {
		t.Fatalf("sets: %d, %d, %d; want 3", len(weighted.Sets), len(plain.Sets), len(repeated.Sets))
	}
	for i := range ps {
		if weighted.Assign[i] != plain.Assign[i] {
			t.Fatalf("reading %d: set %d weighted, %d unweighted", i, weighted.Assign[i], plain.Assign[i])
		}
	}
	const differTol = 1e-3 // relative: a smaller change is not counted as one
	differ := 0
	for k := range 3 {
		wt, pl, rp := weighted.Sets[k], plain.Sets[k], repeated.Sets[k]
		t.Run(Name(k), func(t *testing.T) {
			if !scalar.EqualWithinAbsOrRel(wt.RawTensor.WoodcockK(), pl.RawTensor.WoodcockK(), tol, tol) ||
				!scalar.EqualWithinAbsOrRel(wt.RawTensor.WoodcockC(), pl.RawTensor.WoodcockC(), tol, tol) {
				t.Errorf("raw K, C %v, %v with weights; %v, %v without", wt.RawTensor.WoodcockK(), wt.RawTensor.WoodcockC(), pl.RawTensor.WoodcockK(), pl.RawTensor.WoodcockC())
			}
			if !scalar.EqualWithinAbsOrRel(wt.Tensor.WoodcockK(), rp.RawTensor.WoodcockK(), tol, tol) ||
				!scalar.EqualWithinAbsOrRel(wt.Tensor.WoodcockC(), rp.RawTensor.WoodcockC(), tol, tol) {
				t.Errorf("weighted K, C %v, %v; the repeated readings give %v, %v", wt.Tensor.WoodcockK(), wt.Tensor.WoodcockC(), rp.RawTensor.WoodcockK(), rp.RawTensor.WoodcockC())
			}
			if pl.Tensor != pl.RawTensor {
				t.Errorf("unweighted: weighted tensor %v differs from the raw %v", pl.Tensor, pl.RawTensor)
			}
		})
		if !scalar.EqualWithinRel(wt.Tensor.WoodcockK(), wt.RawTensor.WoodcockK(), differTol) {
			differ++
		}
	}
	if differ == 0 {
		t.Error("the weights changed no set's Woodcock K: the test cannot tell raw from weighted")
	}
}
