package sets

import (
	"math"
	"sync"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/spatial/r3"
)

// Options say how Analyse finds the sets.
type Options struct {
	K        int      // number of sets; 0 with no Seeds chooses automatically
	Seeds    []r3.Vec // starting set axes (poles); fixes the number of sets
	MaxAngle float64  // cut-off cone, degrees; 0 for none
	KMax     int      // largest number tried by the automatic choice (default 6)
	// Progress, when not nil, is called after each k-means run with the
	// number of runs done and the number the grouping will make (ten for
	// each number of sets tried and ten for the grouping kept; one with
	// Seeds), one call at a time, from any goroutine.
	Progress func(done, total int)
}

// Set is one joint set with its statistics.
type Set struct {
	Members       []int   // indexes of its readings
	WeightedCount float64 // Σ of the members' weights
	Raw           FisherStats
	Weighted      FisherStats // with the weights (equal to Raw without them)
	RawTensor     Eigen       // orientation tensor of the members, unweighted
	Tensor        Eigen       // of the members, weighted (equal to RawTensor without weights)
}

// Mean returns the set's mean plane (from the raw Fisher mean).
func (s Set) Mean() planes.Orientation { return s.Raw.MeanPlane() }

// Analysis is readings grouped into sets with statistics per set.
type Analysis struct {
	Sets   []Set
	Assign []int // set of each reading, or −1
	// AngleToMean is each reading's angle (degrees, axial) to its set's mean
	// pole, or to the nearest set mean for an unassigned reading.
	AngleToMean      []float64
	Unassigned       int
	UnassignedWeight float64
	// Auto is true when the number of sets was chosen by ChooseK; Scores
	// then holds the mean silhouette width for each number tried, and
	// ChosenOn the number of readings the choice grouped (all of them, or
	// ChooseSample spread evenly through them).
	Auto     bool
	Scores   []float64
	ChosenOn int
}

// Analyse groups the poles into sets (Cluster, with ChooseK when
// neither K nor seeds are given) and computes each set's Fisher statistics,
// raw and weighted, and its orientation tensor, raw and weighted. weights
// may be nil.
func Analyse(poles []r3.Vec, weights []float64, o Options) Analysis {
	var a Analysis
	co := ClusterOptions{K: o.K, Seeds: o.Seeds, MaxAngle: o.MaxAngle, Weights: weights}
	kmax := o.KMax
	if kmax == 0 {
		kmax = 6
	}
	auto := o.K == 0 && len(o.Seeds) == 0
	done := progress(o.Progress, auto, len(o.Seeds) > 0, min(kmax, min(len(poles), ChooseSample)-1))
	co.Progress = done
	if auto {
		// The number of sets is chosen without the cut-off cone: a cone
		// leaves out the readings that do not fit, which flatters a
		// grouping with too few sets.
		choose := co
		choose.MaxAngle = 0
		co.K, a.Scores = ChooseK(poles, choose, kmax)
		a.Auto, a.ChosenOn = true, min(len(poles), ChooseSample)
	}
	co.K = min(max(co.K, 1), len(poles))
	// The cut-off cone trims each set about its axis after the grouping:
	// it never changes which sets there are. (Inside the k-means it could
	// leave a tight set outside every cone and so unassigned, while the
	// count was chosen with it as a set.)
	cut := co.MaxAngle
	co.MaxAngle = 0
	c := Cluster(poles, co)
	if cut > 0 {
		for i, s := range c.Assign {
			if s >= 0 && geom.AxialAngle(poles[i], c.Axes[s]) > cut {
				c.Assign[i] = -1
			}
		}
	}
	if len(o.Seeds) > 0 && done != nil {
		done()
	}
	a.Assign = c.Assign
	w := func(i int) float64 {
		if weights == nil {
			return 1
		}
		return weights[i]
	}
	a.Sets = make([]Set, len(c.Axes))
	for i, s := range c.Assign {
		if s < 0 {
			a.Unassigned++
			a.UnassignedWeight += w(i)
			continue
		}
		a.Sets[s].Members = append(a.Sets[s].Members, i)
		a.Sets[s].WeightedCount += w(i)
	}
	kept := a.Sets[:0]
	remap := make([]int, len(a.Sets))
	for k, s := range a.Sets {
		if len(s.Members) == 0 { // a set the cut-off emptied
			remap[k] = -1
			continue
		}
		remap[k] = len(kept)
		ps := make([]r3.Vec, len(s.Members))
		var ws []float64
		if weights != nil {
			ws = make([]float64, len(s.Members))
		}
		for j, m := range s.Members {
			ps[j] = poles[m]
			if ws != nil {
				ws[j] = weights[m]
			}
		}
		s.Raw = Fisher(ps, nil)
		s.Weighted = Fisher(ps, ws)
		s.RawTensor = OrientationTensor(ps, nil)
		s.Tensor = OrientationTensor(ps, ws)
		kept = append(kept, s)
	}
	a.Sets = kept
	for i, s := range a.Assign {
		if s >= 0 {
			a.Assign[i] = remap[s]
		}
	}
	a.AngleToMean = make([]float64, len(poles))
	for i, p := range poles {
		if s := a.Assign[i]; s >= 0 {
			a.AngleToMean[i] = geom.AxialAngle(p, a.Sets[s].Raw.Mean)
			continue
		}
		a.AngleToMean[i] = math.NaN()
		for _, s := range a.Sets {
			if d := geom.AxialAngle(p, s.Raw.Mean); !(d >= a.AngleToMean[i]) {
				a.AngleToMean[i] = d
			}
		}
	}
	return a
}

// progress counts the k-means runs of Analyse for report (nil for none):
// ten for each number of sets from 2 to kmax when auto, then ten, or one
// with seeds. It returns the function to call after each run.
func progress(report func(done, total int), auto, seeded bool, kmax int) func() {
	if report == nil {
		return nil
	}
	total := 10
	if seeded {
		total = 1
	}
	if auto {
		total += 10 * max(0, kmax-1)
	}
	var mu sync.Mutex
	done := 0
	return func() {
		mu.Lock()
		defer mu.Unlock()
		done++
		report(done, total)
	}
}
