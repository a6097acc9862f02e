package site

import (
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"

	"cleft/planes/sets"
)

func (s *Site) readSets(v node) error {
	m, err := v.mapping("count", "seeds", "max_angle", "line", "max_weight")
	if err != nil {
		return err
	}
	c := sets.DefaultConfig
	if cv, ok := m.get("count"); ok {
		n, err := cv.numberIn(interval{lo: 1, hi: 12})
		if err != nil {
			return err
		}
		if n != math.Trunc(n) {
			return cv.errf("%v: want a whole number of sets", n).is(ErrRange)
		}
		c.Count = int(n)
	}
	if sv, ok := m.get("seeds"); ok {
		items, err := sv.list()
		if err != nil {
			return err
		}
		if len(items) > 12 {
			return sv.errf("%d seeds: at most 12 sets", len(items)).is(ErrLimit)
		}
		for _, it := range items {
			t, err := it.text()
			if err != nil {
				return err
			}
			o, err := ParseOrientation(t)
			if err != nil {
				return it.errf("%v", err).is(ErrRange)
			}
			c.Seeds = append(c.Seeds, o)
		}
		if c.Count != 0 && c.Count != len(c.Seeds) {
			return sv.errf("%d seeds for count: %d: give one seed per set, or leave count out", len(c.Seeds), c.Count).is(ErrConflict)
		}
	}
	if c.MaxAngle, _, err = m.optNumber("max_angle", interval{lo: 0, hi: 90, openLo: true, unit: "°"}, 0); err != nil {
		return err
	}
	if lv, ok := m.get("line"); ok {
		t, err := lv.text()
		if err != nil {
			return err
		}
		l, err := ParseLine(t)
		if err != nil {
			return lv.errf("%v", err).is(ErrRange)
		}
		c.Line = &l
	}
	if c.MaxWeight, _, err = m.optNumber("max_weight", interval{lo: 1, hi: 1000}, sets.DefaultMaxWeight); err != nil {
		return err
	}
	s.Sets = c
	return nil
}

// ReadReadings reads a whole table of field readings (see PlaneReader: name
// and depth may be left out, a weight column is known). A reading without a
// depth takes depth, when hasDepth, else NaN. It returns the readings, the
// names of the extra columns and the SHA-256 of the table.
func ReadReadings(r io.Reader, name string, depth float64, hasDepth bool) ([]Plane, []string, string, error) {
	h := newHash()
	rd, err := NewPlaneReader(io.TeeReader(r, h), name, planeDefaults{depth: depth, hasDepth: hasDepth, coulomb: true, readings: true})
	if err != nil {
		return nil, nil, "", err
	}
	var out []Plane
	held := 0
	for {
		var p Plane
		if err := rd.Next(&p); err != nil {
			if errors.Is(err, io.EOF) {
				break
			}
			return nil, nil, "", err
		}
		if held += p.TextSize(); held > MaxHeldText {
			return nil, nil, "", &Error{File: name, Line: p.Line, Err: ErrLimit, Msg: fmt.Sprintf("the readings hold more than %d MiB of names and other values: split the table", MaxHeldText>>20)}
		}
		if len(out) == MaxReadings {
			return nil, nil, "", &Error{File: name, Line: p.Line, Err: ErrLimit, Msg: fmt.Sprintf("more than %d readings: cleft groups at most %d into sets; split the table (by borehole or domain)", MaxReadings, MaxReadings)}
		}
		out = append(out, p)
	}
	if len(out) == 0 {
		return nil, nil, "", &Error{File: name, Err: ErrEmpty, Msg: "no readings: the table has a header but no rows"}
	}
	return out, rd.ExtraNames, h.sum(), nil
}

// OpenReadings reads the site's readings_file.
func (s *Site) OpenReadings() ([]Plane, []string, string, error) {
	f, err := s.open(s.ReadingsFile)
	if err != nil {
		return nil, nil, "", &Error{File: s.File, Err: ErrRead, Msg: fmt.Sprintf("readings_file %s: cannot open it: %v", s.ReadingsFile, unwrapPath(err))}
	}
	defer f.Close()
	return ReadReadings(f, s.ReadingsFile, s.Depth, s.HasDepth)
}

// LoadReadings reads a readings table from a path ("-" for stdin).
func LoadReadings(path string, stdin io.Reader) ([]Plane, []string, string, error) {
	if path == "-" {
		return ReadReadings(stdin, "standard input", 0, false)
	}
	f, err := os.Open(path)
	if err != nil {
		return nil, nil, "", &Error{File: path, Err: ErrRead, Msg: fmt.Sprintf("cannot open the readings table: %v", unwrapPath(err))}
	}
	defer f.Close()
	return ReadReadings(f, path, 0, false)
}

func resolvePath(siteFile, p string) string {
	if filepath.IsAbs(p) {
		return p
	}
	return filepath.Join(filepath.Dir(siteFile), p)
}
