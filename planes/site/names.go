package site

import (
	"fmt"
	"hash/maphash"
)

// MaxNameCheck is how many plane names a stream checks for repeats; the
// names of later planes are not checked, so that memory stays bounded.
const MaxNameCheck = 100000

// nameCheck finds plane names given twice. It keeps a 64-bit hash of each
// name with the line of its plane (a repeat it reports is a repeat but for
// a hash collision, about one chance in 10⁹ among MaxNameCheck names).
type nameCheck struct {
	seed    maphash.Seed
	lines   map[uint64]nameAt
	repeats int
	first   *Error // the first repeat
	skipped bool   // planes beyond MaxNameCheck went unchecked
}

type nameAt struct {
	file string
	line int
}

// add notes the name of plane p, read from file.
func (c *nameCheck) add(p *Plane, file string) {
	if c.lines == nil {
		c.seed, c.lines = maphash.MakeSeed(), map[uint64]nameAt{}
	}
	h := maphash.String(c.seed, p.Name)
	prev, seen := c.lines[h]
	switch {
	case seen:
		c.repeats++
		if c.first == nil {
			where := fmt.Sprintf("line %d", prev.line)
			if prev.file != file {
				where = fmt.Sprintf("%s:%d", prev.file, prev.line)
			}
			c.first = &Error{File: file, Line: p.Line, Key: "name", Err: ErrDuplicate,
				Msg: fmt.Sprintf("%s is also the name of the plane at %s", Quote(p.Name), where)}
		}
	case len(c.lines) < MaxNameCheck:
		c.lines[h] = nameAt{file, p.Line}
	default:
		c.skipped = true
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
