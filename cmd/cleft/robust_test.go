package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"unicode/utf8"
)

// runIn runs the command line with stdin r and returns its exit status and
// standard error.
func runIn(r io.Reader, args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := run(args, r, &out, &errb)
	return code, out.String(), errb.String()
}

const robustSite = `site: s
depth: 100
stress:
  vertical: {gradient: 0.027}
  shmax: {ratio: 1.2, azimuth: 90}
  shmin: {ratio: 0.7}
strength: {friction: 0.6}
`

// files writes name → content into a new folder and returns it.
func files(t *testing.T, m map[string]string) string {
	t.Helper()
	dir := t.TempDir()
	for name, data := range m {
		p := filepath.Join(dir, name)
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, []byte(data), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return dir
}

// snapshot is every file of dir with its content.
func snapshot(t *testing.T, dir string) map[string]string {
	t.Helper()
	out := map[string]string{}
	filepath.Walk(dir, func(p string, fi os.FileInfo, err error) error {
		if err == nil && !fi.IsDir() {
			data, _ := os.ReadFile(p)
			out[p] = string(data)
		}
		return nil
	})
	return out
}

// firstLine is the first line of s, and whether s has more (the usage hint
// of a usage error aside).
func oneMessage(t *testing.T, stderr string) string {
	t.Helper()
	lines := strings.Split(strings.TrimRight(stderr, "\n"), "\n")
	if len(lines) == 2 && strings.HasPrefix(lines[1], "Run 'cleft") {
		lines = lines[:1]
	}
	if len(lines) != 1 || utf8.RuneCountInString(lines[0]) > 300+len("cleft: ") {
		t.Errorf("want one line of at most 300 characters, got %d lines: %.200q", len(lines), stderr)
	}
	return lines[0]
}

func TestOutputThatIsAnInputIsRefused(t *testing.T) {
	// Any output path that is, or links to, one of the run's inputs is a
	// usage error before anything is written, and every file stays as it was.
	mk := func() string {
		dir := files(t, map[string]string{
			"s.yaml":         robustSite + "planes_file: field.csv\n",
			"field.csv":      "name,dip,dip_direction\nA,60,120\n",
			"a/s.yaml":       robustSite + "planes_file: planes.csv\n",
			"a/planes.csv":   "name,dip,dip_direction\nA,60,120\n",
			"r/readings.csv": "dip,dip_direction\n60,120\n62,118\n20,200\n",
		})
		if err := os.Symlink(filepath.Join(dir, "field.csv"), filepath.Join(dir, "link.csv")); err != nil {
			t.Skip("no symbolic links here:", err)
		}
		return dir
	}
	for _, c := range []struct {
		name string
		args func(dir string) []string
		want string
	}{
		{"--out the --planes table", func(d string) []string {
			return []string{"resolve", d + "/s.yaml", "--planes", d + "/field.csv", "--out", d + "/field.csv"}
		}, "DIR/field.csv is an input of this run: the output would replace it; write the output elsewhere\nRun 'cleft resolve --help' for usage."},
		{"--out the site file", func(d string) []string { return []string{"resolve", d + "/s.yaml", "--out", d + "/s.yaml"} }, "DIR/s.yaml is an input of this run: the output would replace it; write the output elsewhere\nRun 'cleft resolve --help' for usage."},
		{"--out the planes_file", func(d string) []string { return []string{"resolve", d + "/s.yaml", "--out", d + "/field.csv"} }, "DIR/field.csv is an input of this run: the output would replace it; write the output elsewhere\nRun 'cleft resolve --help' for usage."},
		{"--out a link to an input", func(d string) []string { return []string{"resolve", d + "/s.yaml", "--out", d + "/link.csv"} }, "DIR/link.csv is the input DIR/field.csv: the output would replace it; write the output elsewhere\nRun 'cleft resolve --help' for usage."},
		{"assess into the folder of its planes.csv", func(d string) []string { return []string{"assess", d + "/a/s.yaml", "--out", d + "/a"} }, "DIR/a/planes.csv is an input of this run: the output would replace it; write the output elsewhere\nRun 'cleft assess --help' for usage."},
		{"sets into the folder of its readings.csv", func(d string) []string { return []string{"sets", d + "/r/readings.csv", "--out", d + "/r"} }, "DIR/r/readings.csv is an input of this run: the output would replace it; write the output elsewhere\nRun 'cleft sets --help' for usage."},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := mk()
			before := snapshot(t, dir)
			code, stdout, stderr := cleft(t, "", c.args(dir)...)
			want := message(c.want, dir)
			if code != 2 || stdout != "" || stderr != want {
				t.Errorf("exit %d, stdout %q, stderr %q; want 2 and %q", code, stdout, stderr, want)
			}
			if after := snapshot(t, dir); fmt.Sprint(after) != fmt.Sprint(before) {
				t.Errorf("files changed:\nbefore %v\nafter  %v", before, after)
			}
		})
	}
}

func TestBadFlagsAreUsageErrors(t *testing.T) {
	// Every non-finite or out-of-range number on the command line is exit 2,
	// and nothing is written (no output, no temporary file).
	readings := filepath.Join(files(t, map[string]string{"r.csv": "dip,dip_direction\n0,0\n1,0\n0.5,90\n"}), "r.csv")
	site := filepath.Join(testdata, "good", "minimal.yaml")
	for _, c := range []struct {
		name string
		args []string
	}{
		{"width NaN", []string{"plot", "--example", "--width", "NaN", "--out", "f.png"}},
		{"height NaN into SVG", []string{"plot", "--example", "--height", "NaN", "--out", "f.svg"}},
		{"width Inf", []string{"plot", "--example", "--width", "Inf", "--out", "f.svg"}},
		{"width hexadecimal", []string{"plot", "--example", "--width", "0x10", "--out", "f.svg"}},
		{"width too large", []string{"plot", "--example", "--width", "1e6", "--out", "f.svg"}},
		{"depth too deep", []string{"plot", "--example", "--depth", "30000", "--out", "f.svg"}},
		{"contour NaN", []string{"plot", "--example", "--contours", "0.1,NaN", "--out", "f.svg"}},
		{"max-weight Inf with readings parallel to the line", []string{"sets", readings, "--line", "0/0", "--max-weight", "Inf", "--out", "o"}},
		{"max-weight above 1000", []string{"sets", readings, "--max-weight", "1e9", "--out", "o"}},
		{"sets not whole", []string{"sets", readings, "--sets", "2.5", "--out", "o"}},
		{"seed hexadecimal", []string{"sets", readings, "--seed", "0x10/20", "--out", "o"}},
		{"line NaN", []string{"sets", readings, "--line", "NaN/0", "--out", "o"}},
		{"station NaN", []string{"tunnel", site, "--station", "NaN", "--out", "o"}},
		{"stress depth Inf", []string{"stress", site, "--depth", "Inf"}},
		{"stress depth 1e999", []string{"stress", site, "--depth", "1e999"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := t.TempDir()
			args := append([]string(nil), c.args...)
			for i, a := range args {
				if i > 0 && args[i-1] == "--out" {
					args[i] = filepath.Join(dir, a)
				}
			}
			code, _, stderr := cleft(t, "", args...)
			if code != 2 {
				t.Errorf("exit %d, want 2; stderr %q", code, stderr)
			}
			oneMessage(t, stderr)
			if entries, _ := os.ReadDir(dir); len(entries) != 0 {
				t.Errorf("left files behind: %v", entries)
			}
		})
	}
}

func TestWriteFileLeavesNothingBehind(t *testing.T) {
	dir := t.TempDir()
	out := filepath.Join(dir, "out.csv")
	t.Run("panic", func(t *testing.T) {
		func() {
			defer func() { recover() }()
			writeFile(out, func(io.Writer) error { panic("boom") })
		}()
		if entries, _ := os.ReadDir(dir); len(entries) != 0 {
			t.Errorf("a panicking write left %v", entries)
		}
	})
	t.Run("error", func(t *testing.T) {
		if err := writeFile(out, func(io.Writer) error { return errors.New("bad row") }); err == nil || err.Error() != "bad row" {
			t.Errorf("error %v, want the writer's", err)
		}
		if entries, _ := os.ReadDir(dir); len(entries) != 0 {
			t.Errorf("a failed write left %v", entries)
		}
	})
	t.Run("stale temporary files", func(t *testing.T) {
		// 4194999 is above the largest process id Linux hands out
		// (PID_MAX_LIMIT, 2²², common practice), so no process has it.
		own := fmt.Sprintf(".out.csv.%d-77.tmp", os.Getpid())
		stale := []string{".out.csv.4194999-123.tmp", ".out.csv.756341328.tmp", ".f.png.4194999-1.tmp"}
		kept := []string{own, ".f.png.756341328.tmp", ".out.csv.notes.tmp", "out.csv.1.tmp", ".x.4194999.tmp"}
		for _, n := range append(append([]string(nil), stale...), kept...) {
			os.WriteFile(filepath.Join(dir, n), []byte("x"), 0o644)
		}
		if err := writeFile(out, func(w io.Writer) error { _, err := io.WriteString(w, "ok\n"); return err }); err != nil {
			t.Fatal(err)
		}
		for _, n := range stale {
			if _, err := os.Stat(filepath.Join(dir, n)); err == nil {
				t.Errorf("%s of a killed run was not removed", n)
			}
		}
		for _, n := range append(kept, "out.csv") {
			if _, err := os.Stat(filepath.Join(dir, n)); err != nil {
				t.Errorf("%s was removed", n)
			}
		}
	})
}

func TestFullDiskNamesTheOutput(t *testing.T) {
	tmp := "/d/.out.csv.12-34.tmp"
	err := outputError("/d/out.csv", tmp, fmt.Errorf("wrapped: %w", &os.PathError{Op: "write", Path: tmp, Err: syscall.ENOSPC}))
	if err == nil || err.Error() != "/d/out.csv: cannot write: no space left on device" || !errors.Is(err, syscall.ENOSPC) {
		t.Errorf("error %v", err)
	}
	other := errors.New("standard input:3: dip (column 2): bad")
	if got := outputError("/d/out.csv", tmp, other); got != other {
		t.Errorf("an input error was changed: %v", got)
	}
}

func TestResultColumnsAreNotShadowed(t *testing.T) {
	site := filepath.Join(files(t, map[string]string{"s.yaml": robustSite}), "s.yaml")
	in := "name,dip,dip_direction,state,input_state,note\nA,60,120,closed,x,y\n"
	code, out, stderr := cleft(t, in, "resolve", site, "--planes", "-", "--format", "json")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if n := strings.Count(out, `"state":`); n != 1 || !strings.Contains(out, `"input_state":"closed","input_input_state":"x","note":"y"`) {
		t.Errorf("JSON keys: %s", out)
	}
	var rows []map[string]any
	if err := json.Unmarshal([]byte(out), &rows); err != nil || rows[0]["state"] != "stable" {
		t.Errorf("state %v (%v), want the result's", rows, err)
	}
	code, out, _ = cleft(t, in, "resolve", site, "--planes", "-")
	header, _, _ := strings.Cut(out, "\n")
	if code != 0 || !strings.HasSuffix(header, ",state,input_state,input_input_state,note") {
		t.Errorf("CSV header %q", header)
	}
	// readings.csv: an input column named like one of its own is renamed too.
	dir := files(t, map[string]string{"r.csv": "dip,dip_direction,set,angle_to_mean_deg\n60,120,J1,5\n62,118,J1,6\n20,200,J2,7\n"})
	if code, _, stderr := cleft(t, "", "sets", filepath.Join(dir, "r.csv"), "--out", filepath.Join(dir, "o")); code != 0 {
		t.Fatalf("sets: exit %d: %s", code, stderr)
	}
	rows2 := readCSV(t, filepath.Join(dir, "o", "readings.csv"))
	if got := strings.Join(rows2[0], ","); !strings.HasSuffix(got, "angle_to_mean_deg,field_set,input_angle_to_mean_deg") {
		t.Errorf("readings.csv header %q", got)
	}
}

func TestRepeatedNamesWarn(t *testing.T) {
	site := filepath.Join(files(t, map[string]string{"s.yaml": robustSite + "planes:\n  - {name: A, dip: 10, dip_direction: 20}\n"}), "s.yaml")
	code, out, stderr := cleft(t, "name,dip,dip_direction\nB,1,2\nB,3,4\n", "resolve", site, "--planes", "-")
	if code != 0 || strings.Count(out, "\n") != 3 || stderr != "cleft: warning: standard input:3: name: \"B\" is also the name of the plane at line 2\n" {
		t.Errorf("exit %d, %d lines, stderr %q", code, strings.Count(out, "\n"), stderr)
	}
	dir := files(t, map[string]string{"s.yaml": robustSite + "planes:\n  - {name: A, dip: 10, dip_direction: 20}\nplanes_file: p.csv\n", "p.csv": "name,dip,dip_direction\nA,1,2\n"})
	code, _, stderr = cleft(t, "", "assess", filepath.Join(dir, "s.yaml"), "--out", filepath.Join(dir, "o"))
	if code != 0 || stderr != message(`warning: DIR/p.csv:2: name: "A" is also the name of the plane at DIR/s.yaml:9`, dir) {
		t.Errorf("assess: exit %d, stderr %q", code, stderr)
	}
}

func TestOutputListsAreComplete(t *testing.T) {
	// The files each command writes are all in its list, so that the check
	// against the inputs covers every one of them.
	if testing.Short() {
		t.Skip("runs the demo")
	}
	dir := t.TempDir()
	ex := filepath.Join(dir, "ex")
	if code, _, stderr := cleft(t, "", "example", ex); code != 0 {
		t.Fatal(stderr)
	}
	for _, c := range []struct {
		args []string
		list []string
	}{
		{[]string{"assess", "--example"}, assessFiles()},
		{[]string{"slope", filepath.Join(ex, "site.yaml")}, slopeFiles()},
		{[]string{"tunnel", filepath.Join(ex, "site.yaml")}, tunnelFiles()},
		{[]string{"sets", filepath.Join(ex, "readings.csv")}, setsFiles()},
		{[]string{"chance", filepath.Join(ex, "site.yaml")}, chanceFiles()},
	} {
		t.Run(c.args[0], func(t *testing.T) {
			out := filepath.Join(dir, c.args[0])
			if code, _, stderr := cleft(t, "", append(c.args, "--out", out)...); code != 0 {
				t.Fatal(stderr)
			}
			listed := map[string]bool{}
			for _, n := range c.list {
				listed[n] = true
			}
			entries, _ := os.ReadDir(out)
			for _, e := range entries {
				if !listed[e.Name()] {
					t.Errorf("%s wrote %s, which its list lacks", c.args[0], e.Name())
				}
			}
		})
	}
}

// message is what cleft writes to standard error for one mistake: the line
// "cleft: " + want, where DIR in want stands for the folder dir (a usage
// error's want ends with its pointer to --help). Tests compare it whole.
func message(want, dir string) string {
	if dir != "" {
		want = strings.ReplaceAll(want, "DIR", dir)
	}
	return "cleft: " + want + "\n"
}
