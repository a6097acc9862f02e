package main

import (
	"bytes"
	"math"
	"os"
	"path/filepath"
	"strconv"
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
	zones := readCSV(t, filepath.Join(out, "zones.csv"))
	if strings.Join(zones[0], ",") != strings.Join(table.ZoneColumns, ",") || len(zones) != 1+57*4 {
		t.Errorf("zones.csv: header %v, %d rows", zones[0], len(zones)-1)
	}
	// profile.csv's deepest zone is the deepest of the station's rows in
	// zones.csv, by extent (unbounded, past the grid, bounded) then depth.
	rank := map[string]int{"": 0, "bounded": 1, "past the grid": 2, "unbounded": 3}
	for i, p := range prof[1:] {
		best := -1
		for j := 1 + 4*i; j < 1+4*(i+1); j++ {
			z := zones[j]
			if z[0] != p[0] {
				t.Fatalf("zones.csv row %v at station %v", z, p[0])
			}
			if best < 0 || rank[z[7]] > rank[zones[best][7]] || (rank[z[7]] == rank[zones[best][7]] && cell(t, z[2]) > cell(t, zones[best][2])) {
				best = j
			}
		}
		if b := zones[best]; p[14] != b[2] || p[15] != b[1] || p[16] != b[7] {
			t.Errorf("station %v: profile's deepest %v, zones.csv's %v", p[0], p[14:17], b)
		}
	}
	for _, name := range []string{"zones.csv", "profile.csv"} {
		data, _ := os.ReadFile(filepath.Join(out, name))
		if bytes.Contains(data, []byte("NaN")) || bytes.Contains(data, []byte("Inf")) {
			t.Errorf("%s has NaN or Inf", name)
		}
	}
	flat := strings.Join(strings.Fields(stdout), " ")
	for _, want := range []string{"slip zone up to", "Thiem 1906", "not a support design", "zone of potential slip has no bound"} {
		if !strings.Contains(flat, want) {
			t.Errorf("summary lacks %q", want)
		}
	}
	for _, f := range []string{"tunnel-profile.svg", "tunnel-profile.png", "tunnel-section.svg", "tunnel-section.png", "tunnel-wall.svg", "tunnel-wall.png"} {
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
		{strings.Replace(good, "{from: 100, to: 250", "{from: 120, to: 250", 1), "DIR/t.yaml:10: tunnel.alignment[1]: a gap in the alignment between chainage 100 and 120 m: legs must join"},
		{strings.Replace(good, "{from: 100, to: 250", "{from: 90, to: 250", 1), "DIR/t.yaml:10: tunnel.alignment[1]: legs overlap between chainage 90 and 100 m: each leg must start where the last ended"},
		{strings.Replace(good, "[250, 30]", "[200, 30]", 1), "DIR/t.yaml: tunnel.cover: station at chainage 240 m lies outside the cover profile (0 to 200 m)"},
		{strings.Replace(good, "rock: {ucs: 80}", "rock: {poisson: 0.2}", 1), "DIR/t.yaml:13: tunnel.rock: missing required key \"ucs\" (MPa, uniaxial compressive strength of the intact rock)"},
		{good + "  sets: [Z9]\n", "DIR/t.yaml: tunnel.sets: no plane or set is named \"Z9\"; there are: A"},
		{strings.Replace(good, "[100, 60], [250, 30]", "[100, 60], [90, 30]", 1), "DIR/t.yaml:11: tunnel.cover: chainages must increase: 90 after 100"},
	} {
		p := filepath.Join(dir, "t.yaml")
		os.WriteFile(p, []byte(base+c.tunnel), 0o644)
		code, _, stderr := cleft(t, "", "tunnel", p)
		if want := message(c.want, dir); code != 1 || stderr != want {
			t.Errorf("exit %d, %q; want %q", code, stderr, want)
		}
	}
}

// cell parses a CSV number, −1 for an empty cell.
func cell(t *testing.T, s string) float64 {
	t.Helper()
	if s == "" {
		return -1
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatal(err)
	}
	return v
}

func TestTunnelZoneClosedForm(t *testing.T) {
	// Through the whole command (derived; REFERENCES.md "Slip zone,
	// derived"): an isotropic far field, dry rock, a cohesionless horizontal
	// plane containing the axis of a level drive, φ = 30° (μ = tan 30°),
	// a = 4 m: the zone reaches a/√(sin φ), 1.657 m beyond the wall, at 45° +
	// φ/2 from a springline, and reaches the wall; the limit a/2 = 2 m is
	// not passed.
	const (
		want     = 1.656854 // m
		tol      = 1e-6     // m: zones.csv's 8 significant digits
		angleTol = 0.01     // degrees
	)
	dir := t.TempDir()
	site := "site: closed form\nstress:\n  tensor: {nn: 10, ee: 10, dd: 10, ne: 0, nd: 0, ed: 0}\nwater: {dry: true}\n" +
		"strength: {friction: 0.5773502691896258, cohesion: 0}\nplanes: [{name: H, dip: 0, dip_direction: 0, depth: 100}]\n" +
		"tunnel:\n  alignment: [{from: 0, to: 50, trend: 0}]\n  cover: [[0, 100], [50, 100]]\n  radius: 4\n  rock: {ucs: 80}\n"
	p := filepath.Join(dir, "s.yaml")
	if err := os.WriteFile(p, []byte(site), 0o644); err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "out")
	code, stdout, stderr := cleft(t, "", "tunnel", p, "--out", out)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	zones := readCSV(t, filepath.Join(out, "zones.csv"))
	if len(zones) != 3 {
		t.Fatalf("zones.csv: %v", zones)
	}
	for _, z := range zones[1:] {
		at, off := cell(t, z[3]), math.Inf(1)
		for _, w := range []float64{30, 150, 210, 330} {
			off = math.Min(off, math.Abs(at-w))
		}
		if d := cell(t, z[2]); math.Abs(d-want) > tol || z[6] != "yes" || z[7] != "bounded" || off > angleTol {
			t.Errorf("zone %v: want depth %v m at 30°, 150°, 210° or 330°, open to the wall, bounded", z, want)
		}
	}
	flat := strings.Join(strings.Fields(stdout), " ")
	if !strings.Contains(flat, "slip zone up to 1.66 m beyond the wall") || !strings.Contains(flat, "nowhere deeper than 2 m") {
		t.Errorf("summary:\n%s", stdout)
	}
}

func TestTunnelZoneKeys(t *testing.T) {
	base := "site: s\nstress:\n  vertical: {gradient: 0.026}\n  shmax: {ratio: 1.2, azimuth: 90}\n  shmin: {ratio: 0.7}\nplanes: [{name: A, dip: 60, dip_direction: 200, depth: 100}]\n" +
		"tunnel:\n  alignment: [{from: 0, to: 100, trend: 72}]\n  cover: [[0, 40], [100, 60]]\n  radius: 3\n  rock: {ucs: 80}\n"
	s, err := site.Parse([]byte(base), "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if tn := s.Tunnel; tn.Support != 0 || tn.ZoneLimit != 1.5 || tn.Influence != 0 || !tn.Drained {
		t.Errorf("defaults: support %v, limit %v, influence %v, drained %v", tn.Support, tn.ZoneLimit, tn.Influence, tn.Drained)
	}
	d := strings.Join(s.TunnelDefaults, "; ")
	for _, want := range []string{"support_pressure = 0 MPa", "zone_depth_limit = 1.5 m", "radius_of_influence = twice the head"} {
		if !strings.Contains(d, want) {
			t.Errorf("defaults %q lack %q", d, want)
		}
	}
	s, err = site.Parse([]byte(base+"  support_pressure: 0.4\n  zone_depth_limit: 2.5\n  radius_of_influence: 60\n"), "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if tn := s.Tunnel; tn.Support != 0.4 || tn.ZoneLimit != 2.5 || tn.Influence != 60 {
		t.Errorf("given: support %v, limit %v, influence %v", tn.Support, tn.ZoneLimit, tn.Influence)
	}
	s, err = site.Parse([]byte(base+"  wall_pore_pressure: far-field\n"), "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if strings.Contains(strings.Join(s.TunnelDefaults, "; "), "radius_of_influence") {
		t.Error("a far-field wall lists the radius of influence among its defaults")
	}
}
