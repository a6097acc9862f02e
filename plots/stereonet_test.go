package plots

import (
	"fmt"
	"io"
	"regexp"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

func TestNorthSouthTraceNamed(t *testing.T) {
	// A plane striking north–south has its great circle's ends at N and S;
	// its name must still be written there (and at its pole), at every size,
	// among few poles and among all the demo's.
	for _, n := range []int{NameAll - 1, -1} {
		for _, sz := range layoutSizes {
			t.Run(fmt.Sprintf("%d/%gx%g", n, sz[0], sz[1]), func(t *testing.T) {
				w, h := vg.Length(sz[0])*vg.Centimeter, vg.Length(sz[1])*vg.Centimeter
				s := withNorthSouth(t, demoNet(t, SlipTendency, EqualArea, n, unstable, w, h))
				doc, err := readSVG(svgOf(t, s, w, h))
				if err != nil {
					t.Fatal(err)
				}
				count := 0
				for _, x := range doc.texts {
					if x.text == "NS-60" && !strings.EqualFold(x.fill, "#FFFFFF") {
						count++
					}
				}
				if count != 2 {
					t.Errorf("NS-60 written %d times, want 2: at its pole and at its great circle", count)
				}
			})
		}
	}
}

func TestBandsStepped(t *testing.T) {
	// The background is stepped: one colour per band between the contour
	// levels (and FS = 1 where the bar shows FS), lighter towards the
	// unstable end, every band its own colour.
	for _, m := range []Measure{SlipTendency, FactorOfSafety, DilationTendency} {
		t.Run(m.String(), func(t *testing.T) {
			s := demoStereonet()
			s.Measure = m
			s.Field = NewField(s.State, s.Criterion, m, s.Proj, 61)
			lo, hi := s.Scale()
			edges, fills := s.bands(lo, hi)
			if len(fills) != len(edges)+1 {
				t.Fatalf("%d fills for %d edges", len(fills), len(edges))
			}
			if m == FactorOfSafety && lo < 1 && !contains(edges, 1) {
				t.Errorf("edges %v lack FS = 1", edges)
			}
			for k := 1; k < len(fills); k++ {
				// Lightness rises with the band for Ts and Td, falls for FS.
				up := oklabL(fills[k]) > oklabL(fills[k-1])
				if up != m.HighIsUnstable() {
					t.Errorf("band %d (%v) is not %s than band %d", k, fills[k], map[bool]string{true: "lighter", false: "darker"}[m.HighIsUnstable()], k-1)
				}
			}
			// Every node takes its band's colour.
			for j := range s.Field.N {
				for i := range s.Field.N {
					v := s.Field.Values[j*s.Field.N+i]
					k := bandOf(v, edges)
					if k > 0 && v < edges[k-1] || k < len(edges) && v >= edges[k] {
						t.Fatalf("node value %v put in band %d of %v", v, k, edges)
					}
				}
			}
		})
	}
}

func contains(vs []float64, x float64) bool {
	for _, v := range vs {
		if v == x {
			return true
		}
	}
	return false
}

var pathD = regexp.MustCompile(`<path d="([^"]*)" style="fill:#050505"`)

func TestAxisSymbolsAreHexagons(t *testing.T) {
	// The principal axes have symbols of this project's own: hexagons (six
	// corners), not squares or diamonds (four).
	data := svgOf(t, demoStereonet(), 19*vg.Centimeter, 13.5*vg.Centimeter)
	ms := pathD.FindAllStringSubmatch(string(data), -1)
	if len(ms) < 3+3 { // at least one per axis on the net, and the key's three
		t.Fatalf("%d axis symbols", len(ms))
	}
	for _, m := range ms {
		corners := map[string]bool{}
		for _, p := range regexp.MustCompile(`[ML]([-0-9.]+,[-0-9.]+)`).FindAllStringSubmatch(m[1], -1) {
			corners[p[1]] = true
		}
		if len(corners) != 6 {
			t.Errorf("axis symbol with %d corners: %s", len(corners), m[1])
		}
	}
}

// BenchmarkDrawSVG times laying out and drawing figures as SVG at the
// default size, their fields computed beforehand: the small test figures,
// and the demo's stereonet (139 poles) and Mohr diagram.
func BenchmarkDrawSVG(b *testing.B) {
	for _, c := range []struct {
		name string
		fig  Figure
	}{
		{"stereonet", demoStereonet()}, {"mohr", demoMohr()}, {"density", demoDensity()},
		{"stereonet-demo", demoNet(b, SlipTendency, EqualArea, -1, unstable, benchW, benchH)}, {"mohr-demo", demoMohrOf(b, -1)},
	} {
		b.Run(c.name, func(b *testing.B) {
			for b.Loop() {
				if err := Write(c.fig, benchW, benchH, "svg", io.Discard); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
