package insitu

// State is the stress at one point: the total tensor, its principal stresses,
// the pore pressure and Biot's coefficient. Values are MPa; depth is metres.
// Principal must describe Total: models build both together.
type State struct {
	Depth        float64
	Total        Tensor
	Principal    Principal
	PorePressure float64
	Biot         float64
}

// NewState returns the state of a total tensor with pore pressure pp and
// Biot coefficient biot at depth z; it computes the principal stresses.
func NewState(total Tensor, z, pp, biot float64) State {
	return State{Depth: z, Total: total, Principal: total.Principal(), PorePressure: pp, Biot: biot}
}

// EffectivePrincipal returns σ1', σ2', σ3' = σi − α·Pp.
func (s State) EffectivePrincipal() [3]float64 {
	p := s.Biot * s.PorePressure
	v := s.Principal.Values
	return [3]float64{v[0] - p, v[1] - p, v[2] - p}
}

// Model gives the far-field state at a depth (m, ≥ 0). At must be cheap and
// allocation-free: it is called once per plane.
type Model interface {
	At(depth float64) State
}
