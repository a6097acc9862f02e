package site

import (
	"fmt"
	"hash/maphash"
)

// MaxNameCheck is how many plane names a stream checks for repeats: the
// names of its first MaxNameCheck planes, against each other; later planes
// are not checked, so that memory and time per row stay bounded.
const MaxNameCheck = 100000

// nameCheck finds plane names given twice. It keeps a 64-bit hash of each
// name with the line of its plane (a repeat it reports is a repeat but for
// a hash collision, about one chance in 10⁹ among MaxNameCheck names), and
// no pointers, so that the collector has nothing to scan.
type nameCheck struct {
	seed    maphash.Seed
	lines   map[uint64]uint32 // line, with tableBit for a plane of the table
	repeats int
	first   *Error // the first repeat
	skipped bool   // planes beyond MaxNameCheck went unchecked
	files   [2]string
}

// tableBit marks the line of a plane read from the planes table (not inline).
const tableBit = 1 << 31

// add notes the name of plane p, read from the planes table or inline
// (from the site file); inline planes come first.
func (c *nameCheck) add(p *Plane, table bool, file string) {
	if c.lines == nil {
		c.seed, c.lines = maphash.MakeSeed(), map[uint64]uint32{}
	}
	if c.skipped || len(c.lines) == MaxNameCheck {
		c.skipped = true // later planes are not checked at all: no cost per row
		return
	}
	key := uint32(p.Line) &^ tableBit
	if table {
		key |= tableBit
		c.files[1] = file
	} else {
		c.files[0] = file
	}
	h := maphash.String(c.seed, p.Name)
	prev, seen := c.lines[h]
	switch {
	case seen:
		c.repeats++
		if c.first == nil {
			where := fmt.Sprintf("line %d", prev&^tableBit)
			if prevTable := prev&tableBit != 0; prevTable != table {
				where = fmt.Sprintf("%s:%d", c.files[0], prev&^tableBit)
			}
			c.first = &Error{File: file, Line: p.Line, Key: "name", Err: ErrDuplicate,
				Msg: fmt.Sprintf("%s is also the name of the plane at %s", Quote(p.Name), where)}
		}
	default:
		c.lines[h] = key
	}
}

// Repeats reports the plane names given more than once among the planes
// read so far: the first repeat as an *Error of kind ErrDuplicate (nil when
// there is none), the number of planes whose name was taken, and whether
// planes beyond MaxNameCheck went unchecked. cleft warns of repeats and
// goes on: the tables keep every plane in input order.
func (ps *PlaneStream) Repeats() (first *Error, n int, unchecked bool) {
	return ps.names.first, ps.names.repeats, ps.names.skipped
}
