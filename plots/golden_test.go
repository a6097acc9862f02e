package plots_test

import (
	"testing"

	"gonum.org/v1/plot/cmpimg"
)

// TestExampleGoldens runs each figure's example, which writes
// testdata/NAME.svg, and compares that byte for byte with
// testdata/NAME_golden.svg, as gonum/plot's own tests do. After a wanted
// change of a figure's look, look at the new drawings and run
//
//	go test ./plots -run ExampleGoldens -regen
//
// to make them the goldens.
func TestExampleGoldens(t *testing.T) {
	for _, c := range []struct {
		file    string
		example func()
	}{
		{"stereonet.svg", ExampleStereonet},
		{"mohr.svg", ExampleMohr},
		{"kinematic.svg", ExampleKinematicNet},
		{"tunnel-profile.svg", ExampleTunnelProfile},
	} {
		t.Run(c.file, func(t *testing.T) {
			cmpimg.CheckPlot(c.example, t, c.file)
		})
	}
}
