package slope

import (
	"errors"
	"fmt"
	"math"

	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Tags of the planes that bound a wedge block.
const (
	onA = iota
	onB
	onFace
	onTop
	onCrack
)

// WedgeBlock is the rigid block bounded by two planes A and B, the cut face,
// the upper slope surface and, when the slope gives one, a vertical tension
// crack. It is built in the NED frame (x north, y east, z down) with its
// lowest corner O, where the line of intersection daylights, at the toe of
// the slope and the crest H above it: the largest wedge the two planes can
// cut from the slope. Lengths are m, areas m², volume m³, weight MN.
type WedgeBlock struct {
	Volume         float64 // m³
	Weight         float64 // W = γ·Volume, MN
	AreaA, AreaB   float64 // contact areas on A and B, m²
	TraceA, TraceB float64 // lengths of the traces of A and B on the face, m
	CrackArea      float64 // area of the crack face, m²; 0 without a crack
	CrackDepth     float64 // depth of the crack below the upper surface where it meets the line of intersection, m; 0 without
	Saturated      float64 // head of water (m) at the block's deepest wet point when it is fully saturated
	Plunge         float64 // ψi, plunge of the line of intersection, °
	Line           r3.Vec  // unit vector down the line of intersection, out of the face
	NormalA        r3.Vec  // unit normal of A pointing into the block: upwards when the block rests on A, downwards when A overhangs it
	NormalB        r3.Vec  // unit normal of B pointing into the block

	faces    []blockFace
	crackOut r3.Vec  // unit normal of the crack, into the slope; zero without a crack
	peak     r3.Vec  // where the water pressure on A and B is greatest
	crest    float64 // elevation of the crest above O, m (= H)
}

// Wedge errors: the two planes and the slope make no closed block.
var (
	ErrNoLine   = errors.New("the planes are parallel: no line of intersection")
	ErrNoWedge  = errors.New("a plane is parallel to the face, or the traces of the planes on the face coincide or run level: no wedge forms")
	ErrOpenTop  = errors.New("the line of intersection or a trace does not reach the upper slope surface: the block is not closed")
	ErrCrackPos = errors.New("the tension crack would meet the line of intersection in front of the crest or below its daylight point")
)

// sides returns the unit normals of a and b that point into the wedge they
// cut from a slope of face f, and the upward directions of their traces on
// the face. Of the four dihedral quadrants round the line of intersection,
// the block is the one whose outcrop on the face is the sector between the
// two traces' upward rays (the only quadrant that the face and an upper
// surface close off): a plane the block rests on has its inward normal
// upwards; one that overhangs the block, downwards. ok is false when a
// plane is parallel to the face or the traces coincide or run horizontally.
func sides(a, b, f planes.Orientation) (na, nb, ra, rb r3.Vec, ok bool) {
	nF := f.Normal()
	na, nb = a.Normal(), b.Normal()
	ray := func(n r3.Vec) (r3.Vec, bool) {
		r := r3.Cross(n, nF)
		if r3.Norm(r) < 1e-12 {
			return r, false
		}
		r = r3.Unit(r)
		if r.Z > 0 {
			r = r3.Scale(-1, r)
		}
		return r, -r.Z > 1e-12
	}
	var okA, okB bool
	ra, okA = ray(na)
	rb, okB = ray(nb)
	if !okA || !okB {
		return na, nb, ra, rb, false
	}
	da, db := r3.Dot(na, rb), r3.Dot(nb, ra)
	if math.Abs(da) < 1e-12 || math.Abs(db) < 1e-12 {
		return na, nb, ra, rb, false
	}
	if da < 0 {
		na = r3.Scale(-1, na)
	}
	if db < 0 {
		nb = r3.Scale(-1, nb)
	}
	return na, nb, ra, rb, true
}

// NewWedgeBlock builds the block of planes a and b in slope sl (face, top,
// height, unit weight, tension crack). With sl.CrackGiven the crack is
// vertical, parallel to the crest, at sl.Crack m behind it, or (with
// sl.CrackByDepth) placed so that it is sl.Crack m deep where it meets the
// line of intersection; a crack behind the block is no crack. Without a
// crack, a saturated block has the head Saturated = half the height of the
// line of intersection at the middle of that line (Hoek & Bray 1981); with
// one, the crack's depth at the line.
//
// It returns an error when the planes make no closed block with the face and
// the top (ErrNoLine, ErrNoWedge, ErrOpenTop, ErrCrackPos, wrapped).
func NewWedgeBlock(sl Slope, a, b planes.Orientation) (WedgeBlock, error) {
	var w WedgeBlock
	nF, nT := r3.Scale(-1, sl.Face.Normal()), r3.Scale(-1, sl.Top.Normal()) // outward: up, out of the rock
	l, ok := Intersection(a, b)
	if !ok {
		return w, ErrNoLine
	}
	lv := l.Vec()
	if r3.Dot(lv, nF) <= 0 {
		if l.Plunge != 0 {
			return w, fmt.Errorf("%w: the line of intersection does not daylight", ErrNoWedge)
		}
		lv = r3.Scale(-1, lv)
	}
	w.Line, w.Plunge = lv, l.Plunge
	var eA, eB r3.Vec
	if w.NormalA, w.NormalB, eA, eB, ok = sides(a, b, sl.Face); !ok {
		return w, ErrNoWedge
	}
	w.crest = sl.Height
	crest := r3.Scale(sl.Height/math.Sin(sl.Face.Dip()*math.Pi/180), sl.Face.UpDip())
	eL := r3.Scale(-1, lv) // up the line, into the slope
	toTop := func(e r3.Vec) (r3.Vec, error) {
		den := r3.Dot(nT, e)
		t := r3.Dot(nT, crest) / den
		if !(den > 1e-12) || !(t > 0) || math.IsInf(t, 0) {
			return e, ErrOpenTop
		}
		return r3.Scale(t, e), nil
	}
	pa, err := toTop(eA)
	if err != nil {
		return w, err
	}
	pb, err := toTop(eB)
	if err != nil {
		return w, err
	}
	pc, err := toTop(eL)
	if err != nil {
		return w, err
	}
	var o r3.Vec
	w.faces = []blockFace{{onA, []r3.Vec{o, pa, pc}}, {onB, []r3.Vec{o, pb, pc}}, {onFace, []r3.Vec{o, pa, pb}}, {onTop, []r3.Vec{pa, pb, pc}}}
	w.TraceA, w.TraceB = r3.Norm(pa), r3.Norm(pb)
	w.peak, w.Saturated = r3.Scale(0.5, pc), -pc.Z/2

	if sl.CrackGiven {
		if err := w.cut(sl, nF, nT, crest, eL, pc); err != nil {
			return w, err
		}
	}
	outs := map[int]r3.Vec{onA: r3.Scale(-1, w.NormalA), onB: r3.Scale(-1, w.NormalB), onFace: nF, onTop: nT, onCrack: w.crackOut}
	for _, f := range w.faces {
		switch f.plane {
		case onA:
			w.AreaA = polygonArea(f.pts)
		case onB:
			w.AreaB = polygonArea(f.pts)
		case onCrack:
			w.CrackArea = polygonArea(f.pts)
		}
	}
	w.Volume = volume(w.faces, outs)
	w.Weight = sl.UnitWeight * w.Volume
	return w, nil
}

// cut clips the block by the vertical tension crack parallel to the crest.
func (w *WedgeBlock) cut(sl Slope, nF, nT, crest, eL, pc r3.Vec) error {
	dc := r3.Cross(nF, nT)
	k := r3.Vec{X: -dc.Y, Y: dc.X}
	if r3.Norm(k) < 1e-12 {
		k = r3.Vec{X: -nF.X, Y: -nF.Y}
	}
	k = r3.Unit(k)
	if r3.Dot(k, nF) > 0 {
		k = r3.Scale(-1, k)
	}
	// depth below the top of a point p: nT·(crest − p)/(−nT.z).
	depth := func(p r3.Vec) float64 { return r3.Dot(nT, r3.Sub(crest, p)) / -nT.Z }
	d := r3.Dot(k, crest) + sl.Crack
	if sl.CrackByDepth {
		s := (r3.Dot(nT, crest) - sl.Crack*-nT.Z) / r3.Dot(nT, eL)
		if s < 0 {
			return ErrCrackPos
		}
		d = r3.Dot(k, r3.Scale(s, eL))
		if d < r3.Dot(k, crest)-1e-9 {
			return ErrCrackPos
		}
	}
	if r3.Dot(k, pc) <= d+1e-9 {
		return nil // the crack is behind the block
	}
	w.faces = clip(w.faces, k, d, onCrack)
	w.crackOut = k
	pK := r3.Scale(d/r3.Dot(k, eL), eL)
	w.peak, w.CrackDepth = pK, depth(pK)
	w.Saturated = w.CrackDepth
	return nil
}

// HasCrack reports whether a tension crack cuts the block.
func (w *WedgeBlock) HasCrack() bool { return w.crackOut != (r3.Vec{}) }

// PeakElevation is the height above O of the point where the water pressure
// on A and B is greatest: the foot of the crack on the line of intersection,
// or without a crack the middle of that line.
func (w *WedgeBlock) PeakElevation() float64 { return -w.peak.Z }

// CrestElevation is the height of the crest above O, m.
func (w *WedgeBlock) CrestElevation() float64 { return w.crest }
