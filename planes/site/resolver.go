package site

import (
	"math"

	"cleft/insitu"
	"cleft/planes"
)

// Resolver applies a site's model to its planes one at a time: the state at
// the plane's depth (kept while consecutive planes share a depth), the
// plane's own pore pressure and strength when it gives them, then
// planes.ResolveTo. One Resolver per goroutine; it does not allocate.
type Resolver struct {
	site    *Site
	state   insitu.State
	depth   float64
	basePp  float64
	scratch planes.Coulomb
}

// Resolver returns a new Resolver for s.
func (s *Site) Resolver() *Resolver { return &Resolver{site: s, depth: math.NaN()} }

// Resolve writes the result for p into r.
func (rv *Resolver) Resolve(p *Plane, r *planes.Result) {
	if p.Depth != rv.depth {
		rv.state = rv.site.Model.At(p.Depth)
		rv.depth = p.Depth
		rv.basePp = rv.state.PorePressure
	}
	rv.state.PorePressure = rv.basePp
	if !math.IsNaN(p.PorePressure) {
		rv.state.PorePressure = p.PorePressure
	}
	planes.ResolveTo(r, &rv.state, &p.Orientation, rv.site.CriterionFor(p, &rv.scratch))
}

// ResolveAt writes into r the result for p's orientation in the far field
// at another depth, for a figure drawn at one depth (the Mohr diagram). A
// plane with its own pore pressure keeps its excess over the water model,
// Pp(z) = model Pp(z) + (plane Pp − model Pp(plane depth)), not below 0; its
// own friction and cohesion apply as everywhere. It returns the plane's
// criterion (a new value when the plane overrides the site's).
func (rv *Resolver) ResolveAt(p *Plane, depth float64, r *planes.Result) planes.Criterion {
	st := rv.site.Model.At(depth)
	if !math.IsNaN(p.PorePressure) {
		excess := p.PorePressure - rv.site.Model.At(p.Depth).PorePressure
		st.PorePressure = math.Max(0, st.PorePressure+excess)
	}
	c := rv.site.CriterionFor(p, &rv.scratch)
	if c == planes.Criterion(&rv.scratch) {
		own := rv.scratch
		c = &own
	}
	planes.ResolveTo(r, &st, &p.Orientation, c)
	return c
}
