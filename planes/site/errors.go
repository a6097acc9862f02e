// Package site reads cleft's inputs: the site file (YAML) and the planes
// table (CSV). It turns them into the stress model, water model, strength
// criterion and planes of packages insitu and planes, the slope and tunnel
// to screen (planes/slope, planes/tunnel) and the way readings are grouped
// (planes/sets), and reports every mistake as one *Error naming the file,
// the line and the key or column.
package site

import (
	"errors"
	"fmt"
	"strings"
)

// The kinds of input mistakes, wrapped by *Error: compare with errors.Is.
var (
	ErrSyntax     = errors.New("not valid YAML or CSV")
	ErrUnknownKey = errors.New("unknown key or column")
	ErrMissing    = errors.New("missing key, column or value")
	ErrType       = errors.New("wrong kind of value")
	ErrNotNumber  = errors.New("not a number")
	ErrRange      = errors.New("value out of range")
	ErrDuplicate  = errors.New("given twice")
	ErrConflict   = errors.New("keys that exclude each other")
	ErrEmpty      = errors.New("empty")
	ErrNoPlanes   = errors.New("no planes")
	ErrRead       = errors.New("cannot read")
	ErrInvalid    = errors.New("invalid input")
)

// Error is a mistake in an input file. Lines and columns are 1-indexed;
// Line 0 means the file as a whole and Column 0 that the column is not
// known. Err is one of the kinds above (ErrInvalid when no other fits); Msg
// is what the user reads.
type Error struct {
	File   string
	Line   int
	Column int
	Key    string // YAML key path (stress.shmax.ratio) or CSV column, may be empty
	Err    error
	Msg    string
}

// Error returns the one-line message: FILE:LINE: KEY: MESSAGE.
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

// Unwrap returns the kind of mistake.
func (e *Error) Unwrap() error {
	if e.Err == nil {
		return ErrInvalid
	}
	return e.Err
}

// is sets the kind of e and returns it.
func (e *Error) is(kind error) *Error {
	e.Err = kind
	return e
}
