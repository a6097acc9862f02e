package decide

import (
	"math"
	"strings"

	"cleft/planes"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// Kind is what a finding is about.
type Kind uint8

const (
	Plane      Kind = iota + 1 // a mapped plane of the site (inline or planes_file)
	SetMean                    // the mean plane of a joint set
	Readings                   // the field readings of one set, by its least stable reading
	Planar                     // planar sliding of the slope on one plane
	Wedge                      // wedge sliding of the slope on two planes
	Toppling                   // flexural toppling of the slope on one plane
	TunnelWall                 // the wall of the tunnel: its largest boundary stress
	TunnelZone                 // one plane or set along the tunnel: its slip zone and far field
)

// String returns the kind as summary.json writes it.
func (k Kind) String() string {
	switch k {
	case Plane:
		return "plane"
	case SetMean:
		return "set-mean"
	case Readings:
		return "readings"
	case Planar:
		return "planar"
	case Wedge:
		return "wedge"
	case Toppling:
		return "flexural-toppling"
	case TunnelWall:
		return "tunnel-wall"
	case TunnelZone:
		return "tunnel-zone"
	}
	return ""
}

// Measure is the number a finding is ranked and shown by.
type Measure uint8

const (
	FactorOfSafety  Measure = iota + 1 // FS; slope cases: the least over the water cases
	EffectiveNormal                    // σn' (MPa) of an opening plane, ≤ 0
	ZoneDepth                          // the greatest depth of a slip zone beyond the wall, m
	WallRatio                          // σmax/UCS at the tunnel wall
	Probability                        // P(critical or opening); slope cases P(FS < 1)
	Kinematic                          // no number: kinematically feasible
)

// String returns the measure as summary.json writes it.
func (m Measure) String() string {
	switch m {
	case FactorOfSafety:
		return "factor_of_safety"
	case EffectiveNormal:
		return "effective_normal_stress_mpa"
	case ZoneDepth:
		return "slip_zone_depth_m"
	case WallRatio:
		return "sigma_max_to_ucs"
	case Probability:
		return "probability"
	case Kinematic:
		return "kinematic"
	}
	return ""
}

// Standing is how near a finding is to its limit.
type Standing uint8

const (
	Holds Standing = iota // within its limit and not near it
	Near                  // near its limit (see the package rule)
	Fails                 // at or past its limit
)

// String returns the standing as summary.json writes it.
func (s Standing) String() string {
	switch s {
	case Near:
		return "near"
	case Fails:
		return "fails"
	}
	return "holds"
}

// Reason is a bit set of why a finding stands where it does.
type Reason uint32

const (
	OwnFriction     Reason = 1 << iota // a plane of it has its own friction (friction column)
	OwnCohesion                        // … its own cohesion
	OwnPorePressure                    // … its own pore pressure (pore_pressure column)
	OpensFirst                         // its cohesion carries the shear stress: a rise in pore pressure opens it before it slips
	Water                              // slope: its least FS is with water (in the crack, on the planes), not saturated
	Saturated                          // slope: its least FS is in the saturated case
	Seismic                            // slope: with the seismic load
	Bolted                             // slope: with the bolt force
	OnePlane                           // wedge: in the water case of its least FS it slides on one plane alone
	FarField                           // tunnel: critical or opening in the far field somewhere, so its zone has no bound there
	PastGrid                           // tunnel: its deepest zone reaches the search's outer radius: the depth is a lower bound
	InCases                            // critical or opening in some bracketing case
	InRealisations                     // P ≥ NearP in the Monte Carlo
	NoBlock                            // slope: kinematically feasible, but its block is outside the limit-equilibrium model (no factor of safety)
)

var reasonNames = [...]string{"own-friction", "own-cohesion", "own-pore-pressure", "opens-first", "water", "saturated",
	"seismic", "bolted", "one-plane", "far-field", "past-grid", "in-cases", "in-realisations", "no-block"}

// Has reports whether every bit of g is set in r.
func (r Reason) Has(g Reason) bool { return r&g == g }

// Tokens returns the names of the bits of r, in bit order.
func (r Reason) Tokens() []string {
	out := []string{}
	for i, n := range reasonNames {
		if r&(1<<i) != 0 {
			out = append(out, n)
		}
	}
	return out
}

// String returns the tokens joined by ",".
func (r Reason) String() string { return strings.Join(r.Tokens(), ",") }

// Own are a plane's own strength and pore pressure from its table, NaN
// where it takes the site's.
type Own struct {
	Name                             string // the plane
	Friction, Cohesion, PorePressure float64
}

// reasons returns the Own… bits of o.
func (o Own) reasons() Reason {
	var r Reason
	if !math.IsNaN(o.Friction) {
		r |= OwnFriction
	}
	if !math.IsNaN(o.Cohesion) {
		r |= OwnCohesion
	}
	if !math.IsNaN(o.PorePressure) {
		r |= OwnPorePressure
	}
	return r
}

// Finding is one thing to look at, with the numbers a summary says of it.
// Fields that do not apply to its Kind are zero, or NaN for numbers.
type Finding struct {
	Kind    Kind
	Name    string // the plane, set mean ("S1 mean"), reading, block ("J-cut-1+J-cut-3") or plane along the tunnel; "" for the tunnel wall
	Measure Measure
	Value   float64 // of Measure; NaN for Kinematic
	// Plain and PlainValue are the finding's measure and value before the
	// Monte Carlo raised its standing: equal to Measure and Value unless
	// Measure is Probability.
	Plain      Measure
	PlainValue float64
	Use        float64 // the utilisation u (package rule)
	Standing   Standing
	Reasons    Reason
	// Decisive are the Own… bits of Reasons without which the finding
	// would stand better: with the site's value instead, its standing
	// falls (planes, set means and readings).
	Decisive Reason
	// Own are the own inputs of its planes (only planes that give one).
	Own []Own

	// Planes, set means and readings: the plane, its result, its result
	// with the site's strength and water model instead of its own (equal
	// to Result when it has none), and those site values: μ and c
	// (Coulomb; NaN for Barton–Bandis) and the water model's Pp at its
	// depth.
	Orientation planes.Orientation
	Depth       float64
	Result      planes.Result
	Site        planes.Result
	SiteOwn     Own
	// Readings: the set ("S2", "unassigned"), its readings, and how many
	// of them are critical or opening.
	Set       string
	Count, Of int

	// Slope cases: the index into the screening's Cases, the water case of
	// Value, the largest FS over the water cases and its case, the target
	// FS, and for planar cases the crack depth and the water in the crack
	// at which FS falls to 1 (NaN when none does).
	Case               int
	Water, BestWater   slope.Water
	Best, Target       float64
	CrackDepth, ToFail float64
	Mode               slope.Mode

	// Tunnel: the station of Value (chainage, index), the angle of the
	// deepest zone from the crown, the extent of that zone, the zone limit,
	// the stretches where it fails (zone deeper than the limit; σmax/UCS at
	// or past the onset of spalling) and where the plane is critical or
	// opening in the far field.
	Chainage     float64
	Station      int
	Angle        float64
	Extent       tunnel.Extent
	Limit        float64
	Stretches    []tunnel.Stretch
	FarStretches []tunnel.Stretch

	// Cases and Monte Carlo: P and its standard error (NaN without a Monte
	// Carlo: slope cases P(FS < 1) in water case PWater, tunnel the largest
	// along the alignment, at PChainage), and in how many of Cases runs
	// (the base included; 0 without cases:) it is critical or opening.
	P, SE     float64
	PWater    slope.Water
	PChainage float64
	Unstable  int
	Cases     int

	target int // index into study.Targets (planes, readings, set means) or the tunnel's targets; −1 for none
}

// blank returns a finding of kind k with every number NaN.
func blank(k Kind) Finding {
	nan := math.NaN()
	return Finding{Kind: k, Value: nan, PlainValue: nan, Depth: nan, Best: nan, Target: nan, CrackDepth: nan, ToFail: nan,
		Chainage: nan, Station: -1, Case: -1, target: -1, Angle: nan, Limit: nan, P: nan, SE: nan, PChainage: nan}
}
