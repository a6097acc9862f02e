package decide_test

import (
	"math"
	"testing"

	"cleft/planes/assess"
	"cleft/planes/decide"
	"cleft/planes/site"

	"gonum.org/v1/gonum/floats/scalar"
)

// ownSite has a measured stress state that is the same at every depth:
// σ1 = 10 MPa vertical, σ2 = 6 MPa north, σ3 = 4 MPa east, dry, μ = 0.6.
// Each plane dips 60° east, so its pole lies in the σ1–σ3 plane at 60°
// from σ1, and (Jaeger, Cook & Zimmerman 2007, the Mohr-circle forms)
//
//	σn = (σ1 + σ3)/2 + (σ1 − σ3)/2 · cos 120° = 5.5 MPa
//	τ  = (σ1 − σ3)/2 · sin 120°              = 2.5981 MPa
//
// (derived). The planes differ only in their own columns.
const ownSite = `site: own inputs
depth: 100
stress:
  principal:
    - {magnitude: 10, trend: 0, plunge: 90}
    - {magnitude: 6, trend: 0, plunge: 0}
    - {magnitude: 4, trend: 90, plunge: 0}
water: {dry: true}
strength: {friction: 0.6, cohesion: 0}
planes:
  - {name: weak, dip: 60, dip_direction: 90, friction: 0.45}
  - {name: wet, dip: 60, dip_direction: 90, pore_pressure: 6}
  - {name: both, dip: 60, dip_direction: 90, friction: 0.45, cohesion: 0.1}
  - {name: plain, dip: 60, dip_direction: 90}
  - {name: strong, dip: 60, dip_direction: 90, friction: 0.9}
`

func findings(t *testing.T, yaml string) (*assess.Assessment, []decide.Finding) {
	t.Helper()
	s, err := site.Parse([]byte(yaml), "own.yaml")
	if err != nil {
		t.Fatal(err)
	}
	a, err := assess.New(s)
	if err != nil {
		t.Fatal(err)
	}
	return a, decide.Findings(decide.Screenings{A: a})
}

func TestPlaneFindingsAndTheirOwnInputs(t *testing.T) {
	const tol = 1e-4
	sn, tau := 5.5, 1.5*math.Sqrt(3) // MPa, derived above
	_, fs := findings(t, ownSite)
	byName := map[string]decide.Finding{}
	var order []string
	for _, f := range fs {
		byName[f.Name] = f
		order = append(order, f.Name)
	}
	for _, c := range []struct {
		name              string
		measure           decide.Measure
		value             float64 // derived from σn, τ and the plane's strength
		standing          decide.Standing
		reasons, decisive decide.Reason
		siteFS            float64 // with the site's μ 0.6, c 0 and dry: 0.6 σn/τ = 1.2702
	}{
		// μ 0.45: FS = 0.45 σn/τ = 0.9526 ≤ 1; with the site's 0.6 it holds
		// better (near, FS < 1.5): its own friction decides.
		{"weak", decide.FactorOfSafety, 0.45 * sn / tau, decide.Fails, decide.OwnFriction, decide.OwnFriction, 0.6 * sn / tau},
		// Pp 6 MPa on a dry site: σn' = 5.5 − 6 = −0.5 MPa, opening; dry it
		// would not be: its own pore pressure decides.
		{"wet", decide.EffectiveNormal, sn - 6, decide.Fails, decide.OwnPorePressure, decide.OwnPorePressure, 0.6 * sn / tau},
		// μ 0.45 and c 0.1: FS = (0.1 + 0.45 σn)/τ = 0.9910, still ≤ 1
		// without the cohesion (0.9526), > 1 with the site's μ (1.3086):
		// the friction decides, the cohesion does not.
		{"both", decide.FactorOfSafety, (0.1 + 0.45*sn) / tau, decide.Fails, decide.OwnFriction | decide.OwnCohesion, decide.OwnFriction, 0.6 * sn / tau},
		{"plain", decide.FactorOfSafety, 0.6 * sn / tau, decide.Near, 0, 0, 0.6 * sn / tau},
		// μ 0.9: FS 1.905 holds; the site's μ would make it worse, not
		// better, so it decides nothing.
		{"strong", decide.FactorOfSafety, 0.9 * sn / tau, decide.Holds, decide.OwnFriction, 0, 0.6 * sn / tau},
	} {
		t.Run(c.name, func(t *testing.T) {
			f, ok := byName[c.name]
			if !ok {
				t.Fatal("no finding")
			}
			if f.Kind != decide.Plane || f.Measure != c.measure || !scalar.EqualWithinAbs(f.Value, c.value, tol) || f.Standing != c.standing {
				t.Errorf("%v %v %.5f %v, want %v %.5f %v", f.Kind, f.Measure, f.Value, f.Standing, c.measure, c.value, c.standing)
			}
			if f.Reasons&(decide.OwnFriction|decide.OwnCohesion|decide.OwnPorePressure) != c.reasons || f.Decisive != c.decisive {
				t.Errorf("reasons %v decisive %v, want %v and %v", f.Reasons, f.Decisive, c.reasons, c.decisive)
			}
			if !scalar.EqualWithinAbs(f.Site.FactorOfSafety, c.siteFS, tol) || f.SiteOwn.Friction != 0.6 || f.SiteOwn.PorePressure != 0 {
				t.Errorf("with the site's values FS %.5f (μ %v, Pp %v), want %.5f", f.Site.FactorOfSafety, f.SiteOwn.Friction, f.SiteOwn.PorePressure, c.siteFS)
			}
		})
	}
	// The rule: failing first (opening before the rest, then by 1/FS),
	// then near, then holding.
	want := []string{"wet", "weak", "both", "plain", "strong"}
	for i := range want {
		if order[i] != want[i] {
			t.Fatalf("ranked %v, want %v", order, want)
		}
	}
}

func TestTopKeepsEveryPart(t *testing.T) {
	// Twelve failing planes and one failing slope case ranked last: the
	// slope case is still listed, beyond the cap.
	mk := func(k decide.Kind, fs float64) decide.Finding {
		return decide.Finding{Kind: k, Measure: decide.FactorOfSafety, Value: fs, Use: 1 / fs, Standing: decide.Fails}
	}
	var fs []decide.Finding
	for i := range 12 {
		fs = append(fs, mk(decide.Plane, 0.5+0.01*float64(i)))
	}
	fs = append(fs, mk(decide.Planar, 0.9), mk(decide.Plane, 0.95))
	fs = append(fs, decide.Finding{Kind: decide.SetMean, Measure: decide.FactorOfSafety, Value: 3, Use: 1.0 / 3, Standing: decide.Holds})
	decide.Rank(fs)
	top, more := decide.Top(fs, 10, 3)
	if len(top) != 11 || top[10].Kind != decide.Planar || more != 3 {
		t.Errorf("top %d (last %v), more %d; want the 10 least stable planes, the slope case, 3 more", len(top), top[len(top)-1].Kind, more)
	}
	// Nothing near: the least stable are listed anyway.
	hold := []decide.Finding{{Kind: decide.Plane, Use: 0.2}, {Kind: decide.Plane, Use: 0.3}}
	decide.Rank(hold)
	if top, more := decide.Top(hold, 10, 3); len(top) != 2 || more != 0 || top[0].Use != 0.3 {
		t.Errorf("top %+v more %d, want both, the larger u first", top, more)
	}
}
