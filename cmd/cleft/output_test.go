package main

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"cleft/plots"
)

// TestFiguresConcurrent checks that figures, which draws the figures
// concurrently, writes what drawing them one after the other gives: the
// same bytes in every file, the same SVG for the report and the same list
// of files in the same order.
func TestFiguresConcurrent(t *testing.T) {
	s, err := loadSite(true, "")
	if err != nil {
		t.Fatal(err)
	}
	a, err := screenAll(s)
	if err != nil {
		t.Fatal(err)
	}
	figs := a.figures()
	out := &outputs{dir: t.TempDir()}
	if err := out.figures(figs); err != nil {
		t.Fatal(err)
	}
	var want []string
	for _, f := range figs {
		for _, format := range []string{"svg", "png"} {
			p := filepath.Join(out.dir, f.file+"."+format)
			want = append(want, p)
			var b bytes.Buffer
			if err := plots.Write(f.fig, f.w, f.h, format, &b); err != nil {
				t.Fatal(err)
			}
			got, err := os.ReadFile(p)
			if err != nil {
				t.Fatal(err)
			}
			if !bytes.Equal(got, b.Bytes()) {
				t.Errorf("%s differs from the figure drawn alone", filepath.Base(p))
			}
			if format == "svg" && !bytes.Equal(f.svg, b.Bytes()) {
				t.Errorf("%s: the SVG kept for the report differs", f.file)
			}
		}
	}
	if len(out.wrote) != len(want) {
		t.Fatalf("wrote %v, want %v", out.wrote, want)
	}
	for i := range want {
		if out.wrote[i] != want[i] {
			t.Errorf("file %d: %s, want %s", i, out.wrote[i], want[i])
		}
	}
}
