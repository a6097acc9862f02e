package site

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
)

// guard sits between a table's bytes and encoding/csv. It drops a leading
// UTF-8 byte-order mark (so that a quoted first header name is read), keeps
// the line where the current row and any open quoted value started, and
// stops with an *Error (ErrLimit) when one row grows past MaxRow bytes, so
// that memory stays bounded on any input: a file without line breaks
// (/dev/zero), or a quote that is never closed. It follows the CSV rules
// of the reader it feeds: a quote toggles a quoted value ("" inside one
// toggles twice), a line break outside quotes ends the row, and a line that
// starts with # outside quotes is a comment.
type guard struct {
	r    *bufio.Reader
	file string
	bom  bool // the BOM check is done

	line      int // line of the next byte, 1-indexed
	rowLine   int // line where the current row started
	rowBytes  int
	quoted    bool // inside a quoted value
	quoteLine int  // line where it opened
	lineStart bool // the next byte starts a line
	comment   bool // inside a comment line
	eof       bool // the input has ended
	err       error
}

func newGuard(r io.Reader, file string) *guard {
	return &guard{r: bufio.NewReaderSize(r, 64<<10), file: file, line: 1, rowLine: 1, lineStart: true}
}

// csvReader returns the CSV reader of cleft's tables on g: comments with #,
// leading spaces trimmed, rows of any width (checked by the caller, to say
// how many values were found), records reused.
func (g *guard) csvReader() *csv.Reader {
	cr := csv.NewReader(g)
	cr.ReuseRecord = true
	cr.TrimLeadingSpace = true
	cr.Comment = '#'
	cr.FieldsPerRecord = -1
	return cr
}

func (g *guard) Read(p []byte) (int, error) {
	if g.err != nil {
		return 0, g.err
	}
	if !g.bom {
		g.bom = true
		if b, err := g.r.Peek(3); err == nil && string(b) == "\ufeff" {
			g.r.Discard(3)
		}
	}
	n, err := g.r.Read(p)
	quote := -1 // index in p of the next quote at or after i, once looked for
	for i := 0; i < n; {
		if g.lineStart && !g.quoted {
			g.comment = p[i] == '#'
			if g.rowBytes == 0 {
				g.rowLine = g.line
			}
		}
		g.lineStart = false
		// The next byte that matters: a line break, or (outside comments)
		// a quote.
		j := bytes.IndexByte(p[i:n], '\n')
		if j >= 0 {
			j += i
		} else {
			j = n
		}
		if !g.comment {
			if quote < i {
				if quote = bytes.IndexByte(p[i:n], '"'); quote >= 0 {
					quote += i
				} else {
					quote = n
				}
			}
			j = min(j, quote)
		}
		if j == n { // nothing more in this read
			g.rowBytes += n - i
			if g.rowBytes > MaxRow {
				g.err = g.tooLong()
				return max(0, n-(g.rowBytes-MaxRow)), g.err
			}
			break
		}
		g.rowBytes += j + 1 - i
		if g.rowBytes > MaxRow {
			g.err = g.tooLong()
			return max(0, j+1-(g.rowBytes-MaxRow)), g.err
		}
		i = j + 1
		if p[j] == '\n' {
			g.line++
			g.lineStart = true
			if !g.quoted {
				g.rowBytes, g.comment = 0, false
			}
			continue
		}
		g.quoted = !g.quoted
		if g.quoted {
			g.quoteLine = g.line
		}
	}
	if err == io.EOF {
		g.eof = true
	}
	return n, err
}

// tooLong is the error of a row past MaxRow.
func (g *guard) tooLong() *Error {
	if g.quoted {
		return &Error{File: g.file, Line: g.quoteLine, Err: ErrLimit, Msg: fmt.Sprintf("a quoted value opened on this line runs on past %d KiB: is its closing quote missing?", MaxRow>>10)}
	}
	return &Error{File: g.file, Line: g.rowLine, Err: ErrLimit, Msg: fmt.Sprintf("this row is longer than %d KiB: is this a CSV table?", MaxRow>>10)}
}

// csvError turns an error of the CSV reader on g into an *Error: an
// unclosed quote is reported at the line where it opened.
func (g *guard) csvError(err error) error {
	var e *Error
	if errors.As(err, &e) {
		return e
	}
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		switch {
		case errors.Is(pe.Err, csv.ErrQuote) && g.eof && g.quoted:
			return &Error{File: g.file, Line: g.quoteLine, Err: ErrSyntax, Msg: "not valid CSV: a quoted value opened on this line is not closed"}
		case errors.Is(pe.Err, csv.ErrBareQuote):
			return &Error{File: g.file, Line: pe.Line, Err: ErrSyntax, Msg: `not valid CSV: a quote inside a value that does not start with one; quote the whole value and double the quote inside ("")`}
		}
		return &Error{File: g.file, Line: pe.Line, Err: ErrSyntax, Msg: "not valid CSV: " + pe.Err.Error()}
	}
	return &Error{File: g.file, Err: ErrRead, Msg: "cannot read: " + err.Error()}
}
