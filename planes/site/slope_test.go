package site

import (
	"errors"
	"reflect"
	"testing"

	"cleft/planes/slope"
)

func TestSlopeWaterAndLoads(t *testing.T) {
	const face = "slope:\n  face: {dip: 65, dip_direction: 210}\n  height: 30\n"
	t.Run("given", func(t *testing.T) {
		s, err := Parse([]byte(minimal+"water: {table: 12}\n"+face+
			"  water: [0, 4.5, table, full]\n  bolt: {per_metre: 0.2, per_wedge: 3, angle_to_plane: 40, trend: 30}\n  seismic: 0.12\n  target_fs: 1.3\n"), "t.yaml")
		if err != nil {
			t.Fatal(err)
		}
		sl := s.Slope
		want := []slope.Water{{}, {Depth: 4.5}, {Kind: slope.WaterTable, Depth: 12}, {Kind: slope.WaterFull}}
		if !reflect.DeepEqual(sl.Water, want) {
			t.Errorf("water %+v, want %+v", sl.Water, want)
		}
		if ld := sl.Load; ld.Bolt != 0.2 || sl.WedgeBolt != 3 || ld.Plunge != 40 || !ld.ToPlane || ld.Trend != 30 || !ld.HasTrend || ld.Seismic != 0.12 || sl.TargetFS != 1.3 {
			t.Errorf("loads %+v, wedge bolt %v, target %v", ld, sl.WedgeBolt, sl.TargetFS)
		}
	})
	t.Run("defaults", func(t *testing.T) {
		s, err := Parse([]byte(minimal+"water: {table: 12}\n"+face), "t.yaml")
		if err != nil {
			t.Fatal(err)
		}
		sl := s.Slope
		want := []slope.Water{{}, {Kind: slope.WaterTable, Depth: 12}, {Kind: slope.WaterFull}}
		if !reflect.DeepEqual(sl.Water, want) || sl.Load.Plunge != DefaultBoltPlunge || sl.Load.Bolt != 0 || sl.Load.Seismic != 0 || sl.TargetFS != slope.DefaultTargetFS {
			t.Errorf("water %+v, load %+v, target %v", sl.Water, sl.Load, sl.TargetFS)
		}
		d, _ := Parse([]byte(minimal+"water: {dry: true}\n"+face), "t.yaml")
		if want := []slope.Water{{}, {Kind: slope.WaterFull}}; !reflect.DeepEqual(d.Slope.Water, want) {
			t.Errorf("dry site: water %+v, want %+v", d.Slope.Water, want)
		}
	})
	t.Run("a table with dry water", func(t *testing.T) {
		_, err := Parse([]byte(minimal+"water: {dry: true}\n"+face+"  water: [table]\n"), "t.yaml")
		if !errors.Is(err, ErrConflict) {
			t.Errorf("got %v, want a conflict", err)
		}
	})
}
