package tunnel

import (
	"math"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

// measured is a constant measured far field with dry rock.
func measured(t *testing.T, mags [3]float64, axes [3]geom.Line) insitu.Model {
	t.Helper()
	p, _, err := insitu.FromPrincipal(mags, axes)
	if err != nil {
		t.Fatal(err)
	}
	m, err := insitu.NewMeasuredPrincipal(p, 0, insitu.Constant, insitu.Water{Dry: true, Biot: 1})
	if err != nil {
		t.Fatal(err)
	}
	return m
}

func TestExactWallPeak(t *testing.T) {
	const tol = 1e-6
	// Principal stresses 30 MPa (090/45), 20 (000/00), 10 (270/45), a level
	// drive north: in the tunnel frame σ11 = σ22 = 20 and |σ12| = 10
	// (derived), so σθ = 40 ∓ 40 sin 2θ peaks at the closed form σ11 + σ22 +
	// 2√((σ11 − σ22)² + 4σ12²) = 40 + 40 = 80 MPa on the diagonal, 45° (or
	// 135°) from the crown; the 10°-sampled value was 79.39 at 40°.
	m := measured(t, [3]float64{30, 20, 10}, [3]geom.Line{{Trend: 90, Plunge: 45}, {Trend: 0, Plunge: 0}, {Trend: 270, Plunge: 45}})
	tn := Tunnel{Legs: []Leg{{From: 0, To: 10, Trend: 0}}, Cover: [][2]float64{{0, 100}, {10, 100}}, Spacing: 10, Radius: 1, UCS: 100, Poisson: 0.25, Drained: true}
	sc, err := Screen(tn, m, nil)
	if err != nil {
		t.Fatal(err)
	}
	st := sc.Stations[0]
	if !scalar.EqualWithinAbs(st.ThetaMax.Stress, 80, tol) || !scalar.EqualWithinAbs(math.Mod(st.ThetaMax.Theta, 90), 45, tol) {
		t.Errorf("σθ,max %v at %v°, want 80 at 45°", st.ThetaMax.Stress, st.ThetaMax.Theta)
	}
	// Its least is 40 − 40 = 0 at 90° from the peak.
	if !scalar.EqualWithinAbs(st.ThetaMin.Stress, 0, tol) {
		t.Errorf("σθ,min %v, want 0", st.ThetaMin.Stress)
	}
}

func TestSpallingOnTheLargestWallStress(t *testing.T) {
	const tol = 1e-4
	// A level drive north, SHmax 30 MPa at 045, Shmin 15, Sv 20, ν 0.25,
	// UCS 100: at the crown σθ = 47.5, σz = 23.75, τθz = 15 (Hiramatsu & Oka
	// 1962 wall stresses, derived), so the largest wall principal stress is
	// ½(σθ + σz) + √(¼(σθ − σz)² + τθz²) = 54.757 MPa: σmax/UCS 0.548, past
	// the onset of spalling (Martin, Kaiser & McCreath 1999), where σθ alone
	// (0.475) would be at the onset.
	m := measured(t, [3]float64{30, 20, 15}, [3]geom.Line{{Trend: 45, Plunge: 0}, {Trend: 0, Plunge: 90}, {Trend: 135, Plunge: 0}})
	tn := Tunnel{Legs: []Leg{{From: 0, To: 10, Trend: 0}}, Cover: [][2]float64{{0, 100}, {10, 100}}, Spacing: 10, Radius: 1, UCS: 100, Poisson: 0.25, Drained: true}
	sc, err := Screen(tn, m, []Target{{Name: "J", Orientation: planes.MustNew(60, 90), Criterion: &planes.Coulomb{Mu: 0.6}, PoreExcess: math.NaN()}})
	if err != nil {
		t.Fatal(err)
	}
	st := sc.Stations[0]
	if !scalar.EqualWithinAbs(st.WallMax.Stress, 54.7565, tol) || !scalar.EqualWithinAbs(st.Ratio, 0.547565, tol) || opening.SpallingOf(st.Ratio) != opening.PastOnset {
		t.Errorf("largest wall stress %v at %v°, ratio %v", st.WallMax.Stress, st.WallMax.Theta, st.Ratio)
	}
	if w := st.Wall[0]; !scalar.EqualWithinAbs(w.Theta, 47.5, tol) || !scalar.EqualWithinAbs(w.Z, 23.75, tol) || !scalar.EqualWithinAbs(math.Abs(w.ThetaZ), 15, tol) {
		t.Errorf("crown stresses %+v, want 47.5, 23.75, ±15", w)
	}
}
