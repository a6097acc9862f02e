// Package site reads cleft's inputs: the site file (YAML) and the planes
// table (CSV). It turns them into the stress model, water model, strength
// criterion and planes of packages insitu and planes, and reports every
// mistake as one line naming the file, the line and the key or column.
package site

import (
	"fmt"
	"strings"
)

// Error is a mistake in an input file. Lines are 1-indexed; Line 0 means the
// file as a whole.
type Error struct {
	File string
	Line int
	Key  string // YAML key path (stress.shmax.ratio) or CSV column, may be empty
	Msg  string
}

func (e *Error) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d", e.Line)
	}
	b.WriteString(": ")
	if e.Key != "" {
		b.WriteString(e.Key)
		b.WriteString(": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}
