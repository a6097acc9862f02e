package site

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"cleft/insitu"
	"cleft/planes"

	"go.yaml.in/yaml/v3"
)

// Key is a numeric key of the site model that a case or a realisation of
// the Monte Carlo may change: a key of stress:, water:, strength:, slope:
// or tunnel.rock:, or a plane's own column (the Plane keys).
type Key uint8

// The keys. Each law of a horizontal stress has one value key (its ratio,
// effective ratio, gradient or Sheorey modulus, by the site's law).
const (
	NoKey            Key = iota
	VerticalGradient     // stress.vertical.gradient, MPa/m
	VerticalDensity      // stress.vertical.density, kg/m³
	SHmaxValue           // stress.shmax.<law>: ratio, effective_ratio, gradient (MPa/m) or sheorey.modulus (GPa)
	SHmaxOffset          // stress.shmax.offset, MPa
	SHmaxAzimuth         // stress.shmax.azimuth, °
	ShminValue           // stress.shmin.<law>
	ShminOffset          // stress.shmin.offset, MPa
	TensorNN             // stress.tensor.nn … ed, MPa
	TensorEE
	TensorDD
	TensorNE
	TensorND
	TensorED
	Principal1 // stress.principal.1.magnitude … 3, MPa, in file order
	Principal2
	Principal3
	ReferenceDepth     // stress.reference_depth, m
	WaterGradient      // water.gradient, MPa/m
	WaterTable         // water.table, m
	WaterBiot          // water.biot
	Friction           // strength.friction
	Cohesion           // strength.cohesion, MPa
	JRC                // strength.jrc
	JCS                // strength.jcs, MPa
	ResidualAngle      // strength.residual_angle, °
	SlopeHeight        // slope.height, m
	SlopeFrictionAngle // slope.friction_angle, °
	SlopeLateralLimit  // slope.lateral_limit, °
	SlopeToppleLimit   // slope.toppling_limit, °
	SlopeUnitWeight    // slope.unit_weight, MN/m³
	SlopeFaceDip       // slope.face.dip, °
	SlopeFaceDir       // slope.face.dip_direction, °
	SlopeTopDip        // slope.top.dip, °
	SlopeTopDir        // slope.top.dip_direction, °
	SlopeCrack         // slope.tension_crack.distance or .depth, m
	TunnelUCS          // tunnel.rock.ucs, MPa
	TunnelPoisson      // tunnel.rock.poisson
	PlaneFriction      // planes.NAME.friction
	PlaneCohesion      // planes.NAME.cohesion, MPa
	PlanePorePressure  // planes.NAME.pore_pressure, MPa
	PlaneDip           // planes.NAME.dip, °
	PlaneDipDirection  // planes.NAME.dip_direction, °
	PlaneDepth         // planes.NAME.depth, m
	nKeys
)

// IsPlane reports whether k is a plane's own column.
func (k Key) IsPlane() bool { return k >= PlaneFriction && k < nKeys }

// Circular reports whether k is an azimuth: a value drawn for it is taken
// modulo 360° rather than truncated.
func (k Key) Circular() bool {
	return k == SHmaxAzimuth || k == SlopeFaceDir || k == SlopeTopDir || k == PlaneDipDirection
}

// Stress reports whether k changes the far-field stress or the pore
// pressure (and so every plane).
func (k Key) Stress() bool { return k >= VerticalGradient && k <= WaterBiot }

// Strength reports whether k is a key of strength:.
func (k Key) Strength() bool { return k >= Friction && k <= ResidualAngle }

// Slope reports whether k is a key of slope:.
func (k Key) Slope() bool { return k >= SlopeHeight && k <= SlopeCrack }

// Tunnel reports whether k is a key of tunnel.rock:.
func (k Key) Tunnel() bool { return k == TunnelUCS || k == TunnelPoisson }

// Path is a dotted path of the site file to a numeric key, checked against
// the site: Key says which number; Plane names the plane of a plane key.
type Path struct {
	Text  string // as written, e.g. "planes.F1.friction"
	Key   Key
	Plane string // plane keys only

	file      string
	where     string // the key path in the file, e.g. cases.low-k.stress.shmax.ratio
	line, col int
	valid     interval
}

// Valid returns the range of values the key accepts; for a circular key
// any finite number (taken modulo 360°).
func (p Path) Valid() (lo, hi float64, openLo, openHi bool) {
	return p.valid.lo, p.valid.hi, p.valid.openLo, p.valid.openHi
}

// Errorf returns an *Error at the path's line.
func (p Path) Errorf(kind error, format string, a ...any) *Error {
	key := p.where
	if key == "" {
		key = p.Text
	}
	return &Error{File: p.file, Line: p.line, Column: p.col, Key: key, Err: kind, Msg: fmt.Sprintf(format, a...)}
}

// keySpec is what a fixed path means: its key and valid range.
type keySpec struct {
	key Key
	iv  interval
}

var (
	anyNumber = interval{lo: math.Inf(-1), hi: math.Inf(1)}
	degrees90 = interval{lo: 0, hi: 90, unit: "°"}
	azimuth   = interval{lo: 0, hi: 360, unit: "°"}
)

var fixedPaths = map[string]keySpec{
	"stress.vertical.gradient":       {VerticalGradient, unit(positive, "MPa/m")},
	"stress.vertical.density":        {VerticalDensity, unit(interval{lo: 0, hi: 10000, openLo: true}, "kg/m³")},
	"stress.shmax.offset":            {SHmaxOffset, unit(nonNegative, "MPa")},
	"stress.shmax.azimuth":           {SHmaxAzimuth, azimuth},
	"stress.shmin.offset":            {ShminOffset, unit(nonNegative, "MPa")},
	"stress.tensor.nn":               {TensorNN, unit(anyNumber, "MPa")},
	"stress.tensor.ee":               {TensorEE, unit(anyNumber, "MPa")},
	"stress.tensor.dd":               {TensorDD, unit(anyNumber, "MPa")},
	"stress.tensor.ne":               {TensorNE, unit(anyNumber, "MPa")},
	"stress.tensor.nd":               {TensorND, unit(anyNumber, "MPa")},
	"stress.tensor.ed":               {TensorED, unit(anyNumber, "MPa")},
	"stress.principal.1.magnitude":   {Principal1, unit(nonNegative, "MPa")},
	"stress.principal.2.magnitude":   {Principal2, unit(nonNegative, "MPa")},
	"stress.principal.3.magnitude":   {Principal3, unit(nonNegative, "MPa")},
	"stress.reference_depth":         {ReferenceDepth, unit(nonNegative, "m")},
	"water.gradient":                 {WaterGradient, unit(positive, "MPa/m")},
	"water.table":                    {WaterTable, unit(nonNegative, "m")},
	"water.biot":                     {WaterBiot, interval{lo: 0, hi: 1, openLo: true}},
	"strength.friction":              {Friction, positive},
	"strength.cohesion":              {Cohesion, unit(nonNegative, "MPa")},
	"strength.jrc":                   {JRC, interval{lo: 0, hi: 20}},
	"strength.jcs":                   {JCS, unit(positive, "MPa")},
	"strength.residual_angle":        {ResidualAngle, interval{lo: 0, hi: planes.MaxBartonAngle, openLo: true, openHi: true, unit: "°"}},
	"slope.height":                   {SlopeHeight, unit(positive, "m")},
	"slope.friction_angle":           {SlopeFrictionAngle, interval{lo: 0, hi: 90, openLo: true, openHi: true, unit: "°"}},
	"slope.lateral_limit":            {SlopeLateralLimit, interval{lo: 0, hi: 90, openLo: true, unit: "°"}},
	"slope.toppling_limit":           {SlopeToppleLimit, interval{lo: 0, hi: 90, openLo: true, unit: "°"}},
	"slope.unit_weight":              {SlopeUnitWeight, interval{lo: 0, hi: 0.1, openLo: true, unit: "MN/m³"}},
	"slope.face.dip":                 {SlopeFaceDip, interval{lo: 0, hi: 90, openLo: true, unit: "°"}},
	"slope.face.dip_direction":       {SlopeFaceDir, azimuth},
	"slope.top.dip":                  {SlopeTopDip, degrees90},
	"slope.top.dip_direction":        {SlopeTopDir, azimuth},
	"slope.tension_crack.distance":   {SlopeCrack, unit(nonNegative, "m")},
	"slope.tension_crack.depth":      {SlopeCrack, unit(nonNegative, "m")},
	"tunnel.rock.ucs":                {TunnelUCS, unit(positive, "MPa")},
	"tunnel.rock.poisson":            {TunnelPoisson, interval{lo: 0, hi: 0.5, openHi: true}},
	"stress.shmax.ratio":             {SHmaxValue, positive},
	"stress.shmax.effective_ratio":   {SHmaxValue, positive},
	"stress.shmax.gradient":          {SHmaxValue, unit(positive, "MPa/m")},
	"stress.shmax.sheorey.modulus":   {SHmaxValue, unit(positive, "GPa")},
	"stress.shmin.ratio":             {ShminValue, positive},
	"stress.shmin.effective_ratio":   {ShminValue, positive},
	"stress.shmin.gradient":          {ShminValue, unit(positive, "MPa/m")},
	"stress.shmin.sheorey.modulus":   {ShminValue, unit(positive, "GPa")},
	"planes.*.friction":              {PlaneFriction, positive},
	"planes.*.cohesion":              {PlaneCohesion, unit(nonNegative, "MPa")},
	"planes.*.pore_pressure":         {PlanePorePressure, unit(nonNegative, "MPa")},
	"planes.*.dip":                   {PlaneDip, degrees90},
	"planes.*.dip_direction":         {PlaneDipDirection, azimuth},
	"planes.*.depth":                 {PlaneDepth, unit(nonNegative, "m")},
	"stress.principal.1.trend":       {NoKey, azimuth},
	"stress.principal.1.plunge":      {NoKey, degrees90},
	"stress.principal.2.trend":       {NoKey, azimuth},
	"stress.principal.2.plunge":      {NoKey, degrees90},
	"stress.principal.3.trend":       {NoKey, azimuth},
	"stress.principal.3.plunge":      {NoKey, degrees90},
	"planes.*.strike":                {NoKey, azimuth},
	"slope.water.tension_crack_fill": {NoKey, anyNumber},
}

// parsePath reads the dotted path text, written at the key node at, and
// checks that it names a numeric key this site uses. root is the site
// file's top mapping.
func (s *Site) parsePath(at node, text string, root node) (Path, error) {
	p := Path{Text: text, file: at.file, where: at.path, line: at.line, col: 0}
	if p.line == 0 && at.n != nil {
		p.line, p.col = at.n.Line, at.n.Column
	}
	parts := strings.Split(text, ".")
	pattern := text
	if parts[0] == "planes" && len(parts) >= 3 {
		p.Plane = strings.Join(parts[1:len(parts)-1], ".")
		pattern = "planes.*." + parts[len(parts)-1]
	}
	spec, known := fixedPaths[pattern]
	if !known || spec.key == NoKey {
		return p, s.unknownPath(p, parts, root, known)
	}
	p.Key, p.valid = spec.key, spec.iv
	if why := s.applies(p, parts, root); why != "" {
		return p, p.Errorf(ErrUnknownKey, "%s", why)
	}
	if p.Key == ReferenceDepth {
		if m, ok := s.Model.(*insitu.MeasuredModel); ok && m.Scaling == insitu.Proportional {
			p.valid = unit(positive, "m")
		}
	}
	return p, nil
}

// unknownPath explains a path that names no numeric key of the model.
func (s *Site) unknownPath(p Path, parts []string, root node, known bool) error {
	if known {
		return p.Errorf(ErrNotNumber, "cannot be varied on its own (principal axes stay orthogonal, a strike is a dip direction, crack fills are a list); vary dip_direction, or the principal magnitudes")
	}
	if parts[0] == "planes" && len(parts) >= 3 {
		return p.Errorf(ErrNotNumber, "a plane's column %q is not a number that can vary; the numeric columns are friction, cohesion, pore_pressure, dip, dip_direction and depth", parts[len(parts)-1])
	}
	if n, ok := lookup(root, parts); ok {
		if n.n.Kind != yaml.ScalarNode || n.n.Tag == "!!str" || n.n.Tag == "!!bool" || n.n.Tag == "!!null" {
			return p.Errorf(ErrNotNumber, "names %s, not a number", kindName(n.n))
		}
	}
	paths := s.Paths()
	msg := fmt.Sprintf("not a numeric key of this site's model; the keys here: %s, and planes.NAME.friction|cohesion|pore_pressure|dip|dip_direction|depth", strings.Join(paths, ", "))
	if sg := suggest(p.Text, paths); sg != "" {
		msg = fmt.Sprintf("not a numeric key of this site's model (did you mean %q?); the keys here: %s, and planes.NAME.friction|cohesion|pore_pressure|dip|dip_direction|depth", sg, strings.Join(paths, ", "))
	}
	return p.Errorf(ErrUnknownKey, "%s", msg)
}

// Paths returns the dotted paths of the numeric keys this site's model
// uses (plane columns aside), sorted.
func (s *Site) Paths() []string {
	var out []string
	for text, spec := range fixedPaths {
		if spec.key == NoKey || spec.key.IsPlane() {
			continue
		}
		p := Path{Text: text, Key: spec.key}
		if s.applies(p, strings.Split(text, "."), s.root) == "" {
			out = append(out, text)
		}
	}
	sort.Strings(out)
	return out
}

// applies returns why the key of p is not part of this site's model, or "".
func (s *Site) applies(p Path, parts []string, root node) string {
	g, isGrad := s.Model.(*insitu.GradientModel)
	_, coulomb := s.Criterion.(*planes.Coulomb)
	given := func(ps ...string) bool { _, ok := lookup(root, ps); return ok }
	k := p.Key
	switch {
	case k == VerticalGradient || k == VerticalDensity:
		if !isGrad {
			return "the site's stress is measured, not a gradient model"
		}
		byDensity := given("stress", "vertical", "density")
		if (k == VerticalDensity) != byDensity {
			if byDensity {
				return "the site gives Sv by density: vary stress.vertical.density"
			}
			return "the site gives Sv by gradient: vary stress.vertical.gradient"
		}
	case k >= SHmaxValue && k <= ShminOffset:
		if !isGrad {
			return "the site's stress is measured, not a gradient model"
		}
		h, name := g.SHmax, "shmax"
		if k == ShminValue || k == ShminOffset {
			h, name = g.Shmin, "shmin"
			if !given("stress", "shmin") {
				return "the site gives Sheorey's law on shmax alone, which applies to both: vary stress.shmax.sheorey.modulus"
			}
		}
		if k == SHmaxAzimuth {
			return ""
		}
		law := h.Kind.String()
		if h.Kind == insitu.Sheorey {
			law = "sheorey.modulus"
		}
		if k == SHmaxOffset || k == ShminOffset {
			if h.Kind != insitu.Gradient {
				return fmt.Sprintf("the site's %s follows %s, which has no offset", name, h.Kind)
			}
			return ""
		}
		if want := "stress." + name + "." + law; p.Text != want {
			return fmt.Sprintf("the site's %s follows %s: vary %s", name, h.Kind, want)
		}
	case k >= TensorNN && k <= ReferenceDepth:
		if isGrad {
			return "the site's stress is a gradient model, not a measured one"
		}
		if k <= TensorED && !given("stress", "tensor") {
			return "the site gives principal stresses: vary stress.principal.N.magnitude"
		}
		if k >= Principal1 && k <= Principal3 && !given("stress", "principal") {
			return "the site gives a tensor: vary stress.tensor.nn, ee, dd, ne, nd or ed"
		}
	case k == WaterGradient || k == WaterTable:
		if s.Water.Dry {
			return "the site is dry (water: {dry: true}): there is no water table or gradient to vary"
		}
	case k == Friction || k == Cohesion:
		if !coulomb {
			return "the site's strength is Barton–Bandis: vary strength.jrc, jcs or residual_angle"
		}
	case k == JRC || k == JCS || k == ResidualAngle:
		if coulomb {
			return "the site's strength is Coulomb: vary strength.friction or cohesion"
		}
	case k.Slope():
		if s.Slope == nil {
			return "the site has no slope:"
		}
		if k == SlopeCrack {
			switch {
			case !s.Slope.CrackGiven:
				return "the slope gives no tension_crack: (it uses the critical depth of each plane)"
			case s.Slope.CrackByDepth != (parts[len(parts)-1] == "depth"):
				if s.Slope.CrackByDepth {
					return "the slope's tension crack is given by depth: vary slope.tension_crack.depth"
				}
				return "the slope's tension crack is given by distance: vary slope.tension_crack.distance"
			}
		}
	case k.Tunnel():
		if s.Tunnel == nil {
			return "the site has no tunnel:"
		}
	}
	return ""
}

// lookup walks the mapping keys parts from n (a list item by its 1-based
// index).
func lookup(n node, parts []string) (node, bool) {
	cur := n.n
	for _, part := range parts {
		cur = resolveAlias(cur)
		if cur == nil {
			return node{}, false
		}
		switch cur.Kind {
		case yaml.MappingNode:
			var next *yaml.Node
			for i := 0; i+1 < len(cur.Content); i += 2 {
				if cur.Content[i].Value == part {
					next = cur.Content[i+1]
				}
			}
			if next == nil {
				return node{}, false
			}
			cur = next
		case yaml.SequenceNode:
			var i int
			if _, err := fmt.Sscanf(part, "%d", &i); err != nil || i < 1 || i > len(cur.Content) {
				return node{}, false
			}
			cur = cur.Content[i-1]
		default:
			return node{}, false
		}
	}
	return node{file: n.file, n: resolveAlias(cur)}, true
}
