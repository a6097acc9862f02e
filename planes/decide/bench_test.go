package decide_test

import (
	"testing"

	"cleft/planes/chance/study"
	"cleft/planes/decide"
)

// BenchmarkFindingsDemo ranks the demo's findings: 6 planes, 3 set means,
// 133 readings in 4 groups, 5 feasible slope cases, the tunnel wall and
// 4 planes and sets along 57 stations, with the cases and 500
// realisations attached. The screenings are made once, outside the loop.
func BenchmarkFindingsDemo(b *testing.B) {
	in := demoScreenings(b)
	ts, _ := study.Targets(in.A)
	in.Runs, _ = study.Cases(in.A.Site, ts)
	in.Outcome, _ = study.Run(in.A, ts, study.Options{Slope: in.Slope, Tunnel: in.Tunnel, Realisations: 500})
	b.ReportAllocs()
	for b.Loop() {
		decide.Findings(in)
	}
}
