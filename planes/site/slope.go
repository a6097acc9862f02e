package site

import (
	"fmt"
	"math"

	"cleft/insitu"
	"cleft/planes"
	"cleft/planes/slope"
)

func (s *Site) readSlope(v node) error {
	m, err := v.mapping("face", "top", "height", "friction_angle", "lateral_limit", "toppling_limit", "unit_weight", "water", "tension_crack", "bolt", "seismic", "target_fs", "source")
	if err != nil {
		return err
	}
	sl := &slope.Slope{}
	var defaults []string
	orient := func(key string) (planes.Orientation, bool, error) {
		ov, ok := m.get(key)
		if !ok {
			return planes.Orientation{}, false, nil
		}
		om, err := ov.mapping("dip", "dip_direction")
		if err != nil {
			return planes.Orientation{}, true, err
		}
		for _, k := range []string{"dip", "dip_direction"} {
			if !om.has(k) {
				return planes.Orientation{}, true, om.missing(k, "")
			}
		}
		dip, err := om.vals["dip"].numberIn(unit(interval{lo: 0, hi: 90}, "°"))
		if err != nil {
			return planes.Orientation{}, true, err
		}
		dd, err := om.vals["dip_direction"].numberIn(unit(interval{lo: 0, hi: 360}, "°"))
		if err != nil {
			return planes.Orientation{}, true, err
		}
		o, _ := planes.New(dip, dd)
		return o, true, nil
	}
	var ok bool
	if sl.Face, ok, err = orient("face"); err != nil {
		return err
	} else if !ok {
		return m.missing("face", " ({dip, dip_direction} of the cut face)")
	}
	if sl.Face.Dip() == 0 {
		return m.vals["face"].errf("a face dipping 0° is not a slope")
	}
	if sl.Top, ok, err = orient("top"); err != nil {
		return err
	} else if !ok {
		sl.Top = planes.MustNew(0, sl.Face.DipDirection())
		defaults = append(defaults, "top = horizontal")
	}
	hv, ok := m.get("height")
	if !ok {
		return m.missing("height", " (m, toe to crest)")
	}
	if sl.Height, err = hv.numberIn(interval{lo: 0, hi: MaxDepth, openLo: true, unit: "m"}); err != nil {
		return err
	}
	phiDefault := math.Atan(s.Criterion.Friction()) * 180 / math.Pi
	var given bool
	if sl.FrictionAngle, given, err = m.optNumber("friction_angle", interval{lo: 0, hi: 90, openLo: true, openHi: true, unit: "°"}, phiDefault); err != nil {
		return err
	} else if !given {
		defaults = append(defaults, fmt.Sprintf("friction_angle = %.1f° (atan of the site friction %.4g)", phiDefault, s.Criterion.Friction()))
	}
	if sl.LateralLimit, given, err = m.optNumber("lateral_limit", interval{lo: 0, hi: 90, openLo: true, unit: "°"}, 20); err != nil {
		return err
	} else if !given {
		defaults = append(defaults, "lateral_limit = 20°")
	}
	if sl.ToppleLimit, given, err = m.optNumber("toppling_limit", interval{lo: 0, hi: 90, openLo: true, unit: "°"}, sl.LateralLimit); err != nil {
		return err
	} else if !given {
		defaults = append(defaults, fmt.Sprintf("toppling_limit = %g° (the lateral limit)", sl.LateralLimit))
	}
	gm, isGradient := s.Model.(*insitu.GradientModel)
	uv, ok := m.get("unit_weight")
	switch {
	case ok:
		if sl.UnitWeight, err = uv.numberIn(interval{lo: 0, hi: 0.1, openLo: true, unit: "MN/m³"}); err != nil {
			return err
		}
	case isGradient:
		sl.UnitWeight = gm.VerticalGradient // MPa/m is MN/m³
		defaults = append(defaults, fmt.Sprintf("unit_weight = %.5g MN/m³ (the vertical stress gradient)", sl.UnitWeight))
	default:
		return m.missing("unit_weight", " (MN/m³): a measured stress model gives no rock density")
	}
	if defaults, err = s.readSlopeWater(m, sl, defaults); err != nil {
		return err
	}
	if defaults, err = readSlopeLoads(m, sl, defaults); err != nil {
		return err
	}
	if cv, ok := m.get("tension_crack"); ok {
		cm, err := cv.mapping("distance", "depth")
		if err != nil {
			return err
		}
		switch k := cm.present("distance", "depth"); len(k) {
		case 0:
			return cv.errf("give distance (m behind the crest) or depth (m below the upper surface)")
		case 2:
			return cm.vals["depth"].errf("give distance or depth, not both").is(ErrConflict)
		}
		sl.CrackGiven = true
		if dv, ok := cm.get("depth"); ok {
			sl.CrackByDepth = true
			if sl.Crack, err = dv.numberIn(depthRange); err != nil {
				return err
			}
		} else if sl.Crack, err = cm.vals["distance"].numberIn(interval{lo: 0, hi: MaxLength, unit: "m"}); err != nil {
			return err
		}
	} else {
		defaults = append(defaults, "tension_crack = Hoek & Bray's critical depth for each planar block, none in a wedge")
	}
	if c, ok := s.Criterion.(*planes.Coulomb); ok {
		sl.Cohesion = c.Cohesion
	}
	s.Slope = sl
	s.SlopeDefaults = defaults
	return nil
}
