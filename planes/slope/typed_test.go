package slope

import (
	"math"
	"testing"

	"cleft/planes"
)

func TestPlanesWithoutADipDirection(t *testing.T) {
	// A horizontal plane has no dip direction and a vertical one two: the
	// tests take the reading that matters (Typed), so the reasons given do
	// not depend on the typed direction (this tool's rule). Face 60/180,
	// φ 30°, limits 20°.
	f := planes.MustNew(60, 180)
	for _, dd := range []float64{0, 90, 180, 270} {
		flat := planes.MustNew(0, dd)
		// Hoek & Bray (1981): a plane flatter than φ cannot slide, the only
		// failed condition once it is taken as dipping towards the face.
		if k := PlanarSliding(flat, f, 30, 20); k.Fails != Friction {
			t.Errorf("planar, 0/%03.0f: fails %b, want friction alone", dd, k.Fails)
		}
		// Goodman & Bray (1976): (90° − 0°) + 30° = 120° > 60°, the only
		// failed condition once it is taken as dipping into the face.
		if k := FlexuralToppling(flat, f, 30, 20); k.Fails != Toppling || k.ToppleSum != 120 {
			t.Errorf("toppling, 0/%03.0f: fails %b, sum %v; want toppling alone, 120", dd, k.Fails, k.ToppleSum)
		}
	}
	// A vertical plane never daylights (it is as steep as any face): that
	// is its only failed condition in the sense nearer the face.
	for _, dd := range []float64{170, 350} {
		if k := PlanarSliding(planes.MustNew(90, dd), f, 30, 20); k.Fails != Daylight {
			t.Errorf("planar, 90/%03.0f: fails %b, want daylight alone", dd, k.Fails)
		}
	}
	// A wedge never slides on a (near-)vertical plane alone: gravity has no
	// component across it. 90/090 with 40/340 meet in the line 000/38.26
	// (derived: the line lies in the north–south vertical plane, where
	// 40/340 dips atan(tan 40° cos 20°) = 38.256°). On a face 60/120 it
	// points into the slope (120° from the face's dip direction); neither
	// dip direction of the vertical plane counts, so the φ reported is that
	// of sliding on both planes, the smaller of 30° and 20°, whichever way
	// it is typed (typed 90/090, its dip direction would lie between the
	// line's trend and the face's, and its own 30° would be reported).
	b := planes.MustNew(40, 340)
	const (
		angleTol = 1e-9 // degrees
		readTol  = 1e-4 // degrees: 38.2556 is given to four decimals
	)
	for _, dd := range []float64{90, 270} {
		l, _, k := WedgeSliding(planes.MustNew(90, dd), b, planes.MustNew(60, 120), 30, 20)
		if k.Phi != 20 || k.Fails != Daylight || math.Abs(l.Trend) > angleTol || math.Abs(l.Plunge-38.2556) > readTol {
			t.Errorf("90/%03.0f + 40/340: line %v, fails %b, φ %v; want 000/38.26, daylight alone, 20", dd, l, k.Fails, k.Phi)
		}
	}
}
