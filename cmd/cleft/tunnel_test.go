package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"cleft/planes/site"
	"cleft/plots/table"
)

func TestTunnelCommand(t *testing.T) {
	dir := t.TempDir()
	if code, _, stderr := cleft(t, "", "example", dir); code != 0 {
		t.Fatal(stderr)
	}
	out := filepath.Join(dir, "out")
	code, stdout, stderr := cleft(t, "", "tunnel", filepath.Join(dir, "site.yaml"), "--out", out, "--station", "600")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"57 stations every 25 m", "Largest boundary stress", "Martin, Kaiser & McCreath", "S1 (78/141)", "F1 (74/188)"} {
		if !strings.Contains(stdout, want) {
			t.Errorf("summary lacks %q:\n%s", want, stdout)
		}
	}
	st := readCSV(t, filepath.Join(out, "stations.csv"))
	if strings.Join(st[0], ",") != strings.Join(table.StationColumns, ",") || len(st) != 1+57*4 {
		t.Errorf("stations.csv: header %v, %d rows", st[0], len(st)-1)
	}
	wall := readCSV(t, filepath.Join(out, "wall.csv"))
	if len(wall) != 1+57*36 || wall[0][1] != "angle_deg" {
		t.Errorf("wall.csv: %d rows", len(wall)-1)
	}
	prof := readCSV(t, filepath.Join(out, "profile.csv"))
	if len(prof) != 58 {
		t.Errorf("profile.csv: %d rows", len(prof)-1)
	}
	for _, f := range []string{"tunnel-profile.svg", "tunnel-profile.png", "tunnel-wall.svg", "tunnel-wall.png"} {
		if _, err := os.Stat(filepath.Join(out, f)); err != nil {
			t.Error(err)
		}
	}
	if code, _, stderr := cleft(t, "", "tunnel", filepath.Join(dir, "site.yaml"), "--out", out, "--station", "613"); code != 2 {
		t.Errorf("--station off the grid: exit %d, %s", code, stderr)
	}
}

func TestTunnelInput(t *testing.T) {
	base := "site: s\nstress:\n  vertical: {gradient: 0.026}\n  shmax: {ratio: 1.2, azimuth: 90}\n  shmin: {ratio: 0.7}\nplanes: [{name: A, dip: 60, dip_direction: 200, depth: 100}]\n"
	good := "tunnel:\n  alignment:\n    - {from: 0, to: 100, trend: 72}\n    - {from: 100, to: 250, trend: 96, plunge: 0.5}\n  cover: [[0, 10], [100, 60], [250, 30]]\n  spacing: 40\n  rock: {ucs: 80}\n"
	s, err := site.Parse([]byte(base+good), "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	sts, err := s.Tunnel.Stations()
	if err != nil {
		t.Fatal(err)
	}
	// Every 40 m from 0, and the end: 0, 40, 80, 120, 160, 200, 240, 250.
	if len(sts) != 8 || sts[7].Chainage != 250 {
		t.Fatalf("stations %+v", sts)
	}
	// Cover interpolates linearly: at 40 m, 10 + 50·0.4 = 30; at 160 m,
	// 60 − 30·60/150 = 48. The axis is a radius (default 1 m) below the crown.
	if sts[1].Cover != 30 || sts[4].Cover != 48 || sts[4].Depth != 49 {
		t.Errorf("cover %v, %v, depth %v", sts[1].Cover, sts[4].Cover, sts[4].Depth)
	}
	if sts[2].Trend != 72 || sts[3].Trend != 96 {
		t.Errorf("legs: %v %v", sts[2].Trend, sts[3].Trend)
	}
	dir := t.TempDir()
	for _, c := range []struct{ tunnel, want string }{
		{strings.Replace(good, "{from: 100, to: 250", "{from: 120, to: 250", 1), "a gap in the alignment between chainage 100 and 120 m"},
		{strings.Replace(good, "{from: 100, to: 250", "{from: 90, to: 250", 1), "legs overlap between chainage 90 and 100 m"},
		{strings.Replace(good, "[250, 30]", "[200, 30]", 1), "station at chainage 240 m lies outside the cover profile"},
		{strings.Replace(good, "rock: {ucs: 80}", "rock: {poisson: 0.2}", 1), `missing required key "ucs"`},
		{good + "  sets: [Z9]\n", `no plane or set is named "Z9"`},
		{strings.Replace(good, "[100, 60], [250, 30]", "[100, 60], [90, 30]", 1), "chainages must increase"},
	} {
		p := filepath.Join(dir, "t.yaml")
		os.WriteFile(p, []byte(base+c.tunnel), 0o644)
		code, _, stderr := cleft(t, "", "tunnel", p)
		if code != 1 || !strings.Contains(stderr, c.want) {
			t.Errorf("exit %d, %q; want %q", code, stderr, c.want)
		}
	}
}
