package site

import (
	"fmt"

	"cleft/planes/slope"
)

// readSlopeWater reads slope.water: a list of water cases, each a head in
// m (a number ≥ 0), "table" (the site's water table below the crest) or
// "full"; by default dry, the site's table (unless the water is dry) and
// full.
func (s *Site) readSlopeWater(m *fields, sl *slope.Slope, defaults []string) ([]string, error) {
	wv, ok := m.get("water")
	if !ok {
		sl.Water = []slope.Water{{}}
		d := "water = [0, full]"
		if !s.Water.Dry {
			sl.Water = append(sl.Water, slope.Water{Kind: slope.WaterTable, Depth: s.Water.Table})
			d = fmt.Sprintf("water = [0, table (%g m below the crest), full]", s.Water.Table)
		}
		sl.Water = append(sl.Water, slope.Water{Kind: slope.WaterFull})
		return append(defaults, d), nil
	}
	if wv.n != nil && wv.n.Kind != 0 && wv.n.Tag == "!!map" {
		return defaults, wv.errf("want a list of water cases (m of water, table, full); tension_crack_fill was replaced by depths of water in m").is(ErrType)
	}
	items, err := wv.list()
	if err != nil {
		return defaults, err
	}
	if len(items) == 0 {
		return defaults, wv.errf("give at least one water case: m of water, table or full").is(ErrEmpty)
	}
	if len(items) > MaxWaterCases {
		return defaults, wv.errf("%d water cases: at most %d", len(items), MaxWaterCases).is(ErrLimit)
	}
	for _, it := range items {
		if it.n != nil && it.n.Tag == "!!str" {
			w, err := it.oneOf("table", "full")
			if err != nil {
				return defaults, err
			}
			if w == "full" {
				sl.Water = append(sl.Water, slope.Water{Kind: slope.WaterFull})
				continue
			}
			if s.Water.Dry {
				return defaults, it.errf("the site's water is dry: it has no table").is(ErrConflict)
			}
			sl.Water = append(sl.Water, slope.Water{Kind: slope.WaterTable, Depth: s.Water.Table})
			continue
		}
		h, err := it.numberIn(unit(nonNegative, "m"))
		if err != nil {
			return defaults, err
		}
		sl.Water = append(sl.Water, slope.Water{Depth: h})
	}
	return defaults, nil
}

// readSlopeLoads reads slope.bolt, slope.seismic and slope.target_fs.
func readSlopeLoads(m *fields, sl *slope.Slope, defaults []string) ([]string, error) {
	var err error
	var given bool
	if sl.Load.Seismic, given, err = m.optNumber("seismic", interval{lo: 0, hi: 1, openHi: true}, 0); err != nil {
		return defaults, err
	} else if !given {
		defaults = append(defaults, "seismic = 0")
	}
	if sl.TargetFS, given, err = m.optNumber("target_fs", positive, slope.DefaultTargetFS); err != nil {
		return defaults, err
	} else if !given {
		defaults = append(defaults, fmt.Sprintf("target_fs = %g", slope.DefaultTargetFS))
	}
	sl.Load.Plunge = DefaultBoltPlunge
	bv, ok := m.get("bolt")
	if !ok {
		return append(defaults, fmt.Sprintf("bolt = none (a bolt for target_fs pulls into the slope %g° below the horizontal)", DefaultBoltPlunge)), nil
	}
	bm, err := bv.mapping("per_metre", "per_wedge", "plunge", "angle_to_plane", "trend")
	if err != nil {
		return defaults, err
	}
	if sl.Load.Bolt, _, err = bm.optNumber("per_metre", unit(nonNegative, "MN/m"), 0); err != nil {
		return defaults, err
	}
	if sl.WedgeBolt, _, err = bm.optNumber("per_wedge", unit(nonNegative, "MN"), 0); err != nil {
		return defaults, err
	}
	switch k := bm.present("plunge", "angle_to_plane"); len(k) {
	case 2:
		return defaults, bm.vals["angle_to_plane"].errf("give plunge or angle_to_plane, not both").is(ErrConflict)
	case 0:
		defaults = append(defaults, fmt.Sprintf("bolt.plunge = %g°", DefaultBoltPlunge))
	}
	if v, ok := bm.get("plunge"); ok {
		if sl.Load.Plunge, err = v.numberIn(unit(interval{lo: -90, hi: 90}, "°")); err != nil {
			return defaults, err
		}
	}
	if v, ok := bm.get("angle_to_plane"); ok {
		sl.Load.ToPlane = true
		if sl.Load.Plunge, err = v.numberIn(unit(interval{lo: 0, hi: 180}, "°")); err != nil {
			return defaults, err
		}
	}
	if v, ok := bm.get("trend"); ok {
		sl.Load.HasTrend = true
		if sl.Load.Trend, err = v.numberIn(unit(interval{lo: 0, hi: 360}, "°")); err != nil {
			return defaults, err
		}
	} else {
		defaults = append(defaults, "bolt.trend = into the slope, opposite each block's sliding direction")
	}
	return defaults, nil
}

// DefaultBoltPlunge is the angle below the horizontal of a bolt that the
// slope does not orient, ° (common practice: bolts are drilled a little
// downwards so that they can be grouted).
const DefaultBoltPlunge = 15.0
