package insitu

import (
	"cleft/insitu/geom"

	"fmt"
	"math"
)

// Regime is the Andersonian stress regime (Anderson 1951), named by which
// principal stress is vertical: σ1 normal, σ2 strike-slip, σ3 reverse.
type Regime int

const (
	Normal Regime = iota
	StrikeSlip
	Reverse
)

func (r Regime) String() string {
	switch r {
	case Normal:
		return "normal"
	case StrikeSlip:
		return "strike-slip"
	case Reverse:
		return "reverse"
	}
	return fmt.Sprintf("Regime(%d)", int(r))
}

// RegimeFit is the regime of a stress state with how well it fits Anderson's
// assumption of one vertical principal axis.
type RegimeFit struct {
	Regime Regime
	// Axis is the index (0 for σ1, 1 for σ2, 2 for σ3) of the principal axis
	// nearest to vertical.
	Axis int
	// Tilt is the angle in degrees between that axis and the vertical.
	Tilt float64
}

// AndersonTilt is the tilt, in degrees, up to which a principal axis counts as
// vertical and the state as Andersonian. Common practice; the exact figure is
// a choice of this tool.
const AndersonTilt = 5.0

// Andersonian reports whether the nearest-to-vertical axis is within
// AndersonTilt of the vertical.
func (f RegimeFit) Andersonian() bool { return f.Tilt <= AndersonTilt }

// Regime returns the regime of the principal axis nearest to vertical. For an
// Andersonian state it is Anderson's regime; for any other it is the regime of
// the nearest vertical axis, and RegimeFit.Tilt says how far from vertical
// that axis is. When two principal stresses are equal the regime is still
// defined by the eigenvector axes, which are then not unique: φ = 0 or 1
// tells the reader so.
func (p Principal) Regime() RegimeFit {
	best, tilt := 0, 90.0
	for i, a := range p.Axes {
		t := 90 - math.Asin(math.Min(1, math.Abs(a.Z)))*geom.Deg
		if t < tilt {
			best, tilt = i, t
		}
	}
	return RegimeFit{Regime: Regime(best), Axis: best, Tilt: tilt}
}

// APhi returns Simpson's (1997) Aφ ∈ [0, 3], which places the shape ratio
// and the regime on one scale:
//
//	Aφ = (n + 0.5) + (−1)ⁿ·(φ − 0.5),  n = 0 normal, 1 strike-slip, 2 reverse
//
// It returns NaN when φ is NaN (isotropic state).
func APhi(r Regime, phi float64) float64 {
	n := float64(r)
	sign := 1.0
	if r == StrikeSlip {
		sign = -1
	}
	return n + 0.5 + sign*(phi-0.5)
}
