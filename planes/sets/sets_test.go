package sets

import (
	"cleft/insitu/geom"
	"cleft/planes"
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// tol is the tolerance of exact identities between floating-point results.
const tol = 1e-12

func poles(lines ...geom.Line) []r3.Vec {
	out := make([]r3.Vec, len(lines))
	for i, l := range lines {
		out[i] = l.Vec()
	}
	return out
}

func TestFisherHandComputed(t *testing.T) {
	// Fisher (1953): R = |Σx|, K = (N−1)/(N−R),
	// cos α95 = 1 − ((N−R)/R)[(1/0.05)^(1/(N−1)) − 1]. Derived for poles
	// 010/60, 020/65, 015/55, 005/62, 025/58, 012/70: N = 6, R = 5.969447,
	// K = 163.65, α95 = 5.253°, mean pole 014.7/61.8.
	const (
		rTol       = 5e-7   // R given to six decimals
		kTol       = 0.005  // K given to two decimals
		alphaTol   = 0.0005 // degrees: α95 given to three decimals
		oneDecimal = 0.05   // degrees: the mean pole given to one decimal
		angleTol   = 1e-9   // degrees
		weightTol  = 1e-9
	)
	ps := poles(geom.Line{Trend: 10, Plunge: 60}, geom.Line{Trend: 20, Plunge: 65}, geom.Line{Trend: 15, Plunge: 55},
		geom.Line{Trend: 5, Plunge: 62}, geom.Line{Trend: 25, Plunge: 58}, geom.Line{Trend: 12, Plunge: 70})
	f := Fisher(ps, nil)
	if f.N != 6 || !scalar.EqualWithinAbs(f.R, 5.969447, rTol) || !scalar.EqualWithinAbs(f.K, 163.65, kTol) || !scalar.EqualWithinAbs(f.Alpha, 5.253, alphaTol) {
		t.Errorf("N %v R %v K %v α95 %v; want 6, 5.969447, 163.65, 5.253", f.N, f.R, f.K, f.Alpha)
	}
	if m := f.MeanPole(); !scalar.EqualWithinAbs(m.Trend, 14.7, oneDecimal) || !scalar.EqualWithinAbs(m.Plunge, 61.8, oneDecimal) {
		t.Errorf("mean pole %v, want 014.7/61.8", m)
	}
	if !scalar.EqualWithinAbs(f.SphVar, 1-f.R/6, tol) {
		t.Errorf("spherical variance %v", f.SphVar)
	}
	// Axes: flipping any pole to the upper hemisphere changes nothing.
	flipped := append([]r3.Vec(nil), ps...)
	flipped[2], flipped[4] = r3.Scale(-1, flipped[2]), r3.Scale(-1, flipped[4])
	if g := Fisher(flipped, nil); !scalar.EqualWithinAbs(g.R, f.R, tol) || geom.AxialAngle(g.Mean, f.Mean) > angleTol {
		t.Errorf("flipped poles changed the statistics: %+v vs %+v", g, f)
	}
	// Equal weights are no weights.
	w := []float64{3, 3, 3, 3, 3, 3}
	if g := Fisher(ps, w); !scalar.EqualWithinAbs(g.K, f.K, weightTol) || !scalar.EqualWithinAbs(g.Alpha, f.Alpha, weightTol) {
		t.Errorf("equal weights changed K or α95: %v %v", g.K, g.Alpha)
	}
}

// fisherSample draws n axes from a Fisher distribution of concentration
// kappa about mean, by the simulation method of Fisher, Lewis & Embleton
// (1987), §3.6.2 (memory): cos θ = 1 + ln(U + (1 − U)e^(−2κ))/κ, φ uniform.
func fisherSample(rng *rand.Rand, mean r3.Vec, kappa float64, n int) []r3.Vec {
	mean = r3.Unit(mean)
	ref := r3.Vec{Z: 1}
	if math.Abs(mean.Z) > 0.9 {
		ref = r3.Vec{X: 1}
	}
	u := r3.Unit(r3.Cross(mean, ref))
	v := r3.Cross(mean, u)
	out := make([]r3.Vec, n)
	for i := range out {
		U := rng.Float64()
		c := 1 + math.Log(U+(1-U)*math.Exp(-2*kappa))/kappa
		s := math.Sqrt(math.Max(0, 1-c*c))
		phi := 2 * math.Pi * rng.Float64()
		out[i] = r3.Add(r3.Scale(c, mean), r3.Add(r3.Scale(s*math.Cos(phi), u), r3.Scale(s*math.Sin(phi), v)))
		if rng.IntN(2) == 0 { // axes: either end
			out[i] = r3.Scale(-1, out[i])
		}
	}
	return out
}

func TestFisherCoverage(t *testing.T) {
	// Fisher (1953); Fisher, Lewis & Embleton (1987): the true mean lies
	// within α95 of the estimate in 95 % of samples, and K estimates κ.
	// 400 seeded trials: the binomial spread of the coverage is ±1.1 %.
	rng := rand.New(rand.NewPCG(41, 42))
	const trials, n, kappa = 400, 30, 40.0
	mean := geom.Line{Trend: 135, Plunge: 50}.Vec()
	in, sumK := 0, 0.0
	for range trials {
		f := Fisher(fisherSample(rng, mean, kappa, n), nil)
		if geom.AxialAngle(f.Mean, mean) <= f.Alpha {
			in++
		}
		sumK += f.K
	}
	if cov := float64(in) / trials; cov < 0.915 || cov > 0.98 {
		t.Errorf("α95 covers the mean in %.1f%% of trials, want about 95%%", 100*cov)
	}
	const kRelTol = 0.12 // relative: the mean of a seeded run of small-sample K
	if k := sumK / trials; math.Abs(k/kappa-1) > kRelTol {
		t.Errorf("mean K %v for κ = %v", k, kappa)
	}
}

func TestSetStraddlingThePrimitive(t *testing.T) {
	// Steep joints dipping 85–90° with dip directions 180° apart are one set.
	rng := rand.New(rand.NewPCG(43, 44))
	var ps []r3.Vec
	for i := range 40 {
		dd := 90.0 + rng.Float64()*6 - 3
		if i%2 == 0 {
			dd += 180
		}
		ps = append(ps, planes.MustNew(85+rng.Float64()*5, dd).Normal())
	}
	c := Cluster(ps, ClusterOptions{K: 1})
	f := Fisher(ps, nil)
	for _, a := range c.Assign {
		if a != 0 {
			t.Fatalf("a reading left the single set")
		}
	}
	plane := f.MeanPlane()
	if plane.Dip() < 87 || math.Abs(math.Remainder(plane.DipDirection()-90, 180)) > 3 {
		t.Errorf("mean plane %v, want about 89/090 or 89/270", plane)
	}
	if f.Alpha > 3 || f.K < 100 {
		t.Errorf("K %v, α95 %v: the set was not treated as axes", f.K, f.Alpha)
	}
}

func TestOrientationTensorPatterns(t *testing.T) {
	// Woodcock (1977): a cluster has S1 ≫ S2 ≈ S3 and K > 1; a girdle
	// S1 ≈ S2 ≫ S3 and K < 1; a uniform spread S1 ≈ S2 ≈ S3 ≈ 1/3.
	rng := rand.New(rand.NewPCG(45, 46))
	cl := OrientationTensor(fisherSample(rng, r3.Vec{X: 1, Z: 1}, 200, 300), nil)
	if cl.Values[0] < 0.98 || cl.WoodcockK() <= 1 || cl.WoodcockC() < 4 {
		t.Errorf("cluster: S %v, K %v, C %v", cl.Values, cl.WoodcockK(), cl.WoodcockC())
	}
	var girdle []r3.Vec
	for i := range 180 { // poles round the great circle of the plane 30/100
		s, c := math.Sincos(math.Pi * float64(i) / 180)
		o := planes.MustNew(30, 100)
		girdle = append(girdle, r3.Add(r3.Scale(c, o.StrikeVec()), r3.Scale(s, o.DownDip())))
	}
	g := OrientationTensor(girdle, nil)
	const (
		girdleTol  = 1e-9
		angleTol   = 1e-6 // degrees
		scatterTol = 0.03 // a seeded scatter of 3000 axes, not an exact one
	)
	if !scalar.EqualWithinAbs(g.Values[0], 0.5, girdleTol) || !scalar.EqualWithinAbs(g.Values[1], 0.5, girdleTol) || g.Values[2] > tol {
		t.Errorf("girdle: S %v, want 0.5, 0.5, 0", g.Values)
	}
	if k := g.WoodcockK(); !(k < 1) {
		t.Errorf("girdle K = %v, want < 1", k)
	}
	if a := geom.AxialAngle(g.Axes[2], planes.MustNew(30, 100).Normal()); a > angleTol {
		t.Errorf("girdle S3 axis %v° from the girdle's pole", a)
	}
	var uni []r3.Vec
	for range 3000 {
		uni = append(uni, r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
	}
	u := OrientationTensor(uni, nil)
	for _, s := range u.Values {
		if math.Abs(s-1.0/3) > scatterTol {
			t.Errorf("uniform: S %v, want about 1/3 each", u.Values)
		}
	}
	if s := u.Values[0] + u.Values[1] + u.Values[2]; !scalar.EqualWithinAbs(s, 1, tol) {
		t.Errorf("eigenvalues sum to %v", s)
	}
}

func TestTerzaghiWeight(t *testing.T) {
	// Terzaghi (1965): w = 1/|cos δ|, δ between the sampling line and the
	// pole. Derived by hand for a vertical borehole, where δ is the dip:
	// w = 1 at dip 0, √2 at 45° and 2 at 60° (cos 60° = ½); the cap beyond
	// 84.26° (cos δ = 1/10).
	line := r3.Vec{Z: 1} // a vertical borehole
	for _, c := range []struct{ dip, want float64 }{
		{0, 1}, {45, math.Sqrt2}, {60, 2}, {85, DefaultMaxWeight}, {89, DefaultMaxWeight}, {90, DefaultMaxWeight},
	} {
		if got := TerzaghiWeight(planes.MustNew(c.dip, 40).Normal(), line, DefaultMaxWeight); !scalar.EqualWithinAbsOrRel(got, c.want, tol, tol) {
			t.Errorf("dip %v: w = %v, want %v", c.dip, got, c.want)
		}
	}
	// The cap applies from sin θ = 1/max: θ = 5.74° for max = 10.
	if w := TerzaghiWeight(planes.MustNew(84.3, 0).Normal(), line, 10); w != 10 {
		t.Errorf("plane 5.7° from the line: w = %v, want the cap 10", w)
	}
	// By counting, the meaning of the weight (Terzaghi 1965; Priest 1993,
	// memory):
	// a set of parallel planes one metre apart along their pole, sampled by
	// a line L long, is crossed about L·|cos δ| times, so the weighted count
	// of its crossings is L, the count a line along the pole would make, to
	// within one crossing's weight. The crossings are counted by walking
	// the line in 1 cm steps, not from the formula; seeded random planes and
	// lines. Below the cap a weight is never short by more than that; at
	// the cap the line's count stays short of L.
	const (
		length = 200.0 // m
		step   = 0.01  // m, less than the 1 m least spacing along a line
	)
	rng := rand.New(rand.NewPCG(61, 62))
	unit := func() r3.Vec {
		return r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
	}
	for i := range 300 {
		pole, ln := unit(), unit()
		crossings, slab := 0, math.Floor(0.5)
		for k := 1; k <= int(length/step); k++ {
			if sl := math.Floor(r3.Dot(pole, r3.Scale(float64(k)*step, ln)) + 0.5); sl != slab {
				crossings, slab = crossings+1, sl
			}
		}
		w := TerzaghiWeight(pole, ln, DefaultMaxWeight)
		switch {
		case w < DefaultMaxWeight && math.Abs(w*float64(crossings)-length) > w:
			t.Errorf("case %d: %d crossings of weight %v make %v, want %v within one weight", i, crossings, w, w*float64(crossings), length)
		case w == DefaultMaxWeight && w*float64(crossings) > length+w:
			t.Errorf("case %d: capped weight %v over %d crossings makes %v, more than %v", i, w, crossings, w*float64(crossings), length)
		}
	}
}

func threeSets(rng *rand.Rand) ([]r3.Vec, []int, []r3.Vec) {
	means := []r3.Vec{planes.MustNew(75, 140).Normal(), planes.MustNew(20, 250).Normal(), planes.MustNew(85, 10).Normal()}
	var ps []r3.Vec
	var truth []int
	for k, m := range means {
		s := fisherSample(rng, m, 60, 80-20*k)
		ps = append(ps, s...)
		for range s {
			truth = append(truth, k)
		}
	}
	return ps, truth, means
}

func TestClusterThreeSets(t *testing.T) {
	rng := rand.New(rand.NewPCG(47, 48))
	ps, truth, means := threeSets(rng)
	c := Cluster(ps, ClusterOptions{K: 3})
	// Sets come largest first, as the samples were drawn (80, 60, 40).
	for k, m := range means {
		if a := geom.AxialAngle(c.Axes[k], m); a > 3 {
			t.Errorf("set %d axis %.1f° from the true mean", k+1, a)
		}
	}
	wrong := 0
	for i, a := range c.Assign {
		if a != truth[i] {
			wrong++
		}
	}
	if wrong > len(ps)/50 {
		t.Errorf("%d of %d readings in the wrong set", wrong, len(ps))
	}
	// Seeds give the same sets.
	s := Cluster(ps, ClusterOptions{Seeds: []r3.Vec{planes.MustNew(70, 135).Normal(), planes.MustNew(25, 245).Normal(), planes.MustNew(80, 15).Normal()}})
	const seedTol = 0.5 // degrees
	for k := range means {
		if geom.AxialAngle(s.Axes[k], c.Axes[k]) > seedTol {
			t.Errorf("seeded set %d differs from the k-means set", k+1)
		}
	}
	k, scores := ChooseK(ps, ClusterOptions{}, 6)
	if k != 3 {
		t.Errorf("ChooseK = %d (silhouettes %v), want 3", k, scores)
	}
}

func TestClusterCutOff(t *testing.T) {
	rng := rand.New(rand.NewPCG(49, 50))
	ps, _, _ := threeSets(rng)
	n := len(ps)
	// Scattered readings, uniform on the sphere but kept only when more
	// than 40° from all three sets' axes.
	for len(ps) < n+15 {
		v := r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
		far := true
		for _, m := range []r3.Vec{planes.MustNew(75, 140).Normal(), planes.MustNew(20, 250).Normal(), planes.MustNew(85, 10).Normal()} {
			if geom.AxialAngle(v, m) < 40 {
				far = false
			}
		}
		if far {
			ps = append(ps, v)
		}
	}
	c := Cluster(ps, ClusterOptions{K: 3, MaxAngle: 25})
	for i := n; i < len(ps); i++ {
		if c.Assign[i] != -1 {
			t.Errorf("outlier %d assigned to set %d (%.0f° from its axis)", i, c.Assign[i]+1, geom.AxialAngle(ps[i], c.Axes[c.Assign[i]]))
		}
	}
	for i, a := range c.Assign {
		if a >= 0 && geom.AxialAngle(ps[i], c.Axes[a]) > 25 {
			t.Errorf("reading %d is %.1f° from its set axis, beyond the cut-off", i, geom.AxialAngle(ps[i], c.Axes[a]))
		}
	}
}

func TestKamb(t *testing.T) {
	// Kamb (1959): E = N·A = 3σ with σ² = N·A(1 − A), so A = 9/(N + 9).
	k := NewKamb(91)
	if !scalar.EqualWithinAbs(k.Area, 0.09, tol) || !scalar.EqualWithinAbs(k.Expected, 3*k.Sigma, tol) {
		t.Errorf("A %v, E %v, σ %v", k.Area, k.Expected, k.Sigma)
	}
	if !scalar.EqualWithinAbs(k.Theta, math.Acos(0.91)*180/math.Pi, tol) {
		t.Errorf("θ = %v", k.Theta)
	}
	// A uniform scatter reads about 3σ everywhere.
	rng := rand.New(rand.NewPCG(51, 52))
	var uni []r3.Vec
	for range 2000 {
		uni = append(uni, r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}))
	}
	kk := NewKamb(2000)
	sum := 0.0
	for range 200 { // at random directions, not at the readings themselves
		at := r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()}
		sum += kk.Density(at, uni, nil)
	}
	const scatterTol = 0.3 // σ: the mean over 200 directions of a seeded scatter
	if m := sum / 200; math.Abs(m-3) > scatterTol {
		t.Errorf("mean density of a uniform scatter %vσ, want about 3σ", m)
	}
}

func TestAnalyseSets(t *testing.T) {
	rng := rand.New(rand.NewPCG(53, 54))
	ps, _, means := threeSets(rng)
	a := Analyse(ps, nil, Options{})
	if !a.Auto || len(a.Sets) != 3 || len(a.Scores) != 7 {
		t.Fatalf("auto: %d sets, scores %v", len(a.Sets), a.Scores)
	}
	total := a.Unassigned
	for k, s := range a.Sets {
		total += len(s.Members)
		if d := geom.AxialAngle(s.Raw.Mean, means[k]); d > 3 || d > 3*s.Raw.Alpha {
			t.Errorf("set %d mean %.1f° from the truth (α95 %.1f°)", k+1, d, s.Raw.Alpha)
		}
		if s.Weighted.K != s.Raw.K || s.WeightedCount != float64(len(s.Members)) {
			t.Errorf("set %d: unweighted data gave different weighted statistics", k+1)
		}
	}
	if total != len(ps) {
		t.Errorf("%d readings accounted for, want %d", total, len(ps))
	}
	for i, s := range a.Assign {
		if s >= 0 && math.Abs(a.AngleToMean[i]-geom.AxialAngle(ps[i], a.Sets[s].Raw.Mean)) > tol {
			t.Fatalf("angle to mean of reading %d", i)
		}
	}
}
