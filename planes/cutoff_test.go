package planes

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestTensionCutOffIssueCase(t *testing.T) {
	const tol = 1e-6
	// Issue 11, item 2: plane 20/090 at 200 m, c = 1 MPa, μ 0.6, dry, Sv = 5,
	// an east–west horizontal stress of 4 and 6 north–south (the issue's
	// σn' = 4.883 and τ = 0.321 come out of these). Derived, principal-axis
	// form (Jaeger, Cook & Zimmerman 2007, ch. 2): the pole of 20/090 lies in
	// the east–west vertical section at 20° from the vertical, so
	//   σn = Sv cos²20° + Sh sin²20° = 5·0.8830222 + 4·0.1169778 = 4.8830222,
	//   τ  = (Sv − Sh) sin 20° cos 20° = 0.3213938.
	// Without the cut-off ΔPp = σn' − (τ − c)/μ = 4.8830222 + 1.1310103
	// = 6.0140325 (what the tool gave); the plane opens after 4.8830222,
	// and an opening plane has no strength, so ΔPp = min(6.014, 4.883) =
	// 4.8830222, reached by opening.
	c := &Coulomb{Mu: 0.6, Cohesion: 1}
	s := insitu.NewState(insitu.Andersonian(6, 4, 5, 0), 200, 0, 1)
	o := MustNew(20, 90)
	r := Resolve(s, o, c)
	if !scalar.EqualWithinAbs(r.EffectiveNormal, 4.8830222, tol) || !scalar.EqualWithinAbs(r.Shear, 0.3213938, tol) {
		t.Fatalf("σn', τ = %v, %v; want 4.8830222, 0.3213938", r.EffectiveNormal, r.Shear)
	}
	if !scalar.EqualWithinAbs(r.PressureToSlip, 4.8830222, tol) || !r.OpensFirst || r.State != Stable {
		t.Errorf("ΔPp = %v (opens first %v, %v); want 4.8830222 by opening, stable", r.PressureToSlip, r.OpensFirst, r.State)
	}
	// Raising Pp by 4.9 MPa opens it (σn' = −0.0169778): the tool then gave
	// +1.11 MPa still "to slip"; with the cut-off ΔPp = σn' = −0.0169778.
	s.PorePressure = 4.9
	r = Resolve(s, o, c)
	if r.State != Opening || !scalar.EqualWithinAbs(r.PressureToSlip, -0.0169778, tol) {
		t.Errorf("after +4.9 MPa: %v with ΔPp %v; want opening with −0.0169778", r.State, r.PressureToSlip)
	}
}

// randomCriterion is a Coulomb criterion with cohesion up to 3 MPa or a
// Barton–Bandis one.
func randomCriterion(rng *rand.Rand) Criterion {
	if rng.IntN(3) == 0 {
		return &BartonBandis{JRC: rng.Float64() * 20, JCS: 20 + rng.Float64()*150, Residual: 20 + rng.Float64()*15}
	}
	return &Coulomb{Mu: 0.3 + rng.Float64()*0.7, Cohesion: rng.Float64() * 3 * float64(rng.IntN(2))}
}

func TestPressureToSlipIsTheLeastRiseThatEndsStability(t *testing.T) {
	// The pressure to slip is the least rise in pore pressure after which the
	// plane is no longer stable (critical or opening), and a plane that is
	// not stable now has ΔPp ≤ 0 (the definition in Result; checked by
	// raising Pp just short of and just past ΔPp rather than by the
	// formula). So an opening plane never has a positive ΔPp, and no plane
	// has one larger than the rise that opens it, σn'/α. Seeded random
	// states, planes, Biot coefficients and criteria, Coulomb with cohesion
	// and Barton–Bandis.
	const (
		tol     = 1e-9 // MPa
		minRise = 1e-3 // MPa: a ΔPp too small to step short of is not stepped
	)
	rng := rand.New(rand.NewPCG(111, 112))
	for i := range 20000 {
		ten := randomTensor(rng)
		alpha := 0.5 + rng.Float64()*0.5
		s := insitu.NewState(ten, 100, rng.Float64()*60/alpha, alpha)
		o := MustNew(rng.Float64()*90, rng.Float64()*360)
		c := randomCriterion(rng)
		r := Resolve(s, o, c)
		switch {
		case r.State == Opening && r.PressureToSlip > 0:
			t.Fatalf("case %d: opening (σn' %v) with ΔPp %v > 0", i, r.EffectiveNormal, r.PressureToSlip)
		case r.PressureToSlip > r.EffectiveNormal/alpha+tol:
			t.Fatalf("case %d: ΔPp %v beyond the rise that opens it, %v", i, r.PressureToSlip, r.EffectiveNormal/alpha)
		case r.State != Stable && r.PressureToSlip > tol:
			t.Fatalf("case %d: %v with ΔPp %v > 0", i, r.State, r.PressureToSlip)
		case r.State == Stable && r.PressureToSlip < -tol:
			t.Fatalf("case %d: stable with ΔPp %v < 0", i, r.PressureToSlip)
		}
		if r.State != Stable || r.PressureToSlip < minRise {
			continue
		}
		step := 1e-6 * (1 + r.PressureToSlip)
		pp := s.PorePressure
		s.PorePressure = pp + r.PressureToSlip - step
		if q := Resolve(s, o, c); q.State != Stable {
			t.Fatalf("case %d: %v after a rise %v short of ΔPp %v", i, q.State, step, r.PressureToSlip)
		}
		s.PorePressure = pp + r.PressureToSlip + step
		if q := Resolve(s, o, c); q.State == Stable {
			t.Fatalf("case %d: still stable (FS %v) after a rise %v past ΔPp %v", i, q.FactorOfSafety, step, r.PressureToSlip)
		} else if r.OpensFirst && q.State != Opening {
			t.Fatalf("case %d: opens first, but past ΔPp it is %v", i, q.State)
		}
	}
}

func TestBartonBandisNeverOpensBeforeSlipping(t *testing.T) {
	// Barton–Bandis strength falls to 0 with σn' (Barton & Bandis 1980, eq.
	// 1, with the 70° cap), so a sheared plane reaches it before it opens:
	// the cut-off never governs while τ > 0, and with τ = 0 the rise to
	// "slip" is the one that opens it (derived from the formula's limit).
	const tol = 1e-12 // MPa
	bb := &BartonBandis{JRC: 12, JCS: 60, Residual: 28}
	rng := rand.New(rand.NewPCG(113, 114))
	for range 2000 {
		s := insitu.NewState(randomTensor(rng), 100, rng.Float64()*40, 1)
		r := Resolve(s, MustNew(rng.Float64()*90, rng.Float64()*360), bb)
		if r.Shear > 0 && r.OpensFirst {
			t.Fatalf("τ = %v: the cut-off governs", r.Shear)
		}
	}
	r := Resolve(insitu.NewState(insitu.Andersonian(20, 20, 20, 0), 100, 7, 1), MustNew(30, 40), bb)
	if !r.OpensFirst || !scalar.EqualWithinAbs(r.PressureToSlip, 13, tol) {
		t.Errorf("isotropic 20 MPa, Pp 7: ΔPp %v (opens first %v), want 13 by opening", r.PressureToSlip, r.OpensFirst)
	}
}

func TestPressureToSlipAtZeroShear(t *testing.T) {
	// No shear: a cohesive plane cannot slip, it can only open, so the rise
	// is σn'/α, not σn' + c/μ (derived: τ = 0 in the cut-off rule).
	const tol = 1e-12 // MPa
	s := insitu.NewState(insitu.Andersonian(20, 20, 20, 0), 100, 4, 0.8)
	r := Resolve(s, MustNew(50, 10), &Coulomb{Mu: 0.6, Cohesion: 2})
	if want := (20 - 0.8*4) / 0.8; !scalar.EqualWithinAbs(r.PressureToSlip, want, tol) || !r.OpensFirst || !math.IsNaN(r.FactorOfSafety) {
		t.Errorf("ΔPp %v (opens first %v), FS %v; want %v by opening, no FS", r.PressureToSlip, r.OpensFirst, r.FactorOfSafety, want)
	}
}

func TestCutOffAtTheTie(t *testing.T) {
	// τ = c: the plane reaches its strength as it opens. Derived: the
	// vertical plane 90/045 under 6 MPa north–south and 4 east–west has its
	// pole half way between them, σn = 5, τ = (6 − 4)/2 = 1 = c; ΔPp = 5,
	// by opening, for either dip direction (rounding must not split them).
	const tol = 1e-12 // MPa
	c := &Coulomb{Mu: 0.6, Cohesion: 1}
	s := insitu.NewState(insitu.Andersonian(6, 4, 5, 0), 200, 0, 1)
	for _, dd := range []float64{45, 225} {
		r := Resolve(s, MustNew(90, dd), c)
		if !scalar.EqualWithinAbs(r.Shear, 1, tol) || !scalar.EqualWithinAbs(r.PressureToSlip, 5, tol) || !r.OpensFirst {
			t.Errorf("90/%03.0f: τ %v, ΔPp %v, opens first %v; want 1, 5, true", dd, r.Shear, r.PressureToSlip, r.OpensFirst)
		}
	}
}
