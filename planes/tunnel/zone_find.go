package tunnel

import (
	"fmt"
	"math"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Find returns the zone round the opening of st where the plane o, judged
// by the criterion c, is critical or opening under the stress in the rock
// (opening.Circle.At as a NED tensor, the pore pressure st.Pore(r), resolved
// by planes.ResolveTo), searched on the grid g.
//
// Each ray is sampled from the wall to g.Outer·a in equal steps no longer
// than g.Step·a; where the plane's state changes between two samples the
// boundary is found by bisection on that state (the verdict of
// planes.ResolveTo itself, through planes.StateOf, not a proxy margin) to
// 1e-9·a. The ray with the deepest zone, and the one with the deepest
// opening part, are then refined in angle by golden-section search between
// their neighbours. The zone's area is Σ Δθ·½(r_out² − r_in²) over the
// parts inside on every ray. Parts of the zone thinner than one step along
// every ray, or narrower than the angle between rays, can be missed.
//
// The stress tensor at (r, θ + 180°) is that at (r, θ): every term of
// Circle.At is even in (cos θ, sin θ) or odd in them and multiplied by one
// of eᵣ, eθ, which turn over too; the pore pressure depends on r alone. So
// the zone is symmetric through the axis, and with an even number of rays
// only those from 0 to 180° are searched, the others mirrored (tested
// against the search of every ray).
//
// If outline is not nil it must have g.Rays elements and receives the span
// of the zone on each ray. Find panics if g is out of range or outline has
// the wrong length. Find allocates only for the far-field state
// (insitu.NewState) and a table of the pore pressure at the grid radii, once
// per call; the search itself does not allocate.
func Find(st *Section, o *planes.Orientation, c planes.Criterion, g Grid, outline []Span) Zone {
	g = g.resolved()
	if outline != nil && len(outline) != g.Rays {
		panic(fmt.Sprintf("tunnel: outline has %d spans for %d rays", len(outline), g.Rays))
	}
	return find(st, o, c, g, outline, g.Rays%2 == 0)
}

// find is Find on the resolved grid g, searching half the rays and
// mirroring the others when mirror is true (g.Rays even).
func find(st *Section, o *planes.Orientation, c planes.Criterion, g Grid, outline []Span, mirror bool) Zone {
	var p probe
	p.init(st, o, c, g)
	nan := math.NaN()
	z := Zone{Depth: nan, Angle: nan, OpeningDepth: nan, FarField: p.res}

	dth := 360.0 / float64(g.Rays)
	bestK, openK := -1, -1
	var best, bestOpen, sq float64
	rays, weight := g.Rays, 1.0
	if mirror {
		rays, weight = g.Rays/2, 2
	}
	for k := range rays {
		th := float64(k) * dth
		ray := st.Opening.Ray(st.Up, st.Right, st.Along, th)
		s := p.scan(&ray)
		if outline != nil {
			outline[k] = Span{Theta: th, Inner: s.inner, Outer: s.outer}
			if mirror {
				outline[k+rays] = Span{Theta: float64(k+rays) * dth, Inner: s.inner, Outer: s.outer}
			}
		}
		if math.IsNaN(s.inner) {
			continue
		}
		z.Flags |= Exists | s.flags
		sq += weight * s.sq
		if s.outer > best {
			best, bestK = s.outer, k
		}
		if s.openOuter > bestOpen {
			bestOpen, openK = s.openOuter, k
		}
	}
	if bestK < 0 {
		return z
	}
	z.Area = sq / 2 * dth * geom.Rad
	angle := float64(bestK) * dth
	if best < p.rOut {
		angle, best = p.refine(angle, dth, best, isZone)
	}
	z.Depth, z.Angle = best-p.a, geom.Azimuth(angle)
	if openK >= 0 {
		if bestOpen < p.rOut {
			_, bestOpen = p.refine(float64(openK)*dth, dth, bestOpen, isOpen)
		}
		z.OpeningDepth = bestOpen - p.a
		if z.OpeningDepth < 2*rootTol*p.a {
			z.OpeningDepth = 0 // the wall alone, within the bisection's resolution
		}
	}
	return z
}

// rootTol is the resolution of the bisections, relative to the radius.
const rootTol = 1e-9

// Which part of the zone a search follows.
const (
	isZone = iota // critical or opening
	isOpen        // opening only
)

// probe evaluates the plane's state at points of the rock with
// planes.StateOf, the verdict of planes.ResolveTo without the values a zone
// does not read (rake, sense, tendencies). Its state s has the far field's
// principal stresses, computed once: the verdict reads Principal only for
// its relative shear floor (1e-12 of the largest principal magnitude); it
// depends on Total, the pore pressure and the criterion. This keeps the
// search free of an eigen-decomposition per point (tested against
// planes.ResolveTo on a fresh insitu.NewState at each point).
type probe struct {
	st  *Section
	o   *planes.Orientation
	c   planes.Criterion
	s   insitu.State
	res planes.PlaneState // of the last point probed

	a, rOut, h float64
	m, nb      int       // steps per ray, bisection halvings
	pp         []float64 // pore pressure at the grid radii, radius(j)
}

// radius returns the j-th grid radius on a ray, j ∈ [0, m]: the wall, steps
// of h, and exactly the outer radius at j = m.
func (p *probe) radius(j int) float64 {
	if j == p.m {
		return p.rOut
	}
	return p.a + float64(j)*p.h
}

func (p *probe) init(st *Section, o *planes.Orientation, c planes.Criterion, g Grid) {
	p.st, p.o, p.c = st, o, c
	p.a = st.Opening.Radius
	p.rOut = g.Outer * p.a
	p.m = int(math.Ceil((g.Outer - 1) / g.Step * (1 - 1e-12)))
	p.h = (p.rOut - p.a) / float64(p.m)
	p.nb = int(math.Ceil(math.Log2(p.h / (rootTol * p.a))))
	// The far field in NED: the rows of the tunnel frame turned back.
	u, r, l := st.Up, st.Right, st.Along
	far := st.Opening.Far.Rotate([3]r3.Vec{{X: u.X, Y: r.X, Z: l.X}, {X: u.Y, Y: r.Y, Z: l.Y}, {X: u.Z, Y: r.Z, Z: l.Z}})
	p.s = insitu.NewState(far, st.Depth, st.Pore(p.rOut), st.Biot)
	p.res = planes.StateOf(&p.s, p.o, p.c)
	// The pore pressure at the grid radii, the same on every ray, once.
	p.pp = make([]float64, p.m+1)
	for j := range p.pp {
		p.pp[j] = st.Pore(p.radius(j))
	}
}

// inGrid is in at the j-th grid radius, with its pore pressure taken from
// the table.
func (p *probe) inGrid(y *opening.Ray, j int) bool {
	p.s.Total = y.TensorAt(p.radius(j))
	p.s.PorePressure = p.pp[j]
	p.res = planes.StateOf(&p.s, p.o, p.c)
	return p.res != planes.Stable
}

// in reports whether the point at r on ray y is in the part of the zone
// followed by mode.
func (p *probe) in(y *opening.Ray, r float64, mode int) bool {
	p.s.Total = y.TensorAt(r)
	p.s.PorePressure = p.st.Pore(r)
	p.res = planes.StateOf(&p.s, p.o, p.c)
	if mode == isOpen {
		return p.res == planes.Opening
	}
	return p.res != planes.Stable
}

// bisect returns the boundary of the mode's part between lo and hi, where
// the state at lo is inLo and the state at hi is not.
func (p *probe) bisect(y *opening.Ray, lo, hi float64, inLo bool, mode int) float64 {
	for range p.nb {
		mid := (lo + hi) / 2
		if p.in(y, mid, mode) == inLo {
			lo = mid
		} else {
			hi = mid
		}
	}
	return (lo + hi) / 2
}

// rayScan is the zone on one ray: least and greatest radius (NaN for none),
// Σ(r_out² − r_in²) over its parts, the greatest radius of its opening part
// (0 for none) and the flags it sets.
type rayScan struct {
	inner, outer, sq, openOuter float64
	flags                       Flags
}

func (p *probe) scan(y *opening.Ray) rayScan {
	s := rayScan{inner: math.NaN(), outer: math.NaN()}
	r0 := p.a
	p.inGrid(y, 0)
	st0 := p.res
	in0, op0 := st0 != planes.Stable, st0 == planes.Opening
	start := r0
	if in0 {
		s.inner = r0
		s.flags |= AtWall
	}
	if op0 {
		s.openOuter = r0
		s.flags |= Opens
	}
	for j := 1; j <= p.m; j++ {
		r := p.radius(j)
		p.inGrid(y, j)
		st := p.res
		in, op := st != planes.Stable, st == planes.Opening
		if in != in0 {
			b := p.bisect(y, r0, r, in0, isZone)
			if in {
				start = b
				if math.IsNaN(s.inner) {
					s.inner = b
				}
			} else {
				s.sq += b*b - start*start
				s.outer = b
			}
		}
		if op {
			s.openOuter = r
			s.flags |= Opens
		} else if op0 {
			s.openOuter = p.bisect(y, r0, r, true, isOpen)
			s.flags |= Opens
		}
		r0, in0, op0 = r, in, op
	}
	if in0 {
		s.sq += p.rOut*p.rOut - start*start
		s.outer = p.rOut
		s.flags |= ReachesOuter
	}
	return s
}
