package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestSlopeCommand(t *testing.T) {
	dir := t.TempDir()
	if code, _, stderr := cleft(t, "", "example", dir); code != 0 {
		t.Fatal(stderr)
	}
	out := filepath.Join(dir, "out")
	code, stdout, stderr := cleft(t, "", "slope", filepath.Join(dir, "site.yaml"), "--out", out)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"1 planar, 2 wedge, 1 flexural toppling", "planar J-cut-3", "falls to 1 with", "flexural toppling F2", "not a substitute"} {
		if !strings.Contains(stdout, want) {
			t.Errorf("summary lacks %q:\n%s", want, stdout)
		}
	}
	rows := readCSV(t, filepath.Join(out, "slope.csv"))
	head := strings.Join(rows[0], ",")
	if head != "test,planes,feasible,reason,line_trend,line_plunge,friction_angle_deg,fs_crack_fill_0,fs_crack_fill_0.5,fs_crack_fill_1,crack_depth_m,water_depth_to_fail_m" {
		t.Errorf("header %s", head)
	}
	// 9 candidates (6 planes, 3 set means): 9 planar, 36 wedge, 9 toppling rows.
	if len(rows) != 1+9+36+9 {
		t.Errorf("%d rows, want 54", len(rows)-1)
	}
	for _, r := range rows[1:] {
		if r[2] == "no" && r[3] == "" {
			t.Errorf("a failing test without its reason: %v", r)
		}
		if r[0] == "planar" && r[2] == "yes" && (r[6] == "" || r[9] == "") {
			t.Errorf("a feasible planar case without FS: %v", r)
		}
	}
	for _, f := range []string{"slope-kinematic.svg", "slope-kinematic.png"} {
		if _, err := os.Stat(filepath.Join(out, f)); err != nil {
			t.Error(err)
		}
	}
}

func TestSlopeBadInput(t *testing.T) {
	dir := t.TempDir()
	base := "site: s\nstress:\n  vertical: {gradient: 0.026}\n  shmax: {ratio: 1.2, azimuth: 90}\n  shmin: {ratio: 0.7}\nplanes: [{name: A, dip: 40, dip_direction: 200, depth: 10}]\n"
	for _, c := range []struct{ slope, want string }{
		{"slope: {height: 30}", `slope: missing required key "face"`},
		{"slope: {face: {dip: 65, dip_direction: 210}}", `missing required key "height"`},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: -3}", "slope.height: -3 is outside"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, lateral: 20}", `unknown key "lateral" (did you mean "lateral_limit"?)`},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, tension_crack: {distance: 5, depth: 3}}", "give distance or depth, not both"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, water: {tension_crack_fill: [0, 1.5]}}", "1.5 is outside the allowed range [0, 1]"},
	} {
		p := filepath.Join(dir, "s.yaml")
		os.WriteFile(p, []byte(base+c.slope+"\n"), 0o644)
		code, _, stderr := cleft(t, "", "slope", p)
		if code != 1 || !strings.Contains(stderr, c.want) {
			t.Errorf("%s: exit %d, %q; want %q", c.slope, code, stderr, c.want)
		}
	}
	p := filepath.Join(dir, "none.yaml")
	os.WriteFile(p, []byte(base), 0o644)
	if code, _, stderr := cleft(t, "", "slope", p); code != 1 || !strings.Contains(stderr, "no slope: block") {
		t.Errorf("no slope block: exit %d, %q", code, stderr)
	}
}

func TestSlopeBlockOutsideTheModel(t *testing.T) {
	// A feasible planar case whose plane dips less steeply than the upper
	// surface cannot be a tension-crack block: the row says so, nothing fails.
	dir := t.TempDir()
	p := filepath.Join(dir, "s.yaml")
	os.WriteFile(p, []byte("site: s\nstress:\n  vertical: {gradient: 0.026}\n  shmax: {ratio: 1.2, azimuth: 90}\n  shmin: {ratio: 0.7}\n"+
		"planes: [{name: A, dip: 40, dip_direction: 210, depth: 10}]\n"+
		"slope: {face: {dip: 65, dip_direction: 210}, top: {dip: 45, dip_direction: 210}, height: 20, friction_angle: 30}\n"), 0o644)
	code, out, stderr := cleft(t, "", "slope", p, "--out", dir)
	if code != 0 || !strings.Contains(out, "factor of safety not computed") {
		t.Errorf("exit %d, %s %s", code, out, stderr)
	}
}
