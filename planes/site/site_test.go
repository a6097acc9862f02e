package site

import (
	"math"
	"strings"
	"testing"
	"testing/fstest"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
)

const minimal = `site: t
stress:
  vertical: {density: 2700}
  shmax: {ratio: 1.3, azimuth: 65}
  shmin: {ratio: 0.8}
`

func TestParseDefaults(t *testing.T) {
	s, err := Parse([]byte(minimal), "t.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if s.Water != insitu.DefaultWater {
		t.Errorf("water = %+v, want the default hydrostatic model", s.Water)
	}
	c, ok := s.Criterion.(*planes.Coulomb)
	if !ok || c.Mu != 0.6 || c.Cohesion != 0 {
		t.Errorf("criterion = %v, want Coulomb μ 0.6 (default)", s.Criterion)
	}
	defaults := 0
	for _, p := range s.Params {
		if p.Default {
			defaults++
		}
	}
	if defaults != 5 { // water gradient, table, biot; friction, cohesion
		t.Errorf("%d parameters marked default, want 5: %+v", defaults, s.Params)
	}
	// Density 2700 kg/m³ → 0.026487 MPa/m (ρ·g with g = 9.81, common practice).
	st := s.Model.At(100)
	const tol = 1e-9 // MPa
	if !scalar.EqualWithinAbs(st.Total.DD, 2.6487, tol) {
		t.Errorf("Sv(100 m) = %v, want 2.6487", st.Total.DD)
	}
	if got := s.Summary(); !strings.Contains(got, "SHmax 1.3·Sv @ 065°") || !strings.Contains(got, "μ = 0.6 (default)") {
		t.Errorf("summary %q", got)
	}
}

func TestSheoreyAppliesToBoth(t *testing.T) {
	s, err := Parse([]byte(`site: t
stress:
  vertical: {gradient: 0.027}
  shmax: {sheorey: {modulus: 50}, azimuth: 10}
water: {dry: true}
`), "t.yaml")
	if err != nil {
		t.Fatal(err)
	}
	st := s.Model.At(1000)
	// Sheorey (1994) as given by Hoek, derived: k(50 GPa, 1000 m) = 0.95.
	want := 0.95 * 27
	const tol = 1e-9 // MPa
	if v := st.Principal.Values; !scalar.EqualWithinAbs(v[2], want, tol) || !scalar.EqualWithinAbs(v[1], want, tol) {
		t.Errorf("horizontal stresses %v, want both %v", v, want)
	}
}

func TestPlaneOverrides(t *testing.T) {
	s, err := Parse([]byte(minimal+`depth: 80
strength: {friction: 0.7, cohesion: 0.1}
planes:
  - {name: A, dip: 60, dip_direction: 10}
  - {name: B, dip: 60, dip_direction: 10, friction: 0.3, pore_pressure: 2.5, depth: 200}
`), "t.yaml")
	if err != nil {
		t.Fatal(err)
	}
	a, b := &s.Planes[0], &s.Planes[1]
	if a.Depth != 80 || !math.IsNaN(a.Friction) || !math.IsNaN(a.PorePressure) {
		t.Errorf("A = %+v, want the site depth and no overrides", a)
	}
	var scratch planes.Coulomb
	if c := s.CriterionFor(b, &scratch).(*planes.Coulomb); c.Mu != 0.3 || c.Cohesion != 0.1 {
		t.Errorf("B criterion %v, want μ 0.3 with the site cohesion 0.1", c)
	}
	rv := s.Resolver()
	var r planes.Result
	rv.Resolve(b, &r)
	if r.PorePressure != 2.5 {
		t.Errorf("B pore pressure %v, want the override 2.5", r.PorePressure)
	}
	rv.Resolve(a, &r)
	if want := s.Water.Pressure(80); r.PorePressure != want {
		t.Errorf("A pore pressure %v after B, want the model's %v", r.PorePressure, want)
	}
}

func TestPlanesFileRelativeToSite(t *testing.T) {
	s, err := Parse([]byte(minimal+"planes_file: joints.csv\n"), "some/dir/site.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if s.PlanesFile != "some/dir/joints.csv" {
		t.Errorf("planes_file resolved to %q", s.PlanesFile)
	}
}

func TestSetsBlock(t *testing.T) {
	s, err := Parse([]byte(minimal+`readings_file: r.csv
sets: {seeds: ["70/135", "20/250"], max_angle: 25, line: "100/70", max_weight: 5}
`), "d/s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	c := s.Sets
	if s.ReadingsFile != "d/r.csv" || len(c.Seeds) != 2 || c.Seeds[1].DipDirection() != 250 || c.MaxAngle != 25 || c.Line == nil || c.Line.Plunge != 70 || c.MaxWeight != 5 {
		t.Errorf("sets %+v, readings %q", c, s.ReadingsFile)
	}
	// The sets block's mistakes, compared whole. The first four carry no
	// finer kind than ErrInvalid, though ErrConflict, ErrType and ErrRange
	// would fit them.
	for _, bad := range []struct {
		sets string
		want Error
	}{
		{`{count: 3, seeds: ["70/135"]}`, Error{File: "s.yaml", Line: 7, Column: 25, Key: "sets.seeds", Err: ErrConflict, Msg: "1 seeds for count: 3: give one seed per set, or leave count out"}},
		{`{count: 2.5}`, Error{File: "s.yaml", Line: 7, Column: 15, Key: "sets.count", Err: ErrRange, Msg: "2.5: want a whole number of sets"}},
		{`{line: "east"}`, Error{File: "s.yaml", Line: 7, Column: 14, Key: "sets.line", Err: ErrRange, Msg: `"east": want TREND/PLUNGE in degrees, e.g. 120/10`}},
		{`{seeds: ["95/10"]}`, Error{File: "s.yaml", Line: 7, Column: 16, Key: "sets.seeds[0]", Err: ErrRange, Msg: "dip 95 is outside [0, 90]"}},
		{`{max_weight: 0.5}`, Error{File: "s.yaml", Line: 7, Column: 20, Key: "sets.max_weight", Err: ErrRange, Msg: "0.5 is outside the allowed range [1, 1000]"}},
	} {
		t.Run(bad.sets, func(t *testing.T) {
			_, err := Parse([]byte(minimal+"readings_file: r.csv\nsets: "+bad.sets+"\n"), "s.yaml")
			sameError(t, err, bad.want)
		})
	}
}

func TestCoverFile(t *testing.T) {
	fsys := fstest.MapFS{
		"s.yaml":       {Data: []byte(minimal + "tunnel:\n  alignment: [{from: 0, to: 100, trend: 10}]\n  cover_file: cover.csv\n  rock: {ucs: 50}\n")},
		"cover.csv":    {Data: []byte("# profile\nchainage,cover\n0,5\n100,45\n")},
		"bad.yaml":     {Data: []byte(minimal + "tunnel:\n  alignment: [{from: 0, to: 100, trend: 10}]\n  cover_file: badcover.csv\n  rock: {ucs: 50}\n")},
		"badcover.csv": {Data: []byte("chainage,cover\n0,5\n50,-3\n")},
	}
	s, err := ParseFS(fsys, "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if c, ok := s.Tunnel.CoverAt(25); !ok || c != 15 {
		t.Errorf("cover at 25 m = %v, %v; want 15", c, ok)
	}
	_, err = ParseFS(fsys, "bad.yaml")
	sameError(t, err, Error{File: "badcover.csv", Line: 3, Key: "cover", Err: ErrRange, Msg: `"-3": want a decimal number in [0, 20000] m`})
}
