package planes

import (
	"fmt"
	"math"
)

// Criterion is the shear strength of a discontinuity as a function of the
// effective normal stress on it.
type Criterion interface {
	// Strength returns the shear strength τs in MPa at effective normal
	// stress sn > 0 (MPa).
	Strength(sn float64) float64
	// CriticalNormal returns the effective normal stress at which the
	// strength equals the shear stress tau ≥ 0: the σn' where the plane would
	// be at limit equilibrium. It may be ≤ 0 (cohesion carries tau alone).
	CriticalNormal(tau float64) float64
	// Friction returns the friction coefficient used for the frictional-limit
	// check of the far field (see insitu.FrictionalLimit).
	Friction() float64
	// String names the criterion and its parameters, e.g. "μ = 0.6, c = 0 MPa".
	String() string
}

// Coulomb is the linear strength τs = c + μ·σn' (Coulomb 1776; Byerlee 1978
// gives μ ≈ 0.6–0.85 for most rocks).
type Coulomb struct {
	Mu       float64 // friction coefficient, > 0
	Cohesion float64 // MPa, ≥ 0
}

// NewCoulomb validates μ > 0 and c ≥ 0.
func NewCoulomb(mu, c float64) (*Coulomb, error) {
	if math.IsNaN(mu) || math.IsInf(mu, 0) || mu <= 0 {
		return nil, fmt.Errorf("friction %v: want a finite coefficient > 0", mu)
	}
	if math.IsNaN(c) || math.IsInf(c, 0) || c < 0 {
		return nil, fmt.Errorf("cohesion %v MPa: want a finite number ≥ 0", c)
	}
	return &Coulomb{Mu: mu, Cohesion: c}, nil
}

// Strength returns c + μ·sn.
func (k *Coulomb) Strength(sn float64) float64 { return k.Cohesion + k.Mu*sn }

// CriticalNormal returns (τ − c)/μ.
func (k *Coulomb) CriticalNormal(tau float64) float64 { return (tau - k.Cohesion) / k.Mu }

// Friction returns μ.
func (k *Coulomb) Friction() float64 { return k.Mu }

func (k *Coulomb) String() string {
	return fmt.Sprintf("Coulomb, μ = %g, c = %g MPa", k.Mu, k.Cohesion)
}
