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
	"strconv"
	"strings"
	"unicode/utf8"
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
	ErrLimit      = errors.New("more than cleft accepts")
	ErrEncoding   = errors.New("not UTF-8 text, or control characters")
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

// Error returns the one-line message: FILE:LINE: KEY: MESSAGE, made one
// line of at most MaxMessage characters by OneLine.
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
	return OneLine(b.String())
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

// MaxMessage is the most characters of an error message; MaxQuote the most
// characters of an input value quoted in one.
const (
	MaxMessage = 300
	MaxQuote   = 80
)

// Quote returns s in double quotes as Go writes strings (control characters
// and invalid UTF-8 escaped), cut to its first MaxQuote characters and "…"
// when longer, so that a message quoting a value stays one short line.
func Quote(s string) string {
	if utf8.RuneCountInString(s) <= MaxQuote {
		return strconv.Quote(s)
	}
	n := 0
	for i := range s {
		if n == MaxQuote {
			return strconv.Quote(s[:i]) + "…"
		}
		n++
	}
	return strconv.Quote(s)
}

// OneLine returns s as one line of at most MaxMessage characters: control
// characters become escapes (a newline is written \n), invalid UTF-8
// becomes U+FFFD, and a longer text is cut, ending in "…".
func OneLine(s string) string {
	var b strings.Builder
	for i := 0; i < len(s); i++ {
		if c := s[i]; c < 0x20 || c >= 0x7f {
			for _, r := range s {
				if isControl(r) {
					q := strconv.QuoteRune(r)
					b.WriteString(q[1 : len(q)-1])
				} else {
					b.WriteRune(r) // U+FFFD for an invalid byte
				}
			}
			s = b.String()
			break
		}
	}
	if utf8.RuneCountInString(s) <= MaxMessage {
		return s
	}
	n := 0
	for i := range s {
		if n == MaxMessage-1 {
			return s[:i] + "…"
		}
		n++
	}
	return s
}

// isControl reports whether r is a C0 or C1 control character or DEL.
func isControl(r rune) bool { return r < 0x20 || (r >= 0x7f && r < 0xa0) }
