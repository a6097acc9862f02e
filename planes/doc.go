// Package planes resolves a stress state onto planes — joints, faults,
// bedding — and judges how close each is to slipping or opening.
//
// A plane is an Orientation given by dip and dip direction in degrees (dip
// from horizontal in [0, 90], dip direction clockwise from north in
// [0, 360), 360 ≡ 0); strike follows the right-hand rule (dip direction =
// strike + 90). Its pole is the lower-hemisphere normal. The frame, sign and
// unit conventions are those of package insitu: NED, compression positive,
// MPa, metres.
//
// Resolve gives, for a state and a strength Criterion, the normal and shear
// stress, slip tendency (Morris, Ferrill & Henderson 1996), dilation tendency
// (Ferrill et al. 1999), factor of safety, the pore-pressure rise to slip,
// and the rake of the hanging-wall slip (Wallace 1951; Bott 1959) measured as
// in Aki & Richards (1980). A value that is undefined for a plane is NaN in
// Result; writers print it as an empty cell or null, never as a number.
//
// The pressure to slip has a tension cut-off: it is never more than the rise
// that opens the plane, so an opening plane never has a positive one. A plane
// within NearVertical of vertical, or NearHorizontal of horizontal, gets the
// same verdicts whichever dip direction was typed: its dip-slip is named by
// the side that goes up (Side), not normal or reverse, and a horizontal plane
// has no rake or sense, only the slip trend of its upper block.
//
// Everything here is a pure function over values: no I/O.
package planes
