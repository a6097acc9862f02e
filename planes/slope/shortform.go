package slope

import (
	"math"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// ShortForm is the friction-only wedge of Wyllie & Mah (2004, ch. 7), read
// in the section perpendicular to the line of intersection: the included
// angle ξ between the two planes' traces on the block's side, the tilt β of
// its bisector from the horizontal, and the wedge factor
//
//	K = sin β / sin(ξ/2)
//
// so that a dry cohesionless wedge of friction φ on both planes has
// FS = K · tan φ / tan ψi. With different friction on the planes, resolving
// the weight's part W cos ψi in that section onto the two traces gives
// NA = W cos ψi sin θB / sin ξ and NB = W cos ψi sin θA / sin ξ (θ the
// traces' angles from the horizontal in that section), and
// FS = (NA tan φA + NB tan φB) / (W sin ψi). Both reactions positive is the
// condition of sliding on both planes (Both).
type ShortForm struct {
	K, Beta, Xi float64 // K; β and ξ in degrees
	PlungeI     float64 // ψi, °
	Both        bool    // both reactions positive: the wedge rides on both planes
	shareA      float64 // NA / (W cos ψi)
	shareB      float64
}

// WedgeShortForm works out the short form of the wedge of planes a and b
// on face f; false for parallel planes, a vertical line of intersection, or
// planes that make no wedge with the face.
func WedgeShortForm(a, b, f planes.Orientation) (ShortForm, bool) {
	var s ShortForm
	l, ok := Intersection(a, b)
	if !ok || l.Plunge >= 90 {
		return s, false
	}
	lv := l.Vec()
	s.PlungeI = l.Plunge
	hz := r3.Unit(r3.Cross(lv, r3.Vec{Z: 1})) // horizontal, across the line
	up := r3.Unit(r3.Cross(hz, lv))           // in the section, upwards
	if up.Z > 0 {
		up = r3.Scale(-1, up)
	}
	na, nb, _, _, ok := sides(a, b, f)
	if !ok {
		return s, false
	}
	ray := func(n, other r3.Vec) r3.Vec {
		t := r3.Unit(r3.Cross(lv, n))
		if r3.Dot(t, other) < 0 {
			t = r3.Scale(-1, t)
		}
		return t
	}
	ta, tb := ray(na, nb), ray(nb, na)
	thA := math.Atan2(r3.Dot(ta, up), r3.Dot(ta, hz))
	thB := math.Atan2(r3.Dot(tb, up), r3.Dot(tb, hz))
	xi := math.Acos(math.Max(-1, math.Min(1, r3.Dot(ta, tb))))
	bis := r3.Unit(r3.Add(ta, tb))
	s.Xi, s.Beta = xi*geom.Deg, math.Asin(math.Max(-1, math.Min(1, r3.Dot(bis, up))))*geom.Deg
	s.K = r3.Dot(bis, up) / math.Sin(xi/2)
	s.shareA, s.shareB = math.Sin(thB)/math.Sin(xi), math.Sin(thA)/math.Sin(xi)
	s.Both = s.shareA > 0 && s.shareB > 0
	return s, true
}

// FS returns the friction-only factor of safety of the short form, for
// friction angles phiA and phiB (°); NaN unless the wedge rides on both
// planes.
func (s ShortForm) FS(phiA, phiB float64) float64 {
	if !s.Both {
		return math.NaN()
	}
	return (s.shareA*math.Tan(phiA*geom.Rad) + s.shareB*math.Tan(phiB*geom.Rad)) / math.Tan(s.PlungeI*geom.Rad)
}
