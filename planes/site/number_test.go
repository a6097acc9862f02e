package site

import (
	"strings"
	"testing"
	"unicode/utf8"
)

func TestParseNumber(t *testing.T) {
	// Decimal numbers as tables and site files write them (common
	// practice); everything else strconv.ParseFloat would also take is
	// refused: hexadecimal floats, digit separators, Inf and NaN, overflow.
	for _, c := range []struct {
		in string
		v  float64
		ok bool
	}{
		{"12", 12, true}, {"-1.5", -1.5, true}, {".5", 0.5, true}, {"5.", 5, true},
		{"1e3", 1000, true}, {"+2E-3", 0.002, true}, {" 7 ", 7, true}, {"0", 0, true},
		{"0x1p4", 0, false}, {"0x10", 0, false}, {"1_000", 0, false}, {"Inf", 0, false},
		{"-inf", 0, false}, {"NaN", 0, false}, {"1e400", 0, false}, {"", 0, false},
		{".", 0, false}, {"e5", 0, false}, {"1e", 0, false}, {"--1", 0, false},
		{"65/120", 0, false}, {"1,5", 0, false}, {"١٢", 0, false},
	} {
		t.Run(c.in, func(t *testing.T) {
			v, ok := ParseNumber(c.in)
			if ok != c.ok || (ok && v != c.v) {
				t.Errorf("ParseNumber(%q) = %v, %v; want %v, %v", c.in, v, ok, c.v, c.ok)
			}
		})
	}
}

func TestParseOrientationAndLine(t *testing.T) {
	if o, err := ParseOrientation(" 65 / 120 "); err != nil || o.Dip() != 65 || o.DipDirection() != 120 {
		t.Errorf("65/120: %v, %v", o, err)
	}
	for _, bad := range []string{"0x1p4/120", "65/Inf", "65", "NaN/10"} {
		if _, err := ParseOrientation(bad); err == nil {
			t.Errorf("ParseOrientation(%q) accepted", bad)
		}
		if _, err := ParseLine(bad); err == nil {
			t.Errorf("ParseLine(%q) accepted", bad)
		}
	}
}

func TestOneLineAndQuote(t *testing.T) {
	long := strings.Repeat("ä", 5000)
	for name, c := range map[string]struct {
		in   string
		want string // the whole result
	}{
		"newline":    {"a\nb: unknown", `a\nb: unknown`},
		"control":    {"x\x01y", `x\x01y`},
		"C1 control": {"x\u0085y", `x\u0085y`},
		"latin-1":    {"caf\xe9", "caf\ufffd"},
		"long":       {long, strings.Repeat("ä", MaxMessage-1) + "…"},
	} {
		t.Run(name, func(t *testing.T) {
			if got := OneLine(c.in); got != c.want {
				t.Errorf("OneLine(%.20q) = %.80q, want %.80q", c.in, got, c.want)
			}
		})
	}
	if got := OneLine("short, fine: 90°"); got != "short, fine: 90°" {
		t.Errorf("OneLine changed a clean message: %q", got)
	}
	q := Quote(long)
	if n := utf8.RuneCountInString(q); n != MaxQuote+3 || !strings.HasSuffix(q, `"…`) {
		t.Errorf("Quote of 5000 characters is %d long: %.40q", n, q)
	}
	if q := Quote("a\nb"); q != `"a\nb"` {
		t.Errorf("Quote(a newline b) = %s", q)
	}
}

func TestEditDistance(t *testing.T) {
	// Optimal string alignment: a swap of neighbours counts one (Damerau
	// 1964; the restricted form, common practice in spelling suggestions).
	// "ca" to "abc" is 3 in this form, 2 in the unrestricted one: the usual
	// example that tells them apart (memory).
	for _, c := range []struct {
		a, b string
		d    int
	}{
		{"depht", "depth", 1}, {"fricton", "friction", 1}, {"note", "name", 2},
		{"depth_m", "depth", 2}, {"", "dip", 3}, {"ca", "abc", 3}, {"dip", "dip", 0},
	} {
		if got := editDistance(c.a, c.b); got != c.d {
			t.Errorf("editDistance(%q, %q) = %d, want %d", c.a, c.b, got, c.d)
		}
	}
}
