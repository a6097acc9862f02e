package tunnel

import (
	"fmt"
	"math"
	"math/rand/v2"
	"reflect"
	"runtime"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

// level returns a level drive along trend, 10 m long, two stations, under
// 100 m of cover.
func level(trend, radius float64) Tunnel {
	return Tunnel{Legs: []Leg{{From: 0, To: 10, Trend: trend}}, Cover: [][2]float64{{0, 100}, {10, 100}}, Spacing: 10,
		Radius: radius, UCS: 100, Poisson: 0.25, Drained: true}
}

func TestScreenZoneClosedForm(t *testing.T) {
	// The closed form of TestZoneClosedForm through the whole screening
	// (derived; REFERENCES.md "Slip zone, derived"): isotropic far field,
	// dry, a cohesionless horizontal plane containing the axis, φ = 30°,
	// a = 4 m: the zone reaches r = a/√(sin φ), 1.657 m beyond the wall, at
	// 45° + φ/2 from either springline (30°, 150°, 210° or 330° from the
	// crown), and it is open to the wall.
	const (
		wantDepth = 1.656854 // m
		tolDepth  = 1e-6     // m
		tolAngle  = 0.01     // degrees
	)
	m := dryMeasured(t, insitu.Tensor{NN: 10, EE: 10, DD: 10})
	tg := Target{Name: "H", Orientation: planes.MustNew(0, 0), Criterion: coulomb(t, math.Tan(30*geom.Rad), 0), PoreExcess: math.NaN()}
	sc, err := Screen(level(0, 4), m, []Target{tg})
	if err != nil {
		t.Fatal(err)
	}
	for _, st := range sc.Stations {
		r := &st.Rows[0]
		if !scalar.EqualWithinAbs(r.Zone.Depth, wantDepth, tolDepth) || r.Extent() != Bounded || !r.Zone.Flags.Has(AtWall) {
			t.Errorf("%g m: depth %v m, extent %v, flags %b", st.Chainage, r.Zone.Depth, r.Extent(), r.Zone.Flags)
		}
		off := math.Inf(1)
		for _, w := range []float64{30, 150, 210, 330} {
			off = math.Min(off, math.Abs(r.Zone.Angle-w))
		}
		if off > tolAngle {
			t.Errorf("%g m: angle %v°, want 30, 150, 210 or 330", st.Chainage, r.Zone.Angle)
		}
	}
	if i, k, ok := sc.Deepest(-1, true); !ok || i != 0 || k != 0 {
		t.Errorf("deepest %d, %d, %v", i, k, ok)
	}
	// The limit a/2 = 2 m is deeper than the zone; 1.5 m is not.
	if d := sc.Deeper(0); d != nil {
		t.Errorf("deeper than 2 m at %v", d)
	}
	sc.Tunnel.ZoneLimit = 1.5
	if d := sc.Deeper(0); len(d) != 1 || d[0] != (Stretch{0, 10}) {
		t.Errorf("deeper than 1.5 m at %v", d)
	}
}

func TestZoneAtTheWallMatchesTheArcs(t *testing.T) {
	// Two computations of the same verdict: the wall screening resolves the
	// field at r = a (Circle.At, then planes.ResolveTo) at the 36 wall points;
	// the zone search probes its ray at r = a (Ray.TensorAt, then
	// planes.StateOf) with the pore-pressure rule at the wall. With the
	// default 360 rays every wall point has its ray, and the ray's zone
	// starts at the wall exactly where the wall point is critical or opening
	// — for supported and unsupported, drained and undrained walls, and
	// targets with their own pore pressure.
	rng := rand.New(rand.NewPCG(151, 152))
	var atWall, free int
	for i := range 12 {
		w := insitu.Water{Gradient: insitu.Hydrostatic, Table: rng.Float64() * 60, Biot: 0.7 + 0.3*rng.Float64()}
		m, err := insitu.NewGradientModel(0.026, insitu.Horizontal{Kind: insitu.Ratio, Value: 0.6 + rng.Float64()},
			insitu.Horizontal{Kind: insitu.Ratio, Value: 0.4 + rng.Float64()*0.4}, rng.Float64()*180, w)
		if err != nil {
			t.Fatal(err)
		}
		tn := level(rng.Float64()*360, 3)
		tn.Legs[0].Plunge = rng.Float64()*10 - 5
		tn.Drained = i%2 == 0
		tn.Support = []float64{0, 0.3, 1.5}[i%3]
		var tgs []Target
		for range 4 {
			tg := Target{Orientation: randomPlane(rng), Criterion: coulomb(t, 0.3+0.5*rng.Float64(), 0.3*rng.Float64()), PoreExcess: math.NaN()}
			if rng.IntN(2) == 0 {
				tg.PoreExcess = rng.Float64()*2 - 0.5
			}
			tgs = append(tgs, tg)
		}
		sc, err := Screen(tn, m, tgs)
		if err != nil {
			t.Fatal(err)
		}
		for k := range tgs {
			out := sc.Outline(0, k)
			for j, ws := range sc.Stations[0].Rows[k].Wall {
				s := out[j*PerimeterStep]
				if in := s.Inner == tn.Radius; in != (ws != planes.Stable) {
					t.Fatalf("case %d target %d at %d°: wall %v, zone on the ray %+v", i, k, j*PerimeterStep, ws, s)
				}
				if ws != planes.Stable {
					atWall++
				} else {
					free++
				}
			}
		}
	}
	if atWall < 100 || free < 100 {
		t.Errorf("%d wall points in a zone, %d free: the cases do not test both", atWall, free)
	}
}

func TestSupportAtTheWall(t *testing.T) {
	// A support pressure pᵢ adds the Lamé term: at the wall σr = pᵢ and σθ is
	// lowered by pᵢ (Lamé; Jaeger, Cook & Zimmerman 2007, common practice),
	// σz and τθz unchanged; so σθ,max and σθ,min fall by pᵢ.
	const (
		tol = 1e-9 // MPa
		pi  = 1.2  // MPa
	)
	m := dryMeasured(t, insitu.Tensor{NN: 14, EE: 9, DD: 11, NE: 2, ND: 1, ED: -1.5})
	free, err := Screen(level(30, 3), m, nil)
	if err != nil {
		t.Fatal(err)
	}
	tn := level(30, 3)
	tn.Support = pi
	held, err := Screen(tn, m, nil)
	if err != nil {
		t.Fatal(err)
	}
	a, b := free.Stations[0], held.Stations[0]
	for k := range a.Wall {
		if !scalar.EqualWithinAbs(b.Wall[k].Theta, a.Wall[k].Theta-pi, tol) || b.Wall[k].Z != a.Wall[k].Z || b.Wall[k].ThetaZ != a.Wall[k].ThetaZ {
			t.Errorf("%d°: %+v, unsupported %+v", k*PerimeterStep, b.Wall[k], a.Wall[k])
		}
	}
	if !scalar.EqualWithinAbs(b.ThetaMax.Stress, a.ThetaMax.Stress-pi, tol) || !scalar.EqualWithinAbs(b.ThetaMin.Stress, a.ThetaMin.Stress-pi, tol) {
		t.Errorf("σθ max/min %v/%v, unsupported %v/%v", b.ThetaMax.Stress, b.ThetaMin.Stress, a.ThetaMax.Stress, a.ThetaMin.Stress)
	}
	if p := b.Opening.At(3, 40); !scalar.EqualWithinAbs(p.R, pi, tol) {
		t.Errorf("σr at the wall %v, want %v", p.R, pi)
	}
}

func TestDrainedRuleOfTheScreening(t *testing.T) {
	// The drained rule at a station: Pp = 0 at the wall, the target's own
	// pore pressure from the radius of influence on, which by default is
	// twice the head over the axis (Goodman et al. 1965, memory): with
	// hydrostatic water from the surface and the axis at 101 m, head 101 m,
	// R = 202 m (derived). Thiem's log in between: at r = √(aR) half of Pp.
	const tol = 1e-9
	w := insitu.Water{Gradient: insitu.Hydrostatic, Table: 0, Biot: 1}
	m, err := insitu.NewGradientModel(0.026, insitu.Horizontal{Kind: insitu.Ratio, Value: 1}, insitu.Horizontal{Kind: insitu.Ratio, Value: 1}, 0, w)
	if err != nil {
		t.Fatal(err)
	}
	tg := Target{Orientation: planes.MustNew(60, 90), Criterion: coulomb(t, 0.6, 0), PoreExcess: 0.5}
	sc, err := Screen(level(0, 1), m, []Target{tg, {Orientation: tg.Orientation, Criterion: tg.Criterion, PoreExcess: math.NaN()}})
	if err != nil {
		t.Fatal(err)
	}
	st := sc.Stations[0]
	if !scalar.EqualWithinAbs(st.Influence, 202, tol) {
		t.Fatalf("radius of influence %v m, want 202", st.Influence)
	}
	pp := st.State.PorePressure
	for k, want := range []float64{pp + 0.5, pp} {
		s := sc.Section(0, k)
		if s.Pore(1) != 0 || !scalar.EqualWithinAbs(s.Pore(202), want, tol) || !scalar.EqualWithinAbs(s.Pore(math.Sqrt(202)), want/2, tol) {
			t.Errorf("target %d: Pp %v, %v, %v; want 0, %v, %v", k, s.Pore(1), s.Pore(math.Sqrt(202)), s.Pore(202), want/2, want)
		}
	}
	if got := DefaultInfluence(0.01, 3); got != 6 {
		t.Errorf("shallow water: R %v, want 2a = 6", got)
	}
}

func TestScreenWithoutZonesAndOnOneCPU(t *testing.T) {
	// NoZones leaves every other result as it was; the zones do not depend
	// on the number of workers.
	rng := rand.New(rand.NewPCG(153, 154))
	ned := randomField(rng)
	m := dryMeasured(t, ned)
	tn := level(70, 3)
	tn.Legs[0].To, tn.Cover[1][0] = 60, 60
	var tgs []Target
	for range 3 {
		tgs = append(tgs, Target{Orientation: randomPlane(rng), Criterion: coulomb(t, 0.5, 0), PoreExcess: math.NaN()})
	}
	tn.ZoneGrid = Grid{Rays: 72}
	all, err := Screen(tn, m, tgs)
	if err != nil {
		t.Fatal(err)
	}
	defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(1))
	one, err := Screen(tn, m, tgs)
	if err != nil {
		t.Fatal(err)
	}
	// Compared as printed (%v writes every float exactly), as NaN ≠ NaN.
	if fmt.Sprint(all.Stations) != fmt.Sprint(one.Stations) {
		t.Error("the screening depends on the number of workers")
	}
	tn.NoZones = true
	none, err := Screen(tn, m, tgs)
	if err != nil {
		t.Fatal(err)
	}
	zones := 0
	for i := range all.Stations {
		for k := range all.Stations[i].Rows {
			if all.Stations[i].Rows[k].Zone.Flags.Has(Exists) {
				zones++
			}
			all.Stations[i].Rows[k].Zone = Zone{}
		}
	}
	if zones == 0 || fmt.Sprint(all.Stations) != fmt.Sprint(none.Stations) {
		t.Errorf("%d zones; without them the rest differs", zones)
	}
}

func TestDeepestOrdersByExtent(t *testing.T) {
	// Unbounded before past the grid before bounded; then by depth; the
	// first of equals. Built by hand.
	nan := math.NaN()
	row := func(depth float64, flags Flags, far planes.PlaneState) Row {
		return Row{Far: planes.Result{State: far}, Zone: Zone{Depth: depth, Flags: flags}}
	}
	none := row(nan, 0, planes.Stable)
	b1, b2 := row(1, Exists, planes.Stable), row(2, Exists, planes.Stable)
	past := row(5, Exists|ReachesOuter, planes.Stable)
	unb := row(0.5, Exists, planes.Critical)
	sc := &Screening{Tunnel: Tunnel{Radius: 2}, Targets: make([]Target, 3), Stations: []Result{
		{Station: Station{Chainage: 0}, Rows: []Row{b1, none, b2}},
		{Station: Station{Chainage: 10}, Rows: []Row{b2, past, none}},
		{Station: Station{Chainage: 20}, Rows: []Row{none, unb, b1}},
	}}
	for _, c := range []struct {
		k       int
		bounded bool
		i, j    int
	}{{-1, true, 0, 2}, {-1, false, 2, 1}, {0, true, 1, 0}, {1, false, 2, 1}, {1, true, -1, -1}} {
		if i, j, ok := sc.Deepest(c.k, c.bounded); i != c.i || j != c.j || ok != (c.i >= 0) {
			t.Errorf("Deepest(%d, %v) = %d, %d, %v; want %d, %d", c.k, c.bounded, i, j, ok, c.i, c.j)
		}
	}
	if got := []int{sc.Stations[0].Deepest(), sc.Stations[1].Deepest(), sc.Stations[2].Deepest()}; !reflect.DeepEqual(got, []int{2, 1, 1}) {
		t.Errorf("deepest per station %v", got)
	}
	// Limit a/2 = 1 m: target 0 is deeper only at 10 m (1 m at 0 is not
	// deeper), target 1 past the grid and unbounded at 10–20 m.
	if d0, d1 := sc.Deeper(0), sc.Deeper(1); !reflect.DeepEqual(d0, []Stretch{{10, 10}}) || !reflect.DeepEqual(d1, []Stretch{{10, 20}}) {
		t.Errorf("deeper: %v, %v", d0, d1)
	}
}
