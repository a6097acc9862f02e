package slope

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu/geom"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestPlanarBoltAndSeismic(t *testing.T) {
	const tol = 1e-6
	// Wyllie & Mah (2004), ch. 6 (memory of the form), with a bolt T per
	// metre at ψT below the horizontal and a horizontal seismic α·W:
	//
	//	FS = [cA + (W(cos ψp − α sin ψp) − U − V sin ψp + T sin(ψT + ψp)) tan φ]
	//	   / [W(sin ψp + α cos ψp) + V cos ψp − T cos(ψT + ψp)]
	//
	// Block (derived): H = 20 m, ψf = 60°, ψp = 30°, flat top, crack 5 m
	// deep, γ = 0.026 MN/m³: W = ½γH²{[1 − (z/H)²] cot ψp − cot ψf}
	// = 5.2 × (0.9375 × 1.7320508 − 0.5773503) = 5.4415263 MN/m,
	// A = (H − z)/sin ψp = 30 m.
	b, err := NewPlanarBlock(20, 60, 0, 30, 5, true, 0.026)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name       string
		c, phi, zw float64
		ld         PlanarLoad
		want       float64
	}{
		// zw = 2.5: U = ½·0.00981·2.5·30 = 0.367875, V = ½·0.00981·2.5²
		// = 0.0306563; T = 0.5 at 10°, α = 0.1, c = 0.025, φ = 35°:
		// N = 5.4415263·0.8160254 − 0.367875 − 0.0153281 + 0.5 sin 40°
		// = 4.3786144; numerator 0.75 + 4.3786144·0.7002075 = 3.8159389;
		// denominator 5.4415263·0.5866025 + 0.0265491 − 0.5 cos 40°
		// = 2.8355400; FS = 1.3457538 (derived, by hand).
		{"bolt below the horizontal", 0.025, 35, 2.5, PlanarLoad{Bolt: 0.5, BoltPlunge: 10, Seismic: 0.1}, 1.3457538},
		// zw = 5 (full): U = 0.73575, V = 0.122625; T = 0.3 at −5° (5°
		// upwards), α = 0.15, c = 0, φ = 38°: N = 5.4415263·0.7910254
		// − 0.73575 − 0.0613125 + 0.3 sin 25° = 3.6341083; denominator
		// 5.4415263·0.6299038 + 0.1061963 − 0.3 cos 25° = 3.2619430;
		// FS = 3.6341083·0.7812856/3.2619430 = 0.8704252 (derived, by hand).
		{"bolt rising, dry cohesion", 0, 38, 5, PlanarLoad{Bolt: 0.3, BoltPlunge: -5, Seismic: 0.15}, 0.8704252},
	} {
		t.Run(c.name, func(t *testing.T) {
			if got := b.FSWith(c.c, c.phi, c.zw, c.ld); !scalar.EqualWithinAbs(got, c.want, tol) {
				t.Errorf("FS %v, want %v", got, c.want)
			}
		})
	}
	t.Run("no load is FS", func(t *testing.T) {
		if a, b := b.FSWith(0.02, 33, 3, PlanarLoad{}), b.FS(0.02, 33, 3); a != b {
			t.Errorf("%v ≠ %v", a, b)
		}
	})
}

func TestBoltForTarget(t *testing.T) {
	const (
		tol   = 1e-8
		fsTol = 1e-7 // the wedge's FS after the bolt force put back in
	)
	rng := rand.New(rand.NewPCG(5, 6))
	t.Run("planar", func(t *testing.T) {
		// The bolt force for a target FS, put back in, gives that FS (the
		// FS is continuous in T for a planar block).
		bolted := 0
		defer func() {
			if bolted < 50 {
				t.Errorf("only %d blocks needed a bolt", bolted)
			}
		}()
		for range 200 {
			psiP := 25 + 30*rng.Float64()
			b, err := NewPlanarBlock(10+30*rng.Float64(), psiP+5+20*rng.Float64(), 0, psiP, 0, true, 0.026)
			if err != nil {
				t.Fatal(err)
			}
			ld := PlanarLoad{BoltPlunge: -10 + 40*rng.Float64(), Seismic: 0.2 * rng.Float64()}
			c, phi, target := 0.03*rng.Float64(), 20+20*rng.Float64(), 1.2+0.6*rng.Float64()
			T, ok := b.BoltFor(c, phi, 0, ld, target)
			if !ok {
				t.Fatalf("no bolt force for %+v", b)
			}
			ld.Bolt = T
			if T > 0 {
				bolted++
			}
			if got := b.FSWith(c, phi, 0, ld); T > 0 && !scalar.EqualWithinAbsOrRel(got, target, tol, tol) {
				t.Errorf("T = %v gives FS %v, want %v", T, got, target)
			}
		}
	})
	t.Run("wedge", func(t *testing.T) {
		sl := wedgeSlope()
		bolted := 0
		defer func() {
			if bolted < 30 {
				t.Errorf("only %d wedges needed a bolt", bolted)
			}
		}()
		for _, p := range randomWedges(t, sl, 19, 100, WedgeBoth) {
			w, _ := NewWedgeBlock(sl, p[0], p[1])
			st := Strength{PhiA: 25, PhiB: 30}
			ld := Load{Plunge: 15, Seismic: 0.1}
			if w.Solve(st, w.Saturated/2, ld).Mode == LiftOff {
				continue // floated off both planes: FS jumps from 0 once a bolt holds it down
			}
			T, ok := w.BoltFor(st, w.Saturated/2, ld, 1.5)
			if !ok {
				t.Fatalf("%v %v: no bolt force", p[0], p[1])
			}
			ld.Bolt = T
			if T > 0 {
				bolted++
			}
			r := w.Solve(st, w.Saturated/2, ld)
			// Cohesionless, so FS is continuous across a change of mode.
			if T > 0 && !scalar.EqualWithinAbsOrRel(r.FS, 1.5, fsTol, fsTol) {
				t.Errorf("%v %v: T = %v MN gives FS %v (%v)", p[0], p[1], T, r.FS, r.Mode)
			}
		}
	})
}

func TestWedgeLiftOff(t *testing.T) {
	const tol = 1e-9
	sl := wedgeSlope()
	// A wedge that slides on A alone under its weight, dry and cohesionless,
	// is a planar block on A: FS = tan φA / tan ψA (Hoek & Bray 1981,
	// lecture notes, read), whatever B's strength.
	var w WedgeBlock
	for _, p := range randomWedges(t, sl, 29, 50, WedgeOnFirst) {
		w, _ = NewWedgeBlock(sl, p[0], p[1])
		r := w.Solve(Strength{PhiA: 35, PhiB: 10, CB: 1}, 0, Load{})
		if want := math.Tan(35*geom.Rad) / math.Tan(p[0].Dip()*geom.Rad); r.Mode != WedgeOnFirst || !scalar.EqualWithinAbs(r.FS, want, tol) || r.NB != 0 {
			t.Errorf("%v %v on A alone: %+v, want FS %v", p[0], p[1], r, want)
		}
	}
	// A sideways pull that takes the block off A (a bolt pulling
	// horizontally straight away from A, bigger than the weight) leaves it
	// on B, or nowhere.
	away := r3.Unit(r3.Vec{X: w.NormalA.X, Y: w.NormalA.Y})
	tr := math.Atan2(away.Y, away.X) * geom.Deg
	r := w.Solve(Strength{PhiA: 35, PhiB: 35}, 0, Load{Bolt: 50 * w.Weight, Trend: tr, HasTrend: true})
	if r.Mode == WedgeBoth || r.Mode == WedgeOnFirst || r.NA != 0 {
		t.Errorf("pulled off A: %+v", r)
	}
	// A both-plane wedge with the crack full of water: contact is lost on a
	// plane when its reaction is not positive, and the factor of safety
	// follows the mode, never negative.
	cr := sl
	cr.CrackGiven, cr.Crack = true, 3
	for _, p := range randomWedges(t, cr, 23, 200, WedgeBoth) {
		w, _ := NewWedgeBlock(cr, p[0], p[1])
		r := w.Solve(Strength{PhiA: 30, PhiB: 30}, w.Saturated, Load{Seismic: 0.2})
		if r.FS < 0 || (r.Mode == WedgeOnFirst && r.NB != 0) || (r.Mode == WedgeOnSecond && r.NA != 0) || (r.Mode == WedgeBoth && !(r.NA > 0 && r.NB > 0)) {
			t.Errorf("%v %v: %+v", p[0], p[1], r)
		}
	}
}

func TestWaterHead(t *testing.T) {
	// Heads by kind, capped at saturation: a block whose wet point is 12 m
	// above the toe under a 30 m crest, saturated at 8 m (derived).
	for _, c := range []struct {
		w    Water
		want float64
		name string
	}{
		{Water{}, 0, "0m"},
		{Water{Depth: 5}, 5, "5m"},
		{Water{Depth: 20}, 8, "20m"},
		{Water{Kind: WaterTable, Depth: 14}, 4, "table_14m"}, // 30 − 14 − 12
		{Water{Kind: WaterTable, Depth: 25}, 0, "table_25m"}, // below the wet point
		{Water{Kind: WaterTable, Depth: 0}, 8, "table_0m"},   // at the crest: saturated
		{Water{Kind: WaterFull}, 8, "full"},
	} {
		if got := c.w.Head(12, 30, 8); got != c.want || c.w.String() != c.name {
			t.Errorf("%+v: head %v %q, want %v %q", c.w, got, c.w.String(), c.want, c.name)
		}
	}
}
