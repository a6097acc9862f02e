package chance

import (
	"fmt"
	"math"
)

// Kind is the family of a Dist.
type Kind uint8

// The families of input distribution. The zero Kind is Fixed.
const (
	Fixed      Kind = iota // a constant value
	Normal                 // mean, sd
	LogNormal              // median, sd of the natural logarithm
	Uniform                // low, high
	Triangular             // low, mode, high
)

var kindNames = [...]string{"fixed", "normal", "lognormal", "uniform", "triangular"}

// String returns the family's key: fixed, normal, lognormal, uniform or
// triangular.
func (k Kind) String() string {
	if int(k) < len(kindNames) {
		return kindNames[k]
	}
	return fmt.Sprintf("Kind(%d)", uint8(k))
}

// Dist is the distribution of one uncertain scalar input, optionally
// truncated. Build it with NewFixed, NewNormal, NewLogNormal, NewUniform or
// NewTriangular, then Truncate if bounds are given; the constructors validate
// and the methods trust the values. The zero Dist is the constant 0.
//
// A zero spread (sd = 0, low = high) is allowed: the Dist is then the
// constant (the mean, the median or low) and every Quantile returns it.
type Dist struct {
	kind      Kind
	p         [3]float64 // parameters in the order of the Kind's comment
	truncated bool
	lo, hi    float64 // truncation bounds when truncated
	// fa and fb bound the base CDF over the truncation interval: for normal
	// and lognormal in the standard-normal variable, mirrored (survival
	// function, and z negated) when the whole interval lies above the
	// median, so that a far upper tail keeps its precision.
	fa, fb float64
	mirror bool
}

// NewFixed returns the constant v.
func NewFixed(v float64) (Dist, error) {
	if !finite(v) {
		return Dist{}, fmt.Errorf("%w: value %g", ErrNotFinite, v)
	}
	return Dist{kind: Fixed, p: [3]float64{v}, fa: 0, fb: 1}, nil
}

// NewNormal returns the normal distribution of the given mean and standard
// deviation sd ≥ 0:
//
//	F(x) = Φ((x − mean)/sd)
func NewNormal(mean, sd float64) (Dist, error) {
	if !finite(mean) || !finite(sd) {
		return Dist{}, fmt.Errorf("%w: mean %g, sd %g", ErrNotFinite, mean, sd)
	}
	if sd < 0 {
		return Dist{}, fmt.Errorf("%w: sd %g", ErrSpread, sd)
	}
	return Dist{kind: Normal, p: [3]float64{mean, sd}, fa: 0, fb: 1}, nil
}

// NewLogNormal returns the lognormal distribution of the given median > 0 and
// standard deviation sdLn ≥ 0 of ln X:
//
//	F(x) = Φ(ln(x/median)/sdLn),  x > 0
func NewLogNormal(median, sdLn float64) (Dist, error) {
	if !finite(median) || !finite(sdLn) {
		return Dist{}, fmt.Errorf("%w: median %g, sd of ln %g", ErrNotFinite, median, sdLn)
	}
	if median <= 0 {
		return Dist{}, fmt.Errorf("%w: median %g", ErrMedian, median)
	}
	if sdLn < 0 {
		return Dist{}, fmt.Errorf("%w: sd of ln %g", ErrSpread, sdLn)
	}
	return Dist{kind: LogNormal, p: [3]float64{median, sdLn}, fa: 0, fb: 1}, nil
}

// NewUniform returns the uniform distribution on [low, high], low ≤ high:
//
//	F(x) = (x − low)/(high − low)
func NewUniform(low, high float64) (Dist, error) {
	if !finite(low) || !finite(high) {
		return Dist{}, fmt.Errorf("%w: low %g, high %g", ErrNotFinite, low, high)
	}
	if low > high {
		return Dist{}, fmt.Errorf("%w: low %g, high %g", ErrOrder, low, high)
	}
	return Dist{kind: Uniform, p: [3]float64{low, high}, fa: 0, fb: 1}, nil
}

// NewTriangular returns the triangular distribution on [low, high] with its
// peak at mode, low ≤ mode ≤ high:
//
//	F(x) = (x − low)²/((high − low)(mode − low))          low ≤ x ≤ mode
//	F(x) = 1 − (high − x)²/((high − low)(high − mode))    mode < x ≤ high
func NewTriangular(low, mode, high float64) (Dist, error) {
	if !finite(low) || !finite(mode) || !finite(high) {
		return Dist{}, fmt.Errorf("%w: low %g, mode %g, high %g", ErrNotFinite, low, mode, high)
	}
	if low > high {
		return Dist{}, fmt.Errorf("%w: low %g, high %g", ErrOrder, low, high)
	}
	if mode < low || mode > high {
		return Dist{}, fmt.Errorf("%w: low %g, mode %g, high %g", ErrMode, low, mode, high)
	}
	return Dist{kind: Triangular, p: [3]float64{low, mode, high}, fa: 0, fb: 1}, nil
}

// Kind returns the family of d.
func (d Dist) Kind() Kind { return d.kind }

// Params returns the parameters of d as given, in the order of its Kind's
// comment (unused entries are 0).
func (d Dist) Params() [3]float64 { return d.p }

// Bounds returns the truncation bounds of d, −Inf and +Inf when it is not
// truncated.
func (d Dist) Bounds() (min, max float64) {
	if !d.truncated {
		return math.Inf(-1), math.Inf(1)
	}
	return d.lo, d.hi
}

// point reports whether d has zero width; its value is then p[0].
func (d Dist) point() bool {
	switch d.kind {
	case Normal, LogNormal:
		return d.p[1] == 0
	case Uniform:
		return d.p[0] == d.p[1]
	case Triangular:
		return d.p[0] == d.p[2]
	}
	return true
}

// Quantile returns the inverse CDF of d at u ∈ [0, 1], the smallest x with
// F(x) ≥ u. For a truncated Dist it is the base quantile at
// F(min) + u·(F(max) − F(min)), kept within [min, max]. Quantile(0) and
// Quantile(1) of an unbounded family are −Inf (0 for the lognormal) and
// +Inf. Quantile panics if u is outside [0, 1] or NaN.
func (d Dist) Quantile(u float64) float64 {
	if !(u >= 0 && u <= 1) {
		panic("chance: quantile probability outside [0, 1]")
	}
	if d.point() {
		return d.p[0]
	}
	v := d.fa + u*(d.fb-d.fa)
	var x float64
	switch d.kind {
	case Normal:
		x = d.p[0] + d.p[1]*d.z(v)
	case LogNormal:
		x = d.p[0] * math.Exp(d.p[1]*d.z(v))
	case Uniform:
		x = d.p[0] + v*(d.p[1]-d.p[0])
	case Triangular:
		x = triangularQuantile(d.p[0], d.p[1], d.p[2], v)
	}
	if d.truncated {
		x = math.Max(d.lo, math.Min(d.hi, x))
	}
	return x
}

// CDF returns P(X ≤ x) for d, truncation included.
func (d Dist) CDF(x float64) float64 {
	if d.point() {
		if x < d.p[0] {
			return 0
		}
		return 1
	}
	var f float64
	switch d.kind {
	case Normal:
		f = d.zCDF((x - d.p[0]) / d.p[1])
	case LogNormal:
		if x <= 0 {
			f = d.zCDF(math.Inf(-1))
		} else {
			f = d.zCDF(math.Log(x/d.p[0]) / d.p[1])
		}
	case Uniform:
		f = uniformCDF(d.p[0], d.p[1], x)
	case Triangular:
		f = triangularCDF(d.p[0], d.p[1], d.p[2], x)
	}
	return math.Max(0, math.Min(1, (f-d.fa)/(d.fb-d.fa)))
}

// z returns the standard-normal quantile of the (possibly mirrored)
// probability v.
func (d Dist) z(v float64) float64 {
	if d.mirror {
		return -normalQuantile(v)
	}
	return normalQuantile(v)
}

// zCDF returns the (possibly mirrored) standard-normal CDF at z.
func (d Dist) zCDF(z float64) float64 {
	if d.mirror {
		return normalCDF(-z)
	}
	return normalCDF(z)
}

func uniformCDF(low, high, x float64) float64 {
	return math.Max(0, math.Min(1, (x-low)/(high-low)))
}

func triangularCDF(low, mode, high, x float64) float64 {
	switch {
	case x <= low:
		return 0
	case x >= high:
		return 1
	case x <= mode:
		return (x - low) * (x - low) / ((high - low) * (mode - low))
	}
	return 1 - (high-x)*(high-x)/((high-low)*(high-mode))
}

func triangularQuantile(low, mode, high, v float64) float64 {
	if v < (mode-low)/(high-low) {
		return low + math.Sqrt(v*(high-low)*(mode-low))
	}
	return high - math.Sqrt((1-v)*(high-low)*(high-mode))
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }
