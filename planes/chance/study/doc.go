// Package study runs the bracketing cases and the Monte Carlo of a site
// (the cases: and uncertainty: blocks of its site file) and returns typed
// results for every plane, reading and set mean, and, when the varied keys
// touch them, for the feasible planar cases of its slope and the targets of
// its tunnel.
//
// Conventions:
//
//   - Targets are the assessment's planes in input order (the site's
//     planes, then its readings), then the set means.
//   - A case is the base site with the case's overrides set on a
//     site.Variant; its results are those of cleft resolve on the site file
//     edited by hand.
//   - A realisation draws every varied key (chance.Draw: seeded ChaCha8
//     streams, Iman & Conover 1982 rank correlation), sets them on a
//     site.Variant, and, with orientation: {fisher_k}, draws each plane's
//     pole from the Fisher distribution about its own (a set mean: with its
//     set's fitted K) from the plane's own stream, in realisation order.
//   - Work is split by plane, each plane handled by one goroutine over every
//     realisation in order, and every result has a slot of its own, so the
//     outcome for a seed does not depend on the number of workers.
//   - Percentiles are exact (type 7, chance.Percentile) over all
//     realisations: each plane's values are sorted once per plane, by a
//     radix sort on the order-preserving bits of the numbers, so that memory
//     grows with the realisations, not with planes × realisations. A factor
//     of safety that is undefined because the plane opens counts as −Inf
//     (below every number); one undefined because the plane carries no
//     shear counts as +Inf; the slip tendency of an opening plane counts as
//     +Inf.
//   - Rank correlations are Spearman's (1904) ρ between each varied input
//     and the plane's factor of safety (so ranked), mid-ranks for ties.
package study
