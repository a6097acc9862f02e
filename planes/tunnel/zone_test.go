package tunnel

import (
	"math"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"
	"cleft/insitu/opening"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// station returns the station of a drive along l with the far field ned
// (NED frame) turned into the tunnel frame.
func station(t testing.TB, ned insitu.Tensor, l geom.Line, a, nu, pi, biot float64, pore PorePressure) Section {
	t.Helper()
	up, right, along := opening.TunnelFrame(l)
	c, err := opening.NewCircle(ned.Rotate([3]r3.Vec{up, right, along}), a, nu, pi)
	if err != nil {
		t.Fatal(err)
	}
	st, err := NewSection(c, up, right, along, 200, biot, pore)
	if err != nil {
		t.Fatal(err)
	}
	return st
}

func coulomb(t testing.TB, mu, c float64) planes.Criterion {
	t.Helper()
	k, err := planes.NewCoulomb(mu, c)
	if err != nil {
		t.Fatal(err)
	}
	return k
}

func TestZoneClosedForm(t *testing.T) {
	// Derived (the "slip zone" of REFERENCES.md, re-derived here): an
	// isotropic far field p round a horizontal tunnel gives, with q = (a/r)²
	// and θ from the crown, σ = p·I + pq(eθeθᵀ − eᵣeᵣᵀ) (Kirsch with
	// σ11 = σ22 = σ33 = p: σrr = p(1 − q), σθθ = p(1 + q), σzz = p). On the
	// horizontal plane (normal Up, n = cos θ·eᵣ − sin θ·eθ) this resolves to
	//	σn = p − pq cos 2θ,  τ = pq|sin 2θ|
	// so a dry cohesionless plane with friction angle φ (t = tan φ) slips
	// where pq|sin 2θ| ≥ t(p − pq cos 2θ). With θ' = θ − 90° from the
	// springline (cos 2θ = −cos 2θ'):
	//	q(|sin 2θ'| − t cos 2θ') ≥ t,  i.e.  q·sin(2θ' − φ) ≥ sin φ  (for sin 2θ' ≥ 0)
	// The zone reaches r² = a²·sin(2θ'− φ)/sin φ, greatest at 2θ' − φ = 90°:
	// θ' = 45° + φ/2 and r = a/√(sin φ). For φ = 30°, a = 4 m: r = 4√2 =
	// 5.656854 m, 1.656854 m beyond the wall, at θ' = ±60° from either
	// springline: 30°, 150°, 210° and 330° from the crown. The zone spans
	// θ' ∈ [φ, 90°] in each quadrant of sin 2θ' ≥ 0 and its mirror, four
	// lobes of area ½a²∫(sin(2θ'−φ)/sin φ − 1)dθ' over [φ, 90°] =
	// ½a²[cot φ − (90° − φ)]: in all 2a²[cot φ − (π/2 − φ)] = 21.915304 m².
	const (
		a         = 4.0
		wantDepth = 1.656854 // m
		wantArea  = 21.915304
		tolDepth  = 1e-6 // m: the hand value's 6 decimals
		tolAngle  = 0.01 // degrees: a flat maximum, located to ~√(1e-9) rad
		tolArea   = 1e-3 // relative: Σ over 1° rays of a lobe with kinked ends, O(Δθ²)
		tolSpan   = 1e-7 // m: bisection to 1e-9·a
		edgeGap   = 1e-6 // (a/r)² this close to 1 is the zone's edge: not checked
	)
	phi := 30 * geom.Rad
	st := station(t, insitu.Tensor{NN: 10, EE: 10, DD: 10}, geom.Line{}, a, 0.25, 0, 1, nil)
	o := planes.MustNew(0, 0)
	k := coulomb(t, math.Tan(phi), 0)
	out := make([]Span, DefaultRays)
	z := Find(&st, &o, k, Grid{}, out)

	t.Run("depth", func(t *testing.T) {
		if !scalar.EqualWithinAbs(z.Depth, wantDepth, tolDepth) {
			t.Errorf("depth %v m, want %v", z.Depth, wantDepth)
		}
		d := math.Inf(1)
		for _, w := range []float64{30, 150, 210, 330} {
			d = math.Min(d, math.Abs(z.Angle-w))
		}
		if d > tolAngle {
			t.Errorf("angle %v°, want 30, 150, 210 or 330", z.Angle)
		}
	})
	t.Run("area", func(t *testing.T) {
		if !scalar.EqualWithinRel(z.Area, wantArea, tolArea) {
			t.Errorf("area %v m², want %v", z.Area, wantArea)
		}
	})
	t.Run("flags", func(t *testing.T) {
		// The zone reaches the wall (q = 1 satisfies the condition over
		// θ' ∈ [φ, 90°]); at the crown the wall is the plane and σn = 0 there,
		// a single opening point; the far field has no shear: stable.
		if !z.Flags.Has(Exists|AtWall|Opens) || z.Flags.Has(ReachesOuter) || z.FarField != planes.Stable {
			t.Errorf("flags %b, far field %v", z.Flags, z.FarField)
		}
		if !(z.OpeningDepth >= 0 && z.OpeningDepth < tolSpan) {
			t.Errorf("opening depth %v m, want 0", z.OpeningDepth)
		}
	})
	t.Run("outline", func(t *testing.T) {
		for _, s := range out {
			tp := (s.Theta - 90) * geom.Rad
			x := (math.Abs(math.Sin(2*tp)) - math.Tan(phi)*math.Cos(2*tp)) / math.Tan(phi) // (a/r)² at the edge
			switch {
			case x > 1+edgeGap:
				if want := a * math.Sqrt(x); !scalar.EqualWithinAbs(s.Outer, want, tolSpan) || s.Inner != a {
					t.Errorf("θ %v: span %v–%v, want %v–%v", s.Theta, s.Inner, s.Outer, a, want)
				}
			case x < 1-edgeGap:
				if !math.IsNaN(s.Inner) || !math.IsNaN(s.Outer) {
					t.Errorf("θ %v: span %v–%v, want none", s.Theta, s.Inner, s.Outer)
				}
			}
		}
	})
}

func TestZoneFarFieldCritical(t *testing.T) {
	// σ1 = 40 vertical, σ3 = 10 across a tunnel driven north, σ2 = 20 along
	// it: (σ1/σ3) = 4 exceeds the frictional limit 3.1194 of μ = 0.6 (Jaeger
	// & Cook 1979, read), so the plane containing the axis at 29.5° from σ1
	// (½·atan(1/μ), read) — dip 60.5° east — is critical in the far field
	// (derived: σn = 25 + 15 cos 121° = 17.27, τ = 15 sin 121° = 12.86,
	// τ/σn = 0.74 > 0.6), and its zone has no end.
	const tol = 1e-9
	st := station(t, insitu.Tensor{NN: 20, EE: 10, DD: 40}, geom.Line{}, 3, 0.25, 0, 1, nil)
	o := planes.MustNew(60.5, 90)
	z := Find(&st, &o, coulomb(t, 0.6, 0), Grid{Rays: 72}, nil)
	if z.FarField != planes.Critical || !z.Flags.Has(Exists|ReachesOuter) {
		t.Errorf("far field %v, flags %b", z.FarField, z.Flags)
	}
	if want := (DefaultOuter - 1) * 3; !scalar.EqualWithinAbs(z.Depth, want, tol) {
		t.Errorf("depth %v m, want the grid's %v", z.Depth, want)
	}
}

func TestZoneNone(t *testing.T) {
	// A mild field and a strong plane: no zone. The cohesion, 100 MPa, is
	// above any shear stress here (no stress round a circular opening exceeds
	// three times the largest far-field stress, 3 × 12 MPa: Kirsch 1898,
	// common practice). The plane 45/045 is oblique to the drive (north), so
	// even on the free wall (σrr = 0) its normal stress is carried by σθθ ≥ 18
	// and σzz ≥ 10 MPa (Hiramatsu & Oka 1962, derived: σθ = 22 − 4 cos 2θ,
	// σz = 11 − cos 2θ, τθz = 0) and it does not open.
	st := station(t, insitu.Tensor{NN: 11, EE: 10, DD: 12}, geom.Line{}, 3, 0.25, 0, 1, nil)
	o := planes.MustNew(45, 45)
	z := Find(&st, &o, coulomb(t, 0.6, 100), Grid{Rays: 36}, nil)
	if z.Flags != 0 || !math.IsNaN(z.Depth) || !math.IsNaN(z.Angle) || z.Area != 0 || !math.IsNaN(z.OpeningDepth) {
		t.Errorf("%+v, want no zone", z)
	}
}

func TestDrained(t *testing.T) {
	// Steady radial flow in uniform rock: the head satisfies Laplace's
	// equation with radial symmetry, (1/r)d/dr(r dp/dr) = 0 (Thiem 1906;
	// common practice), so r·dp/dr is the same at every radius; Pp = 0 at the
	// drained wall and the undisturbed value at the radius of influence.
	const (
		tol  = 1e-12
		h    = 1e-5
		tolD = 1e-6 // central difference, O(h²)
	)
	pp, err := Drained(2, 4, 40)
	if err != nil {
		t.Fatal(err)
	}
	if pp(4) != 0 || !scalar.EqualWithinAbs(pp(40), 2, tol) || pp(100) != 2 {
		t.Errorf("Pp(a) %v, Pp(R) %v, beyond %v", pp(4), pp(40), pp(100))
	}
	flux := func(r float64) float64 { return r * (pp(r+h) - pp(r-h)) / (2 * h) }
	for _, r := range []float64{5, 9, 17, 33} {
		if !scalar.EqualWithinAbs(flux(r), flux(6), tolD) {
			t.Errorf("r·dp/dr at %v: %v, at 6: %v", r, flux(r), flux(6))
		}
	}
	for _, c := range []struct {
		name       string
		p, a, infl float64
	}{{"negative p", -1, 4, 40}, {"zero radius", 1, 0, 40}, {"influence inside", 1, 4, 4}, {"nan", math.NaN(), 4, 40}} {
		t.Run(c.name, func(t *testing.T) {
			if _, err := Drained(c.p, c.a, c.infl); err == nil {
				t.Error("no error")
			}
		})
	}
}

func TestNewStationErrors(t *testing.T) {
	up, right, along := opening.TunnelFrame(geom.Line{Trend: 20})
	good, err := opening.NewCircle(insitu.Tensor{NN: 10, EE: 8, DD: 9}, 3, 0.25, 0)
	if err != nil {
		t.Fatal(err)
	}
	bad := good
	bad.Radius = -1
	nanPore := func(float64) float64 { return math.NaN() }
	for _, c := range []struct {
		name        string
		c           opening.Circle
		up, r, a    r3.Vec
		depth, biot float64
		pore        PorePressure
	}{
		{"bad circle", bad, up, right, along, 100, 1, nil},
		{"left-handed", good, up, r3.Scale(-1, right), along, 100, 1, nil},
		{"not unit", good, r3.Scale(2, up), right, along, 100, 1, nil},
		{"negative depth", good, up, right, along, -1, 1, nil},
		{"biot 0", good, up, right, along, 100, 0, nil},
		{"biot above 1", good, up, right, along, 100, 1.2, nil},
		{"nan pore", good, up, right, along, 100, 1, nanPore},
	} {
		t.Run(c.name, func(t *testing.T) {
			if _, err := NewSection(c.c, c.up, c.r, c.a, c.depth, c.biot, c.pore); err == nil {
				t.Error("no error")
			}
		})
	}
}

func TestFindPanics(t *testing.T) {
	st := station(t, insitu.Tensor{NN: 10, EE: 10, DD: 10}, geom.Line{}, 4, 0.25, 0, 1, nil)
	o := planes.MustNew(0, 0)
	k := coulomb(t, 0.6, 0)
	for _, c := range []struct {
		name    string
		g       Grid
		outline []Span
	}{
		{"few rays", Grid{Rays: 4}, nil},
		{"coarse step", Grid{Step: 0.02}, nil},
		{"outer inside", Grid{Outer: 1}, nil},
		{"outline length", Grid{Rays: 36}, make([]Span, 35)},
	} {
		t.Run(c.name, func(t *testing.T) {
			defer func() {
				if recover() == nil {
					t.Error("no panic")
				}
			}()
			Find(&st, &o, k, c.g, c.outline)
		})
	}
}
