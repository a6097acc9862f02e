package sets

import (
	"math"
	"strconv"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Config is how field readings are grouped into sets.
type Config struct {
	Count     int                  // number of sets; 0 with no Seeds: chosen automatically
	Seeds     []planes.Orientation // starting set means; fix the number of sets
	MaxAngle  float64              // cut-off cone about each set axis, degrees; 0 for none
	Line      *geom.Line           // sampling line for Terzaghi weights, or nil
	MaxWeight float64              // cap of the Terzaghi weight, ≥ 1
	// Progress, when not nil, follows the grouping (Options.Progress); it
	// is no part of the site file.
	Progress func(done, total int)
}

// DefaultConfig is automatic choice, no cut-off, no sampling line.
var DefaultConfig = Config{MaxWeight: DefaultMaxWeight}

// Grouping is readings grouped into sets, with the weights used.
type Grouping struct {
	Config   Config
	Poles    []r3.Vec  // of the readings, in input order
	Weights  []float64 // used for each reading; nil when no reading is weighted
	Own      bool      // some reading has a weight of its own
	Analysis Analysis
}

// Weights returns each reading's weight: its own (own[i]; NaN or a nil own
// for none, counted 1) times Terzaghi's weight for the sampling line, capped
// at max (TerzaghiWeight). It returns nil when there is no line and no
// reading has its own weight: the readings are then unweighted.
func Weights(poles []r3.Vec, own []float64, line *geom.Line, max float64) []float64 {
	weighted := line != nil
	for _, w := range own {
		if !math.IsNaN(w) {
			weighted = true
		}
	}
	if !weighted {
		return nil
	}
	out := make([]float64, len(poles))
	for i := range poles {
		w := 1.0
		if own != nil && !math.IsNaN(own[i]) {
			w = own[i]
		}
		if line != nil {
			w *= TerzaghiWeight(poles[i], line.Vec(), max)
		}
		out[i] = w
	}
	return out
}

// Group weights the readings (Weights) and groups them into sets (Analyse).
// own may be nil.
func Group(readings []planes.Orientation, own []float64, c Config) *Grouping {
	poles := make([]r3.Vec, len(readings))
	for i, r := range readings {
		poles[i] = r.Normal()
	}
	return GroupPoles(poles, own, c)
}

// GroupPoles is Group for readings given by their unit poles, which the
// Grouping keeps (as Poles): for many readings it saves building their
// orientations. own may be nil.
func GroupPoles(poles []r3.Vec, own []float64, c Config) *Grouping {
	g := &Grouping{Config: c, Poles: poles}
	g.Weights = Weights(g.Poles, own, c.Line, c.MaxWeight)
	for _, w := range own {
		g.Own = g.Own || !math.IsNaN(w)
	}
	o := Options{K: c.Count, MaxAngle: c.MaxAngle, Progress: c.Progress}
	for _, s := range c.Seeds {
		o.Seeds = append(o.Seeds, s.Normal())
	}
	g.Analysis = Analyse(g.Poles, g.Weights, o)
	return g
}

// Weight returns the weight used for reading i (1 when unweighted).
func (g *Grouping) Weight(i int) float64 {
	if g.Weights == nil {
		return 1
	}
	return g.Weights[i]
}

// Name returns the name of set k (0-based): S1, S2, … in the order of
// Analysis.Sets.
func Name(k int) string { return "S" + strconv.Itoa(k+1) }

// Assigned returns the name of reading i's set, or "unassigned".
func (g *Grouping) Assigned(i int) string {
	if s := g.Analysis.Assign[i]; s >= 0 {
		return Name(s)
	}
	return "unassigned"
}
