package planes

import (
	"testing"

	"cleft/insitu"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestBartonBandis(t *testing.T) {
	// Barton & Bandis (1980), eq. 1 (read); Barton & Choubey (1977):
	// τ = σn'·tan(φr + JRC·log10(JCS/σn')). Derived values from that formula:
	// σn' = 1, JRC = 10, JCS = 100, φr = 30° → 1.191754 MPa; σn' = 10 → 8.390996 MPa.
	const (
		sixDecimals = 5e-7  // MPa: the derived values are given to six decimals
		invTol      = 1e-10 // MPa, absolute or relative
	)
	b, err := NewBartonBandis(10, 100, 30)
	if err != nil {
		t.Fatal(err)
	}
	if got := b.Strength(1); !scalar.EqualWithinAbs(got, 1.191754, sixDecimals) {
		t.Errorf("τ(1) = %v, want 1.191754", got)
	}
	if got := b.Strength(10); !scalar.EqualWithinAbs(got, 8.390996, sixDecimals) {
		t.Errorf("τ(10) = %v, want 8.390996", got)
	}
	// The angle is capped at 70° at low stress and held at φr above JCS.
	if got := b.Angle(1e-6); got != MaxBartonAngle {
		t.Errorf("angle at 1e-6 MPa = %v, want the cap %v", got, MaxBartonAngle)
	}
	if got := b.Angle(500); got != 30 {
		t.Errorf("angle above JCS = %v, want φr = 30", got)
	}
	// CriticalNormal inverts Strength.
	for _, tau := range []float64{0.01, 0.5, 1.191754, 8.390996, 40} {
		sn := b.CriticalNormal(tau)
		if got := b.Strength(sn); !scalar.EqualWithinAbsOrRel(got, tau, invTol, invTol) {
			t.Errorf("Strength(CriticalNormal(%v)) = %v", tau, got)
		}
	}
	for _, bad := range [][3]float64{{-1, 100, 30}, {21, 100, 30}, {10, 0, 30}, {10, -5, 30}, {10, 100, 0}, {10, 100, 75}} {
		if _, err := NewBartonBandis(bad[0], bad[1], bad[2]); err == nil {
			t.Errorf("NewBartonBandis%v: no error", bad)
		}
	}
}

func TestCoulombRejects(t *testing.T) {
	for _, bad := range [][2]float64{{0, 0}, {-0.6, 0}, {0.6, -1}} {
		if _, err := NewCoulomb(bad[0], bad[1]); err == nil {
			t.Errorf("NewCoulomb%v: no error", bad)
		}
	}
}

func TestResolveBartonBandis(t *testing.T) {
	// With a non-linear criterion the pressure to slip comes from the
	// bracketed root: after that rise the factor of safety is 1.
	const fsTol = 1e-9 // CriticalNormal bisects σn' to 1e-12 relative
	b, _ := NewBartonBandis(12, 70, 28)
	s := insitu.NewState(insitu.Andersonian(30, 14, 20, 20), 500, 3, 1)
	for _, o := range []Orientation{MustNew(85, 65), MustNew(40, 200), MustNew(60, 110)} {
		r := Resolve(s, o, b)
		if want := b.Strength(r.EffectiveNormal) / r.Shear; !scalar.EqualWithinAbsOrRel(r.FactorOfSafety, want, tol, tol) {
			t.Errorf("%v: FS %v, want %v", o, r.FactorOfSafety, want)
		}
		q := s
		q.PorePressure += r.PressureToSlip
		if got := Resolve(q, o, b); !scalar.EqualWithinAbs(got.FactorOfSafety, 1, fsTol) {
			t.Errorf("%v: FS after ΔPp %v = %v, want 1", o, r.PressureToSlip, got.FactorOfSafety)
		}
	}
}
