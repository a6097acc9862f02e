package site

import (
	"errors"
	"fmt"
	"io"
	"strings"
)

// Row is one plane as read, before its numbers are parsed: a row of the
// planes table (its values and line) or an inline plane of the site file.
// Reading rows is serial (NextRow); parsing them (Parse) may run on many
// goroutines at once, so that a long table is read at the speed of the
// reading alone.
type Row struct {
	line   int
	rec    []string // the table row's values, in header order
	inline int      // index of the inline plane, or −1 for a table row
}

// Size returns the bytes of the row's values (0 for an inline plane).
func (r *Row) Size() int {
	n := 0
	for _, v := range r.rec {
		n += len(v)
	}
	return n
}

// readRow reads the next table row into r: the CSV record, the width and
// the text checks, which need the reader's positions. io.EOF after the
// last row.
func (pr *PlaneReader) readRow(r *Row) error {
	rec, err := pr.r.Read()
	if err != nil {
		if errors.Is(err, io.EOF) {
			return io.EOF
		}
		return pr.g.csvError(err)
	}
	line, _ := pr.r.FieldPos(0)
	if len(rec) != pr.width {
		return &Error{File: pr.file, Line: line, Err: ErrSyntax, Msg: fmt.Sprintf("this row has %d values and the header %d columns: every row needs one value per column (quote values that contain commas)", len(rec), pr.width)}
	}
	if i := pr.idx[colName]; i >= 0 {
		if j := badText(rec[i], false); j >= 0 {
			return pr.errAt(line, colName, ErrEncoding, "%s", textProblem(rec[i], j))
		}
	}
	for k, i := range pr.extra {
		if j := badText(rec[i], true); j >= 0 {
			l, _ := pr.r.FieldPos(i)
			return &Error{File: pr.file, Line: l, Column: i + 1, Key: fmt.Sprintf("%s (column %d)", pr.ExtraNames[k], i+1), Err: ErrEncoding, Msg: textProblem(rec[i], j)}
		}
	}
	// The record's strings stay valid after the next Read (ReuseRecord
	// reuses only the slice), so a copy of the slice keeps the row.
	r.line, r.inline = line, -1
	r.rec = append(r.rec[:0], rec...)
	return nil
}

// errAt reports a problem with column col of the row at line.
func (pr *PlaneReader) errAt(line, col int, kind error, format string, a ...any) error {
	return &Error{File: pr.file, Line: line, Column: pr.idx[col] + 1, Key: fmt.Sprintf("%s (column %d)", colNames[col], pr.idx[col]+1), Err: kind, Msg: fmt.Sprintf(format, a...)}
}

// name returns the plane name a row will get: its name column, or R and
// its line for a reading without one.
func (pr *PlaneReader) name(r *Row) string {
	if i := pr.idx[colName]; i >= 0 {
		if n := strings.TrimSpace(r.rec[i]); n != "" {
			return n
		}
	}
	return fmt.Sprintf("R%d", r.line)
}

// parseRow parses a row read by readRow into p, reusing p.Extras. It reads
// nothing of pr but the header, so rows may be parsed concurrently.
func (pr *PlaneReader) parseRow(r *Row, p *Plane) error {
	var vals [nCols]string
	for c, i := range pr.idx {
		if i >= 0 {
			vals[c] = r.rec[i]
		}
	}
	errAt := func(col int, kind error, format string, a ...any) error {
		return pr.errAt(r.line, col, kind, format, a...)
	}
	extras := p.Extras[:0]
	for _, i := range pr.extra {
		extras = append(extras, r.rec[i])
	}
	q, err := parsePlane(&vals, &pr.present, pr.defaults, errAt)
	if err != nil {
		return err
	}
	*p = q
	p.Line = r.line
	p.Extras = extras
	if p.Name == "" {
		p.Name = fmt.Sprintf("R%d", r.line)
	}
	return nil
}

// NextRow reads the next plane as a row; io.EOF after the last. It also
// keeps the check of repeated names, in input order.
func (ps *PlaneStream) NextRow(r *Row) error {
	if ps.next < len(ps.inline) {
		r.inline, r.line = ps.next, ps.inline[ps.next].Line
		ps.names.add(&ps.inline[ps.next], false, ps.siteFile)
		ps.next++
		return nil
	}
	if ps.table == nil {
		return io.EOF
	}
	if err := ps.table.readRow(r); err != nil {
		return err
	}
	ps.names.add(&Plane{Name: ps.table.name(r), Line: r.line}, true, ps.tableName)
	return nil
}

// Parse turns a row from NextRow into the plane p, reusing p.Extras. Safe
// for concurrent use on different rows and planes.
func (ps *PlaneStream) Parse(r *Row, p *Plane) error {
	if r.inline >= 0 {
		q := ps.inline[r.inline]
		extras := p.Extras[:0]
		for range ps.ExtraNames {
			extras = append(extras, "")
		}
		if ps.inlineSet >= 0 && len(q.Extras) > 0 {
			extras[ps.inlineSet] = q.Extras[0]
		}
		*p = q
		p.Extras = extras
		return nil
	}
	if err := ps.table.parseRow(r, p); err != nil {
		return err
	}
	for range ps.pad {
		p.Extras = append(p.Extras, "")
	}
	return nil
}
