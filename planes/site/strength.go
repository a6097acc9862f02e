package site

import (
	"fmt"

	"cleft/planes"
)

func (s *Site) readStrength(f *fields) error {
	v, ok := f.get("strength")
	if !ok {
		c, _ := planes.NewCoulomb(0.6, 0)
		s.Criterion = c
		s.param("strength", "friction", 0.6, "", "", true)
		s.param("strength", "cohesion", 0, "MPa", "", true)
		s.summary = append(s.summary, "μ = 0.6 (default)")
		return nil
	}
	m, err := v.mapping("model", "friction", "cohesion", "jrc", "jcs", "residual_angle", "source")
	if err != nil {
		return err
	}
	src, err := m.source()
	if err != nil {
		return err
	}
	model := "coulomb"
	if mv, ok := m.get("model"); ok {
		if model, err = mv.oneOf("coulomb", "barton-bandis"); err != nil {
			return err
		}
	}
	if model == "coulomb" {
		if k := m.present("jrc", "jcs", "residual_angle"); len(k) > 0 {
			return m.vals[k[0]].errf("goes with model: barton-bandis, not with the Coulomb criterion").is(ErrConflict)
		}
		mu, given, err := m.optNumber("friction", interval{lo: 0, hi: MaxFriction, openLo: true}, 0.6)
		if err != nil {
			return err
		}
		s.param("strength", "friction", mu, "", src, !given)
		c, cgiven, err := m.optNumber("cohesion", stressRange, 0)
		if err != nil {
			return err
		}
		s.param("strength", "cohesion", c, "MPa", src, !cgiven)
		s.Criterion = &planes.Coulomb{Mu: mu, Cohesion: c}
		d := "μ = " + fmtNum(mu)
		if c != 0 {
			d += ", c = " + fmtNum(c) + " MPa"
		}
		s.summary = append(s.summary, d)
		return nil
	}
	if k := m.present("friction", "cohesion"); len(k) > 0 {
		return m.vals[k[0]].errf("goes with the Coulomb criterion, not with model: barton-bandis").is(ErrConflict)
	}
	var vals [3]float64
	for i, k := range []struct {
		key  string
		iv   interval
		unit string
	}{
		{"jrc", interval{lo: 0, hi: 20}, ""},
		{"jcs", interval{lo: 0, hi: MaxStress, openLo: true, unit: "MPa"}, "MPa"},
		{"residual_angle", interval{lo: 0, hi: planes.MaxBartonAngle, openLo: true, openHi: true, unit: "°"}, "°"},
	} {
		kv, ok := m.get(k.key)
		if !ok {
			return m.missing(k.key, " (barton-bandis needs jrc, jcs and residual_angle)")
		}
		if vals[i], err = kv.numberIn(k.iv); err != nil {
			return err
		}
		s.param("strength", k.key, vals[i], k.unit, src, false)
	}
	b, err := planes.NewBartonBandis(vals[0], vals[1], vals[2])
	if err != nil {
		return v.errf("%v", err)
	}
	s.Criterion = b
	s.summary = append(s.summary, fmt.Sprintf("Barton–Bandis JRC %s, JCS %s MPa, φr %s°", fmtNum(vals[0]), fmtNum(vals[1]), fmtNum(vals[2])))
	return nil
}
