package site

import (
	"fmt"
	"strings"
)

// nearColumn returns the known column that header name h (lower case) is
// a likely misspelling of: within one edit of a known name of up to five
// letters, or two of a longer one (editDistance, so "depht" is near
// "depth"). It returns "" when h is a known name or near none.
func nearColumn(h string, known []string) string {
	for _, k := range known {
		if h == k {
			return ""
		}
	}
	for _, k := range known {
		limit := 1
		if len(k) > 5 {
			limit = 2
		}
		if editDistance(h, k) <= limit {
			return k
		}
	}
	return ""
}

// separatorHint says which separator a header of one column seems to use
// instead of commas, or "".
func separatorHint(head []string) string {
	if len(head) != 1 {
		return ""
	}
	switch {
	case strings.Contains(head[0], ";"):
		return "semicolon"
	case strings.Contains(head[0], "\t"):
		return "tab"
	}
	return ""
}

// listColumns lists header names for a message: at most eight, each cut
// short, with the count when there are more.
func listColumns(head []string) string {
	var parts []string
	for i, h := range head {
		if i == 8 {
			parts = append(parts, fmt.Sprintf("… (%d columns)", len(head)))
			break
		}
		if r := []rune(h); len(r) > 24 {
			h = string(r[:24]) + "…"
		}
		parts = append(parts, h)
	}
	return strings.Join(parts, ", ")
}
