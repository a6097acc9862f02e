package chance

import "math"

// Mean returns the expected value of d, truncation included, in closed form
// (Johnson, Kotz & Balakrishnan 1994 for the truncated normal and
// lognormal):
//
//	normal       μ + σ(φ(α) − φ(β))/Z,  α, β = (min − μ)/σ, (max − μ)/σ,  Z = Φ(β) − Φ(α)
//	lognormal    m·e^(s²/2)·(Φ(β − s) − Φ(α − s))/Z,  α, β = ln(min/m)/s, ln(max/m)/s
//	uniform      (a + b)/2 on [a, b] = [low, high] ∩ [min, max]
//	triangular   ∫ x f(x) dx / ∫ f(x) dx over [low, high] ∩ [min, max]
//
// (untruncated: μ; m·e^(s²/2); (low + high)/2; (low + mode + high)/3).
// A Dist of zero width returns its constant.
func (d Dist) Mean() float64 {
	m, _ := d.moments()
	return m
}

// Variance returns the variance of d, truncation included, in closed form:
//
//	normal       σ²[1 + (αφ(α) − βφ(β))/Z − ((φ(α) − φ(β))/Z)²]
//	lognormal    E[X²] − E[X]²,  E[X²] = m²·e^(2s²)·(Φ(β − 2s) − Φ(α − 2s))/Z
//	uniform      (b − a)²/12
//	triangular   ∫ (x − mean)² f(x) dx / ∫ f(x) dx
//
// (untruncated: σ²; m²·e^(s²)·(e^(s²) − 1); (high − low)²/12;
// (low² + mode² + high² − low·mode − low·high − mode·high)/18).
// A Dist of zero width returns 0. In far tails of a truncated normal or
// lognormal the formula loses digits to cancellation; it never returns a
// negative value.
func (d Dist) Variance() float64 {
	_, v := d.moments()
	return v
}

func (d Dist) moments() (mean, variance float64) {
	if d.point() {
		return d.p[0], 0
	}
	lo, hi := d.Bounds()
	switch d.kind {
	case Normal:
		mu, s := d.p[0], d.p[1]
		if !d.truncated {
			return mu, s * s
		}
		a, b := d.standard(lo), d.standard(hi)
		z := normalMass(a, b)
		r := (normalPDF(a) - normalPDF(b)) / z
		v := 1 + (zPDF(a)-zPDF(b))/z - r*r
		return mu + s*r, s * s * math.Max(0, v)
	case LogNormal:
		m, s := d.p[0], d.p[1]
		if !d.truncated {
			return m * math.Exp(s*s/2), m * m * math.Exp(s*s) * math.Expm1(s*s)
		}
		a, b := d.standard(lo), d.standard(hi)
		z := normalMass(a, b)
		e1 := m * math.Exp(s*s/2) * normalMass(a-s, b-s) / z
		e2 := m * m * math.Exp(2*s*s) * normalMass(a-2*s, b-2*s) / z
		return e1, math.Max(0, e2-e1*e1)
	case Uniform:
		a, b := math.Max(d.p[0], lo), math.Min(d.p[1], hi)
		return (a + b) / 2, (b - a) * (b - a) / 12
	case Triangular:
		return triangularMoments(d.p[0], d.p[1], d.p[2], lo, hi)
	}
	return math.NaN(), math.NaN()
}

// zPDF returns z·φ(z), 0 at ±Inf.
func zPDF(z float64) float64 {
	if math.IsInf(z, 0) {
		return 0
	}
	return z * normalPDF(z)
}

// triangularMoments integrates the triangular density on [l, h] with mode m
// over its intersection with [lo, hi], in t = x − m to limit cancellation.
// On each side of the mode the density is linear, f = A + B·t, and
//
//	∫ tᵏ f dt = A(qᵏ⁺¹ − pᵏ⁺¹)/(k + 1) + B(qᵏ⁺² − pᵏ⁺²)/(k + 2)
func triangularMoments(l, m, h, lo, hi float64) (mean, variance float64) {
	var mom [3]float64
	add := func(p, q, a, b float64) {
		if !(q > p) {
			return
		}
		pk, qk := p, q // p^(k+1), q^(k+1)
		for k := range 3 {
			fk := float64(k)
			mom[k] += a*(qk-pk)/(fk+1) + b*(qk*q-pk*p)/(fk+2)
			pk, qk = pk*p, qk*q
		}
	}
	if m > l {
		b := 2 / ((h - l) * (m - l))
		add(math.Max(l, lo)-m, math.Min(m, hi)-m, 2/(h-l), b)
	}
	if h > m {
		b := 2 / ((h - l) * (h - m))
		add(math.Max(m, lo)-m, math.Min(h, hi)-m, 2/(h-l), -b)
	}
	t := mom[1] / mom[0]
	return m + t, math.Max(0, mom[2]/mom[0]-t*t)
}
