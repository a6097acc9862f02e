package site

import (
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"unicode/utf8"

	"cleft/planes"
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

// checkMessage fails unless err is an *Error naming file, on one line of at
// most MaxMessage characters.
func checkMessage(t *testing.T, err error, file string) {
	t.Helper()
	var e *Error
	if !errors.As(err, &e) || e.File != file {
		t.Fatalf("error %v (%T) is not an *Error naming %s", err, err, file)
	}
	msg := err.Error()
	if strings.ContainsAny(msg, "\n\r") || utf8.RuneCountInString(msg) > MaxMessage || !utf8.ValidString(msg) {
		t.Fatalf("error is not one line of at most %d characters (%d): %.120q", MaxMessage, utf8.RuneCountInString(msg), msg)
	}
}

// checkResult fails when a resolved plane holds ±Inf anywhere, or NaN in a
// value that is always defined (the stresses): the tables would show an
// empty cell, or a figure NaN, for a value that exists.
func checkResult(t *testing.T, p *Plane, r *planes.Result) {
	t.Helper()
	for i, v := range []float64{r.PorePressure, r.Normal, r.Shear, r.EffectiveNormal} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("plane %+v: stress %d is %v: %+v", p, i, v, r)
		}
	}
	for i, v := range []float64{r.SlipTendency, r.NormalisedSlip, r.DilationTendency, r.FactorOfSafety, r.PressureToSlip, r.Rake} {
		if math.IsInf(v, 0) {
			t.Fatalf("plane %+v: value %d is %v: %+v", p, i, v, r)
		}
	}
}

// FuzzParse: any bytes give a site or a one-line *Error naming the file of
// at most MaxMessage characters, never a panic; a site that loads has a
// model and a criterion, finite sorted principal stresses at every depth it
// accepts, and its planes resolve to finite stresses.
func FuzzParse(f *testing.F) {
	seeds(f, "*.yaml")
	if data, err := fs.ReadFile(demo.FS, demo.Site); err == nil { // slope:, tunnel:, sets:
		f.Add(data)
	}
	f.Add([]byte("site: s\n\"a\\nb\": 1\n"))
	f.Add([]byte("site: \"s\\x01\"\nstress: {tensor: {nn: 1e300, ee: 1, dd: 1, ne: 0, nd: 0, ed: 0}}\n"))
	f.Add([]byte("site: s\ndepth: 20000\nstress:\n  vertical: {gradient: 0.1}\n  shmax: {ratio: 100, azimuth: 0}\n  shmin: {ratio: 100}\nwater: {gradient: 0.1, table: 0}\nplanes: [{name: A, dip: 90, dip_direction: 360, pore_pressure: 10000, cohesion: 10000, friction: 10}]\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		s, err := Parse(data, "fuzz.yaml")
		if err != nil {
			checkMessage(t, err, "fuzz.yaml")
			return
		}
		if s.Model == nil || s.Criterion == nil || s.Name == "" {
			t.Fatalf("loaded site lacks a part: %+v", s)
		}
		for _, z := range []float64{0, 1, 150, 3000, MaxDepth} {
			st := s.Model.At(z)
			v := st.Principal.Values
			if !(v[0] >= v[1] && v[1] >= v[2]) || math.IsInf(v[0], 0) || math.IsInf(v[2], 0) || math.IsInf(st.PorePressure, 0) {
				t.Fatalf("principal stresses not finite and sorted at %v m: %v, Pp %v", z, v, st.PorePressure)
			}
		}
		rv := s.Resolver()
		for i := range s.Planes {
			var r planes.Result
			rv.Resolve(&s.Planes[i], &r)
			checkResult(t, &s.Planes[i], &r)
		}
	})
}

// FuzzPlaneReader: any table gives planes within range or a one-line
// *Error (with a line, for a row) of at most MaxMessage characters, never a
// panic; names are clean text and every plane resolves to finite stresses.
func FuzzPlaneReader(f *testing.F) {
	seeds(f, "*.csv")
	f.Add([]byte("name,dip,dip_direction,depth\nA,45,10,100\n"))
	f.Add([]byte("name,strike,dip\nA,350,90\n"))
	f.Add([]byte("\ufeff\"name\",dip,dip_direction\r\nA,60,120\r\n"))
	f.Add([]byte("name,dip,dip_direction,fricton\nA,60,120,0.3\n"))
	f.Add([]byte("name;dip;dip_direction\nA;60;120\n"))
	f.Add([]byte("name,dip,dip_direction\nA,65/120,120\n\"B,1,2\n"))
	f.Add([]byte("name,dip,dip_direction,depth,pore_pressure,cohesion,friction\nA,90,360,20000,10000,10000,10\n"))
	s, err := Parse([]byte("site: f\ndepth: 100\nstress:\n  vertical: {gradient: 0.027}\n  shmax: {ratio: 1.3, azimuth: 65}\n  shmin: {ratio: 0.8}\n"), "f.yaml")
	if err != nil {
		f.Fatal(err)
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		d := planeDefaults{depth: 100, hasDepth: true, coulomb: true}
		r, err := NewPlaneReader(strings.NewReader(string(data)), "fuzz.csv", d)
		if err != nil {
			checkMessage(t, err, "fuzz.csv")
			return
		}
		rv := s.Resolver()
		for range 1000 {
			var p Plane
			err := r.Next(&p)
			if errors.Is(err, io.EOF) {
				return
			}
			if err != nil {
				checkMessage(t, err, "fuzz.csv")
				var e *Error
				if errors.As(err, &e) && e.Line == 0 {
					t.Fatalf("row error %v has no line", err)
				}
				return
			}
			o := p.Orientation
			if !(o.Dip() >= 0 && o.Dip() <= 90 && o.DipDirection() >= 0 && o.DipDirection() < 360 && p.Depth >= 0 && p.Depth <= MaxDepth) || p.Name == "" || badText(p.Name, false) >= 0 {
				t.Fatalf("plane out of range: %+v", p)
			}
			if len(p.Extras) != len(r.ExtraNames) {
				t.Fatalf("%d extras for %d extra columns", len(p.Extras), len(r.ExtraNames))
			}
			for _, e := range p.Extras {
				if badText(e, true) >= 0 {
					t.Fatalf("carried value %q is not clean text", e)
				}
			}
			var res planes.Result
			rv.Resolve(&p, &res)
			checkResult(t, &p, &res)
		}
	})
}

// FuzzGuard: on any input the CSV reader reads whole through the guard
// exactly the records it reads without it, when no row is longer than
// MaxRow (so the guard's quote and comment tracking never stops a valid
// table), apart from a leading byte-order mark, which the guard drops.
func FuzzGuard(f *testing.F) {
	seeds(f, "*.csv")
	f.Add([]byte("# it's \"quoted\na,\"b\nc\",d\n\"e\"\"f\",g\n"))
	f.Add([]byte("a, \"b\"\r\n#\"\nc,d"))
	f.Fuzz(func(t *testing.T, data []byte) {
		data = bytes.TrimPrefix(data, []byte("\ufeff"))
		plain := csv.NewReader(bytes.NewReader(data))
		plain.TrimLeadingSpace, plain.Comment, plain.FieldsPerRecord = true, '#', -1
		want, err := plain.ReadAll()
		if err != nil || len(data) > MaxRow {
			return
		}
		cr := newGuard(bytes.NewReader(data), "f.csv").csvReader()
		cr.ReuseRecord = false
		got, err := cr.ReadAll()
		if err != nil {
			t.Fatalf("the guard stopped a valid table: %v", err)
		}
		if fmt.Sprint(got) != fmt.Sprint(want) {
			t.Fatalf("records differ:\n%q\n%q", got, want)
		}
	})
}
