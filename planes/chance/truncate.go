package chance

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/mathext"
)

// Truncate returns d restricted to [min, max], replacing any earlier bounds.
// Either bound may be infinite (a one-sided truncation); bounds beyond the
// support of d (below 0 for a lognormal, outside [low, high]) have no
// effect there.
//
// The truncated distribution has the CDF
//
//	G(x) = (F(x) − F(min))/(F(max) − F(min)),  min ≤ x ≤ max
//
// and is sampled by its inverse, G⁻¹(u) = F⁻¹(F(min) + u·(F(max) − F(min))):
// the same distribution as redrawing every sample that falls outside
// [min, max], with one uniform per draw. Truncate returns ErrBounds unless
// min < max, ErrEmpty if F(max) − F(min) is zero in float64 (or a
// constant lies outside the bounds), and ErrNotFinite for a NaN bound.
func (d Dist) Truncate(min, max float64) (Dist, error) {
	if math.IsNaN(min) || math.IsNaN(max) {
		return d, fmt.Errorf("%w: min %g, max %g", ErrNotFinite, min, max)
	}
	if !(min < max) {
		return d, fmt.Errorf("%w: min %g, max %g", ErrBounds, min, max)
	}
	t := d
	t.truncated, t.lo, t.hi = true, min, max
	t.fa, t.fb, t.mirror = 0, 1, false
	if d.point() {
		if d.p[0] < min || d.p[0] > max {
			return d, fmt.Errorf("%w: constant %g outside [%g, %g]", ErrEmpty, d.p[0], min, max)
		}
		return t, nil
	}
	switch d.kind {
	case Normal, LogNormal:
		za, zb := t.standard(min), t.standard(max)
		if za > 0 {
			t.mirror = true
			t.fa, t.fb = normalCDF(-za), normalCDF(-zb)
		} else {
			t.fa, t.fb = normalCDF(za), normalCDF(zb)
		}
		if t.fa == t.fb {
			return d, fmt.Errorf("%w: %v(%g, %g) on [%g, %g]", ErrEmpty, d.kind, d.p[0], d.p[1], min, max)
		}
	case Uniform, Triangular:
		f := func(x float64) float64 {
			if d.kind == Uniform {
				return uniformCDF(d.p[0], d.p[1], x)
			}
			return triangularCDF(d.p[0], d.p[1], d.p[2], x)
		}
		t.fa, t.fb = f(min), f(max)
		if !(t.fb > t.fa) {
			if d.kind == Uniform {
				return d, fmt.Errorf("%w: %v(%g, %g) on [%g, %g]", ErrEmpty, d.kind, d.p[0], d.p[1], min, max)
			}
			return d, fmt.Errorf("%w: %v(%g, %g, %g) on [%g, %g]", ErrEmpty, d.kind, d.p[0], d.p[1], d.p[2], min, max)
		}
	}
	return t, nil
}

// standard returns the standard-normal variable of x for a normal or
// lognormal d of non-zero spread: (x − mean)/sd or ln(x/median)/sdLn, with
// x ≤ 0 at −Inf for the lognormal.
func (d Dist) standard(x float64) float64 {
	if d.kind == LogNormal {
		if x <= 0 {
			return math.Inf(-1)
		}
		return math.Log(x/d.p[0]) / d.p[1]
	}
	return (x - d.p[0]) / d.p[1]
}

// normalCDF returns Φ(z) = ½·erfc(−z/√2), accurate in the lower tail.
func normalCDF(z float64) float64 { return 0.5 * math.Erfc(-z/math.Sqrt2) }

// normalPDF returns φ(z) = exp(−z²/2)/√(2π), 0 at ±Inf.
func normalPDF(z float64) float64 { return math.Exp(-z*z/2) / math.Sqrt(2*math.Pi) }

// normalQuantile returns Φ⁻¹(p), −Inf at 0 and +Inf at 1.
func normalQuantile(p float64) float64 { return mathext.NormalQuantile(p) }

// normalMass returns Φ(b) − Φ(a) for a ≤ b, through the upper tail when
// a > 0 so that intervals far above the mean keep their precision.
func normalMass(a, b float64) float64 {
	if a > 0 {
		return normalCDF(-a) - normalCDF(-b)
	}
	return normalCDF(b) - normalCDF(a)
}
