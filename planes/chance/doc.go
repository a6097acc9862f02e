// Package chance is the statistical core of cleft's uncertainty analysis:
// input distributions, correlated Monte Carlo draws, per-realisation random
// streams, Fisher-distributed directions, rank correlation, percentiles and
// the standard error of a proportion.
//
// Conventions:
//
//   - A Dist is one uncertain scalar input: normal (mean, sd), lognormal
//     (median, sd of ln), uniform (low, high) or triangular (low, mode, high),
//     optionally truncated to [min, max]. A zero spread is allowed and gives
//     the constant. Truncation samples by the inverse CDF restricted to
//     [F(min), F(max)], which is the same distribution as redrawing a sample
//     that falls outside, but takes exactly one uniform per draw, so draws are
//     reproducible and cheap.
//   - Draw returns n realisations × k inputs, row i being realisation i.
//     Each input's uniforms come from a stream of its own (simple random
//     sampling, not a Latin hypercube), so adding an input that is not
//     correlated does not change the others. Rank correlations are induced by the method of Iman &
//     Conover (1982), which reorders the correlated columns and leaves
//     their values (the marginal sample) unchanged.
//   - Every random stream is ChaCha8 keyed by (seed, purpose, index), so a
//     realisation's draws depend on the seed and its index only, never on the
//     number of workers or the order in which they run.
//   - Directions are r3.Vec in whatever frame the caller uses (cleft: NED).
//   - Undefined outputs: Spearman and Percentile accept −Inf and +Inf as
//     ordinary ranks (a caller marks "FS undefined because the plane opens"
//     as −Inf so that it ranks below every number); NaN is not a rank.
//
// Misuse (a probability outside [0, 1], mismatched lengths) panics with a
// message starting "chance:"; bad data (a negative spread, a correlation
// matrix that is not positive definite) returns an error.
package chance
