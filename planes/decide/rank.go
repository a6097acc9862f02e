package decide

import (
	"math"
	"sort"

	"cleft/insitu/opening"
)

// NearFS is the factor of safety below which a plane is near its limit, and
// NearFS times the zone depth limit the depth from which a slip zone is: 1.5,
// the usual target of a permanent rock slope (common practice). Slope cases
// use the slope's own target_fs instead.
const NearFS = 1.5

// NearP is the probability of being critical or opening (slope cases: of
// FS < 1) from which a finding is near its limit, whatever its base state.
const NearP = 0.05

// FailP is the probability from which a finding fails: more likely than not.
const FailP = 0.5

// byFS sets the utilisation and standing of a factor of safety fs against
// near (FS below it is near): u = 1/FS; FS ≤ 1 fails. An undefined FS
// (no shear stress) or +Inf (nothing drives the block) holds with u = 0.
func (f *Finding) byFS(fs, near float64) {
	f.Measure, f.Value = FactorOfSafety, fs
	switch {
	case math.IsNaN(fs) || math.IsInf(fs, 1):
		f.Use, f.Standing = 0, Holds
	case fs <= 1:
		f.Use, f.Standing = 1/fs, Fails
	case fs < near:
		f.Use, f.Standing = 1/fs, Near
	default:
		f.Use, f.Standing = 1/fs, Holds
	}
	if fs <= 0 {
		f.Use = math.Inf(1)
	}
}

// byOpening marks an opening plane: u = +Inf, fails, measured by σn'.
func (f *Finding) byOpening(sn float64) {
	f.Measure, f.Value, f.Use, f.Standing = EffectiveNormal, sn, math.Inf(1), Fails
}

// byZone sets the utilisation and standing of a slip zone of depth d
// against the limit: u = d/limit (+Inf when unbounded); it fails when it
// reaches deeper than the limit somewhere (deeper), near at d ≥ limit/NearFS.
func (f *Finding) byZone(d, limit float64, unbounded, deeper bool) {
	f.Measure, f.Value, f.Use = ZoneDepth, d, d/limit
	if unbounded {
		f.Use = math.Inf(1)
	}
	switch {
	case deeper || unbounded:
		f.Standing = Fails
	case f.Use >= 1/NearFS:
		f.Standing = Near
	default:
		f.Standing = Holds
	}
}

// byWall sets the utilisation and standing of σmax/UCS: u = ratio/0.5; past
// the onset of spalling fails, at the onset is near (Martin, Kaiser &
// McCreath 1999 bands, opening.SpallingOf).
func (f *Finding) byWall(ratio float64) {
	f.Measure, f.Value, f.Use = WallRatio, ratio, ratio/(opening.SpallingOnset+0.1)
	switch opening.SpallingOf(ratio) {
	case opening.PastOnset:
		f.Standing = Fails
	case opening.AtOnset:
		f.Standing = Near
	default:
		f.Standing = Holds
	}
}

// byKinematic marks a case that can move but has no factor of safety:
// near, u = 0.
func (f *Finding) byKinematic() {
	f.Measure, f.Value, f.Use, f.Standing = Kinematic, math.NaN(), 0, Near
}

// byChance raises the standing by the cases and the Monte Carlo: unstable
// in some case is at least near; P ≥ NearP near, P ≥ FailP fails. When P
// raises the standing, P becomes the measure and u = P/FailP.
func (f *Finding) byChance() {
	f.Plain, f.PlainValue = f.Measure, f.Value
	if f.Cases > 1 && f.Unstable > 0 {
		f.Reasons |= InCases
		if f.Standing < Near {
			f.Standing = Near
		}
	}
	if math.IsNaN(f.P) {
		return
	}
	s := Holds
	switch {
	case f.P >= FailP:
		s = Fails
	case f.P >= NearP:
		s = Near
	}
	if s >= Near {
		f.Reasons |= InRealisations
	}
	if s > f.Standing {
		f.Measure, f.Value, f.Use, f.Standing = Probability, f.P, f.P/FailP, s
	}
}

// Rank sorts findings by the package rule: standing, then u (largest
// first), then kind, then input order; opening planes among themselves by
// σn', the most negative first.
func Rank(fs []Finding) {
	sort.SliceStable(fs, func(i, j int) bool {
		a, b := &fs[i], &fs[j]
		if a.Standing != b.Standing {
			return a.Standing > b.Standing
		}
		if a.Use != b.Use {
			return a.Use > b.Use
		}
		if a.Kind != b.Kind {
			return a.Kind < b.Kind
		}
		if a.Measure == EffectiveNormal && b.Measure == EffectiveNormal {
			return a.Value < b.Value
		}
		return false
	})
}

// part is the part of a site a kind belongs to, for Top.
func (k Kind) part() int {
	switch k {
	case Plane:
		return 0
	case SetMean, Readings:
		return 1
	case Planar, Wedge, Toppling:
		return 2
	case TunnelWall:
		return 3
	}
	return 4
}

// Top returns the findings to look at first from ranked ones: those that
// fail or are near their limit, the first n of them, and the first of each
// part of the site that is not among those (the mapped planes, the joint
// sets, the slope, the tunnel wall, the planes along the tunnel), so that
// no part is crowded out; at least min(least, len(fs)) findings whatever
// their standing; in rank order. more is how many failing or near ones are
// left out.
func Top(fs []Finding, n, least int) (top []Finding, more int) {
	k := 0
	for k < len(fs) && fs[k].Standing >= Near {
		k++
	}
	var seen [5]bool
	for i := range fs[:k] {
		if p := fs[i].Kind.part(); i < n || !seen[p] {
			seen[p] = true
			top = append(top, fs[i])
		}
	}
	more = k - len(top)
	for j := k; len(top) < least && j < len(fs); j++ {
		top = append(top, fs[j])
	}
	return top, more
}
