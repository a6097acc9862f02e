// Package geom is the geometry shared by every part of cleft: lines given by
// trend and plunge, azimuths, angles between directions and axes, sines and
// cosines of degrees, and the eigen-decomposition of a symmetric 3 × 3
// tensor in descending order. It knows nothing of stress or planes, so the
// stress model (insitu), the planes and the figures can all import it.
//
// Frame: x = north, y = east, z = down (NED, right-handed). Angles are
// degrees; azimuths clockwise from north in [0, 360), plunges down from the
// horizontal in [0, 90].
package geom
