package study

import (
	"cleft/insitu"
	"cleft/insitu/geom"
)

// gradState is a gradient model with the sine and cosine of its SHmax
// azimuth worked out once, so that the state at a depth costs no
// trigonometry. at gives exactly what GradientModel.At gives (tested).
type gradState struct {
	m    *insitu.GradientModel
	s, c float64
}

func newGradState(m *insitu.GradientModel) gradState {
	s, c := geom.SinCosDeg(m.Azimuth)
	return gradState{m: m, s: s, c: c}
}

// at writes the state at depth z into st: the tensor of insitu.Andersonian
// and the principal stresses sorted descending with a right-handed triad,
// as GradientModel.At builds them.
func (g *gradState) at(z float64, st *insitu.State) {
	m := g.m
	sh, sm, sv := m.Magnitudes(z)
	s, c := g.s, g.c
	st.Depth = z
	st.Total = insitu.Tensor{NN: sh*c*c + sm*s*s, EE: sh*s*s + sm*c*c, DD: sv, NE: (sh - sm) * c * s}
	p := &st.Principal
	p.Values = [3]float64{sh, sm, sv}
	p.Axes[0].X, p.Axes[0].Y, p.Axes[0].Z = c, s, 0
	p.Axes[1].X, p.Axes[1].Y, p.Axes[1].Z = -s, c, 0
	p.Axes[2].X, p.Axes[2].Y, p.Axes[2].Z = 0, 0, 1
	for i := 0; i < 2; i++ {
		for j := 0; j < 2-i; j++ {
			if p.Values[j] < p.Values[j+1] {
				p.Values[j], p.Values[j+1] = p.Values[j+1], p.Values[j]
				p.Axes[j], p.Axes[j+1] = p.Axes[j+1], p.Axes[j]
			}
		}
	}
	a, b, d := p.Axes[0], p.Axes[1], p.Axes[2]
	if a.X*(b.Y*d.Z-b.Z*d.Y)-a.Y*(b.X*d.Z-b.Z*d.X)+a.Z*(b.X*d.Y-b.Y*d.X) < 0 {
		p.Axes[2].X, p.Axes[2].Y, p.Axes[2].Z = -d.X, -d.Y, -d.Z
	}
	st.PorePressure = m.Water.Pressure(z)
	st.Biot = m.Water.Biot
}

// stateAt writes realisation i's far field at depth z into st.
func (r *runner) stateAt(i int, z float64, st *insitu.State) {
	if r.grads != nil {
		r.grads[i].at(z, st)
		return
	}
	*st = r.models[i].At(z)
}
