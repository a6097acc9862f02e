package sets

import (
	"bufio"
	"fmt"
	"os"
	"testing"

	"cleft/insitu/geom"
	"cleft/planes"
)

func TestCutOffKeepsEverySet(t *testing.T) {
	// Two steep sets about 30° apart as axes (80/073 and 71/260) and a
	// tight set of 15 sub-horizontal joints (15/170), invented
	// (testdata/three-sets.csv): the silhouette takes the steep pair as one
	// set; a cut-off cone of 25° must then trim that set, not leave the
	// tight set outside every cone and so unassigned (the rule is this
	// tool's: the cone trims each set after the grouping, it never changes
	// which sets there are). The cone inside the k-means lost the set.
	f, err := os.Open("testdata/three-sets.csv")
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var rs []planes.Orientation
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		var dip, dd float64
		if _, err := fmt.Sscanf(sc.Text(), "%g,%g", &dip, &dd); err == nil {
			rs = append(rs, planes.MustNew(dip, dd))
		}
	}
	free := Group(rs, nil, Config{MaxWeight: DefaultMaxWeight})
	cut := Group(rs, nil, Config{MaxAngle: 25, MaxWeight: DefaultMaxWeight})
	if len(cut.Analysis.Sets) != len(free.Analysis.Sets) {
		t.Fatalf("%d sets with the cut-off, %d without", len(cut.Analysis.Sets), len(free.Analysis.Sets))
	}
	flat := planes.MustNew(15, 170).Normal()
	in := 0
	for i, r := range rs {
		near := geom.AxialAngle(r.Normal(), flat) < 20
		if s := cut.Analysis.Assign[i]; near && s >= 0 && geom.AxialAngle(cut.Analysis.Sets[s].Raw.Mean, flat) < 10 {
			in++
		}
	}
	if in < 13 {
		t.Errorf("%d sub-horizontal readings are in a set about 15/170 with the cut-off, want the 15 of the file but a stray", in)
	}
	// Every reading the cone keeps lies within it of its set's axis.
	for i, s := range cut.Analysis.Assign {
		if s >= 0 && cut.Analysis.AngleToMean[i] > 25+10 {
			t.Errorf("reading %d is %v° from its set's mean", i, cut.Analysis.AngleToMean[i])
		}
	}
}
