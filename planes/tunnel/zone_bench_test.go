package tunnel

import (
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"
)

var sinkZone Zone

// benchStation is an oblique case: a drive 030/05 under SHmax 30 MPa at
// azimuth 065, Shmin 15, Sv 20, hydrostatic pore pressure 2 MPa, and the
// plane 60/110 with μ = 0.5.
func benchStation(b *testing.B) (Section, planes.Orientation, planes.Criterion) {
	s, c := geom.SinCosDeg(65)
	ned := insitu.Tensor{NN: 30*c*c + 15*s*s, EE: 30*s*s + 15*c*c, DD: 20, NE: 15 * c * s}
	st := station(b, ned, geom.Line{Trend: 30, Plunge: 5}, 4, 0.25, 0, 1, Constant(2))
	return st, planes.MustNew(60, 110), coulomb(b, 0.5, 0)
}

// BenchmarkFind is one zone search on the default grid (360 rays, steps of
// 0.01a out to 6a) with the outline.
func BenchmarkFind(b *testing.B) {
	st, o, k := benchStation(b)
	out := make([]Span, DefaultRays)
	b.ReportAllocs()
	for b.Loop() {
		sinkZone = Find(&st, &o, k, Grid{}, out)
	}
}

// BenchmarkFind72 is the same search on 72 rays.
func BenchmarkFind72(b *testing.B) {
	st, o, k := benchStation(b)
	b.ReportAllocs()
	for b.Loop() {
		sinkZone = Find(&st, &o, k, Grid{Rays: 72}, nil)
	}
}
