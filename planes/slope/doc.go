// Package slope screens a cut rock slope against its discontinuities: the
// kinematic tests of planar sliding (Markland's test as refined by Hoek &
// Bray 1981), wedge sliding on the line of intersection of two planes and
// flexural toppling (Goodman & Bray 1976), and the limit-equilibrium factor
// of safety of a planar block with a tension crack (Hoek & Bray 1981; Wyllie
// & Mah 2004) for water cases in the crack.
//
// Screen is the entry point: a Slope (face, top, height, friction, limits,
// unit weight, water cases, crack) and the candidate planes, each with its
// own friction and cohesion, give a Screening of typed Cases. Nothing here
// makes sentences: the failed conditions are bits and the figures behind
// each verdict are fields, put into words by the caller.
//
// Angles are degrees; lengths m; unit weights MN/m³ (MPa/m); forces MN per
// metre of slope for a planar block.
package slope
