package plots

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestChordOutside(t *testing.T) {
	// The line through (0, o) along x, outside the circle of radius a and
	// inside that of radius w (derived: x² + o² = R²).
	const tol = 1e-12
	for _, c := range []struct {
		name string
		o    float64
		want [][2]float64 // x ranges
	}{
		{"through the axis", 0, [][2]float64{{-2, -1}, {1, 2}}},
		{"missing the opening", 1.5, [][2]float64{{-math.Sqrt(4 - 2.25), math.Sqrt(4 - 2.25)}}},
		{"missing the view", 2.5, nil},
		{"cutting the opening", 0.6, [][2]float64{{-math.Sqrt(4 - 0.36), -0.8}, {0.8, math.Sqrt(4 - 0.36)}}},
	} {
		t.Run(c.name, func(t *testing.T) {
			got := chordOutside([2]float64{0, c.o}, [2]float64{1, 0}, 1, 2)
			if len(got) != len(c.want) {
				t.Fatalf("%v, want %v", got, c.want)
			}
			for i, s := range got {
				if !scalar.EqualWithinAbs(s[0][0], c.want[i][0], tol) || !scalar.EqualWithinAbs(s[1][0], c.want[i][1], tol) || s[0][1] != c.o || s[1][1] != c.o {
					t.Errorf("segment %d: %v, want x %v at y %v", i, s, c.want[i], c.o)
				}
			}
		})
	}
}

func TestLobes(t *testing.T) {
	// Runs of rays with a zone, on 12 rays every 30°: one through the crown
	// is one lobe; all rays make one full ring; radii are clipped to the view.
	nan := math.NaN()
	mk := func(on ...int) SectionZone {
		z := SectionZone{}
		for k := range 12 {
			z.Theta = append(z.Theta, float64(30*k))
			z.Inner = append(z.Inner, nan)
			z.Outer = append(z.Outer, nan)
		}
		for _, k := range on {
			z.Inner[k], z.Outer[k] = 1, 3
		}
		return z
	}
	if ls := lobes(mk(11, 0, 1, 5), 2.5); len(ls) != 2 || len(ls[0].theta) != 1 || len(ls[1].theta) != 3 || ls[1].theta[0] != 330 || ls[1].outer[0] != 2.5 {
		t.Errorf("through the crown: %+v", ls)
	}
	all := make([]int, 12)
	for k := range all {
		all[k] = k
	}
	if ls := lobes(mk(all...), 5); len(ls) != 1 || !ls[0].full || len(ls[0].theta) != 12 {
		t.Errorf("all round: %+v", ls)
	}
	if ls := lobes(mk(), 5); len(ls) != 0 {
		t.Errorf("none: %+v", ls)
	}
}
