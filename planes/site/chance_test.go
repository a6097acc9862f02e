package site

import (
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"cleft/planes"
)

const chanceBase = `site: t
depth: 150
stress:
  vertical: {density: 2650}
  shmax: {ratio: 1.35, azimuth: 128}
  shmin: {ratio: 0.72}
water: {table: 18}
strength: {friction: 0.6}
planes:
  - {name: F1, dip: 74, dip_direction: 188, depth: 180, friction: 0.45}
  - {name: B1, dip: 14, dip_direction: 200}
`

func TestChanceErrors(t *testing.T) {
	// Each mistake is one *Error naming the file, the line and the path.
	for _, c := range []struct {
		name, yaml string
		want       Error
	}{
		{"unknown path", "cases:\n  a: {stress.shmax.ratoi: 1.2}\n", Error{File: "t.yaml", Line: 13, Key: "cases.a.stress.shmax.ratoi", Err: ErrUnknownKey, Msg: "not a numeric key of this site's model (did you mean \"stress.shmax.ratio\"?); the keys here: strength.cohesion, strength.friction, stress.shmax.azimuth, stress.shmax.ratio, stress.shmin.ratio, stress.vertical.density, water.biot, water.gradient, water.table, and planes.NAME.friction|cohesion|pore_pressure|dip|dip_direction|depth"}},
		{"not a number", "cases:\n  a: {stress.shmax: 1.2}\n", Error{File: "t.yaml", Line: 13, Key: "cases.a.stress.shmax", Err: ErrNotNumber, Msg: "names a mapping, not a number"}},
		{"other law", "cases:\n  a: {stress.shmax.gradient: 0.03}\n", Error{File: "t.yaml", Line: 13, Key: "cases.a.stress.shmax.gradient", Err: ErrUnknownKey, Msg: "the site's shmax follows ratio: vary stress.shmax.ratio"}},
		{"case out of range", "cases:\n  a: {strength.friction: 0}\n", Error{File: "t.yaml", Line: 13, Column: 26, Key: "cases.a.strength.friction", Err: ErrRange, Msg: "0 is outside the allowed range (0, ∞)"}},
		{"case model", "cases:\n  a: {stress.shmax.ratio: 0.6}\n", Error{File: "t.yaml", Line: 13, Column: 6, Key: "cases.a", Err: ErrRange, Msg: "case \"a\": shmax ratio 0.6 is less than shmin ratio 0.72: SHmax is the larger horizontal stress"}},
		{"base name", "cases:\n  base: {water.table: 3}\n", Error{File: "t.yaml", Line: 13, Column: 9, Key: "cases.base", Err: ErrConflict, Msg: "\"base\" is the site as given, the first row of every case; name this case otherwise"}},
		{"no plane", "cases:\n  a: {planes.F9.friction: 0.3}\n", Error{File: "t.yaml", Line: 13, Key: "cases.a.planes.F9.friction", Err: ErrMissing, Msg: "no plane or set mean is named \"F9\""}},
		{"plane column", "cases:\n  a: {planes.F1.name: 3}\n", Error{File: "t.yaml", Line: 13, Key: "cases.a.planes.F1.name", Err: ErrNotNumber, Msg: "a plane's column \"name\" is not a number that can vary; the numeric columns are friction, cohesion, pore_pressure, dip, dip_direction and depth"}},
		{"dist range", "uncertainty:\n  vary:\n    strength.friction: {uniform: [-0.1, 0.5]}\n", Error{File: "t.yaml", Line: 14, Column: 34, Key: "uncertainty.vary.strength.friction.uniform", Err: ErrRange, Msg: "low -0.1 is outside the allowed range (0, ∞) of strength.friction"}},
		{"dist family", "uncertainty:\n  vary:\n    strength.friction: {beta: [1, 2]}\n", Error{File: "t.yaml", Line: 14, Column: 31, Key: "uncertainty.vary.strength.friction.beta", Err: ErrUnknownKey, Msg: "unknown key \"beta\"; allowed here: normal, lognormal, uniform, triangular, min, max"}},
		{"dist count", "uncertainty:\n  vary:\n    water.table: {triangular: [1, 2]}\n", Error{File: "t.yaml", Line: 14, Column: 31, Key: "uncertainty.vary.water.table.triangular", Err: ErrType, Msg: "triangular takes 3 numbers, got 2"}},
		{"truncation", "uncertainty:\n  vary:\n    water.table: {uniform: [5, 20], min: 30, max: 40}\n", Error{File: "t.yaml", Line: 14, Column: 18, Key: "uncertainty.vary.water.table", Err: ErrRange, Msg: "min 30, max 40: truncation leaves no probability: uniform(5, 20) on [30, 40]"}},
		{"correlation path", "uncertainty:\n  vary:\n    water.table: {uniform: [5, 30]}\n  correlations: [[water.table, strength.friction, 0.5]]\n", Error{File: "t.yaml", Line: 15, Column: 18, Key: "uncertainty.correlations[0]", Err: ErrMissing, Msg: "\"strength.friction\" is not one of the varied paths (vary:)"}},
		{"nothing varies", "uncertainty:\n  seed: 3\n", Error{File: "t.yaml", Line: 12, Key: "uncertainty", Err: ErrMissing, Msg: "nothing varies: give vary: {dotted.path: {normal: [mean, sd]}, …} or orientation: {fisher_k: K}"}},
		{"realisations", "uncertainty:\n  realisations: 1.5\n  vary:\n    water.table: {uniform: [5, 30]}\n", Error{File: "t.yaml", Line: 13, Column: 17, Key: "uncertainty.realisations", Err: ErrRange, Msg: "1.5 is outside the allowed range [2, 1e+07]"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			_, err := Parse([]byte(chanceBase+c.yaml), "t.yaml")
			sameError(t, err, c.want)
		})
	}
}

func TestTruncationToTheValidRange(t *testing.T) {
	// A sample outside the key's valid range is never used: friction
	// normal(0.1, 0.2) is truncated to μ > 0. Its mean is then the
	// truncated-normal mean μ + σφ(α)/(1 − Φ(α)), α = −μ/σ (Johnson, Kotz &
	// Balakrishnan 1994; derived: 0.1 + 0.2·φ(−0.5)/Φ(0.5) = 0.2018). The
	// quantiles at 0 and 1 stay inside (0, ∞).
	s, err := Parse([]byte(chanceBase+"uncertainty:\n  vary:\n    strength.friction: {normal: [0.1, 0.2]}\n"), "t.yaml")
	if err != nil {
		t.Fatal(err)
	}
	d := s.Uncertainty.Vary[0].Dist
	const (
		tol     = 1e-4
		readTol = 1e-4 // 0.2018 is given to four decimals
	)
	phi := math.Exp(-0.125) / math.Sqrt(2*math.Pi)
	want := 0.1 + 0.2*phi/(0.5*math.Erfc(-0.5/math.Sqrt2))
	if math.Abs(want-0.2018) > readTol || math.Abs(d.Mean()-want) > tol {
		t.Errorf("mean %v, want %v (0.2018)", d.Mean(), want)
	}
	if lo := d.Quantile(0); !(lo > 0) {
		t.Errorf("Quantile(0) = %v, want > 0", lo)
	}
	rng := rand.New(rand.NewPCG(1, 1))
	sum := 0.0
	const n = 100000
	for range n {
		x := d.Quantile(rng.Float64())
		if !(x > 0) {
			t.Fatalf("sample %v ≤ 0", x)
		}
		sum += x
	}
	// Within 4 standard errors; the sd of the truncated normal is below σ.
	if se := 0.2 / math.Sqrt(n); math.Abs(sum/n-want) > 4*se {
		t.Errorf("sample mean %v, want %v ± %v", sum/n, want, 4*se)
	}
	// An azimuth is not truncated but taken modulo 360°.
	s, err = Parse([]byte(chanceBase+"cases:\n  a: {stress.shmax.azimuth: 370}\n"), "t.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if got := s.Cases[0].Overrides[0].Value; got != 10 {
		t.Errorf("azimuth 370 taken as %v, want 10", got)
	}
}

func TestVariantIsTheEditedFile(t *testing.T) {
	// Setting a key on a Variant gives the model that the site file edited
	// by hand gives, for a key of every block: the state at two depths and
	// the criterion must agree.
	for _, c := range []struct{ path, from, to string }{
		{"stress.shmax.ratio", "ratio: 1.35", "ratio: 1.1"},
		{"stress.shmax.azimuth", "azimuth: 128", "azimuth: 300"},
		{"stress.shmin.ratio", "ratio: 0.72", "ratio: 0.6"},
		{"stress.vertical.density", "density: 2650", "density: 2400"},
		{"water.table", "table: 18", "table: 40"},
		{"strength.friction", "friction: 0.6}", "friction: 0.5}"},
	} {
		t.Run(c.path, func(t *testing.T) {
			edited := strings.Replace(chanceBase, c.from, c.to, 1)
			if edited == chanceBase {
				t.Fatalf("%q not in the site", c.from)
			}
			x := strings.Fields(strings.Trim(c.to, "}"))[1]
			s, err := Parse([]byte(chanceBase+fmt.Sprintf("cases:\n  a: {%s: %s}\n", c.path, x)), "t.yaml")
			if err != nil {
				t.Fatal(err)
			}
			e, err := Parse([]byte(edited), "e.yaml")
			if err != nil {
				t.Fatal(err)
			}
			v := s.Variant()
			if err := s.Cases[0].Apply(v); err != nil {
				t.Fatal(err)
			}
			for _, z := range []float64{10, 180} {
				if got, want := v.Model().At(z), e.Model.At(z); got != want {
					t.Errorf("at %v m: %+v, want %+v", z, got, want)
				}
			}
			if v.Criterion().String() != e.Criterion.String() {
				t.Errorf("criterion %v, want %v", v.Criterion(), e.Criterion)
			}
			var got, want planes.Result
			p := s.Planes[1]
			v.Resolve(&p, &got)
			e.Resolver().Resolve(&e.Planes[1], &want)
			if got != want && !(math.IsNaN(got.Rake) && math.IsNaN(want.Rake)) {
				t.Errorf("B1: %+v, want %+v", got, want)
			}
			v.Reset()
			if err := v.Finish(); err != nil {
				t.Fatal(err)
			}
			if got, want := v.Model().At(100), s.Model.At(100); got != want {
				t.Errorf("after Reset: %+v, want the site's %+v", got, want)
			}
		})
	}
}
