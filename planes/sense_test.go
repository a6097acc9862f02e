package planes

import (
	"math"
	"math/rand/v2"
	"testing"

	"cleft/insitu"
	"cleft/insitu/geom"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestSideNames(t *testing.T) {
	// The eight points of the compass (common practice), 45° apart; a
	// half-way azimuth goes clockwise, so opposite azimuths get opposite
	// points (this tool's rule).
	for _, c := range []struct {
		az   float64
		want Side
	}{
		{0, North}, {22.4, North}, {22.5, Northeast}, {90, East}, {157.4, Southeast}, {202.5, Southwest},
		{270, West}, {337.4, Northwest}, {337.5, North}, {359.9, North},
	} {
		if got := SideOf(c.az); got != c.want {
			t.Errorf("SideOf(%v) = %v, want %v", c.az, got, c.want)
		}
	}
	for az := 0.0; az < 360; az += 0.25 {
		a, b := SideOf(az), SideOf(az+180)
		if (a-1+4)%8 != b-1 {
			t.Fatalf("SideOf(%v) = %v and SideOf(%v) = %v are not opposite", az, a, az+180, b)
		}
	}
	t.Run("names", func(t *testing.T) {
		for s, want := range map[Sense]string{
			WithSide(SideUp, East): "east-side-up", WithSide(SinistralSideUp, Northwest): "sinistral-northwest-side-up",
			WithSide(DextralSideUp, South): "dextral-south-side-up", Reverse: "reverse", NoSlip: "",
		} {
			if s.String() != want {
				t.Errorf("%d: %q, want %q", s, s.String(), want)
			}
		}
	})
}

func TestVerticalPlaneDipSlip(t *testing.T) {
	// Issue 11, item 4: the same slip on 90/090 and 90/270 was called
	// reverse (rake 90) and normal (rake −90). Derived: in the state σ = 20 I
	// with σED = 5 (NED, compression positive) the shear on north–south
	// vertical planes is vertical. For 90/090 the pole points west, the
	// hanging wall is the east block and t − σn·n = (0, 0, −5): up. For
	// 90/270 the pole points east, the hanging wall is the west block and
	// t − σn·n = (0, 0, +5): down. Both say the east side goes up.
	const angleTol = 1e-9 // degrees
	s := dryState(insitu.Tensor{NN: 20, EE: 20, DD: 20, ED: 5})
	for _, c := range []struct {
		dd, rake float64
	}{{90, 90}, {270, -90}} {
		r := Resolve(s, MustNew(90, c.dd), mu06)
		if !scalar.EqualWithinAbs(r.Rake, c.rake, angleTol) || r.Sense != WithSide(SideUp, East) || r.Sense.String() != "east-side-up" {
			t.Errorf("90/%03.0f: rake %v, sense %q; want %v, east-side-up", c.dd, r.Rake, r.Sense, c.rake)
		}
		if !math.IsNaN(r.SlipTrend) {
			t.Errorf("90/%03.0f: vertical slip has trend %v, want none", c.dd, r.SlipTrend)
		}
	}
	// A plane within NearVertical of vertical gets a side, not normal or
	// reverse: 89.5/090 in the same state (derived as above, the up-dip
	// vector of the east-dipping plane is nearly straight up).
	if r := Resolve(s, MustNew(89.5, 90), mu06); r.Sense != WithSide(SideUp, East) {
		t.Errorf("89.5/090: %q, want east-side-up", r.Sense)
	}
	// Oblique: σNE adds a horizontal shear on the same planes. Derived: for
	// 90/090, t − σn·n = (−σNE, 0, −σED) = (−5, 0, −5): the east block moves
	// south and up (rake atan2(5, −5) = 135 from the strike 000, dextral-
	// reverse); for 90/270, (5, 0, 5): the west block moves north and down
	// (rake −135 from the strike 180, dextral-normal). Either way: dextral,
	// east side up, the east block moving towards 180.
	s = dryState(insitu.Tensor{NN: 20, EE: 20, DD: 20, ED: 5, NE: 5})
	for _, c := range []struct{ dd, rake float64 }{{90, 135}, {270, -135}} {
		r := Resolve(s, MustNew(90, c.dd), mu06)
		if r.Sense != WithSide(DextralSideUp, East) || !scalar.EqualWithinAbs(r.SlipTrend, 180, angleTol) || !scalar.EqualWithinAbs(r.Rake, c.rake, angleTol) {
			t.Errorf("90/%03.0f oblique: %q trend %v rake %v; want dextral-east-side-up, 180, %v", c.dd, r.Sense, r.SlipTrend, r.Rake, c.rake)
		}
	}
}

func TestHorizontalPlaneSlip(t *testing.T) {
	// Issue 11, item 4: 0/000, 0/090, 0/180, 0/270 got four senses for one
	// slip. A horizontal plane has no strike, so no rake and no sense; the
	// upper block's slip trend is given. Derived: with σND = 4 and σED = −3
	// the pole (0, 0, 1) carries t − σn·n = (4, −3, 0), so the upper block
	// moves towards atan2(−3, 4) = −36.87°, azimuth 323.13°.
	const angleTol = 1e-9 // degrees
	s := dryState(insitu.Tensor{NN: 20, EE: 15, DD: 25, ND: 4, ED: -3})
	want := 360 - math.Atan2(3, 4)*geom.Deg
	for _, dd := range []float64{0, 90, 180, 270, 33.3} {
		r := Resolve(s, MustNew(0, dd), mu06)
		if !math.IsNaN(r.Rake) || r.Sense != NoSlip || !scalar.EqualWithinAbs(r.SlipTrend, want, angleTol) || !scalar.EqualWithinAbs(r.Shear, 5, tol) {
			t.Errorf("0/%03.0f: rake %v, sense %q, trend %v, τ %v; want none, none, %v, 5", dd, r.Rake, r.Sense, r.SlipTrend, r.Shear, want)
		}
	}
	// Within NearHorizontal of horizontal the same holds (0.8/120).
	if r := Resolve(s, MustNew(0.8, 120), mu06); !math.IsNaN(r.Rake) || r.Sense != NoSlip || math.IsNaN(r.SlipTrend) {
		t.Errorf("0.8/120: rake %v, sense %q, trend %v", r.Rake, r.Sense, r.SlipTrend)
	}
}

func TestAndersonianSlipTrends(t *testing.T) {
	// Anderson (1951), as in TestAndersonianRakes: the hanging wall of the
	// normal fault dipping east moves down-dip, east (090); that of the
	// reverse fault dipping north moves up-dip, south (180). The sinistral
	// plane striking a = 29.5° east of north: its east block moves north-
	// north-east along the strike, 029.5°; the dextral one striking 330.5°:
	// its east block moves south-south-east, 150.5° (common practice: on a
	// sinistral fault the far block moves to the left). The vertical planes
	// are typed both ways: the trend is the east block's either way.
	const (
		mu       = 0.6
		angleTol = 1e-9 // degrees
	)
	a := insitu.OptimalAngle(mu)
	for _, c := range []struct {
		name             string
		shmax, sv, shmin float64
		dip, dd, trend   float64
		sense            Sense
	}{
		{"normal", 30, 40, 20, 90 - a, 90, 90, NormalSlip},
		{"reverse", 40, 20, 30, a, 0, 180, Reverse},
		{"sinistral", 40, 30, 20, 90, a + 90, a, Sinistral},
		{"sinistral typed west", 40, 30, 20, 90, a + 270, a, Sinistral},
		{"dextral", 40, 30, 20, 90, 90 - a, 180 - a, Dextral},
		{"dextral typed west", 40, 30, 20, 90, 270 - a, 180 - a, Dextral},
	} {
		t.Run(c.name, func(t *testing.T) {
			r := Resolve(dryState(insitu.Andersonian(c.shmax, c.shmin, c.sv, 0)), MustNew(c.dip, c.dd), &Coulomb{Mu: mu})
			if !scalar.EqualWithinAbs(r.SlipTrend, c.trend, angleTol) || r.Sense != c.sense {
				t.Errorf("trend %v (%q), want %v (%q)", r.SlipTrend, r.Sense, c.trend, c.sense)
			}
		})
	}
}

func TestSlipTrendFollowsTheRake(t *testing.T) {
	// The slip of the hanging wall is cos(rake)·strike + sin(rake)·up-dip
	// (Aki & Richards 1980, derived); its horizontal part's azimuth is the
	// slip trend (of the opposite block on a (near-)vertical plane typed
	// with a dip direction in [180, 360)). Seeded random states and planes
	// away from horizontal.
	const (
		tol           = 1e-7 // degrees
		minHorizontal = 1e-6 // a slip this close to vertical has no trend to compare
	)
	rng := rand.New(rand.NewPCG(121, 122))
	for i := range 5000 {
		s := dryState(randomTensor(rng))
		o := MustNew(1.5+rng.Float64()*88.5, rng.Float64()*360)
		if i%5 == 0 {
			o = MustNew(89+rng.Float64(), rng.Float64()*360)
		}
		r := Resolve(s, o, mu06)
		sr, cr := math.Sincos(r.Rake * geom.Rad)
		v := r3.Add(r3.Scale(cr, o.StrikeVec()), r3.Scale(sr, o.UpDip()))
		if o.Dip() >= 90-NearVertical && o.DipDirection() >= 180 {
			v = r3.Scale(-1, v)
		}
		if math.Hypot(v.X, v.Y) < minHorizontal {
			continue
		}
		want := geom.Azimuth(math.Atan2(v.Y, v.X) * geom.Deg)
		if d := math.Abs(math.Remainder(r.SlipTrend-want, 360)); d > tol {
			t.Fatalf("case %d, %v: trend %v, want %v from rake %v", i, o, r.SlipTrend, want, r.Rake)
		}
	}
}

func TestSamePlaneTypedTwoWaysResolves(t *testing.T) {
	// A vertical plane by either dip direction, and a horizontal plane by any
	// strike, is one plane (common practice): the same state, factor of
	// safety, pressure to slip, sense and slip trend, whatever the criterion
	// and pore pressure (seeded random states).
	const (
		tol      = 1e-9
		trendTol = 1e-7 // degrees
	)
	rng := rand.New(rand.NewPCG(131, 132))
	for i := range 5000 {
		s := insitu.NewState(randomTensor(rng), 100, rng.Float64()*50, 0.6+rng.Float64()*0.4)
		c := randomCriterion(rng)
		dd := rng.Float64() * 360
		pairs := [][2]Orientation{
			{MustNew(90, dd), MustNew(90, geom.Azimuth(dd+180))},
			{MustNew(0, dd), MustNew(0, rng.Float64()*360)},
		}
		for _, p := range pairs {
			a, b := Resolve(s, p[0], c), Resolve(s, p[1], c)
			same := func(x, y float64) bool {
				return math.IsNaN(x) && math.IsNaN(y) || scalar.EqualWithinAbsOrRel(x, y, tol, tol)
			}
			switch {
			case a.State != b.State, a.Sense != b.Sense, a.OpensFirst != b.OpensFirst,
				!same(a.FactorOfSafety, b.FactorOfSafety), !same(a.PressureToSlip, b.PressureToSlip):
				t.Fatalf("case %d, %v and %v: %+v\n%+v", i, p[0], p[1], a, b)
			case !(math.IsNaN(a.SlipTrend) && math.IsNaN(b.SlipTrend)) && math.Abs(math.Remainder(a.SlipTrend-b.SlipTrend, 360)) > trendTol:
				t.Fatalf("case %d, %v and %v: slip trends %v and %v", i, p[0], p[1], a.SlipTrend, b.SlipTrend)
			}
		}
	}
}
