package slope

import (
	"math"
	"strconv"
)

// WaterKind says how a water case is given.
type WaterKind int

const (
	// WaterHead: Depth m of water at the block's deepest wet point: standing
	// in the tension crack above its foot, or without a crack the head at
	// the middle of a wedge's line of intersection; capped at saturation.
	WaterHead WaterKind = iota
	// WaterTable: the water table Depth m below the crest; the head at the
	// block's deepest wet point is the level's height above it, from 0 to
	// saturation.
	WaterTable
	// WaterFull: the block saturated (a full crack; without a crack, half
	// the height of a wedge's line of intersection at its middle).
	WaterFull
)

// Water is one water case of a slope.
type Water struct {
	Kind  WaterKind
	Depth float64 // m ≥ 0; unused for WaterFull
}

// Head returns the case's head of water in m, in [0, saturated], for a
// block whose deepest wet point is peak m above the toe under a crest crest
// m above it.
func (w Water) Head(peak, crest, saturated float64) float64 {
	h := saturated
	switch w.Kind {
	case WaterHead:
		h = w.Depth
	case WaterTable:
		h = crest - w.Depth - peak
	}
	return math.Min(math.Max(h, 0), saturated)
}

// String returns the case's label in column names: "5m" (a head), "table_18m"
// (the table 18 m below the crest) or "full".
func (w Water) String() string {
	d := strconv.FormatFloat(w.Depth, 'g', -1, 64) + "m"
	switch w.Kind {
	case WaterTable:
		return "table_" + d
	case WaterFull:
		return "full"
	}
	return d
}
