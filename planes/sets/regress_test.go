package sets

import (
	"bufio"
	"fmt"
	"hash/fnv"
	"math/rand/v2"
	"os"
	"strconv"
	"strings"
	"testing"

	"cleft/insitu/geom"
	"cleft/planes"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/spatial/r3"
)

// regressCase is one grouping whose statistics were recorded.
type regressCase struct {
	name     string
	readings func(t *testing.T) []planes.Orientation
	config   Config
}

func demoReadings(t *testing.T) []planes.Orientation {
	f, err := os.Open("../site/demo/readings.csv")
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []planes.Orientation
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		l := sc.Text()
		if strings.HasPrefix(l, "#") || strings.HasPrefix(l, "name") {
			continue
		}
		c := strings.Split(l, ",")
		var dip, dd float64
		fmt.Sscan(c[1], &dip)
		fmt.Sscan(c[2], &dd)
		out = append(out, planes.MustNew(dip, dd))
	}
	return out
}

// synthetic draws n readings: three Fisher sets (45 %, 30 %, 15 %) and
// 10 % uniform scatter, seeded.
func synthetic(n int, seed uint64) func(*testing.T) []planes.Orientation {
	return func(*testing.T) []planes.Orientation {
		rng := rand.New(rand.NewPCG(seed, 7))
		means := []r3.Vec{planes.MustNew(75, 140).Normal(), planes.MustNew(20, 250).Normal(), planes.MustNew(88, 10).Normal()}
		kappas := []float64{40, 60, 25}
		out := make([]planes.Orientation, n)
		for i := range out {
			u := rng.Float64()
			var v r3.Vec
			switch {
			case u < 0.45:
				v = fisherSample(rng, means[0], kappas[0], 1)[0]
			case u < 0.75:
				v = fisherSample(rng, means[1], kappas[1], 1)[0]
			case u < 0.90:
				v = fisherSample(rng, means[2], kappas[2], 1)[0]
			default:
				v = r3.Unit(r3.Vec{X: rng.NormFloat64(), Y: rng.NormFloat64(), Z: rng.NormFloat64()})
			}
			out[i] = planes.FromNormal(v)
		}
		return out
	}
}

var bh2 = geom.Line{Trend: 100, Plunge: 70}

var regressCases = []regressCase{
	{"demo site", demoReadings, Config{MaxAngle: 30, Line: &bh2, MaxWeight: DefaultMaxWeight}},
	{"demo auto", demoReadings, DefaultConfig},
	{"demo three", demoReadings, Config{Count: 3, MaxWeight: DefaultMaxWeight}},
	{"synthetic 5000 seeds", synthetic(5000, 61), Config{Seeds: []planes.Orientation{planes.MustNew(70, 135), planes.MustNew(25, 245), planes.MustNew(85, 15)}, MaxWeight: DefaultMaxWeight}},
	{"synthetic 30000 auto", synthetic(30000, 62), DefaultConfig},
	{"synthetic 30000 weighted cut-off", synthetic(30000, 63), Config{MaxAngle: 25, Line: &bh2, MaxWeight: DefaultMaxWeight}},
}

// summary is what the regression records of a grouping.
func summary(g *Grouping) string {
	var b strings.Builder
	an := g.Analysis
	h := fnv.New64a()
	for _, a := range an.Assign {
		fmt.Fprint(h, a, ",")
	}
	angles := 0.0
	for _, a := range an.AngleToMean {
		angles += a
	}
	fmt.Fprintf(&b, "sets %d unassigned %d %.17g assign %x angles %.17g\n", len(an.Sets), an.Unassigned, an.UnassignedWeight, h.Sum64(), angles)
	if an.Auto {
		b.WriteString("scores")
		for _, s := range an.Scores[2:] {
			fmt.Fprintf(&b, " %.17g", s)
		}
		b.WriteString("\n")
	}
	for _, s := range an.Sets {
		fmt.Fprintf(&b, "n %d w %.17g\n", len(s.Members), s.WeightedCount)
		for _, f := range []FisherStats{s.Raw, s.Weighted} {
			fmt.Fprintf(&b, "fisher %.17g %.17g %.17g %.17g %.17g %.17g %.17g %.17g\n", f.N, f.R, f.Mean.X, f.Mean.Y, f.Mean.Z, f.K, f.Alpha, f.SphVar)
		}
		e := s.Tensor
		fmt.Fprintf(&b, "tensor %.17g %.17g %.17g %.17g %.17g %.17g\n", e.Values[0], e.Values[1], e.Values[2], e.Axes[0].X, e.Axes[0].Y, e.Axes[0].Z)
	}
	return b.String()
}

// TestStatisticsUnchanged checks that the groupings of regressCases give the
// statistics that cleft computed before the speed-ups of issue 17
// (testdata/stats-7fdb035.txt, printed by summary at commit 7fdb035:
// regression values, not published ones): counts and assignments exactly,
// every number to regressTol. The silhouette scores are compared only where
// the number of sets is chosen on all the readings (at most ChooseSample).
func TestStatisticsUnchanged(t *testing.T) {
	const regressTol = 1e-9 // relative, or absolute below 1
	data, err := os.ReadFile("testdata/stats-7fdb035.txt")
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]string{}
	for _, block := range strings.Split(string(data), "== ")[1:] {
		name, body, _ := strings.Cut(block, "\n")
		want[name] = body
	}
	for _, c := range regressCases {
		t.Run(c.name, func(t *testing.T) {
			rs := c.readings(t)
			got := strings.Split(summary(Group(rs, nil, c.config)), "\n")
			exp := strings.Split(want[c.name], "\n")
			if len(got) != len(exp) {
				t.Fatalf("%d lines, want %d:\n%s", len(got), len(exp), strings.Join(got, "\n"))
			}
			for l := range got {
				g, e := strings.Fields(got[l]), strings.Fields(exp[l])
				if len(e) > 0 && e[0] == "scores" && len(rs) > ChooseSample {
					continue
				}
				if len(g) != len(e) {
					t.Fatalf("line %d: %q, want %q", l+1, got[l], exp[l])
				}
				for k := range g {
					gv, gerr := strconv.ParseFloat(g[k], 64)
					ev, eerr := strconv.ParseFloat(e[k], 64)
					if gerr != nil || eerr != nil || strings.Contains(e[k-min(k, 1)], "assign") {
						if g[k] != e[k] {
							t.Errorf("line %d field %d: %s, want %s", l+1, k+1, g[k], e[k])
						}
						continue
					}
					if !scalar.EqualWithinAbsOrRel(gv, ev, regressTol, regressTol) {
						t.Errorf("line %d field %d: %.17g, want %.17g", l+1, k+1, gv, ev)
					}
				}
			}
		})
	}
}
