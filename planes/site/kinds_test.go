package site

import (
	"errors"
	"strings"
	"testing"
)

// TestErrorKinds checks that each kind of mistake comes back as a *Error of
// that kind, with its file, line and key, compared as values rather than by
// the words of the message.
func TestErrorKinds(t *testing.T) {
	for _, c := range []struct {
		name string
		yaml string
		want Error // File, Line, Key and Err compared; Msg not
	}{
		{"unknown key", minimal + "planes_fil: p.csv\n", Error{File: "k.yaml", Line: 6, Key: "planes_fil", Err: ErrUnknownKey}},
		{"missing key", "site: t\nstress:\n  vertical: {density: 2700}\n  shmax: {ratio: 1.3}\n  shmin: {ratio: 0.8}\n", Error{File: "k.yaml", Line: 4, Key: "stress.shmax", Err: ErrMissing}},
		{"not a number", strings.Replace(minimal, "ratio: 1.3", "ratio: high", 1), Error{File: "k.yaml", Line: 4, Key: "stress.shmax.ratio", Err: ErrNotNumber}},
		{"out of range", strings.Replace(minimal, "ratio: 0.8", "ratio: -0.8", 1), Error{File: "k.yaml", Line: 5, Key: "stress.shmin.ratio", Err: ErrRange}},
		{"given twice", minimal + "site: u\n", Error{File: "k.yaml", Line: 6, Key: "site", Err: ErrDuplicate}},
		{"conflict", strings.Replace(minimal, "{density: 2700}", "{density: 2700, gradient: 0.026}", 1), Error{File: "k.yaml", Line: 3, Key: "stress.vertical.density", Err: ErrConflict}},
		{"wrong type", minimal + "planes: {name: A}\n", Error{File: "k.yaml", Line: 6, Key: "planes", Err: ErrType}},
		{"syntax", "site: [\n", Error{File: "k.yaml", Err: ErrSyntax}},
		{"empty", "", Error{File: "k.yaml", Err: ErrEmpty}},
	} {
		t.Run(c.name, func(t *testing.T) {
			_, err := Parse([]byte(c.yaml), "k.yaml")
			var e *Error
			if !errors.As(err, &e) {
				t.Fatalf("error %v is not a *site.Error", err)
			}
			if !errors.Is(err, c.want.Err) {
				t.Errorf("error %q is not %v", err, c.want.Err)
			}
			got := Error{File: e.File, Line: e.Line, Key: e.Key, Err: e.Err}
			if c.want.Err == ErrSyntax || c.want.Err == ErrEmpty {
				got.Line = 0 // the YAML library's line for a syntax error is its own
			}
			if got != c.want {
				t.Errorf("got %+v, want %+v (%q)", got, c.want, err)
			}
		})
	}
}
