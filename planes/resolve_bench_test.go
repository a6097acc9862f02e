package planes

import (
	"testing"

	"cleft/insitu"
)

var sink Result

// BenchmarkResolve measures one plane: the far-field state at its depth from
// a gradient model and the full Result with a Coulomb criterion.
func BenchmarkResolve(b *testing.B) {
	m, err := insitu.NewGradientModel(0.0265, insitu.Horizontal{Kind: insitu.Ratio, Value: 1.3}, insitu.Horizontal{Kind: insitu.Ratio, Value: 0.8}, 65, insitu.Water{Gradient: insitu.Hydrostatic, Table: 12, Biot: 1})
	if err != nil {
		b.Fatal(err)
	}
	os := make([]Orientation, 1024)
	for i := range os {
		os[i] = MustNew(float64(i%91), float64((i*37)%360))
	}
	c := &Coulomb{Mu: 0.6}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		sink = Resolve(m.At(150+float64(i&63)), os[i&1023], c)
	}
}

// BenchmarkResolveOnly is Resolve alone on a fixed state.
func BenchmarkResolveOnly(b *testing.B) {
	s := insitu.NewState(insitu.Andersonian(30, 15, 20, 65), 150, 1.4, 1)
	os := make([]Orientation, 1024)
	for i := range os {
		os[i] = MustNew(float64(i%91), float64((i*37)%360))
	}
	c := &Coulomb{Mu: 0.6}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		sink = Resolve(s, os[i&1023], c)
	}
}

// BenchmarkResolveTo is the copy-free form used by the streaming commands.
func BenchmarkResolveTo(b *testing.B) {
	s := insitu.NewState(insitu.Andersonian(30, 15, 20, 65), 150, 1.4, 1)
	os := make([]Orientation, 1024)
	for i := range os {
		os[i] = MustNew(float64(i%91), float64((i*37)%360))
	}
	c := &Coulomb{Mu: 0.6}
	var r Result
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		ResolveTo(&r, &s, &os[i&1023], c)
	}
	sink = r
}
