package main

// baselineDate is when the recorded figures were measured.
const baselineDate = "2026-12-01"

// recorded are the median wall times in seconds of each job on main before
// the speed-ups of issue 17 (commit 7fdb035, built by hand and given as
// -base), measured with this command on the 2-core development machine
// while other work shared it: five paired runs each, sets-1m one run. They
// are also in DEVELOPERS.md. Jobs not listed have no recorded baseline.
var recorded = map[string]float64{
	"assess":     3.347,
	"sets-10k":   4.528,
	"sets-100k":  41.715,
	"sets-1m":    562.258,
	"resolve-1m": 1.018,
}

// recordedCPU are the median CPU times (user and system) in seconds of the
// same runs (sets-1m: a separate run at low priority, whose wall time says
// nothing).
var recordedCPU = map[string]float64{
	"assess":     3.41,
	"sets-10k":   6.00,
	"sets-100k":  57.54,
	"sets-1m":    465.30,
	"resolve-1m": 1.80,
}
