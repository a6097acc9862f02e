package insitu

import (
	"cleft/insitu/geom"

	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestDensityGradient(t *testing.T) {
	// Common practice: 2700 kg/m³ rock gives a lithostatic gradient of about
	// 0.0265 MPa/m; water 1000 kg/m³ gives 0.00981 MPa/m.
	const readTol = 0.00005 // MPa/m: half a unit in the 4th decimal of 0.0265
	if got := DensityGradient(2700); !scalar.EqualWithinAbs(got, 0.0265, readTol) {
		t.Errorf("DensityGradient(2700) = %v, want ≈ 0.0265", got)
	}
	if got := DensityGradient(1000); !scalar.EqualWithinAbs(got, Hydrostatic, tol) {
		t.Errorf("DensityGradient(1000) = %v, want %v", got, Hydrostatic)
	}
}

func TestSheorey(t *testing.T) {
	// Sheorey (1994), as given by Hoek (read for units): k = 0.25 + 7·Eh·(0.001 + 1/z),
	// Eh in GPa, z in m. Derived: z = 1000 m, Eh = 50 GPa → 0.95; z = 500 m, Eh = 20 → 0.67.
	if got := SheoreyK(50, 1000); !scalar.EqualWithinAbs(got, 0.95, tol) {
		t.Errorf("k(50 GPa, 1000 m) = %v, want 0.95", got)
	}
	if got := SheoreyK(20, 500); !scalar.EqualWithinAbs(got, 0.67, tol) {
		t.Errorf("k(20 GPa, 500 m) = %v, want 0.67", got)
	}
	m, err := NewGradientModel(0.027, Horizontal{Kind: Sheorey, Value: 50}, Horizontal{Kind: Sheorey, Value: 50}, 0, Water{Dry: true, Biot: 1})
	if err != nil {
		t.Fatal(err)
	}
	for _, z := range []float64{10, 500, 1000, 3000} {
		sh, _, sv := m.Magnitudes(z)
		if !scalar.EqualWithinAbsOrRel(sh, SheoreyK(50, z)*sv, tol, tol) {
			t.Errorf("z = %v: Sh = %v, want k·Sv = %v", z, sh, SheoreyK(50, z)*sv)
		}
	}
	// At the surface k·Sv tends to 7·Eh·γ.
	if sh, _, _ := m.Magnitudes(0); !scalar.EqualWithinAbs(sh, 7*50*0.027, tol) {
		t.Errorf("Sh(0) = %v, want 7·Eh·γ = %v", sh, 7*50*0.027)
	}
}

func TestGradientModel(t *testing.T) {
	w := Water{Gradient: Hydrostatic, Table: 10, Biot: 1}
	m, err := NewGradientModel(0.025, Horizontal{Kind: EffectiveRatio, Value: 1.5}, Horizontal{Kind: Gradient, Value: 0.015, Offset: 1}, 60, w)
	if err != nil {
		t.Fatal(err)
	}
	z := 210.0
	s := m.At(z)
	sv, pp := 0.025*z, Hydrostatic*200
	if !scalar.EqualWithinAbs(s.PorePressure, pp, tol) {
		t.Errorf("Pp = %v, want %v", s.PorePressure, pp)
	}
	shmax := pp + 1.5*(sv-pp)
	shmin := 1 + 0.015*z
	want := Andersonian(shmax, shmin, sv, 60)
	if s.Total != want {
		t.Errorf("tensor = %+v, want %+v", s.Total, want)
	}
	ref := s.Total.Principal()
	const (
		valueTol = 1e-9 // MPa
		axisTol  = 1e-6 // degrees between axes
	)
	for i := range 3 {
		if !scalar.EqualWithinAbs(s.Principal.Values[i], ref.Values[i], valueTol) || geom.AxialAngle(s.Principal.Axes[i], ref.Axes[i]) > axisTol {
			t.Errorf("principal %d = %v %v, want %v %v", i, s.Principal.Values[i], s.Principal.Axis(i), ref.Values[i], ref.Axis(i))
		}
	}
	if s0 := m.At(0); s0.PorePressure != 0 || s0.Total.DD != 0 {
		t.Errorf("surface state = %+v, want Sv = Pp = 0", s0)
	}
}

func TestGradientModelRejects(t *testing.T) {
	ok := Horizontal{Kind: Ratio, Value: 1}
	w := DefaultWater
	cases := map[string]func() error{
		"zero vertical gradient": func() error { _, err := NewGradientModel(0, ok, ok, 0, w); return err },
		"negative ratio": func() error {
			_, err := NewGradientModel(0.026, Horizontal{Kind: Ratio, Value: -1}, ok, 0, w)
			return err
		},
		"NaN ratio": func() error {
			_, err := NewGradientModel(0.026, ok, Horizontal{Kind: Ratio, Value: math.NaN()}, 0, w)
			return err
		},
		"offset with ratio": func() error {
			_, err := NewGradientModel(0.026, Horizontal{Kind: Ratio, Value: 1, Offset: 2}, ok, 0, w)
			return err
		},
		"shmax below shmin": func() error {
			_, err := NewGradientModel(0.026, Horizontal{Kind: Ratio, Value: 0.7}, ok, 0, w)
			return err
		},
		"azimuth 400": func() error { _, err := NewGradientModel(0.026, ok, ok, 400, w); return err },
		"biot 0":      func() error { _, err := NewGradientModel(0.026, ok, ok, 0, Water{Gradient: 0.01, Biot: 0}); return err },
		"negative water table": func() error {
			_, err := NewGradientModel(0.026, ok, ok, 0, Water{Gradient: 0.01, Table: -1, Biot: 1})
			return err
		},
	}
	for name, f := range cases {
		if f() == nil {
			t.Errorf("%s: no error", name)
		}
	}
}

func TestMeasuredModel(t *testing.T) {
	ref, _ := Components(30, 20, 25, 3, -2, 1)
	m, err := NewMeasuredModel(ref, 400, Proportional, Water{Dry: true, Biot: 1})
	if err != nil {
		t.Fatal(err)
	}
	s := m.At(200)
	want := ref.Principal()
	for i := range 3 {
		if !scalar.EqualWithinAbs(s.Principal.Values[i], want.Values[i]/2, tol) {
			t.Errorf("σ%d at half depth = %v, want %v", i+1, s.Principal.Values[i], want.Values[i]/2)
		}
	}
	if !scalar.EqualWithinAbs(s.Total.NE, 1.5, tol) {
		t.Errorf("NE = %v, want 1.5", s.Total.NE)
	}
	c, _ := NewMeasuredModel(ref, 400, Constant, DefaultWater)
	if c.At(50).Total != ref {
		t.Error("constant scaling changed the tensor")
	}
	if _, err := NewMeasuredModel(ref, 0, Proportional, DefaultWater); err == nil {
		t.Error("proportional scaling with zero reference depth accepted")
	}
}

func TestWater(t *testing.T) {
	w := Water{Gradient: Hydrostatic, Table: 12, Biot: 1}
	if got := w.Pressure(112); !scalar.EqualWithinAbs(got, 0.981, tol) {
		t.Errorf("Pp(112) = %v, want 0.981", got)
	}
	if w.Pressure(5) != 0 {
		t.Error("pressure above the table")
	}
	if (Water{Dry: true, Biot: 1}).Pressure(500) != 0 {
		t.Error("dry model has pressure")
	}
}
