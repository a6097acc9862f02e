package site

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"

	"cleft/planes/chance"

	"go.yaml.in/yaml/v3"
)

// Uncertainty is the Monte Carlo of uncertainty:: how many realisations,
// the seed, the distribution of each varied key, their rank correlations
// and the scatter of the planes' orientations.
type Uncertainty struct {
	Realisations int    // ≥ 2; default DefaultRealisations
	Seed         uint64 // default 1
	Vary         []Varied
	Correlations []chance.Pair // A and B index Vary
	// FisherK is the concentration κ of the Fisher distribution from which
	// each plane's pole is drawn about its own (set means: their set's
	// fitted K); 0 when orientations are fixed.
	FisherK float64
	Line    int // of the uncertainty: key
}

// Varied is one uncertain key with its distribution. A sample outside the
// key's valid range never occurs: Dist is truncated to it (the same
// distribution as redrawing such a sample), except for an azimuth, which is
// taken modulo 360°.
type Varied struct {
	Path Path
	Dist chance.Dist
}

// Defaults of uncertainty:.
const (
	DefaultRealisations = 10000
	MaxRealisations     = 10000000
)

func (s *Site) readUncertainty(v node) error {
	m, err := v.mapping("realisations", "seed", "vary", "correlations", "orientation")
	if err != nil {
		return err
	}
	u := &Uncertainty{Realisations: DefaultRealisations, Seed: 1, Line: v.line}
	if rv, ok := m.get("realisations"); ok {
		n, err := rv.numberIn(interval{lo: 2, hi: MaxRealisations})
		if err != nil {
			return err
		}
		if n != math.Trunc(n) {
			return rv.errf("%s: want a whole number of realisations", rv.n.Value).is(ErrRange)
		}
		u.Realisations = int(n)
	}
	if sv, ok := m.get("seed"); ok {
		seed, err := strconv.ParseUint(strings.TrimSpace(sv.n.Value), 10, 64)
		if sv.n.Kind != yaml.ScalarNode || err != nil {
			return sv.errf("want a whole number ≥ 0 for the seed, got %s", kindName(sv.n)).is(ErrNotNumber)
		}
		u.Seed = seed
	}
	if vv, ok := m.get("vary"); ok {
		if vv.n == nil || vv.n.Kind != yaml.MappingNode {
			return vv.errf("want a mapping of dotted paths to distributions, got %s", kindName(vv.n)).is(ErrType)
		}
		seen := map[string]bool{}
		for i := 0; i+1 < len(vv.n.Content); i += 2 {
			k, val := vv.n.Content[i], vv.n.Content[i+1]
			at := vv.child(k, val)
			if seen[k.Value] {
				return at.errf("this path is given twice").is(ErrDuplicate)
			}
			seen[k.Value] = true
			p, err := s.parsePath(at, k.Value, s.root)
			if err != nil {
				return err
			}
			d, err := readDist(at, p)
			if err != nil {
				return err
			}
			u.Vary = append(u.Vary, Varied{Path: p, Dist: d})
		}
	}
	if ov, ok := m.get("orientation"); ok {
		om, err := ov.mapping("fisher_k")
		if err != nil {
			return err
		}
		kv, ok := om.get("fisher_k")
		if !ok {
			return om.missing("fisher_k", " (the Fisher concentration κ of each plane's pole about its own, > 0)")
		}
		if u.FisherK, err = kv.numberIn(positive); err != nil {
			return err
		}
	}
	if len(u.Vary) == 0 && u.FisherK == 0 {
		return v.errf("nothing varies: give vary: {dotted.path: {normal: [mean, sd]}, …} or orientation: {fisher_k: K}").is(ErrMissing)
	}
	if cv, ok := m.get("correlations"); ok {
		if err := u.readCorrelations(cv); err != nil {
			return err
		}
	}
	s.Uncertainty = u
	return nil
}

func (u *Uncertainty) readCorrelations(cv node) error {
	items, err := cv.list()
	if err != nil {
		return err
	}
	index := func(it node, text string) (int, error) {
		for j, in := range u.Vary {
			if in.Path.Text == text {
				return j, nil
			}
		}
		return 0, it.errf("%q is not one of the varied paths (vary:)", text).is(ErrMissing)
	}
	lines := make([]int, len(items))
	for i, it := range items {
		lines[i] = it.n.Line
		tri, err := it.list()
		if err != nil || len(tri) != 3 {
			return it.errf("want [path, path, rank correlation]").is(ErrType)
		}
		var pr chance.Pair
		a, err := tri[0].text()
		if err != nil {
			return err
		}
		b, err := tri[1].text()
		if err != nil {
			return err
		}
		if pr.A, err = index(it, a); err != nil {
			return err
		}
		if pr.B, err = index(it, b); err != nil {
			return err
		}
		if pr.Rho, err = tri[2].numberIn(interval{lo: -1, hi: 1, openLo: true, openHi: true}); err != nil {
			return err
		}
		u.Correlations = append(u.Correlations, pr)
	}
	dists := make([]chance.Dist, len(u.Vary))
	for i, in := range u.Vary {
		dists[i] = in.Dist
	}
	if _, err := chance.Draw(dists, u.Correlations, max(64, 4*len(dists)), 1); err != nil {
		var ce *chance.CorrelationError
		if errors.As(err, &ce) {
			return &Error{File: cv.file, Line: lines[ce.Pair], Key: cv.path, Err: ErrRange, Msg: fmt.Sprintf("%s and %s, %g: %v", u.Vary[ce.A].Path.Text, u.Vary[ce.B].Path.Text, ce.Rho, ce.Err)}
		}
		return cv.errf("%v", err).is(ErrRange)
	}
	correlated := map[int]bool{}
	for _, p := range u.Correlations {
		correlated[p.A], correlated[p.B] = true, true
	}
	if u.Realisations <= len(correlated) {
		return cv.errf("%d realisations cannot carry %d correlated inputs", u.Realisations, len(correlated)).is(ErrRange)
	}
	return nil
}

// readDist reads {family: [parameters], min:, max:} for the key of p.
func readDist(at node, p Path) (chance.Dist, error) {
	m, err := at.mapping("normal", "lognormal", "uniform", "triangular", "min", "max")
	if err != nil {
		return chance.Dist{}, err
	}
	fam := m.present("normal", "lognormal", "uniform", "triangular")
	switch len(fam) {
	case 0:
		return chance.Dist{}, at.errf("give one of normal: [mean, sd], lognormal: [median, sd of ln], uniform: [low, high], triangular: [low, mode, high]").is(ErrMissing)
	case 2, 3, 4:
		return chance.Dist{}, m.vals[fam[1]].errf("give one distribution, not %s", strings.Join(fam, " and ")).is(ErrConflict)
	}
	fv := m.vals[fam[0]]
	items, err := fv.list()
	if err != nil {
		return chance.Dist{}, err
	}
	want := map[string]int{"normal": 2, "lognormal": 2, "uniform": 2, "triangular": 3}[fam[0]]
	if len(items) != want {
		return chance.Dist{}, fv.errf("%s takes %d numbers, got %d", fam[0], want, len(items)).is(ErrType)
	}
	x := make([]float64, want)
	for i, it := range items {
		if x[i], err = it.number(); err != nil {
			return chance.Dist{}, err
		}
	}
	valid := p.valid
	inRange := func(what string, v float64) error {
		if p.Key.Circular() || valid.contains(v) {
			return nil
		}
		return fv.errf("%s %s is outside the allowed range %s of %s", what, fmtNum(v), valid, p.Text).is(ErrRange)
	}
	var d chance.Dist
	switch fam[0] {
	case "normal":
		if err = inRange("the mean", x[0]); err == nil {
			d, err = chance.NewNormal(x[0], x[1])
		}
	case "lognormal":
		if err = inRange("the median", x[0]); err == nil {
			d, err = chance.NewLogNormal(x[0], x[1])
		}
	case "uniform":
		if err = inRange("low", x[0]); err == nil {
			if err = inRange("high", x[1]); err == nil {
				d, err = chance.NewUniform(x[0], x[1])
			}
		}
	case "triangular":
		for i, w := range []string{"low", "mode", "high"} {
			if err = inRange(w, x[i]); err != nil {
				break
			}
		}
		if err == nil {
			d, err = chance.NewTriangular(x[0], x[1], x[2])
		}
	}
	if err != nil {
		if e, ok := err.(*Error); ok {
			return d, e
		}
		return d, fv.errf("%v", err).is(ErrRange)
	}
	lo, hi := math.Inf(-1), math.Inf(1)
	closed := valid
	closed.openLo, closed.openHi = false, false
	for _, b := range []struct {
		key string
		dst *float64
	}{{"min", &lo}, {"max", &hi}} {
		bv, ok := m.get(b.key)
		if !ok {
			continue
		}
		if *b.dst, err = bv.number(); err != nil {
			return d, err
		}
		if !p.Key.Circular() && !closed.contains(*b.dst) {
			return d, bv.errf("%s is outside the allowed range %s of %s", bv.n.Value, valid, p.Text).is(ErrRange)
		}
	}
	if !p.Key.Circular() {
		lo, hi = math.Max(lo, valid.lo), math.Min(hi, valid.hi)
		if valid.openLo && lo == valid.lo {
			lo = math.Nextafter(lo, math.Inf(1))
		}
		if valid.openHi && hi == valid.hi {
			hi = math.Nextafter(hi, math.Inf(-1))
		}
	}
	if math.IsInf(lo, -1) && math.IsInf(hi, 1) {
		return d, nil
	}
	t, err := d.Truncate(lo, hi)
	if err != nil {
		return d, at.errf("min %s, max %s: %v", fmtNum(lo), fmtNum(hi), err).is(ErrRange)
	}
	return t, nil
}

// Correlated returns the varied paths of the correlation pairs, as
// "A ~ B: ρ".
func (u *Uncertainty) Correlated() []string {
	var out []string
	for _, p := range u.Correlations {
		out = append(out, fmt.Sprintf("%s ~ %s: %g", u.Vary[p.A].Path.Text, u.Vary[p.B].Path.Text, p.Rho))
	}
	return out
}
