package insitu

import (
	"testing"
)

// TestGradientModelTrigonometry checks that the sine and cosine kept from
// construction give the same state as computing them at each call: a model
// built as a literal, and one whose azimuth was changed after construction,
// agree to the bit with a model newly built for that azimuth.
func TestGradientModelTrigonometry(t *testing.T) {
	w := Water{Gradient: Hydrostatic, Table: 10, Biot: 1}
	sh, sm := Horizontal{Kind: Ratio, Value: 1.4}, Horizontal{Kind: Ratio, Value: 0.8}
	for _, az := range []float64{0, 37.5, 90, 128, 300} {
		fresh, err := NewGradientModel(0.026, sh, sm, az, w)
		if err != nil {
			t.Fatal(err)
		}
		literal := &GradientModel{VerticalGradient: 0.026, SHmax: sh, Shmin: sm, Azimuth: az, Water: w}
		changed, _ := NewGradientModel(0.026, sh, sm, 200, w)
		changed.Azimuth = az
		for _, z := range []float64{0, 55, 1234.5} {
			want := fresh.At(z)
			if got := literal.At(z); got != want {
				t.Errorf("az %v z %v: literal model %+v, want %+v", az, z, got, want)
			}
			if got := changed.At(z); got != want {
				t.Errorf("az %v z %v: changed model %+v, want %+v", az, z, got, want)
			}
		}
	}
}

func BenchmarkGradientModelAt(b *testing.B) {
	m, err := NewGradientModel(0.0265, Horizontal{Kind: Ratio, Value: 1.35}, Horizontal{Kind: Ratio, Value: 0.72}, 128, Water{Gradient: Hydrostatic, Table: 18, Biot: 1})
	if err != nil {
		b.Fatal(err)
	}
	var s State
	z := 0.0
	for b.Loop() {
		s = m.At(z)
		z += 0.5
	}
	_ = s
}
