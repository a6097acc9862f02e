package plots

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

func TestSeriesStylesDiffer(t *testing.T) {
	// Every series of the first 120 has its own colour, dashes and marker
	// together (6, 5 and 8 choices taken in turn), so that no two read
	// alike in grey print or in colour.
	seen := map[string]int{}
	for i := range 120 {
		line, glyph := seriesStyle(i, 1)
		k := fmt.Sprintf("%v|%v|%T", line.Color, line.Dashes, glyph.Shape)
		if j, ok := seen[k]; ok {
			t.Fatalf("series %d and %d share colour, dashes and marker", j, i)
		}
		seen[k] = i
	}
}

func TestMarkersTakeTurns(t *testing.T) {
	// No station is marked by two series, and each series marks stations
	// no closer on the page than the gap asked for.
	for _, c := range []struct {
		series, stations int
		width, gap       float64
	}{{4, 57, 400, 8}, {4, 57, 100, 8}, {1, 10, 200, 5}, {7, 300, 500, 6}, {3, 2, 50, 5}} {
		t.Run(fmt.Sprintf("%d×%d/%gpt", c.series, c.stations, c.width), func(t *testing.T) {
			ch := make([]float64, c.stations)
			for k := range ch {
				ch[k] = float64(25 * k)
			}
			x := func(v float64) vg.Length { return vg.Length(v / math.Max(1, ch[len(ch)-1]) * c.width) }
			stride := markStride(c.series, ch, x, vg.Length(c.gap))
			for k := range ch {
				n := 0
				for i := range c.series {
					if marked(k, i, c.series, stride) {
						n++
					}
				}
				if n > 1 {
					t.Errorf("station %d marked by %d series", k, n)
				}
			}
			step := c.width / float64(max(1, c.stations-1))
			const tol = 1e-9 // pt
			if float64(stride)*step < c.gap-tol {
				t.Errorf("stride %d: markers %.1f pt apart, want %v", stride, float64(stride)*step, c.gap)
			}
		})
	}
}

func TestFSAxis(t *testing.T) {
	// The demo's factors of safety (0.91 to 6.09, S1 and S3 above 4 at
	// most stations) all lie inside the logarithmic axis: none is drawn at
	// an end, so S1 and S3 are drawn at their own values, not together at
	// a ceiling as before. Values past fsTop are drawn at it and keyed.
	p := demoProfile(t)
	a, cl := p.fsAxis()
	if cl.above || cl.below {
		t.Errorf("demo: %+v on [%v, %v], want nothing clipped", cl, a.lo, a.hi)
	}
	for _, s := range p.Series {
		for k, v := range s.FS {
			if !(v >= a.lo && v <= a.hi) {
				t.Errorf("%s at station %d: FS %v outside [%v, %v]", s.Name, k, v, a.lo, a.hi)
			}
		}
	}
	if !a.log || a.lo > 1 || a.hi < 1 {
		t.Errorf("axis %+v: want logarithmic with FS = 1 inside", a)
	}
	big := &TunnelProfile{Chainage: []float64{0, 10}, Cover: []float64{5, 5}, Ratio: []float64{0.1, 0.1},
		Series: []TunnelSeries{{Name: "A", FS: []float64{50, 1e6}, FarBad: []bool{false, false}, WallSlip: []bool{false, false}}}}
	if a, cl := big.fsAxis(); !cl.above || a.hi != fsTop {
		t.Errorf("FS 50 and 1e6: axis to %v, clip %+v; want to %v, clipped", a.hi, cl, fsTop)
	}
	if txt := big.clipText(); !strings.Contains(txt, "FS above 20") {
		t.Errorf("clip key %q", txt)
	}
}

func TestProfileKey(t *testing.T) {
	// A key row for every series, every line, band and shading.
	p := demoProfile(t)
	var rows []string
	for _, r := range p.key().rows {
		rows = append(rows, r.text)
	}
	all := strings.Join(rows, "\n")
	for _, s := range p.Series {
		want := false
		for _, r := range rows {
			want = want || r == s.Name
		}
		if !want {
			t.Errorf("no key row for series %s", s.Name)
		}
	}
	for _, w := range []string{"FS = 1", "onset of spalling", "zone depth limit", "far field: its zone has no bound", "lane: critical or opening in the far field", "lane: critical or opening only at the wall"} {
		if !strings.Contains(all, w) {
			t.Errorf("key lacks %q:\n%s", w, all)
		}
	}
}

func TestWallRuns(t *testing.T) {
	// Runs of wall points every 10°, each standing for ±5°: one through
	// the crown is one arc; all on is the circle.
	on := func(ks ...int) []bool {
		b := make([]bool, 36)
		for _, k := range ks {
			b[k] = true
		}
		return b
	}
	for _, c := range []struct {
		name string
		on   []bool
		want [][2]float64
	}{
		{"none", on(), nil},
		{"one", on(9), [][2]float64{{85, 95}}},
		{"through the crown", on(35, 0, 1, 18), [][2]float64{{175, 185}, {345, 375}}},
		{"all", on(func() []int {
			var a []int
			for k := range 36 {
				a = append(a, k)
			}
			return a
		}()...), [][2]float64{{0, 360}}},
	} {
		t.Run(c.name, func(t *testing.T) {
			got := wallRuns(c.on, 10)
			if fmt.Sprint(got) != fmt.Sprint(c.want) {
				t.Errorf("%v, want %v", got, c.want)
			}
		})
	}
}

func TestWallLabelsClear(t *testing.T) {
	// The crown, sidewall and invert labels and the ring names lie outside
	// the outermost ring, so neither the σθ curve (inside the rings) nor a
	// ring is drawn over them; every one of them is placed.
	w := demoWall(t)
	for _, sz := range layoutSizes {
		t.Run(fmt.Sprintf("%gx%gcm", sz[0], sz[1]), func(t *testing.T) {
			var b bytes.Buffer
			if err := Write(w, vg.Length(sz[0])*vg.Centimeter, vg.Length(sz[1])*vg.Centimeter, "svg", &b); err != nil {
				t.Fatal(err)
			}
			if got, want := len(w.labels), len(wallMarks)+len(w.Sets); got != want || w.dropped != 0 {
				t.Errorf("%d labels placed, %d dropped; want %d, 0", got, w.dropped, want)
			}
			for _, n := range w.labels {
				p := nearest(n.box, w.centre)
				if d := math.Hypot(float64(p.X-w.centre.X), float64(p.Y-w.centre.Y)); d < w.outer {
					t.Errorf("%q comes %.1f pt from the centre, inside the rings (%.1f pt)", n.txt, d, w.outer)
				}
			}
		})
	}
}

// BenchmarkDrawSVGFigures times laying out and drawing the demo's tunnel
// figures, the kinematic net and the chance figures as SVG at 19 × 13.5 cm.
func BenchmarkDrawSVGFigures(b *testing.B) {
	for _, c := range []struct {
		name string
		fig  func(testing.TB) Figure
	}{
		{"kinematic", func(t testing.TB) Figure { return demoKinematic(t) }},
		{"kinematic-crowded", func(t testing.TB) Figure { return crowdedKinematic(t) }},
		{"tunnel-profile", func(t testing.TB) Figure { return demoProfile(t) }},
		{"tunnel-wall", func(t testing.TB) Figure { return demoWall(t) }},
		{"tunnel-section", func(t testing.TB) Figure { return demoSection(t) }},
		{"chance-stereonet", func(t testing.TB) Figure { return demoChanceNet(t) }},
		{"chance-sensitivity", func(t testing.TB) Figure { return demoRankBars(t) }},
	} {
		f := c.fig(b)
		b.Run(c.name, func(b *testing.B) {
			for b.Loop() {
				if err := Write(f, benchW, benchH, "svg", io.Discard); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
