// Package decide ranks the findings of one site's screenings across
// everything the site asks for — its mapped planes, the joint sets' mean
// planes and readings, the cases of its rock slope, the stretches of its
// tunnel and, with cases: or uncertainty:, the probabilities — so that a
// summary can put what to look at first at the top, each finding with the
// one number that matters and why (Finding.Reasons).
//
// The ranking rule (Rank). Every finding has a measure and a utilisation u,
// the share of its limit that the measure uses (u ≥ 1 is at or past it):
//
//	factor of safety FS          u = 1/FS          fails at FS ≤ 1, near below NearFS (slope cases: below the slope's target_fs)
//	σn' of an opening plane      u = +Inf          fails (it has no strength left)
//	slip-zone depth d, limit L   u = d/L           fails where the zone reaches deeper than L (or is unbounded, u = +Inf), near at d ≥ L/NearFS
//	σmax/UCS at the tunnel wall  u = (σmax/UCS)/0.5   fails past the onset of spalling (> 0.5), near at the onset (≥ 0.3)
//	probability P                u = P/0.5         fails at P ≥ 0.5, near at P ≥ NearP
//	kinematic only (no FS)       u = 0             near: it can move, with no number to rank it
//
// A finding's standing is Fails, Near or Holds from its measure; the
// bracketing cases and the Monte Carlo can raise it (unstable in some case:
// at least Near; by P as above), and when P raises it, P becomes the
// measure. Findings are ranked by standing, then by u (largest first), then
// by kind (Kind order), then in input order; opening planes among
// themselves by σn', the most negative first.
//
// Stresses are MPa, compression positive; depths and chainages m. The
// package computes; plots/words says it.
package decide
