// Package assess runs the screenings of one site file: every plane (the
// inline planes and the planes table) and every field reading resolved at
// its own depth with its own strength and pore pressure; the readings
// grouped into joint sets with the stress on each set's mean plane; and, on
// request, the rock slope and the tunnel of the site with the site's planes
// and set means as candidates. It also gathers the facts a summary needs.
//
// New is the entry point; Slope and Tunnel screen only when called, so a
// caller computes only what it needs. Stresses are MPa, compression
// positive; depths m.
package assess
