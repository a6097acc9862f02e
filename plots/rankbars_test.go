package plots

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

func TestRankOrder(t *testing.T) {
	// Inputs by |ρ|, largest first, undefined last, cut to MaxInputs.
	r := RankRow{Inputs: []string{"a", "b", "c", "d"}, Rho: []float64{0.1, -0.7, math.NaN(), 0.3}}
	b := &RankBars{MaxInputs: 3}
	if got := fmt.Sprint(b.order(r)); got != "[1 3 0]" {
		t.Errorf("order %s, want [1 3 0]", got)
	}
}

func TestRankBarsFit(t *testing.T) {
	// At its own height every bar is drawn, each with its value, and the
	// key says nothing is left out; on 8 × 8 cm fewer are drawn, the first
	// planes and their inputs of largest |ρ|, and the key says so.
	b := demoRankBars(t)
	const w = 19 * vg.Centimeter
	h := b.Height(w)
	texts := func(w, h vg.Length) string {
		doc, err := readSVG(svgOf(t, b, w, h))
		if err != nil {
			t.Fatal(err)
		}
		var all []string
		for _, x := range doc.texts {
			all = append(all, x.text)
		}
		return "|" + strings.Join(all, "|") + "|"
	}
	t.Run("own height", func(t *testing.T) {
		got := texts(w, h)
		if b.shown != b.all() {
			t.Errorf("shows %+v at %v, want %+v", b.shown, h, b.all())
		}
		if strings.Contains(got, "for want of room") {
			t.Error("the key says bars are left out")
		}
		for _, r := range b.Rows {
			for _, j := range b.order(r) {
				if v := signed2(r.Rho[j]); !math.IsNaN(r.Rho[j]) && !strings.Contains(got, v) {
					t.Errorf("%s %s: value %s not written", r.Plane, r.Inputs[j], v)
				}
			}
		}
	})
	t.Run("8x8cm", func(t *testing.T) {
		got := texts(8*vg.Centimeter, 8*vg.Centimeter)
		if b.bars(b.shown) >= b.bars(b.all()) {
			t.Errorf("shows %+v on 8 × 8 cm, all of %+v", b.shown, b.all())
		}
		if !strings.Contains(got, "for want of room") {
			t.Error("the key does not say bars are left out")
		}
		for i, r := range b.Rows {
			if strings.Contains(got, "|"+r.Plane+"|") != (i < b.shown.planes) {
				t.Errorf("plane %s (%d): shown is %v; want the first %d only", r.Plane, i, !(i < b.shown.planes), b.shown.planes)
			}
		}
	})
}
