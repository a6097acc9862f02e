package insitu

import (
	"fmt"
)

// Scaling says how a measured tensor is carried to other depths.
type Scaling int

const (
	// Constant: the same tensor at every depth.
	Constant Scaling = iota
	// Proportional: every component ∝ depth, σ(z) = σref·z/zref, so the
	// principal axes stay fixed and the magnitudes scale.
	Proportional
)

func (s Scaling) String() string {
	if s == Proportional {
		return "proportional"
	}
	return "constant"
}

// MeasuredModel is a tensor measured (or estimated) at a reference depth and
// carried to other depths by a Scaling. Its principal axes are decomposed
// once, at construction, so At is cheap.
type MeasuredModel struct {
	Reference      Tensor
	ReferenceDepth float64 // m
	Scaling        Scaling
	Water          Water

	principal Principal
}

// NewMeasuredModel validates and returns the model. Proportional scaling needs
// a reference depth > 0.
func NewMeasuredModel(ref Tensor, zref float64, s Scaling, w Water) (*MeasuredModel, error) {
	if bad(zref) || zref < 0 {
		return nil, fmt.Errorf("reference_depth %v m: want a finite depth ≥ 0", zref)
	}
	if s == Proportional && zref == 0 {
		return nil, fmt.Errorf("reference_depth must be > 0 for proportional scaling")
	}
	if err := w.Validate(); err != nil {
		return nil, fmt.Errorf("water: %w", err)
	}
	return &MeasuredModel{Reference: ref, ReferenceDepth: zref, Scaling: s, Water: w, principal: ref.Principal()}, nil
}

// NewMeasuredPrincipal is NewMeasuredModel for a tensor given by its
// principal stresses, which are kept as given (no second decomposition).
func NewMeasuredPrincipal(p Principal, zref float64, s Scaling, w Water) (*MeasuredModel, error) {
	m, err := NewMeasuredModel(p.Tensor(), zref, s, w)
	if err != nil {
		return nil, err
	}
	m.principal = p
	return m, nil
}

// At returns the state at depth z (m).
func (m *MeasuredModel) At(z float64) State {
	f := 1.0
	if m.Scaling == Proportional {
		f = z / m.ReferenceDepth
	}
	p := m.principal
	for i := range p.Values {
		p.Values[i] *= f
	}
	if f == 0 {
		p.Values = [3]float64{} // no −0 at the surface
	}
	t := m.Reference
	if f != 1 {
		t = t.Scale(f)
	}
	return State{Depth: z, Total: t, Principal: p, PorePressure: m.Water.Pressure(z), Biot: m.Water.Biot}
}
