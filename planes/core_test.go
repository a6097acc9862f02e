package planes

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu"

	"gonum.org/v1/gonum/spatial/r3"
)

func TestResolveCoreIsResolveTo(t *testing.T) {
	// Property: the lean resolution gives ResolveTo's numbers to the last
	// bit, for seeded random states (some with pore pressure past σ3, so
	// that planes open), orientations of both senses and both criteria.
	rng := rand.New(rand.NewPCG(5, 9))
	bb, _ := NewBartonBandis(10, 80, 30)
	crits := []Criterion{&Coulomb{Mu: 0.6}, &Coulomb{Mu: 0.45, Cohesion: 0.3}, bb}
	same := func(a, b float64) bool { return a == b || (math.IsNaN(a) && math.IsNaN(b)) }
	for i := range 5000 {
		tn, _ := insitu.Components(50*rng.Float64(), 50*rng.Float64(), 50*rng.Float64(), 10*rng.NormFloat64(), 10*rng.NormFloat64(), 10*rng.NormFloat64())
		s := insitu.NewState(tn, 100, 20*rng.Float64(), 1)
		if i%7 == 0 {
			s = insitu.NewState(insitu.Andersonian(30, 20, 25, 40), 100, 5, 0.8) // Andersonian, shear-free planes
		}
		o := MustNew(90*rng.Float64(), 360*rng.Float64())
		if i%11 == 0 {
			o = MustNew(0, 0)
		}
		n := o.Normal()
		if i%2 == 1 {
			n = r3.Scale(-1, n) // the other sense of the same plane
		}
		c := crits[i%len(crits)]
		var full Result
		var core Core
		ResolveTo(&full, &s, &o, c)
		ResolveCore(&core, &s, o.Normal(), c)
		var flipped Core
		ResolveCore(&flipped, &s, n, c)
		if !same(core.EffectiveNormal, full.EffectiveNormal) || !same(core.Shear, full.Shear) || !same(core.SlipTendency, full.SlipTendency) ||
			!same(core.FactorOfSafety, full.FactorOfSafety) || !same(core.PressureToSlip, full.PressureToSlip) || core.State != full.State {
			t.Fatalf("case %d: ResolveCore %+v, ResolveTo %+v", i, core, full)
		}
		const tol = 1e-12 // MPa: the two senses of the normal differ only by rounding
		if math.Abs(flipped.Shear-core.Shear) > tol*(1+core.Shear) || math.Abs(flipped.EffectiveNormal-core.EffectiveNormal) > tol*(1+math.Abs(core.EffectiveNormal)) {
			t.Fatalf("case %d: −n gives %+v, n %+v", i, flipped, core)
		}
	}
}

func BenchmarkResolveCore(b *testing.B) {
	s := insitu.NewState(insitu.Andersonian(30, 20, 25, 40), 100, 5, 1)
	n := MustNew(60, 120).Normal()
	c := &Coulomb{Mu: 0.6}
	var r Core
	for b.Loop() {
		ResolveCore(&r, &s, n, c)
	}
}
