package decide

import (
	"cleft/planes/assess"
	"cleft/planes/chance/study"
	"cleft/planes/slope"
	"cleft/planes/tunnel"
)

// Screenings are the results the findings are drawn from. A is required;
// Slope and Tunnel are nil when the site has none; Runs are the bracketing
// cases (study.Cases, base first; nil or the base alone without cases:)
// and Outcome the Monte Carlo (nil without uncertainty:), both over
// study.Targets(A).
type Screenings struct {
	A       *assess.Assessment
	Slope   *slope.Screening
	Tunnel  *tunnel.Screening
	Runs    []study.CaseRun
	Outcome *study.Outcome
}

// Findings returns every finding of s, ranked (Rank): each mapped plane,
// set mean and set of readings, each feasible slope case, the tunnel wall
// and each plane or set along the tunnel with a slip zone.
func Findings(s Screenings) []Finding {
	fs := planeFindings(s.A)
	if s.Slope != nil {
		fs = append(fs, slopeFindings(s.A, s.Slope)...)
	}
	if s.Tunnel != nil {
		fs = append(fs, tunnelFindings(s.A, s.Tunnel)...)
	}
	withChance(fs, &s)
	Rank(fs)
	return fs
}
