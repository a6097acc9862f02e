package plots

import (
	"bytes"
	"strings"
	"testing"

	"cleft/insitu"
	"cleft/planes"

	"gonum.org/v1/plot/vg"
)

func TestChanceNetSVG(t *testing.T) {
	// Every pole is drawn once (outlined once in #111111, as on the tendency
	// stereonet, plus the three legend markers), each named pole's label
	// appears, and the field's nodes are the orientations of ChanceNodes.
	const n = 21
	nodes := ChanceNodes(EqualArea, n)
	if len(nodes) != n*n {
		t.Fatalf("%d nodes, want %d", len(nodes), n*n)
	}
	f := &Field{N: n}
	for j := range n {
		for i := range n {
			if got, want := nodes[j*n+i], f.orientation(EqualArea, i, j); got != want {
				t.Fatalf("node (%d, %d) is %v, want %v", i, j, got, want)
			}
		}
	}
	vals := make([]float64, n*n)
	for k := range vals {
		vals[k] = float64(k%n) / float64(n-1) // P rising from west to east
	}
	poles := []ChancePole{
		{Name: "A", Orientation: planes.MustNew(60, 10), State: planes.Stable, P: 0.1, Label: true},
		{Name: "B", Orientation: planes.MustNew(80, 200), State: planes.Critical, P: 0.7, Label: true},
		{Name: "C", Orientation: planes.MustNew(20, 300), State: planes.Opening, P: 1},
	}
	net := &ChanceNet{Site: "t", Depth: 100, State: insitu.NewState(insitu.Andersonian(30, 20, 25, 40), 100, 1, 1), Proj: EqualArea,
		Field: NewProbabilityField(n, vals), Poles: poles}
	var b bytes.Buffer
	if err := Write(net, 19*vg.Centimeter, 13.5*vg.Centimeter, "svg", &b); err != nil {
		t.Fatal(err)
	}
	s := b.String()
	if got := strings.Count(s, "stroke:#111111"); got != len(poles)+3 {
		t.Errorf("%d pole outlines, want %d poles + 3 in the legend", got, len(poles))
	}
	for _, l := range []string{"A 0.10", "B 0.70"} {
		if !strings.Contains(s, l) {
			t.Errorf("label %q missing", l)
		}
	}
	if strings.Contains(s, "C 1.00") {
		t.Errorf("an unlabelled pole is named")
	}
}
