package main

import (
	"bytes"
	"encoding/csv"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"testing"
)

const chanceSite = `site: chance test (invented)
depth: 150
stress:
  vertical: {density: 2650}
  shmax: {ratio: 1.35, azimuth: 128}
  shmin: {ratio: 0.72}
water: {table: 18}
strength: {friction: 0.6}
planes:
  - {name: F1, dip: 74, dip_direction: 188, depth: 180, friction: 0.45}
  - {name: B1, dip: 14, dip_direction: 200}
  - {name: J1, dip: 81, dip_direction: 146, depth: 45}
  - {name: J2, dip: 62, dip_direction: 300}
`

const chanceBlocks = `cases:
  low-k:  {stress.shmax.ratio: 1.1, stress.shmin.ratio: 0.6}
  high-k: {stress.shmax.ratio: 1.6, water.table: 5}
  weak:   {strength.friction: 0.5, planes.F1.friction: 0.35}
  turned: {stress.shmax.azimuth: 150, planes.J2.depth: 80}
uncertainty:
  realisations: 3000
  seed: 7
  vary:
    stress.shmax.ratio:   {normal: [1.35, 0.15]}
    stress.shmax.azimuth: {uniform: [110, 146]}
    stress.shmin.ratio:   {triangular: [0.6, 0.72, 0.85]}
    water.table:          {uniform: [5, 30]}
    strength.friction:    {lognormal: [0.6, 0.1]}
    planes.F1.friction:   {uniform: [0.35, 0.5]}
  correlations: [[stress.shmax.ratio, stress.shmin.ratio, 0.7]]
  orientation: {fisher_k: 200}
`

func writeSite(t *testing.T, text string) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), "site.yaml")
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

func TestChanceCaseRowIsResolveByHand(t *testing.T) {
	// Each case's rows of cases.csv equal cleft resolve of the site file
	// with the case's numbers typed into it by hand (the same 8-digit cells).
	dir := t.TempDir()
	code, _, stderr := cleft(t, "", "chance", writeSite(t, chanceSite+chanceBlocks), "--out", dir)
	if code != 0 {
		t.Fatalf("chance: exit %d: %s", code, stderr)
	}
	rows := readCSV(t, filepath.Join(dir, "cases.csv"))
	by := map[[2]string][]string{}
	for _, r := range rows[1:] {
		by[[2]string{r[0], r[1]}] = r
	}
	edits := map[string][][2]string{
		"base":   nil,
		"low-k":  {{"ratio: 1.35", "ratio: 1.1"}, {"ratio: 0.72", "ratio: 0.6"}},
		"high-k": {{"ratio: 1.35", "ratio: 1.6"}, {"table: 18", "table: 5"}},
		"weak":   {{"friction: 0.6}", "friction: 0.5}"}, {"friction: 0.45}", "friction: 0.35}"}},
		"turned": {{"azimuth: 128", "azimuth: 150"}, {"dip_direction: 300}", "dip_direction: 300, depth: 80}"}},
	}
	for name, ed := range edits {
		t.Run(name, func(t *testing.T) {
			text := chanceSite
			for _, e := range ed {
				if !strings.Contains(text, e[0]) {
					t.Fatalf("%q not in the site", e[0])
				}
				text = strings.Replace(text, e[0], e[1], 1)
			}
			code, out, stderr := cleft(t, "", "resolve", writeSite(t, text))
			if code != 0 {
				t.Fatalf("resolve: exit %d: %s", code, stderr)
			}
			res, err := csv.NewReader(strings.NewReader(out)).ReadAll()
			if err != nil {
				t.Fatal(err)
			}
			col := map[string]int{}
			for i, c := range res[0] {
				col[c] = i
			}
			for _, r := range res[1:] {
				got, ok := by[[2]string{r[col["name"]], name}]
				if !ok {
					t.Fatalf("no row for %s in case %s", r[col["name"]], name)
				}
				for k, c := range []string{"depth_m", "effective_normal_stress_mpa", "shear_stress_mpa", "slip_tendency", "factor_of_safety", "pressure_to_slip_mpa", "state"} {
					if got[2+k] != r[col[c]] {
						t.Errorf("%s, case %s, %s: cases.csv %q, resolve by hand %q", r[col["name"]], name, c, got[2+k], r[col[c]])
					}
				}
			}
		})
	}
}

func TestChanceSameFilesForAnyCPUs(t *testing.T) {
	// GOMAXPROCS 1 and 2 give byte-identical files for one seed; another
	// seed gives another chance.csv.
	site := writeSite(t, chanceSite+chanceBlocks)
	run := func(procs int, args ...string) string {
		defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
		dir := t.TempDir()
		code, _, stderr := cleft(t, "", append([]string{"chance", site, "--out", dir}, args...)...)
		if code != 0 {
			t.Fatalf("chance: exit %d: %s", code, stderr)
		}
		return dir
	}
	one, two := run(1), run(2)
	files, _ := filepath.Glob(filepath.Join(one, "*"))
	if len(files) < 7 {
		t.Fatalf("%d files written: %v", len(files), files)
	}
	for _, f := range files {
		a, _ := os.ReadFile(f)
		b, err := os.ReadFile(filepath.Join(two, filepath.Base(f)))
		if err != nil || !bytes.Equal(a, b) {
			t.Errorf("%s differs between GOMAXPROCS 1 and 2 (%v)", filepath.Base(f), err)
		}
	}
	other := run(2, "--seed", "8")
	a, _ := os.ReadFile(filepath.Join(one, "chance.csv"))
	b, _ := os.ReadFile(filepath.Join(other, "chance.csv"))
	if bytes.Equal(a, b) {
		t.Errorf("seeds 7 and 8 give the same chance.csv")
	}
}

func TestChanceTables(t *testing.T) {
	// The columns of the issue, in order; robust is yes when the state holds
	// in every case; no NaN or Inf reaches a file.
	dir := t.TempDir()
	code, stdout, stderr := cleft(t, "", "chance", writeSite(t, chanceSite+chanceBlocks), "--out", dir, "--realisations", "500")
	if code != 0 {
		t.Fatalf("chance: exit %d: %s", code, stderr)
	}
	if !strings.Contains(stdout, "P(unstable)") || !strings.Contains(stdout, "Caution") {
		t.Errorf("stdout lacks the verdict table or the caution:\n%s", stdout)
	}
	chance := readCSV(t, filepath.Join(dir, "chance.csv"))
	want := "name,dip,dip_direction,depth_m,state,p_critical,p_opening,p_unstable,p_unstable_se,fs_p05,fs_p50,fs_p95,ts_p05,ts_p50,ts_p95,pressure_to_slip_p05_mpa,pressure_to_slip_p50_mpa,pressure_to_slip_p95_mpa,robust,driver,driver_correlation"
	if got := strings.Join(chance[0], ","); got != want {
		t.Errorf("chance.csv header\n%s\nwant\n%s", got, want)
	}
	cases := readCSV(t, filepath.Join(dir, "cases.csv"))
	if got := strings.Join(cases[0], ","); got != "name,case,depth_m,effective_normal_stress_mpa,shear_stress_mpa,slip_tendency,factor_of_safety,pressure_to_slip_mpa,state" {
		t.Errorf("cases.csv header %s", got)
	}
	if len(chance) != 5 || len(cases) != 1+4*5 || cases[1][1] != "base" {
		t.Errorf("%d chance rows, %d case rows (first case %q)", len(chance)-1, len(cases)-1, cases[1][1])
	}
	states := map[string]map[string]bool{}
	for _, r := range cases[1:] {
		if states[r[0]] == nil {
			states[r[0]] = map[string]bool{}
		}
		states[r[0]][r[8]] = true
	}
	for _, r := range chance[1:] {
		if want := map[bool]string{true: "yes", false: "no"}[len(states[r[0]]) == 1]; r[18] != want {
			t.Errorf("%s: robust %q with states %v", r[0], r[18], states[r[0]])
		}
	}
	sens := readCSV(t, filepath.Join(dir, "sensitivity.csv"))
	if len(sens) != 1+4*6 {
		t.Errorf("sensitivity.csv has %d rows, want 4 planes × 6 inputs", len(sens)-1)
	}
	for _, name := range []string{"cases.csv", "chance.csv", "sensitivity.csv"} {
		data, _ := os.ReadFile(filepath.Join(dir, name))
		for _, bad := range []string{"NaN", "Inf"} {
			if bytes.Contains(data, []byte(bad)) {
				t.Errorf("%s contains %s", name, bad)
			}
		}
	}
}
