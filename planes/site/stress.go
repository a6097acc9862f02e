package site

import (
	"fmt"
	"strings"

	"cleft/insitu"
	"cleft/insitu/geom"
)

// ratioRange is the range of a horizontal stress ratio.
var ratioRange = interval{lo: 0, hi: MaxRatio, openLo: true}

var stressKeys = []string{"vertical", "shmax", "shmin", "principal", "tensor", "reference_depth", "scaling", "source"}

func (s *Site) readStress(v node) error {
	m, err := v.mapping(stressKeys...)
	if err != nil {
		return err
	}
	forms := 0
	if m.has("vertical") || m.has("shmax") || m.has("shmin") {
		forms++
	}
	if m.has("principal") {
		forms++
	}
	if m.has("tensor") {
		forms++
	}
	if forms != 1 {
		return v.errf("give exactly one stress model: vertical + shmax + shmin (gradients and ratios), principal: (three measured principal stresses) or tensor: (six components)")
	}
	src, err := m.source()
	if err != nil {
		return err
	}
	if m.has("principal") || m.has("tensor") {
		return s.readMeasured(m, src)
	}
	if k := m.present("reference_depth", "scaling"); len(k) > 0 {
		return m.vals[k[0]].errf("goes with principal: or tensor:, not with the gradient model").is(ErrConflict)
	}
	return s.readGradient(m, src)
}

func (s *Site) readGradient(m *fields, src string) error {
	vv, ok := m.get("vertical")
	if !ok {
		return m.missing("vertical", " ({gradient: MPa/m} or {density: kg/m³})")
	}
	vm, err := vv.mapping("gradient", "density", "source")
	if err != nil {
		return err
	}
	vsrc, err := vm.source()
	if err != nil {
		return err
	}
	if vsrc == "" {
		vsrc = src
	}
	var gv float64
	svDesc := ""
	switch k := vm.present("gradient", "density"); len(k) {
	case 0:
		return vm.missing("gradient", " (MPa/m), or give density (kg/m³)")
	case 2:
		return vm.vals["density"].errf("give gradient or density, not both").is(ErrConflict)
	}
	if g, ok := vm.get("gradient"); ok {
		if gv, err = g.numberIn(interval{lo: 0, hi: MaxGradient, openLo: true, unit: "MPa/m"}); err != nil {
			return err
		}
		s.param("stress", "Sv gradient", gv, "MPa/m", vsrc, false)
		svDesc = fmt.Sprintf("Sv %s MPa/m", fmtNum(gv))
	} else {
		d := vm.vals["density"]
		rho, err := d.numberIn(unit(interval{lo: 0, hi: 10000, openLo: true}, "kg/m³"))
		if err != nil {
			return err
		}
		gv = insitu.DensityGradient(rho)
		s.param("stress", "density", rho, "kg/m³", vsrc, false)
		s.param("stress", "Sv gradient (ρ·g, g = 9.81 m/s²)", gv, "MPa/m", vsrc, false)
		svDesc = fmt.Sprintf("Sv from ρ %s kg/m³", fmtNum(rho))
	}

	hv, ok := m.get("shmax")
	if !ok {
		return m.missing("shmax", " (the larger horizontal stress, with its azimuth)")
	}
	shmax, az, err := s.readHorizontal(hv, "SHmax", src, true)
	if err != nil {
		return err
	}
	var shmin insitu.Horizontal
	if lv, ok := m.get("shmin"); ok {
		if shmin, _, err = s.readHorizontal(lv, "Shmin", src, false); err != nil {
			return err
		}
	} else if shmax.Kind == insitu.Sheorey {
		shmin = shmax // Sheorey's k applies to both horizontals
		s.Params = append(s.Params, Param{Group: "stress", Name: "Shmin", Value: "as SHmax (Sheorey applies to both)", Default: true})
	} else {
		return m.missing("shmin", " (the smaller horizontal stress)")
	}
	model, err := insitu.NewGradientModel(gv, shmax, shmin, az, s.Water)
	if err != nil {
		return m.parent.errf("%v", err)
	}
	s.Model = model
	s.summary = append(s.summary,
		describeHorizontal("SHmax", shmax)+fmt.Sprintf(" @ %03.0f°", az),
		describeHorizontal("Shmin", shmin),
		svDesc)
	return nil
}

func describeHorizontal(name string, h insitu.Horizontal) string {
	switch h.Kind {
	case insitu.Ratio:
		return fmt.Sprintf("%s %s·Sv", name, fmtNum(h.Value))
	case insitu.EffectiveRatio:
		return fmt.Sprintf("%s' %s·Sv'", name, fmtNum(h.Value))
	case insitu.Gradient:
		d := fmt.Sprintf("%s %s MPa/m", name, fmtNum(h.Value))
		if h.Offset != 0 {
			d += fmt.Sprintf(" + %s MPa", fmtNum(h.Offset))
		}
		return d
	default:
		return fmt.Sprintf("%s Sheorey Eh %s GPa", name, fmtNum(h.Value))
	}
}

func (s *Site) readHorizontal(v node, name, src string, isMax bool) (insitu.Horizontal, float64, error) {
	keys := []string{"ratio", "effective_ratio", "gradient", "offset", "sheorey", "source"}
	if isMax {
		keys = append(keys, "azimuth")
	}
	m, err := v.mapping(keys...)
	if err != nil {
		return insitu.Horizontal{}, 0, err
	}
	if hs, err := m.source(); err != nil {
		return insitu.Horizontal{}, 0, err
	} else if hs != "" {
		src = hs
	}
	laws := m.present("ratio", "effective_ratio", "gradient", "sheorey")
	switch len(laws) {
	case 0:
		return insitu.Horizontal{}, 0, v.errf("give one of ratio (S/Sv), effective_ratio ((S−Pp)/(Sv−Pp)), gradient (MPa/m, with optional offset MPa) or sheorey ({modulus: GPa})")
	case 1:
	default:
		return insitu.Horizontal{}, 0, m.vals[laws[1]].errf("give one of %s, not several", strings.Join(laws, ", ")).is(ErrConflict)
	}
	var h insitu.Horizontal
	law := laws[0]
	lv := m.vals[law]
	switch law {
	case "ratio":
		h.Kind = insitu.Ratio
		h.Value, err = lv.numberIn(ratioRange)
		s.param("stress", name+" ratio S/Sv", h.Value, "", src, false)
	case "effective_ratio":
		h.Kind = insitu.EffectiveRatio
		h.Value, err = lv.numberIn(ratioRange)
		s.param("stress", name+" effective ratio (S−αPp)/(Sv−αPp)", h.Value, "", src, false)
	case "gradient":
		h.Kind = insitu.Gradient
		h.Value, err = lv.numberIn(interval{lo: 0, hi: MaxHorizontalGradient, openLo: true, unit: "MPa/m"})
		s.param("stress", name+" gradient", h.Value, "MPa/m", src, false)
	case "sheorey":
		h.Kind = insitu.Sheorey
		sm, e := lv.mapping("modulus")
		if e != nil {
			return h, 0, e
		}
		mv, ok := sm.get("modulus")
		if !ok {
			return h, 0, sm.missing("modulus", " (Eh, the horizontal deformation modulus, GPa)")
		}
		h.Value, err = mv.numberIn(interval{lo: 0, hi: MaxModulus, openLo: true, unit: "GPa"})
		s.param("stress", name+" Sheorey modulus Eh", h.Value, "GPa", src, false)
	}
	if err != nil {
		return h, 0, err
	}
	if ov, ok := m.get("offset"); ok {
		if h.Kind != insitu.Gradient {
			return h, 0, ov.errf("offset goes with gradient only, not with %s", law).is(ErrConflict)
		}
		if h.Offset, err = ov.numberIn(stressRange); err != nil {
			return h, 0, err
		}
		s.param("stress", name+" offset at surface", h.Offset, "MPa", src, false)
	}
	var az float64
	if isMax {
		av, ok := m.get("azimuth")
		if !ok {
			return h, 0, m.missing("azimuth", " (of SHmax, degrees clockwise from north)")
		}
		if az, err = av.numberIn(unit(interval{lo: 0, hi: 360}, "°")); err != nil {
			return h, 0, err
		}
		s.param("stress", "SHmax azimuth", az, "°", src, false)
	}
	return h, az, nil
}

func (s *Site) readMeasured(m *fields, src string) error {
	zref, zgiven, err := m.optNumber("reference_depth", depthRange, 0)
	if err != nil {
		return err
	}
	scaling := insitu.Constant
	if sv, ok := m.get("scaling"); ok {
		w, err := sv.oneOf("constant", "proportional")
		if err != nil {
			return err
		}
		if w == "proportional" {
			scaling = insitu.Proportional
		}
		s.Params = append(s.Params, Param{Group: "stress", Name: "scaling", Value: w, Source: src})
	} else {
		s.Params = append(s.Params, Param{Group: "stress", Name: "scaling", Value: "constant", Default: true})
	}
	if scaling == insitu.Proportional && !zgiven {
		return m.missing("reference_depth", " (m): proportional scaling needs the depth of the measurement")
	}
	if scaling == insitu.Proportional && zref == 0 {
		return m.vals["reference_depth"].errf("must be > 0 for proportional scaling")
	}
	s.param("stress", "reference depth", zref, "m", src, !zgiven)

	var model *insitu.MeasuredModel
	if pv, ok := m.get("principal"); ok {
		items, err := pv.list()
		if err != nil {
			return err
		}
		if len(items) != 3 {
			return pv.errf("want three principal stresses, got %d", len(items))
		}
		var mags [3]float64
		var axes [3]geom.Line
		for i, it := range items {
			im, err := it.mapping("magnitude", "trend", "plunge", "source")
			if err != nil {
				return err
			}
			isrc, err := im.source()
			if err != nil {
				return err
			}
			if isrc == "" {
				isrc = src
			}
			for _, k := range []string{"magnitude", "trend", "plunge"} {
				if !im.has(k) {
					return im.missing(k, " (each principal stress has magnitude MPa, trend ° and plunge °)")
				}
			}
			if mags[i], err = im.vals["magnitude"].numberIn(stressRange); err != nil {
				return err
			}
			if axes[i].Trend, err = im.vals["trend"].numberIn(unit(interval{lo: 0, hi: 360}, "°")); err != nil {
				return err
			}
			if axes[i].Plunge, err = im.vals["plunge"].numberIn(unit(interval{lo: 0, hi: 90}, "°")); err != nil {
				return err
			}
			s.Params = append(s.Params, Param{Group: "stress", Name: fmt.Sprintf("principal %d", i+1),
				Value: fmt.Sprintf("%s MPa along %03.0f/%02.0f", fmtNum(mags[i]), axes[i].Trend, axes[i].Plunge), Source: isrc})
		}
		p, fit, err := insitu.FromPrincipal(mags, axes)
		if err != nil {
			return pv.errf("%v", err)
		}
		if fit.Misfit > 1e-6 {
			s.Notes = append(s.Notes, fmt.Sprintf("%s:%d: principal axes were %.2f° from orthogonal; replaced by the nearest orthogonal triad (largest move %.2f°)", s.File, pv.n.Line, fit.Misfit, fit.Moved))
		}
		if model, err = insitu.NewMeasuredPrincipal(p, zref, scaling, s.Water); err != nil {
			return m.parent.errf("%v", err)
		}
		s.summary = append(s.summary, fmt.Sprintf("measured σ1/σ2/σ3 %s/%s/%s MPa at %s m, %s", fmtNum(p.Values[0]), fmtNum(p.Values[1]), fmtNum(p.Values[2]), fmtNum(zref), scaling))
	} else {
		tv := m.vals["tensor"]
		names := []string{"nn", "ee", "dd", "ne", "nd", "ed"}
		tm, err := tv.mapping(append(names, "source")...)
		if err != nil {
			return err
		}
		tsrc, err := tm.source()
		if err != nil {
			return err
		}
		if tsrc == "" {
			tsrc = src
		}
		var c [6]float64
		for i, k := range names {
			kv, ok := tm.get(k)
			if !ok {
				return tm.missing(k, " (a tensor gives all six of nn, ee, dd, ne, nd, ed in MPa, compression positive)")
			}
			if c[i], err = kv.numberIn(interval{lo: -MaxStress, hi: MaxStress, unit: "MPa"}); err != nil {
				return err
			}
			s.param("stress", "σ"+k, c[i], "MPa", tsrc, false)
		}
		t, err := insitu.Components(c[0], c[1], c[2], c[3], c[4], c[5])
		if err != nil {
			return tv.errf("%v", err)
		}
		if model, err = insitu.NewMeasuredModel(t, zref, scaling, s.Water); err != nil {
			return m.parent.errf("%v", err)
		}
		s.summary = append(s.summary, fmt.Sprintf("measured tensor at %s m, %s", fmtNum(zref), scaling))
	}
	s.Model = model
	return nil
}
