package decide

import (
	"math"
	"testing"
)

func TestStandingAtTheLimits(t *testing.T) {
	// The boundaries of the rule (doc.go): a factor of safety of 1 is
	// critical (this project's definition of the state, FS ≤ 1); the
	// spalling bands of Martin, Kaiser & McCreath (1999), 0.4 ± 0.1, as
	// opening.SpallingOf draws them (0.3 and 0.5 are at the onset).
	for _, c := range []struct {
		name string
		set  func(f *Finding)
		want Standing
	}{
		{"FS 1", func(f *Finding) { f.byFS(1, NearFS) }, Fails},
		{"FS just above 1", func(f *Finding) { f.byFS(1.000001, NearFS) }, Near},
		{"FS just below 1.5", func(f *Finding) { f.byFS(1.499999, NearFS) }, Near},
		{"FS 1.5", func(f *Finding) { f.byFS(1.5, NearFS) }, Holds},
		{"slope FS below its target 2", func(f *Finding) { f.byFS(1.8, 2) }, Near},
		{"no shear", func(f *Finding) { f.byFS(math.NaN(), NearFS) }, Holds},
		{"not driven", func(f *Finding) { f.byFS(math.Inf(1), NearFS) }, Holds},
		{"opening", func(f *Finding) { f.byOpening(-0.1) }, Fails},
		{"zone at the limit", func(f *Finding) { f.byZone(2.1, 2.1, false, false) }, Near},
		{"zone deeper than the limit", func(f *Finding) { f.byZone(2.2, 2.1, false, true) }, Fails},
		{"zone past two thirds of the limit", func(f *Finding) { f.byZone(1.41, 2.1, false, false) }, Near},
		{"shallow zone", func(f *Finding) { f.byZone(1.3, 2.1, false, false) }, Holds},
		{"unbounded zone", func(f *Finding) { f.byZone(0.5, 2.1, true, false) }, Fails},
		{"σmax/UCS 0.2999", func(f *Finding) { f.byWall(0.2999) }, Holds},
		{"σmax/UCS 0.3", func(f *Finding) { f.byWall(0.3) }, Near},
		{"σmax/UCS 0.5", func(f *Finding) { f.byWall(0.5) }, Near},
		{"σmax/UCS 0.5001", func(f *Finding) { f.byWall(0.5001) }, Fails},
		{"kinematic only", func(f *Finding) { f.byKinematic() }, Near},
	} {
		t.Run(c.name, func(t *testing.T) {
			f := blank(Plane)
			c.set(&f)
			if f.Standing != c.want {
				t.Errorf("standing %v, want %v (u = %v)", f.Standing, c.want, f.Use)
			}
		})
	}
}

func TestChanceRaisesTheStanding(t *testing.T) {
	for _, c := range []struct {
		name            string
		fs, p           float64
		unstable, cases int
		want            Standing
		measure         Measure
		reasons         Reason
	}{
		{"P below 0.05 leaves it", 2, 0.049, 0, 0, Holds, FactorOfSafety, 0},
		{"P 0.05 is near", 2, 0.05, 0, 0, Near, Probability, InRealisations},
		{"P 0.5 fails", 2, 0.5, 0, 0, Fails, Probability, InRealisations},
		{"P does not lower it", 0.9, 0.01, 0, 0, Fails, FactorOfSafety, 0},
		{"P on a near plane keeps its FS", 1.2, 0.2, 0, 0, Near, FactorOfSafety, InRealisations},
		{"critical in a case is near", 2, math.NaN(), 1, 4, Near, FactorOfSafety, InCases},
		{"the base alone is no case", 2, math.NaN(), 1, 1, Holds, FactorOfSafety, 0},
	} {
		t.Run(c.name, func(t *testing.T) {
			f := blank(Plane)
			f.byFS(c.fs, NearFS)
			f.P, f.Unstable, f.Cases = c.p, c.unstable, c.cases
			f.byChance()
			if f.Standing != c.want || f.Measure != c.measure || f.Reasons != c.reasons {
				t.Errorf("%v by %v, reasons %v; want %v by %v, %v", f.Standing, f.Measure, f.Reasons, c.want, c.measure, c.reasons)
			}
			if f.Plain != FactorOfSafety || f.PlainValue != c.fs {
				t.Errorf("plain measure %v %v, want the factor of safety %v", f.Plain, f.PlainValue, c.fs)
			}
			if f.Measure == Probability && f.Use != c.p/FailP {
				t.Errorf("u = %v, want P/0.5", f.Use)
			}
		})
	}
}

func TestRankOrder(t *testing.T) {
	fs := []Finding{
		{Kind: TunnelZone, Standing: Near, Use: 0.9, Name: "a"},
		{Kind: Plane, Standing: Fails, Use: 1.2, Name: "b"},
		{Kind: Plane, Standing: Fails, Use: math.Inf(1), Measure: EffectiveNormal, Value: -0.1, Name: "c"},
		{Kind: Plane, Standing: Fails, Use: math.Inf(1), Measure: EffectiveNormal, Value: -0.3, Name: "d"},
		{Kind: TunnelZone, Standing: Fails, Use: math.Inf(1), Name: "e"},
		{Kind: Planar, Standing: Near, Use: 0.9, Name: "f"},
		{Kind: Plane, Standing: Holds, Use: 0.99, Name: "g"},
	}
	Rank(fs)
	got := ""
	for _, f := range fs {
		got += f.Name
	}
	// d and c open (most negative σn' first), then the unbounded zone
	// (same u, later kind), then by u; on equal u the planar case before
	// the tunnel; holding last.
	if want := "dcebfag"; got != want {
		t.Errorf("ranked %s, want %s", got, want)
	}
}
