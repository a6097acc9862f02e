package planes

import (
	"fmt"
	"math"
)

// MaxBartonAngle is the cap, in degrees, on the friction angle of the
// Barton–Bandis criterion at low normal stress. Barton (1976) advises that
// arctan(τ/σn') should not be taken above about 70°; this tool caps there.
const MaxBartonAngle = 70.0

// BartonBandis is the non-linear joint strength of Barton & Choubey (1977)
// and Barton & Bandis (1980):
//
//	τs = σn'·tan(φr + JRC·log10(JCS/σn'))
//
// with angles in degrees. The bracketed angle is capped at MaxBartonAngle at
// low stress, and not allowed below φr at σn' > JCS (where the formula leaves
// its range and would fall below the residual strength).
type BartonBandis struct {
	JRC      float64 // joint roughness coefficient, [0, 20]
	JCS      float64 // joint wall compressive strength, MPa, > 0
	Residual float64 // residual friction angle φr, degrees, (0, MaxBartonAngle)
}

// NewBartonBandis validates the parameters.
func NewBartonBandis(jrc, jcs, residual float64) (*BartonBandis, error) {
	if math.IsNaN(jrc) || jrc < 0 || jrc > 20 {
		return nil, fmt.Errorf("jrc %v: want a number in [0, 20]", jrc)
	}
	if math.IsNaN(jcs) || math.IsInf(jcs, 0) || jcs <= 0 {
		return nil, fmt.Errorf("jcs %v MPa: want a finite number > 0", jcs)
	}
	if math.IsNaN(residual) || residual <= 0 || residual >= MaxBartonAngle {
		return nil, fmt.Errorf("residual_angle %v°: want degrees in (0, %g)", residual, MaxBartonAngle)
	}
	return &BartonBandis{JRC: jrc, JCS: jcs, Residual: residual}, nil
}

// Angle returns the mobilised friction angle in degrees at σn' = sn > 0,
// φr + JRC·log10(JCS/sn), held within [φr, MaxBartonAngle].
func (b *BartonBandis) Angle(sn float64) float64 {
	a := b.Residual + b.JRC*math.Log10(b.JCS/sn)
	return math.Min(MaxBartonAngle, math.Max(b.Residual, a))
}

// Strength returns σn'·tan(angle(σn')), 0 for sn ≤ 0.
func (b *BartonBandis) Strength(sn float64) float64 {
	if sn <= 0 {
		return 0
	}
	return sn * math.Tan(b.Angle(sn)*math.Pi/180)
}

// CriticalNormal returns the σn' at which Strength equals tau, found by
// bisection on [0, τ/tan φr]: the strength is 0 at 0 and at least σn'·tan φr,
// and it increases with σn' for φr above about 9° (the derivative
// tan θ − JRC·(π/180)·sec²θ/ln 10 is positive for θ between 9° and 81° at
// JRC = 20), so the root is unique. Absolute accuracy is 1e-12·(1 + root).
func (b *BartonBandis) CriticalNormal(tau float64) float64 {
	if tau <= 0 {
		return 0
	}
	lo, hi := 0.0, tau/math.Tan(b.Residual*math.Pi/180)
	for range 200 {
		mid := 0.5 * (lo + hi)
		if b.Strength(mid) < tau {
			lo = mid
		} else {
			hi = mid
		}
		if hi-lo <= 1e-12*(1+hi) {
			break
		}
	}
	return 0.5 * (lo + hi)
}

// Friction returns tan φr: the residual friction is used for the far-field
// frictional-limit check, the cautious choice for a rough-joint criterion.
func (b *BartonBandis) Friction() float64 { return math.Tan(b.Residual * math.Pi / 180) }

func (b *BartonBandis) String() string {
	return fmt.Sprintf("Barton–Bandis, JRC = %g, JCS = %g MPa, φr = %g°", b.JRC, b.JCS, b.Residual)
}
