package site

import (
	"cleft/planes/tunnel"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"
)

// chainageRange is the range of a chainage along a tunnel.
var chainageRange = interval{lo: 0, hi: MaxLength, unit: "m"}

func (s *Site) readTunnel(v node) error {
	m, err := v.mapping("alignment", "cover", "cover_file", "spacing", "radius", "rock", "sets", "wall_pore_pressure",
		"support_pressure", "zone_depth_limit", "radius_of_influence", "source")
	if err != nil {
		return err
	}
	t := &tunnel.Tunnel{}
	var defaults []string
	av, ok := m.get("alignment")
	if !ok {
		return m.missing("alignment", " (legs {from, to, trend, plunge} in chainage order)")
	}
	legs, err := av.list()
	if err != nil {
		return err
	}
	if len(legs) == 0 {
		return av.errf("give at least one leg").is(ErrEmpty)
	}
	for i, lv := range legs {
		lm, err := lv.mapping("from", "to", "trend", "plunge")
		if err != nil {
			return err
		}
		var l tunnel.Leg
		for _, k := range []struct {
			key string
			dst *float64
			iv  interval
		}{
			{"from", &l.From, chainageRange},
			{"to", &l.To, chainageRange},
			{"trend", &l.Trend, unit(interval{lo: 0, hi: 360}, "°")},
			{"plunge", &l.Plunge, unit(interval{lo: -45, hi: 45}, "°")},
		} {
			kv, ok := lm.get(k.key)
			if !ok {
				if k.key == "plunge" {
					continue // level
				}
				return lm.missing(k.key, " (each leg has from and to chainages, m, and the drive's trend, °)")
			}
			if *k.dst, err = kv.numberIn(k.iv); err != nil {
				return err
			}
		}
		if !(l.To > l.From) {
			return lv.errf("leg from %g to %g m: to must be beyond from", l.From, l.To)
		}
		if i > 0 {
			prev := t.Legs[i-1]
			switch {
			case l.From > prev.To:
				return lv.errf("a gap in the alignment between chainage %g and %g m: legs must join", prev.To, l.From)
			case l.From < prev.To:
				return lv.errf("legs overlap between chainage %g and %g m: each leg must start where the last ended", l.From, prev.To)
			}
		}
		t.Legs = append(t.Legs, l)
	}
	switch k := m.present("cover", "cover_file"); len(k) {
	case 0:
		return m.missing("cover", " (pairs [chainage, cover] in m) or cover_file:")
	case 2:
		return m.vals["cover_file"].errf("give cover or cover_file, not both").is(ErrConflict)
	}
	if cv, ok := m.get("cover"); ok {
		items, err := cv.list()
		if err != nil {
			return err
		}
		if len(items) > MaxCoverPoints {
			return cv.errf("%d points: at most %d", len(items), MaxCoverPoints).is(ErrLimit)
		}
		for _, it := range items {
			pair, err := it.list()
			if err != nil || len(pair) != 2 {
				return it.errf("want a pair [chainage, cover] in m")
			}
			ch, err := pair[0].numberIn(chainageRange)
			if err != nil {
				return err
			}
			c, err := pair[1].numberIn(depthRange)
			if err != nil {
				return err
			}
			t.Cover = append(t.Cover, [2]float64{ch, c})
		}
		if err := checkProfile(t.Cover); err != nil {
			return cv.errf("%v", err)
		}
	} else {
		fv := m.vals["cover_file"]
		p, err := fv.text()
		if err != nil {
			return err
		}
		path := resolvePath(s.File, p)
		f, err := s.open(path)
		if err != nil {
			return fv.errf("cannot open %s: %v", path, unwrapPath(err))
		}
		t.Cover, err = readCover(f, path)
		f.Close()
		if err != nil {
			return err
		}
		s.CoverFile = path
	}
	var given bool
	if t.Spacing, given, err = m.optNumber("spacing", interval{lo: 0, hi: MaxLength, openLo: true, unit: "m"}, 50); err != nil {
		return err
	} else if !given {
		defaults = append(defaults, "spacing = 50 m")
	}
	if t.Radius, given, err = m.optNumber("radius", interval{lo: 0, hi: MaxRadius, openLo: true, unit: "m"}, 1); err != nil {
		return err
	} else if !given {
		defaults = append(defaults, "radius = 1 m")
	}
	rv, ok := m.get("rock")
	if !ok {
		return m.missing("rock", " ({ucs: MPa, poisson: ratio})")
	}
	rm, err := rv.mapping("ucs", "poisson", "source")
	if err != nil {
		return err
	}
	uv, ok := rm.get("ucs")
	if !ok {
		return rm.missing("ucs", " (MPa, uniaxial compressive strength of the intact rock)")
	}
	if t.UCS, err = uv.numberIn(interval{lo: 0, hi: MaxStress, openLo: true, unit: "MPa"}); err != nil {
		return err
	}
	if t.Poisson, given, err = rm.optNumber("poisson", interval{lo: 0, hi: 0.5, openHi: true}, 0.25); err != nil {
		return err
	} else if !given {
		defaults = append(defaults, "rock.poisson = 0.25")
	}
	if sv, ok := m.get("sets"); ok {
		items, err := sv.list()
		if err != nil {
			return err
		}
		for _, it := range items {
			name, err := it.text()
			if err != nil {
				return err
			}
			t.Sets = append(t.Sets, name)
		}
	}
	t.Drained = true
	if wv, ok := m.get("wall_pore_pressure"); ok {
		w, err := wv.oneOf("drained", "far-field")
		if err != nil {
			return err
		}
		t.Drained = w == "drained"
	} else {
		defaults = append(defaults, "wall_pore_pressure = drained (Pp = 0 at the wall)")
	}
	if l := t.Legs[len(t.Legs)-1].To - t.Legs[0].From; l/t.Spacing+1 > MaxStations {
		at := v
		if sv, ok := m.get("spacing"); ok {
			at = sv
		}
		return at.errf("spacing %s m over the %g m of the alignment makes %.0f stations: at most %d (a spacing of at least %.3g m)",
			fmtNum(t.Spacing), l, math.Floor(l/t.Spacing)+1, MaxStations, l/(MaxStations-1)).is(ErrLimit)
	}
	if err := readZoneKeys(m, t, &defaults); err != nil {
		return err
	}
	if _, err := t.Stations(); err != nil {
		return &Error{File: s.File, Key: "tunnel.cover", Err: ErrRange, Msg: err.Error()}
	}
	s.Tunnel = t
	s.TunnelDefaults = defaults
	return nil
}

// readZoneKeys reads the keys of the support and the slip zones:
// support_pressure (MPa, default 0), zone_depth_limit (m, default half the
// radius) and radius_of_influence (m, beyond the radius; a drained wall
// only, default twice the head over the axis at each station).
func readZoneKeys(m *fields, t *tunnel.Tunnel, defaults *[]string) error {
	var given bool
	var err error
	if t.Support, given, err = m.optNumber("support_pressure", unit(nonNegative, "MPa"), 0); err != nil {
		return err
	} else if !given {
		*defaults = append(*defaults, "support_pressure = 0 MPa (unsupported wall)")
	}
	if t.ZoneLimit, given, err = m.optNumber("zone_depth_limit", unit(positive, "m"), t.Radius/2); err != nil {
		return err
	} else if !given {
		*defaults = append(*defaults, fmt.Sprintf("zone_depth_limit = %g m (half the radius)", t.ZoneLimit))
	}
	iv, ok := m.get("radius_of_influence")
	switch {
	case ok && !t.Drained:
		return iv.errf("applies to a drained wall only (with wall_pore_pressure: far-field the pore pressure is the far field's everywhere)").is(ErrConflict)
	case ok:
		if t.Influence, err = iv.numberIn(unit(interval{lo: t.Radius, hi: math.Inf(1), openLo: true, openHi: true}, "m")); err != nil {
			return err
		}
	case t.Drained:
		*defaults = append(*defaults, "radius_of_influence = twice the head of water over the axis, at least twice the radius")
	}
	return nil
}

func checkProfile(c [][2]float64) error {
	if len(c) < 2 {
		return fmt.Errorf("a cover profile needs at least two points")
	}
	for i := 1; i < len(c); i++ {
		if !(c[i][0] > c[i-1][0]) {
			return fmt.Errorf("chainages must increase: %g after %g", c[i][0], c[i-1][0])
		}
	}
	return nil
}

// readCover reads a cover profile table with columns chainage and cover.
func readCover(r io.Reader, name string) ([][2]float64, error) {
	g := newGuard(r, name)
	cr := g.csvReader()
	head, err := cr.Read()
	if errors.Is(err, io.EOF) {
		return nil, &Error{File: name, Err: ErrEmpty, Msg: "empty: want a header row with chainage and cover"}
	}
	if err != nil {
		return nil, g.csvError(err)
	}
	head = append([]string(nil), head...) // the reader reuses its record
	ic, iv := -1, -1
	for i, h := range head {
		switch strings.ToLower(strings.TrimSpace(h)) {
		case "chainage":
			ic = i
		case "cover":
			iv = i
		}
	}
	if ic < 0 || iv < 0 {
		return nil, &Error{File: name, Line: 1, Err: ErrMissing, Msg: "the header needs the columns chainage and cover (m)"}
	}
	var out [][2]float64
	for {
		rec, err := cr.Read()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return nil, g.csvError(err)
		}
		line, _ := cr.FieldPos(0)
		if len(rec) != len(head) {
			return nil, &Error{File: name, Line: line, Err: ErrSyntax, Msg: fmt.Sprintf("this row has %d values and the header %d columns", len(rec), len(head))}
		}
		if len(out) == MaxCoverPoints {
			return nil, &Error{File: name, Line: line, Err: ErrLimit, Msg: fmt.Sprintf("more than %d points in the cover profile", MaxCoverPoints)}
		}
		var p [2]float64
		for j, i := range []int{ic, iv} {
			v, ok := ParseNumber(rec[i])
			hi := MaxLength
			if j == 1 {
				hi = MaxDepth
			}
			if !ok || v < 0 || v > hi {
				return nil, &Error{File: name, Line: line, Key: head[i], Err: ErrRange, Msg: fmt.Sprintf("%s: want a decimal number in [0, %g] m", Quote(strings.TrimSpace(rec[i])), hi)}
			}
			p[j] = v
		}
		out = append(out, p)
	}
	if err := checkProfile(out); err != nil {
		return nil, &Error{File: name, Err: ErrRange, Msg: err.Error()}
	}
	return out, nil
}
