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
	for _, want := range []string{"1 planar, 3 wedge, 1 flexural toppling", "planar J-cut-3", "falls to 1 with", "flexural toppling F2",
		"wedge J-cut-1+J-cut-3: line 229/38, sliding on both planes", "MN, traces on the face", "K = ", "bolt for FS 1.5", "Readings against the tests", "pairs of readings pass", "not a substitute"} {
		if !strings.Contains(strings.Join(strings.Fields(stdout), " "), want) { // lines are wrapped
			t.Errorf("summary lacks %q:\n%s", want, stdout)
		}
	}
	rows := readCSV(t, filepath.Join(out, "slope.csv"))
	head := strings.Join(rows[0], ",")
	if head != "test,planes,feasible,reason,mode,plan_view_mode,line_trend,line_plunge,friction_angle_deg,fs_water_0m,fs_water_5m,fs_water_table_18m,fs_water_full,"+
		"crack_depth_m,water_depth_to_fail_m,saturated_head_m,water_table_head_m,weight_mn,volume_m3,trace_a_m,trace_b_m,area_a_m2,area_b_m2,"+
		"mode_by_water,wedge_factor_k,fs_friction_only,bolt_to_target_mn_per_m,bolt_to_target_mn" {
		t.Errorf("header %s", head)
	}
	col := map[string]int{}
	for i, c := range rows[0] {
		col[c] = i
	}
	// 9 candidates (6 planes, 3 set means): 9 planar, 36 wedge, 9 toppling rows.
	if len(rows) != 1+9+36+9 {
		t.Errorf("%d rows, want 54", len(rows)-1)
	}
	wedges := 0
	for _, r := range rows[1:] {
		if r[2] == "no" && r[3] == "" {
			t.Errorf("a failing test without its reason: %v", r)
		}
		if r[0] == "planar" && r[2] == "yes" && (r[col["fs_water_0m"]] == "" || r[col["fs_water_full"]] == "" || r[col["bolt_to_target_mn_per_m"]] == "") {
			t.Errorf("a feasible planar case without FS: %v", r)
		}
		if r[0] == "wedge" && r[2] == "yes" {
			wedges++
			for _, c := range []string{"mode", "fs_water_0m", "fs_water_5m", "fs_water_table_18m", "fs_water_full", "weight_mn", "volume_m3", "trace_a_m", "trace_b_m", "bolt_to_target_mn"} {
				if r[col[c]] == "" {
					t.Errorf("feasible wedge %s without %s: %v", r[1], c, r)
				}
			}
		}
	}
	if wedges != 3 {
		t.Errorf("%d feasible wedges, want 3", wedges)
	}
	counts := readCSV(t, filepath.Join(out, "slope-readings.csv"))
	if strings.Join(counts[0], ",") != "test,sets,tested,passing,share,weighted_share" {
		t.Errorf("slope-readings.csv header %v", counts[0])
	}
	// 133 readings in 3 sets and the unassigned: planar and toppling 4 sets
	// + all; wedges 10 pairs of sets + all.
	if len(counts) != 1+5+11+5 {
		t.Errorf("slope-readings.csv has %d rows, want 21", len(counts)-1)
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
		{"slope: {height: 30}", "DIR/s.yaml:7: slope: missing required key \"face\" ({dip, dip_direction} of the cut face)"},
		{"slope: {face: {dip: 65, dip_direction: 210}}", "DIR/s.yaml:7: slope: missing required key \"height\" (m, toe to crest)"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: -3}", "DIR/s.yaml:7: slope.height: -3 is outside the allowed range (0, 20000] m"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, lateral: 20}", "DIR/s.yaml:7: slope.lateral: unknown key \"lateral\" (did you mean \"lateral_limit\"?); allowed here: face, top, height, friction_angle, lateral_limit, toppling_limit, unit_weight, water, tension_crack, bolt, seismic, target_fs, source"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, tension_crack: {distance: 5, depth: 3}}", "DIR/s.yaml:7: slope.tension_crack.depth: give distance or depth, not both"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, water: {tension_crack_fill: [0, 1]}}", "DIR/s.yaml:7: slope.water: want a list of water cases (m of water, table, full); tension_crack_fill was replaced by depths of water in m"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, water: [0, -2]}", "DIR/s.yaml:7: slope.water[1]: -2 is outside the allowed range [0, ∞) m"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, water: [0, half]}", "DIR/s.yaml:7: slope.water[1]: \"half\" is not one of: table, full"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, bolt: {per_metre: 0.1, plunge: 10, angle_to_plane: 30}}", "DIR/s.yaml:7: slope.bolt.angle_to_plane: give plunge or angle_to_plane, not both"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, seismic: 1.2}", "DIR/s.yaml:7: slope.seismic: 1.2 is outside the allowed range [0, 1)"},
		{"slope: {face: {dip: 65, dip_direction: 210}, height: 30, target_fs: 0}", "DIR/s.yaml:7: slope.target_fs: 0 is outside the allowed range (0, ∞)"},
	} {
		p := filepath.Join(dir, "s.yaml")
		os.WriteFile(p, []byte(base+c.slope+"\n"), 0o644)
		code, _, stderr := cleft(t, "", "slope", p)
		if want := message(c.want, dir); code != 1 || stderr != want {
			t.Errorf("%s: exit %d, %q; want %q", c.slope, code, stderr, want)
		}
	}
	p := filepath.Join(dir, "none.yaml")
	os.WriteFile(p, []byte(base), 0o644)
	if code, _, stderr := cleft(t, "", "slope", p); code != 1 || stderr != message("DIR/none.yaml: no slope: block: give the face, height and the rest (see README, Rock slopes)", dir) {
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
