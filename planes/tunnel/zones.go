package tunnel

import (
	"math"
	"runtime"
	"sync"

	"cleft/insitu"
	"cleft/planes"
)

// DefaultInfluence is the radius of influence of a drained opening of
// radius a (m) under a pore pressure pp (MPa) at its axis: twice the head of
// water over the axis, 2·pp/γw with γw = insitu.Hydrostatic, the distance
// to the image of the opening in the water table in the inflow formula of
// Goodman et al. (1965) (memory), and at least 2a.
func DefaultInfluence(pp, a float64) float64 {
	return math.Max(2*pp/insitu.Hydrostatic, 2*a)
}

// Section returns the cross-section of station i for target k, as the zone
// search sees it: the opening with the support pressure in the far field,
// and the pore-pressure rule. With Pp the target's pore pressure at the
// axis depth (the water model, or the target's own excess over it):
//
//	drained wall (Tunnel.Drained):  Drained(Pp, a, Influence), steady radial
//	                                inflow, 0 at the wall, Pp from the radius
//	                                of influence on
//	far-field wall:                 Constant(Pp), as for a watertight lining
//
// Section panics if i or k is out of range.
func (sc *Screening) Section(i, k int) Section {
	res := &sc.Stations[i]
	tg := &sc.Targets[k]
	pp := tg.porePressure(res.State.PorePressure)
	pore := Constant(pp)
	if sc.Tunnel.Drained {
		var err error
		if pore, err = Drained(pp, sc.Tunnel.Radius, res.Influence); err != nil {
			panic("tunnel: " + err.Error()) // Screen checked the values
		}
	}
	st, err := NewSection(res.Opening, res.Up, res.Right, res.Along, res.Depth, res.State.Biot, pore)
	if err != nil {
		panic("tunnel: " + err.Error()) // Screen built the values
	}
	return st
}

// Outline returns the span of target k's zone on each ray of the zone grid
// at station i (see Find), from the same search as Row.Zone.
func (sc *Screening) Outline(i, k int) []Span {
	g := sc.Tunnel.ZoneGrid.resolved()
	out := make([]Span, g.Rays)
	st := sc.Section(i, k)
	Find(&st, &sc.Targets[k].Orientation, sc.Targets[k].Criterion, g, out)
	return out
}

// findZones fills Row.Zone of every station and target, one worker per CPU
// taking stations in turn; each zone is independent of the others, so the
// result does not depend on the number of workers.
func (sc *Screening) findZones() {
	g := sc.Tunnel.ZoneGrid.resolved()
	next := make(chan int)
	var wg sync.WaitGroup
	for range min(runtime.GOMAXPROCS(0), len(sc.Stations)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range next {
				for k := range sc.Targets {
					st := sc.Section(i, k)
					sc.Stations[i].Rows[k].Zone = Find(&st, &sc.Targets[k].Orientation, sc.Targets[k].Criterion, g, nil)
				}
			}
		}()
	}
	for i := range sc.Stations {
		next <- i
	}
	close(next)
	wg.Wait()
}

// Extent says how far a zone reaches.
type Extent int

const (
	NoZone Extent = iota // no point of the grid is in the zone
	// Bounded: the zone ends inside the grid, so Zone.Depth is its greatest
	// depth.
	Bounded
	// PastGrid: the zone reaches the grid's outer radius, so Zone.Depth is a
	// lower bound.
	PastGrid
	// Unbounded: the target is critical or opening in the far field (Row.Far),
	// so a zone of potential slip has no end, whatever the search found
	// near the opening.
	Unbounded
)

// String returns the extent as the tables write it: "", "bounded", "past
// the grid", "unbounded".
func (e Extent) String() string {
	switch e {
	case Bounded:
		return "bounded"
	case PastGrid:
		return "past the grid"
	case Unbounded:
		return "unbounded"
	}
	return ""
}

// Extent returns how far the row's zone reaches.
func (r *Row) Extent() Extent {
	switch {
	case r.Far.State != planes.Stable:
		return Unbounded
	case !r.Zone.Flags.Has(Exists):
		return NoZone
	case r.Zone.Flags.Has(ReachesOuter):
		return PastGrid
	}
	return Bounded
}

// deeper reports whether row a's zone reaches deeper than row b's:
// by extent first (unbounded, past the grid, bounded), then by depth.
func deeper(a, b *Row) bool {
	ea, eb := a.Extent(), b.Extent()
	if ea != eb {
		return ea > eb
	}
	return a.Zone.Depth > b.Zone.Depth
}

// Deepest returns the index of the target whose zone reaches deepest at
// the station (by extent, then depth; the first of equals), or −1 when no
// target has a zone.
func (r *Result) Deepest() int {
	best := -1
	for k := range r.Rows {
		if r.Rows[k].Extent() != NoZone && (best < 0 || deeper(&r.Rows[k], &r.Rows[best])) {
			best = k
		}
	}
	return best
}

// Deepest returns the station and target of the deepest zone of target k
// (of any target when k < 0), counting only bounded zones when bounded is
// true (the zones whose depth is known), else by extent then depth; the
// first of equals. ok is false when there is no such zone.
func (sc *Screening) Deepest(k int, bounded bool) (station, target int, ok bool) {
	station, target = -1, -1
	for i := range sc.Stations {
		for j := range sc.Stations[i].Rows {
			if k >= 0 && j != k {
				continue
			}
			r := &sc.Stations[i].Rows[j]
			e := r.Extent()
			if e == NoZone || (bounded && e != Bounded) {
				continue
			}
			if station < 0 || deeper(r, &sc.Stations[station].Rows[target]) {
				station, target = i, j
			}
		}
	}
	return station, target, station >= 0
}

// Deeper returns the stretches where target k's zone reaches deeper than
// the tunnel's zone depth limit (Tunnel.Limit) beyond the wall: zones deeper
// than it, zones past the grid (whose depth is at least the grid's), and
// unbounded zones.
func (sc *Screening) Deeper(k int) []Stretch {
	lim := sc.Tunnel.Limit()
	return sc.Stretches(func(r *Result) bool {
		row := &r.Rows[k]
		e := row.Extent()
		return e == Unbounded || e == PastGrid || row.Zone.Depth > lim
	})
}
