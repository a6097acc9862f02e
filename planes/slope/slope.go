package slope

import "cleft/planes"

// Slope is a cut slope to screen, with every default already applied.
type Slope struct {
	Face          planes.Orientation // the cut face; dip > 0
	Top           planes.Orientation // the upper slope surface; dip 0 for a flat top
	Height        float64            // H, toe to crest, m > 0
	FrictionAngle float64            // φ of planes without their own friction, ° in (0, 90)
	LateralLimit  float64            // planar sliding, ° in (0, 90]
	ToppleLimit   float64            // flexural toppling, ° in (0, 90]
	UnitWeight    float64            // γ of the rock, MN/m³
	Water         []Water            // water cases, at least one
	Crack         float64            // tension crack: depth (CrackByDepth) or distance behind the crest, m ≥ 0
	CrackByDepth  bool
	CrackGiven    bool    // false: Hoek & Bray's critical depth for each planar block, no crack in a wedge
	Cohesion      float64 // c of planes without their own cohesion, MPa ≥ 0
	Load          Load    // bolt (Bolt: MN per metre on planar blocks) and seismic load on every block
	WedgeBolt     float64 // the bolt force on each wedge, MN, in the direction of Load
	TargetFS      float64 // the factor of safety a bolt force is sized for, > 0 (DefaultTargetFS)
}

// Candidate is a plane tested against the slope, with the strength of its
// own sliding: φ and c are the plane's own where it gives them, else the
// slope's.
type Candidate struct {
	Name        string
	Orientation planes.Orientation
	Phi         float64 // friction angle, °
	Cohesion    float64 // MPa
	IsSet       bool    // the mean plane of a joint set
}
