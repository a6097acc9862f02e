package tunnel

import (
	"reflect"
	"testing"

	"cleft/planes"
)

func TestArcs(t *testing.T) {
	// Runs of wall points every 10° (derived by hand from the point lists).
	C, S := planes.Critical, planes.Stable
	mk := func(on ...int) []planes.PlaneState {
		st := make([]planes.PlaneState, 36)
		for i := range st {
			st[i] = S
		}
		for _, k := range on {
			st[k] = C
		}
		return st
	}
	for _, c := range []struct {
		name string
		on   []int
		want []Arc
	}{
		{"none", nil, nil},
		{"one run", []int{3, 4, 5}, []Arc{{30, 50}}},
		{"through the crown", []int{35, 0, 1}, []Arc{{350, 10}}},
		{"single points", []int{9, 27}, []Arc{{90, 90}, {270, 270}}},
	} {
		t.Run(c.name, func(t *testing.T) {
			if got := Arcs(mk(c.on...), C); !reflect.DeepEqual(got, c.want) {
				t.Errorf("%v: %v, want %v", c.on, got, c.want)
			}
		})
	}
	all := make([]planes.PlaneState, 36)
	for i := range all {
		all[i] = C
	}
	if got := Arcs(all, C); !reflect.DeepEqual(got, []Arc{{0, 350}}) {
		t.Errorf("all: %v", got)
	}
}
