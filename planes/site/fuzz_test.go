package site

import (
	"errors"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"cleft/planes/site/demo"
)

// seeds adds every file of the top-level testdata/good and testdata/bad
// folders matching pattern to the fuzz corpus.
func seeds(f *testing.F, pattern string) {
	for _, dir := range []string{"good", "bad"} {
		files, _ := filepath.Glob(filepath.Join("..", "..", "testdata", dir, pattern))
		for _, name := range files {
			data, err := os.ReadFile(name)
			if err != nil {
				f.Fatal(err)
			}
			f.Add(data)
		}
	}
}

// FuzzParse: any bytes give a site or an *Error naming the file, never a
// panic, and a site that loads has a model and a criterion.
func FuzzParse(f *testing.F) {
	seeds(f, "*.yaml")
	if data, err := fs.ReadFile(demo.FS, demo.Site); err == nil { // slope:, tunnel:, sets:
		f.Add(data)
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		s, err := Parse(data, "fuzz.yaml")
		if err != nil {
			var e *Error
			if !errors.As(err, &e) || e.File != "fuzz.yaml" {
				t.Fatalf("error %v (%T) is not an *Error naming the file", err, err)
			}
			if strings.Contains(err.Error(), "\n") {
				t.Fatalf("error spans lines: %q", err)
			}
			return
		}
		if s.Model == nil || s.Criterion == nil || s.Name == "" {
			t.Fatalf("loaded site lacks a part: %+v", s)
		}
		for _, z := range []float64{0, 1, 150, 3000} {
			st := s.Model.At(z)
			if v := st.Principal.Values; !(v[0] >= v[1] && v[1] >= v[2]) {
				t.Fatalf("principal stresses not sorted at %v m: %v", z, v)
			}
		}
	})
}

// FuzzPlaneReader: any table gives planes within range or an *Error with a
// line, never a panic.
func FuzzPlaneReader(f *testing.F) {
	seeds(f, "*.csv")
	f.Add([]byte("name,dip,dip_direction,depth\nA,45,10,100\n"))
	f.Add([]byte("name,strike,dip\nA,350,90\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		d := planeDefaults{depth: 100, hasDepth: true, coulomb: true}
		r, err := NewPlaneReader(strings.NewReader(string(data)), "fuzz.csv", d)
		if err != nil {
			var e *Error
			if !errors.As(err, &e) {
				t.Fatalf("header error %v (%T) is not an *Error", err, err)
			}
			return
		}
		for range 1000 {
			var p Plane
			err := r.Next(&p)
			if errors.Is(err, io.EOF) {
				return
			}
			if err != nil {
				var e *Error
				if !errors.As(err, &e) || e.Line == 0 {
					t.Fatalf("row error %v (%T) is not an *Error with a line", err, err)
				}
				return
			}
			o := p.Orientation
			if !(o.Dip() >= 0 && o.Dip() <= 90 && o.DipDirection() >= 0 && o.DipDirection() < 360 && p.Depth >= 0) || p.Name == "" {
				t.Fatalf("plane out of range: %+v", p)
			}
			if len(p.Extras) != len(r.ExtraNames) {
				t.Fatalf("%d extras for %d extra columns", len(p.Extras), len(r.ExtraNames))
			}
		}
	})
}
