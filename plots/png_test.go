package plots

import (
	"bytes"
	"io"
	"math"
	"math/rand/v2"
	"testing"

	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
	"gonum.org/v1/plot/vg"
)

// Figure sizes of the command line's defaults (cmd/cleft/plot.go).
const (
	benchW = 19 * vg.Centimeter
	benchH = 13.5 * vg.Centimeter
)

// demoStereonet is a slip-tendency stereonet of a few planes in demoState.
func demoStereonet() *Stereonet {
	s := demoState()
	c := &planes.Coulomb{Mu: 0.6}
	st := &Stereonet{Site: "bench", Model: "demo", Depth: 200, State: s, Criterion: c, Measure: SlipTendency, Proj: EqualArea, Grid: true}
	for i, o := range []planes.Orientation{planes.MustNew(80, 10), planes.MustNew(40, 200), planes.MustNew(88, 350), planes.MustNew(10, 30), planes.MustNew(65, 128)} {
		st.Poles = append(st.Poles, Pole{Name: o.String(), Orientation: o, Result: planes.Resolve(s, o, c), Trace: i%2 == 0})
	}
	return st
}

// demoDensity is a pole-density net of 300 seeded random poles scattered
// round two set means.
func demoDensity() *DensityNet {
	rng := rand.New(rand.NewPCG(7, 11))
	means := []planes.Orientation{planes.MustNew(70, 140), planes.MustNew(30, 260)}
	d := &DensityNet{Site: "bench", Lines: []string{"demo"}, Proj: EqualArea}
	for i := range 300 {
		m := means[i%2].Pole().Vec()
		p := r3.Unit(r3.Add(m, r3.Vec{X: 0.15 * rng.NormFloat64(), Y: 0.15 * rng.NormFloat64(), Z: 0.15 * rng.NormFloat64()}))
		if p.Z < 0 {
			p = r3.Scale(-1, p)
		}
		d.Poles = append(d.Poles, p)
		d.InSet = append(d.InSet, math.Abs(r3.Dot(p, m)) > 0.97)
	}
	return d
}

// benchFigures are the figures the PNG benchmarks draw, with their fields
// computed once beforehand (Draw keeps a field of the right size), so the
// benchmarks time colouring, drawing and encoding only.
func benchFigures(b *testing.B) []struct {
	name string
	f    Figure
} {
	figs := []struct {
		name string
		f    Figure
	}{{"stereonet", demoStereonet()}, {"density", demoDensity()}, {"mohr", demoMohr()}}
	for _, fg := range figs {
		if err := Write(fg.f, benchW, benchH, "png", io.Discard); err != nil {
			b.Fatal(err)
		}
	}
	return figs
}

// BenchmarkWritePNG times Write of whole figures as PNG.
func BenchmarkWritePNG(b *testing.B) {
	for _, fg := range benchFigures(b) {
		b.Run(fg.name, func(b *testing.B) {
			var buf bytes.Buffer
			for b.Loop() {
				buf.Reset()
				if err := Write(fg.f, benchW, benchH, "png", &buf); err != nil {
					b.Fatal(err)
				}
			}
			b.ReportMetric(float64(buf.Len()), "bytes/png")
		})
	}
}
