package table

// InputPrefix marks a carried-through input column whose name an output
// column already has: an input column state comes out as input_state.
const InputPrefix = "input_"

// Carried returns the names under which the input's extra columns are
// written after the columns taken (the table's own): a name already taken,
// by an output column or an earlier extra, gets InputPrefix, again until it
// is free, so that no output column is shadowed and no two columns share a
// name (JSON readers and CSV dict readers keep only one of two). The
// result is extras itself when nothing needs renaming.
func Carried(taken, extras []string) []string {
	used := make(map[string]bool, len(taken)+len(extras))
	for _, t := range taken {
		used[t] = true
	}
	var out []string
	for i, e := range extras {
		n := e
		for used[n] {
			n = InputPrefix + n
		}
		if n != e && out == nil {
			out = append(make([]string, 0, len(extras)), extras[:i]...)
		}
		if out != nil {
			out = append(out, n)
		}
		used[n] = true
	}
	if out == nil {
		return extras
	}
	return out
}
