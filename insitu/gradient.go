package insitu

import (
	"fmt"

	"cleft/insitu/geom"
)

// HorizontalKind says how a horizontal principal stress grows with depth.
type HorizontalKind int

const (
	// Ratio: S = k·Sv, k = Value (total stress ratio).
	Ratio HorizontalKind = iota
	// EffectiveRatio: S − αPp = k·(Sv − αPp), k = Value.
	EffectiveRatio
	// Gradient: S = Offset + Value·z, Value in MPa/m, Offset in MPa.
	Gradient
	// Sheorey: S = k·Sv with Sheorey's (1994) k = 0.25 + 7·Eh·(0.001 + 1/z),
	// Eh = Value the horizontal deformation modulus in GPa, z in m.
	Sheorey
)

func (k HorizontalKind) String() string {
	switch k {
	case Ratio:
		return "ratio"
	case EffectiveRatio:
		return "effective_ratio"
	case Gradient:
		return "gradient"
	case Sheorey:
		return "sheorey"
	}
	return fmt.Sprintf("HorizontalKind(%d)", int(k))
}

// Horizontal is the depth law of one horizontal principal stress.
type Horizontal struct {
	Kind   HorizontalKind
	Value  float64 // ratio, MPa/m, or GPa, by Kind
	Offset float64 // MPa at the surface, Gradient only
}

// Validate reports a value out of range.
func (h Horizontal) Validate() error {
	if bad(h.Value) || !(h.Value > 0) {
		return fmt.Errorf("%s %v: want a finite number > 0", h.Kind, h.Value)
	}
	if bad(h.Offset) || h.Offset < 0 {
		return fmt.Errorf("offset %v MPa: want a finite number ≥ 0", h.Offset)
	}
	if h.Offset != 0 && h.Kind != Gradient {
		return fmt.Errorf("offset goes with gradient only, not with %s", h.Kind)
	}
	return nil
}

// magnitude returns S at depth z for vertical gradient gv (MPa/m), vertical
// stress sv and the Biot-scaled pore pressure ap.
//
// Sheorey's k·Sv is expanded as Sv·(0.25 + 0.007·Eh) + 7·Eh·gv, which is
// finite at the surface (k itself is infinite there): S(0) = 7·Eh·gv.
func (h Horizontal) magnitude(z, gv, sv, ap float64) float64 {
	switch h.Kind {
	case Ratio:
		return h.Value * sv
	case EffectiveRatio:
		return ap + h.Value*(sv-ap)
	case Gradient:
		return h.Offset + h.Value*z
	case Sheorey:
		return sv*(0.25+0.007*h.Value) + 7*h.Value*gv
	}
	panic("insitu: unknown horizontal kind")
}

// SheoreyK returns Sheorey's (1994) ratio of mean horizontal to vertical
// stress, k = 0.25 + 7·Eh·(0.001 + 1/z), for Eh in GPa and z in m (+Inf at z = 0).
func SheoreyK(eh, z float64) float64 { return 0.25 + 7*eh*(0.001+1/z) }

// GradientModel is the far field of a gradient or ratio estimate: a vertical
// principal stress Sv = VerticalGradient·z, and two horizontal principal
// stresses, SHmax along Azimuth and Shmin across it, each with its own depth
// law. Pore pressure follows Water.
type GradientModel struct {
	VerticalGradient float64 // MPa/m
	SHmax, Shmin     Horizontal
	Azimuth          float64 // of SHmax, degrees clockwise from north
	Water            Water

	// The sine and cosine of Azimuth, computed once by NewGradientModel;
	// used while trigAz still equals Azimuth.
	sin, cos, trigAz float64
	trig             bool
}

// NewGradientModel validates the parts and returns the model.
func NewGradientModel(gv float64, shmax, shmin Horizontal, azimuth float64, w Water) (*GradientModel, error) {
	if bad(gv) || !(gv > 0) {
		return nil, fmt.Errorf("vertical gradient %v MPa/m: want a finite number > 0", gv)
	}
	if err := shmax.Validate(); err != nil {
		return nil, fmt.Errorf("shmax: %w", err)
	}
	if err := shmin.Validate(); err != nil {
		return nil, fmt.Errorf("shmin: %w", err)
	}
	if bad(azimuth) || azimuth < 0 || azimuth > 360 {
		return nil, fmt.Errorf("azimuth %v: want degrees in [0, 360]", azimuth)
	}
	if shmax.Kind == shmin.Kind && shmax.Value < shmin.Value {
		return nil, fmt.Errorf("shmax %s %v is less than shmin %s %v: SHmax is the larger horizontal stress", shmax.Kind, shmax.Value, shmin.Kind, shmin.Value)
	}
	if err := w.Validate(); err != nil {
		return nil, fmt.Errorf("water: %w", err)
	}
	m := &GradientModel{VerticalGradient: gv, SHmax: shmax, Shmin: shmin, Azimuth: geom.Azimuth(azimuth), Water: w}
	m.sin, m.cos = geom.SinCosDeg(m.Azimuth)
	m.trigAz, m.trig = m.Azimuth, true
	return m, nil
}

// sinCos returns the sine and cosine of the azimuth: those computed at
// construction, or for a model built or changed otherwise, computed now.
func (m *GradientModel) sinCos() (sin, cos float64) {
	if m.trig && m.trigAz == m.Azimuth {
		return m.sin, m.cos
	}
	return geom.SinCosDeg(m.Azimuth)
}

// Magnitudes returns SHmax, Shmin and Sv at depth z (m), MPa.
func (m *GradientModel) Magnitudes(z float64) (shmax, shmin, sv float64) {
	sv = m.VerticalGradient * z
	ap := m.Water.Biot * m.Water.Pressure(z)
	return m.SHmax.magnitude(z, m.VerticalGradient, sv, ap), m.Shmin.magnitude(z, m.VerticalGradient, sv, ap), sv
}

// At returns the state at depth z (m). SHmax may come out below Shmin at
// some depths when the two follow different laws; the tensor is then still
// the one the laws give, and the principal stresses are sorted as always.
// The trigonometry of the azimuth is done once, at construction.
func (m *GradientModel) At(z float64) State {
	sh, sm, sv := m.Magnitudes(z)
	st, ct := m.sinCos()
	p := Principal{
		Values: [3]float64{sh, sm, sv},
	}
	p.Axes[0].X, p.Axes[0].Y = ct, st
	p.Axes[1].X, p.Axes[1].Y = -st, ct
	p.Axes[2].Z = 1
	sortPrincipal(&p)
	return State{
		Depth:        z,
		Total:        andersonian(sh, sm, sv, st, ct),
		Principal:    p,
		PorePressure: m.Water.Pressure(z),
		Biot:         m.Water.Biot,
	}
}

// sortPrincipal orders three values descending with their axes, keeping the
// triad right-handed. Allocation-free.
func sortPrincipal(p *Principal) {
	for i := 0; i < 2; i++ {
		for j := 0; j < 2-i; j++ {
			if p.Values[j] < p.Values[j+1] {
				p.Values[j], p.Values[j+1] = p.Values[j+1], p.Values[j]
				p.Axes[j], p.Axes[j+1] = p.Axes[j+1], p.Axes[j]
			}
		}
	}
	a, b, c := p.Axes[0], p.Axes[1], p.Axes[2]
	det := a.X*(b.Y*c.Z-b.Z*c.Y) - a.Y*(b.X*c.Z-b.Z*c.X) + a.Z*(b.X*c.Y-b.Y*c.X)
	if det < 0 {
		p.Axes[2].X, p.Axes[2].Y, p.Axes[2].Z = -c.X, -c.Y, -c.Z
	}
}
