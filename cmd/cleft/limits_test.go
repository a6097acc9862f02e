package main

import (
	"bytes"
	"cleft/planes/site"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestOneReadingSetHasEmptyStatistics(t *testing.T) {
	// One reading has no spread: Fisher's K, α95, the spherical variance and
	// Woodcock's K and C are undefined (empty cells), not 0 or a large number.
	dir := files(t, map[string]string{"r.csv": "dip,dip_direction\n60,10\n"})
	code, out, stderr := cleft(t, "", "sets", filepath.Join(dir, "r.csv"), "--out", filepath.Join(dir, "o"))
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if strings.Contains(out, "NaN") || !strings.Contains(out, "1 reading is too few to compare groupings into sets: one set.") {
		t.Errorf("printed:\n%s", out)
	}
	rows := readCSV(t, filepath.Join(dir, "o", "sets.csv"))
	head, s1 := rows[0], rows[1]
	for i, col := range head {
		switch col {
		case "fisher_k", "alpha95_deg", "spherical_variance", "woodcock_k", "woodcock_c", "weighted_fisher_k", "weighted_alpha95_deg":
			if s1[i] != "" {
				t.Errorf("%s = %q, want an empty cell", col, s1[i])
			}
		}
	}
	if svg, _ := os.ReadFile(filepath.Join(dir, "o", "sets-density.svg")); bytes.Contains(svg, []byte("NaN")) {
		t.Error("sets-density.svg contains NaN")
	}
}

func TestReadingsRefused(t *testing.T) {
	var many strings.Builder
	many.WriteString("dip,dip_direction\n")
	for i := range site.MaxReadings + 1 {
		fmt.Fprintf(&many, "%d,%d\n", i%90, i%360)
	}
	dir := files(t, map[string]string{
		"w.csv":    "dip,dip_direction,weight\n60,10,1e308\n62,12,1\n",
		"many.csv": many.String(),
	})
	for _, c := range []struct{ file, want string }{
		{"w.csv", "DIR/w.csv:2: weight (column 3): 1e308: a weight must be in (0, 1000]"},
		{"many.csv", fmt.Sprintf("DIR/many.csv:%d: more than %d readings: cleft groups at most %d into sets; split the table (by borehole or domain)", site.MaxReadings+2, site.MaxReadings, site.MaxReadings)},
	} {
		code, _, stderr := cleft(t, "", "sets", filepath.Join(dir, c.file))
		if want := message(c.want, dir); code != 1 || stderr != want {
			t.Errorf("%s: exit %d, stderr %q; want %q", c.file, code, stderr, want)
		}
	}
}

func TestSurfaceSiteSaysCheckDoesNotApply(t *testing.T) {
	dir := files(t, map[string]string{"s.yaml": strings.Replace(robustSite, "depth: 100", "depth: 0", 1) + "planes: [{name: A, dip: 60, dip_direction: 10}]\n"})
	code, out, stderr := cleft(t, "", "assess", filepath.Join(dir, "s.yaml"), "--out", filepath.Join(dir, "o"))
	if code != 0 || !strings.Contains(out, "The frictional-limit check does not apply at 0 m") || strings.Contains(out, "Inf") || strings.Contains(out, "NaN") {
		t.Errorf("exit %d (%s):\n%s", code, stderr, out)
	}
	for _, f := range []string{"planes.csv", "planes.json", "stress.json", "summary.json", "report.html"} {
		data, _ := os.ReadFile(filepath.Join(dir, "o", f))
		if bytes.Contains(data, []byte("NaN")) || bytes.Contains(data, []byte("Inf")) {
			t.Errorf("%s contains NaN or Inf", f)
		}
	}
}

func TestHugeInputsGiveShortMessages(t *testing.T) {
	site := filepath.Join(files(t, map[string]string{"s.yaml": robustSite}), "s.yaml")
	for _, c := range []struct {
		name string
		in   io.Reader
		want string
	}{
		{"a 10 MB bad field", strings.NewReader("name,dip,dip_direction\nA," + strings.Repeat("x", 10<<20) + ",1\n"), "standard input:2: this row is longer than 64 KiB: is this a CSV table?"},
		{"a 60 KB bad field", strings.NewReader("name,dip,dip_direction\nA," + strings.Repeat("x", 60<<10) + ",1\n"), "standard input:2: dip (column 2): \"xxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxx\"… is not a decimal number"},
		{"a million-column header", strings.NewReader(strings.Repeat("c,", 1<<20) + "\n"), "standard input:1: this row is longer than 64 KiB: is this a CSV table?"},
		{"a newline in a header name", strings.NewReader("name,\"d\nip\",dip_direction\nA,1,1\n"), "standard input:1: column 2 of the header: control character U+000A at character 2: remove it"},
		{"endless zero bytes", endless{0}, "standard input:1: this row is longer than 64 KiB: is this a CSV table?"},
		{"a quote never closed", io.MultiReader(strings.NewReader("name,dip,dip_direction\n\"A,1,1\n"), endless{'\n'}), "standard input:2: a quoted value opened on this line runs on past 64 KiB: is its closing quote missing?"},
	} {
		t.Run(c.name, func(t *testing.T) {
			code, _, stderr := runIn(c.in, "resolve", site, "--planes", "-")
			if want := message(c.want, ""); code != 1 || stderr != want {
				t.Errorf("exit %d, stderr %.400q; want %q", code, stderr, want)
			}
		})
	}
}

// endless is an input that never ends: byte b repeated.
type endless struct{ b byte }

func (e endless) Read(p []byte) (int, error) {
	for i := range p {
		p[i] = e.b
	}
	return len(p), nil
}

func TestTooManyWedgePlanes(t *testing.T) {
	var p strings.Builder
	p.WriteString("name,dip,dip_direction\n")
	for i := range 201 {
		fmt.Fprintf(&p, "P%d,%d,%d\n", i, i%90, (i*37)%360)
	}
	dir := files(t, map[string]string{"s.yaml": robustSite + "planes_file: p.csv\nslope: {face: {dip: 65, dip_direction: 210}, height: 30}\n", "p.csv": p.String()})
	code, _, stderr := cleft(t, "", "slope", filepath.Join(dir, "s.yaml"))
	want := "DIR/s.yaml: slope: 201 planes and set means would make 20100 wedge pairs: cleft screens at most 200 against a slope (19900 pairs); give the slope's own planes in planes_file:, or the field readings in readings_file: so that their set means are screened"
	if code != 1 || stderr != message(want, dir) {
		t.Errorf("exit %d, stderr %q", code, stderr)
	}
}

func TestFiguresAndReportShowTheLeastStable(t *testing.T) {
	if testing.Short() {
		t.Skip("writes the figures of 2,100 planes")
	}
	in := genPlanes(2100, false)
	dir := files(t, map[string]string{"s.yaml": robustSite + "planes_file: p.csv\n", "p.csv": in})
	out := filepath.Join(dir, "o")
	if code, _, stderr := cleft(t, "", "assess", filepath.Join(dir, "s.yaml"), "--out", out); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, f := range []string{"stereonet-slip.svg", "mohr.svg"} {
		svg, _ := os.ReadFile(filepath.Join(out, f))
		if !bytes.Contains(svg, []byte("2000 least stable of 2100 planes are drawn")) {
			t.Errorf("%s does not say that 100 planes are left out", f)
		}
	}
	html, _ := os.ReadFile(filepath.Join(out, "report.html"))
	if !bytes.Contains(html, []byte("The 500 least stable of the 2100 planes are listed; planes.csv and planes.json hold every plane.")) {
		t.Error("the report does not say it lists 500 of the planes")
	}
	if n := bytes.Count(html, []byte("<tr class=\"critical\"")) + bytes.Count(html, []byte("<tr class=\"opening\"")) + bytes.Count(html, []byte("<tr class=\"stable\"")); n > 500+20 {
		t.Errorf("the report has %d plane rows", n)
	}
	if rows := readCSV(t, filepath.Join(out, "planes.csv")); len(rows) != 2101 {
		t.Errorf("planes.csv has %d rows, want every plane", len(rows)-1)
	}
}

func TestAssessHoldsBoundedTables(t *testing.T) {
	// assess holds its planes in memory: more than 200,000, or more than
	// 64 MiB of names and carried values, is an error (resolve streams them).
	if testing.Short() {
		t.Skip("generates 70 MB of tables")
	}
	var many, wide strings.Builder
	many.WriteString("name,dip,dip_direction\n")
	for i := range 200001 {
		fmt.Fprintf(&many, "P%d,%d,%d\n", i, i%90, i%360)
	}
	note := strings.Repeat("n", 60<<10)
	wide.WriteString("name,dip,dip_direction,note\n")
	for i := range 1200 {
		fmt.Fprintf(&wide, "P%d,%d,%d,%s\n", i, i%90, i%360, note)
	}
	dir := files(t, map[string]string{
		"many.yaml": robustSite + "planes_file: many.csv\n", "many.csv": many.String(),
		"wide.yaml": robustSite + "planes_file: wide.csv\n", "wide.csv": wide.String(),
	})
	for _, c := range []struct{ site, want string }{
		{"many.yaml", "DIR/many.csv:200002: more than 200000 planes or 64 MiB of names and carried values: an assessment holds no more; cleft resolve streams a table of any length"},
		{"wide.yaml", "DIR/wide.csv:1094: more than 200000 planes or 64 MiB of names and carried values: an assessment holds no more; cleft resolve streams a table of any length"},
	} {
		code, _, stderr := cleft(t, "", "assess", filepath.Join(dir, c.site), "--out", filepath.Join(dir, "o"))
		if want := message(c.want, dir); code != 1 || stderr != want {
			t.Errorf("%s: exit %d, stderr %q; want %q", c.site, code, stderr, want)
		}
	}
}
