package site

import (
	"crypto/sha256"
	"encoding/csv"
	"encoding/hex"
	"errors"
	"fmt"
	"hash"
	"io"
	"os"
	"path/filepath"
	"strings"
)

// PlaneReader streams planes from a CSV table. The header row is required;
// columns may come in any order; the known columns are name, dip,
// dip_direction or strike (right-hand rule), depth, friction, cohesion and
// pore_pressure, and any other column is carried through untouched, unless
// its name is within an edit or two of a known one (then it is taken for a
// misspelling and is an error that names the known column). Lines
// starting with # are comments; a leading byte-order mark is skipped. Text
// must be UTF-8 without control characters (carried columns may hold tabs
// and line breaks). A row may be at most MaxRow bytes and the header
// MaxColumns columns. Lines are 1-indexed.
type PlaneReader struct {
	file       string
	g          *guard
	r          *csv.Reader
	idx        [nCols]int // column index, −1 when absent
	extra      []int      // indexes of the extra columns
	ExtraNames []string
	width      int // number of header columns
	defaults   planeDefaults
	present    [nCols]bool
	row        Row // Next's row, reused
}

// NewPlaneReader reads the header of the table in r; file names it in errors.
func NewPlaneReader(r io.Reader, file string, d planeDefaults) (*PlaneReader, error) {
	g := newGuard(r, file)
	cr := g.csvReader()
	pr := &PlaneReader{file: file, g: g, r: cr, defaults: d}
	head, err := cr.Read()
	if errors.Is(err, io.EOF) {
		return nil, &Error{File: file, Err: ErrEmpty, Msg: "empty: want a header row naming the columns (name, dip, dip_direction, depth, …)"}
	}
	if err != nil {
		return nil, g.csvError(err)
	}
	line, _ := cr.FieldPos(0)
	if sep := separatorHint(head); sep != "" {
		return nil, &Error{File: file, Line: line, Err: ErrSyntax, Msg: fmt.Sprintf("the header is one column holding %ss: this looks like a %s-separated file; cleft reads comma-separated tables (save it as CSV with commas)", sep, sep)}
	}
	if len(head) > MaxColumns {
		return nil, &Error{File: file, Line: line, Err: ErrLimit, Msg: fmt.Sprintf("the header has %d columns: at most %d", len(head), MaxColumns)}
	}
	pr.width = len(head)
	for i := range pr.idx {
		pr.idx[i] = -1
	}
	known := make([]string, 0, nCols)
	for c, name := range colNames {
		if c != colWeight || d.readings { // a planes table carries a weight column through
			known = append(known, name)
		}
	}
	seen := map[string]bool{}
	for i, h := range head {
		if j := badText(h, false); j >= 0 {
			return nil, &Error{File: file, Line: line, Column: i + 1, Err: ErrEncoding, Msg: fmt.Sprintf("column %d of the header: %s", i+1, textProblem(h, j))}
		}
		h = strings.ToLower(strings.TrimSpace(strings.TrimPrefix(h, "\ufeff")))
		if h == "" {
			return nil, &Error{File: file, Line: line, Err: ErrMissing, Msg: fmt.Sprintf("column %d has an empty name in the header", i+1)}
		}
		if seen[h] {
			return nil, &Error{File: file, Line: line, Key: h, Err: ErrDuplicate, Msg: "this column appears twice in the header"}
		}
		seen[h] = true
		if k := nearColumn(h, known); k != "" {
			return nil, &Error{File: file, Line: line, Column: i + 1, Key: fmt.Sprintf("%s (column %d)", h, i+1), Err: ErrUnknownKey,
				Msg: fmt.Sprintf("unknown column; did you mean %q? A name this close to a known column is taken for a misspelling: correct it, or rename the column to carry it through", k)}
		}
		isKnown := false
		for c, name := range colNames {
			if c == colWeight && !d.readings {
				continue
			}
			if h == name {
				pr.idx[c] = i
				isKnown = true
			}
		}
		if !isKnown {
			pr.extra = append(pr.extra, i)
			pr.ExtraNames = append(pr.ExtraNames, h)
		}
	}
	for c := range pr.idx {
		pr.present[c] = pr.idx[c] >= 0
	}
	need := func(c int, why string) error {
		return &Error{File: file, Line: line, Err: ErrMissing, Msg: fmt.Sprintf("the header has no %q column%s; it has: %s", colNames[c], why, listColumns(head))}
	}
	switch {
	case !pr.present[colName] && !d.readings:
		return nil, need(colName, "")
	case !pr.present[colDip]:
		return nil, need(colDip, "")
	case pr.present[colStrike] && pr.present[colDipDirection]:
		return nil, &Error{File: file, Line: line, Err: ErrConflict, Msg: "the header has both strike and dip_direction: give one of the two"}
	case !pr.present[colStrike] && !pr.present[colDipDirection]:
		return nil, need(colDipDirection, " (or strike, right-hand rule)")
	case !pr.present[colDepth] && !d.hasDepth && !d.readings:
		return nil, need(colDepth, " and the site file gives no depth")
	}
	return pr, nil
}

// Next reads the next plane into p. It returns io.EOF after the last row.
// p.Extras is reused between calls when it has the capacity.
func (pr *PlaneReader) Next(p *Plane) error {
	if err := pr.readRow(&pr.row); err != nil {
		return err
	}
	return pr.parseRow(&pr.row, p)
}

// PlaneStream yields a site's planes: the inline planes, then those of
// planes_file; or, when a planes table was named on the command line, only
// those. Every plane carries one extra value per ExtraNames entry.
type PlaneStream struct {
	ExtraNames []string
	tableName  string
	hash       *hasher // of the table's bytes as read
	inline     []Plane
	next       int
	table      *PlaneReader
	closer     io.Closer
	inlineSet  int // index of "set" among ExtraNames for inline planes, or −1
	pad        int // empty extras appended to table rows
	siteFile   string
	names      nameCheck
	row        Row // Next's row, reused
}

// OpenPlanes opens the planes of s. table, when not empty, names a CSV file
// (or "-" for stdin) that replaces the site's planes.
func (s *Site) OpenPlanes(table string, stdin io.Reader) (*PlaneStream, error) {
	ps := &PlaneStream{inlineSet: -1, siteFile: s.File}
	var r io.Reader
	name := table
	switch {
	case table == "-":
		r, name = stdin, "standard input"
	case table != "":
		f, err := os.Open(table)
		if err != nil {
			return nil, &Error{File: table, Err: ErrRead, Msg: fmt.Sprintf("cannot open the planes table: %v", unwrapPath(err))}
		}
		r, ps.closer = f, f
	default:
		ps.inline = s.Planes
		if s.PlanesFile != "" {
			f, err := s.open(s.PlanesFile)
			if err != nil {
				return nil, &Error{File: s.File, Err: ErrRead, Msg: fmt.Sprintf("planes_file %s: cannot open it: %v", s.PlanesFile, unwrapPath(err))}
			}
			r, ps.closer, name = f, f, s.PlanesFile
		}
		if r == nil && len(s.Planes) == 0 && !s.readingsOnly {
			msg := "no planes: give planes: or planes_file: in the site file, or --planes FILE.csv"
			if s.ReadingsFile != "" {
				msg = "no planes: the site has only readings_file:, which cleft assess groups into sets and resolves; give planes: or planes_file:, or --planes FILE.csv"
			}
			return nil, &Error{File: s.File, Err: ErrNoPlanes, Msg: msg}
		}
	}
	if r != nil {
		ps.tableName, ps.hash = name, newHash()
		r = io.TeeReader(r, ps.hash)
		t, err := NewPlaneReader(r, name, s.planeDefaults())
		if err != nil {
			ps.Close()
			return nil, err
		}
		ps.table = t
		ps.ExtraNames = append(ps.ExtraNames, t.ExtraNames...)
	}
	if len(ps.inline) > 0 && s.inlineSet {
		for i, n := range ps.ExtraNames {
			if n == "set" {
				ps.inlineSet = i
			}
		}
		if ps.inlineSet < 0 {
			ps.inlineSet = len(ps.ExtraNames)
			ps.ExtraNames = append(ps.ExtraNames, "set")
			ps.pad = 1
		}
	}
	return ps, nil
}

// Table returns the planes table's name and the SHA-256 (hex) of the bytes
// read from it so far: of the whole table once Next has returned io.EOF.
// The name is "" when the planes are all inline.
func (ps *PlaneStream) Table() (name, sum string) {
	if ps.hash == nil {
		return "", ""
	}
	return ps.tableName, ps.hash.sum()
}

// Next reads the next plane into p; io.EOF after the last. It is NextRow
// followed by Parse.
func (ps *PlaneStream) Next(p *Plane) error {
	if err := ps.NextRow(&ps.row); err != nil {
		return err
	}
	return ps.Parse(&ps.row, p)
}

func (s *Site) open(name string) (io.ReadCloser, error) {
	if s.fsys != nil {
		return s.fsys.Open(filepath.ToSlash(name))
	}
	return os.Open(name)
}

// Close closes the table file, if any.
func (ps *PlaneStream) Close() error {
	if ps.closer != nil {
		return ps.closer.Close()
	}
	return nil
}

// hasher is a SHA-256 of what was written to it.
type hasher struct{ h hash.Hash }

func newHash() *hasher                        { return &hasher{sha256.New()} }
func (h *hasher) Write(p []byte) (int, error) { return h.h.Write(p) }
func (h *hasher) sum() string                 { return hex.EncodeToString(h.h.Sum(nil)) }
