package insitu

import (
	"cleft/insitu/geom"

	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestFromPrincipal(t *testing.T) {
	const angleTol = 1e-9 // degrees
	t.Run("orthogonal axes kept, order sorted", func(t *testing.T) {
		p, fit, err := FromPrincipal([3]float64{20, 35, 12}, [3]geom.Line{{Trend: 90, Plunge: 0}, {Trend: 0, Plunge: 0}, {Trend: 0, Plunge: 90}})
		if err != nil {
			t.Fatal(err)
		}
		if fit.Misfit > angleTol || fit.Moved > angleTol {
			t.Errorf("fit = %+v, want zero", fit)
		}
		if p.Values != [3]float64{35, 20, 12} {
			t.Errorf("values = %v", p.Values)
		}
		if a := p.Axis(0); geom.AxialAngle(a.Vec(), geom.Line{Trend: 0, Plunge: 0}.Vec()) > angleTol {
			t.Errorf("σ1 axis = %v, want 000/00", a)
		}
	})
	t.Run("small misfit corrected and reported", func(t *testing.T) {
		_, fit, err := FromPrincipal([3]float64{30, 20, 10}, [3]geom.Line{{Trend: 91.5, Plunge: 0}, {Trend: 0, Plunge: 0}, {Trend: 0, Plunge: 90}})
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinAbs(fit.Misfit, 1.5, angleTol) || fit.Moved <= 0 || fit.Moved > 1.5 {
			t.Errorf("fit = %+v, want misfit 1.5 and a move in (0, 1.5]", fit)
		}
	})
	t.Run("large misfit rejected", func(t *testing.T) {
		if _, _, err := FromPrincipal([3]float64{30, 20, 10}, [3]geom.Line{{Trend: 95, Plunge: 0}, {Trend: 0, Plunge: 0}, {Trend: 0, Plunge: 90}}); err == nil {
			t.Error("5° misfit accepted")
		}
	})
}

func TestShape(t *testing.T) {
	p := Principal{Values: [3]float64{30, 20, 10}}
	if got := p.Shape(); !scalar.EqualWithinAbs(got, 0.5, tol) {
		t.Errorf("φ = %v, want 0.5", got)
	}
	iso := Principal{Values: [3]float64{7, 7, 7}}
	if got := iso.Shape(); got == got {
		t.Errorf("isotropic φ = %v, want NaN", got)
	}
}

func TestRegimeAndAPhi(t *testing.T) {
	const (
		shapeTol = 1e-9 // φ and Aφ, both in [0, 3]
		angleTol = 1e-9 // degrees
	)
	cases := []struct {
		name         string
		shmax, shmin float64
		sv           float64
		want         Regime
		phi, aphi    float64
	}{
		// Aφ (Simpson 1997; memory): Aφ = (n + 0.5) + (−1)ⁿ(φ − 0.5).
		{"normal", 30, 20, 40, Normal, 0.5, 0.5},
		{"strike-slip", 40, 20, 25, StrikeSlip, 0.25, 1.75},
		{"reverse", 40, 30, 20, Reverse, 0.5, 2.5},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			p := Andersonian(c.shmax, c.shmin, c.sv, 30).Principal()
			f := p.Regime()
			if f.Regime != c.want || !f.Andersonian() {
				t.Errorf("regime = %v (tilt %v), want %v", f.Regime, f.Tilt, c.want)
			}
			if phi := p.Shape(); !scalar.EqualWithinAbs(phi, c.phi, shapeTol) {
				t.Errorf("φ = %v, want %v", phi, c.phi)
			}
			if a := APhi(f.Regime, p.Shape()); !scalar.EqualWithinAbs(a, c.aphi, shapeTol) {
				t.Errorf("Aφ = %v, want %v", a, c.aphi)
			}
		})
	}
	t.Run("tilted state names the nearest vertical axis", func(t *testing.T) {
		p, _, err := FromPrincipal([3]float64{50, 30, 20}, [3]geom.Line{{Trend: 40, Plunge: 70}, {Trend: 220, Plunge: 20}, {Trend: 130, Plunge: 0}})
		if err != nil {
			t.Fatal(err)
		}
		f := p.Regime()
		if f.Regime != Normal || !scalar.EqualWithinAbs(f.Tilt, 20, angleTol) || f.Andersonian() {
			t.Errorf("fit = %+v, want normal, tilt 20, not Andersonian", f)
		}
	})
}
