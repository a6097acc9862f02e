package site

import (
	"math"
	"strings"

	"cleft/planes"
)

// Plane is one input plane with its optional per-plane values. Friction,
// Cohesion and PorePressure are NaN when the input leaves them out.
type Plane struct {
	Line         int // line in the file it came from (1-indexed)
	Name         string
	Orientation  planes.Orientation
	Depth        float64 // m
	Friction     float64 // μ, overrides the site's
	Cohesion     float64 // MPa, overrides the site's
	PorePressure float64 // MPa, overrides the water model
	Weight       float64 // readings only: the reading's own weight, > 0
	// Extras are the values of the input's extra columns, in ExtraNames order.
	Extras []string
}

// TextSize is the number of bytes of the plane's name and carried values,
// for a caller that holds many planes to bound (see MaxHeldText).
func (p *Plane) TextSize() int {
	n := len(p.Name)
	for _, e := range p.Extras {
		n += len(e)
	}
	return n
}

// The columns a plane may give, in both the CSV table and inline YAML.
const (
	colName = iota
	colDip
	colDipDirection
	colStrike
	colDepth
	colFriction
	colCohesion
	colPorePressure
	colWeight // readings only
	nCols
)

var colNames = [nCols]string{"name", "dip", "dip_direction", "strike", "depth", "friction", "cohesion", "pore_pressure", "weight"}

// planeDefaults are what a plane falls back on.
type planeDefaults struct {
	depth    float64
	hasDepth bool
	coulomb  bool // the site criterion is Coulomb (cohesion alone may override it)
	// readings: a table of field readings, where name and depth may be left
	// out (a reading is then named R and its line, its depth is NaN) and a
	// weight column is known.
	readings bool
}

func (s *Site) planeDefaults() planeDefaults {
	_, c := s.Criterion.(*planes.Coulomb)
	return planeDefaults{depth: s.Depth, hasDepth: s.HasDepth, coulomb: c}
}

// parsePlane builds a plane from the raw text of its columns; present says
// which columns the input has. errAt reports a problem with one column.
// Messages quote values as given.
func parsePlane(vals *[nCols]string, present *[nCols]bool, d planeDefaults, errAt func(col int, kind error, format string, a ...any) error) (Plane, error) {
	var p Plane
	p.Name = strings.TrimSpace(vals[colName])
	if p.Name == "" && !d.readings {
		return p, errAt(colName, ErrMissing, "empty name: every plane needs one")
	}
	// num reads column col: its value, its text as given, and whether it
	// was given at all (an empty cell is not).
	num := func(col int) (float64, string, bool, error) {
		if !present[col] {
			return math.NaN(), "", false, nil
		}
		t := strings.TrimSpace(vals[col])
		if t == "" {
			return math.NaN(), "", false, nil
		}
		v, ok := ParseNumber(t)
		if !ok {
			if (col == colDip || col == colDipDirection || col == colStrike) && strings.Contains(t, "/") {
				return 0, t, false, errAt(col, ErrNotNumber, "%s looks like DIP/DIP_DIRECTION in one cell: give the dip and the dip direction in columns of their own", Quote(t))
			}
			return 0, t, false, errAt(col, ErrNotNumber, "%s is not a decimal number", Quote(t))
		}
		return v, t, true, nil
	}
	dip, t, ok, err := num(colDip)
	if err != nil {
		return p, err
	}
	if !ok {
		return p, errAt(colDip, ErrMissing, "empty: every plane needs a dip in [0, 90]°")
	}
	if dip < 0 || dip > 90 {
		return p, errAt(colDip, ErrRange, "%s is outside [0, 90]° (dip is measured down from the horizontal)", t)
	}
	if present[colStrike] {
		st, t, ok, err := num(colStrike)
		if err != nil {
			return p, err
		}
		if !ok {
			return p, errAt(colStrike, ErrMissing, "empty: every plane needs a strike in [0, 360]°")
		}
		if p.Orientation, err = planes.FromStrike(st, dip); err != nil {
			return p, errAt(colStrike, ErrRange, "%s is outside [0, 360]°", t)
		}
	} else {
		dd, t, ok, err := num(colDipDirection)
		if err != nil {
			return p, err
		}
		if !ok {
			return p, errAt(colDipDirection, ErrMissing, "empty: every plane needs a dip direction in [0, 360]°")
		}
		if p.Orientation, err = planes.New(dip, dd); err != nil {
			return p, errAt(colDipDirection, ErrRange, "%s is outside [0, 360]°", t)
		}
	}
	z, t, ok, err := num(colDepth)
	if err != nil {
		return p, err
	}
	switch {
	case ok && z < 0:
		return p, errAt(colDepth, ErrRange, "%s is negative: depth is metres below ground, ≥ 0", t)
	case ok && z > MaxDepth:
		return p, errAt(colDepth, ErrRange, "%s m is deeper than the %g m cleft accepts", t, MaxDepth)
	case ok:
		p.Depth = z
	case d.hasDepth:
		p.Depth = d.depth
	case d.readings:
		p.Depth = math.NaN()
	default:
		return p, errAt(colDepth, ErrMissing, "no depth for this plane and no depth: in the site file")
	}
	if p.Weight, t, ok, err = num(colWeight); err != nil {
		return p, err
	} else if ok && !(p.Weight > 0 && p.Weight <= MaxWeight) {
		return p, errAt(colWeight, ErrRange, "%s: a weight must be in (0, %g]", t, MaxWeight)
	}
	if p.Friction, t, ok, err = num(colFriction); err != nil {
		return p, err
	} else if ok && !(p.Friction > 0 && p.Friction <= MaxFriction) {
		return p, errAt(colFriction, ErrRange, "%s: friction μ must be in (0, %g]", t, MaxFriction)
	}
	if p.Cohesion, t, ok, err = num(colCohesion); err != nil {
		return p, err
	} else if ok && !(p.Cohesion >= 0 && p.Cohesion <= MaxStress) {
		return p, errAt(colCohesion, ErrRange, "%s MPa: cohesion must be in [0, %g] MPa", t, MaxStress)
	} else if ok && !d.coulomb && math.IsNaN(p.Friction) {
		return p, errAt(colCohesion, ErrConflict, "a cohesion alone cannot override the Barton–Bandis criterion: give friction too")
	}
	if p.PorePressure, t, ok, err = num(colPorePressure); err != nil {
		return p, err
	} else if ok && !(p.PorePressure >= 0 && p.PorePressure <= MaxStress) {
		return p, errAt(colPorePressure, ErrRange, "%s MPa: pore pressure must be in [0, %g] MPa", t, MaxStress)
	}
	return p, nil
}

// CriterionFor returns the strength criterion of plane p: the site's, or a
// Coulomb criterion built in scratch from the plane's friction and cohesion
// columns (a missing one taken from the site's Coulomb criterion, or 0
// cohesion). It does not allocate; a nil scratch gets a new criterion of
// the plane's own, for a caller that keeps it.
func (s *Site) CriterionFor(p *Plane, scratch *planes.Coulomb) planes.Criterion {
	hasMu, hasC := !math.IsNaN(p.Friction), !math.IsNaN(p.Cohesion)
	if !hasMu && !hasC {
		return s.Criterion
	}
	if scratch == nil {
		scratch = new(planes.Coulomb)
	}
	*scratch = planes.Coulomb{}
	if base, ok := s.Criterion.(*planes.Coulomb); ok {
		*scratch = *base
	}
	if hasMu {
		scratch.Mu = p.Friction
	}
	if hasC {
		scratch.Cohesion = p.Cohesion
	}
	return scratch
}

var inlineKeys = append(colNames[:colWeight:colWeight], "set")

func (s *Site) readInlinePlanes(v node) error {
	items, err := v.list()
	if err != nil {
		return err
	}
	d := s.planeDefaults()
	for _, it := range items {
		m, err := it.mapping(inlineKeys...)
		if err != nil {
			return err
		}
		var vals [nCols]string
		var present [nCols]bool
		for i, k := range colNames {
			kv, ok := m.get(k)
			if !ok {
				continue
			}
			t, err := kv.text()
			if err != nil {
				return err
			}
			vals[i], present[i] = t, true
		}
		for _, req := range []int{colName, colDip} {
			if !present[req] {
				return m.missing(colNames[req], " (each plane has name, dip and dip_direction or strike)")
			}
		}
		if present[colStrike] == present[colDipDirection] {
			return it.errf("give dip_direction or strike (right-hand rule), one of the two").is(ErrConflict)
		}
		p, err := parsePlane(&vals, &present, d, func(col int, kind error, format string, a ...any) error {
			if v, ok := m.get(colNames[col]); ok {
				return v.errf(format, a...).is(kind)
			}
			return it.errf(format, a...).is(kind)
		})
		if err != nil {
			if _, ok := err.(*Error); ok {
				return err
			}
			return it.errf("%v", err)
		}
		p.Line = it.n.Line
		if sv, ok := m.get("set"); ok {
			t, err := sv.text()
			if err != nil {
				return err
			}
			p.Extras = []string{t}
			s.inlineSet = true
		}
		s.Planes = append(s.Planes, p)
	}
	return nil
}
