package opening

import (
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
)

var (
	sinkTensor insitu.Tensor
	sinkPeak   Peak
)

// BenchmarkRayTensorAt is one point of the field as a NED tensor, the inner
// step of a zone search.
func BenchmarkRayTensorAt(b *testing.B) {
	c, err := NewCircle(insitu.Tensor{NN: 20, EE: 22.5, DD: 22.5, ED: 7.5, NE: -3, ND: 1}, 4, 0.25, 0.2)
	if err != nil {
		b.Fatal(err)
	}
	up, right, along := TunnelFrame(geom.Line{Trend: 30, Plunge: 3})
	ray := c.Ray(up, right, along, 37)
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		sinkTensor = ray.TensorAt(4 + float64(i&1023)*0.02)
	}
}

// BenchmarkCircleAt is Circle.At with its trigonometry, then Polar.Tensor.
func BenchmarkCircleAt(b *testing.B) {
	c, err := NewCircle(insitu.Tensor{NN: 20, EE: 22.5, DD: 22.5, ED: 7.5, NE: -3, ND: 1}, 4, 0.25, 0.2)
	if err != nil {
		b.Fatal(err)
	}
	up, right, along := TunnelFrame(geom.Line{Trend: 30, Plunge: 3})
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		th := float64(i&255) * 1.4
		sinkTensor = c.At(4+float64(i&1023)*0.02, th).Tensor(up, right, along, th)
	}
}

// BenchmarkMaxWallPrincipal is one located peak of the wall principal stress.
func BenchmarkMaxWallPrincipal(b *testing.B) {
	far := insitu.Tensor{NN: 20, EE: 22.5, DD: 22.5, ED: 7.5, NE: -3, ND: 1}
	b.ReportAllocs()
	for b.Loop() {
		sinkPeak = MaxWallPrincipal(far, 0.25, 0)
	}
}

// BenchmarkMaxTangential is the closed-form tangential peak.
func BenchmarkMaxTangential(b *testing.B) {
	far := insitu.Tensor{NN: 20, EE: 22.5, DD: 22.5, ED: 7.5, NE: -3, ND: 1}
	b.ReportAllocs()
	for b.Loop() {
		sinkPeak = MaxTangential(far, 0.1)
	}
}
