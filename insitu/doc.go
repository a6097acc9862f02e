// Package insitu describes the far-field stress in rock: a symmetric stress
// tensor, its principal stresses and axes, the stress regime, and models that
// give the stress and pore pressure at any depth.
//
// Conventions, used everywhere in cleft:
//
//   - Frame: x = north, y = east, z = down (NED, right-handed).
//   - Stress: compression positive, MPa. Texts that use tension positive are
//     converted at the edge, never inside this package.
//   - Depth: metres below ground surface, positive down.
//   - Angles: degrees at the edges only. Azimuths (trend, dip direction) are
//     clockwise from north in [0, 360); plunges and dips are down from the
//     horizontal in [0, 90].
//   - Pore pressure: Pp = gradient·max(0, depth − table); effective stress
//     σ' = σ − α·Pp with Biot's coefficient α (1 by default).
//
// Values are validated once, at construction; afterwards methods trust them.
// A model built from bad data returns an error; misuse of the API (an index
// out of range, say) panics with a message starting with "insitu:".
package insitu
