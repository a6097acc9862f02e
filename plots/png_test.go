package plots

import (
	"bytes"
	"image"
	"image/color"
	"image/png"
	"io"
	"math"
	"math/rand/v2"
	"testing"

	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
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
	st.Field = NewField(s, c, SlipTendency, EqualArea, FieldSize(19*vg.Centimeter, 13.5*vg.Centimeter))
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
	d.Field, d.Kamb = NewDensityField(EqualArea, d.Poles, nil, FieldSize(19*vg.Centimeter, 13.5*vg.Centimeter))
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

// pngBefore writes f as Write did before pngEncoder: through
// vgimg.PngCanvas, at the default compression level.
func pngBefore(f Figure, w, h vg.Length, out io.Writer) error {
	c := vgimg.PngCanvas{Canvas: vgimg.NewWith(vgimg.UseWH(w, h), vgimg.UseDPI(PNGDPI), vgimg.UseBackgroundColor(color.White))}
	f.Draw(draw.New(c))
	_, err := c.WriteTo(out)
	return err
}

func decodePNG(t *testing.T, b []byte) image.Image {
	t.Helper()
	img, err := png.Decode(bytes.NewReader(b))
	if err != nil {
		t.Fatal(err)
	}
	return img
}

func TestWritePNGSamePixels(t *testing.T) {
	// The faster encoder changes the compression only: every figure decodes
	// (image/png) to the same pixels as through vgimg.PngCanvas.
	figs := []struct {
		name string
		f    Figure
	}{{"stereonet", demoStereonet()}, {"density", demoDensity()}, {"mohr", demoMohr()}}
	for _, fg := range figs {
		t.Run(fg.name, func(t *testing.T) {
			var before, after bytes.Buffer
			if err := pngBefore(fg.f, benchW, benchH, &before); err != nil {
				t.Fatal(err)
			}
			if err := Write(fg.f, benchW, benchH, "png", &after); err != nil {
				t.Fatal(err)
			}
			a, b := decodePNG(t, before.Bytes()), decodePNG(t, after.Bytes())
			if a.Bounds() != b.Bounds() {
				t.Fatalf("bounds %v, before %v", b.Bounds(), a.Bounds())
			}
			r := a.Bounds()
			if r.Dx() != int(math.Round(float64(benchW/vg.Inch)*PNGDPI)) {
				t.Errorf("width %d px, want %v in at %d dpi", r.Dx(), benchW/vg.Inch, PNGDPI)
			}
			differ := 0
			for y := r.Min.Y; y < r.Max.Y; y++ {
				for x := r.Min.X; x < r.Max.X; x++ {
					if color.NRGBA64Model.Convert(a.At(x, y)) != color.NRGBA64Model.Convert(b.At(x, y)) {
						differ++
					}
				}
			}
			if differ > 0 {
				t.Errorf("%d of %d pixels differ", differ, r.Dx()*r.Dy())
			}
			t.Logf("%d bytes, before %d", after.Len(), before.Len())
		})
	}
}

// BenchmarkEncodePNG times the encoding alone of a drawn figure: "before"
// is vgimg.PngCanvas (default compression), "after" writePNG.
func BenchmarkEncodePNG(b *testing.B) {
	for _, fg := range benchFigures(b) {
		c := vgimg.NewWith(vgimg.UseWH(benchW, benchH), vgimg.UseDPI(PNGDPI), vgimg.UseBackgroundColor(color.White))
		fg.f.Draw(draw.New(c))
		for _, enc := range []struct {
			name  string
			write func(io.Writer) error
		}{
			{"before", func(w io.Writer) error { _, err := (vgimg.PngCanvas{Canvas: c}).WriteTo(w); return err }},
			{"after", func(w io.Writer) error { return writePNG(w, c.Image()) }},
		} {
			b.Run(fg.name+"/"+enc.name, func(b *testing.B) {
				var buf bytes.Buffer
				for b.Loop() {
					buf.Reset()
					if err := enc.write(&buf); err != nil {
						b.Fatal(err)
					}
				}
				b.ReportMetric(float64(buf.Len()), "bytes/png")
			})
		}
	}
}
