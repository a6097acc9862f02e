package sets

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"
)

// TestChooseOnSubsample checks the choice of the number of sets on
// ChooseSample readings against the choice on all of them, for 40,000
// seeded synthetic readings (three Fisher sets and 10 % scatter): the same
// number of sets, and silhouette widths within 0.01 (2000 readings of each
// grouping are scored either way, so the widths differ by the sampling).
func TestChooseOnSubsample(t *testing.T) {
	if testing.Short() {
		t.Skip("groups 40,000 readings ten times")
	}
	const widthTol = 0.01
	rs := synthetic(40000, 64)(t)
	poles := make([]r3.Vec, len(rs))
	for i, r := range rs {
		poles[i] = r.Normal()
	}
	for _, o := range []ClusterOptions{{}, {Weights: Weights(poles, nil, &bh2, DefaultMaxWeight)}} {
		kSub, sub := ChooseK(poles, o, 6)
		kAll, all := chooseK(poles, o, 6, len(poles))
		if kSub != kAll || kSub != 3 {
			t.Errorf("weighted %v: %d sets on the subsample, %d on all the readings; want 3", o.Weights != nil, kSub, kAll)
		}
		t.Logf("weighted %v: subsample %.3f, all %.3f", o.Weights != nil, sub[2:], all[2:])
		for k := 2; k < len(all); k++ {
			if math.Abs(sub[k]-all[k]) > widthTol {
				t.Errorf("weighted %v, %d sets: width %.3f on the subsample, %.3f on all", o.Weights != nil, k, sub[k], all[k])
			}
		}
	}
}

// TestProgressCounts checks the progress of Analyse: one call per k-means
// run, counting up to the total announced in every call.
func TestProgressCounts(t *testing.T) {
	rs := synthetic(3000, 65)(t)
	poles := make([]r3.Vec, len(rs))
	for i, r := range rs {
		poles[i] = r.Normal()
	}
	for _, c := range []struct {
		name  string
		o     Options
		total int
	}{
		{"automatic", Options{}, 10*5 + 10},
		{"automatic up to 4", Options{KMax: 4}, 10*3 + 10},
		{"three sets", Options{K: 3}, 10},
		{"seeds", Options{Seeds: []r3.Vec{poles[0], poles[1]}}, 1},
	} {
		t.Run(c.name, func(t *testing.T) {
			var calls []int
			c.o.Progress = func(done, total int) {
				if total != c.total {
					t.Errorf("total %d, want %d", total, c.total)
				}
				calls = append(calls, done)
			}
			Analyse(poles, nil, c.o)
			if len(calls) != c.total {
				t.Fatalf("%d calls, want %d", len(calls), c.total)
			}
			for i, d := range calls {
				if d != i+1 {
					t.Fatalf("call %d reported %d done", i+1, d)
				}
			}
		})
	}
}
