package slope

import (
	"fmt"
	"math"

	"cleft/insitu"
)

// PlanarBlock is the cross-section of a planar sliding block with a vertical
// tension crack in the upper slope surface (Hoek & Bray 1981; Wyllie & Mah
// 2004), per metre of slope length, in the vertical section through the
// plane's dip direction. Angles are degrees, lengths m, γ MN/m³, forces
// MN/m.
type PlanarBlock struct {
	Height     float64 // H, slope height (toe to crest)
	FaceDip    float64 // ψf in the section
	TopDip     float64 // ψs in the section, rising into the slope (negative: descending behind the crest); 0 for a flat top
	PlaneDip   float64 // ψp
	CrackDepth float64 // z, below the upper surface; 0 for no crack
	UnitWeight float64 // γ of the rock

	// Derived by NewPlanarBlock.
	Weight float64 // W = γ·(area of the block)
	Length float64 // A, length of the sliding plane from the toe to the crack
	Behind float64 // b, the crack's distance behind the crest
}

// CriticalCrackDepth returns Hoek & Bray's (1981) critical tension-crack
// depth for a flat-topped slope (memory): z/H = 1 − √(cot ψf · tan ψp).
func CriticalCrackDepth(h, faceDip, planeDip float64) float64 {
	return h * (1 - math.Sqrt(math.Tan(planeDip*math.Pi/180)/math.Tan(faceDip*math.Pi/180)))
}

// NewPlanarBlock works out the block for a crack given by its depth z (when
// byDepth) or its distance b behind the crest. The block is the polygon toe
// → crest → top of the crack → foot of the crack → toe; with a flat top its
// weight is Hoek & Bray's W = ½γH²{[1 − (z/H)²] cot ψp − cot ψf}. The upper
// surface may rise into the slope or descend behind the crest (topDip < 0):
// the polygon follows it either way, never flattened. A crack
// placed where the plane has already reached the upper surface is no crack
// (z = 0, the block ends where the plane outcrops).
func NewPlanarBlock(h, faceDip, topDip, planeDip, crack float64, byDepth bool, gamma float64) (PlanarBlock, error) {
	b := PlanarBlock{Height: h, FaceDip: faceDip, TopDip: topDip, PlaneDip: planeDip, UnitWeight: gamma}
	tp, ts, tf := tand(planeDip), tand(topDip), tand(faceDip)
	switch {
	case !(h > 0):
		return b, fmt.Errorf("slope height %.3g m: want > 0", h)
	case !(planeDip > 0 && planeDip < faceDip):
		return b, fmt.Errorf("plane dip %.1f° must be between 0 and the face dip %.1f° for planar sliding", planeDip, faceDip)
	case !(topDip > -90 && topDip < planeDip):
		return b, fmt.Errorf("upper surface dip %.1f° must be less than the plane dip %.1f° for the plane to outcrop behind the crest", topDip, planeDip)
	}
	xc := h / tf // crest
	top := func(x float64) float64 { return h + (x-xc)*ts }
	xOut := (h - xc*ts) / (tp - ts) // where the plane reaches the upper surface
	xk := xOut
	if byDepth {
		if crack > 0 {
			xk = (h - crack - xc*ts) / (tp - ts)
			if xk < xc {
				return b, fmt.Errorf("a tension crack %.3g m deep would meet the plane in front of the crest: the crack must be in the upper surface (at most %.2f m deep here)", crack, h-xc*tp)
			}
		}
	} else {
		xk = math.Min(xc+crack, xOut)
	}
	b.Behind = xk - xc
	b.CrackDepth = math.Max(0, top(xk)-xk*tp)
	poly := [][2]float64{{0, 0}, {xc, h}, {xk, top(xk)}, {xk, xk * tp}}
	area := 0.0
	for i := range poly {
		p, q := poly[i], poly[(i+1)%len(poly)]
		area += p[0]*q[1] - q[0]*p[1]
	}
	b.Weight = gamma * math.Abs(area) / 2
	b.Length = xk / math.Cos(planeDip*math.Pi/180)
	return b, nil
}

// FS returns the factor of safety of the block with water to depth zw in
// the tension crack, draining along the plane to the toe (Hoek & Bray 1981;
// Wyllie & Mah 2004):
//
//	FS = [c·A + (W cos ψp − U − V sin ψp) tan φ] / (W sin ψp + V cos ψp)
//	U = ½ γw zw A,  V = ½ γw zw²
//
// c in MPa, φ in degrees. A negative effective normal force (uplift beyond
// the weight) is taken as 0: the block floats and only cohesion holds it.
// It is FSWith and no load.
func (b PlanarBlock) FS(c, phi, zw float64) float64 {
	return b.FSWith(c, phi, zw, PlanarLoad{})
}

// FSWith returns the factor of safety with water to depth zw in the crack
// and the load ld: a bolt force T (MN/m) pulling into the slope at ψT below
// the horizontal and a horizontal seismic force α·W out of the face
// (Wyllie & Mah 2004, ch. 6):
//
//	FS = [cA + (W(cos ψp − α sin ψp) − U − V sin ψp + T sin(ψT + ψp)) tan φ]
//	   / [W(sin ψp + α cos ψp) + V cos ψp − T cos(ψT + ψp)]
//
// A negative effective normal force is taken as 0, as in FS; a denominator
// ≤ 0 (nothing drives the block) gives +Inf. It costs a few dozen
// floating-point operations and allocates nothing.
func (b PlanarBlock) FSWith(c, phi, zw float64, ld PlanarLoad) float64 {
	sp, cp := math.Sincos(b.PlaneDip * math.Pi / 180)
	st, ct := math.Sincos((ld.BoltPlunge + b.PlaneDip) * math.Pi / 180)
	U := 0.5 * insitu.Hydrostatic * zw * b.Length
	V := 0.5 * insitu.Hydrostatic * zw * zw
	a := ld.Seismic
	n := math.Max(0, b.Weight*(cp-a*sp)-U-V*sp+ld.Bolt*st)
	d := b.Weight*(sp+a*cp) + V*cp - ld.Bolt*ct
	if d <= 0 {
		return math.Inf(1)
	}
	return (c*b.Length + n*tand(phi)) / d
}

// BoltFor returns the smallest bolt force (MN/m) in the direction of ld
// that brings the block with water to zw in the crack to the factor of
// safety target; ld.Bolt is replaced. False when no force in that
// direction does.
func (b PlanarBlock) BoltFor(c, phi, zw float64, ld PlanarLoad, target float64) (float64, bool) {
	return boltFor(func(t float64) float64 {
		ld.Bolt = t
		return b.FSWith(c, phi, zw, ld)
	}, target, b.Weight/64)
}

// FootElevation is the height of the crack's foot above the toe, m (the
// point where the water pressure on the plane is greatest).
func (b PlanarBlock) FootElevation() float64 {
	return (b.Height/tand(b.FaceDip) + b.Behind) * tand(b.PlaneDip)
}

// WaterDepthToFail returns the depth of water in the tension crack at which
// the factor of safety falls to 1, by bisection on [0, z]: 0 when the block
// is at or below 1 dry, NaN when even a full crack leaves it above 1. It is
// WaterDepthToFailWith and no load.
func (b PlanarBlock) WaterDepthToFail(c, phi float64) float64 {
	return b.WaterDepthToFailWith(c, phi, PlanarLoad{})
}

// WaterDepthToFailWith is WaterDepthToFail with the load ld.
func (b PlanarBlock) WaterDepthToFailWith(c, phi float64, ld PlanarLoad) float64 {
	fs := func(zw float64) float64 { return b.FSWith(c, phi, zw, ld) }
	if fs(0) <= 1 {
		return 0
	}
	if b.CrackDepth == 0 || fs(b.CrackDepth) > 1 {
		return math.NaN()
	}
	lo, hi := 0.0, b.CrackDepth
	for range 100 {
		mid := (lo + hi) / 2
		if fs(mid) > 1 {
			lo = mid
		} else {
			hi = mid
		}
	}
	return (lo + hi) / 2
}
