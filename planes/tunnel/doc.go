// Package tunnel screens a tunnel alignment against the in-situ stress and
// the discontinuities it crosses: stations along straight legs with the
// cover interpolated from a profile, the far field at the axis depth rotated
// into the tunnel frame, each plane's far-field tendencies and its
// orientation class against the drive (Bieniawski 1989), the boundary
// stresses of a circular opening round the perimeter (insitu/opening), their
// largest value against the UCS (spalling, Martin, Kaiser & McCreath 1999),
// the arcs of the wall where the wall stress resolved on each plane is
// critical or opening, and each plane's slip zone in the rock round the
// opening (Find): how deep beyond the wall, where and over what area the
// full elastic stress resolved on it is critical or opening.
//
// Screen is the entry point. Chainages and lengths are m, stresses MPa
// (compression positive), angles degrees; perimeter angles run from the
// crown, clockwise looking along the drive (0 crown, 90 right sidewall, 180
// invert, 270 left sidewall).
package tunnel
