package site

import (
	"bytes"
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"strconv"
	"strings"

	"cleft/insitu"
	"cleft/planes"
	"cleft/planes/sets"
	"cleft/planes/slope"
	"cleft/planes/tunnel"

	"go.yaml.in/yaml/v3"
)

// Site is a loaded, validated site file.
type Site struct {
	File   string // the path it was read from, as given
	SHA256 string // of the site file's bytes, hex
	Name   string

	// Depth is the default depth (m) of planes that do not give their own;
	// HasDepth says whether the file set it.
	Depth    float64
	HasDepth bool

	Model     insitu.Model
	Water     insitu.Water
	Criterion planes.Criterion

	// Planes are the inline planes, in file order.
	Planes []Plane
	// PlanesFile is the planes_file path resolved against the site file's
	// folder, or "".
	PlanesFile string
	// ReadingsFile is the readings_file path (field readings to group into
	// sets) resolved likewise, or "".
	ReadingsFile string
	// CoverFile is the tunnel's cover_file path resolved likewise (already
	// read), or "".
	CoverFile string
	// Sets is how the readings are grouped (the sets: block, or defaults).
	Sets sets.Config
	// Slope is the cut slope to screen, or nil; SlopeDefaults lists the
	// keys of its block the file left out, as "key = value (why)".
	Slope         *slope.Slope
	SlopeDefaults []string
	// Tunnel is the alignment to screen, or nil; TunnelDefaults as
	// SlopeDefaults.
	Tunnel         *tunnel.Tunnel
	TunnelDefaults []string

	// ReportDepths are the depths of report.depths, or nil.
	ReportDepths []float64

	// Params lists every model parameter for the report, defaults included.
	Params []Param
	// Notes are things the reader should know about how the file was read
	// (re-orthogonalised axes, say).
	Notes []string

	// Cases are the named bracketing cases of cases:, in file order; nil
	// without them.
	Cases []Case
	// Uncertainty is the Monte Carlo of uncertainty:, or nil.
	Uncertainty *Uncertainty

	root      node     // the file's top mapping, for dotted paths
	base      *Variant // the site's own values, copied by Variant
	summary   []string // parts of Summary
	inlineSet bool     // some inline plane has set:
	fsys      fs.FS    // where planes_file is read from; nil for the OS

	// readingsOnly: the caller will add readings as planes (assess), so a
	// site with readings and no planes is not an error. Set by AllowReadingsOnly.
	readingsOnly bool
}

// Param is one input parameter as the report lists it.
type Param struct {
	Group   string // stress, water, strength
	Name    string
	Value   string
	Unit    string
	Source  string // the file's source: text, or ""
	Default bool   // true when the file did not give it
}

// Summary is the model in one line, e.g.
// "SHmax 1.3·Sv @ 065°, Shmin 0.8·Sv, Sv 0.0265 MPa/m, Pp hydrostatic below 12 m, μ = 0.6".
func (s *Site) Summary() string { return strings.Join(s.summary, ", ") }

// Load reads and validates the site file at path. A file of more than
// MaxSiteBytes is an error (ErrLimit) read no further.
func Load(path string) (*Site, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, &Error{File: path, Err: ErrRead, Msg: fmt.Sprintf("cannot read the site file: %v", unwrapPath(err))}
	}
	defer f.Close()
	data, err := io.ReadAll(io.LimitReader(f, MaxSiteBytes+1))
	if err != nil {
		return nil, &Error{File: path, Err: ErrRead, Msg: fmt.Sprintf("cannot read the site file: %v", unwrapPath(err))}
	}
	return Parse(data, path)
}

func unwrapPath(err error) error {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err
	}
	return err
}

// Parse reads a site file from data; name is used in errors and to resolve
// planes_file. The file must be UTF-8 text of at most MaxSiteBytes.
func Parse(data []byte, name string) (*Site, error) { return parse(data, name, nil) }

func parse(data []byte, name string, fsys fs.FS) (*Site, error) {
	if len(data) > MaxSiteBytes {
		return nil, &Error{File: name, Err: ErrLimit, Msg: fmt.Sprintf("the site file is over %d MiB: put long lists of planes in planes_file: (a CSV table)", MaxSiteBytes>>20)}
	}
	if i := badText(string(data), true); i >= 0 {
		start := bytes.LastIndexByte(data[:i], '\n') + 1
		line := bytes.Count(data[:i], []byte("\n")) + 1
		return nil, &Error{File: name, Line: line, Err: ErrEncoding, Msg: textProblem(string(data[start:]), i-start)}
	}
	dec := yaml.NewDecoder(bytes.NewReader(data))
	var doc yaml.Node
	if err := dec.Decode(&doc); err != nil {
		if errors.Is(err, io.EOF) {
			return nil, &Error{File: name, Err: ErrEmpty, Msg: "the site file is empty: it needs at least site: and stress:"}
		}
		return nil, yamlError(name, err)
	}
	var extra yaml.Node
	if err := dec.Decode(&extra); err == nil {
		return nil, &Error{File: name, Line: extra.Line, Err: ErrSyntax, Msg: "a second YAML document (---) follows: a site file holds one"}
	}
	root := node{file: name, n: resolveAlias(&doc)}
	if root.n.Kind == yaml.DocumentNode && len(root.n.Content) == 1 {
		root.n = resolveAlias(root.n.Content[0])
	}
	sum := sha256.Sum256(data)
	s := &Site{File: name, SHA256: hex.EncodeToString(sum[:]), fsys: fsys}
	if err := s.read(root); err != nil {
		return nil, err
	}
	return s, nil
}

// AllowReadingsOnly lets OpenPlanes open a site whose only planes are its
// readings (which the caller adds itself).
func (s *Site) AllowReadingsOnly() { s.readingsOnly = s.ReadingsFile != "" }

// ParseFS reads the site file name from fsys; its planes_file is read from
// fsys too. It serves the demo embedded in the binary.
func ParseFS(fsys fs.FS, name string) (*Site, error) {
	data, err := fs.ReadFile(fsys, name)
	if err != nil {
		return nil, err
	}
	return parse(data, name, fsys)
}

// yamlError turns the YAML library's syntax error into a one-line Error.
// The library numbers the lines of its parser errors (as opposed to its
// scanner errors) from 0 and leaves out "line 0"; they are renumbered here.
func yamlError(name string, err error) error {
	msg := strings.TrimPrefix(err.Error(), "yaml: ")
	line := 0
	if rest, ok := strings.CutPrefix(msg, "line "); ok {
		if i := strings.Index(rest, ": "); i > 0 {
			if n, err := strconv.Atoi(rest[:i]); err == nil {
				line, msg = n, rest[i+2:]
			}
		}
	}
	for _, p := range parserProblems {
		if strings.HasPrefix(msg, p) {
			line++
			break
		}
	}
	return &Error{File: name, Line: line, Err: ErrSyntax, Msg: "not valid YAML: " + msg}
}

// parserProblems are the YAML library's parser (not scanner) messages.
var parserProblems = []string{
	"did not find expected <stream-start>", "did not find expected <document start>",
	"found undefined tag handle", "did not find expected node content",
	"did not find expected '-' indicator", "did not find expected key",
	"did not find expected ',' or ']'", "did not find expected ',' or '}'",
	"found duplicate %YAML directive", "found incompatible YAML document",
	"found duplicate %TAG directive",
}

var topKeys = []string{"site", "depth", "stress", "water", "strength", "planes", "planes_file", "readings_file", "sets", "slope", "tunnel", "report", "cases", "uncertainty"}

func (s *Site) read(root node) error {
	f, err := root.mapping(topKeys...)
	if err != nil {
		return err
	}
	v, ok := f.get("site")
	if !ok {
		return f.missing("site", " (the site's name, shown on every output)")
	}
	if s.Name, err = v.text(); err != nil {
		return err
	}
	if strings.TrimSpace(s.Name) == "" {
		return v.errf("the site name is empty").is(ErrEmpty)
	}
	if s.Depth, s.HasDepth, err = f.optNumber("depth", depthRange, 0); err != nil {
		return err
	}
	// Water and strength first: the stress model needs the water model, and
	// the summary lists them after the stress.
	if err := s.readWater(f); err != nil {
		return err
	}
	sv, ok := f.get("stress")
	if !ok {
		return f.missing("stress", " (the far-field stress model)")
	}
	if err := s.readStress(sv); err != nil {
		return err
	}
	s.summary = append(s.summary, describeWater(s.Water))
	if err := s.readStrength(f); err != nil {
		return err
	}
	if pv, ok := f.get("planes"); ok {
		if err := s.readInlinePlanes(pv); err != nil {
			return err
		}
	}
	if pv, ok := f.get("planes_file"); ok {
		p, err := pv.text()
		if err != nil {
			return err
		}
		if strings.TrimSpace(p) == "" {
			return pv.errf("empty path").is(ErrEmpty)
		}
		s.PlanesFile = resolvePath(s.File, p)
	}
	s.Sets = sets.DefaultConfig
	if rv, ok := f.get("readings_file"); ok {
		p, err := rv.text()
		if err != nil {
			return err
		}
		if strings.TrimSpace(p) == "" {
			return rv.errf("empty path").is(ErrEmpty)
		}
		s.ReadingsFile = resolvePath(s.File, p)
	}
	if sv, ok := f.get("sets"); ok {
		if s.ReadingsFile == "" {
			return sv.errf("goes with readings_file: (the field readings to group)").is(ErrConflict)
		}
		if err := s.readSets(sv); err != nil {
			return err
		}
	}
	if sv, ok := f.get("slope"); ok {
		if err := s.readSlope(sv); err != nil {
			return err
		}
	}
	if tv, ok := f.get("tunnel"); ok {
		if err := s.readTunnel(tv); err != nil {
			return err
		}
	}
	if rv, ok := f.get("report"); ok {
		if err := s.readReport(rv); err != nil {
			return err
		}
	}
	s.root = root
	s.base = s.newBase()
	return s.readChance(f)
}

func (s *Site) param(group, name string, value float64, unit, source string, def bool) {
	s.Params = append(s.Params, Param{Group: group, Name: name, Value: fmtNum(value), Unit: unit, Source: source, Default: def})
}

func fmtNum(v float64) string {
	return strings.TrimSuffix(strings.TrimRight(fmt.Sprintf("%.6f", v), "0"), ".")
}

func (s *Site) readWater(f *fields) error {
	w := insitu.DefaultWater
	v, ok := f.get("water")
	if !ok {
		s.Water = w
		s.param("water", "gradient", w.Gradient, "MPa/m", "", true)
		s.param("water", "table", w.Table, "m", "", true)
		s.param("water", "biot", w.Biot, "", "", true)
		return nil
	}
	m, err := v.mapping("gradient", "table", "biot", "dry", "source")
	if err != nil {
		return err
	}
	src, err := m.source()
	if err != nil {
		return err
	}
	if dv, ok := m.get("dry"); ok {
		if w.Dry, err = dv.boolean(); err != nil {
			return err
		}
	}
	if w.Dry {
		if k := m.present("gradient", "table"); len(k) > 0 {
			return v.errf("dry: true goes without %s", strings.Join(k, " and ")).is(ErrConflict)
		}
		s.Params = append(s.Params, Param{Group: "water", Name: "dry", Value: "true", Source: src})
	} else {
		var given bool
		if w.Gradient, given, err = m.optNumber("gradient", interval{lo: 0, hi: MaxGradient, openLo: true, unit: "MPa/m"}, insitu.Hydrostatic); err != nil {
			return err
		}
		s.param("water", "gradient", w.Gradient, "MPa/m", src, !given)
		if w.Table, given, err = m.optNumber("table", depthRange, 0); err != nil {
			return err
		}
		s.param("water", "table", w.Table, "m", src, !given)
	}
	var given bool
	if w.Biot, given, err = m.optNumber("biot", interval{lo: 0, hi: 1, openLo: true}, 1); err != nil {
		return err
	}
	s.param("water", "biot", w.Biot, "", src, !given)
	s.Water = w
	return nil
}

func describeWater(w insitu.Water) string {
	var d string
	switch {
	case w.Dry:
		d = "dry (Pp = 0)"
	case w.Gradient == insitu.Hydrostatic:
		d = fmt.Sprintf("Pp hydrostatic below %s m", fmtNum(w.Table))
	default:
		d = fmt.Sprintf("Pp %s MPa/m below %s m", fmtNum(w.Gradient), fmtNum(w.Table))
	}
	if w.Biot != 1 {
		d += fmt.Sprintf(", α = %s", fmtNum(w.Biot))
	}
	return d
}

func (s *Site) readReport(v node) error {
	m, err := v.mapping("depths")
	if err != nil {
		return err
	}
	dv, ok := m.get("depths")
	if !ok {
		return nil
	}
	items, err := dv.list()
	if err != nil {
		return err
	}
	if len(items) == 0 {
		return dv.errf("the list is empty: give at least one depth, or leave report: out").is(ErrEmpty)
	}
	if len(items) > MaxReportDepths {
		return dv.errf("%d depths: at most %d", len(items), MaxReportDepths).is(ErrLimit)
	}
	for _, it := range items {
		z, err := it.numberIn(depthRange)
		if err != nil {
			return err
		}
		s.ReportDepths = append(s.ReportDepths, z)
	}
	return nil
}
