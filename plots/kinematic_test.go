package plots

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

func TestKinematicRanked(t *testing.T) {
	// The lines that can fail, least FS first, those without one last in
	// their order; the ones held back are left out.
	nan := math.NaN()
	k := &KinematicNet{Items: []KinItem{
		{Name: "a", Feasible: true, FS: 1.4},
		{Name: "b", Feasible: false, FS: 0.2},
		{Name: "c", Toppling: true, FS: nan},
		{Name: "d", Feasible: true, Intersection: true, FS: 0.6},
		{Name: "e", Feasible: true, FS: nan},
		{Name: "f", Feasible: true, Intersection: true, FS: 0.9},
	}}
	var got []string
	for _, it := range k.ranked() {
		got = append(got, it.Name)
	}
	if s := strings.Join(got, ""); s != "dface" {
		t.Errorf("ranked %q, want dface", s)
	}
}

func TestKinematicNamesLeastFSFirst(t *testing.T) {
	// A slope with many feasible wedges: the names on the net are those of
	// the least FS, as many as there is room for, and the key counts the
	// others; with the demo's few, every one is named and none counted.
	for _, c := range []struct {
		name string
		k    func(testing.TB) *KinematicNet
		all  bool
	}{{"crowded", crowdedKinematic, false}, {"demo", demoKinematic, true}} {
		for _, sz := range layoutSizes {
			t.Run(fmt.Sprintf("%s/%gx%gcm", c.name, sz[0], sz[1]), func(t *testing.T) {
				k := c.k(t)
				doc, err := readSVG(svgOf(t, k, vg.Length(sz[0])*vg.Centimeter, vg.Length(sz[1])*vg.Centimeter))
				if err != nil {
					t.Fatal(err)
				}
				texts := map[string]bool{}
				var all []string
				for _, x := range doc.texts {
					texts[x.text] = true
					all = append(all, x.text)
				}
				ranked := k.ranked()
				if c.all != (k.named == len(ranked)) || k.named < 1 {
					t.Fatalf("%d of %d named", k.named, len(ranked))
				}
				for i, it := range ranked {
					if texts[it.Name] != (i < k.named) {
						t.Errorf("%s (rank %d, FS %.2f) named %v; %d named", it.Name, i, it.FS, texts[it.Name], k.named)
					}
				}
				note := fmt.Sprintf("%d more that can fail are not named", len(ranked)-k.named)
				if got := strings.Contains(strings.Join(all, " "), note); got == c.all {
					t.Errorf("key note %q shown %v, want %v", note, got, !c.all)
				}
			})
		}
	}
}
