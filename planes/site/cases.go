package site

import (
	"fmt"
	"math"
	"strings"

	"cleft/insitu/geom"

	"go.yaml.in/yaml/v3"
)

// Case is a named bracketing case of cases:: the base site with some of its
// numbers changed.
type Case struct {
	Name      string
	Line      int // of the case's name in the site file
	Overrides []Override
}

// Override is one number of a case.
type Override struct {
	Path  Path
	Value float64 // within the key's range; an azimuth in [0, 360)
}

// BaseCase is the name of the site as given, the first case of every
// table.
const BaseCase = "base"

// Apply sets the case's model overrides on v (Reset first) and finishes
// it; the plane overrides are applied by ApplyPlanes.
func (c *Case) Apply(v *Variant) error {
	v.Reset()
	for _, o := range c.Overrides {
		if !o.Path.Key.IsPlane() {
			v.Set(o.Path.Key, o.Value)
		}
	}
	return v.Finish()
}

// ApplyPlanes sets the case's plane overrides on p when they name it.
func (c *Case) ApplyPlanes(p *Plane) {
	for _, o := range c.Overrides {
		if o.Path.Key.IsPlane() && o.Path.Plane == p.Name {
			SetPlane(p, o.Path.Key, o.Value)
		}
	}
}

func (s *Site) readChance(f *fields) error {
	if cv, ok := f.get("cases"); ok {
		if err := s.readCases(cv); err != nil {
			return err
		}
	}
	if uv, ok := f.get("uncertainty"); ok {
		if err := s.readUncertainty(uv); err != nil {
			return err
		}
	}
	if s.PlanesFile == "" && s.ReadingsFile == "" {
		return s.BindPlanes(s.Planes)
	}
	return nil
}

func (s *Site) readCases(v node) error {
	if v.n == nil || v.n.Kind != yaml.MappingNode {
		return v.errf("want a mapping of case names to {dotted.path: number, …}, got %s", kindName(v.n)).is(ErrType)
	}
	if len(v.n.Content) == 0 {
		return v.errf("no cases: give at least one, or leave cases: out").is(ErrEmpty)
	}
	seen := map[string]int{}
	for i := 0; i+1 < len(v.n.Content); i += 2 {
		k, val := v.n.Content[i], v.n.Content[i+1]
		cn := v.child(k, val)
		name := strings.TrimSpace(k.Value)
		switch {
		case name == "":
			return cn.errf("a case needs a name").is(ErrEmpty)
		case name == BaseCase:
			return cn.errf("%q is the site as given, the first row of every case; name this case otherwise", BaseCase).is(ErrConflict)
		case seen[name] > 0:
			return cn.errf("case %q is given twice (first at line %d)", name, seen[name]).is(ErrDuplicate)
		}
		seen[name] = k.Line
		c := Case{Name: name, Line: k.Line}
		if cn.n == nil || cn.n.Kind != yaml.MappingNode || len(cn.n.Content) == 0 {
			return cn.errf("want a mapping {dotted.path: number, …} of the numbers this case changes, got %s", kindName(cn.n)).is(ErrType)
		}
		done := map[string]bool{}
		for j := 0; j+1 < len(cn.n.Content); j += 2 {
			pk, pv := cn.n.Content[j], cn.n.Content[j+1]
			at := cn.child(pk, pv)
			if done[pk.Value] {
				return at.errf("this path is given twice in case %q", name).is(ErrDuplicate)
			}
			done[pk.Value] = true
			p, err := s.parsePath(at, pk.Value, s.root)
			if err != nil {
				return err
			}
			x, err := at.number()
			if err != nil {
				return err
			}
			if p.Key.Circular() {
				x = geom.Azimuth(x)
			} else if !p.valid.contains(x) {
				return at.errf("%s is outside the allowed range %s", pv.Value, p.valid).is(ErrRange)
			}
			c.Overrides = append(c.Overrides, Override{Path: p, Value: x})
		}
		vr := s.Variant()
		if err := c.Apply(vr); err != nil {
			return cn.errf("case %q: %v", name, err).is(ErrRange)
		}
		if err := vr.Check(); err != nil {
			return cn.errf("case %q: %v", name, err).is(ErrRange)
		}
		s.Cases = append(s.Cases, c)
	}
	return nil
}

// BindPlanes checks the plane keys of the cases and of uncertainty: against
// the planes the site assesses (its planes, readings and set means, by
// name): each must name one of them, and a plane's own cohesion cannot be
// set alone under the Barton–Bandis criterion. The error names the file,
// the line and the path. Parse calls it when the site's planes are all
// inline; a caller that reads planes_file or readings_file calls it with
// every plane.
func (s *Site) BindPlanes(ps []Plane) error {
	names := make(map[string]*Plane, len(ps))
	for i := range ps {
		if _, ok := names[ps[i].Name]; !ok {
			names[ps[i].Name] = &ps[i]
		}
	}
	check := func(p Path, friction bool) error {
		if !p.Key.IsPlane() {
			return nil
		}
		q, ok := names[p.Plane]
		if !ok {
			return p.Errorf(ErrMissing, "no plane or set mean is named %q", p.Plane)
		}
		if p.Key == PlaneCohesion && !friction && s.base != nil && !s.base.isCoul && math.IsNaN(q.Friction) {
			return p.Errorf(ErrConflict, "a cohesion alone cannot override the Barton–Bandis criterion of plane %q: give or vary its friction too", p.Plane)
		}
		return nil
	}
	hasFriction := func(paths []Path, plane string) bool {
		for _, p := range paths {
			if p.Key == PlaneFriction && p.Plane == plane {
				return true
			}
		}
		return false
	}
	for _, c := range s.Cases {
		var paths []Path
		for _, o := range c.Overrides {
			paths = append(paths, o.Path)
		}
		for _, p := range paths {
			if err := check(p, hasFriction(paths, p.Plane)); err != nil {
				return err
			}
		}
	}
	if u := s.Uncertainty; u != nil {
		var paths []Path
		for _, in := range u.Vary {
			paths = append(paths, in.Path)
		}
		for _, p := range paths {
			if err := check(p, hasFriction(paths, p.Plane)); err != nil {
				return err
			}
		}
	}
	return nil
}

// String returns the case as "name: path = value, …".
func (c Case) String() string {
	var parts []string
	for _, o := range c.Overrides {
		parts = append(parts, fmt.Sprintf("%s = %s", o.Path.Text, fmtNum(o.Value)))
	}
	return c.Name + ": " + strings.Join(parts, ", ")
}
