// Package opening gives the stresses round a circular opening (a tunnel or
// shaft) in an elastic far field: the tunnel frame, the boundary stresses of
// Kirsch (1898) in the general plane-strain form of Hiramatsu & Oka (1962),
// the wall stress as a full tensor for resolving on planes, and where the
// largest boundary stress sits against the onset of spalling.
//
// Stresses are MPa, compression positive, in the NED frame unless a function
// says it works in the tunnel frame (Up, Right, Axis). Perimeter angles are
// degrees from the crown, clockwise looking along the drive.
package opening
