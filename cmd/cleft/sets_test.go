package main

import (
	"cleft/plots/table"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const demoReadings = "../../planes/site/demo/readings.csv"

func TestSetsCommand(t *testing.T) {
	dir := t.TempDir()
	code, out, stderr := cleft(t, "", "sets", demoReadings, "--line", "100/70", "--max-angle", "30", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"133 readings", "silhouette", "the largest at 3 sets", "Terzaghi", "S1", "S2", "S3", "unassigned"} {
		if !strings.Contains(out, want) {
			t.Errorf("summary lacks %q:\n%s", want, out)
		}
	}
	sets := readCSV(t, filepath.Join(dir, "sets.csv"))
	if strings.Join(sets[0], ",") != strings.Join(table.SetColumns, ",") || len(sets) != 5 {
		t.Errorf("sets.csv header %v, %d rows", sets[0], len(sets))
	}
	rd := readCSV(t, filepath.Join(dir, "readings.csv"))
	if len(rd) != 134 || rd[0][5] != "set" || rd[0][6] != "angle_to_mean_deg" || rd[0][7] != "aperture_mm" {
		t.Errorf("readings.csv: %d rows, header %v", len(rd), rd[0])
	}
	for _, f := range []string{"sets-density.svg", "sets-density.png"} {
		if st, err := os.Stat(filepath.Join(dir, f)); err != nil || st.Size() == 0 {
			t.Errorf("%s not written", f)
		}
	}
	for _, want := range []string{"78/141", "86/189", "19/246"} { // the demo's set means, with cut-off and weights
		if !strings.Contains(out, want) {
			t.Errorf("set mean %s missing from:\n%s", want, out)
		}
	}
	// Seeds and a fixed number give the same three sets.
	_, seeded, _ := cleft(t, "", "sets", demoReadings, "--seed", "78/140", "--seed", "20/245", "--seed", "86/190")
	_, fixed, _ := cleft(t, "", "sets", demoReadings, "--sets", "3")
	table := func(s string) string { return s[strings.Index(s, "set   "):] }
	if table(seeded) != table(fixed) {
		t.Errorf("seeded sets differ from --sets 3:\n%s\n%s", seeded, fixed)
	}
}

func TestSetsBadInput(t *testing.T) {
	dir := t.TempDir()
	write := func(name, body string) string {
		p := filepath.Join(dir, name)
		os.WriteFile(p, []byte(body), 0o644)
		return p
	}
	for _, c := range []struct {
		file, want string
		code       int
		args       []string
	}{
		{write("dip.csv", "dip,dip_direction\n40,10\n95,20\n"), "DIR/dip.csv:3: dip (column 1): 95 is outside [0, 90]° (dip is measured down from the horizontal)", 1, nil},
		{write("nocol.csv", "dip,azimuth\n40,10\n"), "DIR/nocol.csv:1: the header has no \"dip_direction\" column (or strike, right-hand rule); it has: dip, azimuth", 1, nil},
		{write("empty.csv", ""), "DIR/empty.csv: empty: want a header row naming the columns (name, dip, dip_direction, depth, …)", 1, nil},
		{write("header.csv", "dip,dip_direction\n"), "DIR/header.csv: no readings: the table has a header but no rows", 1, nil},
		{write("weight.csv", "dip,dip_direction,weight\n40,10,0\n"), "DIR/weight.csv:2: weight (column 3): 0: a weight must be in (0, 1000]", 1, nil},
		{write("few.csv", "dip,dip_direction\n40,10\n50,20\n"), "DIR/few.csv: 2 readings cannot make 3 sets", 1, []string{"--sets", "3"}},
		{write("ok.csv", "dip,dip_direction\n40,10\n50,20\n"), "--line \"north\": want TREND/PLUNGE in degrees, e.g. 120/10\nRun 'cleft sets --help' for usage.", 2, []string{"--line", "north"}},
		{write("ok2.csv", "dip,dip_direction\n40,10\n50,20\n"), "--seed dip 95 is outside [0, 90]\nRun 'cleft sets --help' for usage.", 2, []string{"--seed", "95/10"}},
	} {
		code, _, stderr := cleft(t, "", append([]string{"sets", c.file}, c.args...)...)
		if want := message(c.want, dir); code != c.code || stderr != want {
			t.Errorf("%s %v: exit %d, %q; want %d and %q", filepath.Base(c.file), c.args, code, stderr, c.code, want)
		}
	}
}

func TestReadingsOnlySite(t *testing.T) {
	dir := t.TempDir()
	data, _ := os.ReadFile(demoReadings)
	os.WriteFile(filepath.Join(dir, "r.csv"), data, 0o644)
	p := filepath.Join(dir, "s.yaml")
	os.WriteFile(p, []byte("site: s\ndepth: 100\nstress:\n  vertical: {gradient: 0.026}\n  shmax: {ratio: 1.2, azimuth: 90}\n  shmin: {ratio: 0.7}\nreadings_file: r.csv\n"), 0o644)
	if code, out, stderr := cleft(t, "", "assess", p, "--out", filepath.Join(dir, "o")); code != 0 || !strings.Contains(out, "133 planes were screened") {
		t.Errorf("assess: exit %d, %s %s", code, out, stderr)
	}
	if code, _, stderr := cleft(t, "", "resolve", p); code != 1 || stderr != message("DIR/s.yaml: no planes: the site has only readings_file:, which cleft assess groups into sets and resolves; give planes: or planes_file:, or --planes FILE.csv", dir) {
		t.Errorf("resolve: exit %d, %s", code, stderr)
	}
}
