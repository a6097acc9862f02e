package slope

import (
	"math"

	"cleft/insitu/geom"

	"gonum.org/v1/gonum/spatial/r3"
)

// DefaultTargetFS is the factor of safety the bolt force is sized for when
// the slope gives none (common practice for permanent rock slopes).
const DefaultTargetFS = 1.5

// Load is the external load on a block besides its weight and its water: a
// bolt or anchor force and a horizontal pseudo-static seismic load α·W
// (Wyllie & Mah 2004, ch. 6 and 7). The zero value is no load.
type Load struct {
	Bolt float64 // T ≥ 0: MN per metre of slope on a planar block, MN on a wedge
	// Plunge is ψT, the angle below the horizontal of the bolt's pull on the
	// block (°; negative: upward). With ToPlane it is instead the angle
	// between the bolt and the sliding plane (planar) or the line of
	// intersection (wedge), and ψT = Plunge − ψp (or − ψi).
	Plunge  float64
	ToPlane bool
	// Trend of the pull (°), used when HasTrend; else the pull points into
	// the slope, opposite the sliding direction (the plane's dip direction
	// or the line's trend). A planar block takes the part of the bolt in its
	// section.
	Trend    float64
	HasTrend bool
	Seismic  float64 // α ≥ 0, acting horizontally along the sliding direction's trend
}

// direction returns the unit vector of the bolt's pull on a wedge whose line
// of intersection is l (down, out of the face) of plunge ψi (°).
func (ld Load) direction(l r3.Vec, psiI float64) r3.Vec {
	psiT := ld.Plunge
	if ld.ToPlane {
		psiT -= psiI
	}
	tr := ld.Trend
	if !ld.HasTrend {
		tr = geom.Azimuth(math.Atan2(l.Y, l.X)*geom.Deg + 180)
	}
	return geom.Line{Trend: geom.Azimuth(tr), Plunge: psiT}.Vec() // (cos ψT cos t, cos ψT sin t, sin ψT), any sign of ψT
}

// PlanarLoad is a Load in the vertical section of a planar block, per metre
// of slope: the bolt force T (MN/m) pulling into the slope at ψT below the
// horizontal, and the seismic coefficient α.
type PlanarLoad struct {
	Bolt, BoltPlunge, Seismic float64
}

// InSection returns the part of ld in the section of a plane of dip ψp and
// dip direction dd (°): a bolt whose trend is off the section pulls with the
// component of its force in that section.
func (ld Load) InSection(dip, dd float64) PlanarLoad {
	psiT := ld.Plunge
	if ld.ToPlane {
		psiT -= dip
	}
	pl := PlanarLoad{Bolt: ld.Bolt, BoltPlunge: psiT, Seismic: ld.Seismic}
	if ld.HasTrend && ld.Bolt != 0 {
		s, c := geom.SinCosDeg(psiT)
		_, cd := geom.SinCosDeg(ld.Trend - (dd + 180))
		h, v := ld.Bolt*c*cd, ld.Bolt*s
		pl.Bolt, pl.BoltPlunge = math.Hypot(h, v), math.Atan2(v, h)*geom.Deg
	}
	return pl
}

// boltFor returns the smallest bolt force T ≥ 0 (to 1e-10 relative) with
// fs(T) ≥ target, by doubling then bisection from scale; false when no force
// up to 2⁶⁰·scale reaches it (a bolt in that direction does not help
// enough). fs(0) ≥ target gives 0.
func boltFor(fs func(t float64) float64, target, scale float64) (float64, bool) {
	if fs(0) >= target {
		return 0, true
	}
	if !(scale > 0) {
		scale = 1
	}
	hi := scale
	for range 60 {
		if fs(hi) >= target {
			break
		}
		hi *= 2
	}
	if !(fs(hi) >= target) {
		return math.NaN(), false
	}
	lo := 0.0
	for hi-lo > 1e-10*hi {
		mid := (lo + hi) / 2
		if fs(mid) >= target {
			hi = mid
		} else {
			lo = mid
		}
	}
	return hi, true
}

// BoltFor returns the smallest bolt force (MN) in the direction of ld that
// brings the wedge to target with h m of water; ld.Bolt is replaced. False
// when no force in that direction does.
func (w *WedgeBlock) BoltFor(st Strength, h float64, ld Load, target float64) (float64, bool) {
	return boltFor(func(t float64) float64 {
		ld.Bolt = t
		return w.Solve(st, h, ld).FS
	}, target, w.Weight/64)
}
