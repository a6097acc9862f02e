package main

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// cleft runs the command line in-process and returns its exit status,
// standard output and standard error.
func cleft(t *testing.T, stdin string, args ...string) (int, string, string) {
	t.Helper()
	var out, errb bytes.Buffer
	code := run(args, strings.NewReader(stdin), &out, &errb)
	return code, out.String(), errb.String()
}

const testdata = "../../testdata"

func TestBadInputFiles(t *testing.T) {
	// Each file in testdata/bad starts with "# want: TEXT": run from that
	// folder on the file's own name, the command writes exactly one line to
	// standard error, "cleft: TEXT", and exits 1. The text is what the user
	// reads, so it is compared whole, for resolve and for assess alike.
	dir, err := filepath.Abs(filepath.Join(testdata, "bad"))
	if err != nil {
		t.Fatal(err)
	}
	files, err := filepath.Glob(filepath.Join(dir, "*.yaml"))
	if err != nil || len(files) == 0 {
		t.Fatalf("no bad-input files: %v", err)
	}
	t.Chdir(dir)
	for _, f := range files {
		name := filepath.Base(f)
		t.Run(name, func(t *testing.T) {
			data, err := os.ReadFile(name)
			if err != nil {
				t.Fatal(err)
			}
			first, _, _ := strings.Cut(string(data), "\n")
			want, ok := strings.CutPrefix(first, "# want: ")
			if !ok {
				t.Fatalf("%s does not start with # want:", name)
			}
			want = "cleft: " + want + "\n"
			for _, args := range [][]string{{"resolve", name}, {"assess", name, "--out", t.TempDir()}} {
				code, _, stderr := cleft(t, "", args...)
				if code != 1 {
					t.Errorf("%v: exit %d, want 1; stderr %q", args[0], code, stderr)
				}
				if stderr != want {
					t.Errorf("%v: stderr\n%q\nwant\n%q", args[0], stderr, want)
				}
			}
		})
	}
}

func TestUsageErrors(t *testing.T) {
	site := filepath.Join(testdata, "good", "minimal.yaml")
	for _, args := range [][]string{
		{"resolve"},
		{"resolve", site, site},
		{"resolve", site, "--format", "xml"},
		{"resolve", site, "--bogus"},
		{"stress", site},
		{"stress", site, "--depth", "-4"},
		{"stress", site, "--depth", "deep"},
		{"assess", site},
		{"assess", "--example", site, "--out", "x"},
		{"frobnicate"},
	} {
		code, out, stderr := cleft(t, "", args...)
		if code != 2 {
			t.Errorf("%v: exit %d, want 2 (stderr %q)", args, code, stderr)
		}
		if out != "" {
			t.Errorf("%v: wrote to stdout: %q", args, out)
		}
		if !strings.Contains(stderr, "--help") {
			t.Errorf("%v: stderr %q does not point to --help", args, stderr)
		}
	}
}

func TestHelpCarriesCaution(t *testing.T) {
	for _, cmd := range []string{"", "resolve", "stress", "assess"} {
		args := []string{"--help"}
		if cmd != "" {
			args = []string{cmd, "--help"}
		}
		code, out, _ := cleft(t, "", args...)
		if code != 0 || !strings.Contains(out, "not a substitute for site") {
			t.Errorf("cleft %s --help: exit %d, caution missing", cmd, code)
		}
	}
}

func TestAssessExample(t *testing.T) {
	dir := t.TempDir()
	code, out, stderr := cleft(t, "", "assess", "--example", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"139 planes were screened", "1 is critical", "1 is opening", "137 are stable", "3 sets", "1 planar, 3 wedge", "Look at these first:\n 1. F2 (80/038 at 150 m): opening", "frictional-limit check", "not a substitute"} {
		if !strings.Contains(out, want) {
			t.Errorf("summary lacks %q:\n%s", want, out)
		}
	}
	rows := readCSV(t, filepath.Join(dir, "planes.csv"))
	if len(rows) != 140 {
		t.Errorf("planes.csv has %d lines, want header + 139 (6 planes, 133 readings)", len(rows))
	}
	var js []map[string]any
	readJSON(t, filepath.Join(dir, "planes.json"), &js)
	if len(js) != 139 {
		t.Errorf("planes.json has %d rows, want 139", len(js))
	}
	var st stressDoc
	readJSON(t, filepath.Join(dir, "stress.json"), &st)
	if len(st.States) != 3 || float64(st.States[2].Depth) != 200 {
		t.Errorf("stress.json states %+v, want the report depths 50, 120, 200", st.States)
	}
	sets := readCSV(t, filepath.Join(dir, "sets.csv"))
	if len(sets) != 5 || sets[1][0] != "S1" || sets[4][0] != "unassigned" {
		t.Errorf("sets.csv: %v", sets)
	}
	for _, name := range []string{"planes.csv", "planes.json", "stress.json", "sets.csv", "summary.json", "manifest.json"} {
		data, _ := os.ReadFile(filepath.Join(dir, name))
		for _, bad := range []string{"NaN", "Inf"} {
			if bytes.Contains(data, []byte(bad)) {
				t.Errorf("%s contains %s", name, bad)
			}
		}
	}
	// Undefined values: F2 is opening, so its slip tendency and factor of
	// safety are empty cells and JSON nulls.
	for i, r := range rows {
		if r[0] == "F2" {
			if r[16] != "opening" || r[8] != "" || r[11] != "" {
				t.Errorf("F2 row %v: want opening with empty Ts and FS", r)
			}
			if js[i-1]["slip_tendency"] != nil || js[i-1]["factor_of_safety"] != nil {
				t.Errorf("F2 JSON %v: want null Ts and FS", js[i-1])
			}
		}
	}
}

func readCSV(t *testing.T, path string) [][]string {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	rows, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	return rows
}

func readJSON(t *testing.T, path string, v any) {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(data, v); err != nil {
		t.Fatalf("%s: %v", path, err)
	}
}

func TestGoodSites(t *testing.T) {
	for _, name := range []string{"minimal.yaml", "measured.yaml", "tensor.yaml"} {
		t.Run(name, func(t *testing.T) {
			f := filepath.Join(testdata, "good", name)
			for _, format := range []string{"csv", "json"} {
				code, out, stderr := cleft(t, "", "resolve", f, "--format", format)
				if code != 0 {
					t.Fatalf("resolve --format %s: exit %d: %s", format, code, stderr)
				}
				if format == "json" {
					var v []map[string]any
					if err := json.Unmarshal([]byte(out), &v); err != nil {
						t.Errorf("JSON output does not parse: %v\n%s", err, out)
					}
				}
			}
			code, out, stderr := cleft(t, "", "stress", f, "--depth", "0,150", "--format", "json")
			if code != 0 {
				t.Fatalf("stress: exit %d: %s", code, stderr)
			}
			var d stressDoc
			if err := json.Unmarshal([]byte(out), &d); err != nil || len(d.States) != 2 {
				t.Errorf("stress JSON: %v, %d states", err, len(d.States))
			}
		})
	}
}

func TestMeasuredAxesNote(t *testing.T) {
	// The measured site's axes are 1.5° from orthogonal: accepted, with a note.
	code, out, _ := cleft(t, "", "stress", filepath.Join(testdata, "good", "measured.yaml"))
	if code != 0 || !strings.Contains(out, "from orthogonal; replaced by the nearest orthogonal triad") {
		t.Errorf("exit %d, want a note on re-orthogonalised axes:\n%s", code, out)
	}
}

// genPlanes returns a planes table of n rows with a deterministic spread of
// orientations and depths.
func genPlanes(n int, extra bool) string {
	var b strings.Builder
	b.WriteString("name,dip,dip_direction,depth")
	if extra {
		b.WriteString(",set")
	}
	b.WriteString("\n")
	for i := range n {
		fmt.Fprintf(&b, "P%d,%d,%d,%d", i, i%91, (i*37)%361, 20+(i*13)%400)
		if extra {
			fmt.Fprintf(&b, ",S%d", i%3)
		}
		b.WriteString("\n")
	}
	return b.String()
}

func TestResolveStreamsInOrder(t *testing.T) {
	// More rows than several batches: the parallel pipeline must give the
	// same bytes, in input order, as the one-at-a-time writer of assess.
	site := filepath.Join(testdata, "good", "minimal.yaml")
	in := genPlanes(3*batchSize+17, true)
	dir := t.TempDir()
	os.WriteFile(filepath.Join(dir, "p.csv"), []byte(in), 0o644)
	data, _ := os.ReadFile(site)
	data = data[:bytes.Index(data, []byte("planes:"))]
	data = append(data, "planes_file: p.csv\n"...)
	siteFile := filepath.Join(dir, "s.yaml")
	os.WriteFile(siteFile, data, 0o644)
	if code, _, stderr := cleft(t, "", "assess", siteFile, "--out", dir); code != 0 {
		t.Fatalf("assess: exit %d: %s", code, stderr)
	}
	for _, format := range []string{"csv", "json"} {
		code, out, stderr := cleft(t, in, "resolve", site, "--planes", "-", "--format", format)
		if code != 0 {
			t.Fatalf("exit %d: %s", code, stderr)
		}
		want, _ := os.ReadFile(filepath.Join(dir, "planes."+format))
		if out != string(want) {
			t.Errorf("%s: streamed output differs from the sequential table", format)
		}
	}
}

func TestResolveOutIsAtomic(t *testing.T) {
	site := filepath.Join(testdata, "good", "minimal.yaml")
	in := genPlanes(5000, false) + "BAD,95,10,100\n"
	out := filepath.Join(t.TempDir(), "out.csv")
	code, _, stderr := cleft(t, in, "resolve", site, "--planes", "-", "--out", out)
	if code != 1 || stderr != message("standard input:5002: dip (column 2): 95 is outside [0, 90]° (dip is measured down from the horizontal)", "") {
		t.Errorf("exit %d, stderr %q", code, stderr)
	}
	if _, err := os.Stat(out); !os.IsNotExist(err) {
		t.Errorf("a failed run left %s behind", out)
	}
	entries, _ := os.ReadDir(filepath.Dir(out))
	if len(entries) != 0 {
		t.Errorf("temporary files left: %v", entries)
	}
	// To standard output, the rows before the bad one are written.
	code, stdout, _ := cleft(t, in, "resolve", site, "--planes", "-")
	if code != 1 {
		t.Errorf("stdout run: exit %d, want 1", code)
	}
	if n := strings.Count(stdout, "\n"); n != 5001 {
		t.Errorf("stdout run wrote %d lines, want header + 5000", n)
	}
}

func TestResolveCarriesExtraColumns(t *testing.T) {
	site := filepath.Join(testdata, "good", "minimal.yaml")
	in := "dip,name,dip_direction,depth,note,set\n30,Q,10,50,\"wet, iron-stained\",S9\n"
	code, out, stderr := cleft(t, in, "resolve", site, "--planes", "-")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	r, err := csv.NewReader(bufio.NewReader(strings.NewReader(out))).ReadAll()
	if err != nil || len(r) != 2 {
		t.Fatalf("output: %v %q", err, out)
	}
	n := len(r[0])
	if r[0][n-2] != "note" || r[0][n-1] != "set" || r[1][n-2] != "wet, iron-stained" || r[1][n-1] != "S9" || r[1][0] != "Q" {
		t.Errorf("extras not carried: %v / %v", r[0], r[1])
	}
}

func TestExampleWritesAndRefusesOverwrite(t *testing.T) {
	dir := t.TempDir()
	if code, _, stderr := cleft(t, "", "example", dir); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if code, _, stderr := cleft(t, "", "example", dir); code != 1 || stderr != message("DIR/site.yaml exists: not overwritten (use --force)", dir) {
		t.Errorf("second run: exit %d, %q; want a refusal", code, stderr)
	}
	if code, _, stderr := cleft(t, "", "assess", filepath.Join(dir, "site.yaml"), "--out", filepath.Join(dir, "out")); code != 0 {
		t.Errorf("assess of the written example: exit %d: %s", code, stderr)
	}
}

func TestFrictionalLimitWarning(t *testing.T) {
	// SHmax 2.2·Sv and Shmin 0.5·Sv, hydrostatic from the surface: at any
	// depth (2.2 − 0.37)/(0.5 − 0.37) ≫ 3.12, so the state is past the limit
	// for μ = 0.6 and must be reported, not rejected (Zoback 2007).
	dir := t.TempDir()
	p := filepath.Join(dir, "s.yaml")
	os.WriteFile(p, []byte("site: s\nstress:\n  vertical: {gradient: 0.026}\n  shmax: {ratio: 2.2, azimuth: 90}\n  shmin: {ratio: 0.5}\nplanes: [{name: A, dip: 60, dip_direction: 0, depth: 300}]\n"), 0o644)
	code, out, _ := cleft(t, "", "stress", p, "--depth", "300")
	if code != 0 || !strings.Contains(out, "EXCEEDS the limit") || !strings.Contains(out, "regime: strike-slip (σ2 vertical)") {
		t.Errorf("stress: exit %d\n%s", code, out)
	}
	code, out, _ = cleft(t, "", "stress", p, "--depth", "300", "--format", "json")
	var d stressDoc
	if code != 0 || json.Unmarshal([]byte(out), &d) != nil || !d.States[0].Exceeds {
		t.Errorf("stress json: exit %d, %s", code, out)
	}
	code, out, _ = cleft(t, "", "assess", p, "--out", dir)
	if code != 0 || !strings.Contains(out, "EXCEEDS the frictional limit") {
		t.Errorf("assess: exit %d\n%s", code, out)
	}
}
