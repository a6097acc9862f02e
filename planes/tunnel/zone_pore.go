package tunnel

import (
	"fmt"
	"math"
)

// PorePressure gives the pore pressure (MPa) at distance r ≥ a (m) from the
// axis of the opening. It must be cheap, allocation-free and finite: a NaN
// pressure makes a point read as stable.
type PorePressure func(r float64) float64

// Constant returns the rule Pp(r) = p: the undisturbed pore pressure all
// the way to the wall, as for an undrained (short-term) response or a
// watertight lining.
func Constant(p float64) PorePressure {
	return func(float64) float64 { return p }
}

// Drained returns the rule of steady radial inflow to a free-draining
// opening of radius a in uniform rock (the head varies as ln r: Thiem 1906,
// as used for tunnel inflow by Goodman et al. 1965):
//
//	Pp(r) = p·ln(r/a)/ln(R/a)  for a ≤ r ≤ R,  p for r > R
//
// with p the undisturbed pore pressure (MPa, ≥ 0) and R > a the radius of
// influence (m). Pp is zero at the wall. The stresses of opening.Circle do
// not include the seepage forces of this flow: the rule changes the
// effective stress only through Pp.
func Drained(p, a, influence float64) (PorePressure, error) {
	if math.IsNaN(p) || math.IsInf(p, 0) || p < 0 {
		return nil, fmt.Errorf("pore pressure %v MPa: want a finite number ≥ 0", p)
	}
	if math.IsNaN(a) || math.IsInf(a, 0) || a <= 0 {
		return nil, fmt.Errorf("radius %v m: want a finite number > 0", a)
	}
	if math.IsNaN(influence) || math.IsInf(influence, 0) || influence <= a {
		return nil, fmt.Errorf("radius of influence %v m: want a finite number > the radius %v m", influence, a)
	}
	k := p / math.Log(influence/a)
	return func(r float64) float64 {
		if r >= influence {
			return p
		}
		if r <= a {
			return 0
		}
		return k * math.Log(r/a)
	}, nil
}
