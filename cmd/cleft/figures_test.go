package main

import (
	"bytes"
	"encoding/xml"
	"flag"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/plot/cmpimg"
)

// regen reports whether -regen was given: the flag is gonum's cmpimg's,
// which registers it for the same purpose.
func regen() bool {
	f := flag.Lookup("regen")
	return f != nil && f.Value.String() == "true"
}

// TestFigureGoldens draws the demo's stereonet and Mohr diagram and compares
// them with testdata/*_golden.svg. Run with -regen to rewrite them, and look
// at the PNGs (cleft assess --example) before committing a new golden.
func TestFigureGoldens(t *testing.T) {
	for _, c := range []struct {
		golden string
		args   []string
	}{
		{"stereonet_golden.svg", []string{"plot", "--example", "--kind", "stereonet"}},
		{"mohr_golden.svg", []string{"plot", "--example", "--kind", "mohr"}},
	} {
		t.Run(c.golden, func(t *testing.T) {
			out := filepath.Join(t.TempDir(), "fig.svg")
			if code, _, stderr := cleft(t, "", append(c.args, "--out", out)...); code != 0 {
				t.Fatalf("exit %d: %s", code, stderr)
			}
			got, err := os.ReadFile(out)
			if err != nil {
				t.Fatal(err)
			}
			path := filepath.Join(testdata, c.golden)
			if regen() {
				if err := os.WriteFile(path, got, 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (run go test ./cmd/cleft -run Golden -regen)", err)
			}
			if ok, err := cmpimg.Equal("svg", got, want); err != nil || !ok {
				t.Errorf("%s differs from the golden (%v); if the change is wanted, look at it and run -regen", c.golden, err)
			}
		})
	}
}

// svgCount counts occurrences of s in an SVG after checking that it parses.
func svgParse(t *testing.T, data []byte) {
	t.Helper()
	d := xml.NewDecoder(bytes.NewReader(data))
	for {
		_, err := d.Token()
		if err == io.EOF {
			return
		}
		if err != nil {
			t.Fatalf("SVG does not parse: %v", err)
		}
	}
}

func TestStereonetStructure(t *testing.T) {
	// Structural checks on the SVG: one marker per plane (each marker, and
	// each of the three legend markers, is outlined once in the colour
	// #111111, used for nothing else), the principal-axis symbols (#050505:
	// horizontal axes show at both ends), one raster, the colour bar.
	dir := t.TempDir()
	out := filepath.Join(dir, "s.svg")
	if code, _, stderr := cleft(t, "", "plot", "--example", "--measure", "dilation-tendency", "--out", out); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	data, _ := os.ReadFile(out)
	svgParse(t, data)
	s := string(data)
	const planes = 139
	if n := strings.Count(s, "stroke:#111111"); n != planes+3 {
		t.Errorf("%d plane markers, want %d planes + 3 in the legend", n, planes)
	}
	// Demo axes: σ1 and σ3 horizontal (two ends each), σ2 vertical.
	if n := strings.Count(s, "fill:#050505"); n != 5+3 {
		t.Errorf("%d axis symbols, want 5 on the net + 3 in the legend", n)
	}
	for _, lbl := range []string{">σ1<", ">σ2<", ">σ3<"} {
		if !strings.Contains(s, lbl) {
			t.Errorf("axis label %s missing", lbl)
		}
	}
	if n := strings.Count(s, "<image"); n != 1 {
		t.Errorf("%d raster images, want the one tendency field", n)
	}
	for _, want := range []string{"dilation tendency Td", "more prone to open", ">1.0<", ">0.0<", "equal-area", "N<"} {
		if !strings.Contains(s, want) {
			t.Errorf("SVG lacks %q", want)
		}
	}
}

func TestPlotFormatsAndErrors(t *testing.T) {
	dir := t.TempDir()
	for _, kind := range []string{"stereonet", "mohr"} {
		for _, ext := range []string{"png", "svg", "pdf"} {
			out := filepath.Join(dir, kind+"."+ext)
			code, _, stderr := cleft(t, "", "plot", "--example", "--kind", kind, "--projection", "equal-angle", "--grid", "--out", out, "--width", "12", "--height", "9")
			if code != 0 {
				t.Fatalf("%s %s: exit %d: %s", kind, ext, code, stderr)
			}
			data, _ := os.ReadFile(out)
			magic := map[string]string{"png": "\x89PNG", "svg": "<?xml", "pdf": "%PDF"}[ext]
			if !bytes.HasPrefix(data, []byte(magic)) {
				t.Errorf("%s: does not start with %q", out, magic)
			}
		}
	}
	for _, args := range [][]string{
		{"plot", "--example", "--out", "x.gif"},
		{"plot", "--example"},
		{"plot", "--example", "--kind", "rose", "--out", "x.png"},
		{"plot", "--example", "--measure", "wobble", "--out", "x.png"},
		{"plot", "--example", "--projection", "mercator", "--out", "x.png"},
		{"plot", "--example", "--great-circles", "NOPE", "--out", "x.png"},
		{"plot", "--example", "--depth", "-3", "--out", "x.png"},
	} {
		if code, _, stderr := cleft(t, "", args...); code != 2 {
			t.Errorf("%v: exit %d, want 2 (%s)", args, code, stderr)
		}
	}
}
