package tunnel

import "cleft/planes"

// Arc is a run of wall points, from From to To degrees round the perimeter
// (from the crown, clockwise looking along the drive), both ends included.
// An arc through the crown has To < From (350 to 10); the whole perimeter is
// 0 to 360 − PerimeterStep.
type Arc struct{ From, To int }

// Arcs returns the runs of wall points in state s, the points being every
// PerimeterStep degrees from the crown. A run that wraps round the crown is
// one arc.
func Arcs(states []planes.PlaneState, s planes.PlaneState) []Arc {
	n := len(states)
	all := true
	for _, x := range states {
		if x != s {
			all = false
		}
	}
	if all {
		return []Arc{{0, (n - 1) * PerimeterStep}}
	}
	// Start after a point not in s, so no run is cut at the array's end.
	start := 0
	for states[start] == s {
		start++
	}
	var out []Arc
	for i := 1; i <= n; i++ {
		k := (start + i) % n
		if states[k] != s {
			continue
		}
		j := i
		for j+1 <= n && states[(start+j+1)%n] == s {
			j++
		}
		out = append(out, Arc{k * PerimeterStep, ((start + j) % n) * PerimeterStep})
		i = j
	}
	return out
}
