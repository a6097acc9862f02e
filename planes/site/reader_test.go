package site

import (
	"errors"
	"io"
	"strings"
	"testing"
	"unicode/utf8"
)

// readAll reads every plane of a table, returning the first error.
func readAll(t *testing.T, r io.Reader, d planeDefaults) ([]Plane, []string, error) {
	t.Helper()
	pr, err := NewPlaneReader(r, "t.csv", d)
	if err != nil {
		return nil, nil, err
	}
	var out []Plane
	for {
		var p Plane
		if err := pr.Next(&p); err != nil {
			if errors.Is(err, io.EOF) {
				return out, pr.ExtraNames, nil
			}
			return out, pr.ExtraNames, err
		}
		out = append(out, p)
	}
}

// checkOneLine fails unless err is one line of at most MaxMessage characters.
func checkOneLine(t *testing.T, err error) {
	t.Helper()
	msg := err.Error()
	if strings.ContainsAny(msg, "\n\r") || utf8.RuneCountInString(msg) > MaxMessage || !utf8.ValidString(msg) {
		t.Errorf("error is not one short line (%d characters): %.120q", utf8.RuneCountInString(msg), msg)
	}
}

func TestPlaneReaderRefuses(t *testing.T) {
	d := planeDefaults{depth: 100, hasDepth: true, coulomb: true}
	for _, c := range []struct {
		name, in string
		want     Error
	}{
		{"misspelt friction", "name,dip,dip_direction,fricton\nA,60,120,0.3\n", Error{File: "t.csv", Line: 1, Column: 4, Key: "fricton (column 4)", Err: ErrUnknownKey, Msg: "unknown column; did you mean \"friction\"? A name this close to a known column is taken for a misspelling: correct it, or rename the column to carry it through"}},
		{"misspelt depth", "name,dip,dip_direction,depht\nA,60,120,300\n", Error{File: "t.csv", Line: 1, Column: 4, Key: "depht (column 4)", Err: ErrUnknownKey, Msg: "unknown column; did you mean \"depth\"? A name this close to a known column is taken for a misspelling: correct it, or rename the column to carry it through"}},
		{"dip direction with a space", "name,dip,dip direction\nA,60,120\n", Error{File: "t.csv", Line: 1, Column: 3, Key: "dip direction (column 3)", Err: ErrUnknownKey, Msg: "unknown column; did you mean \"dip_direction\"? A name this close to a known column is taken for a misspelling: correct it, or rename the column to carry it through"}},
		{"semicolons", "name;dip;dip_direction\nA;60;120\n", Error{File: "t.csv", Line: 1, Err: ErrSyntax, Msg: "the header is one column holding semicolons: this looks like a semicolon-separated file; cleft reads comma-separated tables (save it as CSV with commas)"}},
		{"tabs", "name\tdip\tdip_direction\nA\t60\t120\n", Error{File: "t.csv", Line: 1, Err: ErrSyntax, Msg: "the header is one column holding tabs: this looks like a tab-separated file; cleft reads comma-separated tables (save it as CSV with commas)"}},
		{"dip/dip direction in one cell", "name,dip,dip_direction\nA,65/120,120\n", Error{File: "t.csv", Line: 2, Column: 2, Key: "dip (column 2)", Err: ErrNotNumber, Msg: "\"65/120\" looks like DIP/DIP_DIRECTION in one cell: give the dip and the dip direction in columns of their own"}},
		{"hexadecimal", "name,dip,dip_direction\nA,0x1p4,120\n", Error{File: "t.csv", Line: 2, Column: 2, Key: "dip (column 2)", Err: ErrNotNumber, Msg: "\"0x1p4\" is not a decimal number"}},
		{"Inf", "name,dip,dip_direction,depth\nA,60,120,Inf\n", Error{File: "t.csv", Line: 2, Column: 4, Key: "depth (column 4)", Err: ErrNotNumber, Msg: "\"Inf\" is not a decimal number"}},
		{"dip shown as given", "name,dip,dip_direction\nA,90.0000001,120\n", Error{File: "t.csv", Line: 2, Column: 2, Key: "dip (column 2)", Err: ErrRange, Msg: "90.0000001 is outside [0, 90]° (dip is measured down from the horizontal)"}},
		{"deep", "name,dip,dip_direction,depth\nA,60,120,1e160\n", Error{File: "t.csv", Line: 2, Column: 4, Key: "depth (column 4)", Err: ErrRange, Msg: "1e160 m is deeper than the 20000 m cleft accepts"}},
		{"pore pressure", "name,dip,dip_direction,pore_pressure\nA,60,120,1e300\n", Error{File: "t.csv", Line: 2, Column: 4, Key: "pore_pressure (column 4)", Err: ErrRange, Msg: "1e300 MPa: pore pressure must be in [0, 10000] MPa"}},
		{"friction", "name,dip,dip_direction,friction\nA,60,120,50\n", Error{File: "t.csv", Line: 2, Column: 4, Key: "friction (column 4)", Err: ErrRange, Msg: "50: friction μ must be in (0, 10]"}},
		{"latin-1 name", "name,dip,dip_direction\nA\xe9,60,120\n", Error{File: "t.csv", Line: 2, Column: 1, Key: "name (column 1)", Err: ErrEncoding, Msg: "byte 0xE9 at character 2 is not UTF-8: save the file as UTF-8 text"}},
		{"control character in a name", "name,dip,dip_direction\nB\x01,60,120\n", Error{File: "t.csv", Line: 2, Column: 1, Key: "name (column 1)", Err: ErrEncoding, Msg: "control character U+0001 at character 2: remove it"}},
		{"tab in a name", "name,dip,dip_direction\n\"B\tC\",60,120\n", Error{File: "t.csv", Line: 2, Column: 1, Key: "name (column 1)", Err: ErrEncoding, Msg: "control character U+0009 at character 2: remove it"}},
		{"control character in a carried column", "name,dip,dip_direction,note\nB,60,120,x\x7f\n", Error{File: "t.csv", Line: 2, Column: 4, Key: "note (column 4)", Err: ErrEncoding, Msg: "control character U+007F at character 2: remove it"}},
		{"latin-1 header", "name,dip,dip_direction,r\xe9f\nB,60,120,x\n", Error{File: "t.csv", Line: 1, Column: 4, Err: ErrEncoding, Msg: "column 4 of the header: byte 0xE9 at character 2 is not UTF-8: save the file as UTF-8 text"}},
		{"newline in a header name", "name,\"di\np\",dip_direction\nA,1,1\n", Error{File: "t.csv", Line: 1, Column: 2, Err: ErrEncoding, Msg: "column 2 of the header: control character U+000A at character 3: remove it"}},
		{"unclosed quote", "name,dip,dip_direction\nA,60,120\n\"B,60,120\nC,60,120\nD,1,1\n", Error{File: "t.csv", Line: 3, Err: ErrSyntax, Msg: "not valid CSV: a quoted value opened on this line is not closed"}},
		{"quote inside a value", "name,dip,dip_direction\nA\"x,60,120\n", Error{File: "t.csv", Line: 2, Err: ErrSyntax, Msg: "not valid CSV: a quote inside a value that does not start with one; quote the whole value and double the quote inside (\"\")"}},
		{"too many columns", strings.Repeat("c,", MaxColumns) + "name,dip,dip_direction\n", Error{File: "t.csv", Line: 1, Err: ErrLimit, Msg: "the header has 1003 columns: at most 1000"}},
		{"missing column, header cut short", "name," + strings.Repeat("x", 5000) + ",dip_direction\nA,1,2\n", Error{File: "t.csv", Line: 1, Err: ErrMissing, Msg: "the header has no \"dip\" column; it has: name, xxxxxxxxxxxxxxxxxxxxxxxx…, dip_direction"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			_, _, err := readAll(t, strings.NewReader(c.in), d)
			if err == nil {
				t.Fatal("accepted")
			}
			sameError(t, err, c.want)
			checkOneLine(t, err)
		})
	}
}

func TestPlaneReaderAccepts(t *testing.T) {
	d := planeDefaults{depth: 100, hasDepth: true, coulomb: true}
	for _, c := range []struct {
		name, in string
		planes   int
		extras   []string
	}{
		{"BOM then a quoted header", "\ufeff\"name\",\"dip\",dip_direction\nA,60,120\n", 1, nil},
		{"BOM and CRLF", "\ufeffname,dip,dip_direction\r\nA,60,120\r\n", 1, nil},
		{"a quote in a comment", "# it's \"quoted\nname,dip,dip_direction\n# and \" once more\nA,60,120\n", 1, nil},
		{"a carried note over lines, with a tab", "name,dip,dip_direction,note\nA,60,120,\"wet,\n\tiron-stained\"\nB,1,2,x\n", 2, []string{"note"}},
		{"names far from the known ones are carried", "name,dip,dip_direction,note,set,depth_m,weight\nA,60,120,n,S1,5,2\n", 1, []string{"note", "set", "depth_m", "weight"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			ps, extras, err := readAll(t, strings.NewReader(c.in), d)
			if err != nil {
				t.Fatal(err)
			}
			if len(ps) != c.planes || strings.Join(extras, ",") != strings.Join(c.extras, ",") {
				t.Errorf("%d planes with extras %v, want %d with %v", len(ps), extras, c.planes, c.extras)
			}
		})
	}
}

// endless is an input that never ends: bytes b repeated.
type endless struct{ b byte }

func (e endless) Read(p []byte) (int, error) {
	for i := range p {
		p[i] = e.b
	}
	return len(p), nil
}

// counter counts the bytes read through it.
type counter struct {
	r io.Reader
	n int
}

func (c *counter) Read(p []byte) (int, error) { n, err := c.r.Read(p); c.n += n; return n, err }

func TestPlaneReaderBounded(t *testing.T) {
	// An input without line breaks (/dev/zero), and a quote opened and
	// never closed with rows after it: both stop after about MaxRow bytes,
	// at the line where the row or the quote starts.
	d := planeDefaults{depth: 100, hasDepth: true, coulomb: true}
	for _, c := range []struct {
		name string
		r    io.Reader
		want Error
	}{
		{"zero bytes", endless{0}, Error{File: "t.csv", Line: 1, Err: ErrLimit, Msg: "this row is longer than 64 KiB: is this a CSV table?"}},
		{"a header without end", endless{'a'}, Error{File: "t.csv", Line: 1, Err: ErrLimit, Msg: "this row is longer than 64 KiB: is this a CSV table?"}},
		{"an open quote", io.MultiReader(strings.NewReader("name,dip,dip_direction\nA,1,2\n\"B,1,2\n"), endless{'\n'}), Error{File: "t.csv", Line: 3, Err: ErrLimit, Msg: "a quoted value opened on this line runs on past 64 KiB: is its closing quote missing?"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			cr := &counter{r: c.r}
			_, _, err := readAll(t, cr, d)
			sameError(t, err, c.want)
			if cr.n > 4*MaxRow {
				t.Errorf("read %d bytes before stopping, want about %d", cr.n, MaxRow)
			}
		})
	}
}

func TestRepeatedNames(t *testing.T) {
	s, err := Parse([]byte(minimal+"depth: 10\nplanes:\n  - {name: A, dip: 1, dip_direction: 2}\n  - {name: B, dip: 1, dip_direction: 2}\n"), "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	ps, err := s.OpenPlanes("", nil)
	if err != nil {
		t.Fatal(err)
	}
	for p := new(Plane); ps.Next(p) == nil; {
	}
	if first, n, _ := ps.Repeats(); first != nil || n != 0 {
		t.Errorf("inline planes A, B: repeat %v, %d", first, n)
	}
	ps, err = s.OpenPlanes("-", strings.NewReader("name,dip,dip_direction\nA,1,2\nC,3,4\nA,5,6\nC,7,8\nA,9,9\n"))
	if err != nil {
		t.Fatal(err)
	}
	for p := new(Plane); ps.Next(p) == nil; {
	}
	first, n, unchecked := ps.Repeats()
	if first == nil || n != 3 || unchecked || !errors.Is(first, ErrDuplicate) || first.Error() != `standard input:4: name: "A" is also the name of the plane at line 2` {
		t.Errorf("repeats: %v, %d, %v; want the A of line 4, 3 repeats", first, n, unchecked)
	}
}
